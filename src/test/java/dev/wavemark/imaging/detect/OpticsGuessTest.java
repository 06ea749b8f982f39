package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.Side;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The optics guess. The physical facts it rests on (Settles, "Schlieren and Shadowgraph
 * Techniques", 2001, ch. 2 and 6, from memory): a shadowgraph only displaces light, so the light
 * missing from a shock's dark band is the light in its bright caustic and the signal integrates to
 * zero across the line; a knife edge passes or cuts light in proportion to the deflection, which
 * has one sign across a shock, so the signal there has one sign.
 */
class OpticsGuessTest {

  private static final BodyShape.Wall FLOOR = new BodyShape.Wall(new Point2(0, 400), new Point2(640, 400), Side.LOWER);

  /** A mean profile as the guess samples it: {@link OpticsGuess#HALF_PX} either side, f(offset px). */
  private static double[] profile(java.util.function.DoubleUnaryOperator f) {
    int m = (int) Math.round(2 * OpticsGuess.HALF_PX / 0.5) + 1;
    double[] p = new double[m];
    for (int j = 0; j < m; j++) {
      p[j] = f.applyAsDouble(j * 0.5 - OpticsGuess.HALF_PX);
    }
    return p;
  }

  private static double gauss(double x, double s) {
    return Math.exp(-0.5 * x * x / (s * s));
  }

  @Test
  void aOneSignedLineIsAllNetAndADipoleNone() {
    // knife edge: the deflection across a blurred shock, one sign (fraction 1 by definition)
    assertEquals(1.0, OpticsGuess.netFraction(profile(x -> 0.3 * gauss(x, 1.5))), 1e-9);
    // shadowgraph to first order: the derivative of that bump, whose integral is exactly zero; the
    // part integrated is centred on the stronger lobe, so its far end cuts a little of the other
    assertEquals(0.0, OpticsGuess.netFraction(profile(x -> -x * gauss(x, 1.5))), 0.01);
  }

  @Test
  void aLineOnAPlateauOrAHaloIsJudgedAgainstItsFlatSide() {
    // a cone's shock in schlieren: the peak, then the compression behind it decaying over tens of px
    double[] cone = profile(x -> gauss(x, 1.5) + (x > 0 ? 0.45 * Math.exp(-x / 15) : 0));
    assertTrue(OpticsGuess.netFraction(cone) > OpticsGuess.SHADOW_BELOW, "cone " + OpticsGuess.netFraction(cone));
    // a dipole of 10 % contrast on a frame without a reference whose illumination falls 10 % per
    // 100 px (a strong vignette): the slope reads as some net light, but stays well short of a knife edge's
    double[] tilted = profile(x -> -0.11 * x * gauss(x, 1.5) + 0.001 * x + 0.2);
    assertTrue(OpticsGuess.netFraction(tilted) < OpticsGuess.SHADOW_BELOW, "tilted dipole " + OpticsGuess.netFraction(tilted));
  }

  @ParameterizedTest(name = "wedge {0} edge {1} SNR {2} roll {3} deg")
  @CsvSource({
      "SCHLIEREN_VERTICAL_EDGE, 1, 5, 3",
      "SCHLIEREN_HORIZONTAL_EDGE, -1, 5, -4",
      "SHADOWGRAPH, 1, 5, 3",
      "SHADOWGRAPH, 1, Infinity, -5"})
  void aRenderedWedgeIsGuessedFromItsTwoShocks(Optics truth, int edge, double snr, double rollDeg) {
    BodyShape wedge = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(150.4, 240.3), 180);
    RenderedCase c = RenderedCase.of("wedge", wedge, 2.2, truth, edge, 1.6, snr, Math.toRadians(rollDeg), 640, 480, 11);
    assertGuess(c.frame(), c, wedge, Math.toRadians(rollDeg), 2, truth);
  }

  /** The guess from {@code frame} (the rendered case's mask) judges {@code lines} lines and names the true optics. */
  private static void assertGuess(GrayF32 frame, RenderedCase c, BodyShape shape, double rollRad, int lines, Optics truth) {
    OpticsGuess g = WaveDetector.guessOptics(frame, FlowRegion.of(c.mask()), shape, rollRad);
    assertEquals(lines, g.lines(), g.toString());
    assertEquals(truth == Optics.SHADOWGRAPH, g.optics() == Optics.SHADOWGRAPH, g.toString());
  }

  /** 8-bit samples: the frame quantised to 1/127 of its level (a mid-grey exposure) before the guess. */
  @ParameterizedTest(name = "{0}, 8-bit")
  @CsvSource({"SCHLIEREN_VERTICAL_EDGE", "SHADOWGRAPH"})
  void eightBitSamplesDoNotChangeTheGuess(Optics truth) {
    BodyShape ramp = new BodyShape.Ramp(Math.toRadians(12), new Point2(250.3, 400), FLOOR);
    RenderedCase c = RenderedCase.of("ramp", ramp, 2.4, truth, 1, 1.2, 10, 0, 640, 480, 5);
    GrayF32 q = c.frame().clone();
    for (int i = 0; i < q.data.length; i++) {
      q.data[i] = Math.round(127 * (1 + q.data[i])) / 127f - 1;
    }
    assertGuess(q, c, ramp, 0, 1, truth);
  }

  /** An expansion corner has no shock: its fan is judged whole (zero net light across it in shadowgraph). */
  @ParameterizedTest(name = "expansion corner {0}")
  @CsvSource({"SCHLIEREN_VERTICAL_EDGE", "SHADOWGRAPH"})
  void anExpansionCornerIsGuessedFromItsWholeFan(Optics truth) {
    BodyShape corner = new BodyShape.ExpansionCorner(Math.toRadians(10), new Point2(250.6, 400), FLOOR);
    RenderedCase c = RenderedCase.of("corner", corner, 2.0, truth, 1, 1.4, 10, 0, 640, 480, 3);
    assertGuess(c.frame(), c, corner, 0, 1, truth);
  }

  @Test
  void withNoLineToJudgeByTheGuessSaysSo() {
    // a freestream picture has no model feature to search from: the fallback, and no fraction
    BodyShape none = new BodyShape.Freestream(java.util.Optional.empty());
    RenderedCase c = RenderedCase.of("freestream", none, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 10, 0, 320, 240, 3);
    OpticsGuess g = WaveDetector.guessOptics(c.frame(), FlowRegion.of(c.mask()), none, 0);
    assertEquals(0, g.lines(), g.toString());
    assertTrue(!g.fromLines() && Double.isNaN(g.netFraction()) && g.optics() != Optics.AUTO, g.toString());
  }
}
