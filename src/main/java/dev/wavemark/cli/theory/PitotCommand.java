package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.NormalShock;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory pitot}: the tunnel-calibration inversions of the pitot relations. */
@Command(name = "pitot", mixinStandardHelpOptions = true,
    description = {"Pitot probe: Mach number from pitot/static p02/p1 (Rayleigh pitot formula, NACA Report 1135 eq. 100)",
        "or from pitot/total p02/p01 (normal-shock total-pressure ratio, eq. 99); or both ratios at --mach."})
final class PitotCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = "--pitot-over-static", paramLabel = "p02/p1", description = "Pitot over freestream static pressure (>= 1).")
  @Nullable Double overStatic;

  @Option(names = "--pitot-over-total", paramLabel = "p02/p01", description = "Pitot over settling-chamber total pressure, in (0, 1].")
  @Nullable Double overTotal;

  @Override
  Result compute() {
    int forms = (machs.given() ? 1 : 0) + (overStatic != null ? 1 : 0) + (overTotal != null ? 1 : 0);
    if (forms > 1) {
      throw usage("give one of --mach/--mach-range, --pitot-over-static or --pitot-over-total");
    }
    if (overStatic != null) {
      return new Result.Point("Mach number from pitot/static", at(NormalShock.machFromPitotOverStatic(overStatic, gamma)));
    }
    if (overTotal != null) {
      return new Result.Point("Mach number from pitot/total", at(NormalShock.machFromTotalPressureRatio(overTotal, gamma)));
    }
    return pointOrTable("Pitot relations", machs.mach, machs.range, this::at);
  }

  private Values at(double m) {
    return new Values()
        .put("mach", "M", m)
        .put("pitotOverStatic", "p02/p1", NormalShock.pitotOverStatic(m, gamma))
        .put("pitotOverTotal", "p02/p01", m > 1 ? NormalShock.totalPressureRatio(m, gamma) : 1.0);
  }
}
