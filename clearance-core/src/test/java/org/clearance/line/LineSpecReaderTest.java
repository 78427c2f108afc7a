package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.line.LineCondition.Kind;
import org.clearance.line.LineCondition.ReportGroup;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class LineSpecReaderTest {

  private static final ConductorLibrary LIB = ConductorLibrary.builtin();
  /** Values read from decimal text convert exactly or to the last bit. */
  private static final double EXACT = 1e-12;

  @TempDir Path dir;

  private LineSpec read(String yaml) {
    return LineSpecReader.read(InputErrors.write(dir, "line.yaml", yaml), LIB);
  }

  @Test
  void exampleLineParses() {
    LineSpec s = LineSpecReader.read(Path.of("../span-specs/lines/example-line.yaml"), LIB);
    assertEquals("BH230", s.lineId());
    assertEquals("Brackenford - Hollin Moor 230 kV", s.displayName());
    assertEquals(230.0, s.nominalVoltageKv(), EXACT);
    assertEquals(340.0, s.altitudeM(), EXACT);
    assertEquals(28.0, s.surveyConductorTemperatureC(), EXACT);
    assertEquals(List.of("A", "B", "C", "SW1"),
        s.conductors().stream().map(ConductorPosition::position).toList());
    assertEquals(3, s.phases().size());
    ConductorPosition a = s.position("A").orElseThrow();
    assertEquals("Drake", a.conductor().code());
    assertEquals(7.5, a.offsetM(), EXACT);
    assertEquals(21.0, a.attachHeightM(), EXACT);
    assertEquals(2.3, a.insulatorLengthM(), EXACT);
    assertEquals(1, a.bundle());
    assertTrue(Double.isNaN(a.bundleSpacingM()));
    ConductorPosition sw = s.position("SW1").orElseThrow();
    assertEquals(Role.SHIELD, sw.role());
    assertEquals("Partridge", sw.conductor().code());
    assertTrue(Double.isNaN(sw.insulatorLengthM()));
    LineCondition hot = s.condition("hot").orElseThrow();
    assertEquals(Kind.TEMPERATURE, hot.kind());
    assertEquals(100.0, hot.temperatureC(), EXACT);
    assertEquals(10.0, hot.creepAllowanceC(), EXACT);
    assertEquals(ReportGroup.HOT, hot.reportGroup());
    assertTrue(Double.isNaN(hot.iceThicknessM()));
    LineCondition wind = s.condition("blowout").orElseThrow();
    assertEquals(Kind.WIND, wind.kind());
    assertEquals(290.0, wind.windPressurePa(), EXACT);
    assertEquals(15.0, wind.temperatureC(), EXACT);
    assertEquals(0.0, wind.iceThicknessM(), 0.0); // no ice given: bare conductor
    assertEquals(ReportGroup.BLOWOUT, wind.reportGroup());
    LineCondition ice = s.condition("ice").orElseThrow();
    assertEquals(0.0127, ice.iceThicknessM(), EXACT); // 12.7 mm = 0.5 in (exact, NIST)
    // Glaze ice 913 kg/m^3 (methods.md section 3.7).
    assertEquals(913.0, ice.iceDensityKgM3(), EXACT);
    assertEquals(0.0, ice.creepAllowanceC(), 0.0); // default: no creep allowance
    assertEquals(ReportGroup.ICE, ice.reportGroup());
    assertEquals(3, s.conditions().size()); // the extra_sag and swing examples are commented out
  }

  @Test
  void minimalSpecGetsDefaults() {
    LineSpec s = read("line_id: 0042\nnominal_voltage_kv: 115\nconductors:\n"
        + "  - {position: P1, role: PHASE, conductor: hawk}\n");
    assertEquals("0042", s.lineId()); // read as text: leading zeros kept
    assertEquals("", s.name());
    assertEquals("0042", s.displayName());
    assertEquals(0.0, s.altitudeM(), 0.0); // line-inputs.md: default 0
    assertTrue(Double.isNaN(s.surveyConductorTemperatureC()));
    assertEquals(List.of(), s.conditions());
    ConductorPosition p = s.conductors().get(0);
    assertEquals("Hawk", p.conductor().code()); // code lookup ignores case
    assertEquals(1, p.circuit());
    assertEquals(Role.PHASE, p.role());
    assertTrue(Double.isNaN(p.offsetM()));
    assertTrue(Double.isNaN(p.attachHeightM()));
    assertEquals(0.0, p.strainLengthM(), 0.0); // line-inputs.md: default 0
  }

  @Test
  void strainAssemblyLengthIsRead() {
    LineSpec s = read("line_id: L\nnominal_voltage_kv: 230\nconductors:\n"
        + "  - {position: A, role: phase, conductor: Drake, strain_length_m: 3.2}\n");
    assertEquals(3.2, s.conductors().get(0).strainLengthM(), 0.0);
  }

  @Test
  void byteOrderMarkIsIgnored() {
    LineSpec s = read("\uFEFFline_id: L\nnominal_voltage_kv: 69\nconductors:\n"
        + "  - {position: A, role: phase, conductor: Dove}\n");
    assertEquals("L", s.lineId());
  }

  @Test
  void swingAndExtraSagNeedNoSurveyTemperature() {
    LineSpec s = read("line_id: L\nnominal_voltage_kv: 69\nconductors:\n"
        + "  - {position: A, role: phase, conductor: Linnet, bundle: 2, bundle_spacing_m: 0.4}\n"
        + "conditions:\n"
        + "  - {name: sway, kind: swing, swing_angle_deg: 30}\n"
        + "  - {name: margin, kind: extra-sag, extra_sag_m: 1.5}\n");
    LineCondition sway = s.conditions().get(0);
    assertEquals(Math.PI / 6, sway.swingAngleRad(), EXACT); // 30 deg = pi/6 rad
    assertEquals(ReportGroup.BLOWOUT, sway.reportGroup());
    assertTrue(Double.isNaN(sway.temperatureC()));
    assertTrue(Double.isNaN(sway.creepAllowanceC()));
    LineCondition margin = s.conditions().get(1);
    assertEquals(Kind.EXTRA_SAG, margin.kind());
    assertEquals(1.5, margin.extraSagM(), EXACT);
    assertEquals(ReportGroup.HOT, margin.reportGroup());
    assertEquals(2, s.conductors().get(0).bundle());
    assertEquals(0.4, s.conductors().get(0).bundleSpacingM(), EXACT);
  }

  @Test
  void coldCaseBelowSurveyTemperatureIsAllowed() {
    // A temperature case colder than the survey is legal (line-inputs.md; only physical ranges).
    LineSpec s = read("line_id: L\nnominal_voltage_kv: 230\nsurvey_conductor_temperature_c: 35\n"
        + "conductors:\n  - {position: A, role: phase, conductor: Drake}\nconditions:\n"
        + "  - {name: cold, kind: temperature, temperature_c: -40}\n"
        + "  - {name: iced-wind, kind: wind, temperature_c: -5, wind_pressure_pa: 190,"
        + " ice_thickness_mm: 6.35, ice_density_kg_m3: 900}\n");
    assertEquals(-40.0, s.condition("cold").orElseThrow().temperatureC(), EXACT);
    LineCondition w = s.condition("iced-wind").orElseThrow();
    assertEquals(0.00635, w.iceThicknessM(), EXACT);
    assertEquals(900.0, w.iceDensityKgM3(), EXACT);
  }

  /** A valid specification; line numbers of its keys are in the comments. */
  private static final String BASE = String.join("\n",
      "line_id: L1",                          // 1
      "nominal_voltage_kv: 230",              // 2
      "survey_conductor_temperature_c: 20",   // 3
      "conductors:",                          // 4
      "  - position: A",                      // 5
      "    role: phase",                      // 6
      "    conductor: Drake",                 // 7
      "conditions:",                          // 8
      "  - name: hot",                        // 9
      "    kind: temperature",                // 10
      "    temperature_c: 100",               // 11
      "");

  private static Arguments edit(String what, String from, String to, int line, String key,
      String problem) {
    if (!BASE.contains(from)) {
      throw new IllegalArgumentException(from);
    }
    return Arguments.of(what, BASE.replace(from, to), line, key, problem);
  }

  static Stream<Arguments> errors() {
    String cond = "  - name: hot\n    kind: temperature\n    temperature_c: 100\n";
    return Stream.of(
        edit("unknown top key", "line_id: L1", "line_id: L1\nvoltage: 230", 2, "voltage",
            "unknown key"),
        edit("unknown position key", "    conductor: Drake",
            "    conductor: Drake\n    colour: red",
            8, "colour", "unknown key"),
        edit("unknown condition key", "    temperature_c: 100",
            "    temperature_c: 100\n    wind_speed_ms: 3", 12, "wind_speed_ms", "unknown key"),
        edit("missing top key", "nominal_voltage_kv: 230\n", "", 1, "nominal_voltage_kv",
            "required key missing"),
        edit("missing conductor", "    conductor: Drake\n", "", 5, "conductor",
            "required key missing"),
        edit("missing condition kind", "    kind: temperature\n", "", 9, "kind",
            "required key missing"),
        edit("text for a number", "230", "high", 2, "nominal_voltage_kv",
            "expected a number in kV"),
        edit("number with a unit", "temperature_c: 100", "temperature_c: 212 F", 11,
            "temperature_c", "the unit is in the key's name (degC)"),
        edit("quoted number", "temperature_c: 100", "temperature_c: \"100\"", 11,
            "temperature_c", "remove the quotes"),
        edit("infinite number", "temperature_c: 100", "temperature_c: .inf", 11,
            "temperature_c", "plain decimal"),
        edit("list expected", "conductors:\n  - position: A\n    role: phase\n"
            + "    conductor: Drake\n", "conductors: Drake\n", 4, "conductors", "expected a list"),
        edit("empty conductor list", "conductors:\n  - position: A\n    role: phase\n"
            + "    conductor: Drake\n", "conductors: []\n", 4, "conductors", "at least one"),
        edit("mapping expected", "  - position: A\n    role: phase\n    conductor: Drake\n",
            "  - A\n", 5, null, "expected a conductor position"),
        edit("duplicate position", "    conductor: Drake\n", "    conductor: Drake\n"
            + "  - {position: a, role: phase, conductor: Drake}\n", 8, "position", "used twice"),
        edit("duplicate condition", cond, cond + cond.replace("temperature_c: 100",
            "temperature_c: 90"), 12, "name", "used twice"),
        edit("unknown conductor", "Drake", "Draek", 7, "conductor",
            "known codes: Aster, Cardinal, Cosmos, Dove, Drake"),
        edit("bad role", "role: phase", "role: earth", 6, "role", "phase, shield or neutral"),
        edit("no phase", "role: phase", "role: shield", 5, "conductors", "no position"),
        edit("bad position name", "position: A", "position: A 1", 5, "position", "only letters"),
        edit("circuit not whole", "    role: phase", "    role: phase\n    circuit: 1.5", 7,
            "circuit", "whole number"),
        edit("bundle below 1", "    role: phase", "    role: phase\n    bundle: 0", 7, "bundle",
            "1 or more"),
        edit("bundle without spacing", "    role: phase", "    role: phase\n    bundle: 2", 5,
            "bundle_spacing_m", "required when bundle"),
        edit("spacing without bundle", "    role: phase",
            "    role: phase\n    bundle_spacing_m: 0.45", 7, "bundle_spacing_m", "bundle is 1"),
        edit("strain assembly too long", "    role: phase",
            "    role: phase\n    strain_length_m: 40", 7, "strain_length_m", "between 0 and 15"),
        edit("negative attach height", "    role: phase",
            "    role: phase\n    attach_height_m: -3", 7, "attach_height_m", "greater than 0"),
        edit("voltage zero", "nominal_voltage_kv: 230", "nominal_voltage_kv: 0", 2,
            "nominal_voltage_kv", "greater than 0"),
        edit("altitude out of range", "line_id: L1", "line_id: L1\naltitude_m: 12000", 2,
            "altitude_m", "between -500 and 9000"),
        edit("temperature too low", "temperature_c: 100", "temperature_c: -70", 11,
            "temperature_c", "between -60 and 300 degC"),
        edit("temperature too high", "temperature_c: 100", "temperature_c: 350", 11,
            "temperature_c", "between -60 and 300"),
        edit("survey temperature out of range", "survey_conductor_temperature_c: 20",
            "survey_conductor_temperature_c: 400", 3, "survey_conductor_temperature_c",
            "between -60 and 300"),
        edit("survey temperature needed", "survey_conductor_temperature_c: 20\n", "", 8,
            "survey_conductor_temperature_c", "condition 'hot' (kind temperature)"),
        edit("bad kind", "kind: temperature", "kind: heat", 10, "kind", "not a condition kind"),
        edit("key of another kind", "    temperature_c: 100",
            "    temperature_c: 100\n    wind_pressure_pa: 300", 12, "wind_pressure_pa",
            "not used by kind temperature"),
        edit("negative creep", "    temperature_c: 100",
            "    temperature_c: 100\n    creep_allowance_c: -5", 12, "creep_allowance_c",
            "0 degC or more"),
        edit("ice without thickness", "kind: temperature", "kind: ice", 9, "ice_thickness_mm",
            "required key missing"),
        edit("negative ice", "    kind: temperature", "    kind: ice\n    ice_thickness_mm: -1",
            11, "ice_thickness_mm", "0 mm or more"),
        edit("ice density too high", "    kind: temperature",
            "    kind: ice\n    ice_thickness_mm: 10\n    ice_density_kg_m3: 9130", 12,
            "ice_density_kg_m3", "at most 1000"),
        edit("wind without pressure", "kind: temperature", "kind: wind", 9, "wind_pressure_pa",
            "required key missing"),
        edit("negative wind pressure", "    kind: temperature",
            "    kind: wind\n    wind_pressure_pa: -290", 11, "wind_pressure_pa",
            "0 Pa or more"),
        edit("ice density without ice", "    kind: temperature",
            "    kind: wind\n    wind_pressure_pa: 290\n    ice_density_kg_m3: 900", 12,
            "ice_density_kg_m3", "without ice_thickness_mm"),
        edit("swing angle above 90", cond, "  - {name: s, kind: swing, swing_angle_deg: 95}\n", 9,
            "swing_angle_deg", "between 0 and 90"),
        edit("swing angle negative", cond, "  - {name: s, kind: swing, swing_angle_deg: -1}\n", 9,
            "swing_angle_deg", "between 0 and 90"),
        edit("extra sag zero", cond, "  - {name: e, kind: extra_sag, extra_sag_m: 0}\n", 9,
            "extra_sag_m", "greater than 0"),
        edit("duplicate key", "line_id: L1", "line_id: L1\nline_id: L2", 2, "line_id",
            "given twice"),
        edit("YAML syntax", "line_id: L1", "line_id: [L1", 2, null, "YAML syntax"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("errors")
  void errorsNameFileLineAndKey(String what, String yaml, int line, String key, String problem) {
    Path f = InputErrors.write(dir, "bad.yaml", yaml);
    InputErrors.check(f, line, key, problem, () -> LineSpecReader.read(f, LIB));
  }

  @Test
  void emptyFileIsAnError() {
    Path f = InputErrors.write(dir, "empty.yaml", "# only a comment\n");
    InputErrors.check(f, 0, null, "empty", () -> LineSpecReader.read(f, LIB));
    Path list = InputErrors.write(dir, "list.yaml", "- a\n- b\n");
    InputErrors.check(list, 1, null, "expected the line specification",
        () -> LineSpecReader.read(list, LIB));
  }
}
