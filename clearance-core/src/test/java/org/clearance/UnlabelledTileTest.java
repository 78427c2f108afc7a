package org.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.run.TreeRecord;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.Survey;
import org.clearance.survey.SurveyTestFiles;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 9 on the real open corridor tile (shared/data/open/corridor_12AN2_20_thinned.las, Dutch
 * AHN lidar with vendor labels: ground 2, vegetation 5, wires 14, tower 15, water 9, objects 26):
 * the whole check run on the tile as labelled, with every class but ground reset to 1
 * (ground-only) and with every point class 1 (unlabelled). The labels of the original tile are
 * the truth. With the labels taken away: every span the labelled run finds vegetation inside a
 * zone in keeps a zone site, and every labelled zone site has one within {@link #SAME_SITE_M} of
 * it at least as urgent. The sites on points not labelled vegetation and the fall-in sites at no
 * labelled tree of that height are counted and printed; at most 2 % of the zone sites may stand
 * off vegetation (the class-1 sites with crown evidence counted as vegetation) and none of the
 * fall-in sites at no labelled tree of that height (issue 9).
 */
class UnlabelledTileTest {

  private static final Path LINE_DIR = Paths.get("src/test/resources/corridor-12AN2");
  private static final String PROFILE = "example-utility";
  /** Two runs' sites name the same vegetation when this near in plan, m (site clustering joins
   * points 1.5 m apart; common practice, no source). */
  private static final double SAME_SITE_M = 5.0;
  /** Fall-in tree height tolerance, m (issue 9's target). */
  private static final double HEIGHT_TOL_M = 0.5;
  /** A fall-in site matches a labelled run's tree within this plan distance of its top, or
   * within its crown radius when that is larger, m: on a broad crown the highest point above
   * ground moves between cells when the two runs' ground models differ by a few centimetres
   * (tile, unlabelled: the same 26 m tree's top 2.5 m away, height 0.29 m apart). */
  private static final double TOP_M = 1.5;

  @TempDir
  static Path dir;

  private static Map<Long, Integer> classAt;
  /** Coordinates (x, y, z per point) of the tile's points labelled vegetation (3-5). */
  private static List<double[]> vegetation;
  /** A site on a point not labelled vegetation is "at vegetation" when a labelled vegetation
   * point lies this near, m: the wire finder measures a wire point with a vegetation point
   * within 0.3 m (PointEvidence.TOUCH_M), as the branch and the wire cannot be told apart. */
  private static final double AT_VEGETATION_M = 0.3;

  /** Every point of the tile that is not ground: x, y, z, vendor class. */
  private static List<double[]> aboveGround;
  /** Crown evidence for a site on a point the vendor left class 1 (the tile's author moved
   * only some of AHN's crowns to class 5; AHN's class 1 holds its vegetation): the vendor's
   * class-1 and vegetation points within {@link #CROWN_COLUMN_M} in plan of the site fill at
   * least {@link #CROWN_MIN_LAYERS} one-metre height layers with at least
   * {@link #CROWN_MIN_POINTS} points (a crown is a volume of returns; a wire, a roof or a
   * fence is one thin layer at that scale), and no vendor wire, tower or crane point (14, 15,
   * 26) lies within {@link #CROWN_CLEAR_M} of the site. Common practice, no source; the
   * values are not those of the labelling step (docs/labelling.md). */
  private static final double CROWN_COLUMN_M = 2.0;
  private static final int CROWN_MIN_LAYERS = 4;
  private static final int CROWN_MIN_POINTS = 20;
  private static final double CROWN_CLEAR_M = 1.0;

  private record Site(String span, int priority, String zone, double x, double y, double z,
      double height, double clearance) {}

  private record Run(RunModel model, List<Site> sites, String console) {}

  @BeforeAll
  static void truth() {
    classAt = new HashMap<>();
    vegetation = new ArrayList<>();
    aboveGround = new ArrayList<>();
    Survey s = Survey.open(List.of(SurveyTestFiles.open("corridor_12AN2_20_thinned.las")),
        UnitsChoice.of(LinearUnit.METRE));
    s.readParallel(1, () -> chunk -> {
      for (int i = 0; i < chunk.size(); i++) {
        classAt.put(key(chunk.x()[i], chunk.y()[i], chunk.z()[i]),
            (int) chunk.classification()[i]);
        if (chunk.classification()[i] >= 3 && chunk.classification()[i] <= 5) {
          vegetation.add(new double[] {chunk.x()[i], chunk.y()[i], chunk.z()[i]});
        }
        if (chunk.classification()[i] != 2) {
          aboveGround.add(new double[] {chunk.x()[i], chunk.y()[i], chunk.z()[i],
              chunk.classification()[i]});
        }
      }
    });
  }

  /**
   * The crown evidence around a site ({@link #CROWN_COLUMN_M}): a description when the site
   * stands in a crown the vendor left class 1, null when it does not.
   */
  static String crownEvidence(double x, double y, double z) {
    java.util.BitSet layers = new java.util.BitSet();
    int n = 0;
    double zMin = Double.POSITIVE_INFINITY;
    double zMax = Double.NEGATIVE_INFINITY;
    for (double[] p : aboveGround) {
      int c = (int) p[3];
      if ((c == 14 || c == 15 || c == 26) && Math.sqrt(Math.pow(p[0] - x, 2)
          + Math.pow(p[1] - y, 2) + Math.pow(p[2] - z, 2)) <= CROWN_CLEAR_M) {
        return null;
      }
      if ((c == 1 || (c >= 3 && c <= 5)) && Math.hypot(p[0] - x, p[1] - y) <= CROWN_COLUMN_M) {
        n++;
        layers.set((int) Math.floor(p[2]) - (int) Math.floor(z) + 1000);
        zMin = Math.min(zMin, p[2]);
        zMax = Math.max(zMax, p[2]);
      }
    }
    return n >= CROWN_MIN_POINTS && layers.cardinality() >= CROWN_MIN_LAYERS
        ? String.format(Locale.ROOT, "crown: %d points within %.0f m in plan over %.1f m of"
            + " height (%d one-metre layers), no wire, tower or crane within %.0f m", n,
            CROWN_COLUMN_M, zMax - zMin, layers.cardinality(), CROWN_CLEAR_M)
        : null;
  }

  /** How the tile's classes are changed for a run: which vendor classes are reset to 1. */
  private enum Mode {
    /** As delivered (vegetation 5 and the vendor's class 1 read together: partly labelled). */
    LABELLED(c -> false),
    /** Every class but ground reset to 1. */
    GROUND_ONLY(c -> c != 2),
    /** Every class reset to 1. */
    UNLABELLED(c -> true),
    /** Vegetation (3-5) reset to 1, ground, water, wires, tower and cranes kept. */
    VEGETATION_RESET(c -> c >= 3 && c <= 5),
    /** Wires (13, 14) reset to 1, vegetation and the rest kept. */
    WIRES_RESET(c -> c == 13 || c == 14);

    final java.util.function.IntPredicate reset;

    Mode(java.util.function.IntPredicate reset) {
      this.reset = reset;
    }
  }

  @Test
  void labelsTakenAwayGiveTheLabelledFindings() throws IOException {
    Run labelled = run(Mode.LABELLED);
    StringBuilder figures = new StringBuilder();
    for (Mode keep : Mode.values()) {
      Run r = keep == Mode.LABELLED ? labelled : run(keep);
      r.console().lines().filter(l -> l.contains("labelling")).forEach(l -> System.out.println(
          "tile " + keep + ": " + l));
      int zoneSites = 0;
      int notVegetation = 0;
      int notAtVegetation = 0;
      int manMade = 0;
      int classOne = 0;
      int classOneCrown = 0;
      for (Site s : r.sites()) {
        if (s.zone().equals("fall-in")) {
          continue;
        }
        zoneSites++;
        Integer c = classAt.get(key(s.x(), s.y(), s.z()));
        if (c == null || c < 3 || c > 5) {
          notVegetation++;
          boolean at = vegetation.stream().anyMatch(v -> Math.sqrt(Math.pow(v[0] - s.x(), 2)
              + Math.pow(v[1] - s.y(), 2) + Math.pow(v[2] - s.z(), 2)) <= AT_VEGETATION_M);
          manMade += c != null && (c == 15 || c == 26) ? 1 : 0;
          classOne += c != null && c == 1 && !at ? 1 : 0;
          String crown = c != null && c == 1 && !at ? crownEvidence(s.x(), s.y(), s.z()) : null;
          classOneCrown += crown != null ? 1 : 0;
          notAtVegetation += at ? 0 : 1;
          System.out.println("tile " + keep + ": site not on vegetation: " + s + " class " + c
              + (at ? ", labelled vegetation within 0.3 m" : "")
              + (crown != null ? ", " + crown : ""));
        }
      }
      int missed = 0;
      int spansFalseClear = 0;
      for (SpanRecord span : labelled.model().spans()) {
        boolean labelledZone = labelled.sites().stream().anyMatch(s -> s.span().equals(span.id())
            && !s.zone().equals("fall-in"));
        boolean zone = r.sites().stream().anyMatch(s -> s.span().equals(span.id())
            && !s.zone().equals("fall-in"));
        if (labelledZone && !zone) {
          spansFalseClear++;
        }
      }
      for (Site l : labelled.sites()) {
        if (l.zone().equals("fall-in")) {
          continue;
        }
        boolean found = r.sites().stream().anyMatch(s -> s.span().equals(l.span())
            && s.priority() <= l.priority() && Math.hypot(s.x() - l.x(), s.y() - l.y())
            <= SAME_SITE_M);
        if (!found) {
          missed++;
          System.out.println("tile " + keep + ": labelled site without a match: " + l);
        }
      }
      int fallIn = 0;
      int fallInWrong = 0;
      for (Site s : r.sites()) {
        if (!s.zone().equals("fall-in")) {
          continue;
        }
        fallIn++;
        boolean match = false;
        for (TreeRecord t : labelled.model().trees()) {
          match |= Math.hypot(t.x() - s.x(), t.y() - s.y())
              <= Math.max(TOP_M, t.crownRadiusM())
              && Math.abs(t.heightM() - s.height()) <= HEIGHT_TOL_M;
        }
        if (!match) {
          fallInWrong++;
          TreeRecord near = labelled.model().trees().stream().min(java.util.Comparator
              .comparingDouble(t -> Math.hypot(t.x() - s.x(), t.y() - s.y()))).orElse(null);
          System.out.println("tile " + keep + ": fall-in site at no labelled tree: " + s
              + "; nearest labelled tree " + near);
        }
      }
      // Item 1 of the wire-site brief: a span minimum never above a zone site's clearance (a
      // site standing on the vegetation beside a touched wire point must not raise it), and the
      // touched wire points counted per span.
      long touched = 0;
      int minimaOnWire = 0;
      int minimumAboveSite = 0;
      for (SpanRecord span : r.model().spans()) {
        touched += span.setAside().wireTouched();
        minimaOnWire += span.notes().stream().anyMatch(n -> n.contains(
            "minimum set by a point on the wire touched by vegetation")) ? 1 : 0;
        double least = span.minima().stream().mapToDouble(m -> m.distance())
            .filter(Double::isFinite).min().orElse(Double.POSITIVE_INFINITY);
        for (Site s : r.sites()) {
          if (s.span().equals(span.id()) && !s.zone().equals("fall-in")
              && least > s.clearance() + 0.0005) {
            minimumAboveSite++;
            System.out.println("tile " + keep + ": span minimum " + least + " above site " + s);
          }
        }
        if (span.setAside().wireTouched() > 0) {
          System.out.println("tile " + keep + ": span " + span.id() + " minimum "
              + String.format(Locale.ROOT, "%.3f", least) + " m, notes " + span.notes());
        }
      }
      int strict = notVegetation - classOneCrown;
      String f = String.format(Locale.ROOT, "%s: zone sites %d (labelled run %d), not on"
          + " vegetation %d (of them with no labelled vegetation within 0.3 m %d: vendor class 1"
          + " %d, of them in a crown %d, tower or crane 15/26 %d; not vegetation when crowns"
          + " count as vegetation %d = %.1f %%); spans with labelled zone"
          + " sites left without one %d;"
          + " labelled zone sites without a match %d; fall-in sites %d, at no labelled tree of"
          + " that height %d; wire points touched by vegetation measured %d, spans whose minimum"
          + " stands on one %d", keep, zoneSites,
          labelled.sites().stream().filter(s -> !s.zone().equals("fall-in")).count(),
          notVegetation, notAtVegetation, classOne, classOneCrown, manMade, strict,
          zoneSites == 0 ? 0.0 : 100.0 * strict / zoneSites, spansFalseClear,
          missed, fallIn, fallInWrong, touched, minimaOnWire);
      System.out.println("tile " + f);
      figures.append(f).append('\n');
      assertEquals(0, spansFalseClear, f);
      assertEquals(0, missed, f);
      // Issue 9: no site on a tower or a crane (the labelling step, docs/labelling.md) and every
      // fall-in site at a labelled tree of that height. A wire point with vegetation within
      // 0.3 m is measured but a site holding it stands on the vegetation (docs/clearance.md);
      // sites on vendor class 1 lie in a tree belt the vendor left unclassified (AHN's class 1
      // holds its vegetation; docs/labelling.md): each must show crown evidence of its own
      // (crownEvidence), so that no site stands on something shown not to be vegetation.
      assertEquals(0, manMade, f);
      assertEquals(0, fallInWrong, f);
      assertEquals(notAtVegetation, classOne, f);
      assertEquals(classOne, classOneCrown, f);
      // Issue 9's share: at most 2 % of zone sites not on vegetation, the class-1 sites with
      // crown evidence counted as vegetation (the argument above).
      assertTrue(strict <= 0.02 * zoneSites, f);
      assertEquals(0, minimumAboveSite, f);
    }
    assertTrue(labelled.sites().size() >= 3, "labelled sites: " + labelled.sites().size());
  }

  /** Runs the check on the tile with its classes changed as the mode says. */
  private static Run run(Mode mode) throws IOException {
    String name = mode.name();
    Path las = dir.resolve(name + ".las");
    byte[] bytes = Files.readAllBytes(SurveyTestFiles.open("corridor_12AN2_20_thinned.las"));
    relabel(bytes, mode.reset);
    Files.write(las, bytes);
    Path out = dir.resolve(name + "-run");
    CheckInputs inputs = new CheckInputs(List.of(las), UnitsChoice.of(LinearUnit.METRE),
        LINE_DIR.resolve("structures.csv"), List.of(LINE_DIR.resolve("line.yaml")),
        Optional.empty(), Optional.of(PROFILE), out);
    StringWriter console = new StringWriter();
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(console)).run(inputs, "test");
    return new Run(RunModelJson.read(out.resolve(RunModel.FILE_NAME)), sites(out),
        console.toString());
  }

  /** Sets the classes {@code reset} names to 1 in a LAS 1.4 point format 6-10 file, in place. */
  private static void relabel(byte[] las, java.util.function.IntPredicate reset) {
    ByteBuffer b = ByteBuffer.wrap(las).order(ByteOrder.LITTLE_ENDIAN);
    int format = las[104] & 0x3F;
    assertTrue(format >= 6, "point format " + format);
    int offset = b.getInt(96);
    int length = b.getShort(105) & 0xFFFF;
    long count = b.getLong(247);
    for (long i = 0; i < count; i++) {
      int at = (int) (offset + i * length + 16); // classification byte of formats 6-10
      if (reset.test(las[at] & 0xFF)) {
        las[at] = 1;
      }
    }
  }

  private static long key(double x, double y, double z) {
    return Math.round(x * 1000) * 1_000_003L * 1_000_003L + Math.round(y * 1000) * 1_000_003L
        + Math.round(z * 1000);
  }

  private static List<Site> sites(Path run) throws IOException {
    List<String> lines = Files.readAllLines(run.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    List<Site> out = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      String h = f[header.indexOf("veg_height_m")];
      out.add(new Site(f[header.indexOf("span_id")],
          Integer.parseInt(f[header.indexOf("priority")]), f[header.indexOf("zone")],
          Double.parseDouble(f[coord(header, "x")]), Double.parseDouble(f[coord(header, "y")]),
          Double.parseDouble(f[coord(header, "z")]),
          h.isEmpty() ? Double.NaN : Double.parseDouble(h),
          Double.parseDouble(f[header.indexOf("min_clearance_m")])));
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
