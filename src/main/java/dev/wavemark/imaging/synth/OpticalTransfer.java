package dev.wavemark.imaging.synth;

import dev.wavemark.core.model.Optics;

/**
 * From light deflection to brightness: the knife edge and the shadowgraph. Merzkirch, "Flow
 * Visualization", 2nd ed. 1987, ch. 3 (from memory), and Settles, "Schlieren and Shadowgraph
 * Techniques", 2001, ch. 2-3 (from memory).
 */
final class OpticalTransfer {
  private OpticalTransfer() {}

  /**
   * Knife-edge schlieren: a ray deflected by eps moves the source image by f * eps across the
   * edge; the brightness is the uncut fraction of the source image, (1 - cut) + f eps / a,
   * saturating at 0 (fully cut off) and 1 (fully open). Returned as a fraction of full scale.
   */
  static float[] schlieren(Bench b, FlowRaster r) {
    float[] g = b.optics() == Optics.SCHLIEREN_VERTICAL_EDGE ? r.gx : r.gy;
    double k = b.edgeSign() * b.focalLengthM() * b.deflectionPerGradient() / b.sourceImageM();
    double open = 1 - b.cutFraction();
    float[] out = new float[g.length];
    for (int i = 0; i < g.length; i++) {
      double uncut = open + k * g[i];
      out[i] = (float) (b.exposure() * (uncut < 0 ? 0 : uncut > 1 ? 1 : uncut));
    }
    return out;
  }

  /**
   * Shadowgraph: each ray lands displaced by D = L eps on the recorded plane; the brightness there
   * is the source brightness over the Jacobian of the ray mapping, 1 / det(I + grad D) (to first
   * order 1 - L * laplacian, so a shock shows as a dark line ahead of a bright one, displaced
   * downstream). Caustics are capped at four times the background.
   */
  static float[] shadowgraph(Bench b, FlowRaster r, int w, int h) {
    double k = b.screenDistanceM() * b.deflectionPerGradient() / b.metersPerPixel();
    float[] dx = new float[w * h];
    float[] dy = new float[w * h];
    for (int i = 0; i < dx.length; i++) {
      dx[i] = (float) (k * r.gx[i]);
      dy[i] = (float) (k * r.gy[i]);
    }
    float[] bright = new float[w * h];
    for (int y = 0; y < h; y++) {
      int ym = Math.max(0, y - 1);
      int yp = Math.min(h - 1, y + 1);
      for (int x = 0; x < w; x++) {
        int xm = Math.max(0, x - 1);
        int xp = Math.min(w - 1, x + 1);
        int i = y * w + x;
        double a = 1 + (dx[y * w + xp] - dx[y * w + xm]) / (xp - xm);
        double d = 1 + (dy[yp * w + x] - dy[ym * w + x]) / (yp - ym);
        double bxy = (dx[yp * w + x] - dx[ym * w + x]) / (yp - ym);
        double cxy = (dy[y * w + xp] - dy[y * w + xm]) / (xp - xm);
        double det = Math.abs(a * d - bxy * cxy);
        bright[i] = (float) Math.min(4.0, 1.0 / Math.max(0.25, det));
      }
    }
    // Each recorded point x' shows the ray that left x = x' - D(x) (one fixed-point step).
    float[] out = new float[w * h];
    double scale = 0.45 * b.exposure();
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        double sx = x - dx[i];
        double sy = y - dy[i];
        out[i] = (float) (scale * bilinear(bright, w, h, sx, sy, 1f));
      }
    }
    return out;
  }

  /** Resamples {@code img} at the mapped positions (bilinear, zero outside). */
  static float[] remap(float[] img, float[] mx, float[] my, int w, int h) {
    float[] out = new float[w * h];
    for (int i = 0; i < out.length; i++) {
      out[i] = (float) bilinear(img, w, h, mx[i], my[i], 0f);
    }
    return out;
  }

  static double bilinear(float[] img, int w, int h, double x, double y, float outside) {
    if (x < 0 || y < 0 || x > w - 1 || y > h - 1) {
      return outside;
    }
    int x0 = (int) x;
    int y0 = (int) y;
    int x1 = Math.min(w - 1, x0 + 1);
    int y1 = Math.min(h - 1, y0 + 1);
    double fx = x - x0;
    double fy = y - y0;
    double top = img[y0 * w + x0] * (1 - fx) + img[y0 * w + x1] * fx;
    double bot = img[y1 * w + x0] * (1 - fx) + img[y1 * w + x1] * fx;
    return top * (1 - fy) + bot * fy;
  }
}
