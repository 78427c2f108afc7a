package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The primitive stable index sort gives the permutation of the JDK's stable object sort
 * ({@code Arrays.sort(Integer[], Comparator)}, TimSort) on keys with many ties, signed zeros
 * and runs already in order.
 */
class IntOrderTest {

  @Test
  void sameOrderAsTheJdkStableSort() {
    Random r = new Random(12);
    for (int trial = 0; trial < 300; trial++) {
      int n = trial % 50 == 0 ? 20_000 : r.nextInt(200);
      double[] x = new double[n];
      double[] y = new double[n];
      for (int i = 0; i < n; i++) {
        x[i] = switch (trial % 3) {
          case 0 -> r.nextInt(7) + (r.nextBoolean() ? 0.0 : -0.0);
          case 1 -> i / 10;
          default -> r.nextGaussian();
        };
        y[i] = r.nextInt(3);
      }
      Integer[] boxed = new Integer[n];
      for (int i = 0; i < n; i++) {
        boxed[i] = i;
      }
      Arrays.sort(boxed, Comparator.<Integer>comparingDouble(i -> x[i])
          .thenComparingDouble(i -> y[i]));
      int[] expected = Arrays.stream(boxed).mapToInt(Integer::intValue).toArray();
      int[] actual = IntOrder.sorted(n, (a, b) -> {
        int c = Double.compare(x[a], x[b]);
        return c != 0 ? c : Double.compare(y[a], y[b]);
      });
      assertArrayEquals(expected, actual, "trial " + trial);
    }
  }
}
