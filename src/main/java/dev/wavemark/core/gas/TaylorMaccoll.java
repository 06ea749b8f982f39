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
    DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, beta, tolerance, tolerance);
    // A first step near the one the controller settles on (measured: ~0.006 rad at 1e-9, scaling
    // as tol^(1/8)) saves the four or five rejected trial steps of the automatic start.
    integrator.setInitialStepSize(0.05 * Math.pow(tolerance, 0.125));
    Stop stop = new Stop();
    // One sign check per step is enough: V_theta rises monotonically towards the surface.
    integrator.addEventDetector(new SurfaceDetector(AdaptableInterval.of(Double.POSITIVE_INFINITY),
        AbstractODEDetector.DEFAULT_MAX_ITER, new BracketingNthOrderBrentSolver(0, Math.max(1e-15, 1e-3 * tolerance), 0, 5), stop));
    if (model != null) {
      integrator.addStepHandler(model);
    }
    integrator.setMaxEvaluations(200_000);
    try {
      ODEStateAndDerivative end = integrator.integrate(new Equation(), new ODEState(beta, behindShock(m, beta)), AXIS_GUARD);
      return stop.found ? end : null;
    } catch (MathIllegalStateException | MathIllegalArgumentException e) {
      throw new WavemarkException(e, Problem.SOLVER_FAILED, "Taylor-Maccoll integration", integrator.getEvaluations(),
          "from the shock at " + WavemarkException.deg(beta) + " deg for M = " + WavemarkException.num(m));
    }
  }
}
