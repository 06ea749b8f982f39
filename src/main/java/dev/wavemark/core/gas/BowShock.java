package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;

/**
 * The detached bow shock ahead of a blunt nose, from Billig's empirical correlation, a fit to
 * measurements in air, not a solution of the flow equations.
 *
 * <p>Source: F. S. Billig, "Shock-wave shapes around spherical- and cylindrical-nosed bodies",
 * J. Spacecraft and Rockets 4 (6), 1967, pp. 822-823 (coefficients from memory):
 * <pre>
 *   sphere:   delta/R = 0.143 exp(3.24 / M^2),  Rc/R = 1.143 exp(0.54 / (M - 1)^1.2)
 *   cylinder: delta/R = 0.386 exp(4.67 / M^2),  Rc/R = 1.386 exp(1.8  / (M - 1)^0.75)
 *   shape:    x = R + delta - Rc cot^2(mu) (sqrt(1 + y^2 tan^2(mu) / Rc^2) - 1)
 * </pre>
 * with R the nose radius, delta the stand-off distance on the axis, Rc the shock's radius of
 * curvature at its vertex, mu the freestream Mach angle, x measured upstream from the nose's
 * centre of curvature along the axis and y across it. The fit was made for air; this class
 * accepts gamma within {@link #GAMMA_RANGE} of 1.4 and Mach numbers in [{@link #MACH_MIN},
 * {@link #MACH_MAX}] (the range of the data behind the fit, from memory), and throws
 * {@link Problem#OUTSIDE_CORRELATION} outside them.
 */
public final class BowShock {
  /** Lowest Mach number the correlation is used for. */
  public static final double MACH_MIN = 1.2;
  /** Highest Mach number the correlation is used for. */
  public static final double MACH_MAX = 20.0;
  /** Largest accepted |gamma - 1.4|: the fit is for air only. */
  public static final double GAMMA_RANGE = 0.02;

  /**
   * The correlation's relative scatter in delta/R about the measurements it was fitted to, as a
   * standard uncertainty. Not a published figure: Billig's paper shows the fit against data in
   * plots and (as far as recalled) states no single scatter figure; 5 % is our assumption, a
   * round value to be replaced by a published one. A Mach number from a stand-off carries it as
   * a line of its budget.
   */
  public static final double STANDOFF_SCATTER = 0.05;

  private static final String NAME = "Billig's bow-shock correlation";

  private BowShock() {}

  /** The blunt nose: a sphere (axisymmetric) or a circular cylinder across the flow (planar). */
  public enum Nose {
    SPHERE(0.143, 3.24, 1.143, 0.54, 1.2),
    CYLINDER(0.386, 4.67, 1.386, 1.8, 0.75);

    private final double a;
    private final double b;
    private final double c;
    private final double d;
    private final double e;

    Nose(double a, double b, double c, double d, double e) {
      this.a = a;
      this.b = b;
      this.c = c;
      this.d = d;
      this.e = e;
    }
  }

  /** Stand-off distance over nose radius, delta/R, on the axis. */
  public static double standoffRatio(Nose nose, double m, double gamma) {
    check(m, gamma);
    return nose.a * Math.exp(nose.b / (m * m));
  }

  /** Radius of curvature of the shock at its vertex over nose radius, Rc/R. */
  public static double vertexRadiusRatio(Nose nose, double m, double gamma) {
    check(m, gamma);
    return nose.c * Math.exp(nose.d / Math.pow(m - 1, nose.e));
  }

  /**
   * The shock's axial position x/R (upstream of the nose's centre of curvature) at lateral
   * distance {@code yOverR} from the axis; far from the axis the shock tends to the Mach angle.
   */
  public static double shockX(Nose nose, double m, double gamma, double yOverR) {
    Checks.finite("y/R", yOverR);
    double delta = standoffRatio(nose, m, gamma);
    double rc = vertexRadiusRatio(nose, m, gamma);
    double tanMu2 = 1 / (m * m - 1);
    return 1 + delta - rc / tanMu2 * (Math.sqrt(1 + yOverR * yOverR * tanMu2 / (rc * rc)) - 1);
  }

  /**
   * The Mach number from a measured stand-off ratio delta/R, inverting {@link #standoffRatio} in
   * closed form: M = sqrt(b / ln(delta / (a R))).
   *
   * @throws WavemarkException outside-correlation when the ratio lies outside the values the
   *     correlation takes over its Mach range
   */
  public static double machFromStandoff(Nose nose, double ratio, double gamma) {
    checkGamma(gamma);
    Checks.finite("stand-off ratio", ratio);
    double lo = nose.a * Math.exp(nose.b / (MACH_MAX * MACH_MAX));
    double hi = nose.a * Math.exp(nose.b / (MACH_MIN * MACH_MIN));
    if (!(ratio >= lo && ratio <= hi)) {
      throw new WavemarkException(Problem.OUTSIDE_CORRELATION, "stand-off ratio delta/R (" + name(nose) + ")",
          WavemarkException.num(ratio), "[" + WavemarkException.num(lo) + ", " + WavemarkException.num(hi) + "]", NAME);
    }
    return Math.min(MACH_MAX, Math.max(MACH_MIN, Math.sqrt(nose.b / Math.log(ratio / nose.a))));
  }

  private static String name(Nose nose) {
    return nose == Nose.SPHERE ? "sphere" : "cylinder";
  }

  private static void check(double m, double gamma) {
    checkGamma(gamma);
    Checks.finite("Mach number", m);
    if (!(m >= MACH_MIN && m <= MACH_MAX)) {
      throw new WavemarkException(Problem.OUTSIDE_CORRELATION, "Mach number", WavemarkException.num(m),
          "[" + WavemarkException.num(MACH_MIN) + ", " + WavemarkException.num(MACH_MAX) + "]", NAME);
    }
  }

  private static void checkGamma(double gamma) {
    Gas.check(gamma);
    if (Math.abs(gamma - 1.4) > GAMMA_RANGE) {
      throw new WavemarkException(Problem.OUTSIDE_CORRELATION, "gamma", WavemarkException.num(gamma),
          "[1.38, 1.42] (air)", NAME);
    }
  }
}
