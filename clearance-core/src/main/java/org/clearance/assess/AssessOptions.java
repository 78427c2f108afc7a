package org.clearance.assess;

/**
 * Options of the assessment of a run.
 *
 * @param linkDistanceM encroaching points closer than this (3D) belong to the same site, m
 *     (&gt; 0)
 * @param drawnSpans spans with findings whose vegetation points are sampled for drawing, most
 *     urgent first (&gt;= 0)
 * @param drawnPointsPerSpan vegetation points sampled per span and view at most (&gt;= 0)
 */
public record AssessOptions(double linkDistanceM, int drawnSpans, int drawnPointsPerSpan) {

  /** Link distance of a site: about a crown radius (issue 5; common practice, no source). */
  public static final double DEFAULT_LINK_M = 1.5;
  /** Drawn spans: with the points below, keeps the report under about 5 MB on any network. */
  public static final int DEFAULT_DRAWN_SPANS = 100;
  /** Drawn points per span, view and kind (inside a zone, other): shows the vegetation's shape. */
  public static final int DEFAULT_DRAWN_POINTS = 600;

  public AssessOptions {
    if (!(Double.isFinite(linkDistanceM) && linkDistanceM > 0)) {
      throw new IllegalArgumentException("link distance must be positive: " + linkDistanceM);
    }
    if (drawnSpans < 0 || drawnPointsPerSpan < 0) {
      throw new IllegalArgumentException("span and point counts must not be negative");
    }
  }

  /** 1.5 m link, 100 drawn spans, 600 points per kind. */
  public static AssessOptions defaults() {
    return new AssessOptions(DEFAULT_LINK_M, DEFAULT_DRAWN_SPANS, DEFAULT_DRAWN_POINTS);
  }
}
