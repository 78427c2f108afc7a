package org.clearance.label;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class HeapBudgetTest {

  @Test
  void aBlockLargerThanTheBudgetRunsAloneAndOthersWait() throws InterruptedException {
    HeapBudget budget = new HeapBudget(1000);
    long big = budget.acquire(5000); // a dense block: takes the whole budget, does not hang
    assertEquals(1000, big);
    assertEquals(0, budget.free());
    AtomicLong second = new AtomicLong(-1);
    CountDownLatch done = new CountDownLatch(1);
    Thread t = new Thread(() -> {
      second.set(budget.acquire(600));
      done.countDown();
    });
    t.start();
    assertTrue(!done.await(200, TimeUnit.MILLISECONDS), "a block ran beside the dense one");
    budget.release(big);
    assertTrue(done.await(10, TimeUnit.SECONDS), "the waiting block never ran");
    t.join();
    assertEquals(600, second.get());
    assertEquals(400, budget.free());
    assertEquals(400, budget.acquire(400)); // two small blocks fit side by side
    assertEquals(0, budget.free());
  }
}
