package dev.wavemark.inference;

import dev.wavemark.core.model.BodyShape;
import java.util.List;

/**
 * The model's angles that carry the run's angle tolerance, and a way to perturb each one; plus
 * the deflection of each surface for the detachment verdict.
 */
final class ModelAngles {
  private ModelAngles() {}

  /** Names of the shape's toleranced angles, in the order {@link #perturbed} indexes them. */
  static List<String> names(BodyShape shape) {
    if (shape instanceof BodyShape.Wedge || shape instanceof BodyShape.Diamond || shape instanceof BodyShape.Cone) {
      return List.of("half-angle");
    } else if (shape instanceof BodyShape.FlatPlate) {
      return List.of("incidence");
    } else if (shape instanceof BodyShape.Ramp || shape instanceof BodyShape.ExpansionCorner
        || shape instanceof BodyShape.ShockGenerator) {
      return List.of("deflection");
    } else if (shape instanceof BodyShape.DoubleRamp) {
      return List.of("first deflection", "second deflection");
    } else if (shape instanceof BodyShape.TwinGenerators) {
      return List.of("upper deflection", "lower deflection");
    }
    return List.of();
  }

  /** The shape with its angle number {@code k} changed by {@code deltaRad}. */
  static BodyShape perturbed(BodyShape shape, int k, double deltaRad) {
    if (shape instanceof BodyShape.Wedge s) {
      return new BodyShape.Wedge(s.halfAngleRad() + deltaRad, s.incidenceRad(), s.leadingEdgePx(), s.chordPx());
    } else if (shape instanceof BodyShape.Diamond s) {
      return new BodyShape.Diamond(s.halfAngleRad() + deltaRad, s.incidenceRad(), s.leadingEdgePx(), s.chordPx());
    } else if (shape instanceof BodyShape.Cone s) {
      return new BodyShape.Cone(s.halfAngleRad() + deltaRad, s.incidenceRad(), s.leadingEdgePx(), s.chordPx());
    } else if (shape instanceof BodyShape.FlatPlate s) {
      return new BodyShape.FlatPlate(s.incidenceRad() + deltaRad, s.leadingEdgePx(), s.chordPx());
    } else if (shape instanceof BodyShape.Ramp s) {
      return new BodyShape.Ramp(s.deflectionRad() + deltaRad, s.cornerPx(), s.wall());
    } else if (shape instanceof BodyShape.ExpansionCorner s) {
      return new BodyShape.ExpansionCorner(s.deflectionRad() + deltaRad, s.cornerPx(), s.wall());
    } else if (shape instanceof BodyShape.ShockGenerator s) {
      return new BodyShape.ShockGenerator(s.deflectionRad() + deltaRad, s.leadingEdgePx(), s.wall());
    } else if (shape instanceof BodyShape.DoubleRamp s) {
      return k == 0
          ? new BodyShape.DoubleRamp(s.deflectionRad() + deltaRad, s.cornerPx(), s.secondDeflectionRad(), s.secondCornerPx(), s.wall())
          : new BodyShape.DoubleRamp(s.deflectionRad(), s.cornerPx(), s.secondDeflectionRad() + deltaRad, s.secondCornerPx(), s.wall());
    } else if (shape instanceof BodyShape.TwinGenerators s) {
      return k == 0
          ? new BodyShape.TwinGenerators(s.upperLeadingEdgePx(), s.lowerLeadingEdgePx(), s.upperDeflectionRad() + deltaRad, s.lowerDeflectionRad())
          : new BodyShape.TwinGenerators(s.upperLeadingEdgePx(), s.lowerLeadingEdgePx(), s.upperDeflectionRad(), s.lowerDeflectionRad() + deltaRad);
    }
    throw new IllegalArgumentException("shape " + shape.contractName() + " has no toleranced angle " + k);
  }

  /**
   * A surface that turns the oncoming flow into itself, for the detachment verdict.
   *
   * @param name e.g. "wedge, steeper surface"
   * @param deflectionRad its flow deflection
   * @param conical true for a cone (the conical detachment limit applies)
   * @param behindFirstShockOf for a second ramp, the deflection of the first (its flow comes
   *     through the first shock); NaN otherwise
   */
  record Surface(String name, double deflectionRad, boolean conical, double behindFirstShockOf) {}

  /**
   * The compressive surfaces of the shape. Incidence adds to one surface and subtracts from the
   * other whatever its sign convention, so the steeper surface has half-angle + |incidence|.
   */
  static List<Surface> compressive(BodyShape shape) {
    if (shape instanceof BodyShape.Wedge s) {
      return List.of(new Surface("wedge, steeper surface", s.halfAngleRad() + Math.abs(s.incidenceRad()), false, Double.NaN));
    } else if (shape instanceof BodyShape.Diamond s) {
      return List.of(new Surface("diamond, steeper leading surface", s.halfAngleRad() + Math.abs(s.incidenceRad()), false, Double.NaN));
    } else if (shape instanceof BodyShape.Cone s) {
      return List.of(new Surface("cone, windward side", s.halfAngleRad() + Math.abs(s.incidenceRad()), true, Double.NaN));
    } else if (shape instanceof BodyShape.FlatPlate s) {
      return s.incidenceRad() == 0 ? List.of()
          : List.of(new Surface("flat plate, windward side", Math.abs(s.incidenceRad()), false, Double.NaN));
    } else if (shape instanceof BodyShape.Ramp s) {
      return List.of(new Surface("ramp", s.deflectionRad(), false, Double.NaN));
    } else if (shape instanceof BodyShape.ShockGenerator s) {
      return List.of(new Surface("shock generator", s.deflectionRad(), false, Double.NaN));
    } else if (shape instanceof BodyShape.DoubleRamp s) {
      return List.of(new Surface("first ramp", s.deflectionRad(), false, Double.NaN),
          new Surface("second ramp", s.secondDeflectionRad(), false, s.deflectionRad()));
    } else if (shape instanceof BodyShape.TwinGenerators s) {
      return List.of(new Surface("upper generator", s.upperDeflectionRad(), false, Double.NaN),
          new Surface("lower generator", s.lowerDeflectionRad(), false, Double.NaN));
    }
    return List.of();
  }
}
