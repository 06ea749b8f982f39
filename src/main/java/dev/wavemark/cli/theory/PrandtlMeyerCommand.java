package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.PrandtlMeyer;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory prandtl-meyer}: nu(M) and its inverse. */
@Command(name = "prandtl-meyer", mixinStandardHelpOptions = true,
    description = "Prandtl-Meyer function nu(M) (NACA Report 1135 eq. 171), or M from --nu degrees.")
final class PrandtlMeyerCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = "--nu", paramLabel = "DEG", description = "Prandtl-Meyer angle in degrees; prints the Mach number.")
  @Nullable Double nuDeg;

  @Override
  Result compute() {
    if (nuDeg != null) {
      if (machs.given()) {
        throw usage("give either --nu or --mach/--mach-range");
      }
      return new Result.Point("Mach number from the Prandtl-Meyer angle", at(PrandtlMeyer.inverse(rad(nuDeg), gamma)));
    }
    return pointOrTable("Prandtl-Meyer function", machs.mach, machs.range, this::at);
  }

  private Values at(double m) {
    return new Values()
        .put("mach", "M", m)
        .putDeg("nuDeg", "nu (deg)", PrandtlMeyer.nu(m, gamma))
        .putDeg("machAngleDeg", "Mach angle (deg)", m > 1 ? MachAngle.of(m) : 0.5 * Math.PI)
        .putDeg("nuMaxDeg", "nu at M -> infinity (deg)", PrandtlMeyer.nuMax(gamma));
  }
}
