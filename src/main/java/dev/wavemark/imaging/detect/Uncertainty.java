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
   * ({@code DetectorBenchmark}) so that about 68% of the errors fall within one reported sigma:
   * 76 % of the shocks with 0.04 px (0.05 px gave 79 %, outside the 68 +/- 10 % band, once a
   * double ramp's second shock stopped clear of the first).
   */
  static final double SYSTEMATIC_PX = 0.04;
  /** Multiplier on the statistical part, also from the benchmark's coverage. */
  static final double STATISTICAL_FACTOR = 1.0;

  static double total(LineFit.Result f) {
    double stat = STATISTICAL_FACTOR * f.sigmaThetaRad();
    double len = Math.max(f.length(), 1);
    double sys = SYSTEMATIC_PX / len;
    return Math.sqrt(stat * stat + sys * sys);
  }

  /**
   * A fan boundary's direction floor, radians: the step located in each profile stands on the
   * fan's level, which changes along the boundary as the fan widens (and in shadowgraph the
   * boundary's thin line fades with the radius), a slow change the residuals do not show. Set from the accuracy benchmark, like the others
   * (with it and {@link #FAN_SYSTEMATIC_PX}, 71 % of the fan heads and 76 % of the tails of the
   * table fall within one sigma).
   */
  static final double FAN_FLOOR_RAD = Math.toRadians(0.03);

  /**
   * A fan boundary's end-to-end systematic offset, px: near the origin the fan's level changes
   * across a boundary within a few pixels (it goes as one over the radius, and the normal crosses
   * rays quickly there), which moves the located step by a fraction of a pixel more at the near
   * end than at the far end; on a short boundary (a generator's shoulder fan ending at the
   * window, 60 to 100 px) that offset dominates. The detector takes the modelled part of it off
   * (the kink's pull in schlieren, half the ray displacement in shadowgraph, see
   * {@link Measure}); what is left (a saturated knife edge near the corner, the model's mismatch)
   * is this, 0.15 px (0.4 px before that correction). Set from the accuracy benchmark.
   */
  static final double FAN_SYSTEMATIC_PX = 0.15;

  static double totalForFan(LineFit.Result f) {
    double t = total(f);
    double sys = FAN_SYSTEMATIC_PX / Math.max(f.length(), 1);
    return Math.sqrt(t * t + FAN_FLOOR_RAD * FAN_FLOOR_RAD + sys * sys);
  }
}
