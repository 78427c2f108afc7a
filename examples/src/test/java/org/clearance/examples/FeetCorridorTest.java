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
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.survey.LasWriter;
import org.clearance.survey.LasWriterOptions;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.PointFormat;
import org.clearance.survey.Survey;
import org.clearance.survey.SurveyUnits;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Issue 9 in US survey feet: the demo corridor's survey and structures rewritten in US survey
 * feet (1200/3937 m, NIST; check-values.md section 1) give the findings of the metre files, in
 * every classification mode that infers vegetation (all four: a labelled survey infers its
 * class 0/1 too, issue 9): the same sites in the same zones, their
 * clearances within {@link #CLEARANCE_TOL_M} and their positions within {@link #POSITION_TOL_M},
 * and the same span minima (or the same bound beyond the keep radius). The corridor carries the
 * labelling fixtures (a tower crane over the line, a fence, a shed: ManMadeFixtures). With
 * {@link ClassificationModesTruthTest} on the metre files this carries its figures to feet.
 */
class FeetCorridorTest {

  private static final String PROFILE = "example-utility";
  /** US survey foot in metres (NIST, 1200/3937 exactly). */
  private static final double FT_US = 1200.0 / 3937.0;
  /** Clearances agree to this, m: 1 mm file resolution in either unit, carried through the fit. */
  private static final double CLEARANCE_TOL_M = 0.003;
  /** Positions agree to this, m: the written millimetre and thousandth of a foot. */
  private static final double POSITION_TOL_M = 0.002;

  /** Fall-in sites: one diagonal of the 0.5 m canopy cell, m (docs/ground.md). */
  private static final double FALL_IN_TOL_M = 0.71;

  @TempDir
  Path dir;

  private record Site(String key, double clearance, double x, double y, double z) {}

  @ParameterizedTest
  @EnumSource(value = ClassificationMode.class, names = {"GROUND_ONLY", "UNCLASSIFIED",
      "PARTLY_LABELLED", "FULL"})
  void feetGiveTheFindingsOfMetres(ClassificationMode mode) throws IOException {
    DemoRuns.Run metres = DemoRuns.of(DemoRuns.small(11L, mode).withManMade(true), PROFILE);
    Path las = dir.resolve("survey-ftus.las");
    Survey survey = Survey.open(List.of(metres.input().resolve(DemoCorridor.SURVEY)),
        UnitsChoice.fromFile());
    SurveyUnits feet = new SurveyUnits(LinearUnit.US_SURVEY_FOOT, LinearUnit.US_SURVEY_FOOT, "",
        OptionalInt.empty(), "", "demo rewritten in US survey feet");
    double ox = Math.round(metres.model().spans().get(0).from().x() / FT_US / 1000) * 1000.0;
    double oy = Math.round(metres.model().spans().get(0).from().y() / FT_US / 1000) * 1000.0;
    try (LasWriter w = LasWriter.create(las, LasWriterOptions.of(4, PointFormat.F6)
        .withCrs(feet).withOffset(ox, oy, 0).withAdjustedGpsTime(true))) {
      survey.readParallel(1, () -> w::write);
    }
    Path structures = dir.resolve("structures-ftus.csv");
    Files.writeString(structures, toFeet(Files.readAllLines(
        metres.input().resolve(DemoCorridor.STRUCTURES), StandardCharsets.UTF_8)),
        StandardCharsets.UTF_8);
    Path run = dir.resolve("run");
    CheckInputs inputs = new CheckInputs(List.of(las), UnitsChoice.fromFile(), structures,
        List.of(metres.input().resolve(DemoCorridor.LINE_SPEC)), Optional.empty(),
        Optional.of(PROFILE), run);
    StringWriter console = new StringWriter();
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(console)).run(inputs, "test");
    List<Site> inMetres = sites(metres.runDir(), 1.0);
    List<Site> inFeet = sites(run, FT_US);
    assertEquals(inMetres.size(), inFeet.size(), "sites; the check in feet said:\n" + console);
    for (Site m : inMetres) {
      // A fall-in site is a tree top at a canopy cell centre: a return on a cell edge may fall
      // in the neighbouring cell once rounded to the other unit, so one cell diagonal is allowed.
      double tol = m.key().contains("|fall-in|") ? FALL_IN_TOL_M : POSITION_TOL_M;
      double dTol = m.key().contains("|fall-in|") ? FALL_IN_TOL_M : CLEARANCE_TOL_M;
      boolean same = inFeet.stream().anyMatch(f -> f.key().equals(m.key())
          && Math.abs(f.clearance() - m.clearance()) <= dTol
          && Math.abs(f.x() - m.x()) <= tol && Math.abs(f.y() - m.y()) <= tol
          && Math.abs(f.z() - m.z()) <= tol + POSITION_TOL_M);
      assertTrue(same, "no site in feet like " + m);
    }
    List<String> spansM = Files.readAllLines(metres.runDir().resolve("spans.csv"));
    List<String> spansF = Files.readAllLines(run.resolve("spans.csv"));
    assertEquals(spansM.size(), spansF.size());
    List<String> header = List.of(spansM.get(0).split(",", -1));
    for (int i = 1; i < spansM.size(); i++) {
      String[] a = spansM.get(i).split(",", -1);
      String[] b = spansF.get(i).split(",", -1);
      for (String col : List.of("span_id", "status", "n_sites")) {
        assertEquals(a[header.indexOf(col)], b[header.indexOf(col)], col + " of " + a[0]);
      }
      for (String col : List.of("min_clearance_survey_m", "min_clearance_hot_m",
          "min_clearance_blowout_m", "min_clearance_ice_m")) {
        String x = a[header.indexOf(col)];
        String y = b[header.indexOf(col)];
        if (x.isEmpty() || x.startsWith(">")) {
          assertEquals(x, y, col + " of " + a[0]);
        } else {
          assertEquals(Double.parseDouble(x), Double.parseDouble(y), CLEARANCE_TOL_M,
              col + " of " + a[0]);
        }
      }
    }
    System.out.printf(Locale.ROOT, "%s in US survey feet: %d sites, each as in metres%n", mode,
        inFeet.size());
  }

  /** The structures file with x, y and ground_z in US survey feet. */
  private static String toFeet(List<String> lines) {
    int h = 0;
    StringBuilder b = new StringBuilder();
    while (lines.get(h).startsWith("#")) {
      b.append("# (rewritten in US survey feet)\n");
      h++;
    }
    List<String> header = List.of(lines.get(h).split(",", -1));
    b.append(lines.get(h)).append('\n');
    for (String line : lines.subList(h + 1, lines.size())) {
      String[] f = line.split(",", -1);
      for (String col : List.of("x", "y", "ground_z")) {
        int k = header.indexOf(col);
        if (k >= 0 && !f[k].isEmpty()) {
          f[k] = String.format(Locale.ROOT, "%.4f", Double.parseDouble(f[k]) / FT_US);
        }
      }
      b.append(String.join(",", f)).append('\n');
    }
    return b.toString();
  }

  /** Work-list sites, positions in metres (file unit {@code unitM} m). */
  private static List<Site> sites(Path run, double unitM) throws IOException {
    List<String> lines = Files.readAllLines(run.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    List<Site> out = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      out.add(new Site(f[header.indexOf("span_id")] + "|" + f[header.indexOf("zone")] + "|"
          + f[header.indexOf("priority")],
          Double.parseDouble(f[header.indexOf("min_clearance_m")]),
          unitM * Double.parseDouble(f[coord(header, "x")]),
          unitM * Double.parseDouble(f[coord(header, "y")]),
          unitM * Double.parseDouble(f[coord(header, "z")])));
    }
    return out;
  }

  /** The sites.csv column of a coordinate, named with its unit ({@code x_m}, {@code x_ft}). */
  private static int coord(List<String> header, String axis) {
    for (int i = 0; i < header.size(); i++) {
      if (header.get(i).startsWith(axis + "_")) {
        return i;
      }
    }
    throw new AssertionError("no " + axis + " column in " + header);
  }
}
