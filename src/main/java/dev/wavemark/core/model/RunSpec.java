package dev.wavemark.core.model;

import dev.wavemark.core.gas.Gas;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * One tunnel run as the analyser needs it, validated and with paths resolved: the domain
 * counterpart of the contract's run file.
 *
 * @param frames image files, absolute; a single multi-page TIFF is a sequence
 * @param frameRange optional "first-last" selection of frame indices (0-based, inclusive)
 * @param modelAngleToleranceRad standard uncertainty of the model's deflection angle
 */
public record RunSpec(
    String label, Gas gas, List<Path> frames, Optional<Path> noFlowReference, Optional<String> frameRange,
    Calibration calibration, Optics optics, BodyShape model, double modelAngleToleranceRad, Tunnel tunnel) {
  public RunSpec {
    frames = List.copyOf(frames);
  }
}
