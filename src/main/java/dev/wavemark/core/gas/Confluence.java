package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;

/**
 * Two uniform supersonic streams that meet (at a trailing edge, or at a wave intersection) and
 * each pass one simple wave so that they leave side by side at one pressure and one direction,
 * separated by a slip line. The upper stream's wave runs up and downstream and compresses when
 * it turns the flow counter-clockwise; the lower stream's wave runs down and compresses when it
 * turns the flow clockwise.
 *
 * <p>Source: the pressure-deflection (shock-polar) matching of Anderson, "Modern Compressible
 * Flow", 3rd ed., sec. 4.12-4.13, and Liepmann and Roshko, "Elements of Gasdynamics", sec. 4.13
 * (from memory). The matching function is monotone in the common direction, so a bracketed
 * root on the feasible range of directions is unique.
 */
final class Confluence {
  /** Keeps the bracket off the exact detachment and vacuum limits, where the relations end. */
  private static final double EDGE = 1e-9;

  private Confluence() {}

  /** A uniform stream, relative to the reference freestream (Mach m1, pressure p1). */
  record Stream(double mach, double pressureRatio, double entropyRise, double directionRad) {
    Stream {
      Checks.supersonic(mach, "a stream meeting another at a slip line");
      Checks.positive("pressure ratio", pressureRatio);
      Checks.finite("entropy rise", entropyRise);
      Checks.finite("flow direction (rad)", directionRad);
    }
  }

  /** The meeting: the upper stream's wave, the lower stream's wave and the slip line. */
  record Meeting(Turn upperWave, Turn lowerWave, SlipLine slipLine) {}

  /**
   * Solves for the common direction phi with p_u * P(M_u, phi - d_u) = p_l * P(M_l, d_l - phi).
   *
   * @param what names the situation in failure messages
   * @throws WavemarkException no-solution when no common direction exists (a wave would detach
   *     or expand to vacuum)
   */
  static Meeting meet(String what, Stream upper, Stream lower, double m1, double gamma) {
    double du = upper.directionRad();
    double dl = lower.directionRad();
    double lo = Math.max(du - Turn.maxExpansion(upper.mach(), gamma), dl - ObliqueShock.maxDeflection(lower.mach(), gamma)) + EDGE;
    double hi = Math.min(du + ObliqueShock.maxDeflection(upper.mach(), gamma), dl + Turn.maxExpansion(lower.mach(), gamma)) - EDGE;
    if (!(hi > lo)) {
      throw new WavemarkException(
          Problem.NO_SOLUTION, what + ": the two streams have no common flow direction with attached waves");
    }
    double phi = Roots.solve(
        what + " (common flow direction behind the waves, rad)",
        f -> Math.log(upper.pressureRatio() * Turn.of(upper.mach(), f - du, gamma).pressureRatio())
            - Math.log(lower.pressureRatio() * Turn.of(lower.mach(), dl - f, gamma).pressureRatio()),
        lo, hi, 1e-15);
    Turn uw = Turn.of(upper.mach(), phi - du, gamma);
    Turn lw = Turn.of(lower.mach(), dl - phi, gamma);
    double pu = upper.pressureRatio() * uw.pressureRatio();
    double pl = lower.pressureRatio() * lw.pressureRatio();
    SlipLine.Side above = SlipLine.Side.of(uw.machDownstream(), pu, du + uw.compressionRad(), upper.entropyRise() + uw.entropyRise(), m1, gamma);
    SlipLine.Side below = SlipLine.Side.of(lw.machDownstream(), pl, dl - lw.compressionRad(), lower.entropyRise() + lw.entropyRise(), m1, gamma);
    return new Meeting(uw, lw, new SlipLine(phi, 0.5 * (pu + pl), above, below));
  }
}
