package dev.wavemark.imaging.calib;

import boofcv.alg.geo.calibration.CalibrationObservation;
import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.imaging.io.ImageFiles;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The {@code calibrate} command's work: from pictures of a chessboard, the lens (several tilted
 * views, {@link IntrinsicFit}) and the flow direction and scale (one view of the board laid in
 * the test section, {@link TargetPose}), as a contract {@link Calibration}.
 */
public final class BenchCalibration {
  private BenchCalibration() {}

  /**
   * What to calibrate from.
   *
   * @param images the target pictures given on the command line
   * @param inSitu the picture of the board laid in the test section; when absent and only one
   *     picture is given, that one; when absent with several pictures, no flow direction or scale
   * @param target the board
   * @param priorLens a lens calibrated earlier, used when no lens views are given
   * @param nominalFlowRad the rough flow direction that picks one of the board's edge directions
   * @param placementUncertaintyRad standard uncertainty of the board's alignment with the
   *     tunnel axis, added in quadrature to the measured one
   * @param radialTerms radial coefficients to estimate, 1 or 2
   * @param tangential whether to estimate tangential distortion too
   */
  public record Request(List<Path> images, Optional<Path> inSitu, ChessboardTarget target, Optional<Calibration.Lens> priorLens,
      double nominalFlowRad, double placementUncertaintyRad, int radialTerms, boolean tangential) {
    public Request {
      images = List.copyOf(images);
    }
  }

  /**
   * The outcome.
   *
   * @param calibration the bench calibration (flow direction 0 and no scale when there was no in-situ view)
   * @param lensFit the lens fit, when lens views were given
   * @param pose the in-situ pose, when there was an in-situ view
   */
  public record Result(Calibration calibration, Optional<IntrinsicFit> lensFit, Optional<TargetPose> pose) {}

  /** Runs the calibration; every failure names the picture and what to do. */
  public static Result run(Request r) {
    if (r.images().isEmpty() && r.inSitu().isEmpty()) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, "no target picture given");
    }
    Optional<Path> inSitu = r.inSitu().isPresent() ? r.inSitu()
        : r.images().size() == 1 ? Optional.of(r.images().get(0)) : Optional.empty();
    List<Path> lensViews = new ArrayList<>();
    for (Path p : r.images()) {
      if (inSitu.isEmpty() || !p.equals(inSitu.get())) {
        lensViews.add(p);
      }
    }
    int width = -1;
    int height = -1;
    List<CalibrationObservation> obs = new ArrayList<>();
    for (Path p : lensViews) {
      GrayF32 g = ImageFiles.read(p);
      if (width < 0) {
        width = g.width;
        height = g.height;
      } else if (g.width != width || g.height != height) {
        throw new WavemarkException(Problem.BAD_ARGUMENT,
            p + " is " + g.width + "x" + g.height + " but " + lensViews.get(0) + " is " + width + "x" + height
                + "; all lens views must come from the same camera setting");
      }
      obs.add(detect(r.target(), g, p));
    }
    Optional<IntrinsicFit> fit = obs.isEmpty() ? Optional.empty()
        : Optional.of(IntrinsicFit.estimate(r.target(), obs, width, height, r.radialTerms(), r.tangential()));
    Optional<Calibration.Lens> lens = fit.map(f -> Lenses.fromBoof(f.camera())).or(r::priorLens);

    Optional<TargetPose> pose = Optional.empty();
    if (inSitu.isPresent()) {
      GrayF32 g = ImageFiles.read(inSitu.get());
      LensCorrection correction = lens.map(l -> LensCorrection.of(l, g.width, g.height)).orElse(LensCorrection.identity());
      pose = Optional.of(TargetPose.estimate(r.target(), detect(r.target(), g, inSitu.get()), correction, r.nominalFlowRad()));
    }
    Calibration cal = pose
        .map(p -> new Calibration(p.flowDirectionRad(), Math.hypot(p.flowDirectionUncertaintyRad(), r.placementUncertaintyRad()),
            Optional.of(p.metersPerPixel()), lens, Optional.empty()))
        .orElse(new Calibration(0, 0, Optional.empty(), lens, Optional.empty()));
    return new Result(cal, fit, pose);
  }

  private static CalibrationObservation detect(ChessboardTarget t, GrayF32 g, Path p) {
    return t.detect(g).orElseThrow(() -> new WavemarkException(Problem.TARGET_NOT_FOUND, p,
        "chessboard of " + t.rows() + "x" + t.cols() + " squares",
        "check the board size (count squares, not corners) and that the whole board with a white border is in view"));
  }
}
