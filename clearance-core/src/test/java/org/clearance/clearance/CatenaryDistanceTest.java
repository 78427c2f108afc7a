package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.geometry.euclidean.threed.Rotation;
import org.apache.commons.math3.geometry.euclidean.threed.RotationConvention;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Point-to-conductor distance against brute-force dense sampling of the curve (1 mm spacing,
 * whose own error is below 0.5 mm) and hand-checkable cases.
 */
class CatenaryDistanceTest {

  /** Required accuracy of the kernel, m (task brief: exact to 1 mm). */
  private static final double EXACT = 0.001;
  /** Brute-force sample spacing along the curve, m. */
  private static final double SAMPLE = 0.001;

  /** A conductor from A = (x0, y0) along azimuth-ish direction (dx, dy) with the given ends. */
  private static ConductorCurve conductor(double length, double zA, double zB, double c,
      double angle) {
    double x0 = 512_300.0;
    double y0 = 4_180_200.0;
    SpanFrame plan = SpanFrame.between(x0, y0, x0 + length * Math.cos(angle),
        y0 + length * Math.sin(angle));
    return new ConductorCurve(plan, Catenary.through(0, zA, plan.length(), zB, c));
  }

  /** Brute force: smallest distance to curve points sampled every SAMPLE metres of station. */
  private static double bruteForce(ConductorCurve w, double x, double y, double z) {
    int n = (int) Math.ceil(w.length() / SAMPLE);
    double best = Double.POSITIVE_INFINITY;
    for (int i = 0; i <= n; i++) {
      double s = Math.min(w.length(), i * SAMPLE);
      double dx = w.x(s) - x;
      double dy = w.y(s) - y;
      double dz = w.z(s) - z;
      best = Math.min(best, dx * dx + dy * dy + dz * dz);
    }
    return Math.sqrt(best);
  }

  @ParameterizedTest
  @CsvSource({
      // length m, zA m, zB m, c m, plan angle rad, seed
      "300, 40, 40, 1753.8, 0.3, 1", // level span of check-values.md section 2
      "300, 40, 70, 1753.8, 2.1, 2", // inclined span, vertex outside the span
      "250, 30, 90, 600, -1.0, 3", // steep uplift
      "120, 20, 25, 150, 4.0, 4"}) // short slack span
  void matchesBruteForce(double length, double zA, double zB, double c, double angle,
      long seed) {
    ConductorCurve w = conductor(length, zA, zB, c, angle);
    CatenaryDistance kernel = new CatenaryDistance(w);
    Random r = new Random(seed);
    for (int k = 0; k < 24; k++) {
      double s = -30 + (length + 60) * r.nextDouble(); // includes beyond both ends
      double e = (k % 3 == 0 ? 40 : 6) * (2 * r.nextDouble() - 1); // near and far
      double dz = (k % 3 == 0 ? 40 : 6) * (2 * r.nextDouble() - 1);
      double sc = Math.min(length, Math.max(0, s));
      double x = w.plan().x(s, e);
      double y = w.plan().y(s, e);
      double z = w.z(sc) + dz;
      double expected = bruteForce(w, x, y, z);
      assertEquals(expected, kernel.distance(x, y, z), EXACT, "point " + k);
      ConductorDistance d = kernel.closest(x, y, z);
      assertEquals(kernel.distance(x, y, z), d.distance(), 1e-12);
      assertEquals(d.distance() * d.distance(),
          d.horizontal() * d.horizontal() + d.vertical() * d.vertical(), 1e-6);
      assertEquals(w.z(d.station()), d.closestZ(), 1e-9);
      assertEquals(w.x(d.station()), d.closestX(), 1e-6);
    }
  }

  @Test
  void pointHighAboveTightCurveUsesScan() {
    // Non-convex case: a point more than c above the vertex of a tight curve (c = 25 m).
    ConductorCurve w = conductor(80, 60, 60, 25, 0.7);
    CatenaryDistance kernel = new CatenaryDistance(w);
    double vertexZ = w.curve().z0();
    Random r = new Random(7);
    for (int k = 0; k < 20; k++) {
      double s = 80 * r.nextDouble();
      double x = w.plan().x(s, 3 * r.nextGaussian());
      double y = w.plan().y(s, 0);
      double z = vertexZ + 26 + 30 * r.nextDouble();
      assertEquals(bruteForce(w, x, y, z), kernel.distance(x, y, z), EXACT, "point " + k);
    }
  }

  @Test
  void handCheckableCases() {
    ConductorCurve w = conductor(300, 40, 40, 1753.8, 0);
    double bottom = w.z(150);
    // 10 m straight below mid-span: distance 10, station 150, all vertical
    ConductorDistance below = CatenaryDistance.between(w, w.x(150), w.y(150), bottom - 10);
    assertEquals(10, below.distance(), 1e-9);
    assertEquals(150, below.station(), 1e-6);
    assertEquals(-10, below.vertical(), 1e-9);
    assertEquals(0, below.horizontal(), 1e-9);
    // 3 m to the side at the conductor's height: all horizontal
    ConductorDistance side = CatenaryDistance.between(w, w.plan().x(150, 3), w.plan().y(150, 3),
        bottom);
    assertEquals(3, side.distance(), 1e-9);
    assertEquals(3, side.horizontal(), 1e-9);
    // beyond attachment A on the line's axis: the attachment is closest
    ConductorDistance beyond = CatenaryDistance.between(w, w.plan().x(-4, 0),
        w.plan().y(-4, 0), 43);
    assertEquals(5, beyond.distance(), 1e-9); // 3-4-5 triangle
    assertEquals(0, beyond.station(), 0);
  }

  @Test
  void swingGeometryCheckValue() {
    // check-values.md section 2 [computed]: sag 5 m swung 30 deg about the chord moves the
    // bottom 2.5000 m sideways and raises it 0.6699 m.
    SpanFrame plan = SpanFrame.between(0, 0, 250, 0);
    ConductorCurve w = new ConductorCurve(plan, Catenary.withMidSpanSag(0, 30, 250, 30, 5));
    CatenaryDistance kernel = new CatenaryDistance(w);
    double phi = Math.toRadians(30);
    ConductorDistance d = kernel.closest(125, 0, 25, phi); // from the hanging bottom
    assertEquals(125, d.station(), 1e-6);
    assertEquals(2.5000, d.closestY(), 1e-4);
    assertEquals(0.6699, d.closestZ() - 25, 1e-4);
    assertEquals(2.5000, d.horizontal(), 1e-4);
    assertEquals(-0.6699, d.vertical(), 1e-4);
    // a point at the swung bottom touches the conductor swung +30 deg, not the one swung -30
    assertEquals(0, kernel.distance(125, 2.5, 30 - 5 * Math.cos(phi), phi), 1e-9);
    assertEquals(5.0, kernel.distance(125, 2.5, 30 - 5 * Math.cos(phi), -phi), 1e-3);
  }

  @ParameterizedTest
  @CsvSource({"0.35, 11", "-0.8, 12", "1.2, 13"})
  void swungMatchesRotatedSamples(double phi, long seed) {
    // Independent rotation: commons-math3 Rotation about the chord (right-handed, vector
    // operator) applied to sampled curve points, then brute force.
    ConductorCurve w = conductor(280, 35, 65, 1200, 0.9);
    CatenaryDistance kernel = new CatenaryDistance(w);
    Vector3D a = new Vector3D(w.x(0), w.y(0), w.zA());
    Vector3D b = new Vector3D(w.x(w.length()), w.y(w.length()), w.zB());
    Rotation rot = new Rotation(b.subtract(a), phi, RotationConvention.VECTOR_OPERATOR);
    int n = (int) Math.ceil(w.length() / SAMPLE);
    double[][] pts = new double[n + 1][];
    for (int i = 0; i <= n; i++) {
      double s = Math.min(w.length(), i * SAMPLE);
      Vector3D p = a.add(rot.applyTo(new Vector3D(w.x(s), w.y(s), w.z(s)).subtract(a)));
      pts[i] = new double[] {p.getX(), p.getY(), p.getZ()};
    }
    Random r = new Random(seed);
    for (int k = 0; k < 12; k++) {
      double s = -20 + 320 * r.nextDouble();
      double x = w.plan().x(s, 12 * (2 * r.nextDouble() - 1));
      double y = w.plan().y(s, 12 * (2 * r.nextDouble() - 1));
      double z = w.z(Math.min(w.length(), Math.max(0, s))) + 10 * (2 * r.nextDouble() - 1);
      double best = Double.POSITIVE_INFINITY;
      for (double[] p : pts) {
        double dx = p[0] - x;
        double dy = p[1] - y;
        double dz = p[2] - z;
        best = Math.min(best, dx * dx + dy * dy + dz * dz);
      }
      assertEquals(Math.sqrt(best), kernel.distance(x, y, z, phi), EXACT, "point " + k);
      ConductorDistance d = kernel.closest(x, y, z, phi);
      assertEquals(Math.sqrt(best), d.distance(), EXACT);
      assertEquals(phi, d.swingAngle(), 0);
    }
  }

  @Test
  void swingRangeMinimumMatchesDenseAngleSampling() {
    // The closed-form minimiser against 20 001 sampled angles (spacing < 1e-4 rad).
    ConductorCurve w = conductor(320, 30, 55, 900, -0.4);
    CatenaryDistance kernel = new CatenaryDistance(w);
    Random r = new Random(21);
    for (int k = 0; k < 40; k++) {
      double phiMax = Math.toRadians(10 + 70 * r.nextDouble());
      double s = -10 + 340 * r.nextDouble();
      double x = w.plan().x(s, 15 * (2 * r.nextDouble() - 1));
      double y = w.plan().y(s, 15 * (2 * r.nextDouble() - 1));
      double z = w.z(Math.min(w.length(), Math.max(0, s))) + 12 * (2 * r.nextDouble() - 1);
      double sampled = Double.POSITIVE_INFINITY;
      int steps = 20_000;
      for (int i = 0; i <= steps; i++) {
        double phi = -phiMax + 2 * phiMax * i / steps;
        sampled = Math.min(sampled, kernel.distance(x, y, z, phi));
      }
      double exact = kernel.minDistanceOverSwing(x, y, z, phiMax);
      assertTrue(exact <= sampled + 1e-12, "point " + k + ": closed form above sampling");
      assertEquals(sampled, exact, 1e-4, "point " + k);
      ConductorDistance d = kernel.closestOverSwing(x, y, z, phiMax);
      assertEquals(exact, d.distance(), 1e-12);
      assertTrue(Math.abs(d.swingAngle()) <= phiMax);
    }
  }

  @Test
  void distanceIsNotMonotoneInSwing() {
    // A point beside and below the wire: swinging towards it first closes, then opens the gap;
    // the range minimum lies inside the range.
    SpanFrame plan = SpanFrame.between(0, 0, 300, 0);
    ConductorCurve w = new ConductorCurve(plan, Catenary.withMidSpanSag(0, 30, 300, 30, 8));
    CatenaryDistance kernel = new CatenaryDistance(w);
    double phiMax = Math.toRadians(60);
    double best = kernel.closestSwingAngle(150, 4, 20, phiMax);
    assertTrue(best > 0 && best < phiMax);
    assertTrue(kernel.distance(150, 4, 20, best) < kernel.distance(150, 4, 20, 0));
    assertTrue(kernel.distance(150, 4, 20, best) < kernel.distance(150, 4, 20, phiMax));
  }

  @Test
  void badInputs() {
    ConductorCurve w = conductor(300, 40, 40, 1753.8, 0);
    CatenaryDistance kernel = new CatenaryDistance(w);
    assertTrue(Double.isNaN(kernel.distance(Double.NaN, 0, 0)));
    assertThrows(IllegalArgumentException.class, () -> kernel.closestSwingAngle(0, 0, 0, -0.1));
    assertThrows(IllegalArgumentException.class, () -> kernel.closestSwingAngle(0, 0, 0, 4));
  }
}
