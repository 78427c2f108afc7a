package org.clearance.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.clearance.assess.SpanResult;
import org.clearance.clearance.PointClearance;
import org.clearance.rules.PointFinding;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfiles;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneEvaluator;
import org.clearance.run.RunFixture;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.survey.LinearUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report stage on the hand-made Kestrel Vale run folder (RunFixture). */
class ReportStageTest {

  /** CSV values are written to 3 decimals: half a unit in the last place, plus rounding. */
  private static final double CSV_TOL = 0.0005 + 1e-9;
  /** PRC 4293 at 110 kV and above: 10 ft = 3.048 m (check-values.md section 4, published). */
  private static final double PRC_M = 3.048;
  /** example-utility: class 5 grows 0.90 m/year, trim cycle 3 years (its own values). */
  private static final double CLASS5_CYCLE_GROWTH = 0.90 * 3;

  @TempDir Path dir;
  private RunFixture fixture;
  private RuleProfile profile;
  private ReportStage.Outcome outcome;
  private String console;

  @BeforeEach
  void run() throws IOException {
    fixture = RunFixture.metric();
    fixture.write(dir);
    profile = RuleProfiles.builtin("example-utility");
    StringWriter out = new StringWriter();
    outcome = ReportStage.run(dir, RunModelJson.read(dir.resolve(RunModel.FILE_NAME)), profile,
        ReportOptions.defaults(), new PrintWriter(out));
    console = out.toString();
  }

  private List<Map<String, String>> sites() throws IOException {
    return CsvText.rows(Files.readString(dir.resolve("sites.csv")));
  }

  private List<Map<String, String>> worklist() throws IOException {
    return CsvText.rows(Files.readString(dir.resolve("worklist.csv")));
  }

  private static double num(Map<String, String> row, String column) {
    return Double.parseDouble(row.get(column));
  }

  @Test
  void siteColumnsAreExactlyTheAgreedOnes() throws IOException {
    // issue 5: the agreed column list, in this order; issue 11: units in coordinate names;
    // issue 15: the site's kind (grow-in, fall-in, pole-clearing) last
    assertEquals(List.of("site_id", "span_id", "priority", "zone", "condition",
        "min_clearance_m", "required_m", "deficit_m", "x_m", "y_m", "z_m", "lon_deg", "lat_deg",
        "chainage_m", "side", "offset_m", "veg_height_m", "cut_to_height_m", "n_points",
        "area_m2", "years_to_violation", "conductor", "cut_to_height_now_m", "verdict",
        "confidence_percent", "clearance_sigma_m", "clearance_low_m", "clearance_high_m",
        "uncertainty_dominant", "kind"),
        CsvText.header(Files.readString(dir.resolve("sites.csv"))));
  }

  @Test
  void clumpUnderTheLineIsAPrc4293SiteWhenHot() throws IOException {
    Map<String, String> s = sites().get(0);
    assertEquals("KV-10-11.1", s.get("site_id"));
    assertEquals("1", s.get("priority"));
    assertEquals("prc4293", s.get("zone"));
    assertEquals("hot-75C", s.get("condition"));
    // computed: the point straight under the middle phase at mid-span, hot catenary c = 700 m,
    // attachments 120 m, span 200 m: conductor 120 - 700 (cosh(100 / 700) - 1) m above datum
    double hotConductor = 120 - 700 * (Math.cosh(100.0 / 700) - 1);
    double clearance = hotConductor - 110.5;
    assertEquals(clearance, num(s, "min_clearance_m"), CSV_TOL);
    assertEquals(PRC_M, num(s, "required_m"), CSV_TOL);
    assertEquals(PRC_M - clearance, num(s, "deficit_m"), CSV_TOL);
    assertEquals(100, num(s, "x_m"), CSV_TOL);
    assertEquals(0, num(s, "y_m"), CSV_TOL);
    assertEquals(110.5, num(s, "z_m"), CSV_TOL);
    assertEquals(100, num(s, "chainage_m"), CSV_TOL);
    assertEquals("centre", s.get("side"));
    assertEquals(10.5, num(s, "veg_height_m"), CSV_TOL);
    // computed (CutHeight): below the hot conductor by the PRC distance plus one cycle of
    // class-5 growth, above ground at 100 m
    assertEquals(hotConductor - PRC_M - CLASS5_CYCLE_GROWTH - 100, num(s, "cut_to_height_m"),
        CSV_TOL);
    assertEquals("9", s.get("n_points"));
    // computed: convex hull of a 3 x 3 grid 0.5 m apart is a 1 m square
    assertEquals(1.0, num(s, "area_m2"), 0.005 + 1e-9);
    assertEquals(0.0, num(s, "years_to_violation"), 0.0);
    assertEquals("", s.get("lon_deg"), "no CRS: longitude not computed");
    assertEquals("B2", s.get("conductor"), "straight under the middle phase");
    assertEquals(hotConductor - PRC_M - 100, num(s, "cut_to_height_now_m"), CSV_TOL);
  }

  @Test
  void watchSiteCarriesItsYearsToViolation() throws IOException {
    Map<String, String> s = sites().get(1);
    assertEquals("KV-10-11.2", s.get("site_id"));
    assertEquals("watch", s.get("zone"));
    assertEquals("right", s.get("side"));
    assertEquals("4", s.get("n_points"));
    // computed: a 0.6 m square
    assertEquals(0.36, num(s, "area_m2"), 0.005 + 1e-9);
    // carried through: the smallest of its points' years under the rule evaluator itself
    SpanRules rules = new ZoneEvaluator(profile).forSpan(fixture.spans.get(0).context());
    double expected = Double.POSITIVE_INFINITY;
    for (PointClearance p : fixture.points) {
      if (!p.spanId().equals("KV-10-11")) {
        continue;
      }
      PointFinding f = rules.evaluate(p);
      if (p.y() < -9 && f.violation().isPresent()) { // the clump 10 m right
        expected = Math.min(expected, f.yearsToViolation());
      }
    }
    assertTrue(expected > 0 && expected < 10, "a watch site grows in within years: " + expected);
    assertEquals(expected, num(s, "years_to_violation"), 0.005 + 1e-9);
    // required: work-trigger (3.048 + 3 x 0.90) + 1.5 + mid-span 0.1 x (200 - 150) / 100
    assertEquals(PRC_M + CLASS5_CYCLE_GROWTH + 1.5 + 0.05, num(s, "required_m"), CSV_TOL);
  }

  @Test
  void tallTreeIsAFallInSite() throws IOException {
    Map<String, String> s = sites().get(2);
    assertEquals("KV-10-11.3", s.get("site_id"));
    assertEquals("fall-in", s.get("zone"));
    assertEquals("4", s.get("priority"), "after the profile's three zones");
    assertEquals("hot-75C", s.get("condition"));
    assertEquals("left", s.get("side"));
    // independent check: distance from the tree base to the nearest phase by dense sampling of
    // the catenaries (every millimetre of station), surveyed and hot
    double survey = bruteForceBaseDistance(1000);
    double hot = bruteForceBaseDistance(700);
    assertTrue(hot < survey);
    assertEquals(hot, num(s, "min_clearance_m"), CSV_TOL + 1e-6);
    double reach = RunFixture.TREE_HEIGHT + PRC_M;
    assertEquals(reach, num(s, "required_m"), CSV_TOL);
    assertEquals(reach - hot, num(s, "deficit_m"), CSV_TOL + 1e-6);
    assertEquals(hot - PRC_M - CLASS5_CYCLE_GROWTH, num(s, "cut_to_height_m"), CSV_TOL + 1e-6);
    assertEquals("", s.get("n_points"));
    // a 3 m crown radius: pi 3^2
    assertEquals(Math.PI * 9, num(s, "area_m2"), 0.005 + 1e-9);
  }

  @Test
  void workListHasOneRowPerTreeOrPatchWithTheCrewsColumns() throws IOException {
    // the fixture's span KV-10-11 holds three things: the clump under the middle phase, the
    // watch clump 10 m right of the line and tree T1 14 m left (fall-in): three rows
    List<Map<String, String>> w = worklist();
    assertEquals(3, w.size());
    Map<String, String> clump = w.get(0);
    assertEquals("KV-10-11.W1", clump.get("item_id"));
    assertEquals("", clump.get("tree_id"));
    assertEquals("zone prc4293 (hot-75C)", clump.get("reasons"));
    assertEquals("clear to height", clump.get("work"));
    assertEquals("B2", clump.get("conductor"));
    assertEquals("1", clump.get("circuit"));
    double hotConductor = 120 - 700 * (Math.cosh(100.0 / 700) - 1);
    // computed (CutHeight): today below the hot conductor by the PRC distance; for the cycle
    // also by one cycle of class-5 growth; ground at 100 m
    assertEquals(hotConductor - PRC_M - 100, num(clump, "cut_to_height_now_m"), CSV_TOL);
    assertEquals(hotConductor - PRC_M - CLASS5_CYCLE_GROWTH - 100,
        num(clump, "cut_to_height_cycle_m"), CSV_TOL);
    assertEquals(num(sites().get(0), "min_clearance_m"), num(clump, "clearance_m"), 0.0);
    assertEquals("", clump.get("fall_in_distance_m"), "not a fall-in tree");
    assertEquals("", clump.get("side_trim_m"), "a cut in height clears it");
    // first span of the line: station = chainage; 100 m of 200: the first structure is nearest
    assertEquals(100, num(clump, "station_m"), CSV_TOL);
    assertEquals("KV-10", clump.get("nearest_structure"));
    assertEquals("on", clump.get("right_of_way"), "on the centre line, 12 m half width");
    assertEquals("KV-10-11.1", clump.get("sites"));
    Map<String, String> tree = w.stream().filter(r -> r.get("tree_id").equals("T1"))
        .findFirst().orElseThrow();
    assertEquals("remove tree", tree.get("work"));
    assertEquals("fall-in (hot-75C)", tree.get("reasons"));
    assertEquals("", tree.get("clearance_m"), "a distance column means one thing in every row");
    assertEquals(num(sites().get(2), "min_clearance_m"), num(tree, "fall_in_distance_m"), 0.0);
    assertEquals(RunFixture.TREE_HEIGHT + PRC_M, num(tree, "fall_in_reach_m"), CSV_TOL);
    assertEquals(RunFixture.TREE_STATION, num(tree, "station_m"), CSV_TOL);
    assertEquals("KV-11", tree.get("nearest_structure"));
    assertEquals("off", tree.get("right_of_way"), "14 m from the centre line, 12 m half width");
    assertEquals(RunFixture.TREE_OFFSET, num(tree, "offset_m"), CSV_TOL);
    for (Map<String, String> r : w) {
      assertTrue(Set.of("remove tree", "clear to height", "side-trim", "no cut now (re-check)")
          .contains(r.get("work")), r.get("work"));
    }
  }

  private static double bruteForceBaseDistance(double c) {
    double best = Double.POSITIVE_INFINITY;
    for (double e : RunFixture.PHASE_OFFSETS) {
      for (int i = 0; i <= 200_000; i++) {
        double s = i / 1000.0;
        double z = RunFixture.ATTACH_Z - c * (Math.cosh(100 / c) - 1)
            + c * (Math.cosh((s - 100) / c) - 1);
        double d = Math.sqrt(Math.pow(s - RunFixture.TREE_STATION, 2)
            + Math.pow(e - RunFixture.TREE_OFFSET, 2) + Math.pow(z - RunFixture.GROUND, 2));
        best = Math.min(best, d);
      }
    }
    return best;
  }

  @Test
  void spansAreRankedNotAssessedFirstAndNeverClear() throws IOException {
    List<Map<String, String>> spans = CsvText.rows(Files.readString(dir.resolve("spans.csv")));
    assertEquals(List.of("KV-11-12", "KV-10-11", "KV-12-13"),
        spans.stream().map(r -> r.get("span_id")).toList());
    Map<String, String> na = spans.get(0);
    assertEquals("NOT ASSESSED", na.get("status"));
    assertEquals("no conductor points found in the span", na.get("reason"));
    assertEquals("1", na.get("rank"));
    assertEquals("", na.get("min_clearance_survey_m"));
    assertEquals("", na.get("min_clearance_ice_m"), "no ice condition in the run");
    assertEquals("0", na.get("n_conductors_fitted"));
    assertEquals("", na.get("n_sites"), "a NOT ASSESSED span has no site count, not zero");
    Map<String, String> found = spans.get(1);
    assertEquals("ASSESSED", found.get("status"));
    assertEquals("prc4293", found.get("worst_zone"));
    assertEquals("3", found.get("n_sites"));
    assertEquals("hot-75C", found.get("governing_condition"));
    assertEquals("3", found.get("n_conductors_fitted"));
    assertEquals(num(sites().get(0), "min_clearance_m"), num(found, "min_clearance_hot_m"),
        CSV_TOL);
    Map<String, String> clear = spans.get(2);
    assertEquals("0", clear.get("n_sites"));
    assertEquals("", clear.get("worst_zone"));
    for (String c : List.of("span_id", "line_id", "from_structure", "to_structure", "length_m",
        "status", "reason", "n_conductors_fitted", "min_clearance_survey_m",
        "min_clearance_hot_m", "min_clearance_blowout_m", "min_clearance_ice_m",
        "governing_condition", "worst_zone", "n_sites", "rank")) {
      assertTrue(na.containsKey(c), c);
    }
  }

  @Test
  void consoleSummaryNamesTheProfileAndTheNotAssessedSpan() {
    assertTrue(console.contains("Rule profile example-utility"), console);
    assertTrue(console.contains("NOT ASSESSED (never clear):"), console);
    assertTrue(console.contains("KV-11-12"), console);
    assertTrue(console.contains("prc4293 1, watch 1, fall-in 1"), console);
    assertTrue(console.contains("sites.geojson not written"), console);
    assertTrue(console.contains("qualified line-clearance personnel"), console);
    assertEquals(List.of("worklist.csv", "sites.csv", "spans.csv", "sites.gpkg", "report.html"),
        outcome.written());
    assertFalse(Files.exists(dir.resolve("sites.geojson")));
  }

  @Test
  void feetOutputConvertsEveryLengthAndNamesTheUnit() throws IOException {
    Path ft = Files.createDirectory(dir.resolve("ft"));
    RunFixture.metric().write(ft);
    ReportStage.run(ft, RunModelJson.read(ft.resolve(RunModel.FILE_NAME)), profile,
        ReportOptions.defaults().withUnit(LinearUnit.FOOT), null);
    String text = Files.readString(ft.resolve("sites.csv"));
    List<String> header = CsvText.header(text);
    assertEquals(List.of("site_id", "span_id", "priority", "zone", "condition",
        "min_clearance_ft", "required_ft", "deficit_ft", "x_m", "y_m", "z_m", "lon_deg",
        "lat_deg", "chainage_ft", "side", "offset_ft", "veg_height_ft", "cut_to_height_ft",
        "n_points", "area_ft2", "years_to_violation", "conductor", "cut_to_height_now_ft",
        "verdict", "confidence_percent", "clearance_sigma_ft", "clearance_low_ft",
        "clearance_high_ft", "uncertainty_dominant", "kind"),
        header);
    Map<String, String> m = sites().get(0);
    Map<String, String> f = CsvText.rows(text).get(0);
    // 1 ft = 0.3048 m exactly (NIST; check-values.md section 1, published)
    for (String c : List.of("min_clearance", "required", "deficit", "chainage", "veg_height",
        "cut_to_height")) {
      assertEquals(num(m, c + "_m") / 0.3048, num(f, c + "_ft"), CSV_TOL / 0.3048 + CSV_TOL,
          c);
    }
    assertEquals(num(m, "area_m2") / (0.3048 * 0.3048), num(f, "area_ft2"), 0.01);
    assertEquals(num(m, "x_m"), num(f, "x_m"), 0.0, "x stays in the survey's units");
    List<Map<String, String>> spans = CsvText.rows(Files.readString(ft.resolve("spans.csv")));
    assertEquals(200 / 0.3048, num(spans.get(1), "length_ft"), CSV_TOL);
  }

  @Test
  void noProfileLeavesEverySpanNotAssessedAndTheWorkListEmpty() throws IOException {
    Path none = Files.createDirectory(dir.resolve("none"));
    RunFixture.metric().write(none);
    ReportStage.Outcome o = ReportStage.run(none,
        RunModelJson.read(none.resolve(RunModel.FILE_NAME)), null, ReportOptions.defaults(),
        null);
    assertEquals(1, Files.readAllLines(none.resolve("worklist.csv")).size(), "header only");
    List<Map<String, String>> spans =
        CsvText.rows(Files.readString(none.resolve("spans.csv")));
    List<String> statuses = new ArrayList<>();
    spans.forEach(r -> statuses.add(r.get("status") + "/" + r.get("rank") + "/"
        + r.get("n_sites")));
    assertEquals(List.of("NOT ASSESSED//", "NOT ASSESSED//", "NOT ASSESSED//"), statuses);
    assertTrue(spans.get(0).get("reason").contains("no rule profile"));
    assertTrue(o.assessment().spans().stream().noneMatch(SpanResult::clear));
  }
}
