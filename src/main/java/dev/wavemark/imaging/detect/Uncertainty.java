package dev.wavemark.imaging.detect;

/**
 * The reported standard uncertainty of a fitted direction: the statistical part from the fit
 * (residual spread over point spread, inflated for correlated neighbours) combined with a
 * systematic floor for what the residuals cannot show (a sub-pixel bias of the centre locator
 * that changes along the wave, e.g. with the changing background), expressed as an offset
 * between the two ends of the fitted segment.
 */
final class Uncertainty {
  private Uncertainty() {}

  /**
   * End-to-end systematic offset, px. Set from the accuracy benchmark
   * ({@code WaveBenchmark}) so that about 68% of the errors fall within one reported sigma.
   */
  static final double SYSTEMATIC_PX = 0.05;
  /** Multiplier on the statistical part, also from the benchmark's coverage. */
  static final double STATISTICAL_FACTOR = 1.0;

  static double total(LineFit.Result f) {
    double stat = STATISTICAL_FACTOR * f.sigmaThetaRad();
    double len = Math.max(f.length(), 1);
    double sys = SYSTEMATIC_PX / len;
    return Math.sqrt(stat * stat + sys * sys);
  }

  /**
   * A fan boundary's direction floor, radians: the edge of a wide band is located where the
   * band's level crosses half its height, and that level changes along the boundary as the fan
   * widens, which the residuals do not show. Set from the accuracy benchmark, like the others
   * (fan heads and tails were 23 % and 39 % within one sigma without it).
   */
  static final double FAN_FLOOR_RAD = Math.toRadians(0.06);

  static double totalForFan(LineFit.Result f) {
    double t = total(f);
    return Math.sqrt(t * t + FAN_FLOOR_RAD * FAN_FLOOR_RAD);
  }
}
