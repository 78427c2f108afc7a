package org.clearance.run;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The facts a report states in its header besides the measurements: the lines as specified, the
 * input files with their hashes and the survey's acquisition days. The day of the run is not one
 * of them: {@code model.json} holds only what the inputs determine (the same inputs give the same
 * bytes on any day and in any folder); the run's times are in {@code run.json}.
 *
 * @param lines the line specifications, in the order given
 * @param inputs the input files (role, file name without its folder, size, SHA-256)
 * @param firstSurveyDay UTC day of the earliest survey point, when the files give dates
 *     (adjusted standard GPS time)
 * @param lastSurveyDay UTC day of the latest survey point, when known
 * @param acquisitionNote how the days were found, or why they are not known
 */
public record RunFacts(
    List<LineFacts> lines, List<RunRecord.InputFile> inputs, Optional<LocalDate> firstSurveyDay,
    Optional<LocalDate> lastSurveyDay, String acquisitionNote) {

  public RunFacts {
    lines = List.copyOf(lines);
    inputs = List.copyOf(inputs);
    Objects.requireNonNull(firstSurveyDay, "firstSurveyDay");
    Objects.requireNonNull(lastSurveyDay, "lastSurveyDay");
    Objects.requireNonNull(acquisitionNote, "acquisitionNote");
  }

  /** No facts (a model written before they were recorded, or a test fixture). */
  public static RunFacts none() {
    return new RunFacts(List.of(), List.of(), Optional.empty(), Optional.empty(),
        "not recorded in this run folder");
  }

  /**
   * The UTC day of a run that started at {@code started} (the day a report states); when the environment variable
   * {@code SOURCE_DATE_EPOCH} (seconds since 1970, the reproducible-builds convention) is set, the
   * day of that instant instead, so that identical inputs give identical reports.
   */
  public static LocalDate runDay(java.time.Instant started) {
    String fixed = System.getenv("SOURCE_DATE_EPOCH");
    java.time.Instant at = started;
    if (fixed != null && fixed.strip().matches("[0-9]{1,12}")) {
      at = java.time.Instant.ofEpochSecond(Long.parseLong(fixed.strip()));
    }
    return at.atZone(java.time.ZoneOffset.UTC).toLocalDate();
  }

  /** The line with this id, if recorded. */
  public Optional<LineFacts> line(String lineId) {
    return lines.stream().filter(l -> l.lineId().equals(lineId)).findFirst();
  }
}
