package org.clearance.label;

/**
 * Bytes of heap that blocks labelled at once may take together, so that a dense block (a town,
 * a forest edge: its window holds more points than others) waits for another block to finish
 * instead of running the heap out (docs/benchmark.md, "Heap flat in survey size"). A block asks
 * for its estimate before it is read and gives it back when it is labelled; an estimate larger
 * than the whole budget takes the whole budget (the block runs alone). The order in which blocks
 * run changes nothing in the result: they are folded in block order.
 */
final class HeapBudget {

  private final long capacity;
  private long free;

  /** @param capacity bytes, &gt; 0 */
  HeapBudget(long capacity) {
    if (capacity <= 0) {
      throw new IllegalArgumentException("heap budget must be > 0: " + capacity);
    }
    this.capacity = capacity;
    this.free = capacity;
  }

  /**
   * Waits until {@code bytes} (at most the whole budget) are free and takes them.
   *
   * @return the bytes taken, to give back with {@link #release}
   */
  synchronized long acquire(long bytes) {
    long take = Math.max(0, Math.min(bytes, capacity));
    while (free < take) {
      try {
        wait();
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        throw new IllegalStateException("interrupted while waiting for heap", e);
      }
    }
    free -= take;
    return take;
  }

  /** Gives back what {@link #acquire} took. */
  synchronized void release(long taken) {
    free += taken;
    notifyAll();
  }

  /** Bytes free now. */
  synchronized long free() {
    return free;
  }
}
