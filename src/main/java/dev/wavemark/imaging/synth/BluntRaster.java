package dev.wavemark.imaging.synth;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BowShockShape;
import dev.wavemark.core.model.WavePattern;

/**
 * A blunt body's bow shock: a curved density jump along Billig's shock shape, smoothed by a
 * Gaussian of the shock thickness across the curve, whose height at each point is the normal
 * shock at the normal Mach component there (the oblique-shock density ratio at the local shock
 * angle). The distance to the curve is found by a few foot-point iterations along its tangent,
 * so the ridge of the gradient lies on the curve to well below a pixel. The gradient of the jump's
 * height along the shock (slow, a fraction of the jump over a nose radius) is left out.
 */
final class BluntRaster {
  private static final double BAND = 5.0;
  private static final double INV_SQRT_2PI = 1.0 / Math.sqrt(2 * Math.PI);
  private static final int FOOT_ITERATIONS = 4;

  private BluntRaster() {}

  static void paint(WavePattern.DetachedShock d, FlowRaster r, double thicknessPx, double shiftPx) {
    BowShockShape sh = d.shape();
    Point2 up = ImageAngles.unit(sh.axisDirectionRad() + Math.PI);
    Point2 across = ImageAngles.unit(sh.axisDirectionRad() + 0.5 * Math.PI);
    Point2 c = sh.centrePx();
    double sigma = Math.max(0.3, thicknessPx);
    double reach = BAND * sigma;
    double inv2s2 = 0.5 / (sigma * sigma);
    double rho0 = d.before().density();
    int w = r.width();
    int h = r.height();
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        double dx = x - c.x();
        double dy = y - c.y();
        double s = dx * up.x() + dy * up.y();
        double t = dx * across.x() + dy * across.y();
        // quick reject: far from the curve along the axis
        double s0 = sh.upstreamPx(t);
        if (Math.abs(s - s0) > reach * 3 + 2) {
          continue;
        }
        double tk = t;
        double dist = 0;
        double ns = 1;
        double nt = 0;
        for (int k = 0; k < FOOT_ITERATIONS; k++) {
          double sk = sh.upstreamPx(tk);
          double sl = sh.slope(tk);
          double norm = Math.sqrt(1 + sl * sl);
          ns = 1 / norm;
          nt = -sl / norm;
          double ps = s - sk;
          double pt = t - tk;
          dist = ps * ns + pt * nt;
          double along = (ps * sl + pt) / norm;
          tk += along / norm;
        }
        dist -= shiftPx;
        if (dist > reach || dist < -reach) {
          continue;
        }
        double jump = rho0 * (sh.densityBehind(tk) - 1);
        double g = jump * INV_SQRT_2PI / sigma * Math.exp(-dist * dist * inv2s2);
        // the density rises downstream: against the upstream normal (ns, nt) in body coordinates
        double gxv = -(ns * up.x() + nt * across.x());
        double gyv = -(ns * up.y() + nt * across.y());
        r.gx[y * w + x] += (float) (g * gxv);
        r.gy[y * w + x] += (float) (g * gyv);
      }
    }
  }
}
