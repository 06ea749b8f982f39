package dev.wavemark.core.model;

import dev.wavemark.core.gas.ConicalField;
import dev.wavemark.core.gas.ConicalFlow;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import java.util.List;

/**
 * The cone seen from the side: the Taylor-Maccoll solution of {@link ConicalFlow} gives the
 * conical shock's half-angle and the density on every ray; in the picture the shock shows as two
 * lines (its silhouette) at the shock angle either side of the axis.
 */
final class ConePattern {
  private ConePattern() {}

  static void cone(PatternBuilder b, BodyShape.Cone c) {
    double axis = b.flowDir - c.incidenceRad();
    if (Math.abs(c.incidenceRad()) > 1e-9) {
      b.notes.add("the cone is at incidence: its field is taken as the zero-incidence conical field turned with the axis (approximate)");
    }
    ConicalField field = ConicalFlow.of(b.gamma).solve(b.free.mach(), c.halfAngleRad());
    double beta = field.shockRad();
    Point2 apex = c.leadingEdgePx();
    double side = c.chordPx() / Math.cos(c.halfAngleRad());
    Point2 bu = apex.plus(ImageAngles.unit(axis + c.halfAngleRad()).times(side));
    Point2 bl = apex.plus(ImageAngles.unit(axis - c.halfAngleRad()).times(side));
    Point2 n = ImageAngles.unit(axis + 0.5 * Math.PI);
    Point2 a = ImageAngles.unit(axis);
    double sting = 0.35 * c.chordPx() * Math.tan(c.halfAngleRad());
    Point2 base = apex.plus(a.times(c.chordPx()));
    Point2 su = base.plus(n.times(sting));
    Point2 sl = base.minus(n.times(sting));
    b.solids.add(List.of(apex, bu, su, su.plus(a.times(b.far())), sl.plus(a.times(b.far())), sl, bl));
    ExpectedWave up = b.wave(WaveKind.CONICAL_SHOCK, Side.UPPER, beta, b.flowDir, ImageAngles.wrap(axis + beta), apex,
        Feature.APEX, "upper conical shock");
    ExpectedWave lo = b.wave(WaveKind.CONICAL_SHOCK, Side.LOWER, beta, b.flowDir, ImageAngles.wrap(axis - beta), apex,
        Feature.APEX, "lower conical shock");
    WavePattern.ConeField cf = new WavePattern.ConeField() {
      @Override
      public double shockAngleRad() {
        return beta;
      }

      @Override
      public double density(double thetaRad) {
        return field.densityRatio(thetaRad);
      }
    };
    b.add(new WavePattern.ConicalShock(up, lo, apex, axis, c.halfAngleRad(), c.chordPx(), b.free, cf));
    b.notes.add("cone: the conical field is drawn to the picture's edge; the expansion at the cone's base and its wake are not modelled");
  }
}
