package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class PlanCellIndexTest {

  @Test
  void findsWhatWasPutInAndNothingElse() {
    PlanCellIndex idx = new PlanCellIndex.Builder(32)
        .addBox(0, 0, 40, 10, 1) // cells (0..1, 0)
        .addBox(30, 5, 70, 50, 2) // cells (0..2, 0..1)
        .add(-1, -1, 3)
        .build();
    assertArrayEquals(new int[] {1, 2}, sorted(idx.at(31, 1)));
    assertArrayEquals(new int[] {2}, sorted(idx.at(65, 40)));
    assertArrayEquals(new int[] {3}, idx.at(-0.5, -0.5));
    assertEquals(0, idx.at(200, 200).length);
  }

  @Test
  void aLongDiagonalLineOfCellsHasNoLostEntries() {
    // Regression: a boxed-Long hash map with key (cx << 32) ^ cy collided along diagonals
    // (UTM-sized cell numbers) and slowed every lookup; the mixed hash must still find all.
    PlanCellIndex.Builder b = new PlanCellIndex.Builder(32);
    int n = 20_000;
    long cx0 = 15_000;
    long cy0 = 208_000;
    for (int i = 0; i < n; i++) {
      b.add(cx0 + i, cy0 + i, i);
    }
    PlanCellIndex idx = b.build();
    Random r = new Random(3);
    for (int k = 0; k < 2000; k++) {
      int i = r.nextInt(n);
      double x = (cx0 + i) * 32 + 16;
      double y = (cy0 + i) * 32 + 16;
      assertArrayEquals(new int[] {i}, idx.at(x, y));
    }
  }

  private static int[] sorted(int[] a) {
    int[] c = a.clone();
    Arrays.sort(c);
    return c;
  }
}
