package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;

/**
 * The three-shock solution at the triple point of a steady Mach reflection: the incident shock
 * (weak, in M1), the reflected shock (in the stream behind the incident shock) and the Mach stem
 * (strong branch, in M1), with equal pressure and a common direction on either side of the slip
 * line. Geometry as in {@link ShockReflection}: wall along +x below the gas, directions in
 * radians counter-clockwise from +x.
 *
 * <p>Source: von Neumann's three-shock theory as set out by Ben-Dor, "Shock Wave Reflection
 * Phenomena", 2nd ed. (2007), sec. 1.3, and Hornung, Oertel and Sandeman, J. Fluid Mech. 90
 * (1979) 541 (from memory). The solution is the first intersection of the reflected shock polar,
 * followed from its Mach-wave end, with the strong part of the incident polar.
 *
 * @param m1 freestream Mach number
 * @param thetaRad the generator's deflection (the incident shock's turn towards the wall)
 * @param incidentAngleRad the incident shock's angle to the freestream
 * @param reflectedAngleToFlowRad the reflected shock's angle to its upstream flow
 * @param reflectedDeflectionRad how far the reflected shock turns the flow back (away from the wall)
 * @param reflectedBranch the branch of the reflected shock on its polar
 * @param reflectedDirectionRad the reflected shock line from the triple point, -theta + beta_r
 * @param stemAngleToFlowRad the Mach stem's wave angle to the freestream at the triple point
 *     (strong branch, pi/2 for a normal stem)
 * @param stemDirectionRad the stem line from the triple point towards the wall (-pi/2 = normal
 *     to the wall; above -pi/2 its foot lies downstream of the triple point)
 * @param slipLine the slip line: above it the flow behind the reflected shock, below it the
 *     flow behind the stem; its direction is negative when it turns towards the wall
 */
public record TriplePoint(
    double m1, double thetaRad, double incidentAngleRad,
    double reflectedAngleToFlowRad, double reflectedDeflectionRad, ShockBranch reflectedBranch,
    double reflectedDirectionRad, double stemAngleToFlowRad, double stemDirectionRad, SlipLine slipLine) {

  private static final int SCAN_STEPS = 400;

  public TriplePoint {
    Checks.supersonic(m1, "a triple point");
    Checks.finite("deflection (rad)", thetaRad);
    Checks.finite("incident shock angle (rad)", incidentAngleRad);
    Checks.finite("reflected shock angle (rad)", reflectedAngleToFlowRad);
    Checks.finite("reflected deflection (rad)", reflectedDeflectionRad);
    Checks.finite("reflected shock direction (rad)", reflectedDirectionRad);
    Checks.finite("Mach stem angle (rad)", stemAngleToFlowRad);
    Checks.finite("Mach stem direction (rad)", stemDirectionRad);
  }

  /** The incident shock line from the triple point's upstream side, -beta1. */
  public double incidentDirectionRad() {
    return -incidentAngleRad;
  }

  /**
   * Solves the triple point for deflection theta in M1.
   *
   * @throws WavemarkException shock-detached when theta exceeds thetaMax(M1); subsonic when the
   *     flow behind the incident shock is subsonic; no-solution when the polars do not meet
   */
  static TriplePoint solve(double m1, double thetaRad, double gamma) {
    Checks.inOpen("deflection (rad)", thetaRad, 0, 0.5 * Math.PI);
    Turn incident = Turn.of(m1, thetaRad, gamma);
    double m2 = Checks.supersonic(incident.machDownstream(), "a Mach reflection (flow behind the incident shock)");
    double thetaMax1 = ObliqueShock.maxDeflection(m1, gamma);
    double lo = MachAngle.of(m2) + 1e-12;
    double hi = 0.5 * Math.PI;
    double prev = mismatch(lo, m1, thetaRad, incident, thetaMax1, gamma);
    double step = (hi - lo) / SCAN_STEPS;
    for (int i = 1; i <= SCAN_STEPS; i++) {
      double b = lo + i * step;
      double g = mismatch(b, m1, thetaRad, incident, thetaMax1, gamma);
      if (prev < 0 && g >= 0) {
        double a = b - step;
        double br = Roots.solve(
            "triple point for M = " + WavemarkException.num(m1) + ", theta = " + WavemarkException.deg(thetaRad) + "°",
            x -> mismatch(x, m1, thetaRad, incident, thetaMax1, gamma), a, b, 1e-15);
        return build(br, m1, thetaRad, incident, gamma);
      }
      prev = g;
    }
    throw new WavemarkException(
        Problem.NO_SOLUTION,
        "no three-shock solution for M = " + WavemarkException.num(m1) + ", theta = "
            + WavemarkException.deg(thetaRad) + "°: the reflected polar misses the incident polar");
  }

  /** ln(p behind reflected) - ln(p behind stem); NaN where the stem would need more than thetaMax(M1). */
  private static double mismatch(double betaR, double m1, double theta, Turn incident, double thetaMax1, double gamma) {
    double m2 = incident.machDownstream();
    double turnBack = ObliqueShock.theta(m2, betaR, gamma);
    double delta = turnBack - theta;
    if (Math.abs(delta) > thetaMax1) {
      return Double.NaN;
    }
    double pr = incident.pressureRatio() * NormalShock.pressureRatio(Math.max(1, m2 * Math.sin(betaR)), gamma);
    double betaS = ObliqueShock.beta(m1, Math.abs(delta), ShockBranch.STRONG, gamma);
    double ps = NormalShock.pressureRatio(Math.max(1, m1 * Math.sin(betaS)), gamma);
    return Math.log(pr) - Math.log(ps);
  }

  private static TriplePoint build(double betaR, double m1, double theta, Turn incident, double gamma) {
    double m2 = incident.machDownstream();
    ObliqueShock.Solution r = ObliqueShock.fromWaveAngle(m2, betaR, gamma);
    double delta = r.thetaRad() - theta;
    ObliqueShock.Solution s = ObliqueShock.fromDeflection(m1, Math.abs(delta), ShockBranch.STRONG, gamma);
    double pAbove = incident.pressureRatio() * r.pressureRatio();
    double sAbove = incident.entropyRise() - Math.log(r.totalPressureRatio());
    SlipLine.Side above = SlipLine.Side.of(r.m2(), pAbove, -theta + r.thetaRad(), sAbove, m1, gamma);
    SlipLine.Side below = SlipLine.Side.of(s.m2(), s.pressureRatio(), delta, -Math.log(s.totalPressureRatio()), m1, gamma);
    double stemDir = delta <= 0 ? -s.betaRad() : -(Math.PI - s.betaRad());
    return new TriplePoint(
        m1, theta, incident.headAngleRad(), betaR, r.thetaRad(), ObliqueShock.branchOf(m2, betaR, gamma),
        -theta + betaR, s.betaRad(), stemDir, new SlipLine(delta, 0.5 * (pAbove + s.pressureRatio()), above, below));
  }
}
