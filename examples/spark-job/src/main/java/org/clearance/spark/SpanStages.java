package org.clearance.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.RunModels;
import org.clearance.clearance.ClearanceEngine;
import org.clearance.clearance.ConditionModels;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.ConductorModel;
import org.clearance.clearance.Measurement;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointWriter;
import org.clearance.clearance.SpanModel;
import org.clearance.clearance.SurveyedConductor;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.clearance.VegetationSelector;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.label.ObjectLabeller;
import org.clearance.label.ObjectLabels;
import org.clearance.label.WireLabels;
import org.clearance.line.SpanLayout;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.sag.ConditionSolver;
import org.clearance.sag.SpanTemperature;
import org.clearance.sag.SurveyTemperatures;
import org.clearance.survey.PointChunk;
import org.clearance.wire.ConductorTable;
import org.clearance.wire.FlightTimes;
import org.clearance.wire.PointSource;
import org.clearance.wire.SetAside;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireResult;
import org.clearance.wire.WireStatus;

/**
 * The work of one span, in the order of the command line's stages and with the same core
 * classes: read its points from the tile pieces; ground and wires ({@link #fit}); then, with the
 * fitted conductors of its whole tension section, conditions and distances ({@link #measure}).
 * A failure in a span is caught here and becomes that span's NOT ASSESSED record with the
 * reason, as the command line reports a span it could not assess; it never stops the others.
 */
final class SpanStages {
  /** Points per chunk handed to the stages (as the command line's reader). */
  static final int CHUNK_POINTS = 65_536;

  private SpanStages() {}

  /**
   * Reads a piece and hands each point to the work areas that hold it: (span, points). A piece
   * that cannot be read gives each of its spans a block that says why.
   */
  static List<scala.Tuple2<Integer, PointBlock>> read(JobSpec spec, WorkPlan.Piece piece) {
    JobContext ctx = JobContext.of(spec);
    List<WorkPlan.WorkBox> boxes = piece.boxes();
    PointBlock[] out = new PointBlock[boxes.size()];
    for (int b = 0; b < out.length; b++) {
      out[b] = new PointBlock();
    }
    List<scala.Tuple2<Integer, PointBlock>> result = new ArrayList<>();
    try {
      ctx.survey.readRecords(piece.tile(), piece.first(), piece.count(), chunk -> {
        double[] x = chunk.x();
        double[] y = chunk.y();
        for (int i = 0; i < chunk.size(); i++) {
          for (int b = 0; b < out.length; b++) {
            if (boxes.get(b).contains(x[i], y[i])) {
              out[b].add(chunk, i);
            }
          }
        }
      });
    } catch (RuntimeException e) {
      // A damaged piece fails the spans it feeds, each reported NOT ASSESSED with the reason;
      // the other spans go on.
      String why = String.format(java.util.Locale.ROOT, "records %d-%d of %s could not be "
          + "read: %s", piece.first(), piece.first() + piece.count() - 1,
          ctx.spec.tiles().get(piece.tile()), describe(e));
      for (WorkPlan.WorkBox b : boxes) {
        result.add(new scala.Tuple2<>(b.span(), PointBlock.failed(why)));
      }
      return result;
    }
    for (int b = 0; b < out.length; b++) {
      if (out[b].size() > 0) {
        result.add(new scala.Tuple2<>(boxes.get(b).span(), out[b]));
      }
    }
    return result;
  }

  /** The points of a span as a point source of the core. */
  static PointSource source(Iterable<PointBlock> blocks) {
    return consumers -> feed(blocks, consumers.get());
  }

  private static void feed(Iterable<PointBlock> blocks, Consumer<PointChunk> sink) {
    PointChunk chunk = new PointChunk(CHUNK_POINTS);
    long record = 0;
    for (PointBlock b : blocks) {
      record = b.feed(chunk, record, sink);
    }
  }

  /**
   * Ground model, wires and flight time of one span from the points of its work area.
   *
   * @param key the span's key in the job
   */
  static SpanFit fit(JobSpec spec, int key, Iterable<PointBlock> blocks) {
    long start = System.nanoTime();
    JobContext ctx = JobContext.of(spec);
    JobContext.SpanRef ref = ctx.spans.get(key);
    SpanLayout layout = ctx.lineLayouts.get(ref.line());
    long[] classes = new long[256];
    long[] points = new long[1];
    double[] gps = {Double.NaN, Double.NaN};
    try {
      for (PointBlock b : blocks) {
        if (b.failure() != null) {
          throw new UnreadablePiece(b.failure());
        }
        points[0] += b.size();
        gps[0] = minimum(gps[0], b.gpsMin());
        gps[1] = maximum(gps[1], b.gpsMax());
      }
      GroundModelBuilder builder = new GroundModelBuilder(ctx.options.ground());
      source(blocks).stream(() -> chunk -> {
        builder.accept(chunk);
        for (int i = 0; i < chunk.size(); i++) {
          classes[chunk.classification()[i] & 0xFF]++;
        }
      });
      GroundModel ground = builder.build();
      FlightTimes flight = new FlightTimes(List.of(ref.span()));
      WireFinder.SpanFind found = new WireFinder(ctx.options.wires()).findSpan(
          consumers -> source(blocks).stream(flight.consumers(consumers)), layout,
          ref.span().id(), ground::heightAboveGround);
      double meanGps = flight.result().get(ref.span().id()).meanGps();
      return new SpanFit(key, ground, found.wires(), found, meanGps, points[0], classes, gps,
          seconds(start), null);
    } catch (RuntimeException e) {
      return new SpanFit(key, null, failed(ref, e), null, Double.NaN, points[0], classes, gps,
          seconds(start), describe(e));
    }
  }

  /** The keys of the span's wire points, for the spans near it ({@link #setAside}). */
  static PointKeys wireKeys(SpanFit fit) {
    return new PointKeys(fit.key(), fit.found() == null ? new long[0] : fit.found().wireKeys(),
        new long[0], new long[0], new long[0]);
  }

  /**
   * The span's points that are not vegetation, once the wire points of the spans near it are
   * known: the command line's second step of the wire finder, for this span.
   *
   * @param wires the wire points of the span's partners (itself included)
   * @return the span's points set aside (none when its fit failed), or the failure of this
   *     step (the span is then reported NOT ASSESSED by {@link #measure})
   */
  static PointKeys setAside(SpanFit fit, Iterable<PointKeys> wires) {
    if (fit.found() == null) {
      return new PointKeys(fit.key(), new long[0], new long[0], new long[0], new long[0]);
    }
    try {
      SetAside out = SetAside.none();
      fit.found().setAside(union(wires, false), out);
      return new PointKeys(fit.key(), out.wireKeys(), out.airborneKeys(), out.crossingKeys(),
          out.touchedKeys());
    } catch (RuntimeException e) {
      return new PointKeys(fit.key(), null, null, null, null, describe(e));
    }
  }

  /** One set of the keys of every message ({@code withAirborne}: the airborne, crossing
   * wires' and touched wire points' keys too). */
  static SetAside union(Iterable<PointKeys> messages, boolean withAirborne) {
    List<long[]> w = new ArrayList<>();
    List<long[]> a = new ArrayList<>();
    List<long[]> c = new ArrayList<>();
    List<long[]> t = new ArrayList<>();
    for (PointKeys m : messages) {
      if (m.wire() == null) {
        continue;
      }
      w.add(m.wire());
      if (withAirborne) {
        a.add(m.airborne());
        c.add(m.crossing());
        t.add(m.touched());
      }
    }
    return SetAside.of(concat(w), concat(a), concat(c), concat(t));
  }

  /** The arrays one after the other. */
  private static long[] concat(List<long[]> parts) {
    long[] out = new long[parts.stream().mapToInt(p -> p.length).sum()];
    int n = 0;
    for (long[] p : parts) {
      System.arraycopy(p, 0, out, n, p.length);
      n += p.length;
    }
    return out;
  }

  /** The span's fitted conductors and flight time for its section's tasks. */
  static SectionFit sectionFit(SpanFit fit, JobContext ctx) {
    String id = ctx.spans.get(fit.key()).span().id();
    Map<String, List<SurveyedConductor>> surveyed = ClearanceCheck.surveyed(new WireResult(
        ctx.lineLayouts.get(ctx.spans.get(fit.key()).line()), List.of(fit.wires()),
        List.of()));
    return SectionFit.of(fit.key(), id, fit.meanGps(), surveyed.getOrDefault(id, List.of()));
  }

  /**
   * The spans that need a section's fitted conductors: the section's own spans (ruling span,
   * change of state) and the spans whose tasks measure a span of the section with their own
   * (their partners, {@link JobContext#partners}).
   *
   * @param section the section's spans, in key order
   */
  static List<Integer> receivers(JobContext ctx, List<SectionFit> section) {
    java.util.TreeSet<Integer> out = new java.util.TreeSet<>();
    section.forEach(f -> out.addAll(ctx.partners.get(f.span())));
    return new ArrayList<>(out);
  }

  /** The key of a span's tension section: line index and section index. */
  static String sectionKey(JobContext ctx, int key) {
    JobContext.SpanRef ref = ctx.spans.get(key);
    return ref.line() + "/" + ref.span().sectionIndex();
  }

  /**
   * Conditions and distances of one span: the conductor models from the fitted conductors and
   * flight times of its whole tension section (ruling span, change of state, survey
   * temperature), then every point of its work area measured, skipping the points that the
   * spans near it set aside; the result as a one-span run model, its conductor table rows, its
   * uncertainty rows and its near points.
   *
   * <p>The engine is given the span's partners too (the spans whose work areas meet its own): in
   * a whole-survey run the canopy in which trees are found is the union of all spans' tree
   * regions, so a crown near a structure is seen whole, and a tree is assigned to the nearest
   * span. With its partners the span's task sees the same canopy around the span and keeps only
   * what belongs to the span itself: its minima, its near points (filtered when the line's file
   * is written) and the trees nearest to it.
   *
   * @param sections the fitted conductors of every span of the span's tension section, and of
   *     the sections of its partners
   * @param asides the points set aside by the spans near it (its own message may tell that
   *     its step failed: the span is then NOT ASSESSED; a partner's failure leaves that
   *     partner's points measured as vegetation, the safe side)
   * @param classCounts points per ASPRS class over the work areas (which classes exist)
   */
  static SpanOutcome measure(JobSpec spec, SpanFit fit, Iterable<PointBlock> blocks,
      Iterable<List<SectionFit>> sections, Iterable<PointKeys> asides, long[] classCounts) {
    long start = System.nanoTime();
    JobContext ctx = JobContext.of(spec);
    JobContext.SpanRef ref = ctx.spans.get(fit.key());
    SpanLayout layout = ctx.lineLayouts.get(ref.line());
    ConditionSet conditions = ctx.conditions.get(ref.line());
    CheckOptions options = ctx.options;
    VegetationSelector vegetation = VegetationSelector.forSurvey(classCounts,
        options.vegetationClasses());
    Path temp = null;
    try {
      temp = Files.createTempDirectory("clearance-span");
      if (fit.failure() != null) {
        return outcome(ctx, fit, conditions, vegetation, emptyGround(options), fit.wires(),
            List.of(), null, new Measurement(List.of(), List.of()), null, null, start);
      }
      List<PointKeys> setAside = new ArrayList<>();
      for (PointKeys k : asides) {
        if (k.wire() == null && k.span() == fit.key()) {
          throw new IllegalStateException("setting the span's points aside failed: "
              + k.failure());
        }
        setAside.add(k);
      }
      Map<String, List<SurveyedConductor>> fitted = new LinkedHashMap<>();
      Map<String, Double> times = new LinkedHashMap<>();
      for (List<SectionFit> section : sections) {
        for (SectionFit s : section) {
          List<SurveyedConductor> list = new ArrayList<>();
          s.conductors().forEach(c -> list.add(c.toSurveyed()));
          fitted.put(s.spanId(), list);
          times.put(s.spanId(), s.meanGps());
        }
      }
      SurveyTemperatures temperatures = ClearanceCheck.surveyTemperatures(ctx.survey, times);
      Map<String, List<ConductorModel>> models = ConditionModels.build(layout, fitted,
          conditions, new ConditionSolver(options.conditions()), temperatures,
          options.uncertainty());
      String id = ref.span().id();
      SpanTemperature temperature = ConditionModels.spanTemperatures(layout, temperatures)
          .get(id);
      List<SpanModel> engineSpans = new ArrayList<>();
      for (int k : ctx.partners.get(fit.key())) {
        engineSpans.add(spanModel(layout, models, ctx.spans.get(k).span().id()));
      }
      ClearanceEngine engine = new ClearanceEngine(engineSpans, conditions, fit.ground(),
          vegetation, options.engine(), options.trees());
      SetAside aside = union(setAside, true);
      if (vegetation.inferred()) {
        // the command line's labelling step, over the spans this task measures: man-made
        // objects join the points set aside
        List<org.clearance.line.SpanFrame> frames = engineSpans.stream()
            .map(m -> m.span().frame()).toList();
        double region = options.engine().treeReach() + ClearanceCheck.LABEL_REGION_MARGIN_M;
        ObjectLabels objects = ObjectLabeller.label(consumers -> feed(blocks, consumers.get()),
            frames, region, fit.ground(), aside, vegetation.mixed());
        if (WireLabels.anyIn(classCounts)) {
          // crowns labelled wire (issue 9): measured as unclassified, as on the command line
          WireLabels.judge(consumers -> feed(blocks, consumers.get()), frames, region,
              fit.ground(), aside, objects.echoesInformative());
        }
      }
      Path near = temp.resolve(NearPointFile.FILE_NAME);
      Measurement all;
      try (NearPointWriter out = new NearPointWriter(near, engine.nearPointLayout())) {
        all = engine.measure((threads, consumers) -> feed(blocks, consumers.get()), out,
            aside);
      }
      Measurement measured = new Measurement(
          all.spans().stream().filter(c -> c.spanId().equals(id)).toList(),
          all.trees().stream().filter(t -> t.spanId().equals(id)).toList());
      SpanModel model = spanModel(layout, models, id);
      Path uncertainty = temp.resolve(UncertaintyFile.FILE_NAME);
      UncertaintyFile.write(uncertainty, List.of(model), conditions, options.uncertainty());
      return outcome(ctx, fit, conditions, vegetation, fit.ground(), fit.wires(),
          model.conductors(), temperature, measured, near, uncertainty, start);
    } catch (IOException | RuntimeException e) {
      SpanFit failed = new SpanFit(fit.key(), null, failed(ref, e), null, fit.meanGps(),
          fit.points(), fit.classCounts(), fit.gpsRange(), fit.seconds(), describe(e));
      try {
        return outcome(ctx, failed, conditions, vegetation, emptyGround(options),
            failed.wires(), List.of(), null, new Measurement(List.of(), List.of()), null, null,
            start);
      } catch (IOException again) {
        throw new UncheckedIOException(again);
      }
    } finally {
      deleteQuietly(temp);
    }
  }

  private static SpanOutcome outcome(JobContext ctx, SpanFit fit, ConditionSet conditions,
      VegetationSelector vegetation, GroundModel ground, SpanWires wires,
      List<ConductorModel> models, SpanTemperature temperature, Measurement measured,
      Path near, Path uncertainty, long start) throws IOException {
    JobContext.SpanRef ref = ctx.spans.get(fit.key());
    SpanLayout layout = ctx.lineLayouts.get(ref.line());
    WireResult result = new WireResult(layout, List.of(wires), List.of());
    String id = ref.span().id();
    SpanModel model = spanModel(layout, Map.of(id, models), id);
    RunModel part = RunModels.of(ctx.spec.toolVersion(), ctx.survey.units(), conditions,
        ctx.options, vegetation, ground, result, List.of(model), measured,
        temperature == null ? Map.of() : Map.of(id, temperature));
    String csv = ConductorTable.csv(result, ctx.survey.units());
    String rows = csv.substring(csv.indexOf('\n') + 1);
    byte[] nearBytes = near == null ? null : Files.readAllBytes(near);
    return new SpanOutcome(fit.key(), ref.line(), RunModelJson.toJson(part), rows,
        uncertainty == null ? "" : RunWriter.uncertaintyRows(Files.readString(uncertainty)),
        nearBytes, GroundTally.of(ground.source()), fit.points(), fit.seconds(),
        seconds(start), fit.failure());
  }

  private static SpanModel spanModel(SpanLayout layout, Map<String, List<ConductorModel>> models,
      String spanId) {
    return ClearanceCheck.spanModels(layout, models).stream()
        .filter(m -> m.span().id().equals(spanId)).findFirst().orElseThrow();
  }

  /** A span whose task failed: not assessed, with the reason. */
  private static SpanWires failed(JobContext.SpanRef ref, Exception e) {
    return new SpanWires(ref.span(), WireStatus.NOT_ASSESSED,
        Optional.of("the span's task failed: " + describe(e)), List.of(), 0, false);
  }

  /** A piece of the span's work area could not be read. */
  private static final class UnreadablePiece extends RuntimeException {
    private static final long serialVersionUID = 1L;

    UnreadablePiece(String why) {
      super(why);
    }
  }

  /** What failed: the message of an input error or an unreadable piece, else the class too. */
  private static String describe(Exception e) {
    String m = e.getMessage();
    if (m != null && (e instanceof UnreadablePiece || e instanceof org.clearance.InputException)) {
      return m;
    }
    return e.getClass().getSimpleName() + (m == null ? "" : ": " + m);
  }

  /** The ground model of no points (a failed span has none). */
  private static GroundModel emptyGround(CheckOptions options) {
    return new GroundModelBuilder(options.ground()).build();
  }

  /** The smaller of two times, NaN only when both are. */
  static double minimum(double a, double b) {
    return Double.isNaN(a) ? b : Double.isNaN(b) ? a : Math.min(a, b);
  }

  /** The larger of two times, NaN only when both are. */
  static double maximum(double a, double b) {
    return Double.isNaN(a) ? b : Double.isNaN(b) ? a : Math.max(a, b);
  }

  private static double seconds(long start) {
    return (System.nanoTime() - start) / 1e9;
  }

  private static void deleteQuietly(Path dir) {
    if (dir == null) {
      return;
    }
    try (var files = Files.walk(dir)) {
      files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    } catch (IOException | UncheckedIOException e) {
      // a temporary folder left behind is harmless
    }
  }

  /** Classes present in the counts (for messages). */
  static Set<Integer> present(long[] counts) {
    Set<Integer> out = new HashSet<>();
    for (int c = 0; c < counts.length; c++) {
      if (counts[c] > 0) {
        out.add(c);
      }
    }
    return out;
  }
}
