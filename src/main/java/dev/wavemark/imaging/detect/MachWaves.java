package dev.wavemark.imaging.detect;

import java.util.List;

/** Placeholder-free entry for freestream Mach-wave families; see {@link #find}. */
final class MachWaves {
  private MachWaves() {}

  static List<WaveDetector.Found> find(WaveDetector.Context ctx) {
    return List.of();
  }
}
