package org.clearance.clearance;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.line.ConductorPosition;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.line.LineLayout;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.line.SpanLayout;
import org.clearance.line.StructureType;
import org.clearance.line.TensionSection;
import org.clearance.sag.ConditionSolver;
import org.clearance.sag.ConditionState;
import org.clearance.sag.InsulatorSwing;
import org.clearance.sag.SectionSurvey;
import org.clearance.sag.SectionTension;
import org.clearance.sag.SpanTemperature;
import org.clearance.sag.SurveyTemperatures;
import org.clearance.sag.SuspensionString;
import org.clearance.sag.TemperatureEstimate;
import org.clearance.wire.ConductorCurve;

/**
 * Builds every conductor's geometry in every condition of a run from the fitted survey state
 * (docs/methods.md section 3.5): per tension section and conductor, the survey
 * tension from the fitted catenary constants of the section's spans ({@link SectionTension}),
 * the section's ruling span and the survey temperature of the line specification; then per span
 * the state in each condition ({@link ConditionSolver}).
 *
 * <p>Wind conditions of a line whose specification gives suspension string lengths are measured
 * as two states, wind from the left and from the right ({@link InsulatorSwing}); the run's
 * condition set then names them {@code <name>@left} and {@code <name>@right}.
 */
public final class ConditionModels {

  /** Suffixes of the two wind directions of a wind condition with insulator swing. */
  public static final String LEFT = "@left";
  public static final String RIGHT = "@right";

  private ConditionModels() {}

  /** The run's conditions: surveyed state, then the specifications' conditions. */
  public static ConditionSet conditionSet(List<LineSpec> specs) {
    List<String> names = new ArrayList<>(List.of(ConditionDistance.SURVEY));
    List<String> groups = new ArrayList<>(List.of(ConditionDistance.SURVEY));
    for (LineSpec spec : specs) {
      for (LineCondition c : spec.conditions()) {
        List<String> variants = hasStrings(spec) && c.kind() == LineCondition.Kind.WIND
            ? List.of(c.name() + LEFT, c.name() + RIGHT) : List.of(c.name());
        for (String v : variants) {
          if (!names.contains(v)) {
            names.add(v);
            groups.add(ConditionSet.group(c));
          }
        }
      }
    }
    return new ConditionSet(names, groups);
  }

  private static boolean hasStrings(LineSpec spec) {
    return spec.conductors().stream().anyMatch(p -> Double.isFinite(p.insulatorLengthM()));
  }

  /**
   * Conductor models for every span with fitted conductors.
   *
   * @param layout spans and tension sections
   * @param fitted per span id, the conductors fitted to the survey
   * @param conditions the run's conditions from {@link #conditionSet}
   * @param solver the condition solver
   * @return per span id, the conductors in every condition (spans without fitted conductors map
   *     to an empty list)
   */
  public static Map<String, List<ConductorModel>> build(SpanLayout layout,
      Map<String, List<SurveyedConductor>> fitted, ConditionSet conditions,
      ConditionSolver solver) {
    return build(layout, fitted, conditions, solver, SurveyTemperatures.givenOnly());
  }

  /**
   * Conductor models for every span with fitted conductors, the survey temperature of each tension
   * section and position from {@code temperatures}.
   *
   * @see #build(SpanLayout, Map, ConditionSet, ConditionSolver)
   */
  public static Map<String, List<ConductorModel>> build(SpanLayout layout,
      Map<String, List<SurveyedConductor>> fitted, ConditionSet conditions,
      ConditionSolver solver, SurveyTemperatures temperatures) {
    return build(layout, fitted, conditions, solver, temperatures, null);
  }

  /**
   * Conductor models with the uncertainty of every state ({@link UncertaintyPropagation}).
   *
   * @param uncertainty input uncertainties, or null for models without uncertainties
   * @see #build(SpanLayout, Map, ConditionSet, ConditionSolver, SurveyTemperatures)
   */
  public static Map<String, List<ConductorModel>> build(SpanLayout layout,
      Map<String, List<SurveyedConductor>> fitted, ConditionSet conditions,
      ConditionSolver solver, SurveyTemperatures temperatures, UncertaintyOptions uncertainty) {
    UncertaintyPropagation propagation = uncertainty == null ? null
        : new UncertaintyPropagation(solver, uncertainty);
    Map<String, List<ConductorModel>> out = new LinkedHashMap<>();
    for (LineLayout line : layout.lines()) {
      Map<String, String> why = new HashMap<>();
      Map<String, Double> sigmas = new HashMap<>();
      Map<String, SectionSurvey> sections = sectionSurveys(line, fitted, temperatures, why,
          sigmas);
      List<Span> spans = line.spans();
      for (int i = 0; i < spans.size(); i++) {
        Span span = spans.get(i);
        double before = i > 0 ? spans.get(i - 1).lengthM() : span.lengthM();
        double after = i + 1 < spans.size() ? spans.get(i + 1).lengthM() : span.lengthM();
        List<ConductorModel> models = new ArrayList<>();
        for (SurveyedConductor c : fitted.getOrDefault(span.id(), List.of())) {
          SectionSurvey section = sections.getOrDefault(sectionKey(line.section(span), c.name()),
              SectionSurvey.unknown());
          String key = sectionKey(line.section(span), c.name());
          ConductorModel m = model(line.spec(), span, c, section, conditions, solver, before,
              after, spans, i, why.get(key));
          models.add(propagation == null ? m : withUncertainty(m, line.spec(), c, section,
              sigmas.getOrDefault(key, Double.NaN), conditions, solver, propagation));
        }
        out.put(span.id(), models);
      }
    }
    return out;
  }

  private static ConductorModel model(LineSpec spec, Span span, SurveyedConductor c,
      SectionSurvey section, ConditionSet conditions, ConditionSolver solver, double before,
      double after, List<Span> spans, int index, String temperatureProblem) {
    Optional<ConductorPosition> position = spec.position(c.position());
    ConductorType type = position.map(ConductorPosition::conductor).orElse(null);
    List<Optional<ConductorState>> states = new ArrayList<>();
    List<Optional<String>> failures = new ArrayList<>();
    states.add(Optional.of(ConductorState.surveyed(c.curve(), c.surveySwingRad())));
    failures.add(Optional.empty());
    for (int k = 1; k < conditions.size(); k++) {
      String name = conditions.names().get(k);
      String base = baseName(name);
      Optional<LineCondition> condition = spec.condition(base);
      if (condition.isEmpty()) {
        states.add(Optional.empty());
        failures.add(Optional.of("line " + spec.lineId() + " has no condition '" + base + "'"));
        continue;
      }
      try {
        ConditionState state = solver.state(c.curve(), type, section, condition.get());
        if (!name.equals(base)) {
          state = withStrings(state, span, position, name.endsWith(LEFT), before, after, spans,
              index);
        }
        states.add(Optional.of(ConductorState.of(state)));
        failures.add(Optional.empty());
      } catch (IllegalArgumentException e) {
        states.add(Optional.empty());
        String message = temperatureProblem != null
            && Double.isNaN(section.conductorTemperatureC())
            && condition.get().needsChangeOfState() ? temperatureProblem : e.getMessage();
        failures.add(Optional.of(position.isEmpty() && type == null
            ? "conductor " + c.name() + " is not in the line specification: " + message
            : message));
      }
    }
    return new ConductorModel(c.name(), c.role(), states, failures);
  }

  /** The model with the uncertainty of each state it has. */
  private static ConductorModel withUncertainty(ConductorModel m, LineSpec spec,
      SurveyedConductor c, SectionSurvey section, double sigmaT, ConditionSet conditions,
      ConditionSolver solver, UncertaintyPropagation propagation) {
    ConductorType type = spec.position(c.position()).map(ConductorPosition::conductor)
        .orElse(null);
    List<Optional<StateUncertainty>> u = new ArrayList<>();
    u.add(Optional.of(propagation.survey(c.curve(), c.covariance())));
    for (int k = 1; k < conditions.size(); k++) {
      Optional<LineCondition> condition = spec.condition(baseName(conditions.names().get(k)));
      if (m.states().get(k).isEmpty() || condition.isEmpty()) {
        u.add(Optional.empty());
        continue;
      }
      try {
        ConditionState base = solver.state(c.curve(), type, section, condition.get());
        u.add(Optional.of(propagation.condition(c.curve(), c.covariance(), type, section, sigmaT,
            condition.get(), base)));
      } catch (IllegalArgumentException e) {
        // A perturbed state without a solution: the uncertainty is unknown, never zero.
        u.add(Optional.empty());
      }
    }
    return new ConductorModel(m.name(), m.role(), m.states(), m.failures(), u);
  }

  private static ConditionState withStrings(ConditionState state, Span span,
      Optional<ConductorPosition> position, boolean left, double before, double after,
      List<Span> spans, int index) {
    double length = position.map(ConductorPosition::insulatorLengthM).orElse(Double.NaN);
    SuspensionString atA = null;
    SuspensionString atB = null;
    if (Double.isFinite(length) && length > 0) {
      if (span.from().type() == StructureType.SUSPENSION) {
        atA = SuspensionString.between(length, before, span.lengthM());
      }
      if (span.to().type() == StructureType.SUSPENSION) {
        atB = SuspensionString.between(length, span.lengthM(), after);
      }
    }
    return InsulatorSwing.displaced(state, atA, atB,
        left ? ConditionState.SwingSide.LEFT : ConditionState.SwingSide.RIGHT);
  }

  /** The specification's condition name of a run condition name (without a wind side). */
  public static String baseName(String runCondition) {
    if (runCondition.endsWith(LEFT)) {
      return runCondition.substring(0, runCondition.length() - LEFT.length());
    }
    if (runCondition.endsWith(RIGHT)) {
      return runCondition.substring(0, runCondition.length() - RIGHT.length());
    }
    return runCondition;
  }

  private static Map<String, SectionSurvey> sectionSurveys(LineLayout line,
      Map<String, List<SurveyedConductor>> fitted, SurveyTemperatures temperatures,
      Map<String, String> why, Map<String, Double> sigmas) {
    LineSpec spec = line.spec();
    Map<String, List<ConductorCurve>> curves = new HashMap<>();
    Map<String, String> positions = new HashMap<>();
    for (Span span : line.spans()) {
      for (SurveyedConductor c : fitted.getOrDefault(span.id(), List.of())) {
        String key = sectionKey(line.section(span), c.name());
        curves.computeIfAbsent(key, k -> new ArrayList<>()).add(c.curve());
        positions.put(key, c.position());
      }
    }
    Map<String, SectionSurvey> out = new HashMap<>();
    for (TensionSection section : line.sections()) {
      for (Map.Entry<String, List<ConductorCurve>> e : curves.entrySet()) {
        if (!e.getKey().startsWith(section.id() + "|")) {
          continue;
        }
        Optional<ConductorPosition> position = spec.position(positions.get(e.getKey()));
        double w = position.map(p -> p.conductor().weightPerLength()).orElse(Double.NaN);
        SectionTension tension = SectionTension.estimate(e.getValue(), w);
        TemperatureEstimate t = temperatures.estimate(spec, section, position.orElse(null));
        if (!t.isKnown()) {
          why.put(e.getKey(), t.detail());
        }
        sigmas.put(e.getKey(), t.sigmaC());
        out.put(e.getKey(), new SectionSurvey(section.rulingSpanM(), tension.horizontalTension(),
            t.temperatureC()));
      }
    }
    return out;
  }

  /**
   * Per span id, the survey temperature of its first phase position (the one its change of state
   * uses): the span's own and its tension section's, for reports.
   */
  public static Map<String, SpanTemperature> spanTemperatures(SpanLayout layout,
      SurveyTemperatures temperatures) {
    Map<String, SpanTemperature> out = new LinkedHashMap<>();
    for (LineLayout line : layout.lines()) {
      LineSpec spec = line.spec();
      ConductorPosition phase = spec.phases().isEmpty() ? null : spec.phases().get(0);
      Map<String, TemperatureEstimate> bySection = new HashMap<>();
      for (Span span : line.spans()) {
        TensionSection section = line.section(span);
        TemperatureEstimate ofSection = bySection.computeIfAbsent(section.id(),
            k -> temperatures.estimate(spec, section, phase));
        out.put(span.id(), new SpanTemperature(temperatures.estimate(spec, span, phase),
            ofSection));
      }
    }
    return out;
  }

  private static String sectionKey(TensionSection section, String conductor) {
    return section.id() + "|" + conductor;
  }

  /** Text for logs: conditions and how many states each could be computed for. */
  public static String summary(ConditionSet conditions, Map<String, List<ConductorModel>> models) {
    StringBuilder sb = new StringBuilder();
    for (int k = 0; k < conditions.size(); k++) {
      int ok = 0;
      int all = 0;
      for (List<ConductorModel> list : models.values()) {
        for (ConductorModel m : list) {
          all++;
          if (m.states().get(k).isPresent()) {
            ok++;
          }
        }
      }
      sb.append(String.format(Locale.ROOT, "%s%s %d/%d", sb.length() > 0 ? ", " : "",
          conditions.names().get(k), ok, all));
    }
    return sb.toString();
  }
}
