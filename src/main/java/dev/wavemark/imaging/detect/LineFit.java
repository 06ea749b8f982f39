package dev.wavemark.imaging.detect;

import georegression.fitting.line.FitLine_F64;
import georegression.fitting.line.ModelManagerLinePolar2D_F64;
import georegression.struct.line.LinePolar2D_F64;
import georegression.struct.point.Point2D_F64;
import java.util.ArrayList;
import java.util.List;
import org.ddogleg.fitting.modelset.DistanceFromModel;
import org.ddogleg.fitting.modelset.ModelGenerator;
import org.ddogleg.fitting.modelset.ransac.Ransac;

/**
 * Robust straight-line fit to sub-pixel wave points, with a standard uncertainty of the
 * direction, a straightness test, and trimming of a curved wave to its straight part.
 *
 * <p>Steps: RANSAC (ddogleg) rejects gross outliers such as points taken on a crossing wave;
 * Tukey-biweight iteratively reweighted orthogonal regression (georegression's weighted
 * {@link FitLine_F64#polar}) refines; the direction's formal variance is s^2 / sum(u_i^2)
 * (residual variance over the spread of the points along the line), inflated by the residuals'
 * own autocorrelation (neighbouring points share blur and interpolation, so N points are worth
 * fewer independent ones: the variance factor 1 + 2 sum rho_k of a correlated series, e.g.
 * Box, Jenkins and Reinsel, "Time Series Analysis", 4th ed., sec. 2.1.5 (from memory)).
 */
final class LineFit {
  private LineFit() {}

  /** RANSAC inlier distance, px: well above the point scatter, well below a neighbouring wave. */
  static final double RANSAC_THRESHOLD_PX = 1.5;
  /** Tukey biweight tuning constant (95% efficiency at the normal law; common practice). */
  static final double TUKEY_C = 4.685;
  /** A quadratic bow this many standard errors from zero flags a curved wave. */
  static final double CURVE_SIGNIFICANCE = 5.0;
  /** ... and only if its sagitta over the half-length exceeds this, px. */
  static final double CURVE_MIN_SAGITTA_PX = 0.2;
  /** Smallest fraction of the points kept when trimming a curved wave. */
  static final double MIN_KEEP = 0.4;

  /**
   * The fitted line.
   *
   * @param cx centroid x
   * @param cy centroid y
   * @param ux unit direction x (image, y down), pointing from the first point to the last
   * @param uy unit direction y
   * @param sigmaThetaRad standard uncertainty of the direction (statistical part)
   * @param startAlong along-line coordinate of the first used point relative to the centroid
   * @param endAlong along-line coordinate of the last used point
   * @param support points used
   * @param rmsPx RMS normal residual of the used points
   * @param curved true when the straightness test trimmed the wave
   * @param first index of the first point used (of the input order)
   * @param last index of the last point used
   */
  record Result(
      double cx, double cy, double ux, double uy, double sigmaThetaRad, double startAlong, double endAlong,
      int support, double rmsPx, boolean curved, int first, int last) {
    double length() {
      return endAlong - startAlong;
    }
  }

  /**
   * Fits points given in their order along the wave (first = nearest the wave's origin).
   *
   * @return the fit, or null if fewer than {@code minSupport} points survive
   */
  static Result fit(double[] xs, double[] ys, int minSupport, long seed) {
    int n = xs.length;
    if (n < Math.max(minSupport, 3)) {
      return null;
    }
    List<Point2D_F64> pts = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      pts.add(new Point2D_F64(xs[i], ys[i]));
    }
    boolean[] keep = ransac(pts, seed);
    Result r = refine(pts, keep, 0, n - 1, minSupport, false);
    if (r == null || !isCurved(pts, keep, r)) {
      return r;
    }
    return trim(pts, keep, minSupport, r);
  }

  private static boolean[] ransac(List<Point2D_F64> pts, long seed) {
    Ransac<LinePolar2D_F64, Point2D_F64> ransac =
        new Ransac<>(seed, 120, RANSAC_THRESHOLD_PX, new ModelManagerLinePolar2D_F64(), Point2D_F64.class);
    ransac.setModel(TwoPointLine::new, LineDistance::new);
    boolean[] keep = new boolean[pts.size()];
    if (!ransac.process(pts)) {
      java.util.Arrays.fill(keep, true);
      return keep;
    }
    for (int i = 0; i < ransac.getMatchSet().size(); i++) {
      keep[ransac.getInputIndex(i)] = true;
    }
    return keep;
  }

  /** Tukey IRLS orthogonal regression on the kept points with index in [first, last]. */
  private static Result refine(List<Point2D_F64> pts, boolean[] keep, int first, int last, int minSupport, boolean curved) {
    List<Point2D_F64> used = new ArrayList<>();
    for (int i = first; i <= last; i++) {
      if (keep[i]) {
        used.add(pts.get(i));
      }
    }
    if (used.size() < Math.max(3, minSupport)) {
      return null;
    }
    int m = used.size();
    double[] w = new double[m];
    java.util.Arrays.fill(w, 1.0);
    LinePolar2D_F64 line = FitLine_F64.polar(used, w, null);
    double[] res = new double[m];
    for (int iter = 0; iter < 5 && line != null; iter++) {
      residuals(used, line, res);
      double scale = Math.max(0.03, 1.4826 * medianAbs(res));
      double c = TUKEY_C * scale;
      for (int i = 0; i < m; i++) {
        double t = res[i] / c;
        w[i] = Math.abs(t) < 1 ? (1 - t * t) * (1 - t * t) : 0;
      }
      line = FitLine_F64.polar(used, w, null);
    }
    if (line == null) {
      return null;
    }
    return statistics(used, w, line, first, last, curved);
  }

  private static Result statistics(List<Point2D_F64> used, double[] w, LinePolar2D_F64 line, int first, int last, boolean curved) {
    int m = used.size();
    double nx = Math.cos(line.angle);
    double ny = Math.sin(line.angle);
    double ux = -ny;
    double uy = nx;
    Point2D_F64 a = used.get(0);
    Point2D_F64 b = used.get(m - 1);
    if ((b.x - a.x) * ux + (b.y - a.y) * uy < 0) {
      ux = -ux;
      uy = -uy;
    }
    double sw = 0;
    double cx = 0;
    double cy = 0;
    for (int i = 0; i < m; i++) {
      sw += w[i];
      cx += w[i] * used.get(i).x;
      cy += w[i] * used.get(i).y;
    }
    cx /= sw;
    cy /= sw;
    double su2 = 0;
    double sr2 = 0;
    int support = 0;
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    double[] r = new double[m];
    for (int i = 0; i < m; i++) {
      Point2D_F64 p = used.get(i);
      double u = (p.x - cx) * ux + (p.y - cy) * uy;
      r[i] = (p.x - cx) * nx + (p.y - cy) * ny;
      if (w[i] > 0) {
        support++;
        su2 += w[i] * u * u;
        sr2 += w[i] * r[i] * r[i];
        lo = Math.min(lo, u);
        hi = Math.max(hi, u);
      }
    }
    double s2 = sr2 / Math.max(1, sw - 2);
    double inflation = correlationInflation(r, w);
    double sigma = Math.sqrt(s2 / su2 * inflation);
    double rms = Math.sqrt(sr2 / sw);
    return new Result(cx, cy, ux, uy, sigma, lo, hi, support, rms, curved, first, last);
  }

  /** 1 + 2 sum_k rho_k over the residuals in order, summed while rho_k stays positive. */
  static double correlationInflation(double[] r, double[] w) {
    int m = r.length;
    double[] z = new double[m];
    int n = 0;
    for (int i = 0; i < m; i++) {
      if (w[i] > 0) {
        z[n++] = r[i];
      }
    }
    if (n < 10) {
      return 1;
    }
    double mean = 0;
    for (int i = 0; i < n; i++) {
      mean += z[i];
    }
    mean /= n;
    double c0 = 0;
    for (int i = 0; i < n; i++) {
      c0 += (z[i] - mean) * (z[i] - mean);
    }
    if (c0 == 0) {
      return 1;
    }
    double f = 1;
    int maxLag = Math.min(60, n / 4);
    for (int k = 1; k <= maxLag; k++) {
      double ck = 0;
      for (int i = 0; i + k < n; i++) {
        ck += (z[i] - mean) * (z[i + k] - mean);
      }
      double rho = ck / c0;
      if (rho <= 0) {
        break;
      }
      f += 2 * rho * (1 - (double) k / n);
    }
    return f;
  }

  /**
   * Fits r = a + b t + c t^2 to the residuals (t the along-line position scaled to [-1, 1]) and
   * tests the bow c against its standard error.
   */
  private static boolean isCurved(List<Point2D_F64> pts, boolean[] keep, Result fit) {
    double half = 0.5 * fit.length();
    if (half <= 0) {
      return false;
    }
    double mid = 0.5 * (fit.startAlong() + fit.endAlong());
    double[][] ata = new double[3][3];
    double[] atb = new double[3];
    List<double[]> rows = new ArrayList<>();
    for (int i = fit.first(); i <= fit.last(); i++) {
      if (!keep[i]) {
        continue;
      }
      Point2D_F64 p = pts.get(i);
      double u = (p.x - fit.cx()) * fit.ux() + (p.y - fit.cy()) * fit.uy();
      double r = -(p.x - fit.cx()) * fit.uy() + (p.y - fit.cy()) * fit.ux();
      if (Math.abs(r) > 4 * Math.max(fit.rmsPx(), 0.05)) {
        continue;
      }
      double t = (u - mid) / half;
      double[] x = {1, t, t * t};
      rows.add(new double[] {t, r});
      for (int a = 0; a < 3; a++) {
        atb[a] += x[a] * r;
        for (int b = 0; b < 3; b++) {
          ata[a][b] += x[a] * x[b];
        }
      }
    }
    if (rows.size() < 20) {
      return false;
    }
    double[][] inv = invert3(ata);
    if (inv == null) {
      return false;
    }
    double[] coef = new double[3];
    for (int a = 0; a < 3; a++) {
      for (int b = 0; b < 3; b++) {
        coef[a] += inv[a][b] * atb[b];
      }
    }
    double ss = 0;
    double[] res = new double[rows.size()];
    double[] ones = new double[rows.size()];
    for (int i = 0; i < rows.size(); i++) {
      double t = rows.get(i)[0];
      res[i] = rows.get(i)[1] - (coef[0] + coef[1] * t + coef[2] * t * t);
      ones[i] = 1;
      ss += res[i] * res[i];
    }
    double s2 = ss / (rows.size() - 3) * correlationInflation(res, ones);
    double se = Math.sqrt(s2 * inv[2][2]);
    return Math.abs(coef[2]) > CURVE_SIGNIFICANCE * se && Math.abs(coef[2]) > CURVE_MIN_SAGITTA_PX;
  }

  /** Keeps the longest straight run from either end of the wave; prefers the origin side. */
  private static Result trim(List<Point2D_F64> pts, boolean[] keep, int minSupport, Result whole) {
    int n = pts.size();
    for (double f = 0.9; f >= MIN_KEEP - 1e-9; f -= 0.1) {
      int len = (int) Math.round(f * n);
      Result head = refine(pts, keep, 0, len - 1, minSupport, true);
      if (head != null && !isCurved(pts, keep, head)) {
        return head;
      }
      Result tail = refine(pts, keep, n - len, n - 1, minSupport, true);
      if (tail != null && !isCurved(pts, keep, tail)) {
        return tail;
      }
    }
    Result head = refine(pts, keep, 0, (int) Math.round(MIN_KEEP * n) - 1, minSupport, true);
    return head != null ? head : new Result(whole.cx(), whole.cy(), whole.ux(), whole.uy(), whole.sigmaThetaRad(),
        whole.startAlong(), whole.endAlong(), whole.support(), whole.rmsPx(), true, whole.first(), whole.last());
  }

  private static void residuals(List<Point2D_F64> pts, LinePolar2D_F64 line, double[] out) {
    double c = Math.cos(line.angle);
    double s = Math.sin(line.angle);
    for (int i = 0; i < pts.size(); i++) {
      out[i] = pts.get(i).x * c + pts.get(i).y * s - line.distance;
    }
  }

  static double medianAbs(double[] v) {
    return medianAbs(v, v.length);
  }

  /** The median of |v[0..n)| (mean of the two middle values for even n), 0 when n is 0; v is left alone. */
  static double medianAbs(double[] v, int n) {
    double[] a = new double[n];
    for (int i = 0; i < n; i++) {
      a[i] = Math.abs(v[i]);
    }
    return medianInPlace(a, n);
  }

  /**
   * The median of a[0..n) (mean of the two middle values for even n), 0 when n is 0; reorders a.
   * ddogleg's quickselect (linear time) partitions the array about the upper middle, so the
   * lower middle is the largest value before it.
   */
  static double medianInPlace(double[] a, int n) {
    if (n == 0) {
      return 0;
    }
    double upper = org.ddogleg.sorting.QuickSelect.select(a, n / 2, n);
    if (n % 2 == 1) {
      return upper;
    }
    double lower = Double.NEGATIVE_INFINITY;
    for (int i = 0; i < n / 2; i++) {
      lower = Math.max(lower, a[i]);
    }
    return 0.5 * (lower + upper);
  }

  private static double[][] invert3(double[][] m) {
    double a = m[0][0], b = m[0][1], c = m[0][2];
    double d = m[1][0], e = m[1][1], f = m[1][2];
    double g = m[2][0], h = m[2][1], k = m[2][2];
    double det = a * (e * k - f * h) - b * (d * k - f * g) + c * (d * h - e * g);
    if (Math.abs(det) < 1e-12) {
      return null;
    }
    return new double[][] {
      {(e * k - f * h) / det, (c * h - b * k) / det, (b * f - c * e) / det},
      {(f * g - d * k) / det, (a * k - c * g) / det, (c * d - a * f) / det},
      {(d * h - e * g) / det, (b * g - a * h) / det, (a * e - b * d) / det}
    };
  }

  /** RANSAC model from two points: the line through them. */
  private static final class TwoPointLine implements ModelGenerator<LinePolar2D_F64, Point2D_F64> {
    @Override
    public boolean generate(List<Point2D_F64> data, LinePolar2D_F64 out) {
      Point2D_F64 p = data.get(0);
      Point2D_F64 q = data.get(1);
      double dx = q.x - p.x;
      double dy = q.y - p.y;
      double len = Math.hypot(dx, dy);
      if (len < 1e-9) {
        return false;
      }
      double ang = Math.atan2(dx, -dy);
      out.angle = ang;
      out.distance = p.x * Math.cos(ang) + p.y * Math.sin(ang);
      return true;
    }

    @Override
    public int getMinimumPoints() {
      return 2;
    }
  }

  /** RANSAC distance: absolute normal distance to the polar line. */
  private static final class LineDistance implements DistanceFromModel<LinePolar2D_F64, Point2D_F64> {
    private double c;
    private double s;
    private double d;

    @Override
    public void setModel(LinePolar2D_F64 model) {
      c = Math.cos(model.angle);
      s = Math.sin(model.angle);
      d = model.distance;
    }

    @Override
    public double distance(Point2D_F64 pt) {
      return Math.abs(pt.x * c + pt.y * s - d);
    }

    @Override
    public void distances(List<Point2D_F64> points, double[] out) {
      for (int i = 0; i < points.size(); i++) {
        out[i] = distance(points.get(i));
      }
    }

    @Override
    public Class<Point2D_F64> getPointType() {
      return Point2D_F64.class;
    }

    @Override
    public Class<LinePolar2D_F64> getModelType() {
      return LinePolar2D_F64.class;
    }
  }
}
