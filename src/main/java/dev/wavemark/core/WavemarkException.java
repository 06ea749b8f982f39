package dev.wavemark.core;

import java.util.Locale;

/**
 * The one unchecked exception of wavemark: a {@link Problem} with its arguments. Library code
 * throws it; only the command line turns it into an exit code and a single line of text.
 */
public final class WavemarkException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final Problem problem;

  public WavemarkException(Problem problem, Object... args) {
    super(problem.format(args));
    this.problem = problem;
  }

  public WavemarkException(Throwable cause, Problem problem, Object... args) {
    super(problem.format(args), cause);
    this.problem = problem;
  }

  public Problem problem() {
    return problem;
  }

  /** The problem's stable code. */
  public String code() {
    return problem.code();
  }

  /** Formats a number the way messages show it: up to 4 significant decimals, no locale. */
  public static String num(double v) {
    if (Double.isNaN(v) || Double.isInfinite(v)) {
      return Double.toString(v);
    }
    String s = String.format(Locale.ROOT, "%.4f", v);
    s = s.indexOf('.') >= 0 ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    return s;
  }

  /** Formats an angle given in radians, in degrees for a message. */
  public static String deg(double rad) {
    return num(Math.toDegrees(rad));
  }
}
