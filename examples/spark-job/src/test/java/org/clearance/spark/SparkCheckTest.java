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
  private static JavaSparkContext sc;

  @BeforeAll
  static void demoAndCommandLine() throws IOException {
    demo = DemoCorridor.write(dir.resolve("demo"), DemoOptions.defaults().withSpanCount(4)
        .withPointDensity(2.0));
    cliRun = dir.resolve("cli");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(demo.survey()), UnitsChoice.fromFile(), demo.structures(),
            List.of(demo.lineSpec()), Optional.empty(), Optional.of(PROFILE), cliRun), "test");
    sc = new JavaSparkContext(new SparkConf().setMaster("local[2]").setAppName("test")
        .set("spark.ui.enabled", "false").set("spark.driver.host", "127.0.0.1"));
  }

  @AfterAll
  static void stop() {
    if (sc != null) {
      sc.close();
    }
  }

  private static Path runJob(List<Path> tiles, String name) throws IOException {
    Path out = dir.resolve(name);
    StringWriter console = new StringWriter();
    SparkCheck.Summary s = SparkCheck.run(sc, new SparkCheck.Request(JobSpec.of(tiles,
        UnitsChoice.fromFile(), demo.structures(), List.of(demo.lineSpec()), Optional.empty(),
        null, "test"), Optional.of(PROFILE), out.toString(), 0), new PrintWriter(console));
    assertEquals(0, s.failedSpans(), console.toString());
    try (var lines = Files.list(out)) {
      // one run folder per line (the hidden names beside it are the run folder's lock)
      List<Path> folders = lines.filter(p -> !p.getFileName().toString().startsWith("."))
          .toList();
      assertEquals(List.of(out.resolve("FW231")), folders);
      return folders.get(0);
    }
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

  /** A span whose task fails (here: its points cannot be read) is reported NOT ASSESSED with
   * the reason, as the command line reports a span it could not assess; it is not dropped. */
  @Test
  void aFailedSpanIsReportedNotAssessedWithTheReason() throws IOException {
    JobSpec spec = JobSpec.of(List.of(demo.survey()), UnitsChoice.fromFile(), demo.structures(),
        List.of(demo.lineSpec()), Optional.empty(), null, "test");
    Iterable<PointBlock> broken = () -> {
      throw new java.io.UncheckedIOException(new IOException("piece 3 of tile 7 is gone"));
    };
    SpanFit fit = SpanStages.fit(spec, 1, broken);
    SpanOutcome o = SpanStages.measure(spec, fit, broken, List.of(), new long[256]);
    assertEquals(1, o.key());
    Path json = dir.resolve("failed-span.json");
    Files.writeString(json, o.modelJson());
    var span = org.clearance.run.RunModelJson.read(json).spans().get(0);
    assertEquals(org.clearance.clearance.SpanStatus.NOT_ASSESSED, span.status());
    assertTrue(span.reason().contains("piece 3 of tile 7 is gone"), span.reason());
    assertTrue(o.failure().contains("piece 3 of tile 7 is gone"), o.failure());
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
