package org.clearance.wire;

/**
 * Where a wire's own survey points lie, so that a wire can be found on the ground even when no
 * curve was fitted to it (an extra the specification lacks, a piece too short to fit): its first
 * and last point along the span and its lowest point. Survey CRS coordinates in metres
 * (x, y, z); the caller converts to the survey's own unit.
 *
 * @param firstX x of the point nearest the span's first structure, m
 * @param firstY its y, m
 * @param firstZ its elevation, m
 * @param lastX x of the point nearest the span's second structure, m
 * @param lastY its y, m
 * @param lastZ its elevation, m
 * @param lowX x of the lowest point, m
 * @param lowY its y, m
 * @param lowZ its elevation, m
 */
public record WireExtent(double firstX, double firstY, double firstZ, double lastX,
    double lastY, double lastZ, double lowX, double lowY, double lowZ) {

  /** The extent of the points {@code members} of a span's candidates; null when none. */
  static WireExtent of(SpanPoints p, int[] members, org.clearance.line.SpanFrame frame) {
    if (members == null || members.length == 0) {
      return null;
    }
    int first = members[0];
    int last = members[0];
    int low = members[0];
    for (int i : members) {
      if (p.s(i) < p.s(first)) {
        first = i;
      }
      if (p.s(i) > p.s(last)) {
        last = i;
      }
      if (p.z(i) < p.z(low)) {
        low = i;
      }
    }
    return new WireExtent(frame.x(p.s(first), p.e(first)), frame.y(p.s(first), p.e(first)),
        p.z(first), frame.x(p.s(last), p.e(last)), frame.y(p.s(last), p.e(last)), p.z(last),
        frame.x(p.s(low), p.e(low)), frame.y(p.s(low), p.e(low)), p.z(low));
  }
}
