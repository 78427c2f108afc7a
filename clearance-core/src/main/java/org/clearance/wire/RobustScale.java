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
    Arrays.sort(a);
    return n % 2 == 1 ? a[n / 2] : 0.5 * (a[n / 2 - 1] + a[n / 2]);
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
