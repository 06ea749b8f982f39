package dev.wavemark.inference;

/**
 * One line of an uncertainty budget: an input's standard uncertainty and the part of the Mach
 * number's standard uncertainty it causes, found by linear propagation (central differences).
 * The contributions of a budget add in quadrature to the reported uncertainty.
 *
 * @param source which input
 * @param description what the line covers, for a table (e.g. "angle fit, 4 waves")
 * @param inputUncertainty the input's standard uncertainty, in {@code inputUnit}; for
 *     {@link Source#ANGLE_FIT} the root-mean-square over the waves used, for
 *     {@link Source#SCATTER} the Birge ratio
 * @param inputUnit {@code rad}, {@code 1} (gamma, a ratio), {@code px} or {@code Birge ratio}
 * @param machContribution the standard uncertainty it gives the Mach number, zero or positive
 */
public record BudgetLine(
    Source source, String description, double inputUncertainty, String inputUnit, double machContribution) {

  /** The inputs of the budget. */
  public enum Source {
    /** The fitted direction of each measured line (independent between waves and frames). */
    ANGLE_FIT("angle-fit"),
    /** The freestream direction in the picture, from the calibration (common to every wave). */
    FLOW_DIRECTION("flow-direction"),
    /** The model's deflection angles, from the run's model angle tolerance. */
    MODEL_ANGLE("model-angle"),
    /** The ratio of specific heats. */
    GAMMA("gamma"),
    /**
     * Scatter between the estimates beyond their uncertainties: when the Birge ratio R exceeds
     * 1 the uncertainty is scaled by R (Particle Data Group practice), and this line holds the
     * added part, u sqrt(R^2 - 1). For a run summary: the frame-to-frame scatter.
     */
    SCATTER("scatter"),
    /** A bow shock's measured stand-off (independent between frames), px. */
    STANDOFF("standoff"),
    /** The blunt nose's radius, from the run's stated tolerance (common to every frame), px. */
    NOSE_RADIUS("nose-radius"),
    /** The stand-off correlation's own scatter about the data it was fitted to, relative. */
    CORRELATION("correlation"),
    /**
     * The fan-boundary locator's error common to every expansion-fan boundary of a frame (and
     * taken as common to a run's frames), rad: in the detector benchmark the boundaries of one
     * picture read low together.
     */
    FAN_LOCATOR("fan-locator");

    private final String code;

    Source(String code) {
      this.code = code;
    }

    /** Stable kebab-case code for files. */
    public String code() {
      return code;
    }
  }

  /** The square root of the sum of squares of the contributions. */
  public static double total(Iterable<BudgetLine> lines) {
    double s = 0;
    for (BudgetLine l : lines) {
      s += l.machContribution * l.machContribution;
    }
    return Math.sqrt(s);
  }
}
