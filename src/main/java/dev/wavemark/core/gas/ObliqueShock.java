package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;

/**
 * The plane oblique shock of a perfect gas: the theta-beta-M relation, its explicit inversions,
 * the detachment and sonic limits, and the state behind the shock.
 *
 * <p>Sources: NACA Report 1135, eq. 138 (theta-beta-M), eqs. 150-151 (the cubic for sin^2 beta
 * and its explicit trigonometric solution, here in the tan-beta form given by Thompson,
 * "Compressible Fluid Dynamics", 1972, sec. 8.3, from memory), eq. 168 (beta at maximum
 * deflection). The state behind is the normal shock of the normal Mach component M sin(beta).
 */
public final class ObliqueShock {
  private ObliqueShock() {}

  /** The state behind an oblique shock. Angles in radians. */
  public record Solution(
      double m1, double betaRad, double thetaRad, double m2,
      double pressureRatio, double densityRatio, double temperatureRatio, double totalPressureRatio) {}

  /** Flow deflection theta(M, beta) in radians, for mu &le; beta &le; pi/2 (NACA 1135 eq. 138). */
  public static double theta(double m, double betaRad, double gamma) {
    Gas.check(gamma);
    Checks.supersonic(m, "an oblique shock");
    double mu = Math.asin(1 / m);
    if (betaRad < mu - 1e-15) {
      throw new WavemarkException(Problem.BELOW_MACH_ANGLE, WavemarkException.deg(betaRad), WavemarkException.deg(mu), WavemarkException.num(m));
    }
    Checks.inClosed("shock angle (rad)", betaRad, 0, 0.5 * Math.PI);
    return thetaUnchecked(m, betaRad, gamma);
  }

  /** NACA 1135 eq. 138 without argument checks, for arguments already validated. */
  static double thetaUnchecked(double m, double betaRad, double gamma) {
    double s = Math.sin(betaRad);
    double c = Math.cos(betaRad);
    double m2 = m * m;
    double num = 2 * (m2 * s * s - 1) * c;
    double den = s * (m2 * (gamma + c * c - s * s) + 2);
    return Math.atan2(Math.max(0, num), den);
  }

  /**
   * d theta / d beta at fixed M, in rad/rad: the derivative of eq. 138 written as
   * theta = atan2(N, D) with N = 2 (M^2 sin^2 beta - 1) cos beta, D = sin beta (M^2 (gamma + cos 2beta) + 2).
   * Zero at the maximum deflection; used for Newton steps and for propagating uncertainty.
   */
  public static double dThetaDBeta(double m, double betaRad, double gamma) {
    double s = Math.sin(betaRad);
    double c = Math.cos(betaRad);
    double m2 = m * m;
    double n = 2 * (m2 * s * s - 1) * c;
    double d = s * (m2 * (gamma + c * c - s * s) + 2);
    double dn = 2 * s * (2 * m2 * c * c - m2 * s * s + 1);
    double dd = c * (m2 * (gamma + c * c - s * s) + 2) - 4 * m2 * s * s * c;
    return (dn * d - n * dd) / (n * n + d * d);
  }

  /**
   * The shock angle beta(M, theta) on the chosen branch, in radians, from the explicit solution
   * of the cubic. theta = 0 gives the Mach angle (weak) or pi/2 (strong).
   *
   * @throws WavemarkException shock-detached when theta exceeds thetaMax(M)
   */
  public static double beta(double m, double thetaRad, ShockBranch branch, double gamma) {
    Gas.check(gamma);
    Checks.supersonic(m, "an oblique shock");
    Checks.inClosed("deflection (rad)", thetaRad, 0, 0.5 * Math.PI);
    if (thetaRad == 0) {
      return branch == ShockBranch.WEAK ? Math.asin(1 / m) : 0.5 * Math.PI;
    }
    double thetaMax = maxDeflection(m, gamma);
    if (thetaRad > thetaMax) {
      throw detached(m, thetaRad, gamma);
    }
    if (thetaRad == thetaMax) {
      return betaAtMaxDeflection(m, gamma);
    }
    double m2 = m * m;
    double t = Math.tan(thetaRad);
    double a = 1 + 0.5 * (gamma - 1) * m2;
    double b = 1 + 0.5 * (gamma + 1) * m2;
    double lambdaSq = (m2 - 1) * (m2 - 1) - 3 * a * b * t * t;
    double lambda = Math.sqrt(Math.max(0, lambdaSq));
    double chi = ((m2 - 1) * (m2 - 1) * (m2 - 1) - 9 * a * (a + 0.25 * (gamma + 1) * m2 * m2) * t * t)
        / (lambda * lambda * lambda);
    chi = Math.max(-1, Math.min(1, chi));
    double delta = branch == ShockBranch.WEAK ? 1 : 0;
    double tanBeta = (m2 - 1 + 2 * lambda * Math.cos((4 * Math.PI * delta + Math.acos(chi)) / 3)) / (3 * a * t);
    return polish(m, thetaRad, Math.atan(tanBeta), branch, gamma);
  }

  /**
   * Newton steps on theta(M, beta) = theta from the explicit root. The explicit weak-branch
   * formula subtracts nearly equal terms at small deflections (relative error ~ eps / theta^2),
   * which the round trip M(beta(M, theta), theta) would show at high Mach numbers; two Newton
   * steps restore full precision. Steps are capped and kept on the branch, because d theta /
   * d beta vanishes at the maximum deflection.
   */
  private static double polish(double m, double theta, double beta, ShockBranch branch, double gamma) {
    double star = Double.NaN;
    for (int i = 0; i < 2; i++) {
      double f = thetaUnchecked(m, beta, gamma) - theta;
      double step = f / dThetaDBeta(m, beta, gamma);
      if (!(Math.abs(step) < 1e-7)) {
        break;
      }
      double next = beta - step;
      if (Math.abs(step) > 1e-12) {
        if (Double.isNaN(star)) {
          star = betaAtMaxDeflection(m, gamma);
        }
        next = branch == ShockBranch.WEAK ? Math.min(next, star) : Math.max(next, star);
      }
      if (next == beta) {
        break;
      }
      beta = next;
    }
    return beta;
  }

  /** The shock angle at the maximum deflection, in radians (NACA 1135 eq. 168). */
  public static double betaAtMaxDeflection(double m, double gamma) {
    Gas.check(gamma);
    Checks.supersonic(m, "an oblique shock");
    double m2 = m * m;
    double root = Math.sqrt((gamma + 1) * ((gamma + 1) * m2 * m2 / 16 + 0.5 * (gamma - 1) * m2 + 1));
    double sin2 = (0.25 * (gamma + 1) * m2 - 1 + root) / (gamma * m2);
    return Math.asin(Math.sqrt(Math.min(1, sin2)));
  }

  /** The largest deflection with an attached plane shock, thetaMax(M), in radians. */
  public static double maxDeflection(double m, double gamma) {
    return theta(m, betaAtMaxDeflection(m, gamma), gamma);
  }

  /** The shock angle (weak branch) at which the flow behind is exactly sonic, in radians. */
  public static double sonicBeta(double m, double gamma) {
    double mu = Math.asin(1 / Checks.supersonic(m, "an oblique shock"));
    double hi = betaAtMaxDeflection(m, gamma);
    return Roots.solve("sonic shock angle", b -> m2(m, b, gamma) - 1, mu + 1e-12, hi, 1e-14);
  }

  /** The deflection at which the flow behind the weak shock is exactly sonic, in radians. */
  public static double sonicDeflection(double m, double gamma) {
    return theta(m, sonicBeta(m, gamma), gamma);
  }

  /**
   * The freestream Mach number for which a shock at angle beta turns the flow by theta: the
   * theta-beta-M relation solved for M^2 in closed form,
   * M^2 = 2 (cot beta + tan theta) / (sin 2beta - tan theta (gamma + cos 2beta)).
   * theta = 0 gives the Mach wave, M = 1/sin(beta).
   *
   * @throws WavemarkException no-solution when beta &le; theta or no Mach number produces that
   *     pair (the wave is too close to the surface for the deflection)
   */
  public static double machFromAngles(double betaRad, double thetaRad, double gamma) {
    Gas.check(gamma);
    Checks.inClosed("shock angle (rad)", betaRad, 0, 0.5 * Math.PI);
    Checks.inClosed("deflection (rad)", thetaRad, 0, 0.5 * Math.PI);
    if (!(betaRad > thetaRad) || betaRad == 0) {
      throw new WavemarkException(
          Problem.NO_SOLUTION,
          "shock angle " + WavemarkException.deg(betaRad) + "° must exceed the deflection "
              + WavemarkException.deg(thetaRad) + "°");
    }
    double t = Math.tan(thetaRad);
    double den = Math.sin(2 * betaRad) - t * (gamma + Math.cos(2 * betaRad));
    double m2 = 2 * (1 / Math.tan(betaRad) + t) / den;
    if (!(den > 0) || !(m2 > 1) || !Double.isFinite(m2)) {
      throw new WavemarkException(
          Problem.NO_SOLUTION,
          "no Mach number gives a shock at " + WavemarkException.deg(betaRad) + "° for a deflection of "
              + WavemarkException.deg(thetaRad) + "° (gamma " + WavemarkException.num(gamma) + ")");
    }
    return Math.sqrt(m2);
  }

  /** Which branch the shock at beta lies on for Mach m (weak up to the maximum-deflection angle). */
  public static ShockBranch branchOf(double m, double betaRad, double gamma) {
    return betaRad <= betaAtMaxDeflection(m, gamma) ? ShockBranch.WEAK : ShockBranch.STRONG;
  }

  /** Mach number behind a shock of angle beta in a stream of Mach m. */
  public static double m2(double m, double betaRad, double gamma) {
    double theta = theta(m, betaRad, gamma);
    double mn1 = Math.max(1, m * Math.sin(betaRad));
    return NormalShock.m2(mn1, gamma) / Math.sin(betaRad - theta);
  }

  /** The full state behind the shock of angle beta. */
  public static Solution fromWaveAngle(double m, double betaRad, double gamma) {
    double theta = theta(m, betaRad, gamma);
    double mn1 = Math.max(1, m * Math.sin(betaRad));
    double m2 = NormalShock.m2(mn1, gamma) / Math.sin(betaRad - theta);
    return new Solution(
        m, betaRad, theta, m2,
        NormalShock.pressureRatio(mn1, gamma), NormalShock.densityRatio(mn1, gamma),
        NormalShock.temperatureRatio(mn1, gamma), NormalShock.totalPressureRatio(mn1, gamma));
  }

  /** The full state behind the shock that turns a Mach-m stream by theta, on the chosen branch. */
  public static Solution fromDeflection(double m, double thetaRad, ShockBranch branch, double gamma) {
    return fromWaveAngle(m, beta(m, thetaRad, branch, gamma), gamma);
  }

  private static WavemarkException detached(double m, double thetaRad, double gamma) {
    return new WavemarkException(
        Problem.SHOCK_DETACHED, WavemarkException.deg(thetaRad),
        WavemarkException.deg(maxDeflection(m, gamma)), WavemarkException.num(m));
  }
}
