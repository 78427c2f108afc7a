package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.clearance.clearance.SpanContext;
import org.junit.jupiter.api.Test;

/** The explanation names the distances, bands, conditions and sources that apply. */
class RuleExplainerTest {

  private static void assertHas(String text, String expected) {
    assertTrue(text.contains(expected), () -> "missing '" + expected + "' in:\n" + text);
  }

  @Test
  void explainsInheritedAndRelativeZones() {
    String text = RuleExplainer.explain(RuleProfiles.builtin("example-utility"),
        new SpanContext("CR-115-2/T4-T5", "CR-115-2", 115, 420, 310));
    assertHas(text, "builds on: example-utility -> ca-prc4293");
    // 10 ft = 3.048 m at 110 kV and above [published, check-values.md section 4]
    assertHas(text, "3.048 m from table row 110 kV and above");
    // computed: 3.048 + 3 years x 0.90 m/year = 5.748 m
    assertHas(text, "less than 5.748 m");
    // computed: watch 7.248 m; mid-span + 0.1 x (310 - 150) / 100 = 0.16 m -> 7.408 m between
    // stations 310 x (1 - 0.6667) / 2 = 51.7 m and 258.3 m
    assertHas(text, "7.248 m near the structures, 7.408 m at mid-span");
    assertHas(text, "from station 51.7 m to 258.3 m");
    assertHas(text, "report groups survey, hot");
    assertHas(text, "Trim cycle: 3 years");
    assertHas(text, "California Public Resources Code section 4293");
    assertHas(text, "Result: assessed");
  }

  /** Issue 15: each zone says which conductor roles it is measured from. */
  @Test
  void explainsTheConductorRolesOfAZone() {
    String prc = RuleExplainer.explain(RuleProfiles.builtin("ca-prc4293"),
        new SpanContext("F7/P1-P2", "F7", 12.47, 40, 80));
    assertHas(prc, "measured from: energised (phase) conductors, neutral and secondary "
        + "conductors (not shield wires)");
    String mvcd = RuleExplainer.explain(RuleProfiles.builtin("us-fac003-mvcd"),
        new SpanContext("S", "L", 345, 100, 400));
    assertHas(mvcd, "measured from: energised (phase) conductors (not neutrals or shield "
        + "wires)");
  }

  @Test
  void explainsAltitudeApproximation() {
    String text = RuleExplainer.explain(RuleProfiles.builtin("us-fac003-mvcd"),
        new SpanContext("S", "L", 345, 1500, 400));
    assertHas(text, "table row 345 kV to 362 kV inclusive");
    assertHas(text, "altitude band 1219.2 m to 1524.0 m");
    assertHas(text, "APPROXIMATE");
    assertHas(text, "the standard's own Table 2 governs");
  }

  @Test
  void explainsWhyASpanIsNotAssessed() {
    String text = RuleExplainer.explain(RuleProfiles.builtin("us-fac003-mvcd"),
        new SpanContext("S", "L", 115, 100, 400));
    assertHas(text, "NOT ASSESSED - profile us-fac003-mvcd covers lines of 200 kV and above");
    assertFalse(text.contains("Zones in force"), text);
  }

  @Test
  void numbersIgnoreTheDefaultLocale() {
    Locale saved = Locale.getDefault();
    try {
      Locale.setDefault(Locale.GERMANY);
      String text = RuleExplainer.explain(RuleProfiles.builtin("ca-prc4293"),
          new SpanContext("S", "L", 12.47, 35.5, 95.25));
      assertHas(text, "12.47 kV");
      assertHas(text, "1.219 m");
      assertHas(text, "plan length 95.3 m");
      assertFalse(text.contains("1,219"), text);
    } finally {
      Locale.setDefault(saved);
    }
  }
}
