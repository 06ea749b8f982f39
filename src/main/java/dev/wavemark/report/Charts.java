package dev.wavemark.report;

import dev.wavemark.core.gas.ObliqueShock;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Locale;
import dev.wavemark.files.ResultFile;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;
import org.jspecify.annotations.Nullable;

/**
 * The report's charts, drawn with JFreeChart and exported as inline SVG with JFreeSVG (text as
 * SVG text in generic font families, so nothing is fetched from the network).
 */
final class Charts {
  static final int WIDTH = 900;
  static final int HEIGHT = 520;
  private static final double[] FAMILY = {1.2, 1.5, 2.0, 2.5, 3.0, 4.0, 6.0};
  private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
  private static final Color GRID = new Color(0xD0D4DA);
  private static final Color INK = new Color(0x1F2933);
  private static final Color MEASURED = new Color(0xC0392B);
  private static final Color INFERRED = new Color(0x1565C0);
  private static final Color NOMINAL = new Color(0x2E7D32);

  private Charts() {}

  /** A measured shock: the body deflection (and its tolerance) and the wave angle (and its uncertainty), degrees. */
  record ShockPoint(double deflectionDeg, double deflectionUncertaintyDeg, double angleDeg, double angleUncertaintyDeg) {}

  /** One frame's Mach number for the sequence chart. */
  record MachPoint(int frame, double mach, double uncertainty) {}

  /** The charts of one report; null where a chart does not apply. */
  record Inputs(@Nullable String thetaBetaSvg, @Nullable String thetaBetaNote, @Nullable String machSvg) {}

  /**
   * The charts for a result: the oblique-shock diagram with the plane oblique shocks of the
   * {@code shown} frames (left out, with a note, when there is none), and, for a sequence, Mach
   * number against frame.
   */
  static Inputs forResult(ResultFile r, List<Integer> shown) {
    double gamma = r.settings() == null ? 1.4 : r.settings().gamma();
    double tol = r.settings() == null ? 0 : r.settings().modelAngleToleranceDeg();
    java.util.Set<Integer> show = java.util.Set.copyOf(shown);
    List<ShockPoint> pts = new java.util.ArrayList<>();
    List<MachPoint> seq = new java.util.ArrayList<>();
    for (ResultFile.Frame f : r.frames()) {
      if (f.mach() != null && Double.isFinite(f.mach().value())) {
        seq.add(new MachPoint(f.index(), f.mach().value(), Double.isFinite(f.mach().uncertainty()) ? f.mach().uncertainty() : 0));
      }
      if (!show.contains(f.index())) {
        continue;
      }
      for (ResultFile.Wave w : f.waves()) {
        if ("oblique-shock".equals(w.kind()) && w.deflectionDeg() != null && Double.isFinite(w.angleDeg())) {
          pts.add(new ShockPoint(w.deflectionDeg(), Double.isFinite(tol) ? tol : 0, w.angleDeg(),
              Double.isFinite(w.uncertaintyDeg()) ? w.uncertaintyDeg() : 0));
        }
      }
    }
    Double inferred = r.summary().mach() == null ? null : r.summary().mach().value();
    // with no measured point the diagram would show theory only (a blunt body, a cone, Mach waves)
    String tb = pts.isEmpty() ? null : thetaBetaMach(pts, gamma, inferred, r.summary().nominalMach(), "tbm");
    String note = pts.isEmpty()
        ? "No plane oblique shock with a known deflection was measured in the pictured frames, so the oblique-shock diagram is left out."
        : "Error bars are one standard uncertainty; at this scale they are often smaller than the marker.";
    String mach = seq.size() > 1
        ? machSequence(seq, r.summary().nominalMach(), r.summary().machTolerance(), inferred, "seq") : null;
    return new Inputs(tb, note, mach);
  }

  /**
   * The theta-beta-M diagram (NACA Report 1135, chart 2 in form): shock angle against deflection
   * for a family of Mach numbers, weak and strong branches, the detachment locus, the curve at the
   * inferred (and nominal) Mach number, and the measured points with error bars.
   */
  static String thetaBetaMach(List<ShockPoint> points, double gamma, @Nullable Double inferredMach, @Nullable Double nominalMach, String id) {
    XYSeriesCollection curves = new XYSeriesCollection();
    XYLineAndShapeRenderer curveRenderer = new XYLineAndShapeRenderer(true, false);
    XYPlot plot = new XYPlot();
    int k = 0;
    for (double m : FAMILY) {
      curves.addSeries(curve(String.format(Locale.ROOT, "M %.1f", m), m, gamma));
      curveRenderer.setSeriesPaint(k, new Color(0x7B8794));
      curveRenderer.setSeriesStroke(k, new BasicStroke(1.0f));
      double bm = ObliqueShock.betaAtMaxDeflection(m, gamma);
      XYTextAnnotation a = new XYTextAnnotation(String.format(Locale.ROOT, "M=%.1f", m),
          Math.toDegrees(ObliqueShock.theta(m, bm, gamma)) + 0.4, Math.toDegrees(bm));
      a.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
      a.setPaint(new Color(0x52606D));
      a.setTextAnchor(TextAnchor.CENTER_LEFT);
      plot.addAnnotation(a);
      k++;
    }
    curves.addSeries(detachmentLocus(gamma));
    curveRenderer.setSeriesPaint(k, new Color(0x9AA5B1));
    curveRenderer.setSeriesStroke(k, dashed(1.0f));
    k++;
    if (nominalMach != null && nominalMach > 1) {
      curves.addSeries(curve("nominal", nominalMach, gamma));
      curveRenderer.setSeriesPaint(k, NOMINAL);
      curveRenderer.setSeriesStroke(k, dashed(1.6f));
      k++;
    }
    if (inferredMach != null && inferredMach > 1) {
      curves.addSeries(curve("inferred", inferredMach, gamma));
      curveRenderer.setSeriesPaint(k, INFERRED);
      curveRenderer.setSeriesStroke(k, new BasicStroke(2.0f));
    }
    XYIntervalSeries measured = new XYIntervalSeries("measured");
    for (ShockPoint p : points) {
      measured.add(p.deflectionDeg, p.deflectionDeg - p.deflectionUncertaintyDeg, p.deflectionDeg + p.deflectionUncertaintyDeg,
          p.angleDeg, p.angleDeg - p.angleUncertaintyDeg, p.angleDeg + p.angleUncertaintyDeg);
    }
    XYIntervalSeriesCollection pts = new XYIntervalSeriesCollection();
    pts.addSeries(measured);
    XYErrorRenderer err = new XYErrorRenderer();
    err.setDefaultLinesVisible(false);
    err.setSeriesPaint(0, MEASURED);
    err.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
    err.setErrorPaint(MEASURED);
    err.setCapLength(8);

    plot.setDataset(0, pts);
    plot.setRenderer(0, err);
    plot.setDataset(1, curves);
    plot.setRenderer(1, curveRenderer);
    plot.setDomainAxis(axis("flow deflection \u03b8 (deg)", 0, 46));
    plot.setRangeAxis(axis("shock angle \u03b2 (deg)", 0, 90));
    return svg(styled(plot, false), id);
  }

  /** Mach number against frame, with its uncertainty band, the nominal line and the tolerance band. */
  static String machSequence(List<MachPoint> points, @Nullable Double nominal, @Nullable Double tolerance,
      @Nullable Double summary, String id) {
    YIntervalSeries s = new YIntervalSeries("Mach");
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (MachPoint p : points) {
      s.add(p.frame, p.mach, p.mach - p.uncertainty, p.mach + p.uncertainty);
      lo = Math.min(lo, p.mach - p.uncertainty);
      hi = Math.max(hi, p.mach + p.uncertainty);
    }
    YIntervalSeriesCollection data = new YIntervalSeriesCollection();
    data.addSeries(s);
    DeviationRenderer r = new DeviationRenderer(true, points.size() <= 60);
    r.setSeriesPaint(0, INFERRED);
    r.setSeriesFillPaint(0, new Color(0x90CAF9));
    r.setSeriesStroke(0, new BasicStroke(1.4f));
    r.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
    r.setAlpha(0.45f);
    XYPlot plot = new XYPlot();
    plot.setDataset(data);
    plot.setRenderer(r);
    if (nominal != null) {
      lo = Math.min(lo, nominal - (tolerance == null ? 0 : tolerance));
      hi = Math.max(hi, nominal + (tolerance == null ? 0 : tolerance));
      if (tolerance != null) {
        IntervalMarker band = new IntervalMarker(nominal - tolerance, nominal + tolerance, new Color(0xC8E6C9));
        band.setAlpha(0.55f);
        band.setLabel("tolerance");
        band.setLabelFont(LABEL);
        band.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        band.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        plot.addRangeMarker(band, org.jfree.chart.ui.Layer.BACKGROUND);
      }
      ValueMarker nom = new ValueMarker(nominal, NOMINAL, dashed(1.6f));
      nom.setLabel(String.format(Locale.ROOT, "nominal %.3f", nominal));
      nom.setLabelFont(LABEL);
      nom.setLabelPaint(NOMINAL);
      nom.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
      nom.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
      plot.addRangeMarker(nom);
    }
    if (summary != null) {
      ValueMarker mean = new ValueMarker(summary, INK, new BasicStroke(1.0f));
      mean.setLabel(String.format(Locale.ROOT, "run %.3f", summary));
      mean.setLabelFont(LABEL);
      mean.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
      mean.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
      plot.addRangeMarker(mean);
    }
    double pad = Math.max(0.002, 0.15 * (hi - lo));
    int last = points.isEmpty() ? 1 : points.get(points.size() - 1).frame;
    NumberAxis x = axis("frame", 0, Math.max(1, last));
    x.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
    plot.setDomainAxis(x);
    NumberAxis y = axis("Mach number", lo - pad, hi + pad);
    y.setAutoRangeIncludesZero(false);
    plot.setRangeAxis(y);
    return svg(styled(plot, false), id);
  }

  private static XYSeries curve(String key, double m, double gamma) {
    XYSeries s = new XYSeries(key, false);
    double mu = Math.asin(1 / m);
    int n = 180;
    for (int i = 0; i <= n; i++) {
      double beta = mu + (0.5 * Math.PI - mu) * i / n;
      s.add(Math.toDegrees(ObliqueShock.theta(m, beta, gamma)), Math.toDegrees(beta));
    }
    return s;
  }

  private static XYSeries detachmentLocus(double gamma) {
    XYSeries s = new XYSeries("maximum deflection", false);
    for (double m = 1.02; m < 20; m *= 1.04) {
      double b = ObliqueShock.betaAtMaxDeflection(m, gamma);
      s.add(Math.toDegrees(ObliqueShock.theta(m, b, gamma)), Math.toDegrees(b));
    }
    return s;
  }

  private static NumberAxis axis(String label, double lo, double hi) {
    NumberAxis a = new NumberAxis(label);
    a.setRange(lo, hi);
    a.setLabelFont(LABEL);
    a.setTickLabelFont(LABEL);
    a.setLabelPaint(INK);
    a.setTickLabelPaint(INK);
    return a;
  }

  private static JFreeChart styled(XYPlot plot, boolean legend) {
    plot.setBackgroundPaint(Color.WHITE);
    plot.setDomainGridlinePaint(GRID);
    plot.setRangeGridlinePaint(GRID);
    plot.setOutlinePaint(new Color(0x9AA5B1));
    JFreeChart c = new JFreeChart(null, LABEL, plot, legend);
    c.setBackgroundPaint(Color.WHITE);
    c.setAntiAlias(true);
    c.setTextAntiAlias(true);
    return c;
  }

  private static BasicStroke dashed(float w) {
    return new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f);
  }

  /** The chart as an {@code <svg>} element that scales with its container; {@code id} keeps clip ids apart. */
  private static String svg(JFreeChart chart, String id) {
    SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
    g.setDefsKeyPrefix(id + "-");
    chart.draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
    return g.getSVGElement(id, false, new ViewBox(0, 0, WIDTH, HEIGHT), null, null);
  }
}
