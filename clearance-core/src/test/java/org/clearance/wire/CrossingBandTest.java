package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;

/**
 * A wire crossing the span is followed beyond the candidates' corridor into the band the
 * clearance engine still measures ({@link CrossingBand}, through {@link PointEvidence#setAside}).
 * Regression (issue 9, generated feeders ground-only and unlabelled, span P206-P207 of seeds 41
 * and 42 horizontal and 45 vertical): the service line's points 0.1-0.5 m beyond the corridor's
 * edge were measured as vegetation and set the span's minimum, 0.4-1.0 m below the true one.
 * Geometry made up: a 100 m span along x, corridor half-width 9.25 m (the demo feeder's), a
 * service line crossing at 60 degrees, level 7 m up, a point every 0.5 m from offset -14 to 14 m
 * (the demo's 2 points per m), 3 cm Gaussian noise up (the demo's service line noise), seeded;
 * a crown in the band beside it on one side.
 */
class CrossingBandTest {
  private static final double GROUND_Z = 100.0;
  private static final double HALF_WIDTH_M = 9.25;
  private static final double NOISE_M = 0.03;
  private static final SpanFrame FRAME = SpanFrame.between(1000, 2000, 1100, 2000);

  private final SplittableRandom rng = new SplittableRandom(23);
  private long nextKey = 1;

  private void add(SpanPoints inner, SpanPoints outer, double s, double e, double h) {
    (Math.abs(e) <= HALF_WIDTH_M ? inner : outer).add(s, e, GROUND_Z + h, h,
        CandidateCollector.UNCLASSIFIED, nextKey++);
  }

  @Test
  void crossingWireIsFollowedIntoTheBandUnlessVegetationTouchesIt() {
    SpanPoints inner = new SpanPoints(GROUND_Z);
    SpanPoints outer = new SpanPoints(GROUND_Z);
    double ux = Math.cos(Math.toRadians(60));
    double uy = Math.sin(Math.toRadians(60));
    List<double[]> wire = new ArrayList<>();
    for (double t = -14 / uy; t <= 14 / uy; t += 0.5) {
      double[] w = {50 + t * ux, t * uy, 7 + NOISE_M * rng.nextGaussian()};
      wire.add(w);
      add(inner, outer, w[0], w[1], w[2]);
    }
    long wireEnd = nextKey;
    // a crown in the band beside the wire at offset 12 m: its surface reaches 0.2 m from the line
    List<double[]> crown = new ArrayList<>();
    double tc = 12 / uy;
    for (int k = 0; k < 150; k++) {
      double a = rng.nextDouble(0, 2 * Math.PI);
      double up = rng.nextDouble(-1, 1);
      double ring = Math.sqrt(1 - up * up);
      double[] q = {50 + tc * ux + 1.2 * uy + ring * Math.cos(a),
          tc * uy - 1.2 * ux + ring * Math.sin(a), 7 + up};
      crown.add(q);
      add(inner, outer, q[0], q[1], q[2]);
    }
    // a crown point of the other side 0.15 m across the wire, at its height: no wire point
    double tb = -11 / uy;
    add(inner, outer, 50 + tb * ux + 0.15 * uy, tb * uy - 0.15 * ux, 7);
    long beside = nextKey - 1;
    inner.sort();
    outer.sort();
    boolean[] none = new boolean[inner.size()];
    boolean[] crossing = new boolean[inner.size()];
    for (int i = 0; i < inner.size(); i++) {
      crossing[i] = inner.key(i) < wireEnd;
    }
    SetAside out = SetAside.none();
    PointEvidence.setAside(inner, none, none, crossing, SetAside.none(), 3.0, Double.NaN,
        Double.NaN, FRAME, List.of(), outer, out);
    int band = 0;
    int touched = 0;
    for (int k = 0; k < wire.size(); k++) {
      double[] w = wire.get(k);
      long key = k + 1;
      if (Math.abs(w[1]) <= HALF_WIDTH_M) {
        continue;
      }
      band++;
      // touched: a crown point within 0.3 m (PointEvidence.TOUCH_M), or the point beside it
      boolean near = Math.hypot(Math.hypot(w[0] - 50 - tb * ux - 0.15 * uy,
          w[1] - tb * uy + 0.15 * ux), w[2] - 7) <= PointEvidence.TOUCH_M;
      for (double[] q : crown) {
        near |= Math.hypot(Math.hypot(w[0] - q[0], w[1] - q[1]), w[2] - q[2])
            <= PointEvidence.TOUCH_M;
      }
      touched += near ? 1 : 0;
      assertEquals(near ? SetAside.Reason.NONE : SetAside.Reason.CROSSING, out.reason(key),
          "wire point at offset " + w[1]);
      assertEquals(near, out.touchedWire(key), "wire point at offset " + w[1]);
    }
    assertTrue(band >= 20 && touched >= 2 && touched < band, band + " " + touched);
    for (long key = wireEnd; key <= beside; key++) {
      assertEquals(SetAside.Reason.NONE, out.reason(key), "crown point " + key);
      assertFalse(out.touchedWire(key), "crown point " + key);
    }
  }

  @Test
  void withoutACrossingWireNothingInTheBandIsSetAside() {
    // the same line in the band only: no crossing wire was found in the corridor
    SpanPoints inner = new SpanPoints(GROUND_Z);
    SpanPoints outer = new SpanPoints(GROUND_Z);
    for (double e = 9.5; e <= 14; e += 0.5) {
      add(inner, outer, 50 + e * 0.5, e, 7 + NOISE_M * rng.nextGaussian());
    }
    inner.sort();
    outer.sort();
    SetAside out = SetAside.none();
    PointEvidence.setAside(inner, new boolean[0], new boolean[0], new boolean[0],
        SetAside.none(), 3.0, Double.NaN, Double.NaN, FRAME, List.of(), outer, out);
    for (long key = 1; key < nextKey; key++) {
      assertEquals(SetAside.Reason.NONE, out.reason(key));
    }
  }

  @Test
  void crossingWireIsFollowedFromItsPiecesBetweenGaps() {
    // regression (issue 9, generated horizontal feeder, seed 42, ground-only, span P206-P207):
    // the crossing finder named the service line's points on one side of the conductors only;
    // on the other its points beyond a gap were a wire piece on their own (set aside as wire),
    // and the service line sags: the line of the named points alone, carried 11-16 m across,
    // missed the band's points by decimetres, and one of them set the span's minimum (8.790 m
    // against a true 9.222 m). The pieces set aside as a wire nobody fitted are the wire's
    // points too. Here a slack service line (catenary parameter 150 m, low point at the span's
    // centre line), no points from offset -6 to 0 m, named from 0 to 9 m
    SpanPoints inner = new SpanPoints(GROUND_Z);
    SpanPoints outer = new SpanPoints(GROUND_Z);
    double ux = Math.cos(Math.toRadians(60));
    double uy = Math.sin(Math.toRadians(60));
    for (double t = -14 / uy; t <= 9 / uy; t += 0.5) {
      double e = t * uy;
      if (e > -6 && e < 0) {
        continue;
      }
      add(inner, outer, 50 + t * ux, e, 7 + t * t / 300 + NOISE_M * rng.nextGaussian());
    }
    inner.sort();
    outer.sort();
    boolean[] none = new boolean[inner.size()];
    boolean[] crossing = new boolean[inner.size()];
    for (int i = 0; i < inner.size(); i++) {
      crossing[i] = inner.e(i) >= 0;
    }
    SetAside out = SetAside.none();
    PointEvidence.setAside(inner, none, none, crossing, SetAside.none(), 3.0, Double.NaN,
        Double.NaN, FRAME, List.of(), outer, out);
    assertTrue(outer.size() >= 9, "band points " + outer.size());
    for (int j = 0; j < outer.size(); j++) {
      assertEquals(SetAside.Reason.CROSSING, out.reason(outer.key(j)),
          "band point at offset " + outer.e(j));
    }
  }
}
