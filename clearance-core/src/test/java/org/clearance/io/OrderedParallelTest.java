package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** Results in item order for any thread count; the first failure reaches the caller. */
class OrderedParallelTest {

  @Test
  void resultsComeInItemOrder() {
    List<Integer> items = IntStream.range(0, 101).boxed().toList();
    // Uneven costs so that the workers finish out of order.
    List<Long> expected = items.stream().map(OrderedParallelTest::slowSquare).toList();
    for (int threads : new int[] {1, 2, 3, 8}) {
      assertEquals(expected, OrderedParallel.map(items, threads, OrderedParallelTest::slowSquare));
      List<Long> folded = new ArrayList<>();
      OrderedParallel.forEach(items, threads, OrderedParallelTest::slowSquare, folded::add);
      assertEquals(expected, folded);
    }
  }

  @Test
  void failureIsRethrownOnTheCaller() {
    IllegalStateException boom = new IllegalStateException("boom");
    IllegalStateException thrown = assertThrows(IllegalStateException.class,
        () -> OrderedParallel.map(List.of(1, 2, 3, 4, 5), 3, i -> {
          if (i == 4) {
            throw boom;
          }
          return i;
        }));
    assertSame(boom, thrown);
    assertThrows(IllegalArgumentException.class, () -> OrderedParallel.map(List.of(1), 0, i -> i));
  }

  /** The sliding window: items computed but not yet folded stay at most
   * {@link OrderedParallel#ITEMS_PER_WORKER} per thread, also while the sink is slow; a failure
   * of the sink or of an item reaches the caller. */
  @Test
  void windowBoundsTheResultsHeld() {
    List<Integer> items = IntStream.range(0, 60).boxed().toList();
    for (int threads : new int[] {2, 3}) {
      java.util.concurrent.atomic.AtomicInteger computed = new java.util.concurrent.atomic.AtomicInteger();
      int[] folded = {0};
      int[] most = {0};
      List<Long> got = new ArrayList<>();
      OrderedParallel.forEach(items, threads, i -> {
        computed.incrementAndGet();
        return slowSquare(i);
      }, r -> {
        most[0] = Math.max(most[0], computed.get() - folded[0]);
        got.add(r);
        slowSquare(6);
        folded[0]++;
      });
      assertEquals(items.stream().map(OrderedParallelTest::slowSquare).toList(), got);
      assertTrue(most[0] <= threads * OrderedParallel.ITEMS_PER_WORKER,
          threads + " threads held " + most[0]);
    }
    IllegalStateException boom = new IllegalStateException("sink");
    assertSame(boom, assertThrows(IllegalStateException.class, () -> OrderedParallel.forEach(
        items, 2, i -> i, r -> {
          if (r == 7) {
            throw boom;
          }
        })));
    IllegalStateException item = new IllegalStateException("item");
    assertSame(item, assertThrows(IllegalStateException.class, () -> OrderedParallel.forEach(
        items, 2, i -> {
          if (i == 30) {
            throw item;
          }
          return i;
        }, r -> { })));
  }

  private static long slowSquare(int i) {
    long acc = 0;
    for (int k = 0; k < (i % 7) * 20_000; k++) {
      acc += k % 3;
    }
    return (long) i * i + (acc < 0 ? 1 : 0);
  }
}
