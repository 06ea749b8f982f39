package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU8;
import java.util.Arrays;
import org.jspecify.annotations.Nullable;

/** Robust statistics of a picture over a subsample of its pixels (about 65,000, on a regular grid). */
final class Robust {
  private Robust() {}

  /** The {@code q}-quantile (0..1) of the pixels, inside {@code mask} when given; NaN when none. */
  static double quantile(GrayF32 g, @Nullable GrayU8 mask, double q) {
    int step = Math.max(1, (int) Math.sqrt((double) g.width * g.height / 65536.0));
    float[] v = new float[(g.width / step + 1) * (g.height / step + 1)];
    int n = 0;
    for (int y = 0; y < g.height; y += step) {
      for (int x = 0; x < g.width; x += step) {
        if (mask == null || mask.unsafe_get(x, y) != 0) {
          float f = g.unsafe_get(x, y);
          if (Float.isFinite(f)) {
            v[n++] = f;
          }
        }
      }
    }
    if (n == 0) {
      return Double.NaN;
    }
    Arrays.sort(v, 0, n);
    return v[Math.min(n - 1, (int) Math.floor(q * (n - 1) + 0.5))];
  }
}
