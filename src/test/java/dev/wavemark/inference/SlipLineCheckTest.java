package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.model.WavePattern;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Slip lines are checked against theory, never used for the Mach number: a double ramp (8 + 8 deg
 * at M 3) whose waves lie exactly on theory's, except the slip line, turned by a known amount.
 * The slip line's direction is the pressure match of the two streams behind the merged shock and
 * behind the two ramp shocks (the same-family intersection, core.gas.ShockIntersection).
 */
class SlipLineCheckTest {
  private static final BodyShape.Wall FLOOR = new BodyShape.Wall(new Point2(0, 600), new Point2(1000, 600), Side.LOWER);
  private static final BodyShape RAMP = new BodyShape.DoubleRamp(Math.toRadians(8), new Point2(300, 600), Math.toRadians(8),
      new Point2(450, 600), FLOOR);
  private static final double MACH = 3.0;
  private static final double SIGMA = Math.toRadians(0.05);

  private static FrameInference infer(double slipErrorRad, boolean withSlip) {
    RunSpec run = Fixtures.run(RAMP, 0, Math.toRadians(0.05), Math.toRadians(0.05), Fixtures.nominal(MACH * 1.05));
    List<ObservedWave> obs = new ArrayList<>();
    for (ExpectedWave e : WavePattern.of(RAMP, MACH, 1.4, 0, Fixtures.W, Fixtures.H)) {
      if (e.kind() == WaveKind.SLIP_LINE && !withSlip) {
        continue;
      }
      obs.add(Fixtures.along(e, e.kind() == WaveKind.SLIP_LINE ? slipErrorRad : 0, SIGMA));
    }
    return Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H);
  }

  private static int slipIndex(FrameInference f) {
    return f.matches().stream().filter(m -> m.expected().kind() == WaveKind.SLIP_LINE).findFirst().orElseThrow().observedIndex();
  }

  @Test
  void aTurnedSlipLineLeavesTheMachNumberAlone() {
    double without = infer(0, false).mach().orElseThrow().value();
    FrameInference f = infer(Math.toRadians(0.4), true);
    assertEquals(without, f.mach().orElseThrow().value(), 1e-12, "the slip line fed the Mach number");
    int slip = slipIndex(f);
    WaveMatch m = f.matches().stream().filter(x -> x.observedIndex() == slip).findFirst().orElseThrow();
    assertFalse(m.usedForMach());
    for (MachEstimate e : f.estimates()) {
      assertFalse(e.observedIndices().contains(slip), "estimate " + e.from() + " uses the slip line");
    }
  }

  @Test
  void theCheckGivesTheTurnInDegreesAndSigmas() {
    double turn = Math.toRadians(0.4);
    FrameInference f = infer(turn, true);
    int slip = slipIndex(f);
    ExpectedWave theory = f.matches().stream().filter(x -> x.observedIndex() == slip).findFirst().orElseThrow().expected();
    ObservedWave o = Fixtures.along(theory, turn, SIGMA);
    WaveMatch m = f.matches().stream().filter(x -> x.observedIndex() == slip).findFirst().orElseThrow();
    DirectionCheck c = DirectionCheck.of(o, m, 0).orElseThrow();
    assertEquals(turn, c.differenceRad(), 1e-12);
    assertEquals(8.0, c.differenceSigma(), 1e-9, "0.4 deg over 0.05 deg");
    assertEquals(theory.directionRad(), c.predictedRad(), 1e-12);
    assertEquals(c.predictedRad() + turn, c.measuredRad(), 1e-12);
    // the reflected wave of a same-family intersection is weak (a fraction of a degree of turn):
    // the slip line runs close to the flow behind the second ramp, 16 deg from the wall
    assertEquals(16.0, Math.toDegrees(c.predictedRad()), 0.5, "theory direction");
    assertTrue(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.LARGE_RESIDUAL && w.message().contains("slip line")),
        f.warnings().toString());
  }

  @Test
  void aShockHasNoDirectionCheck() {
    FrameInference f = infer(0, true);
    WaveMatch shock = f.matches().stream().filter(x -> x.expected().kind() == WaveKind.OBLIQUE_SHOCK).findFirst().orElseThrow();
    assertTrue(DirectionCheck.of(Fixtures.along(shock.expected(), 0, SIGMA), shock, 0).isEmpty());
  }
}
