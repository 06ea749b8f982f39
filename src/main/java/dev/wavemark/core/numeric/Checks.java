package dev.wavemark.core.numeric;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;

/** Argument checks that name the offending value; used by the records and relations of core. */
public final class Checks {
  private Checks() {}

  /** Returns {@code v} if finite; otherwise throws {@link Problem#NOT_FINITE}. */
  public static double finite(String name, double v) {
    if (!Double.isFinite(v)) {
      throw new WavemarkException(Problem.NOT_FINITE, name, v);
    }
    return v;
  }

  /** Returns {@code v} if it lies in the closed interval [lo, hi]. */
  public static double inClosed(String name, double v, double lo, double hi) {
    finite(name, v);
    if (v < lo || v > hi) {
      throw new WavemarkException(
          Problem.OUT_OF_RANGE, name, WavemarkException.num(v),
          "[" + WavemarkException.num(lo) + ", " + WavemarkException.num(hi) + "]");
    }
    return v;
  }

  /** Returns {@code v} if it lies in the open interval (lo, hi). */
  public static double inOpen(String name, double v, double lo, double hi) {
    finite(name, v);
    if (!(v > lo && v < hi)) {
      throw new WavemarkException(
          Problem.OUT_OF_RANGE, name, WavemarkException.num(v),
          "(" + WavemarkException.num(lo) + ", " + WavemarkException.num(hi) + ")");
    }
    return v;
  }

  /** Returns {@code m} if it is a supersonic Mach number; {@code what} names the relation. */
  public static double supersonic(double m, String what) {
    finite("Mach number", m);
    if (!(m > 1.0)) {
      throw new WavemarkException(Problem.SUBSONIC, WavemarkException.num(m), what);
    }
    return m;
  }

  /** Returns {@code v} if it is positive. */
  public static double positive(String name, double v) {
    finite(name, v);
    if (!(v > 0)) {
      throw new WavemarkException(Problem.OUT_OF_RANGE, name, WavemarkException.num(v), "(0, inf)");
    }
    return v;
  }
}
