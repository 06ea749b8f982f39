package dev.wavemark.core.model;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.numeric.Checks;
import java.util.List;

/**
 * The model in the test section, one case per {@code model.shape} of the files contract.
 * Angles in radians, positions and lengths in image pixels (as photographed, before lens
 * correction). Each record checks its own fields; the files layer names missing ones.
 */
public sealed interface BodyShape {

  /** The contract's name of the shape, e.g. {@code double-ramp}. */
  String contractName();

  /** Every contract shape name, in documentation order. */
  List<String> NAMES = List.of(
      "wedge", "diamond", "flat-plate", "cone", "ramp", "expansion-corner", "double-ramp",
      "shock-generator", "twin-generators", "none", "cylinder", "sphere");

  /**
   * A symmetric wedge: half-angle {@code halfAngleRad}, shoulders at {@code chordPx} from the
   * leading edge where the surfaces turn back parallel to the wedge axis.
   */
  record Wedge(double halfAngleRad, double incidenceRad, Point2 leadingEdgePx, double chordPx) implements BodyShape {
    public Wedge {
      Checks.inOpen("wedge half-angle (rad)", halfAngleRad, 0, 0.5 * Math.PI);
      Checks.finite("incidence (rad)", incidenceRad);
      Checks.positive("chordPx", chordPx);
    }

    @Override
    public String contractName() {
      return "wedge";
    }
  }

  /** A symmetric double wedge (diamond airfoil) of half-angle {@code halfAngleRad} at the leading edge. */
  record Diamond(double halfAngleRad, double incidenceRad, Point2 leadingEdgePx, double chordPx) implements BodyShape {
    public Diamond {
      Checks.inOpen("diamond half-angle (rad)", halfAngleRad, 0, 0.25 * Math.PI);
      Checks.finite("incidence (rad)", incidenceRad);
      Checks.positive("chordPx", chordPx);
    }

    @Override
    public String contractName() {
      return "diamond";
    }
  }

  /** A thin flat plate at incidence. */
  record FlatPlate(double incidenceRad, Point2 leadingEdgePx, double chordPx) implements BodyShape {
    public FlatPlate {
      Checks.finite("incidence (rad)", incidenceRad);
      Checks.positive("chordPx", chordPx);
    }

    @Override
    public String contractName() {
      return "flat-plate";
    }
  }

  /** A circular cone seen from the side, half-angle {@code halfAngleRad}, length {@code chordPx}. */
  record Cone(double halfAngleRad, double incidenceRad, Point2 leadingEdgePx, double chordPx) implements BodyShape {
    public Cone {
      Checks.inOpen("cone half-angle (rad)", halfAngleRad, 0, 0.5 * Math.PI);
      Checks.finite("incidence (rad)", incidenceRad);
      Checks.positive("chordPx", chordPx);
    }

    @Override
    public String contractName() {
      return "cone";
    }
  }

  /** A compression corner in a wall: the wall turns into the flow by {@code deflectionRad} at {@code cornerPx}. */
  record Ramp(double deflectionRad, Point2 cornerPx, Wall wall) implements BodyShape {
    public Ramp {
      Checks.inOpen("ramp deflection (rad)", deflectionRad, 0, 0.5 * Math.PI);
    }

    @Override
    public String contractName() {
      return "ramp";
    }
  }

  /** An expansion corner: the wall turns away from the flow by {@code deflectionRad} at {@code cornerPx}. */
  record ExpansionCorner(double deflectionRad, Point2 cornerPx, Wall wall) implements BodyShape {
    public ExpansionCorner {
      Checks.inOpen("corner turn (rad)", deflectionRad, 0, 0.5 * Math.PI);
    }

    @Override
    public String contractName() {
      return "expansion-corner";
    }
  }

  /** Two compression corners in succession; the second turns a further {@code secondDeflectionRad}. */
  record DoubleRamp(double deflectionRad, Point2 cornerPx, double secondDeflectionRad, Point2 secondCornerPx, Wall wall)
      implements BodyShape {
    public DoubleRamp {
      Checks.inOpen("first ramp deflection (rad)", deflectionRad, 0, 0.5 * Math.PI);
      Checks.inOpen("second ramp deflection (rad)", secondDeflectionRad, 0, 0.5 * Math.PI);
    }

    @Override
    public String contractName() {
      return "double-ramp";
    }
  }

  /**
   * A deflecting surface (leading edge at {@code leadingEdgePx}, turning the flow by
   * {@code deflectionRad} towards the wall) whose shock meets
   * the {@code wall} and reflects.
   */
  record ShockGenerator(double deflectionRad, Point2 leadingEdgePx, Wall wall) implements BodyShape {
    public ShockGenerator {
      Checks.inOpen("generator deflection (rad)", deflectionRad, 0, 0.5 * Math.PI);
    }

    @Override
    public String contractName() {
      return "shock-generator";
    }
  }

  /** Two deflecting surfaces whose shocks cross: upper then lower. */
  record TwinGenerators(Point2 upperLeadingEdgePx, Point2 lowerLeadingEdgePx, double upperDeflectionRad, double lowerDeflectionRad)
      implements BodyShape {
    public TwinGenerators {
      Checks.inOpen("upper deflection (rad)", upperDeflectionRad, 0, 0.5 * Math.PI);
      Checks.inOpen("lower deflection (rad)", lowerDeflectionRad, 0, 0.5 * Math.PI);
    }

    @Override
    public String contractName() {
      return "twin-generators";
    }
  }

  /** No model: the freestream only, with weak Mach waves from the walls; the wall is optional. */
  record Freestream(java.util.Optional<Wall> wall) implements BodyShape {
    @Override
    public String contractName() {
      return "none";
    }
  }

  /**
   * A blunt body: a circular cylinder across the flow seen end-on ({@code cylinder}, plane
   * flow) or a sphere ({@code sphere}, axisymmetric), its nose of radius {@code noseRadiusPx}
   * about {@code centrePx}. The flow comes from the run; the stagnation line runs through the
   * centre along it. {@code noseRadiusSigmaPx} is the standard uncertainty of the stated radius.
   */
  record Blunt(dev.wavemark.core.gas.BowShock.Nose nose, Point2 centrePx, double noseRadiusPx, double noseRadiusSigmaPx)
      implements BodyShape {
    /** Smallest nose radius accepted, px: below it the stand-off is a pixel or two. */
    public static final double MIN_RADIUS_PX = 4;
    /** The nose radius's standard uncertainty when the run file states none: this fraction of it. */
    public static final double DEFAULT_RADIUS_SIGMA = 0.01;

    public Blunt {
      Checks.finite("nose centre x (px)", centrePx.x());
      Checks.finite("nose centre y (px)", centrePx.y());
      Checks.finite("noseRadiusPx", noseRadiusPx);
      if (!(noseRadiusPx >= MIN_RADIUS_PX)) {
        throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.GEOMETRY_IMPOSSIBLE,
            "noseRadiusPx must be at least " + MIN_RADIUS_PX + " px (got " + dev.wavemark.core.WavemarkException.num(noseRadiusPx) + ")");
      }
      if (!(noseRadiusSigmaPx >= 0 && noseRadiusSigmaPx < 0.5 * noseRadiusPx)) {
        throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.GEOMETRY_IMPOSSIBLE,
            "noseRadiusTolerancePx must lie in [0, half the nose radius) (got " + dev.wavemark.core.WavemarkException.num(noseRadiusSigmaPx) + ")");
      }
    }

    @Override
    public String contractName() {
      return nose == dev.wavemark.core.gas.BowShock.Nose.CYLINDER ? "cylinder" : "sphere";
    }
  }

  /**
   * A straight wall through two image points, with the solid on {@code solidSide} of it
   * (as seen on screen).
   */
  record Wall(Point2 a, Point2 b, Side solidSide) {
    public Wall {
      if (a.distanceTo(b) < 1e-6) {
        throw new dev.wavemark.core.WavemarkException(
            dev.wavemark.core.Problem.GEOMETRY_IMPOSSIBLE, "the two wall points coincide");
      }
    }
  }
}
