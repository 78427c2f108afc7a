package org.clearance.rules;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;

/**
 * Evaluates stored clearance distances against a rule profile. It reads only
 * {@link PointClearance} records and span data, never the survey, so changing a zone distance
 * and evaluating again takes seconds.
 *
 * <p>Use {@link #forSpan(SpanContext)} once per span and check its points with
 * {@link SpanRules#evaluate(PointClearance)}; the other methods are shortcuts over it.
 *
 * <p>Semantics (docs/rules.md): a point is inside a radial zone when its 3D distance to the
 * nearest conductor is less than the zone's distance, and inside a components zone when its
 * horizontal distance is less than the horizontal distance AND its absolute height difference
 * is less than the vertical distance; in each condition the zone selects. The finding is the
 * zone of lowest priority number the point is inside, in the condition with the largest
 * deficit. Years-to-violation use {@link GrowIn} with the growth rates of the point's class.
 */
public final class ZoneEvaluator {

  private final RuleProfile profile;

  /** @param profile the rule profile to apply */
  public ZoneEvaluator(RuleProfile profile) {
    this.profile = Objects.requireNonNull(profile, "profile");
  }

  /** Shortcut: the finding for one point of a span. */
  public static PointFinding evaluate(RuleProfile profile, SpanContext span,
      PointClearance point) {
    return new ZoneEvaluator(profile).forSpan(span).evaluate(point);
  }

  public RuleProfile profile() {
    return profile;
  }

  /** The profile resolved for one span (zones, distances, or why it is NOT ASSESSED). */
  public SpanRules forSpan(SpanContext span) {
    return SpanResolver.resolve(profile, Objects.requireNonNull(span, "span"));
  }

  /** The finding for one point of a span. */
  public PointFinding evaluate(SpanContext span, PointClearance point) {
    return forSpan(span).evaluate(point);
  }

  /**
   * The distances a zone requires at a station of a span, for the report's zone envelope.
   *
   * @param zone the zone's name
   * @param span the span
   * @param stationM station from the span's first structure, m
   * @return the requirement, or empty when the zone does not apply to the span or cannot be
   *     resolved for it ({@link SpanRules#gaps()} says why)
   */
  public Optional<Requirement> requiredDistance(String zone, SpanContext span, double stationM) {
    return forSpan(span).requirement(zone, stationM);
  }

  /**
   * The fall-in test of a tree near a span.
   *
   * @param span the span
   * @param treeHeightM tree height above its base, m (&gt; 0)
   * @param fromBase distances from the tree base to the nearest conductor, per condition
   */
  public FallInFinding fallIn(SpanContext span, double treeHeightM,
      List<ConditionDistance> fromBase) {
    return forSpan(span).fallIn(treeHeightM, fromBase);
  }
}
