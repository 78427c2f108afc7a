package org.clearance.ground;

/**
 * A test on a plan position, e.g. "within 60 m of a span", used to keep only the part of the
 * survey that matters. Called once per point: it should be cheap and must not allocate.
 */
@FunctionalInterface
public interface PlanPredicate {
  /** Accepts every position. */
  PlanPredicate ALL = (x, y) -> true;

  /**
   * @param x easting, metres
   * @param y northing, metres
   * @return true to keep the position
   */
  boolean test(double x, double y);
}
