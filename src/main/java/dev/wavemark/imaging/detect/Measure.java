package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.Point2;
import java.util.function.UnaryOperator;

/**
 * The accurate stage: intensity profiles sampled along many normals of a candidate line at
 * full resolution, the wave's centre located in each with sub-pixel precision, and a robust
 * line fitted to those centres.
 */
final class Measure {
  private Measure() {}

  /** Spacing of the samples along each normal, px. */
  static final double SAMPLE_PX = 0.5;
  /** Spacing of the normals along the line, px. */
  static final double NORMAL_STEP_PX = 1.0;
  /** A profile is used only if its signature stands this many noise deviations above zero. */
  static final double MIN_PROFILE_SNR = 2.5;

  /** A candidate: the line O + s u for s in [s0, s1], in frame (distorted) pixels. */
  record Candidate(double ox, double oy, double ux, double uy, double s0, double s1) {
    Candidate recentred(LineFit.Result f) {
      // project the old origin onto the fitted line, keep the orientation of the candidate
      double ux2 = f.ux();
      double uy2 = f.uy();
      if (ux2 * ux + uy2 * uy < 0) {
        ux2 = -ux2;
        uy2 = -uy2;
      }
      double t = (ox - f.cx()) * ux2 + (oy - f.cy()) * uy2;
      return new Candidate(f.cx() + t * ux2, f.cy() + t * uy2, ux2, uy2, s0, s1);
    }
  }

  /**
   * One measured wave boundary.
   *
   * @param fit the fitted line (in lens-corrected pixels when a correction was given)
   * @param distortedFit the same points fitted before lens correction (for re-centring and for
   *     finding where other waves meet this one in the frame)
   * @param amplitude mean signed signature amplitude (frame units)
   * @param widthPx mean apparent width across the line
   * @param sign the sign used (PEAK/STEP), the polarity (DIPOLE) or the side of the tail (ROOT_SPIKE, ROOT_PAIR)
   * @param kinkBlur a fan boundary's fitted kinked-step blur (samples), NaN when none was fitted
   */
  record Result(LineFit.Result fit, LineFit.Result distortedFit, double amplitude, double widthPx, int sign, double kinkBlur) {}

  /**
   * Measures the wave of the given signature near a candidate.
   *
   * @param halfWindowPx half-length of each normal profile
   * @param fixedSign 0 to take the sign from the mean profile, else +1/-1
   * @param noise the frame's pixel noise standard deviation
   * @return the measurement, or null when too few profiles show the signature
   */
  static Result measure(Raster full, Candidate c, Signature sig, double halfWindowPx, int fixedSign, double noise,
      UnaryOperator<Point2> undistort, int minSupport) {
    return measure(full, c, sig, halfWindowPx, fixedSign, noise, undistort, minSupport, 0);
  }

  /**
   * As {@link #measure(Raster, Candidate, Signature, double, int, double, UnaryOperator, int)},
   * for a boundary of a centred expansion fan whose centre is the candidate's origin (so that s is
   * the distance from the fan's centre) when {@code fanSide} is not 0. Each profile's centre is
   * then corrected for what a centred fan does to it, both falling as 1/s and so turning the line:
   * in schlieren (STEP) the pull of the fan side's slope on the box difference (see
   * {@link Profiles.Kink}), its shape fitted once to the mean profile; in shadowgraph (PEAK) the
   * shift of the thin line by half the ray displacement D on the fan's side, D being the area of
   * the line (the light gathered into a caustic, or missing from a gap, is that of a band D wide),
   * fitted as D = alpha / s over all profiles.
   *
   * @param fanSide +1 when the fan lies towards +n (n = (-uy, ux), the profiles' direction), -1
   *     towards -n, 0 for any other wave
   */
  static Result measure(Raster full, Candidate c, Signature sig, double halfWindowPx, int fixedSign, double noise,
      UnaryOperator<Point2> undistort, int minSupport, int fanSide) {
    return measure(full, c, sig, halfWindowPx, fixedSign, noise, undistort, minSupport, fanSide, Double.NaN);
  }

  /**
   * As {@link #measure(Raster, Candidate, Signature, double, int, double, UnaryOperator, int, int)},
   * a fan boundary's kinked step searched near {@code blurHint} (samples; a first pass's
   * {@link Result#kinkBlur}) instead of over every blur, when it is finite.
   */
  static Result measure(Raster full, Candidate c, Signature sig, double halfWindowPx, int fixedSign, double noise,
      UnaryOperator<Point2> undistort, int minSupport, int fanSide, double blurHint) {
    int m = (int) Math.round(2 * halfWindowPx / SAMPLE_PX) + 1;
    int count = (int) Math.floor((c.s1() - c.s0()) / NORMAL_STEP_PX) + 1;
    if (count < minSupport) {
      return null;
    }
    double nx = -c.uy();
    double ny = c.ux();
    double[][] prof = new double[count][];
    double[] mean = new double[m];
    int valid = 0;
    // a rejected profile's array is reused for the next normal
    double[] spare = null;
    for (int k = 0; k < count; k++) {
      double s = c.s0() + k * NORMAL_STEP_PX;
      double px = c.ox() + s * c.ux();
      double py = c.oy() + s * c.uy();
      if (spare == null) {
        spare = new double[m];
      }
      if (full.sampleLine(px, py, nx, ny, SAMPLE_PX, halfWindowPx, m, spare)) {
        double[] p = spare;
        spare = null;
        prof[k] = p;
        valid++;
        for (int j = 0; j < m; j++) {
          mean[j] += p[j];
        }
      }
    }
    if (valid < minSupport) {
      return null;
    }
    for (int j = 0; j < m; j++) {
      mean[j] /= valid;
    }
    int lo = m / 6;
    int hi = m - 1 - m / 6;
    int sign;
    Cone cone = null;
    if (sig.onset()) {
      cone = cone(mean, prof, c, sig, fixedSign, lo, hi);
      if (cone == null) {
        return null;
      }
      sign = cone.tail();
    } else {
      sign = fixedSign != 0 ? fixedSign : dominantSign(mean, sig);
    }
    int maxSep = (int) Math.round(1.4 * halfWindowPx / SAMPLE_PX);
    // the noise of a located signature: the raw noise for lines and pairs; for steps, that of the
    // difference of two means over a quarter of the profile (a quarter window, in px, of
    // independent pixels each)
    double noiseSig = sig == Signature.STEP ? noise * Math.sqrt(2 / Math.max(1, 0.5 * halfWindowPx)) : noise;
    // average G neighbouring profiles so that each located centre stands about 8 noise
    // deviations above zero (a faint wave gives fewer, better points instead of many bad ones)
    SqrtRiseTemplate onset = cone == null ? null : cone.template();
    Profiles.Located ml = locate(mean, sig, sign, lo, hi, maxSep, onset, Double.NaN);
    int half = Math.max(2, m / 4);
    Profiles.Kink kink = null;
    // the 1/s the mean profile's kink stands for: its profiles' jumps fall as 1/s, so it is the
    // mean of 1/s weighted by 1/s
    double invRef = Double.NaN;
    // the ray displacement on the fan's side as alpha / s, px
    double alpha = Double.NaN;
    if (fanSide != 0 && sig == Signature.STEP) {
      kink = Profiles.kinkFit(mean, sign, fanSide, lo, hi, half, blurHint);
      double w1 = 0;
      double w2 = 0;
      for (int k = 0; k < prof.length; k++) {
        if (prof[k] != null) {
          double s = c.s0() + k * NORMAL_STEP_PX;
          w1 += 1 / s;
          w2 += 1 / (s * s);
        }
      }
      invRef = w2 / w1;
    } else if (fanSide != 0 && sig == Signature.PEAK) {
      alpha = displacementScale(prof, c.s0());
    }
    double meanAmp = ml == null ? 0 : Math.abs(ml.amplitude());
    int group = meanAmp <= 0 ? 1 : (int) Math.ceil(Math.pow(8 * noiseSig / meanAmp, 2));
    group = Math.max(1, Math.min(group, valid / Math.max(minSupport / 4, 1)));
    if (group > 1) {
      prof = grouped(prof, group);
      count = prof.length;
      noiseSig /= Math.sqrt(group);
    }
    double step = NORMAL_STEP_PX * group;
    double[] xs = new double[count];
    double[] ys = new double[count];
    double[] dx = new double[count];
    double[] dy = new double[count];
    java.util.Map<Long, Double> pulls = new java.util.HashMap<>();
    int n = 0;
    double ampSum = 0;
    double widthSum = 0;
    for (int k = 0; k < count; k++) {
      if (prof[k] == null) {
        continue;
      }
      double s = c.s0() + (k + 0.5 * (group - 1) / group) * step;
      Profiles.Located l = locate(prof[k], sig, sign, lo, hi, maxSep, onset, cone == null ? Double.NaN : cone.shareAt(s));
      if (l == null || !(Math.abs(l.amplitude()) >= MIN_PROFILE_SNR * noiseSig)) {
        continue;
      }
      double centre = l.centre();
      if (kink != null) {
        double slope = kink.slope() / (s * invRef);
        // the pull depends on the centre only through its phase on the samples (the profiles
        // centre within a sample or two of the window's middle) and smoothly on the slope: it is
        // evaluated for eighths of a sample in phase and at slopes 10 % apart, linearly between
        double phase = centre - Math.floor(centre);
        int pb = (int) Math.round(phase * 8);
        double u = Math.log(Math.abs(slope) + 1e-12) / Math.log(1.1);
        int j = (int) Math.floor(u);
        double f = u - j;
        double b0 = pull(pulls, m, sign, fanSide, pb, j, slope < 0, kink.blur(), lo, hi, half);
        double b1 = pull(pulls, m, sign, fanSide, pb, j + 1, slope < 0, kink.blur(), lo, hi, half);
        double bias = b0 + f * (b1 - b0);
        centre -= Double.isFinite(bias) ? bias : 0;
      } else if (Double.isFinite(alpha)) {
        // the true boundary lies half the displacement from the line, towards the fan when light
        // was gathered into it, away from the fan when it is a gap
        centre += fanSide * 0.5 * alpha / s / SAMPLE_PX;
      }
      double o = centre * SAMPLE_PX - halfWindowPx;
      double px = c.ox() + s * c.ux() + o * nx;
      double py = c.oy() + s * c.uy() + o * ny;
      dx[n] = px;
      dy[n] = py;
      if (undistort != null) {
        Point2 q = undistort.apply(new Point2(px, py));
        xs[n] = q.x();
        ys[n] = q.y();
      } else {
        xs[n] = px;
        ys[n] = py;
      }
      ampSum += l.amplitude();
      widthSum += l.width() * SAMPLE_PX;
      n++;
    }
    if (n < Math.max(8, minSupport / group)) {
      return null;
    }
    LineFit.Result distorted = LineFit.fit(java.util.Arrays.copyOf(dx, n), java.util.Arrays.copyOf(dy, n), Math.max(8, minSupport / group), 17L);
    if (distorted == null) {
      return null;
    }
    LineFit.Result fit = undistort == null ? distorted
        : LineFit.fit(java.util.Arrays.copyOf(xs, n), java.util.Arrays.copyOf(ys, n), Math.max(8, minSupport / group), 17L);
    if (fit == null) {
      return null;
    }
    return new Result(fit, distorted, ampSum / n, widthSum / n, sign, kink == null ? Double.NaN : kink.blur());
  }

  /**
   * The scale alpha of a shadowgraph fan boundary's ray displacement D = alpha / s (px), from the
   * areas A of its profiles (each detrended over the window ends; see
   * {@link #measure(Raster, Candidate, Signature, double, int, double, UnaryOperator, int, int)}):
   * the least-squares fit of A = alpha / s, once over all profiles and once more over those whose
   * A s lies within three median absolute deviations of the median, so that a stretch where
   * another wave crosses the profiles does not set the correction of the whole boundary.
   *
   * @param s0 distance from the fan's centre of the first profile, px
   */
  static double displacementScale(double[][] prof, double s0) {
    int n = 0;
    double[] as = new double[prof.length];
    double[] ss = new double[prof.length];
    for (int k = 0; k < prof.length; k++) {
      if (prof[k] != null) {
        ss[n] = s0 + k * NORMAL_STEP_PX;
        as[n] = Profiles.area(Profiles.detrend(prof[k], 3)) * SAMPLE_PX * ss[n];
        n++;
      }
    }
    if (n == 0) {
      return Double.NaN;
    }
    double med = LineFit.medianInPlace(java.util.Arrays.copyOf(as, n), n);
    double[] dev = new double[n];
    for (int i = 0; i < n; i++) {
      dev[i] = Math.abs(as[i] - med);
    }
    // a copy's median: dev itself is read below, profile by profile
    double mad = LineFit.medianAbs(dev, n);
    double num = 0;
    double den = 0;
    for (int i = 0; i < n; i++) {
      if (dev[i] <= 3 * mad) {
        // A = alpha / s with equal noise in A: weights 1 / s^2 on A s / s^2
        num += as[i] / (ss[i] * ss[i]);
        den += 1 / (ss[i] * ss[i]);
      }
    }
    return den > 0 ? num / den : med;
  }

  /**
   * A fan boundary's pull at phase {@code pb} / 8 of a sample and slope -+1.1^j (see
   * {@link Profiles#stepKinkBias}), from {@code cache} or evaluated once on a model centred in
   * the window.
   */
  private static double pull(java.util.Map<Long, Double> cache, int m, int sign, int fanSide, int pb, int j, boolean negative,
      double blur, int lo, int hi, int half) {
    long key = (((long) j + 100_000) * 16 + pb) * 2 + (negative ? 1 : 0);
    Double known = cache.get(key);
    if (known != null) {
      return known;
    }
    double slope = (negative ? -1 : 1) * Math.pow(1.1, j);
    double v = Profiles.stepKinkBias(m, sign, fanSide, m / 2 + pb / 8.0, blur, slope, lo, hi, half);
    cache.put(key, v);
    return v;
  }

  /** Normals per stretch of a cone's shock over which the d^(3/2) term's share is read. */
  static final int SHARE_STRETCH = 50;

  /**
   * A cone's shock template and the side of its tail, with the d^(3/2) term's share read on
   * stretches of the shock (distance from the origin, px, and share; empty when none could be read).
   */
  record Cone(SqrtRiseTemplate template, int tail, double[] along, double[] share) {
    /** The share at distance s along the shock, linear between the stretches; NaN (free) when none. */
    double shareAt(double s) {
      int n = along.length;
      if (n == 0) {
        return Double.NaN;
      }
      if (s <= along[0] || n == 1) {
        return share[0];
      }
      for (int i = 1; i < n; i++) {
        if (s <= along[i]) {
          double f = (s - along[i - 1]) / (along[i] - along[i - 1]);
          return share[i - 1] + f * (share[i] - share[i - 1]);
        }
      }
      return share[n - 1];
    }
  }

  /**
   * A cone's smear (shock thickness and blur) and the side its tail lies on, read from the mean
   * profile (whose noise is one profile's over the number of them), and the d^(3/2) term's share
   * from the mean of each stretch of {@link #SHARE_STRETCH} normals: the field is conical, so the
   * share changes only slowly with the distance from the apex (as 1 / s to first order, but the
   * terms beyond bend that near the apex), and a profile's own fit of it would add its noise to
   * the onset. Null when the mean profile is too short to fit.
   */
  private static @org.jspecify.annotations.Nullable Cone cone(double[] mean, double[][] prof, Candidate c, Signature sig,
      int fixedSign, int lo, int hi) {
    SqrtRise.Fit f = SqrtRise.fitSmear(mean, order(sig), SAMPLE_PX, lo, hi, fixedSign);
    if (f == null) {
      return null;
    }
    SqrtRiseTemplate t = SqrtRise.template(order(sig), f.tail(), f.sigma(), mean.length, lo, hi);
    int stretches = (prof.length + SHARE_STRETCH - 1) / SHARE_STRETCH;
    double[] along = new double[stretches];
    double[] share = new double[stretches];
    int n = 0;
    for (int b = 0; b < stretches; b++) {
      double[] acc = new double[mean.length];
      double sum = 0;
      int used = 0;
      for (int k = b * SHARE_STRETCH; k < Math.min(prof.length, (b + 1) * SHARE_STRETCH); k++) {
        if (prof[k] != null) {
          for (int j = 0; j < acc.length; j++) {
            acc[j] += prof[k][j];
          }
          sum += c.s0() + k * NORMAL_STEP_PX;
          used++;
        }
      }
      if (used < SHARE_STRETCH / 4) {
        continue;
      }
      double r = t.share(acc);
      if (Double.isFinite(r)) {
        along[n] = sum / used;
        share[n] = r;
        n++;
      }
    }
    return new Cone(t, f.tail(), java.util.Arrays.copyOf(along, n), java.util.Arrays.copyOf(share, n));
  }

  /** Means of consecutive runs of {@code g} profiles; a run with a missing profile is dropped. */
  private static double[][] grouped(double[][] prof, int g) {
    int n = prof.length / g;
    double[][] out = new double[n][];
    for (int i = 0; i < n; i++) {
      double[] acc = null;
      for (int j = 0; j < g; j++) {
        double[] p = prof[i * g + j];
        if (p == null) {
          acc = null;
          break;
        }
        if (acc == null) {
          acc = p.clone();
        } else {
          for (int t = 0; t < p.length; t++) {
            acc[t] += p[t];
          }
        }
        if (j == g - 1) {
          for (int t = 0; t < acc.length; t++) {
            acc[t] /= g;
          }
        }
      }
      out[i] = acc;
    }
    return out;
  }

  /**
   * The centre of one profile.
   *
   * @param onset a cone's shock template, its smear and side fitted to the mean profile (ROOT_SPIKE,
   *     ROOT_PAIR; ignored otherwise)
   * @param next a cone's d^(3/2) term over its leading term at this profile, NaN to fit it freely
   */
  static Profiles.Located locate(double[] p, Signature sig, int sign, int lo, int hi, int maxSep,
      @org.jspecify.annotations.Nullable SqrtRiseTemplate onset, double next) {
    return switch (sig) {
      case PEAK -> Profiles.peak(Profiles.detrend(p, 3), sign, lo, hi);
      case STEP -> Profiles.step(p, sign, lo, hi, Math.max(2, p.length / 4));
      case DIPOLE -> Profiles.pairCentre(Profiles.detrend(p, 3), sign, lo, hi, maxSep);
      case ROOT_SPIKE, ROOT_PAIR -> onset == null ? null : onset.locate(p, next);
    };
  }

  private static SqrtRise.Order order(Signature sig) {
    return sig == Signature.ROOT_PAIR ? SqrtRise.Order.CURVATURE : SqrtRise.Order.GRADIENT;
  }

  /** The sign of the mean profile's signature: the sign of its largest excursion. */
  static int dominantSign(double[] mean, Signature sig) {
    double[] q = switch (sig) {
      case PEAK -> Profiles.detrend(mean, 3);
      case STEP -> Profiles.detrend(Profiles.derivative(mean), 3);
      case DIPOLE, ROOT_SPIKE, ROOT_PAIR -> Profiles.detrend(mean, 3);
    };
    if (sig == Signature.DIPOLE) {
      Profiles.Located l = Profiles.zeroCrossing(q, 0, q.length - 1, q.length);
      return l == null || l.amplitude() >= 0 ? 1 : -1;
    }
    double best = 0;
    int s = 1;
    for (int i = q.length / 6; i < q.length - q.length / 6; i++) {
      if (Math.abs(q[i]) > best) {
        best = Math.abs(q[i]);
        s = q[i] >= 0 ? 1 : -1;
      }
    }
    return s;
  }
}
