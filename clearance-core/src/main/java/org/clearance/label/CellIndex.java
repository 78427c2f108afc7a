package org.clearance.label;

import java.util.Arrays;

/**
 * A fixed-radius neighbour search over points in 3D: cubic cells of the search radius from a
 * fixed origin, the cells numbered in (x, y, z) order and the points sorted by cell, then by
 * index, with their coordinates copied in that order. A query looks at the 27 cells around a
 * point as 9 columns of three cells, each column a contiguous run of points, and visits the
 * points in the same order as a cell-by-cell search would: cells in (x, y, z) order, points of
 * a cell by index. A query of one point finds each run by a binary search ({@link #within},
 * {@link #runs}); a {@link Sweep} over every occupied cell in order finds them by nine pointers
 * that only move forward (a neighbour column's key is the cell's key plus a constant), so the
 * runs are found once per cell for all its points, with no search. The points are put in
 * cell order by one sort of packed (cell, index) pairs. Memory: three doubles, an int and a
 * long a point at most, and a long more while it is built (two longs and an int for a bounding
 * box of more than {@link #PACKED_CELLS} cells); at most 2^21 - 3 cells along any axis.
 */
final class CellIndex {

  /** Bits of a cell's coordinate along one axis in its key. */
  private static final int AXIS_BITS = 21;
  /** Bits of a point index in a packed (cell, index) pair: any int index. */
  private static final int INDEX_BITS = 31;
  private static final long INDEX_MASK = (1L << INDEX_BITS) - 1;
  /** Most cells of the bounding box for the packed sort: a dense cell number then takes at
   * most 32 bits beside the index's 31 (a block window of 1.5 km x 1.5 km x 1 km in 1 m cells
   * is 2.3 x 10^9 cells); a larger box takes the ranks by binary search. */
  static final double PACKED_CELLS = 0x1p32;

  private final double[] x;
  private final double[] y;
  private final double[] z;
  private final double cell;
  private final long minX;
  private final long minY;
  private final long minZ;
  /** Occupied cell keys, ascending, and where each cell's points start in {@link #order}. */
  private final long[] keys;
  private final int[] start;
  /** Point indices sorted by cell, then index ("positions"); their coordinates in the same
   * order, read directly by the labelling's inner loops. */
  final int[] order;
  final double[] sx;
  final double[] sy;
  final double[] sz;

  CellIndex(double[] x, double[] y, double[] z, int n, double cell) {
    this.x = x;
    this.y = y;
    this.z = z;
    this.cell = cell;
    // Cells from a fixed origin, so a point's neighbours come in the same order in a block
    // window as on the whole line (the features' sums are then the same to the last bit).
    long ax = Long.MAX_VALUE;
    long ay = Long.MAX_VALUE;
    long az = Long.MAX_VALUE;
    long bx = Long.MIN_VALUE;
    long by = Long.MIN_VALUE;
    long bz = Long.MIN_VALUE;
    for (int i = 0; i < n; i++) {
      long cx = cellOf(x[i]);
      long cy = cellOf(y[i]);
      long cz = cellOf(z[i]);
      ax = Math.min(ax, cx);
      ay = Math.min(ay, cy);
      az = Math.min(az, cz);
      bx = Math.max(bx, cx);
      by = Math.max(by, cy);
      bz = Math.max(bz, cz);
    }
    long most = (1L << AXIS_BITS) - 3;
    if (n > 0 && (bx - ax > most || by - ay > most || bz - az > most)) {
      throw new IllegalArgumentException("points spread over too many cells to label at once");
    }
    // one cell of margin below, so a neighbour's key is never negative
    minX = ax - 1;
    minY = ay - 1;
    minZ = az - 1;
    order = new int[n];
    sx = new double[n];
    sy = new double[n];
    sz = new double[n];
    long spanY = by - minY + 2;
    long spanZ = bz - minZ + 2;
    long[][] cellKeys = new long[1][];
    int[][] cellStarts = new int[1][];
    if (n == 0 || (double) (bx - minX + 2) * spanY * spanZ <= PACKED_CELLS) {
      packedSort(n, spanY, spanZ, cellKeys, cellStarts);
    } else {
      rankedSort(n, cellKeys, cellStarts);
    }
    keys = cellKeys[0];
    start = cellStarts[0];
  }

  /**
   * Sorts the points by one sort of (dense cell number, index) pairs, the dense number counting
   * the bounding box's cells in (x, y, z) order: cells in key order, then index.
   */
  private void packedSort(int n, long spanY, long spanZ, long[][] cellKeys, int[][] cellStarts) {
    long[] packed = new long[n];
    for (int i = 0; i < n; i++) {
      long dense = ((cellOf(x[i]) - minX) * spanY + cellOf(y[i]) - minY) * spanZ
          + cellOf(z[i]) - minZ;
      packed[i] = dense << INDEX_BITS | i;
    }
    Arrays.sort(packed);
    long[] k = new long[Math.max(16, n / 4)];
    int[] first = new int[k.length + 1];
    int m = 0;
    for (int t = 0; t < n; t++) {
      int i = (int) (packed[t] & INDEX_MASK);
      if (t == 0 || packed[t] >>> INDEX_BITS != packed[t - 1] >>> INDEX_BITS) {
        if (m == k.length) {
          k = Arrays.copyOf(k, 2 * m);
          first = Arrays.copyOf(first, 2 * m + 1);
        }
        k[m] = key(cellOf(x[i]), cellOf(y[i]), cellOf(z[i]));
        first[m++] = t;
      }
      order[t] = i;
      sx[t] = x[i];
      sy[t] = y[i];
      sz[t] = z[i];
    }
    cellKeys[0] = Arrays.copyOf(k, m);
    int[] s = Arrays.copyOf(first, m + 1);
    s[m] = n;
    cellStarts[0] = s;
  }

  /** Sorts the points by a counting sort on each point's cell rank, found by binary search among
   * the sorted keys: for a bounding box of more than {@link #PACKED_CELLS} cells. */
  private void rankedSort(int n, long[][] cellKeys, int[][] cellStarts) {
    long[] key = new long[n];
    for (int i = 0; i < n; i++) {
      key[i] = key(cellOf(x[i]), cellOf(y[i]), cellOf(z[i]));
    }
    long[] sorted = key.clone();
    Arrays.sort(sorted);
    int m = 0;
    for (int i = 0; i < n; i++) {
      if (m == 0 || sorted[m - 1] != sorted[i]) {
        sorted[m++] = sorted[i];
      }
    }
    long[] k = Arrays.copyOf(sorted, m);
    // counting sort of the points by cell rank: stable, so a cell's points stay in index order
    int[] rank = new int[n];
    int[] s = new int[m + 1];
    for (int i = 0; i < n; i++) {
      rank[i] = Arrays.binarySearch(k, key[i]);
      s[rank[i] + 1]++;
    }
    for (int c = 0; c < m; c++) {
      s[c + 1] += s[c];
    }
    int[] at = Arrays.copyOf(s, m);
    for (int i = 0; i < n; i++) {
      int t = at[rank[i]]++;
      order[t] = i;
      sx[t] = x[i];
      sy[t] = y[i];
      sz[t] = z[i];
    }
    cellKeys[0] = k;
    cellStarts[0] = s;
  }

  private long cellOf(double v) {
    return (long) Math.floor(v / cell);
  }

  /** The key of a cell: its coordinates from the least occupied cell less one, in (x, y, z)
   * order, so the cells of one column are consecutive keys. */
  private long key(long cx, long cy, long cz) {
    return ((cx - minX) << (2 * AXIS_BITS)) | ((cy - minY) << AXIS_BITS) | (cz - minZ);
  }

  /** What a query hands on for each neighbour. */
  @FunctionalInterface
  interface Neighbour {
    /**
     * @param j the neighbour's index
     * @param dx its easting less the query point's, m (as {@code x[j] - x[i]})
     * @param dy its northing less the query point's, m
     * @param dz its height less the query point's, m
     */
    void accept(int j, double dx, double dy, double dz);
  }

  /** Calls {@code action} with every point within {@code r} (at most the cell size) of i,
   * i itself included. */
  void within(int i, double r, Neighbour action) {
    int[] from = new int[COLUMNS];
    int[] to = new int[COLUMNS];
    runs(i, from, to);
    double px = x[i];
    double py = y[i];
    double pz = z[i];
    double r2 = r * r;
    for (int k = 0; k < COLUMNS; k++) {
      for (int t = from[k]; t < to[k]; t++) {
        double dx = sx[t] - px;
        double dy = sy[t] - py;
        double dz = sz[t] - pz;
        if (dx * dx + dy * dy + dz * dz <= r2) {
          action.accept(order[t], dx, dy, dz);
        }
      }
    }
  }

  /** Columns of three cells around a cell: x offset -1..1, then y offset -1..1. */
  static final int COLUMNS = 9;

  /**
   * The runs of positions of the 9 columns around point i's cell, in visiting order: column k
   * holds positions {@code from[k]} to {@code to[k] - 1} (one binary search each).
   */
  void runs(int i, int[] from, int[] to) {
    long cx = cellOf(x[i]);
    long cy = cellOf(y[i]);
    long cz = cellOf(z[i]);
    int k = 0;
    for (long a = cx - 1; a <= cx + 1; a++) {
      for (long b = cy - 1; b <= cy + 1; b++) {
        long low = key(a, b, cz - 1);
        int f = Arrays.binarySearch(keys, low);
        f = f < 0 ? -f - 1 : f;
        int e = f;
        while (e < keys.length && keys[e] <= low + 2) {
          e++;
        }
        from[k] = start[f];
        to[k] = start[e];
        k++;
      }
    }
  }

  /** Occupied cells. */
  int cells() {
    return keys.length;
  }

  /** The first position of occupied cell c's points (c from 0 to {@link #cells}; the cell's
   * points are the positions up to the next cell's first). */
  int firstOf(int c) {
    return start[c];
  }

  /** A sweep over the occupied cells in key order. */
  Sweep sweep() {
    return new Sweep();
  }

  /**
   * The 9 column runs around each occupied cell, cells taken in key order ({@link #moveTo} with
   * a rising cell): the same runs as {@link #runs} of any point of the cell. Each column's low
   * key is the cell's key plus a constant (the cell coordinates have a margin of one cell on
   * either side, so no field of the key borrows or carries), so it rises with the cell and two
   * pointers per column only move forward: O(cells) over the whole sweep.
   */
  final class Sweep {
    /** Positions of column k: {@code from[k]} to {@code to[k] - 1}, after {@link #moveTo}. */
    final int[] from = new int[COLUMNS];
    final int[] to = new int[COLUMNS];
    private final int[] lowCell = new int[COLUMNS];
    private final int[] endCell = new int[COLUMNS];
    private final long[] offset = new long[COLUMNS];

    private Sweep() {
      int k = 0;
      for (long a = -1; a <= 1; a++) {
        for (long b = -1; b <= 1; b++) {
          offset[k++] = (a << (2 * AXIS_BITS)) + (b << AXIS_BITS) - 1;
        }
      }
    }

    /** Finds the runs around occupied cell c (not below the last cell moved to). */
    void moveTo(int c) {
      long key = keys[c];
      int m = keys.length;
      for (int k = 0; k < COLUMNS; k++) {
        long low = key + offset[k];
        int f = lowCell[k];
        while (f < m && keys[f] < low) {
          f++;
        }
        int e = Math.max(f, endCell[k]);
        while (e < m && keys[e] <= low + 2) {
          e++;
        }
        lowCell[k] = f;
        endCell[k] = e;
        from[k] = start[f];
        to[k] = start[e];
      }
    }
  }
}
