package org.clearance.examples;

import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * True 3D distance from a point to a conductor curve between its attachments, by Newton's method
 * on the squared distance (docs/methods.md section 6.1), with the two attachment
 * points as candidates too.
 */
final class CurveDistance {
  /** Newton iterations: converges in 2-4 (methods.md 6.1); the cap only guards bad input. */
  private static final int MAX_ITERATIONS = 50;
  /** Station change below which Newton stops, m. */
  private static final double STATION_TOLERANCE_M = 1e-10;

  private CurveDistance() {}

  /**
   * Distance from (x, y, z) to the curve between stations 0 and its length, m.
   *
   * @param curve the conductor
   * @param x easting, m
   * @param y northing, m
   * @param z elevation, m
   */
  static double distance(ConductorCurve curve, double x, double y, double z) {
    SpanFrame f = curve.plan();
    Catenary k = curve.curve();
    double sq = f.station(x, y);
    double e = f.offset(x, y);
    double len = f.length();
    double s = Math.max(0, Math.min(len, sq));
    for (int i = 0; i < MAX_ITERATIONS; i++) {
      double t = (s - k.s0()) / k.c();
      double slope = Math.sinh(t);
      double dz = k.z(s) - z;
      double g = (s - sq) + dz * slope;
      double gp = 1 + slope * slope + dz * Math.cosh(t) / k.c();
      if (!(gp > 0)) {
        gp = 1 + slope * slope; // far above the curve: fall back to a gradient step
      }
      double next = Math.max(0, Math.min(len, s - g / gp));
      boolean done = Math.abs(next - s) < STATION_TOLERANCE_M;
      s = next;
      if (done) {
        break;
      }
    }
    double best = at(k, s, sq, e, z);
    best = Math.min(best, at(k, 0, sq, e, z));
    return Math.min(best, at(k, len, sq, e, z));
  }

  private static double at(Catenary k, double s, double sq, double e, double z) {
    double ds = s - sq;
    double dz = k.z(s) - z;
    return Math.sqrt(ds * ds + e * e + dz * dz);
  }
}
