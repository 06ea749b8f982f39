package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import org.junit.jupiter.api.Test;

class WaveDetectorTest {

  static void dump(List<ObservedWave> ws) {
    for (ObservedWave w : ws) {
      System.out.printf("%s %s %.4f deg ±%.4f  sup %d rms %.3f curved %s amp %.4f w %.2f %s%n", w.kind(), w.side().orElse(null),
          Math.toDegrees(w.line().directionRad()), Math.toDegrees(w.line().directionUncertaintyRad()), w.line().support(),
          w.line().rmsResidualPx(), w.line().curved(), w.contrast(), w.widthPx(), w.feature().orElse(null));
    }
  }

  static SyntheticScene wedgeScene() {
    SyntheticScene sc = new SyntheticScene(1024, 768);
    double lx = 200.4, ly = 384.3;
    double half = Math.toRadians(10);
    double chord = 300;
    double t = chord * Math.tan(half);
    sc.body(lx, ly, lx + chord, ly - t, lx + 900, ly - t, lx + 900, ly + t, lx + chord, ly + t);
    sc.shock(lx, ly, Math.toRadians(39.31), 2000, 1.0, -1, half);
    sc.shock(lx, ly, Math.toRadians(-39.31), 2000, 1.0, +1, -half);
    sc.fan(lx + chord, ly - t, Math.toRadians(47.6), Math.toRadians(30.5), Math.toRadians(-5), 0.8, 2000);
    sc.fan(lx + chord, ly + t, Math.toRadians(-47.6), Math.toRadians(-30.5), Math.toRadians(5), 0.8, 2000);
    return sc;
  }

  @Test
  void wedgeSchlieren() {
    SyntheticScene sc = wedgeScene();
    double lx = 200.4, ly = 384.3;
    double half = Math.toRadians(10);
    double chord = 300;
    GrayF32 img = sc.render(Optics.SCHLIEREN_VERTICAL_EDGE, 1.0, 0.01, 3);
    var shape = new BodyShape.Wedge(half, 0, new Point2(lx, ly), chord);
    List<ObservedWave> ws = WaveDetector.create().detect(DetectionRequest.of(img, FlowRegion.of(sc.mask()), Optics.SCHLIEREN_VERTICAL_EDGE, shape, 0));
    // truth: the scene's shocks at +-39.31 deg
    long shocks = ws.stream().filter(w -> w.kind() == WaveKind.OBLIQUE_SHOCK).count();
    assertEquals(2, shocks, "two leading-edge shocks");
    for (ObservedWave w : ws) {
      if (w.kind() == WaveKind.OBLIQUE_SHOCK) {
        assertEquals(39.31, Math.abs(Math.toDegrees(w.line().directionRad())), 0.01, "shock direction");
      }
    }
  }
}
