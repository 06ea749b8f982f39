package dev.wavemark.inference;

/**
 * A warning attached to a frame or a run: a stable code and a one-line message with the numbers.
 *
 * @param code what kind of warning
 * @param message the line shown in reports (the contract's {@code warnings[]} entries)
 */
public record Warning(Code code, String message) {

  /** The kinds of warning; codes are stable kebab-case strings. */
  public enum Code {
    /** Estimates disagree beyond their uncertainties (the consistency test failed). */
    INCONSISTENT_ESTIMATES("inconsistent-estimates"),
    /** Predicted and observed reflection kinds disagree. */
    REFLECTION_DISAGREES("reflection-disagrees"),
    DETACHED_SHOCK("detached-shock"),
    CURVED_WAVE("curved-wave"),
    MISSING_WAVE("missing-wave"),
    UNMATCHED_WAVE("unmatched-wave"),
    /** A matched wave's angle admits no Mach number under its theory. */
    INVERSION_FAILED("inversion-failed"),
    /** A wave used only as a check lies far from theory. */
    LARGE_RESIDUAL("large-residual"),
    NO_MACH_ESTIMATE("no-mach-estimate"),
    /** A tunnel reference could not be formed (e.g. an impossible pressure ratio). */
    TUNNEL_REFERENCE("tunnel-reference"),
    /** Frames of a run disagree beyond their uncertainties. */
    FRAME_SCATTER("frame-scatter");

    private final String code;

    Code(String code) {
      this.code = code;
    }

    public String code() {
      return code;
    }
  }

  static Warning of(Finding f) {
    return new Warning(f.warningCode(), f.message());
  }
}
