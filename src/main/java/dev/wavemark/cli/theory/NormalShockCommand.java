package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.NormalShock;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code theory normal-shock}: the state behind a normal shock. */
@Command(name = "normal-shock", mixinStandardHelpOptions = true,
    description = "Normal shock: M2, p2/p1, rho2/rho1, T2/T1, p02/p01 and pitot p02/p1 (NACA Report 1135 eqs. 93-100).")
final class NormalShockCommand extends Relation {
  @Mixin MachOptions machs;

  @Override
  Result compute() {
    return pointOrTable("Normal shock", machs.mach, machs.range, this::at);
  }

  private Values at(double m) {
    return new Values()
        .put("mach", "M1", m)
        .put("m2", "M2", NormalShock.m2(m, gamma))
        .put("pressureRatio", "p2/p1", NormalShock.pressureRatio(m, gamma))
        .put("densityRatio", "rho2/rho1", NormalShock.densityRatio(m, gamma))
        .put("temperatureRatio", "T2/T1", NormalShock.temperatureRatio(m, gamma))
        .put("totalPressureRatio", "p02/p01", NormalShock.totalPressureRatio(m, gamma))
        .put("pitotOverStatic", "p02/p1 (Rayleigh pitot)", NormalShock.pitotOverStatic(m, gamma))
        .put("entropyRiseOverR", "(s2-s1)/R", NormalShock.entropyRise(m, gamma));
  }
}
