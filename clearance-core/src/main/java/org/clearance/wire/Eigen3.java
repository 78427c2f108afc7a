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
    double[][] m = {{a, b, c}, {b, d, e}, {c, e, f}};
    double[][] v = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
    for (int sweep = 0; sweep < MAX_SWEEPS; sweep++) {
      double off = m[0][1] * m[0][1] + m[0][2] * m[0][2] + m[1][2] * m[1][2];
      double diag = m[0][0] * m[0][0] + m[1][1] * m[1][1] + m[2][2] * m[2][2];
      if (off <= DIAGONAL_ENOUGH * diag || off == 0) {
        break;
      }
      for (int p = 0; p < 2; p++) {
        for (int q = p + 1; q < 3; q++) {
          rotate(m, v, p, q);
        }
      }
    }
    int[] order = {0, 1, 2};
    for (int i = 0; i < 2; i++) {
      for (int j = i + 1; j < 3; j++) {
        if (m[order[j]][order[j]] > m[order[i]][order[i]]) {
          int t = order[i];
          order[i] = order[j];
          order[j] = t;
        }
      }
    }
    int k = order[0];
    return new Result(m[order[0]][order[0]], m[order[1]][order[1]], m[order[2]][order[2]],
        v[0][k], v[1][k], v[2][k]);
  }

  /** One Jacobi rotation zeroing m[p][q]; accumulates the eigenvectors as columns of v. */
  private static void rotate(double[][] m, double[][] v, int p, int q) {
    if (m[p][q] == 0) {
      return;
    }
    double theta = (m[q][q] - m[p][p]) / (2 * m[p][q]);
    double t = Math.signum(theta) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
    if (theta == 0) {
      t = 1;
    }
    double cs = 1 / Math.sqrt(t * t + 1);
    double sn = t * cs;
    for (int k = 0; k < 3; k++) {
      double mkp = m[k][p];
      double mkq = m[k][q];
      m[k][p] = cs * mkp - sn * mkq;
      m[k][q] = sn * mkp + cs * mkq;
    }
    for (int k = 0; k < 3; k++) {
      double mpk = m[p][k];
      double mqk = m[q][k];
      m[p][k] = cs * mpk - sn * mqk;
      m[q][k] = sn * mpk + cs * mqk;
    }
    for (int k = 0; k < 3; k++) {
      double vkp = v[k][p];
      double vkq = v[k][q];
      v[k][p] = cs * vkp - sn * vkq;
      v[k][q] = sn * vkp + cs * vkq;
    }
  }
}
