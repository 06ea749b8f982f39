package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

@Tag("slow")
class RenderedLookTest {
  @Test
  void wedge() {
    var shape = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200.4, 384.3), 300);
    for (Optics o : new Optics[] {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SHADOWGRAPH}) {
      RenderedCase c = RenderedCase.of("wedge", shape, 2.0, o, 1, 1.2, 20, 0, 1024, 768, 5);
      System.out.println(o + " noise " + c.noiseSigma());
      for (ExpectedWave e : c.truth()) {
        System.out.printf("truth %s %s %.4f %s%n", e.kind(), e.side(), Math.toDegrees(e.directionRad()), e.startPx());
      }
      try {
        for (ObservedWave w : WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), o, shape, 0))) {
          System.out.printf("found %s %s %.4f ±%.4f sup %d%n", w.kind(), w.side().orElse(null), Math.toDegrees(w.line().directionRad()),
              Math.toDegrees(w.line().directionUncertaintyRad()), w.line().support());
        }
      } catch (RuntimeException e) {
        System.out.println(e);
      }
    }
  }
}
