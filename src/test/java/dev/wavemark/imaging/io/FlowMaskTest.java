package dev.wavemark.imaging.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Calibration;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class FlowMaskTest {
  static final int W = 320;
  static final int H = 240;

  @Test
  void circularWindowCoversPiRSquared() {
    FlowMask m = FlowMask.build(W, H, Optional.of(new Calibration.Window.Circle(160, 120, 100)), List.of(), Optional.empty(), 0);
    // lattice points in a disc of radius r: pi r^2 to within a few r (Gauss circle problem)
    assertEquals(Math.PI * 100 * 100, m.count(), 3 * 100);
    assertTrue(m.inside(160, 120));
    assertFalse(m.inside(5, 5));
  }

  @Test
  void windowOutsideThePicture() {
    WavemarkException e = assertThrows(WavemarkException.class, () -> FlowMask.build(W, H,
        Optional.of(new Calibration.Window.Circle(1000, 120, 100)), List.of(), Optional.empty(), 0));
    assertEquals(Problem.MASK_OUTSIDE, e.problem());
    assertTrue(e.getMessage().contains("320x240"), e.getMessage());
  }

  @Test
  void wedgeOutlineIsExcluded() {
    // a 10° wedge, leading edge at (80, 120), flow left to right
    BodyShape.Wedge wedge = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(80, 120), 120);
    List<List<Point2>> solids = FlowMask.modelOutline(wedge, 2.0, 1.4, 0, W, H);
    assertFalse(solids.isEmpty());
    FlowMask m = FlowMask.build(W, H, Optional.empty(), solids, Optional.empty(), FlowMask.DEFAULT_MARGIN_PX);
    assertFalse(m.inside(150, 120), "inside the wedge");
    assertFalse(m.inside(250, 125), "on the afterbody");
    assertTrue(m.inside(40, 120), "upstream of the leading edge");
    assertTrue(m.inside(150, 60), "above the wedge");
    // the surface at x = 150 is at y = 120 - 70 tan 10° = 107.7; the margin keeps 3 px off it
    assertFalse(m.inside(150, 106));
    assertTrue(m.inside(150, 102));
  }

  @Test
  void darkSurroundAndSilhouetteFoundInASample() {
    GrayF32 s = new GrayF32(W, H);
    for (int y = 0; y < H; y++) {
      for (int x = 0; x < W; x++) {
        boolean window = (x - 160) * (x - 160) + (y - 120) * (y - 120) < 110 * 110;
        boolean model = x > 150 && Math.abs(y - 120) < 20; // a sting-mounted body, dark
        boolean shock = Math.abs(y - (240 - x)) < 2; // a thin dark band: must stay in the flow
        float v = window && !model ? (shock ? 300f : 2000f + 2 * x) : 30f;
        s.set(x, y, v);
      }
    }
    FlowMask m = FlowMask.build(W, H, Optional.empty(), List.of(), Optional.of(s), FlowMask.DEFAULT_MARGIN_PX);
    assertTrue(m.inside(100, 120));
    assertFalse(m.inside(200, 120), "model");
    assertFalse(m.inside(10, 10), "surround");
    assertTrue(m.inside(120, 120), "the thin dark band is flow, not silhouette");
  }
}
