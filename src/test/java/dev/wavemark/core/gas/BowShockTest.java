package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.BowShock.Nose;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Billig's bow-shock correlation: its published form, an independent rule, and its range. */
class BowShockTest {
  private static final double G = 1.4;

  @ParameterizedTest(name = "M = {0}")
  @CsvSource({"1.2", "1.5", "2", "3", "5", "8", "12", "20"})
  void inverseRecoversMach(double m) {
    for (Nose nose : Nose.values()) {
      double ratio = BowShock.standoffRatio(nose, m, G);
      assertEquals(m, BowShock.machFromStandoff(nose, ratio, G), 1e-12 * m, nose + " M=" + m);
    }
  }

  @Test
  void coefficientsAsPublished() {
    // Billig (1967), from memory: delta/R -> 0.143 (sphere) and 0.386 (cylinder) as M -> infinity.
    assertEquals(0.143 * Math.exp(3.24 / 4), BowShock.standoffRatio(Nose.SPHERE, 2, G), 1e-15);
    assertEquals(0.386 * Math.exp(4.67 / 4), BowShock.standoffRatio(Nose.CYLINDER, 2, G), 1e-15);
    assertEquals(1.143 * Math.exp(0.54), BowShock.vertexRadiusRatio(Nose.SPHERE, 2, G), 1e-15);
  }

  @ParameterizedTest(name = "M = {0}")
  @CsvSource({"4", "6", "10", "20"})
  void sphereAgreesWithTheDensityRatioRule(double m) {
    // Hypersonic sphere rule delta/R ~ 0.78 rho1/rho2 behind the normal shock (Lobb, 1964; as
    // quoted by Anderson, "Hypersonic and High-Temperature Gas Dynamics", ch. 5, from memory).
    // Two independent fits of data: they agree within about 10%, common practice for such rules.
    double rule = 0.78 / NormalShock.densityRatio(m, G);
    double billig = BowShock.standoffRatio(Nose.SPHERE, m, G);
    assertEquals(rule, billig, 0.12 * rule, "M=" + m);
  }

  @ParameterizedTest(name = "M = {0}")
  @CsvSource({"1.5", "2", "4", "10"})
  void shapeStartsAtTheStandoffAndTendsToTheMachAngle(double m) {
    for (Nose nose : Nose.values()) {
      assertEquals(1 + BowShock.standoffRatio(nose, m, G), BowShock.shockX(nose, m, G, 0), 1e-15, "vertex");
      assertTrue(BowShock.standoffRatio(Nose.CYLINDER, m, G) > BowShock.standoffRatio(Nose.SPHERE, m, G),
          "a planar nose stands its shock further off than a sphere");
      double y = 1e4;
      double slope = (BowShock.shockX(nose, m, G, y) - BowShock.shockX(nose, m, G, y + 1)) / 1;
      assertEquals(MachAngle.of(m), Math.atan(1 / slope), 1e-3, "far field at the Mach angle, " + nose + " M=" + m);
    }
  }

  @Test
  void outsideTheRangeIsTyped() {
    WavemarkException low = assertThrows(WavemarkException.class, () -> BowShock.standoffRatio(Nose.SPHERE, 1.1, G));
    assertEquals(Problem.OUTSIDE_CORRELATION, low.problem());
    assertTrue(low.getMessage().contains("1.1") && low.getMessage().contains("[1.2, 20]"), low.getMessage());
    assertEquals(Problem.OUTSIDE_CORRELATION,
        assertThrows(WavemarkException.class, () -> BowShock.machFromStandoff(Nose.SPHERE, 0.1, G)).problem());
    assertEquals(Problem.OUTSIDE_CORRELATION,
        assertThrows(WavemarkException.class, () -> BowShock.standoffRatio(Nose.CYLINDER, 3, 5.0 / 3)).problem());
  }
}
