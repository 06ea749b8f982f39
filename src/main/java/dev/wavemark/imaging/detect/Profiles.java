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
   * A fan boundary's shape across it, fitted once to a boundary's mean profile. Inside a centred
   * fan the schlieren signal is not flat: the density gradient changes from ray to ray, so at
   * distance s from the fan's centre the level on the fan side of a boundary runs J (1 + kappa y / s)
   * with y the distance into the fan, while outside the uniform flow gives a flat level. Blurred,
   * that kink pulls the box difference's hump of {@link #step} towards the steeper side by an
   * amount that falls as 1/s, which turns the fitted line; {@link #stepKinkBias} gives that pull
   * for the shape found here so that it can be taken off each profile's centre.
   *
   * @param centre the kink's position in the mean profile, samples
   * @param blur Gaussian sigma of the blur across the boundary, samples
   * @param slope the fan side's slope over its jump (C / J), per sample
   */
  record Kink(double centre, double blur, double slope) {}

  /**
   * Least-squares fit of a blurred kinked step to a profile: a level and a slope common to both
   * sides, a jump at x0 and a change of slope there on the fan's side, all blurred by a Gaussian
   * of sigma b. The model is linear in its four levels, so only x0 and b are searched: x0 over
   * 4 samples either side of the box-difference estimate of {@link #step} (half samples, then
   * golden section), b over 0.6 to 10 samples in steps of 8 %.
   *
   * @param fanSide +1 when the fan lies towards higher indices, -1 towards lower
   * @return null when no step is found or the fit is degenerate
   */
  static Kink kinkFit(double[] p, int sign, int fanSide, int lo, int hi, int half) {
    return kinkFit(p, sign, fanSide, lo, hi, half, Double.NaN);
  }

  /**
   * As {@link #kinkFit(double[], int, int, int, int, int)}, the coarse search over blurs left out
   * when {@code blurHint} (samples) is finite: the fine search starts from it.
   */
  static Kink kinkFit(double[] p, int sign, int fanSide, int lo, int hi, int half, double blurHint) {
    Located box = step(p, sign, lo, hi, half);
    if (box == null) {
      return null;
    }
    double a = Math.max(lo, box.centre() - 4);
    double b = Math.min(hi, box.centre() + 4);
    if (!(b > a)) {
      return null;
    }
    // coarse to fine (the cost is smooth in both): blur every 20 % with the kink every sample,
    // then blur every 6 % about the best with the kink every quarter sample within half a sample
    // of its best, then the kink by golden section at the best blur
    double bestBlur = Double.NaN;
    double bestX = Double.NaN;
    double bestCost = Double.POSITIVE_INFINITY;
    boolean hinted = Double.isFinite(blurHint);
    for (double blur = hinted ? blurHint : 0.6; blur <= (hinted ? blurHint : 10.0) + 1e-9; blur *= 1.2) {
      for (double x = a; x <= b + 1e-9; x += 1.0) {
        double c = kinkCost(p, x, blur, fanSide, null);
        if (c < bestCost) {
          bestCost = c;
          bestX = x;
          bestBlur = blur;
        }
      }
    }
    if (!(bestCost < Double.POSITIVE_INFINITY)) {
      return null;
    }
    double b0 = bestBlur;
    double x0 = bestX;
    for (double blur = Math.max(0.6, b0 / 1.2); blur <= Math.min(10.0, b0 * 1.2) + 1e-9; blur *= 1.06) {
      for (double x = Math.max(a, x0 - 0.5); x <= Math.min(b, x0 + 0.5) + 1e-9; x += 0.25) {
        double c = kinkCost(p, x, blur, fanSide, null);
        if (c < bestCost) {
          bestCost = c;
          bestX = x;
          bestBlur = blur;
        }
      }
    }
    double[] best = bestKink(p, fanSide, bestX, Math.max(a, bestX - 0.25), Math.min(b, bestX + 0.25), bestBlur);
    if (best == null || !(sign * fanSide * best[1] > 0)) {
      return null;
    }
    double[] coef = new double[4];
    kinkCost(p, best[0], bestBlur, fanSide, coef);
    return new Kink(best[0], bestBlur, coef[3] / coef[2]);
  }

  /**
   * The pull of {@link #step} on a kinked step (see {@link Kink}): the box-difference centre of
   * the noise-free model of {@code m} samples with its kink at {@code x0}, minus x0 (samples).
   *
   * @param slope the fan side's slope over its jump at this profile's distance, per sample
   * @return the pull, or NaN when the model's step is not found
   */
  static double stepKinkBias(int m, int sign, int fanSide, double x0, double blur, double slope, int lo, int hi,
      int half) {
    double[] q = new double[m];
    for (int i = 0; i < m; i++) {
      double y = fanSide * (i - x0);
      q[i] = sign * fanSide * kinkShape(y, blur, slope);
    }
    Located l = step(q, sign, lo, hi, half);
    return l == null ? Double.NaN : l.centre() - x0;
  }

  /**
   * The unit kinked step at distance y into the fan: H(y) (1 + slope y) blurred by a Gaussian of
   * sigma b, which is Phi(y / b) + slope (y Phi(y / b) + b phi(y / b)).
   */
  static double kinkShape(double y, double blur, double slope) {
    double z = y / blur;
    double cdf = normalCdf(z);
    return cdf + slope * (y * cdf + blur * Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI));
  }

  /** {position, jump, residual sum of squares} of the best kinked step with x0 in [a, b]. */
  private static double[] bestKink(double[] p, int fanSide, double start, double a, double b, double blur) {
    if (!(b > a)) {
      return null;
    }
    double bestX = start;
    double bestCost = kinkCost(p, start, blur, fanSide, null);
    for (double x = a; x <= b + 1e-9; x += 0.5) {
      double c = kinkCost(p, x, blur, fanSide, null);
      if (c < bestCost) {
        bestCost = c;
        bestX = x;
      }
    }
    double l = Math.max(a, bestX - 0.5);
    double r = Math.min(b, bestX + 0.5);
    double g = 0.5 * (Math.sqrt(5) - 1);
    double x1 = r - g * (r - l);
    double x2 = l + g * (r - l);
    double f1 = kinkCost(p, x1, blur, fanSide, null);
    double f2 = kinkCost(p, x2, blur, fanSide, null);
    // 14 steps take the half-sample bracket below a thousandth of a sample
    for (int it = 0; it < 14; it++) {
      if (f1 < f2) {
        r = x2;
        x2 = x1;
        f2 = f1;
        x1 = r - g * (r - l);
        f1 = kinkCost(p, x1, blur, fanSide, null);
      } else {
        l = x1;
        x1 = x2;
        f1 = f2;
        x2 = l + g * (r - l);
        f2 = kinkCost(p, x2, blur, fanSide, null);
      }
    }
    double x = 0.5 * (l + r);
    double[] coef = new double[4];
    double cost = kinkCost(p, x, blur, fanSide, coef);
    if (!(cost < Double.POSITIVE_INFINITY)) {
      return null;
    }
    return new double[] {x, coef[2], cost};
  }

  /**
   * Residual sum of squares of the least-squares kinked step at {@code x0}: the basis 1, i - x0,
   * Phi(y / b) and the blurred ramp y Phi(y / b) + b phi(y / b), with y = fanSide (i - x0) the
   * distance into the fan. {@code coef} receives the four coefficients when given.
   */
  private static double kinkCost(double[] p, double x0, double blur, int fanSide, double[] coef) {
    double[] ata = new double[16];
    double[] aty = new double[4];
    double yy = 0;
    double[] f = new double[4];
    for (int i = 0; i < p.length; i++) {
      double y = fanSide * (i - x0);
      double z = y / blur;
      double cdf = normalCdf(z);
      f[0] = 1;
      f[1] = i - x0;
      f[2] = cdf;
      f[3] = y * cdf + blur * Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
      for (int r = 0; r < 4; r++) {
        aty[r] += f[r] * p[i];
        for (int c = 0; c <= r; c++) {
          ata[4 * r + c] += f[r] * f[c];
        }
      }
      yy += p[i] * p[i];
    }
    // Cholesky factor of the normal matrix (lower triangle), then the two triangular solves
    double[] l = new double[16];
    for (int r = 0; r < 4; r++) {
      for (int c = 0; c <= r; c++) {
        double v = ata[4 * r + c];
        for (int k = 0; k < c; k++) {
          v -= l[4 * r + k] * l[4 * c + k];
        }
        if (r == c) {
          if (!(v > 1e-12 * (1 + ata[4 * r + r]))) {
            return Double.POSITIVE_INFINITY;
          }
          l[4 * r + r] = Math.sqrt(v);
        } else {
          l[4 * r + c] = v / l[4 * c + c];
        }
      }
    }
    double[] w = new double[4];
    for (int r = 0; r < 4; r++) {
      double v = aty[r];
      for (int k = 0; k < r; k++) {
        v -= l[4 * r + k] * w[k];
      }
      w[r] = v / l[4 * r + r];
    }
    double explained = 0;
    for (int r = 0; r < 4; r++) {
      explained += w[r] * w[r];
    }
    if (coef != null) {
      for (int r = 3; r >= 0; r--) {
        double v = w[r];
        for (int k = r + 1; k < 4; k++) {
          v -= l[4 * k + r] * coef[k];
        }
        coef[r] = v / l[4 * r + r];
      }
    }
    return yy - explained;
  }

  /**
   * The standard normal distribution function, by Abramowitz and Stegun, Handbook of
   * Mathematical Functions (1964), eq. 7.1.26 for erf (absolute error below 1.5e-7, from memory).
   */
  static double normalCdf(double z) {
    double x = Math.abs(z) / Math.sqrt(2);
    double t = 1 / (1 + 0.3275911 * x);
    double poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
    double erf = 1 - poly * Math.exp(-x * x);
    return z >= 0 ? 0.5 * (1 + erf) : 0.5 * (1 - erf);
  }

  /** Sum of a profile's samples: its area in samples times the profile's units. */
  static double area(double[] q) {
    double a = 0;
    for (double v : q) {
      a += v;
    }
    return a;
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
