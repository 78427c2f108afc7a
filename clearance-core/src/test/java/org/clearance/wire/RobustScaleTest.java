package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.stat.descriptive.rank.Median;
import org.junit.jupiter.api.Test;

/** Robust scale, Tukey weights and the covariance record's propagation helpers. */
class RobustScaleTest {

  @Test
  void madByHand() {
    // {1, 2, 3, 4, 100}: median 3, absolute deviations {2, 1, 0, 1, 97}, their median 1
    double[] v = {1, 2, 3, 4, 100};
    assertEquals(3, RobustScale.median(v, 5), 0);
    assertEquals(1.4826, RobustScale.sigmaMad(v, 5), 1e-12);
  }

  @Test
  void medianIsTheSortedArraysMiddleBitForBit() {
    // Issue 12: the median is found by selection, not by a full sort; it must be the very value
    // the sort gave (ties, signed zeros, sorted and reversed runs, a tail of the array unused).
    Random r = new Random(12);
    for (int trial = 0; trial < 2000; trial++) {
      int n = 1 + r.nextInt(trial % 10 == 0 ? 3000 : 40);
      double[] v = new double[n + r.nextInt(3)];
      int kind = trial % 4;
      for (int i = 0; i < v.length; i++) {
        v[i] = switch (kind) {
          case 0 -> r.nextGaussian();
          case 1 -> r.nextInt(5) - 2 + (r.nextBoolean() ? 0.0 : -0.0);
          case 2 -> i;
          default -> -i * 0.5;
        };
      }
      double[] sorted = java.util.Arrays.copyOf(v, n);
      java.util.Arrays.sort(sorted);
      double expected = n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
      double[] before = v.clone();
      assertEquals(Double.doubleToRawLongBits(expected),
          Double.doubleToRawLongBits(RobustScale.median(v, n)), "trial " + trial + " n " + n);
      org.junit.jupiter.api.Assertions.assertArrayEquals(before, v);
    }
  }

  @Test
  void medianMatchesReferenceLibrary() {
    // Reference library: commons-math3 Median (average of the middle two for even n)
    Random r = new Random(4);
    for (int n : new int[] {1, 2, 7, 10, 101}) {
      double[] v = new double[n];
      for (int i = 0; i < n; i++) {
        v[i] = r.nextGaussian();
      }
      assertEquals(new Median().evaluate(v), RobustScale.median(v, n), 1e-15);
    }
  }

  @Test
  void madIsConsistentForNormalNoise() {
    // 1.4826 MAD estimates sigma of a normal sample (Rousseeuw and Croux 1993); 20 000 draws
    // of sigma 0.04: standard error about 1 %, tolerance 3 %.
    Random r = new Random(8);
    double[] v = new double[20_000];
    for (int i = 0; i < v.length; i++) {
      v[i] = 0.04 * r.nextGaussian();
    }
    assertEquals(0.04, RobustScale.sigmaMad(v, v.length), 0.0012);
  }

  @Test
  void tukeyWeights() {
    // w(u) = (1 - u^2)^2 inside the cut-off 4.685 sigma, 0 outside (Beaton and Tukey 1974)
    assertEquals(1, RobustScale.tukey(0, 0.05), 0);
    assertEquals(0.5625, RobustScale.tukey(0.5 * 4.685 * 0.05, 0.05), 1e-12);
    assertEquals(0, RobustScale.tukey(4.685 * 0.05, 0.05), 0);
    assertEquals(0, RobustScale.tukey(Double.NaN, 0.05), 0);
  }

  @Test
  void covariancePropagation() {
    CatenaryCovariance cov = new CatenaryCovariance(4, 0.01, 900, 0.02, 30, 0.5);
    assertEquals(cov.get(0, 2), cov.get(2, 0), 0);
    assertEquals(0.5, cov.get(1, 2), 0);
    // at the vertex dz/d(s0, z0, c) = (0, 1, 0): sigma of z is sigma of z0
    Catenary curve = new Catenary(100, 20, 1500);
    assertEquals(0.1, cov.sigmaZ(curve, 100), 1e-12);
    // a constant shift of z0 does not change the sag: only z0 uncertain gives sigma 0
    CatenaryCovariance onlyZ0 = new CatenaryCovariance(0, 0.01, 0, 0, 0, 0);
    assertEquals(0, onlyZ0.sigmaMidSpanSag(curve, 0, 300), 1e-12);
  }
}
