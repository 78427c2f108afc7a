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
 * @param unread points of classes the check does not read that may be vegetation
 *     ({@link VegetationSelector#unread}) within the keep radius of a conductor
 * @param excludedAsObject points of an unclassified survey inside the measuring box set aside
 *     as parts of man-made objects (the labelling step's evidence, docs/labelling.md)
 * @param excludedAsCrossing points of an unclassified survey inside the measuring box set aside
 *     as points of a wire crossing the span (docs/wire-finder.md, "Crossing wires")
 * @param wireTouched points inside the measuring box on a wire but touched by vegetation
 *     (within the wire finder's touch distance), measured: probably the wire itself
 *     ({@code SetAside.touchedWire}; docs/clearance.md, "A wire touched by vegetation")
 * @param labelsDistrusted points inside the measuring box whose label was not believed: a
 *     class-2 point high above the ground model measured as unclassified, a vegetation label on
 *     a man-made or linear object set aside (docs/labelling.md, "Partly labelled surveys")
 * @param minimumOnWire the conditions (names, run order) whose minimum stands on a point of
 *     {@code wireTouched}
 */
public record SpanClearance(
    String spanId, List<ConditionMinimum> minima, long pointsMeasured, long pointsKept,
    long excludedAsConductor, long excludedAsStructure, long excludedAsAirborne, Unread unread,
    long excludedAsObject, long excludedAsCrossing, long wireTouched, long labelsDistrusted,
    List<String> minimumOnWire) {

  /** A span's measurement without wire points touched by vegetation or labels distrusted. */
  public SpanClearance(String spanId, List<ConditionMinimum> minima, long pointsMeasured,
      long pointsKept, long excludedAsConductor, long excludedAsStructure,
      long excludedAsAirborne, Unread unread, long excludedAsObject, long excludedAsCrossing) {
    this(spanId, minima, pointsMeasured, pointsKept, excludedAsConductor, excludedAsStructure,
        excludedAsAirborne, unread, excludedAsObject, excludedAsCrossing, 0, 0, List.of());
  }

  /** A span's measurement without crossing wires set aside. */
  public SpanClearance(String spanId, List<ConditionMinimum> minima, long pointsMeasured,
      long pointsKept, long excludedAsConductor, long excludedAsStructure,
      long excludedAsAirborne, Unread unread, long excludedAsObject) {
    this(spanId, minima, pointsMeasured, pointsKept, excludedAsConductor, excludedAsStructure,
        excludedAsAirborne, unread, excludedAsObject, 0);
  }

  /**
   * Points not read as vegetation that may be vegetation, near the conductors.
   *
   * @param count how many lie within the keep radius of a conductor in some condition
   * @param nearestM the nearest of them, m (NaN when none)
   * @param classes their ASPRS classes, ascending
   */
  public record Unread(long count, double nearestM, List<Integer> classes) {
    /** None. */
    public static final Unread NONE = new Unread(0, Double.NaN, List.of());

    public Unread {
      classes = List.copyOf(classes);
    }
  }

  /** A span's measurement without man-made objects set aside. */
  public SpanClearance(String spanId, List<ConditionMinimum> minima, long pointsMeasured,
      long pointsKept, long excludedAsConductor, long excludedAsStructure,
      long excludedAsAirborne, Unread unread) {
    this(spanId, minima, pointsMeasured, pointsKept, excludedAsConductor, excludedAsStructure,
        excludedAsAirborne, unread, 0);
  }

  /** A span's measurement without unread points. */
  public SpanClearance(String spanId, List<ConditionMinimum> minima, long pointsMeasured,
      long pointsKept, long excludedAsConductor, long excludedAsStructure,
      long excludedAsAirborne) {
    this(spanId, minima, pointsMeasured, pointsKept, excludedAsConductor, excludedAsStructure,
        excludedAsAirborne, Unread.NONE, 0);
  }

  /** A span's measurement without airborne points set aside. */
  public SpanClearance(String spanId, List<ConditionMinimum> minima, long pointsMeasured,
      long pointsKept, long excludedAsConductor, long excludedAsStructure) {
    this(spanId, minima, pointsMeasured, pointsKept, excludedAsConductor, excludedAsStructure,
        0, Unread.NONE, 0);
  }

  public SpanClearance {
    Objects.requireNonNull(spanId, "spanId");
    minima = List.copyOf(minima);
    Objects.requireNonNull(unread, "unread");
    minimumOnWire = List.copyOf(minimumOnWire);
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
