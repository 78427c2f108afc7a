package org.clearance;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.clearance.assess.RunAssessment;
import org.clearance.clearance.ClearanceEngine;
import org.clearance.clearance.ConditionModels;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.ConductorModel;
import org.clearance.clearance.Measurement;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointWriter;
import org.clearance.clearance.PolePointFile;
import org.clearance.clearance.PolePointWriter;
import org.clearance.rules.PoleClearing;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanModel;
import org.clearance.clearance.SurveyedConductor;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.clearance.VegetationSelector;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.label.ObjectLabeller;
import org.clearance.label.ObjectLabels;
import org.clearance.label.WireLabels;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.LineLayout;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.Span;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.line.StructureReader;
import org.clearance.line.SurveyTemperatureSpec;
import org.clearance.report.ReportStage;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.RunRecord;
import org.clearance.run.RunRecordJson;
import org.clearance.sag.ConditionSolver;
import org.clearance.sag.SurveyTemperatures;
import org.clearance.sag.SpanTemperature;
import org.clearance.sag.TemperatureEstimate;
import org.clearance.survey.LonLat;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;
import org.clearance.wire.ConductorTable;
import org.clearance.wire.FittedConductor;
import org.clearance.wire.FlightTimes;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireResult;

/**
 * The whole clearance check, from survey files to a finished run folder: read the inputs, build
 * the ground model, find and fit the conductors, compute the line conditions, measure every
 * vegetation point near the line, then evaluate the rule profile and write the reports.
 *
 * <p>Every output goes first into a staging folder beside the run folder; only when every stage
 * has succeeded is that folder published in its place ({@link RunFolder}), so a failed or killed
 * check never leaves a half-written run behind.
 */
public final class ClearanceCheck {

  /** Margin of the labelling region beyond the tree reach, m: the conductors' own offset from
   * the span's chord (a double circuit's outer phase, about 15 m; common practice, no source). */
  public static final double LABEL_REGION_MARGIN_M = 20.0;

  /** Told when each stage ends; the benchmark uses it to read the heap. */
  @FunctionalInterface
  public interface StageObserver {
    /**
     * @param stage the stage that ended (as in run.json's timings)
     * @param seconds how long it took, s
     */
    void stageEnded(String stage, double seconds);
  }

  private final CheckOptions options;
  private final PrintWriter console;
  private final StageObserver observer;
  private final Map<String, Double> timings = new LinkedHashMap<>();
  private long stageStart;

  /**
   * @param options options of every stage
   * @param console where progress and the summary go (never null; use a null writer to mute)
   */
  public ClearanceCheck(CheckOptions options, PrintWriter console) {
    this(options, console, (stage, seconds) -> { });
  }

  /** A check that also tells {@code observer} when each stage ends. */
  public ClearanceCheck(CheckOptions options, PrintWriter console, StageObserver observer) {
    this.options = options;
    this.console = console;
    this.observer = observer;
  }

  /**
   * Runs the check.
   *
   * @param inputs the input files and the run folder
   * @param toolVersion version recorded in the run
   * @return what the report stage did
   * @throws InputException for any problem with the inputs (names file, record and field)
   * @throws IOException when a file cannot be read or written
   */
  public ReportStage.Outcome run(CheckInputs inputs, String toolVersion) throws IOException {
    RunRecord.Builder record = RunRecord.builder("check", toolVersion);
    try (RunFolder folder = RunFolder.replace(inputs.outDir(), "--out")) {
      ReportStage.Outcome outcome = runInto(folder.staging(), inputs, toolVersion, record);
      folder.publish();
      return outcome;
    }
  }

  private ReportStage.Outcome runInto(Path dir, CheckInputs in, String toolVersion,
      RunRecord.Builder record) throws IOException {
    start();
    ConductorLibrary library = ConductorLibrary.builtin();
    if (in.conductors().isPresent()) {
      library = library.withUserFile(in.conductors().get());
      record.input("conductors", in.conductors().get());
      if (!library.replacedCodes().isEmpty()) {
        record.parameter("conductors_replaced", String.join(" ", library.replacedCodes()));
      }
    }
    RuleProfile profile = in.rules().map(RuleProfiles::byNameOrPath).orElse(null);
    Survey survey = Survey.open(in.survey(), in.surveyUnits());
    List<Structure> structures = StructureReader.read(in.structures(), survey.units());
    List<LineSpec> specs = new ArrayList<>();
    for (Path line : in.lines()) {
      specs.add(LineSpecReader.read(line, library));
    }
    SpanLayout layout = SpanLayout.build(structures, specs);
    for (Path p : in.survey()) {
      record.input("survey", p);
    }
    record.input("structures", in.structures());
    for (Path p : in.lines()) {
      record.input("line", p);
    }
    if (profile != null) {
      record.profile(profile);
    }
    say("read inputs: %d survey file(s), %,d points, %d line(s), %d spans; units %s / %s (%s)",
        in.survey().size(), survey.pointCount(), specs.size(), layout.spans().size(),
        survey.units().horizontal().symbol(), survey.units().vertical().symbol(),
        survey.units().source());
    stop("inputs");

    Progress progress = new Progress(console, survey.pointCount());
    SurveyScan scan = scan(survey, progress);
    say("ground: %s", scan.ground.source().describe());
    stop("ground");

    FlightTimes flight = new FlightTimes(layout.spans());
    WireResult wires = new WireFinder(options.wires()).find(consumers -> survey.readParallel(
        options.threads(), progress.wrap("wires", flight.consumers(consumers))), layout,
        scan.ground::heightAboveGround);
    long fittedCount = wires.spans().stream().mapToLong(s -> s.fitted().size()).sum();
    say("wires: %d conductors fitted in %d spans; %d structure change(s)", fittedCount,
        wires.spans().size(), wires.structureChanges().size());
    wires.structureChanges().forEach(c -> say("  %s", c.describe()));
    ConductorTable.write(dir.resolve(ConductorTable.FILE_NAME), wires, survey.units());
    stop("wires");

    VegetationSelector vegetation = VegetationSelector.forSurvey(scan.classCounts,
        options.vegetationClasses());
    if (vegetation.inferred()) {
      ObjectLabels objects = ObjectLabeller.label(consumers -> survey.readParallel(
          options.threads(), progress.wrap("labels", consumers)),
          wires.layout().spans().stream().map(Span::frame).toList(),
          options.engine().treeReach() + LABEL_REGION_MARGIN_M, scan.ground, wires.setAside(),
          vegetation.mixed(), options.threads(), dir);
      String labelling = objects.describe();
      if (WireLabels.anyIn(scan.classCounts)) {
        labelling += "; " + WireLabels.judge(consumers -> survey.readParallel(options.threads(),
            progress.wrap("wire labels", consumers)),
            wires.layout().spans().stream().map(Span::frame).toList(),
            options.engine().treeReach() + LABEL_REGION_MARGIN_M, scan.ground, wires.setAside(),
            objects.echoesInformative()).describe();
      }
      say("labelling: %s", labelling);
      record.parameter("labelling", labelling);
      stop("labelling");
    }

    ConditionSet conditions = ConditionModels.conditionSet(specs);
    Map<String, List<SurveyedConductor>> fitted = surveyed(wires);
    SurveyTemperatures temperatures = surveyTemperatures(survey, flight);
    Map<String, List<ConductorModel>> models = ConditionModels.build(wires.layout(), fitted,
        conditions, new ConditionSolver(options.conditions()), temperatures,
        options.uncertainty());
    Map<String, SpanTemperature> spanTemperatures =
        ConditionModels.spanTemperatures(wires.layout(), temperatures);
    sayTemperatures(specs, spanTemperatures);
    say("conditions: %s", ConditionModels.summary(conditions, models));
    stop("conditions");

    List<SpanModel> spanModels = spanModels(wires.layout(), models);
    ClearanceEngine engine = new ClearanceEngine(spanModels, conditions, scan.ground, vegetation,
        options.engine(), options.trees());
    Measurement measured;
    PolePointFile poleLayout = engine.polePointLayout(
        PoleClearing.keepRadiusM(profile), PoleClearing.keepHeightM(profile));
    try (NearPointWriter out = new NearPointWriter(dir.resolve(NearPointFile.FILE_NAME),
        engine.nearPointLayout());
        PolePointWriter poles = new PolePointWriter(dir.resolve(PolePointFile.FILE_NAME),
            poleLayout)) {
      measured = engine.measure((threads, consumers) -> survey.readParallel(threads,
          progress.wrap("clearance", consumers)), out, wires.setAside(), poles);
      say("clearance: %,d vegetation points stored within %.1f m; %d trees near the line; "
          + "%,d points within %.1f m of %d structures", out.count(),
          options.engine().keepRadius(), measured.trees().size(), poles.count(),
          poleLayout.keepRadiusM(), poleLayout.structures().size());
    }
    UncertaintyFile.write(dir.resolve(UncertaintyFile.FILE_NAME), spanModels, conditions,
        options.uncertainty());
    stop("clearance");

    RunModel model = RunModels.of(toolVersion, survey.units(), conditions, options, vegetation,
        scan.ground, wires, spanModels, measured, spanTemperatures)
        .withFacts(RunModels.facts(specs, record, survey, scan.gpsMin, scan.gpsMax));
    RunModelJson.write(model, dir.resolve(RunModel.FILE_NAME));
    RunAssessment assessed = ReportStage.assess(dir, model, profile, options.report());
    stop("rules");
    ReportStage.Outcome outcome = ReportStage.write(dir, assessed, options.report(), console);
    stop("report");

    record.parameter("threads", Integer.toString(options.threads()))
        .parameter("keep_radius_m", Double.toString(options.engine().keepRadius()))
        .parameter("vegetation", vegetation.describe())
        .parameter("ground", scan.ground.source().describe())
        .parameter("survey_units", survey.units().horizontal().symbol() + "/"
            + survey.units().vertical().symbol() + " (" + survey.units().source() + ")")
        .parameter("output_unit", options.report().outputUnit().symbol());
    timings.forEach(record::timing);
    writeRecord(dir, record, outcome);
    return outcome;
  }

  /**
   * Lists a run's files in its record (the check's own files, the report stage's, the record
   * itself) and writes run.json into {@code dir}; the Spark job writes its record so too.
   */
  public static void writeRecord(Path dir, RunRecord.Builder record, ReportStage.Outcome outcome)
      throws IOException {
    for (String name : List.of(ConductorTable.FILE_NAME, NearPointFile.FILE_NAME,
        UncertaintyFile.FILE_NAME, RunModel.FILE_NAME)) {
      record.output(name);
    }
    if (Files.isRegularFile(dir.resolve(PolePointFile.FILE_NAME))) {
      record.output(PolePointFile.FILE_NAME);
    }
    outcome.written().forEach(record::output);
    record.output(RunRecord.FILE_NAME);
    RunRecordJson.write(dir, record.build());
  }

  /**
   * Per span, the fitted conductors as the line conditions need them. Public for runs that fit
   * the spans elsewhere (the Spark job), so both hand the conditions the same input.
   */
  public static Map<String, List<SurveyedConductor>> surveyed(WireResult wires) {
    Map<String, List<SurveyedConductor>> out = new LinkedHashMap<>();
    for (SpanWires sw : wires.spans()) {
      List<SurveyedConductor> list = new ArrayList<>();
      for (FittedConductor c : sw.fitted()) {
        list.add(new SurveyedConductor(c.name(), c.position().orElse(""),
            c.role().name().toLowerCase(Locale.ROOT), c.curve().orElseThrow(), c.covariance(),
            c.surveySwingRad()));
      }
      out.put(sw.span().id(), list);
    }
    return out;
  }

  /** The survey temperatures: given, or computed at each span's flight time. */
  private static SurveyTemperatures surveyTemperatures(Survey survey, FlightTimes flight) {
    Map<String, Double> times = new LinkedHashMap<>();
    flight.result().forEach((id, t) -> times.put(id, t.meanGps()));
    return surveyTemperatures(survey, times);
  }

  /**
   * The survey temperatures from the spans' flight times: the survey's clock (adjusted GPS time
   * when every file says so) and CRS. Public for runs that date the spans elsewhere (the Spark
   * job), so both hand the conditions the same input.
   *
   * @param spanGpsTimes per span id, its mean GPS time of flight, s (NaN when unknown)
   */
  public static SurveyTemperatures surveyTemperatures(Survey survey,
      Map<String, Double> spanGpsTimes) {
    boolean adjusted = survey.files().stream().allMatch(f -> f.header().adjustedGpsTime());
    LonLat.Lookup geo = LonLat.forUnits(survey.units());
    return new SurveyTemperatures(new SurveyTemperatures.Clock(adjusted), geo.transform(),
        geo.note(), spanGpsTimes);
  }

  private void sayTemperatures(List<LineSpec> specs, Map<String, SpanTemperature> bySpan) {
    if (specs.stream().noneMatch(s -> s.surveyTemperature().source()
        == SurveyTemperatureSpec.Source.COMPUTED)) {
      return;
    }
    Map<String, TemperatureEstimate> distinct = new LinkedHashMap<>();
    bySpan.forEach((id, t) -> distinct.putIfAbsent(t.section().detail(), t.section()));
    for (TemperatureEstimate t : distinct.values()) {
      say("  survey temperature %s: %s", t.isKnown() ? String.format(Locale.ROOT,
          "%.1f +- %.1f degC (%s dominates)", t.temperatureC(), t.sigmaC(), t.dominant())
          : "unknown", t.detail());
    }
  }

  /**
   * The spans of the layout, in layout order, with their conductors in every condition (an empty
   * list for a span without models) and the context the rules need.
   */
  public static List<SpanModel> spanModels(SpanLayout layout,
      Map<String, List<ConductorModel>> models) {
    List<SpanModel> out = new ArrayList<>();
    for (LineLayout line : layout.lines()) {
      for (Span span : line.spans()) {
        SpanContext context = new SpanContext(span.id(), line.spec().lineId(),
            line.spec().nominalVoltageKv(), line.spec().altitudeM(), span.lengthM(),
            line.spec().positionVoltagesKv());
        out.add(new SpanModel(span, context, models.getOrDefault(span.id(), List.of()),
            WireFinder.isPoleLine(line.spec()) ? ClearanceEngine.POLE_COLUMN_M : Double.NaN));
      }
    }
    return out;
  }

  /** What the first pass over the survey collects. */
  private record SurveyScan(GroundModel ground, long[] classCounts, double gpsMin,
      double gpsMax) {}

  private SurveyScan scan(Survey survey, Progress progress) {
    // one builder for all readers: its rasters cover the whole corridor, and a builder per
    // reader would hold them once per thread (the heap then ran out at 100 million points in
    // 400 MiB); decoding stays parallel, only adding a decoded chunk takes the lock
    GroundModelBuilder builder = new GroundModelBuilder(options.ground());
    List<long[]> counts = new ArrayList<>();
    List<double[]> times = new ArrayList<>();
    survey.readParallel(options.threads(), progress.wrap("ground", () -> {
      long[] c = new long[256];
      double[] t = {Double.NaN, Double.NaN};
      counts.add(c);
      times.add(t);
      Consumer<PointChunk> worker = chunk -> {
        synchronized (builder) {
          builder.accept(chunk);
        }
        short[] cls = chunk.classification();
        double[] gps = chunk.gpsTime();
        for (int i = 0; i < chunk.size(); i++) {
          c[cls[i] & 0xFF]++;
          double g = gps[i];
          if (!Double.isNaN(g)) {
            t[0] = Double.isNaN(t[0]) ? g : Math.min(t[0], g);
            t[1] = Double.isNaN(t[1]) ? g : Math.max(t[1], g);
          }
        }
      };
      return worker;
    }));
    long[] total = new long[256];
    double gpsMin = Double.NaN;
    double gpsMax = Double.NaN;
    for (double[] t : times) {
      gpsMin = Double.isNaN(gpsMin) ? t[0] : Double.isNaN(t[0]) ? gpsMin : Math.min(gpsMin, t[0]);
      gpsMax = Double.isNaN(gpsMax) ? t[1] : Double.isNaN(t[1]) ? gpsMax : Math.max(gpsMax, t[1]);
    }
    for (long[] c : counts) {
      for (int k = 0; k < 256; k++) {
        total[k] += c[k];
      }
    }
    return new SurveyScan(builder.build(options.threads()), total, gpsMin, gpsMax);
  }

  private void start() {
    stageStart = System.nanoTime();
  }

  private void stop(String stage) {
    long now = System.nanoTime();
    double s = (now - stageStart) / 1e9;
    timings.put(stage, s);
    observer.stageEnded(stage, s);
    console.printf(Locale.ROOT, "  [%s %.1f s]%n", stage, s);
    console.flush();
    stageStart = now;
  }

  private void say(String format, Object... args) {
    console.println(String.format(Locale.ROOT, format, args));
    console.flush();
  }
}
