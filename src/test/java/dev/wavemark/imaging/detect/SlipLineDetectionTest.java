package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Slip lines and a double ramp's reflected wave on pictures freshly rendered by the project
 * renderer, against the renderer's truth: the slip-line directions come from the three-shock
 * solution at a triple point and from the same-family shock intersection (core.gas TriplePoint
 * and ShockIntersection, themselves checked against NACA Report 1135's oblique-shock relations),
 * the renderer drawing each as a density step smoothed by a Gaussian.
 */
class SlipLineDetectionTest {
  private static final BodyShape.Wall FLOOR = new BodyShape.Wall(new Point2(0, 640), new Point2(1024, 640), Side.LOWER);

  private static BodyShape doubleRamp(double firstDeg, double secondDeg) {
    double d1 = Math.toRadians(firstDeg);
    return new BodyShape.DoubleRamp(d1, new Point2(300.2, 640), Math.toRadians(secondDeg),
        new Point2(420.2, 640 - 120 * Math.tan(d1)), FLOOR);
  }

  private static List<ObservedWave> detect(RenderedCase c, List<ExpectedWave> hints) {
    List<ObservedWave> ws = WaveDetector.create()
        .detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), c.optics(), c.shape(), c.flowRad()).withHints(hints));
    WaveDetectorTest.dump(ws);
    return ws;
  }

  private static ExpectedWave truth(RenderedCase c, WaveKind kind) {
    return c.truth().stream().filter(e -> e.kind() == kind).findFirst().orElseThrow();
  }

  private static Optional<ObservedWave> found(List<ObservedWave> ws, WaveKind kind) {
    return ws.stream().filter(w -> w.kind() == kind).findFirst();
  }

  private static double errDeg(ObservedWave w, ExpectedWave t) {
    return Math.toDegrees(Math.abs(DetectorBenchmark.lineDiff(w.line().directionRad(), t.directionRad())));
  }

  @Test
  void machReflectionSlipLineLeavesTheTriplePoint() {
    BodyShape g = new BodyShape.ShockGenerator(Math.toRadians(14), new Point2(100.5, 150.2), FLOOR);
    for (Optics o : new Optics[] {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SHADOWGRAPH}) {
      RenderedCase c = RenderedCase.of("generator", g, 2.0, o, 1, 1.2, 20, 0, 1024, 768, 5);
      ObservedWave s = found(detect(c, List.of()), WaveKind.SLIP_LINE).orElseThrow(() -> new AssertionError("no slip line in " + o));
      assertEquals(Optional.of(Feature.TRIPLE_POINT), s.feature());
      double err = errDeg(s, truth(c, WaveKind.SLIP_LINE));
      System.out.printf("mach reflection %s: slip-line error %.4f deg (sigma %.4f)%n", o, err, Math.toDegrees(s.line().directionUncertaintyRad()));
      assertTrue(err < 0.1, "slip line off by " + err + " deg in " + o);
    }
  }

  @Test
  void doubleRampSlipLineLeavesWhereTheShocksMerge() {
    for (Optics o : new Optics[] {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SHADOWGRAPH}) {
      RenderedCase c = RenderedCase.of("double-ramp", doubleRamp(8, 8), 2.2, o, 1, 1.2, 20, 0, 1024, 768, 5);
      ObservedWave s = found(detect(c, List.of()), WaveKind.SLIP_LINE).orElseThrow(() -> new AssertionError("no slip line in " + o));
      assertEquals(Optional.of(Feature.INTERSECTION), s.feature());
      double err = errDeg(s, truth(c, WaveKind.SLIP_LINE));
      System.out.printf("double ramp %s: slip-line error %.4f deg (sigma %.4f)%n", o, err, Math.toDegrees(s.line().directionUncertaintyRad()));
      assertTrue(err < 0.1, "slip line off by " + err + " deg in " + o);
    }
  }

  @Test
  void aHintFourDegreesOffStillGivesThePicturesSlipLine() {
    RenderedCase c = RenderedCase.of("double-ramp", doubleRamp(8, 8), 2.2, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 20, 0, 1024, 768, 6);
    ExpectedWave t = truth(c, WaveKind.SLIP_LINE);
    ExpectedWave off = new ExpectedWave(t.kind(), t.side(), t.angleToFlowRad(), t.localFlowDirectionRad(),
        t.directionRad() + Math.toRadians(4), t.startPx(), t.endPx(), t.feature(), t.label());
    ObservedWave s = found(detect(c, List.of(off)), WaveKind.SLIP_LINE).orElseThrow();
    assertTrue(errDeg(s, t) < 0.1, "the hint, not the picture, was measured: off by " + errDeg(s, t) + " deg");
  }

  @Test
  void noSlipLineWhereThePictureHasNone() {
    // equal generators: by symmetry the two streams behind the crossing have the same density,
    // so the renderer draws no slip line (the truth lists it with a zero density step)
    BodyShape twins = new BodyShape.TwinGenerators(new Point2(100.5, 150.2), new Point2(100.5, 620.7), Math.toRadians(8), Math.toRadians(8));
    for (double snr : new double[] {Double.POSITIVE_INFINITY, 20, 5}) {
      for (Optics o : new Optics[] {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SHADOWGRAPH}) {
        RenderedCase c = RenderedCase.of("twins", twins, 2.2, o, 1, 1.2, snr, 0, 1024, 768, 7);
        assertTrue(found(detect(c, c.truth()), WaveKind.SLIP_LINE).isEmpty(), "a slip line where none is drawn, " + o + " SNR " + snr);
      }
    }
  }

  @Test
  void doubleRampReflectedShockIsFoundWhenThePictureShowsIt() {
    // M 2.2, 10 + 12 deg: the reflected wave is a weak shock (density step 0.006 of the
    // freestream's, against 0.49 for the first ramp shock); noiseless picture
    RenderedCase c = RenderedCase.of("double-ramp", doubleRamp(10, 12), 2.2, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.0,
        Double.POSITIVE_INFINITY, 0, 1024, 768, 8);
    ObservedWave r = found(detect(c, List.of()), WaveKind.REFLECTED_SHOCK).orElseThrow(() -> new AssertionError("no reflected shock"));
    assertEquals(Optional.of(Feature.INTERSECTION), r.feature());
    double err = errDeg(r, truth(c, WaveKind.REFLECTED_SHOCK));
    System.out.printf("double ramp reflected shock error %.4f deg (sigma %.4f)%n", err, Math.toDegrees(r.line().directionUncertaintyRad()));
    assertTrue(err < 0.3, "reflected shock off by " + err + " deg");
  }

  @Test
  void doubleRampReflectedExpansionIsNotReportedAsAShock() {
    // M 3, 10 + 12 deg: theory makes the reflected wave an expansion
    RenderedCase c = RenderedCase.of("double-ramp", doubleRamp(10, 12), 3.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.0, 20, 0, 1024, 768, 9);
    assertTrue(c.truth().stream().anyMatch(e -> e.kind() == WaveKind.EXPANSION_HEAD && e.feature() == Feature.INTERSECTION));
    assertTrue(found(detect(c, c.truth()), WaveKind.REFLECTED_SHOCK).isEmpty());
  }

  @Test
  void theReflectedWavesSignTellsAShockFromAnExpansionWithoutTheory() {
    // 10 + 12 deg ramps: the reflected wave is a weak shock at M 2.2 and a weak expansion at M 3
    // (the same-family shock intersection, core.gas ShockIntersection). No hints: the sign of the
    // line against the first ramp shock's decides, whichever side the knife edge is on.
    Object[][] optics = {{Optics.SCHLIEREN_VERTICAL_EDGE, 1}, {Optics.SCHLIEREN_HORIZONTAL_EDGE, -1}, {Optics.SHADOWGRAPH, 1}};
    for (Object[] oe : optics) {
      Optics o = (Optics) oe[0];
      int edge = (Integer) oe[1];
      for (double mach : new double[] {2.2, 3.0}) {
        RenderedCase c = RenderedCase.of("double-ramp", doubleRamp(10, 12), mach, o, edge, 1.0, Double.POSITIVE_INFINITY, 0, 1024, 768, 10);
        boolean expands = c.truth().stream().anyMatch(e -> e.kind() == WaveKind.EXPANSION_HEAD && e.feature() == Feature.INTERSECTION);
        assertEquals(mach > 2.5, expands, "the theory's reflected wave at M " + mach);
        List<ObservedWave> ws = detect(c, List.of());
        boolean shock = ws.stream().anyMatch(w -> w.kind() == WaveKind.REFLECTED_SHOCK);
        boolean fan = ws.stream().anyMatch(w -> w.kind() == WaveKind.EXPANSION_HEAD && w.feature().equals(Optional.of(Feature.INTERSECTION)));
        assertEquals(expands, fan, "reflected fan found at M " + mach + " in " + o + " edge " + edge);
        assertEquals(!expands, shock, "reflected shock found at M " + mach + " in " + o + " edge " + edge);
      }
    }
  }
}
