package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import java.util.stream.Stream;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class SpanLayoutTest {

  private static final SurveyUnits METRES = SurveyUnits.metres("test");
  private static final ConductorType DRAKE = ConductorLibrary.builtin().find("Drake").orElseThrow();

  @TempDir Path dir;

  static LineSpec spec(String lineId, String file) {
    ConductorPosition a = new ConductorPosition("A", ConductorPosition.Role.PHASE, 1, DRAKE,
        Double.NaN, Double.NaN, 1, Double.NaN, Double.NaN);
    return new LineSpec(lineId, "", 230, 0, Double.NaN, List.of(a), List.of(), file);
  }

  private List<Structure> structures(String name, String csv, SurveyUnits units) {
    return StructureReader.read(InputErrors.write(dir, name, csv), units);
  }

  @Test
  void oneSectionGivesTheCheckValueRulingSpan() {
    // Spans 250, 300, 350, 400 m -> RS 339.116 m (check-values.md section 2, [computed]).
    List<Structure> s = structures("s.csv",
        "structure_id,x,y\nP1,0,0\nP2,250,0\nP3,550,0\nP4,900,0\nP5,1300,0\n", METRES);
    SpanLayout layout = SpanLayout.build(s, List.of(spec("L", "l.yaml")));
    LineLayout line = layout.lines().get(0);
    assertEquals(4, line.spans().size());
    assertEquals(1, line.sections().size());
    TensionSection ts = line.sections().get(0);
    assertEquals(339.116, ts.rulingSpanM(), 0.0005);
    assertEquals("TS1", ts.id()); // no line id in the structures file: no prefix
    assertEquals("P1-P2", line.spans().get(0).id());
    assertEquals("L", line.spans().get(0).lineId());
    assertEquals(1300.0, ts.lengthM(), 1e-9);
    assertSame(s.get(0), ts.first());
    assertSame(s.get(4), ts.last());
  }

  @Test
  void rulingSpanInUsSurveyFeet() {
    // Spans 600, 800, 1000 ftUS -> RS 848.53 ft (check-values.md section 2, [computed]); the
    // layout works in metres, 1 ftUS = 1200/3937 m (check-values.md section 1, [published]).
    SurveyUnits ftUs = new SurveyUnits(LinearUnit.US_SURVEY_FOOT, LinearUnit.US_SURVEY_FOOT, "",
        OptionalInt.empty(), "", "test");
    List<Structure> s = structures("f.csv",
        "structure_id,x,y\nP1,0,0\nP2,0,600\nP3,0,1400\nP4,0,2400\n", ftUs);
    TensionSection ts = SpanLayout.build(s, List.of(spec("L", "l.yaml"))).lines().get(0)
        .sections().get(0);
    assertEquals(848.53, ts.rulingSpanM() * 3937.0 / 1200.0, 0.005);
    assertEquals(600 * 1200.0 / 3937.0, ts.spans().get(0).lengthM(), 1e-9);
  }

  @Test
  void deadEndsSplitSectionsAndSequenceOrders() {
    // Rows out of sequence order; P3 is a dead-end inside the line.
    List<Structure> s = structures("s.csv", "line_id,structure_id,sequence,type,x,y\n"
        + "N,P3,30,dead_end,0,200\n"
        + "N,P1,10,dead_end,0,0\n"
        + "N,P2,20,,0,100\n"
        + "N,P5,50,dead_end,0,400\n"
        + "N,P4,40,,0,300\n", METRES);
    LineLayout line = SpanLayout.build(s, List.of(spec("N", "n.yaml"))).lines().get(0);
    assertEquals(List.of("P1", "P2", "P3", "P4", "P5"),
        line.structures().stream().map(Structure::id).toList());
    assertEquals(List.of("N/P1-P2", "N/P2-P3", "N/P3-P4", "N/P4-P5"),
        line.spans().stream().map(Span::id).toList());
    assertEquals(List.of(0, 0, 1, 1), line.spans().stream().map(Span::sectionIndex).toList());
    assertEquals(List.of("N/TS1", "N/TS2"), line.sections().stream().map(TensionSection::id)
        .toList());
    assertSame(line.sections().get(1), line.section(line.spans().get(2)));
    Span first = line.spans().get(0);
    // Frame from centre to centre: due north, so azimuth 0 and station = northing offset.
    assertEquals(0.0, first.frame().azimuth(), 1e-12);
    assertEquals(100.0, first.lengthM(), 1e-12);
    assertEquals(50.0, first.frame().station(3, 50), 1e-12);
    assertEquals(-3.0, first.frame().offset(3, 50), 1e-12); // east is to the right looking north
  }

  @Test
  void exampleFilesLayOut() {
    Path csv = Path.of("../span-specs/lines/example-structures.csv");
    Path yaml = Path.of("../span-specs/lines/example-line.yaml");
    LineSpec spec = LineSpecReader.read(yaml, ConductorLibrary.builtin());
    SpanLayout layout = SpanLayout.build(StructureReader.read(csv, METRES), List.of(spec));
    LineLayout line = layout.line("BH230").orElseThrow();
    assertEquals(5, line.spans().size());
    assertEquals(2, line.sections().size());
    // [computed] by hand from the file's coordinates: spans 312.570, 347.922, 338.009 m
    // -> RS 333.824 m; spans 348.281, 366.231 m -> RS 357.594 m.
    assertEquals(333.824, line.sections().get(0).rulingSpanM(), 0.0005);
    assertEquals(357.594, line.sections().get(1).rulingSpanM(), 0.0005);
    assertEquals(312.570, layout.span("BH230/BH-001-BH-002").orElseThrow().lengthM(), 0.0005);
    assertEquals(5, layout.spans().size());
  }

  static Stream<Arguments> errors() {
    String h = "line_id,structure_id,x,y\n";
    return Stream.of(
        Arguments.of("one structure", h + "L,P1,0,0\n", 2, "structure_id", "only one structure"),
        Arguments.of("same plan position", h + "L,P1,0,0\nL,P2,0.004,0\n", 3, "x",
            "same plan position"),
        Arguments.of("line without spec", h + "L,P1,0,0\nL,P2,10,0\nM,Q1,0,0\n", 4, "line_id",
            "no line specification has line_id 'M'"),
        Arguments.of("attachment position not in spec",
            "structure_id,x,y,attach_z_D\nP1,0,0,20\nP2,100,0,\n", 2, "attach_z_D",
            "positions are A"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("errors")
  void errorsNameFileLineAndField(String what, String csv, int line, String field,
      String problem) {
    Path f = InputErrors.write(dir, "s.csv", csv);
    List<Structure> s = StructureReader.read(f, METRES);
    InputErrors.check(f, line, field, problem,
        () -> SpanLayout.build(s, List.of(spec("L", "l.yaml"))));
  }

  @Test
  void errorsAcrossFilesAndSpecs() {
    Path f = InputErrors.write(dir, "a.csv", "structure_id,x,y\nP1,0,0\nP2,100,0\n");
    Path g = InputErrors.write(dir, "b.csv", "structure_id,x,y\nP2,0,50\nP3,100,50\n");
    List<Structure> both = new ArrayList<>(StructureReader.read(f, METRES));
    both.addAll(StructureReader.read(g, METRES));
    // Duplicate structure id across two files of one line (P2), reported at the second one.
    InputErrors.check(g, 2, "structure_id", "appears twice",
        () -> SpanLayout.build(both, List.of(spec("L", "l.yaml"))));
    // No line id in the structures but two specifications.
    List<Structure> one = StructureReader.read(f, METRES);
    InputErrors.check(f, 2, "line_id", "give every structure its line_id",
        () -> SpanLayout.build(one, List.of(spec("L", "l.yaml"), spec("M", "m.yaml"))));
    // A specification with no structures.
    Path h = InputErrors.write(dir, "c.csv", "line_id,structure_id,x,y\nL,P1,0,0\nL,P2,9,0\n");
    Path m = dir.resolve("m.yaml");
    InputErrors.check(m, 0, "line_id", "no structure belongs to line 'M'",
        () -> SpanLayout.build(StructureReader.read(h, METRES),
            List.of(spec("L", "l.yaml"), spec("M", m.toString()))));
    // Two specifications with one line id.
    Path l2 = dir.resolve("l2.yaml");
    InputErrors.check(l2, 0, "line_id", "also used by",
        () -> SpanLayout.build(StructureReader.read(h, METRES),
            List.of(spec("L", "l.yaml"), spec("L", l2.toString()))));
  }
}
