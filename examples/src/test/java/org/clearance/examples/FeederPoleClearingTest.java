package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.assess.AssessOptions;
import org.clearance.assess.CutSite;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.RunAssessor;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.SpanStatus;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfileReader;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 15, pole-clearing zones end to end on the demo feeder (structures with equipment: a
 * transformer, fuse and arrester on every fourth pole, a switch on every seventh, dead-ends at
 * the ends; {@link FeederFiles#equipment}) under the built-in profile {@code ca-prc4292}
 * (PRC 4292 and 14 CCR 1254: 10 ft from the pole's surface, 0 to 8 ft above ground; pole radius
 * 0.2 m assumed, so 3.248 m from the centre). The truth is the generator's own points: its grass,
 * undergrowth and tree points within 3.248 m of a pole centre and below 8 ft above the true
 * ground. A pole-clearing site appears at every pole with listed equipment that has such
 * points, and at no other pole though grass grows around every pole; and {@code evaluate}-style
 * re-assessment with another radius or equipment list works from the run folder alone.
 */
class FeederPoleClearingTest {

  /** Reach of the built-in zone from the pole centre, m: 10 ft + 0.2 m [published + assumed]. */
  private static final double REACH_M = 3.048 + 0.2;
  /** Top of the band, m: 8 ft [published, 14 CCR 1254(b)]. */
  private static final double TOP_M = 8 * 0.3048;
  /** Lowest vegetation a survey without labels can tell from the ground, m (docs/rules.md). */
  private static final double INFERRED_FROM_M = 0.3;

  @TempDir Path dir;

  /** Per pole index: true vegetation points inside the cylinder (from {@code fromM} up). */
  private static int[] truthInside(FeederScene scene, double reach, double fromM) {
    List<FeederPole> poles = scene.poles();
    int[] count = new int[poles.size()];
    scene.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        TruthId.Kind k = TruthId.kind(ids[i]);
        if (k != TruthId.Kind.LOW_VEGETATION && k != TruthId.Kind.UNDERSTOREY
            && k != TruthId.Kind.TREE) {
          continue;
        }
        double x = chunk.x()[i];
        double y = chunk.y()[i];
        double hag = chunk.z()[i] - scene.groundZ(x, y);
        for (int p = 0; p < poles.size(); p++) {
          double d = Math.hypot(x - poles.get(p).x(), y - poles.get(p).y());
          if (d < reach && hag >= fromM && hag < TOP_M) {
            count[p]++;
          }
        }
      }
    });
    return count;
  }

  /** Pole-clearing sites by the pole nearest their governing point. */
  private static Map<String, CutSite> poleSites(RunAssessment run, FeederScene scene) {
    Map<String, CutSite> out = new TreeMap<>();
    for (CutSite s : run.sites()) {
      if (s.kind() != CutSite.Kind.POLE_CLEARING) {
        continue;
      }
      FeederPole nearest = scene.poles().stream().min((a, b) -> Double.compare(
          Math.hypot(s.x() - a.x(), s.y() - a.y()), Math.hypot(s.x() - b.x(), s.y() - b.y())))
          .orElseThrow();
      assertFalse(out.containsKey(nearest.id()), "two sites at pole " + nearest.id());
      out.put(nearest.id(), s);
    }
    return out;
  }

  private static boolean listed(FeederPole p) {
    return !FeederFiles.equipment(p).isEmpty();
  }

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"41, HORIZONTAL, FULL", "42, TRIANGULAR, GROUND_ONLY"})
  void sitesOnlyAtPolesWithListedEquipment(long seed, Framing framing, ClassificationMode mode)
      throws IOException {
    FeederOptions options = FeederOptions.defaults().withSeed(seed).withSpanCount(8)
        .withFraming(framing).withMode(mode);
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), options);
    Path runDir = dir.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of("ca-prc4292"), runDir),
        "test");
    // from here on, only the run folder: the survey is gone
    Files.delete(files.survey());
    RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
    FeederScene scene = FeederScene.create(options);
    boolean inferred = mode != ClassificationMode.FULL;
    int[] truth = truthInside(scene, REACH_M, inferred ? INFERRED_FROM_M : 0);
    RunAssessment run = assess(model, runDir, RuleProfiles.builtin("ca-prc4292"));
    Map<String, CutSite> sites = poleSites(run, scene);
    int unlisted = 0;
    for (int p = 0; p < scene.poles().size(); p++) {
      FeederPole pole = scene.poles().get(p);
      CutSite s = sites.get(pole.id());
      System.out.printf(Locale.ROOT, "%d %s %s pole %s equipment [%s]: truth %d points, "
          + "site %s%n", seed, framing, mode, pole.id(), FeederFiles.equipment(pole), truth[p],
          s == null ? "none" : s.points().getAsInt() + " points, nearest "
              + String.format(Locale.ROOT, "%.3f m", s.minClearanceM()));
      if (!listed(pole)) {
        assertTrue(s == null, "site at pole " + pole.id() + " without listed equipment");
        unlisted += truth[p] > 0 ? 1 : 0;
        continue;
      }
      // poles with listed equipment and vegetation in the cylinder have a site (the feeder's
      // grass grows everywhere; a pole without such points would have none)
      assertEquals(truth[p] > 0, s != null, "pole " + pole.id());
      if (s == null) {
        continue;
      }
      assertEquals(REACH_M, s.requiredM(), 1e-9);
      assertEquals(REACH_M - s.minClearanceM(), s.deficitM(), 1e-9);
      assertTrue(s.minClearanceM() < REACH_M);
      assertEquals(0, s.cutToHeightM(), 0);
      int n = s.points().getAsInt();
      if (inferred) {
        // the pole's own returns (0.13-0.2 m from its centre) are never vegetation here
        assertTrue(s.minClearanceM() >= 0.5 - 1e-6, "pole column inside the site at "
            + pole.id() + ": " + s.minClearanceM());
        // heights from the filtered ground differ from the truth by centimetres: grass near
        // 0.3 m may fall either side of the line
        assertTrue(n <= truth[p] * 1.25 + 5, "pole " + pole.id() + ": " + n + " > " + truth[p]);
        assertTrue(n >= truth[p] * 0.5, "pole " + pole.id() + ": " + n + " < " + truth[p]);
      } else {
        // labelled: every true point in the cylinder is in the site, heights from the ground
        // model within a few centimetres of the truth (1 point or 2 % either side)
        assertEquals(truth[p], n, 1 + 0.02 * truth[p], "pole " + pole.id());
      }
    }
    assertTrue(unlisted > 0, "the test needs poles without equipment but with grass around");
    assertTrue(sites.size() >= 3, "sites: " + sites.keySet());

    // the work list and the site table say what the crew does
    String worklist = Files.readString(runDir.resolve("worklist.csv"));
    long around = worklist.lines().filter(l -> l.contains(",clear around pole,")).count();
    assertEquals(sites.size(), around, worklist);
    String siteTable = Files.readString(runDir.resolve("sites.csv"));
    assertEquals(sites.size(), siteTable.lines().filter(l -> l.endsWith(",pole-clearing"))
        .count());
    Path geojson = runDir.resolve("sites.geojson");
    if (Files.exists(geojson)) {
      assertEquals(sites.size(), java.util.regex.Pattern.compile(
          "\"kind\"\\s*:\\s*\"pole-clearing\"").matcher(Files.readString(geojson))
          .results().count());
    }
    String report = Files.readString(runDir.resolve("report.html"));
    assertTrue(report.contains("pole clearing: vegetation from 0 m to below 2.438 m above "
        + "ground within 3.048 m of the structure"), "report profile section");
  }

  @ParameterizedTest(name = "radius {0} m")
  @CsvSource({"1.0", "2.0", "4.5"})
  void anotherRadiusIsEvaluatedFromTheRunFolder(double radius) throws IOException {
    FeederOptions options = FeederOptions.defaults().withSeed(41).withSpanCount(6)
        .withFraming(Framing.HORIZONTAL).withMode(ClassificationMode.FULL);
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), options);
    Path runDir = dir.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of("ca-prc4292"), runDir),
        "test");
    Files.delete(files.survey());
    RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
    FeederScene scene = FeederScene.create(options);
    RuleProfile changed = RuleProfileReader.parse(String.join("\n", "name: narrow",
        "title: t", "source: s", "extends: ca-prc4292", "zones:", "  - name: prc4292",
        "    pole_clearing:", "      radius_m: " + radius, "      pole_radius_m: 0",
        "      to_height_m: 2.4384", "      equipment: [switch, transformer]"), "narrow.yaml");
    int[] truth = truthInside(scene, radius, 0);
    Map<String, CutSite> sites = poleSites(assess(model, runDir, changed), scene);
    TreeSet<String> expected = new TreeSet<>();
    for (int p = 0; p < scene.poles().size(); p++) {
      FeederPole pole = scene.poles().get(p);
      String eq = FeederFiles.equipment(pole);
      if ((eq.contains("switch") || eq.contains("transformer")) && truth[p] > 0) {
        expected.add(pole.id());
        assertEquals(truth[p], sites.get(pole.id()).points().getAsInt(), 1 + 0.02 * truth[p]);
        assertEquals(radius, sites.get(pole.id()).requiredM(), 1e-9);
      }
    }
    // dead-end poles no longer count: only the transformer and switch poles
    assertEquals(expected, sites.keySet());
    assertFalse(expected.isEmpty());
  }

  @org.junit.jupiter.api.Test
  void aRadiusBeyondWhatWasStoredMakesTheSpansIncomplete() throws IOException {
    FeederOptions options = FeederOptions.defaults().withSeed(41).withSpanCount(4)
        .withFraming(Framing.HORIZONTAL).withMode(ClassificationMode.FULL);
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), options);
    Path runDir = dir.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of("ca-prc4292"), runDir),
        "test");
    RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
    RuleProfile wide = RuleProfileReader.parse(String.join("\n", "name: wide",
        "title: t", "source: s", "extends: ca-prc4292", "zones:", "  - name: prc4292",
        "    pole_clearing:", "      radius_m: 8", "      to_height_m: 2.4384",
        "      equipment: [dead_end]"), "wide.yaml");
    RunAssessment run = assess(model, runDir, wide);
    var first = run.spans().stream().filter(r -> r.id().endsWith("P201-P202")).findFirst()
        .orElseThrow();
    assertTrue(first.status() != SpanStatus.ASSESSED, first.reason());
    assertTrue(first.reason().contains("run the check again with this profile"),
        first.reason());
  }

  private static RunAssessment assess(RunModel model, Path runDir, RuleProfile profile)
      throws IOException {
    return RunAssessor.assess(model, runDir.resolve(NearPointFile.FILE_NAME), profile,
        AssessOptions.defaults());
  }
}
