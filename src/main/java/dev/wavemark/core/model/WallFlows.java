package dev.wavemark.core.model;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.PatternBuilder.Turned;
import dev.wavemark.core.model.WavePattern.Element;
import dev.wavemark.core.model.WavePattern.Shock;
import dev.wavemark.core.model.WavePattern.State;
import java.util.ArrayList;
import java.util.List;

/**
 * Flows along a wall: compression and expansion corners, the double ramp, the shock generator
 * with its reflection, twin generators and the free stream's Mach waves. The wall is taken as
 * parallel to the freestream; its points only place it in the picture.
 */
final class WallFlows {
  private WallFlows() {}

  /** +1 when the flow lies above the wall on screen (solid below), -1 otherwise. */
  static int flowSign(BodyShape.Wall wall) {
    return wall.solidSide() == Side.LOWER ? +1 : -1;
  }

  /** The solid below (or above) the wall up to {@code corner}, then along {@code afterDir}. */
  static List<Point2> wallSolid(PatternBuilder b, BodyShape.Wall wall, Point2 corner, List<Point2> turns, double afterDir) {
    int sign = flowSign(wall);
    Point2 u = ImageAngles.unit(b.flowDir);
    Point2 intoSolid = ImageAngles.unit(b.flowDir + 0.5 * Math.PI).times(-sign * b.far());
    Point2 upstream = corner.minus(u.times(b.far()));
    Point2 last = turns.isEmpty() ? corner : turns.get(turns.size() - 1);
    Point2 end = last.plus(ImageAngles.unit(afterDir).times(b.far()));
    List<Point2> poly = new ArrayList<>();
    poly.add(upstream);
    poly.add(corner);
    poly.addAll(turns);
    poly.add(end);
    poly.add(end.plus(intoSolid));
    poly.add(upstream.plus(intoSolid));
    return poly;
  }

  /** The corner projected onto the wall line (the contract places the corner on the wall). */
  static Point2 onWall(BodyShape.Wall wall, Point2 p) {
    Point2 d = wall.b().minus(wall.a()).unit();
    return wall.a().plus(d.times(p.minus(wall.a()).dot(d)));
  }

  static void ramp(PatternBuilder b, BodyShape.Ramp r) {
    int sign = flowSign(r.wall());
    Turned t = b.turn(b.free, r.cornerPx(), sign, r.deflectionRad(), Feature.CORNER, "ramp");
    b.add(t.element());
    b.solids.add(wallSolid(b, r.wall(), r.cornerPx(), List.of(), b.flowDir + sign * r.deflectionRad()));
  }

  static void expansionCorner(PatternBuilder b, BodyShape.ExpansionCorner e) {
    int sign = flowSign(e.wall());
    Turned t = b.turn(b.free, e.cornerPx(), sign, -e.deflectionRad(), Feature.CORNER, "corner");
    b.add(t.element());
    b.solids.add(wallSolid(b, e.wall(), e.cornerPx(), List.of(), b.flowDir - sign * e.deflectionRad()));
  }

  static void doubleRamp(PatternBuilder b, BodyShape.DoubleRamp d) {
    int sign = flowSign(d.wall());
    Turned first = b.turn(b.free, d.cornerPx(), sign, d.deflectionRad(), Feature.CORNER, "first ramp");
    Turned second = b.turn(first.after(), d.secondCornerPx(), sign, d.secondDeflectionRad(), Feature.SECOND_CORNER, "second ramp");
    b.solids.add(wallSolid(b, d.wall(), d.cornerPx(), List.of(d.secondCornerPx()),
        b.flowDir + sign * (d.deflectionRad() + d.secondDeflectionRad())));
    Interactions.sameFamily(b, (Shock) first.element(), (Shock) second.element(), sign, d.deflectionRad(),
        d.secondDeflectionRad(), d.secondCornerPx());
  }

  static void shockGenerator(PatternBuilder b, BodyShape.ShockGenerator g) {
    int wallSign = flowSign(g.wall());
    int genSign = -wallSign;
    Point2 le = g.leadingEdgePx();
    double theta = g.deflectionRad();
    Turned inc = b.turn(b.free, le, genSign, theta, Feature.LEADING_EDGE, "incident");
    Shock incident = (Shock) inc.element();
    Point2 wallDir = g.wall().b().minus(g.wall().a()).unit();
    Point2 hit = PatternBuilder.crossing(incident.wave(), g.wall().a(), ImageAngles.direction(wallDir.x(), wallDir.y()));
    if (hit == null) {
      hit = lineHit(incident.wave(), g.wall());
    }
    double depth = Math.abs(hit.minus(le).dot(ImageAngles.unit(b.flowDir + 0.5 * Math.PI)));
    double reach = hit.minus(le).dot(ImageAngles.unit(b.flowDir));
    // The generator: a wedge plate with a flat back, long enough to look like one, short enough
    // that its shoulder fan reaches the wall behind the impingement point.
    double mu2 = MachAngle.of(inc.after().mach());
    double slope = Math.tan(theta + mu2);
    double need = (1.6 * reach - depth / slope) / (Math.cos(theta) - Math.sin(theta) / slope);
    double len = Math.max(0.3 * reach, Math.min(0.95 * reach, need));
    Point2 shoulder = le.plus(ImageAngles.unit(b.flowDir + genSign * theta).times(len));
    Point2 base = le.plus(ImageAngles.unit(b.flowDir).times(len * Math.cos(theta)));
    b.solids.add(List.of(le, shoulder, base));
    b.solids.add(wallSolid(b, g.wall(), onWall(g.wall(), hit), List.of(), b.flowDir));
    Turned fan = b.turn(inc.after(), shoulder, genSign, -theta, Feature.SHOULDER, "generator shoulder");
    b.notes.add("the generator's base wake is not modelled; the shoulder fan is ended where it meets the reflected shock");
    Interactions.reflection(b, incident, hit, wallSign, fan.element(), g.wall(), theta);
  }

  /** The crossing of a wave's infinite line with the wall line, or a geometry error. */
  static Point2 lineHit(ExpectedWave w, BodyShape.Wall wall) {
    Point2 u = ImageAngles.unit(w.directionRad());
    Point2 d = wall.b().minus(wall.a());
    double den = u.cross(d);
    double t = Math.abs(den) < 1e-12 ? -1 : wall.a().minus(w.startPx()).cross(d) / den;
    if (!(t > 0)) {
      throw new WavemarkException(Problem.GEOMETRY_IMPOSSIBLE,
          "the " + w.label() + " from (" + WavemarkException.num(w.startPx().x()) + ", " + WavemarkException.num(w.startPx().y())
              + ") never meets the wall; put the wall on the side the shock runs to");
    }
    return w.startPx().plus(u.times(t));
  }

  static void twinGenerators(PatternBuilder b, BodyShape.TwinGenerators t) {
    Turned up = b.turn(b.free, t.upperLeadingEdgePx(), -1, t.upperDeflectionRad(), Feature.LEADING_EDGE, "upper generator");
    Turned lo = b.turn(b.free, t.lowerLeadingEdgePx(), +1, t.lowerDeflectionRad(), Feature.LEADING_EDGE, "lower generator");
    Point2 u = ImageAngles.unit(b.flowDir);
    double far = b.far();
    Point2 ule = t.upperLeadingEdgePx();
    Point2 lle = t.lowerLeadingEdgePx();
    b.solids.add(List.of(ule, ule.plus(ImageAngles.unit(b.flowDir - t.upperDeflectionRad()).times(far)),
        ule.plus(u.times(far)).plus(ImageAngles.unit(b.flowDir + 0.5 * Math.PI).times(far))));
    b.solids.add(List.of(lle, lle.plus(ImageAngles.unit(b.flowDir + t.lowerDeflectionRad()).times(far)),
        lle.plus(u.times(far)).minus(ImageAngles.unit(b.flowDir + 0.5 * Math.PI).times(far))));
    Interactions.opposite(b, (Shock) up.element(), (Shock) lo.element(), t.upperDeflectionRad(), t.lowerDeflectionRad());
  }

  /** Weak waves from small wall disturbances: Mach lines at the freestream Mach angle. */
  static void freestream(PatternBuilder b, BodyShape.Freestream f) {
    double mu = MachAngle.of(b.free.mach());
    // A 0.1-degree disturbance gives a density change of a few tenths of a per cent: visible, weak.
    double tiny = Math.toRadians(0.1);
    double rhoJump = ObliqueShock.fromDeflection(b.free.mach(), tiny, dev.wavemark.core.gas.ShockBranch.WEAK, b.gamma).densityRatio() - 1;
    double[] stations = {0.12, 0.31, 0.47, 0.66};
    int k = 0;
    if (f.wall().isPresent()) {
      BodyShape.Wall wall = f.wall().get();
      int sign = flowSign(wall);
      Point2 a = onWall(wall, new Point2(0, 0));
      Point2 u = ImageAngles.unit(b.flowDir);
      double span = b.width / Math.max(0.2, Math.abs(u.x()));
      for (double s : stations) {
        Point2 p = a.plus(u.times(s * span));
        machWave(b, p, sign, mu, (k++ % 2 == 0 ? 1 : -1) * rhoJump, "wall Mach wave " + k);
      }
      b.solids.add(wallSolid(b, wall, a.plus(u.times(span)), List.of(), b.flowDir));
      return;
    }
    for (int sign : new int[] {+1, -1}) {
      for (double s : stations) {
        double x = (s + (sign > 0 ? 0.0 : 0.09)) * b.width;
        Point2 p = new Point2(x, sign > 0 ? b.height - 0.5 : -0.5);
        machWave(b, p, sign, mu, (k++ % 2 == 0 ? 1 : -1) * rhoJump, (sign > 0 ? "lower" : "upper") + " wall Mach wave " + k);
      }
    }
  }

  private static void machWave(PatternBuilder b, Point2 p, int sign, double mu, double jump, String label) {
    State before = b.free;
    State after = new State(before.mach(), before.directionRad(), 1 + jump, 1 + b.gamma * jump);
    ExpectedWave w = b.wave(WaveKind.MACH_WAVE, sign > 0 ? Side.UPPER : Side.LOWER, mu, b.flowDir,
        ImageAngles.wrap(b.flowDir + sign * mu), p, Feature.WALL, label);
    b.add(new Shock(w, before, after));
  }

  /** Ends the element's waves at a wave's segment; a convenience for the interaction code. */
  static Element endAt(Element e, ExpectedWave other) {
    return PatternBuilder.endAt(e, other);
  }
}
