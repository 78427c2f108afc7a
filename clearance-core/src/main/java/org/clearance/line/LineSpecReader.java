package org.clearance.line;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import org.clearance.InputException;
import org.clearance.io.TextFiles;
import org.clearance.io.ValueRange;
import org.clearance.io.YamlMap;
import org.clearance.line.ConductorPosition.Role;
import org.yaml.snakeyaml.nodes.Node;

/**
 * Reads a line specification (YAML, docs/line-inputs.md) through snakeyaml's node tree, so every
 * error names the file, the 1-based line and the key. Strict: unknown keys at every level,
 * missing required keys, wrong types, numbers written with units, duplicate names, unknown
 * conductor codes and values outside their physical range are all {@link InputException}s.
 * Condition keys are checked per kind (see {@link LineConditionReader}).
 */
public final class LineSpecReader {

  /** Lowest conductor temperature accepted, degC: the coldest design cases are about -50. */
  static final double MIN_TEMPERATURE_C = -60;
  /** Highest conductor temperature accepted, degC: high-temperature conductors run to ~250. */
  static final double MAX_TEMPERATURE_C = 300;
  /** Altitude range accepted, m: the lowest and highest ground a line can stand on, rounded out. */
  private static final double MIN_ALTITUDE_M = -500;
  private static final double MAX_ALTITUDE_M = 9000;
  /** Longest strain assembly accepted, m: EHV dead-end assemblies run to about 10 m (common
   * practice, no source); anything longer is a typo. */
  private static final double MAX_STRAIN_LENGTH_M = 15;
  /** Where the ranges below come from. */
  static final String TRADE = "overhead line practice, common practice, no source";
  /**
   * Plausible range of every number key of a line specification, in the key's unit. Voltages span
   * low-voltage distribution (0.12 kV) to the highest AC lines in service (1 150 kV); offsets
   * and heights the widest and tallest towers (crossarms to about 25 m, towers to about 380 m);
   * bundles up to 12 sub-conductors; insulator strings to about 15 m. A value outside is a typo:
   * {@code offset_m: 1e308} ran 35 s and died of OutOfMemoryError before these checks.
   */
  static final Map<String, ValueRange> RANGES = Map.ofEntries(
      Map.entry("nominal_voltage_kv", new ValueRange(0.1, 1200, "kV", TRADE)),
      Map.entry("offset_m", new ValueRange(-50, 50, "m", TRADE)),
      Map.entry("attach_height_m", new ValueRange(1, 400, "m", TRADE)),
      Map.entry("bundle", new ValueRange(1, 12, "sub-conductors", TRADE)),
      Map.entry("bundle_spacing_m", new ValueRange(0.05, 1.5, "m", TRADE)),
      Map.entry("insulator_length_m", new ValueRange(0, 20, "m", TRADE)),
      Map.entry("circuit", new ValueRange(1, 12, "", TRADE)),
      Map.entry("creep_allowance_c", new ValueRange(0, 50, "degC", TRADE)),
      Map.entry("ice_thickness_mm", new ValueRange(0, 100, "mm", TRADE)),
      Map.entry("wind_pressure_pa", new ValueRange(0, 4000, "Pa",
          "a 4 000 Pa pressure is a wind of about 80 m/s (q = rho v^2 / 2, rho 1.225 kg/m^3)")),
      Map.entry("extra_sag_m", new ValueRange(0.001, 50, "m", TRADE)));
  /** Right-of-way half widths accepted, m: from a narrow feeder easement to the widest EHV
   * corridors, rounded out (common practice, no source). */
  private static final double MIN_ROW_HALF_WIDTH_M = 0.5;
  private static final double MAX_ROW_HALF_WIDTH_M = 200;
  /** Position names appear in structure column names ({@code attach_z_<position>}). */
  private static final Pattern POSITION_NAME = Pattern.compile("[A-Za-z0-9_.-]+");

  private static final List<String> TOP_KEYS = topKeys();
  private static final List<String> POSITION_KEYS = List.of("position", "role", "circuit",
      "conductor", "offset_m", "attach_height_m", "bundle", "bundle_spacing_m",
      "insulator_length_m", "strain_length_m");

  private LineSpecReader() {}

  private static List<String> topKeys() {
    List<String> k = new ArrayList<>(List.of("line_id", "name", "nominal_voltage_kv",
        "circuit_voltages_kv", "altitude_m", "row_half_width_m", "conductors", "conditions"));
    k.addAll(SurveyTemperatureReader.TOP_KEYS);
    return List.copyOf(k);
  }

  /**
   * Reads one line specification.
   *
   * @param file the YAML file
   * @param library conductor types the {@code conductor} keys may name
   * @throws InputException naming the file, line and key of the first problem
   */
  public static LineSpec read(Path file, ConductorLibrary library) {
    String name = file.toString();
    Node root = YamlMap.compose(TextFiles.read(file, TextFiles.MAX_YAML_BYTES,
        "the line specification (YAML text)"), name);
    YamlMap top = YamlMap.strict(root, name, "the line specification", TOP_KEYS);
    String lineId = top.text("line_id");
    if (lineId.isEmpty()) {
      throw top.error("line_id", "line_id is empty");
    }
    double kv = plausible(top, "nominal_voltage_kv", top.number("nominal_voltage_kv"));
    double altitude = top.number("altitude_m", 0);
    checkRange(top, "altitude_m", altitude, MIN_ALTITUDE_M, MAX_ALTITUDE_M);
    SurveyTemperatureSpec survey = SurveyTemperatureReader.read(top, file);
    double surveyT = survey.temperatureC();
    double rowHalf = top.number("row_half_width_m", Double.NaN);
    if (!Double.isNaN(rowHalf)) {
      checkRange(top, "row_half_width_m", rowHalf, MIN_ROW_HALF_WIDTH_M, MAX_ROW_HALF_WIDTH_M);
    }
    List<ConductorPosition> positions = positions(top, name, library);
    List<LineCondition> conditions = new ArrayList<>();
    Map<String, Integer> conditionLines = new HashMap<>();
    for (Node n : top.list("conditions", false)) {
      YamlMap m = YamlMap.strict(n, name, "a condition", LineConditionReader.KEYS);
      LineCondition c = LineConditionReader.condition(m);
      Integer twin = conditionLines.putIfAbsent(c.name(), m.line());
      if (twin != null) {
        throw m.error("name", "condition name '" + c.name() + "' used twice (first on line "
            + twin + ")");
      }
      if (c.needsChangeOfState() && !survey.isKnown()) {
        throw new InputException(name, "line " + m.line(), "survey_conductor_temperature_c",
            "the top-level key survey_conductor_temperature_c (or survey_heat_balance) is"
                + " required: condition '"
                + c.name() + "' (kind " + c.kind().name().toLowerCase(Locale.ROOT)
                + ") is computed by a change of state from the surveyed conductor");
      }
      conditions.add(c);
    }
    if (survey.source() == SurveyTemperatureSpec.Source.COMPUTED) {
      for (ConductorPosition p : positions) {
        if (p.conductor().thermal().isEmpty()) {
          throw top.error("survey_heat_balance", "conductor type '" + p.conductor().code()
              + "' (position " + p.position() + ") has no heat-balance data in the conductor"
              + " library (ac_resistance_25c_ohm_per_km, ac_resistance_75c_ohm_per_km,"
              + " absorptivity, emissivity), so its survey temperature cannot be computed; add"
              + " them or give survey_conductor_temperature_c");
        }
      }
    }
    return new LineSpec(lineId, top.text("name", ""), kv, altitude, surveyT, rowHalf, positions,
        conditions, name, survey, circuitVoltages(top, positions, kv));
  }

  /**
   * {@code circuit_voltages_kv}: circuit number to nominal voltage, kV (issue 15). Every circuit
   * named must be the circuit of a phase position; a voltage equal to the line's is allowed
   * (it changes nothing).
   */
  private static Map<Integer, Double> circuitVoltages(YamlMap top,
      List<ConductorPosition> positions, double lineKv) {
    Optional<YamlMap.Entry> entry = top.optional("circuit_voltages_kv");
    if (entry.isEmpty()) {
      return Map.of();
    }
    Map<Integer, Double> out = new java.util.TreeMap<>();
    YamlMap map = entry.get().map();
    for (YamlMap.Entry e : map.entries()) {
      int circuit;
      try {
        circuit = Integer.parseInt(e.key().strip());
      } catch (NumberFormatException ex) {
        throw e.error("a circuit number (whole number 1 to 12) is expected as the key, "
            + "found '" + e.key() + "'");
      }
      if (!RANGES.get("circuit").contains(circuit)) {
        throw e.error("circuit " + circuit + " is outside 1 to 12");
      }
      if (positions.stream().noneMatch(p -> p.isPhase() && p.circuit() == circuit)) {
        throw e.error("circuit " + circuit + " has no phase position (give the positions of "
            + "that circuit circuit: " + circuit + ")");
      }
      out.put(circuit, e.within(RANGES.get("nominal_voltage_kv")));
    }
    if (out.isEmpty()) {
      throw entry.get().error("list at least one circuit and its voltage, e.g. {2: 12.47}");
    }
    return out;
  }

  private static List<ConductorPosition> positions(YamlMap top, String file,
      ConductorLibrary library) {
    List<Node> items = top.list("conductors", true);
    if (items.isEmpty()) {
      throw top.error("conductors", "at least one conductor position is required");
    }
    List<ConductorPosition> out = new ArrayList<>();
    Map<String, Integer> seen = new HashMap<>();
    for (Node n : items) {
      YamlMap m = YamlMap.strict(n, file, "a conductor position", POSITION_KEYS);
      ConductorPosition p = position(m, library);
      Integer twin = seen.putIfAbsent(p.position().toLowerCase(Locale.ROOT), m.line());
      if (twin != null) {
        throw m.error("position", "position name '" + p.position()
            + "' used twice (names are compared ignoring letter case; first on line " + twin
            + ")");
      }
      out.add(p);
    }
    if (out.stream().noneMatch(ConductorPosition::isPhase)) {
      throw top.error("conductors", "no position has role phase");
    }
    return out;
  }

  private static ConductorPosition position(YamlMap m, ConductorLibrary library) {
    String position = m.text("position");
    if (!POSITION_NAME.matcher(position).matches()) {
      throw m.error("position", "position name '" + position
          + "' may use only letters, digits, '_', '-' and '.' (it appears in column names)");
    }
    Role role;
    switch (m.text("role").toLowerCase(Locale.ROOT)) {
      case "phase":
        role = Role.PHASE;
        break;
      case "shield":
        role = Role.SHIELD;
        break;
      case "neutral":
        role = Role.NEUTRAL;
        break;
      default:
        throw m.error("role", "'" + m.text("role")
            + "' is not a role; use phase, shield or neutral");
    }
    int circuit = (int) plausible(m, "circuit", m.integer("circuit", 1));
    String code = m.text("conductor");
    ConductorType type = library.find(code).orElseThrow(() -> m.error("conductor",
        "unknown conductor code '" + code + "'; known codes: " + String.join(", ",
            library.codes())));
    double offset = optional(m, "offset_m");
    double height = optional(m, "attach_height_m");
    int bundle = (int) plausible(m, "bundle", m.integer("bundle", 1));
    double spacing = m.number("bundle_spacing_m", Double.NaN);
    if (bundle > 1 && !m.has("bundle_spacing_m")) {
      throw m.error("bundle_spacing_m", "required when bundle is more than 1");
    }
    if (bundle == 1 && m.has("bundle_spacing_m")) {
      throw m.error("bundle_spacing_m", "given but bundle is 1; remove it or set bundle");
    }
    if (m.has("bundle_spacing_m")) {
      plausible(m, "bundle_spacing_m", spacing);
    }
    double insulator = optional(m, "insulator_length_m");
    double strain = m.number("strain_length_m", 0.0);
    if (!(strain >= 0 && strain <= MAX_STRAIN_LENGTH_M)) {
      throw m.error("strain_length_m", "must be between 0 and " + fmt(MAX_STRAIN_LENGTH_M)
          + " m: " + fmt(strain));
    }
    return new ConductorPosition(position, role, circuit, type, offset, height, bundle, spacing,
        insulator, strain);
  }

  /** An optional number key checked against {@link #RANGES}, or NaN when absent. */
  private static double optional(YamlMap m, String key) {
    return m.has(key) ? plausible(m, key, m.number(key)) : Double.NaN;
  }

  /** The value when inside its key's range in {@link #RANGES}; else an error naming the key. */
  static double plausible(YamlMap m, String key, double v) {
    String problem = RANGES.get(key).problem(v);
    if (problem != null) {
      throw m.error(key, problem);
    }
    return v;
  }

  /** Throws naming the key when v is outside [lo, hi]. */
  static void checkRange(YamlMap m, String key, double v, double lo, double hi) {
    if (!(v >= lo && v <= hi)) {
      throw m.error(key, "must be between " + fmt(lo) + " and " + fmt(hi) + " "
          + YamlMap.unitOf(key) + ": " + fmt(v));
    }
  }

  static String fmt(double v) {
    return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+(e|$)", "$1");
  }
}
