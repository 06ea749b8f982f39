package dev.wavemark.pipeline;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.files.ResultFile;
import dev.wavemark.files.RunFile;
import dev.wavemark.imaging.io.FrameSequence;
import dev.wavemark.report.DemoIndex;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/** The pipeline's entry points: one run, and the bundled demo set. */
public final class Pipeline {
  private Pipeline() {}

  /** What one run produced: its result and where its report is. */
  public record RunResult(String name, ResultFile result, Path report) {}

  /**
   * Analyses one run file into {@code outDir} (result.json, result.csv, report.html and pictures).
   *
   * @param version the tool version written into the result
   * @param progress draw a progress bar on stderr
   * @throws WavemarkException for a run that cannot start (bad run file, missing calibration or
   *     image file, unknown shape); a frame that fails does not throw, it becomes an error entry
   */
  public static RunResult analyze(Path runFile, Path outDir, String version, boolean progress) {
    return analyze(runFile, outDir, version, progress, null);
  }

  private static RunResult analyze(Path runFile, Path outDir, String version, boolean progress, String backLink) {
    RunFile rf = RunFile.read(runFile);
    RunSpec spec = rf.toDomain(runFile);
    FrameSequence seq = FrameSequence.of(spec);
    RunPipeline.Options opts = new RunPipeline.Options(Runtime.getRuntime().availableProcessors(), progress, backLink);
    RunPipeline.Outcome o = RunPipeline.run(runFile, rf, spec, seq, new StandardAnalyser(spec, seq), outDir, opts, version);
    return new RunResult(runName(runFile), o.result(), o.report());
  }

  /**
   * Analyses every {@code *.run.json} of {@code samplesDir} into {@code outDir/<run name>/} and
   * writes {@code outDir/index.html} linking them. A run that cannot start is listed in the index
   * with its one-line reason, and the other runs go on.
   */
  public static List<DemoIndex.Entry> demo(Path samplesDir, Path outDir, String version, boolean progress) {
    List<Path> runs;
    try (Stream<Path> s = Files.list(samplesDir)) {
      runs = s.filter(p -> p.getFileName().toString().endsWith(".run.json")).sorted().toList();
    } catch (IOException e) {
      throw new WavemarkException(Problem.SAMPLES_MISSING, samplesDir);
    }
    if (runs.isEmpty()) {
      throw new WavemarkException(Problem.SAMPLES_MISSING, samplesDir);
    }
    List<DemoIndex.Entry> entries = new ArrayList<>();
    for (Path run : runs) {
      String name = runName(run);
      try {
        RunResult r = analyze(run, outDir.resolve(name), version, progress, "../index.html");
        entries.add(DemoIndex.Entry.of(name, r.result(), name + "/report.html", null));
      } catch (WavemarkException e) {
        entries.add(DemoIndex.Entry.of(name, null, null, e.getMessage() + " [" + e.code() + "]"));
      }
    }
    DemoIndex.write(entries, outDir, version);
    return entries;
  }

  static String runName(Path runFile) {
    String n = runFile.getFileName().toString();
    return n.endsWith(".run.json") ? n.substring(0, n.length() - ".run.json".length()) : n.replaceAll("\\.json$", "");
  }
}
