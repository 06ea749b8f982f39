package dev.wavemark.imaging.detect;

/**
 * Sub-pixel location of a wave's centre in one intensity profile sampled across it at a fixed
 * spacing. All methods work on plain arrays so that they can be checked against analytic
 * profiles; offsets are returned in samples (fractional index), or NaN when the profile does
 * not show the signature clearly.
 */
final class Profiles {
  private Profiles() {}

  /** Levels, as fractions of the peak height, whose crossing midpoints are averaged. */
  private static final double[] LEVELS = {0.35, 0.5, 0.65};

  /** Result of one location: centre (fractional sample index), amplitude and width (samples). */
  record Located(double centre, double amplitude, double width) {}

  /** Subtracts the straight line through the means of the first and last {@code k} samples. */
  static double[] detrend(double[] p, int k) {
    int n = p.length;
    double a = 0;
    double b = 0;
    for (int i = 0; i < k; i++) {
      a += p[i];
      b += p[n - 1 - i];
    }
    a /= k;
    b /= k;
    double xa = 0.5 * (k - 1);
    double xb = n - 1 - xa;
    double[] q = new double[n];
    for (int i = 0; i < n; i++) {
      q[i] = p[i] - (a + (b - a) * (i - xa) / (xb - xa));
    }
    return q;
  }

  /** Central differences (per sample), ends copied from their neighbours. */
  static double[] derivative(double[] p) {
    int n = p.length;
    double[] d = new double[n];
    for (int i = 1; i < n - 1; i++) {
      d[i] = 0.5 * (p[i + 1] - p[i - 1]);
    }
    d[0] = d[1];
    d[n - 1] = d[n - 2];
    return d;
  }

  /**
   * Centre of a thin line of the given sign (+1 bright, -1 dark) in an already detrended
   * profile: the mean of the midpoints between the left and right crossings of 35, 50 and 65% of
   * the peak height. The midpoint of level crossings is unbiased for any symmetric profile,
   * including a saturated flat top, which a parabola through the top three samples is not.
   *
   * @param lo first index searched for the peak
   * @param hi last index searched (inclusive)
   */
  static Located peak(double[] q, int sign, int lo, int hi) {
    int best = -1;
    double h = 0;
    for (int i = Math.max(1, lo); i <= Math.min(q.length - 2, hi); i++) {
      double v = sign * q[i];
      if (v > h) {
        h = v;
        best = i;
      }
    }
    if (best < 0) {
      return null;
    }
    double sum = 0;
    double width = Double.NaN;
    for (double level : LEVELS) {
      double t = level * h;
      int j = best;
      while (j > 0 && sign * q[j] >= t) {
        j--;
      }
      if (sign * q[j] >= t) {
        return null;
      }
      double left = j + (t - sign * q[j]) / (sign * q[j + 1] - sign * q[j]);
      j = best;
      while (j < q.length - 1 && sign * q[j] >= t) {
        j++;
      }
      if (sign * q[j] >= t) {
        return null;
      }
      double right = j - (t - sign * q[j]) / (sign * q[j - 1] - sign * q[j]);
      sum += 0.5 * (left + right);
      if (level == 0.5) {
        width = right - left;
      }
    }
    return new Located(sum / LEVELS.length, sign * h, width);
  }

  /**
   * Midpoint of a step rising in the direction {@code sign} (+1: the profile increases with the
   * index), as the centre of the peak of its box difference: at each sample, the mean of the
   * {@code half} samples after it minus the mean of the {@code half} before (both means shortened
   * at the ends of the profile). For a step blurred by a symmetric kernel narrower than the box
   * this is a symmetric hump centred on the step whose height is the whole step, where the
   * derivative's peak is only the step over the blur's width (about a tenth of it at a 2 px blur
   * sampled every half pixel) with the same noise: a fan's boundary is a step of a few noise
   * deviations, which the derivative alone does not lift out of the noise.
   *
   * @param half box length, samples
   */
  static Located step(double[] p, int sign, int lo, int hi, int half) {
    int n = p.length;
    double[] c = new double[n + 1];
    for (int i = 0; i < n; i++) {
      c[i + 1] = c[i] + p[i];
    }
    double[] d = new double[n];
    for (int i = 0; i < n; i++) {
      int a = Math.max(0, i - half);
      int b = Math.min(n - 1, i + half);
      if (a == i || b == i) {
        continue;
      }
      d[i] = (c[b + 1] - c[i + 1]) / (b - i) - (c[i] - c[a]) / (i - a);
    }
    d[0] = d[1];
    d[n - 1] = d[n - 2];
    return peak(d, sign, lo, hi);
  }

  /**
   * Zero crossing of a dark-bright (or bright-dark) pair in a detrended profile. A shadowgraph
   * shock is rarely symmetric (the light leaving a wide dark band piles up in a thin bright
   * caustic), so the crossing taken is the steepest sign change between the brightest and the
   * darkest sample, refined by a least-squares line through the two samples either side of it.
   * The amplitude is half the lobe-to-lobe difference, signed +1 when the dark lobe comes first.
   *
   * @param maxSeparation the largest lobe separation accepted, samples
   */
  static Located zeroCrossing(double[] q, int lo, int hi, int maxSeparation) {
    int iMax = -1;
    int iMin = -1;
    double vMax = 0;
    double vMin = 0;
    for (int i = Math.max(0, lo); i <= Math.min(q.length - 1, hi); i++) {
      if (q[i] > vMax) {
        vMax = q[i];
        iMax = i;
      }
      if (q[i] < vMin) {
        vMin = q[i];
        iMin = i;
      }
    }
    if (iMax < 0 || iMin < 0 || Math.abs(iMax - iMin) < 2 || Math.abs(iMax - iMin) > maxSeparation) {
      return null;
    }
    int a = Math.min(iMax, iMin);
    int b = Math.max(iMax, iMin);
    int best = -1;
    double steep = 0;
    for (int j = a; j < b; j++) {
      if (q[j] * q[j + 1] <= 0 && Math.abs(q[j + 1] - q[j]) > steep) {
        steep = Math.abs(q[j + 1] - q[j]);
        best = j;
      }
    }
    if (best < 0) {
      return null;
    }
    double sx = 0;
    double sy = 0;
    double sxx = 0;
    double sxy = 0;
    int n = 0;
    for (int i = Math.max(a, best - 1); i <= Math.min(b, best + 2); i++) {
      sx += i;
      sy += q[i];
      sxx += (double) i * i;
      sxy += i * q[i];
      n++;
    }
    double den = n * sxx - sx * sx;
    double slope = den == 0 ? 0 : (n * sxy - sx * sy) / den;
    double root;
    if (slope == 0) {
      root = best + q[best] / (q[best] - q[best + 1]);
    } else {
      root = -(sy - slope * sx) / n / slope;
    }
    if (root < best - 1 || root > best + 2) {
      root = best + q[best] / (q[best] - q[best + 1]);
    }
    int polarity = iMin < iMax ? 1 : -1;
    return new Located(root, polarity * 0.5 * (vMax - vMin), b - a);
  }

  /**
   * Centre of a dark-bright pair as the peak of its running integral: the integral of a
   * shadowgraph profile is the deflection profile itself (a single hump centred on the wave),
   * and an integral is insensitive to how the light is shared between a wide dark band and a
   * thin caustic, which moves the steepest zero crossing by pixels from one normal to the next.
   *
   * @param polarity +1 when the dark lobe comes first
   */
  static Located pairCentre(double[] q, int polarity, int lo, int hi, int maxSeparation) {
    Located z = zeroCrossing(q, lo, hi, maxSeparation);
    if (z == null || (int) Math.signum(z.amplitude()) != polarity) {
      return null;
    }
    double[] c = new double[q.length];
    double acc = 0;
    for (int i = 0; i < q.length; i++) {
      // the integral up to the sample's centre, so that the hump is not shifted by half a sample
      c[i] = acc + 0.5 * q[i];
      acc += q[i];
    }
    Located p = peak(detrend(c, 2), -polarity, lo, hi);
    return p == null ? null : new Located(p.centre(), z.amplitude(), p.width());
  }
}
