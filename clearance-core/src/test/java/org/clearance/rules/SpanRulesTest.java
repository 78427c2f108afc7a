package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.junit.jupiter.api.Test;

/** Guards of the evaluation against values the engine did not compute (NaN). */
class SpanRulesTest {

  private static final RuleProfile MIDSPAN = RuleProfileReader.parse(String.join("\n",
      "name: m", "title: T", "source: S", "zones:",
      "  - {name: z, priority: 1, violation_reference: true, conditions: [all], radial_m: 2,",
      "     midspan_allowance: {middle_fraction: 0.5, add_m_per_100m: 0.5, beyond_span_m: 0}}"),
      "m.yaml");

  private static PointClearance point(double d, double station) {
    return new PointClearance("S", 0, 0, 0, 5, Double.NaN,
        List.of(new ConditionDistance("survey", "survey", d, 0, -d, "A", station)));
  }

  @Test
  void distanceNotComputedIsNotAssessedNeverClear() {
    SpanRules rules = new ZoneEvaluator(MIDSPAN).forSpan(new SpanContext("S", "L", 11, 0, 100));
    PointFinding f = rules.evaluate(point(Double.NaN, 50));
    assertEquals(PointFinding.Verdict.NOT_ASSESSED, f.verdict());
    assertTrue(f.notAssessedReason().orElseThrow().contains("no distance"));
  }

  @Test
  void unknownStationTakesTheFullAllowance() {
    // computed: allowance 0.5 x 100 / 100 = 0.5 m in the middle half; unknown station ->
    // conservative full allowance, required 2.5 m, deficit 2.5 - 2.2 = 0.3 m.
    SpanRules rules = new ZoneEvaluator(MIDSPAN).forSpan(new SpanContext("S", "L", 11, 0, 100));
    PointFinding f = rules.evaluate(point(2.2, Double.NaN));
    assertEquals(2.5, f.violation().orElseThrow().requiredM(), 1e-12);
    assertEquals(0.3, f.violation().orElseThrow().deficitM(), 1e-12);
    // at a known station near a structure the base distance applies: 2.2 m is clear of 2 m
    assertEquals(PointFinding.Verdict.CLEAR, rules.evaluate(point(2.2, 10)).verdict());
  }
}
