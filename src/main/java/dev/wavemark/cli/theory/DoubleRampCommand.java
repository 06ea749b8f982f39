package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.ShockIntersection;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code theory double-ramp}: two shocks of the same family merging. */
@Command(name = "double-ramp", mixinStandardHelpOptions = true,
    description = {"Intersection of two shocks of the same family over a double compression ramp:",
        "the first ramp turns the flow by --first DEG, the second by --second DEG more. Prints the",
        "merged shock, the reflected wave (weak shock or expansion, with its strength) and the slip line."})
final class DoubleRampCommand extends Relation {
  @Option(names = {"-m", "--mach"}, required = true, paramLabel = "M", description = "Freestream Mach number.")
  double mach;

  @Option(names = "--first", required = true, paramLabel = "DEG", description = "First ramp deflection, degrees.")
  double firstDeg;

  @Option(names = "--second", required = true, paramLabel = "DEG", description = "Further deflection of the second ramp, degrees.")
  double secondDeg;

  @Override
  Result compute() {
    ShockIntersection.SameFamily f = ShockIntersection.sameFamily(mach, rad(firstDeg), rad(secondDeg), gamma);
    Values v = new Values().put("mach", "M1", mach)
        .putDeg("firstThetaDeg", "first deflection (deg)", f.first().compressionRad())
        .putDeg("secondThetaDeg", "second deflection (deg)", f.second().compressionRad())
        .putDeg("firstShockAngleDeg", "first shock angle to the freestream (deg)", f.first().headAngleRad())
        .putDeg("secondShockAngleDeg", "second shock angle to its upstream flow (deg)", f.second().headAngleRad())
        .putDeg("secondShockDirectionDeg", "second shock direction from the freestream (deg)", f.secondDirectionRad())
        .putAll(ShockCrossingCommand.wave("merged", "merged shock", f.merged(), f.mergedDirectionRad()))
        .putAll(ShockCrossingCommand.wave("reflected", "reflected", f.reflected(), f.reflectedDirectionRad()));
    return new Result.Point("Merging of same-family shocks", v.putAll(ShockCrossingCommand.slip(f.slipLine())));
  }
}
