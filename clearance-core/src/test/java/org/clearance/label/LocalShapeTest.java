package org.clearance.label;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.ByteBuffer;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.SplittableRandom;
import org.clearance.wire.Eigen3;
import org.junit.jupiter.api.Test;

/**
 * The features and the eigen-decomposition give the same doubles, to the bit, as the version
 * before issue 12's labelling speed-up (Jacobi rotations on two-dimensional arrays, the normal
 * from row arrays; commit fa521be): SHA-256 of every result's bits over 100 000 seeded
 * neighbourhoods of 1 to 30 points (blobs, lines, planes and repeated points at scales from
 * 1 mm to 10 m), recorded by running this method on that version. Their accuracy against a
 * reference library is {@code wire.Eigen3Test}'s and {@link ObjectLabellerTest}'s.
 */
class LocalShapeTest {

  @Test
  void sameBitsAsTheVersionBefore() throws Exception {
    MessageDigest eigen = MessageDigest.getInstance("SHA-256");
    MessageDigest shapes = MessageDigest.getInstance("SHA-256");
    SplittableRandom rng = new SplittableRandom(2026);
    ByteBuffer b = ByteBuffer.allocate(8 * 8);
    int degenerate = 0;
    for (int trial = 0; trial < 100_000; trial++) {
      int n = 1 + rng.nextInt(30);
      int kind = trial % 4;
      double scale = Math.pow(10, rng.nextDouble(-3, 1));
      double[] s = new double[10];
      for (int k = 0; k < n; k++) {
        double u = rng.nextGaussian();
        double v = rng.nextGaussian();
        double w = rng.nextGaussian();
        double dx;
        double dy;
        double dz;
        if (kind == 0) { // blob
          dx = u;
          dy = v;
          dz = w;
        } else if (kind == 1) { // line
          dx = u;
          dy = 0.3 * u + 0.01 * v;
          dz = -0.5 * u + 0.01 * w;
        } else if (kind == 2) { // plane
          dx = u;
          dy = v;
          dz = 0.2 * u - 0.1 * v + 0.005 * w;
        } else { // repeated points
          dx = k % 2 == 0 ? 0 : 1;
          dy = 0;
          dz = k % 3 == 0 ? 0 : 0.5;
        }
        dx *= scale;
        dy *= scale;
        dz *= scale;
        s[0]++;
        s[1] += dx;
        s[2] += dy;
        s[3] += dz;
        s[4] += dx * dx;
        s[5] += dx * dy;
        s[6] += dx * dz;
        s[7] += dy * dy;
        s[8] += dy * dz;
        s[9] += dz * dz;
      }
      double m0 = s[1] / n;
      double m1 = s[2] / n;
      double m2 = s[3] / n;
      Eigen3.Result r = Eigen3.symmetric(s[4] / n - m0 * m0, s[5] / n - m0 * m1,
          s[6] / n - m0 * m2, s[7] / n - m1 * m1, s[8] / n - m1 * m2, s[9] / n - m2 * m2);
      b.clear();
      b.putDouble(r.l1()).putDouble(r.l2()).putDouble(r.l3()).putDouble(r.v1x())
          .putDouble(r.v1y()).putDouble(r.v1z());
      eigen.update(b.array(), 0, 48);
      LocalShape f = LocalShape.of(n, s[1], s[2], s[3], s[4], s[5], s[6], s[7], s[8], s[9]);
      b.clear();
      if (f == null) {
        degenerate++;
        b.putDouble(Double.NaN);
        shapes.update(b.array(), 0, 8);
      } else {
        b.putDouble(f.linearity()).putDouble(f.planarity()).putDouble(f.scattering())
            .putDouble(f.verticality()).putDouble(f.nx()).putDouble(f.ny()).putDouble(f.nz());
        shapes.update(b.array(), 0, 56);
      }
    }
    assertEquals("f95a053cb7c13732bfe33441bde1e65e614260aa23cd5fc7e3dd1eaaf48da286",
        HexFormat.of().formatHex(eigen.digest()));
    assertEquals("d2dd12fc0e95dd40fecc0a8c0a24308d6dc6fdfb9b1322f58e412f79faa6d25d",
        HexFormat.of().formatHex(shapes.digest()));
    // the degenerate branch is exercised (single points: no spread)
    assertEquals(true, degenerate > 0, "degenerate neighbourhoods " + degenerate);
  }
}
