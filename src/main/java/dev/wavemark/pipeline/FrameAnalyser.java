package dev.wavemark.pipeline;

import dev.wavemark.files.ResultFile;
import dev.wavemark.imaging.io.Frame;
import dev.wavemark.inference.FrameInference;
import java.util.Optional;

/**
 * The per-frame work after loading: normalise, detect, infer, and the frame's result entry. One
 * instance is shared by all worker threads, so implementations keep per-call state local.
 * It may throw {@link dev.wavemark.core.WavemarkException} for a frame it cannot analyse; the
 * pipeline turns that into the frame's error entry.
 */
interface FrameAnalyser {
  Analysed analyse(Frame frame);

  /**
   * One analysed frame: its result entry, and the inference (reduced to what the run's summary
   * reads: Mach number and budget), absent when the frame had no inference.
   */
  record Analysed(ResultFile.Frame entry, Optional<FrameInference> inference) {}

  /** The inference cut down to what {@code Inference.summarise} reads, so a long run keeps little per frame. */
  static FrameInference slim(FrameInference f) {
    return new FrameInference(f.mach(), java.util.List.of(), f.consistency(), f.budget(), java.util.List.of(), java.util.List.of(),
        java.util.List.of(), java.util.List.of(), f.reflection(), java.util.List.of(), java.util.List.of(), f.gammaUncertainty(),
        f.iterations());
  }
}
