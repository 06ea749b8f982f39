package dev.wavemark.imaging.synth;

import dev.wavemark.core.geom.Point2;
import java.util.List;

/** Antialiased filling of simple polygons (the model's silhouette, chessboard squares). */
final class Polygons {
  private Polygons() {}

  /**
   * Multiplies {@code t} by {@code level} inside the polygon, blending over one pixel at its
   * boundary by the signed distance to the nearest edge (a good area-coverage estimate for edges
   * straighter than a pixel).
   */
  static void paint(List<Point2> poly, float[] t, int width, int height, double level) {
    int n = poly.size();
    double[] xs = new double[n];
    double[] ys = new double[n];
    double minX = Double.MAX_VALUE;
    double maxX = -Double.MAX_VALUE;
    double minY = Double.MAX_VALUE;
    double maxY = -Double.MAX_VALUE;
    for (int i = 0; i < n; i++) {
      xs[i] = poly.get(i).x();
      ys[i] = poly.get(i).y();
      minX = Math.min(minX, xs[i]);
      maxX = Math.max(maxX, xs[i]);
      minY = Math.min(minY, ys[i]);
      maxY = Math.max(maxY, ys[i]);
    }
    int x0 = (int) Math.max(0, Math.floor(minX - 1));
    int x1 = (int) Math.min(width - 1, Math.ceil(maxX + 1));
    int y0 = (int) Math.max(0, Math.floor(minY - 1));
    int y1 = (int) Math.min(height - 1, Math.ceil(maxY + 1));
    for (int y = y0; y <= y1; y++) {
      for (int x = x0; x <= x1; x++) {
        boolean inside = false;
        double best = Double.MAX_VALUE;
        for (int i = 0, j = n - 1; i < n; j = i++) {
          if ((ys[i] > y) != (ys[j] > y) && x < (xs[j] - xs[i]) * (y - ys[i]) / (ys[j] - ys[i]) + xs[i]) {
            inside = !inside;
          }
          best = Math.min(best, segmentDistance2(x, y, xs[j], ys[j], xs[i], ys[i]));
        }
        double d = Math.sqrt(best);
        double cover = inside ? Math.min(1, 0.5 + d) : Math.max(0, 0.5 - d);
        if (cover > 0) {
          t[y * width + x] *= (float) (1 - cover * (1 - level));
        }
      }
    }
  }

  private static double segmentDistance2(double px, double py, double ax, double ay, double bx, double by) {
    double vx = bx - ax;
    double vy = by - ay;
    double l2 = vx * vx + vy * vy;
    double s = l2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * vx + (py - ay) * vy) / l2));
    double dx = px - ax - s * vx;
    double dy = py - ay - s * vy;
    return dx * dx + dy * dy;
  }
}
