package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Tunnel;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * End to end on a wedge whose shocks are built by hand from theta-beta-M. Reference: NACA Report
 * 1135, Chart 2 (from memory): at M = 2, a 10° deflection makes a weak shock at 39.31°.
 */
class WedgeInferenceTest {
  private static final BodyShape.Wedge WEDGE = new BodyShape.Wedge(Math.toRadians(10), 0, Fixtures.LE, 400);
  /** The printed 4 digits of the chart-read shock angle, ±0.005°, map to ±0.0006 in Mach at M = 2. */
  private static final double CHART_TOL = 6e-4;

  private static List<ObservedWave> exact(RunSpec run, double m) {
    List<ObservedWave> obs = new ArrayList<>();
    for (ExpectedWave e : Fixtures.WEDGE_SHOCKS.of(run.model(), m, 1.4, run.calibration().flowDirectionRad(), Fixtures.W, Fixtures.H)) {
      obs.add(Fixtures.along(e, 0, Math.toRadians(0.05)));
    }
    return obs;
  }

  @Test
  void publishedShockAngleGivesMachTwo() {
    RunSpec run = Fixtures.run(WEDGE, 0, 0, 0, Fixtures.nominal(2.0));
    List<ObservedWave> obs = exact(run, 2.0);
    // Replace the theory directions by the chart's 39.31°.
    List<ObservedWave> chart = List.of(
        rotateTo(obs.get(0), Math.toRadians(39.31)), rotateTo(obs.get(1), Math.toRadians(-39.31)));
    FrameInference f = Inference.ofFrame(run, chart, Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    assertEquals(2.0, f.mach().orElseThrow().value(), CHART_TOL, "M from beta = 39.31°, theta = 10°");
  }

  @Test
  void recoversMachWhenTheNominalIsTenPercentOff() {
    for (double truth : new double[] {1.6, 2.0, 2.5, 3.5}) {
      for (double nominalFactor : new double[] {0.9, 1.1}) {
        RunSpec run = Fixtures.run(WEDGE, Math.toRadians(3), 0, 0, Fixtures.nominal(truth * nominalFactor));
        FrameInference f = Inference.ofFrame(run, exact(run, truth), Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
        assertEquals(truth, f.mach().orElseThrow().value(), 1e-7, "truth " + truth + " nominal x" + nominalFactor + " " + f.warnings());
        assertEquals(2, f.estimates().size());
        assertTrue(f.warnings().isEmpty(), f.warnings().toString());
      }
    }
  }

  @Test
  void findsMachWithoutANominalByScanning() {
    RunSpec run = Fixtures.run(WEDGE, 0, 0, 0, Tunnel.NONE);
    FrameInference f = Inference.ofFrame(run, exact(run, 2.8), Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    assertEquals(2.8, f.mach().orElseThrow().value(), 1e-7);
  }

  @Test
  void budgetAddsInQuadratureToTheReportedUncertainty() {
    RunSpec run = Fixtures.run(new BodyShape.Wedge(Math.toRadians(12), Math.toRadians(2), Fixtures.LE, 400),
        Math.toRadians(1), Math.toRadians(0.05), Math.toRadians(0.05), Fixtures.nominal(2.2));
    FrameInference f = Inference.ofFrame(run, exact(run, 2.2), Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    double u = f.mach().orElseThrow().uncertainty();
    assertEquals(u, BudgetLine.total(f.budget()), 1e-12 * u);
    for (BudgetLine l : f.budget()) {
      assertTrue(l.machContribution() > 0, l.toString());
    }
    // With incidence the two shocks have different sensitivities; the flow direction enters them
    // with opposite signs and partly cancels, so its line is smaller than in either estimate alone.
    double flow = f.budget().stream().filter(l -> l.source() == BudgetLine.Source.FLOW_DIRECTION).findFirst().orElseThrow().machContribution();
    double single = f.estimates().get(0).mach().uncertainty();
    assertTrue(flow < single, "flow line " + flow + " vs single estimate " + single);
  }

  /**
   * The fan boundaries of a frame share one locator error (measured in the detector benchmark):
   * with the wedge's shoulder fans among the waves the budget carries a fan-locator line, common
   * to them, and without fans it has none. Waves here lie exactly on theory's (production
   * pattern, M 2.5), so the Mach number is the true one either way.
   */
  @Test
  void fanBoundariesShareOneLocatorLineInTheBudget() {
    RunSpec run = Fixtures.run(new BodyShape.Wedge(Math.toRadians(10), 0, Fixtures.LE, 200), 0, Math.toRadians(0.03),
        Math.toRadians(0.05), Fixtures.nominal(2.5));
    List<ObservedWave> all = new ArrayList<>();
    List<ObservedWave> shocks = new ArrayList<>();
    for (ExpectedWave e : dev.wavemark.core.model.WavePattern.of(run.model(), 2.5, 1.4, 0, Fixtures.W, Fixtures.H)) {
      boolean fan = e.kind() == WaveKind.EXPANSION_HEAD || e.kind() == WaveKind.EXPANSION_TAIL;
      ObservedWave o = Fixtures.along(e, 0, Math.toRadians(fan ? 0.1 : 0.05));
      all.add(o);
      if (!fan) {
        shocks.add(o);
      }
    }
    assertTrue(all.size() > shocks.size(), "the wedge's pattern has shoulder fans");
    FrameInference withFans = Inference.ofFrame(run, all, Fixtures.W, Fixtures.H);
    FrameInference without = Inference.ofFrame(run, shocks, Fixtures.W, Fixtures.H);
    assertEquals(2.5, withFans.mach().orElseThrow().value(), 1e-6);
    BudgetLine fanLine = withFans.budget().stream().filter(l -> l.source() == BudgetLine.Source.FAN_LOCATOR).findFirst().orElseThrow();
    assertEquals(0.06, Math.toDegrees(fanLine.inputUncertainty()), 1e-12);
    assertTrue(fanLine.machContribution() > 0, fanLine.toString());
    assertTrue(without.budget().stream().noneMatch(l -> l.source() == BudgetLine.Source.FAN_LOCATOR), without.budget().toString());
    assertEquals(withFans.mach().orElseThrow().uncertainty(), BudgetLine.total(withFans.budget()), 1e-12);
  }

  /**
   * Seeded noise of known sigma on the angles and on the flow direction: the reported standard
   * uncertainty covers the truth in about 68.3% of trials (binomial standard deviation 2.3% for
   * 400 trials; the band is ±3.5 of them), and twice it in about 95.4%.
   */
  @Test
  void reportedUncertaintyCoversTheTruthAtTheExpectedRate() {
    double sigma = Math.toRadians(0.05);
    double flowSigma = Math.toRadians(0.03);
    Random rnd = new Random(20261201L);
    int trials = 400;
    int in1 = 0;
    int in2 = 0;
    double truth = 2.3;
    for (int t = 0; t < trials; t++) {
      double flowError = flowSigma * rnd.nextGaussian();
      RunSpec run = Fixtures.run(WEDGE, 0, flowSigma, 0, Fixtures.nominal(2.2));
      List<ObservedWave> obs = new ArrayList<>();
      for (ExpectedWave e : Fixtures.WEDGE_SHOCKS.of(WEDGE, truth, 1.4, flowError, Fixtures.W, Fixtures.H)) {
        obs.add(Fixtures.along(e, sigma * rnd.nextGaussian(), sigma));
      }
      FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
      double m = f.mach().orElseThrow().value();
      double u = f.mach().orElseThrow().uncertainty();
      in1 += Math.abs(m - truth) <= u ? 1 : 0;
      in2 += Math.abs(m - truth) <= 2 * u ? 1 : 0;
    }
    double p1 = in1 / (double) trials;
    double p2 = in2 / (double) trials;
    assertTrue(p1 > 0.683 - 0.08 && p1 < 0.683 + 0.08, "1-sigma coverage " + p1);
    assertTrue(p2 > 0.954 - 0.04, "2-sigma coverage " + p2);
  }

  @Test
  void aMissingExpectedWaveIsAWarningNotAnException() {
    RunSpec run = Fixtures.run(WEDGE, 0, 0, 0, Fixtures.nominal(2.0));
    List<ObservedWave> obs = exact(run, 2.0).subList(0, 1);
    FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    assertEquals(2.0, f.mach().orElseThrow().value(), 1e-7);
    assertTrue(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.MISSING_WAVE), f.warnings().toString());
    assertTrue(f.findings().stream().anyMatch(x -> x instanceof Finding.MissingWave));
  }

  @Test
  void noWaveAtAllGivesNoMachAndAWarning() {
    RunSpec run = Fixtures.run(WEDGE, 0, 0, 0, Fixtures.nominal(2.0));
    FrameInference f = Inference.ofFrame(run, List.of(), Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    assertFalse(f.mach().isPresent());
    assertTrue(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.NO_MACH_ESTIMATE));
    assertEquals(2, f.predictedAtNominal().size());
  }

  @Test
  void curvedWaveIsFlagged() {
    RunSpec run = Fixtures.run(WEDGE, 0, 0, 0, Fixtures.nominal(2.0));
    List<ObservedWave> obs = new ArrayList<>(exact(run, 2.0));
    obs.set(1, Fixtures.curved(obs.get(1)));
    FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    assertTrue(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.CURVED_WAVE), f.warnings().toString());
  }

  @Test
  void detachedWhenTheDeflectionExceedsThetaMax() {
    // thetaMax(M = 2) = 22.97° (NACA Report 1135, Chart 2, from memory).
    BodyShape.Wedge steep = new BodyShape.Wedge(Math.toRadians(23.2), 0, Fixtures.LE, 400);
    List<Finding> f = FrameAnalysis.detached(steep, 2.0, "nominal", 1.4);
    assertEquals(1, f.size());
    Finding.Detached d = (Finding.Detached) f.get(0);
    assertEquals(22.97, Math.toDegrees(d.maxDeflectionRad()), 0.01);
    assertTrue(FrameAnalysis.detached(new BodyShape.Wedge(Math.toRadians(22.7), 0, Fixtures.LE, 400), 2.0, "nominal", 1.4).isEmpty());
  }

  @org.junit.jupiter.api.Test
  void coneDetachesBeyondTheConicalLimit() {
    // The largest cone half-angle with an attached shock at M = 2 is about 40.5°
    // (NACA Report 1135, Chart 5, from memory); read to about 0.3°.
    List<Finding> f = FrameAnalysis.detached(new BodyShape.Cone(Math.toRadians(41.5), 0, Fixtures.LE, 300), 2.0, "nominal", 1.4);
    assertEquals(1, f.size());
    assertEquals(40.5, Math.toDegrees(((Finding.Detached) f.get(0)).maxDeflectionRad()), 0.3);
    assertTrue(FrameAnalysis.detached(new BodyShape.Cone(Math.toRadians(39.5), 0, Fixtures.LE, 300), 2.0, "nominal", 1.4).isEmpty());
  }

  private static ObservedWave rotateTo(ObservedWave o, double dir) {
    var l = o.line();
    return new ObservedWave(o.kind(), o.side(), new dev.wavemark.core.geom.FittedLine(l.centroid(), dir,
        l.directionUncertaintyRad(), l.startPx(), l.endPx(), l.support(), l.rmsResidualPx(), false), o.contrast(), o.widthPx(), o.feature());
  }
}
