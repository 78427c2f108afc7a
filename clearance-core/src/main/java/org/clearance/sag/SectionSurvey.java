package org.clearance.sag;

/**
 * What the survey tells about one conductor position of a tension section: its ruling span, its
 * horizontal tension at survey time (from {@link SectionTension}) and the conductor temperature
 * during the survey. A value that is not known is NaN; conditions that need it then cannot be
 * computed ({@link ConditionSolver} says which value is missing).
 *
 * @param rulingSpan ruling span of the section, m (&gt; 0), or NaN
 * @param horizontalTension survey horizontal tension H_s, N (&gt; 0), or NaN
 * @param conductorTemperatureC conductor temperature during the survey, degC, or NaN
 */
public record SectionSurvey(
    double rulingSpan, double horizontalTension, double conductorTemperatureC) {

  public SectionSurvey {
    if (!(Double.isNaN(rulingSpan) || (Double.isFinite(rulingSpan) && rulingSpan > 0))) {
      throw new IllegalArgumentException("ruling span must be positive or NaN: " + rulingSpan);
    }
    if (!(Double.isNaN(horizontalTension)
        || (Double.isFinite(horizontalTension) && horizontalTension > 0))) {
      throw new IllegalArgumentException("survey tension must be positive or NaN: "
          + horizontalTension);
    }
    if (Double.isInfinite(conductorTemperatureC)) {
      throw new IllegalArgumentException("survey temperature must be finite or NaN");
    }
  }

  /** A section about which nothing is known (enough for swing and extra-sag conditions). */
  public static SectionSurvey unknown() {
    return new SectionSurvey(Double.NaN, Double.NaN, Double.NaN);
  }
}
