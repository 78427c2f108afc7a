package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class LowestPointGridTest {

  @Test
  void movesTheLowestPointToTheCellCentreAlongTheGradient() {
    // Hand-computed: 3 x 3 cells of 1 m; the surface rises 0.5 m per m in x and 0.2 m in y.
    // Cell (1, 1): lowest point at (1.9, 1.25), z = 10: offset from the centre (1.5, 1.5) is
    // (0.4, -0.25), so the centre value is 10 - 0.5 * 0.4 - 0.2 * (-0.25) = 9.85.
    // Quantisation to 1/1024 of a cell moves the offset by under 0.5 mm.
    LowestPointGrid g = new LowestPointGrid(1.0);
    g.accept(1.9, 1.25, 10.0);
    g.accept(1.2, 1.7, 10.4);
    float[] surface = new float[9];
    for (int r = 0; r < 3; r++) {
      for (int c = 0; c < 3; c++) {
        surface[r * 3 + c] = (float) (0.5 * c + 0.2 * r);
      }
    }
    float[] out = g.positionCorrected(0, 0, 3, surface);
    assertEquals(9.85, out[4], 1e-3);
    assertTrue(Float.isNaN(out[0]));
  }

  @Test
  void steepGradientsAreCappedAtFortyFiveDegrees() {
    // Gradient 3 m per m in x is capped at 1: point at (0.0, 0.5), offset (-0.5, 0) -> z + 0.5.
    LowestPointGrid g = new LowestPointGrid(1.0);
    g.accept(1.0, 1.5, 20.0);
    float[] surface = new float[9];
    for (int i = 0; i < 9; i++) {
      surface[i] = 3f * (i % 3);
    }
    assertEquals(20.5, g.positionCorrected(0, 0, 3, surface)[4], 1e-3);
  }

  @Test
  void resultDoesNotDependOnPointOrderOrOnMerging() {
    // Many points with tied elevations (z on a 1 cm grid): any order, or split across two grids
    // and merged, must give the same lowest point per cell.
    Random rnd = new Random(12);
    List<double[]> pts = new ArrayList<>();
    for (int k = 0; k < 20_000; k++) {
      pts.add(new double[] {20 * rnd.nextDouble(), 20 * rnd.nextDouble(), rnd.nextInt(5) * 0.01});
    }
    LowestPointGrid a = new LowestPointGrid(1.0);
    pts.forEach(p -> a.accept(p[0], p[1], p[2]));
    Collections.shuffle(pts, rnd);
    LowestPointGrid b = new LowestPointGrid(1.0);
    LowestPointGrid c = new LowestPointGrid(1.0);
    for (int k = 0; k < pts.size(); k++) {
      double[] p = pts.get(k);
      (k % 2 == 0 ? b : c).accept(p[0], p[1], p[2]);
    }
    b.merge(c);
    float[] surface = new float[20 * 20];
    for (int i = 0; i < surface.length; i++) {
      surface[i] = 0.3f * (i % 20) + 0.1f * (i / 20);
    }
    float[] ra = a.positionCorrected(0, 0, 20, surface);
    float[] rb = b.positionCorrected(0, 0, 20, surface);
    for (int i = 0; i < ra.length; i++) {
      assertEquals(ra[i], rb[i], 0f);
    }
  }
}
