package org.clearance.examples;

import java.util.Objects;

/**
 * A tree or shrub of the demo scene (truth). The crown is a solid of revolution about the vertical
 * axis through the base: a cone from the crown base up to the top, or an ellipsoid spanning the
 * crown base to the top.
 *
 * @param id index in {@link DemoScene#trees()}
 * @param x easting of the stem, m
 * @param y northing of the stem, m
 * @param baseZ ground elevation at the stem, m
 * @param heightM height of the top above the base, m
 * @param shape crown shape
 * @param crownRadiusM largest crown radius, m
 * @param crownBaseHeightM height of the crown's lowest point above the base, m
 * @param role why the tree is there
 * @param span index of the span whose corridor holds the stem
 * @param nearestSpan span of the conductor nearest to the top
 * @param nearestPosition position of that conductor
 * @param apexDistanceM exact 3D distance from the top to the nearest conductor at the survey
 *     state, m
 * @param baseDistanceM exact 3D distance from the stem base to the nearest conductor, m: the tree
 *     can fall into the line when {@code heightM >= baseDistanceM}
 */
public record DemoTree(
    int id,
    double x,
    double y,
    double baseZ,
    double heightM,
    Shape shape,
    double crownRadiusM,
    double crownBaseHeightM,
    Role role,
    int span,
    int nearestSpan,
    String nearestPosition,
    double apexDistanceM,
    double baseDistanceM) {

  /** Crown shape. */
  public enum Shape {
    /** Conifer: a cone with its widest section at the crown base. */
    CONE,
    /** Broadleaf (and shrub): an ellipsoid. */
    ELLIPSOID
  }

  /** Why a tree is where it is. */
  public enum Role {
    /** A stand tree outside the right-of-way. */
    FOREST,
    /** Low woody vegetation, mostly in the cleared right-of-way. */
    SHRUB,
    /** Planted with its top 1-5 m from a conductor (inside typical clearance zones). */
    GROW_IN,
    /** Planted with its top 5.5-9 m from a conductor (just outside). */
    NEAR_MISS,
    /** Planted outside the right-of-way, taller than its distance to the nearest conductor. */
    FALL_IN
  }

  public DemoTree {
    Objects.requireNonNull(shape, "shape");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(nearestPosition, "nearestPosition");
  }

  /** Elevation of the top, m. */
  public double topZ() {
    return baseZ + heightM;
  }

  /** True when the tree is tall enough to reach a conductor by falling about its base. */
  public boolean fallInCandidate() {
    return heightM >= baseDistanceM;
  }

  /** Crown length from its base to the top, m. */
  public double crownLengthM() {
    return heightM - crownBaseHeightM;
  }

  /**
   * Elevation of the crown's upper surface at plan distance r from the stem, m, or NaN outside
   * the crown.
   */
  public double upperZ(double r) {
    if (!(r <= crownRadiusM)) {
      return Double.NaN;
    }
    double q = r / crownRadiusM;
    if (shape == Shape.CONE) {
      return topZ() - crownLengthM() * q;
    }
    double half = 0.5 * crownLengthM();
    return baseZ + crownBaseHeightM + half + half * Math.sqrt(1 - q * q);
  }

  /** Elevation of the crown's lower surface at plan distance r, m, or NaN outside the crown. */
  public double lowerZ(double r) {
    if (!(r <= crownRadiusM)) {
      return Double.NaN;
    }
    if (shape == Shape.CONE) {
      return baseZ + crownBaseHeightM;
    }
    double q = r / crownRadiusM;
    double half = 0.5 * crownLengthM();
    return baseZ + crownBaseHeightM + half - half * Math.sqrt(1 - q * q);
  }
}
