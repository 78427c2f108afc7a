package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;

/** Plan line fitting (total least squares, robust option). */
class PlanLineFitterTest {

  @Test
  void exactPointsOnALine() {
    // Hand-checkable: points on y = 2 + 0.5 x; direction (2, 1)/sqrt(5), offset 0.
    double[] x = {0, 2, 4, 6, 8};
    double[] y = {2, 3, 4, 5, 6};
    PlanLine line = PlanLineFitter.fit(x, y).orElseThrow();
    assertEquals(2 / Math.sqrt(5), line.ux(), 1e-12);
    assertEquals(1 / Math.sqrt(5), line.uy(), 1e-12);
    assertEquals(0, line.rmsLateral(), 1e-12);
    assertEquals(0, line.offset(10, 7), 1e-12);
    // (-1, 4) = (0, 2) + sqrt(5) n with n = (-1, 2) / sqrt(5): sqrt(5) to the left
    assertEquals(Math.sqrt(5), line.offset(-1, 4), 1e-12);
    assertEquals(5, line.inliers().count());
  }

  @Test
  void matchesPrincipalAxisOfReferenceLibrary() {
    // Reference library: commons-math3 EigenDecomposition of the 2 x 2 covariance.
    Random r = new Random(3);
    int n = 200;
    double[] x = new double[n];
    double[] y = new double[n];
    for (int i = 0; i < n; i++) {
      double t = 300 * r.nextDouble();
      x[i] = 512_000 + 0.8 * t + 0.05 * r.nextGaussian();
      y[i] = 4_100_000 + 0.6 * t + 0.05 * r.nextGaussian();
    }
    PlanLine line = new PlanLineFitter(new PlanLineFitter.Options(false)).fitPoints(x, y)
        .orElseThrow();
    double mx = 0;
    double my = 0;
    for (int i = 0; i < n; i++) {
      mx += x[i] / n;
      my += y[i] / n;
    }
    double[][] cov = new double[2][2];
    for (int i = 0; i < n; i++) {
      cov[0][0] += (x[i] - mx) * (x[i] - mx);
      cov[0][1] += (x[i] - mx) * (y[i] - my);
      cov[1][1] += (y[i] - my) * (y[i] - my);
    }
    cov[1][0] = cov[0][1];
    EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(cov));
    int major = eig.getRealEigenvalue(0) >= eig.getRealEigenvalue(1) ? 0 : 1;
    double[] v = eig.getEigenvector(major).toArray();
    assertEquals(1, Math.abs(v[0] * line.ux() + v[1] * line.uy()), 1e-12);
    assertEquals(mx, line.pointX(), 1e-6);
    assertEquals(my, line.pointY(), 1e-6);
    assertEquals(0.05, line.rmsLateral(), 0.01);
  }

  @Test
  void robustAgainstThirtyPercentOutliers() {
    Random r = new Random(5);
    int n = 300;
    double[] x = new double[n];
    double[] y = new double[n];
    for (int i = 0; i < n; i++) {
      double t = 250 * r.nextDouble();
      x[i] = t;
      y[i] = 3 + 0.03 * r.nextGaussian();
      if (i % 10 < 3) {
        y[i] += 1 + 6 * r.nextDouble(); // a hedge row on one side
      }
    }
    PlanLine line = PlanLineFitter.fit(x, y).orElseThrow();
    SpanFrame frame = SpanFrame.between(0, 0, 250, 0);
    assertEquals(3, line.offsetAt(frame, 0), 0.01);
    assertEquals(3, line.offsetAt(frame, 250), 0.01);
    assertEquals(0, line.orientedAlong(1, 0).angleTo(frame), 1e-4);
    assertEquals(210, line.inliers().count(), 3);
    PlanLine plain = new PlanLineFitter(new PlanLineFitter.Options(false)).fitPoints(x, y)
        .orElseThrow();
    assertTrue(Math.abs(plain.offsetAt(frame, 125) - 3) > 0.5); // what the robust option avoids
  }

  @Test
  void orientationFollowsInputOrder() {
    PlanLine line = PlanLineFitter.fit(new double[] {10, 5, 0}, new double[] {0, 0, 0})
        .orElseThrow();
    assertEquals(-1, line.ux(), 1e-12);
    assertEquals(3 * Math.PI / 2, line.azimuth(), 1e-12); // pointing west
  }

  @Test
  void offsetInSkewFrame() {
    // Line x = 5 (north-going) in a frame running east from the origin: at station 5 the
    // cross-section is the line itself (NaN); frame rotated 45 degrees: hand computation.
    PlanLine line = PlanLineFitter.fit(new double[] {5, 5, 5}, new double[] {0, 1, 2})
        .orElseThrow();
    assertTrue(Double.isNaN(line.offsetAt(SpanFrame.between(0, 0, 10, 0), 5)));
    SpanFrame diag = SpanFrame.between(0, 0, 10, 10);
    // cross-section at station 0 is the line y = -x: meets x = 5 at (5, -5), offset -sqrt(50)
    assertEquals(-Math.sqrt(50), line.offsetAt(diag, 0), 1e-12);
    assertEquals(Math.PI / 4, line.angleTo(diag), 1e-12);
  }

  @Test
  void degenerateInputs() {
    assertFalse(PlanLineFitter.fit(new double[] {1}, new double[] {2}).isPresent());
    assertFalse(PlanLineFitter.fit(new double[] {1, 1}, new double[] {2, 2}).isPresent());
    assertFalse(PlanLineFitter.fit(new double[] {Double.NaN, 1}, new double[] {2, 2})
        .isPresent());
    assertThrows(IllegalArgumentException.class,
        () -> PlanLineFitter.fit(new double[2], new double[3]));
  }
}
