package dev.wavemark.imaging.io;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The run file's {@code images.frameRange}: {@code "first-last"} (0-based, inclusive),
 * {@code "first-"} (to the end) or a single index. A last index past the end of the sequence is
 * cut to the last frame (a range written for a longer sequence still works); a first index past
 * the end is an error.
 */
public record FrameRange(int first, int last) {
  private static final Pattern FORM = Pattern.compile("\\s*(\\d+)\\s*(?:(-)\\s*(\\d*)\\s*)?");

  /** Parses {@code text} for a sequence of {@code total} frames. */
  public static FrameRange parse(String text, int total) {
    Matcher m = FORM.matcher(text);
    if (!m.matches()) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "images.frameRange '" + text + "' must be 'first-last' (0-based, inclusive), e.g. '0-199'");
    }
    long first = Long.parseLong(m.group(1));
    long last = m.group(2) == null ? first : m.group(3).isEmpty() ? total - 1L : Long.parseLong(m.group(3));
    if (last < first) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "images.frameRange '" + text + "': the last frame comes before the first");
    }
    if (first >= total) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "images.frameRange '" + text + "' starts after the last frame; the sequence has " + total
              + " frames (0-" + (total - 1) + ")");
    }
    return new FrameRange((int) first, (int) Math.min(last, total - 1L));
  }
}
