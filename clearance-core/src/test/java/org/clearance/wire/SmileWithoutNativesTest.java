package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The build leaves smile-core's native BLAS/LAPACK jars (org.bytedeco, four platforms) out of
 * the runnable jar (parent pom exclusion). This proves the part of smile Clearance calls, DBSCAN
 * with its KD-tree (through {@link WireClusters}), runs without them.
 */
class SmileWithoutNativesTest {

  @Test
  void nativeLibrariesAreNotOnTheClassPath() {
    assertThrows(ClassNotFoundException.class,
        () -> Class.forName("org.bytedeco.openblas.global.openblas"));
    assertThrows(ClassNotFoundException.class,
        () -> Class.forName("org.bytedeco.javacpp.Loader"));
  }

  @Test
  void dbscanSeparatesTwoWiresWithoutThem() {
    // Two straight wires 3 m apart, 0.5 m point spacing, 2 cm noise: two clusters under the
    // stretched metric (methods.md 1.5), computed by smile's DBSCAN on its KD-tree.
    SpanPoints p = new SpanPoints(0);
    Random r = new Random(5);
    for (double s = 0; s < 100; s += 0.5) {
      p.add(s, 0.02 * r.nextGaussian(), 20 + 0.02 * r.nextGaussian(), 15, 14);
      p.add(s, 3 + 0.02 * r.nextGaussian(), 20 + 0.02 * r.nextGaussian(), 15, 14);
    }
    p.sort();
    int[] seeds = new int[p.size()];
    for (int i = 0; i < seeds.length; i++) {
      seeds[i] = i;
    }
    List<int[]> clusters = WireClusters.of(p, seeds, 5.0, 1.0, 3);
    assertEquals(2, clusters.size());
    assertEquals(200, clusters.get(0).length);
    assertEquals(200, clusters.get(1).length);
  }
}
