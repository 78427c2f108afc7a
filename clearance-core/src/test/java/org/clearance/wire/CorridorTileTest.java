package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.line.StructureReader;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;
import org.clearance.survey.SurveyTestFiles;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The finder on the real open corridor tile shared/data/open/corridor_12AN2_20_thinned.las
 * (Dutch AHN4 lidar, shared/data/README.md): with its class-14 labels, and again with every
 * class but ground reset to 1. Structures and line specification in
 * src/test/resources/corridor-12AN2 (two of the three structures assumed, see the file).
 */
class CorridorTileTest {
  private static final Path DIR = Paths.get("src/test/resources/corridor-12AN2");
  /** The brief's limit on the RMS residual of every conductor found in the tile, m. */
  private static final double MAX_RMS = 0.10;

  private static Survey survey;
  private static GroundModel ground;
  private static LineSpec spec;

  @BeforeAll
  static void open() {
    survey = Survey.open(List.of(SurveyTestFiles.open("corridor_12AN2_20_thinned.las")),
        UnitsChoice.of(LinearUnit.METRE));
    ground = GroundModelBuilder.build(survey, GroundOptions.defaults(), 1);
    spec = LineSpecReader.read(DIR.resolve("line.yaml"), ConductorLibrary.builtin());
  }

  private static List<Structure> structures() {
    return new ArrayList<>(StructureReader.read(DIR.resolve("structures.csv"),
        survey.units()));
  }

  /** The survey, or the survey with every class but ground (2) reset to unclassified (1). */
  private static PointSource source(boolean reset) {
    PointSource plain = PointSource.of(survey, 1);
    if (!reset) {
      return plain;
    }
    return consumers -> plain.stream(() -> {
      Consumer<PointChunk> c = consumers.get();
      return chunk -> {
        for (int i = 0; i < chunk.size(); i++) {
          if (chunk.classification()[i] != 2) {
            chunk.classification()[i] = 1;
          }
        }
        c.accept(chunk);
      };
    });
  }

  private static WireResult find(List<Structure> structures, boolean reset) {
    HeightModel h = ground::heightAboveGround;
    return new WireFinder(WireFinderOptions.defaults(1)).find(source(reset),
        SpanLayout.build(structures, List.of(spec)), h);
  }

  private static final java.util.Map<Boolean, WireResult> RESULTS = new java.util.HashMap<>();

  private static synchronized WireResult result(boolean reset) {
    return RESULTS.computeIfAbsent(reset, r -> find(structures(), r));
  }

  @ParameterizedTest(name = "classes reset: {0}")
  @ValueSource(booleans = {false, true})
  void everyConductorInTheCoveredSpanIsFoundAndFitted(boolean reset) {
    WireResult r = result(reset);
    assertTrue(r.structureChanges().isEmpty(), r.structureChanges().toString());
    SpanWires north = r.span("OV380/OV-12-OV-13").orElseThrow();
    assertEquals(WireStatus.FITTED, north.status(), north.reason().orElse(""));
    assertEquals(!reset, north.labelled());
    // six twin-bundled phases and two earth wires: 12 sub-conductors and 2 single wires
    List<String> expected = List.of("L1.1", "L1.2", "L2.1", "L2.2", "L3.1", "L3.2", "LE",
        "R1.1", "R1.2", "R2.1", "R2.2", "R3.1", "R3.2", "RE");
    assertEquals(expected, north.conductors().stream().map(FittedConductor::name).toList());
    for (FittedConductor c : north.conductors()) {
      assertTrue(c.isFitted(), c.name() + ": " + c.reason());
      assertTrue(c.quality().rmsM() <= MAX_RMS, c.name() + " rms " + c.quality().rmsM());
      // the wires leave the tile about 314 m along the 352 m span: coverage 60-90 %
      assertTrue(c.quality().coveragePct() > 60, c.name());
    }
    SpanWires south = r.span("OV380/OV-11-OV-12").orElseThrow();
    assertEquals(WireStatus.NOT_ASSESSED, south.status());
    assertTrue(south.reason().orElseThrow().contains("% of the span (at least 30 % needed)"),
        south.reason().get());
    assertTrue(south.conductors().stream().noneMatch(FittedConductor::isFitted));
  }

  /**
   * Independent reference: catenaries fitted with scipy least_squares (soft L1 loss, vertical
   * residuals) to the class-14 points of each bundle or earth wire, read with numpy, stations
   * along azimuth 20.95 degrees from OV-12 (the script is in docs/wire-finder.md): vertex
   * elevation (m), catenary constant (m), sag at mid-span between stations 0 and 352 m (m).
   * A bundle's sub-conductors each match their bundle's curve to 1.5 % in c, 5 cm in vertex
   * elevation and 7 cm in sag (the twins of R3 differ by 9 cm in sag between themselves).
   */
  @ParameterizedTest(name = "{0} reset {4}")
  @CsvSource({
    "L1, 16.33, 1713, 9.05, false", "L2, 22.88, 1726, 8.98, false",
    "L3, 29.21, 1698, 9.13, false", "LE, 37.30, 2020, 7.67, false",
    "R1, 16.32, 1705, 9.09, false", "R2, 22.80, 1704, 9.10, false",
    "R3, 29.01, 1657, 9.35, false", "RE, 36.49, 1821, 8.51, false",
    "L1, 16.33, 1713, 9.05, true", "L2, 22.88, 1726, 8.98, true",
    "L3, 29.21, 1698, 9.13, true", "LE, 37.30, 2020, 7.67, true",
    "R1, 16.32, 1705, 9.09, true", "R2, 22.80, 1704, 9.10, true",
    "R3, 29.01, 1657, 9.35, true", "RE, 36.49, 1821, 8.51, true"
  })
  void curvesMatchAnIndependentFit(String position, double vertexZ, double c, double sag,
      boolean reset) {
    SpanWires north = result(reset).span("OV380/OV-12-OV-13").orElseThrow();
    List<FittedConductor> parts = north.conductors().stream()
        .filter(f -> f.position().orElse("").equals(position)).toList();
    assertEquals(position.endsWith("E") ? 1 : 2, parts.size(), position);
    for (FittedConductor f : parts) {
      ConductorCurve cc = f.curve().orElseThrow();
      assertEquals(vertexZ, cc.curve().z0(), 0.05, f.name());
      assertEquals(c, cc.curve().c(), 0.015 * c, f.name());
      assertEquals(sag, cc.midSpanSag(), 0.07, f.name());
    }
  }

  /** shared/data/README.md: "the conductors sag ... to about 12 m at mid-span" (approximate). */
  @Test
  void lowestPhasesHangAboutTwelveMetresAboveGround() {
    for (FittedConductor f : result(false).span("OV380/OV-12-OV-13").orElseThrow()
        .conductors()) {
      if (f.name().startsWith("L1") || f.name().startsWith("R1")) {
        Catenary k = f.curve().orElseThrow().curve();
        ConductorCurve cc = f.curve().get();
        double low = k.z0() - ground.groundZ(cc.x(k.s0()), cc.y(k.s0()));
        assertEquals(12, low, 1.5, f.name());
      }
    }
  }

  @ParameterizedTest(name = "classes reset: {0}")
  @ValueSource(booleans = {false, true})
  void offsetTowerIsMovedBackToItsPoints(boolean reset) {
    List<Structure> s = structures();
    Structure t = s.get(1);
    s.set(1, new Structure(t.id(), t.lineId(), t.sequence(), t.type(), t.x() + 12, t.y() - 12,
        t.groundZ(), t.attachZ(), t.sourceFile(), t.sourceLine()));
    WireResult r = find(s, reset);
    assertEquals(1, r.structureChanges().size(), r.structureChanges().toString());
    StructureChange c = r.structureChanges().get(0);
    assertEquals("OV-12", c.structureId());
    assertEquals(StructureChange.Kind.MOVED, c.kind());
    // back at the class-15 centre the structures file gives (229911.676, 569995.314), within
    // 0.01 m from the same points and within the 3 m tolerance from a column of unlabelled ones
    double tol = reset ? 3.0 : 0.01;
    assertEquals(229911.676, c.toX(), tol);
    assertEquals(569995.314, c.toY(), tol);
    assertEquals(WireStatus.FITTED, r.span("OV380/OV-12-OV-13").orElseThrow().status());
  }

  @Test
  void missingTowerIsAddedFromClass15Points() {
    List<Structure> s = structures();
    s.remove(1);
    WireResult r = find(s, false);
    assertEquals(1, r.structureChanges().size());
    StructureChange c = r.structureChanges().get(0);
    assertEquals(StructureChange.Kind.ADDED, c.kind());
    assertEquals("found1", c.structureId());
    assertEquals(229911.676, c.toX(), 0.01);
    assertEquals(569995.314, c.toY(), 0.01);
    SpanWires north = r.span("OV380/found1-OV-13").orElseThrow();
    assertEquals(WireStatus.FITTED, north.status(), north.reason().orElse(""));
    assertFalse(r.span("OV380/OV-11-OV-13").isPresent());
  }
}
