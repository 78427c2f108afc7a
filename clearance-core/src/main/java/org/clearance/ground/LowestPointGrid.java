package org.clearance.ground;

/**
 * The lowest point of each raster cell: its elevation and where in the cell it lies.
 *
 * <p>A minimum surface puts each cell's lowest point at the cell's centre. On sloping ground the
 * lowest point sits towards the downhill edge, so the surface reads low by about the slope times
 * a fraction of the cell (0.2 m on a 30-degree slope with 1 m cells). Knowing the point's position
 * lets {@link #positionCorrected} move its elevation to the centre along the local gradient.
 *
 * <p>The position is kept as a second float per cell, packing x and y offsets quantised to
 * 1/{@value #STEPS} of the cell (1 mm at 1 m cells); integers below 2^24 are exact in a float.
 */
final class LowestPointGrid {
  /** Quantisation steps per cell side for the stored position. */
  static final int STEPS = 1024;
  /**
   * Steepest gradient (rise over run) used to move a lowest point to its cell centre; beyond 45
   * degrees the ground is a step, not a plane, and the move would be a guess.
   */
  static final double MAX_CORRECTION_SLOPE = 1.0;

  private final SparseGrid z;
  private final SparseGrid where;

  /** @param cellSize cell side, metres, &gt; 0 */
  LowestPointGrid(double cellSize) {
    z = new SparseGrid(cellSize);
    where = new SparseGrid(cellSize);
  }

  /**
   * Offers a point (metres); kept when it is the lowest of its cell so far. Of points at exactly
   * the same elevation the one with the smaller packed position is kept, so the result does not
   * depend on the order the points arrive in (parallel readers).
   */
  void accept(double x, double y, double elevation) {
    int change = z.lower(x, y, elevation);
    if (change < 0) {
      return;
    }
    double cell = z.cellSize();
    int qx = quantise(x / cell - Math.floor(x / cell));
    int qy = quantise(y / cell - Math.floor(y / cell));
    int packed = qx * STEPS + qy;
    int col = z.column(x);
    int row = z.row(y);
    if (change > 0 || packed < where.get(col, row)) {
      where.set(col, row, packed);
    }
  }

  /** Folds another grid of the same cell size in, cell by cell keeping the lower point. */
  void merge(LowestPointGrid other) {
    int cells = z.tileCells() * z.tileCells();
    for (long k : other.z.tileKeys()) {
      int oz = other.z.tile(k);
      int ow = other.where.tile(k);
      int tz = z.tileOrCreate(k);
      int tw = where.tileOrCreate(k);
      for (int i = 0; i < cells; i++) {
        float ozi = other.z.cell(oz, i);
        float tzi = z.cell(tz, i);
        float owi = other.where.cell(ow, i);
        boolean lower = !(tzi <= ozi);
        boolean tieWin = tzi == ozi && owi < where.cell(tw, i);
        if (!Float.isNaN(ozi) && (lower || tieWin)) {
          z.setCell(tz, i, ozi);
          where.setCell(tw, i, owi);
        }
      }
    }
  }

  /** The elevation grid (lowest elevation per cell, metres). */
  SparseGrid elevations() {
    return z;
  }

  /**
   * The lowest elevations of a block moved to their cell centres along the gradient of
   * {@code surface}: z - (gx dx + gy dy), with (dx, dy) the point's offset from the centre and the
   * gradient from central differences of {@code surface}, capped at {@link #MAX_CORRECTION_SLOPE}.
   *
   * @param col0 first column of the block
   * @param row0 first row of the block
   * @param side block side, cells
   * @param surface a smooth surface over the same block (no NaN), metres
   * @return corrected elevations, NaN where the cell holds no point
   */
  float[] positionCorrected(int col0, int row0, int side, float[] surface) {
    float[] lows = z.readBlock(col0, row0, side, side);
    float[] pos = where.readBlock(col0, row0, side, side);
    double cell = z.cellSize();
    for (int r = 0; r < side; r++) {
      for (int c = 0; c < side; c++) {
        int i = r * side + c;
        if (Float.isNaN(lows[i])) {
          continue;
        }
        int q = (int) pos[i];
        double dx = ((q / STEPS + 0.5) / STEPS - 0.5) * cell;
        double dy = ((q % STEPS + 0.5) / STEPS - 0.5) * cell;
        double gx = gradient(surface, i, c, side, 1) / cell;
        double gy = gradient(surface, i, r, side, side) / cell;
        gx = Math.max(-MAX_CORRECTION_SLOPE, Math.min(MAX_CORRECTION_SLOPE, gx));
        gy = Math.max(-MAX_CORRECTION_SLOPE, Math.min(MAX_CORRECTION_SLOPE, gy));
        lows[i] = (float) (lows[i] - gx * dx - gy * dy);
      }
    }
    return lows;
  }

  /** Change of {@code s} per cell along one axis: central difference, one-sided at the edge. */
  private static double gradient(float[] s, int i, int along, int side, int step) {
    if (along > 0 && along < side - 1) {
      return 0.5 * (s[i + step] - s[i - step]);
    }
    return along == 0 ? s[i + step] - s[i] : s[i] - s[i - step];
  }

  private static int quantise(double fraction) {
    return Math.min(STEPS - 1, Math.max(0, (int) (fraction * STEPS)));
  }
}
