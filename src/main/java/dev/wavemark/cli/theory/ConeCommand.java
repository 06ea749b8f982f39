package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.ConicalField;
import dev.wavemark.core.gas.ConicalFlow;
import java.util.ArrayList;
import java.util.List;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory cone}: Taylor-Maccoll flow past a cone at zero incidence. */
@Command(name = "cone", mixinStandardHelpOptions = true,
    description = {"Conical flow (Taylor-Maccoll; Sims, NASA SP-3004):",
        "  --mach M --cone DEG          shock angle, cone-surface Mach, p_c/p_inf, Cp",
        "  --shock DEG --cone DEG       the Mach number from a measured conical shock angle",
        "  --mach M                     the largest cone with an attached shock",
        "  --mach M --cone DEG --rays N CSV: the field on N+1 rays from the cone to the shock",
        "  --mach-range R --cone DEG    CSV: the cone solution over a Mach range (detached ones left out)"})
final class ConeCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = {"-c", "--cone"}, paramLabel = "DEG", description = "Cone half-angle, degrees.")
  @Nullable Double coneDeg;

  @Option(names = {"-s", "--shock"}, paramLabel = "DEG", description = "Conical shock angle to the axis, degrees.")
  @Nullable Double shockDeg;

  @Option(names = "--rays", paramLabel = "N", description = "With --mach and --cone: write the field on N+1 rays as CSV.")
  @Nullable Integer rays;

  @Override
  Result compute() {
    ConicalFlow flow = ConicalFlow.of(gamma);
    if (machs.range != null) {
      if (coneDeg == null || shockDeg != null || rays != null) {
        throw usage("--mach-range needs --cone (and no --shock or --rays)");
      }
      List<Values> rows = new ArrayList<>();
      for (double m : machs.range.values()) {
        if (rad(coneDeg) <= flow.maxConeAngle(m).coneRad()) {
          rows.add(solution(flow, flow.solve(m, rad(coneDeg))));
        }
      }
      return new Result.Table("Cone over a Mach range", rows);
    }
    if (rays != null) {
      if (machs.mach == null || coneDeg == null) {
        throw usage("--rays needs --mach and --cone");
      }
      if (rays < 1 || rays > 100_000) {
        throw usage("--rays must be in [1, 100000], got " + rays);
      }
      return field(flow.solve(machs.mach, rad(coneDeg)), rays);
    }
    if (shockDeg != null) {
      if (coneDeg == null || machs.mach != null) {
        throw usage("--shock needs --cone (and no --mach)");
      }
      double m = flow.machFromShockAngle(rad(shockDeg), rad(coneDeg));
      return new Result.Point("Mach number from the conical shock angle", solution(flow, flow.fromShockAngle(m, rad(shockDeg))));
    }
    if (machs.mach != null && coneDeg != null) {
      return new Result.Point("Cone at zero incidence", solution(flow, flow.solve(machs.mach, rad(coneDeg))));
    }
    if (machs.mach != null) {
      ConicalFlow.Detachment d = flow.maxConeAngle(machs.mach);
      return new Result.Point("Largest cone with an attached shock", new Values().put("mach", "M1", machs.mach)
          .putDeg("maxConeDeg", "largest cone half-angle (deg)", d.coneRad())
          .putDeg("shockAtMaxConeDeg", "shock angle there (deg)", d.shockRad()));
    }
    throw usage("give --mach with --cone, --shock with --cone, --mach alone, or --mach-range with --cone");
  }

  private static Values solution(ConicalFlow flow, ConicalField f) {
    ConicalField.State s = f.surface();
    return new Values().put("mach", "M1", f.mach())
        .putDeg("coneDeg", "cone half-angle (deg)", f.coneRad())
        .putDeg("shockDeg", "conical shock angle (deg)", f.shockRad())
        .put("surfaceMach", "cone-surface Mach number", s.mach())
        .put("surfacePressureRatio", "p_c/p_inf", s.pressureRatio())
        .put("surfaceDensityRatio", "rho_c/rho_inf", s.densityRatio())
        .put("surfaceTemperatureRatio", "T_c/T_inf", s.temperatureRatio())
        .put("surfacePressureCoefficient", "Cp on the cone", f.surfacePressureCoefficient())
        .put("totalPressureRatio", "p02/p01 across the shock", f.totalPressureRatio())
        .putDeg("deflectionBehindShockDeg", "flow deflection just behind the shock (deg)", f.deflectionBehindShockRad())
        .putDeg("maxConeDeg", "largest cone with an attached shock (deg)", flow.maxConeAngle(f.mach()).coneRad());
  }

  private static Result field(ConicalField f, int n) {
    List<Values> rows = new ArrayList<>();
    for (int i = 0; i <= n; i++) {
      double ray = i == n ? Math.nextDown(f.shockRad()) : f.coneRad() + (f.shockRad() - f.coneRad()) * i / n;
      ConicalField.State s = f.state(ray);
      rows.add(new Values().putDeg("rayDeg", "ray (deg)", ray).put("mach", "M", s.mach())
          .put("pressureRatio", "p/p_inf", s.pressureRatio()).put("densityRatio", "rho/rho_inf", s.densityRatio())
          .put("temperatureRatio", "T/T_inf", s.temperatureRatio())
          .putDeg("flowAngleDeg", "flow angle (deg)", s.flowAngleRad()));
    }
    return new Result.Table("Conical field from the cone to the shock", rows);
  }
}
