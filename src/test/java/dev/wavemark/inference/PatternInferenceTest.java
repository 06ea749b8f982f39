package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WavePattern;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every shape through the production pattern: observed lines laid exactly on theory's waves at a
 * known Mach number recover it from a nominal Mach number 10% off. The identity is exact up to the
 * solvers' tolerances (1e-10 in M), so the test tolerance is 1e-6.
 */
class PatternInferenceTest {
  private static final double EXACT_TOL = 1e-6;
  private static final BodyShape.Wall LOWER_WALL = new BodyShape.Wall(new Point2(0, 600), new Point2(1000, 600), Side.LOWER);

  static Stream<Arguments> shapes() {
    Point2 le = Fixtures.LE;
    return Stream.of(
        Arguments.of(new BodyShape.Wedge(Math.toRadians(10), 0, le, 300), 2.0),
        Arguments.of(new BodyShape.Wedge(Math.toRadians(8), Math.toRadians(2), le, 300), 3.0),
        Arguments.of(new BodyShape.Diamond(Math.toRadians(6), 0, le, 300), 2.2),
        Arguments.of(new BodyShape.FlatPlate(Math.toRadians(5), le, 300), 2.5),
        Arguments.of(new BodyShape.Ramp(Math.toRadians(12), new Point2(400, 600), LOWER_WALL), 2.5),
        Arguments.of(new BodyShape.ExpansionCorner(Math.toRadians(10), new Point2(400, 600), LOWER_WALL), 2.0),
        Arguments.of(new BodyShape.DoubleRamp(Math.toRadians(8), new Point2(300, 600), Math.toRadians(8), new Point2(450, 600), LOWER_WALL), 3.0),
        Arguments.of(new BodyShape.ShockGenerator(Math.toRadians(8), new Point2(150, 250), LOWER_WALL), 2.5),
        Arguments.of(new BodyShape.Freestream(Optional.of(LOWER_WALL)), 1.8),
        Arguments.of(new BodyShape.Cone(Math.toRadians(10), 0, le, 300), 2.0),
        Arguments.of(new BodyShape.TwinGenerators(new Point2(150, 150), new Point2(150, 618), Math.toRadians(7), Math.toRadians(7)), 2.5));
  }

  @ParameterizedTest(name = "{0} at M={1}")
  @MethodSource("shapes")
  void exactWavesRecoverTheMach(BodyShape shape, double truth) {
    for (double factor : new double[] {0.9, 1.1}) {
      RunSpec run = Fixtures.run(shape, 0, Math.toRadians(0.05), Math.toRadians(0.05), Fixtures.nominal(truth * factor));
      List<ExpectedWave> exp = WavePattern.of(shape, truth, 1.4, 0, Fixtures.W, Fixtures.H);
      List<ObservedWave> obs = new ArrayList<>();
      for (ExpectedWave e : exp) {
        obs.add(Fixtures.along(e, 0, Math.toRadians(0.05)));
      }
      FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H);
      String msg = shape.contractName() + " nominal x" + factor + ": " + f.estimates() + " " + f.warnings();
      assertEquals(truth, f.mach().orElseThrow(() -> new AssertionError(msg)).value(), EXACT_TOL, msg);
      assertTrue(f.consistency().consistent(), msg);
      assertEquals(f.mach().get().uncertainty(), BudgetLine.total(f.budget()), 1e-12, msg);
    }
  }

  @org.junit.jupiter.api.Test
  void oneShiftedWaveFiresTheConsistencyWarningAndIsNamed() {
    BodyShape shape = new BodyShape.Diamond(Math.toRadians(6), 0, Fixtures.LE, 300);
    RunSpec run = Fixtures.run(shape, 0, Math.toRadians(0.02), Math.toRadians(0.02), Fixtures.nominal(2.2));
    List<ExpectedWave> exp = WavePattern.of(shape, 2.2, 1.4, 0, Fixtures.W, Fixtures.H);
    List<ObservedWave> obs = new ArrayList<>();
    for (ExpectedWave e : exp) {
      // The lower trailing-edge shock is 0.5° (ten standard uncertainties) off.
      boolean shifted = e.side() == Side.LOWER && e.feature() == dev.wavemark.core.model.Feature.TRAILING_EDGE;
      obs.add(Fixtures.along(e, shifted ? Math.toRadians(0.5) : 0, Math.toRadians(0.05)));
    }
    FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H);
    assertTrue(!f.consistency().consistent(), f.consistency().toString());
    assertEquals(List.of("oblique-shock lower trailing-edge"), f.consistency().disagreeing());
    assertTrue(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.INCONSISTENT_ESTIMATES
        && w.message().contains("oblique-shock lower trailing-edge")), f.warnings().toString());
  }
}
