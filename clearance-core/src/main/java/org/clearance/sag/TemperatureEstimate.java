package org.clearance.sag;

import java.util.Objects;
import org.clearance.line.SurveyTemperatureSpec.Source;

/**
 * The conductor temperature at survey time used for a tension section and conductor position,
 * with its standard uncertainty and where it comes from.
 *
 * @param temperatureC conductor temperature, degC; NaN when it could not be found
 * @param sigmaC standard uncertainty, degC (&gt;= 0); NaN when not found
 * @param source measured, assumed, computed (IEEE Std 738-2012) or none
 * @param dominant the input whose range contributes most to {@code sigmaC} (for example
 *     {@code wind speed}); {@code survey temperature range} for a given temperature
 * @param detail what it was computed from, or why it could not be, for reports
 */
public record TemperatureEstimate(
    double temperatureC, double sigmaC, Source source, String dominant, String detail) {

  public TemperatureEstimate {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(dominant, "dominant");
    Objects.requireNonNull(detail, "detail");
  }

  /** A temperature that could not be found, with the reason. */
  public static TemperatureEstimate missing(Source source, String why) {
    return new TemperatureEstimate(Double.NaN, Double.NaN, source, "", why);
  }

  /** Whether a temperature was found. */
  public boolean isKnown() {
    return Double.isFinite(temperatureC);
  }
}
