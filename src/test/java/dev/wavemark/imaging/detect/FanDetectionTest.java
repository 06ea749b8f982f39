package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.PrandtlMeyer;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

/**
 * Expansion-fan heads and tails on pictures freshly rendered by the project renderer, against
 * its truth: a centred Prandtl-Meyer fan whose head leaves at the Mach angle of the flow ahead,
 * asin(1/M), and whose tail leaves at the Mach angle of the flow turned by the corner (core.gas
 * PrandtlMeyer, itself checked against NACA Report 1135's table), the renderer painting the
 * isentropic density of each ray. Each boundary must be found with its feature and side and lie
 * within three of its reported standard uncertainties of the truth.
 */
class FanDetectionTest {
  private static final BodyShape.Wall FLOOR = new BodyShape.Wall(new Point2(0, 640), new Point2(1024, 640), Side.LOWER);
  /** Errors allowed, in reported standard uncertainties (a 3-sigma bound). */
  private static final double SIGMAS = 3;

  private static List<ObservedWave> detect(RenderedCase c) {
    return WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), c.optics(), c.shape(), c.flowRad()));
  }

  private static ObservedWave boundary(List<ObservedWave> ws, ExpectedWave t) {
    return ws.stream()
        .filter(w -> w.kind() == t.kind() && w.feature().orElse(null) == t.feature() && w.side().orElse(null) == t.side())
        .findFirst().orElseThrow(() -> new AssertionError("no " + t.label()));
  }

  private static void assertFans(RenderedCase c, int expected) {
    List<ObservedWave> ws = detect(c);
    int n = 0;
    for (ExpectedWave t : c.truth()) {
      if (t.kind() != WaveKind.EXPANSION_HEAD && t.kind() != WaveKind.EXPANSION_TAIL) {
        continue;
      }
      ObservedWave w = boundary(ws, t);
      double err = Math.abs(DetectorBenchmark.lineDiff(w.line().directionRad(), t.directionRad()));
      double sigma = w.line().directionUncertaintyRad();
      assertTrue(err <= SIGMAS * sigma, String.format("%s in %s: error %.4f deg, sigma %.4f deg", t.label(), c.optics(),
          Math.toDegrees(err), Math.toDegrees(sigma)));
      n++;
    }
    assertEquals(expected, n, "fan boundaries in the truth");
  }

  @Test
  void expansionCornerAtMach2HeadAndTailFromTheMachAngles() {
    double turn = Math.toRadians(10);
    BodyShape corner = new BodyShape.ExpansionCorner(turn, new Point2(400.6, 640), FLOOR);
    RenderedCase c = RenderedCase.of("corner", corner, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.7, 5, 0, 1024, 768, 7);
    // the truth itself: head at asin(1/2) = 30 deg exactly; tail at the Mach angle where
    // nu(M2) = nu(2) + 10 deg, less the 10 deg turn
    ExpectedWave head = c.truth().stream().filter(t -> t.kind() == WaveKind.EXPANSION_HEAD).findFirst().orElseThrow();
    ExpectedWave tail = c.truth().stream().filter(t -> t.kind() == WaveKind.EXPANSION_TAIL).findFirst().orElseThrow();
    assertEquals(30.0, Math.toDegrees(head.directionRad()), 1e-9);
    double nu2 = PrandtlMeyer.nu(2.0, 1.4) + turn;
    double m2 = new BrentSolver(1e-12).solve(200, m -> PrandtlMeyer.nu(m, 1.4) - nu2, 2.0, 4.0);
    assertEquals(Math.toDegrees(MachAngle.of(m2) - turn), Math.toDegrees(tail.directionRad()), 1e-3);
    // a picture whose only wave is the fan, at SNR 5 across it: the detector gave "no wave found"
    assertFans(c, 2);
    assertFans(RenderedCase.of("corner", corner, 2.0, Optics.SCHLIEREN_HORIZONTAL_EDGE, -1, 1.7, 5, 0, 1024, 768, 7), 2);
  }

  @Test
  void wedgeShoulderFansAcrossTheLeadingEdgeShocks() {
    // the shoulder fans' rays cross the leading-edge shocks at a few degrees
    BodyShape wedge = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200.4, 384.3), 300);
    assertFans(RenderedCase.of("wedge", wedge, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, Double.POSITIVE_INFINITY, 0, 1024, 768, 7), 4);
  }

  @Test
  void flatPlateEdgeFans() {
    BodyShape plate = new BodyShape.FlatPlate(Math.toRadians(5), new Point2(250.7, 384.1), 400);
    assertFans(RenderedCase.of("plate", plate, 2.25, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.4, 10, 0, 1024, 768, 7), 4);
  }

  @Test
  void generatorShoulderFromTheSilhouetteAndItsFan() {
    BodyShape.ShockGenerator g = new BodyShape.ShockGenerator(Math.toRadians(8), new Point2(100.5, 150.2), FLOOR);
    for (Optics o : new Optics[] {Optics.SCHLIEREN_HORIZONTAL_EDGE, Optics.SHADOWGRAPH}) {
      RenderedCase c = RenderedCase.of("generator", g, 2.0, o, 1, 1.2, 20, 0, 1024, 768, 5);
      Raster full = Raster.of(c.frame(), FlowRegion.of(c.mask())).eroded(WaveDetector.EDGE_MARGIN_PX);
      WaveDetector.Context ctx = new WaveDetector.Context(full, full.reduced(2), Frames.noise(full), o, null, 0, false);
      Point2 shoulder = Secondary.shoulder(g, ctx);
      assertNotNull(shoulder, "shoulder in " + o);
      ExpectedWave head = c.truth().stream().filter(t -> t.feature() == Feature.SHOULDER).findFirst().orElseThrow();
      // the silhouette's edge is where the blurred reference crosses the mask threshold: a pixel or two
      assertEquals(0, shoulder.distanceTo(head.startPx()), 2.0, "shoulder in " + o);
      assertFans(c, 2);
    }
  }

  @Test
  void noShoulderWithoutASilhouette() {
    BodyShape.ShockGenerator g = new BodyShape.ShockGenerator(Math.toRadians(8), new Point2(100.5, 150.2), FLOOR);
    RenderedCase c = RenderedCase.of("generator", g, 2.0, Optics.SCHLIEREN_HORIZONTAL_EDGE, 1, 1.2, 20, 0, 1024, 768, 5);
    // a flow region that takes the whole picture as flow shows no generator to walk along
    boofcv.struct.image.GrayU8 all = new boofcv.struct.image.GrayU8(1024, 768);
    java.util.Arrays.fill(all.data, (byte) 1);
    Raster full = Raster.of(c.frame(), FlowRegion.of(all)).eroded(WaveDetector.EDGE_MARGIN_PX);
    WaveDetector.Context ctx = new WaveDetector.Context(full, full.reduced(2), Frames.noise(full), c.optics(), null, 0, false);
    assertEquals(null, Secondary.shoulder(g, ctx));
  }
}
