package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HashSet;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class LongHashSetTest {

  @Test
  void aLargeSetMovesOutOfTheHeapAndKeepsEveryKey() {
    // Issue 12 (heap flat in survey size): past HEAP_SLOTS slots the keys go to scratch memory;
    // reference: java.util.HashSet of the same keys.
    Random rnd = new Random(12);
    LongHashSet set = new LongHashSet();
    Set<Long> ref = new HashSet<>();
    int n = LongHashSet.HEAP_SLOTS; // twice the keys a heap table of HEAP_SLOTS holds
    for (int i = 0; i < n; i++) {
      long k = i == 7 ? Long.MIN_VALUE : rnd.nextLong();
      assertEquals(ref.add(k), set.add(k));
      assertEquals(ref.add(k), set.add(k)); // a second add of the same key is no change
    }
    assertTrue(set.offHeap());
    assertEquals(ref.size(), set.size());
    for (long k : ref) {
      assertTrue(set.contains(k));
    }
    for (int i = 0; i < 10_000; i++) {
      long k = rnd.nextLong();
      assertEquals(ref.contains(k), set.contains(k));
    }
    long[] keys = set.toArray();
    long[] expected = ref.stream().mapToLong(Long::longValue).toArray();
    Arrays.sort(keys);
    Arrays.sort(expected);
    assertArrayEquals(expected, keys);
    LongHashSet copy = new LongHashSet();
    copy.addAll(set);
    assertEquals(set.size(), copy.size());
    assertFalse(new LongHashSet().offHeap());
  }
}
