package dev.wavemark.core.geom;

/**
 * Coordinates aligned with the freestream: {@code s} along the flow and {@code n} across it,
 * positive towards the top of the picture when the flow runs left to right (the "upper" side of
 * the contract). Built from the contract's {@code flowDirectionDeg}, converted to radians.
 *
 * @param flowDirectionRad the freestream direction in the image, contract sense
 * @param origin the image point that maps to (0, 0)
 */
public record FlowFrame(double flowDirectionRad, Point2 origin) {
  /** The image unit vector along the flow. */
  public Point2 along() {
    return ImageAngles.unit(flowDirectionRad);
  }

  /** The image unit vector across the flow, pointing to the upper side. */
  public Point2 across() {
    return ImageAngles.unit(flowDirectionRad + 0.5 * Math.PI);
  }

  /** Flow coordinates (s, n) of an image point, returned as a Point2(s, n). */
  public Point2 toFlow(Point2 image) {
    Point2 d = image.minus(origin);
    return new Point2(d.dot(along()), d.dot(across()));
  }

  /** The image point of flow coordinates (s, n). */
  public Point2 toImage(double s, double n) {
    return origin.plus(along().times(s)).plus(across().times(n));
  }

  /**
   * The image direction (contract sense) of a line leaving the origin downstream at angle
   * {@code angleToFlowRad} to the flow, on the upper (+1) or lower (-1) side.
   */
  public double imageDirection(double angleToFlowRad, int sideSign) {
    return ImageAngles.wrap(flowDirectionRad + sideSign * angleToFlowRad);
  }
}
