package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.junit.jupiter.api.Test;

/**
 * Issue 15: a span carrying a 230 kV circuit (A, B, C) and a 12.47 kV underbuild circuit (D, E,
 * F) is held to each circuit's own zones. Hand-computed cases under California PRC 4293 (10 ft =
 * 3.048 m at 110 kV and above, 4 ft = 1.2192 m from 2.4 to below 72 kV; published,
 * docs/references.md R2) and NERC FAC-003 MVCD (covers 200 kV and above; 230 kV: 4.0 ft =
 * 1.2192 m, from memory, R1).
 */
class CircuitRulesTest {

  private static final double FOOT = 0.3048;
  private static final SpanContext SPAN = new SpanContext("L/1-2", "L", 230, 0, 250,
      // in position order, as the line specification gives them (Map.of has no fixed order)
      new java.util.TreeMap<>(
          Map.of("A", 230.0, "B", 230.0, "C", 230.0, "D", 12.47, "E", 12.47, "F", 12.47)));

  private static ConditionDistance at(double d, String conductor) {
    return new ConditionDistance("survey", "survey", d, d, 0, conductor, 125);
  }

  /** A point with its nearest energised conductor and its nearest of each voltage. */
  private static PointClearance point(double to230, String c230, double to12, String c12) {
    ConditionDistance nearest = to230 <= to12 ? at(to230, c230) : at(to12, c12);
    return new PointClearance("L/1-2", 0, 0, 0, 5, 5, List.of(nearest), List.of(), List.of(),
        List.of(new PointClearance.VoltageDistances(230, List.of(at(to230, c230))),
            new PointClearance.VoltageDistances(12.47, List.of(at(to12, c12)))));
  }

  private static PointFinding worst(CircuitRules rules, PointClearance p) {
    PointFinding w = null;
    for (CircuitRules.Part part : rules.assessed()) {
      PointFinding f = part.rules().evaluate(p.atVoltage(part.kv()));
      if (CircuitRules.worse(f, w)) {
        w = f;
      }
    }
    return w;
  }

  @Test
  void eachVoltageHasItsOwnPartAndZones() {
    CircuitRules r = CircuitRules.forSpan(new ZoneEvaluator(RuleProfiles.builtin("ca-prc4293")),
        SPAN);
    assertEquals(2, r.parts().size());
    assertEquals(230, r.parts().get(0).kv(), 0);
    assertEquals(List.of("A", "B", "C"), r.parts().get(0).positions());
    assertEquals(List.of("D", "E", "F"), r.parts().get(1).positions());
    assertEquals(10 * FOOT, r.parts().get(0).rules().requirement("prc4293", 125).orElseThrow()
        .radialM(), 1e-9);
    assertEquals(4 * FOOT, r.parts().get(1).rules().requirement("prc4293", 125).orElseThrow()
        .radialM(), 1e-9);
    assertTrue(r.uncovered().isEmpty());
  }

  @Test
  void aPointNearTheUnderbuildIsHeldToItsFourFeet() {
    CircuitRules r = CircuitRules.forSpan(new ZoneEvaluator(RuleProfiles.builtin("ca-prc4293")),
        SPAN);
    // 2.0 m from underbuild D (4 ft = 1.219 m: clear), 5.0 m from B (10 ft: clear). Checked
    // against the nearest energised conductor at the line's 230 kV it would be 0.848 m inside.
    PointFinding f = worst(r, point(5.0, "B", 2.0, "D"));
    assertEquals(PointFinding.Verdict.CLEAR, f.verdict());
    // 1.0 m from D: inside 4 ft by 0.2192 m, measured from D
    f = worst(r, point(5.0, "B", 1.0, "D"));
    assertEquals(PointFinding.Verdict.INSIDE_ZONE, f.verdict());
    assertEquals("D", f.violation().orElseThrow().conductor());
    assertEquals(4 * FOOT - 1.0, f.violation().get().deficitM(), 1e-9);
    // 2.9 m from B although 1.1 m from D: the 230 kV zone (3.048 m) governs, measured from B
    f = worst(r, point(2.9, "B", 1.1, "D"));
    assertEquals("B", f.violation().orElseThrow().conductor());
    assertEquals(10 * FOOT - 2.9, f.violation().get().deficitM(), 1e-9);
    assertEquals(10 * FOOT, f.violation().get().requiredM(), 1e-9);
  }

  @Test
  void aProfileForTransmissionLeavesTheUnderbuildNotChecked() {
    CircuitRules r = CircuitRules.forSpan(
        new ZoneEvaluator(RuleProfiles.builtin("us-fac003-mvcd")), SPAN);
    assertEquals(1, r.assessed().size());
    assertEquals(230, r.assessed().get(0).kv(), 0);
    assertTrue(r.notAssessedReason().isEmpty());
    assertEquals(1, r.uncovered().size());
    assertTrue(r.uncovered().get(0).contains("12.47 kV (positions D, E, F) not checked"),
        r.uncovered().get(0));
    // the 230 kV MVCD (4.0 ft, from memory) from B only: 1.0 m from D is no finding here
    PointFinding f = worst(r, point(3.0, "B", 1.0, "D"));
    assertEquals(PointFinding.Verdict.CLEAR, f.verdict());
    f = worst(r, point(1.0, "B", 0.5, "D"));
    assertEquals("B", f.violation().orElseThrow().conductor());
    assertEquals(4.0 * FOOT, f.violation().get().requiredM(), 0.001);
  }

  @Test
  void aSpanOfOneVoltageIsUnchanged() {
    SpanContext one = new SpanContext("L/1-2", "L", 12.47, 0, 80);
    CircuitRules r = CircuitRules.forSpan(new ZoneEvaluator(RuleProfiles.builtin("ca-prc4293")),
        one);
    assertFalse(r.multiVoltage());
    assertEquals(1, r.parts().size());
    assertEquals(4 * FOOT, r.main().requirement("prc4293", 40).orElseThrow().radialM(), 1e-9);
  }

  @Test
  void explainSaysEachVoltage() {
    String text = RuleExplainer.explain(RuleProfiles.builtin("ca-prc4293"), SPAN);
    assertTrue(text.contains("== Conductors at 230 kV (positions A, B, C) =="), text);
    assertTrue(text.contains("== Conductors at 12.47 kV (positions D, E, F) =="), text);
  }
}
