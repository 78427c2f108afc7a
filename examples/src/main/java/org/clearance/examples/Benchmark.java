package org.clearance.examples;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.survey.Survey;
import org.clearance.survey.UnitsChoice;

/**
 * The speed and memory benchmark (issue 6): generates a large synthetic corridor, times a raw
 * scan of its LAS file (every byte read, nothing decoded), a plain decoding pass, and every stage
 * of a whole check, and prints each as points per second, as a ratio to the raw scan, and with
 * the peak heap seen while it ran (sampled every {@link #SAMPLE_MS} ms).
 */
public final class Benchmark {

  /** Heap sampling interval, ms: short against any stage of a large survey. */
  static final long SAMPLE_MS = 5;
  /** Points the default demo makes per span and per unit of density (measured: 3.0 M points for
   * 12 spans at 3 points per square metre). */
  static final double POINTS_PER_SPAN_AND_DENSITY = 83_600;
  /** Point density of the benchmark corridor, points per square metre of ground. */
  static final double DENSITY = 6.0;

  /**
   * Options.
   *
   * @param points approximate number of survey points to generate (&gt;= 100 000)
   * @param dir working folder (the corridor and the run go here)
   * @param threads worker threads
   * @param rules rule profile of the check
   */
  public record Options(long points, Path dir, int threads, String rules) {}

  /**
   * One timed step.
   *
   * @param stage name
   * @param seconds wall time, s
   * @param pointsPerSecond survey points (or vegetation points for the clearance stage) per s
   * @param ratioToScan seconds over the raw scan's seconds
   * @param peakHeapBytes largest heap in use seen while the step ran, bytes
   */
  public record Row(String stage, double seconds, double pointsPerSecond, double ratioToScan,
      long peakHeapBytes) {}

  private Benchmark() {}

  /** Runs the benchmark and prints its table; returns the rows. */
  public static List<Row> run(Options o, PrintWriter out) throws IOException {
    Files.createDirectories(o.dir());
    int spans = (int) Math.max(DemoOptions.MIN_SPANS, Math.min(DemoOptions.MAX_SPANS,
        Math.round(o.points() / (POINTS_PER_SPAN_AND_DENSITY * DENSITY))));
    DemoOptions demo = DemoOptions.defaults().withSpanCount(spans).withPointDensity(DENSITY);
    long t0 = System.nanoTime();
    DemoCorridor.DemoFiles files = DemoCorridor.write(o.dir().resolve("input"), demo);
    out.printf(Locale.ROOT, "generated %,d points (%d spans, %.0f points/m2) in %.1f s: %s%n",
        files.pointCount(), spans, DENSITY, (System.nanoTime() - t0) / 1e9, files.survey());
    out.printf(Locale.ROOT, "machine: %d cores, max heap %d MiB, Java %s%n",
        Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20,
        System.getProperty("java.version"));
    out.flush();

    Survey survey = Survey.open(List.of(files.survey()), UnitsChoice.fromFile());
    long n = survey.pointCount();
    survey.rawScan(); // warm the page cache, as the check's passes find it
    HeapSampler heap = new HeapSampler();
    heap.start();
    List<Row> rows = new ArrayList<>();
    try {
      heap.reset();
      long s0 = System.nanoTime();
      long bytes = survey.rawScan();
      double scan = (System.nanoTime() - s0) / 1e9;
      rows.add(new Row("raw scan", scan, n / scan, 1.0, heap.peak()));
      out.printf(Locale.ROOT, "raw scan: %,d bytes in %.3f s%n", bytes, scan);

      heap.reset();
      AtomicLong vegetation = new AtomicLong();
      long r0 = System.nanoTime();
      survey.readParallel(o.threads(), () -> chunk -> {
        long v = 0;
        short[] cls = chunk.classification();
        for (int i = 0; i < chunk.size(); i++) {
          if (cls[i] >= 3 && cls[i] <= 5) {
            v++;
          }
        }
        vegetation.addAndGet(v);
      });
      double read = (System.nanoTime() - r0) / 1e9;
      rows.add(new Row("read", read, n / read, read / scan, heap.peak()));

      heap.reset();
      Path run = o.dir().resolve("run");
      CheckInputs inputs = new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(),
          files.structures(), List.of(files.lineSpec()), Optional.empty(),
          Optional.ofNullable(o.rules()), run);
      new ClearanceCheck(CheckOptions.defaults(o.threads()), new PrintWriter(new StringWriter()),
          (stage, seconds) -> {
            long count = stage.equals("clearance") ? vegetation.get() : n;
            rows.add(new Row(stage, seconds, count / seconds, seconds / scan, heap.peak()));
            heap.reset();
          }).run(inputs, "bench");
    } finally {
      heap.stop();
    }
    print(rows, n, out);
    return rows;
  }

  private static void print(List<Row> rows, long points, PrintWriter out) {
    out.printf(Locale.ROOT, "%n%-12s %9s %14s %9s %10s%n", "stage", "seconds", "points/s",
        "x scan", "peak MiB");
    double check = 0;
    long peak = 0;
    double scan = rows.get(0).seconds();
    for (Row r : rows) {
      out.printf(Locale.ROOT, "%-12s %9.3f %14s %9.1f %10d%n", r.stage(), r.seconds(),
          String.format(Locale.ROOT, "%,.0f", r.pointsPerSecond()), r.ratioToScan(),
          r.peakHeapBytes() >> 20);
      if (!r.stage().equals("raw scan") && !r.stage().equals("read")) {
        check += r.seconds();
        peak = Math.max(peak, r.peakHeapBytes());
      }
    }
    out.printf(Locale.ROOT, "%-12s %9.3f %14s %9.1f %10d%n", "whole check", check,
        String.format(Locale.ROOT, "%,.0f", points / check), check / scan, peak >> 20);
    out.println("(clearance: vegetation points per second; other stages: survey points per "
        + "second; peak heap sampled every " + SAMPLE_MS + " ms)");
    out.flush();
  }

  /** Samples the heap in use on a daemon thread and keeps the largest value since a reset. */
  private static final class HeapSampler implements Runnable {
    private final AtomicLong peak = new AtomicLong();
    private volatile boolean running = true;
    private Thread thread;

    void start() {
      thread = new Thread(this, "heap-sampler");
      thread.setDaemon(true);
      thread.start();
    }

    void stop() {
      running = false;
    }

    void reset() {
      peak.set(used());
    }

    long peak() {
      return Math.max(peak.get(), used());
    }

    @Override
    public void run() {
      while (running) {
        peak.accumulateAndGet(used(), Math::max);
        try {
          Thread.sleep(SAMPLE_MS);
        } catch (InterruptedException e) {
          return;
        }
      }
    }

    private static long used() {
      Runtime r = Runtime.getRuntime();
      return r.totalMemory() - r.freeMemory();
    }
  }
}
