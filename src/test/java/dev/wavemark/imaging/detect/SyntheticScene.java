package dev.wavemark.imaging.detect;

import boofcv.alg.filter.blur.GBlurImageOps;
import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU8;
import dev.wavemark.core.model.Optics;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Test-scope pictures with exactly known waves, for developing and checking the detector
 * independently of the project renderer: a density field made of blurred steps (shocks) and
 * angular ramps (centred expansion fans), imaged as knife-edge schlieren (the density gradient
 * component across the edge) or shadowgraph (minus the Laplacian), with Gaussian noise.
 */
final class SyntheticScene {
  final int width;
  final int height;
  private final List<Shock> shocks = new ArrayList<>();
  private final List<Fan> fans = new ArrayList<>();
  private final List<double[]> bodies = new ArrayList<>();
  double blurPx = 1.2;

  SyntheticScene(int width, int height) {
    this.width = width;
    this.height = height;
  }

  /**
   * A straight shock from (ox, oy) along image direction {@code dirRad} (contract sense),
   * {@code length} px long, raising the density by {@code jump} on the side {@code behind}
   * (+1: the left of the direction as seen on screen, i.e. counter-clockwise).
   */
  record Shock(double ox, double oy, double dirRad, double length, double jump, int behind, double floorRad) {}

  /**
   * A centred fan at (cx, cy), density falling by {@code drop} from the head to the tail
   * direction and staying low from the tail on to {@code floorRad} (the surface downstream).
   */
  record Fan(double cx, double cy, double headRad, double tailRad, double floorRad, double drop, double length) {}

  /**
   * As {@link #shock(double, double, double, double, double, int, double)}, with the high-density
   * region bounded by the direction 30 deg further round on the behind side.
   */
  SyntheticScene shock(double ox, double oy, double dirRad, double length, double jump, int behind) {
    return shock(ox, oy, dirRad, length, jump, behind, dirRad + behind * Math.toRadians(60));
  }

  /**
   * A shock whose high-density side is the sector from its direction round to {@code floorRad}
   * (a surface, usually inside a masked body).
   */
  SyntheticScene shock(double ox, double oy, double dirRad, double length, double jump, int behind, double floorRad) {
    shocks.add(new Shock(ox, oy, dirRad, length, jump, behind, floorRad));
    return this;
  }

  SyntheticScene fan(double cx, double cy, double headRad, double tailRad, double floorRad, double drop, double length) {
    fans.add(new Fan(cx, cy, headRad, tailRad, floorRad, drop, length));
    return this;
  }

  /** A solid convex polygon (x0, y0, x1, y1, ...) drawn dark and left out of the flow mask. */
  SyntheticScene body(double... xy) {
    bodies.add(xy.clone());
    return this;
  }

  double density(double x, double y) {
    double rho = 0;
    for (Shock s : shocks) {
      double ux = Math.cos(s.dirRad);
      double uy = -Math.sin(s.dirRad);
      double along = (x - s.ox) * ux + (y - s.oy) * uy;
      double phi = Math.atan2(-(y - s.oy), x - s.ox);
      // sector from 20 deg outside the shock (its upstream tail) round to the floor
      double rel = s.behind * angleBetween(phi, s.dirRad);
      double floor = s.behind * angleBetween(s.floorRad, s.dirRad);
      if (along > s.length || rel < -Math.toRadians(20) || rel > floor) {
        continue;
      }
      // left of the direction on screen (counter-clockwise): normal (uy, -ux) in y-down pixels
      double d = s.behind * ((x - s.ox) * uy - (y - s.oy) * ux);
      rho += s.jump * 0.5 * (1 + erf(d / (0.5 * Math.sqrt(2))));
    }
    for (Fan f : fans) {
      double dx = x - f.cx;
      double dy = y - f.cy;
      double r = Math.hypot(dx, dy);
      if (r > f.length) {
        continue;
      }
      double phi = Math.atan2(-dy, dx);
      double span = angleBetween(f.tailRad, f.headRad);
      double t = angleBetween(phi, f.headRad) / span;
      double floor = angleBetween(f.floorRad, f.headRad) / span;
      if (t > floor) {
        continue;
      }
      rho -= f.drop * Math.max(0, Math.min(1, t));
    }
    return rho;
  }

  private static double angleBetween(double a, double b) {
    return Math.IEEEremainder(a - b, 2 * Math.PI);
  }

  boolean inBody(double x, double y) {
    for (double[] p : bodies) {
      if (insidePolygon(p, x, y)) {
        return true;
      }
    }
    return false;
  }

  private static boolean insidePolygon(double[] p, double x, double y) {
    boolean in = false;
    int n = p.length / 2;
    for (int i = 0, j = n - 1; i < n; j = i++) {
      double xi = p[2 * i];
      double yi = p[2 * i + 1];
      double xj = p[2 * j];
      double yj = p[2 * j + 1];
      if ((yi > y) != (yj > y) && x < (xj - xi) * (y - yi) / (yj - yi) + xi) {
        in = !in;
      }
    }
    return in;
  }

  /** The flow mask: everything outside the bodies. */
  GrayU8 mask() {
    GrayU8 m = new GrayU8(width, height);
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        m.set(x, y, inBody(x, y) ? 0 : 1);
      }
    }
    return m;
  }

  /**
   * The picture. {@code gain} scales the optical signal; {@code noiseSigma} is the standard
   * deviation of the added noise (same units).
   */
  GrayF32 render(Optics optics, double gain, double noiseSigma, long seed) {
    GrayF32 rho = new GrayF32(width, height);
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        rho.set(x, y, (float) density(x, y));
      }
    }
    double extra = Math.sqrt(Math.max(0, blurPx * blurPx - 0.25));
    GrayF32 b = extra > 0.05 ? GBlurImageOps.gaussian(rho, null, extra, -1, null) : rho;
    GrayF32 img = new GrayF32(width, height);
    Random rnd = new Random(seed);
    for (int y = 1; y < height - 1; y++) {
      for (int x = 1; x < width - 1; x++) {
        double v;
        switch (optics) {
          case SCHLIEREN_HORIZONTAL_EDGE -> v = 0.5 * (b.get(x, y + 1) - b.get(x, y - 1));
          case SHADOWGRAPH -> v = -(b.get(x + 1, y) + b.get(x - 1, y) + b.get(x, y + 1) + b.get(x, y - 1) - 4 * b.get(x, y));
          default -> v = 0.5 * (b.get(x + 1, y) - b.get(x - 1, y));
        }
        img.set(x, y, (float) (gain * v + noiseSigma * rnd.nextGaussian()));
      }
    }
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        if (inBody(x, y)) {
          img.set(x, y, -1f);
        }
      }
    }
    return img;
  }

  static double erf(double x) {
    return org.hipparchus.special.Erf.erf(x);
  }
}
