package dev.wavemark.imaging.calib;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.alg.geo.calibration.CalibrationObservation;
import boofcv.struct.calib.CameraPinholeBrown;
import boofcv.struct.geo.PointIndex2D_F64;
import boofcv.struct.image.GrayF32;
import georegression.struct.point.Point2D_F64;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Calibration against synthetic truth: boards rendered through a known camera (fx = fy = 500 px,
 * centre (320, 240), Brown k1 = -0.20, k2 = 0.05 on 640x480 pictures) and known poses.
 */
class BenchCalibrationTest {
  static final CameraPinholeBrown CAMERA = new CameraPinholeBrown().fsetK(500, 500, 0, 320, 240, 640, 480).fsetRadial(-0.20, 0.05);
  static final ChessboardTarget BOARD = new ChessboardTarget(7, 9, 0.03);
  static final double DEG = Math.PI / 180;
  /** Tilts (rad about x, about y) and centre (m) of the lens views: tilted up to 20°, reaching into the corners. */
  static final double[][] VIEWS = {
      {0, 0, 0.0, 0, 0.33}, {0.35, 0, 0.03, 0.02, 0.35}, {-0.35, 0, -0.03, -0.02, 0.35}, {0, 0.35, 0.02, -0.03, 0.35},
      {0, -0.35, -0.02, 0.03, 0.35}, {0.25, 0.25, 0.05, 0.04, 0.38}};
  /**
   * Roll tolerance: ten times the formal standard uncertainty the pose reports on these pictures
   * (about 0.002°), and 2.5 times below the 0.05° the issue allows for a whole flow-direction
   * budget.
   */
  static final double ROLL_TOL_DEG = 0.02;

  static List<CalibrationObservation> lensViews = new ArrayList<>();

  static GrayF32 view(double rollRad, double[] p, long seed) {
    return ChessboardRenderer.render(CAMERA, BOARD, ChessboardRenderer.rotation(rollRad, p[0], p[1]),
        new double[] {p[2], p[3], p[4]}, 1.0, seed);
  }

  @BeforeAll
  static void renderLensViews() {
    for (int k = 0; k < VIEWS.length; k++) {
      lensViews.add(BOARD.detect(view(3 * k * DEG, VIEWS[k], k)).orElseThrow(() -> new AssertionError("board not found")));
    }
  }

  @Test
  void detectedCornersLieWhereTheCameraPutsThem() {
    double[] pose = {0.25, 0.25, 0.05, 0.04, 0.38};
    CalibrationObservation obs = lensViews.get(5);
    double[][] r = ChessboardRenderer.rotation(15 * DEG, pose[0], pose[1]);
    List<Point2D_F64> layout = BOARD.layout();
    double max = 0;
    for (PointIndex2D_F64 p : obs.points) {
      Point2D_F64 truth = ChessboardRenderer.project(CAMERA, r, new double[] {pose[2], pose[3], pose[4]},
          layout.get(p.index).x, layout.get(p.index).y);
      max = Math.max(max, truth.distance(p.p));
    }
    assertEquals(BOARD.cornerCount(), obs.size());
    assertTrue(max < 0.15, "largest corner error " + max + " px");
  }

  @Test
  void lensFromTiltedViewsRecoversFocalLengthAndBarrelDistortion() {
    IntrinsicFit fit = IntrinsicFit.estimate(BOARD, lensViews, 640, 480, false);
    CameraPinholeBrown c = fit.camera();
    assertTrue(c.radial[0] < 0, "barrel distortion gives k1 < 0: " + c.radial[0]);
    assertEquals(-0.20, c.radial[0], 0.02, "k1 within 10%");
    assertEquals(500, c.fx, 5, "fx within 1%");
    assertEquals(500, c.fy, 5, "fy within 1%");
    assertEquals(320, c.cx, 2);
    assertEquals(240, c.cy, 2);
    assertTrue(fit.meanErrorPx() < 0.1, "mean reprojection error " + fit.meanErrorPx());
  }

  @Test
  void inSituViewGivesRollAndScale() {
    double[] faceOn = {0, 0, 0, 0, 0.4};
    CalibrationObservation obs = BOARD.detect(view(2.0 * DEG, faceOn, 99)).orElseThrow();
    TargetPose pose = TargetPose.estimate(BOARD, obs, LensCorrection.of(CAMERA), 0);
    assertEquals(2.0, Math.toDegrees(pose.flowDirectionRad()), ROLL_TOL_DEG);
    // pinhole: a face-on plane at distance z is seen at z / fx metres per pixel
    assertEquals(0.4 / 500, pose.metersPerPixel(), 0.4 / 500 * 1e-3);
    assertTrue(pose.flowDirectionUncertaintyRad() > 0 && pose.flowDirectionUncertaintyRad() < ROLL_TOL_DEG * DEG);

    // the same board turned by half a turn looks the same: the nominal direction picks the edge along the flow
    CalibrationObservation turned = BOARD.detect(view(182.0 * DEG, faceOn, 98)).orElseThrow();
    TargetPose p2 = TargetPose.estimate(BOARD, turned, LensCorrection.of(CAMERA), 0);
    assertEquals(2.0, Math.toDegrees(p2.flowDirectionRad()), ROLL_TOL_DEG);
    TargetPose p3 = TargetPose.estimate(BOARD, turned, LensCorrection.of(CAMERA), 180 * DEG);
    assertEquals(-178.0, Math.toDegrees(p3.flowDirectionRad()), ROLL_TOL_DEG);
  }

  @Test
  void uncorrectedBarrelDistortionShrinksTheScale() {
    CalibrationObservation obs = BOARD.detect(view(2.0 * DEG, new double[] {0, 0, 0, 0, 0.4}, 99)).orElseThrow();
    TargetPose raw = TargetPose.estimate(BOARD, obs, LensCorrection.identity(), 0);
    // barrel distortion draws the board smaller, so more metres per pixel; a centred board keeps its roll
    assertTrue(raw.metersPerPixel() > 0.4 / 500 * 1.005, "uncorrected " + raw.metersPerPixel());
    assertEquals(2.0, Math.toDegrees(raw.flowDirectionRad()), ROLL_TOL_DEG);
  }
}
