package dev.wavemark.inference;

import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.numeric.Measured;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;

/**
 * A run's Mach number from its frames. Frame weights are inverse variances of each frame's own
 * (independent) part, its angle fit and scatter; the common parts (flow direction, model angle,
 * gamma) are fully correlated between frames and enter as weighted sums, not in quadrature.
 */
final class RunSummaries {
  /** Test level of the frame-to-frame scatter warning. */
  private static final double SCATTER_TEST_LEVEL = 0.01;

  private RunSummaries() {}

  static RunSummary of(RunSpec run, List<FrameInference> frames, int failedFrames) {
    List<FrameInference> with = frames.stream().filter(f -> f.mach().isPresent()).toList();
    int total = frames.size() + failedFrames;
    List<Warning> warnings = new ArrayList<>();
    if (with.isEmpty()) {
      warnings.add(new Warning(Warning.Code.NO_MACH_ESTIMATE,
          "no frame gave a Mach number (" + frames.size() + " analysed, " + failedFrames + " failed)"));
      return new RunSummary(Optional.empty(), 0, total, 0, failedFrames, List.of(), Optional.empty(), warnings);
    }
    int n = with.size();
    double[] m = new double[n];
    double[] own = new double[n];
    for (int i = 0; i < n; i++) {
      FrameInference f = with.get(i);
      m[i] = f.mach().get().value();
      own[i] = Math.hypot(Math.hypot(part(f, BudgetLine.Source.ANGLE_FIT), part(f, BudgetLine.Source.SCATTER)),
          part(f, BudgetLine.Source.STANDOFF));
    }
    double[] w = new double[n];
    boolean anyZero = false;
    for (double o : own) {
      anyZero |= !(o > 0);
    }
    double sw = 0;
    for (int i = 0; i < n; i++) {
      w[i] = anyZero ? 1 : 1 / (own[i] * own[i]);
      sw += w[i];
    }
    double mean = 0;
    double fitVar = 0;
    for (int i = 0; i < n; i++) {
      w[i] /= sw;
      mean += w[i] * m[i];
      fitVar += w[i] * w[i] * own[i] * own[i];
    }
    double plain = 0;
    for (double v : m) {
      plain += v / n;
    }
    double ss = 0;
    double chi2 = 0;
    for (int i = 0; i < n; i++) {
      ss += (m[i] - plain) * (m[i] - plain);
      if (own[i] > 0) {
        chi2 += (m[i] - mean) * (m[i] - mean) / (own[i] * own[i]);
      }
    }
    double scatter = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
    double fit = Math.sqrt(fitVar);
    double standardError = n > 1 ? scatter / Math.sqrt(n) : 0;
    List<BudgetLine> budget = new ArrayList<>();
    budget.add(new BudgetLine(BudgetLine.Source.ANGLE_FIT,
        (line(with.get(0), BudgetLine.Source.STANDOFF).isPresent() ? "angle fit, stand-off fit" : "angle fit")
            + " and within-frame scatter, averaged over " + n + " frame(s)", rms(with, BudgetLine.Source.ANGLE_FIT), "rad", fit));
    if (standardError > fit) {
      budget.add(new BudgetLine(BudgetLine.Source.SCATTER,
          String.format(Locale.ROOT, "frame-to-frame scatter %.5f over %d frames beyond the fit uncertainty", scatter, n),
          scatter, "1", Math.sqrt(standardError * standardError - fit * fit)));
    }
    for (BudgetLine.Source s : List.of(BudgetLine.Source.FLOW_DIRECTION, BudgetLine.Source.MODEL_ANGLE, BudgetLine.Source.GAMMA,
        BudgetLine.Source.NOSE_RADIUS, BudgetLine.Source.CORRELATION, BudgetLine.Source.FAN_LOCATOR)) {
      if (with.stream().allMatch(f -> line(f, s).isEmpty())) {
        continue; // only the sources some frame's estimate depends on (see Combiner)
      }
      double c = 0;
      for (int i = 0; i < n; i++) {
        c += w[i] * part(with.get(i), s);
      }
      BudgetLine first = line(with.get(0), s).orElse(null);
      budget.add(new BudgetLine(s, (first == null ? s.code() : first.description()) + " (common to every frame)",
          first == null ? 0 : first.inputUncertainty(), first == null ? "" : first.inputUnit(), c));
    }
    Measured mach = new Measured(mean, BudgetLine.total(budget));
    if (n >= 3 && chi2 > 0) {
      double p = 1 - new ChiSquaredDistribution(n - 1).cumulativeProbability(chi2);
      if (p < SCATTER_TEST_LEVEL) {
        warnings.add(new Warning(Warning.Code.FRAME_SCATTER, String.format(Locale.ROOT,
            "the %d frames scatter beyond their uncertainties (chi-square %.1f for %d degrees of freedom, p = %.2g)",
            n, chi2, n - 1, p)));
      }
    }
    Optional<TunnelCheck> tunnel = Optional.empty();
    if (run.tunnel().nominalMach().isPresent() || run.tunnel().pitot().isPresent()) {
      tunnel = Optional.of(TunnelChecks.of(run.tunnel(), run.gas().gamma(), mach));
      for (String note : tunnel.get().notes()) {
        warnings.add(new Warning(Warning.Code.TUNNEL_REFERENCE, note));
      }
    }
    return new RunSummary(Optional.of(mach), scatter, total, n, failedFrames, budget, tunnel, warnings);
  }

  private static Optional<BudgetLine> line(FrameInference f, BudgetLine.Source s) {
    return f.budget().stream().filter(l -> l.source() == s).findFirst();
  }

  private static double part(FrameInference f, BudgetLine.Source s) {
    return line(f, s).map(BudgetLine::machContribution).orElse(0.0);
  }

  private static double rms(List<FrameInference> frames, BudgetLine.Source s) {
    double sum = 0;
    for (FrameInference f : frames) {
      double v = line(f, s).map(BudgetLine::inputUncertainty).orElse(0.0);
      sum += v * v;
    }
    return Math.sqrt(sum / frames.size());
  }
}
