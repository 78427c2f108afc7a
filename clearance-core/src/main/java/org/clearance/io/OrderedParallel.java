package org.clearance.io;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;

/**
 * Maps a function over a list on several threads and returns the results in the list's order,
 * so a caller that then folds them in that order gets the same result as a sequential loop,
 * whatever the thread count. Used for independent blocks of a raster (ground, canopy).
 *
 * <p>Each worker takes the next unclaimed item (dynamic hand-out: the blocks of a corridor differ
 * a lot in cost). The first error stops the hand-out and is rethrown on the calling thread,
 * unchecked exceptions as they are (an {@code InputException} keeps its message).
 */
public final class OrderedParallel {

  /** Items in flight per worker in {@link #forEach}: enough to even out the blocks' costs while
   * the results held at once stay a few blocks per thread. */
  static final int ITEMS_PER_WORKER = 2;

  private OrderedParallel() {}

  /**
   * Applies {@code fn} to every item on {@code threads} threads and hands the results to
   * {@code sink} on the calling thread in item order; at most {@link #ITEMS_PER_WORKER} results
   * per thread are held at once, so memory stays that of a few items, not of the whole list.
   */
  public static <T, R> void forEach(List<T> items, int threads, Function<? super T, R> fn,
      java.util.function.Consumer<? super R> sink) {
    int batch = Math.max(1, threads * ITEMS_PER_WORKER);
    for (int from = 0; from < items.size(); from += batch) {
      for (R r : map(items.subList(from, Math.min(items.size(), from + batch)), threads, fn)) {
        sink.accept(r);
      }
    }
  }

  /**
   * {@code fn} applied to every item, results in item order.
   *
   * @param threads worker threads, &gt;= 1 (1 runs on the calling thread, in order)
   * @param fn must be safe to call from several threads at once on different items
   */
  public static <T, R> List<R> map(List<T> items, int threads, Function<? super T, R> fn) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be at least 1: " + threads);
    }
    int workers = Math.min(threads, items.size());
    if (workers <= 1) {
      List<R> out = new ArrayList<>(items.size());
      for (T item : items) {
        out.add(fn.apply(item));
      }
      return out;
    }
    Object[] results = new Object[items.size()];
    AtomicInteger next = new AtomicInteger();
    AtomicReference<Throwable> failure = new AtomicReference<>();
    Runnable work = () -> {
      for (int i = next.getAndIncrement(); i < results.length && failure.get() == null;
          i = next.getAndIncrement()) {
        try {
          results[i] = fn.apply(items.get(i));
        } catch (RuntimeException | Error e) {
          failure.compareAndSet(null, e);
        }
      }
    };
    Thread[] pool = new Thread[workers - 1];
    for (int t = 0; t < pool.length; t++) {
      pool[t] = new Thread(work, "clearance-blocks-" + t);
      pool[t].setDaemon(true);
      pool[t].start();
    }
    work.run();
    for (Thread t : pool) {
      try {
        t.join();
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        failure.compareAndSet(null, new IllegalStateException("interrupted", e));
      }
    }
    Throwable f = failure.get();
    if (f instanceof RuntimeException r) {
      throw r;
    }
    if (f instanceof Error e) {
      throw e;
    }
    @SuppressWarnings("unchecked")
    List<R> out = (List<R>) Arrays.asList(results);
    return new ArrayList<>(out);
  }
}
