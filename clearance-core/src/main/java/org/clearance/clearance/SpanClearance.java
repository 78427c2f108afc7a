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
 * @param excludedAsConductor points of an unclassified survey taken to be conductor points
 * @param excludedAsStructure points of an unclassified survey taken to be structure points
 */
public record SpanClearance(
    String spanId, List<ConditionMinimum> minima, long pointsMeasured, long pointsKept,
    long excludedAsConductor, long excludedAsStructure) {

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
