package dev.wavemark.imaging.detect;

import java.util.List;

/**
 * The candidate stage: the reduced-resolution frame summed along each ray of a pencil from
 * a point where waves start (a Hough transform restricted to the lines through one point, which
 * is what the model geometry allows). A wave through the point shows in this angular profile
 * with the same signature it has across its line: a peak, a step or a dark-bright pair.
 * BoofCV's Hough detectors search all lines of the picture, which costs more and resolves the
 * angle worse than this one-parameter search.
 */
final class AngularScan {
  final double ox;
  final double oy;
  final double a0;
  final double step;
  /**
   * For each angle, the searched value: the ray's sum over the square root of its sample count
   * (see {@link #of}), or in a {@link #levels()} scan its mean.
   */
  final double[] profile;
  /** For each angle, the mean along the ray. */
  private final double[] level;
  /** For each angle, the largest radius (frame px) at which the ray is still in the flow. */
  final double[] reach;
  final double rMin;

  private AngularScan(double ox, double oy, double a0, double step, double[] profile, double[] level, double[] reach,
      double rMin) {
    this.ox = ox;
    this.oy = oy;
    this.a0 = a0;
    this.step = step;
    this.profile = profile;
    this.level = level;
    this.reach = reach;
    this.rMin = rMin;
  }

  double angle(double index) {
    return a0 + index * step;
  }

  /**
   * Scans directions a0..a1 (contract sense, radians, a1 &gt; a0) from (ox, oy) (frame px).
   *
   * @param low the reduced frame
   * @param rMin first radius used, frame px (the corner itself is unreliable)
   * @param rMax last radius used, frame px
   */
  static AngularScan of(Raster low, double ox, double oy, double a0, double a1, double rMin, double rMax) {
    return of(low, ox, oy, a0, a1, rMin, rMax, null);
  }

  /**
   * As {@link #of(Raster, double, double, double, double, double, double)}, each ray ending
   * {@code stop[4]} px before the line through (stop[0], stop[1]) along (stop[2], stop[3])
   * (frame px) where it meets that line ahead of the origin: another wave the searched one
   * runs into. What lies beyond is left out of the profile as well as out of the reach, so that
   * the wave beyond cannot win the search.
   *
   * <p>Each value of the profile is the sum along its ray over the square root of the number of
   * samples, not the mean: with independent pixel noise every value then carries the same noise
   * whatever the ray's length (the profile's noise estimate assumes that), and a short ray, e.g.
   * one that runs into the model a few tens of pixels out and crosses another wave's foot on the
   * way, no longer outweighs a long ray that lies on a wave for hundreds of pixels (a matched
   * filter's rule: evidence grows with the length on the line, noise with its square root).
   */
  static AngularScan of(Raster low, double ox, double oy, double a0, double a1, double rMin, double rMax,
      double @org.jspecify.annotations.Nullable [] stop) {
    return of(low, ox, oy, a0, a1, rMin, rMax, stop, List.of());
  }

  /**
   * As {@link #of(Raster, double, double, double, double, double, double, double[])}, leaving out
   * of every ray the samples that lie on one of the {@code avoid} bands (waves already measured,
   * each {@code {x, y, ux, uy, s0, s1, half, ...}}: the points x + s u, s in [s0, s1], and
   * everything within {@code half} of them across, frame px; further entries are not read). A ray that crosses a shock at a small angle
   * otherwise takes the shock's whole integral into its sum, which outweighs the faint, wide band
   * of a fan the ray lies in; the samples left out count neither as evidence nor as a gap.
   */
  static AngularScan of(Raster low, double ox, double oy, double a0, double a1, double rMin, double rMax,
      double @org.jspecify.annotations.Nullable [] stop, List<WaveDetector.ShockBand> avoid) {
    int k = low.scale;
    double rTyp = Math.max(rMin + 20, Math.min(rMax, 400));
    double step = Math.max(Math.toRadians(0.05), Math.min(Math.toRadians(0.5), 0.5 * k / rTyp));
    int n = (int) Math.ceil((a1 - a0) / step) + 1;
    double[] value = new double[n];
    double[] level = new double[n];
    double[] reach = new double[n];
    double off = 0.5 * (k - 1);
    double lx0 = (ox - off) / k;
    double ly0 = (oy - off) / k;
    double rs = rMin / k;
    boolean[] cell = low.cells();
    int w = low.width;
    float[] data = low.data;
    for (int i = 0; i < n; i++) {
      double a = a0 + i * step;
      double ux = Math.cos(a);
      double uy = -Math.sin(a);
      double re = (stop == null ? rMax : Math.min(rMax, distanceTo(ox, oy, ux, uy, stop))) / k;
      // the radii at which the ray is inside the raster's last full cell; outside it every
      // sample is missing, so the loop below needs no bounds test (the steps stay on rs + j)
      double[] span = {rs, re};
      clip(lx0, ux, w - 1, span);
      clip(ly0, uy, low.height - 1, span);
      double sum = 0;
      int cnt = 0;
      double last = 0;
      int misses = 0;
      if (span[0] <= span[1]) {
        double first = rs + Math.max(0, Math.ceil(span[0] - rs));
        for (double r = first; r <= span[1]; r += 1.0) {
          double x = lx0 + r * ux;
          double y = ly0 + r * uy;
          int x0 = (int) x;
          int y0 = (int) y;
          int c = y0 * w + x0;
          if (!cell[c]) {
            if (cnt > 0 && ++misses > 6) {
              break;
            }
            continue;
          }
          if (!avoid.isEmpty() && onBand(ox + r * k * ux, oy + r * k * uy, avoid)) {
            misses = 0;
            last = r;
            continue;
          }
          double fx = x - x0;
          double fy = y - y0;
          double top = data[c] + fx * (data[c + 1] - data[c]);
          double bot = data[c + w] + fx * (data[c + w + 1] - data[c + w]);
          misses = 0;
          sum += top + fy * (bot - top);
          cnt++;
          last = r;
        }
      }
      value[i] = cnt >= 8 ? sum / Math.sqrt(cnt) : Double.NaN;
      level[i] = cnt >= 8 ? sum / cnt : Double.NaN;
      reach[i] = last * k;
    }
    return new AngularScan(ox, oy, a0, step, value, level, reach, rMin);
  }

  /** True when frame point (x, y) lies on one of the bands (see {@link #of(Raster, double, double, double, double, double, double, double[], List)}). */
  private static boolean onBand(double x, double y, List<WaveDetector.ShockBand> avoid) {
    for (WaveDetector.ShockBand b : avoid) {
      if (b.contains(x, y)) {
        return true;
      }
    }
    return false;
  }

  /**
   * Narrows span = [lo, hi] to the radii r at which p0 + r d lies in [0, max) (strictly below
   * max, so that the bilinear cell to the right or below exists). A span emptied has lo &gt; hi.
   */
  private static void clip(double p0, double d, double max, double[] span) {
    double lim = Math.nextDown(max);
    if (d == 0) {
      if (!(p0 >= 0 && p0 <= lim)) {
        span[0] = 1;
        span[1] = 0;
      }
      return;
    }
    double ta = (0 - p0) / d;
    double tb = (lim - p0) / d;
    double lo = Math.min(ta, tb);
    double hi = Math.max(ta, tb);
    // rounding in the division may put the end a hair outside: step the ends inwards until inside
    while (!(p0 + lo * d >= 0 && p0 + lo * d <= lim) && lo < hi) {
      lo = Math.nextUp(lo);
    }
    while (!(p0 + hi * d >= 0 && p0 + hi * d <= lim) && hi > lo) {
      hi = Math.nextDown(hi);
    }
    span[0] = Math.max(span[0], lo);
    span[1] = Math.min(span[1], hi);
  }

  /**
   * The same pencil searched on the mean along each ray: the level of a band that fills its rays
   * (a fan: every ray through a centred fan's origin lies in it for its whole length), whose
   * edges are where that level falls to half, whatever each ray's length.
   */
  AngularScan levels() {
    return new AngularScan(ox, oy, a0, step, level, level, reach, rMin);
  }

  /** Distance along the ray (dx, dy) from (ox, oy) to {@code stop[4]} px short of the stop line; infinite if it never meets it. */
  private static double distanceTo(double ox, double oy, double dx, double dy, double[] stop) {
    double det = dx * stop[3] - dy * stop[2];
    if (Math.abs(det) < 1e-9) {
      return Double.POSITIVE_INFINITY;
    }
    double t = ((stop[0] - ox) * stop[3] - (stop[1] - oy) * stop[2]) / det;
    return t > 0 ? Math.max(0, t - stop[4]) : Double.POSITIVE_INFINITY;
  }

  /** Robust noise of the profile: the MAD of its first differences, over sqrt 2. */
  double noise() {
    double[] d = new double[profile.length];
    int m = 0;
    for (int i = 1; i < profile.length; i++) {
      if (!Double.isNaN(profile[i]) && !Double.isNaN(profile[i - 1])) {
        d[m++] = profile[i] - profile[i - 1];
      }
    }
    return Math.max(1e-12, 1.4826 * LineFit.medianAbs(d, m) / Math.sqrt(2));
  }

  private double at(int i) {
    return i < 0 || i >= profile.length || Double.isNaN(profile[i]) ? 0 : profile[i];
  }

  /** A found candidate direction (fractional index) with its strength and sign. */
  record Hit(double index, double strength, int sign, double widthIndex) {}

  /**
   * The strongest thin line: the largest |value| of the profile with its running median taken
   * off (schlieren: a peak; the median leaves the broad plateau of a conical compression or of
   * a fan beside it out, so that a shock on top of such a plateau still reads as a thin line),
   * refined as the midpoint of its half-height crossings. Returns null if nothing exceeds
   * {@code minSnr} noise deviations.
   */
  Hit strongestLine(double minSnr, double maxWidthIndex) {
    return strongestLine(minSnr, maxWidthIndex, true);
  }

  /**
   * As {@link #strongestLine(double, double)}; with {@code removePlateau} false the raw profile
   * is searched (a short pencil, e.g. a reflected shock's, is too narrow for a running median).
   */
  Hit strongestLine(double minSnr, double maxWidthIndex, boolean removePlateau) {
    double sigma = noise();
    double[] q = removePlateau ? withoutMedian((int) Math.ceil(PLATEAU_WIDTHS * maxWidthIndex)) : withoutMedian(0);
    int best = -1;
    double bv = 0;
    for (int i = 1; i < q.length - 1; i++) {
      double v = Math.abs(q[i]);
      if (v > bv && isNarrow(q, i, maxWidthIndex)) {
        bv = v;
        best = i;
      }
    }
    if (best < 0 || bv < minSnr * sigma) {
      return null;
    }
    int sign = q[best] >= 0 ? 1 : -1;
    for (int i = 0; i < q.length; i++) {
      q[i] *= sign;
    }
    Profiles.Located l = Profiles.peak(q, 1, best, best);
    double centre = l == null ? best : l.centre();
    double width = l == null ? 1 : l.width();
    return new Hit(centre, bv / sigma, sign, width);
  }

  /** Running-median half-width, in multiples of the widest line accepted. */
  static final double PLATEAU_WIDTHS = 3;

  /** The profile minus its running median over 2w+1 angles (missing angles give zero); w = 0 gives the profile. */
  double[] withoutMedian(int w) {
    int n = profile.length;
    double[] q = new double[n];
    if (w == 0) {
      for (int i = 0; i < n; i++) {
        q[i] = at(i);
      }
      return q;
    }
    // a missing ray (out of the flow, too short) is no evidence either way: it stays zero and is
    // left out of its neighbours' medians, or a gap in a bright plateau would read as a dark line
    double[] win = new double[2 * w + 1];
    for (int i = 0; i < n; i++) {
      if (Double.isNaN(profile[i])) {
        continue;
      }
      int lo = Math.max(0, i - w);
      int hi = Math.min(n - 1, i + w);
      int m = 0;
      for (int k = lo; k <= hi; k++) {
        if (!Double.isNaN(profile[k])) {
          win[m++] = profile[k];
        }
      }
      // the upper median by quickselect (linear time; a sort of every window cost more than the pencil)
      q[i] = profile[i] - org.ddogleg.sorting.QuickSelect.select(win, m / 2, m);
    }
    return q;
  }

  private static boolean isNarrow(double[] q, int i, double maxWidthIndex) {
    double v = Math.abs(q[i]);
    if (v == 0) {
      return false;
    }
    int w = (int) Math.ceil(maxWidthIndex);
    int lo = i;
    while (lo > 0 && Math.abs(q[lo]) >= 0.5 * v && i - lo <= w) {
      lo--;
    }
    int hi = i;
    while (hi < q.length - 1 && Math.abs(q[hi]) >= 0.5 * v && hi - i <= w) {
      hi++;
    }
    return hi - lo <= 2 * w && v >= Math.abs(q[i - 1]) && v >= Math.abs(q[i + 1]);
  }


  /**
   * The strongest dark-bright pair (shadowgraph shock): the largest lobe-to-lobe difference
   * between extrema of opposite sign within {@code maxSepIndex}; its zero crossing.
   */
  Hit strongestPair(double minSnr, int maxSepIndex) {
    double sigma = noise();
    double best = 0;
    int bi = -1;
    int bj = -1;
    for (int i = 1; i < profile.length - 1; i++) {
      if (!(at(i) > at(i - 1) && at(i) >= at(i + 1) && at(i) > 0)) {
        continue;
      }
      for (int j = Math.max(0, i - maxSepIndex); j <= Math.min(profile.length - 1, i + maxSepIndex); j++) {
        double d = at(i) - at(j);
        if (at(j) < 0 && d > best && Math.min(at(i), -at(j)) > 0.25 * Math.max(at(i), -at(j))) {
          best = d;
          bi = i;
          bj = j;
        }
      }
    }
    if (bi < 0 || 0.5 * best < minSnr * sigma) {
      return null;
    }
    int a = Math.min(bi, bj);
    int b = Math.max(bi, bj);
    double[] q = new double[b - a + 1];
    for (int i = a; i <= b; i++) {
      q[i - a] = at(i);
    }
    Profiles.Located l = Profiles.zeroCrossing(q, 0, q.length - 1, q.length);
    double centre = l == null ? 0.5 * (a + b) : a + l.centre();
    return new Hit(centre, 0.5 * best / sigma, bj < bi ? 1 : -1, b - a);
  }

  /**
   * The widest band of one sign (schlieren fan): the run of angles whose |profile| stays above
   * {@code minSnr} noise deviations, scored by its median level times its width; returns its two
   * edges (lower index first) or null. Each edge is where the level changes fastest (see
   * {@link #steepest}), not where it crosses half the band's level: a fan's level is not flat
   * across it (the knife edge sees a share of the gradient that turns with the rays, and the
   * density gradient itself changes through the fan), and every ray just outside a boundary still
   * passes within the blur of it near the origin, where the fan is brightest, so that the band
   * has long skirts. A half-level crossing then lies degrees outside the boundary; the steepest
   * change of a step blurred by a symmetric kernel lies on it.
   */
  Hit[] widestBand(double minSnr, double minWidthIndex) {
    double sigma = noise();
    double thr = minSnr * sigma;
    Hit[] best = null;
    double bestScore = 0;
    int i = 0;
    while (i < profile.length) {
      if (Math.abs(at(i)) < thr) {
        i++;
        continue;
      }
      int sign = at(i) > 0 ? 1 : -1;
      int j = i;
      while (j + 1 < profile.length && sign * at(j + 1) >= thr) {
        j++;
      }
      int width = j - i + 1;
      // a band running into the end of the sector is a wave crossing the pencil, not a fan
      boolean bounded = i > 0 && j < profile.length - 1;
      if (width >= minWidthIndex && bounded) {
        double[] vals = new double[width];
        for (int k = i; k <= j; k++) {
          vals[k - i] = sign * at(k);
        }
        double level = median(vals);
        int mid = (i + j) / 2;
        double left = steepest(i, mid, sign);
        double right = steepest(mid, j, -sign);
        double score = level * (right - left);
        if (score > bestScore) {
          bestScore = score;
          best = new Hit[] {new Hit(left, level / sigma, sign, right - left), new Hit(right, level / sigma, sign, right - left)};
        }
      }
      i = j + 1;
    }
    return best;
  }

  /**
   * The fractional index in [lo, hi] where {@code sign} times the profile rises fastest: the
   * centre of the largest peak of its central difference (smoothed over three angles), located
   * by {@link Profiles#peak}'s level crossings.
   */
  private double steepest(int lo, int hi, int sign) {
    int n = profile.length;
    double[] d = new double[n];
    for (int k = 1; k < n - 1; k++) {
      d[k] = 0.5 * sign * (at(k + 1) - at(k - 1));
    }
    double[] q = new double[n];
    for (int k = 1; k < n - 1; k++) {
      q[k] = (d[k - 1] + d[k] + d[k + 1]) / 3;
    }
    Profiles.Located l = Profiles.peak(q, 1, Math.max(1, lo), Math.min(n - 2, hi));
    if (l != null && l.centre() >= lo - 1 && l.centre() <= hi + 1) {
      return l.centre();
    }
    int best = Math.max(1, lo);
    for (int k = Math.max(1, lo); k <= Math.min(n - 2, hi); k++) {
      if (q[k] > q[best]) {
        best = k;
      }
    }
    return best;
  }

  /** The two strongest thin lines of opposite sign at least {@code minSepIndex} apart (shadowgraph fan). */
  Hit[] oppositeLines(double minSnr, int minSepIndex, double maxWidthIndex) {
    double sigma = noise();
    Hit pos = null;
    Hit neg = null;
    double[] q = new double[profile.length];
    for (int k = 0; k < q.length; k++) {
      q[k] = at(k);
    }
    for (int i = 1; i < profile.length - 1; i++) {
      double v = q[i];
      if (Math.abs(v) < minSnr * sigma || !isNarrow(q, i, maxWidthIndex)) {
        continue;
      }
      Hit h = new Hit(i, Math.abs(v) / sigma, v > 0 ? 1 : -1, 1);
      if (v > 0 && (pos == null || h.strength() > pos.strength())) {
        pos = h;
      } else if (v < 0 && (neg == null || h.strength() > neg.strength())) {
        neg = h;
      }
    }
    if (pos == null || neg == null || Math.abs(pos.index() - neg.index()) < minSepIndex) {
      return null;
    }
    return pos.index() < neg.index() ? new Hit[] {pos, neg} : new Hit[] {neg, pos};
  }

  private static double median(double[] v) {
    double[] a = v.clone();
    java.util.Arrays.sort(a);
    return a[a.length / 2];
  }
}
