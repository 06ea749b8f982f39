package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Waves that start where other waves end: a reflected shock at the wall impingement point (or,
 * when the incident shock stops short of the wall, a Mach stem and a reflected shock at the
 * triple point), transmitted shocks where two shocks cross, the merged shock and the reflected
 * wave of a double ramp, and the slip lines that leave a triple point, a crossing, a double
 * ramp's meeting point or a sharp trailing edge. Their origins come from the primary waves
 * already measured, not from a Mach number; the theory waves (hints), when given, only narrow
 * the directions searched.
 */
final class Secondary {
  private Secondary() {}

  private static final double EPS = Math.toRadians(0.7);
  private static final double NEAR_NORMAL = Math.toRadians(87);
  /**
   * An incident shock can end at a triple point only when its fitted segment stops at least this
   * far before the wall, px (and its contrast does not go on towards the wall, see
   * {@link #continuesTo}).
   */
  static final double TRIPLE_POINT_GAP_PX = 25;

  /** The secondary waves of a frame, measured. */
  static List<WaveDetector.Found> find(BodyShape shape, List<WaveDetector.Found> found, WaveDetector.Context ctx,
      List<ExpectedWave> hints) {
    if (shape instanceof BodyShape.ShockGenerator g) {
      return reflection(g, found, ctx, hints);
    }
    List<WaveDetector.Found> out = new ArrayList<>();
    for (Search s : searches(shape, found, ctx)) {
      out.addAll(WaveDetector.run(ctx, s));
    }
    if (shape instanceof BodyShape.DoubleRamp r) {
      out.addAll(rampReflection(r, found, ctx, hints));
    }
    List<WaveDetector.Found> all = new ArrayList<>(found);
    all.addAll(out);
    slipSearch(shape, all, ctx).ifPresent(s -> slipLine(ctx, s, all, hints).ifPresent(out::add));
    return out;
  }

  /**
   * The waves where a generator's incident shock meets the wall: a reflected shock from the
   * impingement point when the incident shock reaches the wall, else a Mach stem and a reflected
   * shock from where it stops (the triple point).
   */
  static List<WaveDetector.Found> reflection(BodyShape.ShockGenerator g, List<WaveDetector.Found> found, WaveDetector.Context ctx,
      List<ExpectedWave> hints) {
    List<WaveDetector.Found> out = new ArrayList<>();
    WaveDetector.Found inc = first(found, Feature.LEADING_EDGE);
    if (inc == null) {
      return out;
    }
    double w = Search.wallDirection(g.wall(), ctx.flow());
    Side away = g.wall().solidSide().opposite();
    LineFit.Result f = inc.m().distortedFit();
    Point2 hit = intersect(f, g.wall().a(), ImageAngles.unit(w));
    if (hit == null || !ctx.full().inFlowOrNear(hit.x(), hit.y(), 20)) {
      return out;
    }
    Point2 end = nearerEnd(f, hit);
    if (end.distanceTo(hit) > TRIPLE_POINT_GAP_PX && !continuesTo(ctx, inc, end, hit)) {
      Point2 tp = end;
      stem(ctx, tp, w, g.wall().solidSide(), g.wall().a()).ifPresent(out::add);
      Search r = Search.wallShock(tp, w, 0, away, WaveKind.REFLECTED_SHOCK, Feature.TRIPLE_POINT);
      shortShock(ctx, r).ifPresent(out::add);
      List<WaveDetector.Found> all = new ArrayList<>(found);
      all.addAll(out);
      // the slip line leaves the triple point downstream, close to the wall's direction
      slipLine(ctx, new SlipSearch(tp, w, away, Feature.TRIPLE_POINT), all, hints).ifPresent(out::add);
    } else {
      Search r = Search.shock(hit, w + away.sign() * EPS, w + away.sign() * NEAR_NORMAL, WaveKind.REFLECTED_SHOCK, away,
          Feature.IMPINGEMENT);
      shortShock(ctx, r).ifPresent(out::add);
    }
    Point2 shoulder = shoulder(g, ctx);
    if (shoulder != null) {
      List<WaveDetector.Found> all = new ArrayList<>(found);
      all.addAll(out);
      Side towards = g.wall().solidSide();
      int s = towards.sign();
      Search fan = Search.fan(shoulder, w + s * EPS, w + s * (g.deflectionRad() + NEAR_NORMAL), towards, Feature.SHOULDER);
      out.addAll(WaveDetector.run(ctx, WaveDetector.narrow(fan, hints), null, WaveDetector.shockBands(all, ctx.shadow())));
    }
    return out;
  }

  /** How far into the silhouette, beyond the flow region's eroded edge, the shoulder walk looks, px. */
  static final double SHOULDER_PROBE_PX = 3;

  /**
   * A generator's shoulder, from its silhouette: the shape gives the leading edge and the
   * deflection but not the length of the deflecting surface (a generator is made as long as the
   * tunnel needs). Walks along the surface from the leading edge a few pixels inside the solid
   * until the flow region starts again, behind the flat back, and corrects that point for the
   * probe's offset and the erosion (the back taken square to the flow). Null when the flow
   * region does not show the generator as solid there, or the picture ends first.
   */
  static @org.jspecify.annotations.Nullable Point2 shoulder(BodyShape.ShockGenerator g, WaveDetector.Context ctx) {
    Raster full = ctx.full();
    // the surface is turned by the deflection from the flow (not from the wall) towards the wall
    double surface = ctx.flow() + g.wall().solidSide().sign() * g.deflectionRad();
    int s = g.wall().solidSide().sign();
    Point2 u = ImageAngles.unit(surface);
    // into the generator: away from the wall, square to the surface
    Point2 n = ImageAngles.unit(surface - s * 0.5 * Math.PI);
    Point2 f = ImageAngles.unit(ctx.flow());
    double d = WaveDetector.EDGE_MARGIN_PX + SHOULDER_PROBE_PX;
    Point2 le = g.leadingEdgePx();
    double limit = Math.hypot(full.width, full.height);
    int solid = 0;
    int open = 0;
    for (double t = 2 * d; t < limit; t += 0.5) {
      Point2 p = le.plus(u.times(t)).plus(n.times(d));
      int x = (int) Math.round(p.x());
      int y = (int) Math.round(p.y());
      if (x < 0 || y < 0 || x >= full.width || y >= full.height) {
        return null;
      }
      if (!full.flow[y * full.width + x]) {
        solid++;
        open = 0;
      } else if (solid < 20) {
        // still ahead of the body's thickness reaching the probe (or a speck of the mask)
        solid = 0;
      } else if (++open >= 8) {
        double exit = t - 0.5 * (open - 1);
        double len = exit + (d * n.dot(f) - WaveDetector.EDGE_MARGIN_PX) / u.dot(f);
        return le.plus(u.times(len));
      }
    }
    return null;
  }

  static List<Search> searches(BodyShape shape, List<WaveDetector.Found> found, WaveDetector.Context ctx) {
    List<Search> out = new ArrayList<>();
    // the other shapes make no waves from secondary points; a generator's are found by reflection()
    if (shape instanceof BodyShape.ShockGenerator) {
      return out;
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

  /**
   * A slip line's search: where it starts, the direction geometry alone expects (the flow's
   * direction there, without a Mach number), its side and feature.
   */
  record SlipSearch(Point2 origin, double guessRad, Side side, Feature feature) {}

  /**
   * Half-width of the sector searched for a slip line around its predicted (or geometric)
   * direction: several times the few tenths of a degree the theory can be off by, so that the
   * line measured is the picture's, not the hint's, and narrow enough to leave the shocks from
   * the same point (at least about 20 degrees away) out.
   */
  static final double SLIP_WINDOW_RAD = Math.toRadians(7);
  /** The slip-line sector stays this far from the direction of a shock measured from the same point. */
  static final double SLIP_CLEAR_RAD = Math.toRadians(4);
  /** The slip line's profiles start at most this far from its meeting point, px. */
  static final double SLIP_MAX_SKIP_PX = 60;
  /** Hints this close to the searched origin describe the same meeting point, px. */
  static final double HINT_ORIGIN_PX = 40;
  /**
   * A slip line is kept only when its mean profile stands this many standard errors above the
   * noise (the frame noise over the square root of the profiles averaged): a slip line is a
   * weak line, several times fainter than the shocks beside it, and noise or a neighbour's tail
   * must not pass for one.
   */
  static final double SLIP_MIN_SNR = 12;

  /** The slip-line search of a shape with no triple point (handled by {@link #reflection}), if it makes one. */
  static Optional<SlipSearch> slipSearch(BodyShape shape, List<WaveDetector.Found> found, WaveDetector.Context ctx) {
    if (shape instanceof BodyShape.DoubleRamp r) {
      Point2 x = crossing(found, Feature.CORNER, Feature.SECOND_CORNER, ctx);
      if (x == null) {
        return Optional.empty();
      }
      Side s = r.wall().solidSide().opposite();
      double w = Search.wallDirection(r.wall(), ctx.flow());
      // the slip line leaves the meeting point along the flow behind the second shock
      return Optional.of(new SlipSearch(x, w + s.sign() * (r.deflectionRad() + r.secondDeflectionRad()), s, Feature.INTERSECTION));
    } else if (shape instanceof BodyShape.TwinGenerators t) {
      Point2 x = crossing(found, Feature.LEADING_EDGE, Feature.LEADING_EDGE, ctx);
      if (x == null) {
        return Optional.empty();
      }
      // each generator turns the flow towards the other: the streams meet near the mean of the two turns
      double guess = ctx.flow() + 0.5 * (t.lowerDeflectionRad() - t.upperDeflectionRad());
      return Optional.of(new SlipSearch(x, guess, Side.UPPER, Feature.INTERSECTION));
    } else if (shape instanceof BodyShape.Diamond d) {
      double ax = ctx.flow() - d.incidenceRad();
      return Optional.of(new SlipSearch(Search.offset(d.leadingEdgePx(), ax, d.chordPx(), 0), ctx.flow(), Side.UPPER,
          Feature.TRAILING_EDGE));
    } else if (shape instanceof BodyShape.FlatPlate p) {
      double ax = ctx.flow() - p.incidenceRad();
      return Optional.of(new SlipSearch(Search.offset(p.leadingEdgePx(), ax, p.chordPx(), 0), ctx.flow(), Side.UPPER,
          Feature.TRAILING_EDGE));
    }
    return Optional.empty();
  }

  /**
   * The slip line from a meeting point: the strongest thin line of the pencil within
   * {@link #SLIP_WINDOW_RAD} of the predicted direction (the theory's slip line of the same
   * feature from about the same point when hinted, else the geometric guess), kept clear of the
   * shocks already measured from that point, measured like a short shock, and kept only when its
   * contrast stands {@link #SLIP_MIN_SNR} standard errors above the noise.
   */
  static Optional<WaveDetector.Found> slipLine(WaveDetector.Context ctx, SlipSearch s, List<WaveDetector.Found> found,
      List<ExpectedWave> hints) {
    double centre = s.guessRad();
    for (ExpectedWave h : hints) {
      if (h.kind() == WaveKind.SLIP_LINE && h.feature() == s.feature() && h.startPx().distanceTo(s.origin()) < HINT_ORIGIN_PX) {
        centre = s.guessRad() + ImageAngles.wrap(h.directionRad() - s.guessRad());
      }
    }
    double a0 = centre - SLIP_WINDOW_RAD;
    double a1 = centre + SLIP_WINDOW_RAD;
    // the nearest shock from the same point, as an angle from the slip line's expected direction
    double nearest = 0.5 * Math.PI;
    for (WaveDetector.Found f : found) {
      if (!f.kind().isShock() || f.origin().distanceTo(s.origin()) > HINT_ORIGIN_PX) {
        continue;
      }
      LineFit.Result l = f.m().distortedFit();
      double d = ImageAngles.direction(l.ux(), l.uy());
      // the shock's direction pointing away from the meeting point
      Point2 mid = new Point2(l.cx(), l.cy());
      if (mid.minus(s.origin()).dot(ImageAngles.unit(d)) < 0) {
        d += Math.PI;
      }
      double rel = ImageAngles.wrap(d - centre);
      nearest = Math.min(nearest, Math.abs(rel));
      if (rel >= 0 && rel - SLIP_CLEAR_RAD < a1 - centre) {
        a1 = centre + Math.max(0, rel - SLIP_CLEAR_RAD);
      } else if (rel < 0 && rel + SLIP_CLEAR_RAD > a0 - centre) {
        a0 = centre + Math.min(0, rel + SLIP_CLEAR_RAD);
      }
    }
    if (a1 - a0 < Math.toRadians(2)) {
      return Optional.empty();
    }
    double rMax = Math.hypot(ctx.full().width, ctx.full().height);
    // the profiles start where the nearest shock from the point lies a profile window away, so
    // that neither the pencil nor the measured centres (nor where the line is taken to end) mix
    // the faint slip line with the strong shock beside it
    double window = ctx.shadow() ? WaveDetector.SHADOW_WINDOW_PX : WaveDetector.SHOCK_WINDOW_PX;
    double s0 = Math.min(SLIP_MAX_SKIP_PX, Math.max(SHORT_SKIP_PX, (window + 2) / Math.sin(Math.max(nearest, Math.toRadians(5)))));
    AngularScan scan = AngularScan.of(ctx.low(), s.origin().x(), s.origin().y(), a0, a1, s0, rMax);
    AngularScan.Hit h = scan.strongestLine(WaveDetector.MIN_CANDIDATE_SNR, Math.toRadians(3) / scan.step, false);
    if (h == null) {
      return Optional.empty();
    }
    int i = (int) Math.max(0, Math.min(scan.reach.length - 1, Math.round(h.index())));
    double a = scan.angle(h.index());
    Measure.Candidate c = new Measure.Candidate(scan.ox, scan.oy, Math.cos(a), -Math.sin(a), s0, scan.reach[i] - 2);
    Optional<WaveDetector.Found> f = measureShort(ctx, c, WaveKind.SLIP_LINE, s.side(), s.feature(), s.origin());
    double lo = a0;
    double hi = a1;
    double near = s.feature() == Feature.TRIPLE_POINT ? SLIP_TRIPLE_POINT_PX : SLIP_ORIGIN_PX;
    return f.filter(x -> standsOut(ctx, x) && passesNear(x, s.origin(), near) && within(x, lo, hi));
  }

  /** Whether a measured line's contrast stands {@link #SLIP_MIN_SNR} standard errors above the frame noise. */
  private static boolean standsOut(WaveDetector.Context ctx, WaveDetector.Found x) {
    double se = ctx.noise() / Math.sqrt(Math.max(1, x.m().distortedFit().length() / Measure.NORMAL_STEP_PX));
    return Math.abs(x.m().amplitude()) >= SLIP_MIN_SNR * se;
  }

  /** Whether a line from a meeting point passes within {@code tolPx} of it. */
  private static boolean passesNear(WaveDetector.Found x, Point2 o, double tolPx) {
    LineFit.Result l = x.m().distortedFit();
    double d = Math.abs((o.x() - l.cx()) * l.uy() - (o.y() - l.cy()) * l.ux());
    return d <= tolPx;
  }

  /** A slip line's fitted line passes this close to the meeting point of two measured shocks, px. */
  static final double SLIP_ORIGIN_PX = 6;
  /**
   * The same for a triple point, which is known only as where the incident shock's fit ends: in
   * shadowgraph that end lay 12 px from the rendered slip line (generator 14 deg, M 2).
   */
  static final double SLIP_TRIPLE_POINT_PX = 15;

  private static boolean within(WaveDetector.Found x, double a0, double a1) {
    LineFit.Result l = x.m().distortedFit();
    double d = ImageAngles.direction(l.ux(), l.uy());
    double mid = 0.5 * (a0 + a1);
    double rel = ImageAngles.wrap(d - mid);
    if (Math.abs(rel) > 0.5 * Math.PI) {
      rel = ImageAngles.wrap(rel + Math.PI);
    }
    return Math.abs(rel) <= 0.5 * (a1 - a0) + Math.toRadians(1);
  }

  /**
   * A double ramp's reflected wave: from where the ramp shocks meet, back towards the ramp, at
   * least a Mach angle (taken as 20 degrees, below any supersonic Mach angle) from the flow behind
   * the second shock. It is weak, a shock or a fan by a few thousandths of the freestream density
   * either way, and a fan that weak is thinner than the blur: the strongest thin line of the
   * sector is measured and its sign decides ({@link #compressive}). A compression is the reflected
   * shock; an expansion is a fan whose head and tail are that one line.
   */
  static List<WaveDetector.Found> rampReflection(BodyShape.DoubleRamp r, List<WaveDetector.Found> found, WaveDetector.Context ctx,
      List<ExpectedWave> hints) {
    Point2 x = crossing(found, Feature.CORNER, Feature.SECOND_CORNER, ctx);
    WaveDetector.Found ref = first(found, Feature.CORNER);
    if (x == null || ref == null) {
      return List.of();
    }
    Side s = r.wall().solidSide().opposite();
    double flow2 = Search.wallDirection(r.wall(), ctx.flow()) + s.sign() * (r.deflectionRad() + r.secondDeflectionRad());
    int g = -s.sign();
    Search sr = Search.shock(x, flow2 + g * MIN_REFLECTED_ANGLE_RAD, flow2 + g * NEAR_NORMAL, WaveKind.REFLECTED_SHOCK, s.opposite(),
        Feature.INTERSECTION);
    Optional<WaveDetector.Found> w = shortShock(ctx, WaveDetector.narrow(sr, hints));
    if (w.isEmpty()) {
      return List.of();
    }
    int sign = compressive(ctx, w.get(), flow2, ref, ctx.flow());
    if (sign >= 0) {
      return List.of(w.get());
    }
    WaveDetector.Found f = w.get();
    return List.of(new WaveDetector.Found(WaveKind.EXPANSION_HEAD, f.side(), f.feature(), f.m(), f.origin()),
        new WaveDetector.Found(WaveKind.EXPANSION_TAIL, f.side(), f.feature(), f.m(), f.origin()));
  }

  /**
   * Whether a measured thin wave compresses (+1) or expands (-1) the flow crossing it, or 0 when
   * the optics cannot tell: the sign of its signal against that of a shock known to compress,
   * each taken along its own downstream normal, so that the picture's own polarity is the
   * reference and neither the knife edge's side nor a negative print changes the call.
   * Shadowgraph puts the bright band of a compression on its dense (downstream) side, so each
   * line's odd moment along the downstream normal is compared; schlieren sees the density
   * gradient along the sensing axis (across a vertical knife edge, x), so each line's mean peak
   * is divided by the sign of its downstream normal's component along that axis.
   */
  static int compressive(WaveDetector.Context ctx, WaveDetector.Found w, double flowW, WaveDetector.Found ref, double flowRef) {
    double a = polaritySignal(ctx, w.m().distortedFit(), flowW);
    double b = polaritySignal(ctx, ref.m().distortedFit(), flowRef);
    if (!(a != 0 && b != 0)) {
      return 0;
    }
    return Math.signum(a) == Math.signum(b) ? 1 : -1;
  }

  /** A schlieren line whose normal is within this of square to the sensing axis has no sign to read. */
  static final double MIN_SENSED_COMPONENT = 0.1;

  /** A line's signed signal along its downstream normal (see {@link #compressive}); 0 where unread. */
  static double polaritySignal(WaveDetector.Context ctx, LineFit.Result f, double flowRad) {
    Point2 fl = ImageAngles.unit(flowRad);
    double nx = -f.uy();
    double ny = f.ux();
    if (nx * fl.x() + ny * fl.y() < 0) {
      nx = -nx;
      ny = -ny;
    }
    boolean shadow = ctx.shadow();
    double half = shadow ? WaveDetector.SHADOW_WINDOW_PX : WaveDetector.SHOCK_WINDOW_PX;
    int m = (int) Math.round(2 * half / Measure.SAMPLE_PX) + 1;
    double[] mean = new double[m];
    double[] buf = new double[m];
    int n = 0;
    for (double t = f.startAlong(); t <= f.endAlong(); t += Measure.NORMAL_STEP_PX) {
      if (ctx.full().sampleLine(f.cx() + t * f.ux(), f.cy() + t * f.uy(), nx, ny, Measure.SAMPLE_PX, half, m, buf)) {
        for (int j = 0; j < m; j++) {
          mean[j] += buf[j];
        }
        n++;
      }
    }
    if (n == 0) {
      return 0;
    }
    double[] q = Profiles.detrend(mean, 3);
    int mid = m / 2;
    if (shadow) {
      double moment = 0;
      for (int j = 0; j < m; j++) {
        moment += (j - mid) * q[j];
      }
      return moment;
    }
    double sensed = ctx.optics() == dev.wavemark.core.model.Optics.SCHLIEREN_VERTICAL_EDGE ? nx : ny;
    if (Math.abs(sensed) < MIN_SENSED_COMPONENT) {
      return 0;
    }
    double peak = 0;
    for (int j = m / 3; j < m - m / 3; j++) {
      if (Math.abs(q[j]) > Math.abs(peak)) {
        peak = q[j];
      }
    }
    return peak * Math.signum(sensed);
  }

  /** A reflected wave leaves the flow behind the second shock at least this steeply. */
  static final double MIN_REFLECTED_ANGLE_RAD = Math.toRadians(20);

  /** The end of a fitted segment nearer to {@code p}. */
  private static Point2 nearerEnd(LineFit.Result f, Point2 p) {
    Point2 a = new Point2(f.cx() + f.startAlong() * f.ux(), f.cy() + f.startAlong() * f.uy());
    Point2 b = new Point2(f.cx() + f.endAlong() * f.ux(), f.cy() + f.endAlong() * f.uy());
    return a.distanceTo(p) < b.distanceTo(p) ? a : b;
  }

  /**
   * Whether the incident shock goes on past the end of its fitted segment towards the wall:
   * its contrast on the extension beyond {@code end} against its contrast on the last stretch of
   * the segment. The fitted segment usually stops short of the wall because the normal profiles
   * run into the masked wall; the extension is then sampled with shorter profiles. When too
   * little of the extension is in the flow to tell, the shock is taken to reach the wall.
   */
  static boolean continuesTo(WaveDetector.Context ctx, WaveDetector.Found inc, Point2 end, Point2 hit) {
    double len = end.distanceTo(hit);
    double ux = (hit.x() - end.x()) / len;
    double uy = (hit.y() - end.y()) / len;
    double before = contrast(ctx.full(), end, ux, uy, -CONTINUATION_REFERENCE_PX, -4);
    double beyond = contrast(ctx.full(), end, ux, uy, CONTINUATION_SKIP_PX, len);
    if (Double.isNaN(before) || Double.isNaN(beyond)) {
      return true;
    }
    return beyond > CONTINUATION_RATIO * before;
  }

  /** Half-length of the short profiles used on an extension, px. */
  private static final double CONTINUATION_HALF_PX = 4;
  /** The extension is sampled from this far beyond the segment's end (clear of a Mach stem's foot), px. */
  private static final double CONTINUATION_SKIP_PX = 6;
  /** The reference stretch at the end of the fitted segment, px. */
  private static final double CONTINUATION_REFERENCE_PX = 25;
  /** An extension keeping this fraction of the segment's contrast carries the same shock. */
  private static final double CONTINUATION_RATIO = 0.4;

  /**
   * The contrast of a line along {@code o + s u}, s in [s0, s1]: the mean of the short normal
   * profiles that lie wholly in the flow, its largest departure within 2 px of the line from the
   * median of its outer parts. NaN when fewer than 3 profiles are usable.
   */
  private static double contrast(Raster r, Point2 o, double ux, double uy, double s0, double s1) {
    int m = (int) Math.round(2 * CONTINUATION_HALF_PX / Measure.SAMPLE_PX) + 1;
    double[] mean = new double[m];
    int used = 0;
    for (double s = s0; s <= s1; s += 1) {
      double[] p = new double[m];
      boolean ok = true;
      for (int j = 0; j < m && ok; j++) {
        double off = j * Measure.SAMPLE_PX - CONTINUATION_HALF_PX;
        p[j] = r.sample(o.x() + s * ux - off * uy, o.y() + s * uy + off * ux);
        ok = !Double.isNaN(p[j]);
      }
      if (ok) {
        for (int j = 0; j < m; j++) {
          mean[j] += p[j];
        }
        used++;
      }
    }
    if (used < 3) {
      return Double.NaN;
    }
    double[] outer = new double[m];
    int k = 0;
    double best = 0;
    for (int j = 0; j < m; j++) {
      double off = Math.abs(j * Measure.SAMPLE_PX - CONTINUATION_HALF_PX);
      if (off >= 3) {
        outer[k++] = mean[j] / used;
      }
    }
    double[] o2 = java.util.Arrays.copyOf(outer, k);
    java.util.Arrays.sort(o2);
    double base = o2[k / 2];
    for (int j = 0; j < m; j++) {
      if (Math.abs(j * Measure.SAMPLE_PX - CONTINUATION_HALF_PX) <= 2) {
        best = Math.max(best, Math.abs(mean[j] / used - base));
      }
    }
    return best;
  }

  /** The first profiles of a short secondary shock start this far from its origin (clear of the incident shock), px. */
  static final double SHORT_SKIP_PX = 12;
  /** A short secondary shock must offer this much line in the flow, px. */
  static final double SHORT_MIN_LENGTH_PX = 20;
  /**
   * Profile half-length of a secondary shock, as a fraction of a primary one's: the full length,
   * since a shorter one biases the centres towards the first candidate (0.28° on a rendered
   * Mach reflection's reflected shock with 0.6).
   */
  static final double WINDOW_FRACTION = 1.0;
  /** The same for a Mach stem, whose short profiles must stay clear of the masked wall. */
  static final double STEM_WINDOW_FRACTION = 0.6;

  /**
   * A shock from a known secondary origin that may be short (it ends where it meets a fan or the
   * window): the strongest line of the pencil, allowed the broad angular peak of a short line,
   * measured with at least {@link #SHORT_MIN_LENGTH_PX} of line and ended where its peak fades
   * ({@link #lineEnd}).
   */
  static Optional<WaveDetector.Found> shortShock(WaveDetector.Context ctx, Search s) {
    double rMax = Math.hypot(ctx.full().width, ctx.full().height);
    AngularScan scan = AngularScan.of(ctx.low(), s.origin().x(), s.origin().y(), s.a0(), s.a1(), SHORT_SKIP_PX, rMax);
    AngularScan.Hit h = scan.strongestLine(WaveDetector.MIN_CANDIDATE_SNR, Math.toRadians(6) / scan.step, false);
    if (h == null) {
      return Optional.empty();
    }
    int i = (int) Math.max(0, Math.min(scan.reach.length - 1, Math.round(h.index())));
    double s1 = scan.reach[i] - 2;
    double a = scan.angle(h.index());
    Measure.Candidate c = new Measure.Candidate(scan.ox, scan.oy, Math.cos(a), -Math.sin(a), SHORT_SKIP_PX, s1);
    // the accurate stage may slide onto a stronger line beside the sector (a Mach reflection's
    // slip line in shadowgraph): what ends outside the sector is not the wave searched for
    return measureShort(ctx, c, s.kind(), s.side(), s.feature(), s.origin()).filter(x -> within(x, s.a0(), s.a1()));
  }

  /**
   * The Mach stem below a triple point: profiles along the wall at each height between the triple
   * point and the wall (the stem stands near-normal to the wall), fitted; kept when it leans less
   * than {@link #STEM_MAX_LEAN_RAD} from the wall normal.
   */
  static Optional<WaveDetector.Found> stem(WaveDetector.Context ctx, Point2 tp, double wallDir, Side solid, Point2 wallPoint) {
    double toWall = wallDir + solid.sign() * 0.5 * Math.PI;
    Point2 u = ImageAngles.unit(toWall);
    Point2 foot = intersectLines(tp, u, wallPoint, ImageAngles.unit(wallDir));
    if (foot == null) {
      return Optional.empty();
    }
    double s1 = tp.distanceTo(foot);
    Measure.Candidate c = new Measure.Candidate(tp.x(), tp.y(), u.x(), u.y(), STEM_SKIP_PX, s1);
    Optional<WaveDetector.Found> f = measureShort(ctx, c, WaveKind.MACH_STEM, solid.opposite(), Feature.TRIPLE_POINT, tp);
    return f.filter(x -> {
      LineFit.Result r = x.m().distortedFit();
      return Math.abs(r.ux() * u.x() + r.uy() * u.y()) >= Math.cos(STEM_MAX_LEAN_RAD);
    });
  }

  /** The stem's profiles start this far below the triple point, px. */
  static final double STEM_SKIP_PX = 3;
  /** A Mach stem leans at most this far from the wall normal. */
  static final double STEM_MAX_LEAN_RAD = Math.toRadians(25);

  /**
   * The accurate stage for a short line: fewer points than a primary wave needs, the segment
   * ended where the line fades, a third pass for a stem's narrow profiles.
   */
  private static Optional<WaveDetector.Found> measureShort(WaveDetector.Context ctx, Measure.Candidate c, WaveKind kind, Side side,
      Feature feature, Point2 origin) {
    double usable = c.s1() - c.s0();
    boolean stemLike = kind == WaveKind.MACH_STEM;
    if (usable < (stemLike ? 10 : SHORT_MIN_LENGTH_PX)) {
      return Optional.empty();
    }
    Signature sig = ctx.shadow() ? Signature.DIPOLE : Signature.PEAK;
    double full = ctx.shadow() ? WaveDetector.SHADOW_WINDOW_PX : WaveDetector.SHOCK_WINDOW_PX;
    double window = (stemLike ? STEM_WINDOW_FRACTION : WINDOW_FRACTION) * full;
    int minSupport = (int) Math.max(stemLike ? 8 : 12, 0.2 * usable);
    Measure.Result m = Measure.measure(ctx.full(), c, sig, window, 0, ctx.noise(), null, minSupport);
    if (m == null) {
      return Optional.empty();
    }
    Measure.Candidate c2 = c.recentred(m.distortedFit());
    if (sig == Signature.PEAK) {
      double end = lineEnd(ctx.full(), c2, m.sign());
      if (end < c2.s1()) {
        // where the line ends another wave begins: keep the profiles clear of it
        end -= window;
      }
      if (end - c2.s0() < minSupport) {
        return Optional.empty();
      }
      c2 = new Measure.Candidate(c2.ox(), c2.oy(), c2.ux(), c2.uy(), c2.s0(), end);
    }
    if (stemLike) {
      // the narrow profile pulls the centres towards the candidate: one more pass from the fit
      Measure.Result mid = Measure.measure(ctx.full(), c2, sig, window, m.sign(), ctx.noise(), null, minSupport);
      if (mid != null) {
        c2 = c2.recentred(mid.distortedFit());
      }
    }
    Measure.Result m2 = Measure.measure(ctx.full(), c2, sig, window, m.sign(), ctx.noise(), ctx.undistort(), minSupport);
    return m2 == null ? Optional.empty() : Optional.of(new WaveDetector.Found(kind, side, feature, m2, origin));
  }

  /**
   * Where a thin line along a candidate ends: the first stretch of {@link #END_RUN_PX} px over
   * which its peak strength (the centre's rise above the lower of its two sides 3 px out, which a
   * step such as a fan's edge does not have) stays below {@link #END_RATIO} of its level on the first 20 px.
   * A shock that meets a fan stops there even when the fan's edge carries on along the same line.
   */
  static double lineEnd(Raster r, Measure.Candidate c, int sign) {
    double nx = -c.uy();
    double ny = c.ux();
    int n = (int) Math.floor(c.s1() - c.s0()) + 1;
    double[] q = new double[n];
    for (int k = 0; k < n; k++) {
      double s = c.s0() + k;
      double px = c.ox() + s * c.ux();
      double py = c.oy() + s * c.uy();
      double centre = Math.max(r.sample(px, py), Math.max(r.sample(px + 0.7 * nx, py + 0.7 * ny), r.sample(px - 0.7 * nx, py - 0.7 * ny)));
      if (sign < 0) {
        centre = Math.min(r.sample(px, py), Math.min(r.sample(px + 0.7 * nx, py + 0.7 * ny), r.sample(px - 0.7 * nx, py - 0.7 * ny)));
      }
      double left = r.sample(px + 3 * nx, py + 3 * ny);
      double right = r.sample(px - 3 * nx, py - 3 * ny);
      q[k] = Math.min(sign * (centre - left), sign * (centre - right));
    }
    int ref = Math.min(n, 20);
    double[] head = new double[ref];
    int h = 0;
    for (int k = 0; k < ref; k++) {
      if (!Double.isNaN(q[k])) {
        head[h++] = q[k];
      }
    }
    if (h < 5) {
      return c.s1();
    }
    double[] sorted = java.util.Arrays.copyOf(head, h);
    java.util.Arrays.sort(sorted);
    double level = sorted[h / 2];
    int low = 0;
    for (int k = 0; k < n; k++) {
      low = !Double.isNaN(q[k]) && q[k] < END_RATIO * level ? low + 1 : 0;
      if (low >= END_RUN_PX) {
        return c.s0() + k - END_RUN_PX;
      }
    }
    return c.s1();
  }

  /** A line has ended after this many px in a row below {@link #END_RATIO} of its level. */
  private static final int END_RUN_PX = 5;
  private static final double END_RATIO = 0.35;

  /** Intersection of the lines through p along u and through q along v (image vectors). */
  private static Point2 intersectLines(Point2 p, Point2 u, Point2 q, Point2 v) {
    double det = u.x() * v.y() - u.y() * v.x();
    if (Math.abs(det) < 1e-9) {
      return null;
    }
    double t = ((q.x() - p.x()) * v.y() - (q.y() - p.y()) * v.x()) / det;
    return new Point2(p.x() + t * u.x(), p.y() + t * u.y());
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
