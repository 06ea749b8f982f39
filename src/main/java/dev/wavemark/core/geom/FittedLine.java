package dev.wavemark.core.geom;

/**
 * A straight line fitted to sub-pixel wave points, in (lens-corrected) image pixels.
 *
 * @param centroid the centroid of the points used
 * @param directionRad the line's image direction (contract sense), pointing from start to end
 * @param directionUncertaintyRad standard uncertainty of the direction
 * @param startPx first end of the fitted segment (the end nearest the wave's origin)
 * @param endPx the other end
 * @param support number of points used in the final fit
 * @param rmsResidualPx RMS of the normal residuals of the points used
 * @param curved true when a straightness test rejected part of the wave (only the straight part is fitted)
 */
public record FittedLine(
    Point2 centroid, double directionRad, double directionUncertaintyRad, Point2 startPx, Point2 endPx,
    int support, double rmsResidualPx, boolean curved) {}
