package dev.wavemark.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.PrandtlMeyer;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.geom.Point2;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The expected pattern against the physics core and against printed values. */
class WavePatternTest {
  private static final double G = 1.4;
  /** NACA Report 1135 chart 2 and common textbook tables give beta to 0.01 degree (from memory). */
  private static final double TABLE_DEG = 0.01;

  private static ExpectedWave find(List<ExpectedWave> ws, String label) {
    return ws.stream().filter(w -> w.label().equals(label)).findFirst()
        .orElseThrow(() -> new AssertionError("no wave '" + label + "' in " + ws.stream().map(ExpectedWave::label).toList()));
  }

  @Test
  void wedgeAtMachTwoHasTheTabulatedShockAngle() {
    BodyShape w = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200, 384), 300);
    List<ExpectedWave> ws = WavePattern.of(w, 2.0, G, 0, 1024, 768);
    ExpectedWave up = find(ws, "upper leading-edge shock");
    ExpectedWave lo = find(ws, "lower leading-edge shock");
    // M = 2, theta = 10 deg: beta = 39.31 deg (oblique-shock tables, e.g. Anderson, Modern Compressible Flow, from memory).
    assertEquals(39.31, Math.toDegrees(up.angleToFlowRad()), TABLE_DEG);
    assertEquals(up.angleToFlowRad(), ObliqueShock.beta(2.0, Math.toRadians(10), ShockBranch.WEAK, G), 1e-12);
    assertEquals(up.angleToFlowRad(), up.directionRad(), 1e-12, "upper shock points up-downstream");
    assertEquals(-lo.angleToFlowRad(), lo.directionRad(), 1e-12);
    assertEquals(Side.UPPER, up.side());
    assertTrue(up.endPx().y() < up.startPx().y(), "upper shock rises on screen");
  }

  @Test
  void shoulderFanBoundariesAreMachLinesOfTheFlowsEitherSide() {
    double theta = Math.toRadians(10);
    BodyShape w = new BodyShape.Wedge(theta, 0, new Point2(100, 384), 250);
    List<ExpectedWave> ws = WavePattern.of(w, 2.5, G, 0, 1024, 768);
    ObliqueShock.Solution s = ObliqueShock.fromDeflection(2.5, theta, ShockBranch.WEAK, G);
    double m3 = PrandtlMeyer.inverse(PrandtlMeyer.nu(s.m2(), G) + theta, G);
    ExpectedWave head = find(ws, "upper shoulder expansion head");
    ExpectedWave tail = find(ws, "upper shoulder expansion tail");
    assertEquals(MachAngle.of(s.m2()), head.angleToFlowRad(), 1e-12);
    assertEquals(theta, head.localFlowDirectionRad(), 1e-12);
    assertEquals(MachAngle.of(m3), tail.angleToFlowRad(), 1e-12);
    assertEquals(0.0, tail.localFlowDirectionRad(), 1e-12);
  }

  @Test
  void regularReflectionTurnsTheFlowBackParallelToTheWall() {
    BodyShape.Wall wall = new BodyShape.Wall(new Point2(0, 700), new Point2(1000, 700), Side.LOWER);
    BodyShape g = new BodyShape.ShockGenerator(Math.toRadians(8), new Point2(80, 420), wall);
    WavePattern.Solved s = WavePattern.solve(g, 2.5, G, 0, 1024, 768);
    assertEquals("regular", s.reflection());
    ExpectedWave inc = find(s.expectedWaves(), "incident shock");
    ExpectedWave ref = find(s.expectedWaves(), "reflected shock");
    assertEquals(700, inc.endPx().y(), 1e-9, "incident shock ends on the wall");
    assertEquals(inc.endPx().x(), ref.startPx().x(), 1e-9);
    ObliqueShock.Solution first = ObliqueShock.fromDeflection(2.5, Math.toRadians(8), ShockBranch.WEAK, G);
    assertEquals(ObliqueShock.beta(first.m2(), Math.toRadians(8), ShockBranch.WEAK, G), ref.angleToFlowRad(), 1e-12);
    assertEquals(Math.toRadians(-8), ref.localFlowDirectionRad(), 1e-12);
  }

  @Test
  void freestreamMachWavesLieAtTheMachAngle() {
    List<ExpectedWave> ws = WavePattern.of(new BodyShape.Freestream(Optional.empty()), 2.0, G, 0, 800, 600);
    assertTrue(ws.size() >= 4);
    for (ExpectedWave w : ws) {
      assertEquals(WaveKind.MACH_WAVE, w.kind());
      assertEquals(30.0, Math.toDegrees(w.angleToFlowRad()), 1e-9, "M = 2: mu = 30 deg exactly");
    }
  }

  @Test
  void tooSteepAWedgeDetaches() {
    BodyShape w = new BodyShape.Wedge(Math.toRadians(25), 0, new Point2(200, 384), 300);
    WavemarkException e = assertThrows(WavemarkException.class, () -> WavePattern.of(w, 2.0, G, 0, 1024, 768));
    assertEquals(Problem.SHOCK_DETACHED, e.problem());
  }

  @Test
  void rolledPictureRotatesEveryWave() {
    BodyShape w = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(300, 384), 300);
    double roll = Math.toRadians(1.5);
    ExpectedWave a = find(WavePattern.of(w, 2.0, G, 0, 1024, 768), "lower leading-edge shock");
    ExpectedWave b = find(WavePattern.of(w, 2.0, G, roll, 1024, 768), "lower leading-edge shock");
    assertEquals(a.angleToFlowRad(), b.angleToFlowRad(), 1e-12);
    assertEquals(a.directionRad() + roll, b.directionRad(), 1e-12);
  }

  @Test
  void strongGeneratorMakesAMachReflectionWithTheTriplePointSolution() {
    BodyShape.Wall wall = new BodyShape.Wall(new Point2(0, 370), new Point2(640, 370), Side.LOWER);
    BodyShape g = new BodyShape.ShockGenerator(Math.toRadians(14), new Point2(150, 140), wall);
    WavePattern.Solved s = WavePattern.solve(g, 2.0, G, 0, 640, 480);
    assertEquals("mach", s.reflection());
    dev.wavemark.core.gas.TriplePoint tp = dev.wavemark.core.gas.ShockReflection.machReflection(2.0, Math.toRadians(14), G);
    ExpectedWave stem = find(s.expectedWaves(), "Mach stem");
    assertEquals(tp.stemAngleToFlowRad(), stem.angleToFlowRad(), 1e-12);
    assertEquals(370, stem.endPx().y(), 1e-6, "the stem stands on the wall");
    assertEquals(tp.reflectedAngleToFlowRad(), find(s.expectedWaves(), "reflected shock").angleToFlowRad(), 1e-12);
    assertTrue(s.notes().stream().anyMatch(n -> n.contains("approximate")));
  }

  @Test
  void crossingShocksGoOnAsTransmittedShocks() {
    BodyShape t = new BodyShape.TwinGenerators(new Point2(150, 135), new Point2(150, 345), Math.toRadians(8), Math.toRadians(6));
    List<ExpectedWave> ws = WavePattern.of(t, 2.5, G, 0, 640, 480);
    dev.wavemark.core.gas.ShockIntersection.Opposite o =
        dev.wavemark.core.gas.ShockIntersection.opposite(2.5, Math.toRadians(8), Math.toRadians(6), G);
    assertEquals(o.upperTransmitted().headAngleRad(), find(ws, "upper transmitted shock").angleToFlowRad(), 1e-12);
    assertEquals(o.lowerTransmittedDirectionRad(), find(ws, "lower transmitted shock").directionRad(), 1e-12);
    assertEquals(WaveKind.SLIP_LINE, find(ws, "slip line").kind());
  }

  @Test
  void doubleRampShocksMergeWithTheSameFamilySolution() {
    BodyShape.Wall wall = new BodyShape.Wall(new Point2(0, 330), new Point2(640, 330), Side.LOWER);
    Point2 c2 = new Point2(170 + 110 * Math.cos(Math.toRadians(8)), 330 - 110 * Math.sin(Math.toRadians(8)));
    BodyShape d = new BodyShape.DoubleRamp(Math.toRadians(8), new Point2(170, 330), Math.toRadians(8), c2, wall);
    List<ExpectedWave> ws = WavePattern.of(d, 3.0, G, 0, 640, 480);
    dev.wavemark.core.gas.ShockIntersection.SameFamily sf =
        dev.wavemark.core.gas.ShockIntersection.sameFamily(3.0, Math.toRadians(8), Math.toRadians(8), G);
    assertEquals(sf.mergedDirectionRad(), find(ws, "merged shock").directionRad(), 1e-12);
    assertEquals(find(ws, "first ramp shock").endPx().x(), find(ws, "merged shock").startPx().x(), 1e-9);
  }

  @Test
  void coneShockIsTheTaylorMaccollShock() {
    BodyShape c = new BodyShape.Cone(Math.toRadians(15), 0, new Point2(150, 240), 150);
    List<ExpectedWave> ws = WavePattern.of(c, 2.5, G, 0, 640, 480);
    double beta = dev.wavemark.core.gas.ConicalFlow.of(G).shockAngle(2.5, Math.toRadians(15));
    assertTrue(beta > Math.toRadians(15) && beta < ObliqueShock.beta(2.5, Math.toRadians(15), ShockBranch.WEAK, G),
        "a cone's shock lies between its surface and the shock of a wedge of the same angle (fact of the trade)");
    assertEquals(beta, find(ws, "upper conical shock").angleToFlowRad(), 1e-12);
    assertEquals(-beta, find(ws, "lower conical shock").directionRad(), 1e-12);
  }

  @Test
  void diamondTrailingEdgeWavesMatchShockExpansionTheory() {
    double h = Math.toRadians(7);
    double a = Math.toRadians(4);
    BodyShape d = new BodyShape.Diamond(h, a, new Point2(150, 240), 230);
    List<ExpectedWave> ws = WavePattern.of(d, 2.5, G, 0, 640, 480);
    dev.wavemark.core.gas.ShockExpansion.Sharp te = (dev.wavemark.core.gas.ShockExpansion.Sharp)
        dev.wavemark.core.gas.ShockExpansion.solve(dev.wavemark.core.gas.Profile.diamond(h, 230), 2.5, a, G).trailingEdge();
    assertEquals(te.slipLine().directionRad(), find(ws, "trailing-edge slip line").directionRad(), 1e-9);
    assertEquals(te.upperWave().turn().headAngleRad(), find(ws, "upper trailing-edge shock").angleToFlowRad(), 1e-7);
  }
}
