package org.clearance;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.survey.PointChunk;

/**
 * Console progress of a pass over a large survey: a line at every quarter of the points, so a
 * user of a whole network sees the work move. Small surveys (below {@link #MIN_POINTS}) pass
 * quietly.
 */
final class Progress {

  /** Surveys below this many points finish a pass in well under a minute; no progress lines. */
  static final long MIN_POINTS = 50_000_000;
  /** Lines per pass. */
  private static final int STEPS = 4;

  private final PrintWriter console;
  private final long total;

  Progress(PrintWriter console, long total) {
    this.console = console;
    this.total = total;
  }

  /** The consumers of {@code consumers}, counting the points they see for pass {@code name}. */
  Supplier<Consumer<PointChunk>> wrap(String name,
      Supplier<? extends Consumer<PointChunk>> consumers) {
    if (total < MIN_POINTS) {
      return consumers::get;
    }
    AtomicLong seen = new AtomicLong();
    AtomicLong reported = new AtomicLong();
    long step = Math.max(1, total / STEPS);
    long started = System.nanoTime();
    return () -> {
      Consumer<PointChunk> inner = consumers.get();
      return chunk -> {
        inner.accept(chunk);
        long now = seen.addAndGet(chunk.size());
        long mark = now / step;
        long last = reported.get();
        if (mark > last && reported.compareAndSet(last, mark)) {
          synchronized (console) {
            console.printf(Locale.ROOT, "  %s pass: %3.0f %% (%,d of %,d points, %.0f s)%n",
                name, 100.0 * now / total, now, total, (System.nanoTime() - started) / 1e9);
            console.flush();
          }
        }
      };
    };
  }
}
