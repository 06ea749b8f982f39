package dev.wavemark.imaging.calib;

import boofcv.alg.geo.calibration.CalibrationObservation;
import boofcv.factory.geo.FactoryMultiView;
import boofcv.struct.geo.AssociatedPair;
import boofcv.struct.geo.PointIndex2D_F64;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import georegression.geometry.GeometryMath_F64;
import georegression.struct.point.Point2D_F64;
import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;

/**
 * Roll and scale from one picture of a flat target laid in the test section (the in-situ view):
 * the corners are undistorted, a homography H with pixel = H·target is fitted (normalised DLT,
 * BoofCV {@code homographyDLT}), and H's Jacobian at the board centre gives the image direction
 * of the target's x-axis and the pixels per metre along both target axes.
 *
 * <p><b>Flow direction.</b> Lay the board flat in the plane of the flow with the edges of its
 * squares along the tunnel axis. Every board edge direction (x-axis + k·90°) is then either along
 * or across the flow, and the flow direction is the one of the four closest to a nominal
 * direction (0° = left to right, the contract default). This also settles the chessboard's own
 * 180°/90° ambiguity.
 *
 * @param targetXAxisRad image direction (contract sense: from +x towards the top) of the
 *     detected target x-axis, as the detector numbered the corners
 * @param flowDirectionRad the board edge direction closest to the nominal flow direction
 * @param flowDirectionUncertaintyRad formal standard uncertainty of that direction from the
 *     corner residuals (σ_perp / sqrt(Σ u²), u the corners' along-axis offsets in pixels); it
 *     does not include how well the board was aligned with the tunnel axis
 * @param metersPerPixel the mean of both axes' scale in the board plane
 * @param scaleAnisotropy (ppm_x - ppm_y) / mean: how far the pixels are from square, or the board from face-on
 * @param rmsResidualPx root mean square distance between undistorted corners and H's prediction
 * @param corners the number of corners used
 */
public record TargetPose(double targetXAxisRad, double flowDirectionRad, double flowDirectionUncertaintyRad,
    double metersPerPixel, double scaleAnisotropy, double rmsResidualPx, int corners) {

  /** Estimates the pose from a detected board; {@code nominalFlowRad} resolves the board's symmetry. */
  public static TargetPose estimate(ChessboardTarget target, CalibrationObservation observation, LensCorrection lens,
      double nominalFlowRad) {
    List<Point2D_F64> layout = target.layout();
    List<AssociatedPair> pairs = new ArrayList<>();
    List<Point2> pixels = new ArrayList<>();
    double cx = 0;
    double cy = 0;
    for (PointIndex2D_F64 p : observation.points) {
      Point2 u = lens.undistort(new Point2(p.p.x, p.p.y));
      Point2D_F64 t = layout.get(p.index);
      pairs.add(new AssociatedPair(t.x, t.y, u.x(), u.y()));
      pixels.add(u);
      cx += t.x;
      cy += t.y;
    }
    int n = pairs.size();
    if (n < 4) {
      throw new WavemarkException(Problem.NO_SOLUTION, "the in-situ view shows only " + n + " target corners; at least 4 are needed");
    }
    cx /= n;
    cy /= n;
    DMatrixRMaj h = new DMatrixRMaj(3, 3);
    if (!FactoryMultiView.homographyDLT(true).process(pairs, h)) {
      throw new WavemarkException(Problem.NO_SOLUTION, "no homography fits the target corners of the in-situ view");
    }
    double step = target.squareSizeM();
    Point2D_F64 c = map(h, cx, cy);
    Point2D_F64 ex = map(h, cx + step, cy);
    Point2D_F64 ey = map(h, cx, cy + step);
    double ppmX = Math.hypot(ex.x - c.x, ex.y - c.y) / step;
    double ppmY = Math.hypot(ey.x - c.x, ey.y - c.y) / step;
    double axis = ImageAngles.direction(ex.x - c.x, ex.y - c.y);

    double sumSq = 0;
    double sumU2 = 0;
    for (int i = 0; i < n; i++) {
      AssociatedPair a = pairs.get(i);
      Point2D_F64 pred = map(h, a.p1.x, a.p1.y);
      Point2 obs = pixels.get(i);
      sumSq += (pred.x - obs.x()) * (pred.x - obs.x()) + (pred.y - obs.y()) * (pred.y - obs.y());
      double u = (a.p1.x - cx) * ppmX;
      sumU2 += u * u;
    }
    // the homography has 8 parameters fitted to 2n coordinates
    double rms = Math.sqrt(sumSq / n);
    double sigmaPerp = Math.sqrt(sumSq / Math.max(1, 2 * n - 8));
    double sigmaTheta = sigmaPerp / Math.sqrt(sumU2);
    double mean = 0.5 * (ppmX + ppmY);
    return new TargetPose(axis, closestEdge(axis, nominalFlowRad), sigmaTheta, 1.0 / mean, (ppmX - ppmY) / mean, rms, n);
  }

  /** Of the four directions {@code axisRad + k·90°}, the one closest to {@code nominalRad}, in (-π, π]. */
  public static double closestEdge(double axisRad, double nominalRad) {
    double d = ImageAngles.wrap(axisRad - nominalRad);
    double quarter = 0.5 * Math.PI;
    double k = Math.rint(d / quarter);
    return ImageAngles.wrap(axisRad - k * quarter);
  }

  private static Point2D_F64 map(DMatrixRMaj h, double x, double y) {
    Point2D_F64 out = new Point2D_F64();
    GeometryMath_F64.mult(h, new Point2D_F64(x, y), out);
    return out;
  }
}
