package org.clearance.wire;

import java.util.Arrays;

/**
 * Robust scale and weights for iteratively reweighted least squares (package-private).
 *
 * <p>Scale: sigma = 1.4826 MAD, the median absolute deviation made consistent with the standard
 * deviation of a normal distribution (Rousseeuw and Croux 1993, J. Amer. Statist. Assoc.
 * 88(424):1273). Weights: Tukey's biweight w(u) = (1 - u^2)^2 for |u| &lt; 1, u = r / (k sigma),
 * k = 4.685 for 95 % efficiency at the normal (Beaton and Tukey 1974, Technometrics 16(2):147;
 * docs/methods.md section 2.3).
 */
final class RobustScale {

  /** Consistency factor of the MAD at the normal distribution, 1 / Phi^-1(3/4). */
  static final double MAD_TO_SIGMA = 1.4826;
  /** Tukey biweight tuning constant for 95 % asymptotic efficiency at the normal. */
  static final double TUKEY_K = 4.685;

  private RobustScale() {}

  /** Median of the first n values of v (v is not changed), NaN when n = 0. */
  static double median(double[] v, int n) {
    if (n == 0) {
      return Double.NaN;
    }
    double[] a = Arrays.copyOf(v, n);
    double upper = select(a, 0, n - 1, n / 2);
    if (n % 2 == 1) {
      return upper;
    }
    // After the selection every value left of n/2 is at most a[n/2]: the lower middle value is
    // their largest.
    double lower = a[0];
    for (int i = 1; i < n / 2; i++) {
      if (Double.compare(a[i], lower) > 0) {
        lower = a[i];
      }
    }
    return 0.5 * (lower + upper);
  }

  /**
   * The value a sort of {@code a[lo..hi]} would put at {@code k}, found by Hoare's selection
   * (Hoare 1961, Comm. ACM 4(7):321, "FIND"; linear time on average) in the order of
   * {@link Double#compare} (the order of {@link Arrays#sort(double[])}), so the result equals
   * the sorted array's element; leaves {@code a[lo..k-1] <= a[k] <= a[k+1..hi]}.
   */
  private static double select(double[] a, int lo, int hi, int k) {
    while (lo < hi) {
      // Median of three as the pivot: sorted or constant runs stay linear.
      int mid = (lo + hi) >>> 1;
      if (Double.compare(a[mid], a[lo]) < 0) {
        swap(a, mid, lo);
      }
      if (Double.compare(a[hi], a[lo]) < 0) {
        swap(a, hi, lo);
      }
      if (Double.compare(a[hi], a[mid]) < 0) {
        swap(a, hi, mid);
      }
      double pivot = a[mid];
      int i = lo;
      int j = hi;
      while (i <= j) {
        while (Double.compare(a[i], pivot) < 0) {
          i++;
        }
        while (Double.compare(a[j], pivot) > 0) {
          j--;
        }
        if (i <= j) {
          swap(a, i, j);
          i++;
          j--;
        }
      }
      if (k <= j) {
        hi = j;
      } else if (k >= i) {
        lo = i;
      } else {
        return a[k];
      }
    }
    return a[k];
  }

  private static void swap(double[] a, int i, int j) {
    double t = a[i];
    a[i] = a[j];
    a[j] = t;
  }

  /** 1.4826 times the median absolute deviation from the median of the first n values. */
  static double sigmaMad(double[] v, int n) {
    double m = median(v, n);
    double[] d = new double[n];
    for (int i = 0; i < n; i++) {
      d[i] = Math.abs(v[i] - m);
    }
    return MAD_TO_SIGMA * median(d, n);
  }

  /** Tukey biweight of residual r at scale sigma (cut-off TUKEY_K sigma), in [0, 1]. */
  static double tukey(double r, double sigma) {
    double u = r / (TUKEY_K * sigma);
    if (!(Math.abs(u) < 1)) {
      return 0;
    }
    double a = 1 - u * u;
    return a * a;
  }
}
