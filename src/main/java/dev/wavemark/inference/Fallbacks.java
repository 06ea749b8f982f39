package dev.wavemark.inference;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.Side;
import java.util.ArrayList;
import java.util.List;

/**
 * Theory's waves when the full pattern has no solution because a reflection (or a crossing)
 * cannot be regular: the incident shocks alone, which the freestream still makes and which still
 * carry the Mach number. Each generator is stood in for by a compression corner of the same
 * deflection at its leading edge, its wall along the flow on the far side, so that the pattern
 * code places the shock exactly as it places the generator's.
 */
final class Fallbacks {
  private Fallbacks() {}

  static PatternSource incidentShocksWhenNoRegularReflection(PatternSource base) {
    return (shape, m, g, flow, w, h) -> {
      try {
        return base.of(shape, m, g, flow, w, h);
      } catch (WavemarkException e) {
        if (e.problem() != Problem.SHOCK_DETACHED) {
          throw e;
        }
        if (shape instanceof BodyShape.ShockGenerator s) {
          Side towardsWall = s.wall().solidSide();
          return incident(base, s.deflectionRad(), s.leadingEdgePx(), towardsWall.opposite(), "incident shock", m, g, flow, w, h);
        } else if (shape instanceof BodyShape.TwinGenerators t) {
          List<ExpectedWave> out = new ArrayList<>();
          out.addAll(incident(base, t.upperDeflectionRad(), t.upperLeadingEdgePx(), Side.UPPER, "upper generator shock", m, g, flow, w, h));
          out.addAll(incident(base, t.lowerDeflectionRad(), t.lowerLeadingEdgePx(), Side.LOWER, "lower generator shock", m, g, flow, w, h));
          return out;
        }
        throw e;
      }
    };
  }

  /** The shock of a corner at {@code at} with the solid on {@code solidSide}, relabelled as a leading-edge shock. */
  private static List<ExpectedWave> incident(PatternSource base, double theta, Point2 at, Side solidSide, String label,
      double m, double g, double flow, int w, int h) {
    BodyShape.Wall wall = new BodyShape.Wall(at, at.plus(ImageAngles.unit(flow).times(100)), solidSide);
    List<ExpectedWave> out = new ArrayList<>();
    for (ExpectedWave e : base.of(new BodyShape.Ramp(theta, at, wall), m, g, flow, w, h)) {
      out.add(new ExpectedWave(e.kind(), e.side(), e.angleToFlowRad(), e.localFlowDirectionRad(), e.directionRad(),
          e.startPx(), e.endPx(), Feature.LEADING_EDGE, label));
    }
    return out;
  }
}
