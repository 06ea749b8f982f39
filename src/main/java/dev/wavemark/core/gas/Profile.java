package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import java.util.List;

/**
 * A two-dimensional body of straight segments in body coordinates: x along the chord
 * (downstream), y up. The upper and the lower surface each run from the leading edge to the
 * trailing edge (or to the base, for a blunt one) with x increasing; both start at the same
 * leading-edge point. When they also end at one point the trailing edge is sharp.
 *
 * @param upper the upper surface, leading edge first, at least two points
 * @param lower the lower surface, leading edge first, at least two points
 */
public record Profile(List<Vertex> upper, List<Vertex> lower) {

  /** A corner of the profile, in body coordinates (any consistent length unit). */
  public record Vertex(double x, double y) {
    public Vertex {
      Checks.finite("profile x", x);
      Checks.finite("profile y", y);
    }
  }

  public Profile {
    upper = List.copyOf(upper);
    lower = List.copyOf(lower);
    check("upper", upper);
    check("lower", lower);
    if (!upper.get(0).equals(lower.get(0))) {
      throw new WavemarkException(
          Problem.GEOMETRY_IMPOSSIBLE, "profile: the upper and lower surfaces must start at the same leading-edge point");
    }
  }

  private static void check(String side, List<Vertex> pts) {
    if (pts.size() < 2) {
      throw new WavemarkException(Problem.GEOMETRY_IMPOSSIBLE, "profile: the " + side + " surface needs at least two points");
    }
    for (int i = 1; i < pts.size(); i++) {
      if (!(pts.get(i).x() > pts.get(i - 1).x())) {
        throw new WavemarkException(
            Problem.GEOMETRY_IMPOSSIBLE,
            "profile: the " + side + " surface must run downstream (x increasing), but point " + (i + 1)
                + " has x = " + WavemarkException.num(pts.get(i).x()) + " after x = "
                + WavemarkException.num(pts.get(i - 1).x()));
      }
    }
  }

  /** True when both surfaces end at one point. */
  public boolean sharpTrailingEdge() {
    return upper.get(upper.size() - 1).equals(lower.get(lower.size() - 1));
  }

  /** The reference length for the coefficients: the body's extent in x. */
  public double chord() {
    double end = Math.max(upper.get(upper.size() - 1).x(), lower.get(lower.size() - 1).x());
    return end - upper.get(0).x();
  }

  /** The leading edge, the first point of both surfaces (and the moment reference). */
  public Vertex leadingEdge() {
    return upper.get(0);
  }

  /**
   * A symmetric double wedge (diamond) of the given half-angle at the leading edge, with its
   * shoulders at mid-chord; thickness ratio tan(halfAngle).
   */
  public static Profile diamond(double halfAngleRad, double chord) {
    Checks.inOpen("diamond half-angle (rad)", halfAngleRad, 0, 0.5 * Math.PI);
    Checks.positive("chord", chord);
    double h = 0.5 * chord * Math.tan(halfAngleRad);
    Vertex le = new Vertex(0, 0);
    Vertex te = new Vertex(chord, 0);
    return new Profile(List.of(le, new Vertex(0.5 * chord, h), te), List.of(le, new Vertex(0.5 * chord, -h), te));
  }

  /**
   * A symmetric wedge of the given half-angle and length {@code chord} to its shoulders, followed
   * by a flat afterbody of length {@code afterbody} (0 for none), ending in a blunt base.
   */
  public static Profile wedge(double halfAngleRad, double chord, double afterbody) {
    Checks.inOpen("wedge half-angle (rad)", halfAngleRad, 0, 0.5 * Math.PI);
    Checks.positive("chord", chord);
    Checks.inClosed("afterbody length", afterbody, 0, Double.MAX_VALUE);
    double h = chord * Math.tan(halfAngleRad);
    Vertex le = new Vertex(0, 0);
    if (afterbody == 0) {
      return new Profile(List.of(le, new Vertex(chord, h)), List.of(le, new Vertex(chord, -h)));
    }
    return new Profile(
        List.of(le, new Vertex(chord, h), new Vertex(chord + afterbody, h)),
        List.of(le, new Vertex(chord, -h), new Vertex(chord + afterbody, -h)));
  }

  /** A flat plate of zero thickness. */
  public static Profile flatPlate(double chord) {
    Checks.positive("chord", chord);
    List<Vertex> s = List.of(new Vertex(0, 0), new Vertex(chord, 0));
    return new Profile(s, s);
  }
}
