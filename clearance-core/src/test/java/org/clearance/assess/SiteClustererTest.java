package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Single-linkage sites on small hand-made point sets, and against a brute-force reference. */
class SiteClustererTest {

  private static final double LINK = 1.5;

  private static int[] labels(double[][] p) {
    double[] x = new double[p.length];
    double[] y = new double[p.length];
    double[] z = new double[p.length];
    for (int i = 0; i < p.length; i++) {
      x[i] = p[i][0];
      y[i] = p[i][1];
      z[i] = p[i][2];
    }
    return SiteClusterer.cluster(x, y, z, LINK);
  }

  @Test
  void twoClumpsAreTwoSites() {
    // hand-made: two 3-point clumps 10 m apart; within a clump points are 1 m apart
    double[][] p = {{0, 0, 5}, {1, 0, 5}, {0, 1, 5}, {10, 0, 5}, {11, 0, 5}, {10, 0, 6}};
    assertArrayEquals(new int[] {0, 0, 0, 1, 1, 1}, labels(p));
  }

  @Test
  void aChainOfShortStepsIsOneSite() {
    // hand-made: 11 points 1.4 m apart along a diagonal line: ends 14 m apart, one site
    double[][] p = new double[11][];
    for (int i = 0; i < p.length; i++) {
      p[i] = new double[] {1.4 * i / Math.sqrt(2), 1.4 * i / Math.sqrt(2), 3};
    }
    int[] l = labels(p);
    assertEquals(0, Arrays.stream(l).max().getAsInt());
  }

  @Test
  void linkDistanceIsInclusiveAndVerticalCounts() {
    // hand-made: exactly 1.5 m apart joins (<=); 1.6 m apart vertically splits
    assertArrayEquals(new int[] {0, 0}, labels(new double[][] {{0, 0, 0}, {1.5, 0, 0}}));
    assertArrayEquals(new int[] {0, 1}, labels(new double[][] {{0, 0, 0}, {0, 0, 1.6}}));
  }

  @Test
  void labelsFollowFirstAppearance() {
    double[][] p = {{50, 0, 0}, {0, 0, 0}, {50.5, 0, 0}, {0.5, 0, 0}, {100, 0, 0}};
    assertArrayEquals(new int[] {0, 1, 0, 1, 2}, labels(p));
  }

  @Test
  void emptyAndBadInput() {
    assertEquals(0, labels(new double[0][]).length);
    assertThrows(IllegalArgumentException.class, () -> new SiteClusterer(0));
    assertThrows(IllegalArgumentException.class, () -> new SiteClusterer(Double.NaN));
    assertThrows(IllegalArgumentException.class,
        () -> labels(new double[][] {{0, Double.NaN, 0}}));
  }

  @Test
  void matchesBruteForceSingleLinkage() {
    // reference: all-pairs single linkage (connected components of the graph of pairs within
    // the link distance), the textbook definition; random clumpy points
    SplittableRandom r = new SplittableRandom(7);
    int n = 400;
    double[][] p = new double[n][];
    for (int i = 0; i < n; i++) {
      double cx = 10 * r.nextInt(6);
      p[i] = new double[] {cx + r.nextDouble() * 4, r.nextDouble() * 8, r.nextDouble() * 3};
    }
    int[] got = labels(p);
    int[] ref = new int[n];
    for (int i = 0; i < n; i++) {
      ref[i] = i;
    }
    boolean changed = true;
    while (changed) { // label propagation to the smallest index in each component
      changed = false;
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          double dx = p[i][0] - p[j][0];
          double dy = p[i][1] - p[j][1];
          double dz = p[i][2] - p[j][2];
          if (dx * dx + dy * dy + dz * dz <= LINK * LINK && ref[j] < ref[i]) {
            ref[i] = ref[j];
            changed = true;
          }
        }
      }
    }
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        assertEquals(ref[i] == ref[j], got[i] == got[j], "points " + i + ", " + j);
      }
    }
  }
}
