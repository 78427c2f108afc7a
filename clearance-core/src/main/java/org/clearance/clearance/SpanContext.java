package org.clearance.clearance;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeSet;

/**
 * What rule evaluation needs to know about a span besides the distances.
 *
 * @param spanId span id
 * @param lineId line id
 * @param nominalVoltageKv nominal phase-to-phase voltage of the line, kV
 * @param altitudeM altitude of the line above sea level, m (for altitude-banded rules)
 * @param lengthM plan length of the span between structure centres, m
 * @param positionVoltagesKv when the line's circuits carry different voltages (issue 15: a
 *     distribution circuit built under a transmission line), the voltage of every energised
 *     position by name, kV; empty when every conductor carries {@code nominalVoltageKv}
 */
public record SpanContext(
    String spanId, String lineId, double nominalVoltageKv, double altitudeM, double lengthM,
    Map<String, Double> positionVoltagesKv) {

  public SpanContext {
    Objects.requireNonNull(spanId, "spanId");
    Objects.requireNonNull(lineId, "lineId");
    if (!(Double.isFinite(nominalVoltageKv) && nominalVoltageKv > 0)) {
      throw new IllegalArgumentException("nominal voltage must be positive: " + nominalVoltageKv);
    }
    if (!(Double.isFinite(lengthM) && lengthM > 0)) {
      throw new IllegalArgumentException("span length must be positive: " + lengthM);
    }
    positionVoltagesKv = Collections.unmodifiableMap(new LinkedHashMap<>(positionVoltagesKv));
    for (double v : positionVoltagesKv.values()) {
      if (!(Double.isFinite(v) && v > 0)) {
        throw new IllegalArgumentException("position voltage must be positive: " + v);
      }
    }
  }

  /** A span whose conductors all carry the line's nominal voltage. */
  public SpanContext(String spanId, String lineId, double nominalVoltageKv, double altitudeM,
      double lengthM) {
    this(spanId, lineId, nominalVoltageKv, altitudeM, lengthM, Map.of());
  }

  /**
   * The distinct voltages of the span's energised conductors, kV, highest first: the line's
   * nominal voltage alone when every circuit carries it.
   */
  public List<Double> voltagesKv() {
    if (positionVoltagesKv.isEmpty()) {
      return List.of(nominalVoltageKv);
    }
    return new ArrayList<>(new TreeSet<>(positionVoltagesKv.values()).descendingSet());
  }

  /** Whether the span's energised conductors carry more than one voltage. */
  public boolean multiVoltage() {
    return voltagesKv().size() > 1;
  }

  /**
   * The voltage of a conductor by its position name (a sub-conductor {@code B.1} takes that of
   * {@code B}), kV; NaN for a wire of no known position (then every voltage of the span applies
   * to it, the safe reading).
   */
  public double voltageOf(String conductor) {
    if (positionVoltagesKv.isEmpty()) {
      return nominalVoltageKv;
    }
    Double v = positionVoltagesKv.get(conductor);
    if (v == null && conductor.contains(".")) {
      v = positionVoltagesKv.get(conductor.substring(0, conductor.lastIndexOf('.')));
    }
    return v == null ? Double.NaN : v;
  }

  /** The same span seen as carrying one voltage, for resolving a profile at that voltage. */
  public SpanContext atVoltage(double kv) {
    return new SpanContext(spanId, lineId, kv, altitudeM, lengthM, Map.of());
  }
}
