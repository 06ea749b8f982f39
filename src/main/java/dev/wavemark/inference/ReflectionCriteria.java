package dev.wavemark.inference;

import dev.wavemark.core.gas.NormalShock;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;

/**
 * The two transition criteria of a plane shock reflecting from a wall (two-shock and
 * three-shock theory; Ben-Dor, "Shock Wave Reflection Phenomena", 2nd ed., 2007, sec. 1.5, from
 * memory), as incident-shock deflections at freestream Mach M:
 * the detachment criterion, beyond which no reflected shock can turn the flow behind the incident
 * shock back parallel to the wall; and the von Neumann criterion, where the regular reflection's
 * pressure equals that behind a normal shock (the three-shock solution with a normal stem).
 */
final class ReflectionCriteria {
  private ReflectionCriteria() {}

  /** The largest incident deflection with a regular reflection: theta = thetaMax(M2(theta)). */
  static double detachmentDeflection(double m, double gamma) {
    Checks.supersonic(m, "a shock reflection");
    double hi = ObliqueShock.maxDeflection(m, gamma) * (1 - 1e-12);
    return Roots.solve("detachment criterion of a reflection", t -> reserve(m, t, gamma), 1e-4, hi, 1e-13);
  }

  /**
   * The von Neumann criterion, or the detachment criterion when the regular reflection's pressure
   * stays below the normal-shock pressure all the way to detachment (low Mach numbers: no dual
   * solution domain).
   */
  static double vonNeumannDeflection(double m, double gamma) {
    double d = detachmentDeflection(m, gamma);
    double pn = NormalShock.pressureRatio(m, gamma);
    double atD = rrPressure(m, d, gamma) - pn;
    if (atD <= 0) {
      return d;
    }
    return Roots.solve("von Neumann criterion of a reflection", t -> rrPressure(m, t, gamma) - pn, 1e-4, d, 1e-13);
  }

  /** thetaMax behind the incident shock minus the turn the reflected shock must make. */
  private static double reserve(double m, double theta, double gamma) {
    double m2 = ObliqueShock.fromDeflection(m, theta, ShockBranch.WEAK, gamma).m2();
    return m2 > 1 ? ObliqueShock.maxDeflection(m2, gamma) - theta : -theta;
  }

  /** p3/p1 of the regular reflection (weak reflected shock) at incident deflection theta. */
  private static double rrPressure(double m, double theta, double gamma) {
    ObliqueShock.Solution inc = ObliqueShock.fromDeflection(m, theta, ShockBranch.WEAK, gamma);
    double t = Math.min(theta, ObliqueShock.maxDeflection(inc.m2(), gamma));
    ObliqueShock.Solution ref = ObliqueShock.fromDeflection(inc.m2(), t, ShockBranch.WEAK, gamma);
    return inc.pressureRatio() * ref.pressureRatio();
  }
}
