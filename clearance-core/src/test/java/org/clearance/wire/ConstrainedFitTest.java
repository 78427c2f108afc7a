package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Fits with one or both attachments known (methods.md section 2.5). */
class ConstrainedFitTest {

  /** check-values.md section 2: c = H / w = 28000 / 15.9652 m [computed]. */
  private static final double C_DRAKE = 28_000 / 15.9652;

  @Test
  void bothAttachmentsExactData() {
    // check-values.md section 2 inclined span: exact points, c recovered, sag 6.4504 m
    Catenary truth = Catenary.through(0, 0, 300, 30, C_DRAKE);
    double[] s = {40, 100, 150, 220, 280};
    double[] z = new double[s.length];
    for (int i = 0; i < s.length; i++) {
      z[i] = truth.z(s[i]);
    }
    CatenaryFit fit = CatenaryFitter.fitThrough(s, z, 0, 0, 300, 30);
    assertTrue(fit.converged(), () -> fit.failure().toString());
    assertEquals(C_DRAKE, fit.curve().c(), 1e-5);
    assertEquals(6.4504, fit.curve().midSpanSag(0, 300), 1e-4);
    assertEquals(-24.878, fit.curve().s0(), 1e-3);
    assertEquals(CatenaryFit.Method.TWO_ATTACHMENTS, fit.method());
  }

  @Test
  void bothAttachmentsSinglePoint() {
    // One point fixes c when both ends are known.
    Catenary truth = Catenary.through(0, 10, 250, 20, 1300);
    CatenaryFit fit = CatenaryFitter.fitThrough(new double[] {120}, new double[] {truth.z(120)},
        0, 10, 250, 20);
    assertEquals(1300, fit.curve().c(), 1e-4);
    assertTrue(fit.covariance().isEmpty());
  }

  @ParameterizedTest
  @CsvSource({
      // seed, length, rise, c, outlier share
      "21, 300, 0, 1753.8, 0.0",
      "22, 350, 45, 1100, 0.1",
      "23, 220, -30, 2200, 0.2"})
  void bothAttachmentsNoisy(long seed, double length, double rise, double c, double out) {
    SyntheticWire w = SyntheticWire.of(seed, length, 40, 40 + rise, c, (int) length, 0.05, 0.95,
        0.04, out);
    CatenaryFit fit = CatenaryFitter.fitThrough(w.s, w.z, 0, 40, length, 40 + rise);
    assertTrue(fit.converged(), () -> fit.failure().toString());
    assertEquals(0, w.sagError(fit.curve()), 0.02);
    assertEquals(40, fit.curve().z(0), 1e-6);
    assertEquals(40 + rise, fit.curve().z(length), 1e-6);
    // rank-1 covariance: sigma of c finite and small against c
    assertTrue(fit.covariance().orElseThrow().sigmaC() < 0.01 * c);
  }

  @Test
  void bothAttachmentsWithPointsAboveChordFail() {
    // Points above the chord: only an infinitely taut wire comes near them. Regression: the
    // reweighting once rejected every point and reported "no point keeps weight" instead.
    double[] s = {50, 100, 150};
    double[] z = {12, 13, 12};
    CatenaryFit fit = CatenaryFitter.fitThrough(s, z, 0, 10, 200, 10);
    assertFalse(fit.converged(), () -> "fitted " + fit.catenary());
    assertTrue(fit.failure().orElseThrow().contains("physical range"), fit.failure()::get);
  }

  @Test
  void bothAttachmentsSigmaMatchesSpread() {
    // Monte Carlo check of the rank-1 covariance, as in CatenaryFitterTest (factor 1.25)
    int draws = 200;
    double sum = 0;
    double sumSq = 0;
    double sigma = 0;
    for (int k = 0; k < draws; k++) {
      SyntheticWire w = SyntheticWire.of(500 + k, 300, 0, 20, 1500, 100, 0.05, 0.95, 0.05, 0);
      CatenaryFit fit = CatenaryFitter.fitThrough(w.s, w.z, 0, 0, 300, 20);
      sum += fit.curve().c();
      sumSq += fit.curve().c() * fit.curve().c();
      sigma += fit.covariance().orElseThrow().sigmaC() / draws;
    }
    double mean = sum / draws;
    double sd = Math.sqrt((sumSq - draws * mean * mean) / (draws - 1));
    assertTrue(sd / sigma > 0.8 && sd / sigma < 1.25, "spread / sigma = " + sd / sigma);
  }

  @ParameterizedTest
  @CsvSource({
      "31, 300, 0, 1753.8",
      "32, 300, 40, 1000",
      "33, 260, -50, 1600"})
  void oneAttachmentRecoversOtherEnd(long seed, double length, double rise, double c) {
    SyntheticWire w = SyntheticWire.of(seed, length, 25, 25 + rise, c, (int) length, 0.03, 0.97,
        0.04, 0.05);
    CatenaryFit fit = CatenaryFitter.fitFrom(w.s, w.z, 0, 25);
    assertTrue(fit.converged(), () -> fit.failure().toString());
    assertEquals(CatenaryFit.Method.ONE_ATTACHMENT, fit.method());
    assertEquals(25, fit.curve().z(0), 1e-6);
    assertEquals(25 + rise, fit.curve().z(length), 0.15); // attachment target
    assertEquals(0, w.sagError(fit.curve()), 0.05); // sag target
    assertTrue(fit.covariance().isPresent());
  }

  @Test
  void oneAttachmentNeedsTwoStations() {
    CatenaryFit fit = CatenaryFitter.fitFrom(new double[] {50}, new double[] {3}, 0, 10);
    assertTrue(fit.failure().orElseThrow().contains("at least 2 points"));
  }
}
