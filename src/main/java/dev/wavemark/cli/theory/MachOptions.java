package dev.wavemark.cli.theory;

import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Option;

/** {@code --mach M} for one evaluation or {@code --mach-range FROM:TO:STEP} for a CSV table. */
final class MachOptions {
  @Option(names = {"-m", "--mach"}, paramLabel = "M", description = "Freestream Mach number.")
  @Nullable Double mach;

  @Option(names = "--mach-range", paramLabel = "FROM:TO:STEP", converter = MachRange.Converter.class,
      description = "Evaluate over a Mach range and write CSV rows (e.g. 1.5:5:0.25).")
  @Nullable MachRange range;

  boolean given() {
    return mach != null || range != null;
  }
}
