package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import org.clearance.InputException;
import org.clearance.line.SurveyTemperatureSpec.HeatInputs;
import org.clearance.line.SurveyTemperatureSpec.Source;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The survey-temperature keys of a line specification (docs/line-inputs.md). */
class SurveyTemperatureReaderTest {

  private static final ConductorLibrary LIB = ConductorLibrary.builtin();
  private static final String HEAD = "line_id: L1\nnominal_voltage_kv: 115\nconductors:\n"
      + "  - {position: A, role: phase, conductor: Hawk}\n";

  @TempDir Path dir;

  private LineSpec read(String yaml) {
    return LineSpecReader.read(InputErrors.write(dir, "line.yaml", yaml), LIB);
  }

  @Test
  void aGivenTemperatureIsAssumedWithTheDefaultRange() {
    SurveyTemperatureSpec s = read(HEAD + "survey_conductor_temperature_c: 31\n")
        .surveyTemperature();
    assertEquals(Source.ASSUMED, s.source());
    assertEquals(31.0, s.temperatureC(), 0);
    assertEquals(SurveyTemperatureSpec.DEFAULT_ASSUMED_RANGE_C, s.rangeC(), 0);
  }

  @Test
  void aMeasuredTemperatureKeepsItsRange() {
    SurveyTemperatureSpec s = read(HEAD + "survey_conductor_temperature_c: 31\n"
        + "survey_conductor_temperature_source: measured\n"
        + "survey_conductor_temperature_range_c: 1.5\n").surveyTemperature();
    assertEquals(Source.MEASURED, s.source());
    assertEquals(1.5, s.rangeC(), 0);
  }

  @Test
  void theHeatBalanceBlockIsReadWithDefaults() {
    LineSpec spec = read(HEAD + "survey_heat_balance:\n  current_a: 300\n"
        + "  air_temperature_c: 18\n  wind_speed_m_s: 3\n  survey_date: 2026-07-14\n");
    assertTrue(Double.isNaN(spec.surveyConductorTemperatureC()));
    SurveyTemperatureSpec s = spec.surveyTemperature();
    assertEquals(Source.COMPUTED, s.source());
    HeatInputs h = s.heat().orElseThrow();
    assertEquals(300, h.currentA(), 0);
    assertEquals(0.10, h.currentRangeFraction(), 1e-12);
    assertEquals(3, h.airTemperatureRangeC(), 0);
    assertEquals(1.5, h.windSpeedRange(), 0); // half the speed, at least 1 m/s
    assertTrue(Double.isNaN(h.windFromDeg())); // direction unknown
    assertEquals(LocalDate.of(2026, 7, 14), h.surveyDate().orElseThrow());
  }

  @Test
  void aCurrentFileIsReadRelativeToTheSpecification() {
    InputErrors.write(dir, "amps.csv", "time_utc,current_a\n2026-07-14T10:00:00Z,400\n"
        + "2026-07-14T11:00:00Z,500\n");
    HeatInputs h = read(HEAD + "survey_heat_balance:\n  current_file: amps.csv\n"
        + "  air_temperature_c: 18\n  wind_speed_m_s: 3\n").surveyTemperature().heat()
        .orElseThrow();
    CurrentSeries c = h.currents().orElseThrow();
    // [computed] linear: a quarter of the way from 400 to 500 A
    assertEquals(425, c.at(Instant.parse("2026-07-14T10:15:00Z"), 0), 1e-9);
  }

  @Test
  void errorsNameTheKey() {
    Path both = InputErrors.write(dir, "both.yaml", HEAD + "survey_conductor_temperature_c: 3\n"
        + "survey_heat_balance:\n  current_a: 1\n  air_temperature_c: 1\n  wind_speed_m_s: 1\n");
    InputErrors.check(both, 7, "survey_heat_balance", "not both",
        () -> LineSpecReader.read(both, LIB));
    Path noCurrent = InputErrors.write(dir, "nocur.yaml", HEAD
        + "survey_heat_balance:\n  air_temperature_c: 1\n  wind_speed_m_s: 1\n");
    InputErrors.check(noCurrent, 6, "current_a", "exactly one",
        () -> LineSpecReader.read(noCurrent, LIB));
    Path source = InputErrors.write(dir, "src.yaml", HEAD + "survey_conductor_temperature_c: 3\n"
        + "survey_conductor_temperature_source: guessed\n");
    InputErrors.check(source, 6, "survey_conductor_temperature_source", "measured or assumed",
        () -> LineSpecReader.read(source, LIB));
    Path wind = InputErrors.write(dir, "wind.yaml", HEAD + "survey_heat_balance:\n"
        + "  current_a: 1\n  air_temperature_c: 1\n  wind_speed_m_s: 99\n");
    InputErrors.check(wind, 8, "wind_speed_m_s", "between 0 and 40",
        () -> LineSpecReader.read(wind, LIB));
    // weather and current outside their plausible ranges (issue 10 item 5): a Fahrenheit air
    // temperature, a current in milliamperes, an absorptivity range in per cent
    Path hot = InputErrors.write(dir, "hot.yaml", HEAD + "survey_heat_balance:\n"
        + "  current_a: 1\n  air_temperature_c: 95\n  wind_speed_m_s: 1\n");
    InputErrors.check(hot, 7, "air_temperature_c", "between -50 and 60",
        () -> LineSpecReader.read(hot, LIB));
    Path amps = InputErrors.write(dir, "amps.yaml", HEAD + "survey_heat_balance:\n"
        + "  current_a: 850000\n  air_temperature_c: 20\n  wind_speed_m_s: 1\n");
    InputErrors.check(amps, 6, "current_a", "between 0 and 20000",
        () -> LineSpecReader.read(amps, LIB));
    Path surface = InputErrors.write(dir, "surface.yaml", HEAD + "survey_heat_balance:\n"
        + "  current_a: 1\n  air_temperature_c: 20\n  wind_speed_m_s: 1\n"
        + "  absorptivity_range: 20\n");
    InputErrors.check(surface, 9, "absorptivity_range", "between 0 and 1",
        () -> LineSpecReader.read(surface, LIB));
  }

  @Test
  void aTypeWithoutHeatBalanceDataCannotHaveItsTemperatureComputed() {
    Path lib = InputErrors.write(dir, "lib.csv", "code,diameter_mm,area_mm2,mass_kg_per_m,"
        + "rated_strength_kn,final_modulus_gpa,thermal_expansion_per_c\n"
        + "Plain,10,50,0.2,20,60,20e-6\n");
    Path f = InputErrors.write(dir, "plain.yaml", "line_id: L1\nnominal_voltage_kv: 11\n"
        + "conductors:\n  - {position: A, role: phase, conductor: Plain}\n"
        + "survey_heat_balance:\n  current_a: 1\n  air_temperature_c: 1\n  wind_speed_m_s: 1\n");
    InputErrors.check(f, 6, "survey_heat_balance", "no heat-balance data",
        () -> LineSpecReader.read(f, ConductorLibrary.read(lib)));
  }

  @Test
  void theHeatBalanceModelIsChosenByName() {
    HeatInputs ieee = read(HEAD + "survey_heat_balance:\n  current_a: 300\n"
        + "  air_temperature_c: 18\n  wind_speed_m_s: 3\n").surveyTemperature().heat()
        .orElseThrow();
    assertEquals(SurveyTemperatureSpec.HeatModel.IEEE_738, ieee.model());
    HeatInputs cigre = read(HEAD + "survey_heat_balance:\n  model: cigre601\n  current_a: 300\n"
        + "  air_temperature_c: 18\n  wind_speed_m_s: 3\n  ground_albedo: 0.1\n"
        + "  clearness_ratio: 0.8\n  outer_strand_diameter_mm: 4.4\n").surveyTemperature()
        .heat().orElseThrow();
    assertEquals(SurveyTemperatureSpec.HeatModel.CIGRE_601, cigre.model());
    assertEquals(0.1, cigre.groundAlbedo(), 0);
    assertEquals(0.8, cigre.clearnessRatio(), 0);
    assertEquals(0.0044, cigre.outerStrandDiameterM(), 1e-12);
  }

  @Test
  void anUnknownModelOrACigreKeyWithoutItIsAnError() {
    String base = HEAD + "survey_heat_balance:\n  current_a: 300\n  air_temperature_c: 18\n"
        + "  wind_speed_m_s: 3\n";
    String e1 = assertThrows(InputException.class, () -> read(base + "  model: ieee2000\n"))
        .getMessage();
    assertTrue(e1.contains("model") && e1.contains("cigre601"), e1);
    String e2 = assertThrows(InputException.class, () -> read(base + "  ground_albedo: 0.2\n"))
        .getMessage();
    assertTrue(e2.contains("ground_albedo") && e2.contains("cigre601"), e2);
  }
}
