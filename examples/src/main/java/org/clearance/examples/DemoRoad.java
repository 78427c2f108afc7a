package org.clearance.examples;

/**
 * The straight road that crosses the corridor (truth). Its surface is graded level across its
 * width; ground points on it carry the truth kind ROAD.
 *
 * @param x easting of a point on the road axis (where it crosses the line), m
 * @param y northing of that point, m
 * @param ux x component of the unit plan direction of the axis
 * @param uy y component of the unit plan direction of the axis
 * @param widthM paved width, m
 * @param span index of the span the road crosses
 */
public record DemoRoad(double x, double y, double ux, double uy, double widthM, int span) {

  /** Plan distance of a point from the road axis, m. */
  public double distance(double px, double py) {
    return Math.abs(-(px - x) * uy + (py - y) * ux);
  }

  /** Station of a point's projection on the axis, m from (x, y). */
  public double along(double px, double py) {
    return (px - x) * ux + (py - y) * uy;
  }
}
