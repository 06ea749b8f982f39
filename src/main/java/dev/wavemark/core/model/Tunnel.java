package dev.wavemark.core.model;

import java.util.Optional;

/**
 * What the facility says about the run: its nominal (calibrated) Mach number, the tolerance a
 * run must meet, and pitot readings. Every part optional.
 */
public record Tunnel(Optional<Double> nominalMach, Optional<Double> machTolerance, Optional<Pitot> pitot) {
  public static final Tunnel NONE = new Tunnel(Optional.empty(), Optional.empty(), Optional.empty());

  /** Pitot-probe readings in Pa; any may be absent. */
  public record Pitot(Optional<Double> totalPressurePa, Optional<Double> pitotPressurePa, Optional<Double> staticPressurePa) {}
}
