package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.WavemarkException;
import org.junit.jupiter.api.Test;

/**
 * Generated cases over M 1.5-10 and gamma in {1.2, 1.3, 1.4, 5/3}: every slip line the solvers
 * produce matches pressure and direction to 1e-9, entropy never falls across a shock and stays
 * put across a fan. Cases theory rules out (detached waves) must fail with a typed exception, never
 * with a NaN; they are counted, and most cases must solve.
 */
class WaveInteractionGridTest {
  private static final double MATCH = 1e-9;
  private static final double[] GAMMAS = {1.2, 1.3, 1.4, 5.0 / 3.0};
  private static final double[] MACHS = {1.5, 2, 2.5, 3, 4, 6, 10};
  private static final double[] FRACTIONS = {0.1, 0.3, 0.5};

  private static void assertMatched(SlipLine s, String at) {
    assertEquals(0.0, s.pressureMismatch() / s.pressureRatio(), MATCH, "pressure, " + at);
    assertEquals(0.0, s.directionMismatch(), MATCH, "direction, " + at);
  }

  private static void assertEntropy(Turn t, String at) {
    switch (t.kind()) {
      // A weak shock's entropy rise goes as the cube of its strength: below ~1e-4 rad it is under
      // the rounding of p02/p01, so only "not negative beyond rounding" can be asked of it.
      case SHOCK -> assertTrue(t.strengthRad() < 1e-4 ? t.entropyRise() > -1e-15 : t.entropyRise() > 0,
          "entropy rises across a shock, " + at + ": " + t.entropyRise() + " for " + t.strengthRad() + " rad");
      case EXPANSION_FAN, NONE -> assertEquals(0.0, t.entropyRise(), 0.0, "no entropy across a fan, " + at);
    }
  }

  @Test
  void everySlipLineMatches() {
    int solved = 0;
    int ruledOut = 0;
    for (double g : GAMMAS) {
      for (double m : MACHS) {
        double tmax = ObliqueShock.maxDeflection(m, g);
        for (double f2 : FRACTIONS) {
          for (double f3 : FRACTIONS) {
            String at = "M=" + m + " gamma=" + g + " fractions " + f2 + "/" + f3;
            try {
              ShockIntersection.Opposite o = ShockIntersection.opposite(m, f2 * tmax, f3 * tmax, g);
              assertMatched(o.slipLine(), "opposite " + at);
              assertEntropy(o.upperTransmitted(), at);
              assertEntropy(o.lowerTransmitted(), at);
              solved++;
            } catch (WavemarkException e) {
              ruledOut++;
            }
            try {
              ShockIntersection.SameFamily s = ShockIntersection.sameFamily(m, f2 * tmax, f3 * tmax, g);
              assertMatched(s.slipLine(), "same family " + at);
              assertEntropy(s.merged(), at);
              assertEntropy(s.reflected(), at);
              assertTrue(s.slipLine().entropyJump() > 0, "merged shock makes more entropy, " + at);
              solved++;
            } catch (WavemarkException e) {
              ruledOut++;
            }
            try {
              double eps = 0.5 * f2 * tmax;
              ShockExpansion.Solution se = ShockExpansion.solve(Profile.diamond(eps, 1), m, (f3 - 0.3) * eps, g);
              ShockExpansion.Sharp te = (ShockExpansion.Sharp) se.trailingEdge();
              assertMatched(te.slipLine(), "diamond trailing edge " + at);
              for (ShockExpansion.VertexWave w : se.waves()) {
                assertEntropy(w.turn(), at);
              }
              solved++;
            } catch (WavemarkException e) {
              ruledOut++;
            }
          }
        }
      }
    }
    assertTrue(solved >= 400, "solved " + solved + ", ruled out " + ruledOut);
  }

  @Test
  void everyTriplePointMatches() {
    int solved = 0;
    for (double g : GAMMAS) {
      for (double m = 2.5; m <= 10; m += 0.5) {
        ShockReflection.Criterion n = ShockReflection.vonNeumann(m, g);
        ShockReflection.Criterion d = ShockReflection.detachment(m, g);
        for (double f : new double[] {0.0, 0.5, 1.0, 1.1}) {
          double theta = n.deflectionRad() + f * (d.deflectionRad() - n.deflectionRad());
          if (theta >= ObliqueShock.sonicDeflection(m, g)) {
            continue;
          }
          TriplePoint t = ShockReflection.machReflection(m, theta, g);
          String at = "M=" + m + " gamma=" + g + " f=" + f;
          assertMatched(t.slipLine(), at);
          assertTrue(t.slipLine().directionRad() <= 1e-7, "direct Mach reflection, " + at);
          solved++;
        }
      }
    }
    assertTrue(solved >= 200, "solved " + solved);
  }
}
