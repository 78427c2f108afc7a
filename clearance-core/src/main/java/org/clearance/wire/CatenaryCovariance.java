package org.clearance.wire;

import org.clearance.io.Hyperbolic;

/**
 * Covariance of the fitted catenary parameters (s0, z0, c), a symmetric 3x3 matrix stored as its
 * six distinct entries.
 *
 * <p>From least squares: Sigma = sigma0^2 (J^T W J)^-1 with sigma0^2 = r^T W r / (n - p)
 * (docs/methods.md section 2.3). Variances in m^2, covariances in m^2. Fits with
 * fewer free parameters (attachments known) give a singular matrix of rank 1 or 2: the fixed
 * directions carry no variance of their own, only what follows from the free ones.
 *
 * @param varS0 variance of the vertex station s0, m^2, &gt;= 0
 * @param varZ0 variance of the vertex elevation z0, m^2, &gt;= 0
 * @param varC variance of the catenary constant c, m^2, &gt;= 0
 * @param covS0Z0 covariance of s0 and z0, m^2
 * @param covS0C covariance of s0 and c, m^2
 * @param covZ0C covariance of z0 and c, m^2
 */
public record CatenaryCovariance(
    double varS0, double varZ0, double varC, double covS0Z0, double covS0C, double covZ0C) {

  public CatenaryCovariance {
    for (double v : new double[] {varS0, varZ0, varC, covS0Z0, covS0C, covZ0C}) {
      if (!Double.isFinite(v)) {
        throw new IllegalArgumentException("covariance entries must be finite: " + v);
      }
    }
    if (varS0 < 0 || varZ0 < 0 || varC < 0) {
      throw new IllegalArgumentException("variances must not be negative");
    }
  }

  /** The covariance from a symmetric 3x3 matrix in parameter order (s0, z0, c). */
  static CatenaryCovariance of(double[][] m) {
    return new CatenaryCovariance(Math.max(0, m[0][0]), Math.max(0, m[1][1]), Math.max(0, m[2][2]),
        0.5 * (m[0][1] + m[1][0]), 0.5 * (m[0][2] + m[2][0]), 0.5 * (m[1][2] + m[2][1]));
  }

  /** Standard deviation of s0, m. */
  public double sigmaS0() {
    return Math.sqrt(varS0);
  }

  /** Standard deviation of z0, m. */
  public double sigmaZ0() {
    return Math.sqrt(varZ0);
  }

  /** Standard deviation of c, m. */
  public double sigmaC() {
    return Math.sqrt(varC);
  }

  /**
   * Entry (i, j) of the matrix, indices 0 = s0, 1 = z0, 2 = c.
   *
   * @throws IndexOutOfBoundsException for an index outside 0..2
   */
  public double get(int i, int j) {
    if (i < 0 || i > 2 || j < 0 || j > 2) {
      throw new IndexOutOfBoundsException("index outside 0..2: " + i + ", " + j);
    }
    if (i == j) {
      return i == 0 ? varS0 : i == 1 ? varZ0 : varC;
    }
    int k = i + j; // 1 = (0,1), 2 = (0,2), 3 = (1,2)
    return k == 1 ? covS0Z0 : k == 2 ? covS0C : covZ0C;
  }

  /**
   * Standard deviation of the curve elevation z(s) at station s, m: first-order propagation
   * sqrt(g^T Sigma g) with g = dz/d(s0, z0, c) of {@code curve} at s (methods.md section 7.2).
   *
   * @param curve the fitted curve whose parameters this matrix describes
   * @param s station, m, finite
   */
  public double sigmaZ(Catenary curve, double s) {
    return sigmaOf(gradient(curve, s));
  }

  /**
   * Standard deviation of the mid-span sag below the chord between stations sA and sB, m:
   * sag = (z(sA) + z(sB)) / 2 - z((sA + sB) / 2), propagated to first order.
   *
   * @param curve the fitted curve whose parameters this matrix describes
   * @param sA station of attachment A, m; sB station of attachment B, m
   */
  public double sigmaMidSpanSag(Catenary curve, double sA, double sB) {
    double[] ga = gradient(curve, sA);
    double[] gb = gradient(curve, sB);
    double[] gm = gradient(curve, 0.5 * (sA + sB));
    double[] g = new double[3];
    for (int i = 0; i < 3; i++) {
      g[i] = 0.5 * (ga[i] + gb[i]) - gm[i];
    }
    return sigmaOf(g);
  }

  /** dz/d(s0, z0, c) of the curve at station s (methods.md section 2.3). */
  private static double[] gradient(Catenary curve, double s) {
    double t = (s - curve.s0()) / curve.c();
    return new double[] {-Hyperbolic.sinh(t), 1, Catenary.coshm1(t) - t * Hyperbolic.sinh(t)};
  }

  private double sigmaOf(double[] g) {
    double v = 0;
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        v += g[i] * get(i, j) * g[j];
      }
    }
    return Math.sqrt(Math.max(0, v));
  }
}
