package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.special.Gamma;
import org.junit.jupiter.api.Test;

/**
 * The cone-shock onset locator against facts outside the detector: the smeared square-root
 * rise's values at its onset in closed form (Gamma functions, from Hipparchus), and the chord
 * integral of an axisymmetric shell seen side-on (plane geometry), smeared by direct convolution
 * here rather than through the locator's tables.
 */
class SqrtRiseTest {
  /** Profile spacing and half-window as the detector samples a shadowgraph shock, px. */
  private static final double STEP_PX = Measure.SAMPLE_PX;
  private static final double HALF_PX = WaveDetector.SHADOW_WINDOW_PX;
  private static final int N = (int) Math.round(2 * HALF_PX / STEP_PX) + 1;
  private static final int LO = N / 6;
  private static final int HI = N - 1 - N / 6;
  /** Tabulated against closed form: the table's float storage and linear interpolation at 0.01 steps. */
  private static final double TABLE_TOL = 2e-5;
  /**
   * Onset of a pure square-root rise, px: the golden-section search stops at 1e-3 samples and the
   * template is interpolated from its table; the direct convolution here is good to 1e-4 px.
   */
  private static final double ONSET_TOL_PX = 0.005;
  /**
   * Onset near the apex, px: the terms beyond d^(3/2) (relative (d / R)^2, a tenth at the
   * window's far end for R = 40 px) are left out of the fit.
   */
  private static final double APEX_TOL_PX = 0.05;
  /**
   * Onset with the d^(3/2) term's share read from stretches of the shock, px: away from the apex
   * the share changes by a few per cent over a stretch, which moves the onset by thousandths of a
   * pixel.
   */
  private static final double STRETCH_TOL_PX = 0.01;

  /** Unit normal density and its first two derivatives. */
  private static double g(double y, int derivative) {
    double v = Math.exp(-0.5 * y * y) / Math.sqrt(2 * Math.PI);
    return switch (derivative) {
      case 0 -> v;
      case 1 -> -y * v;
      default -> (y * y - 1) * v;
    };
  }

  /**
   * At the onset, S(0) = 2 int u^2 g(u^2) du, S'(0) = int g(u^2) du and S''(0) = int u^2 g(u^2) du
   * (g even), and int_0^inf u^(2k) exp(-u^4 / 2) du = Gamma((2k + 1) / 4) 2^((2k + 1) / 4) / 4
   * (substitute w = u^4 / 2; a standard integral).
   */
  @Test
  void onsetValuesMatchTheClosedForms() {
    double root2pi = Math.sqrt(2 * Math.PI);
    double i0 = Gamma.gamma(0.25) * Math.pow(2, 0.25) / 4;
    double i2 = Gamma.gamma(0.75) * Math.pow(2, 0.75) / 4;
    assertEquals(i0 / root2pi, SqrtRise.unit(SqrtRise.Order.GRADIENT, 0), TABLE_TOL, "S'(0)");
    assertEquals(i2 / root2pi, SqrtRise.unit(SqrtRise.Order.CURVATURE, 0), TABLE_TOL, "S''(0)");
    assertEquals(2 * i2 / root2pi, SqrtRise.rise(0), TABLE_TOL, "S(0)");
  }

  /** Far behind the onset the smear no longer matters: S' -> 1 / (2 sqrt z), S'' -> -1 / (4 z^1.5). */
  @Test
  void farTailIsTheUnsmearedPowerLaw() {
    for (double z : new double[] {30, 63.9, 64.1, 200}) {
      assertEquals(1, SqrtRise.unit(SqrtRise.Order.GRADIENT, z) * 2 * Math.sqrt(z), 1e-3, "S' at " + z);
      assertEquals(1, -SqrtRise.unit(SqrtRise.Order.CURVATURE, z) * 4 * z * Math.sqrt(z), 3e-3, "S'' at " + z);
      assertEquals(1, SqrtRise.rise(z) / Math.sqrt(z), 1e-3, "S at " + z);
    }
    assertEquals(0, SqrtRise.unit(SqrtRise.Order.GRADIENT, -8), 1e-12, "nothing ahead of the smear");
  }

  /**
   * Line-of-sight integral across an axisymmetric shell of radius R, density excess delta at the
   * shock rising inward with slope k per px: at distance d inside the silhouette the chord is
   * 2 sqrt(2 R d - d^2) and the integral is 2 int_0^zmax (delta + k (R - r)) dz, r = sqrt(y^2 + z^2).
   */
  private static double chord(double d, double radius, double delta, double k) {
    if (d <= 0) {
      return 0;
    }
    double y = radius - d;
    double zMax = Math.sqrt(Math.max(0, radius * radius - y * y));
    int n = 400;
    double sum = 0;
    for (int i = 0; i < n; i++) {
      double z = (i + 0.5) / n * zMax;
      double r = Math.sqrt(y * y + z * z);
      sum += delta + k * (radius - r);
    }
    return 2 * sum * zMax / n;
  }

  /**
   * The profile across the shell's silhouette at distances x (px) behind it: the chord integral
   * convolved with a Gaussian of sigma px, differentiated (derivative 1: schlieren) or twice (2:
   * shadowgraph, where the picture darkens as it rises, hence the minus), by convolving with the
   * Gaussian's derivative (midpoint rule, 0.005 px).
   */
  private static double[] profile(double onsetPx, double sigmaPx, double radius, double k, int derivative, int tail) {
    double[] p = new double[N];
    double dt = 0.005;
    double[] c = new double[(int) Math.ceil((HALF_PX + Math.abs(onsetPx) + 8 * sigmaPx) / dt) + 1];
    for (int i = 0; i < c.length; i++) {
      c[i] = chord((i + 0.5) * dt, radius, 1.0, k);
    }
    for (int j = 0; j < N; j++) {
      double x = tail * (j * STEP_PX - HALF_PX - onsetPx);
      double sum = 0;
      for (int i = Math.max(0, (int) Math.floor((x - 8 * sigmaPx) / dt)); i < c.length && (i + 0.5) * dt < x + 8 * sigmaPx; i++) {
        sum += c[i] * g((x - (i + 0.5) * dt) / sigmaPx, derivative);
      }
      double v = sum * dt / Math.pow(sigmaPx, derivative + 1);
      p[j] = (derivative == 2 ? -v : tail * v) + 0.01 * j;
    }
    return p;
  }

  private static double onsetPx(double[] p, SqrtRise.Order order, int tail, double sigmaPx) {
    Profiles.Located l = SqrtRise.locate(p, order, tail, sigmaPx / STEP_PX, LO, HI);
    assertNotNull(l);
    return l.centre() * STEP_PX - HALF_PX;
  }

  /**
   * A shell much wider than the window is the pure square-root rise: the onset is found where it
   * is, on either side and with a background slope, while the centre of the pair (the old locator)
   * stands pixels behind it.
   */
  @Test
  void onsetOfAWideShellIsTheShock() {
    double sigma = 2.5;
    for (int tail : new int[] {1, -1}) {
      for (double x0 : new double[] {-1.3, 0, 0.77, 2.1}) {
        double[] shadow = profile(x0, sigma, 2000, 0, 2, tail);
        assertEquals(x0, onsetPx(shadow, SqrtRise.Order.CURVATURE, tail, sigma), ONSET_TOL_PX, "shadowgraph, onset " + x0 + " tail " + tail);
        double[] schlieren = profile(x0, sigma, 2000, 0, 1, tail);
        assertEquals(x0, onsetPx(schlieren, SqrtRise.Order.GRADIENT, tail, sigma), ONSET_TOL_PX, "schlieren, onset " + x0 + " tail " + tail);
      }
    }
    double[] shadow = profile(0, sigma, 2000, 0, 2, 1);
    Profiles.Located pair = Profiles.pairCentre(Profiles.detrend(shadow, 3), 1, LO, HI, N);
    assertNotNull(pair);
    assertTrue(pair.centre() * STEP_PX - HALF_PX > 1.5, "pair centre " + (pair.centre() * STEP_PX - HALF_PX) + " px behind the shock");
  }

  /**
   * Near a cone's apex the shock's radius is a few windows: the chord's curvature and the density
   * rising inward bend the rise away from sqrt(d) within the window, the d^(3/2) term the locator
   * fits. R = 40 px is the radius 70 px from the apex of a 30 degree shock; a density slope of
   * 0.02 of the jump per px is about what a 12 degree cone's shock layer at M 2 has there (a
   * tenth of the jump across a layer some 16 px wide, from memory of conical-flow tables).
   */
  @Test
  void onsetNearTheApexAllowsForTheShellsCurvature() {
    double sigma = 2.5;
    for (double k : new double[] {0, 0.02}) {
      double[] shadow = profile(0.4, sigma, 40, k, 2, 1);
      assertEquals(0.4, onsetPx(shadow, SqrtRise.Order.CURVATURE, 1, sigma), APEX_TOL_PX, "shadowgraph, density slope " + k);
      double[] schlieren = profile(0.4, sigma, 40, k, 1, -1);
      assertEquals(0.4, onsetPx(schlieren, SqrtRise.Order.GRADIENT, -1, sigma), APEX_TOL_PX, "schlieren, density slope " + k);
    }
  }

  /** The smear and the side of the tail are read from a profile (on the 0.1 px grid tried). */
  @Test
  void smearAndTailAreRecovered() {
    for (int tail : new int[] {1, -1}) {
      double[] p = profile(0.3, 1.8, 2000, 0, 2, tail);
      SqrtRise.Fit f = SqrtRise.fitSmear(p, SqrtRise.Order.CURVATURE, STEP_PX, LO, HI, 0);
      assertNotNull(f);
      assertEquals(tail, f.tail(), "tail");
      assertEquals(1.8, f.sigma() * STEP_PX, 0.051, "smear, tail " + tail);
      assertEquals(0.3, f.onset() * STEP_PX - HALF_PX, ONSET_TOL_PX, "onset, tail " + tail);
    }
  }

  /** A schlieren profile across the shock at s px from the apex of a 30 degree cone shock. */
  private static double[] coneProfile(double s, double sigma) {
    // the shell's radius s sin 30 deg; a density slope behind the shock of 0.02 of the jump per
    // px at 70 px from the apex, falling as 1 / s; the rise towards decreasing index
    return profile(0.4, sigma, 0.5 * s, 0.02 * 70 / s, 1, -1);
  }

  /**
   * A cone's field is conical (it depends on the angle from the apex only): along a 30 degree
   * shock the shell's radius is R = s sin 30 deg and the density slope behind it falls as 1 / s,
   * so the d^(3/2) term's share changes slowly along the shock and can be read from the mean of a
   * stretch of profiles and interpolated between stretches ({@link Measure.Cone}). With the share
   * so fixed each profile's onset is found to a hundredth of a pixel from 135 px off the apex
   * (R = 67 px) to 925 px; nearer the apex, where the share changes by half over a stretch and
   * the terms beyond d^(3/2) matter, to the apex tolerance.
   */
  @Test
  void shareReadOnStretchesHoldsBetweenThem() {
    double sigma = 1.5;
    double half = 0.5 * Measure.SHARE_STRETCH * Measure.NORMAL_STEP_PX;
    double[] centres = {60, 110, 160, 400, 450, 900, 950};
    double[] share = new double[centres.length];
    for (int c = 0; c < centres.length; c++) {
      double[] mean = new double[N];
      for (double at : new double[] {-half, -half / 3, half / 3, half}) {
        double[] p = coneProfile(centres[c] + at, sigma);
        for (int j = 0; j < N; j++) {
          mean[j] += p[j] / 4;
        }
      }
      SqrtRise.Fit f = SqrtRise.fit(mean, SqrtRise.Order.GRADIENT, -1, sigma / STEP_PX, LO, HI);
      assertNotNull(f);
      share[c] = f.next();
    }
    SqrtRiseTemplate t = SqrtRise.template(SqrtRise.Order.GRADIENT, -1, sigma / STEP_PX, N, LO, HI);
    Measure.Cone cone = new Measure.Cone(t, -1, centres, share);
    for (double s : new double[] {50, 85, 135, 425, 925}) {
      Profiles.Located l = t.locate(coneProfile(s, sigma), cone.shareAt(s));
      assertNotNull(l);
      double tol = s < 100 ? APEX_TOL_PX : STRETCH_TOL_PX;
      assertEquals(0.4, l.centre() * STEP_PX - HALF_PX, tol, "onset at " + s + " px from the apex");
    }
  }
}
