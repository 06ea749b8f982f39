package dev.wavemark.imaging.calib;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.factory.distort.LensDistortionFactory;
import boofcv.struct.calib.CameraPinholeBrown;
import boofcv.struct.distort.Point2Transform2_F64;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.Calibration;
import georegression.struct.point.Point2D_F64;
import java.util.Random;
import org.junit.jupiter.api.Test;

class LensCorrectionTest {
  /** A lens with strong barrel distortion and some decentring, in pixels of a 1024x768 picture. */
  static final Calibration.Lens LENS = new Calibration.Lens(900, 905, 515, 380, new double[] {-0.18, 0.04}, new double[] {4e-4, -3e-4});
  static final int W = 1024;
  static final int H = 768;
  /** The iterative inverse is run to BoofCV's default tolerance; a thousandth of a pixel is far below any edge-fit residual. */
  static final double ROUND_TRIP_TOL_PX = 1e-3;

  @Test
  void contractLensAndBoofCameraAgree() {
    CameraPinholeBrown cam = Lenses.toBoof(LENS, W, H);
    assertEquals(900, cam.fx);
    assertEquals(905, cam.fy);
    assertEquals(515, cam.cx);
    assertEquals(380, cam.cy);
    assertEquals(0, cam.skew);
    assertArrayEquals(new double[] {-0.18, 0.04}, cam.radial);
    assertEquals(4e-4, cam.t1);
    assertEquals(-3e-4, cam.t2);
    Calibration.Lens back = Lenses.fromBoof(cam);
    assertArrayEquals(LENS.radial(), back.radial());
    assertArrayEquals(LENS.tangential(), back.tangential());
    assertEquals(LENS.fx(), back.fx());
    assertEquals(LENS.cy(), back.cy());
  }

  /** BoofCV's forward Brown model distorts an ideal point; our undistort must bring it back. */
  @Test
  void undistortInvertsBoofDistort() {
    Point2Transform2_F64 distort = LensDistortionFactory.narrow(Lenses.toBoof(LENS, W, H)).distort_F64(true, true);
    LensCorrection lc = LensCorrection.of(LENS, W, H);
    Random rnd = new Random(42);
    Point2D_F64 d = new Point2D_F64();
    double maxShift = 0;
    for (int i = 0; i < 500; i++) {
      double x = rnd.nextDouble() * (W - 1);
      double y = rnd.nextDouble() * (H - 1);
      distort.compute(x, y, d);
      maxShift = Math.max(maxShift, Math.hypot(d.x - x, d.y - y));
      Point2 u = lc.undistort(new Point2(d.x, d.y));
      assertEquals(x, u.x(), ROUND_TRIP_TOL_PX, "x at " + x + "," + y);
      assertEquals(y, u.y(), ROUND_TRIP_TOL_PX, "y at " + x + "," + y);
      Point2 again = lc.distort(u);
      assertEquals(d.x, again.x(), ROUND_TRIP_TOL_PX);
      assertEquals(d.y, again.y(), ROUND_TRIP_TOL_PX);
    }
    assertTrue(maxShift > 20, "the lens moves corner points by tens of pixels: " + maxShift);
  }

  @Test
  void barrelDistortionPullsPointsTowardsTheCentre() {
    // k1 < 0 is barrel distortion: the photographed point lies closer to the centre than the ideal one
    LensCorrection lc = LensCorrection.of(LENS, W, H);
    Point2 ideal = new Point2(1000, 700);
    Point2 photographed = lc.distort(ideal);
    assertTrue(photographed.distanceTo(new Point2(515, 380)) < ideal.distanceTo(new Point2(515, 380)));
  }

  @Test
  void inPlaceMatchesOneByOneAndIdentityIsIdentity() {
    LensCorrection lc = LensCorrection.of(LENS, W, H);
    double[] xy = {10, 20, 500, 400, 1020, 760};
    double[] copy = xy.clone();
    lc.undistortInPlace(xy, 3);
    for (int i = 0; i < 3; i++) {
      Point2 u = lc.undistort(new Point2(copy[2 * i], copy[2 * i + 1]));
      assertEquals(u.x(), xy[2 * i], 1e-12);
      assertEquals(u.y(), xy[2 * i + 1], 1e-12);
    }
    LensCorrection.identity().undistortInPlace(copy, 3);
    assertArrayEquals(new double[] {10, 20, 500, 400, 1020, 760}, copy);
    assertEquals(new Point2(3, 4), LensCorrection.of(Calibration.NONE, W, H).undistort(new Point2(3, 4)));
  }

  @Test
  void closestEdgeResolvesTheBoardSymmetry() {
    double deg = Math.PI / 180;
    assertEquals(2 * deg, TargetPose.closestEdge(2 * deg, 0), 1e-12);
    assertEquals(2 * deg, TargetPose.closestEdge(182 * deg, 0), 1e-12);
    assertEquals(2 * deg, TargetPose.closestEdge(-88 * deg, 0), 1e-12);
    assertEquals(92 * deg, TargetPose.closestEdge(2 * deg, 90 * deg), 1e-12);
    assertEquals(-178 * deg, TargetPose.closestEdge(2 * deg, 180 * deg), 1e-12);
  }
}
