package org.clearance.survey;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Rough throughput of the reader (not a test: run by hand, one run, no assertions).
 *
 * <p>{@code java -Xmx256m -cp ... org.clearance.survey.SurveyThroughputMain FILE [POINTS]}
 * writes FILE (LAS 1.2, format 1) with POINTS points (default 10 million) when it does not
 * exist, then times a raw scan of the point bytes, a sequential decode and a parallel decode,
 * and prints points per second and the heap in use.
 */
public final class SurveyThroughputMain {
  private static final int DEFAULT_POINTS = 10_000_000;

  private SurveyThroughputMain() {}

  public static void main(String[] args) {
    Path file = Paths.get(args.length > 0 ? args[0] : "throughput.las");
    int points = args.length > 1 ? Integer.parseInt(args[1]) : DEFAULT_POINTS;
    if (!Files.exists(file)) {
      long t = System.nanoTime();
      generate(file, points);
      report("generate", points, System.nanoTime() - t);
    }
    Survey s = Survey.open(List.of(file), UnitsChoice.of(LinearUnit.METRE));
    long n = s.pointCount();
    for (int run = 0; run < 2; run++) {
      long t = System.nanoTime();
      long bytes = s.rawScan();
      report("raw scan (" + bytes / (1 << 20) + " MiB)", n, System.nanoTime() - t);
      t = System.nanoTime();
      double[] sum = new double[1];
      s.read(c -> {
        for (int i = 0; i < c.size(); i++) {
          sum[0] += c.z()[i];
        }
      });
      report("decode, 1 thread", n, System.nanoTime() - t);
      t = System.nanoTime();
      List<double[]> sums = new ArrayList<>();
      s.readParallel(2, () -> {
        double[] mine = new double[1];
        sums.add(mine);
        return c -> {
          for (int i = 0; i < c.size(); i++) {
            mine[0] += c.z()[i];
          }
        };
      });
      report("decode, 2 threads", n, System.nanoTime() - t);
      double total = sums.stream().mapToDouble(a -> a[0]).sum();
      System.out.printf(Locale.ROOT, "  check: mean z %.4f / %.4f m%n", sum[0] / n, total / n);
    }
    Runtime rt = Runtime.getRuntime();
    System.out.printf(Locale.ROOT, "heap: max %d MiB, in use %d MiB%n", rt.maxMemory() >> 20,
        (rt.totalMemory() - rt.freeMemory()) >> 20);
  }

  private static void report(String what, long points, long nanos) {
    System.out.printf(Locale.ROOT, "%-28s %8.2f s  %6.1f million points/s%n", what,
        nanos / 1e9, points / (nanos / 1e9) / 1e6);
  }

  /** A random corridor-like cloud: 2 km x 60 m strip, heights 0-40 m, GPS times. */
  private static void generate(Path file, int points) {
    Random r = new Random(7);
    PointChunk c = new PointChunk(Survey.DEFAULT_CHUNK_POINTS);
    try (LasWriter w = LasWriter.create(file, LasWriterOptions.of(2, PointFormat.F1)
        .withScale(0.001, 0.001, 0.001).withOffset(400_000, 5_000_000, 0))) {
      for (int i = 0; i < points; i++) {
        int j = c.add(400_000 + r.nextDouble() * 2000, 5_000_000 + r.nextDouble() * 60,
            r.nextDouble() * 40, 1 + r.nextInt(6));
        c.gpsTime()[j] = i * 1e-5;
        c.intensity()[j] = r.nextInt(4096);
        if (c.isFull()) {
          w.write(c);
          c.reset(0, 0);
        }
      }
      w.write(c);
    }
  }
}
