package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Wire labels in a volume of wire labels are taken as unclassified candidates (issue 9: a crown
 * labelled 14 hanging on a conductor made the wire finder lose that phase on the open corridor
 * tile, CrownLabelledWireTileTest). Generated, seeded, in a span frame: wires along the span 12 m
 * up, 10 points per metre with 3 cm noise (as WireLabelsTest), class 14; a crown of radius 3 m
 * (an ellipsoid's upper half, 20 points per m^2 of plan area, as WireLabelsTest) hanging on the
 * wire at station 100.
 */
class CrownLabelsTest {

  private static final double NOISE_M = 0.03;

  @Test
  void crownOnAWireIsTakenAsUnclassifiedAndTheWireKeepsItsLabel() {
    SplittableRandom rng = new SplittableRandom(14);
    SpanPoints p = new SpanPoints(0);
    int wire = 0;
    for (double s = 0; s <= 200; s += 0.1) {
      p.add(s, NOISE_M * rng.nextGaussian(), 12 + NOISE_M * rng.nextGaussian(), 12, 14);
      wire++;
    }
    int first = p.size();
    double radius = 3;
    int n = (int) (20 * Math.PI * radius * radius);
    for (int k = 0; k < n; k++) {
      double a = rng.nextDouble(2 * Math.PI);
      double r = radius * Math.sqrt(rng.nextDouble());
      double u = rng.nextDouble();
      // the crown's top 1 m above the wire, reaching 6 m below it
      p.add(100 + r * Math.cos(a), r * Math.sin(a), 13 - 6 * u * u, 10, 14);
    }
    p.sort();
    int demoted = CrownLabels.demote(p);
    int crownKept = 0;
    int wireFarDemoted = 0;
    for (int i = 0; i < p.size(); i++) {
      boolean onWire = Math.abs(p.e(i)) < 5 * NOISE_M && Math.abs(p.z(i) - 12) < 5 * NOISE_M;
      boolean nearCrown = Math.abs(p.s(i) - 100) <= radius + CrownLabels.RADIUS_M;
      if (!onWire && nearCrown) {
        crownKept += p.labelled(i) ? 1 : 0;
      }
      if (onWire && !nearCrown) {
        wireFarDemoted += p.labelled(i) ? 0 : 1;
      }
    }
    System.out.println("crown on a wire: " + demoted + " of " + p.size() + " taken as "
        + "unclassified; crown points still labelled " + crownKept + " of about " + n
        + "; wire points away from the crown taken as unclassified " + wireFarDemoted + " of "
        + wire);
    // most of the crown: points of its smooth top shell (planar over 1 m, scattering under
    // 0.03) may keep a label (6 % with this seed; no 10 m run of seeds, the least wire the
    // finder grows; the labelling step then judges them with the crown, WireLabels)
    assertTrue(crownKept <= 0.10 * n, crownKept + " of " + n);
    assertEquals(0, wireFarDemoted);
    assertTrue(first > 0);
  }

  /** A bundle of four sub-conductors at 0.45 m (a square) is a line along the span, not a
   * volume, though it scatters like one over 1 m ({@link CrownLabels#MAX_LINEARITY}). */
  @Test
  void aBundleOfFourKeepsItsLabels() {
    SplittableRandom rng = new SplittableRandom(4);
    SpanPoints p = new SpanPoints(0);
    for (double s = 0; s <= 200; s += 0.1) {
      for (int k = 0; k < 4; k++) {
        double e = (k % 2 == 0 ? -0.225 : 0.225) + NOISE_M * rng.nextGaussian();
        double z = 12 + (k < 2 ? -0.225 : 0.225) + NOISE_M * rng.nextGaussian();
        p.add(s, e, z, 12, 14);
      }
    }
    p.sort();
    int demoted = CrownLabels.demote(p);
    int inside = 0;
    for (int i = 0; i < p.size(); i++) {
      boolean end = p.s(i) < 2 * CrownLabels.RADIUS_M || p.s(i) > 200 - 2 * CrownLabels.RADIUS_M;
      inside += !p.labelled(i) && !end ? 1 : 0;
    }
    System.out.println("bundle of four: " + demoted + " of " + p.size() + " taken as "
        + "unclassified, " + inside + " of them more than 2 m from the wire's ends");
    // at the wire's ends the neighbourhood is one-sided; nowhere else
    assertEquals(0, inside);
    assertTrue(demoted <= 0.01 * p.size(), demoted + " of " + p.size());
  }
}
