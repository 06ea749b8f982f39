package dev.wavemark.core.model;

import dev.wavemark.core.geom.FittedLine;
import java.util.Optional;

/**
 * A wave found in a picture, in core terms (the detector's output, free of image types).
 *
 * @param kind the detector's classification
 * @param side upper or lower, when the detector could tell from the model geometry
 * @param line the fitted line; for an expansion fan, one ObservedWave per boundary (head, tail)
 * @param contrast signed strength of the wave's signature in normalised intensity units
 * @param widthPx the wave's apparent thickness across the line, pixels
 * @param feature the model feature the detector attached it to, if any
 * @param bow for a bow shock, its stand-off and vertex curvature ({@code line} is then its tangent at the vertex)
 */
public record ObservedWave(
    WaveKind kind, Optional<Side> side, FittedLine line, double contrast, double widthPx, Optional<Feature> feature,
    Optional<BowShockFit> bow) {

  /** A straight wave (no bow-shock measurement). */
  public ObservedWave(WaveKind kind, Optional<Side> side, FittedLine line, double contrast, double widthPx, Optional<Feature> feature) {
    this(kind, side, line, contrast, widthPx, feature, Optional.empty());
  }
}
