package org.clearance.report;

import java.util.Objects;
import org.clearance.survey.LinearUnit;

/**
 * Options of the report stage.
 *
 * @param outputUnit unit of the distances, heights, chainages and areas written to the work list,
 *     span table and report: {@link LinearUnit#METRE} or {@link LinearUnit#FOOT} (international
 *     foot); coordinates x, y, z always stay in the survey's own units
 * @param linkDistanceM encroaching points closer than this (3D) belong to the same site, m
 *     (&gt; 0)
 * @param consoleSpans spans listed in the console summary (&gt;= 1)
 * @param drawnSpans spans with findings drawn in the HTML report, most urgent first (&gt;= 0)
 * @param drawnPointsPerSpan vegetation points drawn per span and view at most (&gt;= 0)
 */
public record ReportOptions(
    LinearUnit outputUnit, double linkDistanceM, int consoleSpans, int drawnSpans,
    int drawnPointsPerSpan) {

  /** Link distance of a site: about a crown radius (issue 5; common practice, no source). */
  public static final double DEFAULT_LINK_M = 1.5;
  /** Console lines for spans: a screenful. */
  public static final int DEFAULT_CONSOLE_SPANS = 10;
  /** Drawn spans: with the points below, keeps the report under about 5 MB on any network. */
  public static final int DEFAULT_DRAWN_SPANS = 100;
  /** Drawn points per span, view and kind (inside a zone, other): shows the vegetation's shape. */
  public static final int DEFAULT_DRAWN_POINTS = 600;

  public ReportOptions {
    Objects.requireNonNull(outputUnit, "outputUnit");
    if (outputUnit == LinearUnit.US_SURVEY_FOOT) {
      throw new IllegalArgumentException("reports are written in metres or international feet");
    }
    if (!(Double.isFinite(linkDistanceM) && linkDistanceM > 0)) {
      throw new IllegalArgumentException("link distance must be positive: " + linkDistanceM);
    }
    if (consoleSpans < 1 || drawnSpans < 0 || drawnPointsPerSpan < 0) {
      throw new IllegalArgumentException("span and point counts must not be negative");
    }
  }

  /** Metres, 1.5 m link, 10 console spans, 100 drawn spans, 600 points per kind. */
  public static ReportOptions defaults() {
    return new ReportOptions(LinearUnit.METRE, DEFAULT_LINK_M, DEFAULT_CONSOLE_SPANS,
        DEFAULT_DRAWN_SPANS, DEFAULT_DRAWN_POINTS);
  }

  /** The same options with another output unit. */
  public ReportOptions withUnit(LinearUnit unit) {
    return new ReportOptions(unit, linkDistanceM, consoleSpans, drawnSpans, drawnPointsPerSpan);
  }
}
