package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.clearance.line.ConductorType;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The default demo's truth is self-consistent and holds the cases the scenario promises. */
class TruthConsistencyTest {
  /** Pure geometry tolerance, m (STYLE.md: 1e-9 m for pure geometry). */
  private static final double GEOMETRY_TOL = 1e-9;

  private final DemoScene scene = Scenes.defaults();

  /** The attachment recomputed from the structure record and the tower description. */
  private static double[] attachment(DemoStructure t, DemoPosition p, double ux, double uy,
      boolean ahead) {
    // The demo's tower (DemoPosition, TowerGeometry javadoc): offsets scaled by 1/cos(defl/2)
    // along the across vector; shield wires at the peak; suspension phases one insulator below
    // the arm; dead-end phases at arm height one 3.0 m strain insulator out along the span.
    double off = p.offsetM() / Math.cos(0.5 * t.deflectionRad());
    double x = t.x() - off * t.alongY();
    double y = t.y() + off * t.alongX();
    if (p.role() == DemoPosition.Role.SHIELD) {
      return new double[] {x, y, t.groundZ() + t.armHeightM() + 7.0};
    }
    if (t.type() == DemoStructure.Type.SUSPENSION) {
      return new double[] {x, y, t.groundZ() + t.armHeightM() - p.insulatorLengthM()};
    }
    double sign = ahead ? 1 : -1;
    return new double[] {x + sign * 3.0 * ux, y + sign * 3.0 * uy, t.groundZ() + t.armHeightM()};
  }

  @Test
  void everyCurvePassesThroughItsAttachments() {
    List<DemoStructure> st = scene.structures();
    for (DemoSpan sp : scene.spans()) {
      DemoStructure a = st.get(sp.from());
      DemoStructure b = st.get(sp.to());
      double ux = (b.x() - a.x()) / sp.lengthM();
      double uy = (b.y() - a.y()) / sp.lengthM();
      for (int k = 0; k < sp.wires().size(); k++) {
        ConductorCurve c = sp.wires().get(k).curve();
        DemoPosition p = scene.positions().get(k);
        double[] pa = attachment(a, p, ux, uy, true);
        double[] pb = attachment(b, p, ux, uy, false);
        double len = c.length();
        assertEquals(pa[0], c.x(0), GEOMETRY_TOL);
        assertEquals(pa[1], c.y(0), GEOMETRY_TOL);
        assertEquals(pa[2], c.z(0), GEOMETRY_TOL);
        assertEquals(pb[0], c.x(len), GEOMETRY_TOL);
        assertEquals(pb[1], c.y(len), GEOMETRY_TOL);
        assertEquals(pb[2], c.z(len), GEOMETRY_TOL);
      }
    }
  }

  @Test
  void midSpanSagsFollowFromTheCatenaryConstantAndSpan() {
    // check-values.md section 2: level sag D = C (cosh(S/2C) - 1). For supports v apart the
    // vertical sag at mid-span is that times cosh(t_m) with sinh(t_m) = v / (2 C sinh(S/2C))
    // (from the vertex formula of methods.md 2.5) [computed]. Reference cases [computed]:
    // C = 1753.812 m, S = 300 m: level 6.4185 m; far support 30 m higher 6.4504 m.
    assertEquals(6.4185, sag(300, 0, 1753.812), 5e-5);
    assertEquals(6.4504, sag(300, 30, 1753.812), 5e-5);
    assertEquals(6.4185, Catenary.through(0, 0, 300, 0, 1753.812).midSpanSag(0, 300), 5e-5);
    assertEquals(6.4504, Catenary.through(0, 0, 300, 30, 1753.812).midSpanSag(0, 300), 5e-5);
    for (DemoSpan sp : scene.spans()) {
      for (DemoWire w : sp.wires()) {
        ConductorCurve c = w.curve();
        assertEquals(sag(c.length(), c.zB() - c.zA(), w.catenaryConstantM()), w.midSpanSagM(),
            1e-7);
        // c = H / w (check-values.md section 2).
        assertEquals(w.horizontalTensionN() / w.weightPerLengthNPerM(), w.catenaryConstantM(),
            1e-9 * w.catenaryConstantM());
      }
    }
  }

  private static double sag(double span, double v, double c) {
    double half = span / (2 * c);
    double sinhTm = v / (2 * c * Math.sinh(half));
    return c * (Math.cosh(half) - 1) * Math.sqrt(1 + sinhTm * sinhTm);
  }

  @Test
  void upliftCaseOfTheReferenceTableIsReproduced() {
    // check-values.md section 2 inclined case [computed]: vertex 24.878 m outside the span
    // beyond the lower support.
    Catenary k = Catenary.through(0, 0, 300, 30, 1753.812);
    assertEquals(-24.878, k.s0(), 5e-4);
  }

  @Test
  void sectionsUseTheirRulingSpanAndTensionBand() {
    List<DemoStructure> st = scene.structures();
    for (TensionSection s : scene.sections()) {
      double cubes = 0;
      double sum = 0;
      for (int i = s.firstStructure(); i < s.lastStructure(); i++) {
        double len = Math.hypot(st.get(i + 1).x() - st.get(i).x(),
            st.get(i + 1).y() - st.get(i).y());
        cubes += len * len * len;
        sum += len;
      }
      // Ruling span sqrt(sum S^3 / sum S) (check-values.md section 2).
      assertEquals(Math.sqrt(cubes / sum), s.rulingSpanM(), 1e-9);
      assertEquals(DemoStructure.Type.DEAD_END, st.get(s.firstStructure()).type());
      assertEquals(DemoStructure.Type.DEAD_END, st.get(s.lastStructure()).type());
      // Chosen at 15 degC as 18-25 % of the rated strength (the brief's band).
      double fraction = s.phaseTensionReferenceN() / DemoPosition.DRAKE.ratedStrength();
      assertTrue(fraction >= 0.18 && fraction <= 0.25, "tension fraction " + fraction);
      // The survey tension conserves the parabolic state function (methods.md 3.2).
      double t = scene.surveyTemperatureC();
      assertEquals(state(DemoPosition.DRAKE, s.rulingSpanM(), s.phaseTensionReferenceN(), 15),
          state(DemoPosition.DRAKE, s.rulingSpanM(), s.phaseTensionN(), t), 1e-12);
      assertEquals(state(DemoPosition.PARTRIDGE, s.rulingSpanM(), s.shieldTensionReferenceN(), 15),
          state(DemoPosition.PARTRIDGE, s.rulingSpanM(), s.shieldTensionN(), t), 1e-12);
    }
    for (DemoSpan sp : scene.spans()) {
      TensionSection s = scene.sections().get(sp.section());
      assertTrue(sp.from() >= s.firstStructure() && sp.to() <= s.lastStructure());
      for (DemoWire w : sp.wires()) {
        assertEquals(s.tension(w.role()), w.horizontalTensionN(), 0.0);
      }
    }
  }

  private static double state(ConductorType type, double span, double h, double t) {
    double w = type.massPerLength() * 9.80665;
    return w * w * span * span / (24 * h * h) - h / (type.finalModulus() * type.area())
        - type.thermalExpansion() * t;
  }

  @ParameterizedTest
  @CsvSource({"230017, 12", "7, 8", "12, 15"})
  void theScenarioHoldsItsPromisedCases(long seed, int spans) {
    DemoScene scene = seed == DemoOptions.DEFAULT_SEED && spans == DemoOptions.DEFAULT_SPANS
        ? this.scene : DemoScene.create(DemoOptions.defaults().withSeed(seed)
            .withSpanCount(spans));
    assertTrue(scene.spans().size() == spans && scene.sections().size() >= 2
        && scene.sections().size() <= 3, "2-3 sections");
    for (DemoSpan sp : scene.spans()) {
      assertTrue(sp.lengthM() >= 250 && sp.lengthM() <= 450, "span length " + sp.lengthM());
    }
    DemoSpan ravine = scene.spans().get(scene.ravineSpan());
    assertTrue(ravine.wires().stream().allMatch(DemoWire::uplift), "ravine span uplift");
    double rise = scene.structures().get(ravine.to()).groundZ()
        - scene.structures().get(ravine.from()).groundZ();
    assertTrue(rise > 35, "ravine rise " + rise);
    long lowCoverage = scene.spans().stream().flatMap(s -> s.wires().stream())
        .filter(w -> w.coverage() < 0.3).count();
    assertTrue(lowCoverage >= 2, "low coverage wires " + lowCoverage);
    assertTrue(scene.trees().stream().anyMatch(t -> t.apexDistanceM() < 3), "tree within 3 m");
    assertTrue(scene.trees().stream().anyMatch(t -> t.role() == DemoTree.Role.NEAR_MISS));
    long fallIn = scene.trees().stream().filter(t -> t.role() == DemoTree.Role.FALL_IN
        && t.fallInCandidate()
        && scene.corridor().segmentDistance(t.span(), t.x(), t.y()) > Corridor.ROW_HALF_WIDTH_M)
        .count();
    assertTrue(fallIn >= 2, "fall-in candidates outside the right-of-way " + fallIn);
    assertTrue(scene.buildings().size() >= 3);
    assertTrue(scene.birds().stream().anyMatch(DemoBird::perched));
    assertTrue(scene.strayBuilding() >= 0 && scene.strayTree() >= 0);
    for (DemoTree t : scene.trees()) {
      if (t.role() == DemoTree.Role.GROW_IN) {
        assertTrue(t.apexDistanceM() <= 5.0 + 1e-9, "grow-in apex " + t.apexDistanceM());
      }
      if (t.role() == DemoTree.Role.FOREST) {
        assertTrue(scene.corridor().segmentDistance(t.span(), t.x(), t.y())
            >= Corridor.ROW_HALF_WIDTH_M, "forest tree in the right-of-way");
      }
    }
  }

  @Test
  void phasesClearTheGroundAtTheSurveyState() {
    // The generator raises towers until the lowest phase is 9 m above ground (ground clearance
    // of 230 kV lines is about 7-8 m: common practice, no source); planted trees are the only
    // vegetation meant to come close.
    for (DemoSpan sp : scene.spans()) {
      for (DemoWire w : sp.wires()) {
        ConductorCurve c = w.curve();
        for (double s = 0; s <= c.length(); s += 1.0) {
          double clearance = c.z(s) - scene.groundZ(c.x(s), c.y(s));
          assertTrue(clearance >= LineBuilder.MIN_GROUND_CLEARANCE_M, sp.id() + " "
              + w.position() + " at " + s + ": " + clearance);
        }
      }
    }
  }

  @Test
  void wirePointsLieWithinNoiseOfTheirCurves() {
    Scenes.Census census = Scenes.defaultCensus();
    int checked = 0;
    for (Map.Entry<Integer, double[]> e : census.wires.entrySet()) {
      DemoWire w = scene.spans().get(e.getKey() / 16).wires().get(e.getKey() % 16);
      double[] s = e.getValue();
      // Isotropic noise sigma per axis: the distance across the curve has two components, so
      // its RMS is sigma sqrt(2); beyond 6 sigma practically never happens.
      assertTrue(s[2] < 6 * w.noiseSigmaM(), "max distance " + s[2]);
      if (s[0] >= 300) {
        double rms = Math.sqrt(s[1] / s[0]);
        assertEquals(1.0, rms / (w.noiseSigmaM() * Math.sqrt(2)), 0.12);
        checked++;
      }
    }
    assertTrue(checked > 20, "wires with enough points " + checked);
    assertEquals(0, census.pointsInGaps);
  }

  @Test
  void coverageSeenInThePointsMatchesTheTruth() {
    Scenes.Census census = Scenes.defaultCensus();
    for (DemoSpan sp : scene.spans()) {
      for (int k = 0; k < sp.wires().size(); k++) {
        DemoWire w = sp.wires().get(k);
        boolean[] bins = census.bins.get(sp.index() * 16 + k);
        int filled = 0;
        for (boolean b : bins) {
          filled += b ? 1 : 0;
        }
        double seen = 5.0 * filled / w.length();
        // A 5 m bin touching a gap edge may hold points: allow two bins per gap.
        double slack = 10.0 * (w.gaps().size() + 1) / w.length();
        assertTrue(seen <= w.coverage() + slack, w.position() + " seen " + seen);
        if (w.coverage() < 0.3) {
          assertTrue(seen < 0.3 + slack, "low coverage seen " + seen);
        }
      }
    }
  }

  @Test
  void pointsIncludeEveryKindAndATreeInsideThreeMetres() {
    Scenes.Census census = Scenes.defaultCensus();
    for (TruthId.Kind k : TruthId.Kind.values()) {
      if (k == TruthId.Kind.MAN_MADE) {
        // the crane, fence and shed are opt-in (DemoOptions.withManMade): none in the default scene
        assertEquals(0, census.byKind[k.ordinal()], "man-made points in the default scene");
        continue;
      }
      assertTrue(census.byKind[k.ordinal()] > 0, "no points of " + k);
    }
    assertTrue(census.closestTreePoint < 3.0, "closest tree point " + census.closestTreePoint);
    assertTrue(census.total > 2_000_000 && census.total < 4_000_000, "points " + census.total);
  }
}
