package dev.wavemark.inference;

import java.util.Optional;

/**
 * Whether a shock reflects regularly or as a Mach reflection: what theory predicts at the Mach
 * number used, what the picture shows, and the verdict (the contract's {@code reflection}).
 *
 * @param verdict what wavemark reports: the observed kind when a reflection is seen, otherwise
 *     {@link Kind#NONE}; never {@link Kind#DUAL_SOLUTION}
 * @param predicted theory's answer: regular below the von Neumann criterion, Mach beyond the
 *     detachment criterion, dual-solution in between (either may occur); none when the model makes
 *     no reflection
 * @param observed {@link Kind#MACH} when a Mach stem is found, {@link Kind#REGULAR} when a
 *     reflected (or, for crossing shocks, transmitted) shock leaves the impingement point without
 *     a stem, {@link Kind#NONE} when no reflection is in view; never dual-solution
 * @param reason one sentence giving the numbers behind the verdict
 * @param limits the criteria compared, when the model makes a reflection
 */
public record ReflectionVerdict(Kind verdict, Kind predicted, Kind observed, String reason, Optional<Limits> limits) {

  /** The contract's reflection kinds, plus the dual-solution domain for predictions. */
  public enum Kind {
    REGULAR("regular"),
    MACH("mach"),
    /** Between the von Neumann and detachment criteria: both reflections are possible. */
    DUAL_SOLUTION("dual-solution"),
    NONE("none");

    private final String contractName;

    Kind(String contractName) {
      this.contractName = contractName;
    }

    public String contractName() {
      return contractName;
    }
  }

  /**
   * The numbers behind a prediction, angles in radians.
   *
   * @param mach the freestream Mach number used
   * @param machBasis {@code inferred} or {@code nominal}
   * @param deflectionRad the incident shock's flow deflection (the generator angle)
   * @param vonNeumannDeflectionRad the deflection at the von Neumann criterion at that Mach number
   * @param detachmentDeflectionRad the deflection at the detachment criterion at that Mach number
   */
  public record Limits(
      double mach, String machBasis, double deflectionRad, double vonNeumannDeflectionRad, double detachmentDeflectionRad) {}
}
