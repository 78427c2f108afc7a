package org.clearance.examples;

/**
 * One wood pole of the demo feeder (truth).
 *
 * @param id structure id as written in structures.csv
 * @param sequence order along the line, 1-based
 * @param x easting of the pole centre, m
 * @param y northing, m
 * @param groundZ ground elevation at the pole, m
 * @param heightM height of the pole top above the ground, m (10-14)
 * @param radiusM pole radius, m (0.13-0.2: a 0.26-0.4 m column)
 * @param deadEnd true at the ends of the line
 * @param alongX x of the unit plan vector along the line at the pole (bisector); alongY its y
 */
public record FeederPole(String id, int sequence, double x, double y, double groundZ,
    double heightM, double radiusM, boolean deadEnd, double alongX, double alongY) {

  /** Elevation of the pole top, m. */
  public double topZ() {
    return groundZ + heightM;
  }

  /** Unit plan vector across the line, to the left: x; {@link #acrossY()} its y. */
  public double acrossX() {
    return -alongY;
  }

  public double acrossY() {
    return alongX;
  }
}
