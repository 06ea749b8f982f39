package dev.wavemark.core.gas;

import dev.wavemark.core.numeric.Checks;

/**
 * The Mach angle mu = asin(1/M), the angle of a vanishingly weak wave to the flow
 * (NACA Report 1135, symbol list and eq. 3 (from memory); a fact of every gas-dynamics text).
 */
public final class MachAngle {
  private MachAngle() {}

  /** Mach angle in radians for a supersonic Mach number. */
  public static double of(double m) {
    Checks.supersonic(m, "the Mach angle");
    return Math.asin(1.0 / m);
  }

  /** Mach number whose Mach angle is {@code muRad}, for 0 &lt; mu &lt; pi/2 (a Mach wave). */
  public static double machFrom(double muRad) {
    Checks.inOpen("Mach angle (rad)", muRad, 0, Math.PI / 2);
    return 1.0 / Math.sin(muRad);
  }
}
