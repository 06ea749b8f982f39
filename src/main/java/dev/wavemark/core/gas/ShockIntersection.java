package dev.wavemark.core.gas;

import dev.wavemark.core.numeric.Checks;

/**
 * Two oblique shocks that meet in a uniform stream: shocks of opposite families (two generators
 * facing each other) and of the same family (a double compression ramp).
 *
 * <p>Directions are radians counter-clockwise from the freestream (+x). Opposite families: the
 * upper generator turns the flow down by theta2, the lower one up by theta3; the shocks cross and
 * go on as two transmitted (refracted) waves. Same family: a ramp below the gas turns the flow up
 * by theta1 and then by theta2 more; the two shocks merge into one, and a reflected wave runs
 * back down towards the ramp.
 *
 * <p>Sources: Anderson, "Modern Compressible Flow", 3rd ed., sec. 4.12 (opposite families) and
 * 4.13 (same family) and Liepmann and Roshko, "Elements of Gasdynamics", sec. 4.13 (from
 * memory); the matching is done by {@link Confluence} (equal pressure, common direction).
 */
public final class ShockIntersection {
  private ShockIntersection() {}

  /**
   * The crossing of two shocks of opposite families.
   *
   * @param upperIncident the upper generator's shock (turns the flow down by theta2)
   * @param lowerIncident the lower generator's shock (turns the flow up by theta3)
   * @param upperTransmitted the wave that continues the lower shock through the upper stream
   *     (runs up and downstream; a shock unless the pressures call for an expansion)
   * @param lowerTransmitted the wave that continues the upper shock through the lower stream
   * @param slipLine between the two final streams: above it the upper stream, below it the lower
   */
  public record Opposite(
      double m1, Turn upperIncident, Turn lowerIncident, Turn upperTransmitted, Turn lowerTransmitted,
      SlipLine slipLine) {
    public Opposite {
      Checks.supersonic(m1, "a shock crossing");
    }

    /** Upper incident shock line, pointing downstream: -beta2. */
    public double upperIncidentDirectionRad() {
      return -upperIncident.headAngleRad();
    }

    /** Lower incident shock line, pointing downstream: +beta3. */
    public double lowerIncidentDirectionRad() {
      return lowerIncident.headAngleRad();
    }

    /** Upper transmitted wave (its head, for a fan) from the intersection: -theta2 + beta4. */
    public double upperTransmittedDirectionRad() {
      return -upperIncident.compressionRad() + upperTransmitted.headAngleRad();
    }

    /** Lower transmitted wave (its head, for a fan) from the intersection: theta3 - beta4'. */
    public double lowerTransmittedDirectionRad() {
      return lowerIncident.compressionRad() - lowerTransmitted.headAngleRad();
    }
  }

  /**
   * The merging of two shocks of the same family over a double ramp.
   *
   * @param first the first ramp's shock (turns the freestream by theta1)
   * @param second the second ramp's shock (turns the flow by theta2 more)
   * @param merged the single shock above the intersection, from the freestream to the slip line's
   *     direction
   * @param reflected the wave from the intersection back towards the ramp: a weak shock
   *     (compressionRad &gt; 0) or an expansion fan (&lt; 0); its pressureRatio is its strength
   * @param slipLine above it the stream behind the merged shock; below it the stream behind the
   *     two ramp shocks and the reflected wave
   */
  public record SameFamily(double m1, Turn first, Turn second, Turn merged, Turn reflected, SlipLine slipLine) {
    public SameFamily {
      Checks.supersonic(m1, "a shock merging");
    }

    /** The first shock's line from the first corner: beta1. */
    public double firstDirectionRad() {
      return first.headAngleRad();
    }

    /** The second shock's line from the second corner: theta1 + beta2. */
    public double secondDirectionRad() {
      return first.compressionRad() + second.headAngleRad();
    }

    /** The merged shock's line from the intersection: beta_merged. */
    public double mergedDirectionRad() {
      return merged.headAngleRad();
    }

    /** The reflected wave's line (its head, for a fan), pointing down and downstream. */
    public double reflectedDirectionRad() {
      return first.compressionRad() + second.compressionRad() - reflected.headAngleRad();
    }
  }

  /**
   * Solves the intersection of two shocks of opposite families.
   *
   * @param theta2Rad the upper generator's deflection, in (0, thetaMax(M1)]
   * @param theta3Rad the lower generator's deflection, in (0, thetaMax(M1)]
   * @throws dev.wavemark.core.WavemarkException shock-detached when either deflection exceeds
   *     thetaMax(M1); no-solution when no regular intersection exists (a transmitted shock would
   *     detach: a Mach-type intersection)
   */
  public static Opposite opposite(double m1, double theta2Rad, double theta3Rad, double gamma) {
    Checks.inOpen("upper deflection (rad)", theta2Rad, 0, 0.5 * Math.PI);
    Checks.inOpen("lower deflection (rad)", theta3Rad, 0, 0.5 * Math.PI);
    Turn up = Turn.of(m1, theta2Rad, gamma);
    Turn low = Turn.of(m1, theta3Rad, gamma);
    Confluence.Meeting meet = Confluence.meet(
        "intersection of opposite-family shocks",
        new Confluence.Stream(up.machDownstream(), up.pressureRatio(), up.entropyRise(), -theta2Rad),
        new Confluence.Stream(low.machDownstream(), low.pressureRatio(), low.entropyRise(), theta3Rad),
        m1, gamma);
    return new Opposite(m1, up, low, meet.upperWave(), meet.lowerWave(), meet.slipLine());
  }

  /**
   * Solves the merging of two shocks of the same family over a double ramp.
   *
   * @param theta1Rad the first ramp's deflection
   * @param theta2Rad the second ramp's further deflection
   * @throws dev.wavemark.core.WavemarkException shock-detached when a ramp shock detaches;
   *     subsonic when the flow behind the first shock is subsonic; no-solution when the merged
   *     shock would detach
   */
  public static SameFamily sameFamily(double m1, double theta1Rad, double theta2Rad, double gamma) {
    Checks.inOpen("first deflection (rad)", theta1Rad, 0, 0.5 * Math.PI);
    Checks.inOpen("second deflection (rad)", theta2Rad, 0, 0.5 * Math.PI);
    Turn first = Turn.of(m1, theta1Rad, gamma);
    Checks.supersonic(first.machDownstream(), "the second ramp shock (flow behind the first shock)");
    Turn second = Turn.of(first.machDownstream(), theta2Rad, gamma);
    Confluence.Meeting meet = Confluence.meet(
        "merging of same-family shocks",
        new Confluence.Stream(m1, 1, 0, 0),
        new Confluence.Stream(
            second.machDownstream(), first.pressureRatio() * second.pressureRatio(),
            first.entropyRise() + second.entropyRise(), theta1Rad + theta2Rad),
        m1, gamma);
    return new SameFamily(m1, first, second, meet.upperWave(), meet.lowerWave(), meet.slipLine());
  }
}
