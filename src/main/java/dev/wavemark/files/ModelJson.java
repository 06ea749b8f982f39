package dev.wavemark.files;

import com.fasterxml.jackson.annotation.JsonInclude;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.BowShock;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Side;
import java.util.Optional;
import org.jspecify.annotations.Nullable;

/**
 * The run file's {@code model} object: every field any shape reads. Fields a shape does not read
 * are ignored; a field it needs and lacks is an error naming the field.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record ModelJson(
    @Nullable String shape, @Nullable Double deflectionDeg, @Nullable Double incidenceDeg,
    double @Nullable [] leadingEdgePx, @Nullable Double chordPx, @Nullable Double angleToleranceDeg,
    double @Nullable [][] wallPx, @Nullable String wallSide,
    double @Nullable [] secondCornerPx, @Nullable Double secondDeflectionDeg,
    double @Nullable [][] leadingEdgesPx, double @Nullable [] deflectionsDeg,
    double @Nullable [] centerPx, @Nullable Double noseRadiusPx, @Nullable Double noseRadiusTolerancePx) {

  /** The fields of the sharp-edged shapes only (no blunt-body fields). */
  public ModelJson(
      @Nullable String shape, @Nullable Double deflectionDeg, @Nullable Double incidenceDeg,
      double @Nullable [] leadingEdgePx, @Nullable Double chordPx, @Nullable Double angleToleranceDeg,
      double @Nullable [][] wallPx, @Nullable String wallSide,
      double @Nullable [] secondCornerPx, @Nullable Double secondDeflectionDeg,
      double @Nullable [][] leadingEdgesPx, double @Nullable [] deflectionsDeg) {
    this(shape, deflectionDeg, incidenceDeg, leadingEdgePx, chordPx, angleToleranceDeg, wallPx, wallSide, secondCornerPx,
        secondDeflectionDeg, leadingEdgesPx, deflectionsDeg, null, null, null);
  }

  /** A blunt body's model object: {@code shape} is {@code cylinder} or {@code sphere}. */
  public static ModelJson blunt(String shape, double[] centerPx, double noseRadiusPx, @Nullable Double noseRadiusTolerancePx) {
    return new ModelJson(shape, null, null, null, null, null, null, null, null, null, null, null, centerPx, noseRadiusPx,
        noseRadiusTolerancePx);
  }

  /** Converts to the domain shape; {@code src} names the run file in messages. */
  public BodyShape toDomain(String src) {
    if (shape == null) {
      throw new WavemarkException(Problem.FIELD_MISSING, src, "model.shape", "?");
    }
    try {
      switch (shape) {
        case "wedge":
          return new BodyShape.Wedge(rad(need(deflectionDeg, "deflectionDeg", src)), rad(incidence()),
              point(leadingEdgePx, "leadingEdgePx", src), need(chordPx, "chordPx", src));
        case "diamond":
          return new BodyShape.Diamond(rad(need(deflectionDeg, "deflectionDeg", src)), rad(incidence()),
              point(leadingEdgePx, "leadingEdgePx", src), need(chordPx, "chordPx", src));
        case "flat-plate":
          return new BodyShape.FlatPlate(rad(incidence()), point(leadingEdgePx, "leadingEdgePx", src), need(chordPx, "chordPx", src));
        case "cone":
          return new BodyShape.Cone(rad(need(deflectionDeg, "deflectionDeg", src)), rad(incidence()),
              point(leadingEdgePx, "leadingEdgePx", src), need(chordPx, "chordPx", src));
        case "ramp":
          return new BodyShape.Ramp(rad(need(deflectionDeg, "deflectionDeg", src)), point(leadingEdgePx, "leadingEdgePx", src), wall(src));
        case "expansion-corner":
          return new BodyShape.ExpansionCorner(rad(need(deflectionDeg, "deflectionDeg", src)),
              point(leadingEdgePx, "leadingEdgePx", src), wall(src));
        case "double-ramp":
          return new BodyShape.DoubleRamp(rad(need(deflectionDeg, "deflectionDeg", src)), point(leadingEdgePx, "leadingEdgePx", src),
              rad(need(secondDeflectionDeg, "secondDeflectionDeg", src)), point(secondCornerPx, "secondCornerPx", src), wall(src));
        case "shock-generator":
          return new BodyShape.ShockGenerator(rad(need(deflectionDeg, "deflectionDeg", src)),
              point(leadingEdgePx, "leadingEdgePx", src), wall(src));
        case "twin-generators": {
          if (leadingEdgesPx == null || leadingEdgesPx.length != 2) {
            throw missing("leadingEdgesPx", src);
          }
          if (deflectionsDeg == null || deflectionsDeg.length != 2) {
            throw missing("deflectionsDeg", src);
          }
          return new BodyShape.TwinGenerators(point(leadingEdgesPx[0], "leadingEdgesPx[0]", src),
              point(leadingEdgesPx[1], "leadingEdgesPx[1]", src), rad(deflectionsDeg[0]), rad(deflectionsDeg[1]));
        }
        case "cylinder":
        case "sphere": {
          double r = need(noseRadiusPx, "noseRadiusPx", src);
          double sigma = noseRadiusTolerancePx != null ? noseRadiusTolerancePx : BodyShape.Blunt.DEFAULT_RADIUS_SIGMA * Math.abs(r);
          return new BodyShape.Blunt("cylinder".equals(shape) ? BowShock.Nose.CYLINDER : BowShock.Nose.SPHERE,
              point(centerPx, "centerPx", src), r, sigma);
        }
        case "none":
          return new BodyShape.Freestream(wallPx == null ? Optional.empty() : Optional.of(wall(src)));
        default:
          throw new WavemarkException(Problem.SHAPE_UNKNOWN, src, shape, String.join(", ", BodyShape.NAMES));
      }
    } catch (WavemarkException e) {
      if (e.problem() == Problem.OUT_OF_RANGE || e.problem() == Problem.NOT_FINITE || e.problem() == Problem.GEOMETRY_IMPOSSIBLE) {
        throw new WavemarkException(e, Problem.JSON_INVALID, src, "model: " + e.getMessage());
      }
      throw e;
    }
  }

  private double incidence() {
    return incidenceDeg == null ? 0 : incidenceDeg;
  }

  private BodyShape.Wall wall(String src) {
    if (wallPx == null || wallPx.length != 2) {
      throw missing("wallPx", src);
    }
    Side side = Side.LOWER;
    if (wallSide != null) {
      side = Side.fromContract(wallSide);
      if (side == null) {
        throw new WavemarkException(Problem.JSON_INVALID, src, "model.wallSide must be 'upper' or 'lower', got '" + wallSide + "'");
      }
    }
    return new BodyShape.Wall(point(wallPx[0], "wallPx[0]", src), point(wallPx[1], "wallPx[1]", src), side);
  }

  private double need(@Nullable Double v, String field, String src) {
    if (v == null) {
      throw missing(field, src);
    }
    return v;
  }

  private Point2 point(double @Nullable [] p, String field, String src) {
    if (p == null) {
      throw missing(field, src);
    }
    if (p.length != 2) {
      throw new WavemarkException(Problem.JSON_INVALID, src, "model." + field + " must be [x, y] in pixels");
    }
    return new Point2(p[0], p[1]);
  }

  private WavemarkException missing(String field, String src) {
    return new WavemarkException(Problem.FIELD_MISSING, src, "model." + field, shape);
  }

  private static double rad(double deg) {
    return Math.toRadians(deg);
  }
}
