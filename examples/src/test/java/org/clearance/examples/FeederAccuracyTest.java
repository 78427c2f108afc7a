package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.SpanLayout;
import org.clearance.line.StructureReader;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.Survey;
import org.clearance.wire.ConductorCurve;
import org.clearance.wire.FittedConductor;
import org.clearance.wire.PointSource;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireFinderOptions;
import org.clearance.wire.WireResult;
import org.clearance.wire.WireStatus;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The wire finder on the demo distribution feeder (issue 15): closely spaced conductors on poles
 * in horizontal, vertical and triangular framing with a neutral, in all three classification
 * modes, in metres and US survey feet. Targets (issue 15): at least 98 % of the conductors with
 * at least 30 % coverage fitted and matched to the right position; mid-span sag within 5 cm of
 * the truth for 95 % of them; no span reported fitted where a primary was not fitted.
 */
class FeederAccuracyTest {
  /** Issue 15 targets. */
  static final double FOUND_SHARE = 0.98;
  static final double SAG_TOL_M = 0.05;
  static final double SAG_SHARE = 0.95;
  static final double FIND_COVERAGE = 0.30;
  /** Truth coverage from which a conductor must also pass every quality threshold: a margin
   * over the 30 % threshold for the difference between the truth's gap-free share and the
   * finder's measured coverage, as in WireAccuracyTest (common practice, no source). */
  static final double FIT_COVERAGE = 0.35;
  /** A fitted conductor is on the right position when its curve passes within this of the
   * truth's at mid-span: well under the closest spacing of the framings, 0.5 m. */
  static final double RIGHT_POSITION_M = 0.15;

  /**
   * The finder's defaults without structure refinement: the refinement takes a tall tree beside
   * a long feeder span in an unclassified survey for a missing structure (issue 15, poles, not
   * done yet), so the poles are used as the structures file gives them.
   */
  static final WireFinderOptions OPTIONS = WireFinderOptions.defaults(2).withStructures(
      new WireFinderOptions.Structures(false, 60, 3, 30));

  @TempDir Path dir;

  /** The comparison of one run. */
  record Figures(int eligible, int matched, int fitted, int sagWithin, double worstSag,
      List<String> misses) {}

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"11, HORIZONTAL, FULL"})
  void feedersMeetTheAccuracyTargets(long seed, Framing framing, ClassificationMode mode) {
    check(FeederOptions.defaults().withSeed(seed).withSpanCount(8).withFraming(framing)
        .withMode(mode), FOUND_SHARE, SAG_SHARE);
  }

  /**
   * Vertical (stacked) framing in every classification mode, 12 spans, metres and US survey
   * feet: single runs meet the targets (docs/wire-finder.md, "Distribution feeder").
   * Regressions pinned (issue 15): seed 35, classified, span P202-P203: a 24 m piece of C
   * extrapolated by its own curve took B's position (B "covers 15 %"); seed 34, ground-only,
   * span P205-P206: 14 points of three crowns strung over 54 m became a wire and took C's
   * position; seeds 31-36 before the common sag shape was found by a vote (a least-squares
   * parabola through all seeds gave 2.6 m of sag for a true 1.4 m): ground-only runs matched
   * 43-44 of 44.
   */
  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"35, FULL, METRE", "34, GROUND_ONLY, METRE", "31, WIRES_UNLABELLED, METRE",
      "33, UNCLASSIFIED, US_SURVEY_FOOT"})
  void verticalStacksMeetTheTargets(long seed, ClassificationMode mode, LinearUnit unit) {
    check(FeederOptions.defaults().withSeed(seed).withSpanCount(12)
        .withFraming(Framing.VERTICAL).withMode(mode).withUnit(unit), FOUND_SHARE, SAG_SHARE);
  }

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"12, VERTICAL, WIRES_UNLABELLED", "13, TRIANGULAR, UNCLASSIFIED"})
  void closeFramingsMeetTheTargets(long seed, Framing framing, ClassificationMode mode) {
    check(FeederOptions.defaults().withSeed(seed).withSpanCount(8).withFraming(framing)
        .withMode(mode), FOUND_SHARE, SAG_SHARE);
  }

  @Tag("slow")
  @ParameterizedTest(name = "seed {0}, {1}, {2}, {3}")
  @CsvSource({
    "21, HORIZONTAL, FULL, METRE", "21, HORIZONTAL, WIRES_UNLABELLED, METRE",
    "21, HORIZONTAL, UNCLASSIFIED, US_SURVEY_FOOT",
    "22, VERTICAL, FULL, METRE", "22, VERTICAL, WIRES_UNLABELLED, US_SURVEY_FOOT",
    "22, VERTICAL, GROUND_ONLY, METRE", "22, VERTICAL, UNCLASSIFIED, US_SURVEY_FOOT",
    "23, TRIANGULAR, FULL, US_SURVEY_FOOT", "23, TRIANGULAR, WIRES_UNLABELLED, METRE",
    "23, TRIANGULAR, UNCLASSIFIED, METRE"
  })
  void feederSweepMeetsTheTargets(long seed, Framing framing, ClassificationMode mode,
      LinearUnit unit) {
    FeederOptions o = FeederOptions.defaults().withSeed(seed).withSpanCount(12)
        .withFraming(framing).withMode(mode).withUnit(unit);
    check(o, FOUND_SHARE, SAG_SHARE);
  }

  private void check(FeederOptions options, double foundShare, double sagShare) {
    FeederScene scene = FeederScene.create(options);
    WireResult r = options.unit() != LinearUnit.METRE ? findInFiles(options, dir)
        : find(scene, dir);
    Figures f = compare(scene, r);
    System.out.printf(Locale.ROOT, "feeder seed %d %s %s %s: %d conductors with >= 30 %%"
        + " coverage, %d matched, %d fitted, sag within %.2f m for %d, worst sag error %.3f m;"
        + " misses %s%n", options.seed(), options.framing(), options.mode(),
        options.unit().symbol(), f.eligible(), f.matched(), f.fitted(), SAG_TOL_M,
        f.sagWithin(), f.worstSag(), f.misses());
    assertTrue(f.matched() >= foundShare * f.eligible(), f.toString());
    assertTrue(f.sagWithin() >= sagShare * f.fitted(), f.toString());
  }

  /** Runs the finder on the scene's points (metres) with its structures and line files. */
  static WireResult find(FeederScene scene, Path dir) {
    try {
      Path structures = dir.resolve("structures.csv");
      Path line = dir.resolve("line.yaml");
      try (Writer w = Files.newBufferedWriter(structures)) {
        FeederFiles.writeStructures(w, scene);
      }
      try (Writer w = Files.newBufferedWriter(line)) {
        FeederFiles.writeLineSpec(w, scene);
      }
      LineSpec spec = LineSpecReader.read(line, ConductorLibrary.builtin());
      SpanLayout layout = SpanLayout.build(StructureReader.read(structures, scene.units()),
          List.of(spec));
      GroundModelBuilder gb = new GroundModelBuilder(GroundOptions.defaults());
      scene.points(gb);
      GroundModel g = gb.build();
      return new WireFinder(OPTIONS).find(
          PointSource.sequential(c -> scene.points(c)), layout, g::heightAboveGround);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** Writes the feeder's files and runs the finder on them as a user would. */
  static WireResult findInFiles(FeederOptions options, Path dir) {
    DemoCorridor.DemoFiles files = FeederFiles.write(dir.resolve("feeder"), options);
    Survey survey = Survey.open(List.of(files.survey()),
        org.clearance.survey.UnitsChoice.fromFile());
    LineSpec spec = LineSpecReader.read(files.lineSpec(), ConductorLibrary.builtin());
    SpanLayout layout = SpanLayout.build(StructureReader.read(files.structures(),
        survey.units()), List.of(spec));
    GroundModel g = GroundModelBuilder.build(survey, GroundOptions.defaults(), 2);
    return WireFinder.find(survey, layout, g::heightAboveGround, OPTIONS);
  }

  /** Counts, per conductor with enough coverage, whether it was fitted at its position. */
  static Figures compare(FeederScene scene, WireResult r) {
    assertEquals(scene.spans().size(), r.spans().size());
    int eligible = 0;
    int matched = 0;
    int fitted = 0;
    int within = 0;
    double worst = 0;
    List<String> misses = new ArrayList<>();
    for (int k = 0; k < scene.spans().size(); k++) {
      FeederScene.Span ts = scene.spans().get(k);
      SpanWires sw = r.spans().get(k);
      assertEquals(ts.id(), sw.span().id());
      boolean primariesFitted = true;
      for (FeederWire tw : ts.wires()) {
        FittedConductor c = sw.conductor(tw.position()).orElse(null);
        boolean ok = c != null && c.isFitted();
        primariesFitted &= ok || tw.neutral();
        if (tw.coverage() < FIND_COVERAGE) {
          continue;
        }
        eligible++;
        boolean found = c != null && c.curve().isPresent() && c.position().isPresent();
        if (!found || !ok && tw.coverage() >= FIT_COVERAGE) {
          misses.add(ts.id() + " " + tw.position() + (c == null ? "" : ": " + c.reason()));
          continue;
        }
        ConductorCurve t = tw.curve();
        ConductorCurve f = c.curve().orElseThrow();
        double sa = f.plan().station(t.x(0), t.y(0));
        double sb = f.plan().station(t.x(t.length()), t.y(t.length()));
        double sm = 0.5 * (sa + sb);
        double mx = t.x(0.5 * t.length());
        double my = t.y(0.5 * t.length());
        double apart = Math.hypot(Math.hypot(f.x(sm) - mx, f.y(sm) - my),
            f.z(sm) - t.z(0.5 * t.length()));
        if (apart > RIGHT_POSITION_M) {
          misses.add(String.format(Locale.ROOT, "%s %s: fitted %.2f m from its truth",
              ts.id(), tw.position(), apart));
          continue;
        }
        matched++;
        if (!ok) {
          continue;
        }
        fitted++;
        double err = Math.abs(f.curve().midSpanSag(sa, sb) - t.midSpanSag());
        within += err <= SAG_TOL_M ? 1 : 0;
        worst = Math.max(worst, err);
      }
      // issue 15: no span reported fitted (and so possibly clear) where a primary was not
      assertTrue(sw.status() != WireStatus.FITTED || primariesFitted, ts.id());
    }
    return new Figures(eligible, matched, fitted, within, worst, misses);
  }
}
