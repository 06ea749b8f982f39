package dev.wavemark.imaging.detect;

import boofcv.struct.image.GrayU8;

/**
 * The part of the picture where flow is seen (inside the window, outside the model
 * silhouette). Pixels outside it are never used as wave evidence.
 */
@FunctionalInterface
public interface FlowRegion {
  /** True when pixel (x, y) (integer pixel centres) shows flow. */
  boolean contains(int x, int y);

  /** Every pixel shows flow. */
  static FlowRegion all() {
    return (x, y) -> true;
  }

  /**
   * A mask image: non-zero means flow. Pixels beyond the mask's size are outside the region.
   * The mask is read, not copied; do not change it while a detection runs.
   */
  static FlowRegion of(GrayU8 mask) {
    return new MaskRegion(mask);
  }

  /** The mask behind a {@link #of(GrayU8)} region, so the detector can check its size. */
  record MaskRegion(GrayU8 mask) implements FlowRegion {
    @Override
    public boolean contains(int x, int y) {
      return mask.isInBounds(x, y) && mask.unsafe_get(x, y) != 0;
    }
  }
}
