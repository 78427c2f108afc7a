package org.clearance.ground;

import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.function.Consumer;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Throughput and memory on a synthetic diagonal corridor (3 km line at 45 degrees, 120 m wide,
 * 8 points per m^2, trees on a jittered 8 m lattice). Prints figures for docs/ground.md; asserts
 * nothing about speed. Tagged slow; {@link #main} runs it outside the test suite.
 */
@Tag("slow")
class GroundBenchmarkTest {
  private static final double LENGTH = 3000;
  private static final double HALF_WIDTH = 60;
  private static final double DENSITY = 8;
  private static final double SPACING = 8;

  /** Runs the benchmark from the command line (test classpath). */
  public static void main(String[] args) {
    new GroundBenchmarkTest().corridorThroughput();
  }

  @Test
  void corridorThroughput() {
    long n = (long) (LENGTH * 2 * HALF_WIDTH * DENSITY);
    // Warm-up on a small part so the JIT has compiled the loops.
    GroundModelBuilder warm = new GroundModelBuilder(
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    stream(n / 20, 0, warm);
    warm.build();

    long t0 = System.nanoTime();
    GroundModelBuilder filter = new GroundModelBuilder(
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    GroundModelBuilder labels = new GroundModelBuilder(GroundOptions.defaults());
    CanopyBuilder canopy = new CanopyBuilder(TreeOptions.defaults(), PlanPredicate.ALL);
    stream(n, 1, c -> {
      filter.accept(c);
    });
    long t1 = System.nanoTime();
    GroundModel f = filter.build();
    long t2 = System.nanoTime();
    stream(n, 1, labels);
    GroundModel g = labels.build();
    long t3 = System.nanoTime();
    stream(n, 1, canopy);
    long t4 = System.nanoTime();
    List<Tree> trees = canopy.findTrees(g);
    long t5 = System.nanoTime();
    double areaKm2 = LENGTH * 2 * HALF_WIDTH / 1e6;
    System.out.printf(Locale.ROOT, "points %d, corridor %.2f km^2%n", n, areaKm2);
    System.out.printf(Locale.ROOT, "accumulate (ground) %.1f M points/s%n", n / ((t1 - t0) / 1e3));
    System.out.printf(Locale.ROOT, "SMRF build %.1f s (%.1f s per km^2), terrain %d tiles, %.1f MB%n",
        (t2 - t1) / 1e9, (t2 - t1) / 1e9 / areaKm2, f.tileCount(), f.memoryBytes() / 1e6);
    System.out.printf(Locale.ROOT, "class-2 stream+build %.1f s%n", (t3 - t2) / 1e9);
    System.out.printf(Locale.ROOT, "canopy accumulate %.1f M points/s, %.1f MB; trees %d in %.1f s%n",
        n / ((t4 - t3) / 1e3), canopy.memoryBytes() / 1e6, trees.size(), (t5 - t4) / 1e9);
    long planted = Math.round(LENGTH * 2 * HALF_WIDTH / (SPACING * SPACING));
    System.out.printf(Locale.ROOT, "planted about %d trees%n", planted);
    System.out.println(f.source().describe());
  }

  /** Streams {@code n} points of the corridor through one reusable 65 536-point chunk. */
  private static void stream(long n, long seed, Consumer<PointChunk> sink) {
    Random rnd = new Random(seed);
    PointChunk c = new PointChunk(65_536);
    c.reset(0, 0);
    double u = Math.sqrt(0.5);
    for (long k = 0; k < n; k++) {
      double s = LENGTH * rnd.nextDouble();
      double e = HALF_WIDTH * (2 * rnd.nextDouble() - 1);
      double x = 700_000 + (s - e) * u;
      double y = 6_000_000 + (s + e) * u;
      double ground = 300 + 0.02 * s + 3 * Math.sin(s / 80) + 0.05 * e;
      double z = ground + 0.03 * rnd.nextGaussian();
      int cls = 2;
      // Tree of the lattice cell (jittered by a hash of the cell), height 8-25 m.
      long ci = (long) Math.floor(s / SPACING);
      long cj = (long) Math.floor(e / SPACING);
      long h = (ci * 73_856_093L) ^ (cj * 19_349_663L);
      double tx = (ci + 0.3 + 0.4 * ((h & 1023) / 1023.0)) * SPACING;
      double ty = (cj + 0.3 + 0.4 * (((h >> 10) & 1023) / 1023.0)) * SPACING;
      double th = 8 + 17 * (((h >> 20) & 1023) / 1023.0);
      double tr = 1 + 0.12 * th;
      double d = Math.hypot(s - tx, e - ty);
      if (d < Math.min(tr, 0.45 * SPACING) && rnd.nextDouble() < 0.7) {
        double q = d / tr;
        z = ground + th - 0.55 * th * (1 - Math.sqrt(1 - q * q));
        cls = 5;
      }
      if (c.isFull()) {
        sink.accept(c);
        c.reset(0, k);
      }
      c.add(x, y, z, cls);
    }
    sink.accept(c);
  }
}
