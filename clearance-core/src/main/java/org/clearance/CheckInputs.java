package org.clearance;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.survey.UnitsChoice;

/**
 * The files of one clearance check.
 *
 * @param survey the LAS files of the survey (tiles read as one)
 * @param surveyUnits how to take the survey's units
 * @param structures the structures file (CSV or GeoJSON)
 * @param lines the line specifications (YAML), one per line
 * @param conductors a user conductor library that adds to or replaces built-in types, if any
 * @param rules a rule profile (built-in name or file), if any
 * @param outDir the run folder to write
 */
public record CheckInputs(
    List<Path> survey, UnitsChoice surveyUnits, Path structures, List<Path> lines,
    Optional<Path> conductors, Optional<String> rules, Path outDir) {

  public CheckInputs {
    survey = List.copyOf(survey);
    lines = List.copyOf(lines);
    Objects.requireNonNull(surveyUnits, "surveyUnits");
    Objects.requireNonNull(structures, "structures");
    Objects.requireNonNull(conductors, "conductors");
    Objects.requireNonNull(rules, "rules");
    Objects.requireNonNull(outDir, "outDir");
    if (survey.isEmpty()) {
      throw new InputException("--survey", null, null, "give at least one survey file");
    }
    if (lines.isEmpty()) {
      throw new InputException("--line", null, null, "give at least one line specification");
    }
  }
}
