package org.clearance.sag;

import java.util.Objects;

/**
 * The survey-time conductor temperature of a span, for reports: the span's own (from its flight
 * time) and its tension section's, which the change of state uses ({@link SurveyTemperatures}).
 *
 * @param span the span's own estimate
 * @param section the section's estimate (the length-weighted mean of its spans')
 */
public record SpanTemperature(TemperatureEstimate span, TemperatureEstimate section) {
  public SpanTemperature {
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(section, "section");
  }
}
