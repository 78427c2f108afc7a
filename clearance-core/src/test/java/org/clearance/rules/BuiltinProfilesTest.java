package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.clearance.InputException;
import org.clearance.clearance.SpanContext;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The built-in profiles against the values of shared/reference/check-values.md section 4. */
class BuiltinProfilesTest {

  /** 1 international foot, m [published, NIST: check-values.md section 1]. */
  private static final double FOOT = 0.3048;
  /** Distances are stored converted exactly; allow only rounding of the written decimals. */
  private static final double TOL_M = 1e-5;

  private static double required(String profile, String zone, double kv, double altitudeM) {
    return required(RuleProfiles.builtin(profile), zone, kv, altitudeM);
  }

  private static double required(RuleProfile profile, String zone, double kv, double altitudeM) {
    SpanContext span = new SpanContext("S1", "L1", kv, altitudeM, 200);
    Optional<Requirement> r = new ZoneEvaluator(profile).requiredDistance(zone, span, 100);
    return r.orElseThrow(() -> new AssertionError("zone " + zone + " not resolved at " + kv
        + " kV")).radialM();
  }

  @Test
  void namesListEveryBuiltinAndEachLoads() {
    assertEquals(List.of("us-fac003-mvcd", "ca-prc4293", "ca-prc4292", "ca-go95-appendix-e",
        "ca-go95-appendix-e-fire", "example-utility", "example-utility-95"),
        RuleProfiles.names());
    for (String name : RuleProfiles.names()) {
      RuleProfile p = RuleProfiles.builtin(name);
      assertEquals(name, p.name());
      assertFalse(p.origins().get(0).source().isEmpty());
      assertEquals(1, p.referenceZones().size(), name);
    }
  }

  /** FAC-003 with line L1 listed as covered, so that the rows below 200 kV apply to it. */
  private static final RuleProfile MVCD_COVERED = RuleProfileReader.parse(String.join("\n",
      "name: covered", "title: t", "source: s", "extends: us-fac003-mvcd",
      "covered_lines: [L1]"), "covered.yaml");

  // NERC FAC-003-4 Table 2 MVCD (AC), sea level to 500 ft, in feet: check-values.md section 4
  // [from memory]. The profile stores the same numbers converted to metres.
  @ParameterizedTest
  @CsvSource({
      "765, 11.6", "500, 7.0", "345, 4.3", "287, 5.2", "230, 4.0",
      "161, 2.7", "138, 2.3", "115, 1.9", "88, 1.5", "69, 1.1"})
  void mvcdSeaLevelColumn(double kv, double feet) {
    assertEquals(feet * FOOT, required(MVCD_COVERED, "mvcd", kv, 0), TOL_M);
  }

  @Test
  void mvcdFor287KvExceeds345Kv() {
    // check-values.md section 4 [from memory]: "287 kV > 345 kV is a real feature of the table".
    assertTrue(required("us-fac003-mvcd", "mvcd", 287, 0)
        > required("us-fac003-mvcd", "mvcd", 345, 0));
  }

  @Test
  void mvcd765KvAgreesWithGalletEquation() {
    // Gallet rod-plane flashover, IEEE Std 516 basis of FAC-003 (check-values.md section 4):
    // CFO = k_g 3400 / (1 + 8 / D) [equation from memory] -> D = 8 / (3400 k_g / CFO - 1).
    // CFO = 1042.1 kV, k_g = 1.0 -> D = 3.536 m = 11.60 ft [computed].
    double cfo = 1042.1;
    double kg = 1.0;
    double d = 8 / (3400 * kg / cfo - 1);
    assertEquals(3.536, d, 0.0005);
    assertEquals(d, required("us-fac003-mvcd", "mvcd", 765, 0), 0.01);
  }

  @ParameterizedTest
  @CsvSource({
      // altitude m, factor over the sea-level column [computed: 1 + 0.045932 * top_km, taking
      // the top of the band; rise 1.4 % per 1000 ft from memory, check-values.md section 4]
      "100.0, 1.0",
      "152.4, 1.0",
      "152.5, 1.014",
      "500.0, 1.028",
      "4500.0, 1.21"})
  void mvcdAltitudeApproximation(double altitudeM, double factor) {
    double sea = 11.6 * FOOT;
    // Tolerance: 1e-4 of the factor covers rounding of 4.5932 %/km (1.4 / 0.3048 = 4.59318).
    assertEquals(sea * factor, required("us-fac003-mvcd", "mvcd", 765, altitudeM), sea * 1e-4);
  }

  @Test
  void mvcdAboveTableAndBetweenRowsIsNotAssessed() {
    RuleProfile p = RuleProfiles.builtin("us-fac003-mvcd");
    // 15 000 ft = 4572 m is the top band (from memory); above it there is no value.
    SpanRules high = new ZoneEvaluator(p).forSpan(new SpanContext("S", "L", 500, 4600, 300));
    assertFalse(high.assessed());
    assertTrue(high.notAssessedReason().get().contains("above the table"));
    // 400 kV is not a row of the table: never guessed.
    SpanRules between = new ZoneEvaluator(p).forSpan(new SpanContext("S", "L", 400, 0, 300));
    assertFalse(between.assessed());
    assertTrue(between.notAssessedReason().get().contains("no row for 400 kV"));
    // Below 200 kV the standard does not apply (published) unless the line is listed.
    SpanRules low = new ZoneEvaluator(p).forSpan(new SpanContext("S", "L", 115, 0, 300));
    assertFalse(low.assessed());
    assertTrue(low.notAssessedReason().get().contains("covered_lines"));
  }

  // California PRC 4293 radial clearances, feet: check-values.md section 4 [published].
  @ParameterizedTest
  @CsvSource({
      "2.4, 4", "12.47, 4", "71.99, 4", "72, 6", "109.9, 6", "110, 10", "230, 10", "500, 10"})
  void prc4293(double kv, double feet) {
    assertEquals(feet * FOOT, required("ca-prc4293", "prc4293", kv, 0), TOL_M);
  }

  // CPUC GO 95 Appendix E time-of-trim guideline, feet: check-values.md section 4 [published];
  // fire-threat variant 6.5 / 10 / 20 / 20 ft [published].
  @ParameterizedTest
  @CsvSource({
      "12, 4, 6.5", "72, 6, 10", "115, 10, 20", "299, 10, 20", "300, 15, 20", "500, 15, 20"})
  void go95AppendixE(double kv, double feet, double fireFeet) {
    assertEquals(feet * FOOT, required("ca-go95-appendix-e", "go95-trim", kv, 0), TOL_M);
    assertEquals(fireFeet * FOOT, required("ca-go95-appendix-e-fire", "go95-trim", kv, 0),
        TOL_M);
  }

  @Test
  void fireVariantInheritsEverythingButTheDistances() {
    RuleProfile fire = RuleProfiles.builtin("ca-go95-appendix-e-fire");
    Zone zone = fire.zone("go95-trim").orElseThrow();
    assertTrue(zone.violationReference());
    assertEquals(1, zone.priority());
    assertTrue(zone.conditions().groups().contains("survey"));
    assertEquals(2, fire.origins().size());
    assertEquals("ca-go95-appendix-e", fire.origins().get(1).name());
  }

  @Test
  void exampleUtilityBuildsOnPrc4293() {
    RuleProfile p = RuleProfiles.builtin("example-utility");
    assertEquals(List.of("prc4293", "work-trigger", "watch"),
        p.zones().stream().map(Zone::name).toList());
    assertTrue(p.zone("prc4293").orElseThrow().note().startsWith("Urgent"));
    // Work trigger = 10 ft + 3 years x 0.90 m/year (fastest class) = 3.048 + 2.7 m [computed].
    assertEquals(3.048 + 2.7, required("example-utility", "work-trigger", 115, 0), 1e-9);
    // Watch at mid-span of a 200 m span: + 1.5 m + 0.1 m x (200 - 150) / 100 [computed].
    assertEquals(3.048 + 2.7 + 1.5 + 0.05, required("example-utility", "watch", 115, 0), 1e-9);
    assertTrue(p.fallIn().enabled());
  }

  @Test
  void contentHashCoversTheChain() {
    RuleProfile go95 = RuleProfiles.builtin("ca-go95-appendix-e");
    RuleProfile fire = RuleProfiles.builtin("ca-go95-appendix-e-fire");
    assertEquals(64, go95.contentHash().length());
    assertEquals(go95.contentHash(), RuleProfiles.builtin("ca-go95-appendix-e").contentHash());
    assertNotEquals(go95.contentHash(), fire.contentHash());
  }

  @Test
  void unknownBuiltinNamesTheOption() {
    InputException e = assertThrows(InputException.class, () -> RuleProfiles.builtin("nope"));
    assertEquals("--rules", e.file());
    assertTrue(e.problem().contains("us-fac003-mvcd"));
  }
}
