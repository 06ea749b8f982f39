package dev.wavemark.cli.render;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code wavemark render SCENE.json --out IMAGE}: a synthetic picture, its truth file and a run file. */
@Command(name = "render", mixinStandardHelpOptions = true, versionProvider = RenderCommand.Version.class,
    description = {
        "Renders a synthetic schlieren or shadowgraph picture of a scene file, with the optics of a real bench.",
        "Writes IMAGE (16-bit PNG or TIFF; a sequence is a multi-page TIFF), and beside it NAME.tare.png|tif",
        "(the no-flow reference), NAME.truth.json (every wave's true angle, ends, the bench and the noise)",
        "and NAME.run.json (a run file that 'analyze' reads directly)."})
public final class RenderCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(index = "0", paramLabel = "SCENE.json", description = "The scene file.")
  Path scene;

  @Option(names = {"-o", "--out"}, required = true, paramLabel = "IMAGE",
      description = "Picture to write: NAME.png, NAME.tif or NAME.tiff.")
  Path out;

  @Override
  public Integer call() {
    if (!Files.isRegularFile(scene)) {
      throw new WavemarkException(Problem.FILE_MISSING, scene, Path.of("").toAbsolutePath());
    }
    String n = out.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
    if (!(n.endsWith(".png") || n.endsWith(".tif") || n.endsWith(".tiff"))) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--out must end in .png, .tif or .tiff: " + out);
    }
    SceneJob.Written w = SceneJob.run(scene, out);
    PrintWriter o = spec.commandLine().getOut();
    o.printf("wrote %s (%d frame%s, %d waves)%n", w.image(), w.frames(), w.frames() == 1 ? "" : "s", w.waves());
    if (w.reference() != null) {
      o.printf("wrote %s%n", w.reference());
    }
    o.printf("wrote %s%nwrote %s%n", w.truth(), w.run());
    o.flush();
    return 0;
  }

  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      return new String[] {"wavemark " + dev.wavemark.cli.Main.version()};
    }
  }
}
