package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.junit.jupiter.api.Test;

class TurnTest {
  @Test
  void compressionIsTheNacaObliqueShock() {
    // NACA Report 1135, oblique-shock chart/table values for M = 2, theta = 10 deg (from memory):
    // beta = 39.31 deg, p2/p1 = 1.707, M2 = 1.641. Printed to 4 figures.
    Turn t = Turn.of(2.0, Math.toRadians(10), 1.4);
    assertEquals(TurnKind.SHOCK, t.kind());
    assertEquals(39.31, Math.toDegrees(t.headAngleRad()), 0.01);
    assertEquals(1.707, t.pressureRatio(), 0.001);
    assertEquals(1.641, t.machDownstream(), 0.001);
    assertTrue(t.entropyRise() > 0);
  }

  @Test
  void expansionIsIsentropicAndFollowsPrandtlMeyer() {
    for (double g : new double[] {1.2, 1.3, 1.4, 5.0 / 3.0}) {
      Turn t = Turn.of(2.0, -Math.toRadians(10), g);
      assertEquals(TurnKind.EXPANSION_FAN, t.kind());
      assertEquals(0.0, t.entropyRise(), 0.0, "no entropy across a fan");
      assertEquals(PrandtlMeyer.nu(2.0, g) + Math.toRadians(10), PrandtlMeyer.nu(t.machDownstream(), g), 1e-12);
      assertEquals(MachAngle.of(2.0), t.headAngleRad(), 1e-15);
      assertEquals(MachAngle.of(t.machDownstream()), t.tailAngleRad(), 1e-15);
      // p/rho^gamma is constant along the fan.
      assertEquals(1.0, t.pressureRatio() / Math.pow(t.densityRatio(), g), 1e-12);
    }
  }

  @Test
  void tinyCompressionsKeepTheirDigits() {
    // Weak-shock limit: beta tends to the Mach angle; theta(beta) must invert to full precision.
    for (double m : new double[] {1.05, 1.5, 3.5, 10}) {
      for (double frac : new double[] {1e-6, 1e-4, 1e-2, 0.3}) {
        double theta = frac * ObliqueShock.maxDeflection(m, 1.4);
        double b = Turn.weakBeta(m, theta, 1.4);
        assertEquals(theta, ObliqueShock.theta(m, b, 1.4), 1e-15 + 1e-12 * theta, "M=" + m + " theta=" + theta);
        assertTrue(b > MachAngle.of(m));
      }
    }
  }

  @Test
  void limitsAreTypedErrors() {
    assertEquals(Problem.SHOCK_DETACHED,
        assertThrows(WavemarkException.class, () -> Turn.of(2.0, Math.toRadians(30), 1.4)).problem());
    assertEquals(Problem.NO_SOLUTION,
        assertThrows(WavemarkException.class, () -> Turn.of(2.0, -Math.toRadians(120), 1.4)).problem());
    assertEquals(Problem.SUBSONIC,
        assertThrows(WavemarkException.class, () -> Turn.of(0.9, Math.toRadians(1), 1.4)).problem());
  }
}
