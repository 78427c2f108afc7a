package org.clearance.line;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.clearance.InputException;
import org.clearance.io.Decimal;
import org.clearance.io.TextFiles;
import org.clearance.io.ValueRange;

/**
 * The conductor types a line specification may name: the built-in library
 * ({@code span-specs/conductors/acsr.csv} and {@code distribution.csv}) plus any user files. Immutable; lookup by code is
 * case-insensitive. The CSV columns are described in the built-in file's header comments and in
 * docs/line-inputs.md.
 */
public final class ConductorLibrary {

  /** Classpath resource of the built-in library. */
  public static final String BUILTIN_RESOURCE = "/span-specs/conductors/acsr.csv";
  /** Classpath resource of the built-in distribution sizes, loaded after {@link
   * #BUILTIN_RESOURCE}; a code in both is a packaging fault. */
  public static final String DISTRIBUTION_RESOURCE = "/span-specs/conductors/distribution.csv";

  /** Where the plausible ranges below come from. */
  private static final String TRADE = "values of bare overhead conductors, common practice, no"
      + " source";
  /**
   * Where the resistance limits come from: 2 500 kcmil aluminium about 0.023 ohm/km, #8 copper
   * about 2.1 ohm/km and #6 ACSR about 2.2 ohm/km at 25 degC (handbook tables, from memory); the
   * range leaves a factor of about 4 either side, so that only a unit slip (ohm per metre or per
   * mile, an exponent typo) is refused.
   */
  private static final String RESISTANCE_SOURCE = "2 500 kcmil aluminium about 0.023 to #8 "
      + "copper about 2.1 ohm/km, from memory, a factor of 4 either side";
  /**
   * Solar absorptivity and infrared emissivity of a bare conductor: about 0.23 new to 0.91
   * weathered (IEEE Std 738-2012, clause on conductor surface, from memory); 0.2 allows a very
   * bright new surface.
   */
  private static final String SURFACE_SOURCE = "bare conductors about 0.23 new to 0.91 "
      + "weathered, IEEE Std 738-2012, from memory";
  /**
   * Plausible range of every number column, in the column's unit. Sizes span the smallest
   * distribution wire (about 3 mm, 5 mm^2) to the largest transmission conductors (about 60 mm,
   * 2 500 mm^2). Moduli span aluminium alloys (55-60 GPa) to steel (200 GPa). Expansion spans
   * carbon-fibre and invar cores (about 1e-6 /degC) to aluminium (23e-6); an exponent slip such
   * as 18.9e-9 or 4.9e-324 falls below it.
   */
  static final Map<String, ValueRange> RANGES = Map.ofEntries(
      Map.entry("diameter_mm", new ValueRange(2, 80, "mm", TRADE)),
      Map.entry("area_mm2", new ValueRange(2, 3000, "mm^2", TRADE)),
      Map.entry("mass_kg_per_m", new ValueRange(0.01, 10, "kg/m", TRADE)),
      Map.entry("rated_strength_kn", new ValueRange(0.5, 2000, "kN", TRADE)),
      Map.entry("final_modulus_gpa", new ValueRange(20, 250, "GPa", TRADE)),
      Map.entry("thermal_expansion_per_c", new ValueRange(5e-7, 3e-5, "1/degC", TRADE)),
      Map.entry("core_area_mm2", new ValueRange(0.5, 2000, "mm^2", TRADE)),
      Map.entry("core_modulus_gpa", new ValueRange(20, 250, "GPa", TRADE)),
      Map.entry("core_thermal_expansion_per_c", new ValueRange(1e-7, 3e-5, "1/degC", TRADE)),
      Map.entry("ac_resistance_25c_ohm_per_km", new ValueRange(0.005, 10, "ohm/km",
          RESISTANCE_SOURCE)),
      Map.entry("ac_resistance_75c_ohm_per_km", new ValueRange(0.005, 12, "ohm/km",
          RESISTANCE_SOURCE)),
      Map.entry("absorptivity", new ValueRange(0.2, 1, "", SURFACE_SOURCE)),
      Map.entry("emissivity", new ValueRange(0.2, 1, "", SURFACE_SOURCE)));
  /**
   * Largest plausible ratio of the resistance at 75 degC to the one at 25 degC: aluminium's
   * temperature coefficient 0.00403 1/K (IEC 60889, from memory) gives 1 + 50 x 0.004 = 1.20,
   * copper's 0.00393 gives 1.20; AC effects in steel-cored conductors add a few per cent. 1.35
   * leaves room for them and refuses a swapped or mistyped column.
   */
  static final double MAX_RESISTANCE_RATIO = 1.35;
  /**
   * Plausible mass per volume of a whole conductor, kg/m^3: aluminium alloys are 2 700, copper
   * 8 900 (handbook densities, from memory); a stranded conductor lies between, lay and grease
   * add a few per cent.
   */
  static final ValueRange DENSITY = new ValueRange(2000, 10000, "kg/m^3",
      "aluminium 2 700 to copper 8 900, from memory");
  /**
   * Strands fill at most the conductor's circle: the area may not exceed pi/4 d^2 by more than
   * the rounding of the tabled values (geometry).
   */
  private static final double AREA_ROUNDING = 1.01;

  private static final String CODE = "code";
  private static final List<String> NUMBERS = List.of("diameter_mm", "area_mm2", "mass_kg_per_m",
      "rated_strength_kn", "final_modulus_gpa", "thermal_expansion_per_c");
  private static final List<String> CORE =
      List.of("core_area_mm2", "core_modulus_gpa", "core_thermal_expansion_per_c");
  /** Heat-balance columns (IEEE Std 738-2012): optional, all four or none. */
  private static final List<String> THERMAL = List.of("ac_resistance_25c_ohm_per_km",
      "ac_resistance_75c_ohm_per_km", "absorptivity", "emissivity");
  private static final List<String> SOURCES = List.of("source_size", "source_elastic",
      "source_core", "source_thermal");
  private static final List<String> COLUMNS = columns();

  /** Entries by lower-case code, in load order. */
  private final Map<String, ConductorType> byCode;
  private final List<String> replaced;

  private ConductorLibrary(Map<String, ConductorType> byCode, List<String> replaced) {
    this.byCode = Collections.unmodifiableMap(new LinkedHashMap<>(byCode));
    this.replaced = List.copyOf(replaced);
  }

  private static List<String> columns() {
    List<String> c = new ArrayList<>(List.of(CODE, "stranding"));
    c.addAll(NUMBERS);
    c.addAll(CORE);
    c.addAll(THERMAL);
    c.addAll(SOURCES);
    return List.copyOf(c);
  }

  /**
   * The built-in library from the classpath.
   *
   * @throws IllegalStateException when the resource is missing or broken (a packaging fault)
   */
  public static ConductorLibrary builtin() {
    Map<String, ConductorType> all = new LinkedHashMap<>();
    for (String resource : List.of(BUILTIN_RESOURCE, DISTRIBUTION_RESOURCE)) {
      for (Map.Entry<String, ConductorType> e : resource(resource).entrySet()) {
        if (all.put(e.getKey(), e.getValue()) != null) {
          throw new IllegalStateException("built-in conductor code " + e.getValue().code()
              + " appears in two files, the second " + resource);
        }
      }
    }
    return new ConductorLibrary(all, List.of());
  }

  private static Map<String, ConductorType> resource(String name) {
    try (InputStream in = ConductorLibrary.class.getResourceAsStream(name)) {
      if (in == null) {
        throw new IllegalStateException("built-in conductor library missing: " + name);
      }
      BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
      return parse(r, "built-in " + name);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    } catch (InputException e) {
      throw new IllegalStateException("built-in conductor library is broken: " + e.getMessage(), e);
    }
  }

  /** A library holding only the types of one file (no built-in ones). */
  public static ConductorLibrary read(Path file) {
    return new ConductorLibrary(parseFile(file), List.of());
  }

  /**
   * This library plus the types of a user file; a user type with the code of an existing one
   * replaces it (see {@link #replacedCodes()}).
   *
   * @param file CSV with the library columns
   * @throws InputException naming file, line and column for any problem in the file
   */
  public ConductorLibrary withUserFile(Path file) {
    Map<String, ConductorType> merged = new LinkedHashMap<>(byCode);
    List<String> rep = new ArrayList<>(replaced);
    for (Map.Entry<String, ConductorType> e : parseFile(file).entrySet()) {
      if (merged.put(e.getKey(), e.getValue()) != null) {
        rep.add(e.getValue().code());
      }
    }
    return new ConductorLibrary(merged, rep);
  }

  /** Codes (as the user file spells them) of types that user files replaced, in order. */
  public List<String> replacedCodes() {
    return replaced;
  }

  /** The type with this code (case-insensitive), if any. */
  public Optional<ConductorType> find(String code) {
    return Optional.ofNullable(byCode.get(code.toLowerCase(Locale.ROOT)));
  }

  /** All codes, sorted case-insensitively, for messages. */
  public List<String> codes() {
    TreeMap<String, String> sorted = new TreeMap<>();
    byCode.forEach((k, t) -> sorted.put(k, t.code()));
    return List.copyOf(sorted.values());
  }

  /** All types in load order. */
  public List<ConductorType> types() {
    return List.copyOf(byCode.values());
  }

  private static Map<String, ConductorType> parseFile(Path file) {
    String text = TextFiles.read(file, TextFiles.MAX_TABLE_BYTES,
        "a conductor table (CSV text)");
    TextFiles.refuseYamlForTable(file.toString(), text, "a conductor table (CSV with a header "
        + "line)");
    try {
      return parse(new BufferedReader(new StringReader(text)), file.toString());
    } catch (IOException e) {
      throw new AssertionError("reading a string cannot fail", e);
    }
  }

  private static Map<String, ConductorType> parse(BufferedReader in, String file)
      throws IOException {
    CsvTable t = CsvTable.read(in, file);
    for (String h : t.header()) {
      if (!COLUMNS.contains(h)) {
        throw new InputException(file, "line " + t.headerLine(), h,
            "unknown column; the columns are " + String.join(", ", COLUMNS));
      }
    }
    List<String> required = new ArrayList<>(List.of(CODE));
    required.addAll(NUMBERS);
    for (String r : required) {
      if (t.column(r) < 0) {
        throw new InputException(file, "line " + t.headerLine(), r,
            "required column missing from the header");
      }
    }
    Map<String, ConductorType> out = new LinkedHashMap<>();
    Map<String, Integer> firstLine = new LinkedHashMap<>();
    for (CsvTable.Row row : t.rows()) {
      ConductorType type = type(t, row);
      String key = type.code().toLowerCase(Locale.ROOT);
      Integer twin = firstLine.putIfAbsent(key, row.line());
      if (twin != null) {
        throw new InputException(file, row.where(), CODE, "conductor code '" + type.code()
            + "' appears twice in the file (first on line " + twin + ")");
      }
      out.put(key, type);
    }
    if (out.isEmpty()) {
      throw new InputException(file, null, null, "no conductor types in the file");
    }
    return out;
  }

  private static ConductorType type(CsvTable t, CsvTable.Row row) {
    String code = text(t, row, CODE);
    if (code.isEmpty()) {
      throw new InputException(t.file(), row.where(), CODE, "no conductor code");
    }
    double[] v = new double[NUMBERS.size()];
    for (int k = 0; k < v.length; k++) {
      v[k] = positive(t, row, NUMBERS.get(k), true);
    }
    checkConsistent(t, row, v[0], v[1], v[2]);
    double[] core = new double[CORE.size()];
    int given = 0;
    for (int k = 0; k < core.length; k++) {
      core[k] = positive(t, row, CORE.get(k), false);
      given += Double.isNaN(core[k]) ? 0 : 1;
    }
    if (given != 0 && given != core.length) {
      String missing = CORE.get(Double.isNaN(core[0]) ? 0 : Double.isNaN(core[1]) ? 1 : 2);
      throw new InputException(t.file(), row.where(), missing,
          "give all three core values or none (none for a single-material conductor)");
    }
    if (core[0] >= v[1]) {
      throw new InputException(t.file(), row.where(), "core_area_mm2", String.format(Locale.ROOT,
          "the core (%s mm^2) must be smaller than the whole conductor (area_mm2 %s mm^2)",
          ValueRange.format(core[0]), ValueRange.format(v[1])));
    }
    Optional<ConductorThermal> thermal = thermal(t, row);
    List<String> parts = new ArrayList<>();
    for (String s : SOURCES) {
      String src = text(t, row, s);
      if (!src.isEmpty()) {
        parts.add(s.substring("source_".length()) + ": " + src);
      }
    }
    String source = t.file() + " line " + row.line()
        + (parts.isEmpty() ? "" : " (" + String.join("; ", parts) + ")");
    return new ConductorType(code, v[0] * 1e-3, v[1] * 1e-6, v[2], v[3] * 1e3, v[4] * 1e9, v[5],
        core[0] * 1e-6, core[1] * 1e9, core[2], source, thermal);
  }

  /** The heat-balance columns of a row: all four or none (a type without them cannot have its
   * survey temperature computed). */
  private static Optional<ConductorThermal> thermal(CsvTable t, CsvTable.Row row) {
    double[] v = new double[THERMAL.size()];
    int given = 0;
    for (int k = 0; k < v.length; k++) {
      v[k] = positive(t, row, THERMAL.get(k), false);
      given += Double.isNaN(v[k]) ? 0 : 1;
    }
    if (given == 0) {
      return Optional.empty();
    }
    for (int k = 0; k < v.length; k++) {
      if (Double.isNaN(v[k])) {
        throw new InputException(t.file(), row.where(), THERMAL.get(k),
            "give all four heat-balance values (" + String.join(", ", THERMAL) + ") or none");
      }
    }
    if (v[1] < v[0]) {
      throw new InputException(t.file(), row.where(), THERMAL.get(1),
          "the resistance at 75 degC must not be below the one at 25 degC");
    }
    if (v[1] > v[0] * MAX_RESISTANCE_RATIO) {
      throw new InputException(t.file(), row.where(), THERMAL.get(1), String.format(Locale.ROOT,
          "%s ohm/km is %s times the resistance at 25 degC (%s ohm/km); a conductor's "
          + "resistance rises by about 1.2 times from 25 to 75 degC (at most %s here): check "
          + "the two columns", ValueRange.format(v[1]), ValueRange.format(v[1] / v[0]),
          ValueRange.format(v[0]), ValueRange.format(MAX_RESISTANCE_RATIO)));
    }
    String src = text(t, row, "source_thermal");
    return Optional.of(new ConductorThermal(v[0] * 1e-3, v[1] * 1e-3, v[2], v[3],
        t.file() + " line " + row.line() + (src.isEmpty() ? "" : " (" + src + ")")));
  }

  private static String text(CsvTable t, CsvTable.Row row, String column) {
    int c = t.column(column);
    return c < 0 ? "" : row.fields().get(c);
  }

  /** A positive finite number from a column; NaN when blank and not required. */
  private static double positive(CsvTable t, CsvTable.Row row, String column, boolean required) {
    String s = text(t, row, column);
    if (s.isEmpty() && !required) {
      return Double.NaN;
    }
    String problem = Decimal.problem(s, unitOf(column));
    if (problem != null) {
      throw new InputException(t.file(), row.where(), column, problem);
    }
    double v = Double.parseDouble(s);
    if (!(v > 0)) {
      throw new InputException(t.file(), row.where(), column, "must be greater than 0: " + s);
    }
    ValueRange range = RANGES.get(column);
    String implausible = range == null ? null : range.problem(v);
    if (implausible != null) {
      throw new InputException(t.file(), row.where(), column, implausible);
    }
    return v;
  }

  /** Area within the diameter's circle, and a mass per volume of a real conductor. */
  private static void checkConsistent(CsvTable t, CsvTable.Row row, double diameterMm,
      double areaMm2, double massKgPerM) {
    double circle = Math.PI / 4 * diameterMm * diameterMm;
    if (areaMm2 > circle * AREA_ROUNDING) {
      throw new InputException(t.file(), row.where(), "area_mm2", String.format(Locale.ROOT,
          "%s mm^2 does not fit in a conductor of diameter_mm %s (its circle is %s mm^2)",
          ValueRange.format(areaMm2), ValueRange.format(diameterMm), ValueRange.format(circle)));
    }
    String density = DENSITY.problem(massKgPerM / (areaMm2 * 1e-6));
    if (density != null) {
      throw new InputException(t.file(), row.where(), "mass_kg_per_m", "mass per volume "
          + density + " (mass_kg_per_m / area_mm2)");
    }
  }

  private static String unitOf(String column) {
    if (column.endsWith("_mm2")) {
      return "mm^2";
    } else if (column.endsWith("_mm")) {
      return "mm";
    } else if (column.endsWith("_kg_per_m")) {
      return "kg/m";
    } else if (column.endsWith("_kn")) {
      return "kN";
    } else if (column.endsWith("_gpa")) {
      return "GPa";
    } else if (column.endsWith("_ohm_per_km")) {
      return "ohm/km";
    } else if (column.equals("absorptivity") || column.equals("emissivity")) {
      return "(a fraction, 0-1)";
    }
    return "1/degC";
  }
}
