package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;

/**
 * The normal shock of a perfect gas and the pitot relations a tunnel calibration uses.
 *
 * <p>Source: NACA Report 1135, equations 96 (M2), 93 (p2/p1), 94 (rho2/rho1), 95 (T2/T1),
 * 99 (p02/p01) and 100 (Rayleigh pitot formula p02/p1) (equation numbers from memory).
 */
public final class NormalShock {
  private NormalShock() {}

  /** Downstream Mach number M2. */
  public static double m2(double m1, double gamma) {
    check(m1, gamma);
    double m2sq = ((gamma - 1) * m1 * m1 + 2) / (2 * gamma * m1 * m1 - (gamma - 1));
    return Math.sqrt(m2sq);
  }

  /** Static pressure ratio p2/p1. */
  public static double pressureRatio(double m1, double gamma) {
    check(m1, gamma);
    return (2 * gamma * m1 * m1 - (gamma - 1)) / (gamma + 1);
  }

  /** Density ratio rho2/rho1, equal to the velocity ratio u1/u2. */
  public static double densityRatio(double m1, double gamma) {
    check(m1, gamma);
    return (gamma + 1) * m1 * m1 / ((gamma - 1) * m1 * m1 + 2);
  }

  /** Static temperature ratio T2/T1. */
  public static double temperatureRatio(double m1, double gamma) {
    return pressureRatio(m1, gamma) / densityRatio(m1, gamma);
  }

  /** Total pressure ratio p02/p01 (below 1: the entropy rise is -R ln(p02/p01)). */
  public static double totalPressureRatio(double m1, double gamma) {
    check(m1, gamma);
    double a = Math.pow(densityRatio(m1, gamma), gamma / (gamma - 1));
    double b = Math.pow((gamma + 1) / (2 * gamma * m1 * m1 - (gamma - 1)), 1 / (gamma - 1));
    return a * b;
  }

  /** Entropy rise across the shock divided by the gas constant, (s2 - s1)/R = -ln(p02/p01). */
  public static double entropyRise(double m1, double gamma) {
    return -Math.log(totalPressureRatio(m1, gamma));
  }

  /**
   * Pitot pressure over freestream static pressure, p02/p1. Supersonic: the Rayleigh pitot
   * formula; subsonic (no shock ahead of the probe): the isentropic p0/p.
   */
  public static double pitotOverStatic(double m1, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("Mach number", m1, 0, 1e6);
    if (m1 <= 1) {
      return 1 / Isentropic.pressureRatio(m1, gamma);
    }
    double a = Math.pow(0.5 * (gamma + 1) * m1 * m1, gamma / (gamma - 1));
    double b = Math.pow((gamma + 1) / (2 * gamma * m1 * m1 - (gamma - 1)), 1 / (gamma - 1));
    return a * b;
  }

  /**
   * Freestream Mach number from pitot over static pressure, inverting
   * {@link #pitotOverStatic}: isentropic below the sonic value ((g+1)/2)^(g/(g-1)), Rayleigh
   * above it (monotone, so the root is unique).
   */
  public static double machFromPitotOverStatic(double ratio, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("pitot/static pressure ratio", ratio, 1.0, 1e12);
    double sonic = pitotOverStatic(1.0, gamma);
    if (ratio <= sonic) {
      return Isentropic.machFromPressureRatio(1 / ratio, gamma);
    }
    double hi = 2;
    while (pitotOverStatic(hi, gamma) < ratio) {
      hi *= 2;
    }
    return Roots.solve("Mach from the Rayleigh pitot formula", m -> pitotOverStatic(m, gamma) - ratio, 1.0, hi, 1e-13);
  }

  /**
   * Freestream Mach number from the total-pressure ratio across a normal shock, p02/p01 in (0, 1),
   * i.e. pitot pressure over the settling-chamber total pressure.
   */
  public static double machFromTotalPressureRatio(double ratio, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("p02/p01", ratio, 1e-300, 1.0);
    if (ratio == 1.0) {
      return 1.0;
    }
    double hi = 2;
    while (totalPressureRatio(hi, gamma) > ratio) {
      hi *= 2;
      if (hi > 1e6) {
        throw new WavemarkException(Problem.NO_SOLUTION, "p02/p01 = " + ratio + " needs a Mach number above 1e6");
      }
    }
    return Roots.solve("Mach from p02/p01", m -> totalPressureRatio(m, gamma) - ratio, 1.0, hi, 1e-13);
  }

  private static void check(double m1, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("Mach number", m1, 1.0, Double.MAX_VALUE);
  }
}
