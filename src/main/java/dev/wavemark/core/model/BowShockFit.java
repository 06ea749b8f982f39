package dev.wavemark.core.model;

import dev.wavemark.core.geom.Point2;

/**
 * A bow shock measured near its vertex: where it crosses the stagnation line ahead of a blunt
 * nose and how it curves there. Lengths in lens-corrected image pixels; uncertainties are
 * standard uncertainties.
 *
 * @param vertexPx where the fitted shock crosses the stagnation line
 * @param standoffPx the shock's distance ahead of the nose's stagnation point, along the line
 * @param standoffSigmaPx its standard uncertainty (the fit's, with the detector's floor)
 * @param vertexRadiusPx the fitted shock's radius of curvature on the stagnation line
 * @param vertexRadiusSigmaPx its standard uncertainty
 * @param noseRadiusPx the nose radius the stand-off is measured from (from the run file)
 * @param halfSpanPx the fit used shock points up to this distance either side of the stagnation line
 * @param curvePx the fitted shape sampled across that span, for drawing
 */
public record BowShockFit(
    Point2 vertexPx, double standoffPx, double standoffSigmaPx, double vertexRadiusPx, double vertexRadiusSigmaPx,
    double noseRadiusPx, double halfSpanPx, java.util.List<Point2> curvePx) {

  public BowShockFit {
    curvePx = java.util.List.copyOf(curvePx);
  }

  /** The stand-off in nose radii, delta / R. */
  public double standoffRatio() {
    return standoffPx / noseRadiusPx;
  }
}
