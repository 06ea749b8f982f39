package dev.wavemark.imaging.calib;

import boofcv.abst.geo.calibration.CalibrateMonoPlanar;
import boofcv.abst.geo.calibration.ImageResults;
import boofcv.alg.geo.calibration.CalibrationObservation;
import boofcv.struct.calib.CameraPinholeBrown;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.util.List;

/**
 * Camera intrinsics and Brown distortion from several views of a planar target, by Zhang's
 * method with bundle adjustment (BoofCV {@code CalibrateMonoPlanar}): zero skew, one or two radial
 * terms, tangential terms optional.
 *
 * @param camera the estimated lens
 * @param views the number of views used
 * @param meanErrorPx mean reprojection error over all views, pixels
 * @param maxErrorPx largest reprojection error of any corner, pixels
 */
public record IntrinsicFit(CameraPinholeBrown camera, int views, double meanErrorPx, double maxErrorPx) {

  /** Fewest views accepted: Zhang's method needs two homographies, three make the problem well posed. */
  public static final int MIN_VIEWS = 3;

  /**
   * Estimates the lens from {@code observations} of {@code target}, taken on pictures of
   * {@code width} x {@code height} pixels. Views should be tilted differently (five or more
   * is common practice), covering the field, the corners especially, where distortion shows.
   */
  public static IntrinsicFit estimate(ChessboardTarget target, List<CalibrationObservation> observations, int width, int height,
      boolean tangential) {
    return estimate(target, observations, width, height, 2, tangential);
  }

  /**
   * As {@link #estimate(ChessboardTarget, List, int, int, boolean)} with {@code radialTerms} (1 or 2) radial
   * coefficients. With a long focal length (a narrow field, as on most schlieren benches) k1 and k2
   * cannot be told apart and two terms give a wild k2; one term is then the better model.
   */
  public static IntrinsicFit estimate(ChessboardTarget target, List<CalibrationObservation> observations, int width, int height,
      int radialTerms, boolean tangential) {
    if (radialTerms < 1 || radialTerms > 2) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, "radial terms must be 1 or 2, got " + radialTerms);
    }
    if (observations.size() < MIN_VIEWS) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "lens calibration needs at least " + MIN_VIEWS + " views of the target, tilted differently; got " + observations.size());
    }
    CalibrateMonoPlanar cal = new CalibrateMonoPlanar();
    cal.configurePinhole(true, radialTerms, tangential);
    cal.initialize(width, height, List.of(target.layout()));
    for (CalibrationObservation o : observations) {
      cal.addImage(o);
    }
    CameraPinholeBrown cam;
    try {
      cam = cal.process();
    } catch (RuntimeException e) {
      throw new WavemarkException(e, Problem.NO_SOLUTION,
          "lens calibration failed (" + e.getMessage() + "); use more views with more varied tilts");
    }
    double sum = 0;
    double max = 0;
    int n = 0;
    for (ImageResults r : cal.getErrors()) {
      for (double e : r.pointError) {
        sum += e;
        max = Math.max(max, e);
        n++;
      }
    }
    return new IntrinsicFit(cam, observations.size(), n == 0 ? Double.NaN : sum / n, max);
  }
}
