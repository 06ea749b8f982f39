package dev.wavemark.imaging.detect;

import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Optics;

/**
 * What the picture looks like, shadowgraph or schlieren, and what the guess rests on.
 *
 * <p>A shadowgraph only moves light: a ray deflected at a shock lands a little further on, so the
 * light missing from the dark band is the light gathered into the bright caustic beside it, and
 * the frame-over-reference signal integrated across a shock line is zero. A knife edge instead
 * cuts off or lets through light in proportion to the deflection, which has one sign across a
 * shock, so the same integral is as large as the integral of the signal's magnitude. The guess
 * samples profiles across the strongest line of each of the model's shock searches ({@link
 * Search#primary}), and takes the mean over the lines of |integral of the mean profile| over
 * integral of its magnitude: near 0 is shadowgraph, near 1 schlieren.
 *
 * @param optics {@link Optics#SHADOWGRAPH} or {@link Optics#SCHLIEREN_VERTICAL_EDGE} (the
 *     detector treats both knife-edge orientations alike); {@link Optics#AUTO} when the flow
 *     region leaves nothing to judge by
 * @param lines how many shock lines were judged; 0 when none was found (a model without a shock
 *     search, or no line above the noise), and the guess then fell back to {@link
 *     Frames#pairingGuess}
 * @param netFraction the mean over those lines of the ratio above, NaN when no line was judged
 */
public record OpticsGuess(Optics optics, int lines, double netFraction) {

  /** Below this mean net fraction the picture is taken for a shadowgraph (midway between 0 and 1). */
  static final double SHADOW_BELOW = 0.9;
  /** Half-width of the profiles sampled across a line, px. */
  static final double HALF_PX = 24;
  /** Half-width of a candidate line accepted by the pencil search, px at 250 px from the origin (a shadowgraph pair's). */
  static final double MAX_LINE_PX = 14;
  /** The fewest profiles across a line that are judged. */
  static final int MIN_PROFILES = 40;

  /** Whether the guess was made from lines rather than the fallback. */
  public boolean fromLines() {
    return lines > 0;
  }

  /** The guess for a frame (eroded full raster and its reduced copy), from the model's shock searches. */
  static OpticsGuess of(Raster full, Raster low, BodyShape shape, double flowRad) {
    double sum = 0;
    int n = 0;
    for (Search s : Search.primary(shape, flowRad)) {
      if (s.fan()) {
        continue;
      }
      double f = netFraction(full, low, s);
      if (!Double.isNaN(f)) {
        sum += f;
        n++;
      }
    }
    if (n == 0) {
      // no shock line: a centred fan judged as a whole (an expansion corner's only wave)
      for (Search s : Search.primary(shape, flowRad)) {
        if (s.fan()) {
          double f = fanNetFraction(full, low, s);
          if (!Double.isNaN(f)) {
            sum += f;
            n++;
          }
        }
      }
    }
    if (n == 0) {
      return new OpticsGuess(Frames.pairingGuess(low), 0, Double.NaN);
    }
    double mean = sum / n;
    return new OpticsGuess(mean < SHADOW_BELOW ? Optics.SHADOWGRAPH : Optics.SCHLIEREN_VERTICAL_EDGE, n, mean);
  }

  /**
   * |integral| over integral of |signal| of the mean profile across the strongest line of one
   * search, NaN when the search finds no line above the noise or too short a one.
   */
  static double netFraction(Raster full, Raster low, Search s) {
    double rMax = Math.hypot(full.width, full.height);
    AngularScan scan = AngularScan.of(low, s.origin().x(), s.origin().y(), s.a0(), s.a1(), WaveDetector.ORIGIN_SKIP_PX, rMax);
    AngularScan.Hit h = scan.strongestLine(WaveDetector.MIN_CANDIDATE_SNR, MAX_LINE_PX / 250 / scan.step);
    if (h == null) {
      return Double.NaN;
    }
    int i = (int) Math.max(0, Math.min(scan.reach.length - 1, Math.round(h.index())));
    double s0 = 2 * WaveDetector.ORIGIN_SKIP_PX;
    double s1 = scan.reach[i] - 2;
    if (s1 - s0 < WaveDetector.MIN_LINE_PX) {
      return Double.NaN;
    }
    double[] mean = meanProfile(full, scan.ox, scan.oy, scan.angle(h.index()), s0, s1);
    return mean == null ? Double.NaN : netFraction(mean);
  }

  /**
   * The net fraction across a whole centred fan: the pencil's mean along each ray, summed over the
   * sector. Within the fan the density varies with the direction from its centre only, so along an
   * arc about the centre a shadowgraph's signal (the Laplacian) integrates to the change of the
   * arc-wise gradient, zero between the uniform flows either side; its head and tail are thin
   * lines of opposite sign. A knife edge sees the fan's gradient as a band of one sign. NaN when
   * the pencil shows neither a band nor a pair of lines above the noise.
   */
  static double fanNetFraction(Raster full, Raster low, Search s) {
    double rMax = Math.hypot(full.width, full.height);
    AngularScan lv = AngularScan.of(low, s.origin().x(), s.origin().y(), s.a0(), s.a1(), WaveDetector.ORIGIN_SKIP_PX, rMax).levels();
    double rTyp = 250;
    boolean band = lv.widestBand(0.6 * WaveDetector.MIN_CANDIDATE_SNR, 12.0 / rTyp / lv.step) != null;
    boolean pair = lv.oppositeLines(0.6 * WaveDetector.MIN_CANDIDATE_SNR, (int) Math.ceil(12.0 / rTyp / lv.step),
        10.0 / rTyp / lv.step) != null;
    if (!band && !pair) {
      return Double.NaN;
    }
    double[] q = new double[lv.profile.length];
    int m = 0;
    for (double v : lv.profile) {
      if (!Double.isNaN(v)) {
        q[m++] = v;
      }
    }
    if (m < 8) {
      return Double.NaN;
    }
    double base = median(q, 0, m);
    double net = 0;
    double abs = 0;
    for (int j = 0; j < m; j++) {
      net += q[j] - base;
      abs += Math.abs(q[j] - base);
    }
    return abs > 0 ? Math.abs(net) / abs : Double.NaN;
  }

  /** Spacing of the samples along each profile, px. */
  private static final double STEP_PX = 0.5;

  /**
   * The mean of the profiles across the ray from (ox, oy) along direction a, s0 to s1 px, each
   * sample averaged over the profiles on which it lies in the flow (near the model or the window's
   * rim a profile's far end is cut off); null when some sample has fewer than {@link #MIN_PROFILES}.
   */
  static double @org.jspecify.annotations.Nullable [] meanProfile(Raster full, double ox, double oy, double a, double s0, double s1) {
    int m = (int) Math.round(2 * HALF_PX / STEP_PX) + 1;
    double ux = Math.cos(a);
    double uy = -Math.sin(a);
    double[] mean = new double[m];
    int[] count = new int[m];
    for (double s = s0; s <= s1; s += 1) {
      double px = ox + s * ux;
      double py = oy + s * uy;
      for (int j = 0; j < m; j++) {
        double o = j * STEP_PX - HALF_PX;
        double v = full.sample(px - o * uy, py + o * ux);
        if (!Double.isNaN(v)) {
          mean[j] += v;
          count[j]++;
        }
      }
    }
    for (int j = 0; j < m; j++) {
      if (count[j] < MIN_PROFILES) {
        return null;
      }
      mean[j] /= count[j];
    }
    return mean;
  }

  /** Half-width of the part integrated about the line's strongest lobe, in multiples of that lobe's full width at half height. */
  static final double INTEGRATE_WIDTHS = 2.5;
  /** Outer edge of the ring either side of the integrated part on which the local baseline is fitted, same units. */
  static final double BASELINE_WIDTHS = 4;

  /**
   * The net fraction of one mean profile (samples {@link #STEP_PX} apart, {@link #HALF_PX} either
   * side of the line). The integral is taken over the line's own extent only: within {@link
   * #INTEGRATE_WIDTHS} widths of its strongest lobe, above a straight baseline fitted just outside
   * (to {@link #BASELINE_WIDTHS} widths). A shadowgraph's other lobe lies right beside the first;
   * broad levels either side (a cone's compression behind its shock, the halo that flattening a
   * frame without a no-flow reference leaves round a strong line) are taken off as the baseline.
   * NaN when the line is too wide for the profile.
   */
  static double netFraction(double[] mean) {
    int m = mean.length;
    int tail = (int) Math.round(4 / STEP_PX);
    double left = median(mean, 0, tail);
    double right = median(mean, m - tail, m);
    double[] r = new double[m];
    for (int j = 0; j < m; j++) {
      r[j] = mean[j] - (left + (right - left) * (j - 0.5 * tail) / (m - tail));
    }
    int p = -1;
    for (int j = tail; j < m - tail; j++) {
      if (p < 0 || Math.abs(r[j]) > Math.abs(r[p])) {
        p = j;
      }
    }
    double half = 0.5 * Math.abs(r[p]);
    double sign = Math.signum(r[p]);
    int lo = p;
    while (lo > 0 && sign * r[lo - 1] >= half) {
      lo--;
    }
    int hi = p;
    while (hi < m - 1 && sign * r[hi + 1] >= half) {
      hi++;
    }
    double w = Math.max(2, hi - lo + 1);
    int centre = (lo + hi) / 2;
    // a line standing on a plateau (a cone's) may be wider than the profile leaves room for: the
    // integrated part then ends a ring's width short of the profile's ends
    int ring = tail;
    int in = Math.min((int) Math.ceil(INTEGRATE_WIDTHS * w), Math.min(centre, m - 1 - centre) - ring);
    if (in < w) {
      return Double.NaN;
    }
    int out = Math.max(in + ring, (int) Math.ceil(BASELINE_WIDTHS * w));
    // the level either side, on the ring just outside the integrated part; the larger fraction of
    // the two (a knife edge's line may stand on a step, a cone's compression behind its shock,
    // and is judged against the flow ahead of it)
    double before = median(mean, Math.max(0, centre - out), centre - in);
    double after = median(mean, centre + in + 1, Math.min(m, centre + out + 1));
    return Math.max(fraction(mean, centre - in, centre + in, before), fraction(mean, centre - in, centre + in, after));
  }

  /** |sum| over sum of magnitudes of mean - base over samples from..to. */
  private static double fraction(double[] mean, int from, int to, double base) {
    double net = 0;
    double abs = 0;
    for (int j = from; j <= to; j++) {
      double v = mean[j] - base;
      net += v;
      abs += Math.abs(v);
    }
    return abs > 0 ? Math.abs(net) / abs : Double.NaN;
  }

  private static double median(double[] v, int from, int to) {
    double[] c = java.util.Arrays.copyOfRange(v, from, to);
    java.util.Arrays.sort(c);
    return c[c.length / 2];
  }
}
