package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.MachAngle;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory mach-angle}: mu = asin(1/M) and its inverse. */
@Command(name = "mach-angle", mixinStandardHelpOptions = true,
    description = "Mach angle mu = asin(1/M), or the Mach number of a Mach wave at --angle degrees.")
final class MachAngleCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = "--angle", paramLabel = "DEG", description = "Mach-wave angle to the flow, degrees, in (0, 90).")
  @Nullable Double angleDeg;

  @Override
  Result compute() {
    if (angleDeg != null) {
      if (machs.given()) {
        throw usage("give either --angle or --mach/--mach-range");
      }
      return new Result.Point("Mach number of a Mach wave", at(MachAngle.machFrom(rad(angleDeg))));
    }
    return pointOrTable("Mach angle", machs.mach, machs.range, this::at);
  }

  private Values at(double m) {
    return new Values().put("mach", "M", m).putDeg("machAngleDeg", "Mach angle (deg)", MachAngle.of(m));
  }
}
