package org.clearance.ground;

/**
 * Fall-in geometry: a rigid tree falling about its base sweeps a sphere of radius equal to its
 * height, so it can strike a conductor when the conductor comes within that height plus the
 * required clearance of the base (methods.md 5.2, after the NERC FAC-003 / ANSI A300 Part 7
 * notion of a tree that could contact the line). A screening test: lean, direction of fall and
 * crown reach are refinements it does not make.
 */
public final class FallIn {
  private FallIn() {}

  /**
   * Straight-line distance from the tree's base (top x, y at ground) to a point.
   *
   * @param tree the tree
   * @param x easting, metres
   * @param y northing, metres
   * @param z elevation, metres
   * @return distance, metres, &gt;= 0; NaN when the tree's base is unknown
   */
  public static double distanceFromBase(Tree tree, double x, double y, double z) {
    double dx = x - tree.x();
    double dy = y - tree.y();
    double dz = z - tree.baseZ();
    return Math.sqrt(dx * dx + dy * dy + dz * dz);
  }

  /**
   * How far the falling tree reaches past the clearance boundary of the conductor:
   * {@code height + clearance - distance}; positive (or zero) means a fall-in candidate.
   *
   * @param tree the tree (its height in metres)
   * @param distance distance from the tree's base to the nearest conductor point, metres, &gt;= 0
   * @param clearance required clearance around the conductor, metres, &gt;= 0
   * @return margin, metres
   * @throws IllegalArgumentException when distance or clearance is negative or not finite
   */
  public static double reachMargin(Tree tree, double distance, double clearance) {
    if (!(Double.isFinite(distance) && distance >= 0)) {
      throw new IllegalArgumentException("distance must be finite and >= 0: " + distance);
    }
    if (!(Double.isFinite(clearance) && clearance >= 0)) {
      throw new IllegalArgumentException("clearance must be finite and >= 0: " + clearance);
    }
    return tree.height() + clearance - distance;
  }

  /**
   * True when the tree could fall into the clearance zone: distance &lt;= height + clearance.
   *
   * @see #reachMargin
   */
  public static boolean isCandidate(Tree tree, double distance, double clearance) {
    return reachMargin(tree, distance, clearance) >= 0;
  }
}
