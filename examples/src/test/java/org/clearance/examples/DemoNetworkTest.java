package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.clearance.SpanStatus;
import org.clearance.line.SpanFrame;
import org.clearance.run.ConductorRecord;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.survey.UnitsChoice;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Issue 15 (demo): the demo's two lines, the 230 kV line FW231 and the feeder FW-F7 built partly
 * under it on its towers (docs/demo-corridor.md, "The demo's two lines"), checked in one run as
 * the {@code demo} command checks them, against the generators' truth.
 *
 * <p>Classified survey (the demo's default): every feeder span assessed, every feeder
 * conductor's mid-span sag within 5 cm of the truth, each feeder span's minimum clearance within
 * 5 cm of the exact truth (the generator's curves of the fitted phases measured to the true
 * vegetation points, as FeederClearanceTest), no feeder span without a site while a true
 * vegetation point is inside its innermost zone, and at most 2 % of either line's zone sites on
 * points that are not vegetation (issue 9). The other classification modes are held to the same
 * 2 % by the slow test below (measured: 0 of 74-75 and 0 of 40-41 zone sites in every mode).
 *
 * <p>Former gap (issue 15, wire finder; closed by the stacked-framing growth, measured: no feeder
 * span INCOMPLETE): in the default demo the finder found
 * the raised centre phase B and the neutral of the triangular span P205-P206 each in two
 * interleaved pieces; one piece of each is matched, the other listed as an extra ({@code extra1}
 * fitted on B's curve, {@code extra2} too short to fit), and an extra has no conductor data for
 * the line conditions, so the span is INCOMPLETE (never clear). Such a span is held to: every
 * extra with a curve is a piece of one of the span's own conductors (its curve within
 * {@link #PIECE_M} of that conductor's truth at mid-span, its sag within 5 cm), its minimum is
 * not above the truth's, and at most {@link #MAX_SPLIT_SPANS} spans are so.
 */
class DemoNetworkTest {
  /** Issue 15: sag and per-span minimum within 5 cm of the truth. */
  static final double TOL_M = 0.05;
  /** Only minima this close are compared (as FeederClearanceTest). */
  static final double COMPARED_WITHIN_M = 10.0;
  /** Issue 9: largest share of zone sites on points that are not vegetation. */
  static final double MAX_NOT_VEGETATION_SHARE = 0.02;
  /**
   * Innermost zone of the demo's profile for the 12.47 kV feeder in the survey state: California
   * PRC 4293, 4 ft (1.2192 m) from 2.4 to below 72 kV (published; span-specs ca-prc4293.yaml).
   */
  static final double FEEDER_INNER_ZONE_M = 1.2192;
  /** An extra is a piece of a conductor whose truth passes this near its curve at mid-span, m
   * (FeederAccuracyTest's right-position distance). */
  static final double PIECE_M = 0.15;
  /** Feeder spans INCOMPLETE only for a conductor found in pieces: none since the stacked-framing
   * growth of issue 15 (the known gap above is kept as the test's description of what it would
   * accept). */
  static final int MAX_SPLIT_SPANS = 0;
  /** The demo command's rule profile. */
  static final String PROFILE = "example-utility-95";

  @TempDir Path dir;

  /** A zone or fall-in site of sites.csv. */
  record Site(String span, String zone, double x, double y, double z) {
    boolean fallIn() {
      return zone.equals("fall-in");
    }
  }

  /** The outcome of one run. */
  record Run(RunModel model, List<Site> sites, Path dir) {}

  @Test
  void classifiedDemoChecksTheFeederToTheTruth() throws IOException {
    DemoOptions options = DemoOptions.defaults();
    DemoNetwork net = DemoNetwork.create(options);
    FeederScene feeder = net.feeder().orElseThrow();
    Run run = run(options, "full");
    Map<String, SpanRecord> byId = new HashMap<>();
    for (SpanRecord s : run.model().spans()) {
      byId.put(s.id(), s);
    }
    double[] truth = truthMinima(net);
    int jointSpans = 0;
    int split = 0;
    List<String> report = new ArrayList<>();
    for (FeederScene.Span ts : feeder.spans()) {
      SpanRecord span = byId.get(ts.id());
      assertTrue(span != null, "no span " + ts.id() + " in the run");
      assertEquals(FeederScene.LINE_ID, span.context().lineId());
      boolean pieces = span.status() == SpanStatus.INCOMPLETE && piecesOnly(span, ts);
      split += pieces ? 1 : 0;
      if (pieces) {
        report.add(ts.id() + " INCOMPLETE: a conductor found in pieces: " + span.reason());
      } else {
        assertEquals(SpanStatus.ASSESSED, span.status(), ts.id() + ": " + span.reason());
      }
      jointSpans += feeder.isJointSpan(ts.index()) ? 1 : 0;
      for (FeederWire tw : ts.wires()) {
        ConductorRecord c = span.conductors().stream()
            .filter(r -> r.name().equals(tw.position())).findFirst().orElseThrow();
        assertTrue(c.fitted(), ts.id() + " " + tw.position() + ": " + c.reason());
        ConductorCurve f = c.states().get(0).orElseThrow().toState().curve();
        ConductorCurve t = tw.curve();
        double sa = f.plan().station(t.x(0), t.y(0));
        double sb = f.plan().station(t.x(t.length()), t.y(t.length()));
        double sag = f.curve().midSpanSag(sa, sb);
        report.add(String.format(Locale.ROOT, "%s %s sag truth %.3f m, check %.3f m", ts.id(),
            tw.position(), t.midSpanSag(), sag));
        assertEquals(t.midSpanSag(), sag, TOL_M, ts.id() + " " + tw.position() + " sag");
      }
      // every conductor of the span is the feeder's: the transmission line's wires above the
      // underbuild are not extras of the feeder's span (and the reverse)
      assertTrue(pieces || span.conductors().stream().noneMatch(c -> c.name().startsWith(
          "extra")), ts.id() + " " + span.conductors().stream().map(ConductorRecord::name)
          .toList());
      double got = span.minima().get(0).distance();
      double exact = truth[ts.index()];
      report.add(String.format(Locale.ROOT, "%s minimum truth %.3f m, check %.3f m", ts.id(),
          exact, got));
      if (exact < COMPARED_WITHIN_M && !pieces) {
        assertEquals(exact, got, TOL_M, ts.id() + " minimum");
      } else if (exact < COMPARED_WITHIN_M) {
        // measured to the pieces too: never above the truth
        assertTrue(got <= exact + TOL_M, ts.id() + ": " + got + " > " + exact);
      }
      boolean sites = run.sites().stream().anyMatch(s -> s.span().equals(ts.id())
          && !s.fallIn());
      assertTrue(sites || exact >= FEEDER_INNER_ZONE_M, ts.id() + " has no site, but true"
          + " vegetation stands " + exact + " m from a conductor");
    }
    System.out.println("demo feeder, classified:\n  " + String.join("\n  ", report));
    assertTrue(jointSpans >= 1, "joint-use spans: " + jointSpans);
    assertTrue(split <= MAX_SPLIT_SPANS, "spans with a conductor in pieces: " + split);
    for (SpanRecord s : run.model().spans()) {
      if (s.context().lineId().equals(DemoScene.LINE_ID)) {
        assertTrue(s.conductors().stream().noneMatch(c -> c.name().startsWith("extra")),
            s.id() + " " + s.conductors().stream().map(ConductorRecord::name).toList());
      }
    }
    assertNotVegetationShare(net, run, ClassificationMode.FULL, true);
    outputsCoverBothLines(run, feeder);
    treesBetweenTheLinesAreMeasuredToBoth(run);
  }

  /**
   * Regression (issue 15, demo): a tree's base was measured to the nearest span of all lines,
   * so trees beside the feeder that can reach the 230 kV line were checked for the feeder only
   * (FW231/T102-T103's fall-in sites went from 7 to 4). Now each tree near both lines is a tree
   * of each, and one able to reach the 230 kV line in the survey state is a fall-in site there.
   */
  private static void treesBetweenTheLinesAreMeasuredToBoth(Run run) {
    Map<String, List<org.clearance.run.TreeRecord>> byPlace = new HashMap<>();
    for (org.clearance.run.TreeRecord t : run.model().trees()) {
      byPlace.computeIfAbsent(String.format(Locale.ROOT, "%.3f,%.3f", t.x(), t.y()),
          k -> new ArrayList<>()).add(t);
    }
    int both = 0;
    int reaching = 0;
    for (List<org.clearance.run.TreeRecord> at : byPlace.values()) {
      if (at.stream().map(t -> t.spanId().substring(0, t.spanId().indexOf('/'))).distinct()
          .count() < 2) {
        continue;
      }
      both++;
      for (org.clearance.run.TreeRecord t : at) {
        if (t.spanId().startsWith(DemoScene.LINE_ID + "/")
            && t.heightM() >= t.baseDistances().get(0)) {
          reaching++;
          assertTrue(run.sites().stream().anyMatch(s -> s.fallIn()
              && s.span().equals(t.spanId()) && Math.hypot(s.x() - t.x(), s.y() - t.y()) < 1),
              t.id() + " can reach " + t.spanId() + " but is no fall-in site there");
        }
      }
    }
    System.out.println("demo trees measured to both lines: " + both + ", of them able to reach"
        + " the 230 kV line: " + reaching);
    assertTrue(both > 0, "no tree measured to both lines");
  }

  /** The report, spans.csv, the GeoPackage and the GeoJSON hold both lines. */
  private static void outputsCoverBothLines(Run run, FeederScene feeder) throws IOException {
    String html = Files.readString(run.dir().resolve("report.html"), StandardCharsets.UTF_8);
    String title = html.substring(html.indexOf("<h1"), html.indexOf("</h1>"));
    assertTrue(title.contains(DemoScene.LINE_ID) && title.contains(FeederScene.LINE_ID), title);
    String spans = Files.readString(run.dir().resolve("spans.csv"), StandardCharsets.UTF_8);
    for (FeederScene.Span ts : feeder.spans()) {
      assertTrue(spans.contains(ts.id() + "," + FeederScene.LINE_ID + ","), ts.id());
    }
    String geojson = Files.readString(run.dir().resolve("sites.geojson"),
        StandardCharsets.UTF_8);
    assertTrue(geojson.contains("\"" + FeederScene.LINE_ID + "/")
        && geojson.contains("\"" + DemoScene.LINE_ID + "/"), "sites.geojson");
    try (java.sql.Connection c = java.sql.DriverManager.getConnection("jdbc:sqlite:"
        + run.dir().resolve("sites.gpkg"));
        java.sql.ResultSet r = c.createStatement().executeQuery("SELECT line_id, count(*)"
            + " FROM structures GROUP BY line_id ORDER BY line_id")) {
      Map<String, Integer> count = new HashMap<>();
      while (r.next()) {
        count.put(r.getString(1), r.getInt(2));
      }
      // a joint-use tower is a structure of each line (regression: once, under the first)
      assertEquals(feeder.poles().size(), count.get(FeederScene.LINE_ID), count.toString());
      assertEquals(DemoOptions.defaults().spanCount() + 1, count.get(DemoScene.LINE_ID),
          count.toString());
    } catch (java.sql.SQLException e) {
      throw new IOException(e);
    }
  }

  /**
   * Issue 9 in every classification mode the demo offers: the share of each line's zone sites
   * standing on points that are not vegetation (printed; docs/demo-corridor.md gives the
   * figures).
   */
  @Tag("slow")
  @ParameterizedTest
  @EnumSource(value = ClassificationMode.class, names = {"WIRES_UNLABELLED", "GROUND_ONLY",
      "UNCLASSIFIED"})
  void sitesStandOnVegetationInEveryMode(ClassificationMode mode) throws IOException {
    DemoOptions options = DemoOptions.defaults().withMode(mode);
    DemoNetwork net = DemoNetwork.create(options);
    Run run = run(options, mode.name());
    assertNotVegetationShare(net, run, mode, true);
  }

  /**
   * Whether every extra of an INCOMPLETE feeder span that has a curve is a piece of one of the
   * span's own conductors: its curve passes within {@link #PIECE_M} of that conductor's truth at
   * the truth's mid-span and its sag is within 5 cm of the truth's.
   */
  private static boolean piecesOnly(SpanRecord span, FeederScene.Span ts) {
    boolean any = false;
    for (ConductorRecord c : span.conductors()) {
      if (!c.name().startsWith("extra") || !c.fitted()) {
        continue;
      }
      ConductorCurve f = c.states().get(0).orElseThrow().toState().curve();
      boolean piece = false;
      for (FeederWire tw : ts.wires()) {
        ConductorCurve t = tw.curve();
        double sm = f.plan().station(t.x(0.5 * t.length()), t.y(0.5 * t.length()));
        double apart = Math.hypot(Math.hypot(f.x(sm) - t.x(0.5 * t.length()),
            f.y(sm) - t.y(0.5 * t.length())), f.z(sm) - t.z(0.5 * t.length()));
        double sa = f.plan().station(t.x(0), t.y(0));
        double sb = f.plan().station(t.x(t.length()), t.y(t.length()));
        piece |= apart <= PIECE_M
            && Math.abs(f.curve().midSpanSag(sa, sb) - t.midSpanSag()) <= TOL_M;
      }
      if (!piece) {
        return false;
      }
      any = true;
    }
    return any;
  }

  /**
   * Counts, per line, the zone sites on points whose truth is not vegetation; asserts the
   * issue 9 share when {@code strict}, otherwise that every such site of the feeder stands on a
   * conductor point (the known gap of FeederModesTruthTest) and the transmission line's meet
   * the share.
   */
  private static void assertNotVegetationShare(DemoNetwork net, Run run, ClassificationMode mode,
      boolean strict) {
    Set<Long> keys = new HashSet<>();
    for (Site s : run.sites()) {
      keys.add(key(s.x(), s.y(), s.z()));
    }
    Map<Long, TruthId.Kind> kinds = new HashMap<>();
    Map<Long, Integer> wireIndex = new HashMap<>();
    PointSink look = (chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        long k = key(chunk.x()[i], chunk.y()[i], chunk.z()[i]);
        if (keys.contains(k)) {
          kinds.put(k, TruthId.kind(ids[i]));
          wireIndex.put(k, TruthId.wireIndex(ids[i]));
        }
      }
    };
    net.line().points(look);
    net.feeder().orElseThrow().points(look);
    StringBuilder text = new StringBuilder();
    for (String line : List.of(DemoScene.LINE_ID, FeederScene.LINE_ID)) {
      int zone = 0;
      int notVegetation = 0;
      int onWire = 0;
      List<String> which = new ArrayList<>();
      for (Site s : run.sites()) {
        if (s.fallIn() || !s.span().startsWith(line + "/")) {
          continue;
        }
        zone++;
        TruthId.Kind k = kinds.get(key(s.x(), s.y(), s.z()));
        if (k != TruthId.Kind.TREE && k != TruthId.Kind.LOW_VEGETATION
            && k != TruthId.Kind.UNDERSTOREY) {
          notVegetation++;
          onWire += k == TruthId.Kind.WIRE ? 1 : 0;
          which.add(s.span() + " " + s.zone() + " " + k + (k == TruthId.Kind.WIRE
              ? " " + wireIndex.get(key(s.x(), s.y(), s.z())) : ""));
        }
      }
      String f = String.format(Locale.ROOT, "demo %s, line %s: %d zone sites, %d not on"
          + " vegetation (%.1f %%), %d of them on a conductor %s", mode, line, zone,
          notVegetation, zone == 0 ? 0.0 : 100.0 * notVegetation / zone, onWire, which);
      System.out.println(f);
      text.append(f).append('\n');
      assertTrue(zone > 0, f);
      if (strict || line.equals(DemoScene.LINE_ID)) {
        assertTrue(notVegetation <= MAX_NOT_VEGETATION_SHARE * zone, f);
      } else {
        assertEquals(notVegetation, onWire, f);
      }
    }
    assertFalse(text.isEmpty());
  }

  private Run run(DemoOptions options, String name) throws IOException {
    DemoNetwork.Files files = DemoNetwork.write(dir.resolve(name + "-in"), options);
    Path out = dir.resolve(name + "-run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            files.lineSpecs(), Optional.empty(), Optional.of(PROFILE), out), "test");
    RunModel model = RunModelJson.read(out.resolve(RunModel.FILE_NAME));
    List<String> lines = Files.readAllLines(out.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    List<Site> sites = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      sites.add(new Site(f[header.indexOf("span_id")], f[header.indexOf("zone")],
          Double.parseDouble(f[header.indexOf("x_m")]),
          Double.parseDouble(f[header.indexOf("y_m")]),
          Double.parseDouble(f[header.indexOf("z_m")])));
    }
    return new Run(model, sites, out);
  }

  /**
   * Per feeder span: least distance from a true vegetation point of the corridor to the truth
   * curves of its primaries (the energised conductors the span minima count, issue 15).
   */
  static double[] truthMinima(DemoNetwork net) {
    FeederScene feeder = net.feeder().orElseThrow();
    int n = feeder.spans().size();
    double[] min = new double[n];
    java.util.Arrays.fill(min, Double.POSITIVE_INFINITY);
    List<SpanFrame> frames = new ArrayList<>();
    for (FeederScene.Span ts : feeder.spans()) {
      FeederPole a = feeder.poles().get(ts.from());
      FeederPole b = feeder.poles().get(ts.to());
      frames.add(SpanFrame.between(a.x(), a.y(), b.x(), b.y()));
    }
    net.line().points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        TruthId.Kind k = TruthId.kind(ids[i]);
        if (k != TruthId.Kind.TREE && k != TruthId.Kind.LOW_VEGETATION
            && k != TruthId.Kind.UNDERSTOREY) {
          continue;
        }
        double x = chunk.x()[i];
        double y = chunk.y()[i];
        double z = chunk.z()[i];
        for (int sp = 0; sp < n; sp++) {
          SpanFrame f = frames.get(sp);
          double s = f.station(x, y);
          if (s < -COMPARED_WITHIN_M || s > f.length() + COMPARED_WITHIN_M
              || Math.abs(f.offset(x, y)) > 2 * COMPARED_WITHIN_M) {
            continue;
          }
          for (FeederWire w : feeder.spans().get(sp).wires()) {
            if (!w.neutral()) {
              min[sp] = Math.min(min[sp], CurveDistance.distance(w.curve(), x, y, z));
            }
          }
        }
      }
    });
    return min;
  }

  /** Key of a point at millimetres (as sites.csv writes it). */
  private static long key(double x, double y, double z) {
    return Math.round(x * 1000) * 1_000_003L * 1_000_003L + Math.round(y * 1000) * 1_000_003L
        + Math.round(z * 1000);
  }
}
