package org.clearance.sag;

import java.util.Locale;
import java.util.Objects;
import org.clearance.line.ConductorType;
import org.clearance.line.LineCondition;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * Turns one span's surveyed conductor into its state in a line condition: the entry point the
 * clearance engine calls (methods.md 3.5 and 3.6).
 *
 * <p>By kind of condition:
 * <ul>
 *   <li>TEMPERATURE: change of state on the ruling span from the survey state (H_s, theta_s, w) to
 *       (theta + creep allowance, w) giving H2.
 *   <li>ICE: the same with w2 = w + w_ice.
 *   <li>WIND: the same with the resultant w2 = sqrt((w + w_ice)^2 + wind^2); swing angle
 *       phi = atan(wind / (w + w_ice)). The returned curve lies in the vertical plane through the
 *       attachments; the loaded conductor lies in the plane through the chord rotated by phi.
 *   <li>SWING: the surveyed curve with the condition's explicit swing angle.
 *   <li>EXTRA_SAG: the catenary through the same attachments whose vertical mid-span sag below the
 *       chord is larger by the condition's extra sag.
 * </ul>
 *
 * <p>For the three change-of-state kinds the span is regenerated through its own attachment points
 * with c_i' = c_i (H2 / H_s) (w / w2), c_i being the span's own surveyed constant: a span whose
 * fitted c differs from the section mean keeps that relative difference, and when nothing changes
 * (same temperature, no creep allowance, same load) the surveyed curve itself is returned.
 *
 * <p>Missing data (no conductor type, no survey temperature, no section tension ...) or an
 * impossible change of state gives an IllegalArgumentException whose message names the condition
 * and what is missing; the engine reports the span as not assessed for that condition.
 */
public final class ConditionSolver {

  /**
   * Options.
   *
   * @param changeOfState method and knee point of the change of state
   */
  public record Options(ChangeOfState.Options changeOfState) {

    /** Exact catenary-length change of state without knee point. */
    public static final Options DEFAULT = new Options(ChangeOfState.Options.DEFAULT);

    public Options {
      Objects.requireNonNull(changeOfState, "changeOfState");
    }
  }

  private final Options options;

  /** A solver with the given options. */
  public ConditionSolver(Options options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** Shortcut with the default options; see {@link #state}. */
  public static ConditionState solve(ConductorCurve span, ConductorType type,
      SectionSurvey section, LineCondition condition) {
    return new ConditionSolver(Options.DEFAULT).state(span, type, section, condition);
  }

  /**
   * The span's conductor in a line condition.
   *
   * @param span the span's surveyed (fitted) conductor
   * @param type its conductor type, or null when unknown (enough for SWING and EXTRA_SAG)
   * @param section ruling span, survey tension and survey temperature of its tension section
   * @param condition the line condition
   * @return the state in that condition
   * @throws IllegalArgumentException naming the condition when data are missing or invalid, or
   *     the change of state has no physical solution
   */
  public ConditionState state(ConductorCurve span, ConductorType type, SectionSurvey section,
      LineCondition condition) {
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(section, "section");
    Objects.requireNonNull(condition, "condition");
    switch (condition.kind()) {
      case SWING:
        return swing(span, type, condition);
      case EXTRA_SAG:
        return extraSag(span, type, condition);
      default:
        return changeOfState(span, type, section, condition);
    }
  }

  private static ConditionState swing(ConductorCurve span, ConductorType type,
      LineCondition condition) {
    double angle = condition.swingAngleRad();
    if (!(angle >= 0 && angle <= Math.PI / 2)) {
      throw missing(condition, "a swing angle between 0 and 90 degrees (swing_angle_deg)");
    }
    String basis = String.format(Locale.ROOT, "surveyed curve swung up to %.1f deg",
        Math.toDegrees(angle));
    return new ConditionState(condition, span, angle, ConditionState.SwingSide.BOTH, Double.NaN,
        bareWeight(type), basis);
  }

  private static ConditionState extraSag(ConductorCurve span, ConductorType type,
      LineCondition condition) {
    double extra = condition.extraSagM();
    if (!(Double.isFinite(extra) && extra > 0)) {
      throw missing(condition, "a positive extra sag (extra_sag_m)");
    }
    double surveyed = span.midSpanSag();
    double length = span.length();
    Catenary deeper = Catenary.withMidSpanSag(0, span.zA(), length, span.zB(), surveyed + extra);
    String basis = String.format(Locale.ROOT, "surveyed mid-span sag %.2f m plus %.2f m",
        surveyed, extra);
    return new ConditionState(condition, new ConductorCurve(span.plan(), deeper), 0.0,
        ConditionState.SwingSide.BOTH, Double.NaN, bareWeight(type), basis);
  }

  private ConditionState changeOfState(ConductorCurve span, ConductorType type,
      SectionSurvey section, LineCondition condition) {
    if (type == null) {
      throw missing(condition, "conductor data: conductor type unknown");
    }
    if (Double.isNaN(section.rulingSpan())) {
      throw missing(condition, "the ruling span of its tension section");
    }
    if (Double.isNaN(section.horizontalTension())) {
      throw missing(condition, "the survey tension of its tension section");
    }
    if (Double.isNaN(section.conductorTemperatureC())) {
      throw missing(condition,
          "the conductor temperature during the survey (survey_conductor_temperature_c)");
    }
    if (!Double.isFinite(condition.temperatureC())) {
      throw missing(condition, "a conductor temperature (temperature_c)");
    }
    if (!Double.isFinite(condition.creepAllowanceC())) {
      throw missing(condition, "a finite creep allowance (creep_allowance_c; 0 for none)");
    }
    if (condition.kind() == LineCondition.Kind.ICE && !Double.isFinite(condition.iceThicknessM())) {
      throw missing(condition, "an ice thickness (ice_thickness_mm)");
    }
    double w = type.weightPerLength();
    ConductorLoading loading;
    TensionState to;
    try {
      loading = condition.kind() == LineCondition.Kind.TEMPERATURE
          ? new ConductorLoading(w, 0.0) : ConductorLoading.of(type, condition);
      ChangeOfState solver = new ChangeOfState(ConductorMechanics.of(type), section.rulingSpan(),
          options.changeOfState());
      TensionState from = new TensionState(section.horizontalTension(),
          section.conductorTemperatureC(), w);
      to = solver.to(from, condition.temperatureC() + condition.creepAllowanceC(),
          loading.resultant());
    } catch (IllegalArgumentException e) {
      throw new IllegalArgumentException("condition '" + condition.name() + "': "
          + e.getMessage(), e);
    }
    double ratio = (to.horizontalTension() / section.horizontalTension())
        * (w / to.weightPerLength());
    ConductorCurve curve = ratio == 1.0 ? span : span.withConstant(span.curve().c() * ratio);
    return new ConditionState(condition, curve, loading.swingAngle(),
        ConditionState.SwingSide.BOTH, to.horizontalTension(), to.weightPerLength(),
        basis(condition, section, to, loading));
  }

  private String basis(LineCondition condition, SectionSurvey section, TensionState to,
      ConductorLoading loading) {
    StringBuilder b = new StringBuilder(String.format(Locale.ROOT,
        "change of state to %.1f degC", condition.temperatureC()));
    if (condition.creepAllowanceC() != 0) {
      b.append(String.format(Locale.ROOT, " + %.1f degC creep", condition.creepAllowanceC()));
    }
    double ice = ConductorLoading.iceThickness(condition);
    if (condition.kind() != LineCondition.Kind.TEMPERATURE && ice > 0) {
      b.append(String.format(Locale.ROOT, ", %.1f mm ice", ice * 1000));
    }
    if (condition.kind() == LineCondition.Kind.WIND) {
      b.append(String.format(Locale.ROOT, ", %.0f Pa wind, swing %.1f deg",
          condition.windPressurePa(), Math.toDegrees(loading.swingAngle())));
    }
    b.append(String.format(Locale.ROOT, ", ruling span %.1f m, H %.0f N -> %.0f N",
        section.rulingSpan(), section.horizontalTension(), to.horizontalTension()));
    ChangeOfState.Options o = options.changeOfState();
    if (o.method() == ChangeOfState.Method.PARABOLIC) {
      b.append(" (parabolic)");
    }
    if (o.kneePoint()) {
      b.append(String.format(Locale.ROOT, " (knee point %.0f degC)", o.kneeTemperatureC()));
    }
    return b.toString();
  }

  private static double bareWeight(ConductorType type) {
    return type == null ? Double.NaN : type.weightPerLength();
  }

  private static IllegalArgumentException missing(LineCondition condition, String what) {
    return new IllegalArgumentException("condition '" + condition.name() + "' needs " + what);
  }
}
