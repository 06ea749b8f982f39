package dev.wavemark.core.model;

import dev.wavemark.core.gas.BowShock;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A blunt body (cylinder end-on, or sphere) and its detached bow shock. The shock's stand-off
 * and vertex curvature are Billig's correlation ({@link BowShock}); only the shock is modelled,
 * with the density jump of the oblique-shock relation at its local angle. The flow between the
 * shock and the body is left uniform (see the notes).
 */
final class BluntPattern {
  /** Vertices of the body's circular outline. */
  private static final int OUTLINE = 360;

  private BluntPattern() {}

  static void blunt(PatternBuilder b, BodyShape.Blunt n) {
    double r = n.noseRadiusPx();
    BowShockShape shape = BowShockShape.of(n.nose(), n.centrePx(), b.flowDir, r, b.free.mach(), b.gamma);
    List<Point2> circle = new ArrayList<>();
    for (int i = 0; i < OUTLINE; i++) {
      double a = 2 * Math.PI * i / OUTLINE;
      circle.add(n.centrePx().plus(new Point2(Math.cos(a), -Math.sin(a)).times(r)));
    }
    b.solids.add(circle);
    if (n.nose() == BowShock.Nose.SPHERE) {
      // the sphere's sting, downstream along the axis
      Point2 a = ImageAngles.unit(b.flowDir);
      Point2 c = ImageAngles.unit(b.flowDir + 0.5 * Math.PI).times(0.3 * r);
      Point2 base = n.centrePx().plus(a.times(0.8 * r));
      b.solids.add(List.of(base.plus(c), base.plus(a.times(b.far())).plus(c), base.plus(a.times(b.far())).minus(c), base.minus(c)));
    }
    Point2 vertex = shape.vertexPx();
    double dir = ImageAngles.wrap(b.flowDir + 0.5 * Math.PI);
    ExpectedWave w = new ExpectedWave(WaveKind.BOW_SHOCK, Side.UPPER, 0.5 * Math.PI, b.flowDir, dir, vertex,
        vertex.plus(ImageAngles.unit(dir).times(r)), Feature.BODY_NOSE, "bow shock");
    double before = b.free.density();
    double after = before * shape.densityBehind(0);
    b.add(new WavePattern.DetachedShock(w, b.free, shape));
    String body = n.nose() == BowShock.Nose.CYLINDER ? "cylinder" : "sphere";
    b.notes.add(String.format(Locale.ROOT,
        "%s: bow shock from Billig's correlation (empirical, coefficients from memory): stand-off %.3f px = %.4f nose radii, "
            + "vertex radius of curvature %.3f px, asymptotic to the Mach angle; the bow-shock wave entry is its tangent at the vertex "
            + "(its side is nominal)", body, shape.standoffPx(), shape.standoffPx() / r, shape.vertexRadiusPx()));
    b.notes.add(String.format(Locale.ROOT,
        "%s: the density jump follows the oblique-shock relation at the local shock angle (%.3f behind the normal part); "
            + "the shock layer behind it is drawn uniform (its compression towards the stagnation point, the sonic line, the "
            + "expansion round the body and the wake are not modelled)%s", body, after,
        n.nose() == BowShock.Nose.SPHERE ? "; the sphere's field is drawn as its meridian plane's, not integrated along the line of sight"
            : ""));
  }
}
