package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorPosition;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;
import org.clearance.line.Structure;
import org.clearance.line.StructureType;
import org.clearance.survey.PointChunk;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.clearance.wire.SetAside;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ClearanceEngineTest {

  /** Pure geometry: the engine must agree with the kernel to float precision. */
  private static final double GEOMETRY_TOL = 1e-9;

  // A level 300 m span along +x, attachments at 30 m, c = 1753.812 m: the check-values.md
  // section 2 level case (sag 6.4185 m) [computed there].
  private static final double C = 1753.812;
  private static final double L = 300.0;
  private static final double Z_ATTACH = 30.0;

  @TempDir Path dir;

  private static Structure structure(String id, double x, double y) {
    return new Structure(id, "", 0, StructureType.SUSPENSION, x, y, 0.0, Map.of(), "test", 1);
  }

  private static ConductorCurve conductor(double offset) {
    SpanFrame plan = SpanFrame.between(0, offset, L, offset);
    return new ConductorCurve(plan, Catenary.through(0, Z_ATTACH, L, Z_ATTACH, C));
  }

  private static SpanModel span(ConditionSet set, List<ConductorModel> conductors) {
    Span span = new Span("T1-T2", "L1", structure("T1", 0, 0), structure("T2", L, 0),
        SpanFrame.between(0, 0, L, 0), L, 0);
    return new SpanModel(span, new SpanContext("T1-T2", "L1", 230, 0, L), conductors);
  }

  private static ConductorModel hangingOnly(String name, ConductorCurve curve, int conditions) {
    List<Optional<ConductorState>> states = new ArrayList<>();
    List<Optional<String>> failures = new ArrayList<>();
    for (int k = 0; k < conditions; k++) {
      states.add(Optional.of(ConductorState.hanging(curve)));
      failures.add(Optional.empty());
    }
    return new ConductorModel(name, "phase", states, failures);
  }

  private static ClearanceEngine.ChunkSource points(double[][] xyzc) {
    return (threads, consumers) -> {
      Consumer<PointChunk> c = consumers.get();
      PointChunk chunk = new PointChunk(xyzc.length);
      chunk.reset(0, 0);
      for (double[] p : xyzc) {
        chunk.add(p[0], p[1], p[2], (int) p[3]);
      }
      c.accept(chunk);
    };
  }

  private static VegetationSelector classified() {
    long[] counts = new long[256];
    counts[5] = 1;
    return VegetationSelector.forSurvey(counts, null);
  }

  @Test
  void pointBelowMidSpanIsMeasuredExactly() throws Exception {
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    ConductorCurve a = conductor(0);
    SpanModel model = span(set, List.of(hangingOnly("A", a, 1)));
    ClearanceEngine engine = new ClearanceEngine(List.of(model), set, (x, y, z) -> z,
        classified(), ClearanceEngine.Options.defaults(1));
    double zMid = a.z(L / 2); // 30 - 6.4185 m
    // the class-2 point lies 1.5 m above the ground (height model: z), where a ground label is
    // believed
    double[][] pts = {{150, 0, zMid - 4.0, 5}, {150, 0, 1.5, 2}, {10, 40, 5, 5}};
    Path file = dir.resolve(NearPointFile.FILE_NAME);
    List<SpanClearance> result;
    try (NearPointWriter w = new NearPointWriter(file, engine.nearPointLayout())) {
      result = engine.measure(points(pts), w).spans();
    }
    ConditionMinimum m = result.get(0).minima().get(0);
    // The lowest point of a level catenary is at mid-span, so a point straight below it is at
    // exactly the vertical gap (geometry, no source needed).
    assertEquals(4.0, m.distance(), GEOMETRY_TOL);
    assertEquals(-4.0, m.vertical(), GEOMETRY_TOL);
    assertEquals(0.0, m.horizontal(), GEOMETRY_TOL);
    assertEquals("A", m.conductor());
    assertEquals(1, result.get(0).pointsMeasured(), "ground class 2 point is not vegetation");
    List<PointClearance> back = new ArrayList<>();
    NearPointReader.forEach(file, back::add);
    assertEquals(1, back.size());
    assertEquals(4.0, back.get(0).distances().get(0).distance(), 1e-5, "float32 storage");
    assertEquals(150.0, back.get(0).distances().get(0).station(), 1e-3);
  }

  @Test
  void nearestOfTwoConductorsAndKeepRadius() throws Exception {
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    ConductorCurve a = conductor(-5);
    ConductorCurve b = conductor(5);
    SpanModel model = span(set, List.of(hangingOnly("A", a, 1), hangingOnly("B", b, 1)));
    ClearanceEngine engine = new ClearanceEngine(List.of(model), set, (x, y, z) -> 1.0,
        classified(), new ClearanceEngine.Options(3.0, 1, 8.0, 50.0));
    double[][] pts = {{100, 7, a.z(100), 5}, {100, 0, a.z(100) - 20, 5}};
    Path file = dir.resolve(NearPointFile.FILE_NAME);
    List<SpanClearance> result;
    try (NearPointWriter w = new NearPointWriter(file, engine.nearPointLayout())) {
      result = engine.measure(points(pts), w).spans();
    }
    ConditionMinimum m = result.get(0).minima().get(0);
    assertEquals("B", m.conductor());
    assertEquals(2.0, m.distance(), GEOMETRY_TOL);
    assertEquals(1, result.get(0).pointsKept(), "only the point within 3 m is stored");
  }

  @Test
  void swingRangeBringsTheConductorToASidePoint() {
    // A swing of 30 degrees moves the mid-span of a 6.4185 m sag sideways by sag sin 30
    // (check-values.md section 2 swing geometry: 5 m at 30 deg -> 2.5 m) [computed].
    ConditionSet set = new ConditionSet(List.of("survey", "wind"), List.of("survey", "blowout"));
    ConductorCurve a = conductor(0);
    double phi = Math.toRadians(30);
    ConductorModel m = new ConductorModel("A", "phase",
        List.of(Optional.of(ConductorState.hanging(a)),
            Optional.of(new ConductorState(a, -phi, phi))),
        List.of(Optional.empty(), Optional.empty()));
    ClearanceEngine engine = new ClearanceEngine(List.of(span(set, List.of(m))), set,
        (x, y, z) -> 1.0, classified(), ClearanceEngine.Options.defaults(1));
    double sag = a.midSpanSag();
    double sideX = 150;
    double sideY = sag * Math.sin(phi) + 1.0;
    double sideZ = Z_ATTACH - sag * Math.cos(phi);
    List<SpanClearance> result = engine.measure(points(new double[][] {{sideX, sideY, sideZ, 4}}),
        null).spans();
    double survey = result.get(0).minima().get(0).distance();
    double swung = result.get(0).minima().get(1).distance();
    assertEquals(1.0, swung, 1e-6);
    assertTrue(survey > swung + 1.0, "hanging conductor is farther: " + survey);
    assertEquals(survey, new CatenaryDistance(a).distance(sideX, sideY, sideZ), GEOMETRY_TOL);
  }

  @Test
  void unclassifiedSurveySetsAsideOnlyPointsShownToBeWireStructureOrAirborne() {
    // Regression, issue 9 item 1: every unclassified point within 0.5 m of a conductor was taken
    // as the conductor, so vegetation touching a wire was dropped and the span read clear. Now
    // only the points the wire finder's evidence names are set aside.
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    ConductorCurve a = conductor(0);
    ClearanceEngine engine = new ClearanceEngine(List.of(span(set, List.of(hangingOnly("A", a,
        1)))), set, (x, y, z) -> z, VegetationSelector.forSurvey(new long[256], null),
        ClearanceEngine.Options.defaults(1));
    double[][] pts = {
      {150, 0.0, a.z(150), 1}, // on the wire, named by the evidence
      {2, 1, 25, 1}, // on the tower
      {150, 3, a.z(150) - 3, 1}, // a tree top
      {120, 0.0, a.z(120) + 0.3, 1}, // a bird, named by the evidence
      {180, 0.0, a.z(180) - 0.1, 1}, // a branch touching the wire: not named, so measured
    };
    SetAside aside = SetAside.of(new long[] {SetAside.key(150, 0.0, a.z(150))},
        new long[] {SetAside.key(120, 0.0, a.z(120) + 0.3)});
    SpanClearance r = engine.measure(points(pts), null, aside).spans().get(0);
    assertEquals(2, r.pointsMeasured());
    assertEquals(1, r.excludedAsConductor());
    assertEquals(1, r.excludedAsStructure());
    assertEquals(1, r.excludedAsAirborne());
    assertEquals(0.1, r.minima().get(0).distance(), 2e-3);
    // Without evidence nothing near the wire is dropped.
    SpanClearance none = engine.measure(points(pts), null).spans().get(0);
    assertEquals(4, none.pointsMeasured());
    assertEquals(0.0, none.minima().get(0).distance(), 1e-3);
  }

  @Test
  void touchedWirePointsAndDistrustedLabelsAreMeasuredAndCounted() {
    // Issue 9: a wire point touched by vegetation is measured (it may set the minimum) and
    // counted; a crown labelled wire (14) the labelling step does not believe is measured and
    // counted as a distrusted label; a class-14 point it believes is not measured.
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    ConductorCurve a = conductor(0);
    long[] counts = new long[256];
    counts[5] = 1;
    counts[14] = 3;
    ClearanceEngine engine = new ClearanceEngine(List.of(span(set, List.of(hangingOnly("A", a,
        1)))), set, (x, y, z) -> z, VegetationSelector.forSurvey(counts, null),
        ClearanceEngine.Options.defaults(1));
    double[][] pts = {
      {150, 0.0, a.z(150) - 0.02, 1}, // on the wire, touched by the branch below
      {150, 0.1, a.z(150) - 0.2, 5}, // the branch: 0.22 m from the wire
      {120, 2, a.z(120) - 2, 14}, // a crown labelled wire: 2.83 m from it
      {100, 0.0, a.z(100), 14}, // the wire itself, labelled: never measured
    };
    SetAside aside = SetAside.of(new long[0], new long[0], new long[0],
        new long[] {SetAside.key(150, 0.0, a.z(150) - 0.02)});
    aside.addDistrustedLabel(SetAside.key(120, 2, a.z(120) - 2));
    SpanClearance r = engine.measure(points(pts), null, aside).spans().get(0);
    assertEquals(3, r.pointsMeasured());
    assertEquals(1, r.wireTouched());
    assertEquals(1, r.labelsDistrusted());
    assertEquals(0.02, r.minima().get(0).distance(), 2e-3);
    assertEquals(List.of("survey"), r.minimumOnWire());
  }

  @Test
  void deadEndHardwareOutToTheFittedConductorEndIsTheStructure() {
    // Regression, issue 9 (demo seed 29, ground-only and unlabelled): at a dead-end on a 31
    // degree turn the outer phase's strain insulator and jumper end 5.2 m along the line from
    // the structure centre (3 m insulator + 8 m x tan(15.6 deg) along the bisector arm), past
    // the fixed 5 m cross-arm reach, so an insulator point and a jumper point became priority-1
    // zone sites. The hardware now reaches out to the fitted conductor end (+0.5 m).
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    double end = 5.2;
    double offset = 8.0;
    SpanFrame plan = SpanFrame.between(end, offset, L - end, offset);
    ConductorCurve a = new ConductorCurve(plan, Catenary.through(0, Z_ATTACH, plan.length(),
        Z_ATTACH, C));
    ClearanceEngine engine = new ClearanceEngine(List.of(span(set, List.of(hangingOnly("A", a,
        1)))), set, (x, y, z) -> z, VegetationSelector.forSurvey(new long[256], null),
        ClearanceEngine.Options.defaults(1));
    double[][] pts = {
      {5.15, offset, Z_ATTACH - 0.02, 1}, // the insulator's clamp end, 9.5 m from the centre
      {L - 5.1, offset + 0.1, Z_ATTACH - 0.05, 1}, // the jumper end at the far dead-end
      {7.0, offset + 1.5, Z_ATTACH - 1.0, 1}, // a branch 1.8 m beyond the conductor end
    };
    SpanClearance r = engine.measure(points(pts), null).spans().get(0);
    assertEquals(2, r.excludedAsStructure());
    assertEquals(1, r.pointsMeasured());
  }

  @Test
  void aPoleSetsAsideItsColumnAboveItsFootAndNothingBesideIt() {
    // Regression, issue 9 (generated feeder, seed 44, vertical framing, ten spans, ground-only:
    // span P210-P211 read 8.789 m against a true 8.692 m): the grass nearest the conductor stood
    // 0.47 m and 0.81 m from the pole centre, 0.44 and 0.39 m high, inside the 1 m a pole line
    // then set aside. Now only the pole's column (0.5 m) above its foot (0.5 m) is the pole.
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    // a feeder conductor attached 9 m above the ground (the height model: z)
    ConductorCurve a = new ConductorCurve(SpanFrame.between(0, 0, L, 0),
        Catenary.through(0, 9.0, L, 9.0, C));
    SpanModel span = span(set, List.of(hangingOnly("A", a, 1)));
    SpanModel pole = new SpanModel(span.span(), span.context(), span.conductors(),
        ClearanceEngine.POLE_COLUMN_M);
    ClearanceEngine engine = new ClearanceEngine(List.of(pole), set, (x, y, z) -> z,
        VegetationSelector.forSurvey(new long[256], null), ClearanceEngine.Options.defaults(1));
    double[][] pts = {
      {0.15, 0.05, 4.0, 1}, // the pole's side, 4 m up (below its arm's box): set aside
      {-0.1, -0.15, 2.0, 1}, // the pole's side on the far side of the centre: set aside
      {0.47, 0.0, 0.44, 1}, // grass beside the pole, inside the old 1 m
      {0.3, 0.25, 0.39, 1}, // grass at the pole's foot, in its column: measured
      {0.0, 0.8, 3.0, 1}, // a shrub against the pole, 0.8 m from its centre
    };
    SpanClearance r = engine.measure(points(pts), null).spans().get(0);
    assertEquals(2, r.excludedAsStructure(), r.toString());
    assertEquals(3, r.pointsMeasured());
    // the nearest measured: the shrub (about 6.05 m; the pole's side 4 m up, 5 m from the wire,
    // is not vegetation); the exact distance from the kernel (geometry, no source needed)
    assertEquals(new CatenaryDistance(a).distance(0.0, 0.8, 3.0),
        r.minima().get(0).distance(), 1e-6);
  }

  @Test
  void vegetationInAClassNotReadIsCountedNearTheConductors() {
    // Regression, issue 10 item 3: 123 494 vegetation points delivered in class 20 (ignored
    // ground) gave "assessed and clear". Points of classes not read that may be vegetation
    // (ground-like classes standing above the ground, unknown classes) are counted per span.
    ConditionSet set = new ConditionSet(List.of("survey"), List.of("survey"));
    ConductorCurve a = conductor(0);
    ClearanceEngine engine = new ClearanceEngine(List.of(span(set, List.of(hangingOnly("A", a,
        1)))), set, (x, y, z) -> z, classified(), ClearanceEngine.Options.defaults(1));
    double[][] pts = {
      {150, 2, a.z(150) - 2, 20}, // a crown labelled ignored ground, 2.83 m from the wire
      {160, 4, a.z(160) - 5, 64}, // a user class
      {170, 0, 0.5, 20}, // class 20 on the ground: believed
      {180, 0, 1.8, 2}, // ground class on the ground: never counted
      {190, 1, a.z(190) - 3, 5}, // read as vegetation
      // issue 9: a ground label 4 m under the wire, far above the ground, is not believed and
      // the point is measured as unclassified (VegetationSelector.groundLabelDoubted)
      {200, 0, a.z(200) - 4, 2},
    };
    SpanClearance r = engine.measure(points(pts), null).spans().get(0);
    assertEquals(2, r.pointsMeasured());
    assertEquals(2, r.unread().count());
    assertEquals(Math.hypot(2, 2), r.unread().nearestM(), 2e-3);
    assertEquals(List.of(20, 64), r.unread().classes());
  }

  @Test
  void lowerBoundsNeverExceedTheDistance() {
    // The engine skips a conductor when a cheap bound says it cannot be nearer than what is
    // known; a bound above the true distance would lose findings. Checked against the exact
    // kernel on random points around a level, an inclined and a swinging conductor.
    ConditionSet set = new ConditionSet(List.of("survey", "steep", "wind"),
        List.of("survey", "hot", "blowout"));
    ConductorCurve level = conductor(0);
    SpanFrame plan = SpanFrame.between(0, 3, L, 4);
    ConductorCurve steep = new ConductorCurve(plan, Catenary.through(0, 10, plan.length(), 70,
        600));
    double phi = Math.toRadians(40);
    ConductorModel m = new ConductorModel("A", "phase",
        List.of(Optional.of(ConductorState.hanging(level)),
            Optional.of(ConductorState.hanging(steep)),
            Optional.of(new ConductorState(level, -phi, phi))),
        List.of(Optional.empty(), Optional.empty(), Optional.empty()));
    PreparedSpan p = new PreparedSpan(0, span(set, List.of(m)), 3, 15, 15);
    java.util.Random r = new java.util.Random(7);
    for (int i = 0; i < 20_000; i++) {
      double x = -30 + (L + 60) * r.nextDouble();
      double y = -40 + 80 * r.nextDouble();
      double z = -10 + 100 * r.nextDouble();
      for (int k = 0; k < 3; k++) {
        CatenaryDistance kernel = p.kernels[k][0];
        double exact = kernel.distance(x, y, z, kernel.closestSwingAngle(x, y, z,
            p.swingMin[k][0], p.swingMax[k][0]));
        assertTrue(p.lowerBound(k, 0, x, y, z) <= exact + 1e-9,
            "bound above the distance at " + x + ", " + y + ", " + z + " in condition " + k);
      }
    }
  }

  @Test
  void pointsBelowTheConductorFloorAreBeyondTheReachInEveryCondition() {
    // Issue 12: a point the one-comparison screen passes over must be farther than the reach
    // from the conductor in every condition and swing (else a stored point would be lost).
    // Exact kernel on random points under a level, an inclined (60 m rise) and a swinging one.
    ConditionSet set = new ConditionSet(List.of("survey", "steep", "wind"),
        List.of("survey", "hot", "blowout"));
    SpanFrame plan = SpanFrame.between(0, 3, L, 4);
    ConductorCurve steep = new ConductorCurve(plan, Catenary.through(0, 10, plan.length(), 70,
        600));
    double phi = Math.toRadians(40);
    ConductorModel m = new ConductorModel("A", "phase",
        List.of(Optional.of(ConductorState.hanging(conductor(0))),
            Optional.of(ConductorState.hanging(steep)),
            Optional.of(new ConductorState(conductor(0), -phi, phi))),
        List.of(Optional.empty(), Optional.empty(), Optional.empty()));
    double reach = 10;
    PreparedSpan p = new PreparedSpan(0, span(set, List.of(m)), 3, reach, reach);
    java.util.Random r = new java.util.Random(12);
    int screened = 0;
    for (int i = 0; i < 40_000; i++) {
      double x = -15 + (L + 30) * r.nextDouble();
      double y = -20 + 40 * r.nextDouble();
      double z = -5 + 60 * r.nextDouble();
      double s = p.frame.station(x, y);
      if (!p.belowFloor(s, z)) {
        continue;
      }
      screened++;
      for (int k = 0; k < 3; k++) {
        CatenaryDistance kernel = p.kernels[k][0];
        double exact = kernel.distance(x, y, z, kernel.closestSwingAngle(x, y, z,
            p.swingMin[k][0], p.swingMax[k][0]));
        assertTrue(exact > reach, "screened point within the reach at " + x + ", " + y + ", "
            + z + " in condition " + k + ": " + exact);
      }
    }
    // The screen must also do its job: the level span's lowest point is about 23.6 m up
    // (30 m - L^2 / 8C), so most points below 13 m pass it.
    assertTrue(screened > 5_000, "points screened: " + screened);
  }

  @Test
  void conditionSetSplitsWindOnlyWhenStringsAreGiven() {
    LineCondition hot = new LineCondition("hot", LineCondition.Kind.TEMPERATURE, 100, 10,
        Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    LineCondition wind = new LineCondition("blow", LineCondition.Kind.WIND, 15, 0, 0, 913, 300,
        Double.NaN, Double.NaN);
    ConductorType drake = ConductorLibrary.builtin().find("Drake").orElseThrow();
    ConductorPosition fixed = new ConductorPosition("A", ConductorPosition.Role.PHASE, 1, drake,
        0, 20, 1, Double.NaN, Double.NaN);
    ConductorPosition hung = new ConductorPosition("A", ConductorPosition.Role.PHASE, 1, drake,
        0, 20, 1, Double.NaN, 2.4);
    LineSpec plain = new LineSpec("L1", "", 230, 0, 15, List.of(fixed), List.of(hot, wind), "x");
    LineSpec strings = new LineSpec("L2", "", 230, 0, 15, List.of(hung), List.of(hot, wind),
        "y");
    assertEquals(List.of("survey", "hot", "blow"),
        ConditionModels.conditionSet(List.of(plain)).names());
    ConditionSet split = ConditionModels.conditionSet(List.of(strings));
    assertEquals(List.of("survey", "hot", "blow@left", "blow@right"), split.names());
    assertEquals(List.of("survey", "hot", "blowout", "blowout"), split.groups());
    assertEquals("blow", ConditionModels.baseName("blow@right"));
  }
}
