package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 10 item 11 and issue 11: the same inputs give the same bytes in every output but
 * run.json, whatever the output folder, the input folders, the day and the number of worker
 * threads (tree ids included: they must not follow thread scheduling); and a span has one status
 * word in every command, file and the report.
 *
 * <p>Two checks run as child JVMs, so that each has its own {@code SOURCE_DATE_EPOCH} (the
 * reproducible-builds convention for the day a report states).
 */
class SameInputsSameBytesTest {

  /** 2026-01-05 and 2026-07-15, 00:00 UTC, seconds since 1970 (computed: days x 86 400). */
  private static final long DAY_ONE = 20458L * 86_400;
  private static final long DAY_TWO = 20649L * 86_400;
  private static final long CHILD_LIMIT_S = 300;

  @TempDir static Path tmp;
  private static Path runOne;
  private static Path runTwo;
  private static String consoleOne;

  @BeforeAll
  static void twoChecks() throws Exception {
    DemoCorridor.DemoFiles demo = DemoCorridor.write(tmp.resolve("generated"),
        DemoOptions.defaults().withSpanCount(3).withPointDensity(1.0));
    Path inOne = copyInputs(demo, tmp.resolve("alice").resolve("survey-2026"));
    Path inTwo = copyInputs(demo, tmp.resolve("bob").resolve("projects").resolve("copy"));
    runOne = tmp.resolve("alice").resolve("run-1");
    runTwo = tmp.resolve("bob").resolve("elsewhere").resolve("second-run");
    consoleOne = check(inOne, runOne, 1, DAY_ONE);
    check(inTwo, runTwo, 2, DAY_TWO);
  }

  private static Path copyInputs(DemoCorridor.DemoFiles demo, Path to) throws IOException {
    Files.createDirectories(to);
    for (Path p : List.of(demo.survey(), demo.structures(), demo.lineSpec())) {
      Files.copy(p, to.resolve(p.getFileName()));
    }
    return to;
  }

  /** Runs a check in a child JVM on a given day; returns what it printed. */
  private static String check(Path in, Path out, int threads, long day) throws Exception {
    List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin",
        "java").toString(), "-Xmx768m", "-XX:TieredStopAtLevel=1", "-cp",
        System.getProperty("java.class.path"), ClearanceCommand.class.getName(), "check",
        "--survey", in.resolve("survey.las").toString(), "--structures",
        in.resolve("structures.csv").toString(), "--line", in.resolve("line.yaml").toString(),
        "--out", out.toString(), "--threads", Integer.toString(threads), "--rules",
        "example-utility"));
    Path log = out.resolveSibling(out.getFileName() + ".log");
    Files.createDirectories(out.getParent());
    ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true)
        .redirectOutput(log.toFile());
    pb.environment().put("SOURCE_DATE_EPOCH", Long.toString(day));
    Process p = pb.start();
    assertTrue(p.waitFor(CHILD_LIMIT_S, TimeUnit.SECONDS), "check ended");
    String printed = Files.readString(log, StandardCharsets.UTF_8);
    assertEquals(0, p.exitValue(), printed);
    return printed;
  }

  private static TreeSet<String> names(Path dir) throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return new TreeSet<>(s.map(p -> p.getFileName().toString()).toList());
    }
  }

  @Test
  void everyOutputButRunJsonIsTheSameBytes() throws IOException {
    assertEquals(names(runOne), names(runTwo));
    int compared = 0;
    for (String f : names(runOne)) {
      if (f.equals("run.json") || f.equals("report.html")) {
        continue;
      }
      assertArrayEquals(Files.readAllBytes(runOne.resolve(f)),
          Files.readAllBytes(runTwo.resolve(f)), f + " differs between the two runs");
      compared++;
    }
    assertTrue(compared >= 9, "model, near points, conductors, uncertainty, work list, sites, "
        + "spans, GeoPackage, GeoJSON: " + compared);
    // the report states the day it was made, and nothing else differs
    String one = Files.readString(runOne.resolve("report.html"), StandardCharsets.UTF_8);
    String two = Files.readString(runTwo.resolve("report.html"), StandardCharsets.UTF_8);
    assertTrue(one.contains("2026-01-05 (UTC)") && two.contains("2026-07-15 (UTC)"));
    assertEquals(one.replace("2026-01-05", "DAY"), two.replace("2026-07-15", "DAY"));
    assertNotEquals(Files.readString(runOne.resolve("run.json")),
        Files.readString(runTwo.resolve("run.json")), "run.json keeps the run's own times");
  }

  @Test
  void noFolderOfTheMachineInTheModelOrTheReport() throws IOException {
    for (String f : List.of("model.json", "report.html")) {
      String text = Files.readString(runOne.resolve(f), StandardCharsets.UTF_8);
      assertFalse(text.contains(tmp.toString()), f + " names a folder of the machine");
      assertFalse(text.contains("alice"), f + " names the input folder");
      assertTrue(text.contains("survey.las"), f + " names the survey file");
    }
    // run.json is the record of this run on this machine: it keeps the paths as given
    assertTrue(Files.readString(runOne.resolve("run.json")).contains("alice"));
  }

  @Test
  void treeIdsDoNotFollowTheThreads() throws IOException {
    List<String> one = Files.readAllLines(runOne.resolve("worklist.csv"));
    assertEquals(one, Files.readAllLines(runTwo.resolve("worklist.csv")));
    assertTrue(one.stream().skip(1).anyMatch(l -> l.split(",", -1)[2].startsWith("TREE")),
        "the work list names trees: " + one.size() + " rows");
  }

  @Test
  void evaluateCarriesTheUncertaintiesOver() throws IOException {
    // regression: evaluate did not carry uncertainty.csv into the new folder, so every profile
    // with a confidence level failed ("the run folder has no uncertainty.csv") on a fresh check
    Path out = tmp.resolve("evaluated-95");
    CliRun r = CliRun.of("evaluate", runOne.toString(), "--rules", "example-utility-95",
        "--out", out.toString());
    assertEquals(0, r.exit(), r.err());
    assertArrayEquals(Files.readAllBytes(runOne.resolve("uncertainty.csv")),
        Files.readAllBytes(out.resolve("uncertainty.csv")));
    List<String> sites = Files.readAllLines(out.resolve("sites.csv"));
    int verdict = List.of(sites.get(0).split(",")).indexOf("verdict");
    assertTrue(sites.stream().skip(1).anyMatch(l -> l.split(",", -1)[verdict]
        .contains("violation")), "verdicts at 95 %");
  }

  @Test
  void oneStatusWordPerSpanInEveryOutput() throws Exception {
    Map<String, String> csv = new LinkedHashMap<>();
    List<String> spans = Files.readAllLines(runOne.resolve("spans.csv"));
    List<String> header = List.of(spans.get(0).split(","));
    int id = header.indexOf("span_id");
    int status = header.indexOf("status");
    for (String line : spans.subList(1, spans.size())) {
      String[] f = line.split(",", -1);
      csv.put(f[id], f[status]);
    }
    assertEquals(3, csv.size());
    assertTrue(csv.values().stream().allMatch(w -> w.matches("NOT ASSESSED|INCOMPLETE|ASSESSED")),
        csv.toString());

    Map<String, String> gpkg = new LinkedHashMap<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + runOne.resolve(
        "sites.gpkg").toAbsolutePath()); ResultSet r = c.createStatement().executeQuery(
            "SELECT span_id, status FROM spans")) {
      while (r.next()) {
        gpkg.put(r.getString(1), r.getString(2));
      }
    } catch (SQLException e) {
      throw new AssertionError(e);
    }
    assertEquals(csv, gpkg, "GeoPackage spans layer");

    String html = Files.readString(runOne.resolve("report.html"), StandardCharsets.UTF_8);
    Matcher m = Pattern.compile("<tr class=\"[a-z]+\"><td>[^<]*</td><td>(?:<a [^>]*>)?([^<]+)"
        + "(?:</a>)?</td>.*?<span class=\"badge [a-z]+\">([A-Z ]+)</span>").matcher(html);
    Map<String, String> report = new LinkedHashMap<>();
    while (m.find()) {
      report.put(m.group(1), m.group(2));
    }
    assertEquals(csv, report, "report's span table");

    Map<String, String> console = new LinkedHashMap<>();
    for (String span : csv.keySet()) {
      Matcher c = Pattern.compile("^\\s+\\d+\\s+" + Pattern.quote(span)
          + "\\s+(NOT ASSESSED|INCOMPLETE|ASSESSED)\\s", Pattern.MULTILINE).matcher(consoleOne);
      assertTrue(c.find(), span + " in the check's console:\n" + consoleOne);
      console.put(span, c.group(1));
    }
    assertEquals(csv, console, "check's console");

    CliRun eval = CliRun.of("evaluate", runOne.toString(), "--rules", "example-utility",
        "--out", tmp.resolve("evaluated").toString());
    assertEquals(0, eval.exit(), eval.err());
    for (var e : csv.entrySet()) {
      assertTrue(Pattern.compile("^\\s+\\d+\\s+" + Pattern.quote(e.getKey()) + "\\s+"
          + e.getValue() + "\\s", Pattern.MULTILINE).matcher(eval.out()).find(),
          e + " in evaluate's console:\n" + eval.out());
    }

    Path in = tmp.resolve("alice").resolve("survey-2026");
    CliRun wires = CliRun.of("wires", "--survey", in.resolve("survey.las").toString(),
        "--structures", in.resolve("structures.csv").toString(), "--line",
        in.resolve("line.yaml").toString(), "--out", tmp.resolve("wires").toString(),
        "--threads", "1");
    assertEquals(0, wires.exit(), wires.err());
    for (var e : csv.entrySet()) {
      // the wire stage's word; the check may only make a span's status worse, and on the demo
      // it does not
      assertTrue(wires.out().contains("span " + e.getKey() + ": " + e.getValue() + ","),
          e + " in wires' console:\n" + wires.out());
    }
  }
}
