package dev.wavemark.imaging.detect;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.FittedLine;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * Finds every wave of a frame and measures it: candidates from pencils of rays through the
 * points where the model geometry says waves start (on a reduced copy of the frame), then
 * full-resolution profiles across each candidate, sub-pixel centres, and a robust line fit with
 * an honest standard uncertainty. Thread-safe: it keeps no state between calls.
 */
public final class WaveDetector {

  /** Pixels next to the silhouette or window edge that are left out (their blur bleeds in). */
  static final int EDGE_MARGIN_PX = 3;
  /** A candidate must stand this many noise deviations above the pencil's own noise. */
  static final double MIN_CANDIDATE_SNR = 7;
  /** Radius around a wave's origin that is not used (the corner itself is not a wave). */
  static final double ORIGIN_SKIP_PX = 12;
  /** Half-length of each normal profile for a shock, px. */
  static final double SHOCK_WINDOW_PX = 8;
  /** Half-length of each normal profile for a shadowgraph shock (dark band and caustic), px. */
  static final double SHADOW_WINDOW_PX = 12;
  /** Second-pass half-window of a line profile, in multiples of the wave's measured width. */
  static final double SECOND_WINDOW_WIDTHS = 1.25;
  /** Smallest second-pass half-window, px. */
  static final double MIN_SECOND_WINDOW_PX = 4;
  /**
   * A fan boundary's profiles start where the other boundary is this many profile half-windows
   * away across, so that it stays out of the central part searched (the step locator's box is
   * half that part).
   */
  static final double FAN_SKIP_WINDOWS = 1.2;
  /** Angular tolerance around a hint, radians. */
  static final double HINT_TOLERANCE_RAD = Math.toRadians(8);

  private WaveDetector() {}

  /** The reduction of the candidate stage's copy: 2, or more for frames over 1024 px. */
  private static int reduction(Raster full) {
    return Math.max(2, (int) Math.ceil(Math.max(full.width, full.height) / 512.0));
  }

  /**
   * What the picture looks like, shadowgraph or schlieren (see {@link OpticsGuess}): the guess
   * {@link #detect} makes for {@link Optics#AUTO}, for a caller that wants one answer for a whole
   * run. Its optics is {@link Optics#AUTO} when the region leaves nothing to judge by.
   *
   * @param frame the normalised frame, as for {@link DetectionRequest#frame()}
   * @param shape the model geometry, whose shock searches give the lines judged
   * @param flowDirectionRad the freestream direction in the image (files-contract sense)
   */
  public static OpticsGuess guessOptics(GrayF32 frame, FlowRegion region, BodyShape shape, double flowDirectionRad) {
    Raster full = Raster.of(frame, region).eroded(EDGE_MARGIN_PX);
    if (full.flowCount() < 100) {
      return new OpticsGuess(Optics.AUTO, 0, Double.NaN);
    }
    return OpticsGuess.of(full, full.reduced(reduction(full)), shape, flowDirectionRad);
  }

  /** The detector with its default settings. */
  public static WaveDetector create() {
    return new WaveDetector();
  }

  /**
   * Detects and measures the waves of one frame.
   *
   * @return the waves, each with its fitted line (lens-corrected when a correction is given),
   *     classification, side and the model feature it starts from
   * @throws WavemarkException {@code image-empty} for an empty or contrast-free frame,
   *     {@code mask-outside} when the flow region or the model lies outside the picture,
   *     {@code no-wave-found} when nothing is found
   */
  public List<ObservedWave> detect(DetectionRequest req) {
    GrayF32 frame = req.frame();
    String label = req.frameLabel();
    Frames.validate(frame, label);
    Raster full = Raster.of(frame, req.region()).eroded(EDGE_MARGIN_PX);
    Frames.validateRegion(full, req.region(), label);
    Raster low = full.reduced(reduction(full));
    double noise = Frames.noise(full);
    Optics optics = req.optics() == Optics.AUTO ? OpticsGuess.of(full, low, req.shape(), req.flowDirectionRad()).optics() : req.optics();
    UnaryOperator<Point2> und = req.undistort().orElse(null);
    // a shock generator's triple-point test (Secondary) reads where the incident fit ends, which
    // it was set for with the full-width second pass; the narrow pass is kept for the others
    boolean narrow = !(req.shape() instanceof BodyShape.ShockGenerator);
    Context ctx = new Context(full, low, noise, optics, und, req.flowDirectionRad(), narrow);

    List<Search> searches = new ArrayList<>();
    for (Search s : Search.primary(req.shape(), req.flowDirectionRad())) {
      if (!full.inFlowOrNear(s.origin().x(), s.origin().y(), 40)) {
        throw new WavemarkException(Problem.MASK_OUTSIDE, label, "the model feature at " + fmt(s.origin()), "flow region of the");
      }
      searches.add(narrow(s, req.hints()));
    }
    List<Found> found = new ArrayList<>();
    // shocks first, so that the fan searches can leave every shock out of their pencils
    searches.sort(java.util.Comparator.comparing(Search::fan));
    for (Search s : searches) {
      // a double ramp's second shock ends where it meets the first; beyond lies the merged shock
      found.addAll(run(ctx, s, s.feature() == Feature.SECOND_CORNER ? shockOf(found, Feature.CORNER) : null,
          s.fan() ? shockBands(found, ctx.shadow()) : List.of()));
    }
    if (req.shape() instanceof BodyShape.Freestream f) {
      found.addAll(MachWaveFamily.find(ctx, f, req.hints()));
    }
    found.addAll(Secondary.find(req.shape(), found, ctx, req.hints()));
    List<ObservedWave> out = new ArrayList<>();
    for (Found f : found) {
      out.add(f.toObserved(req.hints()));
    }
    if (req.shape() instanceof BodyShape.Blunt b) {
      Point2 nose = b.centrePx().plus(ImageAngles.unit(req.flowDirectionRad() + Math.PI).times(b.noseRadiusPx()));
      if (!full.inFlowOrNear(nose.x(), nose.y(), 40)) {
        throw new WavemarkException(Problem.MASK_OUTSIDE, label, "the model's nose at " + fmt(nose), "flow region of the");
      }
      BowShockSearch.find(ctx, b, req.hints()).ifPresent(out::add);
    }
    if (out.isEmpty()) {
      throw new WavemarkException(Problem.NO_WAVE_FOUND, label, "wave",
          "check the optics mode (" + optics.contractName() + "), the model position and the mask");
    }
    return out;
  }

  private static String fmt(Point2 p) {
    return "(" + WavemarkException.num(p.x()) + ", " + WavemarkException.num(p.y()) + ") px";
  }

  /** Narrows a search's sector to the hints of the same feature and side, if any. */
  static Search narrow(Search s, List<ExpectedWave> hints) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (ExpectedWave h : hints) {
      if (h.feature() != s.feature() || h.side() != s.side() || h.kind().isShock() == s.fan()) {
        continue;
      }
      double d = s.a0() + ImageAngles.wrap(h.directionRad() - s.a0());
      lo = Math.min(lo, d - HINT_TOLERANCE_RAD);
      hi = Math.max(hi, d + HINT_TOLERANCE_RAD);
    }
    if (lo > hi) {
      return s;
    }
    return new Search(s.origin(), Math.max(s.a0(), lo), Math.min(s.a1(), hi), s.fan(), s.kind(), s.side(), s.feature());
  }

  /** Everything a search needs from the frame. */
  record Context(Raster full, Raster low, double noise, Optics optics, UnaryOperator<Point2> undistort, double flow,
      boolean narrowSecondPass) {
    boolean shadow() {
      return optics == Optics.SHADOWGRAPH;
    }
  }

  /** A measured wave before it becomes an ObservedWave. */
  record Found(WaveKind kind, Side side, Feature feature, Measure.Result m, Point2 origin) {
    ObservedWave toObserved(List<ExpectedWave> hints) {
      LineFit.Result f = m.fit();
      Point2 c = new Point2(f.cx(), f.cy());
      Point2 u = new Point2(f.ux(), f.uy());
      Point2 start = c.plus(u.times(f.startAlong()));
      Point2 end = c.plus(u.times(f.endAlong()));
      double dir = ImageAngles.direction(f.ux(), f.uy());
      double sigma = kind.isShock() || kind == WaveKind.MACH_WAVE || kind == WaveKind.SLIP_LINE ? Uncertainty.total(f)
          : Uncertainty.totalForFan(f);
      FittedLine line = new FittedLine(c, dir, sigma, start, end, f.support(), f.rmsPx(), f.curved());
      return new ObservedWave(kind, Optional.of(side), line, m.amplitude(), m.widthPx(), Optional.of(feature));
    }
  }

  /** Runs one search: the pencil, the best candidate(s), the accurate measurement. */
  static List<Found> run(Context ctx, Search s) {
    return run(ctx, s, null, List.of());
  }

  /** Half-width of a measured shock's band left out of a fan's pencil, in multiples of its measured width. */
  static final double SHOCK_BAND_WIDTHS = 1.5;
  /** Smallest half-width of that band, px (schlieren; shadowgraph's dark band and caustic take more). */
  static final double MIN_SHOCK_BAND_PX = 4;

  /** A shock's band starts this far before its fitted start, and a fan boundary stops at it up to this far beyond its fitted end, px. */
  static final double BAND_MARGIN_PX = 20;

  /**
   * Where a fan boundary along direction {@code a} from the search's origin first runs into a
   * measured shock (its fitted segment, see {@link #shockBands}), less that shock's band and a
   * profile window; infinite if it meets none beyond {@code s0}. A fan ends where it meets a
   * shock (a generator's shoulder fan at the reflected shock, a wedge's at its leading-edge
   * shock); beyond, the boundary's profiles would take in the shock's own peak and what lies past it.
   */
  static double stopAt(Search s, double a, List<WaveDetector.ShockBand> bands, double s0, double window) {
    double ux = Math.cos(a);
    double uy = -Math.sin(a);
    double best = Double.POSITIVE_INFINITY;
    for (ShockBand b : bands) {
      double det = ux * b.uy() - uy * b.ux();
      if (Math.abs(det) < 1e-9) {
        continue;
      }
      double dx = b.cx() - s.origin().x();
      double dy = b.cy() - s.origin().y();
      // origin + t u = b + q v
      double t = (dx * b.uy() - dy * b.ux()) / det;
      double q = (dx * uy - dy * ux) / det;
      if (t > s0 && q >= b.from() && q <= b.fittedEnd()) {
        best = Math.min(best, t - b.halfWidth() - window);
      }
    }
    return best;
  }

  /**
   * The bands of the shocks measured so far, for {@link AngularScan#of(Raster, double, double,
   * double, double, double, double, double[], List)}: each from a little before its fitted start
   * on to the picture's edge (a shock's straight part ends where a fan meets it, but its trace
   * goes on), and as its last entry the end of its fitted segment plus a margin (for
   * {@link #stopAt}).
   */
  static List<ShockBand> shockBands(List<Found> found, boolean shadow) {
    List<ShockBand> out = new ArrayList<>();
    for (Found f : found) {
      if (!f.kind().isShock()) {
        continue;
      }
      LineFit.Result d = f.m().distortedFit();
      double w = f.m().widthPx() > 0 ? f.m().widthPx() : 0;
      double half = Math.max(shadow ? 2 * MIN_SHOCK_BAND_PX : MIN_SHOCK_BAND_PX, SHOCK_BAND_WIDTHS * w);
      out.add(new ShockBand(d.cx(), d.cy(), d.ux(), d.uy(), d.startAlong() - BAND_MARGIN_PX, Double.POSITIVE_INFINITY, half,
          d.endAlong() + BAND_MARGIN_PX));
    }
    return out;
  }

  /**
   * The bands a fan's boundaries stop at: a shock whose fitted segment (with its margin) ends
   * inside the fan's sector, seen from the fan's origin, ended there because it met this fan (a
   * generator's reflected shock fades where the shoulder fan's head crosses it) and goes on,
   * bending, through the fan, so the tail stops at its line as well as the head; such a band's
   * fitted end is taken as unbounded. Other bands are kept as they are.
   */
  static List<ShockBand> throughFan(List<ShockBand> bands, Point2 origin, double a0, double a1) {
    List<ShockBand> out = new ArrayList<>(bands.size());
    double span = ImageAngles.wrap(a1 - a0);
    for (ShockBand b : bands) {
      double ex = b.cx() + b.fittedEnd() * b.ux();
      double ey = b.cy() + b.fittedEnd() * b.uy();
      double rel = ImageAngles.wrap(ImageAngles.direction(ex - origin.x(), ey - origin.y()) - a0);
      boolean inside = Double.isFinite(b.fittedEnd()) && span != 0 && rel / span >= 0 && rel / span <= 1;
      out.add(inside ? new ShockBand(b.cx(), b.cy(), b.ux(), b.uy(), b.from(), b.to(), b.halfWidth(), Double.POSITIVE_INFINITY) : b);
    }
    return out;
  }

  /**
   * A measured shock's band: its fitted line (centre and unit direction, distorted picture
   * pixels), the stretch along it from {@code from} to {@code to} and {@code halfWidth} either
   * side that a fan's pencil leaves out, and where its fitted segment ends (plus a margin), at
   * which a fan boundary running into it stops.
   */
  record ShockBand(double cx, double cy, double ux, double uy, double from, double to, double halfWidth, double fittedEnd) {
    /** Whether picture point (x, y) lies on the band. */
    boolean contains(double x, double y) {
      double dx = x - cx;
      double dy = y - cy;
      double s = dx * ux + dy * uy;
      return s >= from && s <= to && Math.abs(dy * ux - dx * uy) <= halfWidth;
    }
  }

  /** The first measured shock from feature {@code f}, or null. */
  private static LineFit.@org.jspecify.annotations.Nullable Result shockOf(List<Found> found, Feature f) {
    for (Found x : found) {
      if (x.feature() == f && x.kind().isShock()) {
        return x.m().distortedFit();
      }
    }
    return null;
  }

  /**
   * Runs one search; with {@code stop} given, each ray of the pencil ends a profile window short
   * of that line (another wave the searched one runs into); samples on the {@code avoid} bands
   * (see {@link #shockBands}) are left out of the pencil.
   */
  static List<Found> run(Context ctx, Search s, LineFit.@org.jspecify.annotations.Nullable Result stop, List<ShockBand> avoid) {
    double rMax = Math.hypot(ctx.full().width, ctx.full().height);
    double[] clip = stop == null ? null
        : new double[] {stop.cx(), stop.cy(), stop.ux(), stop.uy(), ctx.shadow() ? SHADOW_WINDOW_PX : SHOCK_WINDOW_PX};
    AngularScan scan = AngularScan.of(ctx.low(), s.origin().x(), s.origin().y(), s.a0(), s.a1(), ORIGIN_SKIP_PX, rMax, clip, avoid);
    double rTyp = 250;
    List<Found> out = new ArrayList<>();
    if (!s.fan()) {
      // in shadowgraph the wide dark band of the pair is the strongest line in the pencil; the
      // accurate stage's window covers both lobes
      AngularScan.Hit h = scan.strongestLine(MIN_CANDIDATE_SNR, (ctx.shadow() ? 14.0 : 10.0) / rTyp / scan.step);
      if (h == null) {
        return out;
      }
      // a cone's shock is the onset of a square-root rise, not a symmetric line or pair
      Signature sig = s.kind() == WaveKind.CONICAL_SHOCK ? (ctx.shadow() ? Signature.ROOT_PAIR : Signature.ROOT_SPIKE)
          : ctx.shadow() ? Signature.DIPOLE : Signature.PEAK;
      Measure.Result m = measureAlong(ctx, scan, h.index(), sig, ctx.shadow() ? SHADOW_WINDOW_PX : SHOCK_WINDOW_PX,
          ORIGIN_SKIP_PX, Double.POSITIVE_INFINITY, clip);
      if (m != null) {
        out.add(new Found(s.kind(), s.side(), s.feature(), m, s.origin()));
      }
      return out;
    }
    AngularScan.Hit[] edges = ctx.shadow()
        ? scan.oppositeLines(0.6 * MIN_CANDIDATE_SNR, (int) Math.ceil(12.0 / rTyp / scan.step), 10.0 / rTyp / scan.step)
        : scan.levels().widestBand(0.6 * MIN_CANDIDATE_SNR, 12.0 / rTyp / scan.step);
    if (edges == null) {
      return out;
    }
    double spread = Math.abs(edges[1].index() - edges[0].index()) * scan.step;
    double window = SHOCK_WINDOW_PX;
    double start = Math.max(ORIGIN_SKIP_PX, FAN_SKIP_WINDOWS * window / Math.max(spread, 1e-3));
    Signature sig = ctx.shadow() ? Signature.PEAK : Signature.STEP;
    Measure.Result[] ms = new Measure.Result[2];
    List<ShockBand> stops = throughFan(avoid, s.origin(), scan.angle(edges[0].index()), scan.angle(edges[1].index()));
    for (int i = 0; i < 2; i++) {
      double end = stopAt(s, scan.angle(edges[i].index()), stops, start, window);
      // the side of the profiles' direction n = (-uy, ux) on which the other boundary, and so the
      // fan, lies
      double a = scan.angle(edges[i].index());
      double b = scan.angle(edges[1 - i].index());
      double side = -(-Math.sin(a)) * Math.cos(b) + Math.cos(a) * (-Math.sin(b));
      ms[i] = measureAlong(ctx, scan, edges[i].index(), sig, window, start, end, null, side >= 0 ? 1 : -1);
    }
    // the head is the boundary steeper to the freestream
    double[] steep = new double[2];
    for (int i = 0; i < 2; i++) {
      steep[i] = ImageAngles.acuteToFlow(scan.angle(edges[i].index()), ctx.flow());
    }
    int head = steep[0] >= steep[1] ? 0 : 1;
    for (int i = 0; i < 2; i++) {
      if (ms[i] != null) {
        WaveKind kind = i == head ? WaveKind.EXPANSION_HEAD : WaveKind.EXPANSION_TAIL;
        out.add(new Found(kind, s.side(), s.feature(), ms[i], s.origin()));
      }
    }
    return out;
  }

  /**
   * The half-window of the second pass: once the line is known to a fraction of a pixel, the
   * profiles need only cover the wave's own width. A wider window lets a neighbouring wave (a
   * shoulder fan closing in on a short model's shock) into the far end of the profiles and turns
   * the fitted line; on a 40 px wedge that cost 0.4 deg with the full 8 px window.
   */
  static double secondWindow(Signature sig, double window, double widthPx) {
    if (sig != Signature.PEAK || !(widthPx > 0)) {
      return window;
    }
    return Math.max(MIN_SECOND_WINDOW_PX, Math.min(window, SECOND_WINDOW_WIDTHS * widthPx));
  }

  /**
   * How far along a candidate its profiles (half-length {@code window}, square to it) stay half a
   * window clear of the line {@code stop} = (x, y, ux, uy, ...): a profile at distance d from that
   * line reaches d - window cos(phi) from it, phi the crossing angle, so the last one stands
   * (cos phi + 1/2) window / sin phi before the crossing; infinite when the candidate does not
   * meet the line ahead.
   */
  static double clearOf(Measure.Candidate c, double[] stop, double window) {
    double det = c.ux() * stop[3] - c.uy() * stop[2];
    if (Math.abs(det) < 1e-9) {
      return Double.POSITIVE_INFINITY;
    }
    double t = ((stop[0] - c.ox()) * stop[3] - (stop[1] - c.oy()) * stop[2]) / det;
    double cos = Math.abs(c.ux() * stop[2] + c.uy() * stop[3]);
    return t > 0 ? t - window * (cos + 0.5) / Math.abs(det) : Double.POSITIVE_INFINITY;
  }

  /** The shortest ray a primary wave is measured along, px. */
  static final double MIN_LINE_PX = 40;

  /** Two passes of the accurate stage along the pencil direction of fractional index {@code idx}. */
  static Measure.Result measureAlong(Context ctx, AngularScan scan, double idx, Signature sig, double window, double s0) {
    return measureAlong(ctx, scan, idx, sig, window, s0, Double.POSITIVE_INFINITY, null);
  }

  /**
   * As {@link #measureAlong(Context, AngularScan, double, Signature, double, double)}, the profiles
   * ending by {@code sEnd}, and, when the wave runs into another ({@code stop}, as for
   * {@link AngularScan}), the second pass's profiles ending where their window would come within
   * half a window of that wave's line ({@link #clearOf}).
   */
  static Measure.Result measureAlong(Context ctx, AngularScan scan, double idx, Signature sig, double window, double s0,
      double sEnd, double @org.jspecify.annotations.Nullable [] stop) {
    return measureAlong(ctx, scan, idx, sig, window, s0, sEnd, stop, 0);
  }

  /**
   * As {@link #measureAlong(Context, AngularScan, double, Signature, double, double, double, double[])},
   * for a boundary of the centred fan at the scan's origin when {@code fanSide} is not 0 (see
   * {@link Measure#measure(Raster, Measure.Candidate, Signature, double, int, double,
   * java.util.function.UnaryOperator, int, int)}).
   */
  static Measure.Result measureAlong(Context ctx, AngularScan scan, double idx, Signature sig, double window, double s0,
      double sEnd, double @org.jspecify.annotations.Nullable [] stop, int fanSide) {
    double a = scan.angle(idx);
    int i = (int) Math.max(0, Math.min(scan.reach.length - 1, Math.round(idx)));
    double s1 = Math.min(sEnd, scan.reach[i] - 2);
    if (s1 - s0 < MIN_LINE_PX) {
      return null;
    }
    double ux = Math.cos(a);
    double uy = -Math.sin(a);
    Measure.Candidate c = new Measure.Candidate(scan.ox, scan.oy, ux, uy, s0, s1);
    int minSupport = (int) Math.max(25, 0.2 * (s1 - s0));
    Measure.Result m = Measure.measure(ctx.full(), c, sig, window, 0, ctx.noise(), null, minSupport, fanSide);
    // a wave may end well before its ray leaves the flow (a double ramp's first shock at the
    // second, a shock at a fan): then its profiles are too few a share of the ray's, and beyond
    // its end the window takes in whatever crosses the ray there; the ray is halved until the
    // wave is measured or too short to be
    boolean halved = false;
    while (m == null && (s1 - s0) / 2 >= MIN_LINE_PX) {
      s1 = s0 + (s1 - s0) / 2;
      c = new Measure.Candidate(scan.ox, scan.oy, ux, uy, s0, s1);
      minSupport = (int) Math.max(25, 0.2 * (s1 - s0));
      m = Measure.measure(ctx.full(), c, sig, window, 0, ctx.noise(), null, minSupport, fanSide);
      halved = true;
    }
    if (m == null) {
      return null;
    }
    Measure.Candidate c2 = c.recentred(m.distortedFit());
    if (stop != null) {
      double last = clearOf(c2, stop, window);
      if (last - s0 >= MIN_LINE_PX && last < c2.s1()) {
        c2 = new Measure.Candidate(c2.ox(), c2.oy(), c2.ux(), c2.uy(), s0, last);
      }
    }
    if (halved) {
      // and the second pass stops where the first found the wave's end
      LineFit.Result f = m.distortedFit();
      double end = (f.cx() + f.endAlong() * f.ux() - c2.ox()) * c2.ux() + (f.cy() + f.endAlong() * f.uy() - c2.oy()) * c2.uy();
      double start = (f.cx() + f.startAlong() * f.ux() - c2.ox()) * c2.ux() + (f.cy() + f.startAlong() * f.uy() - c2.oy()) * c2.uy();
      double last = Math.max(end, start);
      if (last - s0 >= MIN_LINE_PX && last < c2.s1()) {
        c2 = new Measure.Candidate(c2.ox(), c2.oy(), c2.ux(), c2.uy(), s0, last);
      }
    }
    return Measure.measure(ctx.full(), c2, sig, ctx.narrowSecondPass() ? secondWindow(sig, window, m.widthPx()) : window, m.sign(), ctx.noise(), ctx.undistort(),
        minSupport, fanSide, m.kinkBlur());
  }
}
