package dev.wavemark.pipeline;

import boofcv.struct.image.GrayF32;
import dev.wavemark.report.Picture;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.Arrays;

/**
 * The display copy of a frame for the report: 8-bit grey, contrast stretched between the 0.5th
 * and 99.5th percentiles of the frame's values (so a few hot pixels do not wash it out), reduced
 * to at most {@link #MAX_WIDTH} pixels wide.
 */
final class Display {
  static final int MAX_WIDTH = 1100;

  private Display() {}

  static Picture of(GrayF32 g) {
    float[] sample = sample(g);
    Arrays.sort(sample);
    float lo = sample[(int) (0.005 * (sample.length - 1))];
    float hi = sample[(int) (0.995 * (sample.length - 1))];
    float span = hi > lo ? hi - lo : 1f;
    BufferedImage img = new BufferedImage(g.width, g.height, BufferedImage.TYPE_BYTE_GRAY);
    byte[] px = ((java.awt.image.DataBufferByte) img.getRaster().getDataBuffer()).getData();
    for (int y = 0; y < g.height; y++) {
      int row = g.startIndex + y * g.stride;
      for (int x = 0; x < g.width; x++) {
        float v = (g.data[row + x] - lo) / span;
        int b = Math.round(255f * Math.max(0f, Math.min(1f, v)));
        px[y * g.width + x] = (byte) b;
      }
    }
    if (g.width <= MAX_WIDTH) {
      return new Picture(img, 1.0);
    }
    double s = (double) MAX_WIDTH / g.width;
    int h = Math.max(1, (int) Math.round(g.height * s));
    BufferedImage small = new BufferedImage(MAX_WIDTH, h, BufferedImage.TYPE_BYTE_GRAY);
    java.awt.Graphics2D gr = small.createGraphics();
    gr.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
    gr.drawImage(img, 0, 0, MAX_WIDTH, h, null);
    gr.dispose();
    return new Picture(small, (double) MAX_WIDTH / g.width);
  }

  /** Up to about 65,000 values spread over the frame, for the percentiles. */
  private static float[] sample(GrayF32 g) {
    int n = g.width * g.height;
    int step = Math.max(1, n / 65_536);
    float[] out = new float[(n + step - 1) / step];
    int k = 0;
    for (int i = 0; i < n && k < out.length; i += step) {
      int x = i % g.width;
      int y = i / g.width;
      out[k++] = g.data[g.startIndex + y * g.stride + x];
    }
    return k == out.length ? out : Arrays.copyOf(out, k);
  }
}
