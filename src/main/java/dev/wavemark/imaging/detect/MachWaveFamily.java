package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Finds the weak Mach waves of an empty test section: faint, straight, parallel lines of two
 * families (running at +mu and -mu to the flow, mu = asin(1/M)), with no single origin. One such
 * line may stand barely above the noise in any one pixel; what makes the family findable is that
 * all of its lines share a direction and each is hundreds of pixels long.
 *
 * <p>Method:
 * <ol>
 *   <li><b>Family direction.</b> For each trial direction theta (acute angle to the flow from
 *       10° to 80°, or 8° either side of the hint when one is given), the reduced frame is
 *       projected along theta: every flow pixel adds its value to the bin of its coordinate across
 *       theta (a discrete Radon transform restricted to one direction at a time). At the family's
 *       direction each line falls into one or two bins and its mean stands out of the bin noise
 *       by the square root of the line's length; at other directions it smears over many bins.
 *       The score of a direction is the energy of the projection's bin means (weighted by the bin
 *       counts, so that it is in units of pixel variance) after a high-pass that removes the
 *       illumination's slow variation. In shadowgraph a line is a dark-bright pair, which the
 *       reduction half cancels, so its projection is first integrated over a few bins (the
 *       integral of a shadowgraph profile is the deflection, a single hump). The search runs
 *       coarse (0.5°) on a frame reduced to about 256 px wide, then fine (0.1°) on the
 *       detector's usual reduced frame; the peak is refined by a parabola.
 *   <li><b>Is there a family?</b> The peak score must stand {@value #MIN_FAMILY_Z} robust
 *       deviations (median and MAD over all trial directions) above the typical score: noise,
 *       dust and the window's rim score about the same at every direction.
 *   <li><b>Lines.</b> The fine projection at the family direction, high-passed, shows one peak
 *       per line; peaks standing {@value #MIN_LINE_Z} robust deviations above the bin noise, at
 *       least {@value #MIN_SEPARATION_PX} px apart, become candidate lines across the whole flow
 *       region.
 *   <li><b>Measurement.</b> Each candidate goes through the detector's accurate stage (full
 *       resolution normal profiles grouped until each located centre is well above the noise,
 *       sub-pixel centres, robust line fit, lens correction, uncertainty), so every line carries
 *       its own direction and standard uncertainty; the family's mean angle and its uncertainty
 *       are inference's work. A measured line that leaves the family direction by more than
 *       {@value #MAX_DEPARTURE_DEG}° (more than lens distortion or a real flow's non-uniformity
 *       can turn it) is another feature and is dropped.
 * </ol>
 *
 * <p>BoofCV has Hough line detectors, but they vote with thresholded edge pixels and find single
 * lines; a faint line below the per-pixel edge threshold casts no vote, and the family's shared
 * direction is not used. The projection here works on the signed intensities and is a few plain
 * loops over the reduced frame.
 */
final class MachWaveFamily {
  private MachWaveFamily() {}

  /** Smallest and largest Mach angle searched (M from about 5.8 down to 1.015). */
  static final double MIN_MU_RAD = Math.toRadians(10);
  static final double MAX_MU_RAD = Math.toRadians(80);
  static final double COARSE_STEP_RAD = Math.toRadians(0.5);
  static final double FINE_STEP_RAD = Math.toRadians(0.1);
  static final double FINE_HALF_RANGE_RAD = Math.toRadians(0.6);
  /** Widest raster of the coarse direction search, px. */
  static final int COARSE_WIDTH_PX = 320;
  /** Half-width of the running mean removed from the projection, bins. */
  static final int TREND_HALF_BINS = 8;
  /** Half-width of the local integral of a shadowgraph projection, bins. */
  static final int INTEGRAL_HALF_BINS = 2;
  /** Bins with fewer pixels than this are left out (the window's rim). */
  static final int MIN_BIN_COUNT = 8;
  /** A family's direction score must stand this many noise deviations above the floor. */
  static final double MIN_FAMILY_Z = 8;
  /** The quantile of the direction scores taken as the noise floor. */
  static final double FLOOR_QUANTILE = 0.2;
  /** A line's projection peak must stand this many robust deviations above the bin noise. */
  static final double MIN_LINE_Z = 6;
  /** Smallest distance between two lines of a family, frame px. */
  static final double MIN_SEPARATION_PX = 10;
  /** Most lines measured per family. */
  static final int MAX_LINES = 16;
  /** Largest departure of a measured line from the family direction, degrees. */
  static final double MAX_DEPARTURE_DEG = 1.0;
  /** Half-length of each normal profile, px. */
  static final double WINDOW_PX = 6;

  /**
   * The measured Mach waves of both families (or of the family leaving the wall, when the shape
   * has one), each with its side: {@link Side#UPPER} for the family at flow + mu.
   */
  static List<WaveDetector.Found> find(WaveDetector.Context ctx, BodyShape.Freestream shape, List<ExpectedWave> hints) {
    List<WaveDetector.Found> out = new ArrayList<>();
    int[] signs = shape.wall().map(w -> new int[] {w.solidSide() == Side.LOWER ? +1 : -1}).orElse(new int[] {+1, -1});
    Raster coarse = ctx.low();
    while (coarse.width > COARSE_WIDTH_PX) {
      coarse = coarse.reduced(2);
    }
    for (int sign : signs) {
      double[] range = range(sign, hints);
      Double theta = direction(coarse, ctx.low(), ctx.flow(), sign, range[0], range[1], ctx.shadow());
      if (theta != null) {
        out.addAll(lines(ctx, theta, sign));
      }
    }
    return out;
  }

  /** The Mach-angle interval searched for a family: the full range, or 8° around its hints. */
  static double[] range(int sign, List<ExpectedWave> hints) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    Side side = sign > 0 ? Side.UPPER : Side.LOWER;
    for (ExpectedWave h : hints) {
      if (h.kind() == WaveKind.MACH_WAVE && h.side() == side) {
        lo = Math.min(lo, h.angleToFlowRad() - WaveDetector.HINT_TOLERANCE_RAD);
        hi = Math.max(hi, h.angleToFlowRad() + WaveDetector.HINT_TOLERANCE_RAD);
      }
    }
    if (lo > hi) {
      return new double[] {MIN_MU_RAD, MAX_MU_RAD};
    }
    return new double[] {Math.max(MIN_MU_RAD, lo), Math.min(MAX_MU_RAD, hi)};
  }

  /**
   * The family's line direction (contract sense, pointing downstream), or null when no
   * direction stands out.
   */
  static Double direction(Raster coarse, Raster fine, double flow, int sign, double muLo, double muHi, boolean shadow) {
    int n = (int) Math.floor((muHi - muLo) / COARSE_STEP_RAD) + 1;
    if (n < 5) {
      return null;
    }
    double[] score = new double[n];
    for (int i = 0; i < n; i++) {
      score[i] = score(Projection.of(coarse, flow + sign * (muLo + i * COARSE_STEP_RAD)), shadow);
    }
    int best = argMax(score);
    // the floor: a low quantile of the scores (a line's energy spreads over several degrees
    // either side of its direction, so the median is not free of it); for noise alone the score
    // of one direction fluctuates about the floor by sqrt(2 / bins) of it
    double[] sorted = score.clone();
    Arrays.sort(sorted);
    double floor = Math.max(1e-30, sorted[(int) (FLOOR_QUANTILE * (n - 1))]);
    double bins = validBins(Projection.of(coarse, flow + sign * (muLo + best * COARSE_STEP_RAD)), shadow);
    double z = (score[best] / floor - 1) * Math.sqrt(0.5 * bins);
    if (z < MIN_FAMILY_Z) {
      return null;
    }
    double mu0 = muLo + (best + vertex(score, best)) * COARSE_STEP_RAD;
    int m = (int) Math.round(2 * FINE_HALF_RANGE_RAD / FINE_STEP_RAD) + 1;
    double[] fineScore = new double[m];
    for (int j = 0; j < m; j++) {
      double mu = mu0 - FINE_HALF_RANGE_RAD + j * FINE_STEP_RAD;
      fineScore[j] = score(Projection.of(fine, flow + sign * mu), shadow);
    }
    int fb = argMax(fineScore);
    double mu = mu0 - FINE_HALF_RANGE_RAD + (fb + vertex(fineScore, fb)) * FINE_STEP_RAD;
    return flow + sign * mu;
  }

  /** Measures the lines of the family at direction {@code theta}. */
  static List<WaveDetector.Found> lines(WaveDetector.Context ctx, double theta, int sign) {
    Raster low = ctx.low();
    Projection pr = Projection.of(low, theta);
    double[] q = profile(pr, ctx.shadow());
    double[] abs = new double[q.length];
    int valid = 0;
    for (int b = 0; b < q.length; b++) {
      if (!Double.isNaN(q[b])) {
        abs[valid++] = Math.abs(q[b] * Math.sqrt(pr.count[b]));
      }
    }
    if (valid < 4 * TREND_HALF_BINS) {
      return List.of();
    }
    double scale = Math.max(1e-30, 1.4826 * median(Arrays.copyOf(abs, valid)));
    int sep = (int) Math.ceil(MIN_SEPARATION_PX / low.scale / pr.bin);
    List<Integer> peaks = new ArrayList<>();
    Integer[] order = new Integer[q.length];
    for (int b = 0; b < q.length; b++) {
      order[b] = b;
    }
    double[] z = new double[q.length];
    for (int b = 0; b < q.length; b++) {
      z[b] = Double.isNaN(q[b]) ? 0 : Math.abs(q[b]) * Math.sqrt(pr.count[b]) / scale;
    }
    Arrays.sort(order, (a, c) -> Double.compare(z[c], z[a]));
    for (int b : order) {
      if (z[b] < MIN_LINE_Z || peaks.size() >= MAX_LINES) {
        break;
      }
      boolean near = false;
      for (int p : peaks) {
        near |= Math.abs(p - b) < sep;
      }
      if (!near) {
        peaks.add(b);
      }
    }
    List<WaveDetector.Found> out = new ArrayList<>();
    Point2 u = ImageAngles.unit(theta);
    Side side = sign > 0 ? Side.UPPER : Side.LOWER;
    for (int b : peaks) {
      Point2 on = pr.pointOnLine(b, low.scale);
      Measure.Result m = measure(ctx, on, u);
      if (m == null) {
        continue;
      }
      double dir = ImageAngles.direction(m.fit().ux(), m.fit().uy());
      if (Math.abs(ImageAngles.wrap(dir - theta)) > Math.toRadians(MAX_DEPARTURE_DEG)) {
        continue;
      }
      if (duplicate(m, out)) {
        continue;
      }
      LineFit.Result f = m.fit();
      Point2 start = new Point2(f.cx(), f.cy()).plus(new Point2(f.ux(), f.uy()).times(f.startAlong()));
      out.add(new WaveDetector.Found(WaveKind.MACH_WAVE, side, Feature.WALL, m, start));
    }
    return out;
  }

  /**
   * True when the measured line lies within {@value #MIN_SEPARATION_PX} px of one already kept:
   * two projection peaks (a line and a side lobe of it) that the accurate stage pulled onto the
   * same line, which must count once.
   */
  private static boolean duplicate(Measure.Result m, List<WaveDetector.Found> kept) {
    LineFit.Result a = m.distortedFit();
    for (WaveDetector.Found k : kept) {
      LineFit.Result b = k.m().distortedFit();
      double d = Math.abs((a.cx() - b.cx()) * -b.uy() + (a.cy() - b.cy()) * b.ux());
      if (d < MIN_SEPARATION_PX) {
        return true;
      }
    }
    return false;
  }

  /** The accurate stage along the line through {@code on} with direction {@code u}, over its longest run in the flow. */
  private static Measure.Result measure(WaveDetector.Context ctx, Point2 on, Point2 u) {
    Raster full = ctx.full();
    double reach = Math.hypot(full.width, full.height);
    double bestLo = 0;
    double bestHi = -1;
    double runLo = Double.NaN;
    for (double s = -reach; s <= reach; s += 1) {
      boolean in = full.inFlow(on.x() + s * u.x(), on.y() + s * u.y());
      if (in && Double.isNaN(runLo)) {
        runLo = s;
      }
      if ((!in || s + 1 > reach) && !Double.isNaN(runLo)) {
        if (s - runLo > bestHi - bestLo) {
          bestLo = runLo;
          bestHi = s;
        }
        runLo = Double.NaN;
      }
    }
    double s0 = bestLo + WINDOW_PX;
    double s1 = bestHi - WINDOW_PX;
    if (s1 - s0 < 60) {
      return null;
    }
    Signature sig = ctx.shadow() ? Signature.DIPOLE : Signature.PEAK;
    Measure.Candidate c = new Measure.Candidate(on.x(), on.y(), u.x(), u.y(), s0, s1);
    int minSupport = (int) Math.max(25, 0.2 * (s1 - s0));
    Measure.Result m = Measure.measure(full, c, sig, WINDOW_PX, 0, ctx.noise(), null, minSupport);
    if (m == null) {
      return null;
    }
    Measure.Candidate c2 = c.recentred(m.distortedFit());
    return Measure.measure(full, c2, sig, WINDOW_PX, m.sign(), ctx.noise(), ctx.undistort(), minSupport);
  }

  /**
   * The projection's bin means, high-passed (a running mean over {@value #TREND_HALF_BINS} bins
   * either side removed) and, in shadowgraph, locally integrated; NaN where a bin has too few
   * pixels.
   */
  static double[] profile(Projection pr, boolean shadow) {
    int n = pr.sum.length;
    double[] mean = new double[n];
    for (int b = 0; b < n; b++) {
      mean[b] = pr.count[b] >= MIN_BIN_COUNT ? pr.sum[b] / pr.count[b] : Double.NaN;
    }
    double[] hp = new double[n];
    for (int b = 0; b < n; b++) {
      if (Double.isNaN(mean[b])) {
        hp[b] = Double.NaN;
        continue;
      }
      double s = 0;
      int c = 0;
      for (int j = Math.max(0, b - TREND_HALF_BINS); j <= Math.min(n - 1, b + TREND_HALF_BINS); j++) {
        if (!Double.isNaN(mean[j])) {
          s += mean[j];
          c++;
        }
      }
      hp[b] = mean[b] - s / c;
    }
    if (!shadow) {
      return hp;
    }
    // the integral up to b minus the integral from b: a dark-bright pair becomes one hump
    double[] out = new double[n];
    for (int b = 0; b < n; b++) {
      double s = 0;
      boolean ok = !Double.isNaN(hp[b]);
      for (int j = 1; j <= INTEGRAL_HALF_BINS && ok; j++) {
        if (b - j < 0 || b + j >= n || Double.isNaN(hp[b - j]) || Double.isNaN(hp[b + j])) {
          ok = false;
        } else {
          s += hp[b - j] - hp[b + j];
        }
      }
      out[b] = ok ? 0.5 * s : Double.NaN;
    }
    return out;
  }

  /**
   * Count-weighted mean energy of the profile per bin: about the pixel variance for pure noise
   * (less the share the high-pass removes), more where lines line up with the direction.
   */
  static double score(Projection pr, boolean shadow) {
    double[] q = profile(pr, shadow);
    double e = 0;
    int n = 0;
    for (int b = 0; b < q.length; b++) {
      if (!Double.isNaN(q[b])) {
        e += pr.count[b] * q[b] * q[b];
        n++;
      }
    }
    return n == 0 ? 0 : e / n;
  }

  private static int validBins(Projection pr, boolean shadow) {
    int n = 0;
    for (double v : profile(pr, shadow)) {
      n += Double.isNaN(v) ? 0 : 1;
    }
    return n;
  }

  /** Offset of a parabola's vertex through the neighbours of index i, in (-0.5, 0.5), or 0 at an end. */
  static double vertex(double[] v, int i) {
    if (i <= 0 || i >= v.length - 1) {
      return 0;
    }
    double den = v[i - 1] - 2 * v[i] + v[i + 1];
    if (!(den < 0)) {
      return 0;
    }
    return Math.max(-0.5, Math.min(0.5, 0.5 * (v[i - 1] - v[i + 1]) / den));
  }

  private static int argMax(double[] v) {
    int best = 0;
    for (int i = 1; i < v.length; i++) {
      if (v[i] > v[best]) {
        best = i;
      }
    }
    return best;
  }

  static double median(double[] v) {
    double[] a = v.clone();
    Arrays.sort(a);
    int m = a.length;
    return m == 0 ? 0 : (m % 2 == 1 ? a[m / 2] : 0.5 * (a[m / 2 - 1] + a[m / 2]));
  }

  /**
   * The flow pixels of a raster summed into bins of their coordinate across a direction: bin b
   * holds the pixels whose centre has normal coordinate p = x nx + y ny in
   * [p0 + (b - 0.5) bin, p0 + (b + 0.5) bin).
   */
  static final class Projection {
    final double nx;
    final double ny;
    final double p0;
    final double bin;
    final double[] sum;
    final int[] count;

    private Projection(double nx, double ny, double p0, double bin, int n) {
      this.nx = nx;
      this.ny = ny;
      this.p0 = p0;
      this.bin = bin;
      this.sum = new double[n];
      this.count = new int[n];
    }

    /** Projects along the image direction {@code theta} (contract sense), bins one raster pixel wide. */
    static Projection of(Raster r, double theta) {
      // the line direction is (cos, -sin) in y-down pixels; its normal (sin, cos)
      double nx = Math.sin(theta);
      double ny = Math.cos(theta);
      double lo = Math.min(0, nx * (r.width - 1)) + Math.min(0, ny * (r.height - 1));
      double hi = Math.max(0, nx * (r.width - 1)) + Math.max(0, ny * (r.height - 1));
      double bin = 1.0;
      int n = (int) Math.ceil((hi - lo) / bin) + 2;
      Projection p = new Projection(nx, ny, lo, bin, n);
      double inv = 1 / bin;
      for (int y = 0; y < r.height; y++) {
        int row = y * r.width;
        double base = y * ny - lo;
        for (int x = 0; x < r.width; x++) {
          if (r.flow[row + x]) {
            int b = (int) ((base + x * nx) * inv + 0.5);
            p.sum[b] += r.data[row + x];
            p.count[b]++;
          }
        }
      }
      return p;
    }

    /**
     * A frame-pixel point on the line of bin b, for a raster of the given scale (its pixel
     * (x, y) covers frame pixels [kx, kx + k) x [ky, ky + k), centred at k x + (k - 1) / 2).
     */
    Point2 pointOnLine(int b, int scale) {
      double p = p0 + b * bin;
      // the raster point p * n lies on the line; map it to frame pixels
      double off = 0.5 * (scale - 1);
      return new Point2(scale * p * nx + off, scale * p * ny + off);
    }
  }
}
