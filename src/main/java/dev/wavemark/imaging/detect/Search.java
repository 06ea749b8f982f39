package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.List;

/**
 * Where to look for one wave: a point it starts from, the sector of directions it may take
 * (contract sense, radians), and what it should be. Built from the model geometry, which needs
 * no Mach number: a wedge's leading-edge shock lies between its surface and the normal, a
 * shoulder's fan between the surface and the normal, and so on.
 *
 * @param kind the kind reported if a shock-like signature is found; for {@code fan} searches
 *     the head and tail kinds are used
 */
record Search(Point2 origin, double a0, double a1, boolean fan, WaveKind kind, Side side, Feature feature) {

  private static final double EPS = Math.toRadians(0.7);
  private static final double NEAR_NORMAL = Math.toRadians(87);

  static Search shock(Point2 o, double a0, double a1, WaveKind kind, Side side, Feature f) {
    return new Search(o, Math.min(a0, a1), Math.max(a0, a1), false, kind, side, f);
  }

  static Search fan(Point2 o, double a0, double a1, Side side, Feature f) {
    return new Search(o, Math.min(a0, a1), Math.max(a0, a1), true, WaveKind.EXPANSION_HEAD, side, f);
  }

  /**
   * The primary searches of a shape. The body axis points along {@code flow - incidence}
   * (positive incidence raises the nose); a wedge's and diamond's {@code chordPx} is measured
   * along that axis.
   */
  static List<Search> primary(BodyShape shape, double flow) {
    List<Search> out = new ArrayList<>();
    if (shape instanceof BodyShape.Wedge w) {
        double ax = flow - w.incidenceRad();
        Point2 le = w.leadingEdgePx();
        out.add(shock(le, ax + w.halfAngleRad() + EPS, ax + NEAR_NORMAL, WaveKind.OBLIQUE_SHOCK, Side.UPPER, Feature.LEADING_EDGE));
        out.add(shock(le, ax - NEAR_NORMAL, ax - w.halfAngleRad() - EPS, WaveKind.OBLIQUE_SHOCK, Side.LOWER, Feature.LEADING_EDGE));
        double t = w.chordPx() * Math.tan(w.halfAngleRad());
        out.add(fan(offset(le, ax, w.chordPx(), t), ax + EPS, ax + w.halfAngleRad() + NEAR_NORMAL, Side.UPPER, Feature.SHOULDER));
        out.add(fan(offset(le, ax, w.chordPx(), -t), ax - w.halfAngleRad() - NEAR_NORMAL, ax - EPS, Side.LOWER, Feature.SHOULDER));
    } else if (shape instanceof BodyShape.Diamond d) {
        double ax = flow - d.incidenceRad();
        Point2 le = d.leadingEdgePx();
        double h = d.halfAngleRad();
        out.add(shock(le, ax + h + EPS, ax + NEAR_NORMAL, WaveKind.OBLIQUE_SHOCK, Side.UPPER, Feature.LEADING_EDGE));
        out.add(shock(le, ax - NEAR_NORMAL, ax - h - EPS, WaveKind.OBLIQUE_SHOCK, Side.LOWER, Feature.LEADING_EDGE));
        double half = 0.5 * d.chordPx();
        double t = half * Math.tan(h);
        out.add(fan(offset(le, ax, half, t), ax - h + EPS, ax + h + NEAR_NORMAL, Side.UPPER, Feature.SHOULDER));
        out.add(fan(offset(le, ax, half, -t), ax - h - NEAR_NORMAL, ax + h - EPS, Side.LOWER, Feature.SHOULDER));
        Point2 te = offset(le, ax, d.chordPx(), 0);
        out.add(shock(te, ax + EPS, ax + NEAR_NORMAL, WaveKind.OBLIQUE_SHOCK, Side.UPPER, Feature.TRAILING_EDGE));
        out.add(shock(te, ax - NEAR_NORMAL, ax - EPS, WaveKind.OBLIQUE_SHOCK, Side.LOWER, Feature.TRAILING_EDGE));
    } else if (shape instanceof BodyShape.FlatPlate p) {
        double ax = flow - p.incidenceRad();
        Point2 le = p.leadingEdgePx();
        Point2 te = offset(le, ax, p.chordPx(), 0);
        boolean noseUp = p.incidenceRad() > 0;
        Side comp = noseUp ? Side.LOWER : Side.UPPER;
        Side exp = comp.opposite();
        out.add(sideShock(le, ax, comp, WaveKind.OBLIQUE_SHOCK, Feature.LEADING_EDGE));
        out.add(sideFan(le, ax, exp, Feature.LEADING_EDGE));
        out.add(sideShock(te, ax, exp, WaveKind.OBLIQUE_SHOCK, Feature.TRAILING_EDGE));
        out.add(sideFan(te, ax, comp, Feature.TRAILING_EDGE));
    } else if (shape instanceof BodyShape.Cone c) {
        double ax = flow - c.incidenceRad();
        Point2 le = c.leadingEdgePx();
        out.add(shock(le, ax + c.halfAngleRad() + EPS, ax + NEAR_NORMAL, WaveKind.CONICAL_SHOCK, Side.UPPER, Feature.APEX));
        out.add(shock(le, ax - NEAR_NORMAL, ax - c.halfAngleRad() - EPS, WaveKind.CONICAL_SHOCK, Side.LOWER, Feature.APEX));
    } else if (shape instanceof BodyShape.Ramp r) {
        double w = wallDirection(r.wall(), flow);
        Side s = r.wall().solidSide().opposite();
        out.add(wallShock(r.cornerPx(), w, r.deflectionRad(), s, WaveKind.OBLIQUE_SHOCK, Feature.CORNER));
    } else if (shape instanceof BodyShape.ExpansionCorner e) {
        double w = wallDirection(e.wall(), flow);
        Side s = e.wall().solidSide().opposite();
        int g = s.sign();
        out.add(fan(e.cornerPx(), w - g * (e.deflectionRad() - EPS), w + g * NEAR_NORMAL, s, Feature.CORNER));
    } else if (shape instanceof BodyShape.DoubleRamp r) {
        double w = wallDirection(r.wall(), flow);
        Side s = r.wall().solidSide().opposite();
        out.add(wallShock(r.cornerPx(), w, r.deflectionRad(), s, WaveKind.OBLIQUE_SHOCK, Feature.CORNER));
        out.add(wallShock(r.secondCornerPx(), w, r.deflectionRad() + r.secondDeflectionRad(), s, WaveKind.OBLIQUE_SHOCK,
            Feature.SECOND_CORNER));
    } else if (shape instanceof BodyShape.ShockGenerator g) {
        double w = wallDirection(g.wall(), flow);
        // the generator sits on the flow side of the wall and turns the flow towards it
        Side towards = g.wall().solidSide();
        out.add(wallShock(g.leadingEdgePx(), w, g.deflectionRad(), towards, WaveKind.OBLIQUE_SHOCK, Feature.LEADING_EDGE));
    } else if (shape instanceof BodyShape.TwinGenerators t) {
        out.add(wallShock(t.upperLeadingEdgePx(), flow, t.upperDeflectionRad(), Side.LOWER, WaveKind.OBLIQUE_SHOCK, Feature.LEADING_EDGE));
        out.add(wallShock(t.lowerLeadingEdgePx(), flow, t.lowerDeflectionRad(), Side.UPPER, WaveKind.OBLIQUE_SHOCK, Feature.LEADING_EDGE));
    } else if (shape instanceof BodyShape.Freestream f) {
        // Mach waves have no single origin: they are searched over the whole picture
    }
    return out;
  }

  /** A shock on side {@code s} of a surface of direction {@code dir} turned by {@code defl} towards s. */
  static Search wallShock(Point2 o, double dir, double defl, Side s, WaveKind kind, Feature f) {
    int g = s.sign();
    return shock(o, dir + g * (defl + EPS), dir + g * NEAR_NORMAL, kind, s, f);
  }

  private static Search sideShock(Point2 o, double ax, Side s, WaveKind kind, Feature f) {
    int g = s.sign();
    return shock(o, ax + g * EPS, ax + g * NEAR_NORMAL, kind, s, f);
  }

  /**
   * A plate edge's fan on side {@code s}: every ray of it lies on that side of the plate's
   * direction (the tail leaves along the surface flow at its Mach angle), so the sector starts at
   * the surface; rays beyond it run under the plate into the other side's waves.
   */
  private static Search sideFan(Point2 o, double ax, Side s, Feature f) {
    int g = s.sign();
    return fan(o, ax + g * EPS, ax + g * NEAR_NORMAL, s, f);
  }

  /** The wall's direction pointing downstream. */
  static double wallDirection(BodyShape.Wall wall, double flow) {
    double d = ImageAngles.direction(wall.a(), wall.b());
    return Math.cos(d - flow) >= 0 ? d : ImageAngles.wrap(d + Math.PI);
  }

  /** The point {@code along} px along direction {@code ax} and {@code across} px to its left. */
  static Point2 offset(Point2 p, double ax, double along, double across) {
    return p.plus(ImageAngles.unit(ax).times(along)).plus(ImageAngles.unit(ax + 0.5 * Math.PI).times(across));
  }
}
