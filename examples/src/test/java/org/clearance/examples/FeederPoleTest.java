package org.clearance.examples;

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
import org.clearance.line.Structure;
import org.clearance.line.StructureReader;
import org.clearance.wire.PointSource;
import org.clearance.wire.StructureChange;
import org.clearance.wire.WireFinder;
import org.clearance.wire.WireFinderOptions;
import org.clearance.wire.WireResult;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Poles located from the points (issue 15) on the demo feeder: the structures file written with
 * every pole displaced by 0.5-3 m from the truth, in the three classification modes. Targets
 * (issue 15 brief): every repaired position within {@link #REPAIRED_M} of the true pole centre,
 * every other pole reported not found (or ambiguous) with its position kept;
 * the conductors fitted as well as with the true positions (same figures of
 * {@link FeederAccuracyTest#compare}); with the true positions nothing moves.
 */
class FeederPoleTest {
  /** A repaired position lies within this of the true pole centre, m (issue 15 brief). */
  static final double REPAIRED_M = 0.15;
  /** Largest displacement of the file's positions, m: the pole search radius (issue 15). */
  static final double DISPLACE_M = 3.0;

  /** The finder's defaults, structure refinement on. */
  static final WireFinderOptions OPTIONS = WireFinderOptions.defaults(2);

  @TempDir Path dir;

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"41, HORIZONTAL, FULL", "42, VERTICAL, GROUND_ONLY", "43, TRIANGULAR, UNCLASSIFIED",
      "44, HORIZONTAL, UNCLASSIFIED"})
  void displacedPolesAreRepaired(long seed, Framing framing, ClassificationMode mode) {
    FeederOptions o = FeederOptions.defaults().withSeed(seed).withSpanCount(8)
        .withFraming(framing).withMode(mode);
    FeederScene moved = FeederScene.create(o.withDisplaceM(DISPLACE_M));
    WireResult r = find(moved, dir.resolve("moved"));
    List<FeederPole> poles = moved.poles();
    double worst = 0;
    int repaired = 0;
    List<String> misses = new java.util.ArrayList<>();
    for (FeederPole p : poles) {
      Structure s = structure(r.layout(), p.id());
      double off = Math.hypot(s.x() - p.x(), s.y() - p.y());
      repaired += off <= REPAIRED_M ? 1 : 0;
      if (off > REPAIRED_M) {
        misses.add(String.format(Locale.ROOT, "%s %.2f m off (%s)", p.id(), off,
            r.structureChanges().stream().filter(c -> c.structureId().equals(p.id()))
                .map(StructureChange::evidence).findFirst().orElse("no report")));
      } else {
        worst = Math.max(worst, off);
      }
    }
    FeederAccuracyTest.Figures withMoved = FeederAccuracyTest.compare(moved, r);
    FeederAccuracyTest.Figures withTrue = FeederAccuracyTest.compare(FeederScene.create(o),
        find(FeederScene.create(o), dir.resolve("true")));
    System.out.printf(Locale.ROOT, "poles seed %d %s %s: %d of %d repaired within %.2f m, worst"
        + " repaired %.3f m; matched %d of %d (true positions %d of %d), sag within 5 cm %d (true %d);"
        + " misses %s%n", seed, framing, mode, repaired, poles.size(), REPAIRED_M, worst,
        withMoved.matched(), withMoved.eligible(), withTrue.matched(), withTrue.eligible(),
        withMoved.sagWithin(), withTrue.sagWithin(), misses);
    // a pole not repaired is one the finder reported not found or ambiguous, position kept;
    // measured: at most one such pole per run (P204 of seeds 42 and 43)
    for (FeederPole p : poles) {
      Structure s = structure(r.layout(), p.id());
      StructureChange c = r.structureChanges().stream()
          .filter(ch -> ch.structureId().equals(p.id())).findFirst().orElseThrow();
      boolean right = Math.hypot(s.x() - p.x(), s.y() - p.y()) <= REPAIRED_M;
      assertTrue(right || c.kind() == StructureChange.Kind.NOT_FOUND, c.toString());
    }
    assertTrue(repaired >= poles.size() - 1, misses.toString());
    assertTrue(withMoved.matched() >= withTrue.matched(), withMoved + " vs " + withTrue);
    assertTrue(withMoved.sagWithin() >= withTrue.sagWithin(), withMoved + " vs " + withTrue);
  }

  @ParameterizedTest(name = "seed {0}, {1}, {2}")
  @CsvSource({"41, HORIZONTAL, GROUND_ONLY", "42, VERTICAL, FULL", "43, TRIANGULAR, UNCLASSIFIED"})
  void rightPositionsStay(long seed, Framing framing, ClassificationMode mode) {
    FeederScene scene = FeederScene.create(FeederOptions.defaults().withSeed(seed)
        .withSpanCount(8).withFraming(framing).withMode(mode));
    WireResult r = find(scene, dir);
    for (StructureChange c : r.structureChanges()) {
      assertTrue(!c.changesLayout(), c.toString());
    }
    long confirmed = r.structureChanges().stream()
        .filter(c -> c.kind() == StructureChange.Kind.CONFIRMED).count();
    System.out.printf(Locale.ROOT, "poles seed %d %s %s, true positions: %d of %d confirmed%n",
        seed, framing, mode, confirmed, scene.poles().size());
    for (FeederPole p : scene.poles()) {
      Structure s = structure(r.layout(), p.id());
      assertTrue(Math.hypot(s.x() - p.x(), s.y() - p.y()) < 0.01, p.id());
    }
  }

  private static Structure structure(SpanLayout layout, String id) {
    return layout.lines().get(0).structures().stream().filter(s -> s.id().equals(id))
        .findFirst().orElseThrow();
  }

  /** Runs the finder, refinement on, on the scene's points with its (displaced) files. */
  static WireResult find(FeederScene scene, Path dir) {
    try {
      Files.createDirectories(dir);
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
}
