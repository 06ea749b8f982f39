package dev.wavemark.core.gas;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.numeric.Checks;
import java.util.ArrayList;
import java.util.List;

/**
 * Shock-expansion theory for a two-dimensional {@link Profile} of straight segments: each corner
 * turns the local stream by an oblique shock (compression) or a centred Prandtl-Meyer fan
 * (expansion), each panel carries a uniform state, and at a sharp trailing edge the upper and
 * lower streams each pass one more wave so that they leave at one pressure and one direction.
 * Waves reflected from wave interactions off the body are neglected, as the theory does.
 *
 * <p>Angles: radians. "Body axes" are the profile's own (x along the chord, y up); the
 * freestream comes at angle of attack alpha, i.e. along (cos alpha, sin alpha) in body axes, and
 * "freestream axes" measure directions from the freestream (body direction minus alpha). Every
 * direction is counter-clockwise positive. Moments are about the leading edge, nose-up positive.
 *
 * <p>Sources: Liepmann and Roshko, "Elements of Gasdynamics", sec. 4.14 and Anderson,
 * "Fundamentals of Aerodynamics", sec. 9.7 (shock-expansion theory) (from memory); the waves are
 * {@link Turn}s, the trailing-edge matching is that of {@link ShockIntersection}.
 */
public final class ShockExpansion {
  private ShockExpansion() {}

  /** Which surface of the profile. */
  public enum Surface {
    UPPER,
    LOWER
  }

  /**
   * One panel with its uniform state.
   *
   * @param index 0 for the panel from the leading edge
   * @param inclinationRad the panel's direction in body axes
   * @param mach the panel's Mach number
   * @param pressureRatio p/p_inf
   * @param totalPressureRatio p0/p0_inf (its logarithm, negated, is the entropy rise over R)
   * @param cp pressure coefficient by shock-expansion theory
   * @param cpLinear pressure coefficient by Ackeret's theory
   */
  public record Panel(
      Surface surface, int index, Profile.Vertex start, Profile.Vertex end, double inclinationRad,
      double mach, double pressureRatio, double totalPressureRatio, double cp, double cpLinear) {
    public Panel {
      Checks.finite("panel inclination (rad)", inclinationRad);
      Checks.positive("panel Mach number", mach);
      Checks.positive("panel pressure ratio", pressureRatio);
      Checks.positive("panel total pressure ratio", totalPressureRatio);
      Checks.finite("panel Cp", cp);
      Checks.finite("panel linear Cp", cpLinear);
    }
  }

  /**
   * The wave at one corner (or at the trailing edge).
   *
   * @param vertexIndex the corner's index on its surface (0 = leading edge)
   * @param turn the wave itself; its head and tail angles are to the local upstream and
   *     downstream flows
   * @param upstreamDirectionRad local flow direction ahead of the wave, body axes
   * @param downstreamDirectionRad local flow direction behind it, body axes
   * @param alphaRad the angle of attack, to convert to freestream axes
   */
  public record VertexWave(
      Surface surface, int vertexIndex, Profile.Vertex at, Turn turn,
      double upstreamDirectionRad, double downstreamDirectionRad, double alphaRad) {
    public VertexWave {
      Checks.finite("upstream direction (rad)", upstreamDirectionRad);
      Checks.finite("downstream direction (rad)", downstreamDirectionRad);
      Checks.finite("angle of attack (rad)", alphaRad);
    }

    /** The shock line, or the fan's head Mach line, leaving the corner: body axes. */
    public double headDirectionBodyRad() {
      return surface == Surface.UPPER
          ? upstreamDirectionRad + turn.headAngleRad() : upstreamDirectionRad - turn.headAngleRad();
    }

    /** The fan's tail Mach line (for a shock, the shock line itself): body axes. */
    public double tailDirectionBodyRad() {
      if (turn.kind() == TurnKind.SHOCK) {
        return headDirectionBodyRad();
      }
      return surface == Surface.UPPER
          ? downstreamDirectionRad + turn.tailAngleRad() : downstreamDirectionRad - turn.tailAngleRad();
    }

    /** {@link #headDirectionBodyRad} in freestream axes. */
    public double headDirectionFreestreamRad() {
      return headDirectionBodyRad() - alphaRad;
    }

    /** {@link #tailDirectionBodyRad} in freestream axes. */
    public double tailDirectionFreestreamRad() {
      return tailDirectionBodyRad() - alphaRad;
    }
  }

  /** What happens at the rear of the body. */
  public sealed interface TrailingEdge permits Sharp, Blunt {}

  /**
   * A sharp trailing edge: the two waves that bring the streams to one pressure and direction.
   *
   * @param slipLine its direction is in freestream axes; ratios to the freestream
   */
  public record Sharp(VertexWave upperWave, VertexWave lowerWave, SlipLine slipLine) implements TrailingEdge {}

  /** A blunt base of the given height: its (separated) base flow is outside the theory. */
  public record Blunt(double baseHeight) implements TrailingEdge {
    public Blunt {
      Checks.inClosed("base height", baseHeight, 0, Double.MAX_VALUE);
    }
  }

  /**
   * Force and moment coefficients per unit span, on the chord {@link Profile#chord()}; base
   * pressure of a blunt body excluded.
   *
   * @param cl lift, normal to the freestream
   * @param cd wave drag, along the freestream
   * @param cmLeadingEdge pitching moment about the leading edge, nose-up positive
   * @param cn normal force (body y)
   * @param ca axial force (body x)
   */
  public record Coefficients(double cl, double cd, double cmLeadingEdge, double cn, double ca) {
    public Coefficients {
      Checks.finite("cl", cl);
      Checks.finite("cd", cd);
      Checks.finite("cm", cmLeadingEdge);
      Checks.finite("cn", cn);
      Checks.finite("ca", ca);
    }

    /** Pitching moment about the chord-line point at x/c from the leading edge: cm_le + (x/c) cn. */
    public double cmAbout(double xOverChord) {
      return cmLeadingEdge + Checks.finite("x/c", xOverChord) * cn;
    }
  }

  /** The whole solution; {@code linear} is Ackeret's theory on the same panels. */
  public record Solution(
      double mach, double alphaRad, double gamma, List<Panel> upper, List<Panel> lower,
      List<VertexWave> waves, TrailingEdge trailingEdge, Coefficients coefficients, Coefficients linear) {
    public Solution {
      Checks.supersonic(mach, "shock-expansion theory");
      Checks.finite("angle of attack (rad)", alphaRad);
      Gas.check(gamma);
      upper = List.copyOf(upper);
      lower = List.copyOf(lower);
      waves = List.copyOf(waves);
    }
  }

  /**
   * Solves the profile in a freestream of Mach m at angle of attack alpha.
   *
   * @throws WavemarkException shock-detached naming the panel whose corner turns the flow beyond
   *     thetaMax; subsonic naming a panel whose flow is subsonic; no-solution when an expansion
   *     would reach vacuum or the trailing-edge waves cannot match
   */
  public static Solution solve(Profile profile, double m, double alphaRad, double gamma) {
    Gas.check(gamma);
    Checks.supersonic(m, "shock-expansion theory");
    Checks.inOpen("angle of attack (rad)", alphaRad, -0.5 * Math.PI, 0.5 * Math.PI);
    List<VertexWave> waves = new ArrayList<>();
    Marched up = march(Surface.UPPER, profile.upper(), m, alphaRad, gamma, waves);
    Marched low = march(Surface.LOWER, profile.lower(), m, alphaRad, gamma, waves);
    TrailingEdge te = trailingEdge(profile, up, low, m, alphaRad, gamma);
    Coefficients se = PanelForces.integrate(profile, up.cp(), low.cp(), alphaRad);
    Coefficients lin = PanelForces.integrate(profile, up.cpLinear(), low.cpLinear(), alphaRad);
    return new Solution(m, alphaRad, gamma, up.panels(), low.panels(), waves, te, se, lin);
  }

  /** One surface marched from the leading edge. */
  private record Marched(List<Panel> panels, double[] cp, double[] cpLinear, double entropyRise) {}

  private static Marched march(
      Surface s, List<Profile.Vertex> pts, double mInf, double alpha, double gamma, List<VertexWave> waves) {
    int n = pts.size() - 1;
    List<Panel> panels = new ArrayList<>(n);
    double[] cp = new double[n];
    double[] cpLin = new double[n];
    double q = 0.5 * gamma * mInf * mInf;
    double dir = alpha;
    double mach = mInf;
    double p = 1;
    double p0 = 1;
    for (int i = 0; i < n; i++) {
      Profile.Vertex a = pts.get(i);
      Profile.Vertex b = pts.get(i + 1);
      double phi = Math.atan2(b.y() - a.y(), b.x() - a.x());
      double compression = s == Surface.UPPER ? phi - dir : dir - phi;
      Turn t = turn(s, i, a, b, mach, compression, gamma);
      waves.add(new VertexWave(s, i, a, t, dir, phi, alpha));
      mach = t.machDownstream();
      p *= t.pressureRatio();
      p0 *= t.totalPressureRatio();
      dir = phi;
      if (!(mach > 1)) {
        throw new WavemarkException(
            Problem.SUBSONIC, WavemarkException.num(mach), "shock-expansion theory on the " + name(s, i, a, b));
      }
      cp[i] = (p - 1) / q;
      cpLin[i] = Ackeret.pressureCoefficient(s == Surface.UPPER ? phi - alpha : alpha - phi, mInf);
      panels.add(new Panel(s, i, a, b, phi, mach, p, p0, cp[i], cpLin[i]));
    }
    return new Marched(panels, cp, cpLin, -Math.log(p0));
  }

  private static Turn turn(Surface s, int i, Profile.Vertex a, Profile.Vertex b, double mach, double compression, double gamma) {
    try {
      return Turn.of(mach, compression, gamma);
    } catch (WavemarkException e) {
      if (e.problem() == Problem.SHOCK_DETACHED) {
        throw new WavemarkException(
            e, Problem.SHOCK_DETACHED, "onto the " + name(s, i, a, b) + ", " + WavemarkException.deg(compression),
            WavemarkException.deg(ObliqueShock.maxDeflection(mach, gamma)), WavemarkException.num(mach));
      }
      if (e.problem() == Problem.NO_SOLUTION) {
        throw new WavemarkException(e, Problem.NO_SOLUTION, "the " + name(s, i, a, b) + ": " + e.getMessage());
      }
      throw e;
    }
  }

  private static String name(Surface s, int i, Profile.Vertex a, Profile.Vertex b) {
    return (s == Surface.UPPER ? "upper" : "lower") + " panel " + (i + 1) + " (x " + WavemarkException.num(a.x())
        + " to " + WavemarkException.num(b.x()) + ")";
  }

  private static TrailingEdge trailingEdge(Profile profile, Marched up, Marched low, double m, double alpha, double gamma) {
    Panel pu = up.panels().get(up.panels().size() - 1);
    Panel pl = low.panels().get(low.panels().size() - 1);
    if (!profile.sharpTrailingEdge()) {
      return new Blunt(pu.end().y() - pl.end().y());
    }
    Confluence.Meeting meet = Confluence.meet(
        "trailing edge",
        new Confluence.Stream(pu.mach(), pu.pressureRatio(), up.entropyRise(), pu.inclinationRad() - alpha),
        new Confluence.Stream(pl.mach(), pl.pressureRatio(), low.entropyRise(), pl.inclinationRad() - alpha),
        m, gamma);
    double slipBody = meet.slipLine().directionRad() + alpha;
    VertexWave uw = new VertexWave(Surface.UPPER, up.panels().size(), pu.end(), meet.upperWave(), pu.inclinationRad(), slipBody, alpha);
    VertexWave lw = new VertexWave(Surface.LOWER, low.panels().size(), pl.end(), meet.lowerWave(), pl.inclinationRad(), slipBody, alpha);
    return new Sharp(uw, lw, meet.slipLine());
  }
}
