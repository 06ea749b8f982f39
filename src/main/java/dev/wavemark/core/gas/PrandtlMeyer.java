package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;

/**
 * The Prandtl-Meyer function nu(M), the angle through which a sonic stream must turn
 * isentropically to reach Mach M, and its inverse.
 *
 * <p>Source: NACA Report 1135, eq. 171.
 */
public final class PrandtlMeyer {
  private static final int NEWTON_BUDGET = 50;

  private PrandtlMeyer() {}

  /** nu(M) in radians, for M &ge; 1. */
  public static double nu(double m, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("Mach number", m, 1.0, Double.MAX_VALUE);
    double k = Math.sqrt((gamma + 1) / (gamma - 1));
    double s = Math.sqrt(m * m - 1);
    return k * Math.atan(s / k) - Math.atan(s);
  }

  /** The largest value of nu, reached as M tends to infinity: (pi/2)(sqrt((g+1)/(g-1)) - 1). */
  public static double nuMax(double gamma) {
    Gas.check(gamma);
    return 0.5 * Math.PI * (Math.sqrt((gamma + 1) / (gamma - 1)) - 1);
  }

  /** d nu / dM, used for Newton steps and uncertainty propagation. */
  public static double derivative(double m, double gamma) {
    return Math.sqrt(m * m - 1) / (m * (1 + 0.5 * (gamma - 1) * m * m));
  }

  /**
   * Mach number with nu(M) = {@code nuRad}, by Newton iteration on ln(M) from a starting value
   * that is exact in both limits.
   *
   * @throws WavemarkException out-of-range unless 0 &le; nu &lt; nuMax(gamma)
   */
  public static double inverse(double nuRad, double gamma) {
    Gas.check(gamma);
    double max = nuMax(gamma);
    Checks.finite("Prandtl-Meyer angle", nuRad);
    if (nuRad < 0 || nuRad >= max) {
      throw new WavemarkException(
          Problem.OUT_OF_RANGE, "Prandtl-Meyer angle (deg)", WavemarkException.deg(nuRad),
          "[0, " + WavemarkException.deg(max) + ")");
    }
    if (nuRad == 0) {
      return 1.0;
    }
    double m = start(nuRad, gamma, max);
    for (int i = 0; i < NEWTON_BUDGET; i++) {
      // Newton on x = ln M: d nu/dx = M dnu/dM, which keeps the step well scaled at large M.
      double f = nu(m, gamma) - nuRad;
      double step = f / (m * derivative(m, gamma));
      double next = m * Math.exp(-Math.max(-1.0, Math.min(1.0, step)));
      if (next <= 1) {
        next = 0.5 * (1 + m);
      }
      if (Math.abs(next - m) <= 1e-14 * m) {
        return next;
      }
      m = next;
    }
    throw new WavemarkException(
        Problem.SOLVER_FAILED, "inverse Prandtl-Meyer function", NEWTON_BUDGET,
        "nu = " + WavemarkException.deg(nuRad) + " deg");
  }

  /**
   * A starting value: near M = 1, nu ~ (2/3)(M^2-1)^(3/2) k'/... gives M^2-1 ~ (1.5 nu / c)^(2/3);
   * near nuMax, nu ~ nuMax - (k^2 - 1)/M... ; blend the two.
   */
  private static double start(double nu, double gamma, double max) {
    double k2 = (gamma + 1) / (gamma - 1);
    // Small nu: nu = (k2 - 1) / (3 k2) * s^3 + ...  with s = sqrt(M^2 - 1)  (series of the atans).
    double c = (k2 - 1) / (3 * k2);
    double sSmall = Math.cbrt(nu / c);
    // Large M: nu = max - (k + ... ) ; atan(s/k) ~ pi/2 - k/s, atan(s) ~ pi/2 - 1/s -> nu ~ max - (k2 - 1)/s
    double sLarge = (k2 - 1) / Math.max(1e-300, max - nu);
    double s = nu < 0.5 * max ? sSmall : sLarge;
    if (!(s > 0) || !Double.isFinite(s)) {
      s = 1;
    }
    return Math.sqrt(1 + s * s);
  }
}
