package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.gas.Isentropic;
import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.PrandtlMeyer;
import org.junit.jupiter.api.Test;

/**
 * The schlieren fan-boundary locator on the analytic profile of a centred Prandtl-Meyer fan:
 * air (gamma 1.4) at M 2 turned 10 degrees, profiles across the head at 40 to 200 px from the
 * fan's centre. Along a ray at angle psi from the head the Mach number M satisfies psi = mu(M1) -
 * mu(M) + nu(M) - nu(M1) and the density is isentropic (NACA Report 1135, eqs. 43-44 and 171, from
 * memory); the gradient across the rays is (d rho / d psi) / r, seen through its component along the
 * head's normal (cos psi), and the picture blurs it by a Gaussian. The fan's side of the boundary
 * is therefore a level that slopes, falling into the fan, by an amount that goes as 1/s.
 */
class FanBoundaryLocatorTest {
  private static final double GAMMA = 1.4;
  private static final double M1 = 2.0;
  private static final double TURN_RAD = Math.toRadians(10);
  /** A fan's profile as Measure samples it: 8 px either side at 0.5 px. */
  private static final int N = 33;
  private static final double SAMPLE_PX = 0.5;
  private static final int LO = N / 6;
  private static final int HI = N - 1 - N / 6;
  private static final int BOX = N / 4;

  @Test
  void prandtlMeyerFunctionMatchesTheTable() {
    // NACA Report 1135, Table II (from memory): nu = 26.380 deg at M = 2 for gamma = 1.4
    assertEquals(26.380, Math.toDegrees(PrandtlMeyer.nu(2.0, GAMMA)), 0.001);
  }

  /** d rho / d psi over rho1 at angle psi from the head (central difference over the table). */
  private static double densitySlope(double psi) {
    double nu1 = PrandtlMeyer.nu(M1, GAMMA);
    double m2 = PrandtlMeyer.inverse(nu1 + TURN_RAD, GAMMA);
    double mu1 = MachAngle.of(M1);
    double psiTail = mu1 - MachAngle.of(m2) + TURN_RAD;
    if (psi < 0 || psi > psiTail) {
      return 0;
    }
    double h = 1e-5;
    return (rhoAt(psi + h, mu1, nu1, m2) - rhoAt(psi - h, mu1, nu1, m2)) / (2 * h);
  }

  /** Density over the upstream density on the ray psi from the head, by bisection on M. */
  private static double rhoAt(double psi, double mu1, double nu1, double m2) {
    double lo = M1;
    double hi = m2 + 0.5;
    for (int i = 0; i < 80; i++) {
      double m = 0.5 * (lo + hi);
      double f = mu1 - MachAngle.of(m) + PrandtlMeyer.nu(m, GAMMA) - nu1;
      if (f < psi) {
        lo = m;
      } else {
        hi = m;
      }
    }
    double m = 0.5 * (lo + hi);
    return Isentropic.densityRatio(m, GAMMA) / Isentropic.densityRatio(M1, GAMMA);
  }

  /**
   * The schlieren profile across the head at distance s (px) from the centre, the head at sample
   * {@code x0}, the fan towards higher indices, blurred by a Gaussian of {@code blurPx}: the
   * blur as a sum over 0.02 px sub-samples out to four sigma.
   */
  private static double[] headProfile(double s, double x0, double blurPx) {
    double[] p = new double[N];
    double dy = 0.02;
    for (int i = 0; i < N; i++) {
      double y0 = (i - x0) * SAMPLE_PX;
      double sum = 0;
      double wsum = 0;
      for (double t = -4 * blurPx; t <= 4 * blurPx; t += dy) {
        double y = y0 + t;
        double psi = Math.atan2(y, s);
        double r = Math.hypot(s, y);
        // the fan thickens the gradient by 1/r; the sign is the schlieren's (a falling density)
        double g = -densitySlope(psi) * Math.cos(psi) / r;
        double w = Math.exp(-0.5 * t * t / (blurPx * blurPx));
        sum += w * g;
        wsum += w;
      }
      p[i] = sum / wsum;
    }
    return p;
  }

  @Test
  void kinkCorrectionRemovesTheBoxDifferencesPullOnTheAnalyticFan() {
    double x0 = 16.3;
    double worstRaw = 0;
    for (double s : new double[] {40, 100, 200}) {
      double[] p = headProfile(s, x0, 1.2);
      int sign = Measure.dominantSign(p, Signature.STEP);
      Profiles.Located raw = Profiles.step(p, sign, LO, HI, BOX);
      assertNotNull(raw, "box difference at s " + s);
      Profiles.Kink k = Profiles.kinkFit(p, sign, 1, LO, HI, BOX);
      assertNotNull(k, "kink at s " + s);
      // the fan's level falls into the fan: its slope is against the jump
      assertTrue(k.slope() < 0, "slope " + k.slope() + " at s " + s);
      double bias = Profiles.stepKinkBias(N, sign, 1, raw.centre(), k.blur(), k.slope(), LO, HI, BOX);
      double corrected = raw.centre() - bias;
      worstRaw = Math.max(worstRaw, Math.abs(raw.centre() - x0));
      // our tolerance: the correction takes off at least four fifths of the pull (the model's
      // level is straight, the fan's curves with 1/r and cos psi, most at 40 px)
      assertTrue(Math.abs(corrected - x0) <= 0.2 * Math.abs(raw.centre() - x0) + 0.002,
          "corrected " + (corrected - x0) * SAMPLE_PX + " px against raw " + (raw.centre() - x0) * SAMPLE_PX + " at s " + s);
    }
    // the effect the correction is for: without it the head is pulled by more than 0.1 px near the centre
    assertTrue(worstRaw * SAMPLE_PX > 0.1, "raw pull " + worstRaw * SAMPLE_PX + " px");
  }
}
