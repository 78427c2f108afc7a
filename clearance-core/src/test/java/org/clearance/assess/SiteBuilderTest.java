package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.clearance.line.SpanFrame;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfileReader;
import org.clearance.rules.Zone;
import org.clearance.rules.ZoneViolation;
import org.junit.jupiter.api.Test;

/**
 * A site holding a point on a wire touched by vegetation stands on the vegetation beside it
 * (issue 9: a zone site must stand on vegetation), never drops the site nor makes it less
 * urgent. Hand-made points: a span along grid east from (0, 0) to (200, 0), a conductor at
 * 20 m; the distances are given, not computed (the site builder only compares them).
 */
class SiteBuilderTest {

  /** Coordinates are compared exactly: the site copies its point's coordinates. */
  private static final double EXACT = 0;
  /** Clearances are compared to the micrometre (copied, no arithmetic). */
  private static final double MICRO_M = 1e-6;

  private static final RuleProfile PROFILE = RuleProfileReader.parse(String.join("\n",
      "name: t", "title: T", "source: S", "zones:",
      "  - {name: contact, priority: 1, violation_reference: true, conditions: [all],"
          + " radial_m: 0.3}",
      "  - {name: near, priority: 2, conditions: [all], radial_m: 1.5}"), "t.yaml");
  private static final Zone CONTACT = PROFILE.zones().get(0);
  private static final Zone NEAR = PROFILE.zones().get(1);
  private static final SpanFrame FRAME = SpanFrame.between(0, 0, 200, 0);

  /** A point at (x, y, z) 10 m above ground, {@code d} m from the conductor, in a zone. */
  private static EncroachingPoint point(double x, double y, double z, double d, Zone zone,
      boolean wireTouched) {
    double required = zone == CONTACT ? 0.3 : 1.5;
    ZoneViolation v = new ZoneViolation(zone, "survey", "survey", "B2", x,
        ZoneViolation.Component.RADIAL, d, required, required - d);
    return new EncroachingPoint(x, y, z, 10, v, 0, z - 1, z - 1,
        java.util.Optional.empty(), wireTouched);
  }

  private static CutSite only(List<EncroachingPoint> points) {
    List<CutSite> sites = new SiteBuilder(1.5).build("S", FRAME, points);
    assertEquals(1, sites.size(), "one clump, one site: " + sites);
    return sites.get(0);
  }

  @Test
  void siteStandsOnTheVegetationBesideATouchedWirePoint() {
    EncroachingPoint wire = point(100, 0, 20.02, 0.02, CONTACT, true);
    EncroachingPoint branch = point(100.1, 0.12, 20.05, 0.15, CONTACT, false);
    EncroachingPoint twig = point(100.6, 0.5, 19.6, 0.6, NEAR, false);
    CutSite s = only(List.of(wire, branch, twig));
    assertEquals(100.1, s.x(), EXACT);
    assertEquals(0.12, s.y(), EXACT);
    assertEquals(20.05, s.z(), EXACT);
    assertEquals(1, s.priority());
    assertEquals(0.15, s.minClearanceM(), MICRO_M, "the vegetation's own distance");
    assertEquals(2, s.points().getAsInt(), "the vegetation points only");
  }

  @Test
  void aZoneOnlyTheWirePointReachesKeepsTheSite() {
    // The touched wire point is in the contact zone, the vegetation only in the near zone:
    // the site stays in the contact zone (never less urgent), standing on the vegetation.
    EncroachingPoint wire = point(100, 0, 20.02, 0.02, CONTACT, true);
    EncroachingPoint branch = point(100.1, 0.25, 19.9, 0.35, NEAR, false);
    CutSite s = only(List.of(wire, branch));
    assertEquals(1, s.priority());
    assertEquals("contact", s.zone());
    assertEquals(0.02, s.minClearanceM(), MICRO_M, "the zone's governing distance");
    assertEquals(100.1, s.x(), EXACT);
    assertEquals(0.25, s.y(), EXACT);
  }

  @Test
  void aClumpOfTouchedWirePointsOnlyIsNeverDropped() {
    EncroachingPoint a = point(100, 0, 20.02, 0.02, CONTACT, true);
    EncroachingPoint b = point(100.5, 0, 20.01, 0.01, CONTACT, true);
    CutSite s = only(List.of(a, b));
    assertEquals(1, s.priority());
    assertEquals(100.5, s.x(), EXACT);
    assertEquals(0.01, s.minClearanceM(), MICRO_M);
  }

  @Test
  void withoutTouchedPointsTheDeepestPointGoverns() {
    EncroachingPoint a = point(100, 0.2, 20.02, 0.2, CONTACT, false);
    EncroachingPoint b = point(100.5, 0.1, 20.01, 0.1, CONTACT, false);
    CutSite s = only(List.of(a, b));
    assertEquals(100.5, s.x(), EXACT);
    assertEquals(2, s.points().getAsInt());
  }
}
