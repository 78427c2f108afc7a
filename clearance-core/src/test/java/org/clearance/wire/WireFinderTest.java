package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.clearance.line.ConductorPosition;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The finder end to end on synthetic corridors with known wires (SyntheticCorridor): every
 * conductor found, named and fitted in all three classification modes; stray labels on a roof
 * and a crown do not become conductors.
 */
class WireFinderTest {
  /** Sag tolerance, m: 3 cm noise over about 900 points fits the sag to about 1 cm; the
   * brief's accuracy target is 5 cm (common practice, no source). */
  private static final double SAG_TOL = 0.05;
  /** Attachment elevation tolerance, m: the brief's target. */
  private static final double ATTACH_TOL = 0.15;

  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void findsNamesAndFitsEveryConductor(SyntheticCorridor.Mode mode) {
    SyntheticCorridor c = SyntheticCorridor.standard(mode, 7);
    WireResult r = new WireFinder(Fixtures.options(false)).find(c, Fixtures.layout(c), c);
    assertEquals(3, r.spans().size());
    for (int k = 0; k < 3; k++) {
      SpanWires sw = r.spans().get(k);
      assertEquals(WireStatus.FITTED, sw.status(), sw.reason().orElse(""));
      assertEquals(5, sw.conductors().size(), names(sw));
      assertEquals(mode == SyntheticCorridor.Mode.LABELLED, sw.labelled());
      for (SyntheticCorridor.Position p : c.positions) {
        FittedConductor f = sw.conductor(p.name()).orElseThrow();
        assertTrue(f.isFitted(), f.name() + " " + f.reason());
        assertEquals(p.shield() ? ConductorPosition.Role.SHIELD : ConductorPosition.Role.PHASE,
            f.role());
        ConductorCurve truth = c.truth(k, p);
        ConductorCurve fit = f.curve().orElseThrow();
        assertEquals(truth.midSpanSag(), fit.midSpanSag(), SAG_TOL, f.name());
        assertEquals(truth.zA(), fit.zA(), ATTACH_TOL, f.name());
        assertEquals(truth.zB(), fit.zB(), ATTACH_TOL, f.name());
        // plan attachments: within 0.1 m of the truth (3 cm noise, hundreds of points)
        assertEquals(0, Math.hypot(truth.x(0) - fit.x(0), truth.y(0) - fit.y(0)), 0.1);
        assertTrue(f.quality().rmsM() < 0.06, f.name() + " rms " + f.quality().rmsM());
        assertTrue(f.quality().coveragePct() > 95, f.name());
        assertEquals(0, f.surveySwingRad(), Math.toRadians(1));
      }
    }
  }

  /** The span-level entry point gives, span by span, exactly what the whole-layout pass gives:
   * the same code runs per span, only the candidate collection is limited to one corridor. */
  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void oneSpanAtATimeEqualsTheWholeLayout(SyntheticCorridor.Mode mode) {
    SyntheticCorridor c = SyntheticCorridor.standard(mode, 7);
    WireFinder finder = new WireFinder(Fixtures.options(false));
    WireResult whole = finder.find(c, Fixtures.layout(c), c);
    java.util.List<WireFinder.SpanFind> finds = new java.util.ArrayList<>();
    SetAside wires = new SetAside();
    for (SpanWires expected : whole.spans()) {
      WireFinder.SpanFind found = finder.findSpan(c, Fixtures.layout(c), expected.span().id(),
          c);
      finds.add(found);
      for (long k : found.wireKeys()) {
        wires.addWire(k);
      }
      SpanWires one = found.wires();
      assertEquals(expected.status(), one.status());
      assertEquals(expected.reason(), one.reason());
      assertEquals(expected.conductors().size(), one.conductors().size());
      for (FittedConductor f : expected.conductors()) {
        FittedConductor g = one.conductor(f.name()).orElseThrow();
        assertEquals(f.curve(), g.curve(), f.name());
        assertEquals(f.quality(), g.quality(), f.name());
      }
    }
    // the points set aside, span by span with every span's wire points, are the whole pass's
    SetAside apart = new SetAside();
    finds.forEach(f -> f.setAside(wires, apart));
    assertEquals(sorted(whole.setAside().wireKeys()), sorted(apart.wireKeys()));
    assertEquals(sorted(whole.setAside().airborneKeys()), sorted(apart.airborneKeys()));
  }

  private static java.util.List<Long> sorted(long[] keys) {
    return java.util.Arrays.stream(keys).sorted().boxed().toList();
  }

  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void missingPositionIsNotAssessedAndBlocksTheSpan(SyntheticCorridor.Mode mode) {
    SyntheticCorridor c = SyntheticCorridor.standard(mode, 8);
    List<SyntheticCorridor.Position> spec = new java.util.ArrayList<>(c.positions);
    spec.add(new SyntheticCorridor.Position("D", false, -14, 20, 1500, 3, 1, 0));
    WireResult r = new WireFinder(Fixtures.options(false)).find(c, Fixtures.layout(c, spec), c);
    for (SpanWires sw : r.spans()) {
      FittedConductor d = sw.conductor("D").orElseThrow();
      assertEquals(WireStatus.NOT_ASSESSED, d.status());
      assertTrue(d.reason().orElseThrow().startsWith("no wire found near offset -14.0 m"),
          d.reason().get());
      assertEquals(WireStatus.NOT_ASSESSED, sw.status());
      assertTrue(sw.reason().orElseThrow().contains("D: no wire found"), sw.reason().get());
      assertEquals(Optional.empty(), d.curve());
    }
  }

  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void swungBundledGappedAndUpliftSpans(SyntheticCorridor.Mode mode) {
    // span 0 climbs 40 m (vertex 49.5 m before its first structure: uplift, computed with
    // methods.md 2.5: s0 = 150 - 1500 asinh(40 / (3000 sinh 0.1)) = -49.5 m); span 1 swung 8
    // degrees by wind; span 2 has a 70 m gap in phase A; phases are twin bundles 0.45 m apart.
    List<SyntheticCorridor.Position> pos = List.of(
        new SyntheticCorridor.Position("A", false, 7.0, 20.0, 1500, 4, 2, 0.45),
        new SyntheticCorridor.Position("B", false, 0.0, 20.0, 1500, 4, 2, 0.45),
        new SyntheticCorridor.Position("C", false, -7.0, 20.0, 1500, 4, 2, 0.45),
        new SyntheticCorridor.Position("SW1", true, 4.5, 28.0, 1700, 1.5, 1, 0));
    double[] x = {500_000, 500_240, 500_480, 500_720};
    double[] y = {4_000_000, 4_000_180, 4_000_360, 4_000_540};
    double[][][] gaps = new double[3][4][0];
    gaps[2][0] = new double[] {100, 170};
    SyntheticCorridor c = new SyntheticCorridor(x, y, new double[] {0, 40, 0, 0}, pos, mode, 9,
        gaps, new double[] {0, Math.toRadians(8), 0});
    assertTrue(c.truth(0, pos.get(0)).curve().s0() < -40, "the first span is an uplift span");
    WireResult r = new WireFinder(Fixtures.options(false)).find(c, Fixtures.layout(c), c);
    for (int k = 0; k < 3; k++) {
      SpanWires sw = r.spans().get(k);
      assertEquals(WireStatus.FITTED, sw.status(), sw.reason().orElse(""));
      assertEquals(7, sw.conductors().size(), names(sw));
      for (SyntheticCorridor.Position p : pos) {
        ConductorCurve truth = c.truth(k, p);
        // the vertical sag of a wire swung by phi is its in-plane sag times cos(phi)
        double sag = truth.midSpanSag() * Math.cos(c.swing[k]);
        for (int sub = 1; sub <= p.bundle(); sub++) {
          String name = p.bundle() > 1 ? p.name() + "." + sub : p.name();
          FittedConductor f = sw.conductor(name).orElseThrow(() -> new AssertionError(name));
          assertTrue(f.isFitted(), name + " " + f.reason());
          assertEquals(sag, f.curve().orElseThrow().midSpanSag(), SAG_TOL, name);
          assertEquals(truth.zA(), f.curve().get().zA(), ATTACH_TOL, name);
          assertEquals(truth.zB(), f.curve().get().zB(), ATTACH_TOL, name);
          assertEquals(c.swing[k], f.surveySwingRad(), Math.toRadians(1), name);
          if (p.bundle() > 1) {
            BundleInfo b = f.bundle().orElseThrow();
            assertEquals(2, b.count());
            assertEquals(p.spacing(), b.spreadM(), 0.05, name);
            // sub-conductor 1 is the right one (more negative offset); the curve's plan line
            // is the swung wire's chord, through its attachments
            ConductorCurve fc = f.curve().get();
            double e = sw.span().frame().offset(fc.x(fc.length() / 2), fc.y(fc.length() / 2));
            assertEquals(p.offset() + (sub == 1 ? -0.5 : 0.5) * p.spacing(), e, 0.05, name);
          }
        }
      }
    }
    FittedConductor gapped = r.spans().get(2).conductor("A.1").orElseThrow();
    assertEquals(70, gapped.quality().maxGapM(), 3);
    assertEquals(100 - 100 * 70 / r.spans().get(2).span().lengthM(),
        gapped.quality().coveragePct(), 3);
  }

  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void spanOutsideTheSurveyIsNotAssessed(SyntheticCorridor.Mode mode) {
    SyntheticCorridor c = SyntheticCorridor.standard(mode, 10);
    List<org.clearance.line.Structure> s = new java.util.ArrayList<>();
    for (int i = 0; i < c.tx.length; i++) {
      s.add(Fixtures.structure("S" + (i + 1), i + 1, c.tx[i], c.ty[i]));
    }
    // two more structures 5 km away from any survey point
    s.add(Fixtures.structure("S9", 9, c.tx[3] + 5000, c.ty[3]));
    s.add(Fixtures.structure("S10", 10, c.tx[3] + 5300, c.ty[3]));
    var layout = org.clearance.line.SpanLayout.build(s, List.of(Fixtures.spec(c.positions)));
    WireResult r = new WireFinder(Fixtures.options(true)).find(c, layout, c);
    SpanWires far = r.span("S9-S10").orElseThrow();
    assertEquals(WireStatus.NOT_ASSESSED, far.status());
    assertTrue(far.reason().orElseThrow().contains("outside the survey"), far.reason().get());
    assertTrue(far.conductors().stream().noneMatch(FittedConductor::isFitted));
    assertEquals(WireStatus.FITTED, r.span("S1-S2").orElseThrow().status());
    assertTrue(r.structureChanges().isEmpty(), r.structureChanges().toString());
  }

  /** attach_z in the structures file pins the curve: only c is left to fit (methods.md 2.5). */
  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void attachmentElevationsFromTheStructuresFileAreKept(SyntheticCorridor.Mode mode) {
    SyntheticCorridor c = SyntheticCorridor.standard(mode, 12);
    SyntheticCorridor.Position b = c.positions.get(1);
    List<org.clearance.line.Structure> s = new java.util.ArrayList<>();
    for (int i = 0; i < c.tx.length; i++) {
      double z = c.groundZ(c.tx[i], c.ty[i]) + c.towerHeight[i] + b.height();
      s.add(new org.clearance.line.Structure("S" + (i + 1), "", i + 1,
          org.clearance.line.StructureType.SUSPENSION, c.tx[i], c.ty[i], Double.NaN,
          java.util.Map.of("B", z), "test.csv", i + 2));
    }
    var layout = org.clearance.line.SpanLayout.build(s, List.of(Fixtures.spec(c.positions)));
    WireResult r = new WireFinder(Fixtures.options(false)).find(c, layout, c);
    for (int k = 0; k < 3; k++) {
      ConductorCurve truth = c.truth(k, b);
      FittedConductor f = r.spans().get(k).conductor("B").orElseThrow();
      ConductorCurve fit = f.curve().orElseThrow();
      assertEquals(truth.zA(), fit.zA(), 1e-6);
      assertEquals(truth.zB(), fit.zB(), 1e-6);
      assertEquals(truth.midSpanSag(), fit.midSpanSag(), SAG_TOL);
      assertTrue(f.isFitted(), f.reason().toString());
    }
  }

  /** Quad bundles (a 0.45 m square) split into four sub-conductors, with or without the spec. */
  @ParameterizedTest
  @EnumSource(SyntheticCorridor.Mode.class)
  void quadBundlesSplitIntoFour(SyntheticCorridor.Mode mode) {
    List<SyntheticCorridor.Position> pos = List.of(
        new SyntheticCorridor.Position("A", false, 8.0, 22.0, 1500, 8, 4, 0.45),
        new SyntheticCorridor.Position("B", false, -8.0, 22.0, 1500, 8, 4, 0.45));
    double[] x = {500_000, 500_280, 500_560};
    double[] y = {4_000_000, 4_000_210, 4_000_420};
    SyntheticCorridor c = new SyntheticCorridor(x, y, new double[3], pos, mode, 13,
        new double[2][2][0], new double[2]);
    List<SyntheticCorridor.Position> unbundledSpec = List.of(
        new SyntheticCorridor.Position("A", false, 8.0, 22.0, 1500, 8, 1, 0),
        new SyntheticCorridor.Position("B", false, -8.0, 22.0, 1500, 8, 1, 0));
    for (List<SyntheticCorridor.Position> spec : List.of(pos, unbundledSpec)) {
      WireResult r = new WireFinder(Fixtures.options(false)).find(c, Fixtures.layout(c, spec),
          c);
      for (int k = 0; k < 2; k++) {
        SpanWires sw = r.spans().get(k);
        assertEquals(8, sw.conductors().size(), names(sw));
        for (FittedConductor f : sw.conductors()) {
          assertTrue(f.isFitted(), f.name() + " " + f.reason());
          assertEquals(4, f.bundle().orElseThrow().count(), f.name());
          // diagonal of the 0.45 m square
          assertEquals(0.45 * Math.sqrt(2), f.bundle().get().spreadM(), 0.05, f.name());
          ConductorCurve truth = c.truth(k, pos.get(f.name().startsWith("A") ? 0 : 1));
          assertEquals(truth.midSpanSag(), f.curve().orElseThrow().midSpanSag(), SAG_TOL);
        }
      }
    }
  }

  private static String names(SpanWires sw) {
    return sw.conductors().stream().map(FittedConductor::name).toList().toString();
  }
}
