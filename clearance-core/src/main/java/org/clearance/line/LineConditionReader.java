package org.clearance.line;

import java.util.List;
import java.util.Locale;
import org.clearance.io.YamlMap;
import org.clearance.line.LineCondition.Kind;

/**
 * Reads one {@code conditions} item of a line specification into a {@link LineCondition}. Each
 * kind has its own keys: a key another kind uses is an error here (it would be silently ignored
 * otherwise), as is a missing required one or a value outside its physical range.
 */
final class LineConditionReader {

  static final List<String> KEYS = List.of("name", "kind", "temperature_c", "creep_allowance_c",
      "ice_thickness_mm", "ice_density_kg_m3", "wind_pressure_pa", "swing_angle_deg",
      "extra_sag_m");

  /** Densest ice accepted, kg/m^3: glaze is 900-917; more is a unit slip. */
  private static final double MAX_ICE_DENSITY = 1000;
  /** Largest swing angle from vertical, degrees (horizontal). */
  private static final double MAX_SWING_DEG = 90;

  private LineConditionReader() {}

  /** The keys a kind accepts; {@code name} and {@code kind} are always accepted. */
  static List<String> keysOf(Kind kind) {
    switch (kind) {
      case TEMPERATURE:
        return List.of("temperature_c", "creep_allowance_c");
      case ICE:
        return List.of("temperature_c", "creep_allowance_c", "ice_thickness_mm",
            "ice_density_kg_m3");
      case WIND:
        return List.of("temperature_c", "creep_allowance_c", "wind_pressure_pa",
            "ice_thickness_mm", "ice_density_kg_m3");
      case SWING:
        return List.of("swing_angle_deg");
      case EXTRA_SAG:
        return List.of("extra_sag_m");
      default:
        throw new AssertionError(kind);
    }
  }

  /**
   * The condition in a mapping whose keys are already limited to {@link #KEYS}.
   *
   * @throws org.clearance.InputException naming the file, line and key of the first problem
   */
  static LineCondition condition(YamlMap m) {
    String name = m.text("name");
    if (name.isEmpty()) {
      throw m.error("name", "condition name is empty");
    }
    Kind kind = kind(m);
    List<String> own = keysOf(kind);
    for (String key : KEYS) {
      if (m.has(key) && !key.equals("name") && !key.equals("kind") && !own.contains(key)) {
        throw m.error(key, "not used by kind " + kindName(kind) + "; its keys are name, kind, "
            + String.join(", ", own));
      }
    }
    switch (kind) {
      case TEMPERATURE:
        return new LineCondition(name, kind, temperature(m), creep(m), Double.NaN, Double.NaN,
            Double.NaN, Double.NaN, Double.NaN);
      case ICE:
        return new LineCondition(name, kind, temperature(m), creep(m),
            iceThickness(m, true), iceDensity(m), Double.NaN, Double.NaN, Double.NaN);
      case WIND:
        return new LineCondition(name, kind, temperature(m), creep(m),
            iceThickness(m, false), iceDensity(m), windPressure(m), Double.NaN, Double.NaN);
      case SWING:
        return new LineCondition(name, kind, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
            Double.NaN, swingAngle(m), Double.NaN);
      case EXTRA_SAG:
        return new LineCondition(name, kind, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
            Double.NaN, Double.NaN, extraSag(m));
      default:
        throw new AssertionError(kind);
    }
  }

  private static Kind kind(YamlMap m) {
    String text = m.text("kind");
    switch (text.toLowerCase(Locale.ROOT).replace('-', '_')) {
      case "temperature":
        return Kind.TEMPERATURE;
      case "ice":
        return Kind.ICE;
      case "wind":
        return Kind.WIND;
      case "swing":
        return Kind.SWING;
      case "extra_sag":
        return Kind.EXTRA_SAG;
      default:
        throw m.error("kind", "'" + text
            + "' is not a condition kind; use temperature, ice, wind, swing or extra_sag");
    }
  }

  static String kindName(Kind kind) {
    return kind.name().toLowerCase(Locale.ROOT);
  }

  private static double temperature(YamlMap m) {
    double t = m.number("temperature_c");
    LineSpecReader.checkRange(m, "temperature_c", t, LineSpecReader.MIN_TEMPERATURE_C,
        LineSpecReader.MAX_TEMPERATURE_C);
    return t;
  }

  private static double creep(YamlMap m) {
    return m.has("creep_allowance_c")
        ? LineSpecReader.plausible(m, "creep_allowance_c", m.number("creep_allowance_c")) : 0;
  }

  /** Radial ice thickness in metres from the mm key; 0 when optional and absent. */
  private static double iceThickness(YamlMap m, boolean required) {
    if (!required && !m.has("ice_thickness_mm")) {
      if (m.has("ice_density_kg_m3")) {
        throw m.error("ice_density_kg_m3", "given without ice_thickness_mm");
      }
      return 0;
    }
    double t = LineSpecReader.plausible(m, "ice_thickness_mm", m.number("ice_thickness_mm"));
    return t * 1e-3;
  }

  private static double iceDensity(YamlMap m) {
    double d = m.number("ice_density_kg_m3", LineCondition.GLAZE_ICE_DENSITY);
    if (!(d > 0 && d <= MAX_ICE_DENSITY)) {
      throw m.error("ice_density_kg_m3", "must be more than 0 and at most "
          + LineSpecReader.fmt(MAX_ICE_DENSITY) + " kg/m^3: " + LineSpecReader.fmt(d));
    }
    return d;
  }

  private static double windPressure(YamlMap m) {
    return LineSpecReader.plausible(m, "wind_pressure_pa", m.number("wind_pressure_pa"));
  }

  private static double swingAngle(YamlMap m) {
    double a = m.number("swing_angle_deg");
    LineSpecReader.checkRange(m, "swing_angle_deg", a, 0, MAX_SWING_DEG);
    return Math.toRadians(a);
  }

  private static double extraSag(YamlMap m) {
    return LineSpecReader.plausible(m, "extra_sag_m", m.number("extra_sag_m"));
  }
}
