package dev.wavemark.cli.render;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code wavemark samples}: rebuilds the bundled sample set and the bench calibration from their seeds. */
@Command(name = "samples", mixinStandardHelpOptions = true, versionProvider = RenderCommand.Version.class,
    description = {"Rebuilds the demo sample set from its seeds: ROOT/calibration (bench calibration files and",
        "chessboard target pictures) and ROOT/sample-images (scene files, pictures, no-flow references,",
        "truth files and run files). The same build gives the same files."})
public final class SamplesCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--root", defaultValue = ".", paramLabel = "DIR",
      description = "Folder that holds calibration/ and sample-images/ (default: ${DEFAULT-VALUE}).")
  Path root;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    SampleSet.build(root, line -> {
      out.println(line);
      out.flush();
    });
    return 0;
  }
}
