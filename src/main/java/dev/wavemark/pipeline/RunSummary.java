package dev.wavemark.pipeline;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.NormalShock;
import dev.wavemark.core.model.Tunnel;
import dev.wavemark.files.ResultFile;
import java.util.List;
import java.util.Optional;
import org.jspecify.annotations.Nullable;

/**
 * The run's summary from its frames: one Mach number with its uncertainty, the frame-to-frame
 * scatter, and the tunnel check.
 *
 * <p>Over a sequence, only the random part of each frame's uncertainty averages out; the
 * systematic part (budget items marked systematic: flow direction, model angle, gamma) is common
 * to every frame and is added back in full. The frames are combined by the inverse-variance
 * weighted mean of their random parts (Taylor, "An Introduction to Error Analysis", 2nd ed.,
 * sec. 7.2); the random part of the result is the larger of the internal estimate 1/sqrt(sum w)
 * and the external one s/sqrt(n) from the scatter s, so that real unsteadiness is not hidden.
 */
final class RunSummary {
  private RunSummary() {}

  static ResultFile.Summary of(List<ResultFile.Frame> frames, Tunnel tunnel, double gamma) {
    int failed = 0;
    double sw = 0;
    double swx = 0;
    double sumSys2 = 0;
    double sum = 0;
    double sum2 = 0;
    int n = 0;
    for (ResultFile.Frame f : frames) {
      if (f.failed() || f.mach() == null || !Double.isFinite(f.mach().value())) {
        failed += f.failed() ? 1 : 0;
        continue;
      }
      double m = f.mach().value();
      double u = Double.isFinite(f.mach().uncertainty()) ? f.mach().uncertainty() : 0;
      double sys2 = systematic2(f);
      double rand2 = Math.max(0, u * u - sys2);
      double w = rand2 > 0 ? 1 / rand2 : 0;
      sw += w;
      swx += w * m;
      sumSys2 += Math.min(sys2, u * u);
      sum += m;
      sum2 += m * m;
      n++;
    }
    Double nominal = tunnel.nominalMach().orElse(null);
    Double tol = tunnel.machTolerance().orElse(null);
    if (n == 0) {
      return new ResultFile.Summary(null, nominal, frames.size(), failed, tol, null, null);
    }
    double mean = sum / n;
    double value = sw > 0 ? swx / sw : mean;
    double scatter = n > 1 ? Math.sqrt(Math.max(0, (sum2 - n * mean * mean) / (n - 1))) : 0;
    double internal2 = sw > 0 ? 1 / sw : 0;
    double external2 = n > 1 ? scatter * scatter / n : 0;
    double u = Math.sqrt(Math.max(internal2, external2) + sumSys2 / n);
    ResultFile.Measure mach = new ResultFile.Measure(value, u);
    return new ResultFile.Summary(mach, nominal, frames.size(), failed, tol, n > 1 ? scatter : null,
        check(value, u, tunnel, gamma));
  }

  private static double systematic2(ResultFile.Frame f) {
    double s = 0;
    if (f.budget() != null) {
      for (ResultFile.BudgetItem b : f.budget()) {
        if (b.systematic() && Double.isFinite(b.machUncertainty())) {
          s += b.machUncertainty() * b.machUncertainty();
        }
      }
    }
    return s;
  }

  /**
   * The tunnel check of a measured Mach number: against the nominal Mach number and against the
   * pitot Mach number, each within the tolerance or not. The pitot Mach number comes from pitot
   * over static pressure by the Rayleigh pitot formula (NACA Report 1135 eq. 100) when both are
   * given, otherwise from pitot over total pressure, the normal-shock total-pressure ratio
   * (eq. 99). The verdict is "pass", "fail", "inconclusive" (within tolerance, but the measurement's
   * own standard uncertainty exceeds the tolerance) or "unchecked" (nothing to compare with).
   */
  static ResultFile.@Nullable TunnelCheck check(double mach, double u, Tunnel tunnel, double gamma) {
    Double nominal = tunnel.nominalMach().orElse(null);
    Double tol = tunnel.machTolerance().orElse(null);
    Double pitotMach = null;
    String from = null;
    Optional<Tunnel.Pitot> p = tunnel.pitot();
    if (p.isPresent()) {
      Tunnel.Pitot q = p.get();
      try {
        if (q.pitotPressurePa().isPresent() && q.staticPressurePa().isPresent()) {
          pitotMach = NormalShock.machFromPitotOverStatic(q.pitotPressurePa().get() / q.staticPressurePa().get(), gamma);
          from = "Rayleigh pitot formula, pitot/static";
        } else if (q.pitotPressurePa().isPresent() && q.totalPressurePa().isPresent()) {
          pitotMach = NormalShock.machFromTotalPressureRatio(q.pitotPressurePa().get() / q.totalPressurePa().get(), gamma);
          from = "normal-shock total-pressure ratio, pitot/total";
        }
      } catch (WavemarkException e) {
        from = "pitot readings unusable: " + e.getMessage();
      }
    }
    if (nominal == null && pitotMach == null && from == null) {
      return null;
    }
    Double dn = nominal == null ? null : mach - nominal;
    Double dp = pitotMach == null ? null : mach - pitotMach;
    Boolean pn = dn == null || tol == null ? null : Math.abs(dn) <= tol;
    Boolean pp = dp == null || tol == null ? null : Math.abs(dp) <= tol;
    String verdict;
    if (pn == null && pp == null) {
      verdict = "unchecked";
    } else if (Boolean.FALSE.equals(pn) || Boolean.FALSE.equals(pp)) {
      verdict = "fail";
    } else if (u > tol) {
      verdict = "inconclusive";
    } else {
      verdict = "pass";
    }
    return new ResultFile.TunnelCheck(mach, nominal, tol, dn, pn, pitotMach, from, dp, pp, verdict);
  }
}
