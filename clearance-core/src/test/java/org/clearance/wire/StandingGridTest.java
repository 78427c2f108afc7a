package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.clearance.ground.SparseGrid;
import org.junit.jupiter.api.Test;

/** The spans' grids of what stands, sharing one raster (checks by hand, no outside source). */
class StandingGridTest {

  /** Spans sharing a raster never see each other's cells, even at the blocks' edges. */
  @Test
  void bandsOfOneRasterAreApart() {
    SparseGrid raster = StandingGrid.newRaster();
    StandingGrid a = StandingGrid.shared(raster, 0);
    StandingGrid b = StandingGrid.shared(raster, 1);
    StandingGrid c = StandingGrid.shared(raster, 1 << 14); // next row of blocks
    a.add(10.2, -3.4, 6.0);
    b.add(10.2, -3.4, 2.0);
    c.add(65_535.5, 8_191.5, 4.0);
    assertEquals(6.0, a.highestIn(10, 10.5, -4, -3), 1e-6);
    assertEquals(2.0, b.highestIn(10, 10.5, -4, -3), 1e-6);
    assertEquals(4.0, c.highestIn(65_535, 65_535.9, 8_191, 8_191.9), 1e-6);
    // a box over the whole block and beyond finds only the span's own point
    assertEquals(6.0, a.highestIn(-70_000, 70_000, -9_000, 9_000), 1e-6);
    assertEquals(2.0, b.highestIn(-70_000, 70_000, -9_000, 9_000), 1e-6);
    assertEquals(1, a.cells());
    assertEquals(1, b.cells());
    assertEquals(1, c.cells());
    assertThrows(IllegalArgumentException.class, () -> a.add(0, 8_192.5, 3.0));
    assertThrows(IllegalArgumentException.class, () -> a.add(-65_537, 0, 3.0));
  }

  /** Merging per-thread grids keeps each cell's highest value; same answers as one grid fed
   * every point. */
  @Test
  void mergingThreadsEqualsOneGrid() {
    SparseGrid r1 = StandingGrid.newRaster();
    SparseGrid r2 = StandingGrid.newRaster();
    StandingGrid one = new StandingGrid();
    StandingGrid t1 = StandingGrid.shared(r1, 7);
    StandingGrid t2 = StandingGrid.shared(r2, 7);
    java.util.Random rnd = new java.util.Random(12);
    for (int n = 0; n < 5000; n++) {
      double s = -30 + 400 * rnd.nextDouble();
      double e = -20 + 40 * rnd.nextDouble();
      double h = 20 * rnd.nextDouble();
      one.add(s, e, h);
      (n % 2 == 0 ? t1 : t2).add(s, e, h);
    }
    t1.addAll(t2);
    assertEquals(one.cells(), t1.cells());
    for (int s = -31; s < 372; s += 3) {
      for (int e = -21; e < 21; e += 2) {
        assertEquals(one.highestIn(s, s + 2.5, e, e + 1.5), t1.highestIn(s, s + 2.5, e, e + 1.5));
      }
    }
  }
}
