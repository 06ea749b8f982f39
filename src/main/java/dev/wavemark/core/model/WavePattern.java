package dev.wavemark.core.model;

import dev.wavemark.core.gas.Gas;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.numeric.Checks;
import java.util.List;

/**
 * The waves theory says a model makes at a given freestream Mach number, placed in the image:
 * the renderer's truth, the detector's hint and the inference's template.
 *
 * <p>Plane flows use the oblique-shock relations (NACA Report 1135 eq. 138-151) and the
 * Prandtl-Meyer function (eq. 171); bodies use shock-expansion theory (the flow along each face
 * is uniform, a compression corner makes an oblique shock, an expansion corner a centred fan).
 * All positions are image pixels in the ideal (lens-corrected) image plane; all angles are radians
 * in the contract's sense (counter-clockwise on screen from +x).
 */
public final class WavePattern {
  private WavePattern() {}

  /**
   * The expected waves for {@code shape} at freestream Mach {@code mach}.
   *
   * @param flowDirectionRad freestream direction in the image, contract sense
   * @param widthPx picture width; waves end at the picture's edge unless another wave or a wall ends them first
   * @param heightPx picture height
   * @return the waves whose visible part is not empty, in a stable order (leading features first)
   * @throws dev.wavemark.core.WavemarkException {@code shock-detached} when a surface turns the flow
   *     by more than the attached-shock limit, {@code subsonic} for M &le; 1
   */
  public static List<ExpectedWave> of(
      BodyShape shape, double mach, double gamma, double flowDirectionRad, int widthPx, int heightPx) {
    return solve(shape, mach, gamma, flowDirectionRad, widthPx, heightPx).expectedWaves();
  }

  /**
   * The same pattern with the flow states on both sides of every wave and the solid outline of the
   * model: what a renderer paints. {@link #of} is {@code solve(...).expectedWaves()}.
   */
  public static Solved solve(
      BodyShape shape, double mach, double gamma, double flowDirectionRad, int widthPx, int heightPx) {
    Gas.check(gamma);
    Checks.supersonic(mach, "a supersonic wave pattern");
    Checks.finite("flow direction (rad)", flowDirectionRad);
    if (widthPx < 2 || heightPx < 2) {
      throw new dev.wavemark.core.WavemarkException(
          dev.wavemark.core.Problem.OUT_OF_RANGE, "picture size (px)", widthPx + "x" + heightPx, "at least 2x2");
    }
    PatternBuilder b = new PatternBuilder(mach, gamma, flowDirectionRad, widthPx, heightPx);
    // Java 17 has no pattern switch; the sealed interface keeps this chain complete by review.
    if (shape instanceof BodyShape.Wedge w) {
      PlanarBodies.wedge(b, w);
    } else if (shape instanceof BodyShape.Diamond d) {
      PlanarBodies.diamond(b, d);
    } else if (shape instanceof BodyShape.FlatPlate p) {
      PlanarBodies.flatPlate(b, p);
    } else if (shape instanceof BodyShape.Cone c) {
      ConePattern.cone(b, c);
    } else if (shape instanceof BodyShape.Ramp r) {
      WallFlows.ramp(b, r);
    } else if (shape instanceof BodyShape.ExpansionCorner e) {
      WallFlows.expansionCorner(b, e);
    } else if (shape instanceof BodyShape.DoubleRamp d) {
      WallFlows.doubleRamp(b, d);
    } else if (shape instanceof BodyShape.ShockGenerator g) {
      WallFlows.shockGenerator(b, g);
    } else if (shape instanceof BodyShape.TwinGenerators t) {
      WallFlows.twinGenerators(b, t);
    } else if (shape instanceof BodyShape.Freestream f) {
      WallFlows.freestream(b, f);
    } else if (shape instanceof BodyShape.Blunt n) {
      BluntPattern.blunt(b, n);
    } else {
      throw new IllegalStateException("unhandled shape " + shape.contractName());
    }
    return b.build();
  }

  /**
   * A uniform flow state, relative to the freestream.
   *
   * @param mach local Mach number
   * @param directionRad local flow direction in the image, contract sense
   * @param density density over freestream density
   * @param pressure static pressure over freestream static pressure
   */
  public record State(double mach, double directionRad, double density, double pressure) {}

  /** One wave of the pattern with the flow on both sides. */
  public sealed interface Element {
    /** The expected waves this element contributes (one, or two for a fan). */
    List<ExpectedWave> waves();
  }

  /**
   * A shock (or a Mach stem): a jump from {@code before} to {@code after} across the straight
   * segment of {@code wave}.
   */
  public record Shock(ExpectedWave wave, State before, State after) implements Element {
    @Override
    public List<ExpectedWave> waves() {
      return List.of(wave);
    }
  }

  /**
   * A centred Prandtl-Meyer expansion fan with its apex at {@code head.startPx()}, between the
   * head and tail Mach lines; {@code sideSign} is +1 when the fan lies on the upper side of the
   * surface that makes it. Inside, density varies isentropically with the ray angle.
   */
  public record Fan(ExpectedWave head, ExpectedWave tail, State before, State after, int sideSign) implements Element {
    @Override
    public List<ExpectedWave> waves() {
      return List.of(head, tail);
    }
  }

  /**
   * A slip line (contact surface): equal pressure, different density and speed on its two
   * sides. {@code left} is the state on the left of the wave's direction as seen on screen
   * (counter-clockwise side), {@code right} the other.
   */
  public record Slip(ExpectedWave wave, State left, State right) implements Element {
    @Override
    public List<ExpectedWave> waves() {
      return List.of(wave);
    }
  }

  /**
   * A right circular cone's conical shock seen from the side: the axisymmetric field itself is
   * {@code field}; {@code upper} and {@code lower} are the shock's two silhouette lines.
   *
   * @param apexPx the cone's tip
   * @param axisDirectionRad the cone axis, pointing downstream
   * @param halfAngleRad the cone half-angle
   * @param lengthPx the cone's length along the axis
   * @param field the density between shock and surface as a function of the ray angle from the axis
   */
  public record ConicalShock(
      ExpectedWave upper, ExpectedWave lower, Point2 apexPx, double axisDirectionRad, double halfAngleRad,
      double lengthPx, State before, ConeField field) implements Element {
    @Override
    public List<ExpectedWave> waves() {
      return List.of(upper, lower);
    }
  }

  /**
   * A detached bow shock ahead of a blunt nose, its shape from Billig's correlation
   * ({@link dev.wavemark.core.gas.BowShock}); {@code wave} is its tangent at the vertex (on the
   * stagnation line), the shock's point nearest upstream. See {@link BowShockShape}.
   */
  public record DetachedShock(ExpectedWave wave, State before, BowShockShape shape) implements Element {
    @Override
    public List<ExpectedWave> waves() {
      return List.of(wave);
    }
  }

  /** Density behind a conical shock as a function of the ray angle from the axis. */
  public interface ConeField {
    /** The shock's half-angle from the axis, radians. */
    double shockAngleRad();

    /** Density over freestream density at ray angle {@code thetaRad} between the surface and the shock. */
    double density(double thetaRad);
  }

  /**
   * A solved pattern.
   *
   * @param freestream the undisturbed flow
   * @param elements every wave with its states, in a stable order
   * @param solids closed polygons (image px) of the model and walls, drawn as dark silhouettes
   * @param reflection the expected reflection verdict: {@code regular}, {@code mach} or {@code none}
   * @param notes where the geometry is approximate, in plain words
   */
  public record Solved(State freestream, List<Element> elements, List<List<Point2>> solids, String reflection, List<String> notes) {
    public Solved {
      elements = List.copyOf(elements);
      solids = List.copyOf(solids);
      notes = List.copyOf(notes);
    }

    /** The expected waves of all elements, in order. */
    public List<ExpectedWave> expectedWaves() {
      return elements.stream().flatMap(e -> e.waves().stream()).toList();
    }
  }
}
