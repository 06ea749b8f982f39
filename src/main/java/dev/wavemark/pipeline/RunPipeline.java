package dev.wavemark.pipeline;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.files.CalibrationFile;
import dev.wavemark.files.ResultFile;
import dev.wavemark.files.ResultFrames;
import dev.wavemark.files.RunFile;
import dev.wavemark.imaging.calib.LensCorrection;
import dev.wavemark.imaging.io.Frame;
import dev.wavemark.imaging.io.FrameRef;
import dev.wavemark.imaging.io.FrameSequence;
import dev.wavemark.inference.FrameInference;
import dev.wavemark.inference.Inference;
import dev.wavemark.report.FrameSelection;
import dev.wavemark.report.Picture;
import dev.wavemark.report.Report;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.UnaryOperator;
import org.jspecify.annotations.Nullable;

/**
 * One run end to end, with the per-frame work given as a {@link FrameAnalyser}: frames are read
 * from the sequence one by one on the worker threads, analysed, and dropped; only each frame's
 * result entry and the display copies of the pictured frames are kept.
 */
final class RunPipeline {
  private RunPipeline() {}

  /** What one run produced. */
  record Outcome(ResultFile result, Path report) {}

  static Outcome run(Path runFile, RunFile rf, RunSpec spec, FrameSequence seq, FrameAnalyser analyser, Path outDir,
      Options options, String version) {
    List<FrameRef> refs = seq.refs();
    Set<Integer> pictured = new HashSet<>();
    List<Integer> annotated = new ArrayList<>();
    for (int i : FrameSelection.evenly(refs.size(), FrameSelection.MAX_PICTURES)) {
      pictured.add(i);
      annotated.add(refs.get(i).index());
    }
    Map<Integer, Picture> pictures = new ConcurrentHashMap<>();
    List<FrameAnalyser.Analysed> done;
    try (Progress progress = Progress.of(options.progress(), spec.label(), refs.size())) {
      done = ParallelFrames.run(refs.size(), options.threads(), i -> {
        FrameRef ref = refs.get(i);
        try {
          Frame frame = seq.read(ref);
          if (pictured.contains(i)) {
            pictures.put(ref.index(), Display.of(frame.image()));
          }
          FrameAnalyser.Analysed a = analyser.analyse(frame);
          return new FrameAnalyser.Analysed(a.entry(), a.inference().map(FrameAnalyser::slim));
        } catch (WavemarkException e) {
          return new FrameAnalyser.Analysed(failed(ref, e.code(), e.getMessage()), Optional.empty());
        } catch (RuntimeException e) {
          // A bug met on one frame must not lose the others: record it as that frame's error.
          WavemarkException w = new WavemarkException(e, Problem.FRAME_FAILED, ref.label(), e.toString());
          return new FrameAnalyser.Analysed(failed(ref, w.code(), w.getMessage()), Optional.empty());
        }
      }, progress::step);
    }
    List<ResultFile.Frame> frames = new ArrayList<>(done.size());
    List<FrameInference> inferences = new ArrayList<>();
    int failed = 0;
    for (FrameAnalyser.Analysed a : done) {
      frames.add(a.entry());
      a.inference().ifPresent(inferences::add);
      failed += a.entry().failed() ? 1 : 0;
    }
    ResultFile.Summary summary = ResultFrames.summary(Inference.summarise(spec, inferences, failed), spec);
    ResultFile result = new ResultFile(spec.label(), new ResultFile.Tool("wavemark", version), frames, summary,
        settings(runFile, rf, spec, annotated));
    Path html = Report.write(new Report.Input(result, spec.model(), spec.calibration().flowDirectionRad(), pictures,
        options.backLink(), toPicture(spec, pictures)), outDir);
    return new Outcome(result, html);
  }

  /** The lens distortion at the pictured frames' size: result pixels (corrected) to picture pixels. */
  private static UnaryOperator<Point2> toPicture(RunSpec spec, Map<Integer, Picture> pictures) {
    if (pictures.isEmpty()) {
      return UnaryOperator.identity();
    }
    Picture p = pictures.values().iterator().next();
    int w = (int) Math.round(p.image().getWidth() / p.scale());
    int h = (int) Math.round(p.image().getHeight() / p.scale());
    LensCorrection lens = LensCorrection.of(spec.calibration(), w, h);
    return lens.isIdentity() ? UnaryOperator.identity() : lens::distort;
  }

  static ResultFile.Frame failed(FrameRef ref, String code, String message) {
    return new ResultFile.Frame(ref.index(), ref.label(), List.of(), null, null, List.of(),
        new ResultFile.FrameError(code, message), null, null, null);
  }

  private static ResultFile.Settings settings(Path runFile, RunFile rf, RunSpec spec, List<Integer> annotated) {
    Calibration c = spec.calibration();
    CalibrationFile cal = c.equals(Calibration.NONE) ? null : CalibrationFile.fromDomain(c);
    RunFile.ImagesJson im = rf.images();
    List<String> images = im == null || im.frames() == null ? List.of() : im.frames();
    return new ResultFile.Settings(runFile.getFileName().toString(), spec.gas().gamma(), spec.optics().contractName(), rf.model(),
        cal, rf.tunnel(), images, im == null ? null : im.noFlowReference(), im == null ? null : im.frameRange(),
        Math.toDegrees(spec.modelAngleToleranceRad()), annotated);
  }

  /**
   * How to run.
   *
   * @param threads worker threads (all cores by default)
   * @param progress whether to draw a progress bar on stderr
   * @param backLink a relative link from the report back to an index page, or null
   */
  record Options(int threads, boolean progress, @Nullable String backLink) {
    static Options defaults() {
      return new Options(Runtime.getRuntime().availableProcessors(), Progress.wanted(), null);
    }
  }
}
