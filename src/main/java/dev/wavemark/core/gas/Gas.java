package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;

/**
 * A calorically perfect gas, described by its ratio of specific heats.
 *
 * @param gamma ratio of specific heats cp/cv, greater than 1 (1.4 for air at tunnel conditions)
 */
public record Gas(double gamma) {
  /** Air, gamma = 1.4. */
  public static final Gas AIR = new Gas(1.4);

  public Gas {
    check(gamma);
  }

  /** Throws {@link Problem#GAMMA_INVALID} unless 1 &lt; gamma and gamma is finite. */
  public static double check(double gamma) {
    if (!(gamma > 1.0) || !Double.isFinite(gamma)) {
      throw new WavemarkException(Problem.GAMMA_INVALID, WavemarkException.num(gamma));
    }
    return gamma;
  }
}
