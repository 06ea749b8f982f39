package dev.wavemark.imaging.detect;

/**
 * The onset of a rise that grows as the square root of the distance behind a line, smeared by a
 * Gaussian: how a conical shock looks side-on. The line-of-sight integral of the density excess
 * behind a cone's shock is, near the shock's silhouette, the jump times the chord through the
 * shock's circle, 2 sqrt(2 R d) at a distance d inside a circle of radius R (plane geometry); so
 * the projected density rises as sqrt(d) from the shock on, the knife edge shows its gradient (a
 * spike with a 1/sqrt(d) tail) and the shadowgraph its second derivative (a spike at the onset
 * and a long d^(-3/2) tail of the other sign). Neither is symmetric about the shock, so a peak's
 * or a pair's centre stands pixels behind the shock, and moves along it as R grows; the onset of
 * a fitted template does not.
 *
 * <p>The next term of the rise in d / R is d^(3/2): the chord's own curvature (2 sqrt(2 R d - d^2)),
 * the density's gradient behind the shock (a linear rise of the density inward adds (2/3) times
 * its slope sqrt(2 R) d^(3/2) to the chord integral), and the distance from the apex growing along
 * the shock's normal all enter there, each relative to the leading term as d / R. With the window
 * a tenth or more of R near the apex, leaving it out moves the onset by tenths of a pixel there
 * and so turns the fitted line. Its coefficient is fitted freely on a mean profile; for single
 * profiles {@link Measure} fixes its share from the mean of their stretch of the shock.
 *
 * <p>With S(x) = integral over t > 0 of sqrt(t) g(x - t) dt for the unit normal density g, the
 * substitution t = u^2 gives S(x) = integral of 2 u^2 g(x - u^2) du, S'(x) = integral of
 * g(x - u^2) du and S''(x) = integral of g'(x - u^2) du (u > 0), smooth integrands tabulated
 * once; for a smear sigma the rise is sigma^(1/2) S(x / sigma) and its derivatives follow. The
 * smeared d^(3/2) has S as its derivative (times 3/2) and S' as its second (times 3/2). Far
 * behind the onset S'(x) tends to 1 / (2 sqrt x) and S''(x) to -1 / (4 x^(3/2)).
 */
final class SqrtRise {
  private SqrtRise() {}

  /** Which derivative of the rise the picture shows. */
  enum Order {
    /** Knife-edge schlieren: the gradient, a spike with a 1/sqrt tail. */
    GRADIENT,
    /** Shadowgraph: the second derivative, a spike at the onset of the other sign with a long tail. */
    CURVATURE
  }

  /** Table range and step, in units of the smear. */
  private static final double Z_MIN = -9;
  private static final double Z_MAX = 64;
  private static final double DZ = 0.01;
  /** Half-range of the normal density kept in the integrals (its tail beyond is below 1e-18). */
  private static final double REACH = 9;
  private static final int STEPS = 600;
  private static final float[] RISE = table(0);
  private static final float[] SLOPE = table(1);
  private static final float[] BEND = table(2);
  /** Heights of the unit spikes, S'(z) and S''(z) at their extremes near the onset. */
  static final double SLOPE_SPIKE = extreme(Order.GRADIENT);
  static final double BEND_SPIKE = extreme(Order.CURVATURE);

  /** Smears tried when fitting one, px: from below the sampling to past any blur the detector handles. */
  static final double MIN_SIGMA_PX = 0.4;
  static final double MAX_SIGMA_PX = 6.0;
  static final double SIGMA_STEP_PX = 0.5;

  /** The unit-smear profile of the given order at z (distance behind the onset over the smear). */
  static double unit(Order order, double z) {
    if (z <= Z_MIN) {
      return 0;
    }
    if (z >= Z_MAX) {
      // the smeared power laws' expansions: (1/2) z^-1/2 (1 + 3/8 z^-2), -(1/4) z^-3/2 (1 + 15/8 z^-2)
      return order == Order.GRADIENT ? 0.5 / Math.sqrt(z) * (1 + 0.375 / (z * z))
          : -0.25 / (z * Math.sqrt(z)) * (1 + 1.875 / (z * z));
    }
    return interpolate(order == Order.GRADIENT ? SLOPE : BEND, z);
  }

  /** The unit-smear rise itself, S(z). */
  static double rise(double z) {
    if (z <= Z_MIN) {
      return 0;
    }
    if (z >= Z_MAX) {
      return Math.sqrt(z) * (1 - 0.125 / (z * z));
    }
    return interpolate(RISE, z);
  }

  private static double interpolate(float[] t, double z) {
    double pos = (z - Z_MIN) / DZ;
    int i = (int) pos;
    double f = pos - i;
    return t[i] * (1 - f) + t[i + 1] * f;
  }

  /** S (derivative 0), S' (1) or S'' (2) on the table's grid. */
  private static float[] table(int derivative) {
    int n = (int) Math.round((Z_MAX - Z_MIN) / DZ) + 2;
    float[] t = new float[n];
    for (int i = 0; i < n; i++) {
      t[i] = (float) integral(Z_MIN + i * DZ, derivative);
    }
    return t;
  }

  /** The integral over u > 0 for S, S' or S'' at z, by Simpson's rule over where g(z - u^2) lives. */
  private static double integral(double z, int derivative) {
    double u0 = Math.sqrt(Math.max(0, z - REACH));
    double u1 = Math.sqrt(Math.max(0, z + REACH));
    if (u1 <= u0) {
      return 0;
    }
    double h = (u1 - u0) / STEPS;
    double sum = 0;
    for (int k = 0; k <= STEPS; k++) {
      double u = u0 + k * h;
      double y = z - u * u;
      double g = Math.exp(-0.5 * y * y) / Math.sqrt(2 * Math.PI);
      double v = switch (derivative) {
        case 0 -> 2 * u * u * g;
        case 1 -> g;
        default -> -y * g;
      };
      sum += (k == 0 || k == STEPS ? 1 : k % 2 == 1 ? 4 : 2) * v;
    }
    return sum * h / 3;
  }

  /** The unit profile's largest excursion near the onset (its spike's signed height). */
  private static double extreme(Order order) {
    double m = 0;
    for (double z = -3; z <= 3; z += DZ) {
      double v = unit(order, z);
      if (Math.abs(v) > Math.abs(m)) {
        m = v;
      }
    }
    return m;
  }

  /**
   * A fitted template.
   *
   * @param onset fractional sample index of the onset
   * @param sigma smear, samples
   * @param tail +1 when the rise lies towards increasing index, -1 the other way
   * @param spike signed height of the leading term's spike (profile units)
   * @param next the d^(3/2) term's coefficient over the leading term's (in the columns of {@link SqrtRiseTemplate})
   * @param residual residual sum of squares
   */
  record Fit(double onset, double sigma, int tail, double spike, double next, double residual) {}

  /**
   * Fits q_j = a + b j + c T(z_j) + e U(z_j), z_j = tail (j - x0) / sigma, by least squares: T the
   * smeared sqrt rise's derivative of the picture's order, U the same of its d^(3/2) term. The
   * onset x0 is searched in [lo, hi] on a grid of half smears (a sample at the least), then by
   * golden section (the residual's trough is a smear wide, so its minimum lies within a step of
   * the grid's).
   *
   * @param tail +1 when the rise lies towards increasing index, -1 the other way
   * @param sigma smear, samples
   * @return the best fit, or null when the profile is too short
   */
  static Fit fit(double[] q, Order order, int tail, double sigma, int lo, int hi) {
    int n = q.length;
    if (n < 8 || hi <= lo) {
      return null;
    }
    double best = Double.POSITIVE_INFINITY;
    double bx = lo;
    double step = Math.max(1, 0.5 * sigma);
    for (double x = lo; x <= hi; x += step) {
      double r = residual(q, order, tail, sigma, x, null);
      if (r < best) {
        best = r;
        bx = x;
      }
    }
    // golden section on the bracket around the best grid point
    double a = Math.max(lo, bx - step);
    double b = Math.min(hi, bx + step);
    double gr = 0.5 * (Math.sqrt(5) - 1);
    double c = b - gr * (b - a);
    double d = a + gr * (b - a);
    double fc = residual(q, order, tail, sigma, c, null);
    double fd = residual(q, order, tail, sigma, d, null);
    while (b - a > 1e-3) {
      if (fc < fd) {
        b = d;
        d = c;
        fd = fc;
        c = b - gr * (b - a);
        fc = residual(q, order, tail, sigma, c, null);
      } else {
        a = c;
        c = d;
        fc = fd;
        d = a + gr * (b - a);
        fd = residual(q, order, tail, sigma, d, null);
      }
    }
    double x0 = 0.5 * (a + b);
    double[] coef = new double[TERMS];
    double r = residual(q, order, tail, sigma, x0, coef);
    double spike = coef[2] * (order == Order.GRADIENT ? SLOPE_SPIKE / Math.sqrt(sigma) : BEND_SPIKE / (sigma * Math.sqrt(sigma)));
    return new Fit(x0, sigma, tail, spike, coef[3] / coef[2], r);
  }

  /** Fitted terms: level, slope, the rise's leading term and its d^(3/2) term. */
  static final int TERMS = 4;

  /** Least-squares residual sum of squares at onset x0; the coefficients (a, b, c, e) into coef if given. */
  private static double residual(double[] q, Order order, int tail, double sigma, double x0, double[] coef) {
    int n = q.length;
    int k = TERMS;
    double scale = order == Order.GRADIENT ? 1 / Math.sqrt(sigma) : 1 / (sigma * Math.sqrt(sigma));
    double[][] m = new double[k][k];
    double[] v = new double[k];
    double sqq = 0;
    double[] x = new double[k];
    for (int j = 0; j < n; j++) {
      double z = tail * (j - x0) / sigma;
      x[0] = 1;
      x[1] = j;
      x[2] = scale * unit(order, z);
      // the d^(3/2) term's derivative of the same order, up to a constant (the fit sets it)
      x[3] = order == Order.GRADIENT ? rise(z) : unit(Order.GRADIENT, z);
      double y = q[j];
      for (int a = 0; a < k; a++) {
        v[a] += x[a] * y;
        for (int b = 0; b < k; b++) {
          m[a][b] += x[a] * x[b];
        }
      }
      sqq += y * y;
    }
    double[] sol = solve(m, v.clone());
    if (sol == null) {
      return Double.POSITIVE_INFINITY;
    }
    if (coef != null) {
      System.arraycopy(sol, 0, coef, 0, k);
    }
    double r = sqq;
    for (int a = 0; a < k; a++) {
      r -= sol[a] * v[a];
    }
    return r;
  }

  /** Gaussian elimination with partial pivoting; null when singular. m and v are overwritten. */
  static double[] solve(double[][] m, double[] v) {
    int k = v.length;
    for (int c = 0; c < k; c++) {
      int p = c;
      for (int r = c + 1; r < k; r++) {
        if (Math.abs(m[r][c]) > Math.abs(m[p][c])) {
          p = r;
        }
      }
      if (!(Math.abs(m[p][c]) > 1e-300)) {
        return null;
      }
      double[] tr = m[c];
      m[c] = m[p];
      m[p] = tr;
      double tv = v[c];
      v[c] = v[p];
      v[p] = tv;
      for (int r = c + 1; r < k; r++) {
        double f = m[r][c] / m[c][c];
        for (int cc = c; cc < k; cc++) {
          m[r][cc] -= f * m[c][cc];
        }
        v[r] -= f * v[c];
      }
    }
    double[] x = new double[k];
    for (int r = k - 1; r >= 0; r--) {
      double s = v[r];
      for (int cc = r + 1; cc < k; cc++) {
        s -= m[r][cc] * x[cc];
      }
      x[r] = s / m[r][r];
    }
    return x;
  }

  /**
   * The smear and (unless given) the side of the tail that fit a (mean) profile best: smears from
   * {@link #MIN_SIGMA_PX} to {@link #MAX_SIGMA_PX} every {@link #SIGMA_STEP_PX} on each side, then
   * golden section to a hundredth of a pixel about the best of each side.
   *
   * @param samplePx spacing of the samples, px
   * @param tail +1 or -1 to fix the side of the tail, 0 to try both
   * @return the best fit (its smear in samples), or null when the profile is too short
   */
  static Fit fitSmear(double[] q, Order order, double samplePx, int lo, int hi, int tail) {
    Fit best = null;
    for (int side = -1; side <= 1; side += 2) {
      if (tail == 0 || side == tail) {
        Fit f = fitSmearOn(q, order, samplePx, lo, hi, side);
        if (f != null && (best == null || f.residual() < best.residual())) {
          best = f;
        }
      }
    }
    return best;
  }

  /** {@link #fitSmear} on one side; null when the profile is too short. */
  private static @org.jspecify.annotations.Nullable Fit fitSmearOn(double[] q, Order order, double samplePx, int lo, int hi, int side) {
    Fit best = null;
    for (double s = MIN_SIGMA_PX; s <= MAX_SIGMA_PX + 1e-9; s += SIGMA_STEP_PX) {
      Fit f = fit(q, order, side, s / samplePx, lo, hi);
      if (f != null && (best == null || f.residual() < best.residual())) {
        best = f;
      }
    }
    if (best == null) {
      return null;
    }
    double a = Math.max(MIN_SIGMA_PX, best.sigma() * samplePx - SIGMA_STEP_PX);
    double b = Math.min(MAX_SIGMA_PX, best.sigma() * samplePx + SIGMA_STEP_PX);
    double gr = 0.5 * (Math.sqrt(5) - 1);
    double c = b - gr * (b - a);
    double d = a + gr * (b - a);
    Fit fc = fit(q, order, side, c / samplePx, lo, hi);
    Fit fd = fit(q, order, side, d / samplePx, lo, hi);
    while (b - a > 0.01) {
      if (fc.residual() < fd.residual()) {
        b = d;
        d = c;
        fd = fc;
        c = b - gr * (b - a);
        fc = fit(q, order, side, c / samplePx, lo, hi);
      } else {
        a = c;
        c = d;
        fc = fd;
        d = a + gr * (b - a);
        fd = fit(q, order, side, d / samplePx, lo, hi);
      }
    }
    for (Fit f : new Fit[] {fc, fd}) {
      if (f.residual() < best.residual()) {
        best = f;
      }
    }
    return best;
  }

  /**
   * The template of one smear and side, laid out for many profiles of n samples: its terms and
   * the inverse of the fit's normal matrix at onsets every {@link SqrtRiseTemplate#GRID} samples over [lo, hi],
   * so that fitting a profile costs four dot products per onset tried.
   *
   * @param sigma smear, samples (from {@link #fitSmear} on the mean profile)
   */
  static SqrtRiseTemplate template(Order order, int tail, double sigma, int n, int lo, int hi) {
    return new SqrtRiseTemplate(order, tail, sigma, n, lo, hi);
  }

  /**
   * The onset of one profile as a {@link Profiles.Located}: its fractional sample index, the
   * fitted spike's signed height, and the smear's full width at half maximum (samples).
   */
  static Profiles.Located locate(double[] q, Order order, int tail, double sigma, int lo, int hi) {
    return template(order, tail, sigma, q.length, lo, hi).locate(q);
  }

  /** Full width at half maximum of a Gaussian over its sigma, 2 sqrt(2 ln 2). */
  static final double FWHM_PER_SIGMA = 2 * Math.sqrt(2 * Math.log(2));
}
