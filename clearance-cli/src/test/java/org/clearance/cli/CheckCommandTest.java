package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code clearance check} and {@code clearance demo} end to end, and their input errors. */
class CheckCommandTest {

  @TempDir static Path shared;
  @TempDir Path dir;
  private static DemoCorridor.DemoFiles demo;

  @BeforeAll
  static void smallDemo() {
    demo = DemoCorridor.write(shared.resolve("input"),
        DemoOptions.defaults().withSpanCount(3).withPointDensity(1.0));
  }

  private CliRun check(Path structures, Path line, Path out, String... more) {
    List<String> args = new java.util.ArrayList<>(List.of("check", "--survey",
        demo.survey().toString(), "--structures", structures.toString(), "--line",
        line.toString(), "--out", out.toString(), "--threads", "2"));
    args.addAll(List.of(more));
    return CliRun.of(args.toArray(new String[0]));
  }

  private static void assertOneLineInputError(CliRun r, String... parts) {
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit(), r.err());
    assertEquals(1, r.err().lines().count(), "one line, no stack trace: " + r.err());
    for (String p : parts) {
      assertTrue(r.err().contains(p), "'" + p + "' in: " + r.err());
    }
  }

  private Path edited(Path source, String name, String from, String to) throws IOException {
    String text = Files.readString(source, StandardCharsets.UTF_8);
    assertTrue(text.contains(from), "fixture text to edit: " + from);
    Path p = dir.resolve(name);
    Files.writeString(p, text.replace(from, to), StandardCharsets.UTF_8);
    return p;
  }

  @Test
  void wholeCheckWritesTheRunFolder() throws IOException {
    Path out = dir.resolve("run");
    CliRun r = check(demo.structures(), demo.lineSpec(), out, "--rules",
        "example-utility", "--units", "ft");
    assertEquals(ClearanceCommand.EXIT_OK, r.exit(), r.err());
    for (String f : List.of("worklist.csv", "spans.csv", "conductors.csv", "sites.gpkg",
        "sites.geojson", "report.html", "run.json", "model.json", "near-points.bin")) {
      assertTrue(Files.isRegularFile(out.resolve(f)), f);
    }
    String header = Files.readAllLines(out.resolve("worklist.csv")).get(0);
    assertTrue(header.contains("min_clearance_ft") && header.contains("area_ft2"), header);
    assertTrue(r.out().contains("screening aid"), "the console carries the caution");
    try (Stream<Path> s = Files.list(dir)) {
      assertEquals(List.of(".run.lock", "run"), s.map(p -> p.getFileName().toString())
          .sorted().toList(), "no staging folder left behind");
    }
  }

  @Test
  void badStructuresFileIsAnInputErrorAndWritesNothing() throws IOException {
    Path out = dir.resolve("run");
    Path noY = edited(demo.structures(), "s1.csv", "structure_id,x,y,", "structure_id,x,yy,");
    assertOneLineInputError(check(noY, demo.lineSpec(), out), "s1.csv", "y");
    Path notNumber = dir.resolve("s2.csv");
    Files.writeString(notNumber, Files.readString(demo.structures())
        .replaceFirst("\\nT102,[0-9.]+,", "\nT102,east,"));
    assertOneLineInputError(check(notNumber, demo.lineSpec(), out), "s2.csv", "line 4", "x");
    String dup = Files.readString(demo.structures()).replace("T103,", "T102,");
    Path duplicate = dir.resolve("s3.csv");
    Files.writeString(duplicate, dup);
    assertOneLineInputError(check(duplicate, demo.lineSpec(), out), "s3.csv", "T102");
    assertFalse(Files.exists(out), "nothing written");
  }

  @Test
  void badLineSpecificationIsAnInputError() throws IOException {
    Path out = dir.resolve("run");
    Path unknownConductor = edited(demo.lineSpec(), "l1.yaml", "conductor: Drake",
        "conductor: Grackle-X");
    assertOneLineInputError(check(demo.structures(), unknownConductor, out), "l1.yaml",
        "conductor", "Grackle-X");
    Path unknownKey = edited(demo.lineSpec(), "l2.yaml", "nominal_voltage_kv:",
        "voltage_class: x\nnominal_voltage_kv:");
    assertOneLineInputError(check(demo.structures(), unknownKey, out), "l2.yaml",
        "voltage_class");
    assertFalse(Files.exists(out), "nothing written");
  }

  @Test
  void outputFolderThatIsNotARunIsRefused() throws IOException {
    Path out = dir.resolve("notes");
    Files.createDirectories(out);
    Files.writeString(out.resolve("mine.txt"), "keep me");
    assertOneLineInputError(check(demo.structures(), demo.lineSpec(), out), "--out");
    assertEquals("keep me", Files.readString(out.resolve("mine.txt")));
  }

  /**
   * Regression: {@code check --out EXISTING_RUN_FOLDER} deleted every file in the folder,
   * including the inputs it had just read and files that were not the tool's.
   */
  @Test
  void aRunFolderIsReplacedWholeButNeverOneHoldingOtherFiles() throws IOException {
    Path out = dir.resolve("run");
    assertEquals(ClearanceCommand.EXIT_OK, check(demo.structures(), demo.lineSpec(), out).exit());
    String firstRecord = Files.readString(out.resolve("run.json"));
    CliRun again = check(demo.structures(), demo.lineSpec(), out, "--rules", "example-utility");
    assertEquals(ClearanceCommand.EXIT_OK, again.exit(), again.err());
    assertFalse(firstRecord.equals(Files.readString(out.resolve("run.json"))), "replaced");
    // an input inside the run folder, and a note of the user's
    Path structures = Files.copy(demo.structures(), out.resolve("structures.csv"));
    Files.writeString(out.resolve("notes.txt"), "crew notes");
    assertOneLineInputError(check(structures, demo.lineSpec(), out), "--out", "notes.txt",
        "structures.csv", "not replaced");
    assertEquals("crew notes", Files.readString(out.resolve("notes.txt")));
    assertTrue(Files.isRegularFile(structures), "the input is kept");
    assertTrue(Files.isRegularFile(out.resolve("model.json")), "the previous run is kept");
  }

  /**
   * Regression: structure ids starting with {@code =}, {@code +}, {@code -} or {@code @} were
   * written as bare cells, which a spreadsheet runs as formulas (issue 10, item 10).
   */
  @Test
  void idsThatLookLikeFormulasAreWrittenAsText() throws IOException {
    String text = Files.readString(demo.structures(), StandardCharsets.UTF_8);
    Path structures = dir.resolve("s-formula.csv");
    Files.writeString(structures, text.replaceAll("(?m)^(T\\d+),", "=$1,"));
    Path out = dir.resolve("run");
    CliRun r = check(structures, demo.lineSpec(), out);
    assertEquals(ClearanceCommand.EXIT_OK, r.exit(), r.err());
    for (String f : List.of("spans.csv", "conductors.csv")) {
      List<String> lines = Files.readAllLines(out.resolve(f));
      assertTrue(lines.size() > 1, f);
      for (String line : lines.subList(1, lines.size())) {
        assertTrue(line.contains(",'=T"), f + ": " + line);
        assertFalse(line.startsWith("=") || line.contains(",="), f + ": " + line);
      }
    }
  }

  @Test
  void demoWritesInputsAndRun() {
    Path out = dir.resolve("demo");
    CliRun r = CliRun.of("demo", "--out", out.toString(), "--spans",
        "3", "--density", "1", "--threads", "2");
    assertEquals(ClearanceCommand.EXIT_OK, r.exit(), r.err());
    assertTrue(Files.isRegularFile(out.resolve("input/survey.las")));
    assertTrue(Files.isRegularFile(out.resolve("run/report.html")));
    assertTrue(r.out().contains("report: "), r.out());
  }
}
