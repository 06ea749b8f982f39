package dev.wavemark.cli;

import dev.wavemark.files.ResultFile;
import dev.wavemark.pipeline.Pipeline;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code analyze RUNFILE --out DIR}: one run end to end. */
@Command(name = "analyze", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
    description = {"Analyses a run: measures every wave in its frames, infers the freestream Mach number with its",
        "uncertainty budget, and writes DIR/result.json, DIR/result.csv and DIR/report.html with its pictures."})
public final class AnalyzeCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(paramLabel = "RUNFILE", description = "the run file (*.run.json)")
  Path runFile;

  @Option(names = "--out", paramLabel = "DIR", required = true, description = "folder for the result and the report")
  Path out;

  @Option(names = "--no-progress", description = "do not draw the progress bar")
  boolean noProgress;

  @Override
  public Integer call() {
    Pipeline.RunResult r = Pipeline.analyze(runFile, out, Main.version(), !noProgress && Progressing.wanted());
    summarise(spec.commandLine().getOut(), r.result(), r.report());
    failures(spec.commandLine().getErr(), r.result());
    // the report is written either way; a run that gave no Mach number at all is a failure
    return r.result().summary().mach() == null ? 1 : 0;
  }

  /** Failed frames shown on the terminal, a line each up to {@value #SHOWN_FAILURES}. */
  static final int SHOWN_FAILURES = 5;

  static void failures(PrintWriter err, ResultFile r) {
    int shown = 0;
    int failed = 0;
    for (ResultFile.Frame f : r.frames()) {
      if (!f.failed()) {
        continue;
      }
      failed++;
      if (shown < SHOWN_FAILURES) {
        err.println("wavemark: " + f.error().message() + " [" + f.error().code() + "]");
        shown++;
      }
    }
    if (failed > shown) {
      err.println("wavemark: " + (failed - shown) + " more frame(s) failed; every failure is in result.json and the report");
    }
    err.flush();
  }

  static void summarise(PrintWriter out, ResultFile r, Path report) {
    ResultFile.Summary s = r.summary();
    String mach = s.mach() == null ? "no Mach number" : String.format(Locale.ROOT, "M = %.4f ± %.4f", s.mach().value(), s.mach().uncertainty());
    String check = s.tunnel() == null ? "" : ", tunnel check " + s.tunnel().verdict();
    out.println(r.label() + ": " + mach + " (" + (s.frames() - s.failedFrames()) + " of " + s.frames() + " frames analysed" + check + ")");
    out.println("report: " + report);
    out.flush();
  }

  /** Whether a progress bar would be seen: a console, and not a CI run. */
  static final class Progressing {
    private Progressing() {}

    static boolean wanted() {
      return System.console() != null && !"true".equalsIgnoreCase(System.getenv("CI"));
    }
  }
}
