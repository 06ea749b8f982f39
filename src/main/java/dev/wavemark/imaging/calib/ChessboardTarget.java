package dev.wavemark.imaging.calib;

import boofcv.abst.fiducial.calib.ConfigGridDimen;
import boofcv.abst.geo.calibration.DetectSingleFiducialCalibration;
import boofcv.alg.geo.calibration.CalibrationObservation;
import boofcv.alg.misc.ImageStatistics;
import boofcv.factory.fiducial.FactoryFiducialCalibration;
import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import georegression.struct.point.Point2D_F64;
import java.util.List;
import java.util.Optional;

/**
 * A printed chessboard target: {@code rows} x {@code cols} squares of side {@code squareSizeM}
 * metres, so (rows - 1)(cols - 1) interior corners are measured. Detection uses BoofCV's
 * x-corner chessboard detector.
 *
 * <p>Target coordinates ({@link #layout()}) are BoofCV's: metres, centred on the board, x along
 * the rows of squares, y up. A chessboard looks the same turned by 180° (by 90° too when square),
 * so the detector may report either way round; {@link TargetPose} resolves this with a nominal
 * direction.
 */
public record ChessboardTarget(int rows, int cols, double squareSizeM) {
  /** See {@link #detect}. */
  static final double X_CORNER_OFFSET_PX = 0.5;

  public ChessboardTarget {
    if (rows < 3 || cols < 3) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "a chessboard needs at least 3x3 squares, got " + rows + "x" + cols);
    }
    if (!(squareSizeM > 0) || !Double.isFinite(squareSizeM)) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, "square size must be a positive length in metres, got " + squareSizeM);
    }
  }

  /** The interior corners in target coordinates (metres, y up), in BoofCV's index order. */
  public List<Point2D_F64> layout() {
    return detector().getLayout();
  }

  /** Number of interior corners. */
  public int cornerCount() {
    return (rows - 1) * (cols - 1);
  }

  /**
   * Finds every interior corner of the board in {@code image} (any intensity scale: it is
   * stretched to 0..255 for the detector). Empty when the whole board is not found. Not
   * thread-safe across calls on one detector, so each call builds its own.
   */
  public Optional<CalibrationObservation> detect(GrayF32 image) {
    float min = ImageStatistics.min(image);
    float max = ImageStatistics.max(image);
    if (!(max > min)) {
      return Optional.empty();
    }
    GrayF32 scaled = image.createSameShape();
    float k = 255f / (max - min);
    for (int i = 0; i < image.data.length; i++) {
      scaled.data[i] = (image.data[i] - min) * k;
    }
    DetectSingleFiducialCalibration d = detector();
    if (!d.process(scaled)) {
      return Optional.empty();
    }
    CalibrationObservation obs = d.getDetectedPoints().copy();
    if (obs.size() != cornerCount()) {
      return Optional.empty();
    }
    // BoofCV's x-corner detector reports corners half a pixel right of and below the contract's
    // convention (pixel centres at integers): measured +0.50 px in x and y against boards rendered
    // in test scope; shifting here keeps cx, cy in the contract's frame
    for (var p : obs.points) {
      p.p.x -= X_CORNER_OFFSET_PX;
      p.p.y -= X_CORNER_OFFSET_PX;
    }
    return Optional.of(obs);
  }

  private DetectSingleFiducialCalibration detector() {
    return FactoryFiducialCalibration.chessboardX(null, new ConfigGridDimen(rows, cols, squareSizeM));
  }
}
