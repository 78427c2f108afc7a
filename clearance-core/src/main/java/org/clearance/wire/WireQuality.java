package org.clearance.wire;

/**
 * How well the survey shows one conductor and how closely the fitted curve follows it.
 *
 * @param points number of survey points the final fit kept (inliers), &gt;= 0
 * @param coveragePct share of the span's full horizontal length (structure to structure) along
 *     which the kept points lie without a break longer than {@link #COVERAGE_BREAK_M}, percent,
 *     0-100; NaN when not computed
 * @param rmsM RMS of the 3D distance from the kept points to the fitted curve (lateral offset
 *     from the plan line combined with the orthogonal distance from the catenary), m; NaN when
 *     not computed
 * @param maxGapM longest stretch of the span, structure to structure, without a kept point
 *     (including the stretches from each structure to the first point), m; NaN when not computed
 * @param curveSigmaM largest standard deviation of the fitted curve's elevation over the span,
 *     from the parameter covariance (first-order propagation, methods.md 7.2), m; NaN when the
 *     fit has no covariance
 */
public record WireQuality(int points, double coveragePct, double rmsM, double maxGapM,
    double curveSigmaM) {

  /**
   * Distance between neighbouring points along the span above which the stretch between them
   * counts as uncovered, m: five times the 1 m spacing of sparse airborne wire returns (common
   * practice, no source).
   */
  public static final double COVERAGE_BREAK_M = 5.0;

  public WireQuality {
    if (points < 0) {
      throw new IllegalArgumentException("points must be >= 0: " + points);
    }
  }

  /** The quality of a conductor that was not found: no points, nothing computed. */
  public static WireQuality none() {
    return new WireQuality(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
  }
}
