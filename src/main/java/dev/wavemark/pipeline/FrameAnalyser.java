package dev.wavemark.pipeline;

import dev.wavemark.files.ResultFile;
import dev.wavemark.imaging.io.Frame;

/**
 * The per-frame work after loading: normalise, detect, infer, and the frame's result entry. One
 * instance is shared by all worker threads, so implementations keep per-call state local.
 * It may throw {@link dev.wavemark.core.WavemarkException} for a frame it cannot analyse; the
 * pipeline turns that into the frame's error entry.
 */
interface FrameAnalyser {
  ResultFile.Frame analyse(Frame frame);
}
