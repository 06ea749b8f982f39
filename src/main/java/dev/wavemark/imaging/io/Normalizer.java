package dev.wavemark.imaging.io;

import boofcv.alg.filter.blur.GBlurImageOps;
import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;

/**
 * Turns a frame into relative intensity changes: about 0 in the undisturbed flow, and the wave
 * signatures as fractions of the local illumination (0.05 = 5% brighter). Outside the flow
 * mask the result is 0. Implementations are immutable and thread-safe; each call returns a new image.
 *
 * <p><b>Why a ratio and not a difference.</b> A schlieren or shadowgraph picture is the local
 * illumination I0(x, y) (light source, vignetting, dirty windows) times (1 + s), where s is the
 * relative change the flow makes (the knife edge passes or cuts a fraction of the deflected light).
 * The difference I - I_ref = I0·s keeps the illumination as a gain on the signal, so the same wave
 * reads weaker where the field is dim; the ratio I/I_ref - 1 = s removes it. The ratio is then
 * divided by its median over the mask, which cancels a change of exposure or lamp brightness
 * between the reference and the frame (waves cover a small part of the field, so the median is
 * undisturbed flow).
 */
public interface Normalizer {
  /** The normalised frame. */
  GrayF32 apply(GrayF32 frame);

  /**
   * Against a no-flow reference: (I / I_ref) / median - 1 inside the mask. Reference pixels
   * darker than {@value Ratio#FLOOR_FRACTION} of its 95th percentile are left at 0 (the ratio
   * would only amplify noise there).
   */
  static Normalizer againstReference(GrayF32 reference, FlowMask mask) {
    return new Ratio(reference, mask);
  }

  /**
   * Without a reference: against a large-scale estimate of the illumination, the mask-weighted
   * Gaussian average of the frame over {@code scalePx} (normalised convolution: blur(I·M) /
   * blur(M), so the dark surround and model do not pull the background down near their rims).
   * The estimate is sharpened by Tukey's twicing (2·B − smooth(B)), which removes the Gaussian's
   * curvature bias. Features much narrower than {@code scalePx} (shocks, fan edges) keep their contrast; choose it
   * several times the widest wave band, e.g. a twentieth of the picture width.
   */
  static Normalizer againstIllumination(FlowMask mask, double scalePx) {
    return new Flatten(mask, scalePx);
  }

  /**
   * Without a reference and without flattening: I / median - 1 inside the mask. The illumination's
   * slow variation stays in the result, but so does each wave's net light, which a background
   * estimate at a scale of a few line widths takes away (it subtracts the line's own blur); for
   * measures at the scale of one line, such as the optics guess, that keep a straight baseline.
   */
  static Normalizer againstMedian(FlowMask mask) {
    return new Level(mask);
  }

  /** See {@link #againstMedian}. */
  final class Level implements Normalizer {
    private final FlowMask mask;
    private final float[] valid;

    Level(FlowMask mask) {
      this.mask = mask;
      valid = new float[mask.width() * mask.height()];
      for (int i = 0; i < valid.length; i++) {
        valid[i] = mask.pixels().data[i] != 0 ? 1f : 0f;
      }
    }

    @Override
    public GrayF32 apply(GrayF32 frame) {
      check(frame, mask.width(), mask.height());
      int w = mask.width();
      GrayF32 out = new GrayF32(w, mask.height());
      for (int y = 0; y < mask.height(); y++) {
        for (int x = 0; x < w; x++) {
          out.data[y * w + x] = valid[y * w + x] != 0f ? frame.unsafe_get(x, y) : 0f;
        }
      }
      return recentre(out, mask, valid);
    }
  }

  /** The reference's ratio when there is one, else the flattening at a twentieth of the picture width. */
  static Normalizer of(java.util.Optional<GrayF32> reference, FlowMask mask) {
    return reference.map(r -> againstReference(r, mask))
        .orElseGet(() -> againstIllumination(mask, Math.max(8.0, mask.width() / 20.0)));
  }

  /** See {@link #againstReference}. */
  final class Ratio implements Normalizer {
    static final double FLOOR_FRACTION = 0.02;
    private final float[] inverse;
    private final FlowMask mask;
    private final int width;
    private final int height;

    Ratio(GrayF32 reference, FlowMask mask) {
      if (reference.width != mask.width() || reference.height != mask.height()) {
        throw new WavemarkException(Problem.FRAME_SIZE_MISMATCH, "flow mask", mask.width() + "x" + mask.height(),
            reference.width + "x" + reference.height);
      }
      this.width = reference.width;
      this.height = reference.height;
      this.mask = mask;
      double floor = FLOOR_FRACTION * Robust.quantile(reference, mask.pixels(), 0.95);
      inverse = new float[width * height];
      for (int y = 0; y < height; y++) {
        for (int x = 0; x < width; x++) {
          float r = reference.unsafe_get(x, y);
          inverse[y * width + x] = mask.inside(x, y) && r > floor ? 1f / r : 0f;
        }
      }
    }

    @Override
    public GrayF32 apply(GrayF32 frame) {
      check(frame, width, height);
      GrayF32 out = new GrayF32(width, height);
      for (int y = 0; y < height; y++) {
        for (int x = 0; x < width; x++) {
          out.data[y * width + x] = frame.unsafe_get(x, y) * inverse[y * width + x];
        }
      }
      return recentre(out, mask, inverse);
    }
  }

  /** See {@link #againstIllumination}. */
  final class Flatten implements Normalizer {
    private final FlowMask mask;
    private final double sigma;
    private final GrayF32 weight;

    Flatten(FlowMask mask, double scalePx) {
      if (!(scalePx > 0)) {
        throw new WavemarkException(Problem.BAD_ARGUMENT, "illumination scale must be positive, got " + scalePx);
      }
      this.mask = mask;
      this.sigma = scalePx;
      GrayF32 m = new GrayF32(mask.width(), mask.height());
      for (int i = 0; i < m.data.length; i++) {
        m.data[i] = mask.pixels().data[i];
      }
      this.weight = blur(m);
    }

    private GrayF32 blur(GrayF32 in) {
      // BoofCV separable Gaussian, radius derived from sigma (about 3 sigma)
      return GBlurImageOps.gaussian(in, null, sigma, -1, null);
    }

    /** blur(v) / blur(M) where the mask's blurred weight is not negligible, else 0. */
    private GrayF32 normalised(GrayF32 maskedValues) {
      GrayF32 b = blur(maskedValues);
      for (int i = 0; i < b.data.length; i++) {
        float wgt = weight.data[i];
        b.data[i] = wgt > 1e-3f ? b.data[i] / wgt : 0f;
      }
      return b;
    }

    @Override
    public GrayF32 apply(GrayF32 frame) {
      check(frame, mask.width(), mask.height());
      int w = mask.width();
      int h = mask.height();
      GrayF32 masked = new GrayF32(w, h);
      for (int y = 0; y < h; y++) {
        for (int x = 0; x < w; x++) {
          masked.data[y * w + x] = mask.inside(x, y) ? frame.unsafe_get(x, y) : 0f;
        }
      }
      // normalised convolution B1 = blur(I·M) / blur(M), then Tukey's twicing B = 2·B1 - Bn(B1):
      // a Gaussian alone biases a curved illumination by sigma²·∇²I0 / 2 (6% on a 60% vignette in
      // the tests); twicing cancels that term, leaving a bias of order sigma^4
      GrayF32 b1 = normalised(masked);
      GrayF32 b1Masked = new GrayF32(w, h);
      for (int i = 0; i < b1.data.length; i++) {
        b1Masked.data[i] = mask.pixels().data[i] != 0 ? b1.data[i] : 0f;
      }
      GrayF32 b2 = normalised(b1Masked);
      GrayF32 out = new GrayF32(w, h);
      float[] inverse = new float[w * h];
      for (int i = 0; i < out.data.length; i++) {
        float bg = 2f * b1.data[i] - b2.data[i];
        inverse[i] = mask.pixels().data[i] != 0 && bg > 0 ? 1f / bg : 0f;
        out.data[i] = masked.data[i] * inverse[i];
      }
      return recentre(out, mask, inverse);
    }
  }

  private static void check(GrayF32 frame, int w, int h) {
    if (frame.width != w || frame.height != h) {
      throw new WavemarkException(Problem.FRAME_SIZE_MISMATCH, "frame", frame.width + "x" + frame.height, w + "x" + h);
    }
  }

  /** Divides the ratio by its median over the valid pixels and subtracts 1; invalid pixels become 0. */
  private static GrayF32 recentre(GrayF32 ratio, FlowMask mask, float[] valid) {
    double median = Robust.quantile(ratio, mask.pixels(), 0.5);
    float k = median > 0 ? (float) (1.0 / median) : 1f;
    for (int i = 0; i < ratio.data.length; i++) {
      ratio.data[i] = valid[i] != 0f ? ratio.data[i] * k - 1f : 0f;
    }
    return ratio;
  }
}
