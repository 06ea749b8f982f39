package dev.wavemark.cli;

import dev.wavemark.pipeline.Pipeline;
import dev.wavemark.report.DemoIndex;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code demo [--out DIR]}: analyses the bundled sample set. */
@Command(name = "demo", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
    description = {"Analyses every run file of the bundled sample set into DIR/<run>/ and writes DIR/index.html",
        "linking the reports."})
public final class DemoCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--out", paramLabel = "DIR", defaultValue = "reports/demo", description = "output folder (default ${DEFAULT-VALUE})")
  Path out;

  @Option(names = "--samples", paramLabel = "DIR", defaultValue = "sample-images",
      description = "folder of the sample run files (default ${DEFAULT-VALUE})")
  Path samples;

  @Option(names = "--no-progress", description = "do not draw the progress bar")
  boolean noProgress;

  @Override
  public Integer call() {
    List<DemoIndex.Entry> entries = Pipeline.demo(samples, out, Main.version(), !noProgress && AnalyzeCommand.Progressing.wanted());
    PrintWriter w = spec.commandLine().getOut();
    int failed = 0;
    for (DemoIndex.Entry e : entries) {
      w.println(String.format("%-28s %-22s %s", e.name(), e.mach(), e.error() == null ? "tunnel check " + e.check() : e.error()));
      failed += e.error() == null ? 0 : 1;
    }
    w.println("index: " + out.resolve("index.html"));
    w.flush();
    return failed == 0 ? 0 : 1;
  }
}
