package dev.wavemark.files;

import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.geom.FittedLine;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.numeric.Measured;
import dev.wavemark.inference.BudgetLine;
import dev.wavemark.inference.DirectionCheck;
import dev.wavemark.inference.FrameInference;
import dev.wavemark.inference.MachEstimate;
import dev.wavemark.inference.RunSummary;
import dev.wavemark.inference.TunnelCheck;
import dev.wavemark.inference.WaveMatch;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jspecify.annotations.Nullable;

/** Builds the result file's wire records from the inference's domain records (radians to degrees, optionals to nulls). */
public final class ResultFrames {
  private ResultFrames() {}

  /**
   * An analysed frame's entry.
   *
   * @param index the frame's index in the run
   * @param file the image file (and page) it came from
   * @param observed the detector's waves, in the order the inference indexed them
   */
  public static ResultFile.Frame analysed(int index, String file, List<ObservedWave> observed, FrameInference inf, RunSpec run) {
    double flow = run.calibration().flowDirectionRad();
    double gamma = run.gas().gamma();
    Optional<Measured> mach = inf.mach();
    List<ResultFile.Wave> waves = new ArrayList<>();
    for (int i = 0; i < observed.size(); i++) {
      waves.add(wave(observed.get(i), match(inf, i), inf.predictedAtNominal(), mach, flow, gamma));
    }
    ResultFile.Mach m = null;
    if (mach.isPresent()) {
      List<ResultFile.Estimate> est = new ArrayList<>();
      for (MachEstimate e : inf.estimates()) {
        est.add(new ResultFile.Estimate(e.from(), e.mach().value(), e.mach().uncertainty(), e.method().label(), e.weight(),
            e.observedIndices()));
      }
      boolean tested = inf.consistency().degreesOfFreedom() > 0;
      m = new ResultFile.Mach(mach.get().value(), mach.get().uncertainty(), est,
          tested ? inf.consistency().consistent() : null, tested ? inf.consistency().pValue() : null,
          tested ? inf.consistency().birgeRatio() : null);
    }
    var r = inf.reflection();
    ResultFile.Reflection reflection = new ResultFile.Reflection(r.verdict().contractName(), r.predicted().contractName(),
        r.observed().contractName(), r.reason());
    List<String> warnings = inf.warnings().stream().map(w -> "[" + w.code().code() + "] " + w.message()).toList();
    List<ResultFile.Prediction> predicted = new ArrayList<>();
    if (mach.isPresent() && !inf.predictedAtInferred().isEmpty()) {
      predicted.add(new ResultFile.Prediction("inferred", mach.get().value(), predictedWaves(inf.predictedAtInferred())));
    }
    Optional<Double> nominal = run.tunnel().nominalMach();
    if (nominal.isPresent() && !inf.predictedAtNominal().isEmpty()) {
      predicted.add(new ResultFile.Prediction("nominal", nominal.get(), predictedWaves(inf.predictedAtNominal())));
    }
    return new ResultFile.Frame(index, file, waves, m, reflection, warnings, null, budget(inf.budget()), predicted, null);
  }

  /** The run's summary entry. */
  public static ResultFile.Summary summary(RunSummary s, RunSpec run) {
    ResultFile.Measure mach = s.mach().map(m -> new ResultFile.Measure(m.value(), m.uncertainty())).orElse(null);
    List<String> warnings = s.warnings().stream().map(w -> "[" + w.code().code() + "] " + w.message()).toList();
    return new ResultFile.Summary(mach, run.tunnel().nominalMach().orElse(null), s.frames(), s.failedFrames(),
        run.tunnel().machTolerance().orElse(null), s.framesWithMach() > 1 ? s.frameScatter() : null, budget(s.budget()),
        s.tunnel().map(ResultFrames::tunnel).orElse(null), warnings);
  }

  /** The entry with one more warning. */
  public static ResultFile.Frame withWarning(ResultFile.Frame f, String warning) {
    List<String> w = new ArrayList<>(f.warnings());
    w.add(warning);
    return new ResultFile.Frame(f.index(), f.file(), f.waves(), f.mach(), f.reflection(), w, f.error(), f.budget(), f.predicted(),
        f.tunnel());
  }

  /** The tunnel check's wire form. */
  public static ResultFile.TunnelCheck tunnel(TunnelCheck t) {
    List<ResultFile.Comparison> cs = new ArrayList<>();
    for (TunnelCheck.Comparison c : t.comparisons()) {
      cs.add(new ResultFile.Comparison(c.reference().code(), c.referenceMach().value(), c.difference(), c.differenceInSigma(),
          c.tolerance().orElse(null), c.outcome().code()));
    }
    return new ResultFile.TunnelCheck(t.inferred().value(), t.inferred().uncertainty(), cs, t.notes(), t.verdict().code());
  }

  private static @Nullable WaveMatch match(FrameInference inf, int observedIndex) {
    for (WaveMatch m : inf.matches()) {
      if (m.observedIndex() == observedIndex) {
        return m;
      }
    }
    return null;
  }

  private static ResultFile.Wave wave(ObservedWave o, @Nullable WaveMatch m, List<ExpectedWave> nominal, Optional<Measured> mach,
      double flowRad, double gamma) {
    FittedLine l = o.line();
    if (m == null) {
      return new ResultFile.Wave(o.kind().contractName(), o.side().map(s -> s.contractName()).orElse(null),
          Math.toDegrees(ImageAngles.acuteToFlow(l.directionRad(), flowRad)), Math.toDegrees(l.directionUncertaintyRad()),
          px(l.startPx()), px(l.endPx()), l.support(), l.rmsResidualPx(), null, l.curved(), null, null, null, null, bow(o));
    }
    ExpectedWave e = m.expected();
    Double deflection = null;
    if (e.kind() == WaveKind.OBLIQUE_SHOCK && mach.isPresent()
        && Math.abs(ImageAngles.wrap(e.localFlowDirectionRad() - flowRad)) < 1e-7) {
      try {
        deflection = Math.toDegrees(ObliqueShock.theta(mach.get().value(), e.angleToFlowRad(), gamma));
      } catch (dev.wavemark.core.WavemarkException ex) {
        deflection = null;
      }
    }
    Double atNominal = null;
    for (ExpectedWave n : nominal) {
      if (n.kind() == e.kind() && n.side() == e.side() && n.feature() == e.feature() && n.label().equals(e.label())) {
        atNominal = Math.toDegrees(n.angleToFlowRad());
        break;
      }
    }
    return new ResultFile.Wave(e.kind().contractName(), e.kind() == WaveKind.BOW_SHOCK ? null : e.side().contractName(),
        Math.toDegrees(m.measuredAngleRad()),
        Math.toDegrees(m.measuredUncertaintyRad()), px(l.startPx()), px(l.endPx()), l.support(), l.rmsResidualPx(), e.label(),
        l.curved(), deflection, Math.toDegrees(m.predictedAngleRad()), atNominal,
        DirectionCheck.of(o, m, flowRad).map(ResultFrames::check).orElse(null), bow(o));
  }

  private static ResultFile.DirectionCheck check(DirectionCheck c) {
    return new ResultFile.DirectionCheck(Math.toDegrees(c.measuredRad()), Math.toDegrees(c.predictedRad()),
        Math.toDegrees(c.differenceRad()), Double.isFinite(c.differenceSigma()) ? c.differenceSigma() : null);
  }

  private static ResultFile.@Nullable BowJson bow(ObservedWave o) {
    return o.bow().map(b -> new ResultFile.BowJson(b.standoffPx(), b.standoffSigmaPx(), b.standoffRatio(), b.vertexRadiusPx(),
        b.vertexRadiusSigmaPx(), b.noseRadiusPx(), px(b.vertexPx()),
        b.curvePx().stream().map(ResultFrames::px).toArray(double[][]::new))).orElse(null);
  }

  private static List<ResultFile.PredictedWave> predictedWaves(List<ExpectedWave> ws) {
    List<ResultFile.PredictedWave> out = new ArrayList<>();
    for (ExpectedWave e : ws) {
      out.add(new ResultFile.PredictedWave(e.kind().contractName(), e.side().contractName(), e.label(),
          Math.toDegrees(e.angleToFlowRad()), px(e.startPx()), px(e.endPx())));
    }
    return out;
  }

  private static List<ResultFile.BudgetItem> budget(List<BudgetLine> lines) {
    List<ResultFile.BudgetItem> out = new ArrayList<>();
    for (BudgetLine b : lines) {
      boolean rad = "rad".equals(b.inputUnit());
      boolean systematic = switch (b.source()) {
        case FLOW_DIRECTION, MODEL_ANGLE, GAMMA, NOSE_RADIUS, CORRELATION, FAN_LOCATOR -> true;
        case ANGLE_FIT, SCATTER, STANDOFF -> false;
      };
      out.add(new ResultFile.BudgetItem(b.source().code(), b.description(),
          rad ? Math.toDegrees(b.inputUncertainty()) : b.inputUncertainty(), rad ? "deg" : b.inputUnit(), b.machContribution(),
          systematic));
    }
    return out;
  }

  private static double[] px(Point2 p) {
    return new double[] {p.x(), p.y()};
  }
}
