package dev.wavemark.inference;

import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.numeric.Measured;
import java.util.List;
import java.util.Optional;

/**
 * One estimate of the freestream Mach number from one wave (or one family of waves), by one
 * theory.
 *
 * @param from a short stable label, e.g. {@code oblique-shock upper leading-edge}; the contract's
 *     {@code mach.estimates[].from}
 * @param method the theory inverted
 * @param kind the kind of the wave(s) used
 * @param side the side of the wave, when it has one (a Mach-wave family spans both)
 * @param observedIndices indices into the frame's observed-wave list of the waves used
 * @param mach the estimate and its standard uncertainty (all of its inputs propagated linearly)
 * @param weight its weight in the frame's combined Mach number (the weights sum to 1)
 */
public record MachEstimate(
    String from, Method method, WaveKind kind, Optional<Side> side, List<Integer> observedIndices,
    Measured mach, double weight) {

  public MachEstimate {
    observedIndices = List.copyOf(observedIndices);
  }

  /** The theory an estimate inverts. */
  public enum Method {
    /** Plane oblique shock, weak branch, theta-beta-M (NACA Report 1135 eq. 138). */
    THETA_BETA_M("theta-beta-M"),
    /** Conical shock on a cone, Taylor-Maccoll flow. */
    TAYLOR_MACCOLL("Taylor-Maccoll"),
    /** A vanishingly weak wave at the Mach angle, mu = asin(1/M). */
    MACH_ANGLE("Mach angle"),
    /** Centred expansion: tail Mach angle and the Prandtl-Meyer function with the known turn. */
    PRANDTL_MEYER("Prandtl-Meyer"),
    /** Shock-expansion theory: waves behind a first shock or expansion (diamond, wedge shoulders). */
    SHOCK_EXPANSION("shock-expansion"),
    /** Two-shock theory of a regular reflection at a wall. */
    SHOCK_REFLECTION("shock reflection"),
    /** Shock-shock intersection theory (crossing shocks, merged and transmitted shocks). */
    SHOCK_INTERSECTION("shock intersection"),
    /** A bow shock's stand-off ahead of a blunt nose, Billig's empirical correlation (core.gas.BowShock). */
    BOW_SHOCK_STANDOFF("Billig stand-off");

    private final String label;

    Method(String label) {
      this.label = label;
    }

    /** A human label for tables. */
    public String label() {
      return label;
    }
  }
}
