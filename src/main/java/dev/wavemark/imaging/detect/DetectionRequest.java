package dev.wavemark.imaging.detect;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Optics;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * What one detection needs.
 *
 * @param frame the normalised frame: undisturbed flow reads about 0, waves read as signed
 *     departures from it (any scale; the detector works in units of the frame's own noise)
 * @param region where flow is seen (window minus model silhouette)
 * @param optics how the picture was formed; {@link Optics#AUTO} lets the detector decide
 * @param shape the model geometry, as photographed (distorted pixels); tells where waves start
 * @param flowDirectionRad the freestream direction in the image (files-contract sense)
 * @param hints the waves theory expects at the nominal Mach number, placed in the image; search
 *     hints only (the detector searches several degrees around them); may be empty
 * @param undistort optional map from photographed (distorted) to lens-corrected pixels, applied
 *     to the sub-pixel wave points before fitting
 * @param frameLabel names the frame in error messages
 */
public record DetectionRequest(
    GrayF32 frame, FlowRegion region, Optics optics, BodyShape shape, double flowDirectionRad,
    List<ExpectedWave> hints, Optional<UnaryOperator<Point2>> undistort, String frameLabel) {

  public DetectionRequest {
    hints = List.copyOf(hints);
  }

  /** A request with no hints and no lens correction. */
  public static DetectionRequest of(GrayF32 frame, FlowRegion region, Optics optics, BodyShape shape, double flowDirectionRad) {
    return new DetectionRequest(frame, region, optics, shape, flowDirectionRad, List.of(), Optional.empty(), "frame");
  }

  public DetectionRequest withHints(List<ExpectedWave> expected) {
    return new DetectionRequest(frame, region, optics, shape, flowDirectionRad, expected, undistort, frameLabel);
  }

  public DetectionRequest withUndistort(UnaryOperator<Point2> distortedToUndistorted) {
    return new DetectionRequest(frame, region, optics, shape, flowDirectionRad, hints, Optional.of(distortedToUndistorted), frameLabel);
  }

  public DetectionRequest withLabel(String label) {
    return new DetectionRequest(frame, region, optics, shape, flowDirectionRad, hints, undistort, label);
  }
}
