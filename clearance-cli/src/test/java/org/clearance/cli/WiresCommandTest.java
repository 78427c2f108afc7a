package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import org.clearance.survey.SurveyTestFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code clearance wires} on the open corridor tile: output file, summary, bad inputs. */
class WiresCommandTest {
  /** The tile's structures and line (clearance-core test resources, shared by the tests). */
  private static final Path FIXTURE = Paths.get("..", "clearance-core", "src", "test",
      "resources", "corridor-12AN2");
  private static final String TILE =
      SurveyTestFiles.open("corridor_12AN2_20_thinned.las").toString();
  private static final String HEADER = "span_id,from_structure,to_structure,conductor,n_points,"
      + "coverage_pct,rms_m,max_gap_m,attach_a_x_m,attach_a_y_m,attach_a_z_m,attach_b_x_m,"
      + "attach_b_y_m,attach_b_z_m,catenary_c_m,sag_mid_m,status,reason,low_x_m,low_y_m,low_z_m,"
      + "first_point_x_m,first_point_y_m,first_point_z_m,last_point_x_m,last_point_y_m,"
      + "last_point_z_m";

  @TempDir Path dir;


  static CliRun run(String... args) {
    return CliRun.of(args);
  }

  private CliRun wires(Path structures, Path line) {
    return run("wires", "--survey", TILE, "--structures", structures.toString(), "--line",
        line.toString(), "--out", dir.resolve("out").toString(), "--survey-units", "m",
        "--threads", "1");
  }

  private List<String> rows() throws IOException {
    return Files.readAllLines(dir.resolve("out").resolve("conductors.csv"));
  }

  @Test
  void tileGivesEveryConductorOfTheCoveredSpan() throws IOException {
    CliRun r = wires(FIXTURE.resolve("structures.csv"), FIXTURE.resolve("line.yaml"));
    assertEquals(0, r.exit(), r.err());
    List<String> rows = rows();
    assertEquals(HEADER, rows.get(0));
    long fitted = rows.stream().filter(s -> s.startsWith("OV380/OV-12-OV-13,")
        && s.contains(",fitted,")).count();
    assertEquals(14, fitted, String.join("\n", rows));
    assertTrue(rows.stream().filter(s -> s.startsWith("OV380/OV-11-OV-12,"))
        .allMatch(s -> s.contains(",not_assessed,")));
    for (String row : rows.subList(1, rows.size())) {
      assertEquals(27, row.split(",", -1).length - (row.contains("\"") ? countCommasInQuotes(row)
          : 0), row);
    }
    assertTrue(r.out().contains("span OV380/OV-12-OV-13: ASSESSED, 14 of 14 "
        + "conductors fitted,"
        + " wires labelled in the survey"), r.out());
    assertTrue(r.out().contains("span OV380/OV-11-OV-12: NOT ASSESSED"), r.out());
    assertTrue(r.out().contains("conductors.csv (" + (rows.size() - 1) + " conductor rows)"),
        r.out());
  }

  private static int countCommasInQuotes(String row) {
    int n = 0;
    boolean quoted = false;
    for (char ch : row.toCharArray()) {
      if (ch == '"') {
        quoted = !quoted;
      } else if (ch == ',' && quoted) {
        n++;
      }
    }
    return n;
  }

  @Test
  void moreSpecPositionsThanWiresAndStructuresOutsideTheSurvey() throws IOException {
    Path structures = dir.resolve("structures.csv");
    Files.writeString(structures, String.join("\n",
        "line_id,structure_id,sequence,type,x,y",
        "OV380,OV-12,12,suspension,229911.676,569995.314",
        "OV380,OV-13,13,suspension,230037.549,570324.039",
        // two structures 5 km away, outside the survey (a span may not exceed 6 km)
        "OV380,OV-20,20,suspension,235000.000,569995.314",
        "OV380,OV-21,21,suspension,235300.000,569995.314", ""));
    Path line = dir.resolve("line.yaml");
    Files.writeString(line, Files.readString(FIXTURE.resolve("line.yaml"))
        + "  - position: X9\n    role: phase\n    conductor: Cardinal\n    offset_m: 25\n"
        + "    attach_height_m: 20\n");
    CliRun r = wires(structures, line);
    assertEquals(0, r.exit(), r.err());
    List<String> rows = rows();
    assertTrue(rows.contains("OV380/OV-12-OV-13,OV-12,OV-13,X9,0,,,,,,,,,,,,not_assessed,"
        + "\"no wire found near offset 25.0 m, 20.0 m above the structures' ground\",,,,,,,,,"),
        String.join("\n", rows));
    assertTrue(rows.stream().filter(s -> s.startsWith("OV380/OV-20-OV-21,")).allMatch(s -> s
        .endsWith("not_assessed,no survey points in the span's corridor (the span lies outside"
            + " the survey),,,,,,,,,")), String.join("\n", rows));
    // the same word as check gives that span (issue 11): a phase missing is INCOMPLETE
    assertTrue(r.out().contains("span OV380/OV-12-OV-13: INCOMPLETE, 14 of 15 conductors"),
        r.out());
  }

  @Test
  void duplicateStructureIdIsAnInputError() throws IOException {
    Path structures = dir.resolve("structures.csv");
    Files.writeString(structures, "line_id,structure_id,x,y\nOV380,A,229911.676,569995.314\n"
        + "OV380,A,230037.549,570324.039\n");
    CliRun r = wires(structures, FIXTURE.resolve("line.yaml"));
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit());
    String[] lines = r.err().strip().split("\n");
    assertEquals(1, lines.length, r.err());
    assertTrue(lines[0].contains(structures.toString()) && lines[0].contains("structure_id")
        && lines[0].contains("appears twice"), lines[0]);
    assertFalse(Files.exists(dir.resolve("out").resolve("conductors.csv")));
  }

  @Test
  void surveyWithoutUnitsNeedsTheOption() {
    CliRun r = run("wires", "--survey", TILE, "--structures",
        FIXTURE.resolve("structures.csv").toString(), "--line",
        FIXTURE.resolve("line.yaml").toString(), "--out", dir.resolve("out").toString());
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit());
    assertTrue(r.err().startsWith("clearance: " + TILE), r.err());
  }

  @Test
  void outputThatIsAFileIsAnInputError() throws IOException {
    Path file = Files.writeString(dir.resolve("taken"), "x");
    CliRun r = run("wires", "--survey", TILE, "--structures",
        FIXTURE.resolve("structures.csv").toString(), "--line",
        FIXTURE.resolve("line.yaml").toString(), "--out", file.toString(), "--survey-units",
        "m");
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit());
    assertTrue(r.err().contains(file + ", field '--out': is a file, not a folder"), r.err());
  }
}
