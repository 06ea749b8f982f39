package dev.wavemark.pipeline;

import dev.wavemark.core.geom.FittedLine;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.WavePattern;
import dev.wavemark.files.ResultFrames;
import dev.wavemark.imaging.io.Frame;
import dev.wavemark.inference.FrameInference;
import dev.wavemark.inference.Inference;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A stand-in for detection in pipeline tests: it "observes" exactly the waves theory puts in the
 * picture at a given Mach number (WavePattern), with a 0.05 deg fit uncertainty, and runs the real
 * inference on them. What it checks is the pipeline's plumbing, not the detector.
 */
final class TheoryAnalyser implements FrameAnalyser {
  private final RunSpec spec;
  private final double mach;

  TheoryAnalyser(RunSpec spec, double mach) {
    this.spec = spec;
    this.mach = mach;
  }

  @Override
  public Analysed analyse(Frame frame) {
    int w = frame.image().width;
    int h = frame.image().height;
    List<ExpectedWave> theory = WavePattern.of(spec.model(), mach, spec.gas().gamma(), spec.calibration().flowDirectionRad(), w, h);
    List<ObservedWave> observed = new ArrayList<>();
    for (ExpectedWave e : theory) {
      Point2 mid = e.startPx().plus(e.endPx()).times(0.5);
      FittedLine line = new FittedLine(mid, e.directionRad(), Math.toRadians(0.05), e.startPx(), e.endPx(), 100, 0.3, false);
      observed.add(new ObservedWave(e.kind(), Optional.of(e.side()), line, 1.0, 2.0, Optional.of(e.feature())));
    }
    FrameInference inf = Inference.ofFrame(spec, observed, w, h);
    return new Analysed(ResultFrames.analysed(frame.index(), frame.ref().label(), observed, inf, spec), Optional.of(inf));
  }
}
