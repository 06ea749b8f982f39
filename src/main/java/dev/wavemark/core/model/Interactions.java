package dev.wavemark.core.model;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.PatternBuilder.Turned;
import dev.wavemark.core.model.WavePattern.Element;
import dev.wavemark.core.model.WavePattern.Shock;
import org.jspecify.annotations.Nullable;

/** Where waves meet walls and each other: reflection, same-family merging, crossing. */
final class Interactions {
  private Interactions() {}

  /**
   * The incident shock meets the wall at {@code hit} and reflects regularly: the reflected
   * shock turns the flow behind the incident shock back parallel to the wall.
   */
  static void reflection(PatternBuilder b, Shock incident, Point2 hit, int wallSign, @Nullable Element shoulderFan) {
    double theta = Math.abs(incident.after().directionRad() - incident.before().directionRad());
    Shock inc = new Shock(PatternBuilder.withEnd(incident.wave(), hit), incident.before(), incident.after());
    Turned refl;
    try {
      refl = b.turn(inc.after(), hit, wallSign, theta, Feature.IMPINGEMENT, "reflected");
    } catch (WavemarkException e) {
      if (e.problem() != Problem.SHOCK_DETACHED) {
        throw e;
      }
      throw new WavemarkException(e, Problem.SHOCK_DETACHED, WavemarkException.deg(theta),
          WavemarkException.deg(dev.wavemark.core.gas.ObliqueShock.maxDeflection(inc.after().mach(), b.gamma)),
          WavemarkException.num(inc.after().mach()) + " behind the incident shock (no regular reflection)");
    }
    Shock reflected = (Shock) refl.element();
    ExpectedWave rw = reflected.wave();
    rw = new ExpectedWave(WaveKind.REFLECTED_SHOCK, rw.side(), rw.angleToFlowRad(), rw.localFlowDirectionRad(),
        rw.directionRad(), rw.startPx(), rw.endPx(), rw.feature(), "reflected shock");
    b.add(inc);
    if (shoulderFan != null) {
      Element fan = PatternBuilder.endAt(shoulderFan, rw);
      rw = PatternBuilder.endAt(rw, PatternBuilder.lead(shoulderFan));
      b.add(fan);
    }
    b.add(new Shock(rw, reflected.before(), reflected.after()));
    b.reflection = "regular";
  }

  /** Two shocks of the same family (double ramp) converge; each is ended where they meet. */
  static void sameFamily(PatternBuilder b, Shock first, Shock second, int sign) {
    ExpectedWave a = first.wave();
    ExpectedWave c = second.wave();
    b.add(new Shock(PatternBuilder.endAt(a, c), first.before(), first.after()));
    b.add(new Shock(PatternBuilder.endAt(c, a), second.before(), second.after()));
  }

  /** Two shocks of opposite families (twin generators) cross; each is ended where they meet. */
  static void opposite(PatternBuilder b, Shock upper, Shock lower) {
    ExpectedWave a = upper.wave();
    ExpectedWave c = lower.wave();
    b.add(new Shock(PatternBuilder.endAt(a, c), upper.before(), upper.after()));
    b.add(new Shock(PatternBuilder.endAt(c, a), lower.before(), lower.after()));
  }
}
