package dev.wavemark.imaging.detect;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.BowShock;
import dev.wavemark.core.geom.FittedLine;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.BowShockFit;
import dev.wavemark.core.model.BowShockShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;

/**
 * A blunt body's detached bow shock: its vertex on the stagnation line and its shape near the
 * nose. First a profile along the stagnation line, upstream of the nose (averaged over a few
 * pixels across it), finds where the shock crosses the line; the stand-off found makes a first
 * shape (Billig's correlation at the Mach number that stand-off implies, {@link BowShock}).
 * Then sub-pixel profiles along the normals of that shape, every {@value #SPACING_PX} px out to
 * {@value #SPAN_RADII} nose radii either side, locate the shock, and a robust least-squares fit
 * (Tukey biweight, iteratively reweighted, on Hipparchus' QR) of s(t) = a + b t + c t^2 + e t^4
 * in body coordinates (s upstream along the axis from the nose centre, t across) gives the
 * shock on the stagnation line (a), the tilt of its tangent there (b) and its radius of
 * curvature (1 / 2|c|), with covariances from the fit scaled by the residual spread.
 */
final class BowShockSearch {
  /** Half-length of each normal profile, px (schlieren); shadowgraph uses the wider window. */
  static final double WINDOW_PX = 8;
  /** Shortest half-length of a profile (where the body cuts it short), px. */
  static final double MIN_WINDOW_PX = 4;
  /** Sample spacing along a profile, px. */
  static final double STEP_PX = 0.25;
  /** Spacing of the profiles along the shock, px. */
  static final double SPACING_PX = 2;
  /** The fit reaches this many nose radii either side of the stagnation line (and at most Rc). */
  static final double SPAN_RADII = 1.5;
  /** A profile's peak must stand this many noise deviations above its surroundings. */
  static final double MIN_SNR = 5;
  /** Fewest points for a fit. */
  static final int MIN_POINTS = 12;
  /** Tukey biweight constant in units of the residuals' robust spread. */
  private static final double TUKEY = 4.685;
  /**
   * Systematic floor on the stand-off, px: what the residuals cannot show (the locator's bias
   * with the changing background). Set from the accuracy benchmark (DetectorBenchmark's blunt
   * row) like the line detector's floors.
   */
  static final double STANDOFF_FLOOR_PX = 0.05;
  /** Nearest approach to the body of a stagnation-line sample, px beyond the eroded mask. */
  private static final double NOSE_CLEARANCE_PX = 2;

  private BowShockSearch() {}

  static Optional<ObservedWave> find(WaveDetector.Context ctx, BodyShape.Blunt b, List<ExpectedWave> hints) {
    Raster full = ctx.full();
    double flow = ctx.flow();
    Point2 up = ImageAngles.unit(flow + Math.PI);
    Point2 across = ImageAngles.unit(flow + 0.5 * Math.PI);
    Point2 c = b.centrePx();
    double r = b.noseRadiusPx();
    double window = ctx.shadow() ? WaveDetector.SHADOW_WINDOW_PX : WINDOW_PX;
    Double hinted = null;
    for (ExpectedWave h : hints) {
      if (h.kind() == WaveKind.BOW_SHOCK) {
        hinted = h.startPx().minus(c).dot(up);
      }
    }
    double sAxis = axialVertex(full, c, up, across, r, hinted, ctx.noise(), window);
    if (!Double.isFinite(sAxis)) {
      if (hinted == null) {
        return Optional.empty();
      }
      sAxis = hinted;
    }
    BowShockShape guess = firstShape(b, c, flow, r, sAxis - r);
    double span = Math.min(SPAN_RADII * r, guess.vertexRadiusPx());
    List<double[]> pts = new ArrayList<>();
    List<Double> amps = new ArrayList<>();
    List<Double> widths = new ArrayList<>();
    UnaryOperator<Point2> und = ctx.undistort() == null ? UnaryOperator.identity() : ctx.undistort();
    Point2 cIdeal = und.apply(c);
    for (double t = -span; t <= span + 1e-9; t += SPACING_PX) {
      double s = guess.upstreamPx(t);
      double sl = guess.slope(t);
      double norm = Math.sqrt(1 + sl * sl);
      Point2 n = up.times(1 / norm).plus(across.times(-sl / norm));
      Point2 p = c.plus(up.times(s)).plus(across.times(t));
      double[] loc = locate(full, p, n, window, ctx.noise(), ctx.shadow());
      if (loc == null) {
        continue;
      }
      Point2 q = und.apply(p.plus(n.times(loc[0])));
      Point2 d = q.minus(cIdeal);
      pts.add(new double[] {d.dot(across), d.dot(up)});
      amps.add(loc[1]);
      widths.add(loc[2]);
    }
    if (pts.size() < MIN_POINTS) {
      return Optional.empty();
    }
    Fit f = fit(pts);
    if (f == null || !(f.c < 0)) {
      return Optional.empty();
    }
    double rIdeal = und.apply(c.plus(up.times(r))).distanceTo(cIdeal);
    double standoff = f.a - rIdeal;
    double sigmaStandoff = Math.hypot(f.sa, STANDOFF_FLOOR_PX);
    double rc = Math.pow(1 + f.b * f.b, 1.5) / (2 * -f.c);
    double sigmaRc = rc * f.sc / -f.c;
    Point2 vertex = cIdeal.plus(up.times(f.a));
    Point2 tangent = across.plus(up.times(f.b)).times(1 / Math.hypot(1, f.b));
    double dir = ImageAngles.direction(tangent.x(), tangent.y());
    double sigmaDir = f.sb / (1 + f.b * f.b);
    double half = f.tMax;
    FittedLine line = new FittedLine(vertex, dir, sigmaDir, vertex.minus(tangent.times(half)), vertex.plus(tangent.times(half)),
        f.used, f.rms, false);
    List<Point2> curve = new ArrayList<>();
    for (int k = 0; k <= CURVE_POINTS; k++) {
      double t = -half + 2 * half * k / CURVE_POINTS;
      curve.add(cIdeal.plus(up.times(f.at(t))).plus(across.times(t)));
    }
    BowShockFit bow = new BowShockFit(vertex, standoff, sigmaStandoff, rc, sigmaRc, rIdeal, half, curve);
    return Optional.of(new ObservedWave(WaveKind.BOW_SHOCK, Optional.empty(), line, median(amps), median(widths),
        Optional.of(Feature.BODY_NOSE), Optional.of(bow)));
  }

  /**
   * Billig's shape through the measured vertex: the stand-off as found, the vertex curvature at
   * the Mach number that stand-off implies (clamped to the correlation's range).
   */
  static BowShockShape firstShape(BodyShape.Blunt b, Point2 c, double flow, double r, double standoffPx) {
    double lo = BowShock.standoffRatio(b.nose(), BowShock.MACH_MAX, 1.4);
    double hi = BowShock.standoffRatio(b.nose(), BowShock.MACH_MIN, 1.4);
    double ratio = Math.max(lo, Math.min(hi, standoffPx / r));
    double m;
    try {
      m = BowShock.machFromStandoff(b.nose(), ratio, 1.4);
    } catch (WavemarkException e) {
      m = 3;
    }
    BowShockShape billig = BowShockShape.of(b.nose(), c, flow, r, m, 1.4);
    return new BowShockShape(b.nose(), c, flow, r, Math.max(1, standoffPx), billig.vertexRadiusPx(), m, 1.4);
  }

  /**
   * The shock's distance upstream of the nose centre on the stagnation line, px (distorted), from
   * the profile along it averaged over +-2 px across; NaN when no peak stands out.
   */
  static double axialVertex(Raster full, Point2 c, Point2 up, Point2 across, double r, Double hinted, double noise, double window) {
    double s0 = r + NOSE_CLEARANCE_PX;
    double s1 = r + 6 * r;
    if (hinted != null) {
      double d = Math.max(2 * window, 0.5 * (hinted - r));
      s0 = Math.max(s0, hinted - d);
      s1 = hinted + d;
    }
    int n = (int) Math.floor((s1 - s0) / STEP_PX) + 1;
    double[] prof = new double[n];
    int first = -1;
    int last = -1;
    for (int i = 0; i < n; i++) {
      double s = s0 + i * STEP_PX;
      double sum = 0;
      int k = 0;
      for (int j = -2; j <= 2; j++) {
        Point2 p = c.plus(up.times(s)).plus(across.times(j));
        double v = full.sample(p.x(), p.y());
        if (Double.isFinite(v)) {
          sum += v;
          k++;
        }
      }
      if (k == 5) {
        prof[i] = sum / k;
        if (first < 0) {
          first = i;
        }
        last = i;
      } else if (first >= 0) {
        break;
      }
    }
    if (first < 0 || last - first < 4 * window / STEP_PX) {
      return Double.NaN;
    }
    double[] q = Arrays.copyOfRange(prof, first, last + 1);
    double[] sorted = q.clone();
    Arrays.sort(sorted);
    double base = sorted[sorted.length / 2];
    int best = -1;
    double h = 0;
    for (int i = 0; i < q.length; i++) {
      if (Math.abs(q[i] - base) > h) {
        h = Math.abs(q[i] - base);
        best = i;
      }
    }
    if (best < 0 || h < MIN_SNR * noise) {
      return Double.NaN;
    }
    return s0 + (first + best) * STEP_PX;
  }

  /**
   * The shock along one profile through {@code p} along {@code n}: its offset from p along n
   * (px), its amplitude and its width (px); null when it does not stand out or the profile
   * leaves the flow.
   */
  static double[] locate(Raster full, Point2 p, Point2 n, double window, double noise, boolean shadow) {
    // symmetric about p, shortened on both sides where one side leaves the flow (the body close
    // behind the shock near the stagnation line)
    int m = (int) Math.round(window / STEP_PX);
    for (int i = 0; i <= m; i++) {
      if (!Double.isFinite(full.sample(p.x() + n.x() * i * STEP_PX, p.y() + n.y() * i * STEP_PX))
          || !Double.isFinite(full.sample(p.x() - n.x() * i * STEP_PX, p.y() - n.y() * i * STEP_PX))) {
        m = i - 1;
        break;
      }
    }
    if (m * STEP_PX < MIN_WINDOW_PX) {
      return null;
    }
    double[] prof = new double[2 * m + 1];
    for (int i = -m; i <= m; i++) {
      prof[i + m] = full.sample(p.x() + n.x() * i * STEP_PX, p.y() + n.y() * i * STEP_PX);
    }
    double[] q = Profiles.detrend(prof, 4);
    int lo = m / 4;
    int hi = prof.length - 1 - m / 4;
    Profiles.Located l;
    if (shadow) {
      Profiles.Located z = Profiles.zeroCrossing(q, lo, hi, prof.length);
      if (z == null) {
        return null;
      }
      l = Profiles.pairCentre(q, (int) Math.signum(z.amplitude()), lo, hi, prof.length);
    } else {
      double maxV = 0;
      for (int i = lo; i <= hi; i++) {
        if (Math.abs(q[i]) > Math.abs(maxV)) {
          maxV = q[i];
        }
      }
      l = Profiles.peak(q, maxV >= 0 ? 1 : -1, lo, hi);
    }
    if (l == null || !(Math.abs(l.amplitude()) >= MIN_SNR * noise) || l.centre() < lo || l.centre() > hi) {
      return null;
    }
    return new double[] {(l.centre() - m) * STEP_PX, Math.abs(l.amplitude()), l.width() * STEP_PX};
  }

  /** Points of the fitted shape reported for drawing. */
  static final int CURVE_POINTS = 24;

  /** The fitted shape near the vertex and its standard uncertainties. */
  record Fit(double a, double b, double c, double e, double sa, double sb, double sc, double rms, int used, double tMax) {
    /** s at lateral distance t. */
    double at(double t) {
      return a + b * t + c * t * t + e * t * t * t * t;
    }
  }

  /** Robust fit of s = a + b t + c t^2 + e t^4 to points (t, s); null when it is singular. */
  static Fit fit(List<double[]> pts) {
    int n = pts.size();
    double[] w = new double[n];
    Arrays.fill(w, 1);
    RealVector x = null;
    double[] res = new double[n];
    double tScale = 0;
    for (double[] p : pts) {
      tScale = Math.max(tScale, Math.abs(p[0]));
    }
    tScale = Math.max(tScale, 1);
    RealMatrix cov = null;
    double scale = 0;
    int used = n;
    for (int it = 0; it < 20; it++) {
      RealMatrix a = new Array2DRowRealMatrix(n, 4);
      RealVector y = new ArrayRealVector(n);
      for (int i = 0; i < n; i++) {
        double u = pts.get(i)[0] / tScale;
        double sw = Math.sqrt(w[i]);
        a.setEntry(i, 0, sw);
        a.setEntry(i, 1, sw * u);
        a.setEntry(i, 2, sw * u * u);
        a.setEntry(i, 3, sw * u * u * u * u);
        y.setEntry(i, sw * pts.get(i)[1]);
      }
      QRDecomposition qr = new QRDecomposition(a);
      if (!qr.getSolver().isNonSingular()) {
        return null;
      }
      RealVector next = qr.getSolver().solve(y);
      for (int i = 0; i < n; i++) {
        double u = pts.get(i)[0] / tScale;
        res[i] = pts.get(i)[1] - (next.getEntry(0) + next.getEntry(1) * u + next.getEntry(2) * u * u + next.getEntry(3) * u * u * u * u);
      }
      double[] abs = new double[n];
      for (int i = 0; i < n; i++) {
        abs[i] = Math.abs(res[i]);
      }
      Arrays.sort(abs);
      double mad = Math.max(1.4826 * abs[n / 2], 1e-3);
      double sumW = 0;
      double sumWr2 = 0;
      used = 0;
      for (int i = 0; i < n; i++) {
        double z = res[i] / (TUKEY * mad);
        w[i] = Math.abs(z) < 1 ? (1 - z * z) * (1 - z * z) : 0;
        if (w[i] > 0) {
          used++;
        }
        sumW += w[i];
        sumWr2 += w[i] * res[i] * res[i];
      }
      if (used < MIN_POINTS) {
        return null;
      }
      scale = Math.sqrt(sumWr2 / Math.max(1e-9, sumW - 4));
      cov = MatrixUtils.inverse(a.transpose().multiply(a));
      boolean settled = x != null && next.subtract(x).getLInfNorm() < 1e-6;
      x = next;
      if (settled) {
        break;
      }
    }
    double rms = 0;
    double tMax = 0;
    int k = 0;
    for (int i = 0; i < n; i++) {
      if (w[i] > 0) {
        rms += res[i] * res[i];
        tMax = Math.max(tMax, Math.abs(pts.get(i)[0]));
        k++;
      }
    }
    rms = Math.sqrt(rms / Math.max(1, k));
    // Weighted normal equations were built with the weights; the covariance of the estimate is
    // scale^2 (A^T W A)^-1 (weights of one for the points the biweight keeps in full).
    double s2 = scale * scale;
    return new Fit(x.getEntry(0), x.getEntry(1) / tScale, x.getEntry(2) / (tScale * tScale), x.getEntry(3) / Math.pow(tScale, 4),
        Math.sqrt(s2 * cov.getEntry(0, 0)), Math.sqrt(s2 * cov.getEntry(1, 1)) / tScale,
        Math.sqrt(s2 * cov.getEntry(2, 2)) / (tScale * tScale), rms, used, tMax);
  }

  private static double median(List<Double> v) {
    double[] a = v.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    return a.length == 0 ? Double.NaN : a[a.length / 2];
  }
}
