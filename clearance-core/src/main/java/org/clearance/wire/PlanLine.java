package org.clearance.wire;

import java.util.Objects;
import org.clearance.line.SpanFrame;

/**
 * A straight line in plan fitted to wire points: a point on it, its unit direction, and how well
 * the points follow it.
 *
 * <p>Coordinates in metres (easting, northing). Offsets are positive to the left looking along
 * the direction, as in {@link SpanFrame}.
 *
 * @param pointX easting of a point on the line (the weighted centroid of the inliers), m
 * @param pointY northing of that point, m
 * @param ux x component of the unit direction
 * @param uy y component of the unit direction
 * @param rmsLateral RMS perpendicular distance of the inliers from the line, m, &gt;= 0
 * @param inliers the points the fit kept
 */
public record PlanLine(double pointX, double pointY, double ux, double uy, double rmsLateral,
    PointMask inliers) {

  /** Largest allowed deviation of |u| from 1. */
  private static final double UNIT_TOLERANCE = 1e-9;
  /** Smallest |sin| of the angle between this line and a frame's normal for an intersection. */
  private static final double PARALLEL_LIMIT = 1e-12;

  public PlanLine {
    Objects.requireNonNull(inliers, "inliers");
    if (!(Double.isFinite(pointX) && Double.isFinite(pointY))) {
      throw new IllegalArgumentException("point must be finite");
    }
    if (!(Math.abs(Math.hypot(ux, uy) - 1) < UNIT_TOLERANCE)) {
      throw new IllegalArgumentException("direction must be a unit vector: " + ux + ", " + uy);
    }
    if (!(rmsLateral >= 0)) {
      throw new IllegalArgumentException("rmsLateral must be >= 0: " + rmsLateral);
    }
  }

  /** Signed perpendicular distance of a plan point from the line, m, positive to the left. */
  public double offset(double x, double y) {
    return -(x - pointX) * uy + (y - pointY) * ux;
  }

  /** Position of a plan point along the line from {@link #pointX()}, {@link #pointY()}, m. */
  public double along(double x, double y) {
    return (x - pointX) * ux + (y - pointY) * uy;
  }

  /** Azimuth of the direction, radians clockwise from grid north, in [0, 2 pi). */
  public double azimuth() {
    double a = Math.atan2(ux, uy);
    return a < 0 ? a + 2 * Math.PI : a;
  }

  /** The same line with its direction reversed when it points against (dx, dy). */
  public PlanLine orientedAlong(double dx, double dy) {
    if (ux * dx + uy * dy >= 0) {
      return this;
    }
    return new PlanLine(pointX, pointY, -ux, -uy, rmsLateral, inliers);
  }

  /**
   * Signed angle from the frame's direction to this line's direction, radians in (-pi, pi],
   * positive counter-clockwise.
   */
  public double angleTo(SpanFrame frame) {
    return Math.atan2(frame.ux() * uy - frame.uy() * ux, frame.ux() * ux + frame.uy() * uy);
  }

  /**
   * Offset of this line in a span frame at a station: where the frame's cross-section at station
   * s meets the line, m (positive to the frame's left). NaN when the line runs along the
   * cross-section.
   *
   * @param frame the span frame
   * @param s station along the frame, m
   */
  public double offsetAt(SpanFrame frame, double s) {
    double px = frame.x(s, 0);
    double py = frame.y(s, 0);
    double nx = -frame.uy();
    double ny = frame.ux();
    double denominator = nx * uy - ny * ux; // cross(n, u)
    if (!(Math.abs(denominator) > PARALLEL_LIMIT)) {
      return Double.NaN;
    }
    // p + e n = point + t u  =>  e = cross(point - p, u) / cross(n, u)
    return ((pointX - px) * uy - (pointY - py) * ux) / denominator;
  }
}
