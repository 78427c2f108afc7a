package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.clearance.InputException;
import org.clearance.clearance.PolePoint;
import org.clearance.clearance.SpanContext;
import org.clearance.line.PoleEquipment;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import java.util.stream.Stream;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Pole-clearing zones (issue 15): the cylinder test with hand-computed values, which structures
 * it applies to, the built-in profile {@code ca-prc4292} against the published texts (California
 * PRC 4292 and 14 CCR 1254, docs/references.md R7), and the profile errors.
 */
class PoleClearingTest {

  /** Exact, 1 ft = 0.3048 m (NIST, published). */
  private static final double FOOT = 0.3048;
  private static final double TOL_M = 1e-9;

  private static final RuleProfile PRC4292 = RuleProfiles.builtin("ca-prc4292");

  private static SpanRules rules(double kv) {
    return new ZoneEvaluator(PRC4292).forSpan(new SpanContext("L/P1-P2", "L", kv, 0, 80));
  }

  private static PolePoint point(double plan, double hag) {
    return new PolePoint("L", "P1", 100 + plan, 200, 50 + hag, 3, hag, plan);
  }

  @Test
  void builtinProfileHoldsThePublishedValues() {
    Zone z = PRC4292.zone("prc4292").orElseThrow();
    Measurement.PoleCylinder c = (Measurement.PoleCylinder) z.measurement();
    // PRC 4292: 10 ft from the outer circumference; 14 CCR 1254(b): 0 to 8 ft [published].
    assertEquals(10 * FOOT, c.radiusM(), TOL_M);
    assertEquals(0, c.fromHeightM(), TOL_M);
    assertEquals(8 * FOOT, c.toHeightM(), TOL_M);
    // 14 CCR 1254: switch, fuse, transformer, lightning arrester; dead-end and corner poles.
    assertEquals(EnumSet.allOf(PoleEquipment.class), c.equipment());
    // assumed pole radius (illustrative), so the reach from the centre is 3.048 + 0.2 m
    assertEquals(3.248, c.reachM(), TOL_M);
    assertFalse(z.violationReference());
    // the conductor rule of the companion section stays the governing minimum
    assertEquals("prc4293", PRC4292.referenceZones().get(0).name());
  }

  // Hand-computed against reach 3.248 m and band [0, 2.4384) m; deficit = 3.248 - plan.
  @ParameterizedTest
  @CsvSource({
      "0.60, 0.10, true, 2.648",     // grass at the pole foot
      "3.20, 1.00, true, 0.048",     // shrub just inside the radius
      "3.248, 1.00, false, NaN",     // on the radius: outside (strictly less than)
      "3.30, 0.20, false, NaN",      // grass beyond the radius
      "1.00, 0.00, true, 2.248",     // at ground level: the band includes its lower edge
      "1.00, 2.4384, false, NaN",    // at 8 ft: the band excludes its upper edge
      "1.00, 2.43, true, 2.248",     // a branch just below 8 ft
      "1.00, 5.00, false, NaN"})     // a limb above the band
  void cylinderHandComputed(double plan, double hag, boolean inside, double deficit) {
    List<Zone> zones = PoleClearing.applicable(rules(12.47), EnumSet.of(PoleEquipment.FUSE));
    Optional<PoleClearing.Finding> f = PoleClearing.check(zones, point(plan, hag));
    assertEquals(inside, f.isPresent());
    if (inside) {
      assertEquals(deficit, f.get().deficitM(), 1e-12);
      assertEquals(3.248, f.get().requiredM(), TOL_M);
      assertEquals(plan, f.get().planDistanceM(), TOL_M);
    }
  }

  @Test
  void unknownHeightIsNeverInside() {
    List<Zone> zones = PoleClearing.applicable(rules(12.47), EnumSet.of(PoleEquipment.FUSE));
    assertTrue(PoleClearing.check(zones, point(1.0, Double.NaN)).isEmpty());
  }

  @Test
  void appliesOnlyToStructuresWithListedEquipment() {
    assertEquals(1, PoleClearing.applicable(rules(12.47),
        EnumSet.of(PoleEquipment.TRANSFORMER)).size());
    assertEquals(1, PoleClearing.applicable(rules(12.47), EnumSet.of(PoleEquipment.CORNER))
        .size());
    assertEquals(0, PoleClearing.applicable(rules(12.47), Set.of()).size());
    RuleProfile switchesOnly = RuleProfileReader.parse(String.join("\n",
        "name: sw", "title: t", "source: s", "extends: ca-prc4292", "zones:",
        "  - name: prc4292", "    pole_clearing:", "      radius_m: 3.048",
        "      pole_radius_m: 0.2", "      to_height_m: 2.4384", "      equipment: [switch]"),
        "sw.yaml");
    SpanRules r = new ZoneEvaluator(switchesOnly).forSpan(new SpanContext("S", "L", 12.47, 0,
        80));
    assertEquals(0, PoleClearing.applicable(r, EnumSet.of(PoleEquipment.TRANSFORMER)).size());
    assertEquals(1, PoleClearing.applicable(r, EnumSet.of(PoleEquipment.SWITCH)).size());
    // an override replaces the inherited pole_clearing block as a whole
    assertEquals(0.2, ((Measurement.PoleCylinder) switchesOnly.zone("prc4292").orElseThrow()
        .measurement()).poleRadiusM(), TOL_M);
  }

  @Test
  void voltageBandAndCoverageApply() {
    // the profile covers lines from 2.4 kV (inherited from ca-prc4293): a 1 kV line is NOT
    // ASSESSED and has no pole zones; a 230 kV line has them
    assertFalse(rules(1.0).assessed());
    assertTrue(rules(1.0).poleZones().isEmpty());
    assertEquals(1, rules(230).poleZones().size());
    RuleProfile banded = RuleProfileReader.parse(String.join("\n",
        "name: b", "title: t", "source: s", "zones:",
        "  - {name: c, priority: 1, violation_reference: true, conditions: [all], radial_m: 1}",
        "  - name: p", "    priority: 2", "    voltage: {max_kv: 35}", "    pole_clearing:",
        "      radius_m: 3", "      to_height_m: 2", "      equipment: [fuse]"), "b.yaml");
    SpanContext feeder = new SpanContext("S", "L", 12.47, 0, 80);
    SpanContext tower = new SpanContext("S", "L", 230, 0, 300);
    assertEquals(1, new ZoneEvaluator(banded).forSpan(feeder).poleZones().size());
    assertEquals(0, new ZoneEvaluator(banded).forSpan(tower).poleZones().size());
  }

  @Test
  void keepRadiusAndHeightCoverTheProfile() {
    assertEquals(PoleClearing.DEFAULT_KEEP_RADIUS_M, PoleClearing.keepRadiusM(PRC4292), 0);
    assertEquals(PoleClearing.DEFAULT_KEEP_HEIGHT_M, PoleClearing.keepHeightM(PRC4292), 0);
    RuleProfile wide = RuleProfileReader.parse(String.join("\n",
        "name: w", "title: t", "source: s", "extends: ca-prc4292", "zones:",
        "  - name: prc4292", "    pole_clearing:", "      radius_m: 6",
        "      to_height_m: 5", "      equipment: [fuse]"), "w.yaml");
    assertEquals(6.0, PoleClearing.keepRadiusM(wide), TOL_M); // radius 6 m, pole radius 0
    assertEquals(5, PoleClearing.keepHeightM(wide), TOL_M);
  }

  private static InputException error(String zoneLines) {
    String text = String.join("\n", "name: e", "title: t", "source: s", "zones:",
        "  - {name: c, priority: 1, violation_reference: true, conditions: [all], radial_m: 1}",
        zoneLines);
    return assertThrows(InputException.class, () -> RuleProfileReader.parse(text, "e.yaml"));
  }

  /** Each case: the pole zone's lines, the line and key the error names, words of it. */
  static Stream<Arguments> badZones() {
    String zone = "  - name: p\n    priority: 2\n";
    String ok = "{radius_m: 3, to_height_m: 2, equipment: [fuse]}";
    return Stream.of(
        Arguments.of(zone + "    radial_m: 2\n    pole_clearing: " + ok, 8, "radial_m",
            "remove radial_m"),
        Arguments.of(zone + "    violation_reference: true\n    pole_clearing: " + ok, 8,
            "violation_reference", "cannot be the violation reference"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 3, to_height_m: 2, equipment: "
            + "[lamp]}", 8, "equipment", "unknown equipment kind 'lamp'"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 3, from_height_m: 2, to_height_m: "
            + "2, equipment: [fuse]}", 8, "to_height_m", "must be above"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 0, to_height_m: 2, equipment: "
            + "[fuse]}", 8, "radius_m", "greater than 0"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 3, to_height_m: 2, equipment: []}",
            8, "equipment", "at least one"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 3, to_height_m: 2, equipment: "
            + "[fuse, fuse]}", 8, "equipment", "listed twice"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 3, to_height_m: 2, equipment: "
            + "[fuse], colour: red}", 8, "colour", "unknown key"),
        Arguments.of(zone + "    pole_clearing: {radius_m: 31, to_height_m: 2, equipment: "
            + "[fuse]}", 8, "radius_m", "30"),
        Arguments.of(zone + "    pole_clearing: " + ok + "\n  - {name: q, priority: 3, "
            + "conditions: [all], radial_m: {based_on_zone: p}}", 9, "radial_m",
            "pole_clearing zone"));
  }

  @ParameterizedTest
  @MethodSource("badZones")
  void errorsNameFileLineAndKey(String zone, int line, String key, String words) {
    InputException e = error(zone.replace("\\n", "\n"));
    assertEquals("e.yaml", e.file(), e.getMessage());
    assertEquals("line " + line, e.location(), e.getMessage());
    assertEquals(key, e.field(), e.getMessage());
    assertTrue(e.problem().contains(words), e.getMessage());
  }
}
