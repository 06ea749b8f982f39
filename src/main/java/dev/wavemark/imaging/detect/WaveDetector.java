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
   * What the picture looks like, shadowgraph or schlieren: the guess {@link #detect} makes for
   * {@link Optics#AUTO}, for a caller that wants one answer for a whole run. {@link Optics#AUTO}
   * when the region leaves nothing to judge by.
   */
  public static Optics guessOptics(GrayF32 frame, FlowRegion region) {
    Raster full = Raster.of(frame, region).eroded(EDGE_MARGIN_PX);
    if (full.flowCount() < 100) {
      return Optics.AUTO;
    }
    return Frames.guessOptics(full.reduced(reduction(full)));
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
    Optics optics = req.optics() == Optics.AUTO ? Frames.guessOptics(low) : req.optics();
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
          ORIGIN_SKIP_PX);
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
    for (int i = 0; i < 2; i++) {
      double end = stopAt(s, scan.angle(edges[i].index()), avoid, start, window);
      ms[i] = measureAlong(ctx, scan, edges[i].index(), sig, window, start, end);
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

  /** Two passes of the accurate stage along the pencil direction of fractional index {@code idx}. */
  static Measure.Result measureAlong(Context ctx, AngularScan scan, double idx, Signature sig, double window, double s0) {
    return measureAlong(ctx, scan, idx, sig, window, s0, Double.POSITIVE_INFINITY);
  }

  /** As {@link #measureAlong(Context, AngularScan, double, Signature, double, double)}, the profiles ending by {@code sEnd}. */
  static Measure.Result measureAlong(Context ctx, AngularScan scan, double idx, Signature sig, double window, double s0,
      double sEnd) {
    double a = scan.angle(idx);
    int i = (int) Math.max(0, Math.min(scan.reach.length - 1, Math.round(idx)));
    double s1 = Math.min(sEnd, scan.reach[i] - 2);
    if (s1 - s0 < 40) {
      return null;
    }
    double ux = Math.cos(a);
    double uy = -Math.sin(a);
    Measure.Candidate c = new Measure.Candidate(scan.ox, scan.oy, ux, uy, s0, s1);
    int minSupport = (int) Math.max(25, 0.2 * (s1 - s0));
    Measure.Result m = Measure.measure(ctx.full(), c, sig, window, 0, ctx.noise(), null, minSupport);
    if (m == null) {
      return null;
    }
    Measure.Candidate c2 = c.recentred(m.distortedFit());
    return Measure.measure(ctx.full(), c2, sig, ctx.narrowSecondPass() ? secondWindow(sig, window, m.widthPx()) : window, m.sign(), ctx.noise(), ctx.undistort(),
        minSupport);
  }
}
