package dev.wavemark.report;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Side;
import java.util.ArrayList;
import java.util.List;

/**
 * The model's outline in the picture, as polylines in image pixels, for drawing only. Built from
 * the run file's geometry: the body axis runs along the freestream turned by the incidence
 * (positive incidence turns the axis nose-up, i.e. the axis direction is flow minus incidence),
 * walls through their two points. Surfaces that run out of the picture are drawn to a length of
 * {@code reach} pixels and left to the clip.
 */
final class ModelOutline {
  private ModelOutline() {}

  /**
   * @param flowRad freestream direction in the image (contract sense)
   * @param reach a length that crosses the picture, pixels (its diagonal)
   */
  static List<List<Point2>> of(BodyShape shape, double flowRad, double reach) {
    List<List<Point2>> out = new ArrayList<>();
    if (shape instanceof BodyShape.Wedge w) {
      double axis = flowRad - w.incidenceRad();
      Point2 le = w.leadingEdgePx();
      Point2 side = normal(axis).times(w.chordPx() * Math.tan(w.halfAngleRad()));
      Point2 up = at(le, axis, w.chordPx()).plus(side);
      Point2 lo = at(le, axis, w.chordPx()).minus(side);
      out.add(List.of(at(up, axis, reach), up, le, lo, at(lo, axis, reach)));
    } else if (shape instanceof BodyShape.Diamond d) {
      double axis = flowRad - d.incidenceRad();
      Point2 le = d.leadingEdgePx();
      double half = 0.5 * d.chordPx();
      Point2 side = normal(axis).times(half * Math.tan(d.halfAngleRad()));
      Point2 mid = at(le, axis, half);
      out.add(List.of(le, mid.plus(side), at(le, axis, d.chordPx()), mid.minus(side), le));
    } else if (shape instanceof BodyShape.FlatPlate p) {
      out.add(List.of(p.leadingEdgePx(), at(p.leadingEdgePx(), flowRad - p.incidenceRad(), p.chordPx())));
    } else if (shape instanceof BodyShape.Cone c) {
      double axis = flowRad - c.incidenceRad();
      Point2 apex = c.leadingEdgePx();
      Point2 base = at(apex, axis, c.chordPx());
      Point2 side = normal(axis).times(c.chordPx() * Math.tan(c.halfAngleRad()));
      out.add(List.of(base.plus(side), apex, base.minus(side), base.plus(side)));
    } else if (shape instanceof BodyShape.Ramp r) {
      out.add(wallTurning(r.wall(), r.cornerPx(), r.deflectionRad(), flowRad, reach));
    } else if (shape instanceof BodyShape.ExpansionCorner e) {
      out.add(wallTurning(e.wall(), e.cornerPx(), -e.deflectionRad(), flowRad, reach));
    } else if (shape instanceof BodyShape.DoubleRamp d) {
      double dir = downstream(d.wall(), flowRad);
      int s = awayFromSolid(d.wall());
      out.add(List.of(at(d.cornerPx(), dir + Math.PI, reach), d.cornerPx(), d.secondCornerPx(),
          at(d.secondCornerPx(), dir + s * (d.deflectionRad() + d.secondDeflectionRad()), reach)));
    } else if (shape instanceof BodyShape.ShockGenerator g) {
      int towardWall = -awayFromSolid(g.wall());
      out.add(List.of(g.leadingEdgePx(), at(g.leadingEdgePx(), flowRad + towardWall * g.deflectionRad(), 0.4 * reach)));
      out.add(wallLine(g.wall(), reach));
    } else if (shape instanceof BodyShape.TwinGenerators t) {
      out.add(List.of(t.upperLeadingEdgePx(), at(t.upperLeadingEdgePx(), flowRad - t.upperDeflectionRad(), 0.25 * reach)));
      out.add(List.of(t.lowerLeadingEdgePx(), at(t.lowerLeadingEdgePx(), flowRad + t.lowerDeflectionRad(), 0.25 * reach)));
    } else if (shape instanceof BodyShape.Freestream f) {
      f.wall().ifPresent(w -> out.add(wallLine(w, reach)));
    } else if (shape instanceof BodyShape.Blunt b) {
      List<Point2> circle = new ArrayList<>();
      for (int i = 0; i <= 72; i++) {
        circle.add(b.centrePx().plus(ImageAngles.unit(2 * Math.PI * i / 72).times(b.noseRadiusPx())));
      }
      out.add(circle);
    }
    return out;
  }

  /** The upstream wall up to the corner, then the surface turned by {@code turnRad} away from the solid. */
  private static List<Point2> wallTurning(BodyShape.Wall wall, Point2 corner, double turnRad, double flowRad, double reach) {
    double dir = downstream(wall, flowRad);
    return List.of(at(corner, dir + Math.PI, reach), corner, at(corner, dir + awayFromSolid(wall) * turnRad, reach));
  }

  /** The wall point farther from the corner: the contract puts both upstream of it. */
  /**
   * The wall's direction that runs with the freestream (the wall's end farther from the corner
   * need not be its upstream end: a corner near the window's upstream edge has it downstream).
   */
  private static double downstream(BodyShape.Wall wall, double flowRad) {
    double d = ImageAngles.direction(wall.a(), wall.b());
    return Math.cos(d - flowRad) >= 0 ? d : d + Math.PI;
  }

  private static List<Point2> wallLine(BodyShape.Wall w, double reach) {
    double d = ImageAngles.direction(w.a(), w.b());
    return List.of(at(w.a(), d + Math.PI, reach), at(w.a(), d, reach));
  }

  /**
   * +1 when turning counter-clockwise on screen moves a downstream-pointing wall direction away
   * from the solid: the solid is below a left-to-right wall for {@link Side#LOWER}.
   */
  private static int awayFromSolid(BodyShape.Wall wall) {
    return wall.solidSide() == Side.LOWER ? +1 : -1;
  }

  private static Point2 at(Point2 p, double dirRad, double len) {
    return p.plus(ImageAngles.unit(dirRad).times(len));
  }

  private static Point2 normal(double axisRad) {
    return ImageAngles.unit(axisRad + 0.5 * Math.PI);
  }
}
