package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import java.util.function.LongFunction;
import org.junit.jupiter.api.Test;

/**
 * Accuracy of the free fit over many seeded random spans. Targets from the project's accuracy
 * goals (task brief, common practice, no source): mid-span sag within 5 cm and attachment
 * heights within 15 cm for 95 % of cases.
 */
class CatenaryFitterAccuracyTest {

  /** Mid-span sag error allowed at the 95th percentile, m (project accuracy target). */
  private static final double SAG_TARGET = 0.05;
  /** Attachment height error allowed at the 95th percentile, m (project accuracy target). */
  private static final double ATTACHMENT_TARGET = 0.15;
  private static final int CASES = 200;

  /** Random level, inclined and uplift spans, 3-5 cm noise, up to 10 % outliers. */
  private static SyntheticWire randomSpan(long seed) {
    Random r = new Random(seed);
    double length = 150 + 300 * r.nextDouble();
    double c = 800 + 1700 * r.nextDouble();
    double v = -40 + 80 * r.nextDouble();
    double spacing = 0.5 + 1.5 * r.nextDouble();
    int n = (int) (length / spacing);
    double noise = 0.03 + 0.02 * r.nextDouble();
    double outliers = 0.10 * r.nextDouble();
    return SyntheticWire.of(seed * 7919, length, 30, 30 + v, c, n, 0.03, 0.97, noise, outliers);
  }

  /**
   * Half of the span missing (points only on the first half), 3-5 cm noise, one point per
   * {@code spacing} metres of the full span.
   */
  private static SyntheticWire halfSpan(long seed, double spacing) {
    Random r = new Random(seed);
    double length = 200 + 200 * r.nextDouble();
    double c = 1000 + 1500 * r.nextDouble();
    double v = -30 + 60 * r.nextDouble();
    int n = (int) (length / spacing);
    double noise = 0.03 + 0.02 * r.nextDouble();
    return SyntheticWire.of(seed * 104729, length, 30, 30 + v, c, n, 0.0, 0.5, noise, 0);
  }

  private static SyntheticWire outlierSpan(long seed, double share) {
    Random r = new Random(seed);
    double length = 200 + 200 * r.nextDouble();
    double c = 1000 + 1500 * r.nextDouble();
    double v = -30 + 60 * r.nextDouble();
    int n = (int) (length / 1.0);
    return SyntheticWire.of(seed * 15485863, length, 30, 30 + v, c, n, 0.03, 0.97, 0.04, share);
  }

  private static double[][] errors(LongFunction<SyntheticWire> cases, int count) {
    double[] sag = new double[count];
    double[] att = new double[count];
    for (int k = 0; k < count; k++) {
      SyntheticWire w = cases.apply(k + 1);
      CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
      assertTrue(fit.converged(), () -> "case failed: " + fit.failure());
      sag[k] = w.sagError(fit.curve());
      att[k] = w.attachmentError(fit.curve());
    }
    return new double[][] {sag, att};
  }

  private static double percentile95(double[] v) {
    double[] a = v.clone();
    Arrays.sort(a);
    return a[(int) Math.ceil(0.95 * a.length) - 1];
  }

  private static void report(String name, double[][] e) {
    System.out.printf(Locale.ROOT, "%s: p95 sag %.4f m, p95 attachment %.4f m, max %.4f / %.4f%n",
        name, percentile95(e[0]), percentile95(e[1]), Arrays.stream(e[0]).max().getAsDouble(),
        Arrays.stream(e[1]).max().getAsDouble());
  }

  @Test
  void randomSpansMeetTargets() {
    double[][] e = errors(CatenaryFitterAccuracyTest::randomSpan, CASES);
    report("random", e);
    assertTrue(percentile95(e[0]) <= SAG_TARGET, "p95 sag error " + percentile95(e[0]));
    assertTrue(percentile95(e[1]) <= ATTACHMENT_TARGET, "p95 att error " + percentile95(e[1]));
  }

  /**
   * Extrapolating over a missing half span needs density: at 2 points per metre of span (1 per
   * metre on the half observed) the targets hold. At half that density the sag error is ~5.5 cm
   * at the 95th percentile (measured), a limit of the data that the next test shows the reported
   * covariance knows about.
   */
  @Test
  void halfSpanMissingMeetsTargets() {
    double[][] e = errors(seed -> halfSpan(seed, 0.5), 100);
    report("half span", e);
    assertTrue(percentile95(e[0]) <= SAG_TARGET, "p95 sag error " + percentile95(e[0]));
    assertTrue(percentile95(e[1]) <= ATTACHMENT_TARGET, "p95 att error " + percentile95(e[1]));
  }

  /**
   * Sparse half span: sag errors scaled by the sigma the covariance reports behave like a
   * standard normal variable: 95th percentile of |error / sigma| near 1.96 (normal quantile,
   * common statistics); accepted within [1.3, 2.8].
   */
  @Test
  void halfSpanErrorsMatchReportedSigma() {
    double[] ratio = new double[100];
    for (int k = 0; k < ratio.length; k++) {
      SyntheticWire w = halfSpan(k + 1, 1.0);
      CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
      double sigma = fit.covariance().orElseThrow().sigmaMidSpanSag(fit.curve(), 0, w.length);
      ratio[k] = w.sagError(fit.curve()) / sigma;
    }
    double p95 = percentile95(ratio);
    System.out.printf(Locale.ROOT, "half span sparse: p95 |error/sigma| %.3f%n", p95);
    assertTrue(p95 > 1.3 && p95 < 2.8, "p95 of |error / sigma| " + p95);
  }

  @Test
  void twentyPercentOutliersMeetTargets() {
    double[][] e = errors(seed -> outlierSpan(seed, 0.2), 100);
    report("20 % outliers", e);
    assertTrue(percentile95(e[0]) <= SAG_TARGET, "p95 sag error " + percentile95(e[0]));
    assertTrue(percentile95(e[1]) <= ATTACHMENT_TARGET, "p95 att error " + percentile95(e[1]));
  }

  @Test
  void fiftyPercentOutliersMeetTargets() {
    double[][] e = errors(seed -> outlierSpan(seed, 0.5), 100);
    report("50 % outliers", e);
    assertTrue(percentile95(e[0]) <= SAG_TARGET, "p95 sag error " + percentile95(e[0]));
    assertTrue(percentile95(e[1]) <= ATTACHMENT_TARGET, "p95 att error " + percentile95(e[1]));
  }

  @Test
  void fiftyPercentOutliersTakeTheRansacPath() {
    SyntheticWire w = outlierSpan(11, 0.5);
    CatenaryFit fit = CatenaryFitter.fit(w.s, w.z);
    assertEquals(CatenaryFit.Method.RANSAC, fit.method());
    int wrong = 0;
    for (int i = 0; i < w.s.length; i++) {
      wrong += fit.inliers().contains(i) == w.outlier[i] ? 1 : 0;
    }
    // Outliers generated within a Tukey cut-off of the wire may be kept: allow 3 %.
    assertTrue(wrong <= 0.03 * w.s.length, "misclassified points: " + wrong);
  }
}
