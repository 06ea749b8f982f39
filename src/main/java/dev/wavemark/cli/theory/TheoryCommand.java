package dev.wavemark.cli.theory;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * {@code wavemark theory}: the gas-dynamic relations on the command line. Each relation is one
 * subclass of {@link Relation}; to add one, write the class and add it to {@code subcommands}.
 */
@Command(name = "theory", mixinStandardHelpOptions = true, scope = CommandLine.ScopeType.INHERIT,
    versionProvider = TheoryCommand.Version.class,
    description = {"Gas-dynamic relations of a perfect gas. Angles in degrees.",
        "Text by default; --json prints one JSON object; --mach-range writes CSV rows."},
    subcommands = {
        IsentropicCommand.class,
        NormalShockCommand.class,
        PitotCommand.class,
        MachAngleCommand.class,
        PrandtlMeyerCommand.class,
        ObliqueShockCommand.class,
        ConeCommand.class,
        StandoffCommand.class,
        ShockExpansionCommand.class,
        ReflectionCommand.class,
        ShockCrossingCommand.class,
        DoubleRampCommand.class,
    })
public final class TheoryCommand implements Runnable {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** The same version line as the top-level command. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      return new String[] {"wavemark " + dev.wavemark.cli.Main.version()};
    }
  }
}
