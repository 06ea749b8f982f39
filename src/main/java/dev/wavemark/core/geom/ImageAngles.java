package dev.wavemark.core.geom;

/**
 * The angle conventions of the files contract. An image-plane direction is measured from +x
 * towards the top of the picture (counter-clockwise on screen), in (-pi, pi]; because image y
 * grows downward, the direction of a vector (dx, dy) is atan2(-dy, dx).
 */
public final class ImageAngles {
  private ImageAngles() {}

  /** Direction, in radians in (-pi, pi], of the image vector (dx, dy). */
  public static double direction(double dx, double dy) {
    double a = Math.atan2(-dy, dx);
    return a == -Math.PI ? Math.PI : a;
  }

  /** Direction of the vector from a to b. */
  public static double direction(Point2 a, Point2 b) {
    return direction(b.x() - a.x(), b.y() - a.y());
  }

  /** The unit image vector of a direction given in radians. */
  public static Point2 unit(double directionRad) {
    return new Point2(Math.cos(directionRad), -Math.sin(directionRad));
  }

  /** Wraps an angle into (-pi, pi]. */
  public static double wrap(double a) {
    double r = Math.IEEEremainder(a, 2 * Math.PI);
    return r == -Math.PI ? Math.PI : r;
  }

  /**
   * The acute angle between an undirected line of direction {@code lineRad} and a flow of
   * direction {@code flowRad}, in [0, pi/2]: the contract's wave angle.
   */
  public static double acuteToFlow(double lineRad, double flowRad) {
    double d = Math.abs(wrap(lineRad - flowRad));
    if (d > 0.5 * Math.PI) {
      d = Math.PI - d;
    }
    return d;
  }
}
