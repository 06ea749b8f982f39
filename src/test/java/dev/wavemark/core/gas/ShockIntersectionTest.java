package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ShockIntersectionTest {
  /** Matching across a slip line is solved to ~1e-15 rad; 1e-9 is the promise. */
  private static final double MATCH = 1e-9;
  /** Identities between two solvers of the same equations: well above their 1e-15 tolerance. */
  private static final double SAME = 1e-10;

  private static double rad(double deg) {
    return Math.toRadians(deg);
  }

  private static void assertMatched(SlipLine s, String at) {
    assertEquals(0.0, s.pressureMismatch() / s.pressureRatio(), MATCH, "pressure across the slip line, " + at);
    assertEquals(0.0, s.directionMismatch(), MATCH, "direction across the slip line, " + at);
  }

  @Test
  void symmetricCrossingIsTheRegularReflection() {
    // A symmetric crossing has a straight streamline on the axis: a wall (Anderson, Modern
    // Compressible Flow, 3rd ed., sec. 4.12, from memory). Checked here for the sec. 4.9 example.
    for (double g : new double[] {1.2, 1.4, 5.0 / 3.0}) {
      ShockIntersection.Opposite o = ShockIntersection.opposite(2.8, rad(16), rad(16), g);
      ShockReflection.Regular r = ShockReflection.regular(2.8, rad(16), g);
      assertEquals(0.0, o.slipLine().directionRad(), SAME, "slip line along the freestream");
      assertEquals(r.reflectedAngleToFlowRad(), o.upperTransmitted().headAngleRad(), SAME);
      assertEquals(r.reflectedAngleToWallRad(), o.upperTransmittedDirectionRad(), SAME);
      assertEquals(r.m3(), o.slipLine().above().mach(), SAME);
      assertEquals(r.pressureRatio(), o.slipLine().pressureRatio(), SAME * r.pressureRatio());
      assertEquals(0.0, o.slipLine().entropyJump(), SAME);
      assertEquals(0.0, o.slipLine().velocityJump(), SAME);
    }
  }

  @ParameterizedTest(name = "M={0} theta2={1} theta3={2} gamma={3}")
  @CsvSource({"3.0,20,10,1.4", "2.0,8,3,1.4", "5.0,25,5,1.4", "2.5,12,12.5,1.3", "4.0,15,8,1.6667", "1.8,6,2,1.2"})
  void oppositeFamiliesMatchAndMirror(double m, double t2, double t3, double g) {
    ShockIntersection.Opposite o = ShockIntersection.opposite(m, rad(t2), rad(t3), g);
    String at = "M=" + m + " " + t2 + "/" + t3;
    assertMatched(o.slipLine(), at);
    // The stronger shock's side keeps its turn: the slip line leans away from the weaker generator's side.
    assertEquals(Math.signum(t3 - t2), Math.signum(o.slipLine().directionRad()), at);
    assertTrue(o.upperTransmitted().kind() == TurnKind.SHOCK && o.lowerTransmitted().kind() == TurnKind.SHOCK, at);
    assertTrue(o.slipLine().above().entropyRise() > 0 && o.slipLine().below().entropyRise() > 0, at);
    ShockIntersection.Opposite mirrored = ShockIntersection.opposite(m, rad(t3), rad(t2), g);
    assertEquals(-o.slipLine().directionRad(), mirrored.slipLine().directionRad(), SAME, "mirror " + at);
    assertEquals(o.slipLine().entropyJump(), -mirrored.slipLine().entropyJump(), SAME, "mirror " + at);
    assertEquals(o.slipLine().temperatureJump(), -mirrored.slipLine().temperatureJump(), SAME, "mirror " + at);
    // Equal pressure with different entropy: the hotter side is the lighter one.
    SlipLine s = o.slipLine();
    assertEquals(Math.signum(s.temperatureJump()), -Math.signum(s.densityJump()), at);
    assertEquals(Math.signum(s.entropyJump()), Math.signum(s.temperatureJump()), at);
  }

  @Test
  void oppositeFamilyTransmittedShockCanDetach() {
    // Both near their limit at M = 2: the transmitted shocks cannot turn the slow streams back.
    double t = ObliqueShock.maxDeflection(2.0, 1.4) - rad(0.5);
    WavemarkException e = assertThrows(WavemarkException.class, () -> ShockIntersection.opposite(2.0, t, t, 1.4));
    assertEquals(Problem.NO_SOLUTION, e.problem());
  }

  @ParameterizedTest(name = "M={0} theta1={1} theta2={2} gamma={3}")
  @CsvSource({"3.0,10,10,1.4", "2.0,5,5,1.4", "5.0,10,15,1.4", "2.5,8,4,1.4", "4.0,5,20,1.3", "3.0,12,6,1.6667"})
  void sameFamilyMergeMatches(double m, double t1, double t2, double g) {
    ShockIntersection.SameFamily f = ShockIntersection.sameFamily(m, rad(t1), rad(t2), g);
    String at = "M=" + m + " " + t1 + "+" + t2;
    assertMatched(f.slipLine(), at);
    assertEquals(TurnKind.SHOCK, f.merged().kind(), at);
    // The reflected wave is weak: a small fraction of the total turn (Anderson sec. 4.13, from memory).
    assertTrue(f.reflected().strengthRad() < 0.1 * rad(t1 + t2), "weak reflected wave " + at);
    assertEquals(f.reflected().compressionRad() > 0, f.reflected().pressureRatio() > 1, at);
    assertEquals(f.reflected().kind() == TurnKind.SHOCK, f.reflected().compressionRad() > 0, at);
    // The merged shock turns the freestream to the slip line's direction and is steeper than the first.
    assertEquals(f.merged().compressionRad(), f.slipLine().directionRad(), SAME, at);
    assertTrue(f.mergedDirectionRad() > f.firstDirectionRad(), at);
    // One strong shock makes more entropy than two weaker ones (plus a weak third wave).
    assertTrue(f.slipLine().entropyJump() > 0, at);
  }

  @Test
  void sameFamilyReflectedWaveVanishesWithTheSecondRamp() {
    // The entropy of a shock grows as the cube of its strength, so one shock of theta1 + theta2
    // and two of theta1 and theta2 differ by ~3 theta1^2 theta2: the reflected wave that makes up
    // the difference vanishes linearly with the second turn (Liepmann and Roshko, sec. 4.13, and
    // the weak-shock entropy law, from memory).
    ShockIntersection.SameFamily f1 = ShockIntersection.sameFamily(3.0, rad(10), rad(1e-3), 1.4);
    ShockIntersection.SameFamily f2 = ShockIntersection.sameFamily(3.0, rad(10), rad(2e-3), 1.4);
    assertEquals(f1.first().headAngleRad(), f1.merged().headAngleRad(), 2 * rad(1e-3));
    assertEquals(2.0, f2.reflected().compressionRad() / f1.reflected().compressionRad(), 0.01);
    assertTrue(f1.reflected().strengthRad() < 0.01 * rad(1e-3), "reflected turn " + f1.reflected().strengthRad());
  }

  @Test
  void sameFamilyMergedShockCanDetach() {
    WavemarkException e = assertThrows(WavemarkException.class,
        () -> ShockIntersection.sameFamily(2.0, rad(12), rad(13), 1.4));
    assertTrue(e.problem() == Problem.NO_SOLUTION || e.problem() == Problem.SHOCK_DETACHED
        || e.problem() == Problem.SUBSONIC, e.getMessage());
  }
}
