package org.clearance.line;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.clearance.InputException;
import org.clearance.io.YamlMap;
import org.clearance.line.SurveyTemperatureSpec.HeatInputs;
import org.clearance.line.SurveyTemperatureSpec.Source;

/**
 * Reads how a line specification gives the survey-time conductor temperature: the top-level keys
 * {@code survey_conductor_temperature_c}, {@code survey_conductor_temperature_range_c} and
 * {@code survey_conductor_temperature_source}, or the {@code survey_heat_balance} block
 * (docs/line-inputs.md). Package-private helper of {@link LineSpecReader}.
 */
final class SurveyTemperatureReader {

  /** Top-level keys this reader handles. */
  static final List<String> TOP_KEYS = List.of("survey_conductor_temperature_c",
      "survey_conductor_temperature_range_c", "survey_conductor_temperature_source",
      "survey_heat_balance");
  /** Keys of the heat-balance block. */
  static final List<String> HEAT_KEYS = List.of("current_a", "current_file",
      "current_range_percent", "air_temperature_c", "air_temperature_range_c", "wind_speed_m_s",
      "wind_speed_range_m_s", "wind_from_deg", "wind_from_range_deg", "absorptivity_range",
      "emissivity_range", "survey_date", "latitude_deg", "longitude_deg", "model",
      "ground_albedo", "clearness_ratio", "outer_strand_diameter_mm");

  /** Default current range, % (common practice, no source: a SCADA hourly mean against the
   * current at the moment of the flight). */
  static final double DEFAULT_CURRENT_RANGE_PERCENT = 10;
  /** Default air temperature range, degC (common practice, no source: a weather station some
   * kilometres from the line). */
  static final double DEFAULT_AIR_RANGE_C = 3;
  /** Default wind speed range, m/s, at least this or half the speed (common practice, no source:
   * wind at conductor height differs from a station's 10 m wind). */
  static final double DEFAULT_WIND_RANGE_M_S = 1;
  /** Default wind direction range, degrees (common practice, no source). */
  static final double DEFAULT_WIND_FROM_RANGE_DEG = 45;
  /** Default absorptivity and emissivity range (common practice, no source: new conductors are
   * near 0.3, weathered ones near 0.9). */
  static final double DEFAULT_SURFACE_RANGE = 0.2;
  /** Highest air temperature accepted, degC; lowest is its negative plus 10. */
  private static final double MAX_AIR_C = 60;
  /** Highest wind speed accepted, m/s: no survey flies in a gale. */
  private static final double MAX_WIND_M_S = 40;

  private SurveyTemperatureReader() {}

  /**
   * The survey temperature of a specification.
   *
   * @param top the specification's top-level map
   * @param specFile the specification file (current files are relative to its folder)
   */
  static SurveyTemperatureSpec read(YamlMap top, Path specFile) {
    boolean given = top.has("survey_conductor_temperature_c");
    if (top.has("survey_heat_balance")) {
      if (given) {
        throw top.error("survey_heat_balance", "give either survey_conductor_temperature_c or "
            + "survey_heat_balance, not both");
      }
      for (String k : List.of("survey_conductor_temperature_range_c",
          "survey_conductor_temperature_source")) {
        if (top.has(k)) {
          throw top.error(k, "belongs to survey_conductor_temperature_c, which is not given");
        }
      }
      YamlMap m = YamlMap.strict(top.required("survey_heat_balance").value(), specFile.toString(),
          "the survey_heat_balance block", HEAT_KEYS);
      return new SurveyTemperatureSpec(Source.COMPUTED, Double.NaN, Double.NaN,
          Optional.of(heat(m, specFile)));
    }
    if (!given) {
      for (String k : List.of("survey_conductor_temperature_range_c",
          "survey_conductor_temperature_source")) {
        if (top.has(k)) {
          throw top.error(k, "given without survey_conductor_temperature_c");
        }
      }
      return SurveyTemperatureSpec.none();
    }
    double t = top.number("survey_conductor_temperature_c");
    LineSpecReader.checkRange(top, "survey_conductor_temperature_c", t,
        LineSpecReader.MIN_TEMPERATURE_C, LineSpecReader.MAX_TEMPERATURE_C);
    Source source;
    String text = top.text("survey_conductor_temperature_source", "assumed");
    switch (text.toLowerCase(Locale.ROOT)) {
      case "assumed":
        source = Source.ASSUMED;
        break;
      case "measured":
        source = Source.MEASURED;
        break;
      default:
        throw top.error("survey_conductor_temperature_source", "'" + text
            + "' is not a source; use measured or assumed (or survey_heat_balance to compute it)");
    }
    double range = top.number("survey_conductor_temperature_range_c",
        source == Source.MEASURED ? SurveyTemperatureSpec.DEFAULT_MEASURED_RANGE_C
            : SurveyTemperatureSpec.DEFAULT_ASSUMED_RANGE_C);
    LineSpecReader.checkRange(top, "survey_conductor_temperature_range_c", range, 0, 100);
    return SurveyTemperatureSpec.given(source, t, range);
  }

  private static HeatInputs heat(YamlMap m, Path specFile) {
    double current = Double.NaN;
    Optional<CurrentSeries> series = Optional.empty();
    if (m.has("current_a") == m.has("current_file")) {
      throw m.error("current_a", "give the line current as current_a or as current_file (a CSV"
          + " of time_utc and current_a), exactly one of them");
    }
    if (m.has("current_a")) {
      current = m.number("current_a");
      LineSpecReader.checkRange(m, "current_a", current, 0, CurrentSeries.MAX_CURRENT_A);
    } else {
      Path file = Path.of(m.text("current_file"));
      Path parent = specFile.toAbsolutePath().getParent();
      series = Optional.of(CurrentSeries.read(file.isAbsolute() || parent == null ? file
          : parent.resolve(file)));
    }
    double currentRange = m.number("current_range_percent", DEFAULT_CURRENT_RANGE_PERCENT);
    LineSpecReader.checkRange(m, "current_range_percent", currentRange, 0, 100);
    double air = m.number("air_temperature_c");
    LineSpecReader.checkRange(m, "air_temperature_c", air, -MAX_AIR_C + 10, MAX_AIR_C);
    double airRange = m.number("air_temperature_range_c", DEFAULT_AIR_RANGE_C);
    LineSpecReader.checkRange(m, "air_temperature_range_c", airRange, 0, 30);
    double wind = m.number("wind_speed_m_s");
    LineSpecReader.checkRange(m, "wind_speed_m_s", wind, 0, MAX_WIND_M_S);
    double windRange = m.number("wind_speed_range_m_s",
        Math.max(DEFAULT_WIND_RANGE_M_S, 0.5 * wind));
    LineSpecReader.checkRange(m, "wind_speed_range_m_s", windRange, 0, MAX_WIND_M_S);
    double from = m.number("wind_from_deg", Double.NaN);
    if (m.has("wind_from_deg")) {
      LineSpecReader.checkRange(m, "wind_from_deg", from, 0, 360);
    }
    double fromRange = m.number("wind_from_range_deg", DEFAULT_WIND_FROM_RANGE_DEG);
    LineSpecReader.checkRange(m, "wind_from_range_deg", fromRange, 0, 90);
    double absorptivity = m.number("absorptivity_range", DEFAULT_SURFACE_RANGE);
    LineSpecReader.checkRange(m, "absorptivity_range", absorptivity, 0, 1);
    double emissivity = m.number("emissivity_range", DEFAULT_SURFACE_RANGE);
    LineSpecReader.checkRange(m, "emissivity_range", emissivity, 0, 1);
    Optional<LocalDate> date = Optional.empty();
    if (m.has("survey_date")) {
      String d = m.text("survey_date");
      try {
        date = Optional.of(LocalDate.parse(d));
      } catch (DateTimeParseException e) {
        throw m.error("survey_date", "'" + d + "' is not a date such as 2026-07-14");
      }
    }
    double lat = m.number("latitude_deg", Double.NaN);
    double lon = m.number("longitude_deg", Double.NaN);
    if (m.has("latitude_deg") != m.has("longitude_deg")) {
      throw m.error(m.has("latitude_deg") ? "longitude_deg" : "latitude_deg",
          "give latitude_deg and longitude_deg together, or neither (then the survey CRS gives"
              + " them)");
    }
    if (m.has("latitude_deg")) {
      LineSpecReader.checkRange(m, "latitude_deg", lat, -90, 90);
      LineSpecReader.checkRange(m, "longitude_deg", lon, -180, 180);
    }
    SurveyTemperatureSpec.HeatModel model = SurveyTemperatureSpec.HeatModel.IEEE_738;
    if (m.has("model")) {
      String name = m.text("model");
      model = switch (name.toLowerCase(Locale.ROOT)) {
        case "ieee738" -> SurveyTemperatureSpec.HeatModel.IEEE_738;
        case "cigre601" -> SurveyTemperatureSpec.HeatModel.CIGRE_601;
        default -> throw m.error("model", "'" + name + "' is not a heat-balance model; use"
            + " ieee738 (IEEE Std 738-2012) or cigre601 (CIGRE TB 601)");
      };
    }
    double albedo = m.number("ground_albedo", SurveyTemperatureSpec.DEFAULT_ALBEDO);
    LineSpecReader.checkRange(m, "ground_albedo", albedo, 0, 1);
    double clearness = m.number("clearness_ratio", SurveyTemperatureSpec.DEFAULT_CLEARNESS);
    LineSpecReader.checkRange(m, "clearness_ratio", clearness, 0, 1.5);
    double strand = m.number("outer_strand_diameter_mm", Double.NaN);
    if (m.has("outer_strand_diameter_mm")) {
      LineSpecReader.checkRange(m, "outer_strand_diameter_mm", strand, 0.5, 10);
    }
    for (String key : List.of("ground_albedo", "clearness_ratio", "outer_strand_diameter_mm")) {
      if (m.has(key) && model != SurveyTemperatureSpec.HeatModel.CIGRE_601) {
        throw m.error(key, "only the cigre601 model uses " + key + "; add model: cigre601 or"
            + " remove it");
      }
    }
    return new HeatInputs(current, series, currentRange / 100, air, airRange, wind, windRange,
        from, fromRange, absorptivity, emissivity, date, lat, lon, model, albedo, clearness,
        strand / 1000);
  }
}
