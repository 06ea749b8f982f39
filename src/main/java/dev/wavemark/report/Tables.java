package dev.wavemark.report;

import dev.wavemark.files.ResultFile;
import org.jspecify.annotations.Nullable;

/** Small lookups shared by the CSV and the HTML. */
final class Tables {
  private Tables() {}

  /**
   * The Mach estimate that came from the wave at {@code waveIndex} alone: the estimate that lists
   * only that wave, or, for results without wave lists, the one whose {@code from} is the wave's
   * "kind side" (the contract's form); null when none.
   */
  static ResultFile.@Nullable Estimate estimateFor(ResultFile.Frame f, int waveIndex) {
    if (f.mach() == null) {
      return null;
    }
    ResultFile.Wave w = f.waves().get(waveIndex);
    String key = w.side() == null ? w.kind() : w.kind() + " " + w.side();
    for (ResultFile.Estimate e : f.mach().estimates()) {
      if (e.waves() != null ? e.waves().equals(java.util.List.of(waveIndex)) : e.from().equals(key)) {
        return e;
      }
    }
    return null;
  }
}
