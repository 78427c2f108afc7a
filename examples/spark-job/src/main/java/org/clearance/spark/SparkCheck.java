package org.clearance.spark;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.apache.spark.api.java.JavaPairRDD;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.storage.StorageLevel;
import org.clearance.RunFolder;
import org.clearance.line.LineLayout;
import org.clearance.report.ReportOptions;
import org.clearance.report.ReportStage;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunRecord;
import scala.Tuple2;

/**
 * The clearance check of many lines and many tiles as one Spark job (docs/spark.md). Per line it
 * writes the run folder that {@code clearance check} writes for that line, computed by the same
 * core stages:
 * <ol>
 *   <li>plan (driver, headers only): each span's work area, the tile pieces that meet it
 *       ({@link WorkPlan}), spans packed into partitions by their expected points
 *       ({@link SpanPartitioner});
 *   <li>read: each needed piece is read once by byte range and its points are shuffled to the
 *       spans whose work areas hold them;
 *   <li>per span: ground model, wires and flight time ({@link SpanStages#fit});
 *   <li>through two shuffles between neighbouring spans: the wire points of the spans near each
 *       span, then the points each span set aside ({@link SpanStages#setAside}), as the command
 *       line's wire finder decides them once all spans are fitted;
 *   <li>per tension section, through a shuffle: every span receives the fitted conductors and
 *       flight times of all spans of its section, which the ruling span, the change of state and
 *       the survey temperature need;
 *   <li>per span: conditions and distances ({@link SpanStages#measure});
 *   <li>reduce per line on the driver ({@link RunWriter}): spans ranked, run folder written.
 * </ol>
 */
public final class SparkCheck {

  /**
   * A run.
   *
   * @param spec the inputs every task reads
   * @param rules rule profile (built-in name or file), if any
   * @param out where the line folders go (a local path or a Hadoop file system URI); each line's
   *     run folder is {@code out/<line id>}
   * @param partitions span partitions wanted (0: three per core of the cluster)
   */
  public record Request(JobSpec spec, Optional<String> rules, String out, int partitions) {}

  /**
   * What a run did, for the console and the benchmark.
   *
   * @param lines line ids, in order
   * @param spans spans checked
   * @param tiles tiles given
   * @param skippedTiles tiles never opened
   * @param pieces pieces read
   * @param surveyPoints points in all tiles
   * @param workPoints points in the spans' work areas (a point in two areas counts twice)
   * @param partitions span partitions
   * @param largestPartitionShare the largest partition's share of the work points
   * @param failedSpans spans whose task failed (reported NOT ASSESSED)
   * @param seconds wall time of the whole run, s
   * @param skew how the work was spread over spans and partitions
   */
  public record Summary(List<String> lines, int spans, int tiles, int skippedTiles, int pieces,
      long surveyPoints, long workPoints, int partitions, double largestPartitionShare,
      int failedSpans, double seconds, Skew skew) {}

  /**
   * How the work was spread (the skew the partitioner packs against), per span key and per
   * partition.
   *
   * @param estimatedPoints per span, the plan's estimate of its work-area points
   * @param spanPoints per span, the work-area points its task read
   * @param spanSeconds per span, the time of its tasks (ground and wires, then conditions and
   *     distances), s
   * @param partitionPoints per partition, the work-area points of its spans
   */
  public record Skew(long[] estimatedPoints, long[] spanPoints, double[] spanSeconds,
      long[] partitionPoints) {}

  /** What a span's first task measured, for the driver: points, classes, GPS time range. */
  private record Tally(int key, long points, long[] classCounts, double[] gpsRange)
      implements java.io.Serializable {}

  private SparkCheck() {}

  /**
   * Runs the check.
   *
   * @throws org.clearance.InputException for a problem with the inputs (found on the driver
   *     before any task starts)
   */
  public static Summary run(JavaSparkContext sc, Request request, PrintWriter console)
      throws IOException {
    long t0 = System.nanoTime();
    JobSpec spec = request.spec();
    JobContext ctx = JobContext.of(spec);
    RuleProfile profile = request.rules().map(RuleProfiles::byNameOrPath).orElse(null);
    WorkPlan plan = WorkPlan.of(ctx);
    int wanted = request.partitions() > 0 ? request.partitions()
        : 3 * sc.defaultParallelism();
    SpanPartitioner partitioner = new SpanPartitioner(plan.estimatedPoints, wanted);
    say(console, "plan: %d line(s), %d spans, %d tiles (%d never opened), %d pieces, "
        + "%d partitions", ctx.layout.lines().size(), ctx.spans.size(), spec.tiles().size(),
        plan.skippedTiles, plan.pieces.size(), partitioner.numPartitions());

    List<Tuple2<Integer, PointBlock>> everySpan = new ArrayList<>();
    for (int k = 0; k < ctx.spans.size(); k++) {
      everySpan.add(new Tuple2<>(k, new PointBlock()));
    }
    JavaPairRDD<Integer, Iterable<PointBlock>> points = sc
        .parallelize(plan.pieces, Math.max(1, plan.pieces.size()))
        .flatMapToPair(piece -> SpanStages.read(spec, piece).iterator())
        .union(sc.parallelizePairs(everySpan, 1))
        .groupByKey(partitioner);
    JavaPairRDD<Integer, SpanFit> fits = points
        .mapPartitionsToPair(it -> map(it, p -> new Tuple2<>(p._1(),
            SpanStages.fit(spec, p._1(), p._2()))), true)
        .persist(StorageLevel.MEMORY_ONLY());

    List<Tally> measured = fits.values()
        .map(f -> new Tally(f.key(), f.points(), f.classCounts(), f.gpsRange())).collect();
    long workPoints = 0;
    long[] spanPoints = new long[ctx.spans.size()];
    long[] partitionPoints = new long[partitioner.numPartitions()];
    long[] classes = new long[256];
    double[] gps = {Double.NaN, Double.NaN};
    for (Tally m : measured) {
      workPoints += m.points();
      spanPoints[m.key()] = m.points();
      partitionPoints[partitioner.getPartition(m.key())] += m.points();
      for (int c = 0; c < 256; c++) {
        classes[c] += m.classCounts()[c];
      }
      gps[0] = SpanStages.minimum(gps[0], m.gpsRange()[0]);
      gps[1] = SpanStages.maximum(gps[1], m.gpsRange()[1]);
    }
    long[] load = partitioner.loads(plan.estimatedPoints);
    long estimated = 0;
    long largest = 0;
    for (long l : load) {
      estimated += l;
      largest = Math.max(largest, l);
    }
    double share = estimated > 0 ? (double) largest / estimated : 1.0;
    say(console, "read: %,d points in the spans' work areas; largest partition %.0f %% of the "
        + "expected work", workPoints, 100 * share);

    JavaPairRDD<Integer, Iterable<List<SectionFit>>> sections = fits
        .mapToPair(p -> new Tuple2<>(SpanStages.sectionKey(JobContext.of(spec), p._1()),
            SpanStages.sectionFit(p._2(), JobContext.of(spec))))
        .groupByKey()
        .flatMapToPair(g -> {
          List<SectionFit> all = new ArrayList<>();
          g._2().forEach(all::add);
          all.sort((a, b) -> Integer.compare(a.span(), b.span()));
          List<Tuple2<Integer, List<SectionFit>>> out = new ArrayList<>();
          for (int k : SpanStages.receivers(JobContext.of(spec), all)) {
            out.add(new Tuple2<>(k, all));
          }
          return out.iterator();
        })
        .groupByKey(partitioner);
    // The points set aside, as the command line's wire finder decides them once every span is
    // fitted: each span's wire points go to its partners (the spans whose corridors may meet
    // its own), each span sets its own points aside, and these go to every span whose task
    // measures near it (its partners' partners).
    JavaPairRDD<Integer, Iterable<PointKeys>> wireKeys = fits
        .flatMapToPair(p -> {
          PointKeys keys = SpanStages.wireKeys(p._2());
          List<Tuple2<Integer, PointKeys>> out = new ArrayList<>();
          for (int k : JobContext.of(spec).partners.get(p._1())) {
            out.add(new Tuple2<>(k, keys));
          }
          return out.iterator();
        })
        .groupByKey(partitioner);
    // A span's fit holds its ground model and wire candidates, which never leave the executor
    // that made them: stages that need it zip the partitions of the RDDs that share the span
    // partitioner (partition i of each holds the same spans), so no join, shuffle or spill ever
    // has to serialize it.
    JavaPairRDD<Integer, Iterable<PointKeys>> setAside = fits
        .zipPartitions(wireKeys, (fitsHere, keysHere) -> {
          Map<Integer, Iterable<PointKeys>> keys = byKey(keysHere);
          List<Tuple2<Integer, PointKeys>> out = new ArrayList<>();
          while (fitsHere.hasNext()) {
            Tuple2<Integer, SpanFit> f = fitsHere.next();
            PointKeys mine = SpanStages.setAside(f._2(), keys.getOrDefault(f._1(), List.of()));
            for (int k : JobContext.of(spec).measuredNear.get(f._1())) {
              out.add(new Tuple2<>(k, mine));
            }
          }
          return out.iterator();
        })
        .mapToPair(t -> t)
        .groupByKey(partitioner);
    JavaPairRDD<Integer, Tuple2<Iterable<List<SectionFit>>, Iterable<PointKeys>>> messages =
        sections.join(setAside, partitioner);
    long[] classCounts = classes;
    JavaRDD<SpanOutcome> outcomes = points
        .zipPartitions(fits, (pointsHere, fitsHere) -> {
          Map<Integer, SpanFit> fit = byKey(fitsHere);
          return map(pointsHere, p -> new SpanWork(p._1(), p._2(), fit.get(p._1())));
        })
        .zipPartitions(messages, (workHere, messagesHere) -> {
          Map<Integer, Tuple2<Iterable<List<SectionFit>>, Iterable<PointKeys>>> m =
              byKey(messagesHere);
          return map(workHere, w -> {
            var got = m.get(w.key());
            return SpanStages.measure(spec, w.fit(), w.blocks(),
                got == null ? List.of() : got._1(), got == null ? List.of() : got._2(),
                classCounts);
          });
        })
        .persist(StorageLevel.MEMORY_AND_DISK());
    outcomes.count();
    fits.unpersist(false);

    int failed = 0;
    double[] spanSeconds = new double[ctx.spans.size()];
    List<String> lineIds = new ArrayList<>();
    List<RunWriter> writers = new ArrayList<>();
    List<Path> stagings = new ArrayList<>();
    List<RunFolder> folders = new ArrayList<>();
    try {
      for (int l = 0; l < ctx.layout.lines().size(); l++) {
        String target = target(request.out(), ctx.layout.lines().get(l));
        Optional<Path> local = localPath(target);
        RunFolder folder = local.isPresent() ? RunFolder.replace(local.get(), "--out") : null;
        folders.add(folder);
        Path staging = folder != null ? folder.staging()
            : Files.createTempDirectory("clearance-run-");
        stagings.add(staging);
        writers.add(new RunWriter(ctx, l, staging));
        lineIds.add(ctx.layout.lines().get(l).spec().lineId());
      }
      Iterator<SpanOutcome> it = outcomes.toLocalIterator();
      while (it.hasNext()) {
        SpanOutcome o = it.next();
        spanSeconds[o.key()] = o.fitSeconds() + o.measureSeconds();
        if (o.failure() != null) {
          failed++;
          say(console, "  span %s: %s", ctx.spans.get(o.key()).span().id(), o.failure());
        }
        writers.get(o.line()).accept(o);
      }
      outcomes.unpersist(false);
      ReportOptions report = ReportOptions.defaults();
      for (int l = 0; l < writers.size(); l++) {
        RunRecord.Builder record = record(ctx, profile, l, request, partitioner);
        say(console, "line %s:", lineIds.get(l));
        writers.get(l).write(profile, report, record, gps, console);
        if (folders.get(l) != null) {
          folders.get(l).publish();
        } else {
          RunWriter.publishToHadoop(stagings.get(l), target(request.out(),
              ctx.layout.lines().get(l)));
        }
      }
    } finally {
      for (int l = 0; l < stagings.size(); l++) {
        if (folders.get(l) != null) {
          folders.get(l).close();
        } else {
          RunWriter.deleteQuietly(stagings.get(l));
        }
      }
    }
    double seconds = (System.nanoTime() - t0) / 1e9;
    say(console, "done: %,d survey points, %,d work-area points in %.1f s", ctx.survey
        .pointCount(), workPoints, seconds);
    return new Summary(lineIds, ctx.spans.size(), spec.tiles().size(), plan.skippedTiles,
        plan.pieces.size(), ctx.survey.pointCount(), workPoints, partitioner.numPartitions(),
        share, failed, seconds, new Skew(plan.estimatedPoints.clone(), spanPoints, spanSeconds,
        partitionPoints));
  }

  /**
   * {@code spark-submit ... clearance-spark.jar --survey TILE|FOLDER ... --structures FILE
   * --line FILE ... [--rules NAME|FILE] [--conductors FILE] [--survey-units m|ft|usft]
   * [--vegetation-classes 3,4,5] [--partitions N] --out PATH|URI}; exit code 0, 2 for an input
   * error (one line on stderr), 1 for any other failure.
   */
  public static void main(String[] args) {
    PrintWriter console = new PrintWriter(System.out, true);
    Request request;
    try {
      request = JobArgs.parse(args);
    } catch (org.clearance.InputException | IllegalArgumentException e) {
      System.err.println("clearance-spark: " + e.getMessage());
      System.err.println(JobArgs.USAGE);
      System.exit(2);
      return;
    }
    org.apache.spark.SparkConf conf = new org.apache.spark.SparkConf()
        .setAppName("clearance check");
    if (!conf.contains("spark.master")) {
      conf.setMaster("local[*]");
    }
    int code = 0;
    try (JavaSparkContext sc = new JavaSparkContext(conf)) {
      run(sc, request, console);
    } catch (org.clearance.InputException e) {
      System.err.println("clearance-spark: " + e.getMessage());
      code = 2;
    } catch (IOException | RuntimeException e) {
      System.err.println("clearance-spark: failed: " + e);
      code = 1;
    }
    System.exit(code);
  }

  /** The run folder of a line: {@code out/<line id>}. */
  static String target(String out, LineLayout line) {
    String name = line.spec().lineId().replaceAll("[^A-Za-z0-9._-]", "_");
    return out.endsWith("/") ? out + name : out + "/" + name;
  }

  /** The local path of a target without a scheme or with {@code file:}; else empty. */
  private static Optional<Path> localPath(String target) {
    java.net.URI uri = java.net.URI.create(target);
    if (uri.getScheme() == null) {
      return Optional.of(Path.of(target));
    }
    return "file".equals(uri.getScheme()) ? Optional.of(Path.of(uri)) : Optional.empty();
  }

  private static RunRecord.Builder record(JobContext ctx, RuleProfile profile, int line,
      Request request, SpanPartitioner partitioner) throws IOException {
    JobSpec spec = ctx.spec;
    RunRecord.Builder record = RunRecord.builder("check", spec.toolVersion());
    if (spec.conductors() != null) {
      record.input("conductors", Path.of(spec.conductors()));
    }
    for (String t : spec.tiles()) {
      // Hashing every tile on the driver would read the whole survey there: tiles are
      // recorded by path and size; their hashes are left empty.
      record.input(new RunRecord.InputFile("survey", t, Files.size(Path.of(t)), ""));
    }
    record.input("structures", Path.of(spec.structures()));
    record.input("line", Path.of(ctx.layout.lines().get(line).spec().sourceFile()));
    if (profile != null) {
      record.profile(profile);
    }
    var units = ctx.survey.units();
    return record.parameter("engine", "Apache Spark, " + partitioner.numPartitions()
            + " span partitions")
        .parameter("keep_radius_m", Double.toString(ctx.options.engine().keepRadius()))
        .parameter("survey_units", units.horizontal().symbol() + "/"
            + units.vertical().symbol() + " (" + units.source() + ")")
        .parameter("output_unit", ReportOptions.defaults().outputUnit().symbol())
        .parameter("survey_hashes", "not computed (distributed run)");
  }

  /** A span's points and its fit, paired inside one executor (never serialized). */
  private record SpanWork(int key, Iterable<PointBlock> blocks, SpanFit fit) {}

  /** The pairs of a partition by key (each key once: the RDDs are grouped by span). */
  private static <V> Map<Integer, V> byKey(Iterator<Tuple2<Integer, V>> it) {
    Map<Integer, V> out = new HashMap<>();
    it.forEachRemaining(t -> out.put(t._1(), t._2()));
    return out;
  }

  private static <T, R> Iterator<R> map(Iterator<T> it, java.util.function.Function<T, R> f) {
    return new Iterator<>() {
      @Override
      public boolean hasNext() {
        return it.hasNext();
      }

      @Override
      public R next() {
        return f.apply(it.next());
      }
    };
  }

  private static void say(PrintWriter console, String format, Object... args) {
    console.println(String.format(Locale.ROOT, format, args));
    console.flush();
  }
}
