package dev.wavemark.inference;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.Isentropic;
import dev.wavemark.core.gas.NormalShock;
import dev.wavemark.core.model.Tunnel;
import dev.wavemark.core.numeric.Measured;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Builds the {@link TunnelCheck}: nominal Mach and the pitot relations of NACA Report 1135. */
final class TunnelChecks {
  private TunnelChecks() {}

  static TunnelCheck of(Tunnel tunnel, double gamma, Measured inferred) {
    List<TunnelCheck.Comparison> out = new ArrayList<>();
    List<String> notes = new ArrayList<>();
    Optional<Double> tol = tunnel.machTolerance();
    tunnel.nominalMach().ifPresent(m -> out.add(compare(TunnelCheck.Reference.NOMINAL, m, inferred, tol)));
    tunnel.pitot().ifPresent(p -> {
      Optional<Double> p01 = p.totalPressurePa();
      Optional<Double> p02 = p.pitotPressurePa();
      Optional<Double> p1 = p.staticPressurePa();
      if (p02.isPresent() && p1.isPresent()) {
        reference(TunnelCheck.Reference.PITOT_STATIC, "pitot/static pressure ratio p02/p1", inferred, tol, out, notes,
            () -> NormalShock.machFromPitotOverStatic(p02.get() / p1.get(), gamma));
      }
      if (p02.isPresent() && p01.isPresent()) {
        reference(TunnelCheck.Reference.PITOT_TOTAL, "pitot/total pressure ratio p02/p01", inferred, tol, out, notes,
            () -> NormalShock.machFromTotalPressureRatio(p02.get() / p01.get(), gamma));
      }
      if (p1.isPresent() && p01.isPresent()) {
        reference(TunnelCheck.Reference.STATIC_TOTAL, "static/total pressure ratio p1/p01", inferred, tol, out, notes,
            () -> Isentropic.machFromPressureRatio(p1.get() / p01.get(), gamma));
      }
    });
    return new TunnelCheck(inferred, out, notes);
  }

  private interface MachSource {
    double mach();
  }

  private static void reference(TunnelCheck.Reference ref, String what, Measured inferred, Optional<Double> tol,
      List<TunnelCheck.Comparison> out, List<String> notes, MachSource source) {
    try {
      out.add(compare(ref, source.mach(), inferred, tol));
    } catch (WavemarkException e) {
      notes.add(what + " gives no Mach number: " + e.getMessage());
    }
  }

  static TunnelCheck.Comparison compare(TunnelCheck.Reference ref, double referenceMach, Measured inferred, Optional<Double> tol) {
    double diff = inferred.value() - referenceMach;
    double u = inferred.uncertainty();
    double z = u > 0 ? diff / u : (diff == 0 ? 0 : Math.copySign(Double.POSITIVE_INFINITY, diff));
    double guard = TunnelCheck.COVERAGE_FACTOR * u;
    TunnelCheck.Outcome outcome = tol.isEmpty() ? TunnelCheck.Outcome.NO_TOLERANCE
        : Math.abs(diff) + guard <= tol.get() ? TunnelCheck.Outcome.PASS
        : Math.abs(diff) - guard > tol.get() ? TunnelCheck.Outcome.FAIL : TunnelCheck.Outcome.INCONCLUSIVE;
    return new TunnelCheck.Comparison(ref, Measured.exact(referenceMach), diff, z, tol, outcome);
  }
}
