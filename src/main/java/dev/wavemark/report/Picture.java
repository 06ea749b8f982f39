package dev.wavemark.report;

import java.awt.image.BufferedImage;

/**
 * A frame as the report shows it: a display copy of the picture and the factor from analysis
 * pixels to display pixels (1 when the copy is full size, below 1 when it was reduced).
 *
 * @param image the display copy (any BufferedImage type; it is copied before drawing)
 * @param scale display pixels per analysis pixel
 */
public record Picture(BufferedImage image, double scale) {
  public Picture {
    if (!(scale > 0) || !Double.isFinite(scale)) {
      throw new IllegalArgumentException("picture scale must be positive, got " + scale);
    }
  }
}
