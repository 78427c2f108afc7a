package org.clearance.run;

import java.util.List;
import java.util.Objects;
import org.clearance.clearance.ConditionSet;
import org.clearance.survey.SurveyUnits;

/**
 * Everything a finished check knows except the per-point distances (those are in
 * {@code near-points.bin}): enough to re-evaluate another rule profile and redraw every report
 * without reading the survey again. Stored as {@code model.json} in the run folder
 * ({@link RunModelJson}).
 *
 * @param toolVersion Clearance version that measured
 * @param units survey units and CRS (outputs convert metres back to them)
 * @param conditions the run's conditions, surveyed first
 * @param keepRadiusM points within this distance of a conductor in any condition were stored, m
 * @param vegetation how vegetation points were chosen
 * @param groundSource how the ground model was made
 * @param spans the spans in line and sequence order
 * @param trees trees near the line, for fall-in
 * @param facts the lines as specified, input files, survey and run days, for the report header
 */
public record RunModel(
    String toolVersion, SurveyUnits units, ConditionSet conditions, double keepRadiusM,
    String vegetation, String groundSource, List<SpanRecord> spans, List<TreeRecord> trees,
    RunFacts facts) {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "model.json";

  public RunModel {
    Objects.requireNonNull(toolVersion, "toolVersion");
    Objects.requireNonNull(units, "units");
    Objects.requireNonNull(conditions, "conditions");
    Objects.requireNonNull(vegetation, "vegetation");
    Objects.requireNonNull(groundSource, "groundSource");
    spans = List.copyOf(spans);
    trees = List.copyOf(trees);
    Objects.requireNonNull(facts, "facts");
  }

  /** A model without header facts ({@link RunFacts#none}). */
  public RunModel(String toolVersion, SurveyUnits units, ConditionSet conditions,
      double keepRadiusM, String vegetation, String groundSource, List<SpanRecord> spans,
      List<TreeRecord> trees) {
    this(toolVersion, units, conditions, keepRadiusM, vegetation, groundSource, spans, trees,
        RunFacts.none());
  }

  /** The same model with header facts. */
  public RunModel withFacts(RunFacts f) {
    return new RunModel(toolVersion, units, conditions, keepRadiusM, vegetation, groundSource,
        spans, trees, f);
  }
}
