package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** {@link DisjointSets#join} from a known root gives the groups and roots of
 * {@link DisjointSets#union} (computed: the same random pairs through both). */
class DisjointSetsTest {

  @Test
  void joinFromAKnownRootAsUnion() {
    int n = 2000;
    int[] a = new int[n];
    int[] b = new int[n];
    for (int i = 0; i < n; i++) {
      a[i] = i;
      b[i] = i;
    }
    SplittableRandom rng = new SplittableRandom(5);
    for (int i = 0; i < n; i++) {
      int root = DisjointSets.root(b, i);
      for (int k = 0; k < 3; k++) {
        int j = rng.nextInt(n);
        DisjointSets.union(a, i, j);
        root = DisjointSets.join(b, root, j);
      }
    }
    int[] ra = new int[n];
    int[] rb = new int[n];
    for (int i = 0; i < n; i++) {
      ra[i] = DisjointSets.root(a, i);
      rb[i] = DisjointSets.root(b, i);
    }
    assertArrayEquals(ra, rb);
  }
}
