package org.clearance.examples;

/**
 * How the demo survey's points are classified (ASPRS LAS 1.4 R15 class codes).
 */
public enum ClassificationMode {
  /**
   * Everything labelled: ground 2, vegetation 3/4/5 by height, buildings 6, noise 7/18,
   * shield wires 13, phase conductors and jumpers 14, towers 15, insulators 16; birds stay 1.
   * A few stray class-14 labels sit on one roof and in one tree crown, as vendors' mistakes do.
   */
  FULL,
  /** As {@link #FULL} but wires (13, 14) stay unclassified (1) and there are no stray labels. */
  WIRES_UNLABELLED,
  /**
   * What public lidar often carries: only ground (2), water (9) and noise (7, 18) labelled;
   * every other point, vegetation, wires, towers, buildings and birds, class 1.
   */
  GROUND_ONLY,
  /** Every point class 1, not even ground. */
  UNCLASSIFIED,
  /**
   * A survey classified in some tiles only, as vendors deliver it when a contract covers part
   * of an area: in a checkerboard of {@link #TILE_M} m tiles (by easting and northing) every
   * other tile is labelled as {@link #FULL} (without stray labels), the rest as
   * {@link #GROUND_ONLY}.
   */
  PARTLY_LABELLED,
  /**
   * As {@link #FULL} (without stray labels) but every wire point (13, 14) labelled high
   * vegetation (5), as a vendor's classifier leaves a wire it sampled too sparsely to tell from
   * a branch (issue 9: labels trusted only as far as they are consistent).
   */
  WIRES_AS_VEGETATION;

  /** Side of the tiles of {@link #PARTLY_LABELLED}, m. */
  static final double TILE_M = 100.0;

  /** ASPRS class 1, unclassified. */
  static final int UNCLASSIFIED_CLASS = 1;
  /** ASPRS class 2, ground. */
  static final int GROUND_CLASS = 2;
  /** ASPRS class 7, low point (noise). */
  static final int LOW_NOISE_CLASS = 7;
  /** ASPRS class 9, water. */
  static final int WATER_CLASS = 9;
  /** ASPRS class 18, high noise. */
  static final int HIGH_NOISE_CLASS = 18;
  /** ASPRS class 5, high vegetation. */
  static final int HIGH_VEGETATION_CLASS = 5;
  /** ASPRS class 13, wire - guard (shield). */
  static final int SHIELD_CLASS = 13;
  /** ASPRS class 14, wire - conductor (phase). */
  static final int CONDUCTOR_CLASS = 14;

  /**
   * The class a point gets in this mode.
   *
   * @param fullClass the class the point has in {@link #FULL} mode, 0-255
   * @return the class written in this mode
   */
  public int label(int fullClass) {
    return label(fullClass, 0, 0);
  }

  /**
   * The class a point at (x, y) gets in this mode.
   *
   * @param fullClass the class the point has in {@link #FULL} mode, 0-255
   * @param x easting, m
   * @param y northing, m
   * @return the class written in this mode
   */
  public int label(int fullClass, double x, double y) {
    switch (this) {
      case FULL:
        return fullClass;
      case WIRES_UNLABELLED:
        return fullClass == SHIELD_CLASS || fullClass == CONDUCTOR_CLASS
            ? UNCLASSIFIED_CLASS : fullClass;
      case GROUND_ONLY:
        return fullClass == GROUND_CLASS || fullClass == WATER_CLASS
            || fullClass == LOW_NOISE_CLASS || fullClass == HIGH_NOISE_CLASS
            ? fullClass : UNCLASSIFIED_CLASS;
      case UNCLASSIFIED:
        return UNCLASSIFIED_CLASS;
      case PARTLY_LABELLED:
        return ((long) Math.floor(x / TILE_M) + (long) Math.floor(y / TILE_M)) % 2 == 0
            ? fullClass : GROUND_ONLY.label(fullClass);
      case WIRES_AS_VEGETATION:
        return fullClass == SHIELD_CLASS || fullClass == CONDUCTOR_CLASS
            ? HIGH_VEGETATION_CLASS : fullClass;
      default:
        throw new AssertionError(this);
    }
  }

  /** True when this mode carries the vendors' stray class-14 labels. */
  public boolean hasStrayLabels() {
    return this == FULL;
  }
}
