package org.clearance.line;

/**
 * A local plan frame along a straight line from a start point: station {@code s} along the line,
 * offset {@code e} across it (positive to the left looking from the start towards the end), and
 * elevation unchanged.
 *
 * <p>All values in metres. The frame is the one of docs/methods.md (notation): u = unit
 * plan vector from start to end, n = (-u_y, u_x).
 *
 * @param originX easting of the start, m
 * @param originY northing of the start, m
 * @param ux x component of the unit direction
 * @param uy y component of the unit direction
 * @param length plan length from start to end, m (&gt; 0)
 */
public record SpanFrame(double originX, double originY, double ux, double uy, double length) {

  /** Largest allowed deviation of |u| from 1; guards against unnormalised input. */
  private static final double UNIT_TOLERANCE = 1e-9;

  public SpanFrame {
    if (!(Double.isFinite(originX) && Double.isFinite(originY))) {
      throw new IllegalArgumentException("origin must be finite");
    }
    if (!(Math.abs(Math.hypot(ux, uy) - 1.0) < UNIT_TOLERANCE)) {
      throw new IllegalArgumentException("direction must be a unit vector: " + ux + ", " + uy);
    }
    if (!(Double.isFinite(length) && length > 0)) {
      throw new IllegalArgumentException("length must be positive: " + length);
    }
  }

  /**
   * The frame from (x1, y1) to (x2, y2).
   *
   * @throws IllegalArgumentException when the two points coincide in plan
   */
  public static SpanFrame between(double x1, double y1, double x2, double y2) {
    double dx = x2 - x1;
    double dy = y2 - y1;
    double len = Math.hypot(dx, dy);
    if (!(len > 0)) {
      throw new IllegalArgumentException("start and end coincide in plan");
    }
    return new SpanFrame(x1, y1, dx / len, dy / len, len);
  }

  /** Station of a plan point along the line, m (0 at the start, {@link #length()} at the end). */
  public double station(double x, double y) {
    return (x - originX) * ux + (y - originY) * uy;
  }

  /** Offset of a plan point across the line, m, positive to the left looking forward. */
  public double offset(double x, double y) {
    return -(x - originX) * uy + (y - originY) * ux;
  }

  /** Easting of the plan point at station s and offset e, m. */
  public double x(double s, double e) {
    return originX + s * ux - e * uy;
  }

  /** Northing of the plan point at station s and offset e, m. */
  public double y(double s, double e) {
    return originY + s * uy + e * ux;
  }

  /** Azimuth of the line direction, radians clockwise from grid north, in [0, 2 pi). */
  public double azimuth() {
    double a = Math.atan2(ux, uy);
    return a < 0 ? a + 2 * Math.PI : a;
  }
}
