package org.clearance.report;

import java.util.Objects;
import org.clearance.assess.AssessOptions;
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

  /** Link distance of a site, m: {@link AssessOptions#DEFAULT_LINK_M}. */
  public static final double DEFAULT_LINK_M = AssessOptions.DEFAULT_LINK_M;
  /** Console lines for spans: a screenful. */
  public static final int DEFAULT_CONSOLE_SPANS = 10;
  /** Drawn spans: {@link AssessOptions#DEFAULT_DRAWN_SPANS}. */
  public static final int DEFAULT_DRAWN_SPANS = AssessOptions.DEFAULT_DRAWN_SPANS;
  /** Drawn points per span, view and kind: {@link AssessOptions#DEFAULT_DRAWN_POINTS}. */
  public static final int DEFAULT_DRAWN_POINTS = AssessOptions.DEFAULT_DRAWN_POINTS;

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

  /** The options of the assessment stage. */
  public AssessOptions assessOptions() {
    return new AssessOptions(linkDistanceM, drawnSpans, drawnPointsPerSpan);
  }

  /** The same options with another output unit. */
  public ReportOptions withUnit(LinearUnit unit) {
    return new ReportOptions(unit, linkDistanceM, consoleSpans, drawnSpans, drawnPointsPerSpan);
  }
}
