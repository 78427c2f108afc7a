package org.clearance.ground;

/**
 * Parameters of canopy height modelling and tree-top detection.
 *
 * @param cellSize canopy raster cell, metres, finite, 0.1-2 (default 0.5)
 * @param minHeight lowest tree top counted, metres above ground, finite, &gt; 0 (default 2, as in
 *     the variable-window method of Popescu &amp; Wynne 2004)
 * @param maxHeight height at which the search window stops growing, metres, finite, &gt; minHeight
 *     (default 60); taller trees are still found, with the window of this height. It bounds the
 *     overlap read around each block.
 * @param blockSize side of the blocks the canopy is processed in, metres, finite, &gt;= 32 cells
 *     (default 128)
 * @param pitDepth a canopy cell this far below the median of its eight neighbours is a pit (a
 *     laser shot that slipped through the crown) and takes that median, metres, finite, &gt; 0
 *     (default 1.0)
 */
public record TreeOptions(
    double cellSize,
    double minHeight,
    double maxHeight,
    double blockSize,
    double pitDepth) {

  /** Blocks smaller than this many cells a side spend most of their time in the overlap. */
  private static final int MIN_BLOCK_CELLS = 32;
  /** Intercept of the crown-width regression, metres (Popescu &amp; Wynne 2004; methods.md 5.1). */
  static final double CROWN_WIDTH_INTERCEPT = 2.51;
  /** Quadratic coefficient of the crown-width regression, 1/m (same source). */
  static final double CROWN_WIDTH_QUADRATIC = 0.009;

  /**
   * @throws IllegalArgumentException when a parameter is out of range
   */
  public TreeOptions {
    if (!(Double.isFinite(cellSize) && cellSize >= 0.1 && cellSize <= 2)) {
      throw new IllegalArgumentException("canopy cell size must be in [0.1, 2] m: " + cellSize);
    }
    if (!(Double.isFinite(minHeight) && minHeight > 0)) {
      throw new IllegalArgumentException("minimum tree height must be finite and > 0: "
          + minHeight);
    }
    if (!(Double.isFinite(maxHeight) && maxHeight > minHeight)) {
      throw new IllegalArgumentException(
          "maximum window height must be finite and > the minimum height: " + maxHeight);
    }
    if (!(Double.isFinite(blockSize) && blockSize >= MIN_BLOCK_CELLS * cellSize)) {
      throw new IllegalArgumentException("block size must be finite and >= 32 cells: "
          + blockSize);
    }
    if (!(Double.isFinite(pitDepth) && pitDepth > 0)) {
      throw new IllegalArgumentException("pit depth must be finite and > 0: " + pitDepth);
    }
  }

  /** Cell 0.5 m, trees from 2 m, window growth to 60 m, 128 m blocks, 1 m pits. */
  public static TreeOptions defaults() {
    return new TreeOptions(0.5, 2, 60, 128, 1.0);
  }

  /**
   * Radius of the tree-top search window for a canopy height, from the crown-width regression
   * width = 2.51 + 0.009 h^2 (Popescu &amp; Wynne 2004, PE&amp;RS 70(5):589-604; methods.md 5.1).
   *
   * @param height canopy height, metres, &gt;= 0
   * @return window radius, metres (half the predicted crown width)
   */
  public static double windowRadius(double height) {
    return 0.5 * (CROWN_WIDTH_INTERCEPT + CROWN_WIDTH_QUADRATIC * height * height);
  }

  /** Block side in cells (before rounding to tiles). */
  int blockCells() {
    return (int) Math.ceil(blockSize / cellSize);
  }

  /** Largest window radius, cells. */
  int maxWindowCells() {
    return (int) Math.ceil(windowRadius(maxHeight) / cellSize);
  }
}
