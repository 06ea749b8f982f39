package dev.wavemark.core.gas;

import dev.wavemark.core.numeric.Checks;

/**
 * Linearised (Ackeret) supersonic thin-airfoil theory, the comparison for shock-expansion theory.
 *
 * <p>Source: Ackeret (1925); as given by Anderson, "Fundamentals of Aerodynamics", sec. 12.3
 * (Cp = 2 theta / sqrt(M^2 - 1), flat-plate cl = 4 alpha / sqrt(M^2 - 1), cd = 4 alpha^2 /
 * sqrt(M^2 - 1)) and Liepmann and Roshko, "Elements of Gasdynamics", sec. 8.4 (thickness drag
 * of a double wedge) (from memory). Valid for small angles; it has no gamma.
 */
public final class Ackeret {
  private Ackeret() {}

  private static double beta(double m) {
    Checks.supersonic(m, "Ackeret's linear theory");
    return Math.sqrt(m * m - 1);
  }

  /** Cp = 2 theta / sqrt(M^2 - 1) for a surface inclined by theta into the flow (negative: away). */
  public static double pressureCoefficient(double compressionRad, double m) {
    Checks.finite("surface inclination (rad)", compressionRad);
    return 2 * compressionRad / beta(m);
  }

  /** Lift coefficient of any uncambered thin profile: 4 alpha / sqrt(M^2 - 1). */
  public static double liftCoefficient(double alphaRad, double m) {
    Checks.finite("angle of attack (rad)", alphaRad);
    return 4 * alphaRad / beta(m);
  }

  /**
   * Wave-drag coefficient of a symmetric double wedge (diamond) of thickness ratio t/c:
   * 4 (alpha^2 + (t/c)^2) / sqrt(M^2 - 1); t/c = 0 is the flat plate.
   */
  public static double diamondDragCoefficient(double alphaRad, double thicknessRatio, double m) {
    Checks.finite("angle of attack (rad)", alphaRad);
    Checks.inClosed("thickness ratio", thicknessRatio, 0, 1);
    return 4 * (alphaRad * alphaRad + thicknessRatio * thicknessRatio) / beta(m);
  }

  /**
   * Pitching-moment coefficient about the leading edge of any uncambered thin profile, nose-up
   * positive: -2 alpha / sqrt(M^2 - 1) (the lift acts at mid-chord).
   */
  public static double leadingEdgeMomentCoefficient(double alphaRad, double m) {
    return -0.5 * liftCoefficient(alphaRad, m);
  }
}
