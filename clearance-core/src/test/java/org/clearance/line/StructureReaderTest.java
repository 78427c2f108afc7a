package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import java.util.stream.Stream;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class StructureReaderTest {

  /** Metre inputs convert exactly (factor 1). */
  private static final double EXACT = 0.0;
  private static final SurveyUnits METRES = SurveyUnits.metres("test");

  @TempDir Path dir;

  private List<Structure> read(String name, String text, SurveyUnits units) {
    return StructureReader.read(InputErrors.write(dir, name, text), units);
  }

  @Test
  void readsCsvWithCommentsQuotesAndOptionalColumns() {
    String csv = "# structures of a tiny hand-made line\n"
        + "\n"
        + "line_id,structure_id,sequence,type,x,y,ground_z,attach_z_A,attach_z_SW1\n"
        + "L1,T1,10,dead_end,100.0,200.0,50.5,70.25,75\n"
        + "# a comment between rows\n"
        + "L1,\"T,2\",20,,400,200,,,\n"
        + "L1, T3 ,30,Dead-End,700,260.5,52,71.5,\n";
    List<Structure> s = read("s.csv", csv, METRES);
    assertEquals(3, s.size());
    Structure t1 = s.get(0);
    assertEquals("T1", t1.id());
    assertEquals("L1", t1.lineId());
    assertEquals(10, t1.sequence());
    assertEquals(StructureType.DEAD_END, t1.type());
    assertEquals(100.0, t1.x(), EXACT);
    assertEquals(200.0, t1.y(), EXACT);
    assertEquals(50.5, t1.groundZ(), EXACT);
    assertEquals(Map.of("A", 70.25, "SW1", 75.0), t1.attachZ());
    assertEquals(4, t1.sourceLine()); // header is line 3 after a comment and a blank line
    Structure t2 = s.get(1);
    assertEquals("T,2", t2.id()); // quoted field keeps its comma
    assertEquals(StructureType.SUSPENSION, t2.type()); // blank type: suspension (line-inputs.md)
    assertTrue(Double.isNaN(t2.groundZ())); // not given: NaN, never 0
    assertTrue(Double.isNaN(t2.attachmentZ("A")));
    assertEquals(Map.of(), t2.attachZ());
    assertEquals(6, t2.sourceLine());
    Structure t3 = s.get(2);
    assertEquals("T3", t3.id()); // unquoted fields are trimmed
    assertEquals(StructureType.DEAD_END, t3.type()); // "dead-end" accepted (line-inputs.md)
    assertEquals(71.5, t3.attachmentZ("A"), EXACT);
  }

  /** Issue 15: the optional equipment column, in CSV and GeoJSON. */
  @Test
  void readsPoleEquipment() {
    List<Structure> s = read("e.csv", "structure_id,x,y,equipment\n"
        + "P1,0,0,transformer; fuse\nP2,50,0,\nP3,100,0,Dead-End;corner;arrester;switch\n",
        METRES);
    assertEquals(java.util.Set.of(PoleEquipment.TRANSFORMER, PoleEquipment.FUSE),
        s.get(0).equipment());
    assertEquals("transformer;fuse", s.get(0).equipmentText());
    assertTrue(s.get(1).equipment().isEmpty());
    assertEquals("", s.get(1).equipmentText());
    assertEquals("switch;arrester;dead_end;corner", s.get(2).equipmentText());
    String json = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\","
        + "\"geometry\":{\"type\":\"Point\",\"coordinates\":[0,0]},\"properties\":"
        + "{\"structure_id\":\"P1\",\"equipment\":\"switch\"}},{\"type\":\"Feature\","
        + "\"geometry\":{\"type\":\"Point\",\"coordinates\":[9,0]},\"properties\":"
        + "{\"structure_id\":\"P2\",\"equipment\":null}}]}";
    List<Structure> g = read("e.geojson", json, METRES);
    assertEquals(java.util.Set.of(PoleEquipment.SWITCH), g.get(0).equipment());
    assertTrue(g.get(1).equipment().isEmpty());
  }

  @Test
  void minimalCsvUsesFileOrderAndNoLineId() {
    List<Structure> s = read("m.csv", "structure_id,x,y\nP1,0,0\nP2,1.5e2,-3\n", METRES);
    assertEquals(1, s.get(0).sequence());
    assertEquals(2, s.get(1).sequence());
    assertEquals("", s.get(1).lineId());
    assertEquals(150.0, s.get(1).x(), EXACT);
    assertEquals(-3.0, s.get(1).y(), EXACT);
  }

  @Test
  void byteOrderMarkIsNotPartOfTheFirstColumnName() {
    // Regression: spreadsheet exports start with U+FEFF; it must not turn "structure_id" into an
    // unknown column, nor hide the '{' that marks GeoJSON.
    assertEquals("P1", read("b.csv", "\uFEFFstructure_id,x,y\nP1,0,0\n", METRES).get(0).id());
    String json = "\uFEFF {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\","
        + "\"geometry\":{\"type\":\"Point\",\"coordinates\":[5,6]},"
        + "\"properties\":{\"structure_id\":\"Q\"}}]}";
    assertEquals(6.0, read("b.txt", json, METRES).get(0).y(), EXACT);
  }

  @Test
  void usSurveyFeetConvertToMetres() {
    // 1 US survey foot = 1200/3937 m (NIST; shared/reference/check-values.md section 1,
    // [published]); horizontal and vertical units apply separately.
    SurveyUnits ftUs = new SurveyUnits(LinearUnit.US_SURVEY_FOOT, LinearUnit.US_SURVEY_FOOT, "",
        OptionalInt.empty(), "", "test");
    Structure s = read("f.csv", "structure_id,x,y,ground_z,attach_z_A\nP1,3937,1000,100,3937\n",
        ftUs).get(0);
    assertEquals(1200.0, s.x(), 1e-9);
    // check-values.md prints 0.3048006096 m, rounded at 1e-10 m, so 1000 ft agree to 1e-7 m.
    assertEquals(1000 * 0.3048006096, s.y(), 1e-7);
    assertEquals(100 * 1200.0 / 3937.0, s.groundZ(), 1e-12);
    assertEquals(1200.0, s.attachmentZ("A"), 1e-9);
    SurveyUnits mixed = new SurveyUnits(LinearUnit.US_SURVEY_FOOT, LinearUnit.METRE, "",
        OptionalInt.empty(), "", "test");
    Structure m = read("g.csv", "structure_id,x,y,ground_z\nP1,3937,0,100\n", mixed).get(0);
    assertEquals(1200.0, m.x(), 1e-9);
    assertEquals(100.0, m.groundZ(), EXACT);
  }

  @Test
  void readsGeoJsonPointFeatures() {
    String json = "{\n"
        + "  \"type\": \"FeatureCollection\",\n"
        + "  \"crs\": {\"type\": \"name\", \"properties\": {\"name\": \"EPSG:32611\"}},\n"
        + "  \"features\": [\n"
        + "    {\"type\": \"Feature\", \"geometry\": {\"type\": \"Point\",\n"
        + "      \"coordinates\": [1000.5, 2000.25, 99]},\n"
        + "     \"properties\": {\"structure_id\": 17, \"line_id\": \"N\\u00e9\",\n"
        + "       \"type\": \"dead_end\", \"ground_z\": null, \"attach_z_A\": \"31.5\"}},\n"
        + "    {\"type\": \"Feature\", \"geometry\": {\"type\": \"Point\","
        + " \"coordinates\": [0, 1]},\n"
        + "     \"properties\": {\"structure_id\": \"18\", \"line_id\": \"N\\u00e9\"}}\n"
        + "  ]\n"
        + "}\n";
    List<Structure> s = read("s.geojson", json, METRES);
    assertEquals(2, s.size());
    Structure a = s.get(0);
    assertEquals("17", a.id());
    assertEquals("N\u00e9", a.lineId());
    assertEquals(1000.5, a.x(), EXACT);
    assertEquals(2000.25, a.y(), EXACT);
    assertTrue(Double.isNaN(a.groundZ())); // the third coordinate is not used; null = not given
    assertEquals(31.5, a.attachmentZ("A"), EXACT);
    assertEquals(StructureType.DEAD_END, a.type());
    assertEquals(5, a.sourceLine()); // the feature's opening brace
    assertEquals(9, s.get(1).sourceLine());
    assertEquals(2, s.get(1).sequence());
  }

  @Test
  void geoJsonFeetConvertToo() {
    SurveyUnits ft = new SurveyUnits(LinearUnit.FOOT, LinearUnit.FOOT, "", OptionalInt.empty(),
        "", "test");
    String json = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\","
        + "\"geometry\":{\"type\":\"Point\",\"coordinates\":[1000,0]},"
        + "\"properties\":{\"structure_id\":\"P\",\"ground_z\":10}}]}";
    Structure s = read("ft.json", json, ft).get(0);
    assertEquals(304.8, s.x(), 1e-9); // 1 ft = 0.3048 m exactly (NIST, check-values.md s1)
    assertEquals(3.048, s.groundZ(), 1e-12);
  }

  static Stream<Arguments> csvErrors() {
    String h = "structure_id,x,y\n";
    return Stream.of(
        Arguments.of("missing required column", "structure_id,x\nT1,0\n", 1, "y", "required"),
        Arguments.of("unknown column", "structure_id,x,y,elev\nT1,0,0,5\n", 1, "elev",
            "unknown column"),
        Arguments.of("attach_z_ without a position", "structure_id,x,y,attach_z_\nT1,0,0,5\n", 1,
            "attach_z_", "unknown column"),
        Arguments.of("non-numeric x", h + "T1,abc,0\n", 2, "x", "not a number"),
        Arguments.of("number with unit", h + "T1,0,12.5ft\n", 2, "y", "number alone"),
        Arguments.of("non-finite number", h + "T1,1e999,0\n", 2, "x", "finite"),
        Arguments.of("NaN is not a number", h + "T1,NaN,0\n", 2, "x", "not a number"),
        Arguments.of("blank required x", h + "T1,,0\n", 2, "x", "no value"),
        Arguments.of("blank structure id", "# c\n" + h + ",0,0\n", 3, "structure_id",
            "no structure id"),
        Arguments.of("duplicate id in a line", "line_id," + h + "L,T1,0,0\nL,T1,5,5\n", 3,
            "structure_id", "appears twice"),
        Arguments.of("duplicate sequence", "structure_id,sequence,x,y\nA,1,0,0\nB,1,5,5\n", 3,
            "sequence", "appears twice"),
        Arguments.of("non-integer sequence", "structure_id,sequence,x,y\nA,1.5,0,0\n", 2,
            "sequence", "whole number"),
        Arguments.of("sequence on some rows only", "structure_id,sequence,x,y\nA,1,0,0\nB,,5,5\n",
            3, "sequence", "every one"),
        Arguments.of("bad type", "structure_id,type,x,y\nA,tower,0,0\n", 2, "type",
            "suspension or dead_end"),
        Arguments.of("too few fields", h + "T1,0\n", 2, "y", "2 fields"),
        Arguments.of("too many fields", h + "T1,0,0,9\n", 2, "column 4", "4 fields"),
        Arguments.of("unclosed quote", h + "\"T1,0,0\n", 2, "column 1", "not closed"),
        Arguments.of("header named twice", "structure_id,x,y,X\n", 1, "X", "twice"),
        Arguments.of("bad attachment value", "structure_id,x,y,attach_z_B\nT,0,0,high\n", 2,
            "attach_z_B", "not a number"),
        Arguments.of("unknown equipment", "structure_id,x,y,equipment\nT,0,0,fuse;recloser\n", 2,
            "equipment", "'recloser' is not equipment"),
        Arguments.of("equipment twice", "structure_id,x,y,equipment\nT,0,0,fuse;Fuse\n", 2,
            "equipment", "listed twice"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("csvErrors")
  void csvErrorsNameFileLineAndColumn(String what, String text, int line, String field,
      String problem) {
    Path f = InputErrors.write(dir, "bad.csv", text);
    InputErrors.check(f, line, field, problem, () -> StructureReader.read(f, METRES));
  }

  /** Messages about a feature name the line where the feature starts, and the property. */
  static Stream<Arguments> geoJsonErrors() {
    String head = "{\"type\": \"FeatureCollection\", \"features\": [\n";
    String pt = "{\"type\": \"Feature\", \"geometry\": {\"type\": \"Point\", \"coordinates\": "
        + "[0, 0]},\n \"properties\": ";
    return Stream.of(
        Arguments.of("unknown property", head + pt + "{\"structure_id\": \"A\",\n \"hgt\": 3}}]}",
            2, "hgt", "unknown column"),
        Arguments.of("x as a property", head + pt + "{\"structure_id\": \"A\", \"x\": 3}}]}", 2,
            "x", "Point geometry"),
        Arguments.of("missing structure_id", head + pt + "{\"type\": \"dead_end\"}}]}", 2,
            "structure_id", "required"),
        Arguments.of("boolean property", head + pt + "{\"structure_id\": true}}]}", 2,
            "structure_id", "string or a number"),
        Arguments.of("not a point", head + "{\"type\": \"Feature\", \"geometry\": {\"type\": "
            + "\"LineString\", \"coordinates\": [[0, 0]]}, \"properties\": {}}]}", 2, "geometry",
            "Point"),
        Arguments.of("not a collection", "{\"type\": \"Feature\"}", 1, "type",
            "FeatureCollection"),
        Arguments.of("duplicate id", head + pt + "{\"structure_id\": \"A\"}},\n" + pt
            + "{\"structure_id\": \"A\"}}]}", 4, "structure_id", "twice"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("geoJsonErrors")
  void geoJsonErrorsNameFileLineAndProperty(String what, String text, int line, String field,
      String problem) {
    Path f = InputErrors.write(dir, "bad.geojson", text);
    InputErrors.check(f, line, field, problem, () -> StructureReader.read(f, METRES));
  }

  @Test
  void emptyAndMissingFiles() {
    Path empty = InputErrors.write(dir, "e.csv", "# nothing\n");
    InputErrors.check(empty, 0, null, "no header", () -> StructureReader.read(empty, METRES));
    Path noRows = InputErrors.write(dir, "h.csv", "structure_id,x,y\n");
    InputErrors.check(noRows, 0, null, "no structures",
        () -> StructureReader.read(noRows, METRES));
    Path missing = dir.resolve("absent.csv");
    InputErrors.check(missing, 0, null, "not found", () -> StructureReader.read(missing, METRES));
  }

  @Test
  void aLasFileGivenAsStructuresSaysWhatWasExpected() throws Exception {
    // regression (issue 11): a LAS file given as structures said only "not UTF-8 text"
    Path las = dir.resolve("tile.las");
    byte[] head = new byte[64];
    head[0] = 'L';
    head[1] = 'A';
    head[2] = 'S';
    head[3] = 'F';
    head[10] = (byte) 0xFF; // not UTF-8, as any real LAS header
    java.nio.file.Files.write(las, head);
    org.clearance.InputException e = org.junit.jupiter.api.Assertions.assertThrows(
        org.clearance.InputException.class, () -> StructureReader.read(las, METRES));
    assertTrue(e.getMessage().contains("a LAS point file (give it with --survey); expected the "
        + "structures table (CSV or GeoJSON text)"), e.getMessage());
  }
}
