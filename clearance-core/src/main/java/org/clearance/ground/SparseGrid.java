package org.clearance.ground;

/**
 * A raster that stores only the square tiles where values were written, so its memory follows the
 * surveyed corridor rather than the corridor's bounding box.
 *
 * <p>Cell {@code (col, row)} covers {@code [col * cellSize, (col + 1) * cellSize)} in x and the same
 * in y, in metres; its centre is at {@code (col + 0.5) * cellSize}. Values are floats; NaN means no
 * data. Per-point operations ({@link #accumulateMin}, {@link #accumulateMax}, {@link #value}) are
 * O(1) and allocate nothing except a new tile the first time a point falls in it. A raster of
 * more than {@value TileMap#HEAP_TILES} tiles (one of the whole corridor) keeps its tiles in
 * scratch memory outside the heap ({@link TileMap}), so the heap does not grow with the survey.
 *
 * <p>Not thread-safe while written; safe to read from many threads once writing has finished.
 */
public final class SparseGrid {
  /** Default tile side in cells: 64 x 64 floats = 16 KiB, small enough to follow a corridor. */
  public static final int DEFAULT_TILE_CELLS = 64;
  /** Largest |cell index| accepted: keeps indices and tile keys well inside the int range. */
  private static final double MAX_INDEX = 1 << 30;
  /** Bytes of bookkeeping per tile (array header, map slot); an estimate for memory reports. */
  private static final long TILE_OVERHEAD_BYTES = 48;

  private final double cellSize;
  private final int tileCells;
  private final int shift;
  private final int mask;
  private final TileMap tiles;

  /**
   * @param cellSize cell side, metres, finite and &gt; 0
   * @param tileCells tile side in cells, a power of two from 4 to 1024
   * @throws IllegalArgumentException when a parameter is out of range
   */
  public SparseGrid(double cellSize, int tileCells) {
    if (!(Double.isFinite(cellSize) && cellSize > 0)) {
      throw new IllegalArgumentException("cell size must be finite and > 0: " + cellSize);
    }
    if (tileCells < 4 || tileCells > 1024 || Integer.bitCount(tileCells) != 1) {
      throw new IllegalArgumentException("tile cells must be a power of two in [4, 1024]: "
          + tileCells);
    }
    this.cellSize = cellSize;
    this.tileCells = tileCells;
    this.shift = Integer.numberOfTrailingZeros(tileCells);
    this.mask = tileCells - 1;
    this.tiles = new TileMap(tileCells * tileCells);
  }

  /** A grid with {@link #DEFAULT_TILE_CELLS} tiles; {@code cellSize} in metres, &gt; 0. */
  public SparseGrid(double cellSize) {
    this(cellSize, DEFAULT_TILE_CELLS);
  }

  /** Cell side, metres. */
  public double cellSize() {
    return cellSize;
  }

  /** Tile side, cells. */
  public int tileCells() {
    return tileCells;
  }

  /**
   * Column of the cell holding easting {@code x} (metres); {@link Integer#MIN_VALUE} when x is not
   * finite or beyond about 10^9 cells from the origin.
   */
  public int column(double x) {
    return index(x);
  }

  /** Row of the cell holding northing {@code y} (metres); see {@link #column}. */
  public int row(double y) {
    return index(y);
  }

  /** Easting of the centre of column {@code col}, metres. */
  public double centreX(int col) {
    return (col + 0.5) * cellSize;
  }

  /** Northing of the centre of row {@code row}, metres. */
  public double centreY(int row) {
    return (row + 0.5) * cellSize;
  }

  /** The value of cell {@code (col, row)}, or NaN when it holds none. */
  public double get(int col, int row) {
    int tile = tiles.id(key(col >> shift, row >> shift));
    return tile < 0 ? Double.NaN : tiles.cell(tile, ((row & mask) << shift) | (col & mask));
  }

  /** Stores {@code value} (NaN clears the cell) in cell {@code (col, row)}. */
  public void set(int col, int row, double value) {
    int tile = tiles.getOrCreate(key(col >> shift, row >> shift));
    tiles.setCell(tile, ((row & mask) << shift) | (col & mask), (float) value);
  }

  /**
   * Folds another grid of the same geometry into this one, keeping the lower value of each cell
   * (for grids filled by parallel readers).
   *
   * @throws IllegalArgumentException when the cell or tile sizes differ
   */
  public void mergeMin(SparseGrid other) {
    merge(other, false);
  }

  /** Like {@link #mergeMin} but keeps the higher value of each cell. */
  public void mergeMax(SparseGrid other) {
    merge(other, true);
  }

  private void merge(SparseGrid other, boolean max) {
    if (other.cellSize != cellSize || other.tileCells != tileCells) {
      throw new IllegalArgumentException("grids differ in cell or tile size");
    }
    int cells = tileCells * tileCells;
    for (long k : other.tiles.keys()) {
      int src = other.tiles.id(k);
      int dst = tiles.getOrCreate(k);
      for (int i = 0; i < cells; i++) {
        float v = other.tiles.cell(src, i);
        float d = tiles.cell(dst, i);
        if (!Float.isNaN(v) && (Float.isNaN(d) || (max ? v > d : v < d))) {
          tiles.setCell(dst, i, v);
        }
      }
    }
  }

  /**
   * Lowers the cell holding {@code (x, y)} to {@code value} when that is lower (or the cell empty).
   *
   * @param x easting, metres
   * @param y northing, metres
   * @param value any finite number, e.g. an elevation in metres
   * @return true when the cell took the value
   * @throws IllegalArgumentException when x or y is not finite or absurdly far from the origin
   */
  public boolean accumulateMin(double x, double y, double value) {
    return lower(x, y, value) > 0;
  }

  /**
   * Lowers the cell holding {@code (x, y)} to {@code value} when that is lower.
   *
   * @return 1 when the cell took the value, 0 when it already held exactly this value, -1 when it
   *     held a lower one
   */
  int lower(double x, double y, double value) {
    int col = checkedIndex(x);
    int row = checkedIndex(y);
    int tile = tiles.getOrCreate(key(col >> shift, row >> shift));
    int i = ((row & mask) << shift) | (col & mask);
    float v = (float) value;
    float old = tiles.cell(tile, i);
    if (old == v) {
      return 0;
    }
    if (!(old < v)) {
      tiles.setCell(tile, i, v);
      return 1;
    }
    return -1;
  }


  /** Like {@link #accumulateMin} but keeps the highest value. */
  public void accumulateMax(double x, double y, double value) {
    raise(checkedIndex(x), checkedIndex(y), value);
  }

  /** Raises cell {@code (col, row)} to {@code value} when that is higher (or the cell empty). */
  public void raise(int col, int row, double value) {
    int tile = tiles.getOrCreate(key(col >> shift, row >> shift));
    int i = ((row & mask) << shift) | (col & mask);
    float v = (float) value;
    if (!(tiles.cell(tile, i) >= v)) {
      tiles.setCell(tile, i, v);
    }
  }

  /**
   * The value at {@code (x, y)} by bilinear interpolation between the four nearest cell centres;
   * where any of the four has no data, the value of the nearest of them that has data; NaN when
   * none has.
   *
   * @param x easting, metres
   * @param y northing, metres
   */
  public double value(double x, double y) {
    double fx = x / cellSize - 0.5;
    double fy = y / cellSize - 0.5;
    if (!(Math.abs(fx) < MAX_INDEX && Math.abs(fy) < MAX_INDEX)) {
      return Double.NaN;
    }
    int c0 = (int) Math.floor(fx);
    int r0 = (int) Math.floor(fy);
    double tx = fx - c0;
    double ty = fy - r0;
    double z00;
    double z10;
    double z01;
    double z11;
    int tc = c0 >> shift;
    int tr = r0 >> shift;
    if ((c0 + 1) >> shift == tc && (r0 + 1) >> shift == tr) {
      // All four cells in one tile (most points): one lookup instead of four, same values.
      int tile = tiles.id(key(tc, tr));
      if (tile < 0) {
        return Double.NaN;
      }
      int i = ((r0 & mask) << shift) | (c0 & mask);
      z00 = tiles.cell(tile, i);
      z10 = tiles.cell(tile, i + 1);
      z01 = tiles.cell(tile, i + tileCells);
      z11 = tiles.cell(tile, i + tileCells + 1);
    } else {
      z00 = get(c0, r0);
      z10 = get(c0 + 1, r0);
      z01 = get(c0, r0 + 1);
      z11 = get(c0 + 1, r0 + 1);
    }
    if (!Double.isNaN(z00 + z10 + z01 + z11)) {
      return (1 - ty) * ((1 - tx) * z00 + tx * z10) + ty * ((1 - tx) * z01 + tx * z11);
    }
    // Fallback: the nearest of the four centres that holds data (squared distances in cells).
    double best = Double.NaN;
    double bestD = Double.POSITIVE_INFINITY;
    double d = tx * tx + ty * ty;
    if (!Double.isNaN(z00) && d < bestD) {
      best = z00;
      bestD = d;
    }
    d = (1 - tx) * (1 - tx) + ty * ty;
    if (!Double.isNaN(z10) && d < bestD) {
      best = z10;
      bestD = d;
    }
    d = tx * tx + (1 - ty) * (1 - ty);
    if (!Double.isNaN(z01) && d < bestD) {
      best = z01;
      bestD = d;
    }
    d = (1 - tx) * (1 - tx) + (1 - ty) * (1 - ty);
    if (!Double.isNaN(z11) && d < bestD) {
      best = z11;
    }
    return best;
  }

  /**
   * Magnitude of the gradient of the bilinear surface at {@code (x, y)}, rise over run
   * (dimensionless, &gt;= 0); NaN unless all four surrounding cell centres hold data.
   */
  public double slope(double x, double y) {
    double fx = x / cellSize - 0.5;
    double fy = y / cellSize - 0.5;
    if (!(Math.abs(fx) < MAX_INDEX && Math.abs(fy) < MAX_INDEX)) {
      return Double.NaN;
    }
    int c0 = (int) Math.floor(fx);
    int r0 = (int) Math.floor(fy);
    double tx = fx - c0;
    double ty = fy - r0;
    double z00 = get(c0, r0);
    double z10 = get(c0 + 1, r0);
    double z01 = get(c0, r0 + 1);
    double z11 = get(c0 + 1, r0 + 1);
    double gx = ((1 - ty) * (z10 - z00) + ty * (z11 - z01)) / cellSize;
    double gy = ((1 - tx) * (z01 - z00) + tx * (z11 - z10)) / cellSize;
    return Math.hypot(gx, gy);
  }

  /**
   * Copies the rectangle of {@code width x height} cells whose lower-left cell is
   * {@code (col0, row0)} into a new row-major array (index {@code r * width + c}); NaN where empty.
   */
  float[] readBlock(int col0, int row0, int width, int height) {
    float[] out = new float[width * height];
    java.util.Arrays.fill(out, Float.NaN);
    int tc0 = col0 >> shift;
    int tc1 = (col0 + width - 1) >> shift;
    int tr0 = row0 >> shift;
    int tr1 = (row0 + height - 1) >> shift;
    for (int tr = tr0; tr <= tr1; tr++) {
      for (int tc = tc0; tc <= tc1; tc++) {
        int tile = tiles.id(key(tc, tr));
        if (tile < 0) {
          continue;
        }
        int cFrom = Math.max(col0, tc << shift);
        int cTo = Math.min(col0 + width, (tc + 1) << shift);
        int rFrom = Math.max(row0, tr << shift);
        int rTo = Math.min(row0 + height, (tr + 1) << shift);
        for (int r = rFrom; r < rTo; r++) {
          tiles.copy(tile, ((r & mask) << shift) | (cFrom & mask), out,
              (r - row0) * width + (cFrom - col0), cTo - cFrom);
        }
      }
    }
    return out;
  }

  /** Whether a tile holds cell {@code (col, row)}: false means the cell and every cell of its
   * {@link #tileCells} x {@link #tileCells} tile are empty. */
  public boolean hasTile(int col, int row) {
    return tiles.id(key(col >> shift, row >> shift)) >= 0;
  }

  /** The number of the tile stored under {@code key}, or -1; read its cells (row-major within
   * the tile) with {@link #cell}. */
  int tile(long key) {
    return tiles.id(key);
  }

  /** The number of the tile stored under {@code key}, created (all NaN) when absent. */
  int tileOrCreate(long key) {
    return tiles.getOrCreate(key);
  }

  /** Cell {@code i} of tile number {@code tile}. */
  float cell(int tile, int i) {
    return tiles.cell(tile, i);
  }

  /** Sets cell {@code i} of tile number {@code tile}. */
  void setCell(int tile, int i, float v) {
    tiles.setCell(tile, i, v);
  }

  /** Whether the tiles were moved out of the heap into scratch memory (a raster of more than
   * {@value TileMap#HEAP_TILES} tiles). */
  boolean offHeap() {
    return tiles.offHeap();
  }

  /** Number of tiles allocated. */
  public int tileCount() {
    return tiles.size();
  }

  /** Approximate bytes held by the tiles (cells plus per-tile bookkeeping), on the heap or, for a
   * large raster, in scratch memory outside it. */
  public long memoryBytes() {
    return tiles.size() * (4L * tileCells * tileCells + TILE_OVERHEAD_BYTES);
  }

  /** Number of cells holding a value (not NaN); walks every tile. */
  public long dataCellCount() {
    long n = 0;
    int cells = tileCells * tileCells;
    for (long k : tiles.keys()) {
      int tile = tiles.id(k);
      for (int i = 0; i < cells; i++) {
        if (!Float.isNaN(tiles.cell(tile, i))) {
          n++;
        }
      }
    }
    return n;
  }

  /** Keys of all tiles, in no particular order; decode with {@link #keyColumn}, {@link #keyRow}. */
  long[] tileKeys() {
    return tiles.keys();
  }

  /** Tile column of a tile key. */
  static int keyColumn(long key) {
    return (int) (key >> 32);
  }

  /** Tile row of a tile key. */
  static int keyRow(long key) {
    return (int) key;
  }

  private static long key(int tileCol, int tileRow) {
    return ((long) tileCol << 32) | (tileRow & 0xffffffffL);
  }

  private int index(double v) {
    double f = Math.floor(v / cellSize);
    return Math.abs(f) < MAX_INDEX ? (int) f : Integer.MIN_VALUE;
  }

  private int checkedIndex(double v) {
    double f = Math.floor(v / cellSize);
    if (!(Math.abs(f) < MAX_INDEX)) {
      throw new IllegalArgumentException("coordinate outside the grid's range: " + v);
    }
    return (int) f;
  }
}
