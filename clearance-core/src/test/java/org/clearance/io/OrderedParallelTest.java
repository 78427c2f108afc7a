package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

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

  private static long slowSquare(int i) {
    long acc = 0;
    for (int k = 0; k < (i % 7) * 20_000; k++) {
      acc += k % 3;
    }
    return (long) i * i + (acc < 0 ? 1 : 0);
  }
}
