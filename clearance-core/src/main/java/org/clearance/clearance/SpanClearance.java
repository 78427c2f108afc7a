package org.clearance.clearance;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What the engine measured for one span.
 *
 * @param spanId span id
 * @param minima the closest vegetation in each condition of the run, in run order
 * @param pointsMeasured vegetation points inside the span's measuring box
 * @param pointsKept points within the keep radius, stored for rule evaluation
 * @param excludedAsConductor points of an unclassified survey inside the measuring box set
 *     aside as wire points (the wire finder's evidence, docs/wire-finder.md)
 * @param excludedAsStructure points of an unclassified survey inside the measuring box taken to
 *     be structure points
 * @param excludedAsAirborne points of an unclassified survey inside the measuring box set aside
 *     as isolated airborne points (birds, high noise)
 */
public record SpanClearance(
    String spanId, List<ConditionMinimum> minima, long pointsMeasured, long pointsKept,
    long excludedAsConductor, long excludedAsStructure, long excludedAsAirborne) {

  /** A span's measurement without airborne points set aside. */
  public SpanClearance(String spanId, List<ConditionMinimum> minima, long pointsMeasured,
      long pointsKept, long excludedAsConductor, long excludedAsStructure) {
    this(spanId, minima, pointsMeasured, pointsKept, excludedAsConductor, excludedAsStructure,
        0);
  }

  public SpanClearance {
    Objects.requireNonNull(spanId, "spanId");
    minima = List.copyOf(minima);
  }

  /** The smallest distance over the conditions of a group, or empty when none was measured. */
  public Optional<ConditionMinimum> minimumOfGroup(String group) {
    ConditionMinimum best = null;
    for (ConditionMinimum m : minima) {
      if (m.group().equals(group) && Double.isFinite(m.distance())
          && (best == null || m.distance() < best.distance())) {
        best = m;
      }
    }
    return Optional.ofNullable(best);
  }

  /** The condition with the smallest distance overall, or empty. */
  public Optional<ConditionMinimum> governing() {
    ConditionMinimum best = null;
    for (ConditionMinimum m : minima) {
      if (Double.isFinite(m.distance()) && (best == null || m.distance() < best.distance())) {
        best = m;
      }
    }
    return Optional.ofNullable(best);
  }
}
