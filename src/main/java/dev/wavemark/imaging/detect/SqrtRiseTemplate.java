package dev.wavemark.imaging.detect;

/**
 * A {@link SqrtRise} template of one smear and side laid out for many profiles of the same
 * length: its terms, their sums, and the inverse of the fit's normal matrix at onsets every
 * {@link #GRID} samples, so that fitting a profile costs two dot products per onset tried. Built
 * once per line and pass ({@link Measure}); immutable after construction.
 */
final class SqrtRiseTemplate {
  /** Spacing of the onsets laid out, samples. */
  static final double GRID = 0.1;
  /** Onsets per coarse step of the search at the least (a sample). */
  private static final int COARSE = 10;

  private final int n;
  private final int lo;
  private final double sigma;
  private final SqrtRise.Order order;
  private final double[][] rise;
  private final double[][] term2;
  private final double[][] inverse;
  /** Per onset: sums of T, U, j T, j U, T T, T U and U U over the profile. */
  private final double[][] sums;
  private final double sumJ;
  private final double sumJJ;

  SqrtRiseTemplate(SqrtRise.Order order, int tail, double sigma, int n, int lo, int hi) {
    this.n = n;
    this.lo = lo;
    this.sigma = sigma;
    this.order = order;
    int count = (int) Math.floor((hi - lo) / GRID + 1e-9) + 1;
    rise = new double[count][n];
    term2 = new double[count][n];
    inverse = new double[count][];
    sums = new double[count][7];
    double sj = 0;
    double sjj = 0;
    for (int j = 0; j < n; j++) {
      sj += j;
      sjj += (double) j * j;
    }
    sumJ = sj;
    sumJJ = sjj;
    double scale = order == SqrtRise.Order.GRADIENT ? 1 / Math.sqrt(sigma) : 1 / (sigma * Math.sqrt(sigma));
    for (int g = 0; g < count; g++) {
      double x0 = lo + g * GRID;
      double[][] m = new double[SqrtRise.TERMS][SqrtRise.TERMS];
      for (int j = 0; j < n; j++) {
        double z = tail * (j - x0) / sigma;
        rise[g][j] = scale * SqrtRise.unit(order, z);
        term2[g][j] = order == SqrtRise.Order.GRADIENT ? SqrtRise.rise(z) : SqrtRise.unit(SqrtRise.Order.GRADIENT, z);
        double[] x = {1, j, rise[g][j], term2[g][j]};
        double[] sg = sums[g];
        sg[0] += x[2];
        sg[1] += x[3];
        sg[2] += j * x[2];
        sg[3] += j * x[3];
        sg[4] += x[2] * x[2];
        sg[5] += x[2] * x[3];
        sg[6] += x[3] * x[3];
        for (int a = 0; a < SqrtRise.TERMS; a++) {
          for (int b = 0; b < SqrtRise.TERMS; b++) {
            m[a][b] += x[a] * x[b];
          }
        }
      }
      inverse[g] = invert(m);
    }
  }

  /** As {@link #locate(double[], double)} with the d^(3/2) term free. */
  Profiles.Located locate(double[] q) {
    return locate(q, Double.NaN);
  }

  /**
   * The profile's onset, spike and the smear's width, or null when it is not n samples long.
   *
   * @param next the d^(3/2) term's coefficient over the leading term's, or NaN to fit it freely
   */
  Profiles.Located locate(double[] q, double next) {
    double[] coef = new double[SqrtRise.TERMS];
    double pos = search(q, next, coef);
    if (Double.isNaN(pos)) {
      return null;
    }
    double spike = coef[2] * (order == SqrtRise.Order.GRADIENT ? SqrtRise.SLOPE_SPIKE / Math.sqrt(sigma) : SqrtRise.BEND_SPIKE / (sigma * Math.sqrt(sigma)));
    return new Profiles.Located(lo + pos * GRID, spike, SqrtRise.FWHM_PER_SIGMA * sigma);
  }

  /** The d^(3/2) term's coefficient over the leading term's, both fitted freely; NaN when the profile does not fit. */
  double share(double[] q) {
    double[] coef = new double[SqrtRise.TERMS];
    return Double.isNaN(search(q, Double.NaN, coef)) ? Double.NaN : coef[3] / coef[2];
  }

  /** The best onset (fractional index into the laid-out onsets, NaN if none) and its coefficients into coef. */
  private double search(double[] q, double next, double[] coef) {
    if (q.length != n) {
      return Double.NaN;
    }
    double qq = 0;
    double q0 = 0;
    double q1 = 0;
    for (int j = 0; j < n; j++) {
      qq += q[j] * q[j];
      q0 += q[j];
      q1 += j * q[j];
    }
    int count = inverse.length;
    int best = -1;
    double bestR = Double.POSITIVE_INFINITY;
    // half a smear apart (the residual's trough is a smear wide), then halving steps about the best
    int coarse = Math.max(COARSE, (int) Math.round(0.5 * sigma / GRID));
    for (int g = 0; g < count; g += coarse) {
      double r = residual(g, q, qq, q0, q1, next, null);
      if (r < bestR) {
        bestR = r;
        best = g;
      }
    }
    if (best < 0) {
      return Double.NaN;
    }
    for (int step = coarse / 2; step >= 1; step = step == 1 ? 0 : (step + 1) / 2) {
      int centre = best;
      for (int g : new int[] {centre - step, centre + step}) {
        if (g >= 0 && g < count) {
          double r = residual(g, q, qq, q0, q1, next, null);
          if (r < bestR) {
            bestR = r;
            best = g;
          }
        }
      }
    }
    double pos = best;
    if (best > 0 && best < count - 1) {
      // the vertex of the parabola through the best onset and its neighbours
      double rm = residual(best - 1, q, qq, q0, q1, next, null);
      double rp = residual(best + 1, q, qq, q0, q1, next, null);
      double den = rm - 2 * bestR + rp;
      if (den > 0) {
        pos += Math.max(-0.5, Math.min(0.5, 0.5 * (rm - rp) / den));
      }
    }
    residual(best, q, qq, q0, q1, next, coef);
    return pos;
  }

  private double residual(int g, double[] q, double qq, double q0, double q1, double next, double[] coef) {
    double[] t = rise[g];
    double[] u = term2[g];
    double q2 = 0;
    double q3 = 0;
    for (int j = 0; j < n; j++) {
      q2 += t[j] * q[j];
      q3 += u[j] * q[j];
    }
    if (Double.isNaN(next)) {
      double[] inv = inverse[g];
      if (inv == null) {
        return Double.POSITIVE_INFINITY;
      }
      double r = qq;
      for (int a = 0; a < SqrtRise.TERMS; a++) {
        int i = a * SqrtRise.TERMS;
        double c = inv[i] * q0 + inv[i + 1] * q1 + inv[i + 2] * q2 + inv[i + 3] * q3;
        r -= c * (a == 0 ? q0 : a == 1 ? q1 : a == 2 ? q2 : q3);
        if (coef != null) {
          coef[a] = c;
        }
      }
      return r;
    }
    // the two terms in the given proportion: one column T + next U (Cramer's rule on 3 x 3)
    double[] sg = sums[g];
    double a02 = sg[0] + next * sg[1];
    double a12 = sg[2] + next * sg[3];
    double a22 = sg[4] + 2 * next * sg[5] + next * next * sg[6];
    double v2 = q2 + next * q3;
    double a00 = n;
    double a01 = sumJ;
    double a11 = sumJJ;
    double det = a00 * (a11 * a22 - a12 * a12) - a01 * (a01 * a22 - a12 * a02) + a02 * (a01 * a12 - a11 * a02);
    if (!(Math.abs(det) > 1e-300)) {
      return Double.POSITIVE_INFINITY;
    }
    double x0 = (q0 * (a11 * a22 - a12 * a12) - a01 * (q1 * a22 - a12 * v2) + a02 * (q1 * a12 - a11 * v2)) / det;
    double x1 = (a00 * (q1 * a22 - a12 * v2) - q0 * (a01 * a22 - a12 * a02) + a02 * (a01 * v2 - q1 * a02)) / det;
    double x2 = (a00 * (a11 * v2 - q1 * a12) - a01 * (a01 * v2 - q1 * a02) + q0 * (a01 * a12 - a11 * a02)) / det;
    if (coef != null) {
      coef[0] = x0;
      coef[1] = x1;
      coef[2] = x2;
      coef[3] = next * x2;
    }
    return qq - x0 * q0 - x1 * q1 - x2 * v2;
  }

  /** The inverse of a symmetric matrix, row-major, by elimination against the identity; null when singular. */
  private static double[] invert(double[][] m) {
    int k = m.length;
    double[] out = new double[k * k];
    for (int c = 0; c < k; c++) {
      double[][] a = new double[k][];
      for (int r = 0; r < k; r++) {
        a[r] = m[r].clone();
      }
      double[] e = new double[k];
      e[c] = 1;
      double[] x = SqrtRise.solve(a, e);
      if (x == null) {
        return null;
      }
      for (int r = 0; r < k; r++) {
        out[r * k + c] = x[r];
      }
    }
    return out;
  }
}
