package org.clearance.wire;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * The common sag shape of a span's closely spaced wires, as a reference profile for clustering
 * (package-private; issue 15). The wires of one distribution span hang nearly parallel (same
 * span, similar tension): a parabola in station fitted to all seed points through the middle of
 * the framing follows each of them up to a constant. Taking elevations relative to it keeps the
 * steep ends of stacked conductors from linking diagonally to the conductor below, which a
 * station-stretched metric otherwise does where a wire drops by the stack spacing within the
 * along-span reach.
 *
 * <p>Least squares (a parabola is the catenary to second order; methods.md 1.2), refitted
 * {@link #PASSES} times without the points beyond {@link #TRIM_SIGMAS} robust standard
 * deviations (1.4826 MAD) of the residuals, at least {@link #MIN_CUT_M}: stray vegetation seeds
 * do not bend it. A fit that does not sag (curvature below zero) or has too few points leaves
 * elevations as they are.
 */
final class SagReference {

  /** Refits after trimming. */
  static final int PASSES = 3;
  /** Residual cut in robust standard deviations. */
  static final double TRIM_SIGMAS = 3.0;
  /** Smallest residual cut, m: the height of a distribution framing with its neutral and
   * secondaries (common practice, no source). */
  static final double MIN_CUT_M = 2.5;
  /** Fewest seeds for a fit. */
  static final int MIN_POINTS = 20;

  private SagReference() {}

  /** The reference profile of the seeds, or zero when none can be fitted. */
  static DoubleUnaryOperator of(SpanPoints p, int[] seeds, double lengthM) {
    if (seeds.length < MIN_POINTS || !(lengthM > 0)) {
      return s -> 0;
    }
    boolean[] use = new boolean[seeds.length];
    Arrays.fill(use, true);
    double[] coef = null;
    for (int pass = 0; pass <= PASSES; pass++) {
      double[] c = fit(p, seeds, use, lengthM);
      if (c == null) {
        break;
      }
      coef = c;
      double[] res = new double[seeds.length];
      for (int k = 0; k < seeds.length; k++) {
        res[k] = Math.abs(p.z(seeds[k]) - eval(c, p.s(seeds[k]) / lengthM));
      }
      double[] sorted = res.clone();
      Arrays.sort(sorted);
      double cut = Math.max(MIN_CUT_M, TRIM_SIGMAS * 1.4826 * sorted[sorted.length / 2]);
      for (int k = 0; k < seeds.length; k++) {
        use[k] = res[k] <= cut;
      }
    }
    if (coef == null || coef[2] < 0) {
      return s -> 0;
    }
    double[] c = coef;
    return s -> eval(c, s / lengthM);
  }

  private static double eval(double[] c, double t) {
    return c[0] + t * (c[1] + t * c[2]);
  }

  /** Least squares z = c0 + c1 t + c2 t^2 over the used seeds, t = s / L; null if singular. */
  private static double[] fit(SpanPoints p, int[] seeds, boolean[] use, double lengthM) {
    double[][] a = new double[3][4];
    int n = 0;
    for (int k = 0; k < seeds.length; k++) {
      if (!use[k]) {
        continue;
      }
      double t = p.s(seeds[k]) / lengthM;
      double[] row = {1, t, t * t};
      double z = p.z(seeds[k]);
      for (int i = 0; i < 3; i++) {
        for (int j = 0; j < 3; j++) {
          a[i][j] += row[i] * row[j];
        }
        a[i][3] += row[i] * z;
      }
      n++;
    }
    if (n < MIN_POINTS) {
      return null;
    }
    // Gauss-Jordan with partial pivoting on the 3 x 3 normal equations
    for (int col = 0; col < 3; col++) {
      int piv = col;
      for (int r = col + 1; r < 3; r++) {
        if (Math.abs(a[r][col]) > Math.abs(a[piv][col])) {
          piv = r;
        }
      }
      double[] tmp = a[col];
      a[col] = a[piv];
      a[piv] = tmp;
      if (Math.abs(a[col][col]) < 1e-12) {
        return null;
      }
      for (int r = 0; r < 3; r++) {
        if (r != col) {
          double f = a[r][col] / a[col][col];
          for (int j = col; j < 4; j++) {
            a[r][j] -= f * a[col][j];
          }
        }
      }
    }
    return new double[] {a[0][3] / a[0][0], a[1][3] / a[1][1], a[2][3] / a[2][2]};
  }
}
