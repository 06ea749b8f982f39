package dev.wavemark.imaging.calib;

import boofcv.alg.distort.LensDistortionNarrowFOV;
import boofcv.factory.distort.LensDistortionFactory;
import boofcv.struct.calib.CameraPinholeBrown;
import boofcv.struct.distort.Point2Transform2_F64;
import boofcv.struct.image.GrayF32;
import georegression.struct.point.Point2D_F64;
import java.util.Random;

/**
 * Test-scope picture of a chessboard seen through a known pinhole camera with Brown distortion:
 * every pixel is traced back through the lens (BoofCV's inverse of the Brown model) onto the
 * board plane and shaded black or white, 4x4 samples per pixel. Pose: the board faces the
 * camera, turned in its own plane by {@code rollRad} (the direction its x-axis takes on screen,
 * counter-clockwise), then tilted by {@code tiltXRad}, {@code tiltYRad} about the camera axes,
 * its centre at {@code (tx, ty, tz)} metres in camera coordinates (z forward, y down).
 */
public final class ChessboardRenderer {
  static final float BLACK = 25;
  static final float WHITE = 225;
  static final float SURROUND = 120;

  private ChessboardRenderer() {}

  public static double[][] rotation(double rollRad, double tiltXRad, double tiltYRad) {
    double c = Math.cos(rollRad);
    double s = Math.sin(rollRad);
    // board faces the camera: board x -> camera x, board y (up) -> camera -y, board z -> camera -z; then roll in plane
    double[][] r = {{c, -s, 0}, {-s, -c, 0}, {0, 0, -1}};
    return mul(mul(rotY(tiltYRad), rotX(tiltXRad)), r);
  }

  public static GrayF32 render(CameraPinholeBrown cam, ChessboardTarget board, double[][] r, double[] t, double noise, long seed) {
    LensDistortionNarrowFOV lens = LensDistortionFactory.narrow(cam);
    Point2Transform2_F64 toNorm = lens.undistort_F64(true, false);
    int w = cam.width;
    int h = cam.height;
    double halfW = 0.5 * board.cols() * board.squareSizeM();
    double halfH = 0.5 * board.rows() * board.squareSizeM();
    double margin = board.squareSizeM();
    double[] rtT = mulT(r, t);
    // board coordinates of every pixel corner, traced once; sub-pixel samples interpolate between
    // them (the lens map is smooth on the scale of one pixel)
    double[] gx = new double[(w + 1) * (h + 1)];
    double[] gy = new double[(w + 1) * (h + 1)];
    Point2D_F64 n = new Point2D_F64();
    for (int y = 0; y <= h; y++) {
      for (int x = 0; x <= w; x++) {
        toNorm.compute(x - 0.5, y - 0.5, n);
        double[] d = mulT(r, new double[] {n.x, n.y, 1});
        double sRay = rtT[2] / d[2];
        gx[y * (w + 1) + x] = sRay * d[0] - rtT[0];
        gy[y * (w + 1) + x] = sRay * d[1] - rtT[1];
      }
    }
    GrayF32 img = new GrayF32(w, h);
    Random rnd = new Random(seed);
    int ss = 4;
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int i00 = y * (w + 1) + x;
        int i10 = i00 + 1;
        int i01 = i00 + w + 1;
        int i11 = i01 + 1;
        double sum = 0;
        for (int j = 0; j < ss; j++) {
          double v = (j + 0.5) / ss;
          for (int i = 0; i < ss; i++) {
            double u = (i + 0.5) / ss;
            double bx = (1 - v) * ((1 - u) * gx[i00] + u * gx[i10]) + v * ((1 - u) * gx[i01] + u * gx[i11]);
            double by = (1 - v) * ((1 - u) * gy[i00] + u * gy[i10]) + v * ((1 - u) * gy[i01] + u * gy[i11]);
            sum += shade(bx, by, halfW, halfH, margin, board.squareSizeM());
          }
        }
        img.set(x, y, (float) (sum / (ss * ss) + noise * rnd.nextGaussian()));
      }
    }
    return img;
  }

  /** Where the forward model puts target point (bx, by): the truth for the detected corners. */
  public static Point2D_F64 project(CameraPinholeBrown cam, double[][] r, double[] t, double bx, double by) {
    double xc = r[0][0] * bx + r[0][1] * by + t[0];
    double yc = r[1][0] * bx + r[1][1] * by + t[1];
    double zc = r[2][0] * bx + r[2][1] * by + t[2];
    Point2D_F64 out = new Point2D_F64();
    LensDistortionFactory.narrow(cam).distort_F64(false, true).compute(xc / zc, yc / zc, out);
    return out;
  }

  private static float shade(double bx, double by, double halfW, double halfH, double margin, double sq) {
    if (Math.abs(bx) > halfW + margin || Math.abs(by) > halfH + margin) {
      return SURROUND;
    }
    if (Math.abs(bx) > halfW || Math.abs(by) > halfH) {
      return WHITE;
    }
    long i = (long) Math.floor((bx + halfW) / sq);
    long j = (long) Math.floor((by + halfH) / sq);
    return ((i + j) & 1) == 0 ? BLACK : WHITE;
  }

  private static double[][] rotX(double a) {
    double c = Math.cos(a);
    double s = Math.sin(a);
    return new double[][] {{1, 0, 0}, {0, c, -s}, {0, s, c}};
  }

  private static double[][] rotY(double a) {
    double c = Math.cos(a);
    double s = Math.sin(a);
    return new double[][] {{c, 0, s}, {0, 1, 0}, {-s, 0, c}};
  }

  private static double[][] mul(double[][] a, double[][] b) {
    double[][] o = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        for (int k = 0; k < 3; k++) {
          o[i][j] += a[i][k] * b[k][j];
        }
      }
    }
    return o;
  }

  /** R^T v. */
  private static double[] mulT(double[][] r, double[] v) {
    double[] o = new double[3];
    for (int i = 0; i < 3; i++) {
      for (int k = 0; k < 3; k++) {
        o[i] += r[k][i] * v[k];
      }
    }
    return o;
  }
}
