package org.clearance.wire;

import java.util.Arrays;

/**
 * Minimum-cost assignment of rows to columns of a square cost matrix: the Hungarian method
 * (Kuhn 1955, Naval Res. Logist. Q. 2:83; Munkres 1957, J. SIAM 5(1):32) in its O(n^3)
 * shortest-augmenting-path form with row and column potentials (package-private).
 */
final class Hungarian {

  private Hungarian() {}

  /**
   * Solves the assignment.
   *
   * @param cost square matrix, finite entries (use a large finite value for forbidden pairs)
   * @return for each row, the column assigned to it
   */
  static int[] solve(double[][] cost) {
    int n = cost.length;
    double[] u = new double[n + 1];
    double[] v = new double[n + 1];
    int[] colRow = new int[n + 1]; // 1-based row assigned to column j, 0 = none
    int[] way = new int[n + 1];
    for (int i = 1; i <= n; i++) {
      if (cost[i - 1].length != n) {
        throw new IllegalArgumentException("cost matrix must be square");
      }
      colRow[0] = i;
      int j0 = 0;
      double[] minv = new double[n + 1];
      Arrays.fill(minv, Double.POSITIVE_INFINITY);
      boolean[] used = new boolean[n + 1];
      do {
        used[j0] = true;
        int i0 = colRow[j0];
        double delta = Double.POSITIVE_INFINITY;
        int j1 = -1;
        for (int j = 1; j <= n; j++) {
          if (!used[j]) {
            double cur = cost[i0 - 1][j - 1] - u[i0] - v[j];
            if (cur < minv[j]) {
              minv[j] = cur;
              way[j] = j0;
            }
            if (minv[j] < delta) {
              delta = minv[j];
              j1 = j;
            }
          }
        }
        for (int j = 0; j <= n; j++) {
          if (used[j]) {
            u[colRow[j]] += delta;
            v[j] -= delta;
          } else {
            minv[j] -= delta;
          }
        }
        j0 = j1;
      } while (colRow[j0] != 0);
      do {
        int j1 = way[j0];
        colRow[j0] = colRow[j1];
        j0 = j1;
      } while (j0 != 0);
    }
    int[] rowCol = new int[n];
    for (int j = 1; j <= n; j++) {
      rowCol[colRow[j] - 1] = j - 1;
    }
    return rowCol;
  }
}
