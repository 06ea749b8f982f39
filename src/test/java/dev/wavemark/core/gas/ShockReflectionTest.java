package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;

class ShockReflectionTest {
  /** The textbook example reads its angles off the theta-beta-M chart: about half a degree. */
  private static final double CHART_DEG = 0.5;
  /** Chart-read Mach numbers: about 0.02. */
  private static final double CHART_MACH = 0.02;
  /** Recalled criteria are quoted to 0.1 deg; allow rounding plus a little. */
  private static final double RECALLED_DEG = 0.15;
  /** Matching across a slip line is solved to ~1e-15 rad; 1e-9 is the promise. */
  private static final double MATCH = 1e-9;
  private static final double[] GAMMAS = {1.2, 1.3, 1.4, 5.0 / 3.0};

  private static double rad(double deg) {
    return Math.toRadians(deg);
  }

  private static double deg(double rad) {
    return Math.toDegrees(rad);
  }

  @Test
  void regularReflectionMatchesTheTextbookExample() {
    // Anderson, Modern Compressible Flow, 3rd ed., sec. 4.9 worked example (from memory):
    // M1 = 2.8, theta = 16 deg: beta1 = 35 deg, M2 = 2.05, reflected shock at 29 deg to the wall, M3 = 1.45.
    ShockReflection.Regular r = ShockReflection.regular(2.8, rad(16), 1.4);
    assertEquals(35.0, deg(r.incidentAngleRad()), CHART_DEG);
    assertEquals(2.05, r.m2(), CHART_MACH);
    assertEquals(29.0, deg(r.reflectedAngleToWallRad()), CHART_DEG);
    assertEquals(1.45, r.m3(), CHART_MACH);
    assertEquals(deg(r.reflectedAngleToFlowRad()) - 16, deg(r.reflectedAngleToWallRad()), 1e-12);
    assertTrue(r.incident().entropyRise() > 0 && r.reflected().entropyRise() > 0, "entropy rises across both shocks");
  }

  @Test
  void dualSolutionThresholdForAir() {
    // Ben-Dor (2007), ch. 1: the von Neumann and detachment lines cross at M = 2.202 for gamma = 1.4 (from memory).
    assertEquals(2.202, ShockReflection.dualSolutionThresholdMach(1.4), 0.002);
  }

  @ParameterizedTest(name = "M={0}")
  @CsvFileSource(resources = "/gas/reflection-criteria.csv", numLinesToSkip = 2)
  void criteriaMatchPublishedTransitionLines(double m, double betaN, double betaD, double thetaN, double thetaD) {
    ShockReflection.Criterion n = ShockReflection.vonNeumann(m, 1.4);
    ShockReflection.Criterion d = ShockReflection.detachment(m, 1.4);
    assertEquals(betaN, deg(n.incidentAngleRad()), RECALLED_DEG, "von Neumann angle at M = " + m);
    assertEquals(betaD, deg(d.incidentAngleRad()), RECALLED_DEG, "detachment angle at M = " + m);
    if (thetaN > 0) {
      assertEquals(thetaN, deg(n.deflectionRad()), RECALLED_DEG, "von Neumann deflection at M = " + m);
      assertEquals(thetaD, deg(d.deflectionRad()), RECALLED_DEG, "detachment deflection at M = " + m);
    }
  }

  @Test
  void vonNeumannLiesBelowDetachmentWhereverItExists() {
    for (double g : GAMMAS) {
      double threshold = ShockReflection.dualSolutionThresholdMach(g);
      for (double m = 1.5; m <= 10.0001; m += 0.25) {
        ShockReflection.Criterion d = ShockReflection.detachment(m, g);
        assertEquals(d.deflectionRad(), ObliqueShock.maxDeflection(Turn.of(m, d.deflectionRad(), g).machDownstream(), g),
            1e-9, "detachment means theta = thetaMax(M2), M=" + m + " gamma=" + g);
        if (m > threshold + 1e-3) {
          ShockReflection.Criterion n = ShockReflection.vonNeumann(m, g);
          String at = "M=" + m + " gamma=" + g;
          assertTrue(n.incidentAngleRad() < d.incidentAngleRad(), "beta_N < beta_D at " + at);
          assertTrue(n.deflectionRad() < d.deflectionRad(), "theta_N < theta_D at " + at);
        } else if (m < threshold - 1e-3) {
          final double mm = m;
          WavemarkException e = assertThrows(WavemarkException.class, () -> ShockReflection.vonNeumann(mm, g));
          assertEquals(Problem.NO_SOLUTION, e.problem(), "no von Neumann condition below the threshold, M=" + m);
        }
      }
    }
  }

  @Test
  void criteriaMeetAtTheThreshold() {
    for (double g : GAMMAS) {
      double m = ShockReflection.dualSolutionThresholdMach(g) + 1e-4;
      double gap = ShockReflection.detachment(m, g).deflectionRad() - ShockReflection.vonNeumann(m, g).deflectionRad();
      assertTrue(gap >= 0 && gap < rad(0.05), "gap " + deg(gap) + " deg at the threshold, gamma=" + g);
    }
  }

  @Test
  void regularReflectionEndsAtDetachment() {
    double thetaD = ShockReflection.detachment(3.0, 1.4).deflectionRad();
    ShockReflection.regular(3.0, thetaD - rad(0.01), 1.4);
    WavemarkException e = assertThrows(WavemarkException.class, () -> ShockReflection.regular(3.0, thetaD + rad(0.01), 1.4));
    assertEquals(Problem.SHOCK_DETACHED, e.problem());
  }

  @ParameterizedTest(name = "M={0} theta={1}")
  @CsvSource({"5.0,15,REGULAR", "5.0,25,DUAL_SOLUTION", "5.0,29,MACH", "2.0,12,REGULAR", "2.0,13.5,MACH", "3.0,20.5,DUAL_SOLUTION"})
  void verdictFollowsTheCriteria(double m, double thetaDeg, ReflectionVerdict expected) {
    assertEquals(expected, ShockReflection.judge(m, rad(thetaDeg), 1.4).verdict());
  }

  @Test
  void incidentShockBeyondItsOwnLimitIsDetached() {
    WavemarkException e = assertThrows(WavemarkException.class, () -> ShockReflection.judge(2.0, rad(25), 1.4));
    assertEquals(Problem.SHOCK_DETACHED, e.problem());
  }

  @Test
  void triplePointAtTheVonNeumannConditionHasANormalStem() {
    for (double g : GAMMAS) {
      double m = 5.0;
      ShockReflection.Criterion n = ShockReflection.vonNeumann(m, g);
      TriplePoint t = ShockReflection.machReflection(m, n.deflectionRad(), g);
      assertEquals(0.0, t.slipLine().directionRad(), 1e-7, "slip line along the wall, gamma=" + g);
      assertEquals(90.0, deg(t.stemAngleToFlowRad()), 1e-3, "normal stem, gamma=" + g);
      assertEquals(n.deflectionRad(), t.reflectedDeflectionRad(), 1e-7, "reflected shock turns back by theta");
    }
  }

  @ParameterizedTest(name = "M={0} theta={1}")
  @CsvSource({"5.0,25", "5.0,29", "3.0,21", "3.0,23", "2.0,13.5", "4.0,24"})
  void triplePointMatchesAcrossTheSlipLine(double m, double thetaDeg) {
    TriplePoint t = ShockReflection.machReflection(m, rad(thetaDeg), 1.4);
    SlipLine s = t.slipLine();
    assertEquals(0.0, s.pressureMismatch() / s.pressureRatio(), MATCH);
    assertEquals(0.0, s.directionMismatch(), MATCH);
    // A direct Mach reflection beyond the von Neumann condition: the slip line turns towards the wall.
    assertTrue(s.directionRad() < 0, "slip line towards the wall");
    assertTrue(s.below().mach() < 1, "subsonic behind the stem");
    assertTrue(s.above().entropyRise() > 0 && s.below().entropyRise() > s.above().entropyRise(),
        "the stem makes more entropy than the two weaker shocks");
    assertTrue(t.incidentAngleRad() > MachAngle.of(m));
    assertTrue(t.stemDirectionRad() > -Math.PI / 2 && t.stemDirectionRad() < 0, "stem leans like the incident shock");
  }
}
