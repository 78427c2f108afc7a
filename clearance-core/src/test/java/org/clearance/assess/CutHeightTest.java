package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfileReader;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneEvaluator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The highest top a point's vegetation may keep (CutHeight), hand-computed cases. */
class CutHeightTest {

  private static final SpanContext SPAN = new SpanContext("S", "L", 115, 0, 200);

  private static RuleProfile profile(String distance) {
    return RuleProfileReader.parse(String.join("\n", "name: t", "title: T", "source: S",
        "zones:", "  - {name: z, priority: 1, violation_reference: true, conditions: [hot], "
            + distance + "}",
        "growth_m_per_year:", "  class_5: {vertical: 0.5, lateral: 0.2}",
        "  default: {vertical: 1.0, lateral: 0.2}", "trim_cycle_years: 2"), "t.yaml");
  }

  private static PointClearance point(double h, double v, int cls) {
    // one surveyed distance (not selected by the zone) and one hot distance
    return new PointClearance("S", 0, 0, 50, cls, 10, List.of(
        new ConditionDistance("survey", "survey", 0.1, 0.1, 0, "A", 100),
        new ConditionDistance("hot", "hot", Math.hypot(h, v), h, v, "A", 100)));
  }

  // computed by hand: the point is at z 50 m, the conductor at 50 - v; growth = rate x 2 years
  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = ';', value = {
    // case; zone; h; v; class; expected top (m)
    "straight below, radial; radial_m: 2; 0; -1; 5; 51 - 2 - 1.0",
    "aside, radial; radial_m: 2; 1; -1; 5; 51 - 1.7320508075688772 - 1.0",
    "other class grows faster; radial_m: 2; 0; -1; 3; 51 - 2 - 2.0",
    "above the conductor; radial_m: 2; 0.5; 0.5; 5; 49.5 - 1.9364916731037085 - 1.0",
    "components, inside horizontally; 'horizontal_m: 3, vertical_m: 2'; 2.5; -1; 5; 51 - 2 - 1",
  })
  void allowedTop(String name, String zone, double h, double v, int cls, String expected) {
    SpanRules rules = new ZoneEvaluator(profile(zone)).forSpan(SPAN);
    assertEquals(eval(expected), CutHeight.allowedTop(rules, point(h, v, cls)), 1e-12);
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = ';', value = {
    "radial, beside the zone; radial_m: 2; 2.5; -1",
    "components, beside; 'horizontal_m: 3, vertical_m: 2'; 3.5; -0.5",
  })
  void besideTheZoneHasNoHeightLimit(String name, String zone, double h, double v) {
    SpanRules rules = new ZoneEvaluator(profile(zone)).forSpan(SPAN);
    assertEquals(Double.POSITIVE_INFINITY, CutHeight.allowedTop(rules, point(h, v, 5)), 0);
  }

  /** Evaluates "a - b - c" written in the table. */
  private static double eval(String expr) {
    String[] parts = expr.split(" - ");
    double v = Double.parseDouble(parts[0].trim());
    for (int i = 1; i < parts.length; i++) {
      v -= Double.parseDouble(parts[i].trim());
    }
    return v;
  }
}
