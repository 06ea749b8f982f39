package dev.wavemark.imaging.synth;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU16;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.WavePattern;
import org.junit.jupiter.api.Test;

/**
 * Rendered pictures against the physics core and against the facts of the bench: a knife edge
 * shows the sign of the density gradient across it, a shadowgraph shows a shock as a dark line
 * ahead of a bright one (Settles, "Schlieren and Shadowgraph Techniques", 2001, ch. 2, from memory).
 */
class RendererTest {
  private static final int W = 400;
  private static final int H = 300;
  private static final double MACH = 2.0;
  private static final double THETA = Math.toRadians(10);
  private static final Point2 LE = new Point2(100.3, 150.4);
  private static final BodyShape WEDGE = new BodyShape.Wedge(THETA, 0, LE, 150);
  private static final Renderer.Condition FLOW = new Renderer.Condition(MACH, 1.4, 0, 0);
  /** A peak found by a three-point parabola on a clean Gaussian ridge: sub-pixel, bias below 0.1 px. */
  private static final double PEAK_TOL_PX = 0.3;

  /** A clean bench whose knife edge does not saturate on a shock (a large source image). */
  private static Bench clean(Optics o, int sign) {
    return Bench.defaults(o).withOptics(o, sign).clean().withSourceImage(0.2);
  }

  private static ExpectedWave wave(WavePattern.Solved p, String label) {
    return p.expectedWaves().stream().filter(w -> w.label().equals(label)).findFirst().orElseThrow();
  }

  /** The x where wave w crosses row y. */
  private static double crossX(ExpectedWave w, double y) {
    Point2 s = w.startPx();
    Point2 e = w.endPx();
    return s.x() + (e.x() - s.x()) * (y - s.y()) / (e.y() - s.y());
  }

  private static double[] row(GrayF32 img, int y) {
    double[] r = new double[img.width];
    for (int x = 0; x < img.width; x++) {
      r[x] = img.get(x, y);
    }
    return r;
  }

  /** Sub-pixel position of the extreme (max if sign > 0) of r in [a, b]. */
  private static double peak(double[] r, int a, int b, int sign) {
    int best = a;
    for (int x = a; x <= b; x++) {
      if (sign * r[x] > sign * r[best]) {
        best = x;
      }
    }
    double l = r[best - 1];
    double c = r[best];
    double rr = r[best + 1];
    return best + 0.5 * (l - rr) / (l - 2 * c + rr);
  }

  @Test
  void truthAnglesAreThePhysicsCoresAngles() {
    Renderer r = Renderer.of(Bench.defaults(Optics.SCHLIEREN_VERTICAL_EDGE), WEDGE, W, H, 3);
    Renderer.Frame f = r.render(FLOW, 1);
    double beta = ObliqueShock.beta(MACH, THETA, ShockBranch.WEAK, 1.4);
    assertEquals(beta, wave(f.pattern(), "upper leading-edge shock").angleToFlowRad(), 1e-12);
    assertEquals(beta, wave(f.pattern(), "lower leading-edge shock").angleToFlowRad(), 1e-12);
  }

  @Test
  void shockProfilePeaksOnTheTruthLine() {
    Renderer r = Renderer.of(clean(Optics.SCHLIEREN_VERTICAL_EDGE, 1), WEDGE, W, H, 3);
    GrayF32 img = r.noiseless(FLOW);
    ExpectedWave up = wave(WavePattern.solve(WEDGE, MACH, 1.4, 0, W, H), "upper leading-edge shock");
    for (int y = 60; y <= 130; y += 7) {
      double truth = crossX(up, y);
      double found = peak(row(img, y), (int) truth - 4, (int) truth + 4, +1);
      assertEquals(truth, found, PEAK_TOL_PX, "row " + y);
    }
  }

  @Test
  void verticalEdgeShowsTheSignOfTheStreamwiseGradient() {
    Renderer r = Renderer.of(clean(Optics.SCHLIEREN_VERTICAL_EDGE, 1), WEDGE, W, H, 3);
    GrayF32 img = r.noiseless(FLOW);
    double background = img.get(20, 20);
    WavePattern.Solved p = WavePattern.solve(WEDGE, MACH, 1.4, 0, W, H);
    int y = 90;
    // Density rises across the shock in +x: brighter. It falls through the shoulder fan: darker.
    assertTrue(img.get((int) Math.round(crossX(wave(p, "upper leading-edge shock"), y)), y) > background * 1.01);
    ExpectedWave head = wave(p, "upper shoulder expansion head");
    ExpectedWave tail = wave(p, "upper shoulder expansion tail");
    int yf = (int) Math.round(head.startPx().y() - 20);
    int xf = (int) Math.round(0.5 * (crossX(head, yf) + crossX(tail, yf)));
    assertTrue(img.get(xf, yf) < background * 0.995, "fan darker than " + background + ": " + img.get(xf, yf));
  }

  @Test
  void horizontalEdgeShowsTheSignOfTheCrossStreamGradient() {
    Renderer r = Renderer.of(clean(Optics.SCHLIEREN_HORIZONTAL_EDGE, 1), WEDGE, W, H, 3);
    GrayF32 img = r.noiseless(FLOW);
    double background = img.get(20, 20);
    WavePattern.Solved p = WavePattern.solve(WEDGE, MACH, 1.4, 0, W, H);
    // edgeSign +1: brighter where density rises downward on screen. Behind the upper shock the
    // dense gas lies below the line (bright); behind the lower shock it lies above (dark).
    int yu = 100;
    int yl = 200;
    assertTrue(img.get((int) Math.round(crossX(wave(p, "upper leading-edge shock"), yu)), yu) > background * 1.01);
    assertTrue(img.get((int) Math.round(crossX(wave(p, "lower leading-edge shock"), yl)), yl) < background * 0.99);
  }

  @Test
  void shadowgraphShowsADarkLineAheadOfABrightOne() {
    Bench b = Bench.defaults(Optics.SHADOWGRAPH).clean();
    Renderer r = Renderer.of(b, WEDGE, W, H, 3);
    GrayF32 img = r.noiseless(FLOW);
    ExpectedWave up = wave(WavePattern.solve(WEDGE, MACH, 1.4, 0, W, H), "upper leading-edge shock");
    int y = 100;
    double truth = crossX(up, y);
    double[] row = row(img, y);
    double dark = peak(row, (int) truth - 8, (int) truth + 8, -1);
    double bright = peak(row, (int) truth - 8, (int) truth + 8, +1);
    assertTrue(dark < bright, "dark at " + dark + " must lie upstream of bright at " + bright);
    assertTrue(bright > truth, "the bright line is displaced downstream of the shock at " + truth + ": " + bright);
    assertTrue(row[(int) Math.round(dark)] < row[20] && row[(int) Math.round(bright)] > row[20]);
  }

  @Test
  void renderingIsDeterministicForASeed() {
    Renderer a = Renderer.of(Bench.defaults(Optics.SCHLIEREN_VERTICAL_EDGE), WEDGE, W, H, 3);
    Renderer b = Renderer.of(Bench.defaults(Optics.SCHLIEREN_VERTICAL_EDGE), WEDGE, W, H, 3);
    Renderer.Condition jittered = new Renderer.Condition(MACH, 1.4, 0, 0.2);
    GrayU16 x = a.render(jittered, 42).image();
    GrayU16 y = b.render(jittered, 42).image();
    assertArrayEquals(x.data, y.data);
    assertFalse(java.util.Arrays.equals(x.data, a.render(jittered, 43).image().data), "another seed, other noise");
  }

  @Test
  void referenceFrameHasTheModelButNoShock() {
    Renderer r = Renderer.of(clean(Optics.SCHLIEREN_VERTICAL_EDGE, 1), WEDGE, W, H, 3);
    GrayU16 ref = r.reference(FLOW, 5);
    ExpectedWave up = wave(WavePattern.solve(WEDGE, MACH, 1.4, 0, W, H), "upper leading-edge shock");
    int y = 100;
    int xs = (int) Math.round(crossX(up, y));
    assertEquals(ref.get(20, y), ref.get(xs, y), 2 * 16, "no shock in the reference");
    assertTrue(ref.get((int) LE.x() + 60, (int) LE.y()) < ref.get(20, y) / 10, "model silhouette is dark");
  }
}
