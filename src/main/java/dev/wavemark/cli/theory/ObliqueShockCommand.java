package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import java.util.ArrayList;
import java.util.List;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory oblique-shock}: the theta-beta-M relation in all its directions. */
@Command(name = "oblique-shock", mixinStandardHelpOptions = true,
    description = {"Plane oblique shock (NACA Report 1135 eqs. 138-168):",
        "  --mach M --theta DEG     shock angle on both branches and the state behind each",
        "  --mach M --beta DEG      deflection and the state behind a shock of that angle",
        "  --beta DEG --theta DEG   the Mach number (the inversion used on measured angles)",
        "  --mach M                 detachment (thetaMax, beta at it) and sonic limits",
        "  --mach-range R [--theta-step DEG | --theta DEG]",
        "                           CSV: limits, the theta-beta-M curve family, or beta(M) at one theta"})
final class ObliqueShockCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = {"-t", "--theta"}, paramLabel = "DEG", description = "Flow deflection, degrees.")
  @Nullable Double thetaDeg;

  @Option(names = {"-b", "--beta"}, paramLabel = "DEG", description = "Shock angle to the upstream flow, degrees.")
  @Nullable Double betaDeg;

  @Option(names = "--theta-step", paramLabel = "DEG",
      description = "With --mach-range: write the theta-beta-M curve family, one row per deflection step.")
  @Nullable Double thetaStepDeg;

  @Override
  Result compute() {
    if (machs.range != null) {
      if (machs.mach != null || betaDeg != null) {
        throw usage("--mach-range combines only with --theta or --theta-step");
      }
      return table(machs.range);
    }
    if (thetaStepDeg != null) {
      throw usage("--theta-step needs --mach-range");
    }
    if (machs.mach != null && thetaDeg != null && betaDeg != null) {
      throw usage("give two of --mach, --theta and --beta, not three");
    }
    if (machs.mach != null && thetaDeg != null) {
      return new Result.Point("Oblique shock of a given deflection", fromDeflection(machs.mach, rad(thetaDeg)));
    }
    if (machs.mach != null && betaDeg != null) {
      ObliqueShock.Solution s = ObliqueShock.fromWaveAngle(machs.mach, rad(betaDeg), gamma);
      Values v = new Values().put("mach", "M1", machs.mach).putDeg("betaDeg", "shock angle beta (deg)", s.betaRad())
          .put("branch", "branch", ObliqueShock.branchOf(machs.mach, s.betaRad(), gamma).name().toLowerCase(java.util.Locale.ROOT));
      return new Result.Point("Oblique shock of a given angle", v.putAll(state(s, "")));
    }
    if (betaDeg != null && thetaDeg != null) {
      double beta = rad(betaDeg);
      double m = ObliqueShock.machFromAngles(beta, rad(thetaDeg), gamma);
      Values v = new Values().put("mach", "M1", m).putDeg("betaDeg", "shock angle beta (deg)", beta)
          .put("branch", "branch", ObliqueShock.branchOf(m, beta, gamma).name().toLowerCase(java.util.Locale.ROOT));
      return new Result.Point("Mach number from shock angle and deflection",
          v.putAll(state(ObliqueShock.fromWaveAngle(m, beta, gamma), "")));
    }
    if (machs.mach != null) {
      return new Result.Point("Oblique-shock limits", limits(machs.mach));
    }
    throw usage("give --mach with --theta or --beta, --beta with --theta, --mach alone, or --mach-range");
  }

  private Values fromDeflection(double m, double theta) {
    Values v = new Values().put("mach", "M1", m).putDeg("thetaDeg", "deflection theta (deg)", theta);
    ObliqueShock.Solution weak = ObliqueShock.fromDeflection(m, theta, ShockBranch.WEAK, gamma);
    ObliqueShock.Solution strong = ObliqueShock.fromDeflection(m, theta, ShockBranch.STRONG, gamma);
    v.putDeg("betaWeakDeg", "beta, weak branch (deg)", weak.betaRad())
        .putDeg("betaStrongDeg", "beta, strong branch (deg)", strong.betaRad())
        .putDeg("thetaMaxDeg", "detachment deflection thetaMax (deg)", ObliqueShock.maxDeflection(m, gamma));
    return v.putAll(state(weak, "Weak")).putAll(state(strong, "Strong"));
  }

  private Values state(ObliqueShock.Solution s, String suffix) {
    String tag = suffix.isEmpty() ? "" : " (" + suffix.toLowerCase(java.util.Locale.ROOT) + ")";
    Values v = new Values();
    if (suffix.isEmpty()) {
      v.putDeg("thetaDeg", "deflection theta (deg)", s.thetaRad());
    }
    return v.put("normalMach" + suffix, "normal Mach M1 sin(beta)" + tag, s.m1() * Math.sin(s.betaRad()))
        .put("m2" + suffix, "M2" + tag, s.m2())
        .put("pressureRatio" + suffix, "p2/p1" + tag, s.pressureRatio())
        .put("densityRatio" + suffix, "rho2/rho1" + tag, s.densityRatio())
        .put("temperatureRatio" + suffix, "T2/T1" + tag, s.temperatureRatio())
        .put("totalPressureRatio" + suffix, "p02/p01" + tag, s.totalPressureRatio());
  }

  private Values limits(double m) {
    return new Values().put("mach", "M1", m)
        .putDeg("machAngleDeg", "Mach angle (deg)", MachAngle.of(m))
        .putDeg("thetaMaxDeg", "detachment deflection thetaMax (deg)", ObliqueShock.maxDeflection(m, gamma))
        .putDeg("betaAtThetaMaxDeg", "beta at thetaMax (deg)", ObliqueShock.betaAtMaxDeflection(m, gamma))
        .putDeg("sonicThetaDeg", "sonic deflection, M2 = 1 (deg)", ObliqueShock.sonicDeflection(m, gamma))
        .putDeg("sonicBetaDeg", "beta at the sonic deflection (deg)", ObliqueShock.sonicBeta(m, gamma));
  }

  private Result table(MachRange range) {
    if (thetaStepDeg != null && thetaDeg != null) {
      throw usage("give either --theta or --theta-step with --mach-range");
    }
    List<Values> rows = new ArrayList<>();
    if (thetaStepDeg == null && thetaDeg == null) {
      for (double m : range.values()) {
        rows.add(limits(m));
      }
      return new Result.Table("Oblique-shock limits", rows);
    }
    if (thetaDeg != null) {
      double theta = rad(thetaDeg);
      for (double m : range.values()) {
        if (theta <= ObliqueShock.maxDeflection(m, gamma)) {
          rows.add(curveRow(m, theta));
        }
      }
      return new Result.Table("Shock angle against Mach number at one deflection (detached Mach numbers left out)", rows);
    }
    if (!(thetaStepDeg > 0)) {
      throw usage("--theta-step must be positive, got " + thetaStepDeg);
    }
    double step = rad(thetaStepDeg);
    for (double m : range.values()) {
      double max = ObliqueShock.maxDeflection(m, gamma);
      for (int i = 0; i * step < max; i++) {
        rows.add(curveRow(m, i * step));
      }
      rows.add(curveRow(m, max));
    }
    return new Result.Table("theta-beta-M curve family", rows);
  }

  private Values curveRow(double m, double theta) {
    return new Values().put("mach", "M1", m).putDeg("thetaDeg", "theta (deg)", theta)
        .putDeg("betaWeakDeg", "beta weak (deg)", ObliqueShock.beta(m, theta, ShockBranch.WEAK, gamma))
        .putDeg("betaStrongDeg", "beta strong (deg)", ObliqueShock.beta(m, theta, ShockBranch.STRONG, gamma));
  }
}
