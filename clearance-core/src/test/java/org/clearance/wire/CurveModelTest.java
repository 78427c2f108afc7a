package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link CurveModel#zAndGradient} gives the very doubles of {@link CurveModel#z} and
 * {@link CurveModel#gradient} (bit for bit: the fits must not change in the last digit), for
 * both models, over random parameters and stations of real spans (c 20 m to 50 km, stations
 * within 6 c of the vertex as the fit keeps them).
 */
class CurveModelTest {

  @Test
  void zAndGradientAreTheSeparateValuesBitForBit() {
    SplittableRandom r = new SplittableRandom(20261205);
    for (int trial = 0; trial < 200_000; trial++) {
      double c = 20 * Math.pow(2500, r.nextDouble()); // 20 m .. 50 km
      double s0 = (r.nextDouble() - 0.5) * 800;
      double s = s0 + (r.nextDouble() - 0.5) * 12 * c * r.nextDouble();
      CurveModel free = new CurveModel.Free();
      check(free, new double[] {s0, (r.nextDouble() - 0.5) * 100, c}, s);
      double sA = s0 + (r.nextDouble() - 0.5) * 4 * c;
      CurveModel anchored = new CurveModel.OneAnchor(sA, (r.nextDouble() - 0.5) * 100);
      check(anchored, new double[] {s0, c}, s);
    }
  }

  private static void check(CurveModel model, double[] p, double s) {
    double[] g = new double[model.size()];
    double z = model.zAndGradient(p, s, g);
    assertEquals(Double.doubleToLongBits(model.z(p, s)), Double.doubleToLongBits(z),
        () -> "z at " + s);
    double[] expected = model.gradient(p, s);
    for (int j = 0; j < g.length; j++) {
      int k = j;
      assertEquals(Double.doubleToLongBits(expected[j]), Double.doubleToLongBits(g[j]),
          () -> "gradient " + k + " at " + s);
    }
  }
}
