package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;

/**
 * One loaded frame: where it came from and its calibrated intensities. The image belongs to the
 * caller (each read makes a new one).
 */
public record Frame(FrameRef ref, GrayF32 image) {
  public int index() {
    return ref.index();
  }

  public String file() {
    return ref.file();
  }

  public int page() {
    return ref.page();
  }
}
