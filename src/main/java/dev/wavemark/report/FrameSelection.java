package dev.wavemark.report;

import java.util.List;
import java.util.TreeSet;

/**
 * Which frames of a run the report pictures: all of a short run, an evenly spaced selection
 * (always the first and the last) of a long one, so that the report's size stays bounded.
 */
public final class FrameSelection {
  /** The most frames the report annotates. */
  public static final int MAX_PICTURES = 8;

  private FrameSelection() {}

  /** Up to {@code max} evenly spaced frame indices out of {@code count}, ascending. */
  public static List<Integer> evenly(int count, int max) {
    TreeSet<Integer> s = new TreeSet<>();
    if (count <= 0 || max <= 0) {
      return List.of();
    }
    if (count <= max) {
      for (int i = 0; i < count; i++) {
        s.add(i);
      }
    } else if (max == 1) {
      s.add(0);
    } else {
      for (int k = 0; k < max; k++) {
        s.add((int) Math.round((double) k * (count - 1) / (max - 1)));
      }
    }
    return List.copyOf(s);
  }
}
