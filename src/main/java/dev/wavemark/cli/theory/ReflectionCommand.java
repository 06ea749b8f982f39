package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.ReflectionVerdict;
import dev.wavemark.core.gas.ShockReflection;
import dev.wavemark.core.gas.SlipLine;
import dev.wavemark.core.gas.TriplePoint;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory reflection}: an oblique shock meeting a wall. */
@Command(name = "reflection", mixinStandardHelpOptions = true,
    description = {"Shock reflection from a plane wall (regular reflection, von Neumann and detachment",
        "criteria, three-shock theory). The generator turns the flow towards the wall by THETA.",
        "  --mach M --theta DEG   verdict, the regular reflection where it exists and the triple",
        "                         point where a Mach reflection is possible",
        "  --mach M               the two transition criteria",
        "  --mach-range R         CSV of the criteria (empty cells where von Neumann has no solution)"})
final class ReflectionCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = {"-t", "--theta"}, paramLabel = "DEG", description = "Generator deflection, degrees.")
  @Nullable Double thetaDeg;

  @Override
  Result compute() {
    if (machs.range != null) {
      if (machs.mach != null || thetaDeg != null) {
        throw usage("--mach-range takes no --mach or --theta");
      }
      List<Values> rows = new ArrayList<>();
      for (double m : machs.range.values()) {
        rows.add(criteria(m, true));
      }
      return new Result.Table("Transition criteria of shock reflection", rows);
    }
    if (machs.mach == null) {
      throw usage("give --mach M (with --theta DEG for one reflection) or --mach-range FROM:TO:STEP");
    }
    double m = machs.mach;
    if (thetaDeg == null) {
      return new Result.Point("Transition criteria of shock reflection", criteria(m, true));
    }
    double theta = rad(thetaDeg);
    ShockReflection.Judgement j = ShockReflection.judge(m, theta, gamma);
    Values v = new Values().put("mach", "M1", m).putDeg("thetaDeg", "deflection theta (deg)", theta)
        .put("verdict", "verdict", j.verdict().name().toLowerCase(Locale.ROOT).replace('_', '-'))
        .putAll(criteria(m, false));
    if (j.verdict() != ReflectionVerdict.MACH) {
      ShockReflection.Regular r = ShockReflection.regular(m, theta, gamma);
      v.putDeg("incidentAngleDeg", "incident shock angle (deg)", r.incidentAngleRad())
          .put("m2", "M2 between the shocks", r.m2())
          .putDeg("reflectedAngleToFlowDeg", "reflected shock angle to its upstream flow (deg)", r.reflectedAngleToFlowRad())
          .putDeg("reflectedAngleToWallDeg", "reflected shock angle to the wall (deg)", r.reflectedAngleToWallRad())
          .put("m3", "M3 behind the reflected shock", r.m3())
          .put("pressureRatio", "p3/p1", r.pressureRatio());
    }
    if (j.verdict() != ReflectionVerdict.REGULAR) {
      v.putAll(triplePoint(ShockReflection.machReflection(m, theta, gamma)));
    }
    return new Result.Point("Shock reflection", v);
  }

  private Values criteria(double m, boolean withMach) {
    ShockReflection.Criterion d = ShockReflection.detachment(m, gamma);
    Values v = withMach ? new Values().put("mach", "M1", m) : new Values();
    v.putDeg("detachmentIncidentDeg", "detachment: incident shock angle (deg)", d.incidentAngleRad())
        .putDeg("detachmentThetaDeg", "detachment: generator deflection (deg)", d.deflectionRad());
    java.util.Optional<ShockReflection.Criterion> vn = ShockReflection.vonNeumannIfAny(m, gamma);
    if (vn.isPresent()) {
      ShockReflection.Criterion n = vn.get();
      v.putDeg("vonNeumannIncidentDeg", "von Neumann: incident shock angle (deg)", n.incidentAngleRad())
          .putDeg("vonNeumannThetaDeg", "von Neumann: generator deflection (deg)", n.deflectionRad());
    } else {
      v.put("vonNeumannIncidentDeg", "von Neumann: incident shock angle (deg)", "")
          .put("vonNeumannThetaDeg", "von Neumann: generator deflection (deg)", "");
    }
    return v;
  }

  private static Values triplePoint(TriplePoint t) {
    SlipLine s = t.slipLine();
    return new Values()
        .putDeg("tripleReflectedAngleToFlowDeg", "triple point: reflected shock angle to its flow (deg)", t.reflectedAngleToFlowRad())
        .putDeg("tripleReflectedDirectionDeg", "triple point: reflected shock direction (deg)", t.reflectedDirectionRad())
        .putDeg("tripleStemAngleDeg", "triple point: Mach stem angle to the freestream (deg)", t.stemAngleToFlowRad())
        .putDeg("tripleStemDirectionDeg", "triple point: Mach stem direction to the wall (deg)", t.stemDirectionRad())
        .putDeg("slipLineDirectionDeg", "slip line direction (deg, negative towards the wall)", s.directionRad())
        .put("triplePressureRatio", "triple point: pressure p/p1 across the slip line", s.pressureRatio())
        .put("machAboveSlipLine", "M behind the reflected shock", s.above().mach())
        .put("machBelowSlipLine", "M behind the Mach stem", s.below().mach());
  }
}
