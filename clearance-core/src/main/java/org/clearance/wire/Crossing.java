package org.clearance.wire;

/**
 * A wire that crosses a span instead of running along it: a service drop, a distribution or
 * communication line crossing under or over the span (issue 15). It is not one of the span's
 * conductors; its points are set aside with reason {@link SetAside.Reason#CROSSING} and counted,
 * and vegetation beside it is still measured (docs/wire-finder.md, "Crossing wires").
 *
 * @param x plan position, m (survey CRS, SI): where the crossing wire meets the plan line of the
 *     span's lowest fitted conductor (the span's centre line when none is fitted); y likewise
 * @param z the crossing wire's elevation there, m
 * @param stationM that place's station along the span from its first structure, m
 * @param angleDeg angle between the crossing wire and the span in plan, degrees, 0-90
 * @param points the crossing wire's survey points in the span's corridor
 * @param conductor the span's lowest fitted conductor at the crossing, or empty when none is
 *     fitted there
 * @param separationM that conductor's elevation at the crossing minus the crossing wire's, m:
 *     positive when the crossing wire passes below; NaN when no conductor is fitted there
 */
public record Crossing(double x, double y, double z, double stationM, double angleDeg,
    int points, String conductor, double separationM) {

  public Crossing {
    java.util.Objects.requireNonNull(conductor, "conductor");
  }
}
