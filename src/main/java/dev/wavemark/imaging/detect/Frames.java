package dev.wavemark.imaging.detect;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.Optics;

/** Checks of the input frame and region, the frame's noise, and the optics guess. */
final class Frames {
  private Frames() {}

  /** Smallest frame side accepted, px. */
  static final int MIN_SIDE_PX = 32;

  static void validate(GrayF32 frame, String label) {
    if (frame.width < MIN_SIDE_PX || frame.height < MIN_SIDE_PX) {
      throw new WavemarkException(Problem.IMAGE_EMPTY, label + " (" + frame.width + "x" + frame.height + " px)");
    }
    float min = Float.POSITIVE_INFINITY;
    float max = Float.NEGATIVE_INFINITY;
    // v * 0 is 0 for every finite v and NaN for NaN and the infinities: one sum tells whether
    // the frame is all finite, without a test per pixel; the bad pixel is looked up only then
    float bad = 0;
    for (int y = 0; y < frame.height; y++) {
      int row = frame.startIndex + y * frame.stride;
      for (int x = 0; x < frame.width; x++) {
        float v = frame.data[row + x];
        bad += v * 0f;
        min = v < min ? v : min;
        max = v > max ? v : max;
      }
    }
    if (bad != 0) {
      for (int y = 0; y < frame.height; y++) {
        int row = frame.startIndex + y * frame.stride;
        for (int x = 0; x < frame.width; x++) {
          float v = frame.data[row + x];
          if (!Float.isFinite(v)) {
            throw new WavemarkException(Problem.IMAGE_EMPTY, label + " (pixel (" + x + ", " + y + ") is " + v + ")");
          }
        }
      }
    }
    if (!(max > min)) {
      throw new WavemarkException(Problem.IMAGE_EMPTY, label);
    }
  }

  static void validateRegion(Raster eroded, FlowRegion region, String label) {
    if (region instanceof FlowRegion.MaskRegion m
        && (m.mask().width != eroded.width || m.mask().height != eroded.height)) {
      throw new WavemarkException(Problem.MASK_OUTSIDE, label, "the flow mask (" + m.mask().width + "x" + m.mask().height + " px)",
          eroded.width + "x" + eroded.height + " px");
    }
    if (eroded.flowCount() < MIN_SIDE_PX * MIN_SIDE_PX) {
      throw new WavemarkException(Problem.MASK_OUTSIDE, label, "the flow region (" + eroded.flowCount() + " usable px)",
          eroded.width + "x" + eroded.height + " px");
    }
  }

  /** About this many neighbour differences set the noise (its MAD then has a relative standard error near 0.5 %). */
  static final int NOISE_SAMPLES = 1 << 16;

  /**
   * The pixel noise standard deviation: the MAD of horizontal neighbour differences over
   * sqrt 2, on rows of the flow region spread evenly so that about {@link #NOISE_SAMPLES} of
   * them are taken (every row of a small frame). Waves occupy few pixels, so the median
   * ignores them.
   */
  static double noise(Raster r) {
    int every = Math.max(1, (int) ((long) r.width * r.height / NOISE_SAMPLES));
    int cap = (r.height / every + 1) * r.width;
    double[] d = new double[cap];
    int n = 0;
    for (int y = 0; y < r.height; y += every) {
      int row = y * r.width;
      for (int x = 0; x + 1 < r.width; x++) {
        if (r.flow[row + x] && r.flow[row + x + 1]) {
          d[n++] = Math.abs(r.data[row + x + 1] - r.data[row + x]);
        }
      }
    }
    double mad = LineFit.medianInPlace(d, n);
    return Math.max(1e-9, 1.4826 * mad / Math.sqrt(2));
  }

  /**
   * The fallback of {@link OpticsGuess} when no shock line is found to judge by: in shadowgraph
   * every wave is a dark-bright pair, so the reduced frame's strongest excursions should have
   * partners of the other sign right next to them. A weak test: it takes most shadowgraphs of the
   * detector benchmark for schlieren.
   */
  static Optics pairingGuess(Raster low) {
    int w = low.width;
    double[] mags = new double[low.data.length];
    int n = 0;
    for (int i = 0; i < low.data.length; i++) {
      if (low.flow[i]) {
        mags[n++] = Math.abs(low.data[i]);
      }
    }
    double[] sorted = java.util.Arrays.copyOf(mags, n);
    java.util.Arrays.sort(sorted);
    double thr = sorted[(int) (0.995 * (n - 1))];
    int opposite = 0;
    int total = 0;
    for (int y = 2; y < low.height - 2; y++) {
      for (int x = 2; x < w - 2; x++) {
        int i = y * w + x;
        float v = low.data[i];
        if (!low.flow[i] || Math.abs(v) < thr) {
          continue;
        }
        total++;
        float[] nb = {low.data[i - 2], low.data[i + 2], low.data[i - 2 * w], low.data[i + 2 * w]};
        for (float q : nb) {
          if (q * v < 0 && Math.abs(q) > 0.3 * Math.abs(v)) {
            opposite++;
            break;
          }
        }
      }
    }
    return total > 0 && opposite > 0.5 * total ? Optics.SHADOWGRAPH : Optics.SCHLIEREN_VERTICAL_EDGE;
  }
}
