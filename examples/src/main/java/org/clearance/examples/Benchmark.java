package org.clearance.examples;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.management.ManagementFactory;
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
 * The speed and memory benchmark (issues 6 and 12): generates a large synthetic corridor in each
 * asked classification mode, times a cold read of its LAS file (page cache bypassed), a raw scan
 * (every byte read from the page cache, nothing decoded), a plain decoding pass ({@code read})
 * and every stage of a whole check, and prints each as points per second, as a ratio to the
 * {@code read} of the same mode, and with the peak heap seen while it ran (sampled every
 * {@link #SAMPLE_MS} ms); then the goal ratios (whole check over read; each mode's whole check
 * over the classified one's) and, when asked, the profile's top frames per stage.
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
   * @param modes classification modes to run, in order (the first is the base of the mode
   *     ratios; {@link ClassificationMode#FULL} is "classified")
   * @param profile record JFR method samples and print the top frames per stage
   */
  public record Options(long points, Path dir, int threads, String rules,
      List<ClassificationMode> modes, boolean profile) {

    /** The classified survey only, no profile. */
    public Options(long points, Path dir, int threads, String rules) {
      this(points, dir, threads, rules, List.of(ClassificationMode.FULL), false);
    }

    public Options {
      modes = List.copyOf(modes);
      if (modes.isEmpty()) {
        throw new IllegalArgumentException("no classification mode to run");
      }
    }
  }

  /**
   * One timed step.
   *
   * @param mode classification mode of the survey ({@link #modeName})
   * @param stage name
   * @param seconds wall time, s
   * @param pointsPerSecond survey points (or vegetation points for the clearance stage) per s
   * @param ratioToRead seconds over the plain decoding pass's seconds of the same mode
   * @param peakHeapBytes largest heap in use seen while the step ran, bytes
   * @param cpuSeconds processor time of the whole process while the step ran (all threads,
   *     garbage collection and compilation included), s; NaN where not measured. Over the wall
   *     time it gives the cores kept busy, and it is the figure to compare when other jobs share
   *     the machine
   */
  public record Row(String mode, String stage, double seconds, double pointsPerSecond,
      double ratioToRead, long peakHeapBytes, double cpuSeconds) {}

  private Benchmark() {}

  /** The benchmark's name of a classification mode. */
  public static String modeName(ClassificationMode mode) {
    return switch (mode) {
      case FULL -> "classified";
      case WIRES_UNLABELLED -> "wires-unlabelled";
      case GROUND_ONLY -> "ground-only";
      case UNCLASSIFIED -> "unclassified";
      case PARTLY_LABELLED -> "partly-labelled";
      case WIRES_AS_VEGETATION -> "wires-as-vegetation";
    };
  }

  /** The mode of a benchmark name ({@link #modeName}); empty when none has it. */
  public static Optional<ClassificationMode> mode(String name) {
    for (ClassificationMode m : ClassificationMode.values()) {
      if (modeName(m).equals(name)) {
        return Optional.of(m);
      }
    }
    return Optional.empty();
  }

  /** Runs the benchmark and prints its tables; returns the rows. */
  public static List<Row> run(Options o, PrintWriter out) throws IOException {
    Files.createDirectories(o.dir());
    out.printf(Locale.ROOT, "machine: %d cores, max heap %d MiB, Java %s; %d threads%n",
        Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20,
        System.getProperty("java.version"), o.threads());
    out.flush();
    List<Row> rows = new ArrayList<>();
    HeapSampler heap = new HeapSampler();
    heap.start();
    StageProfile profile = o.profile() ? new StageProfile(o.dir()) : null;
    try {
      for (ClassificationMode mode : o.modes()) {
        rows.addAll(runMode(o, mode, heap, profile, out));
        if (profile != null) {
          profile.print(out);
        }
      }
      printRatios(rows, o.modes(), out);
    } finally {
      heap.stop();
      if (profile != null) {
        profile.close();
      }
    }
    return rows;
  }

  private static List<Row> runMode(Options o, ClassificationMode mode, HeapSampler heap,
      StageProfile profile, PrintWriter out) throws IOException {
    String name = modeName(mode);
    int spans = (int) Math.max(DemoOptions.MIN_SPANS, Math.min(DemoOptions.MAX_SPANS,
        Math.round(o.points() / (POINTS_PER_SPAN_AND_DENSITY * DENSITY))));
    DemoOptions demo = DemoOptions.defaults().withSpanCount(spans).withPointDensity(DENSITY)
        .withMode(mode);
    Path dir = o.dir().resolve(name);
    long t0 = System.nanoTime();
    DemoCorridor.DemoFiles files = DemoCorridor.write(dir.resolve("input"), demo);
    out.printf(Locale.ROOT, "%n%s: generated %,d points (%d spans, %.0f points/m2) in %.1f s: "
        + "%s%n", name, files.pointCount(), spans, DENSITY, (System.nanoTime() - t0) / 1e9,
        files.survey());
    out.flush();

    Survey survey = Survey.open(List.of(files.survey()), UnitsChoice.fromFile());
    long n = survey.pointCount();
    List<Row> rows = new ArrayList<>();
    heap.reset();
    Optional<ColdRead.Result> cold = ColdRead.read(files.survey());
    long coldHeap = heap.peak();
    survey.rawScan(); // warm the page cache, as the check's passes find it
    heap.reset();
    double c0 = cpuSeconds();
    long s0 = System.nanoTime();
    survey.rawScan();
    double scan = (System.nanoTime() - s0) / 1e9;
    double scanCpu = cpuSeconds() - c0;
    long scanHeap = heap.peak();

    AtomicLong vegetation = new AtomicLong();
    countVegetation(survey, o.threads(), vegetation); // warms the decoder up (JIT)
    heap.reset();
    mark(profile);
    double c1 = cpuSeconds();
    long r0 = System.nanoTime();
    countVegetation(survey, o.threads(), vegetation);
    double read = (System.nanoTime() - r0) / 1e9;
    double readCpu = cpuSeconds() - c1;
    ended(profile, name, "read");
    cold.ifPresent(c -> rows.add(new Row(name, "cold read", c.seconds(), n / c.seconds(),
        c.seconds() / read, coldHeap, Double.NaN)));
    rows.add(new Row(name, "raw scan", scan, n / scan, scan / read, scanHeap, scanCpu));
    rows.add(new Row(name, "read", read, n / read, 1.0, heap.peak(), readCpu));
    out.printf(Locale.ROOT, "%s: cold read %s; raw scan (page cache) %.3f s%n", name,
        cold.map(ColdRead.Result::describe).orElse(ColdRead.UNAVAILABLE), scan);

    heap.reset();
    Path run = dir.resolve("run");
    CheckInputs inputs = new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(),
        files.structures(), List.of(files.lineSpec()), Optional.empty(),
        Optional.ofNullable(o.rules()), run);
    mark(profile);
    double[] cpuAt = {cpuSeconds()};
    new ClearanceCheck(CheckOptions.defaults(o.threads()), new PrintWriter(new StringWriter()),
        (stage, seconds) -> {
          // Vegetation is counted by class; an inferred survey's vegetation is all of its
          // unclassified points, so its clearance rate is given in survey points.
          long count = stage.equals("clearance") && vegetation.get() > 0 ? vegetation.get() : n;
          double cpu = cpuSeconds();
          rows.add(new Row(name, stage, seconds, count / seconds, seconds / read,
              heap.peak(), cpu - cpuAt[0]));
          cpuAt[0] = cpu;
          ended(profile, name, stage);
          heap.reset();
        }).run(inputs, "bench");
    print(rows, n, vegetation.get() > 0, out);
    return rows;
  }

  /** The plain decoding pass: every point decoded on all threads, vegetation counted. */
  private static void countVegetation(Survey survey, int threads, AtomicLong vegetation) {
    vegetation.set(0);
    survey.readParallel(threads, () -> chunk -> {
      long v = 0;
      short[] cls = chunk.classification();
      for (int i = 0; i < chunk.size(); i++) {
        if (cls[i] >= 3 && cls[i] <= 5) {
          v++;
        }
      }
      vegetation.addAndGet(v);
    });
  }

  /** Processor time of this process so far, s (NaN where the JVM does not tell). */
  private static double cpuSeconds() {
    if (ManagementFactory.getOperatingSystemMXBean()
        instanceof com.sun.management.OperatingSystemMXBean os) {
      long ns = os.getProcessCpuTime();
      return ns < 0 ? Double.NaN : ns / 1e9;
    }
    return Double.NaN;
  }

  private static void mark(StageProfile profile) {
    if (profile != null) {
      profile.mark();
    }
  }

  private static void ended(StageProfile profile, String mode, String stage) {
    if (profile != null) {
      profile.ended(mode + " " + stage);
    }
  }

  /** Stages that are not part of the check. */
  private static boolean outsideCheck(Row r) {
    return r.stage().equals("cold read") || r.stage().equals("raw scan")
        || r.stage().equals("read");
  }

  /** Wall seconds (or processor seconds with {@code cpu}) of the whole check of one mode. */
  private static double checkSeconds(List<Row> rows, String mode, boolean cpu) {
    return rows.stream().filter(r -> r.mode().equals(mode) && !outsideCheck(r))
        .mapToDouble(r -> cpu ? r.cpuSeconds() : r.seconds()).sum();
  }

  /** The read row of a mode. */
  private static Row readRow(List<Row> rows, String mode) {
    return rows.stream().filter(r -> r.mode().equals(mode) && r.stage().equals("read"))
        .findFirst().orElseThrow();
  }

  private static void print(List<Row> rows, long points, boolean classifiedVegetation,
      PrintWriter out) {
    out.printf(Locale.ROOT, "%n%-12s %9s %14s %9s %9s %9s %7s %10s%n", "stage", "seconds",
        "points/s", "x read", "cpu s", "cpu x rd", "cores", "peak MiB");
    String mode = rows.get(0).mode();
    Row read = readRow(rows, mode);
    long peak = 0;
    for (Row r : rows) {
      line(out, r.stage(), r.seconds(), r.pointsPerSecond(), r.ratioToRead(), r.cpuSeconds(),
          read.cpuSeconds(), r.peakHeapBytes());
      if (!outsideCheck(r)) {
        peak = Math.max(peak, r.peakHeapBytes());
      }
    }
    double check = checkSeconds(rows, mode, false);
    line(out, "whole check", check, points / check, check / read.seconds(),
        checkSeconds(rows, mode, true), read.cpuSeconds(), peak);
    out.println("(clearance: " + (classifiedVegetation ? "vegetation" : "survey")
        + " points per second; other stages: survey points per second; x read: seconds over "
        + "the read's; cpu s: processor seconds of the process, cpu x rd: over the read's, "
        + "cores: cpu s over seconds; peak heap sampled every " + SAMPLE_MS + " ms)");
    out.flush();
  }

  private static void line(PrintWriter out, String stage, double seconds, double rate,
      double ratio, double cpu, double readCpu, long heapBytes) {
    out.printf(Locale.ROOT, "%-12s %9.3f %14s %9.1f %9.3f %9.1f %7.2f %10d%n", stage, seconds,
        String.format(Locale.ROOT, "%,.0f", rate), ratio, cpu, cpu / readCpu, cpu / seconds,
        heapBytes >> 20);
  }

  private static void printRatios(List<Row> rows, List<ClassificationMode> modes,
      PrintWriter out) {
    String base = modeName(modes.get(0));
    double baseCheck = checkSeconds(rows, base, false);
    double baseCpu = checkSeconds(rows, base, true);
    out.printf(Locale.ROOT, "%ngoal ratios (issue 12: whole check <= 10 x read; other modes "
        + "<= 2 x %s); wall time, and processor time in brackets%n", base);
    for (ClassificationMode m : modes) {
      String name = modeName(m);
      double check = checkSeconds(rows, name, false);
      double cpu = checkSeconds(rows, name, true);
      Row read = readRow(rows, name);
      out.printf(Locale.ROOT, "  %-16s whole check %8.3f s = %6.1f x read (%6.1f)", name,
          check, check / read.seconds(), cpu / read.cpuSeconds());
      if (!name.equals(base)) {
        out.printf(Locale.ROOT, " = %5.2f x %s (%5.2f)", check / baseCheck, base,
            cpu / baseCpu);
      }
      out.println();
    }
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
