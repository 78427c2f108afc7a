package org.clearance.clearance;

import java.util.List;
import java.util.Objects;

/**
 * One vegetation point near a span, with its distances to the span's conductors in every line
 * condition. The clearance engine stores these so that rule profiles can be re-evaluated without
 * reading the survey again.
 *
 * @param spanId id of the span the distances refer to
 * @param x easting, m (survey CRS scaled to metres)
 * @param y northing, m
 * @param z elevation, m
 * @param classification ASPRS class of the point (as read, or as inferred for unclassified data)
 * @param heightAboveGround height above the ground model, m, or NaN where there is no ground
 * @param distances one entry per condition, the surveyed state first
 */
public record PointClearance(
    String spanId,
    double x,
    double y,
    double z,
    int classification,
    double heightAboveGround,
    List<ConditionDistance> distances) {

  public PointClearance {
    Objects.requireNonNull(spanId, "spanId");
    distances = List.copyOf(distances);
  }

  /** The smallest distance over all conditions. */
  public ConditionDistance governing() {
    ConditionDistance best = null;
    for (ConditionDistance d : distances) {
      if (best == null || d.distance() < best.distance()) {
        best = d;
      }
    }
    if (best == null) {
      throw new IllegalStateException("no distances for a point of span " + spanId);
    }
    return best;
  }
}
