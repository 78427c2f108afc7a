package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Wire pieces ({@link WirePiece}, {@link PointEvidence#setAside}): what is left of a wire nobody
 * fitted is set aside as wire; a crown, a pole, a bird and a wire with a crown beside it are not
 * (issue 9). Geometry made up; the wires hang as parabolas z = z0 + (t - t0)^2 / (2c) (the
 * catenary to second order, methods.md 2.1) with seeded Gaussian noise of 3 cm, the demo
 * feeder's wire noise (2-4 cm).
 */
class WirePieceTest {
  /** Candidate floor of the made-up corridor, m above ground. */
  private static final double FLOOR_M = 3.0;
  /** Ground elevation of the made-up corridor, m. */
  private static final double GROUND_Z = 100.0;
  private static final double NOISE_M = 0.03;

  private final SplittableRandom rng = new SplittableRandom(9);
  private long nextKey = 1;

  /**
   * Adds points along a wire: plan line through (s0, e0) at {@code angleDeg} to the span, from
   * -half to +half m along it, height h0 m above ground at its middle, catenary parameter c, m.
   */
  private void wire(SpanPoints p, double s0, double e0, double angleDeg, double half, double h0,
      double c, int points) {
    double ux = Math.cos(Math.toRadians(angleDeg));
    double uy = Math.sin(Math.toRadians(angleDeg));
    for (int k = 0; k < points; k++) {
      double t = -half + 2 * half * k / (points - 1);
      double h = h0 + t * t / (2 * c) + NOISE_M * rng.nextGaussian();
      p.add(s0 + t * ux + NOISE_M * rng.nextGaussian(), e0 + t * uy
          + NOISE_M * rng.nextGaussian(), GROUND_Z + h, h, CandidateCollector.UNCLASSIFIED,
          nextKey++);
    }
  }

  /** Adds points on the upper half of a crown (a sphere of radius r centred h m up). */
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

  /** Sets aside what the evidence shows; {@code linear}: every point with linear evidence
   * (as the sleeve evidence gives a wire's points) or none. */
  private static SetAside run(SpanPoints p, boolean linear) {
    p.sort();
    boolean[] none = new boolean[p.size()];
    boolean[] lin = new boolean[p.size()];
    java.util.Arrays.fill(lin, linear);
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, none, lin, none, SetAside.none(), FLOOR_M, out);
    return out;
  }

  private static long reasons(SetAside out, long from, long to, SetAside.Reason reason) {
    long n = 0;
    for (long k = from; k < to; k++) {
      n += out.reason(k) == reason ? 1 : 0;
    }
    return n;
  }

  @Test
  void serviceLineCrossingTheSpanIsWire() {
    // regression (issue 9, FeederModesTruthTest seed 61): a service line crossing the span at
    // 70 degrees, 1.5 m below the neutral, 18 m of it in the corridor, sag 0.3 m over 40 m
    // (c = 40^2 / (8 * 0.3) = 667 m), 36 points: it ran less than 10 m along the span and was
    // measured as vegetation
    SpanPoints p = new SpanPoints(GROUND_Z);
    wire(p, 50, 0, 70, 9, 7.5, 667, 36);
    SetAside out = run(p, false);
    assertEquals(36, reasons(out, 1, 37, SetAside.Reason.WIRE));
  }

  @Test
  void pieceOfAnUnfittedConductorIsWire() {
    // 6 points over 4 m along the span, 11 m up: what a coverage gap leaves of a conductor
    SpanPoints p = new SpanPoints(GROUND_Z);
    wire(p, 30, -0.8, 0, 2, 11, 300, 6);
    assertEquals(6, reasons(run(p, false), 1, 7, SetAside.Reason.WIRE));
  }

  @Test
  void stackedPiecesOfTwoConductorsAreWire() {
    // vertical framing: two conductors 0.8 m apart, one above the other, 7 points each over
    // 6 m, in one group (2 m link): each is a strand, and each strand is a piece
    SpanPoints p = new SpanPoints(GROUND_Z);
    wire(p, 70, 0.3, 0, 3, 11.6, 300, 7);
    wire(p, 70, 0.3, 0, 3, 12.4, 300, 7);
    assertEquals(14, reasons(run(p, true), 1, 15, SetAside.Reason.WIRE));
  }

  @Test
  void shortEndOfAStackedConductorContinuesItsPiece() {
    // regression (issue 9, FeederModesTruthTest seed 66 vertical, ground-only, span P204-P205):
    // two unfitted conductors 0.85 m apart, one above the other, in one group over 21 m; the
    // end of the lower one climbed to the upper one (its best line) and joined the two, and
    // 3 points of the upper one beyond a 3.5 m gap formed a strand too short to be a piece. A
    // zone site stood on them 0.27 m from the conductor (truth 4.61 m).
    SpanPoints p = new SpanPoints(GROUND_Z);
    wire(p, 27, 0.3, 0, 5, 10.6, 400, 12);
    wire(p, 37, 0.3, 0, 6, 11.45, 400, 13);
    wire(p, 26.5, 0.3, 0, 1, 11.45, 400, 3);
    assertEquals(28, reasons(run(p, true), 1, 29, SetAside.Reason.WIRE));
  }

  @Test
  void wireWithACrownBesideItIsMeasured() {
    // the same conductor piece with a crown 1.5 m beside it: one group, not made of wire
    // pieces only, so every point is measured (a point near a wire is vegetation unless the
    // evidence says otherwise)
    SpanPoints p = new SpanPoints(GROUND_Z);
    wire(p, 30, -0.8, 0, 2, 11, 300, 6);
    crown(p, 30, -3.3, 10, 1.5, 60);
    // linear evidence everywhere, so that the group is split into strands too
    SetAside out = run(p, true);
    assertEquals(0, reasons(out, 1, 67, SetAside.Reason.WIRE));
    assertEquals(0, reasons(out, 1, 67, SetAside.Reason.AIRBORNE));
  }

  @Test
  void pieceTiedToAPoleIsWireOnAPoleLine() {
    // regression (issue 9, seed 62 triangular, ground-only, span P202-P203): a piece of a
    // conductor the finder could not fit, 1.2-5.2 m from the pole, joined the pole's points
    // (within 2 m) into one group that is no wire, and was measured 0.94 m from the next
    // conductor (truth 4.33 m). The pole's points, within the clearance engine's 1 m pole
    // exclusion, now join no group on a pole line.
    SpanPoints p = new SpanPoints(GROUND_Z);
    wire(p, 3.2, -0.8, 0, 2, 11, 300, 6);
    for (int k = 0; k < 10; k++) {
      double h = 6 + 0.6 * k;
      p.add(0.15 * Math.cos(k), 0.15 * Math.sin(k), GROUND_Z + h, h,
          CandidateCollector.UNCLASSIFIED, nextKey++);
    }
    p.sort();
    boolean[] none = new boolean[p.size()];
    SetAside towerLine = SetAside.none();
    PointEvidence.setAside(p, none, none, none, SetAside.none(), FLOOR_M, towerLine);
    assertEquals(0, reasons(towerLine, 1, 17, SetAside.Reason.WIRE), "no pole radius");
    SetAside poleLine = SetAside.none();
    PointEvidence.setAside(p, none, none, none, SetAside.none(), FLOOR_M, 80,
        PointEvidence.POLE_RADIUS_M, poleLine);
    assertEquals(6, reasons(poleLine, 1, 7, SetAside.Reason.WIRE), "the piece");
    assertEquals(0, reasons(poleLine, 7, 17, SetAside.Reason.WIRE)
        + reasons(poleLine, 7, 17, SetAside.Reason.AIRBORNE), "the pole: left to the engine");
  }

  @Test
  void crownPoleAndBirdAreNoPieces() {
    SpanPoints p = new SpanPoints(GROUND_Z);
    crown(p, 10, 5, 8, 2.0, 80);
    int[] all = new int[80];
    for (int k = 0; k < 80; k++) {
      all[k] = k;
    }
    assertFalse(WirePiece.isPiece(p, all, 80), "crown");
    SpanPoints pole = new SpanPoints(GROUND_Z);
    for (int k = 0; k < 10; k++) {
      double h = 4 + 0.8 * k;
      pole.add(20 + 0.15 * Math.cos(k), 0.15 * Math.sin(k), GROUND_Z + h, h,
          CandidateCollector.UNCLASSIFIED, k + 1L);
    }
    assertFalse(WirePiece.isPiece(pole, new int[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9}, 10), "pole");
    SpanPoints bird = new SpanPoints(GROUND_Z);
    for (int k = 0; k < 5; k++) {
      bird.add(40 + 0.1 * k, 2 + 0.05 * k, GROUND_Z + 15, 15, CandidateCollector.UNCLASSIFIED,
          k + 1L);
    }
    assertFalse(WirePiece.isPiece(bird, new int[] {0, 1, 2, 3, 4}, 5), "bird: run 0.4 m");
  }

  @Test
  void lineMustHangLikeAWire() {
    // level within TOL_M: a piece; humped by 0.5 m over 8 m (curvature of the wrong sign),
    // or bowed 0.5 m in plan: none
    SpanPoints level = new SpanPoints(GROUND_Z);
    SpanPoints humped = new SpanPoints(GROUND_Z);
    SpanPoints bowed = new SpanPoints(GROUND_Z);
    int[] idx = new int[9];
    for (int k = 0; k < 9; k++) {
      double t = k - 4.0;
      idx[k] = k;
      level.add(50 + t, 0, GROUND_Z + 9, 9, CandidateCollector.UNCLASSIFIED, k + 1L);
      double hump = 0.5 * (1 - t * t / 16);
      humped.add(50 + t, 0, GROUND_Z + 9 + hump, 9 + hump, CandidateCollector.UNCLASSIFIED,
          k + 1L);
      bowed.add(50 + t, hump, GROUND_Z + 9, 9, CandidateCollector.UNCLASSIFIED, k + 1L);
    }
    assertTrue(WirePiece.isPiece(level, idx, 9));
    assertFalse(WirePiece.isPiece(humped, idx, 9));
    assertFalse(WirePiece.isPiece(bowed, idx, 9));
  }
}
