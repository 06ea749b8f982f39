package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;
import java.util.function.DoubleUnaryOperator;
import org.jspecify.annotations.Nullable;

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
 * charts of NACA Report 1135 (Charts 5-7). The integration is Hipparchus' Dormand-Prince 8(5,3).
 * The shock angle and the inverse are found by Newton's method on the distance of the cone
 * surface from the given cone ray, with the exact slope from the variational equations
 * integrated alongside (see {@link TaylorMaccoll#mismatch}); where Newton cannot go on (near
 * detachment) a bracketing Brent search through {@link Roots} on the surface found by event
 * detection takes over.
 *
 * <p>All angles in radians. The weak (attached, usually supersonic-behind) solution is meant
 * throughout. Methods are thread-safe.
 */
public final class ConicalFlow {
  /** Default integration tolerance (absolute and relative, on velocities of order 1). */
  public static final double DEFAULT_TOLERANCE = 1e-9;

  /** The integration tolerance of the first Newton step, taken from the rough closed-form estimate. */
  private static final double LOOSE_TOLERANCE = 1e-6;
  /** Newton steps (in x, see {@link #estimate}) longer than this are taken from loose integrations. */
  private static final double LOOSE_STEP = 1e-3;

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
      double x = newton((xx, loose) -> {
        double sb = Math.sqrt(xx * xx + invM2);
        double beta = Math.asin(sb);
        double[] r = equation.mismatch(m, beta, coneRad, TaylorMaccoll.Parameter.SHOCK_ANGLE, tolerance(loose));
        // d beta / dx = x / (sin beta cos beta)
        return r == null ? null : new double[] {r[0], r[1] * xx / (sb * Math.cos(beta))};
      }, x0, 0, Math.sqrt(Math.max(0, sw * sw - invM2)), searchTolerance() * 0.5 * Math.sin(2 * beta0) / x0);
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
    double x = newton((xx, loose) -> {
        double mm = 1 / Math.sqrt(sb2 - xx * xx);
        if (mm * Math.sin(shockRad) <= 1) {
          return null;
        }
        double[] r = equation.mismatch(mm, shockRad, coneRad, TaylorMaccoll.Parameter.MACH, tolerance(loose));
        // dM / dx = x M^3
        return r == null ? null : new double[] {r[0], r[1] * xx * mm * mm * mm};
      }, x0, 0, xHi, (1e-12 * m0 + searchTolerance()) / (x0 * m0 * m0 * m0));
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

  /** One evaluation for {@link #newton}: {f(x), f'(x)}, or null when the integration fails to reach a surface. */
  private interface WithSlope {
    double @Nullable [] at(double x, boolean loose);
  }

  /**
   * The root of an increasing f on (lo, hi) by Newton's method from the estimate x0, with the exact
   * slope that the variational equations give alongside each integration. Evaluations are made at
   * the loose {@link #LOOSE_TOLERANCE} while the steps are longer than {@link #LOOSE_STEP} (the
   * estimate is up to a degree off, so the integration's own error does not matter there), and at
   * the solver's tolerance after that. The
   * iteration stops, without a further evaluation, when the predicted error of the last step,
   * c dx^2 with the curvature c = f''/(2 f') estimated from the last two slopes, is below a tenth of
   * {@code tol}. A step that leaves (lo, hi) goes halfway to the bound instead. Returns NaN when f'
   * is not positive (near detachment, where f' vanishes), an evaluation fails, or 12 steps do not
   * converge, for the caller's slower, surer bracketing search.
   *
   * <p>Hand-written rather than Hipparchus' NewtonRaphsonSolver, which takes its derivative from a
   * separate function and evaluates once more at the answer; here one integration yields f and f'
   * together and the last one is not needed.
   */
  private static double newton(WithSlope f, double x0, double lo, double hi, double tol) {
    try {
      double x = Math.max(x0, lo + 1e-3 * (hi - lo));
      double prevX = Double.NaN;
      double prevSlope = Double.NaN;
      double lastDx = Double.NaN;
      for (int step = 0; step < 12; step++) {
        boolean loose = step == 0 || Math.abs(lastDx) > LOOSE_STEP;
        double[] r = f.at(x, loose);
        if (r == null || !(r[1] > 0) || !Double.isFinite(r[0])) {
          return Double.NaN;
        }
        double dx = r[0] / r[1];
        double next = x - dx;
        if (next <= lo) {
          next = 0.5 * (x + lo);
        } else if (next >= hi) {
          next = 0.5 * (x + hi);
        } else if (!loose) {
          double curvature = Math.max(1, Math.abs(r[1] - prevSlope) / (2 * r[1] * Math.abs(x - prevX)));
          if (curvature * dx * dx < 0.1 * tol) {
            return next;
          }
        }
        prevX = x;
        prevSlope = r[1];
        lastDx = next - x;
        x = next;
      }
      return Double.NaN;
    } catch (WavemarkException e) {
      return Double.NaN;
    }
  }

  /** The integration tolerance of a Newton evaluation. */
  private double tolerance(boolean loose) {
    return loose ? Math.max(LOOSE_TOLERANCE, equation.tolerance()) : equation.tolerance();
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
