package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.ShockIntersection;
import dev.wavemark.core.gas.SlipLine;
import dev.wavemark.core.gas.Turn;
import java.util.Locale;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code theory shock-crossing}: two shocks of opposite families. */
@Command(name = "shock-crossing", mixinStandardHelpOptions = true,
    description = {"Intersection of two shocks of opposite families from one uniform stream: the",
        "upper generator turns the flow down by --upper DEG, the lower one up by --lower DEG.",
        "Prints the transmitted waves, the slip line and the jumps across it."})
final class ShockCrossingCommand extends Relation {
  @Option(names = {"-m", "--mach"}, required = true, paramLabel = "M", description = "Freestream Mach number.")
  double mach;

  @Option(names = "--upper", required = true, paramLabel = "DEG", description = "Upper deflection theta2, degrees.")
  double upperDeg;

  @Option(names = "--lower", required = true, paramLabel = "DEG", description = "Lower deflection theta3, degrees.")
  double lowerDeg;

  @Override
  Result compute() {
    ShockIntersection.Opposite o = ShockIntersection.opposite(mach, rad(upperDeg), rad(lowerDeg), gamma);
    Values v = new Values().put("mach", "M1", mach)
        .putDeg("upperThetaDeg", "upper deflection (deg)", o.upperIncident().compressionRad())
        .putDeg("lowerThetaDeg", "lower deflection (deg)", o.lowerIncident().compressionRad())
        .putDeg("upperIncidentAngleDeg", "upper incident shock angle to the freestream (deg)", o.upperIncident().headAngleRad())
        .putDeg("lowerIncidentAngleDeg", "lower incident shock angle to the freestream (deg)", o.lowerIncident().headAngleRad())
        .putAll(wave("upperTransmitted", "upper transmitted", o.upperTransmitted(), o.upperTransmittedDirectionRad()))
        .putAll(wave("lowerTransmitted", "lower transmitted", o.lowerTransmitted(), o.lowerTransmittedDirectionRad()));
    return new Result.Point("Crossing of opposite-family shocks", v.putAll(slip(o.slipLine())));
  }

  /** A wave's kind, turn, angle to its upstream flow and direction (degrees from the freestream). */
  static Values wave(String key, String label, Turn t, double directionRad) {
    return new Values()
        .put(key + "Kind", label + " wave", t.kind().name().toLowerCase(Locale.ROOT).replace('_', '-'))
        .putDeg(key + "TurnDeg", label + " turn (deg, negative = expansion)", t.compressionRad())
        .putDeg(key + "AngleDeg", label + " angle to its upstream flow (deg)", t.headAngleRad())
        .putDeg(key + "DirectionDeg", label + " direction from the freestream (deg)", directionRad)
        .put(key + "PressureRatio", label + " pressure ratio", t.pressureRatio());
  }

  /** The slip line and the jumps across it (above minus below, over the freestream values). */
  static Values slip(SlipLine s) {
    return new Values()
        .putDeg("slipLineDirectionDeg", "slip line direction (deg)", s.directionRad())
        .put("slipLinePressureRatio", "common pressure p/p1", s.pressureRatio())
        .put("machAbove", "M above the slip line", s.above().mach())
        .put("machBelow", "M below the slip line", s.below().mach())
        .put("entropyJump", "(s_above - s_below)/R", s.entropyJump())
        .put("temperatureJump", "(T_above - T_below)/T1", s.temperatureJump())
        .put("densityJump", "(rho_above - rho_below)/rho1", s.densityJump())
        .put("velocityJump", "(V_above - V_below)/V1", s.velocityJump());
  }
}
