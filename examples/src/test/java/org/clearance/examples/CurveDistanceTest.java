package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

class CurveDistanceTest {

  /** Brute force: the curve sampled every 1 cm, then the best sample refined by ternary search. */
  private static double bruteForce(ConductorCurve c, double x, double y, double z) {
    double step = 0.01;
    double bestS = 0;
    double best = Double.POSITIVE_INFINITY;
    for (double s = 0; s <= c.length(); s += step) {
      double d = dist(c, s, x, y, z);
      if (d < best) {
        best = d;
        bestS = s;
      }
    }
    double lo = Math.max(0, bestS - step);
    double hi = Math.min(c.length(), bestS + step);
    for (int i = 0; i < 100; i++) {
      double m1 = lo + (hi - lo) / 3;
      double m2 = hi - (hi - lo) / 3;
      if (dist(c, m1, x, y, z) < dist(c, m2, x, y, z)) {
        hi = m2;
      } else {
        lo = m1;
      }
    }
    return Math.min(Math.min(best, dist(c, 0.5 * (lo + hi), x, y, z)),
        Math.min(dist(c, 0, x, y, z), dist(c, c.length(), x, y, z)));
  }

  private static double dist(ConductorCurve c, double s, double x, double y, double z) {
    return Math.sqrt(Math.pow(c.x(s) - x, 2) + Math.pow(c.y(s) - y, 2) + Math.pow(c.z(s) - z, 2));
  }

  @Test
  void pointBelowTheVertexOfALevelSpanIsItsDepthAway() {
    // Geometry (common practice, no source): at the vertex of a level span the curve is
    // horizontal and its radius of curvature c is far larger than the depth, so the nearest point
    // is the vertex.
    SpanFrame plan = SpanFrame.between(1000, 2000, 1300, 2000);
    ConductorCurve c = new ConductorCurve(plan, Catenary.through(0, 50, 300, 50, 1753.812));
    double zv = c.z(150);
    assertEquals(4.0, CurveDistance.distance(c, 1150, 2000, zv - 4.0), 1e-9);
    // Beyond the end: the distance to the attachment.
    assertEquals(Math.hypot(10, 3), CurveDistance.distance(c, 990, 2000, 53), 1e-9);
  }

  @Test
  void newtonAgreesWithBruteForceOnAnInclinedSpan() {
    // check-values.md section 2 inclined case: S = 300 m, far support 30 m higher, C = 1753.812 m.
    SpanFrame plan = SpanFrame.between(0, 0, 240, 180);
    ConductorCurve c = new ConductorCurve(plan, Catenary.through(0, 100, 300, 130, 1753.812));
    SplittableRandom rng = new SplittableRandom(5);
    for (int k = 0; k < 40; k++) {
      double s = rng.nextDouble(-20, 320);
      double e = rng.nextDouble(-15, 15);
      double x = plan.x(s, e);
      double y = plan.y(s, e);
      double z = c.z(Math.max(0, Math.min(300, s))) + rng.nextDouble(-20, 8);
      assertEquals(bruteForce(c, x, y, z), CurveDistance.distance(c, x, y, z), 1e-6);
    }
  }
}
