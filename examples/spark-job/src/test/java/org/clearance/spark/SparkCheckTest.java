package org.clearance.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.examples.ClassificationMode;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.clearance.report.CsvText;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Spark job in local mode against the command line's check on the demo corridor (an
 * invented scenario, docs/demo-corridor.md): the same run outputs, span for span, from the one
 * survey file and from the survey cut into tiles across the spans. The command line's run is
 * the reference; the job must match it exactly where the run folder is exact (statuses, reasons,
 * work-list rows) and to the millimetre for distances (the outputs' precision).
 */
class SparkCheckTest {
  /** Distances: the run folder's precision is 1 mm; the job runs the same code on the same
   * points, so any difference is a defect. */
  private static final double MM = 0.0005 + 1e-9;
  private static final String PROFILE = "example-utility";

  @TempDir static Path dir;
  private static DemoCorridor.DemoFiles demo;
  private static Path cliRun;
  /** The demo with only ground, water and noise labelled: wires, towers, birds are class 1, so
   * the check infers vegetation and sets points aside (wire, structure, airborne). */
  private static DemoCorridor.DemoFiles groundOnly;
  private static Path groundOnlyCliRun;
  private static JavaSparkContext sc;

  @BeforeAll
  static void demoAndCommandLine() throws IOException {
    demo = DemoCorridor.write(dir.resolve("demo"), DemoOptions.defaults().withSpanCount(4)
        .withPointDensity(2.0));
    cliRun = commandLine(demo, "cli");
    groundOnly = DemoCorridor.write(dir.resolve("ground-only"), DemoOptions.defaults()
        .withSpanCount(4).withPointDensity(2.0).withMode(ClassificationMode.GROUND_ONLY));
    heatBalance(groundOnly.lineSpec());
    groundOnlyCliRun = commandLine(groundOnly, "cli-ground-only");
    // Every shuffle and grouping spills to disk after each element, as a cluster does under
    // memory pressure: whatever a stage hands on must survive serialization. (Regression: the
    // 55-million-point benchmark failed with NotSerializableException when a join spilled a
    // span's fit, which the small test runs had kept in memory.)
    sc = new JavaSparkContext(new SparkConf().setMaster("local[2]").setAppName("test")
        .set("spark.ui.enabled", "false").set("spark.driver.host", "127.0.0.1")
        .set("spark.shuffle.spill.numElementsForceSpillThreshold", "0"));
  }

  /**
   * Gives the line specification a survey temperature computed by the heat balance at each
   * tension section's flight time (the mean GPS time of its spans' points) instead of the given
   * one, so that the job's flight times and temperatures are compared with the command line's.
   * Invented weather and place (the scenario is invented).
   */
  private static void heatBalance(Path lineSpec) throws IOException {
    String yaml = Files.readString(lineSpec);
    String replaced = yaml.replaceFirst("survey_conductor_temperature_c: [-0-9.]+\n",
        "survey_heat_balance:\n  current_a: 420\n  air_temperature_c: 24\n"
            + "  wind_speed_m_s: 2.5\n  wind_from_deg: 250\n  latitude_deg: 46.5\n"
            + "  longitude_deg: 7.5\n  survey_date: 2026-07-14\n");
    assertTrue(!replaced.equals(yaml), "the demo's survey temperature line");
    Files.writeString(lineSpec, replaced);
  }

  private static Path commandLine(DemoCorridor.DemoFiles files, String name) throws IOException {
    Path out = dir.resolve(name);
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of(PROFILE), out), "test");
    return out;
  }

  @AfterAll
  static void stop() {
    if (sc != null) {
      sc.close();
    }
  }

  private static Path runJob(List<Path> tiles, String name) throws IOException {
    return runJob(demo, tiles, name, 0);
  }

  /** Runs the job; {@code failures}: the spans expected to be reported as failed. */
  private static Path runJob(DemoCorridor.DemoFiles files, List<Path> tiles, String name,
      int failures) throws IOException {
    Path out = dir.resolve(name);
    StringWriter console = new StringWriter();
    SparkCheck.Summary s = SparkCheck.run(sc, new SparkCheck.Request(spec(files, tiles),
        Optional.of(PROFILE), out.toString(), 0), new PrintWriter(console));
    assertEquals(failures, s.failedSpans(), console.toString());
    try (var lines = Files.list(out)) {
      // one run folder per line (the hidden names beside it are the run folder's lock)
      List<Path> folders = lines.filter(p -> !p.getFileName().toString().startsWith("."))
          .toList();
      assertEquals(List.of(out.resolve("FW231")), folders);
      return folders.get(0);
    }
  }

  private static JobSpec spec(DemoCorridor.DemoFiles files, List<Path> tiles) {
    return JobSpec.of(tiles, UnitsChoice.fromFile(), files.structures(),
        List.of(files.lineSpec()), Optional.empty(), null, "test");
  }

  @Test
  void oneFileGivesTheCommandLinesOutputs() throws IOException {
    assertSameRun(cliRun, runJob(List.of(demo.survey()), "one-file"));
  }

  @Test
  void tilesCutAcrossTheSpansGiveTheCommandLinesOutputs() throws IOException {
    // 150 m tiles: every span (250-450 m) is cut by two or more tile edges.
    List<Path> tiles = TileSplitter.split(demo.survey(), dir.resolve("tiles"), 150.0);
    assertTrue(tiles.size() > 8, "tiles: " + tiles.size());
    assertSameRun(cliRun, runJob(tiles, "tiled"));
  }

  /** Points set aside (wires, cross arms, birds of a survey whose wires are not labelled) are
   * decided across neighbouring spans as the command line decides them: same counts per span. */
  @Test
  void unlabelledWiresAreSetAsideAsByTheCommandLine() throws IOException {
    List<Path> tiles = TileSplitter.split(groundOnly.survey(), dir.resolve("tiles-ground-only"),
        150.0);
    Path run = runJob(groundOnly, tiles, "ground-only-run", 0);
    assertSameRun(groundOnlyCliRun, run);
    long wire = 0;
    for (Map<String, String> row : rows(run, "spans.csv")) {
      wire += Long.parseLong(row.get("points_set_aside_wire"));
    }
    assertTrue(wire > 0, "the unlabelled wires' points are set aside: " + wire);
    // the survey temperature was computed from the flight times, not left unknown, and is the
    // command line's for every span and section
    var expected = org.clearance.run.RunModelJson.read(groundOnlyCliRun.resolve("model.json"));
    var actual = org.clearance.run.RunModelJson.read(run.resolve("model.json"));
    for (int i = 0; i < expected.spans().size(); i++) {
      var a = expected.spans().get(i).temperature();
      var b = actual.spans().get(i).temperature();
      assertEquals("computed", a.source());
      assertTrue(Double.isFinite(a.sectionC()) && Double.isFinite(a.spanC()), a.toString());
      assertEquals(a.source(), b.source());
      // degC: the flight times are means of the same points summed in another order
      assertEquals(a.spanC(), b.spanC(), 1e-6, "span temperature");
      assertEquals(a.sectionC(), b.sectionC(), 1e-6, "section temperature");
      assertEquals(a.sectionSigmaC(), b.sectionSigmaC(), 1e-6, "section sigma");
    }
  }

  /** A span whose task fails (here: its points cannot be read) is reported NOT ASSESSED with
   * the reason, as the command line reports a span it could not assess; it is not dropped. */
  @Test
  void aFailedSpanIsReportedNotAssessedWithTheReason() throws IOException {
    JobSpec spec = spec(demo, List.of(demo.survey()));
    Iterable<PointBlock> broken = () -> {
      throw new java.io.UncheckedIOException(new IOException("piece 3 of tile 7 is gone"));
    };
    SpanFit fit = SpanStages.fit(spec, 1, broken);
    SpanOutcome o = SpanStages.measure(spec, fit, broken, List.of(), List.of(),
        new long[256]);
    assertEquals(1, o.key());
    Path json = dir.resolve("failed-span.json");
    Files.writeString(json, o.modelJson());
    var span = org.clearance.run.RunModelJson.read(json).spans().get(0);
    assertEquals(org.clearance.clearance.SpanStatus.NOT_ASSESSED, span.status());
    assertTrue(span.reason().contains("piece 3 of tile 7 is gone"), span.reason());
    assertTrue(o.failure().contains("piece 3 of tile 7 is gone"), o.failure());
  }

  /**
   * A tile with a damaged point record (a coordinate far outside its header's box, found only
   * when the points are read on an executor): the spans whose work areas that tile feeds are
   * reported NOT ASSESSED, naming the tile and its records; the job finishes, and every other
   * span is assessed as by the command line (status, conductors, surveyed-state minimum).
   */
  @Test
  void aDamagedTileFailsOnlyTheSpansItFeeds() throws IOException {
    List<Path> tiles = TileSplitter.split(demo.survey(), dir.resolve("tiles-damaged"), 150.0);
    JobContext ctx = JobContext.of(spec(demo, tiles));
    WorkPlan plan = WorkPlan.of(ctx);
    int n = ctx.spans.size();
    int chosen = -1;
    java.util.Set<String> fed = new java.util.TreeSet<>();
    for (int t = 0; t < tiles.size() && chosen < 0; t++) {
      java.util.Set<String> spans = new java.util.TreeSet<>();
      for (WorkPlan.Piece p : plan.pieces) {
        if (p.tile() == t) {
          p.boxes().forEach(b -> spans.add(ctx.spans.get(b.span()).span().id()));
        }
      }
      if (!spans.isEmpty() && spans.size() < n) {
        chosen = t;
        fed = spans;
      }
    }
    assertTrue(chosen >= 0, "a tile that feeds some spans but not all");
    damageRecord(tiles.get(chosen), 10);
    Path run = runJob(demo, tiles, "damaged", fed.size());
    List<Map<String, String>> expected = rows(cliRun, "spans.csv");
    List<Map<String, String>> actual = rows(run, "spans.csv");
    assertEquals(expected.size(), actual.size(), "no span is dropped");
    String tileName = tiles.get(chosen).getFileName().toString();
    Map<String, Map<String, String>> expectedById = new java.util.HashMap<>();
    expected.forEach(r -> expectedById.put(r.get("span_id"), r));
    for (Map<String, String> a : actual) {
      Map<String, String> e = expectedById.get(a.get("span_id"));
      if (fed.contains(a.get("span_id"))) {
        assertEquals("NOT ASSESSED", a.get("status"), a.toString());
        assertTrue(a.get("reason").contains(tileName) && a.get("reason").contains("record"),
            a.get("reason"));
      } else {
        // the fitted conductors and the surveyed state are the span's own; the other
        // conditions follow the ruling span of the tension section, which has lost the
        // failed spans' fits
        for (String column : List.of("status", "n_conductors_fitted", "min_clearance_survey_m",
            "points_set_aside_wire")) {
          assertField(a.get("span_id") + " " + column, e.get(column), a.get(column));
        }
      }
    }
  }

  /** Writes an X far outside the tile's header box into point record {@code record}. */
  private static void damageRecord(Path las, int record) throws IOException {
    try (var ch = java.nio.channels.FileChannel.open(las,
        java.nio.file.StandardOpenOption.READ, java.nio.file.StandardOpenOption.WRITE)) {
      java.nio.ByteBuffer head = java.nio.ByteBuffer.allocate(107)
          .order(java.nio.ByteOrder.LITTLE_ENDIAN);
      ch.read(head, 0);
      // LAS 1.2-1.4 header: offset to point data at byte 96 (uint32), record length at 105
      long offset = Integer.toUnsignedLong(head.getInt(96));
      int length = Short.toUnsignedInt(head.getShort(105));
      java.nio.ByteBuffer x = java.nio.ByteBuffer.allocate(4)
          .order(java.nio.ByteOrder.LITTLE_ENDIAN).putInt(0, Integer.MAX_VALUE);
      ch.write(x, offset + (long) record * length);
    }
  }

  private static void assertSameRun(Path expected, Path actual) throws IOException {
    if (System.getProperty("keep") != null) {
      for (Path p : List.of(expected, actual)) {
        Path to = Path.of(System.getProperty("keep"), p.getParent().getFileName().toString());
        Files.createDirectories(to);
        try (var fs = Files.list(p)) {
          for (Path f : fs.toList()) {
            Files.copy(f, to.resolve(f.getFileName()),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
          }
        }
      }
    }
    List<Map<String, String>> spansA = rows(expected, "spans.csv");
    // the set-aside counts are columns of spans.csv: compared with the others
    List<Map<String, String>> spansB = rows(actual, "spans.csv");
    assertEquals(4, spansA.size());
    assertEquals(spansA.size(), spansB.size());
    for (int i = 0; i < spansA.size(); i++) {
      Map<String, String> a = spansA.get(i);
      Map<String, String> b = spansB.get(i);
      assertEquals(a.keySet(), b.keySet());
      for (String column : a.keySet()) {
        assertField(column, a.get(column), b.get(column));
      }
    }
    List<Map<String, String>> workA = rows(expected, "worklist.csv");
    List<Map<String, String>> workB = rows(actual, "worklist.csv");
    assertTrue(workA.size() > 0, "the demo has encroachments under " + PROFILE);
    assertEquals(workA.size(), workB.size());
    for (int i = 0; i < workA.size(); i++) {
      for (String column : workA.get(i).keySet()) {
        assertField("worklist row " + i + " " + column, workA.get(i).get(column),
            workB.get(i).get(column));
      }
    }
    assertEquals(Files.readString(expected.resolve("conductors.csv")),
        Files.readString(actual.resolve("conductors.csv")));
    List<String> uncertaintyA = Files.readAllLines(expected.resolve("uncertainty.csv"));
    List<String> uncertaintyB = Files.readAllLines(actual.resolve("uncertainty.csv"));
    assertEquals(uncertaintyA.size(), uncertaintyB.size());
    for (int i = 0; i < uncertaintyA.size(); i++) {
      String[] a = uncertaintyA.get(i).split(",", -1);
      String[] b = uncertaintyB.get(i).split(",", -1);
      assertEquals(a.length, b.length, "uncertainty.csv line " + (i + 1));
      for (int j = 0; j < a.length; j++) {
        assertField("uncertainty.csv line " + (i + 1), a[j], b[j]);
      }
    }
  }

  /** Numbers to the millimetre, text exactly. */
  private static void assertField(String what, String a, String b) {
    if (a.equals(b)) {
      return;
    }
    try {
      assertEquals(Double.parseDouble(a), Double.parseDouble(b), MM, what);
    } catch (NumberFormatException e) {
      assertEquals(a, b, what);
    }
  }

  private static List<Map<String, String>> rows(Path run, String file) throws IOException {
    return new ArrayList<>(CsvText.rows(Files.readString(run.resolve(file))));
  }
}
