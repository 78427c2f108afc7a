package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanContext;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.yaml.snakeyaml.Yaml;

/**
 * Runs every data-driven rule case under src/test/resources/rule-cases/ (format in that folder's
 * README.md): a span, a profile, points with their distances per condition, and the expected
 * findings. Each case file names the source of its expected values.
 */
class RuleCasesTest {

  /** Expected distances are written to 0.1 mm or better. */
  private static final double TOL_M = 1e-4;
  /** Expected years are written to 0.001 year or better. */
  private static final double TOL_YEARS = 1e-3;
  /** Fewest cases the suite must hold (the brief asks for at least 15). */
  private static final int MIN_CASES = 15;

  static Stream<Path> cases() throws IOException, URISyntaxException {
    Path dir = Path.of(RuleCasesTest.class.getResource("/rule-cases").toURI());
    try (Stream<Path> files = Files.list(dir)) {
      return files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList().stream();
    }
  }

  @Test
  void enoughCases() throws IOException, URISyntaxException {
    assertTrue(cases().count() >= MIN_CASES);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void ruleCase(Path file) throws IOException {
    Map<String, Object> c =
        new Yaml().load(Files.readString(file, StandardCharsets.UTF_8));
    RuleProfile profile = c.containsKey("profile_text")
        ? RuleProfileReader.parse((String) c.get("profile_text"), file.getFileName() + "#profile")
        : RuleProfiles.builtin((String) c.get("profile"));
    Map<String, Object> s = map(c.get("span"));
    SpanContext span = new SpanContext("S", str(s, "line"), num(s, "kv"),
        s.containsKey("altitude_m") ? num(s, "altitude_m") : Double.NaN, num(s, "length_m"));
    SpanRules rules = new ZoneEvaluator(profile).forSpan(span);
    if (c.containsKey("span_not_assessed")) {
      assertFalse(rules.assessed(), "span should be NOT ASSESSED");
      String reason = rules.notAssessedReason().orElseThrow();
      assertTrue(reason.contains((String) c.get("span_not_assessed")), reason);
    } else {
      assertTrue(rules.assessed(), () -> "span not assessed: " + rules.notAssessedReason());
    }
    for (Object o : list(c.get("points"))) {
      checkPoint(rules, map(o));
    }
    if (c.containsKey("trees")) {
      for (Object o : list(c.get("trees"))) {
        checkTree(rules, map(o));
      }
    }
  }

  private static void checkPoint(SpanRules rules, Map<String, Object> p) {
    String name = str(p, "name");
    int cls = p.containsKey("class") ? ((Number) p.get("class")).intValue() : 1;
    PointClearance point = new PointClearance("S", 0, 0, 0, cls, Double.NaN,
        distances(list(p.get("distances")), "A"),
        p.containsKey("neutral") ? distances(list(p.get("neutral")), "N") : List.of(),
        p.containsKey("shield") ? distances(list(p.get("shield")), "SW") : List.of());
    PointFinding f = rules.evaluate(point);
    Map<String, Object> e = map(p.get("expect"));
    String verdict = str(e, "verdict").toUpperCase(Locale.ROOT);
    assertEquals(verdict, f.verdict().name(), name + ": " + f);
    if (e.containsKey("gaps")) {
      assertEquals(((Number) e.get("gaps")).intValue(), f.gaps().size(), name + ": " + f.gaps());
    }
    if (e.containsKey("reason")) {
      String reason = f.notAssessedReason().orElseThrow();
      assertTrue(reason.contains(str(e, "reason")), name + ": " + reason);
    }
    if (f.violation().isPresent()) {
      ZoneViolation v = f.violation().get();
      assertEquals(str(e, "zone"), v.zone().name(), name);
      assertEquals(str(e, "condition"), v.condition(), name);
      assertEquals(e.containsKey("conductor") ? str(e, "conductor") : "A", v.conductor(), name);
      assertEquals(e.containsKey("component") ? str(e, "component") : "radial",
          v.component().name().toLowerCase(Locale.ROOT), name);
      assertEquals(num(e, "required"), v.requiredM(), TOL_M, name + " required");
      assertEquals(num(e, "deficit"), v.deficitM(), TOL_M, name + " deficit");
      assertEquals(v.requiredM() - v.actualM(), v.deficitM(), 1e-12, name);
    }
    if (e.containsKey("years")) {
      Object y = e.get("years");
      if ("never".equals(y)) {
        assertEquals(Double.POSITIVE_INFINITY, f.yearsToViolation(), name + " years");
      } else if ("none".equals(y)) {
        assertTrue(Double.isNaN(f.yearsToViolation()), name + " years " + f.yearsToViolation());
      } else {
        assertEquals(((Number) y).doubleValue(), f.yearsToViolation(), TOL_YEARS,
            name + " years");
      }
    }
  }

  private static void checkTree(SpanRules rules, Map<String, Object> t) {
    FallInFinding f = rules.fallIn(num(t, "height"), distances(list(t.get("distances")), "A"));
    Map<String, Object> e = map(t.get("expect"));
    if (e.containsKey("not_assessed")) {
      assertTrue(f.notAssessedReason().orElseThrow().contains(str(e, "not_assessed")),
          f.toString());
      return;
    }
    assertTrue(f.notAssessedReason().isEmpty(), f.toString());
    assertEquals(e.get("strike"), f.canStrike(), f.toString());
    assertEquals(str(e, "condition"), f.condition());
    assertEquals(num(e, "reach"), f.reachM(), TOL_M);
    assertEquals(num(e, "margin"), f.marginM(), TOL_M);
  }

  /**
   * Distances per condition to the named conductor; h and v default to a point straight below
   * the conductor.
   */
  private static List<ConditionDistance> distances(List<Object> rows, String conductor) {
    List<ConditionDistance> out = new ArrayList<>();
    for (Object o : rows) {
      Map<String, Object> d = map(o);
      double dist = num(d, "d");
      double h = d.containsKey("h") ? num(d, "h") : 0;
      double v = d.containsKey("v") ? num(d, "v") : -dist;
      if (Math.abs(Math.hypot(h, v) - dist) > 1e-3) {
        fail("inconsistent case data: hypot(h, v) != d in " + d);
      }
      String condition = str(d, "condition");
      String group = d.containsKey("group") ? str(d, "group") : condition;
      double station = d.containsKey("station") ? num(d, "station") : 0;
      out.add(new ConditionDistance(condition, group, dist, h, v, conductor, station));
    }
    return out;
  }

  @SuppressWarnings("unchecked")
  private static Map<String, Object> map(Object o) {
    return (Map<String, Object>) o;
  }

  @SuppressWarnings("unchecked")
  private static List<Object> list(Object o) {
    return (List<Object>) o;
  }

  private static String str(Map<String, Object> m, String key) {
    Object v = m.get(key);
    if (v == null) {
      fail("case is missing '" + key + "' in " + m);
    }
    return v.toString();
  }

  private static double num(Map<String, Object> m, String key) {
    Object v = m.get(key);
    if (!(v instanceof Number)) {
      fail("case needs a number for '" + key + "' in " + m);
    }
    return ((Number) v).doubleValue();
  }
}
