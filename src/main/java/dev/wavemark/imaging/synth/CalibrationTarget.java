package dev.wavemark.imaging.synth;

import boofcv.alg.distort.LensDistortionNarrowFOV;
import boofcv.factory.distort.LensDistortionFactory;
import boofcv.struct.calib.CameraPinholeBrown;
import boofcv.struct.distort.Point2Transform2_F64;
import boofcv.struct.image.GrayU8;
import dev.wavemark.core.model.Calibration;
import georegression.struct.point.Point2D_F64;
import java.util.SplittableRandom;

/**
 * A chessboard calibration target photographed through the bench's lens: a pinhole camera with
 * Brown distortion (BoofCV's CameraPinholeBrown convention, as {@link Calibration.Lens}) looking
 * at a flat board, front-lit, 8-bit with mild noise. Each sensor pixel is traced back through
 * the lens and the board's pose to the board, 3 x 3 samples per pixel.
 */
public final class CalibrationTarget {
  private CalibrationTarget() {}

  /**
   * Renders a board of {@code rows} x {@code cols} squares of {@code squarePx} (ideal pixels at the
   * board's reference distance), rotated by rx, ry (tilt) and rz (roll) radians about its centre,
   * centred at ideal pixel (u0, v0).
   */
  public static GrayU8 render(Calibration.Lens lens, int width, int height, int rows, int cols, double squarePx,
      double rx, double ry, double rz, double u0, double v0, long seed) {
    double[] t = lens.tangential();
    CameraPinholeBrown cam = new CameraPinholeBrown(lens.radial().length)
        .fsetK(lens.fx(), lens.fy(), 0, lens.cx(), lens.cy(), width, height)
        .fsetRadial(lens.radial()).fsetTangential(t[0], t[1]);
    LensDistortionNarrowFOV model = LensDistortionFactory.narrow(cam);
    Point2Transform2_F64 toNorm = model.undistort_F64(true, false);
    double[][] r = rotation(rx, ry, rz);
    double z = 1.0;
    // Board centre on the ray through (u0, v0) at depth 1; board units: 1/fx per ideal pixel.
    double cx = (u0 - lens.cx()) / lens.fx();
    double cy = (v0 - lens.cy()) / lens.fy();
    double s = squarePx / lens.fx();
    double[] n = {r[0][2], r[1][2], r[2][2]};
    double dotC = n[0] * cx + n[1] * cy + n[2] * z;
    GrayU8 out = new GrayU8(width, height);
    SplittableRandom rnd = new SplittableRandom(seed);
    Point2D_F64 p = new Point2D_F64();
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        double sum = 0;
        for (int j = -1; j <= 1; j++) {
          for (int i = -1; i <= 1; i++) {
            toNorm.compute(x + i / 3.0, y + j / 3.0, p);
            // Ray (p.x, p.y, 1) meets the board plane n . (X - C) = 0.
            double k = dotC / (n[0] * p.x + n[1] * p.y + n[2]);
            double dx = k * p.x - cx;
            double dy = k * p.y - cy;
            double dz = k - z;
            double bu = (r[0][0] * dx + r[1][0] * dy + r[2][0] * dz) / s + 0.5 * cols;
            double bv = (r[0][1] * dx + r[1][1] * dy + r[2][1] * dz) / s + 0.5 * rows;
            sum += shade(bu, bv, rows, cols);
          }
        }
        double light = 1 - 0.15 * (Math.pow((x - 0.5 * width) / width, 2) + Math.pow((y - 0.5 * height) / height, 2));
        double v = 235 * light * sum / 9 + 1.5 * rnd.nextGaussian();
        out.data[y * width + x] = (byte) Math.max(0, Math.min(255, Math.round(v)));
      }
    }
    return out;
  }

  /** Board reflectance: white margin of one square, then alternating black and white squares. */
  private static double shade(double u, double v, int rows, int cols) {
    if (u < -1 || v < -1 || u > cols + 1 || v > rows + 1) {
      return 0.35;
    }
    if (u < 0 || v < 0 || u >= cols || v >= rows) {
      return 1.0;
    }
    return ((int) Math.floor(u) + (int) Math.floor(v)) % 2 == 0 ? 0.08 : 1.0;
  }

  /** R = Rz Ry Rx; columns are the board's axes in camera coordinates. */
  private static double[][] rotation(double rx, double ry, double rz) {
    double cx = Math.cos(rx);
    double sx = Math.sin(rx);
    double cy = Math.cos(ry);
    double sy = Math.sin(ry);
    double cz = Math.cos(rz);
    double sz = Math.sin(rz);
    return new double[][] {
        {cz * cy, cz * sy * sx - sz * cx, cz * sy * cx + sz * sx},
        {sz * cy, sz * sy * sx + cz * cx, sz * sy * cx - cz * sx},
        {-sy, cy * sx, cy * cx}};
  }
}
