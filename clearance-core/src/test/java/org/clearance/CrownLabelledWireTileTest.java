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
import java.util.List;
import java.util.Optional;
import org.clearance.run.ConductorRecord;
import org.clearance.run.CurveRecord;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyTestFiles;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 9 (labels trusted only as far as they are consistent) on the real open corridor tile
 * (shared/data/open/corridor_12AN2_20_thinned.las, AHN lidar, vendor labels: vegetation 5,
 * wires 14): the crowns that give the delivered tile's zone sites are relabelled wire conductor
 * (14), as a vendor's classifier that took them for wire would leave them. The engine does not
 * read class 14, so before the labelling step judged wire labels those crowns were never
 * measured. Held: on the delivered tile no wire label is distrusted (its real wires keep their
 * label); with the crowns labelled 14 they are measured and counted per span as labels not
 * trusted, and no span with a delivered zone site is reported clear. The crowns hang on phase L1
 * of OV-12-OV-13; the wire finder, which took them as wire seeds, lost that phase (main
 * fa521be: INCOMPLETE, 8 of 8 delivered zone sites without a match). Held now: every span's
 * status and every conductor's as delivered, each fitted conductor's mid-span sag within
 * {@link #SAG_TOL_M} of the delivered fit, every delivered zone site matched, and the spans'
 * surveyed minima within {@link #MINIMUM_TOL_M} of the delivered tile's.
 */
class CrownLabelledWireTileTest {

  private static final Path LINE_DIR = Paths.get("src/test/resources/corridor-12AN2");
  private static final String PROFILE = "example-utility";
  /** Two runs' sites name the same vegetation when this near in plan, m (as in
   * UnlabelledTileTest; common practice, no source). */
  private static final double SAME_SITE_M = 5.0;
  /** Vegetation (3-5) within this plan distance of a delivered zone site is relabelled 14, m:
   * more than {@link #SAME_SITE_M}, so that no vegetation left in class 5 can give the match. */
  private static final double RELABEL_M = 7.0;
  /** Mid-span sag of a conductor fitted with the crowns labelled 14 against the delivered
   * tile's fit, m: the crown's points are left out of the fit, the wire's own points are the
   * same (common practice, no source: a few centimetres is within a fit's noise). */
  private static final double SAG_TOL_M = 0.05;
  /** A span's surveyed minimum with the crowns labelled 14 against the delivered tile's, m:
   * the same vegetation points, measured as unclassified rather than as class 5 (its wire points
   * touched by vegetation may set it; common practice, no source). */
  private static final double MINIMUM_TOL_M = 0.05;

  @TempDir
  static Path dir;

  private record Site(String span, int priority, String zone, double x, double y) {}

  private record Run(RunModel model, List<Site> sites, String console) {}

  /** The delivered tile's bytes and run, shared by the cases. */
  private static byte[] delivered;
  private static Run asDelivered;

  @BeforeAll
  static void runDelivered() throws IOException {
    delivered = Files.readAllBytes(SurveyTestFiles.open("corridor_12AN2_20_thinned.las"));
    asDelivered = run("delivered", delivered);
  }

  /** The delivered tile: no label is distrusted; its real wires (14) and its real tower (15,
   * 1 179 points, shared/data/README.md) keep their labels. */
  @Test
  void deliveredLabelsAreKept() {
    assertEquals(0, distrusted(asDelivered.model()), asDelivered.console());
    String labelling = asDelivered.console().lines().filter(l -> l.contains("labelling"))
        .findFirst().orElse("");
    System.out.println("delivered: " + labelling);
    assertTrue(labelling.contains("(13, 14) off the fitted conductors looked at"), labelling);
    assertTrue(labelling.matches(".*\\(13, 14\\)[^;]*not trusted \\(crown-shaped, measured\\) 0;"
        + ".*\\(6, 15, 17\\) looked at [1-9][0-9,]*, not trusted \\(crown-shaped, measured\\) 0"),
        labelling);
  }

  /**
   * The crowns of the delivered zone sites relabelled wire (14), building (6), tower (15) or
   * bridge deck (17). Before issue 9's label judging none of these crowns was measured; with
   * 6/15/17 not judged (main fa521be) they were set aside as man-made without a check; with
   * 15 judged by the labelling step alone, the wire finder's tower finder still took the crowns
   * labelled 15 for four towers and cut the span at them (measured, docs/labelling.md): class-15
   * points now make a tower only where they make a tower's column.
   */
  @ParameterizedTest(name = "crowns labelled {0}")
  @ValueSource(ints = {14, 6, 15, 17})
  void crownsLabelledManMadeAreMeasured(int label) throws IOException {
    List<Site> zoneSites = asDelivered.sites().stream().filter(s -> !s.zone().equals("fall-in"))
        .toList();
    assertTrue(zoneSites.size() >= 3, "delivered zone sites " + zoneSites);
    byte[] relabelled = delivered.clone();
    int moved = relabel(relabelled, zoneSites, label);
    Run r = run("crowns-" + label, relabelled);
    String tag = "crowns labelled " + label + ": ";
    System.out.println(tag + moved + " vegetation points relabelled; "
        + r.console().lines().filter(l -> l.contains("labelling")).findFirst().orElse(""));
    int missed = 0;
    int spansClear = 0;
    for (SpanRecord span : r.model().spans()) {
      List<Site> inSpan = zoneSites.stream().filter(l -> l.span().equals(span.id())).toList();
      int unmatched = 0;
      for (Site l : inSpan) {
        boolean found = r.sites().stream().anyMatch(s -> s.span().equals(l.span())
            && s.priority() <= l.priority() && Math.hypot(s.x() - l.x(), s.y() - l.y())
            <= SAME_SITE_M);
        unmatched += found ? 0 : 1;
      }
      missed += unmatched;
      // never clear: a span with a delivered zone site is not reported assessed without one
      boolean clear = span.status() == org.clearance.clearance.SpanStatus.ASSESSED
          && r.sites().stream().noneMatch(s -> s.span().equals(span.id())
              && !s.zone().equals("fall-in"));
      spansClear += !inSpan.isEmpty() && clear ? 1 : 0;
      System.out.println(tag + "span " + span.id() + " " + span.status()
          + ", delivered zone sites " + inSpan.size() + ", without a match " + unmatched
          + ", points_label_distrusted " + span.setAside().labelsDistrusted() + "; "
          + span.reason());
    }
    long counted = distrusted(r.model());
    System.out.println(tag + "delivered zone sites " + zoneSites.size()
        + ", without a match " + missed + ", spans with them reported clear " + spansClear
        + "; points_label_distrusted over the spans " + counted);
    assertTrue(moved > 100, "relabelled " + moved);
    assertEquals(0, spansClear);
    assertTrue(counted > 0, "distrusted labels counted per span: " + counted);
    // Was a known limitation (main fa521be): the crowns labelled 14 hang on phase L1 of
    // OV-12-OV-13, the wire finder took them as wire seeds and lost L1 there (INCOMPLETE, 8 of 8
    // delivered zone sites without a match). Now the wire labels in a volume of wire labels are
    // taken as unclassified candidates (wire.CrownLabels): L1 is found and fitted, and every
    // delivered zone site has a match.
    assertEquals(0, missed, "delivered zone sites without a match");
    for (SpanRecord span : r.model().spans()) {
      SpanRecord before = asDelivered.model().spans().stream()
          .filter(d -> d.id().equals(span.id())).findFirst().orElseThrow();
      assertEquals(before.status(), span.status(), span.id() + " " + span.reason());
      for (ConductorRecord c : before.conductors()) {
        ConductorRecord now = span.conductors().stream()
            .filter(k -> k.name().equals(c.name())).findFirst().orElseThrow();
        assertEquals(c.status(), now.status(), span.id() + " " + c.name() + " " + now.reason());
        if (c.states().isEmpty() || c.states().get(0).isEmpty()) {
          continue;
        }
        double sagThen = midSag(c.states().get(0).get());
        double sagNow = midSag(now.states().get(0).orElseThrow());
        System.out.println(String.format(java.util.Locale.ROOT, tag + "%s %s "
            + "surveyed mid-span sag %.3f m, delivered %.3f m", span.id(), c.name(), sagNow,
            sagThen));
        assertEquals(sagThen, sagNow, SAG_TOL_M, span.id() + " " + c.name());
      }
      if (zoneSites.stream().anyMatch(l -> l.span().equals(span.id()))) {
        double then = before.minima().get(0).distance();
        double now = span.minima().get(0).distance();
        System.out.println(String.format(java.util.Locale.ROOT, tag + "%s "
            + "surveyed minimum %.3f m, delivered %.3f m", span.id(), now, then));
        assertEquals(then, now, MINIMUM_TOL_M, span.id() + " minimum");
      }
    }
  }

  /** Sag at mid-span below the chord of a surveyed curve, m. */
  private static double midSag(CurveRecord c) {
    var curve = c.toState().curve();
    double mid = curve.length() / 2;
    return 0.5 * (curve.zA() + curve.zB()) - curve.z(mid);
  }

  private static long distrusted(RunModel model) {
    return model.spans().stream().mapToLong(s -> s.setAside().labelsDistrusted()).sum();
  }

  /** Sets class 3-5 points within {@link #RELABEL_M} in plan of a site to {@code label} (LAS
   * 1.4 point formats 6-10, in place); returns how many. */
  private static int relabel(byte[] las, List<Site> sites, int label) {
    ByteBuffer b = ByteBuffer.wrap(las).order(ByteOrder.LITTLE_ENDIAN);
    int format = las[104] & 0x3F;
    assertTrue(format >= 6, "point format " + format);
    int offset = b.getInt(96);
    int length = b.getShort(105) & 0xFFFF;
    long count = b.getLong(247);
    double sx = b.getDouble(131);
    double sy = b.getDouble(139);
    double ox = b.getDouble(155);
    double oy = b.getDouble(163);
    int moved = 0;
    for (long i = 0; i < count; i++) {
      int at = (int) (offset + i * length);
      int cls = las[at + 16] & 0xFF; // classification byte of formats 6-10
      if (cls < 3 || cls > 5) {
        continue;
      }
      double x = b.getInt(at) * sx + ox;
      double y = b.getInt(at + 4) * sy + oy;
      for (Site s : sites) {
        if (Math.hypot(x - s.x(), y - s.y()) <= RELABEL_M) {
          las[at + 16] = (byte) label;
          moved++;
          break;
        }
      }
    }
    return moved;
  }

  private static Run run(String name, byte[] bytes) throws IOException {
    Path las = dir.resolve(name + ".las");
    Files.write(las, bytes);
    Path out = dir.resolve(name + "-run");
    CheckInputs inputs = new CheckInputs(List.of(las), UnitsChoice.of(LinearUnit.METRE),
        LINE_DIR.resolve("structures.csv"), List.of(LINE_DIR.resolve("line.yaml")),
        Optional.empty(), Optional.of(PROFILE), out);
    StringWriter console = new StringWriter();
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(console)).run(inputs, "test");
    List<String> lines = Files.readAllLines(out.resolve("sites.csv"), StandardCharsets.UTF_8);
    List<String> header = List.of(lines.get(0).split(",", -1));
    List<Site> sites = new ArrayList<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] f = line.split(",", -1);
      sites.add(new Site(f[header.indexOf("span_id")],
          Integer.parseInt(f[header.indexOf("priority")]), f[header.indexOf("zone")],
          Double.parseDouble(f[header.indexOf("x_m")]),
          Double.parseDouble(f[header.indexOf("y_m")])));
    }
    return new Run(RunModelJson.read(out.resolve(RunModel.FILE_NAME)), sites,
        console.toString());
  }
}
