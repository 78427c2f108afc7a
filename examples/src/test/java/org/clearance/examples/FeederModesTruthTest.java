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
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointReader;
import org.clearance.clearance.SpanStatus;
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
 * Issue 9 on the demo feeder (distribution: poles, conductors 0.3-2.5 m apart, neutral,
 * crossing service line): the same feeder surveyed fully labelled, ground-only and unlabelled,
 * in every framing, in metres and in US survey feet. Against the generator's truth (the kind of
 * every point) and the labelled run, every run is held to issue 9's targets: no span with a
 * labelled zone site is left without one (no span reported clear while vegetation is inside a
 * zone); every labelled zone site has one within {@link #SAME_SITE_M} at least as urgent (every
 * tree in a zone has a site); at most 2 % of zone sites stand on something that is not
 * vegetation; every fall-in site stands at a real tree whose height the check gives within
 * 0.5 m. And per span, the surveyed-state minimum of a span with true vegetation within
 * {@link #COMPARED_WITHIN_M}: never above the truth by more than {@link #TOL_M} (the inferred
 * vegetation holds every true vegetation point), and never set by a point of the line's own
 * wires (issue 9 item 2). The labelled run is the reference for the zones: FeederClearanceTest
 * holds its minima to the truth within 5 cm.
 *
 * <p>Regression (issue 9): in the ground-only and unlabelled runs, points of the feeder's own
 * wires were measured as vegetation: the crossing service line (it crosses the span, so it did
 * not run 10 m along it), and pieces of conductors the finder could not fit, shorter than 10 m
 * or of fewer than 10 points (seed 61 horizontal: 3 of 9 zone sites and 2 of 10 fall-in sites on
 * the service line of span P204-P205; seed 62 triangular: 1 of 16 zone sites). Both are now
 * wire pieces (docs/wire-finder.md, "Points set aside"). Seed 66 (vertical framing): two
 * unfitted conductors one above the other in one group gave 5 of 10 zone sites and 9 of 13
 * fall-in sites on the wires of span P204-P205 (minimum 0.272 m against a true 4.611 m) until
 * the group's strands kept the two apart.
 */
class FeederModesTruthTest {

  private static final String PROFILE = "example-utility";
  /** Two runs' sites name the same vegetation when this near in plan, m (as UnlabelledTileTest). */
  private static final double SAME_SITE_M = 5.0;
  /** Largest share of zone sites on points that are not vegetation (issue 9's target). */
  private static final double MAX_NOT_VEGETATION_SHARE = 0.02;
  /** Fall-in tree height tolerance, m (issue 9's target). */
  private static final double HEIGHT_TOL_M = 0.5;
  /** A fall-in site names the tree top within this plan distance, m (as the transmission test). */
  private static final double TOP_RADIUS_M = 1.5;
  /** Span minimum tolerance against the truth, m (issue 15, as FeederClearanceTest). */
  private static final double TOL_M = 0.05;
  /** Only minima this close are compared, m (as FeederClearanceTest). */
  private static final double COMPARED_WITHIN_M = 10.0;

  /** A sparse scan, pulses per m^2: a quarter of the generator's default (common practice, no
   * source: older and high-altitude surveys deliver 1-4). */
  private static final double SPARSE_DENSITY = 2.0;

  @TempDir Path dir;

  /** A site of sites.csv, SI: its governing point, the condition and the zone's distance there. */
  private record Site(String span, int priority, String zone, double x, double y, double z,
      double height, String condition, double requiredM) {}

  /** The same point in two runs of one survey: within this in each axis, m (a US survey feet
   * survey stores 0.01 ft). */
  private static final double SAME_POINT_M = 0.01;

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"61, HORIZONTAL, METRE", "62, TRIANGULAR, METRE", "63, VERTICAL, US_SURVEY_FOOT"})
  void sameFindingsInEveryClassificationMode(long seed, Framing framing, LinearUnit unit)
      throws IOException {
    check(seed, framing, unit);
  }

  @Tag("slow")
  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"64, HORIZONTAL, US_SURVEY_FOOT", "65, TRIANGULAR, US_SURVEY_FOOT",
      "66, VERTICAL, METRE"})
  void sweepSameFindingsInEveryClassificationMode(long seed, Framing framing, LinearUnit unit)
      throws IOException {
    check(seed, framing, unit);
  }

  /**
   * Ten-span feeders. Regression (issue 9, "a crown is not a roof"): seed 46, vertical framing,
   * ground-only: the smooth shell of a crown was taken for a roof and set aside, span P204-P205
   * minimum 9.403 m against a true 5.013 m (docs/labelling.md). Regression (issue 9, a conductor
   * below the wire-candidate floor): seed 43, vertical framing, ground-only and unlabelled: the
   * neutral of span P208-P209 sags to 2.7-3.0 m over a dip, below the 3 m floor, and its lowest
   * points were measured as vegetation: 4 zone sites and 11 fall-in sites on the wire, minimum
   * 1.312 m against a true 2.730 m (now wire: {@code org.clearance.wire.LowWirePoints}). Seed 42
   * vertical: a labelled site held by a larger site of the inferred runs ({@link #holds}).
   * Regression (issue 9, "the service line beyond the corridor", docs/wire-finder.md): span
   * P206-P207, ground-only and unlabelled, minimum set by the crossing service line beyond the
   * candidates' corridor (seeds 41 and 42 horizontal: 8.972 and 8.790 m against a true 9.886 and
   * 9.222 m) and by its last point in a crown (seed 44 triangular: 4.888 m against 5.805 m, and a
   * watch-zone site on it).
   */
  @Tag("slow")
  @ParameterizedTest(name = "seed {0}, {1}, {2}, 10 spans")
  @CsvSource({"46, VERTICAL, METRE", "43, VERTICAL, METRE", "42, VERTICAL, METRE",
      "41, HORIZONTAL, METRE", "42, HORIZONTAL, METRE", "44, TRIANGULAR, METRE"})
  void tenSpansSameFindingsInEveryClassificationMode(long seed, Framing framing,
      LinearUnit unit) throws IOException {
    check(dir, FeederOptions.defaults().withSeed(seed).withSpanCount(10).withFraming(framing)
        .withUnit(unit), List.of(ClassificationMode.GROUND_ONLY, ClassificationMode.UNCLASSIFIED));
  }

  /**
   * Issue 9: a vendor's class 5 along a sparse wire. Every wire point labelled high vegetation
   * (5) on a sparse scan (2 pulses per m^2, a quarter of the default). Held: no zone site off
   * vegetation and no fall-in site away from a tree of its height (the wire's points are never
   * sites). Known gap, printed: the wire finder reads only 13/14 and 0/1, so it finds no
   * conductor and the spans are NOT ASSESSED (never clear), and the labelled zone sites have no
   * match (docs/labelling.md).
   */
  @ParameterizedTest(name = "seed {0}, {1}, {2}, wires labelled 5, sparse")
  @CsvSource({"61, HORIZONTAL, METRE", "63, VERTICAL, US_SURVEY_FOOT"})
  void wiresLabelledVegetationOnASparseScan(long seed, Framing framing, LinearUnit unit)
      throws IOException {
    List<String> f = figures(dir, FeederOptions.defaults().withSeed(seed).withSpanCount(6)
        .withFraming(framing).withUnit(unit).withPointDensity(SPARSE_DENSITY),
        List.of(ClassificationMode.GROUND_ONLY, ClassificationMode.WIRES_AS_VEGETATION));
    String all = String.join("\n", f);
    int[] wires5 = numbers(f.get(2));
    // v: zone sites, not on vegetation, missed, spans left, fall-in, wrong fall-in, compared,
    // above, on own wire
    assertEquals(0, wires5[1], all);
    assertEquals(0, wires5[5], all);
    assertEquals(0, wires5[7], all);
    assertEquals(0, wires5[8], all);
  }

  private void check(long seed, Framing framing, LinearUnit unit) throws IOException {
    check(dir, FeederOptions.defaults().withSeed(seed).withSpanCount(6).withFraming(framing)
        .withUnit(unit), List.of(ClassificationMode.GROUND_ONLY, ClassificationMode.UNCLASSIFIED));
  }

  /**
   * Runs the feeder of {@code base} labelled and in each of {@code modes}, prints every finding
   * and the figures, and holds every run to issue 9's targets.
   *
   * @param dir a folder for the runs
   * @return the figures line of each run, the labelled one first
   */
  static List<String> check(Path dir, FeederOptions base, List<ClassificationMode> modes)
      throws IOException {
    List<String> figures = figures(dir, base, modes);
    String all = String.join("\n", figures);
    for (String f : figures) {
      int[] v = numbers(f);
      // v: zone sites, not on vegetation, missed, spans left, fall-in, wrong fall-in,
      // compared, above, on own wire
      assertEquals(0, v[3], all);
      assertEquals(0, v[2], all);
      assertTrue(v[1] <= MAX_NOT_VEGETATION_SHARE * v[0], all);
      assertEquals(0, v[5], all);
      assertEquals(0, v[7], all);
      assertEquals(0, v[8], all);
    }
    assertTrue(numbers(figures.get(0))[0] > 0, all);
    return figures;
  }

  /** The figures of {@link #check(Path, FeederOptions, List)} without holding them (the sweep,
   * {@link FeederModesSweep}). */
  static List<String> figures(Path dir, FeederOptions base, List<ClassificationMode> modes)
      throws IOException {
    long seed = base.seed();
    Framing framing = base.framing();
    LinearUnit unit = base.unit();
    FeederScene scene = FeederScene.create(base.withMode(ClassificationMode.FULL));
    Map<Long, Integer> kindAt = new HashMap<>();
    List<double[]> treePoints = new ArrayList<>();
    scene.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        if (TruthId.kind(ids[i]) != TruthId.Kind.GROUND) {
          kindAt.put(key(chunk.x()[i], chunk.y()[i], chunk.z()[i]), ids[i]);
        }
        if (TruthId.kind(ids[i]) == TruthId.Kind.TREE) {
          treePoints.add(new double[] {chunk.x()[i], chunk.y()[i], chunk.z()[i]});
        }
      }
    });
    Run labelled = run(dir, base.withMode(ClassificationMode.FULL), "full");
    List<String> figures = new ArrayList<>();
    List<ClassificationMode> all = new ArrayList<>(List.of(ClassificationMode.FULL));
    all.addAll(modes);
    for (ClassificationMode mode : all) {
      Run r = mode == ClassificationMode.FULL ? labelled
          : run(dir, base.withMode(mode), mode.name());
      String tag = "feeder seed " + seed + " " + framing + " " + unit.symbol() + " " + mode;
      int zoneSites = 0;
      int notVegetation = 0;
      for (Site s : r.sites()) {
        if (s.zone().equals("fall-in")) {
          continue;
        }
        zoneSites++;
        TruthId.Kind k = kind(kindAt, s.x(), s.y(), s.z());
        if (k != TruthId.Kind.TREE && k != TruthId.Kind.LOW_VEGETATION) {
          notVegetation++;
          System.out.println(tag + ": site not on vegetation: " + s + " " + k);
        }
      }
      int spansLeft = 0;
      int missed = 0;
      for (Site l : labelled.sites()) {
        if (l.zone().equals("fall-in")) {
          continue;
        }
        if (r.sites().stream().noneMatch(s -> s.span().equals(l.span())
            && !s.zone().equals("fall-in"))) {
          spansLeft++;
        }
        if (r.sites().stream().noneMatch(s -> s.span().equals(l.span())
            && s.priority() <= l.priority()
            && Math.hypot(s.x() - l.x(), s.y() - l.y()) <= SAME_SITE_M)) {
          if (holds(r, l)) {
            System.out.println(tag + ": labelled site held by a larger site of this run (its"
                + " point measured inside the zone, the site governed farther than "
                + SAME_SITE_M + " m away): " + l);
          } else {
            missed++;
            System.out.println(tag + ": labelled site without a match: " + l);
          }
        }
      }
      int fallIn = 0;
      int fallInWrong = 0;
      for (Site s : r.sites()) {
        if (!s.zone().equals("fall-in")) {
          continue;
        }
        fallIn++;
        double[] top = null;
        for (double[] p : treePoints) {
          if (Math.hypot(p[0] - s.x(), p[1] - s.y()) <= TOP_RADIUS_M
              && (top == null || p[2] > top[2])) {
            top = p;
          }
        }
        double h = top == null ? Double.NaN : top[2] - scene.groundZ(top[0], top[1]);
        if (!(Math.abs(h - s.height()) <= HEIGHT_TOL_M)) {
          fallInWrong++;
          System.out.println(tag + ": fall-in site not at a tree of its height: " + s
              + " truth " + h);
        }
      }
      // per span: the surveyed-state minimum against the truth (the true curves of the
      // conductors this run fitted: a conductor not fitted is not measured, and its span is
      // INCOMPLETE)
      double[] truth = FeederClearanceTest.truthMinima(scene, r.model(), "phase");
      int compared = 0;
      int above = 0;
      int onOwnWire = 0;
      for (int i = 0; i < truth.length; i++) {
        SpanRecord span = r.model().spans().get(i);
        if (span.status() == SpanStatus.NOT_ASSESSED || !(truth[i] < COMPARED_WITHIN_M)) {
          continue;
        }
        compared++;
        ConditionMinimum m = span.minima().get(0);
        TruthId.Kind k = kind(kindAt, m.x(), m.y(), m.z());
        String line = String.format(Locale.ROOT, "%s %s %s: truth %.3f m, check %.3f m on %s",
            tag, span.id(), span.status(), truth[i], m.distance(), k);
        if (m.distance() > truth[i] + TOL_M) {
          above++;
          System.out.println(line + " ABOVE THE TRUTH");
        } else if (k == TruthId.Kind.WIRE) {
          onOwnWire++;
          System.out.println(line + " SET BY THE LINE'S OWN WIRE");
        }
      }
      String f = String.format(Locale.ROOT, "%s: zone sites %d, not on vegetation %d; labelled"
          + " zone sites without a match %d (spans left without one %d); fall-in sites %d, not"
          + " at a tree of that height %d; span minima compared %d, above the truth %d, set by"
          + " the line's own wire %d", tag, zoneSites, notVegetation, missed, spansLeft, fallIn,
          fallInWrong, compared, above, onOwnWire);
      System.out.println(f);
      figures.add(f);
    }
    return figures;
  }

  /** The integers of a figures line after its tag, in order. */
  static int[] numbers(String f) {
    return java.util.Arrays.stream(f.substring(f.indexOf(": ") + 2).split("[^0-9]+"))
        .filter(t -> !t.isEmpty()).mapToInt(Integer::parseInt).toArray();
  }

  /**
   * Whether the run measured the labelled site's governing point itself (the same survey point)
   * inside the site's zone: no farther from the conductors in the site's condition than the
   * zone's distance. Every point inside a zone belongs to a site of that zone or a more urgent
   * one (SiteBuilder), so the run has a site holding it at least as urgent, even when single
   * linkage joined it to vegetation farther on and that site's governing point lies more than
   * {@link #SAME_SITE_M} away. Regression (issue 9): seed 42, vertical framing, ten spans,
   * ground-only: the labelled watch site of span P204-P205 on a grass point 0.317 m high (hot
   * 5.427 m, the zone 5.461 m) had no match: in the ground-only run the same point measured
   * 5.425 m, but a grass point 1.39 m away measured 5.460 m (5.461 m or more in the labelled
   * run, whose fitted curves differ by a millimetre), joined it to a larger watch site whose
   * governing point stands 5.3 m away. The example profile's zones are nested (each based on
   * the one before with a margin), so inside the watch distance is inside a zone at least as
   * urgent.
   */
  private static boolean holds(Run r, Site l) {
    boolean[] held = {false};
    try {
      NearPointReader.forEach(r.dir().resolve(NearPointFile.FILE_NAME), p -> {
        if (p.spanId().equals(l.span()) && Math.abs(p.x() - l.x()) <= SAME_POINT_M
            && Math.abs(p.y() - l.y()) <= SAME_POINT_M
            && Math.abs(p.z() - l.z()) <= SAME_POINT_M) {
          for (ConditionDistance d : p.distances()) {
            if (d.condition().equals(l.condition()) && d.distance() <= l.requiredM()) {
              held[0] = true;
            }
          }
        }
      });
    } catch (IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
    return held[0];
  }

  private record Run(List<Site> sites, RunModel model, Path dir) {}

  private static Run run(Path dir, FeederOptions options, String name) throws IOException {
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve(name + "-in"), options);
    Path out = dir.resolve(name + "-run");
    StringWriter console = new StringWriter();
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(console)).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of(PROFILE), out), "test");
    List<String> lines = Files.readAllLines(out.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    int xCol = column(header, "x_");
    int yCol = column(header, "y_");
    int zCol = column(header, "z_");
    int hCol = column(header, "veg_height_");
    int rCol = column(header, "required_");
    double xy = header.get(xCol).endsWith("_m") ? 1 : options.unit().metres();
    double zu = header.get(zCol).endsWith("_m") ? 1 : options.unit().metres();
    double hu = header.get(hCol).endsWith("_m") ? 1 : options.unit().metres();
    double ru = header.get(rCol).endsWith("_m") ? 1 : options.unit().metres();
    List<Site> sites = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      String h = f[hCol];
      String req = f[rCol];
      sites.add(new Site(f[header.indexOf("span_id")],
          Integer.parseInt(f[header.indexOf("priority")]), f[header.indexOf("zone")],
          xy * Double.parseDouble(f[xCol]), xy * Double.parseDouble(f[yCol]),
          zu * Double.parseDouble(f[zCol]),
          h.isEmpty() ? Double.NaN : hu * Double.parseDouble(h),
          f[header.indexOf("condition")],
          req.isEmpty() ? Double.NaN : ru * Double.parseDouble(req)));
    }
    return new Run(sites, RunModelJson.read(out.resolve(RunModel.FILE_NAME)), out);
  }

  private static int column(List<String> header, String prefix) {
    for (int i = 0; i < header.size(); i++) {
      if (header.get(i).startsWith(prefix)) {
        return i;
      }
    }
    throw new AssertionError("no " + prefix + " column in " + header);
  }

  /**
   * The truth kind of the point at (x, y, z), m: the generated point within a millimetre in
   * each axis (a survey in US survey feet rounds to its own scale), or null (ground).
   */
  static TruthId.Kind kind(Map<Long, Integer> kindAt, double x, double y, double z) {
    long kx = Math.round(x * 1000);
    long ky = Math.round(y * 1000);
    long kz = Math.round(z * 1000);
    for (long a = -1; a <= 1; a++) {
      for (long b = -1; b <= 1; b++) {
        for (long c = -1; c <= 1; c++) {
          Integer id = kindAt.get(packed(kx + a, ky + b, kz + c));
          if (id != null) {
            return TruthId.kind(id);
          }
        }
      }
    }
    return null;
  }

  /** Key of a point at millimetres (as sites.csv writes it). */
  static long key(double x, double y, double z) {
    return packed(Math.round(x * 1000), Math.round(y * 1000), Math.round(z * 1000));
  }

  private static long packed(long mx, long my, long mz) {
    return mx * 1_000_003L * 1_000_003L + my * 1_000_003L + mz;
  }
}
