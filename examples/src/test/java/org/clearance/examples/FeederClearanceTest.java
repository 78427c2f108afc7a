package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.clearance.CheckInputs;
import org.clearance.CheckOptions;
import org.clearance.ClearanceCheck;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.NearPointFile;
import org.clearance.clearance.NearPointReader;
import org.clearance.clearance.SpanStatus;
import org.clearance.line.PoleEquipment;
import org.clearance.line.SpanFrame;
import org.clearance.run.ConductorRecord;
import org.clearance.run.RunModel;
import org.clearance.run.RunModelJson;
import org.clearance.run.SpanRecord;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.UnitsChoice;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 15: the whole check on the demo feeder. Per span, the surveyed-state minimum clearance
 * from vegetation within 5 cm of the exact truth (the generator's catenaries of the conductors
 * the check fitted, measured by {@link CurveDistance} to the vegetation points) in assessed
 * spans, never above it in incomplete ones; and no span assessed where a primary conductor was
 * not fitted. The span minima count the energised conductors only; the neutral is measured too
 * (near-points.bin keeps each point's distance to it, for zones that name it), and its minimum
 * is checked against the truth the same way. Unclassified surveys are left out: their vegetation is inferred (a superset of the
 * truth's), as ClearanceAccuracyTest explains.
 */
class FeederClearanceTest {
  /** Issue 15: per-span minimum within 5 cm of the exact truth. */
  static final double TOL_M = 0.05;
  /** Only minima this close are compared (as ClearanceAccuracyTest). */
  static final double COMPARED_WITHIN_M = 10.0;

  @TempDir Path dir;

  @ParameterizedTest(name = "seed {0}, {1}, {2}, {3}")
  @CsvSource({"41, HORIZONTAL, FULL, METRE", "42, TRIANGULAR, WIRES_UNLABELLED, US_SURVEY_FOOT"})
  void perSpanMinimaMatchTheTruth(long seed, Framing framing, ClassificationMode mode,
      LinearUnit unit) throws IOException {
    check(FeederOptions.defaults().withSeed(seed).withSpanCount(6).withFraming(framing)
        .withMode(mode).withUnit(unit));
  }

  @Tag("slow")
  @ParameterizedTest(name = "seed {0}, {1}, {2}, {3}")
  @CsvSource({"51, VERTICAL, FULL, METRE", "52, HORIZONTAL, WIRES_UNLABELLED, US_SURVEY_FOOT",
      "53, TRIANGULAR, FULL, US_SURVEY_FOOT", "54, VERTICAL, WIRES_UNLABELLED, METRE"})
  void sweepMinimaMatchTheTruth(long seed, Framing framing, ClassificationMode mode,
      LinearUnit unit) throws IOException {
    check(FeederOptions.defaults().withSeed(seed).withSpanCount(10).withFraming(framing)
        .withMode(mode).withUnit(unit));
  }

  /**
   * Surveys without vegetation labels: the inferred vegetation holds every true vegetation point
   * (and more), so no span's minimum may lie above the truth's. Regression (issue 15): the 8 m
   * lattice-tower exclusion around every pole dropped a tree 7.4 m from pole P210 (seed 42,
   * vertical framing, ground-only: span P210-P211 minimum 5.342 m against a true 5.154 m); a
   * pole line now excludes a metre around each pole. Regression (issue 9): the top of a sparse
   * crown whose lower crown lay below the candidate height was set aside as an isolated
   * airborne point (seed 43, triangular framing, ground-only: span P201-P202 minimum 8.287 m
   * against a true 7.701 m); an airborne group now needs open air below it. Regression (issue
   * 9): the neutral, fitted over 63 % of the span, left its other points in a crown's group,
   * measured as vegetation 0.504 m from a phase (seed 43, triangular framing, ground-only: span
   * P208-P209, true 2.154 m); points on a fitted conductor's curve or on a strand hanging like
   * one are wire now, so no span minimum is set by the line's own wire. Regression (issue 9,
   * "a crown is not a roof"): the smooth shell of tree 27's crown (118 first returns) was taken
   * for a roof and its points set aside (seed 46, vertical framing, ground-only: span P204-P205
   * minimum 9.403 m against a true 5.013 m); a roof now needs a few flat facets and, where
   * echoes are recorded, pulses that stop on it. The same survey with every point rewritten 1 of
   * 1 (echoes not recorded) is held too. Regression (issue 9): a crown 4-5 m from pole P202 lay
   * in the cross-arm box sized for towers (5 m along the line) and was set aside as structure
   * (seed 48, vertical framing, ground-only: span P201-P202 5.849 m against a true 5.543 m); a
   * pole line's box reaches 1.5 m along it.
   */
  @ParameterizedTest(name = "seed {0}, {1}, {2}, single returns {3}")
  @CsvSource({"42, VERTICAL, GROUND_ONLY, false", "41, TRIANGULAR, UNCLASSIFIED, false",
      "43, TRIANGULAR, GROUND_ONLY, false", "46, VERTICAL, GROUND_ONLY, false",
      "46, VERTICAL, GROUND_ONLY, true", "48, VERTICAL, GROUND_ONLY, false"})
  void inferredVegetationNeverLeavesAMinimumAboveTheTruth(long seed, Framing framing,
      ClassificationMode mode, boolean singleReturns) throws IOException {
    FeederOptions options = FeederOptions.defaults().withSeed(seed).withSpanCount(10)
        .withFraming(framing).withMode(mode);
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), options);
    if (singleReturns) {
      SingleReturns.rewrite(files.survey());
    }
    Path runDir = dir.resolve("run");
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(new StringWriter())).run(
        new CheckInputs(List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
        List.of(files.lineSpec()), Optional.empty(), Optional.empty(), runDir), "test");
    RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
    FeederScene scene = FeederScene.create(options);
    double[] truth = truthMinima(scene, model, "phase");
    Map<Long, Integer> kindAt = new HashMap<>();
    scene.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        if (TruthId.kind(ids[i]) == TruthId.Kind.WIRE) {
          kindAt.put(FeederModesTruthTest.key(chunk.x()[i], chunk.y()[i], chunk.z()[i]), ids[i]);
        }
      }
    });
    int compared = 0;
    for (int i = 0; i < truth.length; i++) {
      SpanRecord span = model.spans().get(i);
      if (span.status() == SpanStatus.NOT_ASSESSED || !(truth[i] < COMPARED_WITHIN_M)) {
        continue;
      }
      double got = span.minima().get(0).distance();
      System.out.printf(Locale.ROOT, "inferred %d %s %s %s %s: truth %.3f m, check %.3f m%n",
          seed, framing, mode, singleReturns ? "1/1" : "echoes", span.id(), truth[i], got);
      assertTrue(got <= truth[i] + TOL_M, span.id() + ": " + got + " > " + truth[i]);
      ConditionMinimum m = span.minima().get(0);
      assertTrue(FeederModesTruthTest.kind(kindAt, m.x(), m.y(), m.z()) != TruthId.Kind.WIRE,
          span.id() + ": minimum " + got + " m set by the line's own wire (truth " + truth[i]
          + " m)");
      compared++;
    }
    assertTrue(compared >= 5, "spans compared: " + compared);
  }

  private void check(FeederOptions options) throws IOException {
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("in"), options);
    Path runDir = dir.resolve("run");
    StringWriter text = new StringWriter();
    new ClearanceCheck(CheckOptions.defaults(2), new PrintWriter(text)).run(new CheckInputs(
        List.of(files.survey()), UnitsChoice.fromFile(), files.structures(),
        List.of(files.lineSpec()), Optional.empty(), Optional.empty(), runDir), "test");
    RunModel model = RunModelJson.read(runDir.resolve(RunModel.FILE_NAME));
    FeederScene scene = FeederScene.create(options);
    assertEquals(scene.spans().size(), model.spans().size(), text.toString());
    // issue 15: the structures file's equipment column reaches the run model, in the fixed
    // order of the kinds
    int withEquipment = 0;
    for (int i = 0; i < model.spans().size(); i++) {
      FeederPole pole = scene.poles().get(scene.spans().get(i).from());
      String written = FeederFiles.equipment(pole);
      String expected = written.isEmpty() ? "" : Arrays.stream(written.split(";"))
          .map(PoleEquipment::ofFileName).sorted().map(PoleEquipment::fileName)
          .collect(java.util.stream.Collectors.joining(";"));
      assertEquals(expected, model.spans().get(i).from().equipment(), model.spans().get(i).id());
      withEquipment += expected.isEmpty() ? 0 : 1;
    }
    assertTrue(withEquipment >= 2, "structures with equipment: " + withEquipment);
    double[] truth = truthMinima(scene, model, "phase");
    double[] neutralTruth = truthMinima(scene, model, "neutral");
    double[] neutralGot = new double[scene.spans().size()];
    Arrays.fill(neutralGot, Double.POSITIVE_INFINITY);
    Map<String, Integer> spanIndex = new HashMap<>();
    for (int i = 0; i < model.spans().size(); i++) {
      spanIndex.put(model.spans().get(i).id(), i);
    }
    NearPointReader.forEach(runDir.resolve(NearPointFile.FILE_NAME), p -> {
      if (!p.neutral().isEmpty() && !Double.isNaN(p.neutral().get(0).distance())) {
        int i = spanIndex.get(p.spanId());
        neutralGot[i] = Math.min(neutralGot[i], p.neutral().get(0).distance());
      }
    });
    List<String> report = new ArrayList<>();
    int compared = 0;
    for (int i = 0; i < scene.spans().size(); i++) {
      SpanRecord span = model.spans().get(i);
      FeederScene.Span ts = scene.spans().get(i);
      boolean primaries = span.conductors().stream().filter(c -> c.role().equals("phase"))
          .allMatch(c -> c.fitted());
      // issue 15: no span reported assessed (possibly clear) where a primary was not fitted;
      // INCOMPLETE and NOT ASSESSED say so
      assertTrue(span.status() != SpanStatus.ASSESSED || primaries, () -> span.id() + " "
          + span.status() + " " + span.conductors().stream().map(c -> c.name() + ":" + c.status()
          + ":" + c.reason()).toList());
      if (span.status() == SpanStatus.NOT_ASSESSED || !(truth[i] < COMPARED_WITHIN_M)) {
        continue;
      }
      // issue 15: the neutral is measured too (for zones that name it), from near-points.bin
      if (neutralTruth[i] < COMPARED_WITHIN_M && span.status() == SpanStatus.ASSESSED) {
        assertEquals(neutralTruth[i], neutralGot[i], TOL_M, span.id() + " neutral");
        report.add(String.format(Locale.ROOT, "%s neutral: truth %.3f m, check %.3f m",
            ts.id(), neutralTruth[i], neutralGot[i]));
      }
      double got = span.minima().get(0).distance();
      report.add(String.format(Locale.ROOT, "%s %s: truth %.3f m, check %.3f m", ts.id(),
          span.status(), truth[i], got));
      if (span.status() == SpanStatus.ASSESSED) {
        assertEquals(truth[i], got, TOL_M, span.id());
        compared++;
      } else {
        // INCOMPLETE: the check also measures to the curves of conductors it could not assess
        // (the truth lacks them), so its minimum may only be smaller
        assertTrue(got <= truth[i] + TOL_M, span.id() + ": " + got + " > " + truth[i]);
      }
    }
    System.out.println("feeder clearance " + options.seed() + " " + options.framing() + " "
        + options.mode() + " " + options.unit().symbol() + ":\n  " + String.join("\n  ",
        report));
    assertTrue(compared >= 3, "spans compared: " + compared);
  }

  /**
   * Per span: least distance from a vegetation point to the truth of its fitted conductors of
   * one role ({@code phase}: the energised ones the span minima count, issue 15).
   */
  static double[] truthMinima(FeederScene scene, RunModel model, String role) {
    int n = scene.spans().size();
    double[] min = new double[n];
    Arrays.fill(min, Double.POSITIVE_INFINITY);
    List<List<ConductorCurve>> curves = new ArrayList<>();
    List<SpanFrame> frames = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      FeederScene.Span ts = scene.spans().get(i);
      List<ConductorCurve> list = new ArrayList<>();
      for (ConductorRecord c : model.spans().get(i).conductors()) {
        if (c.fitted() && c.role().equals(role)) {
          ts.wires().stream().filter(w -> w.position().equals(c.name()))
              .forEach(w -> list.add(w.curve()));
        }
      }
      curves.add(list);
      FeederPole a = scene.poles().get(ts.from());
      FeederPole b = scene.poles().get(ts.to());
      frames.add(SpanFrame.between(a.x(), a.y(), b.x(), b.y()));
    }
    scene.points((chunk, ids) -> {
      for (int i = 0; i < chunk.size(); i++) {
        TruthId.Kind k = TruthId.kind(ids[i]);
        if (k != TruthId.Kind.TREE && k != TruthId.Kind.LOW_VEGETATION) {
          continue;
        }
        double x = chunk.x()[i];
        double y = chunk.y()[i];
        double z = chunk.z()[i];
        for (int sp = 0; sp < n; sp++) {
          double s = frames.get(sp).station(x, y);
          if (s < -COMPARED_WITHIN_M || s > frames.get(sp).length() + COMPARED_WITHIN_M) {
            continue;
          }
          for (ConductorCurve c : curves.get(sp)) {
            min[sp] = Math.min(min[sp], CurveDistance.distance(c, x, y, z));
          }
        }
      }
    });
    return min;
  }
}
