package org.clearance.assess;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.InputException;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointReader;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.PolePointFile;
import org.clearance.clearance.SpanStatus;
import org.clearance.clearance.UncertaintyFile;
import org.clearance.line.SpanFrame;
import org.clearance.rules.CircuitRules;
import org.clearance.rules.PointFinding;
import org.clearance.rules.Requirement;
import org.clearance.rules.ResolvedZone;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneEvaluator;
import org.clearance.rules.ZoneGap;
import org.clearance.run.RunModel;
import org.clearance.run.SpanRecord;
import org.clearance.run.StructureRecord;
import org.clearance.run.TreeRecord;
import org.clearance.survey.LonLat;

/**
 * Evaluates a finished run under a rule profile: streams {@code near-points.bin} once, checks
 * every point with {@link SpanRules#evaluate}, groups the encroaching points of each span into
 * sites, adds fall-in sites, decides each span's status and ranks the spans; a second pass
 * samples the points of the spans the report draws. Reads only the run model and the stored
 * distances, never the survey. Memory grows with the number of encroaching points and spans
 * (plus a bounded sample per drawn span), not with the survey.
 */
public final class RunAssessor {

  private final RuleProfile profile;
  private final AssessOptions options;

  /**
   * @param profile the profile to apply, or null for none
   * @param options assessment options
   */
  public RunAssessor(RuleProfile profile, AssessOptions options) {
    this.profile = profile;
    this.options = options;
  }

  /** Shortcut: {@code new RunAssessor(profile, options).assess(model, nearPoints)}. */
  public static RunAssessment assess(RunModel model, Path nearPoints, RuleProfile profile,
      AssessOptions options) throws IOException {
    return new RunAssessor(profile, options).assess(model, nearPoints);
  }

  /**
   * @param model the run model
   * @param nearPoints the run's {@code near-points.bin} (not read without a profile)
   * @throws InputException when the near-points file does not belong to the model
   */
  public RunAssessment assess(RunModel model, Path nearPoints) throws IOException {
    LonLat.Lookup geo = LonLat.forUnits(model.units());
    if (profile == null) {
      List<SpanResult> out = new ArrayList<>();
      for (SpanRecord s : model.spans()) {
        String noProfile =
            "no rule profile given: distances were measured but not checked against any zone";
        String reason = s.status() == SpanStatus.NOT_ASSESSED ? s.reason()
            : s.reason().isEmpty() ? noProfile : s.reason() + "; " + noProfile;
        out.add(new SpanResult(s, SpanStatus.NOT_ASSESSED, reason, List.of(),
            OptionalInt.empty(), 0, 0));
      }
      return new RunAssessment(model, Optional.empty(), out, Map.of(), geo.note(),
          geo.transform().isPresent());
    }
    ZoneEvaluator evaluator = new ZoneEvaluator(profile);
    DistanceIntervals intervals = intervals(nearPoints);
    Map<String, SpanState> states = new LinkedHashMap<>();
    for (SpanRecord s : model.spans()) {
      states.put(s.id(), new SpanState(s, CircuitRules.forSpan(evaluator, s.context()),
          intervals));
    }
    NearPointFile layout = NearPointReader.header(nearPoints);
    if (!layout.conditions().equals(model.conditions().names())) {
      throw new InputException(nearPoints, "header", "conditions", "conditions "
          + layout.conditions() + " differ from those of " + RunModel.FILE_NAME + " "
          + model.conditions().names() + ": the files belong to different runs");
    }
    NearPointReader.forEach(nearPoints, p -> {
      SpanState st = states.get(p.spanId());
      if (st == null) {
        throw new InputException(nearPoints, null, "span", "span " + p.spanId()
            + " is not in " + RunModel.FILE_NAME + ": the files belong to different runs");
      }
      st.add(p);
    });
    Map<String, List<TreeRecord>> trees = new HashMap<>();
    for (TreeRecord t : model.trees()) {
      if (!states.containsKey(t.spanId())) {
        throw new InputException(RunModel.FILE_NAME, "tree " + t.id(), "span_id",
            "span " + t.spanId() + " is not in the model");
      }
      trees.computeIfAbsent(t.spanId(), k -> new ArrayList<>()).add(t);
    }
    Map<String, List<SpanRules>> rulesBySpan = new HashMap<>();
    states.forEach((id, st) -> rulesBySpan.put(id, st.circuits.assessed().stream()
        .map(CircuitRules.Part::rules).toList()));
    PoleSites.Result poles = PoleSites.check(model, rulesBySpan,
        nearPoints.resolveSibling(PolePointFile.FILE_NAME));
    for (SpanState st : states.values()) {
      st.poleSites = poles.sites().getOrDefault(st.span.id(), List.of());
      st.poleNotes = poles.notChecked().getOrDefault(st.span.id(), List.of());
    }
    SiteBuilder builder = new SiteBuilder(options.linkDistanceM());
    List<SpanResult> results = new ArrayList<>();
    for (SpanState st : states.values()) {
      results.add(st.result(model, builder, trees.getOrDefault(st.span.id(), List.of()),
          geo.transform()));
    }
    List<SpanResult> ranked = SpanRanking.rank(results);
    return new RunAssessment(model, Optional.of(profile), ranked,
        drawings(nearPoints, states, ranked), geo.note(), geo.transform().isPresent());
  }

  /** The distance intervals the profile asks for, or null when it asks for none. */
  private DistanceIntervals intervals(Path nearPoints) throws IOException {
    double k = profile.coverageFactor();
    if (Double.isNaN(k)) {
      return null;
    }
    Path file = nearPoints.resolveSibling(UncertaintyFile.FILE_NAME);
    UncertaintyFile u = UncertaintyFile.read(file).orElseThrow(() -> new InputException(file,
        null, null, "rule profile " + profile.name() + " asks for findings at a "
            + profile.confidencePercent() + " % confidence level, but the run folder has no "
            + UncertaintyFile.FILE_NAME + " (made by an older version): run the check again"));
    return new DistanceIntervals(u, k, profile.confidencePercent());
  }

  /**
   * Point samples of the spans the report draws (the first spans with sites in ranking
   * order), from a second pass over the file, so that memory stays bounded by the drawn spans.
   */
  private Map<String, SpanPoints> drawings(Path nearPoints, Map<String, SpanState> states,
      List<SpanResult> ranked) throws IOException {
    Map<String, SpanPoints> out = new HashMap<>();
    for (SpanResult r : ranked) {
      if (out.size() < options.drawnSpans() && !r.sites().isEmpty()) {
        out.put(r.id(), new SpanPoints(options.drawnPointsPerSpan()));
      }
    }
    if (out.isEmpty() || options.drawnPointsPerSpan() == 0) {
      return out;
    }
    NearPointReader.forEach(nearPoints, p -> {
      SpanPoints sample = out.get(p.spanId());
      if (sample == null) {
        return;
      }
      PointFinding f = states.get(p.spanId()).evaluate(p).finding();
      if (f.violation().isPresent()) {
        sample.addInside(p.x(), p.y(), p.z(), f.violation().get().zone().priority());
      } else {
        sample.addOther(p.x(), p.y(), p.z());
      }
    });
    return out;
  }

  /** Site order within a span: priority, then deficit (largest first), then chainage. */
  public static final Comparator<CutSite> SITE_ORDER = Comparator.comparingInt(CutSite::priority)
      .thenComparingDouble(s -> -s.deficitM())
      .thenComparingDouble(CutSite::chainageM);

  /** What is gathered for one span while the points stream past. */
  private final class SpanState {
    final SpanRecord span;
    final CircuitRules circuits;
    /** The rules that speak for the whole span (fall-in, reference condition): the highest
     * voltage the profile assesses. */
    final SpanRules rules;
    final DistanceIntervals intervals;
    final List<EncroachingPoint> inside = new ArrayList<>();
    List<CutSite> poleSites = List.of();
    List<String> poleNotes = List.of();
    long checked;
    long notAssessed;
    String firstNotAssessed = "";

    SpanState(SpanRecord span, CircuitRules circuits, DistanceIntervals intervals) {
      this.span = span;
      this.circuits = circuits;
      this.rules = circuits.main();
      this.intervals = intervals;
    }

    /**
     * The finding of a point: with its interval when the profile asks for a confidence level;
     * on a span of several voltages the worst over the voltages the profile assesses, each
     * checked against the nearest conductor of its voltage (issue 15).
     */
    DistanceIntervals.Outcome evaluate(PointClearance p) {
      DistanceIntervals.Outcome worst = null;
      for (CircuitRules.Part part : parts()) {
        PointClearance at = p.atVoltage(part.kv());
        DistanceIntervals.Outcome o = intervals == null ? new DistanceIntervals.Outcome(
            part.rules().evaluate(at), Optional.empty()) : intervals.evaluate(part.rules(), at);
        if (worst == null || CircuitRules.worse(o.finding(), worst.finding())) {
          worst = o;
        }
      }
      return worst;
    }

    /** The parts points are checked with: the assessed ones, or the first when none is. */
    private List<CircuitRules.Part> parts() {
      List<CircuitRules.Part> a = circuits.assessed();
      return a.isEmpty() ? circuits.parts().subList(0, 1) : a;
    }

    /** The lowest allowed top over the voltages (the cut that clears every one), m. */
    private double allowedTop(PointClearance p, boolean withGrowth) {
      double top = Double.NaN;
      for (CircuitRules.Part part : parts()) {
        double t = CutHeight.allowedTop(part.rules(), p.atVoltage(part.kv()), withGrowth);
        top = Double.isNaN(top) || t < top ? t : top;
      }
      return top;
    }

    void add(PointClearance p) {
      checked++;
      DistanceIntervals.Outcome o = evaluate(p);
      PointFinding f = o.finding();
      if (f.verdict() == PointFinding.Verdict.INSIDE_ZONE) {
        inside.add(new EncroachingPoint(p.x(), p.y(), p.z(), p.heightAboveGround(),
            f.violation().orElseThrow(), f.yearsToViolation(), allowedTop(p, true),
            allowedTop(p, false), o.interval(), p.wireTouched()));
      } else if (f.verdict() == PointFinding.Verdict.NOT_ASSESSED && notAssessed++ == 0) {
        firstNotAssessed = f.notAssessedReason().orElse("");
      }
    }

    SpanResult result(RunModel model, SiteBuilder builder, List<TreeRecord> trees,
        Optional<LonLat> geo) {
      SpanFrame frame = frameOf(span);
      List<CutSite> sites = new ArrayList<>(builder.build(span.id(), frame, inside));
      List<String> reasons = new ArrayList<>();
      SpanStatus status = span.status();
      if (!span.reason().isEmpty() && status != SpanStatus.ASSESSED) {
        reasons.add(span.reason());
      }
      if (circuits.notAssessedReason().isPresent()) {
        status = SpanStatus.NOT_ASSESSED;
        reasons.add("rule profile " + profile.name() + ": "
            + circuits.notAssessedReason().get());
      } else {
        Optional<String> noCondition = referenceConditionMissing(model);
        if (noCondition.isPresent()) {
          status = SpanStatus.NOT_ASSESSED;
          reasons.add(noCondition.get());
        }
      }
      List<String> partial = new ArrayList<>();
      for (String u : circuits.uncovered()) {
        partial.add("rule profile " + profile.name() + ": " + u);
      }
      for (CircuitRules.Part part : circuits.assessed()) {
        String at = circuits.multiVoltage() ? " at " + part.describe() : "";
        for (ZoneGap g : part.rules().gaps()) {
          partial.add("zone " + g.zone() + at + " not checked: " + g.reason());
        }
        for (ResolvedZone z : part.rules().zones()) {
          if (!z.zone().violationReference() && !selectsAny(z, model)) {
            partial.add("zone " + z.zone().name() + at + " not checked: the run computed no "
                + "condition it applies in (" + z.zone().conditions().describe() + ")");
          }
        }
        for (ResolvedZone z : part.rules().zones()) {
          double reach = reach(z, span.context().lengthM());
          if (reach > model.keepRadiusM()) {
            partial.add(String.format(Locale.ROOT, "zone %s%s reaches %.2f m from the "
                + "conductors, beyond the %.2f m within which the check stored vegetation; run "
                + "the check again with --keep-radius %.0f or more", z.zone().name(), at, reach,
                model.keepRadiusM(), Math.ceil(reach)));
          }
        }
      }
      if (!circuits.assessed().isEmpty()) {
        sites.addAll(poleSites);
        partial.addAll(poleNotes);
      }
      if (notAssessed > 0) {
        partial.add(notAssessed + " vegetation point" + (notAssessed == 1 ? "" : "s")
            + " not checked: " + firstNotAssessed);
      }
      if (rules.assessed()) {
        FallInSites.Result fall = FallInSites.check(rules, model.conditions(), frame, trees,
            RunAssessment.fallInPriority(profile));
        sites.addAll(fall.sites());
        if (profile.fallIn().enabled()) {
          for (String n : fall.notAssessed()) {
            partial.add("fall-in not checked for " + n);
          }
        }
      }
      reasons.addAll(partial);
      if (status == SpanStatus.ASSESSED && !partial.isEmpty()) {
        status = SpanStatus.INCOMPLETE;
      }
      sites.sort(SITE_ORDER);
      List<CutSite> named = new ArrayList<>();
      for (int i = 0; i < sites.size(); i++) {
        CutSite s = sites.get(i).withId(span.id() + "." + (i + 1));
        if (geo.isPresent()) {
          double[] ll = geo.get().of(s.x(), s.y());
          s = s.withLonLat(ll[0], ll[1]);
        }
        named.add(s);
      }
      return new SpanResult(span, status, String.join("; ", reasons), named,
          OptionalInt.empty(), checked, notAssessed);
    }

    /**
     * The farthest 3D distance from a conductor at which a point can be inside the zone, m:
     * the radial distance, or the diagonal of the horizontal and vertical distances, at the
     * span's ends, quarter points and middle (where span-position allowances peak).
     */
    private static double reach(ResolvedZone z, double length) {
      double max = 0;
      for (double f : new double[] {0, 0.25, 0.5, 0.75, 1}) {
        Requirement r = z.at(length, f * length);
        double d = z.radial().isPresent() ? r.radialM() : Math.hypot(r.horizontalM(),
            r.verticalM());
        max = Math.max(max, d);
      }
      return max;
    }

    /** Why the violation-reference zone cannot apply to the run, if it cannot. */
    private Optional<String> referenceConditionMissing(RunModel model) {
      for (CircuitRules.Part part : circuits.assessed()) {
        ResolvedZone ref = part.rules().reference().orElseThrow();
        if (!selectsAny(ref, model)) {
          return Optional.of("the run computed no condition the violation-reference zone "
              + ref.zone().name() + " applies in (" + ref.zone().conditions().describe() + ")");
        }
      }
      return Optional.empty();
    }
  }

  /** Whether a zone applies in at least one of the run's conditions. */
  private static boolean selectsAny(ResolvedZone z, RunModel model) {
    for (int k = 0; k < model.conditions().size(); k++) {
      ConditionDistance probe = new ConditionDistance(model.conditions().names().get(k),
          model.conditions().groups().get(k), Double.NaN, Double.NaN, Double.NaN, "",
          Double.NaN);
      if (z.zone().conditions().selects(probe)) {
        return true;
      }
    }
    return false;
  }

  /** The span's plan frame from its first structure to its second, or null. */
  public static SpanFrame frameOf(SpanRecord span) {
    StructureRecord a = span.from();
    StructureRecord b = span.to();
    if (!(Double.isFinite(a.x()) && Double.isFinite(a.y()) && Double.isFinite(b.x())
        && Double.isFinite(b.y())) || (a.x() == b.x() && a.y() == b.y())) {
      return null;
    }
    return SpanFrame.between(a.x(), a.y(), b.x(), b.y());
  }
}
