package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** One conductor's plan line, catenary and quality figures. */
class ConductorFitTest {

  /**
   * Coverage and largest gap, computed by hand: neighbours at most 5 m apart cover the stretch
   * between them, the gap counts from each end of the span.
   */
  @ParameterizedTest
  @CsvSource(delimiter = ';', value = {
    // stations; span length; coverage %; largest gap m
    "0 2 4 20 22; 30; 20; 16", // 2 + 2 + 2 covered of 30; gap 4-20
    "5 10 15 20 25; 30; 66.6666667; 5", // breaks of exactly 5 m are covered
    "1 7 13; 14; 0; 6", // every neighbour 6 m apart: nothing covered
    "0 1 2 3; 100; 3; 97" // the far end is the gap
  })
  void coverageAndGap(String stations, double length, double coverage, double gap) {
    String[] parts = stations.trim().split(" ");
    double[] s = new double[parts.length];
    boolean[] kept = new boolean[parts.length];
    for (int k = 0; k < parts.length; k++) {
      s[k] = Double.parseDouble(parts[k]);
      kept[k] = true;
    }
    assertArrayEquals(new double[] {coverage, gap}, ConductorFit.coverage(s, kept, length),
        1e-6);
  }

  private static Span span(double length) {
    var a = Fixtures.structure("P1", 1, 1000, 2000);
    var b = Fixtures.structure("P2", 2, 1000 + length * 0.6, 2000 + length * 0.8);
    return new Span("P1-P2", "TX1", a, b, SpanFrame.between(a.x(), a.y(), b.x(), b.y()),
        length, 0);
  }

  /** Points of a known catenary 2.5 m left of the span line, 3 cm noise. */
  private static SpanPoints points(Catenary truth, double length, int n, long seed) {
    Random r = new Random(seed);
    SpanPoints p = new SpanPoints(0);
    for (int k = 0; k < n; k++) {
      double s = length * r.nextDouble();
      p.add(s, 2.5 + 0.03 * r.nextGaussian(), truth.z(s) + 0.03 * r.nextGaussian(), 15, 14);
    }
    p.sort();
    return p;
  }

  private static int[] all(SpanPoints p) {
    int[] m = new int[p.size()];
    for (int i = 0; i < m.length; i++) {
      m[i] = i;
    }
    return m;
  }

  /**
   * Level 300 m span of the check-values case (shared/reference/check-values.md section 2,
   * [computed]): C = 1753.812 m gives a catenary sag of 6.4185 m.
   */
  @Test
  void freeFitOfTheCheckValueSpan() {
    double length = 300;
    Catenary truth = Catenary.through(0, 50, length, 50, 1753.812);
    assertEquals(6.4185, truth.midSpanSag(0, length), 1e-4);
    SpanPoints p = points(truth, length, 900, 1);
    ConductorFit.Result r = ConductorFit.fit(p, all(p), span(length), true, Double.NaN,
        Double.NaN);
    ConductorCurve c = r.curve().orElseThrow();
    // 900 points with 3 cm noise: sag to about a centimetre, attachments to a few
    assertEquals(6.4185, c.midSpanSag(), 0.02);
    assertEquals(50, c.zA(), 0.03);
    assertEquals(50, c.zB(), 0.03);
    assertEquals(2.5, span(length).frame().offset(c.x(0), c.y(0)), 0.01);
    assertEquals(0, r.swingRad(), Math.toRadians(0.5));
    WireQuality q = r.quality();
    // 3D residual of 3 cm noise on two axes: about 0.042 m
    assertEquals(0.042, q.rmsM(), 0.006);
    assertTrue(q.points() > 880);
    assertTrue(q.coveragePct() > 99);
    assertTrue(q.curveSigmaM() > 0 && q.curveSigmaM() < 0.01, "sigma " + q.curveSigmaM());
  }

  /**
   * The inclined check-values span (far support 30 m higher, uplift: the vertex lies 24.878 m
   * outside the span; mid-span sag from the chord 6.4504 m [computed]), fitted through known
   * attachment elevations from points on its middle third only.
   */
  @Test
  void attachmentConstrainedFitOfTheInclinedSpan() {
    double length = 300;
    Catenary truth = Catenary.through(0, 50, length, 80, 1753.812);
    assertEquals(-24.878, truth.s0(), 1e-3);
    assertEquals(6.4504, truth.midSpanSag(0, length), 1e-4);
    SpanPoints p = new SpanPoints(0);
    Random r = new Random(2);
    for (int k = 0; k < 300; k++) {
      double s = 100 + 100 * r.nextDouble();
      p.add(s, 0.03 * r.nextGaussian(), truth.z(s) + 0.03 * r.nextGaussian(), 15, 14);
    }
    p.sort();
    ConductorFit.Result fit = ConductorFit.fit(p, all(p), span(length), true, 50, 80);
    ConductorCurve c = fit.curve().orElseThrow();
    assertEquals(50, c.zA(), 1e-9);
    assertEquals(80, c.zB(), 1e-9);
    assertEquals(6.4504, c.midSpanSag(), 0.02);
    assertEquals(CatenaryFit.Method.TWO_ATTACHMENTS, fit.fit().method());
    assertEquals(33.3, fit.quality().coveragePct(), 0.5);
  }

  @Test
  void birdsAndBranchesAreLeftOutOfTheQualityFigures() {
    double length = 300;
    Catenary truth = Catenary.through(0, 50, length, 52, 1500);
    SpanPoints p = points(truth, length, 600, 3);
    Random r = new Random(4);
    for (int k = 0; k < 30; k++) {
      double s = length * r.nextDouble();
      p.add(s, 2.5, truth.z(s) + 0.5 + r.nextDouble(), 15, 1); // birds on and above the wire
    }
    p.sort();
    ConductorFit.Result fit = ConductorFit.fit(p, all(p), span(length), true, Double.NaN,
        Double.NaN);
    assertEquals(truth.midSpanSag(0, length), fit.curve().orElseThrow().midSpanSag(), 0.02);
    assertTrue(fit.quality().rmsM() < 0.05, "rms " + fit.quality().rmsM());
    assertTrue(fit.quality().points() <= 600);
  }

  /**
   * A conductor held 3 m into the span by dead-end strain assemblies at both structures
   * (docs/line-inputs.md, strain_length_m): the curve runs from the assemblies' ends, and the
   * level insulator points between the structure and the conductor's end are left out.
   */
  @Test
  void conductorEndsAtTheStrainAssemblies() {
    double length = 300;
    Catenary truth = Catenary.through(3, 50, length - 3, 50, 1600);
    SpanPoints p = points(truth, length, 900, 5);
    for (double s = 0; s < 3; s += 0.1) { // strain insulators, level with the conductor's end
      p.add(s, 2.5, 50, 15, 1);
      p.add(length - s, 2.5, 50, 15, 1);
    }
    p.sort();
    ConductorFit.Result r = ConductorFit.fit(p, all(p), span(length), true, Double.NaN,
        Double.NaN, ConductorEnds.SQUARE.withStrain(3, 3));
    ConductorCurve c = r.curve().orElseThrow();
    assertEquals(length - 6, c.length(), 0.01);
    assertEquals(3, span(length).frame().station(c.x(0), c.y(0)), 0.01);
    assertEquals(50, c.zA(), 0.03);
    assertEquals(50, c.zB(), 0.03);
    assertEquals(truth.midSpanSag(3, length - 3), c.midSpanSag(), 0.02);
    assertTrue(r.quality().rmsM() < 0.05, "rms " + r.quality().rmsM());
  }

  /**
   * At a structure where the line turns 30 degrees left, the cross arm lies along the bisector,
   * 15 degrees off square (plane geometry): a conductor 8 m to the left meets it 8 tan 15 =
   * 2.1436 m before the structure's square cross-section, one 8 m to the right as far beyond.
   */
  @Test
  void crossArmAtAnAngleStructure() {
    double turn = Math.toRadians(30);
    double tan = ConductorEnds.armTangent(1, 0, 1 + Math.cos(turn), Math.sin(turn));
    assertEquals(Math.tan(Math.toRadians(15)), tan, 1e-12);
    ConductorEnds ends = new ConductorEnds(0, 0, tan, 0);
    assertEquals(300 - 2.1436, ends.stationB(8, 0, 300), 1e-4);
    assertEquals(300 + 2.1436, ends.stationB(-8, 0, 300), 1e-4);
    assertEquals(300 - 2.1436 - 3, ends.withStrain(0, 3).stationB(8, 0, 300), 1e-4);
  }
}
