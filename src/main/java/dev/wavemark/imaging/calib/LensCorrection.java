package dev.wavemark.imaging.calib;

import boofcv.alg.distort.LensDistortionNarrowFOV;
import boofcv.factory.distort.LensDistortionFactory;
import boofcv.struct.calib.CameraPinholeBrown;
import boofcv.struct.distort.Point2Transform2_F64;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.Calibration;
import georegression.struct.point.Point2D_F64;
import java.util.Optional;

/**
 * Removes (and re-applies) lens distortion from image POINTS, keeping the camera matrix: a
 * distorted pixel maps to the pixel an ideal pinhole camera with the same fx, fy, cx, cy would
 * have recorded. The detector corrects its sub-pixel edge points with {@link #undistort} before
 * fitting lines, which is cheaper and more accurate than warping the picture.
 *
 * <p>Undistortion inverts the Brown polynomial iteratively (BoofCV's
 * {@code LensDistortionNarrowFOV.undistort_F64(true, true)}); {@link #distort} is the closed-form
 * forward model. Thread-safe: BoofCV's transforms keep scratch state, so each thread gets its own.
 */
public final class LensCorrection {
  private static final LensCorrection IDENTITY = new LensCorrection(null);

  private final CameraPinholeBrown camera;
  private final ThreadLocal<Point2Transform2_F64> toUndistorted;
  private final ThreadLocal<Point2Transform2_F64> toDistorted;

  private LensCorrection(CameraPinholeBrown camera) {
    this.camera = camera;
    if (camera == null) {
      this.toUndistorted = null;
      this.toDistorted = null;
    } else {
      this.toUndistorted = ThreadLocal.withInitial(() -> narrow().undistort_F64(true, true));
      this.toDistorted = ThreadLocal.withInitial(() -> narrow().distort_F64(true, true));
    }
  }

  /** No correction: every point maps to itself. */
  public static LensCorrection identity() {
    return IDENTITY;
  }

  /** The correction for a calibrated lens, for pictures of the given size. */
  public static LensCorrection of(Calibration.Lens lens, int width, int height) {
    return new LensCorrection(Lenses.toBoof(lens, width, height));
  }

  /** The correction of a calibration, or the identity when it has no lens. */
  public static LensCorrection of(Calibration calibration, int width, int height) {
    return calibration.lens().map(l -> of(l, width, height)).orElse(IDENTITY);
  }

  /** The correction for a BoofCV camera. */
  public static LensCorrection of(CameraPinholeBrown camera) {
    return new LensCorrection(new CameraPinholeBrown(camera));
  }

  /** The lens, or empty for the identity. */
  public Optional<Calibration.Lens> lens() {
    return camera == null ? Optional.empty() : Optional.of(Lenses.fromBoof(camera));
  }

  public boolean isIdentity() {
    return camera == null;
  }

  /** Distorted (as photographed) pixel to undistorted pixel. */
  public Point2 undistort(Point2 distorted) {
    if (camera == null) {
      return distorted;
    }
    Point2D_F64 out = new Point2D_F64();
    toUndistorted.get().compute(distorted.x(), distorted.y(), out);
    return new Point2(out.x, out.y);
  }

  /** Undistorted pixel to distorted (as photographed) pixel: the inverse of {@link #undistort}. */
  public Point2 distort(Point2 undistorted) {
    if (camera == null) {
      return undistorted;
    }
    Point2D_F64 out = new Point2D_F64();
    toDistorted.get().compute(undistorted.x(), undistorted.y(), out);
    return new Point2(out.x, out.y);
  }

  /**
   * Undistorts {@code n} points in place, stored as x0, y0, x1, y1, ... in {@code xy}: the
   * allocation-free form for the detector's edge points.
   */
  public void undistortInPlace(double[] xy, int n) {
    if (camera == null) {
      return;
    }
    Point2Transform2_F64 t = toUndistorted.get();
    Point2D_F64 out = new Point2D_F64();
    for (int i = 0; i < n; i++) {
      t.compute(xy[2 * i], xy[2 * i + 1], out);
      xy[2 * i] = out.x;
      xy[2 * i + 1] = out.y;
    }
  }

  private LensDistortionNarrowFOV narrow() {
    return LensDistortionFactory.narrow(camera);
  }
}
