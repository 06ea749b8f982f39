package dev.wavemark.core.gas;

import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;

/**
 * Isentropic flow of a perfect gas: static-to-total ratios and the area ratio.
 *
 * <p>Source: NACA Report 1135, "Equations, Tables, and Charts for Compressible Flow" (Ames
 * Research Staff, 1953), equations 44, 45, 43 and 80.
 */
public final class Isentropic {
  private Isentropic() {}

  /** p/p0 at Mach {@code m} (NACA 1135 eq. 44). Valid for m &ge; 0. */
  public static double pressureRatio(double m, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("Mach number", m, 0, Double.MAX_VALUE);
    return Math.pow(temperatureRatio(m, gamma), gamma / (gamma - 1));
  }

  /** T/T0 at Mach {@code m} (NACA 1135 eq. 43). */
  public static double temperatureRatio(double m, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("Mach number", m, 0, Double.MAX_VALUE);
    return 1.0 / (1.0 + 0.5 * (gamma - 1) * m * m);
  }

  /** rho/rho0 at Mach {@code m} (NACA 1135 eq. 45). */
  public static double densityRatio(double m, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("Mach number", m, 0, Double.MAX_VALUE);
    return Math.pow(temperatureRatio(m, gamma), 1.0 / (gamma - 1));
  }

  /** A/A* at Mach {@code m} (NACA 1135 eq. 80). Valid for m &gt; 0. */
  public static double areaRatio(double m, double gamma) {
    Gas.check(gamma);
    Checks.positive("Mach number", m);
    double e = (gamma + 1) / (2 * (gamma - 1));
    return Math.pow((2.0 / (gamma + 1)) * (1 + 0.5 * (gamma - 1) * m * m), e) / m;
  }

  /**
   * Mach number from p/p0, the inverse of {@link #pressureRatio} (closed form).
   *
   * @throws dev.wavemark.core.WavemarkException out-of-range unless 0 &lt; ratio &le; 1
   */
  public static double machFromPressureRatio(double ratio, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("p/p0", ratio, Double.MIN_NORMAL, 1.0);
    double t = Math.pow(ratio, -(gamma - 1) / gamma);
    return Math.sqrt(Math.max(0, 2.0 / (gamma - 1) * (t - 1)));
  }

  /**
   * Mach number from A/A* on the chosen branch, by a bracketed root search.
   *
   * @param supersonic true for the supersonic branch, false for the subsonic one
   * @throws dev.wavemark.core.WavemarkException out-of-range unless ratio &ge; 1
   */
  public static double machFromAreaRatio(double ratio, double gamma, boolean supersonic) {
    Gas.check(gamma);
    Checks.inClosed("A/A*", ratio, 1.0, 1e12);
    if (ratio == 1.0) {
      return 1.0;
    }
    if (!supersonic) {
      return Roots.solve("subsonic Mach from A/A*", m -> areaRatio(m, gamma) - ratio, 1e-12, 1.0, 1e-13);
    }
    double hi = 2;
    while (areaRatio(hi, gamma) < ratio) {
      hi *= 2;
    }
    return Roots.solve("supersonic Mach from A/A*", m -> areaRatio(m, gamma) - ratio, 1.0, hi, 1e-13);
  }
}
