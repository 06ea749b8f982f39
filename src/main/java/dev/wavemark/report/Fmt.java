package dev.wavemark.report;

import java.util.Locale;
import org.jspecify.annotations.Nullable;

/** Number formatting for the report: fixed decimals, no locale, a dash for an unknown value. */
final class Fmt {
  static final String UNKNOWN = "\u2013";

  private Fmt() {}

  /** {@code v} with {@code decimals} decimals, or a dash when null or not finite. */
  static String fixed(@Nullable Double v, int decimals) {
    if (v == null || !Double.isFinite(v)) {
      return UNKNOWN;
    }
    return String.format(Locale.ROOT, "%." + decimals + "f", v);
  }

  /** "value ± uncertainty" with the same decimals for both. */
  static String pm(double v, double u, int decimals) {
    if (!Double.isFinite(v)) {
      return UNKNOWN;
    }
    return fixed(v, decimals) + " \u00b1 " + fixed(u, decimals);
  }

  /** A CSV cell: plain decimal with up to 6 decimals, empty when unknown. */
  static String cell(@Nullable Double v) {
    if (v == null || !Double.isFinite(v)) {
      return "";
    }
    String s = String.format(Locale.ROOT, "%.6f", v);
    s = s.replaceAll("0+$", "");
    return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
  }
}
