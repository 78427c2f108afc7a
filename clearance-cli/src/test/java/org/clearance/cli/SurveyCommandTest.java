package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;
import java.util.stream.Stream;
import org.clearance.io.JsonFiles;
import org.clearance.survey.LasWriter;
import org.clearance.survey.LasWriterOptions;
import org.clearance.survey.PointChunk;
import org.clearance.survey.PointFormat;
import org.clearance.survey.SurveyTestFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code clearance survey}: JSON and text output, units options, exit codes, bad input. */
class SurveyCommandTest {
  /** The README prints extents rounded to 3 decimals (plus a hair for exact halves). */
  private static final double EXTENT_TOL = 0.0005 + 1e-7;

  @TempDir Path dir;


  static CliRun run(String... args) {
    return CliRun.of(args);
  }

  /** Standard output read back through Jackson: objects as maps, null as null. */
  private static Map<String, Object> json(CliRun r) {
    assertEquals(0, r.exit(), r.err());
    return object(JsonFiles.MAPPER.convertValue(JsonFiles.parse(r.out(), "stdout"), Map.class));
  }

  @SuppressWarnings("unchecked")
  private static Map<String, Object> object(Object v) {
    return (Map<String, Object>) v;
  }

  private static double num(Map<String, Object> m, String key) {
    return ((Number) m.get(key)).doubleValue();
  }

  // Source: shared/data/README.md, tables "Reference values (independent reader)" and
  // "Coordinate systems and units as the files state them" ("-" = not stated: JSON null).
  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = ';', value = {
    "autzen_trim.las; 1.2; 3; 34; 110000; 1:83893 2:26107;"
        + " 636001.760; 848935.200; 406.260; 637179.220; 849497.900; 520.510; ft; -",
    "mvk-thin.las; 1.2; 1; 28; 6280; 1:129 2:1693 4:141 5:578 9:37 12:3702;"
        + " 2045001.760; 1267501.190; 95.790; 2049993.920; 1272499.790; 228.730; ftUS; ftUS",
    "warsaw_small.las; 1.2; 3; 34; 3000; 0:433 2:1381 3:257 4:27 5:902;"
        + " 639913.260; 485143.140; 84.700; 639946.750; 485175.910; 104.550; -; -",
    "4_6_crop.las; 1.2; 3; 34; 23875; 1:14872 2:9003;"
        + " 1639600.000; 1454500.020; 7077.920; 1639799.980; 1454700.000; 7139.700; ftUS; ftUS",
    "nebraska_wkt_and_geotiff.las; 1.4; 6; 30; 25408; 2:9808 3:158 4:724 5:10956 6:3737 7:25;"
        + " 2445180.000; 604300.000; 1352.700; 2445239.990; 604339.980; 1403.960; ftUS; ftUS",
    "topography_forest.las; 1.2; 1; 28; 73403; 1:61347 2:8159 9:3897;"
        + " 273357.145; 5274357.144; 788.993; 273642.856; 5274642.848; 829.758; m; -",
    "corridor_12AN2_20_thinned.las; 1.4; 7; 36; 153464;"
        + " 1:24794 2:52389 5:53836 9:205 14:9453 15:1179 26:11608;"
        + " 229885.703; 569975.328; 2.054; 230024.887; 570389.939; 45.428; -; -"
  })
  void jsonMatchesTheReferenceTable(String name, String version, int format, int record,
      long points, String classes, double minX, double minY, double minZ, double maxX,
      double maxY, double maxZ, String horizontal, String vertical) {
    Map<String, Object> j = json(run("survey", "--json",
        SurveyTestFiles.open(name).toString()));
    Map<String, Object> file = object(((List<?>) j.get("files")).get(0));
    assertEquals(version, file.get("las_version"));
    assertEquals(format, num(file, "point_format"), 0);
    assertEquals(record, num(file, "record_length"), 0);
    assertEquals(points, num(j, "point_count"), 0);
    StringJoiner histogram = new StringJoiner(" ");
    object(j.get("class_counts"))
        .forEach((k, v) -> histogram.add(k + ":" + ((Number) v).longValue()));
    assertEquals(classes, histogram.toString());
    Map<String, Object> min = object(j.get("min"));
    Map<String, Object> max = object(j.get("max"));
    assertEquals(minX, num(min, "x"), EXTENT_TOL);
    assertEquals(minY, num(min, "y"), EXTENT_TOL);
    assertEquals(minZ, num(min, "z"), EXTENT_TOL);
    assertEquals(maxX, num(max, "x"), EXTENT_TOL);
    assertEquals(maxY, num(max, "y"), EXTENT_TOL);
    assertEquals(maxZ, num(max, "z"), EXTENT_TOL);
    assertEquals(horizontal.equals("-") ? null : horizontal, j.get("horizontal_unit"));
    assertEquals(vertical.equals("-") ? null : vertical, j.get("vertical_unit"));
  }

  @Test
  void unitsOptionFillsInAndGivesDensity() {
    Map<String, Object> j = json(run("survey", "--json", "--survey-units", "m",
        SurveyTestFiles.open("corridor_12AN2_20_thinned.las").toString()));
    assertEquals("m", j.get("horizontal_unit"));
    assertEquals("m", j.get("vertical_unit"));
    Map<String, Object> d = object(j.get("density"));
    // [computed] with numpy from the file's bytes: distinct (floor(x / 5), floor(y / 5)) over
    // all 153464 points = 1422 cells; density = 153464 / (1422 x 25 m2) = 4.3169 points/m2.
    assertEquals(1422, num(d, "occupied_cells"), 0);
    assertEquals(1422 * 25.0, num(d, "occupied_area_m2"), 1e-9);
    assertEquals(4.3169, num(d, "points_per_m2"), 1e-4);
  }

  @Test
  void textSaysWhenUnitsAreNotStated() {
    CliRun r = run("survey", SurveyTestFiles.open("warsaw_small.las").toString());
    assertEquals(0, r.exit(), r.err());
    assertTrue(r.out().contains("not stated (WKT record 2112 holds no CRS definition)"),
        r.out());
    assertTrue(r.out().contains("give --survey-units or --horizontal-units"), r.out());
    assertTrue(r.out().contains("density: not computed"), r.out());
    assertTrue(r.out().contains("never classified"), r.out());
  }

  @Test
  void textGivesDensityWhenTheUnitIsKnown() {
    CliRun r = run("survey", SurveyTestFiles.open("topography_forest.las").toString());
    assertEquals(0, r.exit(), r.err());
    assertTrue(r.out().contains("points per square metre over"), r.out());
    assertTrue(r.out().contains("EPSG:2949"), r.out());
  }

  @Test
  void twoTilesAreSummarisedTogether() {
    Path a = tile("a.las", 2, PointFormat.F1, 0);
    Path b = tile("b.las", 4, PointFormat.F6, 100);
    Map<String, Object> j = json(run("survey", "--json", "--survey-units", "m", a.toString(),
        b.toString()));
    assertEquals(2, ((List<?>) j.get("files")).size());
    assertEquals(20, num(j, "point_count"), 0);
    assertEquals(0, num(object(j.get("min")), "x"), 1e-9);
    assertEquals(109, num(object(j.get("max")), "x"), 1e-9);
  }

  /** Ten points x = base + i, y = 0, z = 1, class 2, no CRS. */
  private Path tile(String name, int minor, PointFormat f, double base) {
    Path p = dir.resolve(name);
    PointChunk c = new PointChunk(10);
    for (int i = 0; i < 10; i++) {
      c.add(base + i, 0, 1, 2);
    }
    try (LasWriter w = LasWriter.create(p, LasWriterOptions.of(minor, f))) {
      w.write(c);
    }
    return p;
  }

  /** A valid LAS 1.2 format 1 file of ten points, as bytes. */
  private byte[] validBytes() throws IOException {
    return Files.readAllBytes(tile("valid.las", 2, PointFormat.F1, 0));
  }

  private static byte[] patch(byte[] b, int at, ByteBuffer v) {
    byte[] out = b.clone();
    System.arraycopy(v.array(), 0, out, at, v.capacity());
    return out;
  }

  private static ByteBuffer le(int n) {
    return ByteBuffer.allocate(n).order(ByteOrder.LITTLE_ENDIAN);
  }

  /** Runs the command on the bytes: exit 2, one line naming file and field, nothing else. */
  private void refused(byte[] bytes, String words) throws IOException {
    Path p = Files.write(dir.resolve("bad.las"), bytes);
    long filesBefore = count();
    CliRun r = run("survey", "--json", p.toString());
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit(), r.err());
    assertEquals("", r.out());
    String err = r.err().strip();
    assertFalse(err.contains("\n"), "one line: " + err);
    assertTrue(err.startsWith("clearance: " + p), err);
    assertTrue(err.contains(words), err);
    assertFalse(err.contains("Exception"), err);
    assertEquals(filesBefore, count(), "nothing written");
  }

  private long count() throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return s.count();
    }
  }

  // Header field offsets: ASPRS LAS 1.4 R15 section 2.4 (94 header size, 96 offset to points,
  // 104 format, 105 record length, 107 point count, 131 scales, 155 offsets).
  @Test
  void badFilesAreRefusedWithOneLine() throws IOException {
    byte[] ok = validBytes();
    refused(new byte[0], "empty file");
    refused("not lidar at all".getBytes(java.nio.charset.StandardCharsets.US_ASCII),
        "field 'file signature'");
    refused(java.util.Arrays.copyOf(ok, 120), "truncated header");
    refused(patch(ok, 94, le(2).putShort(0, (short) 90)), "field 'header size'");
    refused(patch(ok, 96, le(4).putInt(0, 99_999)), "field 'offset to point data'");
    refused(patch(ok, 107, le(4).putInt(0, 50)), "field 'number of point records'");
    refused(patch(ok, 131, le(8).putDouble(0, 0)), "field 'x scale factor': must not be zero");
    refused(patch(ok, 139, le(8).putDouble(0, Double.NaN)), "field 'y scale factor'");
    refused(patch(ok, 171, le(8).putDouble(0, Double.NEGATIVE_INFINITY)), "field 'z offset'");
    refused(patch(ok, 104, le(1).put(0, (byte) 12)), "unknown point data format 12");
    refused(patch(ok, 105, le(2).putShort(0, (short) 19)), "field 'point data record length'");
    byte[] withVlr = patch(ok, 100, le(4).putInt(0, 1));
    refused(withVlr, "VLR 1 of 1");
  }

  @Test
  void missingFileIsAnInputError() {
    CliRun r = run("survey", dir.resolve("absent.las").toString());
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit());
    assertEquals("clearance: " + dir.resolve("absent.las") + ": no such file", r.err().strip());
  }

  @Test
  void contradictoryUnitsAreInputErrors() {
    String mvk = SurveyTestFiles.open("mvk-thin.las").toString();
    CliRun conflict = run("survey", "--survey-units", "m", mvk);
    assertEquals(ClearanceCommand.EXIT_INPUT, conflict.exit());
    assertTrue(conflict.err().contains("the file states US survey foot"), conflict.err());
    CliRun both = run("survey", "--survey-units", "m", "--vertical-units", "ft", mvk);
    assertEquals(ClearanceCommand.EXIT_INPUT, both.exit());
    assertTrue(both.err().contains("not both"), both.err());
    CliRun unknown = run("survey", "--survey-units", "furlong", mvk);
    assertEquals(ClearanceCommand.EXIT_INPUT, unknown.exit());
    assertTrue(unknown.err().contains("'furlong' is not a unit"), unknown.err());
    CliRun replaced = run("survey", "--json", "--survey-units", "m", "--override-file-units", mvk);
    assertEquals("m", json(replaced).get("horizontal_unit"));
  }

  @Test
  void tilesInDifferentCrsAreRefused() {
    // mvk-thin: EPSG 26995, 4_6_crop: EPSG 2903 (README).
    CliRun r = run("survey", SurveyTestFiles.open("mvk-thin.las").toString(),
        SurveyTestFiles.open("4_6_crop.las").toString());
    assertEquals(ClearanceCommand.EXIT_INPUT, r.exit());
    assertTrue(r.err().contains("field 'EPSG code'"), r.err());
  }

  @Test
  void jsonNumbersArePlainDecimals() {
    assertEquals("0.1", SurveyCommand.text(SurveyCommand.num(0.1)).strip());
    assertEquals("12345678901", SurveyCommand.text(SurveyCommand.num(12345678901.0)).strip());
    assertEquals("35550", SurveyCommand.text(SurveyCommand.num(1422 * 25.0)).strip());
    assertEquals("null", SurveyCommand.text(SurveyCommand.num(Double.NaN)).strip());
  }
}
