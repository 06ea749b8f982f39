package dev.wavemark.imaging.synth;

import boofcv.alg.filter.blur.GBlurImageOps;
import boofcv.struct.image.GrayF32;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.WavePattern;

/**
 * The cone seen from the side: the axisymmetric (Taylor-Maccoll) density field integrated along
 * the line of sight. The field is conical, so the projected density is P(s, e) = s F(e), with s
 * the distance along the axis, e the image distance from the axis over s, and
 * F(e) = integral over the line of sight of (rho/rho_inf - 1)(atan(sqrt(e^2 + zeta^2))) d zeta.
 * The gradient of P is then smoothed by the shock thickness and converted to the plane-flow
 * units of {@link FlowRaster} (per unit span), so the optics treat both alike.
 */
final class ConeRaster {
  private static final int TABLE = 2048;
  private static final int STEPS = 240;

  private ConeRaster() {}

  /**
   * Adds the cone's line-of-sight density gradient to the raster.
   *
   * @param spanOverPixel the plane-flow span divided by the pixel size (m/m): the factor that
   *     turns a projected density (px) into the raster's per-span units
   */
  static void paint(WavePattern.ConicalShock c, FlowRaster r, double thicknessPx, double shiftPx, double spanOverPixel) {
    int w = r.width();
    int h = r.height();
    double tb = Math.tan(c.field().shockAngleRad());
    double tc = Math.tan(c.halfAngleRad());
    double[] f = new double[TABLE];
    for (int i = 0; i < TABLE; i++) {
      f[i] = lineOfSight(c.field(), tc, tb, tb * i / (TABLE - 1));
    }
    Point2 a = ImageAngles.unit(c.axisDirectionRad());
    Point2 n = ImageAngles.unit(c.axisDirectionRad() + 0.5 * Math.PI);
    Point2 apex = c.apexPx().minus(a.times(shiftPx));
    GrayF32 p = new GrayF32(w, h);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        double dx = x - apex.x();
        double dy = y - apex.y();
        double s = dx * a.x() + dy * a.y();
        if (s <= 0) {
          continue;
        }
        double e = Math.abs(dx * n.x() + dy * n.y()) / s;
        if (e >= tb) {
          continue;
        }
        double pos = e / tb * (TABLE - 1);
        int i = Math.min(TABLE - 2, (int) pos);
        double fr = pos - i;
        p.data[y * w + x] = (float) (s * (f[i] * (1 - fr) + f[i + 1] * fr));
      }
    }
    GrayF32 sm = new GrayF32(w, h);
    GBlurImageOps.gaussian(p, sm, thicknessPx, -1, null);
    double k = 1.0 / spanOverPixel;
    for (int y = 1; y < h - 1; y++) {
      for (int x = 1; x < w - 1; x++) {
        int i = y * w + x;
        r.gx[i] += (float) (0.5 * k * (sm.data[i + 1] - sm.data[i - 1]));
        r.gy[i] += (float) (0.5 * k * (sm.data[i + w] - sm.data[i - w]));
      }
    }
  }

  /** F(e): the density excess integrated through the disturbed gas, both halves of the chord. */
  private static double lineOfSight(WavePattern.ConeField field, double tc, double tb, double e) {
    double zMax = Math.sqrt(Math.max(0, tb * tb - e * e));
    double zMin = e < tc ? Math.sqrt(tc * tc - e * e) : 0;
    if (zMax <= zMin) {
      return 0;
    }
    // Midpoint rule in u with zeta = zMax - (zMax - zMin) u^2: dense near the shock where the chord grazes it.
    double sum = 0;
    double span = zMax - zMin;
    for (int k = 0; k < STEPS; k++) {
      double u = (k + 0.5) / STEPS;
      double z = zMax - span * u * u;
      double theta = Math.atan(Math.sqrt(e * e + z * z));
      double th = Math.max(Math.atan(tc), Math.min(Math.atan(tb), theta));
      sum += (field.density(th) - 1) * 2 * span * u / STEPS;
    }
    return 2 * sum;
  }
}
