package org.clearance.wire;

/**
 * Eigenvalues and the principal eigenvector of a symmetric 3 x 3 matrix by cyclic Jacobi
 * rotations (Golub and Van Loan, Matrix Computations, 4th ed., section 8.5) 
 */
public final class Eigen3 {

  /** Sweeps at most; a 3 x 3 matrix converges to double precision in 4-6. */
  static final int MAX_SWEEPS = 30;
  /** Off-diagonal mass, relative to the diagonal, below which the matrix counts as diagonal. */
  static final double DIAGONAL_ENOUGH = 1e-24;

  /** Eigenvalues l1 &gt;= l2 &gt;= l3 and the unit eigenvector (v1x, v1y, v1z) of l1. */
  public record Result(double l1, double l2, double l3, double v1x, double v1y, double v1z) {}

  private Eigen3() {}

  /**
   * Decomposes the symmetric matrix [[a, b, c], [b, d, e], [c, e, f]].
   *
   * @return eigenvalues sorted from largest and the principal direction
   */
  public static Result symmetric(double a, double b, double c, double d, double e, double f) {
    // row-major m[3 * row + column] and v likewise: the same arithmetic, in the same order, as
    // two-dimensional arrays, without their row objects
    double[] m = {a, b, c, b, d, e, c, e, f};
    double[] v = {1, 0, 0, 0, 1, 0, 0, 0, 1};
    for (int sweep = 0; sweep < MAX_SWEEPS; sweep++) {
      double off = m[1] * m[1] + m[2] * m[2] + m[5] * m[5];
      double diag = m[0] * m[0] + m[4] * m[4] + m[8] * m[8];
      if (off <= DIAGONAL_ENOUGH * diag || off == 0) {
        break;
      }
      rotate(m, v, 0, 1);
      rotate(m, v, 0, 2);
      rotate(m, v, 1, 2);
    }
    int o0 = 0;
    int o1 = 1;
    int o2 = 2;
    // the three swaps of a selection sort from largest, as (i, j) = (0, 1), (0, 2), (1, 2)
    if (m[4 * o1] > m[4 * o0]) {
      int t = o0;
      o0 = o1;
      o1 = t;
    }
    if (m[4 * o2] > m[4 * o0]) {
      int t = o0;
      o0 = o2;
      o2 = t;
    }
    if (m[4 * o2] > m[4 * o1]) {
      int t = o1;
      o1 = o2;
      o2 = t;
    }
    return new Result(m[4 * o0], m[4 * o1], m[4 * o2], v[o0], v[3 + o0], v[6 + o0]);
  }

  /** One Jacobi rotation zeroing m[p][q]; accumulates the eigenvectors as columns of v. */
  private static void rotate(double[] m, double[] v, int p, int q) {
    double mpq = m[3 * p + q];
    if (mpq == 0) {
      return;
    }
    double theta = (m[4 * q] - m[4 * p]) / (2 * mpq);
    double t = Math.signum(theta) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
    if (theta == 0) {
      t = 1;
    }
    double cs = 1 / Math.sqrt(t * t + 1);
    double sn = t * cs;
    for (int k = 0; k < 9; k += 3) {
      double mkp = m[k + p];
      double mkq = m[k + q];
      m[k + p] = cs * mkp - sn * mkq;
      m[k + q] = sn * mkp + cs * mkq;
    }
    for (int k = 0; k < 3; k++) {
      double mpk = m[3 * p + k];
      double mqk = m[3 * q + k];
      m[3 * p + k] = cs * mpk - sn * mqk;
      m[3 * q + k] = sn * mpk + cs * mqk;
    }
    for (int k = 0; k < 9; k += 3) {
      double vkp = v[k + p];
      double vkq = v[k + q];
      v[k + p] = cs * vkp - sn * vkq;
      v[k + q] = sn * vkp + cs * vkq;
    }
  }
}
