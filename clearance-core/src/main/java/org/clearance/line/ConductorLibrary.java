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

  /** Largest plausible expansion, 1/degC: metals are below 3e-5; above is a unit slip. */
  private static final double MAX_EXPANSION_PER_C = 1e-4;
  /** Largest plausible modulus, GPa: steel is about 200; far above is a unit slip (Pa, MPa). */
  private static final double MAX_MODULUS_GPA = 1000;

  private static final String CODE = "code";
  private static final List<String> NUMBERS = List.of("diameter_mm", "area_mm2", "mass_kg_per_m",
      "rated_strength_kn", "final_modulus_gpa", "thermal_expansion_per_c");
  private static final List<String> CORE =
      List.of("core_area_mm2", "core_modulus_gpa", "core_thermal_expansion_per_c");
  private static final List<String> SOURCES = List.of("source_size", "source_elastic",
      "source_core");
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
    String text = TextFiles.read(file);
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
    checkMax(t, row, "final_modulus_gpa", v[4], MAX_MODULUS_GPA);
    checkMax(t, row, "thermal_expansion_per_c", v[5], MAX_EXPANSION_PER_C);
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
    checkMax(t, row, "core_modulus_gpa", core[1], MAX_MODULUS_GPA);
    checkMax(t, row, "core_thermal_expansion_per_c", core[2], MAX_EXPANSION_PER_C);
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
        core[0] * 1e-6, core[1] * 1e9, core[2], source);
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
    return v;
  }

  private static void checkMax(CsvTable t, CsvTable.Row row, String column, double v, double max) {
    if (v > max) {
      throw new InputException(t.file(), row.where(), column, String.format(Locale.ROOT,
          "%s is implausibly large (over %s %s): check the unit", v, max, unitOf(column)));
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
    }
    return "1/degC";
  }
}
