package org.clearance.examples;

/**
 * A stretch of a conductor with no survey points.
 *
 * @param startStation start station along the conductor's plan line, m, from attachment A
 * @param endStation end station, m (&gt; start)
 */
public record WireGap(double startStation, double endStation) {

  public WireGap {
    if (!(Double.isFinite(startStation) && endStation > startStation)) {
      throw new IllegalArgumentException("bad gap " + startStation + ", " + endStation);
    }
  }

  /** Length of the gap along the plan line, m. */
  public double length() {
    return endStation - startStation;
  }

  /** True when station s lies inside the gap. */
  public boolean contains(double s) {
    return s >= startStation && s < endStation;
  }
}
