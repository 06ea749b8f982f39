package dev.wavemark.imaging.synth;

import dev.wavemark.core.gas.Isentropic;
import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.PrandtlMeyer;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.WavePattern;

/**
 * Paints the gradient of density (over freestream density, per pixel) of a plane wave pattern
 * into two float buffers, analytically: a shock or slip line is a jump smoothed by a Gaussian of
 * the thickness parameter (so its gradient is a Gaussian ridge centred exactly on the line), a
 * Prandtl-Meyer fan carries the isentropic density of each ray, varying continuously with the ray
 * angle. Nothing is sampled from a staircase, so line positions are exact to sub-pixel level.
 */
final class FlowRaster {
  /** Half-width of a shock's painted band in thickness units (the Gaussian is below 4e-6 beyond). */
  private static final double BAND = 5.0;
  private static final double INV_SQRT_2PI = 1.0 / Math.sqrt(2 * Math.PI);
  private static final int FAN_TABLE = 1024;

  private final int width;
  private final int height;
  final float[] gx;
  final float[] gy;

  int width() {
    return width;
  }

  int height() {
    return height;
  }

  FlowRaster(int width, int height) {
    this.width = width;
    this.height = height;
    this.gx = new float[width * height];
    this.gy = new float[width * height];
  }

  /**
   * Adds the element's density gradient. {@code jitterPx} shifts every line along its normal
   * (run-to-run unsteadiness); {@code thicknessPx} is the Gaussian sigma of a jump.
   */
  void paint(WavePattern.Element e, double thicknessPx, double jitterPx) {
    if (e instanceof WavePattern.Shock s) {
      ExpectedWave w = s.wave();
      Point2 n = downstreamNormal(w.directionRad(), s.before().directionRad());
      jump(w.startPx(), w.endPx(), n, s.after().density() - s.before().density(), thicknessPx, jitterPx);
    } else if (e instanceof WavePattern.Slip sl) {
      ExpectedWave w = sl.wave();
      Point2 right = ImageAngles.unit(w.directionRad() - 0.5 * Math.PI);
      jump(w.startPx(), w.endPx(), right, sl.right().density() - sl.left().density(), 1.5 * thicknessPx, jitterPx);
    } else if (e instanceof WavePattern.Fan f) {
      fan(f, Math.max(0.5, 0.6 * thicknessPx));
    }
  }

  /** The unit normal of a line of direction {@code lineDir} that points downstream of a flow along {@code flowDir}. */
  static Point2 downstreamNormal(double lineDir, double flowDir) {
    Point2 n = ImageAngles.unit(lineDir + 0.5 * Math.PI);
    return n.dot(ImageAngles.unit(flowDir)) >= 0 ? n : n.times(-1);
  }

  /**
   * A smoothed step of height {@code delta} across the segment a-b, rising along {@code n}: its
   * gradient is delta * N(d; sigma) * n, tapered smoothly over one sigma at the segment's ends.
   */
  void jump(Point2 a, Point2 b, Point2 n, double delta, double sigma, double shift) {
    double len = a.distanceTo(b);
    if (len < 1e-6 || delta == 0) {
      return;
    }
    double ux = (b.x() - a.x()) / len;
    double uy = (b.y() - a.y()) / len;
    double nx = n.x();
    double ny = n.y();
    double ax = a.x() + nx * shift;
    double ay = a.y() + ny * shift;
    double reach = BAND * sigma;
    double amp = delta * INV_SQRT_2PI / sigma;
    double inv2s2 = 0.5 / (sigma * sigma);
    double taper = Math.max(1.0, sigma);
    int y0 = Math.max(0, (int) Math.floor(Math.min(a.y(), b.y()) - reach - 1));
    int y1 = Math.min(height - 1, (int) Math.ceil(Math.max(a.y(), b.y()) + reach + 1));
    for (int y = y0; y <= y1; y++) {
      double dy = y - ay;
      // d = nx (x - ax) + ny dy must lie within +-reach: an x interval when nx != 0.
      int xa = 0;
      int xb = width - 1;
      if (Math.abs(nx) > 1e-9) {
        double c = ny * dy;
        double x1 = ax + (-reach - c) / nx;
        double x2 = ax + (reach - c) / nx;
        xa = Math.max(0, (int) Math.floor(Math.min(x1, x2)));
        xb = Math.min(width - 1, (int) Math.ceil(Math.max(x1, x2)));
      } else if (Math.abs(ny * dy) > reach) {
        continue;
      }
      int row = y * width;
      for (int x = xa; x <= xb; x++) {
        double dx = x - ax;
        double d = nx * dx + ny * dy;
        if (d > reach || d < -reach) {
          continue;
        }
        double t = ux * dx + uy * dy;
        double wEnd = smoothInside(t, taper) * smoothInside(len - t, taper);
        if (wEnd <= 0) {
          continue;
        }
        double g = amp * Math.exp(-d * d * inv2s2) * wEnd;
        gx[row + x] += (float) (g * nx);
        gy[row + x] += (float) (g * ny);
      }
    }
  }

  /** A smooth 0-to-1 ramp of half-width w around s = 0 (cubic smoothstep). */
  private static double smoothInside(double s, double w) {
    if (s <= -w) {
      return 0;
    }
    if (s >= w) {
      return 1;
    }
    double q = 0.5 * (s / w + 1);
    return q * q * (3 - 2 * q);
  }

  /**
   * A centred fan: density rho(phi) along each ray from the apex, from the Prandtl-Meyer relation
   * between the ray angle and the local Mach number; gradient (d rho/d phi) / r across the rays.
   * Points beyond the chord joining the head's and tail's ends are left out.
   */
  void fan(WavePattern.Fan f, double soft) {
    double gamma = gammaOf(f);
    int sign = f.sideSign();
    double m1 = f.before().mach();
    double m2 = f.after().mach();
    double nu1 = PrandtlMeyer.nu(m1, gamma);
    double d1 = f.before().directionRad();
    double rho1 = f.before().density();
    double iso1 = Isentropic.densityRatio(m1, gamma);
    // Table over M: ray angle psi(M) = d1 + sign (mu(M) - nu(M) + nu1), density rho(M).
    double[] psi = new double[FAN_TABLE];
    double[] rho = new double[FAN_TABLE];
    for (int i = 0; i < FAN_TABLE; i++) {
      double m = m1 + (m2 - m1) * i / (FAN_TABLE - 1);
      psi[i] = sign * (MachAngle.of(Math.max(m, 1 + 1e-12)) - PrandtlMeyer.nu(m, gamma) + nu1);
      rho[i] = rho1 * Isentropic.densityRatio(m, gamma) / iso1;
    }
    // psi is monotone in M: decreasing for sign +1, increasing for sign -1. Work in q = sign*psi (decreasing).
    Point2 apex = f.head().startPx();
    double ax = apex.x();
    double ay = apex.y();
    Point2 chordA = f.head().endPx();
    Point2 chordB = f.tail().endPx();
    double cnx = -(chordB.y() - chordA.y());
    double cny = chordB.x() - chordA.x();
    double cside = cnx * (ax - chordA.x()) + cny * (ay - chordA.y());
    double minX = Math.min(ax, Math.min(chordA.x(), chordB.x()));
    double maxX = Math.max(ax, Math.max(chordA.x(), chordB.x()));
    double minY = Math.min(ay, Math.min(chordA.y(), chordB.y()));
    double maxY = Math.max(ay, Math.max(chordA.y(), chordB.y()));
    int x0 = Math.max(0, (int) Math.floor(minX - 2));
    int x1 = Math.min(width - 1, (int) Math.ceil(maxX + 2));
    int y0 = Math.max(0, (int) Math.floor(minY - 2));
    int y1 = Math.min(height - 1, (int) Math.ceil(maxY + 2));
    double qHead = psi[0] * sign;
    double qTail = psi[FAN_TABLE - 1] * sign;
    double dq = (qTail - qHead) / (FAN_TABLE - 1);
    for (int y = y0; y <= y1; y++) {
      double dy = y - ay;
      int row = y * width;
      for (int x = x0; x <= x1; x++) {
        double dx = x - ax;
        double r = Math.hypot(dx, dy);
        if (r < 1.0) {
          continue;
        }
        if ((cnx * (x - chordA.x()) + cny * (y - chordA.y())) * cside < 0) {
          continue;
        }
        double phi = Math.atan2(-dy, dx);
        double q = sign * ImageAngles.wrap(phi - d1);
        // Soft edges: the ray-angle distance to head and tail, in pixels at this radius.
        double inHead = (qHead - q) * r;
        double inTail = (q - qTail) * r;
        if (inHead < -3 * soft || inTail < -3 * soft) {
          continue;
        }
        double wgt = erfStep(inHead / soft) * erfStep(inTail / soft);
        double pos = Math.max(0, Math.min(FAN_TABLE - 1.000001, (q - qHead) / dq));
        int i = (int) pos;
        double drdq = (rho[i + 1] - rho[i]) / ((sign * psi[i + 1]) - (sign * psi[i]));
        // d rho / d phi = sign * d rho / d q; grad = (d rho/d phi) / r * e_phi, e_phi = (-sin phi, -cos phi) on screen.
        double g = wgt * sign * drdq / r;
        gx[row + x] += (float) (g * (dy / r));
        gy[row + x] += (float) (g * (-dx / r));
      }
    }
  }

  /** A smooth step: 0 far below zero, 1 far above (logistic approximation of the normal CDF). */
  private static double erfStep(double s) {
    return 1.0 / (1.0 + Math.exp(-1.702 * s));
  }

  /** The ratio of specific heats implied by the fan's isentropic end states. */
  private static double gammaOf(WavePattern.Fan f) {
    // p ~ rho^gamma along an isentrope, so gamma = ln(p2/p1) / ln(rho2/rho1).
    double lr = Math.log(f.after().density() / f.before().density());
    double lp = Math.log(f.after().pressure() / f.before().pressure());
    return Math.abs(lr) < 1e-12 ? 1.4 : lp / lr;
  }
}
