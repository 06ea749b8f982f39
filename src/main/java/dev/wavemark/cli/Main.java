package dev.wavemark.cli;

import dev.wavemark.core.WavemarkException;
import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code wavemark} command: a thin shell over the pipeline and the physics core. */
@Command(
    name = "wavemark",
    mixinStandardHelpOptions = true,
    versionProvider = Main.Version.class,
    description = "Wave angles and Mach number from schlieren and shadowgraph pictures of supersonic flow.",
    subcommands = {CommandLine.HelpCommand.class})
public final class Main implements Runnable {

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /**
   * The subcommands, in help order. Each capability adds its command here.
   */
  static Object[] subcommands() {
    return new Object[] {new dev.wavemark.cli.theory.TheoryCommand(), new dev.wavemark.cli.render.RenderCommand(),
        new dev.wavemark.cli.render.SamplesCommand(), new CalibrateCommand(), new AnalyzeCommand(), new DemoCommand()};
  }

  /** Builds the configured command line; tests call this with their own writers. */
  public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
    CommandLine cl = new CommandLine(new Main());
    for (Object sub : subcommands()) {
      cl.addSubcommand(sub);
    }
    cl.setOut(out);
    cl.setErr(err);
    cl.setExecutionExceptionHandler(Main::oneLine);
    cl.setParameterExceptionHandler(Main::badArguments);
    return cl;
  }

  public static void main(String[] args) {
    PrintWriter out = new PrintWriter(System.out, true);
    PrintWriter err = new PrintWriter(System.err, true);
    int rc;
    try {
      rc = commandLine(out, err).execute(args);
    } catch (OutOfMemoryError e) {
      // not an Exception, so picocli lets it through; what was written before it stays written
      err.println(String.format(java.util.Locale.ROOT, "wavemark: out of memory (Java heap limit %d MB); run it with more, e.g."
          + " java -Xmx8g -jar wavemark.jar ..., or give it fewer or smaller frames [out-of-memory]",
          Runtime.getRuntime().maxMemory() >> 20));
      rc = 1;
    }
    out.flush();
    err.flush();
    System.exit(rc);
  }

  /**
   * Bad arguments: one line naming the value, a pointer to the command's help, exit 2 (the
   * picocli convention), instead of the whole usage text.
   */
  private static int badArguments(CommandLine.ParameterException e, String[] args) {
    CommandLine cl = e.getCommandLine();
    PrintWriter err = cl.getErr();
    String name = cl.getCommandSpec().qualifiedName();
    err.println(name + ": " + e.getMessage().replace('\n', ' ') + " (see '" + name + " --help')");
    err.flush();
    return cl.getCommandSpec().exitCodeOnInvalidInput();
  }

  /** Domain failures become one line on stderr and exit 1; nothing else prints a stack trace. */
  private static int oneLine(Exception e, CommandLine cl, CommandLine.ParseResult parsed) {
    PrintWriter err = cl.getErr();
    if (e instanceof WavemarkException w) {
      err.println("wavemark: " + w.getMessage() + " [" + w.code() + "]");
    } else if (e instanceof java.io.UncheckedIOException u) {
      err.println("wavemark: " + u.getCause().getMessage());
    } else {
      err.println("wavemark: internal error: " + e + " (please report this with the input that caused it)");
    }
    err.flush();
    return 1;
  }

  /** Reads the version from the jar manifest, falling back to the build's resource. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      return new String[] {"wavemark " + version()};
    }
  }

  /** The tool's version, from the build. */
  public static String version() {
    try (var in = Main.class.getResourceAsStream("/wavemark-version.properties")) {
      if (in != null) {
        java.util.Properties p = new java.util.Properties();
        p.load(in);
        return p.getProperty("version", "unknown");
      }
    } catch (java.io.IOException e) {
      // fall through: the version is informative only
    }
    return "unknown";
  }
}
