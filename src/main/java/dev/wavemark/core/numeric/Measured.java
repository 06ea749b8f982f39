package dev.wavemark.core.numeric;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;

/**
 * A value with its standard uncertainty (one standard deviation), in the value's own unit.
 *
 * @param value the best estimate
 * @param uncertainty the standard uncertainty, zero or positive
 */
public record Measured(double value, double uncertainty) {
  public Measured {
    Checks.finite("value", value);
    Checks.finite("uncertainty", uncertainty);
    if (uncertainty < 0) {
      throw new WavemarkException(Problem.OUT_OF_RANGE, "uncertainty", uncertainty, "[0, inf)");
    }
  }

  public static Measured exact(double value) {
    return new Measured(value, 0.0);
  }

  /** Relative standard uncertainty, |u / value|. */
  public double relative() {
    return uncertainty / Math.abs(value);
  }

  /**
   * The inverse-variance weighted mean of independent estimates (Taylor, "An Introduction to Error
   * Analysis", 2nd ed., sec. 7.2). Estimates with zero uncertainty dominate; if several are exact
   * their plain mean is returned.
   */
  public static Measured weightedMean(Iterable<Measured> estimates) {
    double sw = 0;
    double swx = 0;
    int exactCount = 0;
    double exactSum = 0;
    int n = 0;
    for (Measured m : estimates) {
      n++;
      if (m.uncertainty == 0) {
        exactCount++;
        exactSum += m.value;
        continue;
      }
      double w = 1.0 / (m.uncertainty * m.uncertainty);
      sw += w;
      swx += w * m.value;
    }
    if (n == 0) {
      throw new WavemarkException(Problem.NO_SOLUTION, "a weighted mean needs at least one estimate");
    }
    if (exactCount > 0) {
      return exact(exactSum / exactCount);
    }
    return new Measured(swx / sw, Math.sqrt(1.0 / sw));
  }
}
