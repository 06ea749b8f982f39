package dev.wavemark.pipeline;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.WavePattern;
import dev.wavemark.files.ResultFile;
import dev.wavemark.files.ResultFrames;
import dev.wavemark.imaging.calib.LensCorrection;
import dev.wavemark.imaging.detect.DetectionRequest;
import dev.wavemark.imaging.detect.FlowRegion;
import dev.wavemark.imaging.detect.WaveDetector;
import dev.wavemark.imaging.io.FlowMask;
import dev.wavemark.imaging.io.Frame;
import dev.wavemark.imaging.io.FrameSequence;
import dev.wavemark.imaging.io.Normalizer;
import dev.wavemark.inference.FrameInference;
import dev.wavemark.inference.Inference;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.UnaryOperator;

/**
 * The production per-frame work: normalise against the no-flow reference (or the illumination),
 * detect the waves inside the flow mask with the nominal-Mach pattern as search hints and the lens
 * correction applied to the wave points, infer the Mach number and verdicts, and build the entry.
 * What depends only on the picture size (mask, normaliser, lens, hints) is built once per size.
 */
final class StandardAnalyser implements FrameAnalyser {
  private final RunSpec spec;
  private final FrameSequence seq;
  private final WaveDetector detector = WaveDetector.create();
  private final Map<Long, Setup> setups = new ConcurrentHashMap<>();

  private record Setup(FlowMask mask, Normalizer normalizer, Optional<UnaryOperator<Point2>> undistort, List<ExpectedWave> hints,
      Optics optics) {}

  StandardAnalyser(RunSpec spec, FrameSequence seq) {
    this.spec = spec;
    this.seq = seq;
  }

  @Override
  public Analysed analyse(Frame frame) {
    GrayF32 img = frame.image();
    Setup s = setups.computeIfAbsent(((long) img.width << 32) | img.height, k -> setup(img));
    GrayF32 norm = s.normalizer().apply(img);
    DetectionRequest req = new DetectionRequest(norm, FlowRegion.of(s.mask().pixels()), s.optics(), spec.model(),
        spec.calibration().flowDirectionRad(), s.hints(), s.undistort(), frame.ref().label());
    List<ObservedWave> observed = detector.detect(req);
    FrameInference inf = Inference.ofFrame(spec, observed, img.width, img.height);
    ResultFile.Frame entry = ResultFrames.analysed(frame.index(), frame.ref().label(), observed, inf, spec);
    if (spec.optics() == Optics.AUTO && s.optics() != Optics.AUTO) {
      entry = ResultFrames.withWarning(entry, guessed(s.optics()));
    }
    return new Analysed(entry, Optional.of(inf));
  }

  private static String guessed(Optics o) {
    return "[optics-guessed] the run file gives no optics; the pictures were taken for "
        + (o == Optics.SHADOWGRAPH ? "shadowgraph" : "schlieren")
        + " (the guess is weak, and takes most shadowgraphs for schlieren: give optics in the run file)";
  }

  private Setup setup(GrayF32 first) {
    Optional<GrayF32> reference = seq.reference().filter(r -> r.width == first.width && r.height == first.height);
    FlowMask mask = FlowMask.forRun(spec, first.width, first.height, Optional.of(reference.orElse(first)));
    Normalizer n = Normalizer.of(reference, mask);
    LensCorrection lens = LensCorrection.of(spec.calibration(), first.width, first.height);
    Optional<UnaryOperator<Point2>> und = lens.isIdentity() ? Optional.empty() : Optional.of(lens::undistort);
    List<ExpectedWave> hints = List.of();
    if (spec.tunnel().nominalMach().isPresent()) {
      try {
        hints = WavePattern.of(spec.model(), spec.tunnel().nominalMach().get(), spec.gas().gamma(),
            spec.calibration().flowDirectionRad(), first.width, first.height);
      } catch (WavemarkException e) {
        // No pattern at the nominal Mach number (e.g. a detached shock): search without hints.
        hints = List.of();
      }
    }
    // one guess for the run's frames of this size, from the first, when the run file does not say
    Optics optics = spec.optics() == Optics.AUTO
        ? WaveDetector.guessOptics(n.apply(first), FlowRegion.of(mask.pixels())) : spec.optics();
    return new Setup(mask, n, und, hints, optics);
  }
}
