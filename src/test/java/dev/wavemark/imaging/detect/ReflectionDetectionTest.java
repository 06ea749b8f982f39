package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.geom.ImageAngles;
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
 * The waves where a shock generator's incident shock meets the wall, on pictures freshly rendered
 * by the project renderer, against the renderer's truth (its angles come from the oblique-shock
 * relations and, for the Mach reflection, the three-shock solution at the triple point).
 */
class ReflectionDetectionTest {
  private static final BodyShape.Wall FLOOR = new BodyShape.Wall(new Point2(0, 380), new Point2(640, 380), Side.LOWER);

  private static RenderedCase render(double deflectionDeg, double snr, long seed) {
    BodyShape shape = new BodyShape.ShockGenerator(Math.toRadians(deflectionDeg), new Point2(150.3, 120.6), FLOOR);
    return RenderedCase.of("generator", shape, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.0, snr, 0, 640, 480, seed);
  }

  private static List<ObservedWave> detect(RenderedCase c) {
    return WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), c.optics(), c.shape(), c.flowRad()));
  }

  private static ExpectedWave truth(RenderedCase c, WaveKind kind) {
    return c.truth().stream().filter(e -> e.kind() == kind).findFirst().orElseThrow();
  }

  private static Optional<ObservedWave> found(List<ObservedWave> ws, WaveKind kind) {
    return ws.stream().filter(w -> w.kind() == kind).findFirst();
  }

  private static double errDeg(ObservedWave w, ExpectedWave t) {
    double d = ImageAngles.wrap(w.line().directionRad() - t.directionRad());
    // a line's direction is defined modulo pi
    if (Math.abs(d) > 0.5 * Math.PI) {
      d = ImageAngles.wrap(d + Math.PI);
    }
    return Math.toDegrees(Math.abs(d));
  }

  @Test
  void regularReflectionGivesTheReflectedShockAtTheImpingementPoint() {
    for (double snr : new double[] {Double.POSITIVE_INFINITY, 20}) {
      RenderedCase c = render(8, snr, 31);
      List<ObservedWave> ws = detect(c);
      WaveDetectorTest.dump(ws);
      ObservedWave r = found(ws, WaveKind.REFLECTED_SHOCK).orElseThrow(() -> new AssertionError("no reflected shock at SNR " + snr));
      assertEquals(Optional.of(Feature.IMPINGEMENT), r.feature());
      assertTrue(found(ws, WaveKind.MACH_STEM).isEmpty(), "a Mach stem in a regular reflection");
      double err = errDeg(r, truth(c, WaveKind.REFLECTED_SHOCK));
      System.out.printf("regular snr %s: reflected error %.3f deg (sigma %.3f)%n", snr, err, Math.toDegrees(r.line().directionUncertaintyRad()));
      assertTrue(err < 0.2, "reflected shock off by " + err + " deg at SNR " + snr);
    }
  }

  @Test
  void machReflectionGivesTheStemAndTheReflectedShockAtTheTriplePoint() {
    for (double snr : new double[] {Double.POSITIVE_INFINITY, 20}) {
      RenderedCase c = render(14, snr, 32);
      List<ObservedWave> ws = detect(c);
      WaveDetectorTest.dump(ws);
      ObservedWave stem = found(ws, WaveKind.MACH_STEM).orElseThrow(() -> new AssertionError("no Mach stem at SNR " + snr));
      ObservedWave r = found(ws, WaveKind.REFLECTED_SHOCK).orElseThrow(() -> new AssertionError("no reflected shock at SNR " + snr));
      assertEquals(Optional.of(Feature.TRIPLE_POINT), r.feature());
      double stemErr = errDeg(stem, truth(c, WaveKind.MACH_STEM));
      double err = errDeg(r, truth(c, WaveKind.REFLECTED_SHOCK));
      System.out.printf("mach snr %s: stem error %.3f deg, reflected error %.3f deg (sigma %.3f)%n", snr, stemErr, err,
          Math.toDegrees(r.line().directionUncertaintyRad()));
      assertTrue(stemErr < 0.6, "Mach stem off by " + stemErr + " deg at SNR " + snr);
      assertTrue(err < 0.3, "reflected shock off by " + err + " deg at SNR " + snr);
    }
  }
}
