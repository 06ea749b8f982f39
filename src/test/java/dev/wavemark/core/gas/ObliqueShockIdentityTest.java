package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Exact identities of the theta-beta-M relation; tolerances are a few ULPs of the arithmetic. */
class ObliqueShockIdentityTest {
  private static final double TIGHT = 1e-9;

  @ParameterizedTest(name = "M={0} theta={1}deg gamma={2}")
  @CsvSource({"1.5,5,1.4", "2.0,10,1.4", "3.0,20,1.4", "5.0,30,1.4", "2.5,15,1.3", "8.0,25,1.6667", "1.2,2,1.2"})
  void machFromAnglesInvertsBetaOnBothBranches(double m, double thetaDeg, double gamma) {
    double theta = Math.toRadians(thetaDeg);
    for (ShockBranch b : ShockBranch.values()) {
      double beta = ObliqueShock.beta(m, theta, b, gamma);
      assertEquals(theta, ObliqueShock.theta(m, beta, gamma), TIGHT, "theta(beta(theta)) " + b);
      assertEquals(m, ObliqueShock.machFromAngles(beta, theta, gamma), TIGHT * m, "M(beta, theta) " + b);
    }
  }

  @Test
  void normalShockIsTheNinetyDegreeObliqueShock() {
    ObliqueShock.Solution s = ObliqueShock.fromWaveAngle(2.0, 0.5 * Math.PI, 1.4);
    assertEquals(NormalShock.m2(2.0, 1.4), s.m2(), TIGHT);
    assertEquals(0.0, s.thetaRad(), TIGHT);
  }

  @Test
  void deflectionBeyondTheLimitIsDetachedNotNaN() {
    WavemarkException e = assertThrows(WavemarkException.class,
        () -> ObliqueShock.beta(2.0, Math.toRadians(25), ShockBranch.WEAK, 1.4));
    assertEquals(Problem.SHOCK_DETACHED, e.problem());
  }
}
