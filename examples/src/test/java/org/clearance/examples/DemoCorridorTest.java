package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.clearance.InputException;
import org.clearance.io.JsonFiles;
import org.clearance.survey.LasFile;
import org.clearance.survey.LasHeader;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.PointFormat;
import org.clearance.survey.Survey;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The four files, read back with the project's own readers. */
class DemoCorridorTest {
  /** LAS coordinates are stored in 1 mm steps: half a step of rounding (plus float noise). */
  private static final double COORD_TOL = 0.0005 + 1e-9;
  /** Format 6 scan angles are stored in 0.006 degree steps (LAS 1.4 R15). */
  private static final double SCAN_TOL = 0.003 + 1e-6;

  @TempDir
  Path dir;

  private static final DemoOptions OPTIONS = Scenes.small(5);

  @Test
  void surveyReadsBackAsGenerated() {
    DemoCorridor.DemoFiles files = DemoCorridor.write(dir, OPTIONS);
    DemoScene scene = Scenes.of(OPTIONS);
    int n = (int) files.pointCount();
    double[][] xyz = new double[n][];
    int[][] attrs = new int[n][];
    int[] k = {0};
    scene.points((c, ids) -> {
      for (int i = 0; i < c.size(); i++, k[0]++) {
        xyz[k[0]] = new double[] {c.x()[i], c.y()[i], c.z()[i], c.gpsTime()[i],
            c.scanAngle()[i]};
        attrs[k[0]] = new int[] {c.classification()[i], c.intensity()[i], c.returnNumber()[i],
            c.numberOfReturns()[i], c.pointSourceId()[i], c.scanDirection()[i],
            c.edgeOfFlightLine()[i]};
      }
    });
    assertEquals(n, k[0]);
    LasHeader h = LasFile.open(files.survey()).header();
    // LAS 1.4 R15: version 1.4, point format 6, adjusted GPS time and WKT bits set.
    assertEquals("1.4", h.version());
    assertEquals(PointFormat.F6, h.pointFormat());
    assertTrue(h.adjustedGpsTime() && h.wktGoverns());
    assertEquals(n, h.pointCount());
    Survey survey = Survey.open(List.of(files.survey()), UnitsChoice.fromFile());
    assertEquals(LinearUnit.METRE, survey.units().horizontal());
    assertEquals(LinearUnit.METRE, survey.units().vertical());
    assertEquals(DemoScene.EPSG, survey.units().epsg().orElse(-1));
    int[] j = {0};
    survey.read(c -> {
      for (int i = 0; i < c.size(); i++, j[0]++) {
        double[] p = xyz[j[0]];
        assertEquals(p[0], c.x()[i], COORD_TOL);
        assertEquals(p[1], c.y()[i], COORD_TOL);
        assertEquals(p[2], c.z()[i], COORD_TOL);
        assertEquals(p[3], c.gpsTime()[i], 0.0);
        assertEquals(p[4], c.scanAngle()[i], SCAN_TOL);
        assertArrayEquals(attrs[j[0]], new int[] {c.classification()[i], c.intensity()[i],
            c.returnNumber()[i], c.numberOfReturns()[i], c.pointSourceId()[i],
            c.scanDirection()[i], c.edgeOfFlightLine()[i]});
      }
    });
    assertEquals(n, j[0]);
  }

  @Test
  void truthJsonHoldsTheSceneAndTheCounts() throws IOException {
    DemoCorridor.DemoFiles files = DemoCorridor.write(dir, OPTIONS);
    DemoScene scene = Scenes.of(OPTIONS);
    JsonNode m = JsonFiles.parse(Files.readString(files.truth()), "truth.json");
    assertEquals("clearance-demo-truth", m.get("format").textValue());
    assertEquals(OPTIONS.seed(), m.get("seed").longValue());
    JsonNode spans = m.get("spans");
    assertEquals(scene.spans().size(), spans.size());
    JsonNode wire = spans.get(1).get("wires").get(2);
    DemoWire w = scene.spans().get(1).wires().get(2);
    // Numbers are written in their shortest round-trip form: read back exactly.
    assertEquals(w.catenaryConstantM(), wire.get("catenary_constant_m").doubleValue(), 0.0);
    assertEquals(w.midSpanSagM(), wire.get("mid_span_sag_m").doubleValue(), 0.0);
    assertEquals(w.curve().zB(), wire.get("attach_b").get(2).doubleValue(), 0.0);
    assertEquals(scene.trees().size(), m.get("trees").size());
    assertEquals(scene.buildings().size(), m.get("buildings").size());
    JsonNode counts = m.get("point_counts");
    assertEquals(files.pointCount(), counts.get("total").longValue());
    long byKind = 0;
    for (JsonNode v : counts.get("by_kind")) {
      byKind += v.longValue();
    }
    assertEquals(files.pointCount(), byKind);
  }

  @Test
  void filesAreCompleteAndRepeatable() throws IOException {
    DemoCorridor.write(dir.resolve("a"), OPTIONS);
    DemoCorridor.write(dir.resolve("b"), OPTIONS);
    for (String name : List.of(DemoCorridor.SURVEY, DemoCorridor.STRUCTURES,
        DemoCorridor.LINE_SPEC, DemoCorridor.TRUTH)) {
      assertArrayEquals(Files.readAllBytes(dir.resolve("a").resolve(name)),
          Files.readAllBytes(dir.resolve("b").resolve(name)), name);
    }
    try (Stream<Path> listed = Files.list(dir.resolve("a"))) {
      assertEquals(4, listed.count(), "no temporary files left");
    }
  }

  @Test
  void aFileInPlaceOfTheFolderIsAnInputError() throws IOException {
    Path file = Files.writeString(dir.resolve("taken"), "x");
    InputException e = assertThrows(InputException.class,
        () -> DemoCorridor.write(file, OPTIONS));
    assertEquals(file.toString(), e.file());
  }
}
