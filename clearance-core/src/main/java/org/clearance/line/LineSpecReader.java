package org.clearance.line;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.clearance.InputException;
import org.clearance.line.ConductorPosition.Role;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.constructor.SafeConstructor;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
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
  /** Right-of-way half widths accepted, m: from a narrow feeder easement to the widest EHV
   * corridors, rounded out (common practice, no source). */
  private static final double MIN_ROW_HALF_WIDTH_M = 0.5;
  private static final double MAX_ROW_HALF_WIDTH_M = 200;
  /** Position names appear in structure column names ({@code attach_z_<position>}). */
  private static final Pattern POSITION_NAME = Pattern.compile("[A-Za-z0-9_.-]+");

  private static final List<String> TOP_KEYS = List.of("line_id", "name", "nominal_voltage_kv",
      "altitude_m", "survey_conductor_temperature_c", "row_half_width_m", "conductors",
      "conditions");
  private static final List<String> POSITION_KEYS = List.of("position", "role", "circuit",
      "conductor", "offset_m", "attach_height_m", "bundle", "bundle_spacing_m",
      "insulator_length_m", "strain_length_m");

  private LineSpecReader() {}

  /**
   * Reads one line specification.
   *
   * @param file the YAML file
   * @param library conductor types the {@code conductor} keys may name
   * @throws InputException naming the file, line and key of the first problem
   */
  public static LineSpec read(Path file, ConductorLibrary library) {
    String name = file.toString();
    Node root = compose(TextFiles.read(file), name);
    YamlMap top = new YamlMap(root, name, "the line specification", TOP_KEYS);
    String lineId = top.text("line_id");
    if (lineId.isEmpty()) {
      throw top.error("line_id", "line_id is empty");
    }
    double kv = top.number("nominal_voltage_kv");
    if (!(kv > 0)) {
      throw top.error("nominal_voltage_kv", "must be greater than 0 kV: " + fmt(kv));
    }
    double altitude = top.number("altitude_m", 0);
    checkRange(top, "altitude_m", altitude, MIN_ALTITUDE_M, MAX_ALTITUDE_M);
    double surveyT = top.number("survey_conductor_temperature_c", Double.NaN);
    if (!Double.isNaN(surveyT)) {
      checkRange(top, "survey_conductor_temperature_c", surveyT, MIN_TEMPERATURE_C,
          MAX_TEMPERATURE_C);
    }
    double rowHalf = top.number("row_half_width_m", Double.NaN);
    if (!Double.isNaN(rowHalf)) {
      checkRange(top, "row_half_width_m", rowHalf, MIN_ROW_HALF_WIDTH_M, MAX_ROW_HALF_WIDTH_M);
    }
    List<ConductorPosition> positions = positions(top, name, library);
    List<LineCondition> conditions = new ArrayList<>();
    Map<String, Integer> conditionLines = new HashMap<>();
    for (Node n : top.list("conditions", false)) {
      YamlMap m = new YamlMap(n, name, "a condition", LineConditionReader.KEYS);
      LineCondition c = LineConditionReader.condition(m);
      Integer twin = conditionLines.putIfAbsent(c.name(), m.line());
      if (twin != null) {
        throw m.error("name", "condition name '" + c.name() + "' used twice (first on line "
            + twin + ")");
      }
      if (c.needsChangeOfState() && Double.isNaN(surveyT)) {
        throw new InputException(name, "line " + m.line(), "survey_conductor_temperature_c",
            "the top-level key survey_conductor_temperature_c is required: condition '"
                + c.name() + "' (kind " + c.kind().name().toLowerCase(Locale.ROOT)
                + ") is computed by a change of state from the surveyed conductor");
      }
      conditions.add(c);
    }
    return new LineSpec(lineId, top.text("name", ""), kv, altitude, surveyT, rowHalf, positions,
        conditions, name);
  }

  private static Node compose(String text, String file) {
    LoaderOptions options = new LoaderOptions();
    Yaml yaml = new Yaml(new SafeConstructor(options));
    Node root;
    try {
      root = yaml.compose(new StringReader(text));
    } catch (MarkedYAMLException e) {
      Mark mark = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
      String where = mark == null ? null : "line " + (mark.getLine() + 1);
      throw new InputException(file, where, null, "YAML syntax: " + e.getProblem());
    } catch (YAMLException e) {
      throw new InputException(file, null, null, "YAML: " + e.getMessage());
    }
    if (root == null) {
      throw new InputException(file, null, null, "the file is empty");
    }
    return root;
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
      YamlMap m = new YamlMap(n, file, "a conductor position", POSITION_KEYS);
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
    int circuit = m.integer("circuit", 1);
    if (circuit < 1) {
      throw m.error("circuit", "circuit number must be 1 or more: " + circuit);
    }
    String code = m.text("conductor");
    ConductorType type = library.find(code).orElseThrow(() -> m.error("conductor",
        "unknown conductor code '" + code + "'; known codes: " + String.join(", ",
            library.codes())));
    double offset = m.number("offset_m", Double.NaN);
    double height = m.number("attach_height_m", Double.NaN);
    if (m.has("attach_height_m") && !(height > 0)) {
      throw m.error("attach_height_m", "must be greater than 0 m: " + fmt(height));
    }
    int bundle = m.integer("bundle", 1);
    if (bundle < 1) {
      throw m.error("bundle", "bundle must be 1 or more sub-conductors: " + bundle);
    }
    double spacing = m.number("bundle_spacing_m", Double.NaN);
    if (bundle > 1 && !m.has("bundle_spacing_m")) {
      throw m.error("bundle_spacing_m", "required when bundle is more than 1");
    }
    if (bundle == 1 && m.has("bundle_spacing_m")) {
      throw m.error("bundle_spacing_m", "given but bundle is 1; remove it or set bundle");
    }
    if (m.has("bundle_spacing_m") && !(spacing > 0)) {
      throw m.error("bundle_spacing_m", "must be greater than 0 m: " + fmt(spacing));
    }
    double insulator = m.number("insulator_length_m", Double.NaN);
    if (m.has("insulator_length_m") && !(insulator >= 0)) {
      throw m.error("insulator_length_m", "must be 0 m or more: " + fmt(insulator));
    }
    double strain = m.number("strain_length_m", 0.0);
    if (!(strain >= 0 && strain <= MAX_STRAIN_LENGTH_M)) {
      throw m.error("strain_length_m", "must be between 0 and " + fmt(MAX_STRAIN_LENGTH_M)
          + " m: " + fmt(strain));
    }
    return new ConductorPosition(position, role, circuit, type, offset, height, bundle, spacing,
        insulator, strain);
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
