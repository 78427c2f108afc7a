package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import org.clearance.InputException;
import org.clearance.io.TextMutations;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Seeded fuzz test of the line inputs (issue 10, "Done when"): mutations of the example
 * structures file (CSV and GeoJSON), line specification and conductor library go through the
 * readers and the span layout as {@code check} reads them. Every case ends either in one
 * {@link InputException} line naming the file, or in a result whose every value is inside its
 * plausible range: anything else fails with the seed and the mutation.
 */
class LineInputFuzzTest {
  /** Fixed seed: the same cases in every run. */
  private static final long SEED = 10_2026L;
  private static final ConductorLibrary LIB = ConductorLibrary.builtin();
  private static final SurveyUnits METRES = SurveyUnits.metres("test");
  private static final Path EXAMPLES = Path.of("../span-specs/lines");

  @TempDir Path dir;

  /** What the cases came to: counts of clean rejections by field and of accepted results. */
  private record Tally(Map<String, Integer> rejected, Map<String, Integer> accepted) {
    int total() {
      return rejected.values().stream().mapToInt(Integer::intValue).sum()
          + accepted.values().stream().mapToInt(Integer::intValue).sum();
    }
  }

  /**
   * Runs {@code cases} mutations of {@code seed} through {@code reader}; the reader returns a
   * label for an accepted result ("same as the seed" or why the changed result is valid).
   */
  private Tally fuzz(String name, String seed, int cases, long seedValue,
      Function<Path, String> reader) throws IOException {
    Path p = dir.resolve(name);
    Files.writeString(p, seed, StandardCharsets.UTF_8);
    assertEquals("same as the seed", reader.apply(p), "the seed itself is valid");
    Random rnd = new Random(seedValue);
    Tally t = new Tally(new TreeMap<>(), new TreeMap<>());
    for (int c = 0; c < cases; c++) {
      TextMutations.Mutation m = TextMutations.mutate(seed, rnd);
      Files.write(p, m.bytes());
      try {
        t.accepted().merge(reader.apply(p), 1, Integer::sum);
      } catch (InputException e) {
        String msg = e.getMessage();
        assertTrue(msg.startsWith(p.toString()), "names the file: " + msg);
        assertFalse(msg.contains("\n") || msg.contains("\r"), "one line: " + msg);
        t.rejected().merge(kind(e), 1, Integer::sum);
      } catch (Throwable e) {
        throw new AssertionError(name + " case " + c + " (seed " + seedValue + ", " + m.what()
            + "): " + e, e);
      }
    }
    System.out.printf("%s fuzz: %d cases, rejected by field %s, accepted %s%n", name, cases,
        t.rejected(), t.accepted());
    assertEquals(cases, t.total());
    return t;
  }

  private static String example(String file) {
    try {
      return Files.readString(EXAMPLES.resolve(file));
    } catch (IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
  }

  private static LineSpec exampleSpec() {
    return LineSpecReader.read(EXAMPLES.resolve("example-line.yaml"), LIB);
  }

  @Test
  @Timeout(value = 5, unit = TimeUnit.MINUTES) // a hang guard, not a speed target
  void structuresCsv() throws IOException {
    LineSpec spec = exampleSpec();
    String seed = example("example-structures.csv");
    List<Structure> reference = StructureReader.read(EXAMPLES.resolve(
        "example-structures.csv"), METRES);
    fuzz("structures.csv", seed, 700, SEED, p -> layout(p, spec, reference));
  }

  @Test
  @Timeout(value = 5, unit = TimeUnit.MINUTES)
  void structuresGeoJson() throws IOException {
    LineSpec spec = exampleSpec();
    String seed = """
        {"type": "FeatureCollection", "features": [
          {"type": "Feature", "geometry": {"type": "Point", "coordinates": [1000.0, 2000.0]},
           "properties": {"line_id": "BH230", "structure_id": "BH-001", "type": "dead_end",
             "ground_z": 101.5, "attach_z_A": 122.5}},
          {"type": "Feature", "geometry": {"type": "Point", "coordinates": [1250.0, 2010.0]},
           "properties": {"line_id": "BH230", "structure_id": "BH-002", "ground_z": 102.0}},
          {"type": "Feature", "geometry": {"type": "Point", "coordinates": [1530.5, 2031.0]},
           "properties": {"line_id": "BH230", "structure_id": "BH-003", "type": "dead_end",
             "ground_z": null}}
        ]}
        """;
    Path first = dir.resolve("first.geojson");
    Files.writeString(first, seed);
    List<Structure> reference = StructureReader.read(first, METRES);
    fuzz("structures.geojson", seed, 500, SEED + 1, p -> layout(p, spec, reference));
  }

  private static String layout(Path p, LineSpec spec, List<Structure> reference) {
    List<Structure> s = StructureReader.read(p, METRES);
    SpanLayout layout = SpanLayout.build(s, List.of(spec));
    Set<String> ids = new HashSet<>();
    for (Span span : layout.spans()) {
      assertTrue(span.lengthM() >= SpanLayout.SAME_PLACE_M
          && span.lengthM() <= SpanLayout.MAX_SPAN_M, "span length " + span.lengthM());
      assertTrue(ids.add(span.id()), "span id unique: " + span.id());
    }
    for (Structure st : s) {
      assertTrue(StructureReader.PLAN.contains(st.x()) && StructureReader.PLAN.contains(st.y()),
          st.toString());
    }
    if (sameStructures(s, reference)) {
      return "same as the seed";
    }
    return "other structures, every span 1 cm to 6 km with a unique id";
  }

  private static boolean sameStructures(List<Structure> a, List<Structure> b) {
    if (a.size() != b.size()) {
      return false;
    }
    for (int i = 0; i < a.size(); i++) {
      Structure x = a.get(i);
      Structure y = b.get(i);
      if (!(x.id().equals(y.id()) && x.lineId().equals(y.lineId()) && x.x() == y.x()
          && x.y() == y.y() && x.sequence() == y.sequence() && x.type() == y.type()
          && x.attachZ().equals(y.attachZ()) && Double.compare(x.groundZ(), y.groundZ()) == 0)) {
        return false;
      }
    }
    return true;
  }

  @Test
  @Timeout(value = 5, unit = TimeUnit.MINUTES)
  void lineSpecification() throws IOException {
    LineSpec reference = exampleSpec();
    fuzz("line.yaml", example("example-line.yaml"), 700, SEED + 2, p -> {
      LineSpec s = LineSpecReader.read(p, LIB);
      checkRange("nominal_voltage_kv", s.nominalVoltageKv());
      for (ConductorPosition c : s.conductors()) {
        checkOptional("offset_m", c.offsetM());
        checkOptional("attach_height_m", c.attachHeightM());
        checkRange("bundle", c.bundle());
        checkRange("circuit", c.circuit());
        checkOptional("bundle_spacing_m", c.bundleSpacingM());
        checkOptional("insulator_length_m", c.insulatorLengthM());
      }
      for (LineCondition c : s.conditions()) {
        checkOptional("creep_allowance_c", c.creepAllowanceC());
        checkOptional("wind_pressure_pa", c.windPressurePa());
        checkOptional("extra_sag_m", c.extraSagM());
      }
      if (sameSpec(s, reference)) {
        return "same as the seed";
      }
      return "other values, each inside its plausible range";
    });
  }

  private static boolean sameSpec(LineSpec a, LineSpec b) {
    return a.lineId().equals(b.lineId()) && a.name().equals(b.name())
        && a.nominalVoltageKv() == b.nominalVoltageKv() && a.altitudeM() == b.altitudeM()
        && Double.compare(a.surveyConductorTemperatureC(), b.surveyConductorTemperatureC()) == 0
        && a.conductors().equals(b.conductors()) && a.conditions().equals(b.conditions());
  }

  private static void checkOptional(String key, double v) {
    if (!Double.isNaN(v)) {
      checkRange(key, v);
    }
  }

  private static void checkRange(String key, double v) {
    assertTrue(LineSpecReader.RANGES.get(key).contains(v), key + " = " + v);
  }

  @Test
  @Timeout(value = 5, unit = TimeUnit.MINUTES)
  void conductorLibrary() throws IOException {
    String seed;
    try (var in = ConductorLibrary.class.getResourceAsStream(ConductorLibrary.BUILTIN_RESOURCE)) {
      seed = new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
    Path first = dir.resolve("first.csv");
    Files.writeString(first, seed);
    List<ConductorType> reference = ConductorLibrary.read(first).types();
    fuzz("conductors.csv", seed, 500, SEED + 3, p -> {
      List<ConductorType> types = ConductorLibrary.read(p).types();
      // SI values back to the column units: mm, mm^2, kg/m, kN, GPa, 1/degC
      String[] k = {"diameter_mm", "area_mm2", "mass_kg_per_m", "rated_strength_kn",
          "final_modulus_gpa", "thermal_expansion_per_c"};
      double[] toColumn = {1e3, 1e6, 1, 1e-3, 1e-9, 1};
      for (ConductorType t : types) {
        double[] v = {t.diameter(), t.area(), t.massPerLength(), t.ratedStrength(),
            t.finalModulus(), t.thermalExpansion()};
        for (int i = 0; i < v.length; i++) {
          double inUnit = v[i] * toColumn[i];
          var range = ConductorLibrary.RANGES.get(k[i]);
          // relative slack of 1e-12 for the conversion to SI and back
          assertTrue(inUnit >= range.min() * (1 - 1e-12) && inUnit <= range.max() * (1 + 1e-12),
              k[i] + " = " + inUnit);
        }
      }
      if (sameTypes(types, reference)) {
        return "same as the seed";
      }
      return "other types, each value inside its plausible range";
    });
  }

  private static boolean sameTypes(List<ConductorType> a, List<ConductorType> b) {
    if (a.size() != b.size()) {
      return false;
    }
    for (int i = 0; i < a.size(); i++) {
      ConductorType x = a.get(i);
      ConductorType y = b.get(i);
      if (!(x.code().equals(y.code()) && x.diameter() == y.diameter() && x.area() == y.area()
          && x.massPerLength() == y.massPerLength() && x.ratedStrength() == y.ratedStrength()
          && x.finalModulus() == y.finalModulus()
          && x.thermalExpansion() == y.thermalExpansion())) {
        return false;
      }
    }
    return true;
  }

  /** What a rejection names besides the file: line (or record) and field, line only, or none. */
  static String kind(InputException e) {
    if (e.location() != null && e.field() != null) {
      return "file, line and field";
    }
    return e.location() != null ? "file and line" : e.field() != null ? "file and field"
        : "file only";
  }
}
