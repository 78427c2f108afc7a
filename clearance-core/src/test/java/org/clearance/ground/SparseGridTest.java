package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SparseGridTest {
  /** Float storage of elevations near 1000 m: one float step is 6e-5 m. */
  private static final double FLOAT_TOL = 2e-4;

  @Test
  void keepsLowestAndHighestPerCell() {
    // Hand-computed: three points in cell (0, 0) of a 1 m grid, one in cell (-1, 0).
    SparseGrid min = new SparseGrid(1.0);
    SparseGrid max = new SparseGrid(1.0);
    double[][] pts = {{0.2, 0.3, 5.0}, {0.9, 0.1, 4.0}, {0.5, 0.5, 6.0}, {-0.1, 0.5, 9.0}};
    for (double[] p : pts) {
      min.accumulateMin(p[0], p[1], p[2]);
      max.accumulateMax(p[0], p[1], p[2]);
    }
    assertEquals(4.0, min.get(0, 0), 0);
    assertEquals(6.0, max.get(0, 0), 0);
    assertEquals(9.0, min.get(-1, 0), 0);
    assertTrue(Double.isNaN(min.get(1, 0)));
  }

  @Test
  void mergeKeepsTheLowerOrHigherValuePerCell() {
    // Hand-made: cells (0,0) 5 vs 3, (1,0) only in the first, (2,0) only in the second.
    SparseGrid a = new SparseGrid(1.0);
    SparseGrid b = new SparseGrid(1.0);
    a.set(0, 0, 5);
    a.set(1, 0, 7);
    b.set(0, 0, 3);
    b.set(2, 0, 9);
    SparseGrid min = new SparseGrid(1.0);
    min.mergeMin(a);
    min.mergeMin(b);
    a.mergeMax(b);
    assertEquals(3.0, min.get(0, 0), 0);
    assertEquals(5.0, a.get(0, 0), 0);
    assertEquals(7.0, a.get(1, 0), 0);
    assertEquals(9.0, a.get(2, 0), 0);
    assertThrows(IllegalArgumentException.class, () -> a.mergeMax(new SparseGrid(0.5)));
  }

  @ParameterizedTest
  @CsvSource({
    // x, cell, expected column: floor(x / cell) (hand-computed)
    "0.0, 1.0, 0",
    "0.999, 1.0, 0",
    "-0.001, 1.0, -1",
    "-1.0, 1.0, -1",
    "-1.001, 1.0, -2",
    "520000.26, 0.5, 1040000",
    "-64.0, 1.0, -64",
    "-64.5, 1.0, -65"
  })
  void columnIsFloorOfCoordinateOverCell(double x, double cell, int expected) {
    assertEquals(expected, new SparseGrid(cell).column(x));
  }

  @Test
  void bilinearReproducesAPlaneAndItsSlope() {
    // Bilinear interpolation is exact for linear functions (maths fact); slope = |gradient|.
    SparseGrid g = new SparseGrid(1.0, 8);
    double a = 900;
    double bx = 0.12;
    double by = -0.05;
    for (int r = -20; r < 20; r++) {
      for (int c = -20; c < 20; c++) {
        g.set(c, r, a + bx * g.centreX(c) + by * g.centreY(r));
      }
    }
    Random rnd = new Random(3);
    for (int k = 0; k < 500; k++) {
      double x = -19 + 38 * rnd.nextDouble();
      double y = -19 + 38 * rnd.nextDouble();
      assertEquals(a + bx * x + by * y, g.value(x, y), FLOAT_TOL);
      assertEquals(Math.hypot(bx, by), g.slope(x, y), 1e-3);
    }
  }

  @Test
  void fallsBackToNearestCellAtTheEdgeAndIsNanBeyond() {
    // One cell with data: anywhere within it (and half a cell around) reads its value.
    SparseGrid g = new SparseGrid(2.0);
    g.set(5, 5, 42.0);
    assertEquals(42.0, g.value(11.0, 11.0), 0); // cell centre
    assertEquals(42.0, g.value(10.1, 11.9), 0); // inside the cell
    assertEquals(42.0, g.value(12.9, 12.9), 0); // beyond the cell, nearest centre is (5, 5)
    assertTrue(Double.isNaN(g.value(14.5, 11.0))); // its four neighbouring centres are empty
    assertTrue(Double.isNaN(g.slope(11.0, 11.0)));
    assertTrue(Double.isNaN(g.value(Double.NaN, 11.0)));
  }

  @Test
  void readBlockMatchesCellReadsAcrossTilesAndNegativeIndices() {
    SparseGrid g = new SparseGrid(0.5, 4);
    Random rnd = new Random(11);
    for (int k = 0; k < 300; k++) {
      g.set(rnd.nextInt(40) - 20, rnd.nextInt(40) - 20, rnd.nextDouble());
    }
    int c0 = -13;
    int r0 = -7;
    int w = 23;
    int h = 19;
    float[] block = g.readBlock(c0, r0, w, h);
    for (int r = 0; r < h; r++) {
      for (int c = 0; c < w; c++) {
        assertEquals(g.get(c0 + c, r0 + r), block[r * w + c], 0);
      }
    }
  }

  @Test
  void memoryFollowsTheCorridorNotItsBoundingBox() {
    // A 20 km diagonal line surveyed 30 m either side: the bounding box is 14.1 km square
    // (about 48 800 tiles of 64 m), the corridor about 20 000 x 60 m.
    SparseGrid g = new SparseGrid(1.0);
    double len = 20_000;
    double ux = Math.sqrt(0.5);
    double uy = Math.sqrt(0.5);
    for (double s = 0; s < len; s += 1.0) {
      for (double e = -30; e <= 30; e += 2.0) {
        g.accumulateMin(500_000 + s * ux - e * uy, 4_000_000 + s * uy + e * ux, 10);
      }
    }
    double boxTiles = Math.pow(len * ux / 64, 2);
    // Tiles touched by a 60 m band at 45 degrees (computed): in each of the line's 221 tile
    // columns the band spans 60 sqrt 2 + 64 = 149 m of northing, i.e. 3.3 tiles, plus one where
    // it crosses tile rows: at most ~4.3 x 221 = 950; the bounding box holds 48 800.
    assertTrue(g.tileCount() < 4.5 * len * ux / 64, "tiles " + g.tileCount());
    assertTrue(g.tileCount() < boxTiles / 50, "tiles " + g.tileCount() + " box " + boxTiles);
  }

  @Test
  void rejectsBadParametersAndCoordinates() {
    assertThrows(IllegalArgumentException.class, () -> new SparseGrid(0));
    assertThrows(IllegalArgumentException.class, () -> new SparseGrid(Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> new SparseGrid(1.0, 48));
    SparseGrid g = new SparseGrid(1.0);
    assertThrows(IllegalArgumentException.class, () -> g.accumulateMin(Double.NaN, 0, 1));
    assertThrows(IllegalArgumentException.class, () -> g.accumulateMax(0, 1e12, 1));
  }
  @Test
  void valueReadsTheSameCellsInsideATileAsAcrossTiles() {
    // Issue 12: value() reads the four cells of a point from one tile lookup when they share a
    // tile; the result must be the four-lookup one bit for bit (holes, negative indices, tile
    // borders of 8-cell tiles).
    SparseGrid g = new SparseGrid(0.5, 8);
    java.util.Random r = new java.util.Random(12);
    for (int i = 0; i < 3000; i++) {
      g.set(r.nextInt(80) - 40, r.nextInt(80) - 40, 100 * r.nextDouble());
    }
    for (int i = 0; i < 100_000; i++) {
      double x = -22 + 44 * r.nextDouble();
      double y = -22 + 44 * r.nextDouble();
      assertEquals(Double.doubleToLongBits(fourLookups(g, x, y)),
          Double.doubleToLongBits(g.value(x, y)), x + ", " + y);
    }
  }

  /** value() as it was before issue 12: four cell lookups. */
  private static double fourLookups(SparseGrid g, double x, double y) {
    double fx = x / g.cellSize() - 0.5;
    double fy = y / g.cellSize() - 0.5;
    int c0 = (int) Math.floor(fx);
    int r0 = (int) Math.floor(fy);
    double tx = fx - c0;
    double ty = fy - r0;
    double[] z = {g.get(c0, r0), g.get(c0 + 1, r0), g.get(c0, r0 + 1), g.get(c0 + 1, r0 + 1)};
    if (!Double.isNaN(z[0] + z[1] + z[2] + z[3])) {
      return (1 - ty) * ((1 - tx) * z[0] + tx * z[1]) + ty * ((1 - tx) * z[2] + tx * z[3]);
    }
    double[] d = {tx * tx + ty * ty, (1 - tx) * (1 - tx) + ty * ty, tx * tx + (1 - ty) * (1 - ty),
        (1 - tx) * (1 - tx) + (1 - ty) * (1 - ty)};
    double best = Double.NaN;
    double bestD = Double.POSITIVE_INFINITY;
    for (int k = 0; k < 4; k++) {
      if (!Double.isNaN(z[k]) && d[k] < bestD) {
        best = z[k];
        bestD = d[k];
      }
    }
    return best;
  }

  @Test
  void aCorridorSizedGridMovesOutOfTheHeapWithTheSameCells() {
    // Issue 12 (heap flat in survey size): past TileMap.HEAP_TILES tiles the cells move into
    // scratch memory; every cell, block copy, merge and interpolated value must stay the same.
    // Reference: a plain array of the same cells (computed, no source needed).
    int width = 4 * 40;
    int height = 4 * 10; // 400 tiles of 4 x 4 cells: more than HEAP_TILES
    double[][] ref = new double[height][width];
    SparseGrid grid = new SparseGrid(0.5, 4);
    SparseGrid low = new SparseGrid(0.5, 4);
    Random rnd = new Random(12);
    for (int r = 0; r < height; r++) {
      for (int c = 0; c < width; c++) {
        ref[r][c] = (r + c) % 7 == 0 ? Double.NaN : 100 + rnd.nextInt(1000) / 8.0;
        if (!Double.isNaN(ref[r][c])) {
          grid.set(c, r, ref[r][c]);
          low.accumulateMin(c * 0.5 + 0.25, r * 0.5 + 0.25, ref[r][c] - 1);
        }
      }
    }
    assertTrue(grid.offHeap(), "a grid of " + grid.tileCount() + " tiles stays on the heap");
    assertEquals(width * height / 16, grid.tileCount());
    for (int r = 0; r < height; r++) {
      for (int c = 0; c < width; c++) {
        assertEquals(ref[r][c], grid.get(c, r), 0, "cell " + c + "," + r);
      }
    }
    float[] block = grid.readBlock(3, 5, 30, 9);
    for (int r = 0; r < 9; r++) {
      for (int c = 0; c < 30; c++) {
        assertEquals((float) ref[5 + r][3 + c], block[r * 30 + c], 0);
      }
    }
    // bilinear value at the middle of four cells holding data, by hand from the reference
    double expected = (ref[2][1] + ref[2][2] + ref[3][1] + ref[3][2]) / 4;
    assertEquals(expected, grid.value(1.0, 1.5), 1e-9);
    grid.mergeMin(low);
    for (int r = 0; r < height; r++) {
      for (int c = 0; c < width; c++) {
        assertEquals(Double.isNaN(ref[r][c]) ? Double.NaN : ref[r][c] - 1, grid.get(c, r), 0);
      }
    }
  }
}
