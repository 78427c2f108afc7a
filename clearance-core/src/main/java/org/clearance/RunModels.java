package org.clearance;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.clearance.ClearanceEngine;
import org.clearance.clearance.ConditionSet;
import org.clearance.clearance.ConductorModel;
import org.clearance.clearance.ConductorState;
import org.clearance.clearance.Measurement;
import org.clearance.clearance.SpanClearance;
import org.clearance.clearance.SpanModel;
import org.clearance.clearance.SpanStatus;
import org.clearance.clearance.TreeClearance;
import org.clearance.clearance.VegetationSelector;
import org.clearance.ground.GroundModel;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;
import org.clearance.line.Structure;
import org.clearance.line.SurveyTemperatureSpec;
import org.clearance.run.ConductorRecord;
import org.clearance.run.CurveRecord;
import org.clearance.run.LineFacts;
import org.clearance.run.RunFacts;
import org.clearance.run.RunModel;
import org.clearance.run.RunRecord;
import org.clearance.run.SpanRecord;
import org.clearance.run.StructureRecord;
import org.clearance.run.TreeRecord;
import org.clearance.sag.SpanTemperature;
import org.clearance.sag.TemperatureEstimate;
import org.clearance.survey.GpsTime;
import org.clearance.survey.Survey;
import org.clearance.survey.SurveyUnits;
import org.clearance.wire.Crossing;
import org.clearance.wire.FittedConductor;
import org.clearance.wire.SpanWires;
import org.clearance.wire.StructureChange;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireResult;

/**
 * Assembles the {@link RunModel} of a check from what each stage produced. Public for runs that
 * produce the stages' results elsewhere (the Spark job builds one span's model at a time).
 */
public final class RunModels {

  private RunModels() {}

  /**
   * The header facts of a check: the lines as specified, the input files hashed so far, the
   * survey's acquisition days when every file stores adjusted standard GPS time.
   *
   * @param gpsMin earliest GPS time of the survey, s, or NaN
   * @param gpsMax latest GPS time, s, or NaN
   */
  public static RunFacts facts(List<LineSpec> specs, RunRecord.Builder record, Survey survey,
      double gpsMin, double gpsMax) {
    List<LineFacts> lines = specs.stream().map(LineFacts::of).toList();
    Optional<LocalDate> first = Optional.empty();
    Optional<LocalDate> last = Optional.empty();
    String note;
    if (Double.isNaN(gpsMin)) {
      note = "not known: the point format carries no GPS time";
    } else if (survey.files().stream().allMatch(f -> f.header().adjustedGpsTime())) {
      first = GpsTime.utcDayOfAdjusted(gpsMin);
      last = GpsTime.utcDayOfAdjusted(gpsMax);
      note = "UTC days of the earliest and latest point, from adjusted standard GPS time";
    } else {
      note = "not known: the files store GPS week seconds, which do not name the week";
    }
    List<RunRecord.InputFile> inputs = record.inputs().stream().map(i -> new RunRecord.InputFile(
        i.role(), fileName(i.path()), i.bytes(), i.sha256())).toList();
    return new RunFacts(lines, inputs, first, last, note);
  }

  /**
   * A file's name without its folders: {@code model.json} and the report name an input by its
   * name and SHA-256, never by a folder of the machine it ran on (run.json keeps the path given).
   */
  static String fileName(String path) {
    int cut = Math.max(path.lastIndexOf('/'), path.lastIndexOf('\\'));
    return path.substring(cut + 1);
  }

  /**
   * The run model.
   *
   * @param ground the ground model (its description, and each span's survey coverage)
   * @param wires the fitted spans; the model has one span record per span here, in this order
   * @param spanModels the spans' conductors in every condition
   * @param measured per span what was measured, and the trees near the line (numbered in order)
   */
  public static RunModel of(String toolVersion, SurveyUnits units, ConditionSet conditions,
      CheckOptions options, VegetationSelector vegetation, GroundModel ground, WireResult wires,
      List<SpanModel> spanModels, Measurement measured,
      Map<String, SpanTemperature> temperatures) {
    Map<String, SpanClearance> clearances = new HashMap<>();
    measured.spans().forEach(c -> clearances.put(c.spanId(), c));
    Map<String, SpanModel> models = new HashMap<>();
    spanModels.forEach(m -> models.put(m.span().id(), m));
    Map<String, String> lineNames = new HashMap<>();
    wires.layout().lines().forEach(l -> lineNames.put(l.spec().lineId(), l.spec().displayName()));
    List<SpanRecord> spans = new ArrayList<>();
    for (SpanWires sw : wires.spans()) {
      SpanModel model = models.get(sw.span().id());
      SpanClearance clearance = clearances.get(sw.span().id());
      double coverage = model == null ? Double.NaN : SurveyCoverage.share(model, ground);
      spans.add(span(sw, model, clearance, wires.structureChanges(), conditions,
          options.engine(), lineNames.getOrDefault(sw.span().lineId(), ""), coverage,
          temperatures.get(sw.span().id())));
    }
    List<TreeRecord> trees = new ArrayList<>();
    int n = 0;
    for (TreeClearance t : treesAlongTheLine(measured.trees(), wires)) {
      n++;
      trees.add(new TreeRecord(String.format(Locale.ROOT, "TREE%05d", n), t.spanId(),
          t.tree().x(), t.tree().y(), t.tree().topZ(), t.tree().baseZ(), t.tree().height(),
          t.tree().crownRadius(), t.baseDistances(), t.nearestConductor()));
    }
    return new RunModel(toolVersion, units, conditions, options.engine().keepRadius(),
        vegetation.describe(), ground.source().describe(), spans, trees);
  }

  /**
   * The trees in the order of their place along the line: by span (the run's order), then
   * station along it, offset across it, then position and height. The tree ids are numbered in
   * this order, so they depend on where the trees stand only, never on the order in which
   * threads or tiles found them.
   */
  static List<TreeClearance> treesAlongTheLine(List<TreeClearance> trees, WireResult wires) {
    Map<String, Integer> spanOrder = new HashMap<>();
    Map<String, SpanFrame> frames = new HashMap<>();
    for (SpanWires sw : wires.spans()) {
      spanOrder.putIfAbsent(sw.span().id(), spanOrder.size());
      frames.putIfAbsent(sw.span().id(), sw.span().frame());
    }
    Comparator<TreeClearance> order = Comparator
        .comparingInt((TreeClearance t) -> spanOrder.getOrDefault(t.spanId(), Integer.MAX_VALUE))
        .thenComparing(TreeClearance::spanId)
        .thenComparingDouble(t -> along(frames.get(t.spanId()), t, true))
        .thenComparingDouble(t -> along(frames.get(t.spanId()), t, false))
        .thenComparingDouble(t -> t.tree().x())
        .thenComparingDouble(t -> t.tree().y())
        .thenComparingDouble(t -> t.tree().topZ())
        .thenComparingDouble(t -> t.tree().height());
    List<TreeClearance> sorted = new ArrayList<>(trees);
    sorted.sort(order);
    return sorted;
  }

  private static double along(SpanFrame f, TreeClearance t, boolean station) {
    if (f == null) {
      return 0;
    }
    return station ? f.station(t.tree().x(), t.tree().y()) : f.offset(t.tree().x(), t.tree().y());
  }

  /** Where the span's points were taken for its structures, in plain words. */
  private static String structureZone(SpanModel model, ClearanceEngine.Options engine) {
    if (model != null && !Double.isNaN(model.structureExclusionM())) {
      return String.format(Locale.ROOT, "on a pole (within %.1f m of its centre and %.1f m or"
          + " more above ground) or its arms", Math.min(engine.structureExclusion(),
          model.structureExclusionM()), ClearanceEngine.POLE_FOOT_M);
    }
    return String.format(Locale.ROOT, "within %.1f m of a structure or on its arms",
        engine.structureExclusion());
  }

  private static SpanRecord span(SpanWires sw, SpanModel model, SpanClearance clearance,
      List<StructureChange> changes, ConditionSet conditions, ClearanceEngine.Options engine,
      String lineName, double coverage, SpanTemperature temperature) {
    Span span = sw.span();
    Map<String, ConductorModel> byName = new HashMap<>();
    if (model != null) {
      model.conductors().forEach(c -> byName.put(c.name(), c));
    }
    List<ConductorRecord> conductors = new ArrayList<>();
    List<String> problems = new ArrayList<>();
    for (FittedConductor c : sw.conductors()) {
      ConductorModel m = byName.get(c.name());
      List<Optional<CurveRecord>> states = new ArrayList<>();
      List<Optional<String>> failures = new ArrayList<>();
      for (int k = 0; k < conditions.size(); k++) {
        if (m == null) {
          states.add(Optional.empty());
          failures.add(Optional.of(c.reason().orElse("not fitted")));
          continue;
        }
        Optional<ConductorState> st = m.states().get(k);
        states.add(st.map(CurveRecord::of));
        failures.add(m.failures().get(k));
        if (st.isEmpty()) {
          problems.add("condition " + conditions.names().get(k) + " not computed for "
              + c.name() + ": " + m.failures().get(k).orElse("not computed"));
        }
      }
      conductors.add(new ConductorRecord(c.name(), c.role().name().toLowerCase(Locale.ROOT),
          c.isFitted() ? "fitted" : "not_assessed", c.reason().orElse(""),
          c.quality().points(), c.quality().coveragePct(), c.quality().rmsM(),
          c.quality().maxGapM(), states, failures));
    }
    if (coverage < SurveyCoverage.MIN_SHARE) {
      problems.add(String.format(Locale.ROOT, "the survey covers %.0f %% of the span's corridor "
          + "(sampled every %.0f m, %.0f m beyond the outer conductors); the rest was not "
          + "looked at", 100 * coverage, SurveyCoverage.STEP_M, SurveyCoverage.MARGIN_M));
    }
    if (clearance != null && clearance.unread().count() > 0) {
      SpanClearance.Unread u = clearance.unread();
      problems.add(String.format(Locale.ROOT, "%d points of class %s lie within %.1f m of the "
          + "conductors (nearest %.2f m) in classes not read as vegetation (unknown, or ground "
          + "classes standing above the ground): they may be vegetation; reclassify them or "
          + "name their class with --vegetation-classes", u.count(),
          u.classes().stream().map(String::valueOf).collect(
              java.util.stream.Collectors.joining(", ")), engine.keepRadius(), u.nearestM()));
    }
    SpanStatus status = SpanStatus.ofWires(sw);
    String reason;
    if (status == SpanStatus.NOT_ASSESSED) {
      reason = sw.reason().orElse("no conductor fitted");
    } else if (status == SpanStatus.INCOMPLETE || !problems.isEmpty()) {
      status = SpanStatus.INCOMPLETE;
      List<String> parts = new ArrayList<>();
      sw.reason().ifPresent(parts::add);
      if (!problems.isEmpty()) {
        parts.add(String.join("; ", problems));
      }
      reason = String.join("; ", parts);
    } else {
      status = SpanStatus.ASSESSED;
      reason = "";
    }
    List<String> notes = new ArrayList<>();
    if (temperature != null
        && temperature.section().source() != SurveyTemperatureSpec.Source.NONE) {
      notes.add(temperatureNote(temperature));
    }
    for (StructureChange ch : changes) {
      boolean end = ch.structureId().equals(span.from().id())
          || ch.structureId().equals(span.to().id());
      if (end && !ch.changesLayout()) {
        notes.add("structure " + ch.structureId() + (ch.kind() == StructureChange.Kind.CONFIRMED
            ? " pole found at the structures file's position: " : " pole not located: ")
            + ch.evidence());
      } else if (end) {
        notes.add("structure " + ch.structureId() + " " + ch.kind().name().toLowerCase(Locale.ROOT)
            + String.format(Locale.ROOT, " from (%.2f, %.2f) to (%.2f, %.2f) m: %s",
            ch.fromX(), ch.fromY(), ch.toX(), ch.toY(), ch.evidence()));
      }
    }
    for (Crossing c : sw.crossings()) {
      notes.add(crossingNote(c));
    }
    if (clearance != null && clearance.excludedAsConductor() + clearance.excludedAsStructure()
        + clearance.excludedAsAirborne() + clearance.excludedAsObject()
        + clearance.excludedAsCrossing() > 0) {
      notes.add(String.format(Locale.ROOT, "unclassified points set aside: %d on a wire (on a "
          + "fitted curve within its fit tolerance, or on a long linear piece), %d %s, "
          + "%d isolated airborne (birds, noise), %d of man-made objects "
          + "(mast-like or planar, docs/labelling.md), %d of wires crossing the span",
          clearance.excludedAsConductor(), clearance.excludedAsStructure(),
          structureZone(model, engine), clearance.excludedAsAirborne(),
          clearance.excludedAsObject(), clearance.excludedAsCrossing()));
    }
    if (clearance != null) {
      notes.addAll(measuredNotes(clearance));
    }
    return new SpanRecord(model.context(), lineName, structure(span.from()), structure(span.to()),
        status, reason, conductors, clearance == null ? List.of() : clearance.minima(),
        clearance == null ? 0 : clearance.pointsMeasured(),
        clearance == null ? 0 : clearance.pointsKept(), notes, clearance == null
            ? SpanRecord.SetAsideCounts.NONE : new SpanRecord.SetAsideCounts(
                clearance.excludedAsConductor(), clearance.excludedAsStructure(),
                clearance.excludedAsAirborne(), clearance.excludedAsObject(),
                clearance.excludedAsCrossing(), clearance.wireTouched(),
                clearance.labelsDistrusted()),
        temperatureRecord(temperature), sw.crossings());
  }

  /**
   * The span notes on points measured though their evidence is mixed: wire points touched by
   * vegetation (and the conditions whose minimum stands on one), labels not believed.
   */
  static List<String> measuredNotes(SpanClearance c) {
    List<String> notes = new ArrayList<>();
    if (c.wireTouched() > 0) {
      notes.add(String.format(Locale.ROOT, "%d point%s on a wire touched by vegetation (within "
          + "%.1f m) measured: a branch on the wire and the wire cannot be told apart; the cut "
          + "sites stand on the vegetation beside them%s", c.wireTouched(),
          c.wireTouched() == 1 ? "" : "s", WireFinder.TOUCH_M, c.minimumOnWire().isEmpty() ? ""
              : String.format(Locale.ROOT, "; minimum set by a point on the wire touched by "
              + "vegetation in %s (it may be the wire itself; the vegetation touching it lies "
              + "within %.1f m of it)", String.join(", ", c.minimumOnWire()),
              WireFinder.TOUCH_M)));
    }
    if (c.labelsDistrusted() > 0) {
      notes.add(String.format(Locale.ROOT, "%d point%s whose label was not believed "
          + "(docs/labelling.md): measured as unclassified, or set aside as a man-made object",
          c.labelsDistrusted(), c.labelsDistrusted() == 1 ? "" : "s"));
    }
    return notes;
  }

  /** A crossing wire as the report's span notes give it (where: crossings.csv). */
  static String crossingNote(Crossing c) {
    String below = Double.isFinite(c.separationM())
        ? String.format(Locale.ROOT, ", %.2f m %s conductor %s", Math.abs(c.separationM()),
            c.separationM() >= 0 ? "below" : "above", c.conductor())
        : ", no fitted conductor there to compare";
    return String.format(Locale.ROOT, "a wire crosses the span %.1f m from %s at %.0f degrees"
        + "%s (%d points; not a conductor of this span; crossings.csv)", c.stationM(),
        "the first structure", c.angleDeg(), below, c.points());
  }

  /** The span's and its section's survey temperature as the run model stores them. */
  static SpanRecord.SurveyTemperature temperatureRecord(SpanTemperature t) {
    if (t == null) {
      return SpanRecord.SurveyTemperature.NONE;
    }
    return new SpanRecord.SurveyTemperature(t.span().temperatureC(), t.span().sigmaC(),
        t.span().source().name().toLowerCase(Locale.ROOT), t.section().temperatureC(),
        t.section().sigmaC());
  }

  /** The survey temperature a span's change of state used, for the report. */
  static String temperatureNote(SpanTemperature st) {
    TemperatureEstimate t = st.section();
    if (!t.isKnown()) {
      return "survey conductor temperature unknown: " + t.detail();
    }
    if (t.source() != SurveyTemperatureSpec.Source.COMPUTED) {
      return String.format(Locale.ROOT, "survey conductor temperature %.1f degC, standard "
          + "uncertainty %.1f degC (%s)", t.temperatureC(), t.sigmaC(), t.detail());
    }
    TemperatureEstimate own = st.span();
    String ofSpan = own.isKnown() ? String.format(Locale.ROOT, "this span %.1f degC, standard "
        + "uncertainty %.1f degC, computed by the %s; ", own.temperatureC(), own.sigmaC(),
        own.detail()) : "this span's own not computed (" + own.detail() + "); ";
    return String.format(Locale.ROOT, "survey conductor temperature: %sthe tension section's "
        + "%.1f degC, standard uncertainty %.1f degC, used for the change of state (%s; %s "
        + "dominates the uncertainty)", ofSpan, t.temperatureC(), t.sigmaC(), t.detail(),
        t.dominant());
  }

  private static StructureRecord structure(Structure s) {
    return new StructureRecord(s.id(), s.x(), s.y(), s.groundZ(),
        s.type().name().toLowerCase(Locale.ROOT), s.equipmentText());
  }
}
