package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;
import java.util.function.DoubleUnaryOperator;

/**
 * Supersonic flow past a right circular cone at zero incidence with an attached conical shock
 * (Taylor-Maccoll flow): the shock angle from (M, cone half-angle), the largest cone with an
 * attached shock, the inverse (M from a measured shock angle), and the whole field between the
 * shock and the cone as a {@link ConicalField}.
 *
 * <p>Sources: G. I. Taylor and J. W. Maccoll, "The air pressure on a cone moving at high speeds",
 * Proc. Roy. Soc. A 139 (1933) 278-311; the equation as in Anderson, "Modern Compressible Flow",
 * 3rd ed., sec. 10.4, eq. 10.15 (from memory); checked against J. L. Sims, "Tables for supersonic
 * flow around right circular cones at zero angle of attack", NASA SP-3004 (1964) and the cone
 * charts of NACA Report 1135 (Charts 5-7). The integration and the root finding are Hipparchus'
 * (Dormand-Prince 8(5,3) with event detection; bracketing Brent through {@link Roots}).
 *
 * <p>All angles in radians. The weak (attached, usually supersonic-behind) solution is meant
 * throughout. Methods are thread-safe.
 */
public final class ConicalFlow {
  /** Default integration tolerance (absolute and relative, on velocities of order 1). */
  public static final double DEFAULT_TOLERANCE = 1e-9;

  /** The first step from the estimate overshoots by this factor, so that it usually brackets the root. */
  private static final double OVERSHOOT = 1.1;
  /** Pegasus stops at |f| below this times the root tolerance, f being scaled to units of the unknown. */
  private static final double FUNCTION_TOLERANCE = 0.01;

  private final TaylorMaccoll equation;

  private ConicalFlow(double gamma, double tolerance) {
    this.equation = new TaylorMaccoll(gamma, tolerance);
  }

  /** The conical-flow solver for gamma at {@link #DEFAULT_TOLERANCE}. */
  public static ConicalFlow of(double gamma) {
    return new ConicalFlow(gamma, DEFAULT_TOLERANCE);
  }

  /**
   * The solver with an explicit integration tolerance in [1e-14, 1e-3]; the root-finding
   * tolerance follows it.
   */
  public static ConicalFlow of(double gamma, double tolerance) {
    return new ConicalFlow(gamma, tolerance);
  }

  public double gamma() {
    return equation.gamma();
  }

  /** The largest cone half-angle with an attached shock, and the shock angle there. */
  public record Detachment(double mach, double coneRad, double shockRad) {}

  /**
   * The cone half-angle that carries an attached shock of angle {@code shockRad} in a Mach-m
   * stream (the forward, single-integration direction).
   *
   * @throws WavemarkException below-mach-angle for a shock below the Mach angle
   */
  public double coneAngle(double m, double shockRad) {
    checkShock(m, shockRad);
    return equation.coneAngle(m, shockRad);
  }

  /**
   * The attached conical shock angle for Mach m and cone half-angle {@code coneRad}, on the weak
   * branch. A cone of zero angle gives the Mach angle.
   *
   * @throws WavemarkException shock-detached when the cone exceeds {@link #maxConeAngle}
   */
  public double shockAngle(double m, double coneRad) {
    Checks.supersonic(m, "a conical shock");
    Checks.inClosed("cone half-angle (rad)", coneRad, 0, 0.5 * Math.PI);
    double mu = Math.asin(1 / m);
    if (coneRad == 0) {
      return mu;
    }
    double tol = rootTolerance();
    DoubleUnaryOperator f = b -> equation.coneAngle(m, b) - coneRad;
    // A conical shock is weaker than the plane shock of the same deflection (the flow behind it
    // keeps compressing towards the cone), so the wedge's weak shock angle bounds the root from
    // above whenever the wedge shock is attached.
    if (coneRad < ObliqueShock.maxDeflection(m, gamma())) {
      double wedge = ObliqueShock.beta(m, coneRad, ShockBranch.WEAK, gamma());
      // Solved for x = sqrt(sin^2 beta - 1/M^2), in which the cone angle is nearly linear (see
      // estimate()); in beta itself it rises like sqrt(beta - mu) from the Mach angle.
      double invM2 = 1 / (m * m);
      double sw = Math.sin(wedge);
      double x0 = estimate(coneRad);
      double beta0 = Math.asin(Math.min(1, Math.sqrt(x0 * x0 + invM2)));
      double x = solveNear("conical shock angle", xx -> f.applyAsDouble(Math.asin(Math.sqrt(xx * xx + invM2))), x0,
          estimateSlope(coneRad), 0, -coneRad, Math.sqrt(Math.max(0, sw * sw - invM2)),
          searchTolerance() * 0.5 * Math.sin(2 * beta0) / x0);
      if (!Double.isNaN(x)) {
        return Math.asin(Math.sqrt(x * x + invM2));
      }
      if (equation.coneAngle(m, wedge) > coneRad) {
        return Roots.solve("conical shock angle", f, mu, wedge, tol);
      }
    }
    Detachment d = maxConeAngle(m);
    if (coneRad > d.coneRad()) {
      throw new WavemarkException(Problem.SHOCK_DETACHED, WavemarkException.deg(coneRad),
          WavemarkException.deg(d.coneRad()), WavemarkException.num(m) + " (cone)");
    }
    return Roots.solve("conical shock angle", f, mu, d.shockRad(), tol);
  }

  /**
   * The largest cone half-angle with an attached shock at Mach m, found where d(cone angle) /
   * d(shock angle) = 0: a coarse scan of shock angles locates the maximum, then Brent finds the
   * zero of the central-difference slope.
   */
  public Detachment maxConeAngle(double m) {
    Checks.supersonic(m, "a conical shock");
    double mu = Math.asin(1 / m);
    int n = 24;
    double span = 0.5 * Math.PI - mu;
    int best = 1;
    double bestCone = -1;
    for (int i = 1; i < n; i++) {
      double c = equation.coneAngle(m, mu + span * i / n);
      if (c > bestCone) {
        bestCone = c;
        best = i;
      }
    }
    double lo = mu + span * (best - 1) / n;
    double hi = mu + span * (best + 1) / n;
    double h = Math.cbrt(equation.tolerance()) * 0.1;
    lo = Math.max(lo, mu + 2 * h);
    hi = Math.min(hi, 0.5 * Math.PI - 2 * h);
    double hh = h;
    double beta = Roots.solve("maximum cone angle",
        b -> equation.coneAngle(m, b + hh) - equation.coneAngle(m, b - hh), lo, hi, rootTolerance());
    return new Detachment(m, equation.coneAngle(m, beta), beta);
  }

  /**
   * The freestream Mach number for which a cone of half-angle {@code coneRad} carries a shock at
   * {@code shockRad}: the inversion applied to a measured conical shock angle. The wedge Mach
   * number for the same angles bounds it from above (a cone needs a lower Mach number than a
   * wedge of the same angle to hold the same shock angle).
   *
   * @throws WavemarkException no-solution when no Mach number gives that pair
   */
  public double machFromShockAngle(double shockRad, double coneRad) {
    Checks.inOpen("shock angle (rad)", shockRad, 0, 0.5 * Math.PI);
    Checks.inOpen("cone half-angle (rad)", coneRad, 0, 0.5 * Math.PI);
    if (!(shockRad > coneRad)) {
      throw new WavemarkException(Problem.NO_SOLUTION, "conical shock angle " + WavemarkException.deg(shockRad)
          + "° must exceed the cone half-angle " + WavemarkException.deg(coneRad) + "°");
    }
    double lo = 1 / Math.sin(shockRad);
    double tolerance = rootTolerance();
    // Solved for x = sqrt(sin^2 beta - 1/M^2), in which the cone angle is nearly linear (see
    // estimate()); x up to sin(beta) covers every Mach number up to 1e4.
    double sb2 = Math.sin(shockRad) * Math.sin(shockRad);
    double xHi = Math.sqrt(sb2 - 1e-8);
    double x0 = Math.min(estimate(coneRad), 0.999 * xHi);
    double m0 = 1 / Math.sqrt(sb2 - x0 * x0);
    double x = solveNear("Mach number from the conical shock angle",
        xx -> coneAt(1 / Math.sqrt(sb2 - xx * xx), shockRad) - coneRad, x0, estimateSlope(coneRad), 0, -coneRad, xHi,
        (1e-12 * m0 + searchTolerance()) / (x0 * m0 * m0 * m0));
    if (!Double.isNaN(x)) {
      return 1 / Math.sqrt(sb2 - x * x);
    }
    double hi;
    try {
      hi = ObliqueShock.machFromAngles(shockRad, coneRad, gamma());
    } catch (WavemarkException e) {
      hi = 2 * lo;
    }
    while (coneAt(hi, shockRad) <= coneRad) {
      hi *= 2;
      if (hi > 1e4) {
        throw new WavemarkException(Problem.NO_SOLUTION, "no Mach number up to 1e4 gives a conical shock at "
            + WavemarkException.deg(shockRad) + "° on a cone of " + WavemarkException.deg(coneRad) + "°");
      }
    }
    double loM = lo;
    return Roots.solve("Mach number from the conical shock angle",
        mm -> mm <= loM ? -coneRad : equation.coneAngle(mm, shockRad) - coneRad, lo, hi, 1e-12 * hi + tolerance);
  }

  /**
   * A closed-form first guess used only to start the root searches: x = sqrt(sin^2 beta - 1/M^2)
   * = sqrt((gamma+1)/2) sin theta_c, the hypersonic small-disturbance result for cones,
   * sigma/theta_c = sqrt((gamma+1)/2 + 1/K^2) with K = M theta_c (Rasmussen, AIAA J. 5, 1967,
   * from memory), written with sines so that it tends to the Mach angle for thin cones. Measured
   * against the full solution at gamma = 1.4, M 1.05-20, cones 0.6-45 deg: beta within 1.4 deg.
   */
  private double estimate(double coneRad) {
    return Math.sqrt(0.5 * (gamma() + 1)) * Math.sin(coneRad);
  }

  /** dx/d(theta_c) of {@link #estimate}. */
  private double estimateSlope(double coneRad) {
    return Math.sqrt(0.5 * (gamma() + 1)) * Math.max(Math.cos(coneRad), 0.05);
  }

  /**
   * The root of an increasing f on (lo, hi) started from an estimate x0 with dx/df &asymp; slope,
   * where f(lo) = {@code fLo} &lt; 0 is known without evaluation: a Newton-like step with that
   * slope, then secant steps, until two points bracket the root (usually the first two); then
   * Hipparchus' Pegasus solver through {@link Roots#refine} on f scaled by the secant slope, so
   * that its function tolerance is in units of x. Points stay inside (lo, hi), moving at most
   * halfway to a bound per step; a step that would pass lo brackets with lo itself. Returns NaN
   * when no bracket turns up within a few steps or an evaluation fails, for the caller's slower,
   * surer search.
   *
   * @param tol root tolerance in x; the search stops once |f| / slope is below
   *     {@link #FUNCTION_TOLERANCE} times it
   */
  private static double solveNear(String what, DoubleUnaryOperator f, double x0, double slope, double lo, double fLo,
      double hi, double tol) {
    try {
      double x = Math.max(x0, lo + 1e-3 * (hi - lo));
      double fx = f.applyAsDouble(x);
      double k = slope;
      for (int step = 0; step < 6; step++) {
        if (fx == 0) {
          return x;
        }
        double newton = x - OVERSHOOT * fx * k;
        if (newton <= lo && fx > 0) {
          return refine(what, f, lo, fLo, x, fx, (x - lo) / (fx - fLo), tol);
        }
        double next = Math.min(Math.max(newton, x - 0.5 * (x - lo)), x + 0.5 * (hi - x));
        double fn = f.applyAsDouble(next);
        if (fn == 0) {
          return next;
        }
        if (Math.signum(fn) != Math.signum(fx)) {
          return refine(what, f, x, fx, next, fn, (next - x) / (fn - fx), tol);
        }
        double secant = (next - x) / (fn - fx);
        if (!(secant > 0 && Double.isFinite(secant))) {
          return Double.NaN;
        }
        k = secant;
        x = next;
        fx = fn;
      }
      return Double.NaN;
    } catch (WavemarkException e) {
      return Double.NaN;
    }
  }

  private static double refine(String what, DoubleUnaryOperator f, double a, double fa, double b, double fb,
      double secant, double tol) {
    double scale = Math.abs(secant);
    return Roots.refine(what, v -> scale * f.applyAsDouble(v), a, scale * fa, b, scale * fb, tol,
        FUNCTION_TOLERANCE * tol, Roots.DEFAULT_BUDGET);
  }

  /** The flow field for Mach m and cone half-angle {@code coneRad}. */
  public ConicalField solve(double m, double coneRad) {
    if (!(coneRad > 0)) {
      throw new WavemarkException(Problem.OUT_OF_RANGE, "cone half-angle (deg)", WavemarkException.deg(coneRad), "(0, 90)");
    }
    return ConicalField.integrate(equation, m, shockAngle(m, coneRad));
  }

  /** The flow field behind a conical shock of angle {@code shockRad} in a Mach-m stream. */
  public ConicalField fromShockAngle(double m, double shockRad) {
    checkShock(m, shockRad);
    return ConicalField.integrate(equation, m, shockRad);
  }

  private double coneAt(double m, double shockRad) {
    return m * Math.sin(shockRad) <= 1 ? 0 : equation.coneAngle(m, shockRad);
  }

  private double rootTolerance() {
    return Math.max(1e-14, equation.tolerance());
  }

  /**
   * The tolerance of the near-estimate searches: the root tolerance, but never looser than 1e-9,
   * so that at loose integration tolerances the answer still carries the integration's error
   * alone and not a root-finding error of similar size on top (which made the error jump
   * between tolerances, measured at M = 5 on a 30 deg cone).
   */
  private double searchTolerance() {
    return Math.min(rootTolerance(), 1e-9);
  }

  private void checkShock(double m, double shockRad) {
    Checks.supersonic(m, "a conical shock");
    Checks.inOpen("shock angle (rad)", shockRad, 0, 0.5 * Math.PI);
    double mu = Math.asin(1 / m);
    if (shockRad < mu) {
      throw new WavemarkException(Problem.BELOW_MACH_ANGLE, WavemarkException.deg(shockRad),
          WavemarkException.deg(mu), WavemarkException.num(m));
    }
  }
}
