package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Roots;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * An oblique shock meeting a plane wall in steady flow: the regular reflection, the two
 * transition criteria and the verdict between them, and the three-shock (triple-point) solution
 * of a Mach reflection.
 *
 * <p>Geometry used throughout: the wall is the x axis with the gas above it; the freestream
 * (Mach M1) runs along +x; a generator above turns it towards the wall by theta, making the
 * incident shock; the reflected shock turns the flow back to the wall direction. Directions are
 * radians counter-clockwise from +x (negative = towards the wall). Mirror them for a wall above.
 *
 * <p>Sources: the regular reflection, Anderson, "Modern Compressible Flow", 3rd ed., sec. 4.9
 * (from memory); the detachment and von Neumann criteria and the three-shock theory, Ben-Dor,
 * "Shock Wave Reflection Phenomena", 2nd ed. (2007), ch. 1-2, and Hornung, Oertel and Sandeman,
 * J. Fluid Mech. 90 (1979) 541 (from memory). The von Neumann criterion used here is the
 * condition that the regular reflection's pressure equals that behind a normal shock in M1,
 * where the three-shock solution with a straight (normal) Mach stem first exists.
 */
public final class ShockReflection {
  /**
   * Lower end of the deflection brackets (rad): small enough to lie below any criterion for
   * M1 &gt;= 1.05, large enough that the explicit weak-shock formula keeps its digits.
   */
  private static final double SMALL = 1e-6;

  private ShockReflection() {}

  /**
   * A regular reflection.
   *
   * @param m1 freestream Mach number
   * @param thetaRad the generator's deflection, also the reflected shock's turn back
   * @param incident the incident shock in M1
   * @param reflected the reflected shock in M2
   * @param reflectedAngleToWallRad the reflected shock's angle to the wall, beta2 - theta
   */
  public record Regular(double m1, double thetaRad, Turn incident, Turn reflected, double reflectedAngleToWallRad) {
    public Regular {
      Checks.supersonic(m1, "a regular reflection");
      Checks.finite("deflection (rad)", thetaRad);
      Checks.finite("reflected shock angle to the wall (rad)", reflectedAngleToWallRad);
    }

    /** The incident shock's angle to the freestream (and to the wall), beta1. */
    public double incidentAngleRad() {
      return incident.headAngleRad();
    }

    /** The reflected shock's angle to its upstream flow (the deflected stream), beta2. */
    public double reflectedAngleToFlowRad() {
      return reflected.headAngleRad();
    }

    /** Mach number between the shocks. */
    public double m2() {
      return incident.machDownstream();
    }

    /** Mach number behind the reflected shock, along the wall. */
    public double m3() {
      return reflected.machDownstream();
    }

    /** p3/p1. */
    public double pressureRatio() {
      return incident.pressureRatio() * reflected.pressureRatio();
    }
  }

  /**
   * A transition criterion at one (M1, gamma).
   *
   * @param incidentAngleRad the incident shock angle beta1 at the criterion
   * @param deflectionRad the generator deflection theta at the criterion
   */
  public record Criterion(double m1, double gamma, double incidentAngleRad, double deflectionRad) {
    public Criterion {
      Checks.supersonic(m1, "a reflection criterion");
      Gas.check(gamma);
      Checks.finite("incident shock angle (rad)", incidentAngleRad);
      Checks.finite("deflection (rad)", deflectionRad);
    }
  }

  /**
   * The verdict for one (M1, theta), with the criteria it was judged against.
   *
   * @param vonNeumannDeflectionRad empty below {@link #dualSolutionThresholdMach}, where the
   *     von Neumann condition has no solution short of detachment
   */
  public record Judgement(
      ReflectionVerdict verdict, double detachmentDeflectionRad, OptionalDouble vonNeumannDeflectionRad) {
    public Judgement {
      Checks.finite("detachment deflection (rad)", detachmentDeflectionRad);
      if (vonNeumannDeflectionRad.isPresent()) {
        Checks.finite("von Neumann deflection (rad)", vonNeumannDeflectionRad.getAsDouble());
      }
    }
  }

  /**
   * The regular reflection for deflection theta in M1.
   *
   * @throws WavemarkException shock-detached when theta exceeds thetaMax(M1) (no incident shock)
   *     or thetaMax(M2) (no regular reflection: the detachment criterion); subsonic when the flow
   *     behind the incident shock is subsonic
   */
  public static Regular regular(double m1, double thetaRad, double gamma) {
    Checks.inOpen("deflection (rad)", thetaRad, 0, 0.5 * Math.PI);
    Turn incident = Turn.of(m1, thetaRad, gamma);
    Checks.supersonic(incident.machDownstream(), "a regular reflection (flow behind the incident shock)");
    Turn reflected = Turn.of(incident.machDownstream(), thetaRad, gamma);
    return new Regular(m1, thetaRad, incident, reflected, reflected.headAngleRad() - thetaRad);
  }

  /** p3/p1 of the regular reflection, with the reflected turn clamped to thetaMax(M2). */
  private static double regularPressure(double m1, double theta, double gamma) {
    Turn incident = Turn.of(m1, theta, gamma);
    double m2 = incident.machDownstream();
    double turn = Math.min(theta, ObliqueShock.maxDeflection(m2, gamma));
    return incident.pressureRatio() * Turn.of(m2, turn, gamma).pressureRatio();
  }

  /**
   * The detachment criterion: the largest deflection with a regular reflection, where
   * theta = thetaMax(M2(M1, theta)) (Ben-Dor, sec. 1.5, from memory).
   */
  public static Criterion detachment(double m1, double gamma) {
    Gas.check(gamma);
    Checks.supersonic(m1, "a shock reflection");
    double hi = ObliqueShock.sonicDeflection(m1, gamma);
    double theta = Roots.solve(
        "detachment criterion for M = " + WavemarkException.num(m1),
        t -> {
          double m2 = Turn.of(m1, t, gamma).machDownstream();
          return (m2 > 1 ? ObliqueShock.maxDeflection(m2, gamma) : 0) - t;
        },
        SMALL, hi, 1e-14);
    return new Criterion(m1, gamma, ObliqueShock.beta(m1, theta, ShockBranch.WEAK, gamma), theta);
  }

  /**
   * The von Neumann criterion: the deflection at which the regular reflection's pressure equals
   * the normal-shock pressure in M1, p3/p1 = (2 gamma M1^2 - (gamma - 1))/(gamma + 1).
   *
   * @throws WavemarkException no-solution for M1 at or below {@link #dualSolutionThresholdMach},
   *     where the regular reflection detaches first
   */
  public static Criterion vonNeumann(double m1, double gamma) {
    Criterion d = detachment(m1, gamma);
    double target = Math.log(NormalShock.pressureRatio(m1, gamma));
    double theta = Roots.solve(
        "von Neumann criterion for M = " + WavemarkException.num(m1) + " (none below the dual-solution threshold)",
        t -> Math.log(regularPressure(m1, t, gamma)) - target, SMALL, d.deflectionRad(), 1e-14);
    return new Criterion(m1, gamma, ObliqueShock.beta(m1, theta, ShockBranch.WEAK, gamma), theta);
  }

  /**
   * The von Neumann criterion where it exists (above {@link #dualSolutionThresholdMach}), else
   * empty; cheaper than computing the threshold first.
   */
  public static Optional<Criterion> vonNeumannIfAny(double m1, double gamma) {
    try {
      return Optional.of(vonNeumann(m1, gamma));
    } catch (WavemarkException e) {
      if (e.problem() == Problem.NO_SOLUTION) {
        return Optional.empty();
      }
      throw e;
    }
  }

  /**
   * The Mach number at which the von Neumann and detachment criteria coincide; the dual-solution
   * domain exists only above it (about 2.20 for gamma = 1.4, Ben-Dor, sec. 1.5, from memory).
   */
  public static double dualSolutionThresholdMach(double gamma) {
    Gas.check(gamma);
    return Roots.solve(
        "dual-solution threshold Mach number",
        m -> {
          Criterion d = detachment(m, gamma);
          return Math.log(regularPressure(m, d.deflectionRad(), gamma)) - Math.log(NormalShock.pressureRatio(m, gamma));
        },
        1.05, 50, 1e-12);
  }

  /**
   * Which reflection the deflection theta in M1 allows.
   *
   * @throws WavemarkException shock-detached when theta exceeds thetaMax(M1): no incident shock
   */
  public static Judgement judge(double m1, double thetaRad, double gamma) {
    Checks.inOpen("deflection (rad)", thetaRad, 0, 0.5 * Math.PI);
    Turn.of(m1, thetaRad, gamma);
    Criterion d = detachment(m1, gamma);
    Optional<Criterion> n = vonNeumannIfAny(m1, gamma);
    OptionalDouble vn = n.isPresent() ? OptionalDouble.of(n.get().deflectionRad()) : OptionalDouble.empty();
    ReflectionVerdict v;
    if (thetaRad > d.deflectionRad()) {
      v = ReflectionVerdict.MACH;
    } else if (vn.isPresent() && thetaRad >= vn.getAsDouble()) {
      v = ReflectionVerdict.DUAL_SOLUTION;
    } else {
      v = ReflectionVerdict.REGULAR;
    }
    return new Judgement(v, d.deflectionRad(), vn);
  }

  /**
   * The three-shock (triple-point) solution of a Mach reflection for deflection theta in M1; see
   * {@link TriplePoint}. It exists beyond the von Neumann criterion and, as an inverse solution
   * (slip line turned away from the wall), below it.
   *
   * @throws WavemarkException shock-detached, subsonic or no-solution as {@link TriplePoint} says
   */
  public static TriplePoint machReflection(double m1, double thetaRad, double gamma) {
    return TriplePoint.solve(m1, thetaRad, gamma);
  }
}
