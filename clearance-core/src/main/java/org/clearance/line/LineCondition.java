package org.clearance.line;

import java.util.Objects;

/**
 * One named line condition to check, as the line specification defines it (see
 * docs/line-inputs.md). Values the kind does not use are NaN.
 *
 * @param name unique name used in reports, e.g. {@code hot}
 * @param kind what changes relative to the surveyed state
 * @param temperatureC conductor temperature, degC, or NaN
 * @param creepAllowanceC future creep as an equivalent temperature increase, degC (&ge; 0; 0 if
 *     none) for TEMPERATURE, ICE and WIND; NaN for SWING and EXTRA_SAG
 * @param iceThicknessM radial ice thickness, m (&ge; 0): given for ICE; given or 0 (bare
 *     conductor) for WIND; NaN for the other kinds
 * @param iceDensityKgM3 ice density, kg/m^3 (913 glaze by default) for ICE and WIND (so
 *     thickness times density is always defined there); NaN for the other kinds
 * @param windPressurePa wind pressure on the projected conductor area, Pa, or NaN
 * @param swingAngleRad explicit swing angle from vertical, radians in [0, pi/2], or NaN
 * @param extraSagM extra mid-span sag over the surveyed sag, m, or NaN
 */
public record LineCondition(
    String name,
    Kind kind,
    double temperatureC,
    double creepAllowanceC,
    double iceThicknessM,
    double iceDensityKgM3,
    double windPressurePa,
    double swingAngleRad,
    double extraSagM) {

  /** Glaze ice density, kg/m^3 (docs/methods.md section 3.7: 913, 57 lb/ft^3). */
  public static final double GLAZE_ICE_DENSITY = 913.0;

  /** What a condition changes relative to the surveyed state. */
  public enum Kind {
    /** Conductor temperature (e.g. maximum operating temperature), by change of state. */
    TEMPERATURE,
    /** Radial ice on the conductor at a temperature, by change of state. */
    ICE,
    /** Wind pressure on the (possibly iced) conductor: blowout swing angle and tension. */
    WIND,
    /** An explicit swing angle of the surveyed conductor about its chord. */
    SWING,
    /** An explicit extra mid-span sag, for users without conductor data. */
    EXTRA_SAG
  }

  /** The report column a condition kind reports under. */
  public enum ReportGroup {
    HOT,
    BLOWOUT,
    ICE
  }

  public LineCondition {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(kind, "kind");
  }

  /** The report group: temperature and extra sag report as hot, wind and swing as blowout. */
  public ReportGroup reportGroup() {
    switch (kind) {
      case TEMPERATURE:
      case EXTRA_SAG:
        return ReportGroup.HOT;
      case WIND:
      case SWING:
        return ReportGroup.BLOWOUT;
      case ICE:
        return ReportGroup.ICE;
      default:
        throw new AssertionError(kind);
    }
  }

  /** True when the condition needs a change-of-state calculation (and so conductor data). */
  public boolean needsChangeOfState() {
    return kind == Kind.TEMPERATURE || kind == Kind.ICE || kind == Kind.WIND;
  }
}
