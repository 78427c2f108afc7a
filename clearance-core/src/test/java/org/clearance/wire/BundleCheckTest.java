package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Bundle detection and splitting on synthetic residuals. Sub-conductor spacing 0.3-0.5 m and
 * single-wire residuals of a few centimetres from methods.md section 1.6 (marked [bk] there:
 * common practice, no source).
 */
class BundleCheckTest {

  /** Residuals of sub-conductors at the given (lateral, vertical) offsets, noise 3 cm. */
  private static double[][] bundle(long seed, int perWire, double[][] offsets) {
    Random r = new Random(seed);
    int n = perWire * offsets.length;
    double[] lat = new double[n];
    double[] ver = new double[n];
    for (int i = 0; i < n; i++) {
      double[] o = offsets[i % offsets.length];
      lat[i] = o[0] + 0.03 * r.nextGaussian();
      ver[i] = o[1] + 0.03 * r.nextGaussian();
    }
    return new double[][] {lat, ver};
  }

  @Test
  void singleWireIsNoBundle() {
    double[][] res = bundle(1, 300, new double[][] {{0, 0}});
    BundleCheck.Verdict v = BundleCheck.of(res[0], res[1]);
    assertFalse(v.likelyBundle());
    assertEquals(1, v.groups().size());
    assertEquals(300, v.groups().get(0).members().count());
    assertEquals(0.03 * Math.sqrt(2), v.residualRms(), 0.01);
  }

  @ParameterizedTest
  @CsvSource({"0.3", "0.4", "0.5"})
  void horizontalTwinSplits(double spacing) {
    double[][] res = bundle(2, 200, new double[][] {{-spacing / 2, 0}, {spacing / 2, 0}});
    BundleCheck.Verdict v = BundleCheck.of(res[0], res[1]);
    assertTrue(v.likelyBundle());
    assertEquals(2, v.groups().size());
    assertEquals(-spacing / 2, v.groups().get(0).lateral(), 0.01);
    assertEquals(spacing / 2, v.groups().get(1).lateral(), 0.01);
    for (int i = 0; i < res[0].length; i++) {
      assertTrue(v.groups().get(i % 2).members().contains(i), "point " + i);
    }
  }

  @Test
  void verticalTwinSplits() {
    double[][] res = bundle(3, 150, new double[][] {{0, 0.2}, {0, -0.2}});
    BundleCheck.Verdict v = BundleCheck.of(res[0], res[1]);
    assertEquals(2, v.groups().size());
    assertEquals(0.4, Math.abs(v.groups().get(0).vertical() - v.groups().get(1).vertical()),
        0.01);
  }

  @Test
  void quadBundleSplitsInFour() {
    double h = 0.225; // 0.45 m square
    double[][] res = bundle(4, 120, new double[][] {{-h, -h}, {-h, h}, {h, -h}, {h, h}});
    BundleCheck.Verdict v = BundleCheck.of(res[0], res[1]);
    assertTrue(v.likelyBundle());
    assertEquals(4, v.groups().size());
    for (BundleCheck.Group g : v.groups()) {
      assertEquals(120, g.members().count());
      assertEquals(h, Math.abs(g.lateral()), 0.01);
      assertEquals(h, Math.abs(g.vertical()), 0.01);
    }
  }

  @Test
  void wideSingleClusterIsNotSplit() {
    // A single wire with 8 cm noise in plan and height (swaying in wind): RMS above the limit
    // but one normal cluster; the separation ratio (about 2.7 for a split normal) rejects it.
    Random r = new Random(5);
    double[] lat = new double[400];
    double[] ver = new double[400];
    for (int i = 0; i < 400; i++) {
      lat[i] = 0.08 * r.nextGaussian();
      ver[i] = 0.08 * r.nextGaussian();
    }
    BundleCheck.Verdict v = BundleCheck.of(lat, ver);
    assertTrue(v.residualRms() > 0.10);
    assertFalse(v.likelyBundle());
  }
}
