package org.clearance.examples;

/**
 * The plan corridor of the demo line: which span owns a plan point (the nearest span centre-line
 * segment), its station, offset and chainage, and the right-of-way test.
 */
final class Corridor {
  /** Half width of the cleared right-of-way, m (50 m in all: common practice, no source). */
  static final double ROW_HALF_WIDTH_M = 25.0;
  /** Neighbouring spans checked for ownership either side of a hint. */
  private static final int OWNER_REACH = 2;

  private final RoutePlan route;
  private final double halfWidth;
  private final double[] chainage;

  Corridor(RoutePlan route, double halfWidth) {
    this.route = route;
    this.halfWidth = halfWidth;
    int n = route.spanCount();
    chainage = new double[n + 1];
    for (int i = 0; i < n; i++) {
      chainage[i + 1] = chainage[i] + route.spanLength(i);
    }
  }

  double halfWidth() {
    return halfWidth;
  }

  int spanCount() {
    return route.spanCount();
  }

  /** Total plan length of the line, m. */
  double length() {
    return chainage[chainage.length - 1];
  }

  /** Station of (x, y) along span i's centre line, m from its start structure. */
  double station(int i, double x, double y) {
    return (x - route.x[i]) * route.ux(i) + (y - route.y[i]) * route.uy(i);
  }

  /** Offset of (x, y) from span i's centre line, m, positive to the left. */
  double offset(int i, double x, double y) {
    return -(x - route.x[i]) * route.uy(i) + (y - route.y[i]) * route.ux(i);
  }

  /** Easting of the point at station s and offset e of span i. */
  double x(int i, double s, double e) {
    return route.x[i] + s * route.ux(i) - e * route.uy(i);
  }

  /** Northing of the point at station s and offset e of span i. */
  double y(int i, double s, double e) {
    return route.y[i] + s * route.uy(i) + e * route.ux(i);
  }

  /** Plan distance from (x, y) to span i's centre-line segment, m. */
  double segmentDistance(int i, double x, double y) {
    double s = Math.max(0, Math.min(route.spanLength(i), station(i, x, y)));
    double dx = x - x(i, s, 0);
    double dy = y - y(i, s, 0);
    return Math.sqrt(dx * dx + dy * dy); // not Math.hypot: this runs per point
  }

  /** Chainage of (x, y) projected on span i, clamped to the span, m from the line start. */
  double chainage(int i, double x, double y) {
    return chainage[i] + Math.max(0, Math.min(route.spanLength(i), station(i, x, y)));
  }

  /**
   * The span owning (x, y): the nearest centre-line segment among spans near {@code hint} (lower
   * index on ties), or -1 when the point lies farther than the corridor half width.
   */
  int owner(double x, double y, int hint) {
    int best = -1;
    double bestD = Double.POSITIVE_INFINITY;
    int lo = Math.max(0, hint - OWNER_REACH);
    int hi = Math.min(route.spanCount() - 1, hint + OWNER_REACH);
    for (int i = lo; i <= hi; i++) {
      double d = segmentDistance(i, x, y);
      if (d < bestD) {
        bestD = d;
        best = i;
      }
    }
    return bestD <= halfWidth ? best : -1;
  }

  /** True when (x, y), owned by span i, lies in the cleared right-of-way. */
  boolean inRow(int i, double x, double y) {
    return segmentDistance(i, x, y) < ROW_HALF_WIDTH_M;
  }
}
