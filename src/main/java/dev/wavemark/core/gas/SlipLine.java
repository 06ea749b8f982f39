package dev.wavemark.core.gas;

import dev.wavemark.core.numeric.Checks;

/**
 * A slip line (contact discontinuity) between two uniform streams that share static pressure
 * and flow direction but differ in entropy, temperature, density and speed. Every ratio is taken
 * to one reference stream (the freestream of the problem that made the slip line); both streams
 * have the same total temperature (adiabatic flow), so T/T1 = (T/T0)(M) / (T/T0)(M1).
 *
 * <p>Source: the slip-line conditions p and flow direction continuous across a contact surface,
 * Anderson, "Modern Compressible Flow", 3rd ed., sec. 4.12-4.13 (from memory).
 *
 * @param directionRad the common flow direction, radians, counter-clockwise from the reference
 *     freestream direction
 * @param pressureRatio the common static pressure over the reference static pressure
 * @param above the stream on the counter-clockwise (upper) side of the line
 * @param below the stream on the clockwise (lower) side
 */
public record SlipLine(double directionRad, double pressureRatio, Side above, Side below) {
  public SlipLine {
    Checks.finite("slip-line direction (rad)", directionRad);
    Checks.positive("slip-line pressure ratio", pressureRatio);
  }

  /**
   * One side of a slip line, relative to the reference stream (subscript 1).
   *
   * @param mach Mach number
   * @param pressureRatio p/p1, computed along this side's own waves
   * @param directionRad flow direction, computed along this side's own waves (rad)
   * @param entropyRise (s - s1)/R, the sum of -ln(p0 ratio) over the waves crossed
   * @param temperatureRatio T/T1
   * @param densityRatio rho/rho1
   * @param velocityRatio V/V1
   */
  public record Side(
      double mach, double pressureRatio, double directionRad, double entropyRise,
      double temperatureRatio, double densityRatio, double velocityRatio) {
    public Side {
      Checks.positive("Mach number", mach);
      Checks.positive("pressure ratio", pressureRatio);
      Checks.finite("flow direction (rad)", directionRad);
      Checks.finite("entropy rise", entropyRise);
      Checks.positive("temperature ratio", temperatureRatio);
      Checks.positive("density ratio", densityRatio);
      Checks.positive("velocity ratio", velocityRatio);
    }

    /** Builds a side from its Mach number, pressure and entropy, with the reference Mach m1. */
    static Side of(
        double mach, double pressureRatio, double directionRad, double entropyRise, double m1, double gamma) {
      double t = Isentropic.temperatureRatio(mach, gamma) / Isentropic.temperatureRatio(m1, gamma);
      return new Side(mach, pressureRatio, directionRad, entropyRise, t, pressureRatio / t, mach / m1 * Math.sqrt(t));
    }
  }

  /** p_above/p1 - p_below/p1: zero to the solver's tolerance (a check, not a result). */
  public double pressureMismatch() {
    return above.pressureRatio() - below.pressureRatio();
  }

  /** The difference of the two sides' flow directions (rad): zero to rounding (a check). */
  public double directionMismatch() {
    return above.directionRad() - below.directionRad();
  }

  /** (s_above - s_below)/R. */
  public double entropyJump() {
    return above.entropyRise() - below.entropyRise();
  }

  /** (T_above - T_below)/T1. */
  public double temperatureJump() {
    return above.temperatureRatio() - below.temperatureRatio();
  }

  /** (rho_above - rho_below)/rho1. */
  public double densityJump() {
    return above.densityRatio() - below.densityRatio();
  }

  /** (V_above - V_below)/V1. */
  public double velocityJump() {
    return above.velocityRatio() - below.velocityRatio();
  }
}
