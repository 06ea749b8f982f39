package dev.wavemark.core.model;

import dev.wavemark.core.gas.Turn;
import dev.wavemark.core.gas.TurnKind;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.WavePattern.Element;
import dev.wavemark.core.model.WavePattern.Fan;
import dev.wavemark.core.model.WavePattern.Shock;
import dev.wavemark.core.model.WavePattern.State;
import java.util.ArrayList;
import java.util.List;
import org.jspecify.annotations.Nullable;

/** Shared state and steps of the per-shape pattern code: corner turns, ray clipping, intersections. */
final class PatternBuilder {
  /** Turns smaller than this (radians) make no wave. */
  static final double NO_TURN = 1e-9;

  final double gamma;
  final double flowDir;
  final int width;
  final int height;
  final State free;
  final List<Element> elements = new ArrayList<>();
  final List<List<Point2>> solids = new ArrayList<>();
  final List<String> notes = new ArrayList<>();
  String reflection = "none";

  PatternBuilder(double mach, double gamma, double flowDir, int width, int height) {
    this.gamma = gamma;
    this.flowDir = flowDir;
    this.width = width;
    this.height = height;
    this.free = new State(mach, flowDir, 1.0, 1.0);
  }

  /** A length that reaches well beyond the picture from any point in or near it. */
  double far() {
    return 4.0 * (width + height);
  }

  /** The result of turning a uniform flow at a corner: the wave (null for no turn) and the flow after it. */
  record Turned(@Nullable Element element, State after) {}

  /**
   * The wave made where a surface turns a uniform flow by {@code thetaRad} towards side
   * {@code sign} (+1 upper, -1 lower): theta &gt; 0 compresses (weak oblique shock), theta &lt; 0
   * expands (centred Prandtl-Meyer fan); the physics is {@link Turn#of}.
   */
  Turned turn(State before, Point2 at, int sign, double thetaRad, Feature feature, String where) {
    return turn(before, at, sign, thetaRad, feature, where, WaveKind.OBLIQUE_SHOCK);
  }

  /** As above, naming the kind a shock is given (an oblique, reflected or transmitted shock). */
  Turned turn(State before, Point2 at, int sign, double thetaRad, Feature feature, String where, WaveKind shockKind) {
    Side side = sign > 0 ? Side.UPPER : Side.LOWER;
    if (Math.abs(thetaRad) < NO_TURN) {
      return new Turned(null, before);
    }
    Turn t = Turn.of(before.mach(), thetaRad, gamma);
    double afterDir = ImageAngles.wrap(before.directionRad() + sign * thetaRad);
    State after = new State(t.machDownstream(), afterDir, before.density() * t.densityRatio(),
        before.pressure() * t.pressureRatio());
    if (t.kind() == TurnKind.SHOCK) {
      double dir = ImageAngles.wrap(before.directionRad() + sign * t.headAngleRad());
      ExpectedWave w = wave(shockKind, side, t.headAngleRad(), before.directionRad(), dir, at, feature, where + " shock");
      return new Turned(new Shock(w, before, after), after);
    }
    ExpectedWave head = wave(WaveKind.EXPANSION_HEAD, side, t.headAngleRad(), before.directionRad(),
        ImageAngles.wrap(before.directionRad() + sign * t.headAngleRad()), at, feature, where + " expansion head");
    ExpectedWave tail = wave(WaveKind.EXPANSION_TAIL, side, t.tailAngleRad(), afterDir,
        ImageAngles.wrap(afterDir + sign * t.tailAngleRad()), at, feature, where + " expansion tail");
    return new Turned(new Fan(head, tail, before, after, sign), after);
  }

  /** An expected wave from {@code start} along {@code dir}, ended at the picture's edge. */
  ExpectedWave wave(WaveKind kind, Side side, double angle, double localFlow, double dir, Point2 start, Feature f, String label) {
    return new ExpectedWave(kind, side, angle, localFlow, dir, start, edgeEnd(start, dir), f, label);
  }

  /** Where the ray from {@code p} along image direction {@code dir} leaves the picture (p itself if it never is inside). */
  Point2 edgeEnd(Point2 p, double dir) {
    Point2 u = ImageAngles.unit(dir);
    double[] t = slab(p, u);
    if (t == null || t[1] <= Math.max(0, t[0])) {
      return p;
    }
    return p.plus(u.times(t[1]));
  }

  /** The parameter interval [tIn, tOut] of the line p + t u inside the picture, or null. */
  double @Nullable [] slab(Point2 p, Point2 u) {
    double lo = -Double.MAX_VALUE;
    double hi = Double.MAX_VALUE;
    double[][] axes = {{p.x(), u.x(), -0.5, width - 0.5}, {p.y(), u.y(), -0.5, height - 0.5}};
    for (double[] a : axes) {
      if (Math.abs(a[1]) < 1e-15) {
        if (a[0] < a[2] || a[0] > a[3]) {
          return null;
        }
        continue;
      }
      double t1 = (a[2] - a[0]) / a[1];
      double t2 = (a[3] - a[0]) / a[1];
      lo = Math.max(lo, Math.min(t1, t2));
      hi = Math.min(hi, Math.max(t1, t2));
    }
    return lo <= hi ? new double[] {lo, hi} : null;
  }

  /** True when some part of the segment a-b lies inside the picture. */
  boolean visible(Point2 a, Point2 b) {
    double len = a.distanceTo(b);
    if (len < 1e-9) {
      return false;
    }
    double[] t = slab(a, b.minus(a).times(1 / len));
    return t != null && t[1] > Math.max(0, t[0]) && t[0] < len;
  }

  /**
   * The point where the segment of wave {@code w} crosses the line through {@code q} along
   * {@code dir} (both ways), or null if it does not within the segment.
   */
  static @Nullable Point2 crossing(ExpectedWave w, Point2 q, double dir) {
    Point2 p = w.startPx();
    Point2 d = w.endPx().minus(p);
    Point2 v = ImageAngles.unit(dir);
    double den = d.cross(v);
    if (Math.abs(den) < 1e-12) {
      return null;
    }
    double t = q.minus(p).cross(v) / den;
    return t > 1e-9 && t <= 1 ? p.plus(d.times(t)) : null;
  }

  /** Wave {@code w} ended where it first crosses the segment of wave {@code other}, if it does. */
  static ExpectedWave endAt(ExpectedWave w, ExpectedWave other) {
    Point2 x = crossing(w, other.startPx(), other.directionRad());
    if (x == null || crossing(other, w.startPx(), w.directionRad()) == null) {
      return w;
    }
    return withEnd(w, x);
  }

  /** Wave {@code w} ended where it crosses the infinite line through q along dir, if it does. */
  static ExpectedWave endAtLine(ExpectedWave w, Point2 q, double dir) {
    Point2 x = crossing(w, q, dir);
    return x == null ? w : withEnd(w, x);
  }

  static ExpectedWave withEnd(ExpectedWave w, Point2 end) {
    return new ExpectedWave(w.kind(), w.side(), w.angleToFlowRad(), w.localFlowDirectionRad(), w.directionRad(),
        w.startPx(), end, w.feature(), w.label());
  }

  /** Ends every wave of element {@code e} at its first crossing with wave {@code other}. */
  static Element endAt(Element e, ExpectedWave other) {
    if (e instanceof Shock s) {
      return new Shock(endAt(s.wave(), other), s.before(), s.after());
    }
    if (e instanceof Fan f) {
      return new Fan(endAt(f.head(), other), endAt(f.tail(), other), f.before(), f.after(), f.sideSign());
    }
    return e;
  }

  /** The first wave of an element (the shock, or a fan's head). */
  static ExpectedWave lead(Element e) {
    return e.waves().get(0);
  }

  /** A slip line's side as a pattern state, its direction measured from the freestream on side {@code sign}. */
  State state(dev.wavemark.core.gas.SlipLine.Side s, int sign) {
    return new State(s.mach(), ImageAngles.wrap(flowDir + sign * s.directionRad()), s.densityRatio(), s.pressureRatio());
  }

  /** Image direction of a direction given counter-clockwise from the freestream, mirrored when sign &lt; 0. */
  double dir(double fromFlowRad, int sign) {
    return ImageAngles.wrap(flowDir + sign * fromFlowRad);
  }

  /** Adds the element if not null. */
  void add(@Nullable Element e) {
    if (e != null) {
      elements.add(e);
    }
  }

  WavePattern.Solved build() {
    List<Element> kept = new ArrayList<>();
    for (Element e : elements) {
      boolean any = false;
      for (ExpectedWave w : e.waves()) {
        any |= visible(w.startPx(), w.endPx());
      }
      if (any) {
        kept.add(e);
      }
    }
    return new WavePattern.Solved(free, kept, solids, reflection, notes);
  }
}
