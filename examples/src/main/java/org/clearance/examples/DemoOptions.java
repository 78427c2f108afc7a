package org.clearance.examples;

import java.util.Objects;
import org.clearance.InputException;

/**
 * Options of the demo corridor generator. Invalid values throw {@link InputException} naming the
 * option (record component) at fault.
 *
 * @param seed seed of every random choice: the same options give the same scene, point for point
 * @param spanCount number of spans, {@value #MIN_SPANS} to {@value #MAX_SPANS} (the scenario is
 *     designed for 8-15; default {@value #DEFAULT_SPANS})
 * @param pointDensity laser pulses per square metre of one flight strip, {@value #MIN_DENSITY} to
 *     {@value #MAX_DENSITY} (default {@value #DEFAULT_DENSITY}); where strips overlap the densities
 *     add, so the corridor average is about 1.5 times this; wire and tower sampling scale with it
 * @param mode how the points are classified
 * @param corridorHalfWidth surveyed half width either side of the line centre, m,
 *     {@value #MIN_HALF_WIDTH} to {@value #MAX_HALF_WIDTH} (default {@value #DEFAULT_HALF_WIDTH})
 * @param structureEdit a deliberate error in the written structures file (none by default)
 * @param surveySwingDeg largest swing of the wires by the wind of the survey day, degrees,
 *     0 to {@value #MAX_SURVEY_SWING_DEG} (default 0: still air; {@link SurveyWind})
 * @param manMade whether the man-made fixtures of the labelling tests stand beside the line (a
 *     tower crane over it, a fence, a shed; {@link ManMadeFixtures}); default false
 */
public record DemoOptions(
    long seed,
    int spanCount,
    double pointDensity,
    ClassificationMode mode,
    double corridorHalfWidth,
    StructureEdit structureEdit,
    double surveySwingDeg,
    boolean manMade) {

  /** Largest survey-day swing offered, degrees: surveys are flown in light wind. */
  public static final double MAX_SURVEY_SWING_DEG = 10;

  /** Options in still air. */
  public DemoOptions(long seed, int spanCount, double pointDensity, ClassificationMode mode,
      double corridorHalfWidth, StructureEdit structureEdit) {
    this(seed, spanCount, pointDensity, mode, corridorHalfWidth, structureEdit, 0, false);
  }

  /** Default seed. */
  public static final long DEFAULT_SEED = 230_017L;
  public static final int MIN_SPANS = 3;
  public static final int MAX_SPANS = 2000;
  public static final int DEFAULT_SPANS = 12;
  public static final double MIN_DENSITY = 0.5;
  public static final double MAX_DENSITY = 200;
  /** Gives about 3 million points for 12 spans and a 60 m half width. */
  public static final double DEFAULT_DENSITY = 3.0;
  /** The right-of-way (25 m) plus room for buildings and edge trees outside it. */
  public static final double MIN_HALF_WIDTH = 50;
  public static final double MAX_HALF_WIDTH = 300;
  public static final double DEFAULT_HALF_WIDTH = 60;

  public DemoOptions {
    Objects.requireNonNull(mode, "mode");
    Objects.requireNonNull(structureEdit, "structureEdit");
    if (spanCount < MIN_SPANS || spanCount > MAX_SPANS) {
      throw bad("spanCount", "must be " + MIN_SPANS + " to " + MAX_SPANS + ": " + spanCount);
    }
    if (!(pointDensity >= MIN_DENSITY && pointDensity <= MAX_DENSITY)) {
      throw bad("pointDensity", "must be " + MIN_DENSITY + " to " + MAX_DENSITY
          + " pulses per m^2: " + pointDensity);
    }
    if (!(corridorHalfWidth >= MIN_HALF_WIDTH && corridorHalfWidth <= MAX_HALF_WIDTH)) {
      throw bad("corridorHalfWidth", "must be " + MIN_HALF_WIDTH + " to " + MAX_HALF_WIDTH
          + " m: " + corridorHalfWidth);
    }
    if (!(surveySwingDeg >= 0 && surveySwingDeg <= MAX_SURVEY_SWING_DEG)) {
      throw bad("surveySwingDeg", "must be 0 to " + MAX_SURVEY_SWING_DEG + " degrees: "
          + surveySwingDeg);
    }
    if (structureEdit.structureIndex() > spanCount) {
      throw bad("structureEdit", "structure index " + structureEdit.structureIndex()
          + " beyond the last structure " + spanCount);
    }
  }

  private static InputException bad(String field, String problem) {
    return new InputException((String) null, null, field, problem);
  }

  /** The default demo: seed {@value #DEFAULT_SEED}, 12 spans, 3 pulses/m^2, FULL, 60 m. */
  public static DemoOptions defaults() {
    return new DemoOptions(DEFAULT_SEED, DEFAULT_SPANS, DEFAULT_DENSITY, ClassificationMode.FULL,
        DEFAULT_HALF_WIDTH, StructureEdit.none());
  }

  public DemoOptions withSeed(long newSeed) {
    return new DemoOptions(newSeed, spanCount, pointDensity, mode, corridorHalfWidth,
        structureEdit, surveySwingDeg, manMade);
  }

  public DemoOptions withSpanCount(int spans) {
    return new DemoOptions(seed, spans, pointDensity, mode, corridorHalfWidth, structureEdit,
        surveySwingDeg, manMade);
  }

  public DemoOptions withPointDensity(double density) {
    return new DemoOptions(seed, spanCount, density, mode, corridorHalfWidth, structureEdit,
        surveySwingDeg, manMade);
  }

  public DemoOptions withMode(ClassificationMode newMode) {
    return new DemoOptions(seed, spanCount, pointDensity, newMode, corridorHalfWidth,
        structureEdit, surveySwingDeg, manMade);
  }

  public DemoOptions withCorridorHalfWidth(double halfWidth) {
    return new DemoOptions(seed, spanCount, pointDensity, mode, halfWidth, structureEdit,
        surveySwingDeg, manMade);
  }

  public DemoOptions withStructureEdit(StructureEdit edit) {
    return new DemoOptions(seed, spanCount, pointDensity, mode, corridorHalfWidth, edit,
        surveySwingDeg, manMade);
  }

  /** The same options with the labelling tests' man-made fixtures beside the line, or without. */
  public DemoOptions withManMade(boolean fixtures) {
    return new DemoOptions(seed, spanCount, pointDensity, mode, corridorHalfWidth, structureEdit,
        surveySwingDeg, fixtures);
  }

  /** The same options with the wires swung by the survey day's wind, up to this many degrees. */
  public DemoOptions withSurveySwing(double degrees) {
    return new DemoOptions(seed, spanCount, pointDensity, mode, corridorHalfWidth, structureEdit,
        degrees, manMade);
  }
}
