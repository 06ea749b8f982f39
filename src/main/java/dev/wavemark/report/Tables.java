package dev.wavemark.report;

import dev.wavemark.files.ResultFile;
import org.jspecify.annotations.Nullable;

/** Small lookups shared by the CSV and the HTML. */
final class Tables {
  private Tables() {}

  /**
   * The Mach estimate that came from a wave: the estimate whose {@code from} names the wave's
   * kind and side (the contract's "kind side" form), or null.
   */
  static ResultFile.@Nullable Estimate estimateFor(ResultFile.Frame f, ResultFile.Wave w) {
    if (f.mach() == null) {
      return null;
    }
    String key = w.side() == null ? w.kind() : w.kind() + " " + w.side();
    for (ResultFile.Estimate e : f.mach().estimates()) {
      if (e.from().equals(key)) {
        return e;
      }
    }
    return null;
  }
}
