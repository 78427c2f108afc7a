package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.line.SpanFrame;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.survey.UnitsChoice;
import org.clearance.wire.ConductorCurve;
import org.clearance.wire.Crossing;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireResult;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 15: a wire crossing a feeder span (the generator's service line, 50-90 degrees to the
 * span, 1.5 m below its lowest conductor) is recognised and reported as a crossing, where it
 * crosses and how far below the lowest fitted conductor, and is never taken for a conductor;
 * no other span reports one. The truth is the generator's: the plan intersection of the service
 * line with the lowest conductor (the neutral) and the two curves' elevations there (computed).
 */
class FeederCrossingTest {
  /** Plan position of the crossing, m: the crossing wire's line fitted to 20-40 points with
   * 3 cm noise, met by the fitted conductor's plan line (a few centimetres each). */
  static final double PLAN_TOL_M = 0.3;
  /** Vertical separation, m: the two fits' elevation errors at the crossing, a few cm each. */
  static final double SEPARATION_TOL_M = 0.10;

  @TempDir Path dir;

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"31, VERTICAL, FULL", "32, VERTICAL, GROUND_ONLY", "32, HORIZONTAL, UNCLASSIFIED",
      "34, TRIANGULAR, WIRES_UNLABELLED"})
  void theServiceLineIsReportedAsACrossing(long seed, Framing framing, ClassificationMode mode) {
    FeederOptions o = FeederOptions.defaults().withSeed(seed).withSpanCount(8)
        .withFraming(framing).withMode(mode);
    FeederScene scene = FeederScene.create(o);
    WireResult r = FeederAccuracyTest.find(scene, dir);
    int found = 0;
    for (int k = 0; k < scene.spans().size(); k++) {
      FeederScene.Span ts = scene.spans().get(k);
      SpanWires sw = r.spans().get(k);
      if (ts.service().isEmpty()) {
        assertEquals(List.of(), sw.crossings(), sw.span().id());
        continue;
      }
      // never a conductor: no extra wire in the crossed span
      assertTrue(sw.conductors().stream().noneMatch(c -> c.position().isEmpty()),
          sw.span().id() + " " + sw.conductors().stream().filter(c -> c.position().isEmpty())
              .map(c -> c.name() + " " + c.quality() + " " + c.points() + " "
                  + c.curve().map(cc -> cc.plan().azimuth() - sw.span().frame().azimuth()))
              .toList());
      assertEquals(1, sw.crossings().size(), sw.span().id() + " " + sw.crossings());
      Crossing c = sw.crossings().get(0);
      ConductorCurve low = ts.wires().get(ts.wires().size() - 1).curve();
      ConductorCurve service = ts.service().get();
      double[] at = intersection(low.plan(), service.plan());
      double truthSep = low.z(low.plan().station(at[0], at[1]))
          - service.z(service.plan().station(at[0], at[1]));
      System.out.printf(Locale.ROOT, "crossing seed %d %s %s %s: plan %.3f m off, separation "
          + "%.3f m (truth %.3f m), %.0f degrees, %d points, below %s%n", seed, framing, mode,
          sw.span().id(), Math.hypot(c.x() - at[0], c.y() - at[1]), c.separationM(), truthSep,
          c.angleDeg(), c.points(), c.conductor());
      assertEquals(0, Math.hypot(c.x() - at[0], c.y() - at[1]), PLAN_TOL_M);
      assertEquals(truthSep, c.separationM(), SEPARATION_TOL_M);
      assertEquals("N", c.conductor());
      found++;
    }
    assertEquals(1, found);
  }

  /**
   * The whole check, ground-only survey: the crossing is in the run model with its points set
   * aside and counted (spans.csv {@code points_set_aside_crossing}), named in the span's notes,
   * and its columns are in spans.csv.
   */
  @ParameterizedTest(name = "seed {0}, {1}")
  @CsvSource({"32, VERTICAL, GROUND_ONLY"})
  void theCheckReportsTheCrossingAndSetsItsPointsAside(long seed, Framing framing,
      ClassificationMode mode) throws IOException {
    FeederOptions o = FeederOptions.defaults().withSeed(seed).withSpanCount(6)
        .withFraming(framing).withMode(mode);
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), o);
    Path runDir = dir.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
            List.of(files.lineSpec()), Optional.empty(), Optional.empty(), runDir), "test");
    RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
    FeederScene scene = FeederScene.create(o);
    int withCrossing = 0;
    for (int k = 0; k < scene.spans().size(); k++) {
      SpanRecord span = model.spans().get(k);
      if (scene.spans().get(k).service().isEmpty()) {
        assertEquals(0, span.crossings().size(), span.id());
        assertEquals(0, span.setAside().crossing(), span.id());
        continue;
      }
      withCrossing++;
      assertEquals(1, span.crossings().size(), span.id());
      assertTrue(span.setAside().crossing() >= 10, span.id() + " " + span.setAside());
      assertTrue(span.notes().stream().anyMatch(n -> n.startsWith("a wire crosses the span")),
          span.notes().toString());
    }
    assertEquals(1, withCrossing);
    List<String> lines = Files.readAllLines(runDir.resolve("spans.csv"));
    List<String> header = List.of(lines.get(0).split(","));
    assertTrue(header.containsAll(List.of("points_set_aside_crossing", "n_crossings",
        "crossing_x_m", "crossing_y_m", "crossing_z_m", "crossing_separation_m")),
        header.toString());
  }

  /** Where two plan lines meet, m. */
  private static double[] intersection(SpanFrame a, SpanFrame b) {
    // a.origin + p a.u = b.origin + q b.u
    double det = a.ux() * -b.uy() - a.uy() * -b.ux();
    double dx = b.originX() - a.originX();
    double dy = b.originY() - a.originY();
    double p = (dx * -b.uy() - dy * -b.ux()) / det;
    return new double[] {a.originX() + p * a.ux(), a.originY() + p * a.uy()};
  }
}
