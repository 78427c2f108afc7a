package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The Hungarian method against exhaustive enumeration of every assignment. */
class HungarianTest {

  /**
   * A 4 x 4 textbook-style case (from memory): rows 0-3 take columns 1, 0, 2, 3 for a total of
   * 2 + 6 + 1 + 4 = 13; the enumeration below confirms it is the minimum.
   */
  @Test
  void smallCase() {
    double[][] c = {{9, 2, 7, 8}, {6, 4, 3, 7}, {5, 8, 1, 8}, {7, 6, 9, 4}};
    int[] a = Hungarian.solve(c);
    assertArrayEquals(new int[] {1, 0, 2, 3}, a);
    assertEquals(13, total(c, a), 0);
    assertEquals(13, bruteForce(c), 0);
  }

  @Test
  void randomMatricesMatchEnumeration() {
    Random rnd = new Random(5);
    for (int trial = 0; trial < 300; trial++) {
      int n = 1 + rnd.nextInt(7);
      double[][] c = new double[n][n];
      for (double[] row : c) {
        for (int j = 0; j < n; j++) {
          row[j] = rnd.nextInt(4) == 0 ? 1e9 : 100 * rnd.nextDouble();
        }
      }
      int[] a = Hungarian.solve(c);
      boolean[] used = new boolean[n];
      for (int col : a) {
        used[col] = true;
      }
      for (boolean u : used) {
        assertEquals(true, u, "a permutation");
      }
      assertEquals(bruteForce(c), total(c, a), 1e-6, "trial " + trial);
    }
  }

  private static double total(double[][] c, int[] a) {
    double t = 0;
    for (int i = 0; i < a.length; i++) {
      t += c[i][a[i]];
    }
    return t;
  }

  private static double bruteForce(double[][] c) {
    return permute(c, 0, new boolean[c.length]);
  }

  private static double permute(double[][] c, int row, boolean[] used) {
    if (row == c.length) {
      return 0;
    }
    double best = Double.POSITIVE_INFINITY;
    for (int j = 0; j < c.length; j++) {
      if (!used[j]) {
        used[j] = true;
        best = Math.min(best, c[row][j] + permute(c, row + 1, used));
        used[j] = false;
      }
    }
    return best;
  }
}
