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
import dev.wavemark.imaging.detect.OpticsGuess;
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
      Optics optics, Optional<OpticsGuess> guess) {}

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
    if (s.guess().isPresent() && s.optics() != Optics.AUTO) {
      entry = ResultFrames.withWarning(entry, guessed(s.guess().get()));
    }
    return new Analysed(entry, Optional.of(inf));
  }

  private static String guessed(OpticsGuess g) {
    String taken = "[optics-guessed] the run file gives no optics; the pictures were taken for "
        + (g.optics() == Optics.SHADOWGRAPH ? "shadowgraph" : "schlieren");
    return g.fromLines()
        ? taken + " from the net light across " + g.lines() + " shock line" + (g.lines() == 1 ? "" : "s") + " of the first frame"
            + " (net fraction " + String.format(java.util.Locale.ROOT, "%.2f", g.netFraction())
            + "; about 0 in shadowgraph, 1 in schlieren): give optics in the run file to be sure"
        : taken + " on a weak test (no shock line found in the first frame to judge by; it takes most shadowgraphs"
            + " for schlieren): give optics in the run file";
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
    // the guess weighs each line's net light, which flattening a frame without a reference takes away
    Normalizer forGuess = reference.isPresent() ? n : Normalizer.againstMedian(mask);
    Optional<OpticsGuess> guess = spec.optics() == Optics.AUTO
        ? Optional.of(WaveDetector.guessOptics(forGuess.apply(first), FlowRegion.of(mask.pixels()), spec.model(),
            spec.calibration().flowDirectionRad()))
        : Optional.empty();
    return new Setup(mask, n, und, hints, guess.map(OpticsGuess::optics).orElse(spec.optics()), guess);
  }
}
