package org.clearance.spark;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.examples.DemoCorridor;
import org.clearance.examples.DemoOptions;
import org.clearance.survey.UnitsChoice;

/**
 * The Spark job's benchmark (docs/spark.md): generates a demo corridor of the given size (an
 * invented scenario), cuts it into square tiles, and runs the job in local mode on 1 and 2 cores
 * (or the counts given), printing seconds, survey points per second and the scaling; with
 * {@code --cli} also the command line's check of the same survey on all cores, for reference.
 *
 * <p>{@code SparkBench [--points N] [--dir DIR] [--tile M] [--cores 1,2] [--cli]}
 */
public final class SparkBench {
  /** Points of a demo span at one pulse per square metre (the generator's corridor: 47.5
   * million points in 100 spans at 6 per m^2), a little low so the survey is at least the
   * size asked. */
  private static final double POINTS_PER_SPAN_AND_DENSITY = 79_000;
  /** Pulses per square metre, as the command line's benchmark. */
  private static final double DENSITY = 6.0;
  private static final String PROFILE = "example-utility";

  private SparkBench() {}

  public static void main(String[] args) throws IOException {
    long points = 50_000_000;
    Path dir = Path.of("spark-bench");
    double tile = 500;
    List<Integer> cores = List.of(1, 2);
    boolean cli = false;
    for (int i = 0; i < args.length; i++) {
      switch (args[i]) {
        case "--points" -> points = Long.parseLong(args[++i]);
        case "--dir" -> dir = Path.of(args[++i]);
        case "--tile" -> tile = Double.parseDouble(args[++i]);
        case "--cores" -> {
          List<Integer> c = new ArrayList<>();
          for (String s : args[++i].split(",")) {
            c.add(Integer.parseInt(s.trim()));
          }
          cores = c;
        }
        case "--cli" -> cli = true;
        default -> throw new IllegalArgumentException("unknown option " + args[i]);
      }
    }
    PrintWriter out = new PrintWriter(System.out, true);
    int spans = (int) Math.max(DemoOptions.MIN_SPANS, Math.min(DemoOptions.MAX_SPANS,
        (long) Math.ceil(points / (POINTS_PER_SPAN_AND_DENSITY * DENSITY))));
    long t0 = System.nanoTime();
    DemoCorridor.DemoFiles demo = DemoCorridor.write(dir.resolve("input"),
        DemoOptions.defaults().withSpanCount(spans).withPointDensity(DENSITY));
    List<Path> tiles = TileSplitter.split(demo.survey(), dir.resolve("tiles"), tile);
    Files.delete(demo.survey());
    out.printf(Locale.ROOT, "generated %,d points, %d spans, in %d tiles of %.0f m in %.1f s%n",
        demo.pointCount(), spans, tiles.size(), tile, (System.nanoTime() - t0) / 1e9);
    out.printf(Locale.ROOT, "machine: %d cores, max heap %d MiB, Java %s, load average %s%n",
        Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20,
        System.getProperty("java.version"), Files.readString(Path.of("/proc/loadavg")).trim());
    if (cli) {
      long c0 = System.nanoTime();
      new ClearanceCheck(CheckOptions.defaults(Runtime.getRuntime().availableProcessors()),
          new PrintWriter(new StringWriter())).run(new CheckInputs(tiles, UnitsChoice.fromFile(),
          demo.structures(), List.of(demo.lineSpec()), Optional.empty(), Optional.of(PROFILE),
          dir.resolve("cli-run")), "bench");
      double s = (System.nanoTime() - c0) / 1e9;
      out.printf(Locale.ROOT, "command line, %d threads: %.1f s, %,.0f points/s%n",
          Runtime.getRuntime().availableProcessors(), s, demo.pointCount() / s);
    }
    double first = Double.NaN;
    int firstCores = 0;
    for (int c : cores) {
      SparkConf conf = new SparkConf().setMaster("local[" + c + "]").setAppName("bench")
          .set("spark.ui.enabled", "false").set("spark.driver.host", "127.0.0.1");
      SparkCheck.Summary s;
      try (JavaSparkContext sc = new JavaSparkContext(conf)) {
        s = SparkCheck.run(sc, new SparkCheck.Request(JobSpec.of(tiles, UnitsChoice.fromFile(),
            demo.structures(), List.of(demo.lineSpec()), Optional.empty(), null, "bench"),
            Optional.of(PROFILE), dir.resolve("spark-" + c).toString(), 0),
            new PrintWriter(new StringWriter()));
      }
      if (Double.isNaN(first)) {
        first = s.seconds();
        firstCores = c;
      }
      out.printf(Locale.ROOT, "spark local[%d]: %.1f s, %,.0f survey points/s, %,d work-area "
          + "points (x%.2f), %d partitions (largest %.0f %% of the work), %d pieces, speed-up "
          + "%.2f over %d core(s), load average %s%n", c, s.seconds(),
          s.surveyPoints() / s.seconds(), s.workPoints(),
          (double) s.workPoints() / s.surveyPoints(), s.partitions(),
          100 * s.largestPartitionShare(), s.pieces(), first / s.seconds(), firstCores,
          Files.readString(Path.of("/proc/loadavg")).trim());
      out.println(skew(s.skew()));
    }
  }

  /** The spread of the work over spans and partitions, one line. */
  static String skew(SparkCheck.Skew k) {
    long[] pts = k.spanPoints().clone();
    java.util.Arrays.sort(pts);
    double[] sec = k.spanSeconds().clone();
    java.util.Arrays.sort(sec);
    double worstEstimate = 0;
    for (int i = 0; i < pts.length; i++) {
      if (k.spanPoints()[i] > 0) {
        worstEstimate = Math.max(worstEstimate,
            Math.abs((double) k.estimatedPoints()[i] / k.spanPoints()[i] - 1));
      }
    }
    long[] part = k.partitionPoints().clone();
    java.util.Arrays.sort(part);
    long total = java.util.Arrays.stream(part).sum();
    return String.format(Locale.ROOT, "  skew: %d spans, work-area points per span min %,d "
        + "median %,d max %,d (plan's estimate within %.0f %%); %d partitions, points per "
        + "partition min %,d max %,d (largest %.1f %% of the work, fair share %.1f %%); span "
        + "task seconds median %.1f max %.1f", pts.length, pts[0], pts[pts.length / 2],
        pts[pts.length - 1], 100 * worstEstimate, part.length, part[0], part[part.length - 1],
        100.0 * part[part.length - 1] / Math.max(1, total), 100.0 / part.length,
        sec[sec.length / 2], sec[sec.length - 1]);
  }
}
