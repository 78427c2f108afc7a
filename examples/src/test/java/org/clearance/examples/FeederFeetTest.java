package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 9 on the demo feeder in US survey feet (1200/3937 m, NIST; check-values.md section 1):
 * the same feeder written in metres and in US survey feet, surveyed ground-only, gives the same
 * findings: every span's status, every condition's minimum within {@link #CLEARANCE_TOL_M} at a
 * point within {@link #POSITION_TOL_M}, and the same sites (span, zone, priority) at positions
 * within {@link #POSITION_TOL_M}. The feeder's pole and wire tests (pole column and foot, arm box
 * of a pole line, touched wire points, wire pieces, crossing wires, crown against roof) all
 * work on SI coordinates; a threshold in metres applied to coordinates in feet would show here.
 * Measured when written (seeds 42-45 vertical, 45 and 50 triangular, 41 and 47 horizontal, ten
 * spans, ground-only and unlabelled): identical figures, minima within 1 mm.
 * {@link FeetCorridorTest} does the same for the transmission corridor.
 */
class FeederFeetTest {

  private static final String PROFILE = "example-utility";
  /** Clearances agree to this, m: 1 mm file resolution in either unit, carried through the fit
   * (as FeetCorridorTest). */
  private static final double CLEARANCE_TOL_M = 0.003;
  /** Positions agree to this, m: the written millimetre and thousandth of a foot, and a point of
   * the same distance within the clearance tolerance picked instead (common practice, no
   * source). */
  private static final double POSITION_TOL_M = 0.01;

  @TempDir Path dir;

  private record Site(String key, double x, double y) {}

  private record Run(RunModel model, List<Site> sites) {}

  @ParameterizedTest(name = "seed {0}, {1}")
  @CsvSource({"44, VERTICAL"})
  void feetGiveTheFindingsOfMetres(long seed, Framing framing) throws IOException {
    check(seed, framing);
  }

  @Tag("slow")
  @ParameterizedTest(name = "seed {0}, {1}")
  @CsvSource({"45, TRIANGULAR", "41, HORIZONTAL"})
  void sweepFeetGiveTheFindingsOfMetres(long seed, Framing framing) throws IOException {
    check(seed, framing);
  }

  private void check(long seed, Framing framing) throws IOException {
    FeederOptions base = FeederOptions.defaults().withSeed(seed).withSpanCount(6)
        .withFraming(framing).withMode(ClassificationMode.GROUND_ONLY);
    Run m = run(base.withUnit(LinearUnit.METRE), "m");
    Run ft = run(base.withUnit(LinearUnit.US_SURVEY_FOOT), "ft");
    List<SpanRecord> ms = m.model().spans();
    List<SpanRecord> fs = ft.model().spans();
    assertEquals(ms.size(), fs.size());
    for (int i = 0; i < ms.size(); i++) {
      SpanRecord a = ms.get(i);
      SpanRecord b = fs.get(i);
      assertEquals(a.id(), b.id());
      assertEquals(a.status(), b.status(), a.id());
      assertEquals(a.minima().size(), b.minima().size(), a.id());
      for (int k = 0; k < a.minima().size(); k++) {
        ConditionMinimum p = a.minima().get(k);
        ConditionMinimum q = b.minima().get(k);
        String what = a.id() + " " + p.condition();
        assertEquals(p.distance(), q.distance(), CLEARANCE_TOL_M, what);
        // a minimum not measured (a bound beyond the keep radius) has no position in either
        assertEquals(Double.isNaN(p.x()), Double.isNaN(q.x()), what);
        if (!Double.isNaN(p.x())) {
          assertTrue(Math.hypot(p.x() - q.x(), p.y() - q.y()) <= POSITION_TOL_M, what);
          assertEquals(p.z(), q.z(), POSITION_TOL_M, what);
        }
      }
    }
    assertTrue(!m.sites().isEmpty(), "the feeder has sites");
    assertEquals(m.sites().size(), ft.sites().size(), "sites");
    for (Site s : m.sites()) {
      assertTrue(ft.sites().stream().anyMatch(t -> t.key().equals(s.key())
          && Math.hypot(t.x() - s.x(), t.y() - s.y()) <= POSITION_TOL_M), "no match in feet: "
          + s);
    }
  }

  private Run run(FeederOptions options, String name) throws IOException {
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve(name + "-in"), options);
    Path out = dir.resolve(name + "-run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of(PROFILE), out), "test");
    List<String> lines = Files.readAllLines(out.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    int xCol = prefixed(header, "x_");
    int yCol = prefixed(header, "y_");
    double xy = header.get(xCol).endsWith("_m") ? 1 : options.unit().metres();
    List<Site> sites = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      sites.add(new Site(f[header.indexOf("span_id")] + " " + f[header.indexOf("zone")] + " "
          + f[header.indexOf("priority")], xy * Double.parseDouble(f[xCol]),
          xy * Double.parseDouble(f[yCol])));
    }
    return new Run(RunModelJson.read(out.resolve(RunModel.FILE_NAME)), sites);
  }

  private static int prefixed(List<String> header, String prefix) {
    for (int i = 0; i < header.size(); i++) {
      if (header.get(i).startsWith(prefix)) {
        return i;
      }
    }
    throw new AssertionError("no " + prefix + " column in " + header);
  }
}
