package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.clearance.clearance.PointClearance;
import org.clearance.clearance.SpanStatus;
import org.clearance.rules.PointFinding;
import org.clearance.rules.RuleProfiles;
import org.clearance.rules.SpanRules;
import org.clearance.rules.ZoneEvaluator;
import org.clearance.rules.ZoneViolation;
import org.clearance.run.SpanRecord;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 9: the same demo corridor surveyed fully labelled, ground-only (only ground, water and
 * noise labelled) and unlabelled gives the same findings. Against the generator's truth (exact
 * conductors and the kind of every point), per run: no span reported assessed without a zone
 * site while true vegetation is inside a zone; every tree inside a zone has a site in its span
 * at least as urgent; at most 2 % of the zone sites stand on something that is not vegetation;
 * fall-in sites stand at real trees whose height the check gives within 0.5 m. With the man-made
 * fixtures (a crane over the line, a fence, a shed: {@code ManMadeFixtures}) no site, zone or
 * fall-in, stands on them in any mode.
 */
class ClassificationModesTruthTest {

  private static final String PROFILE = "example-utility";
  /** A zone boundary is a line: truth this close to it may fall either side, m (issue 4). */
  private static final double BOUNDARY_M = 0.10;
  /** Largest share of zone sites on points that are not vegetation (issue 9's target). */
  private static final double MAX_NOT_VEGETATION_SHARE = 0.02;
  /** Survey-state minimum against the truth, m (ClearanceAccuracyTest's survey tolerance:
   * wire noise 2-5 cm per axis averaged by the fit). */
  private static final double SURVEY_TOL_M = 0.05;
    /** Fall-in tree height tolerance, m (issue 9's target). */
  private static final double FALL_IN_HEIGHT_TOL_M = 0.5;
  /** A partly labelled run's zone site names the same vegetation as a fully labelled run's
   * when this near in plan, m (site clustering joins points 1.5 m apart; as
   * UnlabelledTileTest; common practice, no source). */
  private static final double SAME_SITE_M = 5.0;
  /** A fall-in site's position names the tree top within this plan distance, m (the canopy's
   * 0.5 m cells and flat tops; docs/ground.md measured 0.67 m). */
  private static final double TOP_RADIUS_M = 1.5;

  private record Site(String span, int priority, String zone, String condition, double x,
      double y, double z, double vegHeight) {}

  @ParameterizedTest(name = "seed {0}, {1}, wind swing up to {2} deg, man-made fixtures {3}")
  @CsvSource({"11, FULL, 0, false", "11, GROUND_ONLY, 0, false", "11, UNCLASSIFIED, 0, false",
      "23, FULL, 0, false", "23, GROUND_ONLY, 0, false", "23, UNCLASSIFIED, 0, false",
      "37, FULL, 3, false", "37, GROUND_ONLY, 3, false", "11, FULL, 0, true",
      "11, GROUND_ONLY, 0, true", "11, UNCLASSIFIED, 0, true",
      // Seed 29: a dead-end on a 31 degree turn whose strain insulator and jumper end 5.2 m
      // along the line from the tower (once zone sites on them in the unlabelled modes).
      "29, FULL, 0, false", "29, GROUND_ONLY, 0, false", "29, UNCLASSIFIED, 0, false",
      // Seed 41: sparse ground under a stand wider than SMRF's largest opening (once set aside
      // as low outliers in the unlabelled modes: ground 0.58 m high, a fall-in tree 0.59 m
      // short; docs/ground.md).
      "41, FULL, 0, false", "41, GROUND_ONLY, 0, false", "41, UNCLASSIFIED, 0, false",
      // Partly labelled surveys: labelled in a checkerboard of 100 m tiles, ground-only
      // between (vegetation in class 1 beside vegetation in class 5; once read as labelled
      // only, the class-1 vegetation was never measured).
      "11, PARTLY_LABELLED, 0, false", "23, PARTLY_LABELLED, 0, false",
      "41, PARTLY_LABELLED, 0, false", "11, PARTLY_LABELLED, 0, true",
      // Wires labelled vegetation (5) on the sparse scan of these runs (2 pulses per m^2): the
      // wire finder reads only 13/14 and 0/1 and finds no conductor; no span is reported clear
      // and no wire point is a site (check 7).
      "11, WIRES_AS_VEGETATION, 0, false", "23, WIRES_AS_VEGETATION, 0, false",
      "37, WIRES_AS_VEGETATION, 3, false"})
  void findingsMatchTheTruthInEveryClassificationMode(long seed, ClassificationMode mode,
      double swingDeg, boolean manMade) throws IOException {
    DemoRuns.Run run = DemoRuns.of(DemoRuns.small(seed, mode).withSurveySwing(swingDeg)
        .withManMade(manMade), PROFILE);
    TruthDistances truth = new TruthDistances(run, false);
    run.console().lines().filter(l -> l.contains("labelling")).forEach(System.out::println);
    ZoneEvaluator evaluator = new ZoneEvaluator(RuleProfiles.builtin(PROFILE));
    List<SpanRecord> spans = run.model().spans();
    List<SpanRules> rules = new ArrayList<>();
    for (SpanRecord s : spans) {
      rules.add(evaluator.forSpan(s.context()));
    }
    // Truth: per vegetation object (tree id, or the point for grass and undergrowth) the most
    // urgent zone it is inside, per span; and the kind of every point above the ground.
    Map<Long, Integer> kindAt = new HashMap<>();
    List<double[]> treeTops = new ArrayList<>();
    Map<String, int[]> zoneTrees = new HashMap<>();
    Set<Integer> spansWithZoneVegetation = new HashSet<>();
    double[] truthSurveyMinimum = new double[spans.size()];
    java.util.Arrays.fill(truthSurveyMinimum, Double.POSITIVE_INFINITY);
    run.scene().points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        TruthId.Kind kind = TruthId.kind(ids[i]);
        double x = chunk.x()[i];
        double y = chunk.y()[i];
        double z = chunk.z()[i];
        if (kind == TruthId.Kind.GROUND || kind == TruthId.Kind.ROAD) {
          continue;
        }
        kindAt.put(key(x, y, z), ids[i]);
        if (kind == TruthId.Kind.TREE && z - run.scene().groundZ(x, y) > 2) {
          treeTops.add(new double[] {x, y, z});
        }
        if (kind != TruthId.Kind.TREE && kind != TruthId.Kind.LOW_VEGETATION
            && kind != TruthId.Kind.UNDERSTOREY) {
          continue;
        }
        for (int sp = 0; sp < spans.size(); sp++) {
          double keep = run.model().keepRadiusM();
          if (spans.get(sp).status() != SpanStatus.ASSESSED || !truth.nearSpan(sp, x, y, keep)) {
            continue;
          }
          double survey = truth.distance(sp, 0, x, y, z);
          truthSurveyMinimum[sp] = Math.min(truthSurveyMinimum[sp], survey);
          if (!truth.nearSpan(sp, x, y, 0) || survey > keep) {
            continue;
          }
          PointFinding f = rules.get(sp).evaluate(new PointClearance(spans.get(sp).id(), x, y,
              z, 5, Double.NaN, truth.all(sp, x, y, z)));
          if (f.violation().isEmpty() || f.violation().get().deficitM() <= BOUNDARY_M) {
            continue;
          }
          ZoneViolation v = f.violation().get();
          spansWithZoneVegetation.add(sp);
          String object = kind == TruthId.Kind.TREE ? "tree " + TruthId.index(ids[i])
              : String.format(Locale.ROOT, "%s at (%.2f, %.2f, %.2f)", kind, x, y, z);
          zoneTrees.merge(object + "|" + sp, new int[] {v.zone().priority(), sp},
              (a, b) -> a[0] <= b[0] ? a : b);
        }
      }
    });
    List<Site> sites = sites(run);
    // 1. No span without a zone site while vegetation is inside a zone.
    int falseClear = 0;
    for (int sp : spansWithZoneVegetation) {
      String id = spans.get(sp).id();
      if (sites.stream().noneMatch(s -> s.span().equals(id) && !s.zone().equals("fall-in"))) {
        falseClear++;
      }
    }
    // 2. Every tree inside a zone has a site at least as urgent in its span.
    int missed = 0;
    for (Map.Entry<String, int[]> e : zoneTrees.entrySet()) {
      String id = spans.get(e.getValue()[1]).id();
      int priority = e.getValue()[0];
      if (sites.stream().noneMatch(s -> s.span().equals(id) && s.priority() <= priority)) {
        missed++;
        System.out.println("missed: " + e.getKey() + " priority " + priority);
      }
    }
    // 3. Zone sites on points that are not vegetation.
    int zoneSites = 0;
    int notVegetation = 0;
    for (Site s : sites) {
      if (s.zone().equals("fall-in")) {
        continue;
      }
      zoneSites++;
      Integer id = kindAt.get(key(s.x(), s.y(), s.z()));
      TruthId.Kind kind = id == null ? null : TruthId.kind(id);
      if (kind != TruthId.Kind.TREE && kind != TruthId.Kind.LOW_VEGETATION
          && kind != TruthId.Kind.UNDERSTOREY) {
        notVegetation++;
        System.out.println("site not on vegetation: " + s + " truth " + kind);
      }
    }
    // 3b. Sites of any kind on the man-made fixtures or on buildings.
    int onManMade = 0;
    for (Site s : sites) {
      Integer id = kindAt.get(key(s.x(), s.y(), s.z()));
      TruthId.Kind kind = id == null ? null : TruthId.kind(id);
      if (kind == TruthId.Kind.MAN_MADE || kind == TruthId.Kind.BUILDING) {
        onManMade++;
        System.out.println("site on a man-made object: " + s + " truth " + kind);
      }
    }
    // 4. Fall-in sites at real trees with their height.
    int fallIn = 0;
    int fallInWrong = 0;
    for (Site s : sites) {
      if (!s.zone().equals("fall-in")) {
        continue;
      }
      fallIn++;
      double[] top = highestTreePoint(treeTops, s.x(), s.y());
      double height = top == null ? Double.NaN : top[2] - run.scene().groundZ(top[0], top[1]);
      if (!(Math.abs(height - s.vegHeight()) <= FALL_IN_HEIGHT_TOL_M)) {
        fallInWrong++;
        System.out.println("fall-in site not at a tree of its height: " + s + " truth height "
            + height);
      }
    }
    // 5. The survey-state minimum against the wire as surveyed (swung by the wind): equal
    // within SURVEY_TOL_M where the vegetation is labelled, never larger where it is inferred
    // (a superset of the true vegetation).
    double worstSurvey = 0;
    for (int sp = 0; sp < spans.size(); sp++) {
      if (spans.get(sp).status() != SpanStatus.ASSESSED
          || !(truthSurveyMinimum[sp] <= run.model().keepRadiusM())) {
        continue;
      }
      double got = spans.get(sp).minima().get(0).distance();
      double excess = got - truthSurveyMinimum[sp];
      worstSurvey = Math.max(worstSurvey, mode == ClassificationMode.FULL ? Math.abs(excess)
          : excess);
    }
    // 6. A partly labelled survey gives the fully labelled survey's zone sites: each has one in
    // its span within SAME_SITE_M, at least as urgent.
    int fullWithoutMatch = 0;
    if (mode == ClassificationMode.PARTLY_LABELLED) {
      DemoRuns.Run full = DemoRuns.of(DemoRuns.small(seed, ClassificationMode.FULL)
          .withSurveySwing(swingDeg).withManMade(manMade), PROFILE);
      for (Site f : sites(full)) {
        if (f.zone().equals("fall-in")) {
          continue;
        }
        if (sites.stream().noneMatch(s -> s.span().equals(f.span()) && !s.zone().equals(
            "fall-in") && s.priority() <= f.priority()
            && Math.hypot(s.x() - f.x(), s.y() - f.y()) <= SAME_SITE_M)) {
          fullWithoutMatch++;
          System.out.println("fully labelled site without a match: " + f);
        }
      }
    }
    // 7. Wires labelled vegetation: no site of any kind on a wire point, and no span reported
    // assessed without a site where the fully labelled run has a zone site in it. Known gap,
    // counted: the wire finder does not read class 3-5, so it finds no conductor where the
    // wires are labelled 5 and such spans are NOT ASSESSED (docs/labelling.md).
    int notAssessed = 0;
    int onWire = 0;
    int clearWhereFullHasSites = 0;
    if (mode == ClassificationMode.WIRES_AS_VEGETATION) {
      DemoRuns.Run full = DemoRuns.of(DemoRuns.small(seed, ClassificationMode.FULL)
          .withSurveySwing(swingDeg).withManMade(manMade), PROFILE);
      List<Site> fullSites = sites(full);
      for (SpanRecord b : spans) {
        notAssessed += b.status() == SpanStatus.NOT_ASSESSED ? 1 : 0;
        boolean fullZone = fullSites.stream().anyMatch(f -> f.span().equals(b.id())
            && !f.zone().equals("fall-in"));
        boolean zone = sites.stream().anyMatch(f -> f.span().equals(b.id())
            && !f.zone().equals("fall-in"));
        clearWhereFullHasSites += fullZone && !zone && b.status() == SpanStatus.ASSESSED
            ? 1 : 0;
        System.out.println("wires labelled 5: span " + b.id() + " " + b.status() + "; "
            + b.reason());
      }
      for (Site s : sites) {
        Integer id = kindAt.get(key(s.x(), s.y(), s.z()));
        if (id != null && (TruthId.kind(id) == TruthId.Kind.WIRE
            || TruthId.kind(id) == TruthId.Kind.JUMPER)) {
          onWire++;
          System.out.println("site on a wire point: " + s);
        }
      }
    }
    String figures = String.format(Locale.ROOT, "seed %d %s swing %.0f deg: worst survey-state"
        + " minimum error %.3f m; spans %d, spans with vegetation"
        + " in a zone %d, reported without a zone site %d; trees in a zone %d, without a site"
        + " %d; zone sites %d, not on vegetation %d; fall-in sites %d, not at a tree of that"
        + " height %d; sites on man-made objects %d (man-made points %d); fully labelled zone"
        + " sites without a match %d; spans not assessed %d, sites on wire points %d, spans"
        + " assessed without a zone site where the fully labelled run has one %d", seed, mode,
        swingDeg, worstSurvey, spans.size(), spansWithZoneVegetation.size(), falseClear,
        zoneTrees.size(), missed, zoneSites, notVegetation, fallIn, fallInWrong, onManMade,
        kindAt.values().stream().filter(i -> TruthId.kind(i) == TruthId.Kind.MAN_MADE).count(),
        fullWithoutMatch, notAssessed, onWire, clearWhereFullHasSites);
    System.out.println(figures);
    assertEquals(0, onWire, figures);
    assertEquals(0, clearWhereFullHasSites, figures);
    assertTrue(worstSurvey <= SURVEY_TOL_M, figures);
    assertEquals(0, falseClear, figures);
    assertEquals(0, missed, figures);
    assertTrue(notVegetation <= MAX_NOT_VEGETATION_SHARE * zoneSites, figures);
    assertEquals(0, fallInWrong, figures);
    assertEquals(0, onManMade, figures);
    assertEquals(0, fullWithoutMatch, figures);
    if (mode != ClassificationMode.WIRES_AS_VEGETATION) {
      assertTrue(zoneTrees.size() >= 3, figures);
    } else {
      // no conductor found: every span NOT ASSESSED, none reported clear (the known gap)
      assertEquals(spans.size(), notAssessed, figures);
    }
  }

  /** The highest tree point within {@link #TOP_RADIUS_M} of (x, y): x, y, z, or null. */
  private static double[] highestTreePoint(List<double[]> treeTops, double x, double y) {
    double[] best = null;
    for (double[] p : treeTops) {
      if (Math.hypot(p[0] - x, p[1] - y) <= TOP_RADIUS_M && (best == null || p[2] > best[2])) {
        best = p;
      }
    }
    return best;
  }

  /** Key of a point at millimetres (as the work list writes it). */
  private static long key(double x, double y, double z) {
    return Math.round(x * 1000) * 1_000_003L * 1_000_003L + Math.round(y * 1000) * 1_000_003L
        + Math.round(z * 1000);
  }

  private static List<Site> sites(DemoRuns.Run run) throws IOException {
    List<String> lines = Files.readAllLines(run.runDir().resolve("sites.csv"),
        StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    List<Site> out = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      String h = f[header.indexOf("veg_height_m")];
      out.add(new Site(f[header.indexOf("span_id")],
          Integer.parseInt(f[header.indexOf("priority")]), f[header.indexOf("zone")],
          f[header.indexOf("condition")], Double.parseDouble(f[coord(header, "x")]),
          Double.parseDouble(f[coord(header, "y")]), Double.parseDouble(f[coord(header, "z")]),
          h.isEmpty() ? Double.NaN : Double.parseDouble(h)));
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
