package org.clearance.spark;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.clearance.ClearanceCheck;
import org.clearance.RunFolder;
import org.clearance.RunModels;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointReader;
import org.clearance.clearance.NearPointWriter;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.ground.GroundSource;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.line.LineLayout;
import org.clearance.report.ReportOptions;
import org.clearance.report.ReportStage;
import org.clearance.rules.RuleProfile;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.RunRecord;
import org.clearance.run.SpanRecord;
import org.clearance.run.TreeRecord;
import org.clearance.wire.ConductorTable;

/**
 * The reduce of one line on the driver: gathers its spans' outcomes as they stream in (the
 * near points go to disk at once), then writes the line's run folder as the command line does:
 * the run model (spans in line order, trees near the line de-duplicated and ranked), the
 * near-points file, the conductor table, then the rules and the report through the core's
 * report stage, and the run record. The folder is staged locally and published only when
 * complete: moved into place on a local file system, copied then renamed on a Hadoop one.
 */
final class RunWriter {
  private final JobContext ctx;
  private final int line;
  private final Path staging;
  private final Path parts;
  private final TreeMap<Integer, SpanOutcome> outcomes = new TreeMap<>();

  RunWriter(JobContext ctx, int line, Path staging) throws IOException {
    this.ctx = ctx;
    this.line = line;
    this.staging = staging;
    this.parts = Files.createTempDirectory(staging, ".parts-");
  }

  /** Takes one span's outcome; its near points go to a part file at once. */
  void accept(SpanOutcome o) throws IOException {
    if (o.nearPoints() != null) {
      Files.write(parts.resolve(o.key() + ".bin"), o.nearPoints());
    }
    outcomes.put(o.key(), new SpanOutcome(o.key(), o.line(), o.modelJson(), o.conductorRows(),
        o.uncertaintyRows(), null, o.ground(), o.points(), o.fitSeconds(), o.measureSeconds(),
        o.failure()));
  }

  /**
   * Writes the run folder into the staging folder.
   *
   * @param gpsRange earliest and latest GPS time of the points read, s (NaN when unknown)
   * @return the report stage's outcome
   */
  ReportStage.Outcome write(RuleProfile profile, ReportOptions report, RunRecord.Builder record,
      double[] gpsRange, PrintWriter console) throws IOException {
    LineLayout layout = ctx.layout.lines().get(line);
    if (outcomes.size() != layout.spans().size()) {
      throw new IllegalStateException("line " + layout.spec().lineId() + ": "
          + outcomes.size() + " span outcomes for " + layout.spans().size() + " spans");
    }
    List<RunModel> models = new ArrayList<>();
    StringBuilder conductors = new StringBuilder(String.join(",", ConductorTable.COLUMNS))
        .append('\n');
    for (SpanOutcome o : outcomes.values()) {
      Path json = parts.resolve(o.key() + ".json");
      Files.writeString(json, o.modelJson(), StandardCharsets.UTF_8);
      models.add(RunModelJson.read(json));
      Files.delete(json);
      conductors.append(o.conductorRows());
    }
    Files.writeString(staging.resolve(ConductorTable.FILE_NAME), conductors.toString(),
        StandardCharsets.UTF_8);
    writeUncertainty();
    writeNearPoints();
    RunModel model = merge(models).withFacts(RunModels.facts(List.of(layout.spec()), record,
        ctx.survey, gpsRange[0], gpsRange[1]));
    RunModelJson.write(model, staging.resolve(RunModel.FILE_NAME));
    deleteParts();
    ReportStage.Outcome outcome = ReportStage.write(staging,
        ReportStage.assess(staging, model, profile, report), report, console);
    ClearanceCheck.writeRecord(staging, record, outcome);
    return outcome;
  }

  /**
   * The line's uncertainty.csv: the core's comment and header lines (written for no span), then
   * the spans' rows in line order.
   */
  private void writeUncertainty() throws IOException {
    Path file = staging.resolve(UncertaintyFile.FILE_NAME);
    UncertaintyFile.write(file, List.of(), ctx.conditions.get(line),
        ctx.options.uncertainty());
    StringBuilder all = new StringBuilder(Files.readString(file, StandardCharsets.UTF_8));
    for (SpanOutcome o : outcomes.values()) {
      all.append(o.uncertaintyRows());
    }
    Files.writeString(file, all.toString(), StandardCharsets.UTF_8);
  }

  /** The data rows of an uncertainty.csv: its lines after the comments and the header. */
  static String uncertaintyRows(String file) {
    StringBuilder out = new StringBuilder();
    boolean header = false;
    for (String line : file.split("\n", -1)) {
      if (line.startsWith("#") || line.isEmpty()) {
        continue;
      }
      if (!header) {
        header = true;
        continue;
      }
      out.append(line).append('\n');
    }
    return out.toString();
  }

  /** One near-points file for the line: spans in line order, conductor names in first use. */
  private void writeNearPoints() throws IOException {
    List<String> spanIds = new ArrayList<>();
    List<String> names = new ArrayList<>();
    java.util.EnumSet<Role> roles = java.util.EnumSet.of(Role.PHASE);
    for (SpanOutcome o : outcomes.values()) {
      spanIds.add(ctx.spans.get(o.key()).span().id());
      Path part = parts.resolve(o.key() + ".bin");
      if (Files.exists(part)) {
        NearPointFile header = NearPointReader.header(part);
        roles.addAll(header.roles());
        for (String n : header.conductors()) {
          if (!names.contains(n)) {
            names.add(n);
          }
        }
      }
    }
    var conditions = ctx.conditions.get(line);
    // roles as the engine lists them: phase first, then the others in their order
    NearPointFile layout = new NearPointFile(conditions.names(), conditions.groups(), spanIds,
        names, List.copyOf(roles));
    try (NearPointWriter out = new NearPointWriter(staging.resolve(NearPointFile.FILE_NAME),
        layout)) {
      for (SpanOutcome o : outcomes.values()) {
        Path part = parts.resolve(o.key() + ".bin");
        if (!Files.exists(part)) {
          continue;
        }
        // a span's task measured its neighbours too (SpanStages.measure): keep its own points
        String id = ctx.spans.get(o.key()).span().id();
        List<PointClearance> points = new ArrayList<>();
        NearPointReader.forEach(part, p -> {
          if (p.spanId().equals(id)) {
            points.add(p);
          }
        });
        out.write(points);
        Files.delete(part);
      }
    }
  }

  /**
   * The line's run model from its spans' models. A tree measured from two spans' work areas (it
   * stands in both tree regions) is kept once, with the span whose conductor is nearest to its
   * base (ties to the earlier span), as the whole-survey engine assigns it; trees are then
   * numbered in their order along the line, as there.
   */
  private RunModel merge(List<RunModel> parts) {
    List<SpanRecord> spans = new ArrayList<>();
    Map<String, TreeRecord> trees = new HashMap<>();
    List<String> order = new ArrayList<>();
    for (RunModel m : parts) {
      spans.addAll(m.spans());
      for (TreeRecord t : m.trees()) {
        String key = Double.doubleToLongBits(t.x()) + ":" + Double.doubleToLongBits(t.y());
        TreeRecord before = trees.get(key);
        if (before == null) {
          order.add(key);
          trees.put(key, t);
        } else if (t.baseDistances().get(0) < before.baseDistances().get(0)) {
          trees.put(key, t);
        }
      }
    }
    List<TreeRecord> ranked = new ArrayList<>();
    order.forEach(k -> ranked.add(trees.get(k)));
    // numbered in their order along the line, as the command line numbers them
    // (RunModels.treesAlongTheLine): span, station, offset, then position and height
    Map<String, Integer> spanOrder = new HashMap<>();
    Map<String, org.clearance.line.SpanFrame> frames = new HashMap<>();
    for (var span : ctx.layout.lines().get(line).spans()) {
      spanOrder.putIfAbsent(span.id(), spanOrder.size());
      frames.putIfAbsent(span.id(), span.frame());
    }
    ranked.sort(java.util.Comparator
        .comparingInt((TreeRecord t) -> spanOrder.getOrDefault(t.spanId(), Integer.MAX_VALUE))
        .thenComparing(TreeRecord::spanId)
        .thenComparingDouble(t -> along(frames.get(t.spanId()), t, true))
        .thenComparingDouble(t -> along(frames.get(t.spanId()), t, false))
        .thenComparingDouble(TreeRecord::x)
        .thenComparingDouble(TreeRecord::y)
        .thenComparingDouble(TreeRecord::topZ)
        .thenComparingDouble(TreeRecord::heightM));
    List<TreeRecord> numbered = new ArrayList<>();
    for (int i = 0; i < ranked.size(); i++) {
      TreeRecord t = ranked.get(i);
      numbered.add(new TreeRecord(String.format(Locale.ROOT, "TREE%05d", i + 1), t.spanId(),
          t.x(), t.y(), t.topZ(), t.baseZ(), t.heightM(), t.crownRadiusM(), t.baseDistances(),
          t.nearestConductor()));
    }
    RunModel first = parts.get(0);
    return new RunModel(first.toolVersion(), first.units(), first.conditions(),
        first.keepRadiusM(), first.vegetation(), groundDescription(), spans, numbered);
  }

  private static double along(org.clearance.line.SpanFrame f, TreeRecord t, boolean station) {
    if (f == null) {
      return 0;
    }
    return station ? f.station(t.x(), t.y()) : f.offset(t.x(), t.y());
  }

  /** The ground models' counts summed over the spans' work areas. */
  private String groundDescription() {
    long points = 0;
    long ground = 0;
    long surface = 0;
    long groundCells = 0;
    long filled = 0;
    int classified = 0;
    for (SpanOutcome o : outcomes.values()) {
      points += o.ground().points();
      ground += o.ground().groundPoints();
      surface += o.ground().surfaceCells();
      groundCells += o.ground().groundCells();
      filled += o.ground().filledCells();
      classified += o.ground().classified() ? 1 : 0;
    }
    boolean allClassified = classified == outcomes.size();
    GroundSource sum = new GroundSource(allClassified ? GroundSource.Kind.CLASSIFIED
        : GroundSource.Kind.FILTERED, allClassified ? Optional.empty()
        : Optional.of(ctx.options.ground().smrf()), points, ground, surface, groundCells, filled);
    String mixed = classified > 0 && !allClassified
        ? String.format(Locale.ROOT, " %d of %d spans from class-2 points, the others by the "
            + "ground filter.", classified, outcomes.size()) : "";
    return sum.describe() + " Built per span from the span's work area (sums over spans; a "
        + "point in two work areas counts twice)." + mixed;
  }

  private void deleteParts() throws IOException {
    try (var files = Files.list(parts)) {
      for (Path p : files.toList()) {
        Files.delete(p);
      }
    }
    Files.delete(parts);
  }

  /**
   * Publishes a finished staging folder to a Hadoop file system: copied to a temporary name
   * beside the target, the previous run there removed, the copy renamed into place. (A local
   * target is published by the core's {@link RunFolder}, as the command line does.)
   */
  static void publishToHadoop(Path staging, String target) throws IOException {
    org.apache.hadoop.conf.Configuration conf = new org.apache.hadoop.conf.Configuration();
    org.apache.hadoop.fs.Path dst = new org.apache.hadoop.fs.Path(target);
    org.apache.hadoop.fs.FileSystem fs = dst.getFileSystem(conf);
    org.apache.hadoop.fs.Path tmp = new org.apache.hadoop.fs.Path(dst.getParent(),
        "." + dst.getName() + ".staging-" + System.nanoTime());
    fs.copyFromLocalFile(false, true, new org.apache.hadoop.fs.Path(staging.toUri()), tmp);
    if (fs.exists(dst)) {
      fs.delete(dst, true);
    }
    if (!fs.rename(tmp, dst)) {
      throw new IOException("cannot rename " + tmp + " to " + target);
    }
  }

  /** Deletes a local folder and what is in it; errors are ignored. */
  static void deleteQuietly(Path dir) {
    if (dir == null || !Files.exists(dir)) {
      return;
    }
    try (var files = Files.walk(dir)) {
      files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    } catch (IOException | java.io.UncheckedIOException e) {
      // a temporary folder left behind is harmless
    }
  }
}
