package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.AbstractODEDetector;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.jspecify.annotations.Nullable;

/**
 * The Taylor-Maccoll equation of the conical flow behind a conical shock, integrated with
 * Hipparchus' Dormand-Prince 8(5,3) from the shock inwards until the normal velocity component
 * vanishes (the cone surface), found by Hipparchus' event detection.
 *
 * <p>Velocities are divided by the limiting speed V_max = sqrt(2 h0). With V_r and V_theta the
 * radial and polar components and theta the ray angle from the axis, the equation is
 * <pre>
 *   V_r'     = V_theta
 *   V_theta' = (V_theta^2 V_r - A (2 V_r + V_theta cot theta)) / (A - V_theta^2),
 *   A        = (gamma - 1)/2 (1 - V_r^2 - V_theta^2)  (the squared speed of sound),
 * </pre>
 * (Taylor and Maccoll, Proc. Roy. Soc. A 139, 1933; in this form Anderson, "Modern Compressible
 * Flow", 3rd ed., eq. 10.15, from memory). The start values behind a shock of angle beta are
 * those of the plane oblique shock of the same angle (Anderson eqs. 10.16-10.17): V' = (2 /
 * ((gamma-1) M2^2) + 1)^(-1/2), V_r = V' cos(beta - delta), V_theta = -V' sin(beta - delta).
 *
 * <p>Not thread-safe: each call builds its own integrator, so instances may be shared only for
 * their immutable settings.
 */
final class TaylorMaccoll {
  /** Integration stops short of the axis, where cot(theta) is singular. */
  private static final double AXIS_GUARD = 1e-9;

  private final double gamma;
  private final double tolerance;

  /**
   * @param gamma ratio of specific heats
   * @param tolerance absolute and relative tolerance of the integration, on velocities of order 1
   */
  TaylorMaccoll(double gamma, double tolerance) {
    this.gamma = Gas.check(gamma);
    if (!(tolerance >= 1e-14 && tolerance <= 1e-3)) {
      throw new WavemarkException(Problem.OUT_OF_RANGE, "Taylor-Maccoll tolerance", tolerance, "[1e-14, 1e-3]");
    }
    this.tolerance = tolerance;
  }

  double gamma() {
    return gamma;
  }

  double tolerance() {
    return tolerance;
  }

  /** The right-hand side of the Taylor-Maccoll system. */
  private final class Equation implements OrdinaryDifferentialEquation {
    @Override
    public int getDimension() {
      return 2;
    }

    @Override
    public double[] computeDerivatives(double theta, double[] y) {
      return new double[] {y[1], secondDerivative(theta, y[0], y[1])};
    }
  }

  double secondDerivative(double theta, double vr, double vt) {
    double a = 0.5 * (gamma - 1) * (1 - vr * vr - vt * vt);
    return (vt * vt * vr - a * (2 * vr + vt * Math.cos(theta) / Math.sin(theta))) / (a - vt * vt);
  }

  /**
   * The system with its variational (sensitivity) equations appended: y = (V_r, V_theta, s_r,
   * s_theta), s = d(V_r, V_theta)/dp for a parameter p that enters only through the start values,
   * s_r' = s_theta, s_theta' = (dg/dV_r) s_r + (dg/dV_theta) s_theta, with g the right-hand side
   * of V_theta' above, differentiated by hand. The step control is told to ignore s (see
   * {@link #mismatch}).
   */
  private final class WithSensitivity implements OrdinaryDifferentialEquation {
    @Override
    public int getDimension() {
      return 4;
    }

    @Override
    public double[] computeDerivatives(double theta, double[] y) {
      double vr = y[0];
      double vt = y[1];
      double k = 0.5 * (gamma - 1);
      double cot = Math.cos(theta) / Math.sin(theta);
      double a = k * (1 - vr * vr - vt * vt);
      double ar = -2 * k * vr;
      double at = -2 * k * vt;
      double bracket = 2 * vr + vt * cot;
      double num = vt * vt * vr - a * bracket;
      double den = a - vt * vt;
      double numR = vt * vt - ar * bracket - 2 * a;
      double numT = 2 * vt * vr - at * bracket - a * cot;
      double gr = (numR * den - num * ar) / (den * den);
      double gt = (numT * den - num * (at - 2 * vt)) / (den * den);
      return new double[] {vt, num / den, y[3], gr * y[2] + gt * y[3]};
    }
  }

  /** What a derivative is taken with respect to. */
  enum Parameter {
    SHOCK_ANGLE, MACH
  }

  /**
   * How far the cone surface of the flow behind a shock of angle beta (Mach m) lies from the ray
   * {@code ray}, to first order, and its derivative with respect to beta (at fixed m) or m (at
   * fixed beta): {V_theta / (2 V_r), d(V_theta / (2 V_r))/dp} at that ray, integrated at {@code
   * tol}. Near the surface V_theta' = -2 V_r, so V_theta(ray) / (2 V_r) &asymp; theta_c - ray, and
   * it vanishes exactly when the surface lies on the ray. Solving for that zero integrates to a
   * known end and needs no event location, which in Hipparchus doubles the cost of an
   * integration (measured); past the surface the equation carries on smoothly for a while.
   * Returns null when the integration fails (far past the surface, where V_theta reaches the
   * local speed of sound), for the caller's surer search.
   *
   * <p>The derivative comes from the variational equations integrated beside the flow in one
   * pass. Their start values are a central difference of the closed-form {@link #behindShock}
   * (error near 1e-10: it slows the Newton iteration that uses the slope a little, it does not
   * move the root); a change of beta also moves the start of the integration, hence the -y'
   * term for that parameter.
   */
  double @Nullable [] mismatch(double m, double beta, double ray, Parameter p, double tol) {
    double[] y0 = behindShock(m, beta);
    double[] s0;
    if (p == Parameter.SHOCK_ANGLE) {
      double mu = Math.asin(1 / m);
      double h = 1e-6 * beta;
      double lo = Math.max(beta - h, mu);
      double[] up = behindShock(m, beta + h);
      double[] dn = behindShock(m, lo);
      double span = beta + h - lo;
      s0 = new double[] {(up[0] - dn[0]) / span - y0[1], (up[1] - dn[1]) / span - secondDerivative(beta, y0[0], y0[1])};
    } else {
      double h = 1e-6 * m;
      double lo = Math.max(m - h, 1 / Math.sin(beta));
      double[] up = behindShock(m + h, beta);
      double[] dn = behindShock(lo, beta);
      s0 = new double[] {(up[0] - dn[0]) / (m + h - lo), (up[1] - dn[1]) / (m + h - lo)};
    }
    // The step control watches V_r and V_theta only: an infinite tolerance leaves s out.
    double inf = Double.POSITIVE_INFINITY;
    DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, beta,
        new double[] {tol, tol, inf, inf}, new double[] {tol, tol, inf, inf});
    integrator.setInitialStepSize(initialStep(tol));
    integrator.setMaxEvaluations(200_000);
    try {
      double[] y = integrator.integrate(new WithSensitivity(), new ODEState(beta, new double[] {y0[0], y0[1], s0[0], s0[1]}),
          ray).getPrimaryState();
      double vr = y[0];
      if (!(vr > 0) || !Double.isFinite(y[1] + y[2] + y[3])) {
        return null;
      }
      return new double[] {y[1] / (2 * vr), y[3] / (2 * vr) - y[1] * y[2] / (2 * vr * vr)};
    } catch (MathIllegalStateException | MathIllegalArgumentException e) {
      return null;
    }
  }

  /** Records that the surface was reached and stops the integration there. */
  private static final class Stop implements ODEEventHandler {
    boolean found;

    @Override
    public Action eventOccurred(ODEStateAndDerivative state, ODEEventDetector detector, boolean increasing) {
      found = true;
      return Action.STOP;
    }
  }

  /** Detects V_theta = 0, the cone surface. */
  private static final class SurfaceDetector extends AbstractODEDetector<SurfaceDetector> {
    SurfaceDetector(AdaptableInterval maxCheck, int maxIter,
        BracketedUnivariateSolver<UnivariateFunction> solver, ODEEventHandler handler) {
      super(maxCheck, maxIter, solver, handler);
    }

    @Override
    protected SurfaceDetector create(AdaptableInterval maxCheck, int maxIter,
        BracketedUnivariateSolver<UnivariateFunction> solver, ODEEventHandler handler) {
      return new SurfaceDetector(maxCheck, maxIter, solver, handler);
    }

    @Override
    public double g(ODEStateAndDerivative state) {
      return state.getPrimaryState()[1];
    }
  }

  /** The state (V_r, V_theta) just behind a shock of angle beta in a stream of Mach m. */
  double[] behindShock(double m, double beta) {
    double delta = ObliqueShock.thetaUnchecked(m, beta, gamma);
    double mn1 = Math.max(1, m * Math.sin(beta));
    double mn1sq = mn1 * mn1;
    double mn2sq = ((gamma - 1) * mn1sq + 2) / (2 * gamma * mn1sq - (gamma - 1));
    double s = Math.sin(beta - delta);
    double m2sq = mn2sq / (s * s);
    double v = 1 / Math.sqrt(2 / ((gamma - 1) * m2sq) + 1);
    return new double[] {v * Math.cos(beta - delta), -v * s};
  }

  /**
   * The cone half-angle (rad) that carries an attached shock of angle beta in a Mach-m stream, or
   * 0 if the integration reaches the axis first (beta at the Mach angle).
   */
  double coneAngle(double m, double beta) {
    if (beta <= Math.asin(1 / m) * (1 + 1e-14)) {
      return 0;
    }
    ODEStateAndDerivative end = integrate(m, beta, null);
    return end == null ? 0 : end.getTime();
  }

  /**
   * Integrates from the shock to the cone surface, recording dense output in {@code model} when
   * given. Returns the state at the surface, or null if V_theta does not vanish before the axis.
   */
  @Nullable ODEStateAndDerivative integrate(double m, double beta, @Nullable DenseOutputModel model) {
    DormandPrince853Integrator integrator = integrator(beta, tolerance);
    Stop stop = new Stop();
    integrator.addEventDetector(surface(tolerance, stop));
    if (model != null) {
      integrator.addStepHandler(model);
    }
    try {
      ODEStateAndDerivative end = integrator.integrate(new Equation(), new ODEState(beta, behindShock(m, beta)), AXIS_GUARD);
      return stop.found ? end : null;
    } catch (MathIllegalStateException | MathIllegalArgumentException e) {
      throw new WavemarkException(e, Problem.SOLVER_FAILED, "Taylor-Maccoll integration", integrator.getEvaluations(),
          "from the shock at " + WavemarkException.deg(beta) + " deg for M = " + WavemarkException.num(m));
    }
  }

  private static DormandPrince853Integrator integrator(double beta, double tol) {
    DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, beta, tol, tol);
    // A first step near the one the controller settles on (measured: ~0.006 rad at 1e-9, scaling
    // as tol^(1/8)) saves the four or five rejected trial steps of the automatic start.
    integrator.setInitialStepSize(initialStep(tol));
    integrator.setMaxEvaluations(200_000);
    return integrator;
  }

  private static double initialStep(double tol) {
    return 0.05 * Math.pow(tol, 0.125);
  }

  /** The cone-surface event; one sign check per step is enough, as V_theta rises monotonically towards the surface. */
  private static SurfaceDetector surface(double tol, Stop stop) {
    return new SurfaceDetector(AdaptableInterval.of(Double.POSITIVE_INFINITY), AbstractODEDetector.DEFAULT_MAX_ITER,
        new BracketingNthOrderBrentSolver(0, Math.max(1e-15, 1e-3 * tol), 0, 5), stop);
  }
}
