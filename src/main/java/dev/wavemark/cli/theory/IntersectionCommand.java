package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.ShockIntersection;
import dev.wavemark.core.gas.SlipLine;
import dev.wavemark.core.gas.Turn;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory intersection}: two shocks of opposite or of the same family. */
@Command(name = "intersection", mixinStandardHelpOptions = true,
    description = {"Shock intersections:",
        "  --mach M --upper DEG --lower DEG          opposite families (two generators facing each other)",
        "  --mach M --first DEG --second DEG         same family (a double ramp: the merged shock)"})
final class IntersectionCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = "--upper", paramLabel = "DEG", description = "Upper generator deflection, degrees.")
  @Nullable Double upperDeg;

  @Option(names = "--lower", paramLabel = "DEG", description = "Lower generator deflection, degrees.")
  @Nullable Double lowerDeg;

  @Option(names = "--first", paramLabel = "DEG", description = "First ramp deflection, degrees.")
  @Nullable Double firstDeg;

  @Option(names = "--second", paramLabel = "DEG", description = "Second ramp's further deflection, degrees.")
  @Nullable Double secondDeg;

  @Override
  Result compute() {
    if (machs.mach == null || machs.range != null) {
      throw usage("give --mach M (no --mach-range)");
    }
    double m = machs.mach;
    if (upperDeg != null && lowerDeg != null && firstDeg == null && secondDeg == null) {
      ShockIntersection.Opposite o = ShockIntersection.opposite(m, rad(upperDeg), rad(lowerDeg), gamma);
      Values v = new Values().put("mach", "M1", m)
          .putDeg("upperIncidentDirectionDeg", "upper incident shock direction (deg)", o.upperIncidentDirectionRad())
          .putDeg("lowerIncidentDirectionDeg", "lower incident shock direction (deg)", o.lowerIncidentDirectionRad())
          .putDeg("upperTransmittedDirectionDeg", "upper transmitted wave direction (deg)", o.upperTransmittedDirectionRad())
          .putDeg("lowerTransmittedDirectionDeg", "lower transmitted wave direction (deg)", o.lowerTransmittedDirectionRad())
          .put("upperTransmittedKind", "upper transmitted wave", kind(o.upperTransmitted()))
          .put("lowerTransmittedKind", "lower transmitted wave", kind(o.lowerTransmitted()));
      return new Result.Point("Intersection of shocks of opposite families", v.putAll(slip(o.slipLine())));
    }
    if (firstDeg != null && secondDeg != null && upperDeg == null && lowerDeg == null) {
      ShockIntersection.SameFamily s = ShockIntersection.sameFamily(m, rad(firstDeg), rad(secondDeg), gamma);
      Values v = new Values().put("mach", "M1", m)
          .putDeg("firstShockDirectionDeg", "first shock direction (deg)", s.firstDirectionRad())
          .putDeg("secondShockDirectionDeg", "second shock direction (deg)", s.secondDirectionRad())
          .putDeg("mergedShockDirectionDeg", "merged shock direction (deg)", s.mergedDirectionRad())
          .putDeg("reflectedDirectionDeg", "reflected wave direction (deg)", s.reflectedDirectionRad())
          .put("reflectedKind", "reflected wave", kind(s.reflected()))
          .put("reflectedPressureRatio", "reflected wave strength p_behind/p_ahead", s.reflected().pressureRatio());
      return new Result.Point("Intersection of shocks of the same family", v.putAll(slip(s.slipLine())));
    }
    throw usage("give --upper and --lower (opposite families) or --first and --second (same family)");
  }

  private static String kind(Turn t) {
    return t.kind().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
  }

  private static Values slip(SlipLine s) {
    return new Values().putDeg("slipLineDirectionDeg", "slip-line direction (deg)", s.directionRad())
        .put("slipLinePressureRatio", "p/p1 on the slip line", s.pressureRatio())
        .put("machAbove", "M above the slip line", s.above().mach())
        .put("machBelow", "M below the slip line", s.below().mach())
        .put("entropyRiseAbove", "(s-s1)/R above", s.above().entropyRise())
        .put("entropyRiseBelow", "(s-s1)/R below", s.below().entropyRise())
        .put("densityRatioAbove", "rho/rho1 above", s.above().densityRatio())
        .put("densityRatioBelow", "rho/rho1 below", s.below().densityRatio())
        .put("temperatureRatioAbove", "T/T1 above", s.above().temperatureRatio())
        .put("temperatureRatioBelow", "T/T1 below", s.below().temperatureRatio())
        .put("velocityRatioAbove", "V/V1 above", s.above().velocityRatio())
        .put("velocityRatioBelow", "V/V1 below", s.below().velocityRatio());
  }
}
