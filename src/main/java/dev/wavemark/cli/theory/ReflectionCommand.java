package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.ShockReflection;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory reflection}: an oblique shock meeting a plane wall. */
@Command(name = "reflection", mixinStandardHelpOptions = true,
    description = {"Shock reflection from a plane wall: the verdict (regular, dual-solution, Mach) against the",
        "detachment and von Neumann criteria, and the regular reflection when it exists.",
        "  --mach M --theta DEG   verdict and reflected shock for a generator of deflection theta",
        "  --mach-range R         CSV: the two criteria (generator deflections) over a Mach range"})
final class ReflectionCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = {"-t", "--theta"}, paramLabel = "DEG", description = "Generator deflection, degrees.")
  @Nullable Double thetaDeg;

  @Override
  Result compute() {
    if (machs.range != null) {
      if (thetaDeg != null || machs.mach != null) {
        throw usage("--mach-range takes no --theta or --mach");
      }
      List<Values> rows = new ArrayList<>();
      for (double m : machs.range.values()) {
        rows.add(criteria(m));
      }
      return new Result.Table("Reflection criteria", rows);
    }
    if (machs.mach == null || thetaDeg == null) {
      throw usage("give --mach and --theta, or --mach-range");
    }
    double m = machs.mach;
    ShockReflection.Judgement j = ShockReflection.judge(m, rad(thetaDeg), gamma);
    Values v = new Values().put("mach", "M1", m).putDeg("thetaDeg", "generator deflection (deg)", rad(thetaDeg))
        .put("verdict", "verdict", j.verdict().name().toLowerCase(Locale.ROOT).replace('_', '-'))
        .putDeg("detachmentThetaDeg", "detachment criterion, deflection (deg)", j.detachmentDeflectionRad());
    if (j.vonNeumannDeflectionRad().isPresent()) {
      v.putDeg("vonNeumannThetaDeg", "von Neumann criterion, deflection (deg)", j.vonNeumannDeflectionRad().getAsDouble());
    }
    if (j.verdict() != dev.wavemark.core.gas.ReflectionVerdict.MACH) {
      ShockReflection.Regular r = ShockReflection.regular(m, rad(thetaDeg), gamma);
      v.putDeg("incidentAngleDeg", "incident shock angle beta1 (deg)", r.incidentAngleRad())
          .putDeg("reflectedAngleToFlowDeg", "reflected shock to its upstream flow beta2 (deg)", r.reflectedAngleToFlowRad())
          .putDeg("reflectedAngleToWallDeg", "reflected shock to the wall (deg)", r.reflectedAngleToWallRad())
          .put("m2", "M2 (between the shocks)", r.m2())
          .put("m3", "M3 (behind the reflection)", r.m3())
          .put("pressureRatio", "p3/p1", r.pressureRatio());
    }
    return new Result.Point("Shock reflection from a wall", v);
  }

  private Values criteria(double m) {
    Values v = new Values().put("mach", "M1", m)
        .putDeg("detachmentThetaDeg", "detachment deflection (deg)", ShockReflection.detachment(m, gamma).deflectionRad());
    double vn;
    try {
      vn = ShockReflection.vonNeumann(m, gamma).deflectionRad();
    } catch (dev.wavemark.core.WavemarkException e) {
      vn = Double.NaN;
    }
    return v.put("vonNeumannThetaDeg", "von Neumann deflection (deg)", Math.toDegrees(vn));
  }
}
