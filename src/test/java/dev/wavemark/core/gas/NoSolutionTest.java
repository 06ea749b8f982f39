package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Inversions without a solution raise a typed error naming the value and the limit, never NaN. */
class NoSolutionTest {
  private static WavemarkException fails(Problem expected, Executable call) {
    WavemarkException e = assertThrows(WavemarkException.class, call);
    assertEquals(expected, e.problem(), e.getMessage());
    return e;
  }

  @Test
  void shockBelowTheMachAngle() {
    WavemarkException e = fails(Problem.BELOW_MACH_ANGLE, () -> ObliqueShock.theta(2.0, Math.toRadians(29), 1.4));
    assertTrue(e.getMessage().contains("29") && e.getMessage().contains("30"), e.getMessage());
  }

  @Test
  void machFromAnglesWithoutASolution() {
    // beta <= theta: no shock.
    fails(Problem.NO_SOLUTION, () -> ObliqueShock.machFromAngles(Math.toRadians(10), Math.toRadians(12), 1.4));
    // A 30 deg wedge cannot hold a 35 deg shock at any Mach number: even as M tends to infinity
    // the shock stands at beta with tan(beta - theta) = tan(beta) (g-1)/(g+1) (NACA 1135 eq. 139, from memory).
    fails(Problem.NO_SOLUTION, () -> ObliqueShock.machFromAngles(Math.toRadians(35), Math.toRadians(30), 1.4));
  }

  @Test
  void detachedAndSubsonic() {
    WavemarkException e = fails(Problem.SHOCK_DETACHED, () -> ObliqueShock.beta(3.0, Math.toRadians(35), ShockBranch.WEAK, 1.4));
    assertTrue(e.getMessage().contains("35") && e.getMessage().contains("34.07"), e.getMessage());
    fails(Problem.SUBSONIC, () -> ObliqueShock.maxDeflection(0.9, 1.4));
    fails(Problem.SUBSONIC, () -> MachAngle.of(1.0));
  }

  @Test
  void ratiosOutOfRange() {
    fails(Problem.OUT_OF_RANGE, () -> Isentropic.machFromAreaRatio(0.9, 1.4, true));
    fails(Problem.OUT_OF_RANGE, () -> Isentropic.machFromPressureRatio(1.2, 1.4));
    fails(Problem.OUT_OF_RANGE, () -> NormalShock.machFromTotalPressureRatio(1.5, 1.4));
    fails(Problem.OUT_OF_RANGE, () -> NormalShock.machFromPitotOverStatic(0.5, 1.4));
    WavemarkException nu = fails(Problem.OUT_OF_RANGE, () -> PrandtlMeyer.inverse(Math.toRadians(140), 1.4));
    // nu_max for gamma = 1.4 is 130.45 deg (NACA 1135 eq. 172, from memory).
    assertTrue(nu.getMessage().contains("130.45"), nu.getMessage());
    fails(Problem.GAMMA_INVALID, () -> NormalShock.m2(2, 1.0));
    fails(Problem.NOT_FINITE, () -> PrandtlMeyer.inverse(Double.NaN, 1.4));
  }
}
