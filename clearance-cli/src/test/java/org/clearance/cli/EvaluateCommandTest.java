package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.clearance.report.CsvText;
import org.clearance.run.RunFixture;
import org.clearance.run.RunRecord;
import org.clearance.run.RunRecordJson;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code clearance evaluate}: re-evaluation of a run folder with another profile, in place and
 * into a new folder, its run record, and bad input.
 */
class EvaluateCommandTest {

  /** A profile with one radial zone; the test changes its distance. */
  private static final String PROFILE = String.join("\n",
      "name: kestrel-check",
      "title: One radial zone for a re-evaluation test",
      "source: hand-made for a test",
      "zones:",
      "  - name: minimum",
      "    priority: 1",
      "    violation_reference: true",
      "    conditions: [all]",
      "    radial_m: 3.0",
      "");

  @TempDir Path tmp;
  private Path run;


  static CliRun run(String... args) {
    return CliRun.of(args);
  }

  @BeforeEach
  void runFolder() throws IOException {
    run = Files.createDirectory(tmp.resolve("run"));
    RunFixture.metric().write(run);
    Files.writeString(run.resolve("conductors.csv"), "span_id,conductor\nKV-10-11,B1\n");
    // the check's own record, as the check command writes it
    RunRecordJson.write(run, RunRecord.builder("check", "test").parameter("keep_radius_m",
        "15").output("conductors.csv").output("near-points.bin").output("model.json")
        .output("run.json").build());
  }

  private Path profile(String name, double radialM) throws IOException {
    return Files.writeString(tmp.resolve(name + ".yaml"),
        PROFILE.replace("radial_m: 3.0", "radial_m: " + radialM));
  }

  private static List<Map<String, String>> worklist(Path dir) throws IOException {
    return CsvText.rows(Files.readString(dir.resolve("sites.csv")));
  }

  @Test
  void changingAZoneDistanceChangesTheWorkList() throws IOException {
    Path a = tmp.resolve("a");
    CliRun r = run("evaluate", run.toString(), "--rules", profile("p3", 3.0).toString(),
        "--out", a.toString());
    assertEquals(0, r.exit(), r.err());
    assertTrue(r.out().contains("Rule profile kestrel-check"), r.out());
    List<Map<String, String>> three = worklist(a);
    // hand-made fixture: only the clump under the middle phase (2.345 m when hot) is within
    // 3 m; the clump 10 m right (6.69 m hot, about 6.6 m in the gale) and the tree are not
    // (the profile has no fall-in rule)
    assertEquals(List.of("KV-10-11.1"), ids(three));
    assertEquals("3.000", three.get(0).get("required_m"));
    double clearance = Double.parseDouble(three.get(0).get("min_clearance_m"));
    assertEquals(3.0 - clearance, Double.parseDouble(three.get(0).get("deficit_m")), 0.0011);

    // a copy of the profile with a wider zone: the clump to the right comes in
    Path b = tmp.resolve("b");
    assertEquals(0, run("evaluate", run.toString(), "--rules", profile("p7", 7.0).toString(),
        "--out", b.toString()).exit());
    List<Map<String, String>> seven = worklist(b);
    assertEquals(List.of("KV-10-11.1", "KV-10-11.2"), ids(seven));
    assertEquals("7.000", seven.get(1).get("required_m"));
    assertEquals(7.0 - clearance, Double.parseDouble(seven.get(0).get("deficit_m")), 0.0011);

    // narrower than the closest clump: no site, the span is assessed and clear
    Path c = tmp.resolve("c");
    assertEquals(0, run("evaluate", run.toString(), "--rules", profile("p2", 2.0).toString(),
        "--out", c.toString()).exit());
    assertEquals(List.of(), ids(worklist(c)));
    List<Map<String, String>> spans = CsvText.rows(Files.readString(c.resolve("spans.csv")));
    assertEquals("ASSESSED", spans.get(1).get("status"));
    assertEquals("0", spans.get(1).get("n_sites"));
    assertEquals("NOT ASSESSED", spans.get(0).get("status"), "still not assessed");
    // the measured files were copied, the source folder left alone
    for (Path dir : List.of(a, b, c)) {
      assertEquals(-1L, Files.mismatch(run.resolve("near-points.bin"),
          dir.resolve("near-points.bin")));
      assertTrue(Files.exists(dir.resolve("conductors.csv")));
      assertTrue(Files.exists(dir.resolve("report.html")));
    }
    assertFalse(Files.exists(run.resolve("worklist.csv")));
  }

  private static List<String> ids(List<Map<String, String>> rows) {
    List<String> out = new ArrayList<>();
    rows.forEach(r -> out.add(r.get("site_id")));
    return out;
  }

  @Test
  void runRecordNamesTheSourceFilesTheirHashesAndTheProfile() throws IOException {
    Path out = tmp.resolve("out");
    assertEquals(0, run("evaluate", run.toString(), "--rules", "example-utility", "--out",
        out.toString(), "--units", "ft").exit());
    RunRecord rec = RunRecordJson.read(out.resolve("run.json"));
    assertEquals("evaluate", rec.command());
    assertEquals("example-utility", rec.profile().orElseThrow().name());
    assertEquals(List.of("model.json", "near-points.bin", "conductors.csv", "run.json"),
        rec.inputs().stream().map(RunRecord.InputFile::role).toList());
    // SHA-256 of the source files, computed again here
    assertEquals(RunRecord.sha256(run.resolve("near-points.bin")), rec.inputs().get(1).sha256());
    assertEquals("check", rec.source().orElseThrow().command());
    assertEquals("15", rec.source().get().parameters().get("keep_radius_m"));
    assertTrue(rec.outputs().containsAll(List.of("worklist.csv", "spans.csv", "sites.gpkg",
        "report.html", "run.json", "model.json")));
    assertEquals("ft", rec.parameters().get("units"));
    assertTrue(Files.readString(out.resolve("sites.csv")).startsWith(
        "site_id,span_id,priority,zone,condition,min_clearance_ft,"));
    assertTrue(Files.readString(out.resolve("worklist.csv")).startsWith(
        "item_id,span_id,tree_id,priority,zone,reasons,work,"));
  }

  @Test
  void inPlaceReplacesTheOutputsAndKeepsTheCheckRecordAsSource() throws IOException {
    assertEquals(0, run("evaluate", run.toString(), "--rules", "ca-prc4293").exit());
    assertTrue(Files.exists(run.resolve("worklist.csv")));
    RunRecord first = RunRecordJson.read(run.resolve("run.json"));
    assertEquals("ca-prc4293", first.profile().orElseThrow().name());
    assertEquals(0, run("evaluate", run.toString(), "--rules", "example-utility").exit());
    RunRecord second = RunRecordJson.read(run.resolve("run.json"));
    // the chain of records: evaluate <- evaluate <- check
    assertEquals("ca-prc4293", second.source().orElseThrow().profile().orElseThrow().name());
    assertEquals("check", second.source().get().source().orElseThrow().command());
    assertTrue(Files.readString(run.resolve("worklist.csv")).contains("fall-in"));
  }

  @Test
  void badInputIsExitTwoWithOneLine() throws IOException {
    CliRun missing = run("evaluate", tmp.resolve("nope").toString(), "--rules", "ca-prc4293");
    assertEquals(2, missing.exit());
    assertTrue(missing.err().startsWith("clearance: "), missing.err());
    assertFalse(missing.err().contains("\tat "), "no stack trace");
    CliRun profile = run("evaluate", run.toString(), "--rules", "no-such-profile");
    assertEquals(2, profile.exit());
    assertTrue(profile.err().contains("no-such-profile"), profile.err());
    Path full = Files.createDirectory(tmp.resolve("full"));
    Files.writeString(full.resolve("x.txt"), "x");
    CliRun notEmpty = run("evaluate", run.toString(), "--rules", "ca-prc4293", "--out",
        full.toString());
    assertEquals(2, notEmpty.exit());
    assertTrue(notEmpty.err().contains("not a Clearance run folder"), notEmpty.err());
    assertEquals("x", Files.readString(full.resolve("x.txt")), "a foreign file is kept");
    assertEquals(2, run("evaluate", run.toString(), "--rules", "ca-prc4293", "--units", "usft")
        .exit());
    Files.delete(run.resolve("near-points.bin"));
    CliRun noPoints = run("evaluate", run.toString(), "--rules", "ca-prc4293");
    assertEquals(2, noPoints.exit());
    assertTrue(noPoints.err().contains("near-points.bin"), noPoints.err());
  }
}
