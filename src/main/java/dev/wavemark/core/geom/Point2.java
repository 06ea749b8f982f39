package dev.wavemark.core.geom;

import dev.wavemark.core.numeric.Checks;

/**
 * A point (or vector) in the image plane, in pixels: x to the right, y downward, the centre of
 * the top-left pixel at (0, 0).
 */
public record Point2(double x, double y) {
  public Point2 {
    Checks.finite("x (px)", x);
    Checks.finite("y (px)", y);
  }

  public Point2 plus(Point2 o) {
    return new Point2(x + o.x, y + o.y);
  }

  public Point2 minus(Point2 o) {
    return new Point2(x - o.x, y - o.y);
  }

  public Point2 times(double s) {
    return new Point2(x * s, y * s);
  }

  public double dot(Point2 o) {
    return x * o.x + y * o.y;
  }

  /** z component of the cross product this x o. */
  public double cross(Point2 o) {
    return x * o.y - y * o.x;
  }

  public double norm() {
    return Math.hypot(x, y);
  }

  public double distanceTo(Point2 o) {
    return Math.hypot(x - o.x, y - o.y);
  }

  public Point2 unit() {
    double n = norm();
    return new Point2(x / n, y / n);
  }
}
