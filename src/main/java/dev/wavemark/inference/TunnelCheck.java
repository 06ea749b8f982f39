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

  /**
   * Coverage factor of the expanded uncertainty used as the guard band (about 95 % coverage for
   * a normal distribution; common practice).
   */
  public static final double COVERAGE_FACTOR = 2;

  public TunnelCheck {
    comparisons = List.copyOf(comparisons);
    notes = List.copyOf(notes);
  }

  /** True when every comparison that has a tolerance passes (and there is at least one). */
  public boolean passes() {
    return verdict() == Outcome.PASS;
  }

  /**
   * The check as a whole: fail when any reference fails, else inconclusive when any is, else
   * pass when any passes; no-tolerance when no reference has a tolerance.
   */
  public Outcome verdict() {
    boolean pass = false;
    boolean open = false;
    for (Comparison c : comparisons) {
      if (c.outcome == Outcome.FAIL) {
        return Outcome.FAIL;
      }
      open |= c.outcome == Outcome.INCONCLUSIVE;
      pass |= c.outcome == Outcome.PASS;
    }
    return open ? Outcome.INCONCLUSIVE : pass ? Outcome.PASS : Outcome.NO_TOLERANCE;
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

  /**
   * Against the tunnel's Mach tolerance T, with the measurement's expanded uncertainty U = k u
   * (k = {@value #COVERAGE_FACTOR}) as the guard band, the decision rule of ISO
   * 14253-1 (from memory): pass when |difference| + U &le; T (conformance shown), fail when
   * |difference| - U &gt; T (nonconformance shown), and inconclusive in between, where the
   * pictures cannot tell; or no tolerance given.
   */
  public enum Outcome {
    PASS("pass"),
    FAIL("fail"),
    INCONCLUSIVE("inconclusive"),
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
   * @param outcome see {@link Outcome}
   */
  public record Comparison(
      Reference reference, Measured referenceMach, double difference, double differenceInSigma,
      Optional<Double> tolerance, Outcome outcome) {}
}
