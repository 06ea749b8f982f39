package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;

/**
 * A uniform supersonic stream turned through a signed angle by one simple wave: an oblique shock
 * (weak branch) for a compression, a centred Prandtl-Meyer fan for an expansion. This is the
 * building block of shock-expansion theory and of the wave-interaction solutions.
 *
 * <p>Sources: the shock side is NACA Report 1135, eq. 138 and the normal-shock relations of
 * the normal component ({@link ObliqueShock}); the fan side is NACA 1135 eq. 171
 * ({@link PrandtlMeyer}) with the isentropic ratios, eqs. 43-45; total temperature is constant
 * across both (adiabatic flow). Angles in radians.
 *
 * @param kind shock, fan or no wave
 * @param machUpstream Mach number ahead of the wave, &gt; 1
 * @param compressionRad the signed turn: positive compresses (shock), negative expands (fan)
 * @param machDownstream Mach number behind the wave (may be below 1 behind a strong weak-branch shock)
 * @param pressureRatio static pressure behind over ahead
 * @param temperatureRatio static temperature behind over ahead
 * @param densityRatio density behind over ahead
 * @param totalPressureRatio total pressure behind over ahead (1 across a fan)
 * @param headAngleRad angle of the wave (a shock) or of the fan's head Mach line to the upstream flow
 * @param tailAngleRad angle of the shock to the upstream flow, or of the fan's tail Mach line to the
 *     downstream flow
 */
public record Turn(
    TurnKind kind, double machUpstream, double compressionRad, double machDownstream,
    double pressureRatio, double temperatureRatio, double densityRatio, double totalPressureRatio,
    double headAngleRad, double tailAngleRad) {

  private static final int NEWTON_STEPS = 4;

  public Turn {
    Checks.finite("upstream Mach number", machUpstream);
    Checks.finite("turning angle (rad)", compressionRad);
    Checks.finite("downstream Mach number", machDownstream);
    Checks.positive("pressure ratio", pressureRatio);
    Checks.positive("temperature ratio", temperatureRatio);
    Checks.positive("density ratio", densityRatio);
    Checks.positive("total pressure ratio", totalPressureRatio);
    Checks.finite("head angle (rad)", headAngleRad);
    Checks.finite("tail angle (rad)", tailAngleRad);
  }

  /**
   * Turns a stream of Mach {@code m} through {@code compressionRad} (positive: towards the wall
   * that makes the wave, a compression; negative: away from it, an expansion).
   *
   * @throws WavemarkException subsonic unless m &gt; 1; shock-detached when the compression
   *     exceeds thetaMax(m); no-solution when the expansion exceeds the largest Prandtl-Meyer turn
   *     left (the stream would reach vacuum)
   */
  public static Turn of(double m, double compressionRad, double gamma) {
    Gas.check(gamma);
    Checks.supersonic(m, "a turning wave");
    Checks.finite("turning angle (rad)", compressionRad);
    if (compressionRad == 0) {
      double mu = MachAngle.of(m);
      return new Turn(TurnKind.NONE, m, 0, m, 1, 1, 1, 1, mu, mu);
    }
    if (compressionRad > 0) {
      ObliqueShock.Solution s = ObliqueShock.fromWaveAngle(m, weakBeta(m, compressionRad, gamma), gamma);
      return new Turn(
          TurnKind.SHOCK, m, compressionRad, s.m2(), s.pressureRatio(), s.temperatureRatio(),
          s.densityRatio(), s.totalPressureRatio(), s.betaRad(), s.betaRad());
    }
    double room = maxExpansion(m, gamma);
    if (-compressionRad >= room) {
      throw new WavemarkException(
          Problem.NO_SOLUTION,
          "an expansion of " + WavemarkException.deg(-compressionRad) + "° from M = " + WavemarkException.num(m)
              + " exceeds the largest Prandtl-Meyer turn left, " + WavemarkException.deg(room) + "° (vacuum)");
    }
    double m2 = PrandtlMeyer.inverse(PrandtlMeyer.nu(m, gamma) - compressionRad, gamma);
    double t = Isentropic.temperatureRatio(m2, gamma) / Isentropic.temperatureRatio(m, gamma);
    double p = Isentropic.pressureRatio(m2, gamma) / Isentropic.pressureRatio(m, gamma);
    double rho = Isentropic.densityRatio(m2, gamma) / Isentropic.densityRatio(m, gamma);
    return new Turn(TurnKind.EXPANSION_FAN, m, compressionRad, m2, p, t, rho, 1, MachAngle.of(m), MachAngle.of(m2));
  }

  /**
   * The weak-branch shock angle, polished by Newton steps on theta(M, beta) (NACA 1135 eq. 138).
   * The explicit cubic solution loses digits for small deflections (its arccos argument nears
   * -1; about 1e-8/theta relative in tan beta), and the wave-interaction solvers ask for
   * deflections down to 1e-6 rad, so the closed form is only the starting value here.
   */
  static double weakBeta(double m, double thetaRad, double gamma) {
    double mu = MachAngle.of(m);
    double top = ObliqueShock.betaAtMaxDeflection(m, gamma);
    double b = Math.max(mu, Math.min(top, ObliqueShock.beta(m, thetaRad, ShockBranch.WEAK, gamma)));
    for (int i = 0; i < NEWTON_STEPS; i++) {
      double h = 1e-7 * Math.max(1e-3, top - mu);
      double lo = Math.max(mu, b - h);
      double hi = Math.min(top, b + h);
      double slope = (ObliqueShock.theta(m, hi, gamma) - ObliqueShock.theta(m, lo, gamma)) / (hi - lo);
      double f = ObliqueShock.theta(m, b, gamma) - thetaRad;
      if (f == 0 || !(slope > 0)) {
        break;
      }
      double next = Math.max(mu, Math.min(top, b - f / slope));
      if (Math.abs(next - b) < 1e-16) {
        b = next;
        break;
      }
      b = next;
    }
    return b;
  }

  /** The largest expansion a stream of Mach m can still make, nuMax - nu(m), in radians. */
  public static double maxExpansion(double m, double gamma) {
    return PrandtlMeyer.nuMax(gamma) - PrandtlMeyer.nu(m, gamma);
  }

  /** Entropy rise across the wave over the gas constant, (s2 - s1)/R = -ln(p02/p01); 0 for a fan. */
  public double entropyRise() {
    return -Math.log(totalPressureRatio);
  }

  /** The unsigned turning angle in radians. */
  public double strengthRad() {
    return Math.abs(compressionRad);
  }
}
