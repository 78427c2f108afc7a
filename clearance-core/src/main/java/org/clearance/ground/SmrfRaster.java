package org.clearance.ground;

/**
 * The raster steps of SMRF (Pingel, Clarke &amp; McBride 2013, ISPRS J. 77:21-30; methods.md 4.3)
 * on one dense block of the minimum surface.
 *
 * <ol>
 *   <li>Empty cells of the minimum surface are inpainted ({@link Inpainter}).
 *   <li>Low outliers: cells that a closing with a one-cell disk raises by more than
 *       {@link #LOW_OUTLIER_DROP_PER_CELL} x cell size are set aside (the paper screens low
 *       outliers on the inverted surface; this is our one-step version of it), unless at least
 *       {@link #LOW_OUTLIER_MIN_SUPPORT} other cells within {@link #LOW_OUTLIER_SUPPORT_CELLS}
 *       cells hold a lowest point less than that drop above it: terrain continues at its level,
 *       as sparse ground returns under a dense canopy do, while a multipath return lies below
 *       everything around it.
 *   <li>Progressive opening with disks of radius r = 1 .. maxWindow/cell cells, each applied to the
 *       previous opened surface; a cell is an object cell once the surface drops there by more than
 *       slope x r x cell size in one step.
 *   <li>Provisional DEM: the minimum surface of the cells that were neither empty, objects nor low
 *       outliers, inpainted.
 * </ol>
 * The final per-point step (|z - DEM| &lt;= eta + kappa x slope) is {@link GroundModel#isGround}.
 */
final class SmrfRaster {
  /**
   * Rise, metres per metre of cell size, above which a cell is a pit rather than terrain: five in
   * one (about 79 degrees). From memory of the paper's low-outlier step (slope 5, one-cell window).
   */
  static final double LOW_OUTLIER_DROP_PER_CELL = 5.0;
  /** Radius of the window in which a low cell looks for terrain at its own level, cells: under
   * a canopy that a pulse reaches the ground through in 30 % of the cells or more, a 7 x 7
   * window holds about 14 ground cells (issue 9, generated corridor seed 41: ground cells under
   * a forest wider than the largest opening were all set aside as low outliers, and the canopy
   * became the terrain, 0.58 m high at a 27 m tree and up to 13 m high in the stand). */
  static final int LOW_OUTLIER_SUPPORT_CELLS = 3;
  /** Fewest cells at its level that keep a low cell as terrain: more than the 3 other cells of a
   * 2 x 2 cluster of multipath returns (GroundModelTest), which the one-cell closing fills. */
  static final int LOW_OUTLIER_MIN_SUPPORT = 4;

  private SmrfRaster() {}

  /**
   * Result of the raster steps; arrays are row-major like the input.
   *
   * @param dem provisional DEM, metres; all NaN when the block held no data
   * @param object true for cells flagged as objects (not ground) by the openings
   * @param lowOutlier true for cells set aside as low outliers
   */
  record Result(float[] dem, boolean[] object, boolean[] lowOutlier) {}

  /**
   * @param zmin minimum elevation per cell, metres, NaN where no point fell
   * @param width block width, cells
   * @param height block height, cells
   * @param options filter parameters
   */
  static Result run(float[] zmin, int width, int height, SmrfOptions options) {
    int n = zmin.length;
    double cell = options.cellSize();
    boolean[] object = new boolean[n];
    boolean[] low = new boolean[n];
    float[] filled = Inpainter.fill(zmin, width, height);
    if (Float.isNaN(filled[0])) {
      return new Result(filled, object, low);
    }
    float[] closed = Morphology.close(filled, width, height, 1);
    float[] screened = zmin.clone();
    boolean anyLow = false;
    for (int i = 0; i < n; i++) {
      if (!Float.isNaN(zmin[i]) && closed[i] - zmin[i] > LOW_OUTLIER_DROP_PER_CELL * cell
          && !supported(zmin, width, height, i, LOW_OUTLIER_DROP_PER_CELL * cell)) {
        low[i] = true;
        screened[i] = Float.NaN;
        anyLow = true;
      }
    }
    if (anyLow) {
      filled = Inpainter.fill(screened, width, height);
    }
    float[] last = filled;
    for (int r = 1; r <= options.maxRadiusCells(); r++) {
      float[] opened = Morphology.open(last, width, height, r);
      double threshold = options.slope() * r * cell;
      for (int i = 0; i < n; i++) {
        if (last[i] - opened[i] > threshold) {
          object[i] = true;
        }
      }
      last = opened;
    }
    float[] ground = screened;
    for (int i = 0; i < n; i++) {
      if (object[i]) {
        ground[i] = Float.NaN;
      }
    }
    return new Result(Inpainter.fill(ground, width, height), object, low);
  }

  /** True when at least {@link #LOW_OUTLIER_MIN_SUPPORT} other cells within
   * {@link #LOW_OUTLIER_SUPPORT_CELLS} of cell {@code i} hold a lowest point less than
   * {@code dropM} above its own (or below it). */
  static boolean supported(float[] zmin, int width, int height, int i, double dropM) {
    int r0 = i / width;
    int c0 = i % width;
    int k = LOW_OUTLIER_SUPPORT_CELLS;
    int found = 0;
    for (int r = Math.max(0, r0 - k); r <= Math.min(height - 1, r0 + k); r++) {
      for (int c = Math.max(0, c0 - k); c <= Math.min(width - 1, c0 + k); c++) {
        int j = r * width + c;
        if (j != i && !Float.isNaN(zmin[j]) && zmin[j] - zmin[i] < dropM
            && ++found >= LOW_OUTLIER_MIN_SUPPORT) {
          return true;
        }
      }
    }
    return false;
  }
}
