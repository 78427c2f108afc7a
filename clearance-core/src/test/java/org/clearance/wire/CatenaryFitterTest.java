package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Free and constrained catenary fits on small, hand-checkable and seeded noisy spans. */
class CatenaryFitterTest {

  /** Drake-like level span of check-values.md section 2: c = 28000 / 15.9652 m [computed]. */
  private static final double C_DRAKE = 28_000 / 15.9652;
  /** Sag target, m (project accuracy goal, task brief). */
  private static final double SAG_TOL = 0.05;
  /** Attachment height target, m (project accuracy goal, task brief). */
  private static final double ATTACHMENT_TOL = 0.15;

  @Test
  void fivePointsExact() {
    // Tiny fixture: five exact points of the check-values.md level span (sag 6.4185 m).
    Catenary truth = Catenary.through(0, 50, 300, 50, C_DRAKE);
    double[] s = {0, 75, 150, 225, 300};
    double[] z = new double[5];
    for (int i = 0; i < 5; i++) {
      z[i] = truth.z(s[i]);
    }
    CatenaryFit fit = CatenaryFitter.fit(s, z);
    assertTrue(fit.converged());
    assertEquals(C_DRAKE, fit.curve().c(), 1e-6);
    assertEquals(150, fit.curve().s0(), 1e-7);
    assertEquals(6.4185, fit.curve().midSpanSag(0, 300), 1e-4);
    assertEquals(5, fit.inlierCount());
    assertEquals(0, fit.rmsResidual(), 1e-6);
    // Regression: Optional.map over a null bounds check once made every robust fit look failed,
    // so clean data went down the RANSAC path.
    assertEquals(CatenaryFit.Method.ROBUST, fit.method());
  }

  @Test
  void threePointsFitWithoutCovariance() {
    Catenary truth = Catenary.through(0, 0, 300, 30, C_DRAKE);
    double[] s = {10, 150, 290};
    double[] z = {truth.z(10), truth.z(150), truth.z(290)};
    CatenaryFit fit = CatenaryFitter.fit(s, z);
    assertTrue(fit.converged(), () -> fit.failure().toString());
    assertEquals(C_DRAKE, fit.curve().c(), 1e-4);
    assertTrue(fit.covariance().isEmpty()); // no redundancy: sigma0 undefined
  }

  /** Seeded noisy spans: level, inclined, uplift (vertex outside the span), steep uplift. */
  @ParameterizedTest
  @CsvSource({
      // seed, length m, zB - zA m, c m, noise m
      "1, 300, 0, 1753.8, 0.04",
      "2, 300, 30, 1753.8, 0.04",
      "3, 250, 60, 1200, 0.05",
      "4, 400, -80, 900, 0.03",
      "5, 180, 25, 2500, 0.05"})
  void recoversNoisySpan(long seed, double length, double rise, double c, double noise) {
    SyntheticWire w = SyntheticWire.of(seed, length, 20, 20 + rise, c, (int) length, 0.02, 0.98,
        noise, 0);
    CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
    assertTrue(fit.converged(), () -> fit.failure().toString());
    assertEquals(0, w.sagError(fit.curve()), SAG_TOL);
    assertEquals(0, w.attachmentError(fit.curve()), ATTACHMENT_TOL);
    assertEquals(noise, fit.rmsResidual(), 0.25 * noise);
    assertTrue(fit.inlierCount() >= 0.97 * w.s.length);
    assertTrue(fit.iterations() > 0);
  }

  @Test
  void upliftVertexFoundOutsideSpan() {
    // check-values.md section 2 inclined span: vertex 24.878 m beyond the lower support
    SyntheticWire w = SyntheticWire.of(6, 300, 0, 30, C_DRAKE, 400, 0, 1, 0.03, 0);
    CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
    assertEquals(-24.878, fit.curve().s0(), 3.0); // s0 is weakly determined: 3 m
    assertEquals(6.4504, fit.curve().midSpanSag(0, 300), SAG_TOL);
  }

  @ParameterizedTest
  @CsvSource({"1", "2"})
  void tooFewPointsFailCleanly(int n) {
    double[] s = new double[n];
    double[] z = new double[n];
    for (int i = 0; i < n; i++) {
      s[i] = 10 * i;
      z[i] = 5;
    }
    CatenaryFit fit = CatenaryFitter.fit(s, z);
    assertFalse(fit.converged());
    assertTrue(fit.failure().orElseThrow().contains("at least 3 points"));
    assertTrue(fit.catenary().isEmpty());
    assertTrue(Double.isNaN(fit.rmsResidual()));
    assertEquals(n, fit.pointCount());
    assertEquals(0, fit.inlierCount());
    assertThrows(IllegalStateException.class, fit::curve);
  }

  @Test
  void sameStationFails() {
    CatenaryFit fit = CatenaryFitter.fit(new double[] {5, 5, 5, 5}, new double[] {1, 2, 3, 4});
    assertTrue(fit.failure().orElseThrow().contains("distinct stations"));
  }

  @Test
  void straightLineFailsOnBounds() {
    // A taut straight line has no finite c; whatever the path, the result must be a failure.
    double[] s = new double[50];
    double[] z = new double[50];
    Random r = new Random(9);
    for (int i = 0; i < 50; i++) {
      s[i] = 6 * i;
      z[i] = 10 + 0.1 * s[i] + 0.001 * r.nextGaussian();
    }
    CatenaryFit fit = CatenaryFitter.fit(s, z);
    assertFalse(fit.converged(), () -> "fitted " + fit.catenary());
  }

  @Test
  void archFails() {
    // Points on a downward-opening curve (a hill) are no hanging wire.
    double[] s = new double[40];
    double[] z = new double[40];
    for (int i = 0; i < 40; i++) {
      s[i] = 5 * i;
      z[i] = 30 - (s[i] - 100) * (s[i] - 100) / 2000;
    }
    assertFalse(CatenaryFitter.fit(s, z).converged());
  }

  @Test
  void nonFiniteCoordinatesAreIgnored() {
    SyntheticWire w = SyntheticWire.of(7, 300, 10, 20, 1500, 300, 0, 1, 0.04, 0);
    w.z[3] = Double.NaN;
    w.s[8] = Double.POSITIVE_INFINITY;
    CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
    assertTrue(fit.converged());
    assertFalse(fit.inliers().contains(3));
    assertFalse(fit.inliers().contains(8));
    assertEquals(0, w.sagError(fit.curve()), SAG_TOL);
  }

  @Test
  void mismatchedArraysAreAProgrammingError() {
    assertThrows(IllegalArgumentException.class,
        () -> CatenaryFitter.fit(new double[3], new double[4]));
    assertThrows(IllegalArgumentException.class,
        () -> CatenaryFitter.fitThrough(new double[3], new double[3], 10, 0, 5, 0));
    assertThrows(IllegalArgumentException.class,
        () -> CatenaryFitter.fitFrom(new double[3], new double[3], Double.NaN, 0));
  }

  @Test
  void twentyPercentOutliersAreFlagged() {
    SyntheticWire w = SyntheticWire.of(8, 320, 15, 35, 1400, 320, 0.02, 0.98, 0.04, 0.2);
    CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
    int missed = 0;
    for (int i = 0; i < w.s.length; i++) {
      missed += w.outlier[i] && fit.inliers().contains(i) ? 1 : 0;
    }
    assertTrue(missed <= 0.02 * w.s.length, "outliers kept: " + missed);
    assertEquals(0, w.sagError(fit.curve()), SAG_TOL);
  }

  @Test
  void deterministicForSameInput() {
    SyntheticWire w = SyntheticWire.of(12, 300, 0, 10, 1500, 300, 0, 1, 0.04, 0.5);
    assertEquals(CatenaryFitter.fit(w.s, w.z), CatenaryFitter.fit(w.s, w.z));
  }

  @Test
  void reportedSigmaOfCMatchesSpreadOverNoiseDraws() {
    // Monte Carlo check of sigma0^2 (J^T W J)^-1 (methods.md section 2.3): the spread of c over
    // 300 noise draws against the mean reported sigma, within a factor 1.25 (the spread of a
    // standard deviation estimated from 300 draws is about 4 %, statistics, common practice).
    int draws = 300;
    double[] c = new double[draws];
    double sigmaSum = 0;
    for (int k = 0; k < draws; k++) {
      SyntheticWire w = SyntheticWire.of(1000 + k, 300, 20, 35, C_DRAKE, 150, 0.02, 0.98, 0.05, 0);
      CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
      c[k] = fit.curve().c();
      sigmaSum += fit.covariance().orElseThrow().sigmaC();
    }
    double mean = 0;
    for (double v : c) {
      mean += v / draws;
    }
    double var = 0;
    for (double v : c) {
      var += (v - mean) * (v - mean) / (draws - 1);
    }
    double ratio = Math.sqrt(var) / (sigmaSum / draws);
    assertTrue(ratio > 0.8 && ratio < 1.25, "spread / reported sigma = " + ratio);
  }
}
