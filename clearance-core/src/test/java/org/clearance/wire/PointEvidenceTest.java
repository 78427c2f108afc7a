package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Isolated airborne points ({@link PointEvidence#setAside}): a small group high above the
 * candidate floor is set aside only with open air below it (issue 9). Geometry made up: a
 * corridor whose candidates start 3 m above ground, a 4-point group 9.0-9.6 m above ground.
 */
class PointEvidenceTest {
  /** Candidate floor of the made-up corridor, m above ground. */
  private static final double FLOOR_M = 3.0;
  private static final double[][] GROUP = {{50.0, 2.0, 9.6}, {50.6, 2.3, 9.3},
    {49.7, 1.6, 9.0}, {50.3, 1.8, 9.4}};

  private static SpanPoints group() {
    SpanPoints p = new SpanPoints(100.0);
    for (int i = 0; i < GROUP.length; i++) {
      double[] g = GROUP[i];
      p.add(g[0], g[1], 100.0 + g[2], g[2], CandidateCollector.UNCLASSIFIED, i + 1L);
    }
    return p;
  }

  private static SetAside run(SpanPoints p) {
    p.sort();
    boolean[] none = new boolean[p.size()];
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, none, none, none, SetAside.none(), FLOOR_M, out);
    return out;
  }

  @Test
  void crownTopAboveItsCrownIsMeasured() {
    SpanPoints p = group();
    // the lower crown below the candidate floor: returns 1.5-2.9 m above ground under the top
    p.standing().add(50.2, 2.4, 2.9);
    p.standing().add(49.0, 1.0, 2.2);
    p.standing().add(51.5, 3.0, 1.5);
    SetAside out = run(p);
    assertEquals(0, out.airborneCount());
    for (long k = 1; k <= GROUP.length; k++) {
      assertEquals(SetAside.Reason.NONE, out.reason(k));
    }
  }

  @Test
  void sameGroupOverBareGroundIsSetAside() {
    SpanPoints p = group();
    // unclassified ground returns (under 0.5 m) are no crown
    p.standing().add(50.2, 2.4, 0.1);
    p.standing().add(49.0, 1.0, -0.2);
    SetAside out = run(p);
    assertEquals(GROUP.length, out.airborneCount());
    for (long k = 1; k <= GROUP.length; k++) {
      assertEquals(SetAside.Reason.AIRBORNE, out.reason(k));
    }
  }

  @Test
  void birdHighOverALowCrownIsSetAside() {
    SpanPoints p = group();
    // a shrub 1.5 m high under the group: more than UNDER_DEPTH_M below its lowest point
    p.standing().add(50.2, 2.4, 1.5);
    assertEquals(GROUP.length, run(p).airborneCount());
  }

  @Test
  void crownBesideTheColumnDoesNotCount() {
    SpanPoints p = group();
    // 2.9 m high, but 3 m to the side of the group's extent: outside the 1 m column margin
    p.standing().add(50.0, 5.8, 2.9);
    assertEquals(GROUP.length, run(p).airborneCount());
  }

  @Test
  void crownSpreadingPastTheCorridorEdgeIsMeasured() {
    SpanPoints p = group();
    // the rest of the crown stands just outside the corridor, higher than the group
    p.standing().add(50.2, 3.1, 11.0);
    assertEquals(0, run(p).airborneCount());
  }

  @Test
  void gridKeepsTheHighestPointPerCellAcrossTiles() {
    StandingGrid a = new StandingGrid();
    a.add(-0.5, -16.5, 2.0);
    a.add(-0.2, -16.1, 3.0);
    StandingGrid b = new StandingGrid();
    b.add(-0.7, -16.9, 2.5);
    b.add(40.0, 3.0, 0.4);
    a.addAll(b);
    assertEquals(3.0, a.highestIn(-1.0, -0.1, -17.0, -16.0), 1e-6);
    assertEquals(Double.NEGATIVE_INFINITY, a.highestIn(0.0, 50.0, -15.5, 15.0));
    assertEquals(1, a.cells());
  }

  /**
   * A wire point with a vegetation point within the touch distance (0.3 m) is not set aside but
   * marked touched (measured; the site stands on the vegetation, issue 9); a wire point with
   * no vegetation that near is set aside as wire. Made-up points: wire points 1 m apart along a
   * conductor 12 m above ground, a 4-point branch 0.2 m below the wire at station 20.
   */
  @Test
  void wirePointTouchedByVegetationIsMarkedNotSetAside() {
    SpanPoints p = new SpanPoints(100.0);
    int wires = 30;
    for (int i = 0; i < wires; i++) {
      p.add(10.0 + i, 0.0, 112.0, 12.0, CandidateCollector.UNCLASSIFIED, i + 1L);
    }
    double[][] branch = {{20.0, 0.1, 11.8}, {20.3, -0.2, 11.5}, {19.8, 0.3, 11.2},
      {20.1, 0.0, 10.9}};
    for (int i = 0; i < branch.length; i++) {
      double[] b = branch[i];
      p.add(b[0], b[1], 100.0 + b[2], b[2], CandidateCollector.UNCLASSIFIED, 100L + i);
    }
    p.standing().add(20.2, 0.2, 8.0); // the crown under the branch: no bird
    p.sort();
    boolean[] on = new boolean[p.size()];
    boolean[] none = new boolean[p.size()];
    for (int i = 0; i < p.size(); i++) {
      on[i] = p.key(i) <= wires;
    }
    SetAside out = SetAside.none();
    PointEvidence.setAside(p, on, none, none, SetAside.none(), FLOOR_M, out);
    long touched = 11; // the wire point at station 20: the branch's top 0.22 m from it
    assertEquals(SetAside.Reason.NONE, out.reason(touched));
    assertEquals(true, out.touchedWire(touched));
    assertEquals(SetAside.Reason.WIRE, out.reason(1));
    assertEquals(false, out.touchedWire(1));
    for (long k = 100; k < 100 + branch.length; k++) {
      assertEquals(SetAside.Reason.NONE, out.reason(k));
      assertEquals(false, out.touchedWire(k));
    }
    assertEquals(1, out.touchedKeys().length);
  }
}
