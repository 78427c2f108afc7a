package org.clearance.ground;

/** Height above the ground model for a point, m, or NaN where there is no ground. */
@FunctionalInterface
public interface HeightModel {
  /** Height of (x, y, z), m, above the ground at (x, y); NaN outside the ground model. */
  double heightAboveGround(double x, double y, double z);
}
