package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Mach-wave families in freestream pictures from the project renderer, against the Mach angle
 * mu = asin(1/M) (NACA Report 1135, eq. 3 (from memory); a fact of the trade). The lines are
 * rendered at SNR 2 across them (per pixel), the faint end of what a tunnel shows.
 */
class MachWaveFamilyTest {

  /** Inverse-variance weighted mean acute angle to the flow of one family (the inference's rule). */
  static double familyMean(List<ObservedWave> ws, Side side, double flow) {
    double sw = 0;
    double swx = 0;
    for (ObservedWave w : ws) {
      if (w.kind() == WaveKind.MACH_WAVE && w.side().orElseThrow() == side) {
        double s = w.line().directionUncertaintyRad();
        sw += 1 / (s * s);
        swx += ImageAngles.acuteToFlow(w.line().directionRad(), flow) / (s * s);
      }
    }
    return sw == 0 ? Double.NaN : swx / sw;
  }

  @ParameterizedTest
  @CsvSource({
    "1.5, SCHLIEREN_VERTICAL_EDGE, 1", "2.0, SCHLIEREN_VERTICAL_EDGE, -1", "3.0, SCHLIEREN_VERTICAL_EDGE, 1",
    "1.5, SCHLIEREN_HORIZONTAL_EDGE, -1", "2.0, SCHLIEREN_HORIZONTAL_EDGE, 1", "3.0, SCHLIEREN_HORIZONTAL_EDGE, -1",
    "1.5, SHADOWGRAPH, 1", "2.0, SHADOWGRAPH, 1", "3.0, SHADOWGRAPH, 1"})
  void bothFamiliesAtTheMachAngle(double mach, Optics optics, int edge) {
    BodyShape shape = new BodyShape.Freestream(Optional.empty());
    double roll = Math.toRadians(1.3);
    RenderedCase c = RenderedCase.of("freestream", shape, mach, optics, edge, 1.2, 2, roll, 1024, 768, 11);
    List<ObservedWave> ws = WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), optics, shape, roll));
    double mu = Math.asin(1 / mach);
    for (Side side : Side.values()) {
      long n = ws.stream().filter(w -> w.side().orElseThrow() == side).count();
      // the renderer draws four waves per wall (WallFlows.freestream); most must be found
      assertTrue(n >= 3 && n <= 4, side + " family: " + n + " lines");
      // each wave at the Mach angle within 0.05 deg on average (the accuracy target)
      assertEquals(Math.toDegrees(mu), Math.toDegrees(familyMean(ws, side, roll)), 0.05, side + " family mean");
    }
    assertTrue(ws.stream().allMatch(w -> w.kind() == WaveKind.MACH_WAVE && w.feature().isPresent()), "all Mach waves");
  }

  @ParameterizedTest
  @CsvSource({"2.0", "2.5"})
  void wallGivesOneFamily(double mach) {
    BodyShape.Wall wall = new BodyShape.Wall(new Point2(0, 700), new Point2(1024, 700), Side.LOWER);
    BodyShape shape = new BodyShape.Freestream(Optional.of(wall));
    RenderedCase c = RenderedCase.of("freestream-wall", shape, mach, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 2, 0, 1024, 768, 12);
    List<ObservedWave> ws = WaveDetector.create().detect(
        DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), Optics.SCHLIEREN_VERTICAL_EDGE, shape, 0));
    // a wall below the flow sends its waves up and downstream: the flow + mu family only
    assertTrue(ws.stream().allMatch(w -> w.side().orElseThrow() == Side.UPPER), "one family");
    assertTrue(ws.size() >= 3, ws.size() + " lines");
    assertEquals(Math.toDegrees(Math.asin(1 / mach)), Math.toDegrees(familyMean(ws, Side.UPPER, 0)), 0.05, "family mean");
  }

  @ParameterizedTest
  @CsvSource({"SCHLIEREN_VERTICAL_EDGE", "SHADOWGRAPH"})
  void noiseAloneGivesNoWave(Optics optics) {
    BodyShape shape = new BodyShape.Freestream(Optional.empty());
    RenderedCase c = RenderedCase.of("freestream", shape, 2.0, optics, 1, 1.2, 2, 0, 512, 384, 13);
    // the same noise without the waves: replace the frame by its noise part
    var noise = new boofcv.struct.image.GrayF32(512, 384);
    java.util.Random r = new java.util.Random(5);
    for (int i = 0; i < noise.data.length; i++) {
      noise.data[i] = (float) (c.noiseSigma() * r.nextGaussian());
    }
    var ex = org.junit.jupiter.api.Assertions.assertThrows(dev.wavemark.core.WavemarkException.class,
        () -> WaveDetector.create().detect(DetectionRequest.of(noise, FlowRegion.of(c.mask()), optics, shape, 0)));
    assertEquals(dev.wavemark.core.Problem.NO_WAVE_FOUND, ex.problem());
  }
}
