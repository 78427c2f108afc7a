package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
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
import org.clearance.wire.ConductorCurve;
import org.clearance.wire.FittedConductor;
import org.clearance.wire.PointSource;
import org.clearance.wire.SpanWires;
import org.clearance.wire.StructureChange;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireFinderOptions;
import org.clearance.wire.WireResult;
import org.clearance.wire.WireStatus;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The wire finder against the demo generator's truth, in all three classification modes
 * (docs/demo-corridor.md): every conductor with at least 30 % coverage found and matched to its
 * position, mid-span sag within 5 cm of the truth for at least 95 % of the fitted conductors,
 * attachment heights within 15 cm, and no extra conductor fitted (the vendor's stray class-14
 * labels on a roof and a crown in FULL mode must not become conductors). The accuracy targets
 * are the project brief's (issue 3).
 *
 * <p>Fitted curves are compared with the truth at the truth's own attachment points (at
 * dead-ends the end of the 3 m strain insulator the line specification states): the fitted
 * catenary is evaluated at the stations where the truth's attachments project onto its plan
 * line, and its own attachments must lie within 0.3 m of them in plan.
 */
class WireAccuracyTest {
  /** Mid-span sag tolerance, m (brief). */
  static final double SAG_TOL_M = 0.05;
  /** Share of fitted conductors that must meet the sag tolerance (brief). */
  static final double SAG_SHARE = 0.95;
  /** Attachment elevation tolerance, m (brief). */
  static final double ATTACH_TOL_M = 0.15;
  /** Truth coverage from which a conductor must be found and matched (brief). */
  static final double FIND_COVERAGE = 0.30;
  /** Truth coverage from which a conductor must also pass every quality threshold: a margin
   * over the 30 % threshold for the difference between the truth's gap-free share and the
   * finder's measured coverage (common practice, no source). */
  static final double FIT_COVERAGE = 0.35;

  @TempDir Path dir;

  /** The comparison of one run: counts and errors. */
  record Figures(int truthConductors, int fitted, int sagWithin, double worstSag,
      double worstAttach) {}

  @ParameterizedTest(name = "seed {0}, {1}")
  @CsvSource({
    "230017, FULL", "230017, WIRES_UNLABELLED", "230017, UNCLASSIFIED",
    "4242, FULL", "4242, WIRES_UNLABELLED", "4242, UNCLASSIFIED"
  })
  void demoSpansMeetTheAccuracyTargets(long seed, ClassificationMode mode) {
    check(DemoOptions.defaults().withSeed(seed).withSpanCount(6).withMode(mode));
  }

  @Tag("slow")
  @ParameterizedTest(name = "seed {0}, {1}")
  @CsvSource({
    "1, FULL", "1, WIRES_UNLABELLED", "1, UNCLASSIFIED",
    "2, FULL", "2, WIRES_UNLABELLED", "2, UNCLASSIFIED",
    "3, FULL", "3, WIRES_UNLABELLED", "3, UNCLASSIFIED",
    "5, FULL", "5, UNCLASSIFIED", "8, FULL", "8, UNCLASSIFIED"
  })
  void fullLengthDemosMeetTheAccuracyTargets(long seed, ClassificationMode mode) {
    check(DemoOptions.defaults().withSeed(seed).withMode(mode));
  }

  /**
   * The demo's structures.csv with one structure moved 30 m or left out: the finder moves it
   * back to, or adds it at, its tower, from class-15 points or (unclassified) from the column
   * of tower points, within 2 m (a lattice tower's points centre on its body to about a metre).
   */
  @ParameterizedTest(name = "{0} structure {1}, {2}")
  @CsvSource({
    "offset, 3, FULL", "offset, 3, UNCLASSIFIED", "omit, 4, FULL", "omit, 4, UNCLASSIFIED"
  })
  void editedStructuresAreRepaired(String kind, int index, ClassificationMode mode) {
    StructureEdit edit = kind.equals("omit") ? StructureEdit.omit(index)
        : StructureEdit.offset(index, 30);
    DemoScene scene = DemoScene.create(DemoOptions.defaults().withSeed(230017).withSpanCount(6)
        .withMode(mode).withStructureEdit(edit));
    WireResult r = find(scene, dir);
    assertEquals(1, r.structureChanges().size(), r.structureChanges().toString());
    StructureChange c = r.structureChanges().get(0);
    DemoStructure truth = scene.structures().get(index);
    assertEquals(kind.equals("omit") ? StructureChange.Kind.ADDED : StructureChange.Kind.MOVED,
        c.kind());
    assertEquals(0, Math.hypot(c.toX() - truth.x(), c.toY() - truth.y()), 2.0);
    assertEquals(scene.spans().size(), r.spans().size());
    long fitted = r.spans().stream().filter(s -> s.status() == WireStatus.FITTED).count();
    long truthFull = scene.spans().stream().filter(s -> s.wires().stream()
        .allMatch(w -> w.role() == DemoPosition.Role.SHIELD || w.coverage() >= FIT_COVERAGE))
        .count();
    assertEquals(truthFull, fitted);
  }

  private void check(DemoOptions options) {
    DemoScene scene = DemoScene.create(options);
    WireResult r = find(scene, dir);
    Figures f = compare(scene, r);
    System.out.printf(Locale.ROOT, "seed %d %s: %d truth conductors, %d fitted, sag within"
        + " %.2f m for %d, worst sag error %.3f m, worst attachment error %.3f m%n",
        options.seed(), options.mode(), f.truthConductors(), f.fitted(), SAG_TOL_M,
        f.sagWithin(), f.worstSag(), f.worstAttach());
    assertTrue(f.sagWithin() >= SAG_SHARE * f.fitted(), f.toString());
    assertTrue(f.worstAttach() <= ATTACH_TOL_M, f.toString());
  }

  /** Runs the finder on the scene's points with the scene's structures and line files. */
  static WireResult find(DemoScene scene, Path dir) {
    try {
      Path structures = dir.resolve("structures.csv");
      Path line = dir.resolve("line.yaml");
      try (Writer w = Files.newBufferedWriter(structures)) {
        LineFiles.writeStructures(w, scene);
      }
      try (Writer w = Files.newBufferedWriter(line)) {
        LineFiles.writeLineSpec(w, scene);
      }
      LineSpec spec = LineSpecReader.read(line, ConductorLibrary.builtin());
      SpanLayout layout = SpanLayout.build(StructureReader.read(structures, scene.units()),
          List.of(spec));
      GroundModelBuilder gb = new GroundModelBuilder(GroundOptions.defaults());
      scene.points(gb);
      GroundModel g = gb.build();
      return new WireFinder(WireFinderOptions.defaults(2)).find(
          PointSource.sequential(c -> scene.points(c)), layout, g::heightAboveGround);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** Checks finding and matching, and measures the fitted conductors against the truth. */
  static Figures compare(DemoScene scene, WireResult r) {
    assertEquals(scene.spans().size(), r.spans().size());
    int truthCount = 0;
    int fitted = 0;
    int within = 0;
    double worstSag = 0;
    double worstAttach = 0;
    for (int k = 0; k < scene.spans().size(); k++) {
      DemoSpan ts = scene.spans().get(k);
      SpanWires sw = r.spans().get(k);
      assertEquals(ts.id(), sw.span().id());
      for (FittedConductor c : sw.conductors()) {
        assertFalse(c.position().isEmpty() && c.isFitted(),
            sw.span().id() + ": an extra conductor was fitted: " + c.name());
      }
      for (DemoWire tw : ts.wires()) {
        truthCount++;
        String where = sw.span().id() + " " + tw.position();
        FittedConductor c = sw.conductor(tw.position()).orElseThrow(() -> new AssertionError(
            where + " missing"));
        if (tw.coverage() >= FIND_COVERAGE) {
          assertTrue(c.curve().isPresent() && c.position().isPresent(), where + " not found: "
              + c.reason());
        }
        if (tw.coverage() >= FIT_COVERAGE) {
          assertTrue(c.isFitted(), where + " not fitted: " + c.reason());
        }
        if (!c.isFitted()) {
          continue;
        }
        fitted++;
        ConductorCurve t = tw.curve();
        ConductorCurve f = c.curve().orElseThrow();
        double sa = f.plan().station(t.x(0), t.y(0));
        double sb = f.plan().station(t.x(t.length()), t.y(t.length()));
        double sagError = Math.abs(f.curve().midSpanSag(sa, sb) - t.midSpanSag());
        within += sagError <= SAG_TOL_M ? 1 : 0;
        worstSag = Math.max(worstSag, sagError);
        worstAttach = Math.max(worstAttach, Math.max(Math.abs(f.z(sa) - t.zA()),
            Math.abs(f.z(sb) - t.zB())));
        // the attachments are where the truth's are, also at dead-ends (strain_length_m):
        // within 0.3 m in plan, well inside the 3 m strain assembly
        assertEquals(0, Math.hypot(f.x(0) - t.x(0), f.y(0) - t.y(0)), 0.3, where + " A");
        assertEquals(0, Math.hypot(f.x(f.length()) - t.x(t.length()),
            f.y(f.length()) - t.y(t.length())), 0.3, where + " B");
      }
    }
    return new Figures(truthCount, fitted, within, worstSag, worstAttach);
  }
}
