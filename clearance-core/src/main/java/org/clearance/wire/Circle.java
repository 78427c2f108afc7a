package org.clearance.wire;

import java.util.List;

/**
 * Algebraic circle fit in plan (package-private): Kasa's least-squares fit of
 * x^2 + y^2 + D x + E y + F = 0 (I. Kasa, "A circle fitting procedure and its error analysis",
 * IEEE Trans. Instrum. Meas. 25 (1976) 8-14). Coordinates are centred on their mean first so
 * that survey eastings of hundreds of kilometres lose no precision.
 */
final class Circle {

  private Circle() {}

  /**
   * The circle through the points (x, y in the first two entries, m): centre x, y and radius,
   * m; null for fewer than 3 points or points on a line.
   */
  static double[] fit(List<double[]> points) {
    int n = points.size();
    if (n < 3) {
      return null;
    }
    double mx = 0;
    double my = 0;
    for (double[] p : points) {
      mx += p[0] / n;
      my += p[1] / n;
    }
    // normal equations of [u v 1] [D E F]^T = -(u^2 + v^2)
    double[][] a = new double[3][4];
    for (double[] p : points) {
      double u = p[0] - mx;
      double v = p[1] - my;
      double[] row = {u, v, 1};
      double rhs = -(u * u + v * v);
      for (int i = 0; i < 3; i++) {
        for (int j = 0; j < 3; j++) {
          a[i][j] += row[i] * row[j];
        }
        a[i][3] += row[i] * rhs;
      }
    }
    double[] sol = solve(a);
    if (sol == null) {
      return null;
    }
    double cu = -sol[0] / 2;
    double cv = -sol[1] / 2;
    double r2 = cu * cu + cv * cv - sol[2];
    if (!(r2 > 0)) {
      return null;
    }
    return new double[] {mx + cu, my + cv, Math.sqrt(r2)};
  }

  /**
   * The circle of radius at most {@code maxR}, m, that most points lie on within {@code tol}, m:
   * every three points propose a circle (consensus as in RANSAC, Fischler and Bolles 1981, tried
   * exhaustively), the one with most points on it (ties: the least summed residual) is refitted
   * to those points. Null when no circle has at least {@code least} points on it.
   */
  static double[] robust(List<double[]> points, double maxR, double tol, int least) {
    int n = points.size();
    double[] best = null;
    int bestCount = 0;
    double bestSum = Double.POSITIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        for (int k = j + 1; k < n; k++) {
          double[] c = fit(List.of(points.get(i), points.get(j), points.get(k)));
          if (c == null || c[2] > maxR) {
            continue;
          }
          int count = 0;
          double sum = 0;
          for (double[] p : points) {
            double r = Math.abs(Math.hypot(p[0] - c[0], p[1] - c[1]) - c[2]);
            if (r <= tol) {
              count++;
              sum += r;
            }
          }
          if (count > bestCount || count == bestCount && sum < bestSum) {
            best = c;
            bestCount = count;
            bestSum = sum;
          }
        }
      }
    }
    if (best == null || bestCount < least) {
      return null;
    }
    double[] c = best;
    List<double[]> on = points.stream()
        .filter(p -> Math.abs(Math.hypot(p[0] - c[0], p[1] - c[1]) - c[2]) <= tol).toList();
    double[] refit = fit(on);
    return refit != null && refit[2] <= maxR ? refit : best;
  }

  /** Gaussian elimination with partial pivoting of a 3 x 4 augmented matrix; null if singular. */
  private static double[] solve(double[][] a) {
    for (int c = 0; c < 3; c++) {
      int piv = c;
      for (int r = c + 1; r < 3; r++) {
        if (Math.abs(a[r][c]) > Math.abs(a[piv][c])) {
          piv = r;
        }
      }
      if (Math.abs(a[piv][c]) < 1e-12) {
        return null;
      }
      double[] t = a[c];
      a[c] = a[piv];
      a[piv] = t;
      for (int r = 0; r < 3; r++) {
        if (r != c) {
          double f = a[r][c] / a[c][c];
          for (int k = c; k < 4; k++) {
            a[r][k] -= f * a[c][k];
          }
        }
      }
    }
    return new double[] {a[0][3] / a[0][0], a[1][3] / a[1][1], a[2][3] / a[2][2]};
  }
}
