package dev.wavemark.inference;

import dev.wavemark.core.numeric.Measured;
import java.util.List;
import java.util.Optional;

/**
 * The inferred Mach number held against what the facility says: its nominal Mach number and the
 * Mach numbers its pitot readings imply.
 *
 * @param inferred the Mach number from the pictures (a frame's or the run's)
 * @param comparisons one per reference available, in the order nominal, pitot/static, pitot/total, static/total
 * @param notes why a reference could not be formed (e.g. a pitot pressure above the total pressure)
 */
public record TunnelCheck(Measured inferred, List<Comparison> comparisons, List<String> notes) {

  public TunnelCheck {
    comparisons = List.copyOf(comparisons);
    notes = List.copyOf(notes);
  }

  /** True when every comparison that has a tolerance passes (and there is at least one). */
  public boolean passes() {
    boolean any = false;
    for (Comparison c : comparisons) {
      if (c.outcome == Outcome.FAIL) {
        return false;
      }
      any |= c.outcome == Outcome.PASS;
    }
    return any;
  }

  /** Where a reference Mach number comes from. */
  public enum Reference {
    /** The facility's nominal (calibrated) Mach number. */
    NOMINAL("nominal"),
    /** Pitot over freestream static pressure, p02/p1, by the Rayleigh pitot formula (NACA 1135 eq. 100). */
    PITOT_STATIC("pitot/static"),
    /** Pitot over settling-chamber total pressure, p02/p01, the normal-shock total-pressure ratio (NACA 1135 eq. 99). */
    PITOT_TOTAL("pitot/total"),
    /** Freestream static over total pressure, p1/p01, isentropic (NACA 1135 eq. 44). */
    STATIC_TOTAL("static/total");

    private final String code;

    Reference(String code) {
      this.code = code;
    }

    public String code() {
      return code;
    }
  }

  /** Pass or fail against the tunnel's Mach tolerance, or no tolerance given. */
  public enum Outcome {
    PASS("pass"),
    FAIL("fail"),
    NO_TOLERANCE("no-tolerance");

    private final String code;

    Outcome(String code) {
      this.code = code;
    }

    public String code() {
      return code;
    }
  }

  /**
   * One reference against the inferred Mach number.
   *
   * @param reference where the reference comes from
   * @param referenceMach its Mach number (uncertainty zero: the run file gives none for the facility's figures)
   * @param difference inferred minus reference
   * @param differenceInSigma the difference over the combined standard uncertainty; infinite
   *     when both are exact and differ
   * @param tolerance the tunnel's {@code machTolerance}, when given
   * @param outcome pass when |difference| &le; tolerance
   */
  public record Comparison(
      Reference reference, Measured referenceMach, double difference, double differenceInSigma,
      Optional<Double> tolerance, Outcome outcome) {}
}
