package dev.wavemark.report;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.files.ResultFile;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Stroke;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.function.UnaryOperator;
import javax.imageio.ImageIO;

/**
 * Draws a frame's annotations on its picture: the model outline, the theory-predicted waves
 * (dashed: at the inferred Mach number, and at the nominal one), and the measured waves, solid,
 * each tagged W1, W2, ... as in the report's wave table.
 */
final class Annotator {
  static final Color OUTLINE = new Color(0xFFD54F);
  static final Color MEASURED = new Color(0xFF5252);
  static final Color PREDICTED_INFERRED = new Color(0x4FC3F7);
  static final Color PREDICTED_NOMINAL = new Color(0x9CCC65);
  private static final Color SHADOW = new Color(0, 0, 0, 170);

  private Annotator() {}

  /** The annotated picture as PNG bytes. */
  static byte[] png(Picture picture, ResultFile.Frame frame, List<List<Point2>> outline, UnaryOperator<Point2> toPicture) {
    BufferedImage src = picture.image();
    BufferedImage img = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_RGB);
    Graphics2D g = img.createGraphics();
    try {
      g.drawImage(src, 0, 0, null);
      g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
      g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
      g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
      float w = Math.max(1.5f, Math.min(src.getWidth(), src.getHeight()) / 400f);
      double s = picture.scale();
      for (List<Point2> line : outline) {
        Path2D.Double p = new Path2D.Double();
        for (int i = 0; i < line.size(); i++) {
          Point2 q = line.get(i);
          if (i == 0) {
            p.moveTo(q.x() * s, q.y() * s);
          } else {
            p.lineTo(q.x() * s, q.y() * s);
          }
        }
        stroke(g, p, OUTLINE, new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND), w);
      }
      if (frame.predicted() != null) {
        for (ResultFile.Prediction pr : frame.predicted()) {
          boolean nominal = "nominal".equals(pr.basis());
          Color c = nominal ? PREDICTED_NOMINAL : PREDICTED_INFERRED;
          float[] dash = nominal ? new float[] {2 * w, 3 * w} : new float[] {7 * w, 4 * w};
          Stroke st = new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, dash, 0f);
          for (ResultFile.PredictedWave pw : pr.waves()) {
            stroke(g, curve(pw.startPx(), pw.endPx(), s, toPicture), c, st, w);
          }
        }
      }
      Font font = new Font(Font.SANS_SERIF, Font.BOLD, Math.max(12, Math.round(6 * w)));
      g.setFont(font);
      for (int i = 0; i < frame.waves().size(); i++) {
        ResultFile.Wave wave = frame.waves().get(i);
        Line2D.Double l = line(toPicture.apply(pt(wave.startPx())), toPicture.apply(pt(wave.endPx())), s);
        java.awt.Shape drawn = wave.bow() != null && wave.bow().curvePx() != null && wave.bow().curvePx().length > 1
            ? polyline(wave.bow().curvePx(), s, toPicture) : curve(wave.startPx(), wave.endPx(), s, toPicture);
        stroke(g, drawn, MEASURED, new BasicStroke(1.3f * w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND), w);
        tag(g, "W" + (i + 1), l, img.getWidth(), img.getHeight());
      }
    } finally {
      g.dispose();
    }
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try {
      ImageIO.write(img, "png", out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toByteArray();
  }

  private static Point2 pt(double[] a) {
    return new Point2(a[0], a[1]);
  }

  private static Line2D.Double line(Point2 a, Point2 b, double s) {
    return new Line2D.Double(a.x() * s, a.y() * s, b.x() * s, b.y() * s);
  }

  /** Points along a straight line of the corrected image, as they lie in the picture. */
  static final int CURVE_POINTS = 24;

  /**
   * A straight line of the lens-corrected image (the result's coordinates) as the curve it is
   * in the photographed picture, scaled to the display copy.
   */
  private static Path2D.Double curve(double[] a, double[] b, double s, UnaryOperator<Point2> toPicture) {
    Path2D.Double p = new Path2D.Double();
    for (int i = 0; i <= CURVE_POINTS; i++) {
      double t = (double) i / CURVE_POINTS;
      Point2 q = toPicture.apply(new Point2(a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])));
      if (i == 0) {
        p.moveTo(q.x() * s, q.y() * s);
      } else {
        p.lineTo(q.x() * s, q.y() * s);
      }
    }
    return p;
  }

  /** A bow shock's fitted shape: its sampled points (lens-corrected) as they lie in the picture. */
  private static Path2D.Double polyline(double[][] pts, double s, UnaryOperator<Point2> toPicture) {
    Path2D.Double p = new Path2D.Double();
    for (int i = 0; i < pts.length; i++) {
      Point2 q = toPicture.apply(pt(pts[i]));
      if (i == 0) {
        p.moveTo(q.x() * s, q.y() * s);
      } else {
        p.lineTo(q.x() * s, q.y() * s);
      }
    }
    return p;
  }

  /** A line with a dark halo under it, so that it reads on bright and dark backgrounds alike. */
  private static void stroke(Graphics2D g, java.awt.Shape shape, Color c, Stroke st, float w) {
    g.setColor(SHADOW);
    if (st instanceof BasicStroke b) {
      g.setStroke(new BasicStroke(b.getLineWidth() + 2 * w / 1.5f, b.getEndCap(), b.getLineJoin(), b.getMiterLimit(),
          b.getDashArray(), b.getDashPhase()));
    }
    g.draw(shape);
    g.setColor(c);
    g.setStroke(st);
    g.draw(shape);
  }

  /** The wave's tag in a small box near the end of the segment that lies inside the picture. */
  private static void tag(Graphics2D g, String text, Line2D.Double l, int width, int height) {
    FontMetrics fm = g.getFontMetrics();
    double x = l.x1 + 0.8 * (l.x2 - l.x1);
    double y = l.y1 + 0.8 * (l.y2 - l.y1);
    int tw = fm.stringWidth(text) + 8;
    int th = fm.getAscent() + 4;
    int bx = (int) Math.max(2, Math.min(width - tw - 2, x + 6));
    int by = (int) Math.max(2, Math.min(height - th - 2, y - th / 2.0));
    g.setColor(new Color(0, 0, 0, 190));
    g.fillRoundRect(bx, by, tw, th, 6, 6);
    g.setColor(MEASURED);
    g.drawString(text, bx + 4, by + fm.getAscent() + 1);
  }
}
