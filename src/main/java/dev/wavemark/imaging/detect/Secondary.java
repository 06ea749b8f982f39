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
 * Waves that start where other waves end: a reflected shock at the wall impingement point (or,
 * when the incident shock stops short of the wall, a Mach stem and a reflected shock at the
 * triple point), transmitted shocks where two shocks cross, the merged shock of a double ramp.
 * Their origins come from the primary waves already measured, not from a Mach number.
 */
final class Secondary {
  private Secondary() {}

  private static final double EPS = Math.toRadians(0.7);
  private static final double NEAR_NORMAL = Math.toRadians(87);
  /** An incident shock ending this far before the wall ends at a triple point, px. */
  static final double TRIPLE_POINT_GAP_PX = 25;

  static List<Search> searches(BodyShape shape, List<WaveDetector.Found> found, WaveDetector.Context ctx) {
    List<Search> out = new ArrayList<>();
    // the other shapes make no waves from secondary points
    if (shape instanceof BodyShape.ShockGenerator g) {
        WaveDetector.Found inc = first(found, Feature.LEADING_EDGE);
        if (inc == null) {
          return out;
        }
        double w = Search.wallDirection(g.wall(), ctx.flow());
        Side away = g.wall().solidSide().opposite();
        Point2 hit = intersect(inc.m().distortedFit(), g.wall().a(), ImageAngles.unit(w));
        if (hit == null || !ctx.full().inFlowOrNear(hit.x(), hit.y(), 20)) {
          return out;
        }
        LineFit.Result f = inc.m().distortedFit();
        Point2 end = new Point2(f.cx() + f.endAlong() * f.ux(), f.cy() + f.endAlong() * f.uy());
        if (end.distanceTo(hit) > TRIPLE_POINT_GAP_PX) {
          int g2 = g.wall().solidSide().sign();
          double toWall = w + g2 * 0.5 * Math.PI;
          out.add(Search.shock(end, toWall - Math.toRadians(25), toWall + Math.toRadians(25), WaveKind.MACH_STEM,
              g.wall().solidSide(), Feature.TRIPLE_POINT));
          out.add(Search.wallShock(end, w, 0, away, WaveKind.REFLECTED_SHOCK, Feature.TRIPLE_POINT));
        } else {
          out.add(Search.shock(hit, w + away.sign() * EPS, w + away.sign() * NEAR_NORMAL, WaveKind.REFLECTED_SHOCK, away,
              Feature.IMPINGEMENT));
        }
    } else if (shape instanceof BodyShape.TwinGenerators t) {
        Point2 x = crossing(found, Feature.LEADING_EDGE, Feature.LEADING_EDGE, ctx);
        if (x != null) {
          out.add(Search.shock(x, ctx.flow() + EPS, ctx.flow() + NEAR_NORMAL, WaveKind.TRANSMITTED_SHOCK, Side.UPPER, Feature.INTERSECTION));
          out.add(Search.shock(x, ctx.flow() - NEAR_NORMAL, ctx.flow() - EPS, WaveKind.TRANSMITTED_SHOCK, Side.LOWER, Feature.INTERSECTION));
        }
    } else if (shape instanceof BodyShape.DoubleRamp r) {
        Point2 x = crossing(found, Feature.CORNER, Feature.SECOND_CORNER, ctx);
        if (x != null) {
          double w = Search.wallDirection(r.wall(), ctx.flow());
          Side s = r.wall().solidSide().opposite();
          out.add(Search.wallShock(x, w, r.deflectionRad() + r.secondDeflectionRad(), s, WaveKind.OBLIQUE_SHOCK, Feature.INTERSECTION));
        }
    }
    return out;
  }

  private static WaveDetector.Found first(List<WaveDetector.Found> found, Feature f) {
    for (WaveDetector.Found x : found) {
      if (x.feature() == f && x.kind().isShock()) {
        return x;
      }
    }
    return null;
  }

  /** Where the first two shocks of the given features cross, if inside the picture. */
  private static Point2 crossing(List<WaveDetector.Found> found, Feature fa, Feature fb, WaveDetector.Context ctx) {
    WaveDetector.Found a = null;
    WaveDetector.Found b = null;
    for (WaveDetector.Found x : found) {
      if (!x.kind().isShock()) {
        continue;
      }
      if (a == null && x.feature() == fa) {
        a = x;
      } else if (b == null && x.feature() == fb && x != a) {
        b = x;
      }
    }
    if (a == null || b == null) {
      return null;
    }
    LineFit.Result lb = b.m().distortedFit();
    Point2 p = intersect(a.m().distortedFit(), new Point2(lb.cx(), lb.cy()), new Point2(lb.ux(), lb.uy()));
    if (p == null || !ctx.full().inFlowOrNear(p.x(), p.y(), 5)) {
      return null;
    }
    return p;
  }

  /** Intersection of a fitted line with the line through p along unit u (image vectors). */
  static Point2 intersect(LineFit.Result f, Point2 p, Point2 u) {
    double det = f.ux() * u.y() - f.uy() * u.x();
    if (Math.abs(det) < 1e-9) {
      return null;
    }
    double dx = p.x() - f.cx();
    double dy = p.y() - f.cy();
    double t = (dx * u.y() - dy * u.x()) / det;
    return new Point2(f.cx() + t * f.ux(), f.cy() + t * f.uy());
  }
}
