package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Linear evidence, clustering and growth on hand-made point sets in a span frame. */
class WireGrowthTest {
  private static final WireFinderOptions.Growth GROWTH = WireFinderOptions.Growth.defaults();

  /** A wire 3 m left of the span line at c = 1500 m over 300 m, 2 points per metre. */
  private static void wire(SpanPoints p, Random r, double offset, double z0, double from,
      double to, int cls) {
    Catenary c = Catenary.through(0, z0, 300, z0, 1500);
    for (int k = 0; k < 2 * (to - from); k++) {
      double s = from + (to - from) * r.nextDouble();
      p.add(s, offset + 0.03 * r.nextGaussian(), c.z(s) + 0.03 * r.nextGaussian(), 15, cls);
    }
  }

  /** A crown: 800 points in a 3 m ball at station s, offset e, 12 m up. */
  private static void crown(SpanPoints p, Random r, double s, double e, int cls) {
    for (int k = 0; k < 800; k++) {
      double a = 2 * Math.PI * r.nextDouble();
      double b = Math.acos(2 * r.nextDouble() - 1);
      double rad = 3 * Math.cbrt(r.nextDouble());
      p.add(s + rad * Math.sin(b) * Math.cos(a), e + rad * Math.sin(b) * Math.sin(a),
          112 + rad * Math.cos(b), 12, cls);
    }
  }

  @Test
  void wiresShowLinearEvidenceCrownsAndPolesDoNot() {
    SpanPoints p = new SpanPoints(0);
    Random r = new Random(1);
    wire(p, r, 3, 120, 0, 300, 1);
    crown(p, r, 150, -10, 1);
    for (int k = 0; k < 200; k++) { // a pole: vertical line
      p.add(80, -5, 100 + 0.1 * k, 10, 1);
    }
    p.sort();
    boolean[] linear = new WireEvidence(WireFinderOptions.Evidence.defaults()).evaluate(p);
    int[] wire = new int[2];
    int[] crown = new int[2];
    int[] pole = new int[2];
    for (int i = 0; i < p.size(); i++) {
      int[] t = Math.abs(p.e(i) - 3) < 0.5 ? wire : p.e(i) == -5 ? pole : crown;
      t[0]++;
      t[1] += linear[i] ? 1 : 0;
    }
    assertTrue(wire[1] > 0.9 * wire[0], "wire " + wire[1] + " of " + wire[0]);
    assertTrue(crown[1] < 0.02 * crown[0], "crown " + crown[1] + " of " + crown[0]);
    assertEquals(0, pole[1]);
  }

  @Test
  void growthBridgesAGapAndKeepsNeighboursApart() {
    SpanPoints p = new SpanPoints(0);
    Random r = new Random(2);
    wire(p, r, 3, 120, 0, 110, 14);
    wire(p, r, 3, 120, 190, 300, 14); // an 80 m gap
    wire(p, r, 3, 126, 0, 300, 13); // 6 m above: a shield wire
    wire(p, r, -0.5, 120, 0, 300, 14); // 3.5 m to the right
    p.sort();
    int[] seeds = new int[p.size()];
    for (int i = 0; i < seeds.length; i++) {
      seeds[i] = i;
    }
    List<int[]> clusters = WireClusters.of(p, seeds, GROWTH.stationStretch(),
        GROWTH.clusterRadiusM(), GROWTH.clusterMinPoints());
    assertTrue(clusters.size() >= 4, "the gapped wire starts as two pieces");
    List<int[]> wires = WireGrowth.grow(p, clusters, 0, 300, GROWTH, 0.5, 0.35);
    assertEquals(3, wires.size());
    for (int[] w : wires) {
      double e0 = p.e(w[0]);
      double z0 = p.z(w[0]) - Catenary.through(0, 0, 300, 0, 1500).z(p.s(w[0]));
      for (int i : w) {
        assertEquals(e0, p.e(i), 0.3, "one wire's offsets");
        assertEquals(z0, p.z(i) - Catenary.through(0, 0, 300, 0, 1500).z(p.s(i)), 0.3);
      }
      assertTrue(p.s(w[0]) < 5 && p.s(w[w.length - 1]) > 295, "end to end");
    }
  }

  @Test
  void strayLabelsOnARoofACrownAndAHedgeDoNotGrowIntoAWire() {
    SpanPoints p = new SpanPoints(0);
    Random r = new Random(3);
    for (int k = 0; k < 60; k++) { // a 3 m patch of class 14 on a roof ridge
      p.add(100 + 3 * r.nextDouble(), 14 + 0.2 * r.nextDouble(), 108, 8, 14);
    }
    crown(p, r, 200, 5, 14); // a crown labelled 14 by mistake
    for (int k = 0; k < 3000; k++) { // a hedge 40 m long labelled 14, 8-11 m up
      p.add(220 + 40 * r.nextDouble(), -6 + 2 * r.nextDouble(), 108 + 3 * r.nextDouble(), 9,
          14);
    }
    p.sort();
    int[] seeds = new int[p.size()];
    for (int i = 0; i < seeds.length; i++) {
      seeds[i] = i;
    }
    List<int[]> clusters = WireClusters.of(p, seeds, GROWTH.stationStretch(),
        GROWTH.clusterRadiusM(), GROWTH.clusterMinPoints());
    assertFalse(clusters.isEmpty());
    assertEquals(0, WireGrowth.grow(p, clusters, 0, 300, GROWTH, 0.5, 0.35).size());
  }

  @Test
  void aWireThroughACrownIsStillAWire() {
    // an unclassified survey: a wire whose middle 14 m runs through a dense 7 m crown that
    // puts about 200 leaf points in the wire's tube (the wire has 600)
    SpanPoints p = new SpanPoints(0);
    Random r = new Random(4);
    wire(p, r, 3, 120, 0, 300, 1);
    Catenary c = Catenary.through(0, 120, 300, 120, 1500);
    for (int k = 0; k < 20000; k++) {
      double a = 2 * Math.PI * r.nextDouble();
      double b = Math.acos(2 * r.nextDouble() - 1);
      double rad = 7 * Math.cbrt(r.nextDouble());
      double s = 150 + rad * Math.sin(b) * Math.cos(a);
      p.add(s, 3 + rad * Math.sin(b) * Math.sin(a), c.z(150) + rad * Math.cos(b), 12, 1);
    }
    p.sort();
    boolean[] linear = new WireEvidence(WireFinderOptions.Evidence.defaults()).evaluate(p);
    IntList seeds = new IntList();
    for (int i = 0; i < p.size(); i++) {
      if (linear[i]) {
        seeds.add(i);
      }
    }
    List<int[]> clusters = WireClusters.of(p, seeds.toArray(), GROWTH.stationStretch(),
        GROWTH.clusterRadiusM(), GROWTH.clusterMinPoints());
    List<int[]> wires = WireGrowth.grow(p, clusters, 0, 300, GROWTH, 0.6, 0.45);
    assertEquals(1, wires.size());
    int[] w = wires.get(0);
    assertTrue(p.s(w[0]) < 5 && p.s(w[w.length - 1]) > 295, "end to end");
    var span = new org.clearance.line.Span("P1-P2", "TX1", Fixtures.structure("P1", 1, 0, 0),
        Fixtures.structure("P2", 2, 300, 0), org.clearance.line.SpanFrame.between(0, 0, 300, 0),
        300, 0);
    ConductorFit.Result fit = ConductorFit.fit(p, w, span, true, Double.NaN, Double.NaN);
    assertEquals(c.midSpanSag(0, 300), fit.curve().orElseThrow().midSpanSag(), 0.03);
    assertTrue(fit.quality().rmsM() < 0.08, "rms " + fit.quality().rmsM());
  }
}
