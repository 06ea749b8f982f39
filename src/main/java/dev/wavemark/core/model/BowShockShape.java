package dev.wavemark.core.model;

import dev.wavemark.core.gas.BowShock;
import dev.wavemark.core.gas.NormalShock;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;

/**
 * A bow shock placed in the image: Billig's hyperbola (F. S. Billig, J. Spacecraft and Rockets
 * 4 (6), 1967, coefficients from memory; see {@link BowShock}) about the nose centre, axis along
 * the flow. In body coordinates s (upstream from the centre along the axis) and t (across it),
 * s(t) = R + delta - Rc cot^2(mu) (sqrt(1 + t^2 tan^2(mu) / Rc^2) - 1): a vertex of radius of
 * curvature Rc at stand-off delta ahead of the nose, tending to the freestream Mach angle mu far
 * from the axis.
 *
 * @param nose cylinder (plane) or sphere (axisymmetric)
 * @param centrePx the nose's centre of curvature, ideal image pixels
 * @param axisDirectionRad the freestream direction (downstream), contract sense
 * @param noseRadiusPx R
 * @param standoffPx delta, the shock's distance ahead of the nose on the stagnation line
 * @param vertexRadiusPx Rc, the shock's radius of curvature at its vertex
 * @param mach the freestream Mach number
 * @param gamma ratio of specific heats
 */
public record BowShockShape(
    BowShock.Nose nose, Point2 centrePx, double axisDirectionRad, double noseRadiusPx, double standoffPx,
    double vertexRadiusPx, double mach, double gamma) {

  /** Billig's shape at Mach {@code m} for a nose of radius {@code r} px about {@code centre}. */
  public static BowShockShape of(BowShock.Nose nose, Point2 centre, double axisRad, double r, double m, double gamma) {
    return new BowShockShape(nose, centre, axisRad, r, r * BowShock.standoffRatio(nose, m, gamma),
        r * BowShock.vertexRadiusRatio(nose, m, gamma), m, gamma);
  }

  private double tanMu2() {
    return 1 / (mach * mach - 1);
  }

  /** s(t): the shock's distance upstream of the centre at lateral distance {@code tPx}, px. */
  public double upstreamPx(double tPx) {
    double k = tanMu2();
    double rc = vertexRadiusPx;
    return noseRadiusPx + standoffPx - rc / k * (Math.sqrt(1 + tPx * tPx * k / (rc * rc)) - 1);
  }

  /** ds/dt at {@code tPx}: zero at the vertex, tending to -cot(mu) sign(t) far out. */
  public double slope(double tPx) {
    double k = tanMu2();
    double rc = vertexRadiusPx;
    return -tPx / (rc * Math.sqrt(1 + tPx * tPx * k / (rc * rc)));
  }

  /** The local shock angle to the freestream at {@code tPx}: pi/2 on the axis, the Mach angle far out. */
  public double shockAngleRad(double tPx) {
    return Math.atan2(1, Math.abs(slope(tPx)));
  }

  /** Density over freestream density just behind the shock at {@code tPx}: the normal shock at M sin(beta). */
  public double densityBehind(double tPx) {
    double mn = mach * Math.sin(shockAngleRad(tPx));
    return mn <= 1 ? 1 : NormalShock.densityRatio(mn, gamma);
  }

  /** The image point of body coordinates (s upstream, t across: +t is 90 deg counter-clockwise of upstream). */
  public Point2 point(double sPx, double tPx) {
    Point2 up = ImageAngles.unit(axisDirectionRad + Math.PI);
    Point2 across = ImageAngles.unit(axisDirectionRad + 0.5 * Math.PI);
    return centrePx.plus(up.times(sPx)).plus(across.times(tPx));
  }

  /** The shock's vertex, on the stagnation line. */
  public Point2 vertexPx() {
    return point(noseRadiusPx + standoffPx, 0);
  }

  /** The nose's stagnation point (where the stagnation line meets the body). */
  public Point2 stagnationPx() {
    return point(noseRadiusPx, 0);
  }
}
