package org.clearance.wire;

import org.clearance.ground.SparseGrid;

/**
 * A sparse plan grid over one span corridor and a {@value #BAND_M} m band around it, holding per
 * {@value #CELL_M} m cell (station and offset in the span's frame) the height above ground of the
 * highest non-ground point that is not a wire candidate: below the candidate height, or in the
 * band, or labelled by the survey as something else (package-private). It is the evidence of
 * what stands under a small group of candidates ({@link PointEvidence}): a bird or high noise has
 * open air below it, the top of a crown has the rest of its crown, which may spread beyond the
 * corridor's edge.
 *
 * <p>The cells live in a {@link SparseGrid} of {@value #TILE} by {@value #TILE} cell tiles, only
 * tiles holding such a point. The spans of one reading thread share one raster ({@link
 * #shared}), each span in its own block of it (its band, {@value #STATION_CELLS} cells along by
 * {@value #OFFSET_CELLS} across), so that a line of many spans makes one raster large enough to
 * move its tiles into scratch memory outside the heap: the heap the grids take does not grow
 * with the line's length (docs/benchmark.md, "Heap flat in survey size"). A grid made on its
 * own ({@link #StandingGrid()}) makes its raster on the first point. Not thread-safe; one per
 * reading thread, merged with {@link #addAll}.
 */
final class StandingGrid {
  /** Cell size of the grid, m: finer than the column radius of {@link PointEvidence}. */
  static final double CELL_M = 1.0;
  /** Band around the corridor also recorded, m: the column searched under a group at the
   * corridor's edge reaches this far out ({@link PointEvidence#COLUMN_MARGIN_M}). */
  static final double BAND_M = PointEvidence.COLUMN_MARGIN_M;
  /** Least height above ground of a point recorded, m: above ground returns, the ground model's
   * error and grass, so that an unclassified ground return is never taken for a crown (common
   * practice, no source). */
  static final double MIN_HEIGHT_M = 0.5;
  /** Cells along a tile's side. */
  static final int TILE = 16;
  /** Cells along the span in one span's block of a shared raster: stations from -65 536 m to
   * 65 536 m, far beyond any span. */
  static final int STATION_CELLS = 1 << 17;
  /** Cells across the span in one span's block: offsets from -8 192 m to 8 192 m. */
  static final int OFFSET_CELLS = 1 << 14;
  /** Blocks along a shared raster's columns; the rest of a band's number picks its row. */
  private static final int BLOCKS_ALONG = 1 << 14;

  private SparseGrid raster;
  /** Column and row of the cell at station 0, offset 0 of this grid's block. */
  private final int col0;
  private final int row0;
  /** Cells (relative to the block) of the box holding every point added, empty when lo > hi. */
  private int iLo = Integer.MAX_VALUE;
  private int iHi = Integer.MIN_VALUE;
  private int jLo = Integer.MAX_VALUE;
  private int jHi = Integer.MIN_VALUE;

  /** A grid of its own; its raster is made on the first point. */
  StandingGrid() {
    this(null, 0);
  }

  private StandingGrid(SparseGrid raster, int band) {
    this.raster = raster;
    this.col0 = ((band & (BLOCKS_ALONG - 1)) - BLOCKS_ALONG / 2) * STATION_CELLS;
    this.row0 = ((band >>> 14) - (1 << 16)) * OFFSET_CELLS;
  }

  /** A new raster to be shared by the grids of many spans ({@link #shared}). */
  static SparseGrid newRaster() {
    return new SparseGrid(CELL_M, TILE);
  }

  /**
   * The grid of band {@code band} (0 and up; one per span) of a raster made by {@link
   * #newRaster}; grids of different bands never see each other's cells.
   */
  static StandingGrid shared(SparseGrid raster, int band) {
    if (band < 0) {
      throw new IllegalArgumentException("band must be >= 0: " + band);
    }
    return new StandingGrid(raster, band);
  }

  /**
   * Records a point at station s, offset e (m) standing hag m above ground.
   *
   * @throws IllegalArgumentException when s or e lies beyond the grid's block
   */
  void add(double s, double e, double hag) {
    if (!(hag >= MIN_HEIGHT_M)) {
      return;
    }
    long i = index(s);
    long j = index(e);
    if (i <= -STATION_CELLS / 2 || i >= STATION_CELLS / 2 || j <= -OFFSET_CELLS / 2
        || j >= OFFSET_CELLS / 2) {
      throw new IllegalArgumentException("point beyond the standing grid's block: station " + s
          + " m, offset " + e + " m");
    }
    raise((int) i, (int) j, hag);
  }

  private void raise(int i, int j, double hag) {
    if (raster == null) {
      raster = newRaster();
    }
    raster.raise(col0 + i, row0 + j, hag);
    iLo = Math.min(iLo, i);
    iHi = Math.max(iHi, i);
    jLo = Math.min(jLo, j);
    jHi = Math.max(jHi, j);
  }

  /** Keeps the higher value of every cell of another grid (same corridor). */
  void addAll(StandingGrid other) {
    if (other.raster == null || other.iLo > other.iHi) {
      return;
    }
    // tile by tile over the other's box: tiles it never made are skipped whole
    for (int ti = Math.floorDiv(other.iLo, TILE); ti <= Math.floorDiv(other.iHi, TILE); ti++) {
      for (int tj = Math.floorDiv(other.jLo, TILE); tj <= Math.floorDiv(other.jHi, TILE); tj++) {
        if (!other.raster.hasTile(other.col0 + ti * TILE, other.row0 + tj * TILE)) {
          continue;
        }
        for (int i = ti * TILE; i < (ti + 1) * TILE; i++) {
          for (int j = tj * TILE; j < (tj + 1) * TILE; j++) {
            double v = other.raster.get(other.col0 + i, other.row0 + j);
            if (!Double.isNaN(v)) {
              raise(i, j, v);
            }
          }
        }
      }
    }
  }

  /** Number of cells holding a point. */
  int cells() {
    int n = 0;
    for (int i = iLo; i <= iHi; i++) {
      for (int j = jLo; j <= jHi; j++) {
        n += Double.isNaN(raster.get(col0 + i, row0 + j)) ? 0 : 1;
      }
    }
    return n;
  }

  /**
   * The highest recorded height above ground in the cells that meet the plan box (m), or
   * negative infinity when none holds a point.
   */
  double highestIn(double s0, double s1, double e0, double e1) {
    double best = Double.NEGATIVE_INFINITY;
    if (raster == null) {
      return best;
    }
    // only cells of this grid's box hold a point; the rest of the block is empty
    long i1 = Math.min(index(s1), iHi);
    long j1 = Math.min(index(e1), jHi);
    long jFrom = Math.max(index(e0), jLo);
    for (long i = Math.max(index(s0), iLo); i <= i1; i++) {
      for (long j = jFrom; j <= j1; j++) {
        double v = raster.get(col0 + (int) i, row0 + (int) j);
        if (v > best) {
          best = v;
        }
      }
    }
    return best;
  }

  private static long index(double v) {
    return (long) Math.floor(v / CELL_M);
  }
}
