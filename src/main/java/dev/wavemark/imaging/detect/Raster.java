package dev.wavemark.imaging.detect;

import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU8;

/**
 * A frame and its flow mask as plain arrays, for the hot loops of the detector. Bilinear
 * sampling is written out here rather than taken from BoofCV's InterpolatePixelS because the
 * detector samples millions of points per frame and needs the mask test in the same pass.
 */
final class Raster {
  final float[] data;
  final boolean[] flow;
  final int width;
  final int height;
  /** Pixel size of this raster in frame pixels (1 for the frame, 2 for a half-size copy...). */
  final int scale;

  /** See {@link #cells()}; made on first use (a raster belongs to one detection, one thread). */
  private boolean[] cells;
  /** See {@link #flowCount()}; -1 until known. */
  private int flowCount = -1;

  Raster(float[] data, boolean[] flow, int width, int height, int scale) {
    this.data = data;
    this.flow = flow;
    this.width = width;
    this.height = height;
    this.scale = scale;
  }

  /** Copies a frame (respecting stride) and rasterises a region onto it. */
  static Raster of(GrayF32 frame, FlowRegion region) {
    int w = frame.width;
    int h = frame.height;
    float[] d = new float[w * h];
    boolean[] f = new boolean[w * h];
    for (int y = 0; y < h; y++) {
      System.arraycopy(frame.data, frame.startIndex + y * frame.stride, d, y * w, w);
    }
    if (region instanceof FlowRegion.MaskRegion m) {
      GrayU8 mask = m.mask();
      for (int y = 0; y < Math.min(h, mask.height); y++) {
        int row = mask.startIndex + y * mask.stride;
        for (int x = 0; x < Math.min(w, mask.width); x++) {
          f[y * w + x] = mask.data[row + x] != 0;
        }
      }
    } else {
      for (int y = 0; y < h; y++) {
        for (int x = 0; x < w; x++) {
          f[y * w + x] = region.contains(x, y);
        }
      }
    }
    return new Raster(d, f, w, h, 1);
  }

  /**
   * A copy whose flow mask excludes every pixel within {@code radius} (a square neighbourhood)
   * of a non-flow pixel or the border: the blur of the silhouette's and window's edges bleeds
   * into the frame next to them. Separable: a pixel survives a pass when the run of flow pixels
   * through it reaches {@code radius} either side, which a running count of consecutive flow
   * pixels tells in one sweep (the vertical pass keeps one count per column and reads the
   * mask row by row, in memory order).
   */
  Raster eroded(int radius) {
    int span = 2 * radius + 1;
    boolean[] rows = new boolean[flow.length];
    for (int y = 0; y < height; y++) {
      int row = y * width;
      int run = 0;
      for (int x = 0; x < width; x++) {
        run = flow[row + x] ? run + 1 : 0;
        if (run >= span) {
          rows[row + x - radius] = true;
        }
      }
    }
    boolean[] f = new boolean[flow.length];
    int[] run = new int[width];
    int count = 0;
    for (int y = 0; y < height; y++) {
      int row = y * width;
      int out = (y - radius) * width;
      for (int x = 0; x < width; x++) {
        int c = rows[row + x] ? run[x] + 1 : 0;
        run[x] = c;
        if (c >= span) {
          f[out + x] = true;
          count++;
        }
      }
    }
    Raster r = new Raster(data, f, width, height, scale);
    r.flowCount = count;
    return r;
  }

  /** Block-averaged copy, {@code k} x {@code k} frame pixels per pixel; flow where all are flow. */
  Raster reduced(int k) {
    int w = width / k;
    int h = height / k;
    float[] d = new float[w * h];
    boolean[] f = new boolean[w * h];
    float norm = 1f / (k * k);
    float[] acc = new float[w];
    boolean[] all = new boolean[w];
    for (int y = 0; y < h; y++) {
      java.util.Arrays.fill(acc, 0f);
      java.util.Arrays.fill(all, true);
      // the block's rows one after the other, each row's pixels in order: the same order of
      // additions as a block-by-block loop, read along the frame's rows
      for (int j = 0; j < k; j++) {
        int row = (y * k + j) * width;
        for (int x = 0; x < w; x++) {
          int at = row + x * k;
          float s = acc[x];
          boolean a = all[x];
          for (int i = 0; i < k; i++) {
            s += data[at + i];
            a &= flow[at + i];
          }
          acc[x] = s;
          all[x] = a;
        }
      }
      for (int x = 0; x < w; x++) {
        d[y * w + x] = acc[x] * norm;
        f[y * w + x] = all[x];
      }
    }
    return new Raster(d, f, w, h, scale * k);
  }

  /** True when a flow pixel lies within {@code radius} px (square) of (x, y). */
  boolean inFlowOrNear(double x, double y, int radius) {
    int cx = (int) Math.round(x);
    int cy = (int) Math.round(y);
    for (int j = Math.max(0, cy - radius); j <= Math.min(height - 1, cy + radius); j++) {
      for (int i = Math.max(0, cx - radius); i <= Math.min(width - 1, cx + radius); i++) {
        if (flow[j * width + i]) {
          return true;
        }
      }
    }
    return false;
  }

  /** Number of flow pixels. */
  int flowCount() {
    if (flowCount < 0) {
      int n = 0;
      for (boolean b : flow) {
        if (b) {
          n++;
        }
      }
      flowCount = n;
    }
    return flowCount;
  }

  boolean inFlow(double x, double y) {
    int ix = (int) Math.round(x);
    int iy = (int) Math.round(y);
    return ix >= 0 && iy >= 0 && ix < width && iy < height && flow[iy * width + ix];
  }

  /**
   * For each pixel (x, y) with x &lt; width - 1 and y &lt; height - 1: true when the bilinear cell
   * it opens (it and its right, lower and lower-right neighbours) is wholly in the flow, which
   * is when {@link #sample} gives a value inside that cell. Lets the pencil loops test one flag
   * per sample instead of four.
   */
  boolean[] cells() {
    if (cells == null) {
      boolean[] c = new boolean[flow.length];
      for (int y = 0; y + 1 < height; y++) {
        int row = y * width;
        for (int x = 0; x + 1 < width; x++) {
          int i = row + x;
          c[i] = flow[i] && flow[i + 1] && flow[i + width] && flow[i + width + 1];
        }
      }
      cells = c;
    }
    return cells;
  }

  /**
   * Fills out[0..m) with {@link #sample}(px + o_j nx, py + o_j ny), o_j = j step - half, the
   * same values the single-point call gives; stops at the first sample outside the flow (or the
   * raster) and returns false. When both ends lie inside the raster's last full cell, every
   * sample does (the segment is convex), and the bounds tests are left out.
   */
  boolean sampleLine(double px, double py, double nx, double ny, double step, double half, int m, double[] out) {
    double oe = (m - 1) * step - half;
    double xa = px - half * nx;
    double ya = py - half * ny;
    double xb = px + oe * nx;
    double yb = py + oe * ny;
    double lim = Math.nextDown((double) (width - 1));
    double limY = Math.nextDown((double) (height - 1));
    if (!(Math.min(xa, xb) >= 0 && Math.max(xa, xb) <= lim && Math.min(ya, yb) >= 0 && Math.max(ya, yb) <= limY)) {
      for (int j = 0; j < m; j++) {
        double o = j * step - half;
        out[j] = sample(px + o * nx, py + o * ny);
        if (Double.isNaN(out[j])) {
          return false;
        }
      }
      return true;
    }
    for (int j = 0; j < m; j++) {
      double o = j * step - half;
      double x = px + o * nx;
      double y = py + o * ny;
      int x0 = (int) x;
      int y0 = (int) y;
      int i = y0 * width + x0;
      if (!(flow[i] && flow[i + 1] && flow[i + width] && flow[i + width + 1])) {
        return false;
      }
      double fx = x - x0;
      double fy = y - y0;
      double top = data[i] + fx * (data[i + 1] - data[i]);
      double bot = data[i + width] + fx * (data[i + width + 1] - data[i + width]);
      out[j] = top + fy * (bot - top);
    }
    return true;
  }

  /** Bilinear value at (x, y), or NaN outside the raster or the flow region. */
  double sample(double x, double y) {
    if (!(x >= 0 && y >= 0 && x <= width - 1 && y <= height - 1)) {
      return Double.NaN;
    }
    int x0 = (int) x;
    int y0 = (int) y;
    if (x0 == width - 1) {
      x0--;
    }
    if (y0 == height - 1) {
      y0--;
    }
    int i = y0 * width + x0;
    if (!(flow[i] && flow[i + 1] && flow[i + width] && flow[i + width + 1])) {
      return Double.NaN;
    }
    double fx = x - x0;
    double fy = y - y0;
    double top = data[i] + fx * (data[i + 1] - data[i]);
    double bot = data[i + width] + fx * (data[i + width + 1] - data[i + width]);
    return top + fy * (bot - top);
  }
}
