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
   * into the frame next to them. Separable running counts keep it linear in the pixel count.
   */
  Raster eroded(int radius) {
    boolean[] rows = new boolean[flow.length];
    for (int y = 0; y < height; y++) {
      erodeLine(flow, rows, y * width, 1, width, radius);
    }
    boolean[] f = new boolean[flow.length];
    for (int x = 0; x < width; x++) {
      erodeLine(rows, f, x, width, height, radius);
    }
    return new Raster(data, f, width, height, scale);
  }

  private static void erodeLine(boolean[] in, boolean[] out, int start, int step, int n, int r) {
    int bad = 0;
    // bad = number of non-flow pixels in the window [i - r, i + r], with the outside counted as non-flow
    for (int j = -r; j <= r; j++) {
      if (j < 0 || j >= n || !in[start + j * step]) {
        bad++;
      }
    }
    for (int i = 0; i < n; i++) {
      out[start + i * step] = bad == 0;
      int leave = i - r;
      int enter = i + r + 1;
      if (leave < 0 || !in[start + leave * step]) {
        bad--;
      }
      if (enter >= n || !in[start + enter * step]) {
        bad++;
      }
    }
  }

  /** Block-averaged copy, {@code k} x {@code k} frame pixels per pixel; flow where all are flow. */
  Raster reduced(int k) {
    int w = width / k;
    int h = height / k;
    float[] d = new float[w * h];
    boolean[] f = new boolean[w * h];
    float norm = 1f / (k * k);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        float s = 0;
        boolean all = true;
        for (int j = 0; j < k; j++) {
          int row = (y * k + j) * width + x * k;
          for (int i = 0; i < k; i++) {
            s += data[row + i];
            all &= flow[row + i];
          }
        }
        d[y * w + x] = s * norm;
        f[y * w + x] = all;
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
    int n = 0;
    for (boolean b : flow) {
      if (b) {
        n++;
      }
    }
    return n;
  }

  boolean inFlow(double x, double y) {
    int ix = (int) Math.round(x);
    int iy = (int) Math.round(y);
    return ix >= 0 && iy >= 0 && ix < width && iy < height && flow[iy * width + ix];
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
