package org.clearance.clearance;

import java.util.Objects;

/**
 * What rule evaluation needs to know about a span besides the distances.
 *
 * @param spanId span id
 * @param lineId line id
 * @param nominalVoltageKv nominal phase-to-phase voltage, kV
 * @param altitudeM altitude of the line above sea level, m (for altitude-banded rules)
 * @param lengthM plan length of the span between structure centres, m
 */
public record SpanContext(
    String spanId, String lineId, double nominalVoltageKv, double altitudeM, double lengthM) {

  public SpanContext {
    Objects.requireNonNull(spanId, "spanId");
    Objects.requireNonNull(lineId, "lineId");
    if (!(Double.isFinite(nominalVoltageKv) && nominalVoltageKv > 0)) {
      throw new IllegalArgumentException("nominal voltage must be positive: " + nominalVoltageKv);
    }
    if (!(Double.isFinite(lengthM) && lengthM > 0)) {
      throw new IllegalArgumentException("span length must be positive: " + lengthM);
    }
  }
}
