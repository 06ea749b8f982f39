package dev.wavemark.imaging.io;

import java.nio.file.Path;

/**
 * Where one frame of a sequence comes from.
 *
 * @param index the frame's position in the whole sequence (0-based), the {@code index} of the result file
 * @param path the image file
 * @param page the page inside the file, 1-based (1 for single-image files)
 * @param pageCount how many pages the file holds
 */
public record FrameRef(int index, Path path, int page, int pageCount) {
  public FrameRef {
    if (index < 0 || page < 1 || page > pageCount) {
      throw new IllegalArgumentException("frame " + index + ": page " + page + " of " + pageCount);
    }
  }

  /** The file name alone, as the result file's {@code file} field shows it. */
  public String file() {
    return path.getFileName().toString();
  }

  /** The file name, with the page for a multi-page file: {@code run.tif[17]}. */
  public String label() {
    return pageCount == 1 ? file() : file() + "[" + page + "]";
  }
}
