package dev.wavemark.core.model;

import dev.wavemark.core.gas.ReflectionVerdict;
import dev.wavemark.core.gas.ShockIntersection;
import dev.wavemark.core.gas.ShockReflection;
import dev.wavemark.core.gas.SlipLine;
import dev.wavemark.core.gas.TriplePoint;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.PatternBuilder.Turned;
import dev.wavemark.core.model.WavePattern.Element;
import dev.wavemark.core.model.WavePattern.Shock;
import dev.wavemark.core.model.WavePattern.State;
import org.jspecify.annotations.Nullable;

/**
 * Where waves meet walls and each other, placed in the picture with the solutions of
 * {@link ShockReflection}, {@link TriplePoint} and {@link ShockIntersection}. Directions from
 * those solutions are counter-clockwise from the freestream with the wall below; a wall above
 * mirrors them.
 */
final class Interactions {
  private Interactions() {}

  /**
   * The incident shock meets the wall at {@code hit}: a regular reflection when one exists
   * (including the dual-solution domain), otherwise a Mach reflection.
   */
  static void reflection(PatternBuilder b, Shock incident, Point2 hit, int wallSign, @Nullable Element shoulderFan,
      BodyShape.Wall wall, double thetaRad) {
    double m1 = incident.before().mach();
    ShockReflection.Judgement j = ShockReflection.judge(m1, thetaRad, b.gamma);
    if (j.verdict() == ReflectionVerdict.MACH) {
      mach(b, incident, hit, wallSign, shoulderFan, wall, thetaRad, j.detachmentDeflectionRad());
      return;
    }
    if (j.verdict() == ReflectionVerdict.DUAL_SOLUTION) {
      b.notes.add("the deflection lies in the dual-solution domain; the regular reflection is drawn");
    }
    ShockReflection.Regular rr = ShockReflection.regular(m1, thetaRad, b.gamma);
    Shock inc = new Shock(PatternBuilder.withEnd(incident.wave(), hit), incident.before(), incident.after());
    Turned refl = b.turn(inc.after(), hit, wallSign, rr.thetaRad(), Feature.IMPINGEMENT, "reflected", WaveKind.REFLECTED_SHOCK);
    b.add(inc);
    addWithFan(b, (Shock) refl.element(), shoulderFan);
    b.reflection = "regular";
  }

  private static void addWithFan(PatternBuilder b, Shock reflected, @Nullable Element shoulderFan) {
    ExpectedWave rw = reflected.wave();
    if (shoulderFan != null) {
      b.add(PatternBuilder.endAt(shoulderFan, rw));
      rw = PatternBuilder.endAt(rw, PatternBuilder.lead(shoulderFan));
    }
    b.add(new Shock(rw, reflected.before(), reflected.after()));
  }

  /**
   * A Mach reflection from the three-shock solution. The triple point's height is not fixed by
   * the local theory (it depends on the flow downstream); it is placed by an approximate rule,
   * and the stem is drawn straight.
   */
  private static void mach(PatternBuilder b, Shock incident, Point2 hit, int wallSign, @Nullable Element shoulderFan,
      BodyShape.Wall wall, double theta, double detachRad) {
    TriplePoint tp = ShockReflection.machReflection(incident.before().mach(), theta, b.gamma);
    Point2 along = ImageAngles.unit(incident.wave().directionRad());
    double depth = Math.abs(hit.minus(incident.wave().startPx()).dot(ImageAngles.unit(b.flowDir + 0.5 * Math.PI)));
    double stemHeight = depth * Math.min(0.3, 0.08 + 2.0 * (theta - detachRad));
    Point2 triple = hit.minus(along.times(stemHeight / Math.sin(tp.incidentAngleRad())));
    b.add(new Shock(PatternBuilder.withEnd(incident.wave(), triple), incident.before(), incident.after()));
    Side gasSide = wallSign > 0 ? Side.UPPER : Side.LOWER;
    SlipLine slip = tp.slipLine();
    State behindStem = b.state(slip.below(), wallSign);
    State behindReflected = b.state(slip.above(), wallSign);
    double stemDir = b.dir(tp.stemDirectionRad(), wallSign);
    ExpectedWave stem = b.wave(WaveKind.MACH_STEM, gasSide, tp.stemAngleToFlowRad(), b.flowDir, stemDir, triple,
        Feature.TRIPLE_POINT, "Mach stem");
    stem = PatternBuilder.withEnd(stem, WallFlows.lineHit(stem, wall));
    b.add(new Shock(stem, incident.before(), behindStem));
    ExpectedWave rw = b.wave(WaveKind.REFLECTED_SHOCK, gasSide, tp.reflectedAngleToFlowRad(), incident.after().directionRad(),
        b.dir(tp.reflectedDirectionRad(), wallSign), triple, Feature.TRIPLE_POINT, "reflected shock");
    addWithFan(b, new Shock(rw, incident.after(), behindReflected), shoulderFan);
    ExpectedWave sw = b.wave(WaveKind.SLIP_LINE, gasSide, 0.0, b.dir(slip.directionRad(), wallSign),
        b.dir(slip.directionRad(), wallSign), triple, Feature.TRIPLE_POINT, "slip line");
    sw = PatternBuilder.endAtLine(sw, wall.a(), ImageAngles.direction(wall.a(), wall.b()));
    b.add(new WavePattern.Slip(sw, wallSign > 0 ? behindReflected : behindStem, wallSign > 0 ? behindStem : behindReflected));
    b.reflection = "mach";
    b.notes.add("Mach reflection: the triple-point height (the stem is " + WavemarkNum.px(stemHeight)
        + " px tall) follows an approximate rule, not the local theory; the Mach stem and the slip line are drawn straight "
        + "(in a tunnel the stem bows slightly and the slip line curves towards the wall)");
  }

  /** Two shocks of the same family (double ramp) merge; a reflected wave and a slip line leave the meeting point. */
  static void sameFamily(PatternBuilder b, Shock first, Shock second, int sign, double theta1, double theta2, Point2 secondCorner) {
    ExpectedWave a = first.wave();
    ExpectedWave c = second.wave();
    Point2 x = PatternBuilder.crossing(a, c.startPx(), c.directionRad());
    if (x == null || PatternBuilder.crossing(c, a.startPx(), a.directionRad()) == null) {
      b.add(first);
      b.add(second);
      b.notes.add("the ramp shocks merge outside the picture");
      return;
    }
    ShockIntersection.SameFamily sf = ShockIntersection.sameFamily(first.before().mach(), theta1, theta2, b.gamma);
    b.add(new Shock(PatternBuilder.withEnd(a, x), first.before(), first.after()));
    b.add(new Shock(PatternBuilder.withEnd(c, x), second.before(), second.after()));
    Side side = sign > 0 ? Side.UPPER : Side.LOWER;
    SlipLine slip = sf.slipLine();
    State merged = b.state(slip.above(), sign);
    ExpectedWave mw = b.wave(WaveKind.OBLIQUE_SHOCK, side, sf.merged().headAngleRad(), b.flowDir,
        b.dir(sf.mergedDirectionRad(), sign), x, Feature.INTERSECTION, "merged shock");
    b.add(new Shock(mw, b.free, merged));
    Turned refl = b.turn(second.after(), x, -sign, sf.reflected().compressionRad(), Feature.INTERSECTION,
        "reflected", WaveKind.REFLECTED_SHOCK);
    Element re = refl.element();
    if (re != null) {
      double rampDir = b.dir(theta1 + theta2, sign);
      b.add(endAtLine(re, secondCorner, rampDir));
    }
    ExpectedWave sw = b.wave(WaveKind.SLIP_LINE, side, 0.0, b.dir(slip.directionRad(), sign), b.dir(slip.directionRad(), sign),
        x, Feature.INTERSECTION, "slip line");
    State below = b.state(slip.below(), sign);
    b.add(new WavePattern.Slip(sw, sign > 0 ? merged : below, sign > 0 ? below : merged));
    b.notes.add("double ramp: the reflected wave is ended where it reaches the ramp; its further reflection is not drawn");
  }

  private static Element endAtLine(Element e, Point2 q, double dir) {
    if (e instanceof Shock s) {
      return new Shock(PatternBuilder.endAtLine(s.wave(), q, dir), s.before(), s.after());
    }
    WavePattern.Fan f = (WavePattern.Fan) e;
    return new WavePattern.Fan(PatternBuilder.endAtLine(f.head(), q, dir), PatternBuilder.endAtLine(f.tail(), q, dir),
        f.before(), f.after(), f.sideSign());
  }

  /** Two shocks of opposite families (twin generators) cross and go on as transmitted waves, with a slip line. */
  static void opposite(PatternBuilder b, Shock upper, Shock lower, double thetaUpper, double thetaLower) {
    ExpectedWave a = upper.wave();
    ExpectedWave c = lower.wave();
    Point2 x = PatternBuilder.crossing(a, c.startPx(), c.directionRad());
    if (x == null || PatternBuilder.crossing(c, a.startPx(), a.directionRad()) == null) {
      b.add(upper);
      b.add(lower);
      b.notes.add("the generator shocks cross outside the picture");
      return;
    }
    ShockIntersection.Opposite o = ShockIntersection.opposite(b.free.mach(), thetaUpper, thetaLower, b.gamma);
    b.add(new Shock(PatternBuilder.withEnd(a, x), upper.before(), upper.after()));
    b.add(new Shock(PatternBuilder.withEnd(c, x), lower.before(), lower.after()));
    Turned up = b.turn(upper.after(), x, +1, o.upperTransmitted().compressionRad(), Feature.INTERSECTION,
        "upper transmitted", WaveKind.TRANSMITTED_SHOCK);
    Turned lo = b.turn(lower.after(), x, -1, o.lowerTransmitted().compressionRad(), Feature.INTERSECTION,
        "lower transmitted", WaveKind.TRANSMITTED_SHOCK);
    b.add(up.element());
    b.add(lo.element());
    SlipLine slip = o.slipLine();
    ExpectedWave sw = b.wave(WaveKind.SLIP_LINE, Side.UPPER, 0.0, b.dir(slip.directionRad(), 1), b.dir(slip.directionRad(), 1),
        x, Feature.INTERSECTION, "slip line");
    b.add(new WavePattern.Slip(sw, b.state(slip.above(), 1), b.state(slip.below(), 1)));
  }

  /** Number formatting for notes. */
  private static final class WavemarkNum {
    static String px(double v) {
      return dev.wavemark.core.WavemarkException.num(Math.round(v * 10) / 10.0);
    }
  }
}
