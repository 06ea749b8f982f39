package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.special.Erf;
import org.junit.jupiter.api.Test;

/**
 * The step locator on analytic profiles: a unit step blurred by a Gaussian is (1 + erf(x / (s
 * sqrt 2))) / 2, symmetric about its midpoint, so the centre of any symmetric filter's response
 * lies exactly on it (erf from Hipparchus).
 */
class ProfilesTest {
  /** Samples of a profile the size of a fan's (8 px half-window at 0.5 px). */
  private static final int N = 33;
  /** Box of the step locator, samples (as Measure uses it: a quarter of the profile). */
  private static final int BOX = N / 4;
  /** Centre tolerance, samples: sub-pixel interpolation of the level crossings, noise free. */
  private static final double CENTRE_TOL = 0.02;

  private static double[] blurredStep(double centre, double sigma, double height, double slope) {
    double[] p = new double[N];
    for (int i = 0; i < N; i++) {
      p[i] = height * 0.5 * (1 + Erf.erf((i - centre) / (sigma * Math.sqrt(2)))) + slope * i;
    }
    return p;
  }

  @Test
  void stepCentreIsTheMidpointWhateverTheOffset() {
    for (double c : new double[] {14.0, 15.3, 16.5, 17.85}) {
      Profiles.Located l = Profiles.step(blurredStep(c, 3.0, 1.0, 0), 1, N / 6, N - 1 - N / 6, BOX);
      assertNotNull(l, "step at " + c);
      assertEquals(c, l.centre(), CENTRE_TOL, "step at " + c);
    }
  }

  @Test
  void fallingStepIsFoundWithTheOtherSign() {
    Profiles.Located l = Profiles.step(blurredStep(16.2, 2.5, -0.3, 0), -1, N / 6, N - 1 - N / 6, BOX);
    assertNotNull(l);
    assertEquals(16.2, l.centre(), CENTRE_TOL);
    assertTrue(l.amplitude() < 0, "signed amplitude of a falling step");
  }

  @Test
  void boxDifferenceCarriesMostOfTheStepWhereTheDerivativeCarriesLittle() {
    // a 2 px blur sampled every half pixel is sigma = 4 samples
    double[] p = blurredStep(16, 4.0, 1.0, 0);
    Profiles.Located box = Profiles.step(p, 1, N / 6, N - 1 - N / 6, BOX);
    double derivPeak = 0;
    double[] d = Profiles.derivative(p);
    for (double v : d) {
      derivPeak = Math.max(derivPeak, v);
    }
    // the derivative's peak is 1 / (sigma sqrt(2 pi)) = 0.0997 of the step; the box difference of
    // 8 samples either side is the mean of erf(k / (4 sqrt 2)) over k = 1..8, 0.667 of it
    double expected = 0;
    for (int k = 1; k <= BOX; k++) {
      expected += Erf.erf(k / (4.0 * Math.sqrt(2))) / BOX;
    }
    assertEquals(1 / (4.0 * Math.sqrt(2 * Math.PI)), derivPeak, 0.002);
    assertEquals(expected, box.amplitude(), 1e-9);
    assertTrue(box.amplitude() > 6 * derivPeak, "box difference " + box.amplitude());
  }

  @Test
  void slowBackgroundSlopeDoesNotMoveTheCentre() {
    // a fan's level changes slowly across its boundary (it falls as 1/r): a linear slope adds a
    // constant to the box difference, which leaves the level crossings' midpoint where it was
    Profiles.Located l = Profiles.step(blurredStep(15.6, 3.0, 1.0, 0.004), 1, N / 6, N - 1 - N / 6, BOX);
    assertNotNull(l);
    assertEquals(15.6, l.centre(), CENTRE_TOL);
  }
}
