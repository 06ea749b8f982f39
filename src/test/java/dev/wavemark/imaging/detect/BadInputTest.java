package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU8;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Optics;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Bad input gives a WavemarkException with its Problem code, never another exception. */
class BadInputTest {
  private static final BodyShape WEDGE = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(100, 120), 100);

  private static Problem problemOf(DetectionRequest r) {
    return assertThrows(WavemarkException.class, () -> WaveDetector.create().detect(r)).problem();
  }

  @Test
  void constantFrameIsEmpty() {
    GrayF32 f = new GrayF32(320, 240);
    assertEquals(Problem.IMAGE_EMPTY, problemOf(DetectionRequest.of(f, FlowRegion.all(), Optics.SHADOWGRAPH, WEDGE, 0)));
  }

  @Test
  void maskOfAnotherSizeIsOutside() {
    GrayF32 f = noise(320, 240);
    GrayU8 m = new GrayU8(100, 100);
    assertEquals(Problem.MASK_OUTSIDE, problemOf(DetectionRequest.of(f, FlowRegion.of(m), Optics.SHADOWGRAPH, WEDGE, 0)));
  }

  @Test
  void modelOutsideThePictureIsReported() {
    BodyShape far = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(5000, 120), 100);
    assertEquals(Problem.MASK_OUTSIDE,
        problemOf(DetectionRequest.of(noise(320, 240), FlowRegion.all(), Optics.SCHLIEREN_VERTICAL_EDGE, far, 0)));
  }

  @Test
  void pureNoiseHasNoWave() {
    assertEquals(Problem.NO_WAVE_FOUND,
        problemOf(DetectionRequest.of(noise(320, 240), FlowRegion.all(), Optics.SCHLIEREN_VERTICAL_EDGE, WEDGE, 0)));
  }

  private static GrayF32 noise(int w, int h) {
    GrayF32 f = new GrayF32(w, h);
    Random r = new Random(1);
    for (int i = 0; i < f.data.length; i++) {
      f.data[i] = (float) (0.01 * r.nextGaussian());
    }
    return f;
  }
}
