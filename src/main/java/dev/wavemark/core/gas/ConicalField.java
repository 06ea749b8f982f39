package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEStateAndDerivative;

/**
 * The Taylor-Maccoll flow field between a conical shock and its cone, as a function of the ray
 * angle from the cone axis (the flow is constant along each ray from the apex). Built once by
 * {@link ConicalFlow#solve} or {@link ConicalFlow#fromShockAngle}; afterwards every query is a
 * table look-up with cubic Hermite interpolation of (V_r, V_theta) on {@value #INTERVALS}
 * equal intervals, using the exact derivatives V_r' = V_theta and V_theta' from the equation,
 * so a query costs a few tens of nanoseconds and adds a few 1e-10 (in V/V_max) to the
 * integration error.
 *
 * <p>Ray angles in radians from the axis. Below the cone surface there is no flow (an
 * out-of-range error); above the shock the freestream is returned (ratios 1, flow angle 0), so
 * a renderer may sample any ray outside the body. Immutable and thread-safe.
 *
 * <p>Thermodynamics (perfect gas, adiabatic flow, isentropic behind the shock): T/T0 = 1 - V'^2,
 * M^2 = (2/(gamma-1)) V'^2 / (1 - V'^2); p and rho follow from the isentropic relations with
 * the total pressure lost across the shock, p02/p01 = rho02/rho01 (NACA Report 1135 eqs. 43-45
 * and 99; Anderson, "Modern Compressible Flow", 3rd ed., sec. 10.4, from memory).
 */
public final class ConicalField {
  /** Number of equal ray-angle intervals of the interpolation table. */
  public static final int INTERVALS = 256;

  /** The flow on one ray: Mach number, ratios to the freestream, and flow direction. */
  public record State(
      double rayRad, double mach, double pressureRatio, double densityRatio, double temperatureRatio,
      double flowAngleRad) {}

  private final double mach;
  private final double gamma;
  private final double shockRad;
  private final double coneRad;
  private final double totalPressureRatio;
  /** p0/p_inf and rho0/rho_inf of the freestream, times the loss across the shock. */
  private final double pressureScale;
  private final double densityScale;
  private final double freestreamTemperature;
  private final double step;
  private final double[] vr;
  private final double[] vt;
  private final double[] dvt;
  private final TaylorMaccoll equation;

  private ConicalField(TaylorMaccoll equation, double mach, double shockRad, double coneRad,
      double[] vr, double[] vt, double[] dvt) {
    this.equation = equation;
    this.mach = mach;
    this.gamma = equation.gamma();
    this.shockRad = shockRad;
    this.coneRad = coneRad;
    this.vr = vr;
    this.vt = vt;
    this.dvt = dvt;
    this.step = (shockRad - coneRad) / INTERVALS;
    double mn = Math.max(1, mach * Math.sin(shockRad));
    this.totalPressureRatio = NormalShock.totalPressureRatio(mn, gamma);
    this.pressureScale = totalPressureRatio / Isentropic.pressureRatio(mach, gamma);
    this.densityScale = totalPressureRatio / Isentropic.densityRatio(mach, gamma);
    this.freestreamTemperature = Isentropic.temperatureRatio(mach, gamma);
  }

  static ConicalField integrate(TaylorMaccoll equation, double m, double shockRad) {
    DenseOutputModel model = new DenseOutputModel();
    ODEStateAndDerivative end = equation.integrate(m, shockRad, model);
    if (end == null) {
      throw new WavemarkException(Problem.NO_SOLUTION, "no cone carries a conical shock at "
          + WavemarkException.deg(shockRad) + "° for M = " + WavemarkException.num(m));
    }
    double cone = end.getTime();
    double h = (shockRad - cone) / INTERVALS;
    double[] vr = new double[INTERVALS + 1];
    double[] vt = new double[INTERVALS + 1];
    double[] dvt = new double[INTERVALS + 1];
    for (int i = 0; i <= INTERVALS; i++) {
      double theta = i == 0 ? cone : i == INTERVALS ? shockRad : cone + i * h;
      double[] y = i == INTERVALS ? equation.behindShock(m, shockRad) : model.getInterpolatedState(theta).getPrimaryState();
      vr[i] = y[0];
      vt[i] = i == 0 ? 0.0 : y[1];
      dvt[i] = equation.secondDerivative(theta, vr[i], vt[i]);
    }
    return new ConicalField(equation, m, shockRad, cone, vr, vt, dvt);
  }

  /** Freestream Mach number. */
  public double mach() {
    return mach;
  }

  public double gamma() {
    return gamma;
  }

  /** The shock angle from the axis, rad. */
  public double shockRad() {
    return shockRad;
  }

  /** The cone half-angle, rad (where V_theta = 0). */
  public double coneRad() {
    return coneRad;
  }

  /** Total-pressure ratio across the shock, p02/p01 (the same on every ray behind it). */
  public double totalPressureRatio() {
    return totalPressureRatio;
  }

  /** The deflection of the flow just behind the shock, rad: the plane-shock deflection for its angle. */
  public double deflectionBehindShockRad() {
    return ObliqueShock.thetaUnchecked(mach, shockRad, gamma);
  }

  /** The state on the cone surface. */
  public State surface() {
    return state(coneRad);
  }

  /** Surface pressure coefficient Cp = (p_c/p_inf - 1) / (gamma M^2 / 2). */
  public double surfacePressureCoefficient() {
    return (surface().pressureRatio() - 1) / (0.5 * gamma * mach * mach);
  }

  /**
   * The flow on the ray at {@code rayRad} from the axis.
   *
   * @throws WavemarkException out-of-range for a ray inside the cone
   */
  public State state(double rayRad) {
    if (rayRad >= shockRad) {
      return new State(rayRad, mach, 1, 1, 1, 0);
    }
    double[] v = velocity(rayRad);
    double v2 = v[0] * v[0] + v[1] * v[1];
    double t = 1 - v2;
    double m2 = 2 / (gamma - 1) * v2 / t;
    double p = Math.pow(t, gamma / (gamma - 1)) * pressureScale;
    double rho = Math.pow(t, 1 / (gamma - 1)) * densityScale;
    return new State(rayRad, Math.sqrt(m2), p, rho, t / freestreamTemperature, rayRad + Math.atan2(v[1], v[0]));
  }

  /** rho/rho_inf on the ray at {@code rayRad}: the fast path for renderers (no allocation). */
  public double densityRatio(double rayRad) {
    if (rayRad >= shockRad) {
      return 1;
    }
    int i = index(rayRad);
    double u = (rayRad - (coneRad + i * step)) / step;
    double r = hermite(vr[i], vt[i], vr[i + 1], vt[i + 1], u);
    double s = hermite(vt[i], dvt[i], vt[i + 1], dvt[i + 1], u);
    return Math.pow(1 - r * r - s * s, 1 / (gamma - 1)) * densityScale;
  }

  /** (V_r, V_theta) / V_max on the ray, interpolated from the table. */
  double[] velocity(double rayRad) {
    int i = index(rayRad);
    double u = (rayRad - (coneRad + i * step)) / step;
    return new double[] {
        hermite(vr[i], vt[i], vr[i + 1], vt[i + 1], u), hermite(vt[i], dvt[i], vt[i + 1], dvt[i + 1], u)};
  }

  /** The same velocity by a fresh integration (no table), for tests of the interpolation. */
  double[] velocityByIntegration(double rayRad) {
    DenseOutputModel model = new DenseOutputModel();
    equation.integrate(mach, shockRad, model);
    return model.getInterpolatedState(rayRad).getPrimaryState();
  }

  private int index(double rayRad) {
    if (!(rayRad >= coneRad)) {
      throw new WavemarkException(Problem.OUT_OF_RANGE, "ray angle (deg)", WavemarkException.deg(rayRad),
          "[" + WavemarkException.deg(coneRad) + ", 90] outside the cone");
    }
    return Math.min(INTERVALS - 1, (int) ((rayRad - coneRad) / step));
  }

  /** Cubic Hermite on [0, 1] with end values f0, f1 and end slopes (per ray-angle unit) d0, d1. */
  private double hermite(double f0, double d0, double f1, double d1, double u) {
    double u2 = u * u;
    double u3 = u2 * u;
    return (2 * u3 - 3 * u2 + 1) * f0 + (u3 - 2 * u2 + u) * step * d0 + (-2 * u3 + 3 * u2) * f1 + (u3 - u2) * step * d1;
  }
}
