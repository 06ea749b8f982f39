package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.Isentropic;
import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.PrandtlMeyer;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory isentropic}: static-to-total ratios and A/A*, and their inverses. */
@Command(name = "isentropic", mixinStandardHelpOptions = true,
    description = {"Isentropic flow: p/p0, T/T0, rho/rho0 and A/A* at a Mach number (NACA Report 1135 eqs. 43-45, 80),",
        "or the Mach number from A/A* (both branches) or from p/p0."})
final class IsentropicCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = "--area-ratio", paramLabel = "A/A*", description = "Mach number from the area ratio A/A* (>= 1).")
  @Nullable Double areaRatio;

  @Option(names = "--subsonic", description = "With --area-ratio: the subsonic branch (default supersonic).")
  boolean subsonic;

  @Option(names = "--pressure-ratio", paramLabel = "p/p0", description = "Mach number from p/p0 in (0, 1].")
  @Nullable Double pressureRatio;

  @Override
  Result compute() {
    int forms = (machs.given() ? 1 : 0) + (areaRatio != null ? 1 : 0) + (pressureRatio != null ? 1 : 0);
    if (forms > 1) {
      throw usage("give one of --mach/--mach-range, --area-ratio or --pressure-ratio");
    }
    if (areaRatio != null) {
      double m = Isentropic.machFromAreaRatio(areaRatio, gamma, !subsonic);
      return new Result.Point("Isentropic flow from A/A* (" + (subsonic ? "subsonic" : "supersonic") + " branch)", at(m));
    }
    if (pressureRatio != null) {
      return new Result.Point("Isentropic flow from p/p0", at(Isentropic.machFromPressureRatio(pressureRatio, gamma)));
    }
    return pointOrTable("Isentropic flow", machs.mach, machs.range, this::at);
  }

  private Values at(double m) {
    Values v = new Values()
        .put("mach", "M", m)
        .put("pOverP0", "p/p0", Isentropic.pressureRatio(m, gamma))
        .put("tOverT0", "T/T0", Isentropic.temperatureRatio(m, gamma))
        .put("rhoOverRho0", "rho/rho0", Isentropic.densityRatio(m, gamma))
        .put("areaRatio", "A/A*", m > 0 ? Isentropic.areaRatio(m, gamma) : Double.POSITIVE_INFINITY);
    if (m > 1) {
      v.putDeg("machAngleDeg", "Mach angle (deg)", MachAngle.of(m))
          .putDeg("prandtlMeyerDeg", "Prandtl-Meyer angle (deg)", PrandtlMeyer.nu(m, gamma));
    }
    return v;
  }
}
