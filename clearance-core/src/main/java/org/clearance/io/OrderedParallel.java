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
   *
   * <p>The items are handed out in a sliding window: a worker takes the next item as soon as
   * the items being computed, waiting for the sink or being folded are fewer than the window,
   * so no thread waits for the slowest item of a batch, nor for the sink.
   * With one thread (or one item) everything runs on the calling thread, in order.
   */
  public static <T, R> void forEach(List<T> items, int threads, Function<? super T, R> fn,
      java.util.function.Consumer<? super R> sink) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be at least 1: " + threads);
    }
    int workers = Math.min(threads, items.size());
    if (workers <= 1) {
      for (T item : items) {
        sink.accept(fn.apply(item));
      }
      return;
    }
    new Window<T, R>(items, workers, fn).run(sink);
  }

  /** The state of one {@link #forEach}: items handed out, results waiting, the first error. */
  private static final class Window<T, R> {
    private final List<T> items;
    private final Function<? super T, R> fn;
    private final int workers;
    private final int size;
    private final Object[] results;
    private final boolean[] done;
    /** Next item to hand out, items folded by the sink; guarded by {@code this}. */
    private int next;
    private int delivered;
    private Throwable failure;

    Window(List<T> items, int workers, Function<? super T, R> fn) {
      this.items = items;
      this.fn = fn;
      this.workers = workers;
      this.size = Math.max(1, workers * ITEMS_PER_WORKER);
      this.results = new Object[items.size()];
      this.done = new boolean[items.size()];
    }

    /** The next item for a worker, or -1 when none is left or an item failed. */
    private synchronized int claim() throws InterruptedException {
      while (failure == null && next < items.size() && next >= delivered + size) {
        wait();
      }
      return failure != null || next >= items.size() ? -1 : next++;
    }

    private synchronized void finish(int i, Object result, Throwable error) {
      if (error != null) {
        if (failure == null) {
          failure = error;
        }
      } else {
        results[i] = result;
        done[i] = true;
      }
      notifyAll();
    }

    private void work() {
      try {
        for (int i = claim(); i >= 0; i = claim()) {
          try {
            finish(i, fn.apply(items.get(i)), null);
          } catch (RuntimeException | Error e) {
            finish(i, null, e);
          }
        }
      } catch (InterruptedException e) {
        finish(-1, null, new IllegalStateException("interrupted", e));
      }
    }

    void run(java.util.function.Consumer<? super R> sink) {
      Thread[] pool = new Thread[workers];
      for (int t = 0; t < pool.length; t++) {
        pool[t] = new Thread(this::work, "clearance-blocks-" + t);
        pool[t].setDaemon(true);
        pool[t].start();
      }
      try {
        for (int i = 0; i < results.length; i++) {
          R r = take(i);
          if (r == null && failure() != null) {
            break;
          }
          sink.accept(r);
          folded(i + 1);
        }
      } catch (RuntimeException | Error e) {
        finish(-1, null, e);
      } finally {
        for (Thread t : pool) {
          try {
            t.join();
          } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            finish(-1, null, new IllegalStateException("interrupted", e));
          }
        }
      }
      Throwable f = failure();
      if (f instanceof RuntimeException r) {
        throw r;
      }
      if (f instanceof Error e) {
        throw e;
      }
    }

    private synchronized Throwable failure() {
      return failure;
    }

    /** Item i's result once computed (null after a failure), freed for the next item. */
    @SuppressWarnings("unchecked")
    private synchronized R take(int i) {
      while (!done[i] && failure == null) {
        try {
          wait();
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          failure = new IllegalStateException("interrupted", e);
          notifyAll();
        }
      }
      if (!done[i]) {
        return null;
      }
      R r = (R) results[i];
      results[i] = null;
      return r;
    }

    /** The sink has folded the results before item {@code count}: the window moves on. */
    private synchronized void folded(int count) {
      delivered = count;
      notifyAll();
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
