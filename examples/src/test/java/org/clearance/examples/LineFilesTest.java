package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineCondition;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.line.StructureReader;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The written structures.csv and line.yaml read back with the project's line readers. */
class LineFilesTest {
  /** Coordinates are written with 3 decimals: half a millimetre of rounding. */
  private static final double WRITTEN_TOL = 5e-4;

  @TempDir
  Path dir;

  private Path write(String name, DemoScene scene, boolean structures) throws IOException {
    Path file = dir.resolve(name);
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      if (structures) {
        LineFiles.writeStructures(w, scene);
      } else {
        LineFiles.writeLineSpec(w, scene);
      }
    }
    return file;
  }

  private SpanLayout layout(DemoScene scene) throws IOException {
    List<Structure> st = StructureReader.read(write("structures.csv", scene, true),
        SurveyUnits.metres("test"));
    LineSpec spec = LineSpecReader.read(write("line.yaml", scene, false),
        ConductorLibrary.builtin());
    return SpanLayout.build(st, List.of(spec));
  }

  @Test
  void defaultFilesGiveTheTruthSpansAndSections() throws IOException {
    DemoScene scene = Scenes.defaults();
    SpanLayout layout = layout(scene);
    assertEquals(scene.spans().size(), layout.spans().size());
    for (int i = 0; i < scene.spans().size(); i++) {
      assertEquals(scene.spans().get(i).id(), layout.spans().get(i).id());
      assertEquals(scene.spans().get(i).lengthM(), layout.spans().get(i).lengthM(), 2e-3);
      assertEquals(scene.spans().get(i).section(), layout.spans().get(i).sectionIndex());
    }
    var sections = layout.line(DemoScene.LINE_ID).orElseThrow().sections();
    assertEquals(scene.sections().size(), sections.size());
    for (int k = 0; k < sections.size(); k++) {
      assertEquals(scene.sections().get(k).rulingSpanM(), sections.get(k).rulingSpanM(), 2e-3);
    }
    int n = layout.spans().size();
    for (int i = 0; i < n; i++) {
      checkStructure(scene.structures().get(i), layout.spans().get(i).from());
    }
    checkStructure(scene.structures().get(n), layout.spans().get(n - 1).to());
  }

  private static void checkStructure(DemoStructure truth, Structure read) {
    assertEquals(truth.id(), read.id());
    assertEquals(truth.x(), read.x(), WRITTEN_TOL);
    assertEquals(truth.y(), read.y(), WRITTEN_TOL);
    assertEquals(truth.groundZ(), read.groundZ(), WRITTEN_TOL);
    assertEquals(truth.type() == DemoStructure.Type.DEAD_END, read.isDeadEnd());
  }

  @Test
  void lineSpecCarriesTheDemoLine() throws IOException {
    DemoScene scene = Scenes.defaults();
    LineSpec spec = LineSpecReader.read(write("line.yaml", scene, false),
        ConductorLibrary.builtin());
    assertEquals(DemoScene.LINE_ID, spec.lineId());
    assertEquals(230, spec.nominalVoltageKv(), 0.0);
    assertEquals(scene.surveyTemperatureC(), spec.surveyConductorTemperatureC(), 0.05);
    assertEquals(scene.positions().size(), spec.conductors().size());
    for (int k = 0; k < scene.positions().size(); k++) {
      DemoPosition p = scene.positions().get(k);
      ConductorPosition c = spec.conductors().get(k);
      assertEquals(p.name(), c.position());
      assertEquals(p.role().name(), c.role().name());
      assertEquals(p.type().code(), c.conductor().code());
      assertEquals(p.offsetM(), c.offsetM(), 0.005);
      assertEquals(p.attachHeightM(), c.attachHeightM(), 0.005);
    }
    LineCondition hot = spec.condition("hot").orElseThrow();
    assertEquals(LineCondition.Kind.TEMPERATURE, hot.kind());
    assertEquals(100, hot.temperatureC(), 0.0);
    assertEquals(10, hot.creepAllowanceC(), 0.0);
    LineCondition wind = spec.condition("blowout").orElseThrow();
    assertEquals(LineCondition.Kind.WIND, wind.kind());
    assertEquals(290, wind.windPressurePa(), 0.0);
    LineCondition ice = spec.condition("ice").orElseThrow();
    assertEquals(LineCondition.Kind.ICE, ice.kind());
    assertEquals(0.0127, ice.iceThicknessM(), 1e-12); // 12.7 mm = 0.5 in radial ice
  }

  @Test
  void structureEditsMoveOrDropOneStructure() throws IOException {
    DemoOptions base = Scenes.small(21);
    DemoScene moved = Scenes.of(base.withStructureEdit(StructureEdit.offset(2, 4.0)));
    List<Structure> st = StructureReader.read(write("moved.csv", moved, true),
        SurveyUnits.metres("test"));
    for (int i = 0; i < st.size(); i++) {
      DemoStructure t = moved.structures().get(i);
      double d = Math.hypot(st.get(i).x() - t.x(), st.get(i).y() - t.y());
      assertEquals(i == 2 ? 4.0 : 0.0, d, 1e-3);
    }
    DemoScene omitted = Scenes.of(base.withStructureEdit(StructureEdit.omit(2)));
    Path file = write("omitted.csv", omitted, true);
    List<Structure> left = StructureReader.read(file, SurveyUnits.metres("test"));
    assertEquals(omitted.structures().size() - 1, left.size());
    assertEquals(false, left.stream().anyMatch(s -> s.id().equals(
        omitted.structures().get(2).id())));
    LineSpec spec = LineSpecReader.read(write("l.yaml", omitted, false),
        ConductorLibrary.builtin());
    assertEquals(omitted.spans().size() - 1, SpanLayout.build(left, List.of(spec)).spans().size());
  }
}
