package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;

/**
 * Points of the line's own conductors inside a crown's group ({@link ConductorStrands}, {@link
 * PointEvidence#setAside}): a piece of a conductor that was not fitted, hanging like the span's
 * fitted conductor and joined to a crown within the 2 m link, is set aside as wire; the crown is
 * measured, and so is every wire point the crown touches (issue 9). Geometry made up: a 100 m
 * span along x, a fitted conductor 12 m up with catenary parameter 800 m (the demo feeder's
 * 820-930 m), the unfitted conductor 0.8 m below and 0.6 m beside it with the same parameter
 * (the demo's neutral hangs at 90-100 % of the primaries' sag), 3 cm Gaussian noise (the demo
 * feeder's wire noise, 2-4 cm), seeded.
 */
class ConductorStrandsTest {
  private static final double GROUND_Z = 100.0;
  private static final double FLOOR_M = 3.0;
  private static final double NOISE_M = 0.03;
  private static final double C_M = 800;
  private static final SpanFrame FRAME = SpanFrame.between(1000, 2000, 1100, 2000);
  /** The fitted conductor: attachments 12 m up, straight along the span at offset 0. */
  private static final ConductorCurve FITTED = new ConductorCurve(FRAME,
      Catenary.through(0, GROUND_Z + 12, 100, GROUND_Z + 12, C_M));

  private final SplittableRandom rng = new SplittableRandom(17);
  private long nextKey = 1;

  /** Points of the unfitted conductor from station s0 to s1, one every {@code step} m. */
  private void unfitted(SpanPoints p, double s0, double s1, double step) {
    for (double s = s0; s <= s1; s += step) {
      double z = FITTED.curve().z(s) - 0.8 + NOISE_M * rng.nextGaussian();
      p.add(s, 0.6 + NOISE_M * rng.nextGaussian(), z, z - GROUND_Z,
          CandidateCollector.UNCLASSIFIED, nextKey++);
    }
  }

  /** Points on the upper half of a crown (a sphere of radius r centred h m up). */
  private void crown(SpanPoints p, double s0, double e0, double h, double r, int points) {
    for (int k = 0; k < points; k++) {
      double a = rng.nextDouble(0, 2 * Math.PI);
      double up = rng.nextDouble(0, 1);
      double ring = Math.sqrt(1 - up * up);
      double z = h + r * up;
      p.add(s0 + r * ring * Math.cos(a), e0 + r * ring * Math.sin(a), GROUND_Z + z, z,
          CandidateCollector.UNCLASSIFIED, nextKey++);
    }
  }

  /** Sets aside what the evidence shows; linear evidence on keys below {@code linearBelow}. */
  private static SetAside run(SpanPoints p, long linearBelow, List<ConductorCurve> curves) {
    p.sort();
    boolean[] none = new boolean[p.size()];
    boolean[] lin = new boolean[p.size()];
    for (int i = 0; i < p.size(); i++) {
      lin[i] = p.key(i) < linearBelow;
    }
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, none, lin, none, SetAside.none(), FLOOR_M, Double.NaN,
        Double.NaN, FRAME, curves, null, out);
    return out;
  }

  private static long count(SetAside out, long from, long to, SetAside.Reason reason) {
    long n = 0;
    for (long k = from; k < to; k++) {
      n += out.reason(k) == reason ? 1 : 0;
    }
    return n;
  }

  @Test
  void pieceOfAnUnfittedConductorBesideACrownIsWire() {
    // regression (issue 9, FeederModesTruthTest's probe UnfittedWireSweep, seed 43 triangular,
    // ground-only, span P208-P209): the neutral's points beyond its fitted run joined a crown
    // within 2 m and were measured 0.504 m from a phase (truth 2.154 m). 31 points over 15 m,
    // a crown 1.2 m beside them: the 31 are wire, the crown's 120 points are measured.
    SpanPoints p = new SpanPoints(GROUND_Z);
    unfitted(p, 40, 55, 0.5);
    long wireEnd = nextKey;
    crown(p, 47, 3.0, 9.0, 1.2, 120);
    SetAside out = run(p, wireEnd, List.of(FITTED));
    assertEquals(wireEnd - 1, count(out, 1, wireEnd, SetAside.Reason.WIRE));
    assertEquals(0, count(out, wireEnd, nextKey, SetAside.Reason.WIRE)
        + count(out, wireEnd, nextKey, SetAside.Reason.AIRBORNE), "the crown");
  }

  @Test
  void withoutAFittedConductorTheGroupStaysVegetation() {
    // no conductor of the span fitted: nothing says how the line's wires hang, so the group
    // is measured as a whole (as before this evidence)
    SpanPoints p = new SpanPoints(GROUND_Z);
    unfitted(p, 40, 55, 0.5);
    long wireEnd = nextKey;
    crown(p, 47, 3.0, 9.0, 1.2, 120);
    assertEquals(0, count(run(p, wireEnd, List.of()), 1, nextKey, SetAside.Reason.WIRE));
  }

  @Test
  void crownTouchingTheWireKeepsTheTouchedPointsMeasured() {
    // a crown of radius 1 m whose top reaches the unfitted conductor: the wire points within
    // 0.3 m of a crown point are measured (a branch on a wire and the wire cannot be told
    // apart), the rest of the strand is wire, no crown point is set aside
    SpanPoints p = new SpanPoints(GROUND_Z);
    unfitted(p, 40, 55, 0.5);
    long wireEnd = nextKey;
    double top = FITTED.curve().z(48) - 0.8 - GROUND_Z;
    crown(p, 48, 0.6, top - 1.0, 1.0, 200);
    SetAside out = run(p, wireEnd, List.of(FITTED));
    long wire = count(out, 1, wireEnd, SetAside.Reason.WIRE);
    assertTrue(wire > 0 && wire < wireEnd - 1, "wire points set aside: " + wire);
    assertEquals(0, count(out, wireEnd, nextKey, SetAside.Reason.WIRE), "the crown");
    p.sort();
    for (int i = 0; i < p.size(); i++) {
      if (p.key(i) >= wireEnd || out.reason(p.key(i)) != SetAside.Reason.WIRE) {
        continue;
      }
      for (int j = 0; j < p.size(); j++) {
        if (p.key(j) >= wireEnd) {
          double d = Math.sqrt(Math.pow(p.s(i) - p.s(j), 2) + Math.pow(p.e(i) - p.e(j), 2)
              + Math.pow(p.z(i) - p.z(j), 2));
          assertTrue(d > PointEvidence.TOUCH_M, "wire point set aside " + d + " m from a crown");
        }
      }
    }
  }

  @Test
  void lineAcrossTheSpanOrHumpedIsNoConductor() {
    // the same 31 points turned 30 degrees off the span, and a line humped 0.4 m over 15 m
    // (against the fitted conductor's sag): neither hangs like the line's conductors, so the
    // crown's group is measured whole
    SpanPoints across = new SpanPoints(GROUND_Z);
    SpanPoints humped = new SpanPoints(GROUND_Z);
    for (int k = 0; k <= 30; k++) {
      double t = -7.5 + 0.5 * k;
      double z = GROUND_Z + 11;
      across.add(47.5 + t * Math.cos(Math.toRadians(30)), 0.6 + t * Math.sin(Math.toRadians(
          30)), z, z - GROUND_Z, CandidateCollector.UNCLASSIFIED, k + 1L);
      double hump = z + 0.4 * (1 - t * t / 56.25);
      humped.add(47.5 + t, 0.6, hump, hump - GROUND_Z, CandidateCollector.UNCLASSIFIED, k + 1L);
    }
    nextKey = 32;
    crown(across, 47, 3.2, 9.6, 1.6, 120);
    nextKey = 32;
    crown(humped, 47, 2.6, 9.6, 1.6, 120);
    assertEquals(0, count(run(across, 32, List.of(FITTED)), 1, nextKey, SetAside.Reason.WIRE),
        "across");
    assertEquals(0, count(run(humped, 32, List.of(FITTED)), 1, nextKey, SetAside.Reason.WIRE),
        "humped");
  }

  @Test
  void fewPointsOnAFittedConductorInItsCoverageGapAreWire() {
    // regression shape (issue 9): a conductor fitted over part of the span leaves its points
    // in a coverage gap among the candidates; 4 of them (too few for a strand) lie on its
    // fitted curve beside a crown 1.2 m away: on the curve within 0.16 m, they are wire
    SpanPoints p = new SpanPoints(GROUND_Z);
    for (int k = 0; k < 4; k++) {
      double s = 46 + 0.7 * k;
      double z = FITTED.curve().z(s) + NOISE_M * rng.nextGaussian();
      p.add(s, NOISE_M * rng.nextGaussian(), z, z - GROUND_Z, CandidateCollector.UNCLASSIFIED,
          nextKey++);
    }
    long wireEnd = nextKey;
    double h = FITTED.curve().z(47) - GROUND_Z;
    crown(p, 47, 2.4, h - 1.2, 1.2, 120);
    SetAside out = run(p, 1, List.of(FITTED));
    assertEquals(4, count(out, 1, wireEnd, SetAside.Reason.WIRE));
    assertEquals(0, count(out, wireEnd, nextKey, SetAside.Reason.WIRE), "the crown");
    assertEquals(0, count(run(p, 1, List.of()), 1, nextKey, SetAside.Reason.WIRE),
        "no fitted conductor");
  }

  @Test
  void strayPointOfAFittedConductorDoesNotSpoilAnUnfittedPiece() {
    // regression shape (issue 9, generated horizontal feeder seed 50, ground-only): an unfitted
    // conductor's 11 points over 9 m, no linear evidence on most, and one point of the fitted
    // conductor 0.85 m above and 0.6 m beside it (on its curve within 0.16 m, outside its fit's tolerance) within
    // the 2 m link: together no thin line, so the 11 were measured as vegetation. The point on
    // the fitted curve joins no group now; the 11 are a wire piece on their own
    SpanPoints p = new SpanPoints(GROUND_Z);
    unfitted(p, 40, 49, 0.9);
    long wireEnd = nextKey;
    double z = FITTED.curve().z(49.8) + 0.05;
    p.add(49.8, 0.02, z, z - GROUND_Z, CandidateCollector.UNCLASSIFIED, nextKey++);
    SetAside out = run(p, 1, List.of(FITTED));
    assertEquals(11, wireEnd - 1);
    assertEquals(12, count(out, 1, nextKey, SetAside.Reason.WIRE));
    // the same points with a crown touching the stray point: it is measured (touched)
    crown(p, 49.8, 0.02, z - GROUND_Z - 0.9, 0.8, 150);
    SetAside touched = run(p, 1, List.of(FITTED));
    assertTrue(touched.reason(wireEnd) != SetAside.Reason.WIRE, "stray point by a crown");
  }

  @Test
  void crossingWireIsFollowedIntoACrownsGroup() {
    // a service line crossing the span at 70 degrees, 40 points 0.5 m apart, level 7 m up: the
    // crossing finder named its first 24 (outside the crown); the other 16 run past a crown
    // 1.2 m beside them, in the crown's group. They continue the crossing wire's line and are
    // set aside as crossing; the crown is measured
    SpanPoints p = new SpanPoints(GROUND_Z);
    double ux = Math.cos(Math.toRadians(70));
    double uy = Math.sin(Math.toRadians(70));
    for (int k = 0; k < 40; k++) {
      double t = -10 + 0.5 * k;
      double z = 7 + NOISE_M * rng.nextGaussian();
      p.add(50 + t * ux, t * uy, GROUND_Z + z, z, CandidateCollector.UNCLASSIFIED, nextKey++);
    }
    long wireEnd = nextKey;
    // a crown centred 1.2 m + its radius off the line, beside the line's last 8 m
    double t0 = 6;
    crown(p, 50 + t0 * ux + 2.2 * uy, t0 * uy - 2.2 * ux, 6.0, 1.0, 120);
    p.sort();
    boolean[] none = new boolean[p.size()];
    boolean[] crossing = new boolean[p.size()];
    for (int i = 0; i < p.size(); i++) {
      crossing[i] = p.key(i) <= 24;
    }
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, none, none, crossing, SetAside.none(), FLOOR_M, Double.NaN,
        Double.NaN, FRAME, List.of(), null, out);
    assertEquals(wireEnd - 1, count(out, 1, wireEnd, SetAside.Reason.CROSSING));
    assertEquals(0, count(out, wireEnd, nextKey, SetAside.Reason.CROSSING)
        + count(out, wireEnd, nextKey, SetAside.Reason.WIRE), "the crown");
  }

  @Test
  void crownPointBesideACrossingWireStaysVegetation() {
    // regression (issue 9, generated triangular feeder, seed 44, ground-only, span P206-P207):
    // a point was taken onto the crossing wire when the wire's points refitted with it stayed
    // within 0.16 m; a crown point 0.15 m beside the service line was set aside as crossing
    // (a vegetation point dropped), tilted the line, and the line's last point failed and set the
    // span's minimum. Now the point must continue the line fitted without it, within four
    // robust standard deviations of the line's own residuals (here at least 0.08 m across).
    SpanPoints p = new SpanPoints(GROUND_Z);
    double ux = Math.cos(Math.toRadians(70));
    double uy = Math.sin(Math.toRadians(70));
    for (int k = 0; k < 40; k++) {
      double t = -10 + 0.5 * k;
      double z = 7 + NOISE_M * rng.nextGaussian();
      p.add(50 + t * ux, t * uy, GROUND_Z + z, z, CandidateCollector.UNCLASSIFIED, nextKey++);
    }
    long wireEnd = nextKey;
    double t0 = 6;
    crown(p, 50 + t0 * ux + 2.2 * uy, t0 * uy - 2.2 * ux, 6.0, 1.0, 120);
    // a point of the crown's group 0.15 m across the wire, between two of its points, at its
    // height
    double tb = 4.25;
    p.add(50 + tb * ux + 0.15 * uy, tb * uy - 0.15 * ux, GROUND_Z + 7, 7,
        CandidateCollector.UNCLASSIFIED, nextKey++);
    long beside = nextKey - 1;
    p.sort();
    boolean[] none = new boolean[p.size()];
    boolean[] crossing = new boolean[p.size()];
    for (int i = 0; i < p.size(); i++) {
      crossing[i] = p.key(i) <= 24;
    }
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, none, none, crossing, SetAside.none(), FLOOR_M, Double.NaN,
        Double.NaN, FRAME, List.of(), null, out);
    assertEquals(SetAside.Reason.NONE, out.reason(beside), "the crown's point beside the wire");
    // the two wire points within 0.3 m of it are measured, the other 14 beyond the crossing
    // finder's 24 are followed into the group
    assertEquals(wireEnd - 1 - 2, count(out, 1, wireEnd, SetAside.Reason.CROSSING));
  }
}
