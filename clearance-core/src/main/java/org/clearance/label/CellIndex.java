package org.clearance.label;

import java.util.Arrays;
import java.util.function.IntConsumer;

/**
 * A fixed-radius neighbour search over points in 3D: cubic cells of the search radius, the points
 * sorted by a 40-bit hash of their cell, a cell found by binary search among the occupied hashes
 * (two cells sharing a hash only add points that the distance test then drops). Memory: two ints
 * and a long per point; at most 2^24 points.
 */
final class CellIndex {

  /** Bits of the cell hash: with 24 bits of point index it fills a positive long. */
  private static final long HASH_MASK = (1L << 39) - 1;

  private final double[] x;
  private final double[] y;
  private final double[] z;
  private final double cell;
  private final double x0;
  private final double y0;
  private final double z0;
  /** Occupied cell keys, ascending, and where each cell's points start in {@link #order}. */
  private final long[] keys;
  private final int[] start;
  private final int[] order;

  CellIndex(double[] x, double[] y, double[] z, int n, double cell) {
    this.x = x;
    this.y = y;
    this.z = z;
    this.cell = cell;
    // Cells from a fixed origin, so a point's neighbours come in the same order in a block
    // window as on the whole line (the features' sums are then the same to the last bit).
    x0 = 0;
    y0 = 0;
    z0 = 0;
    long[] packed = new long[n];
    for (int i = 0; i < n; i++) {
      packed[i] = (key(x[i], y[i], z[i]) << 24) | i;
    }
    if (n >= (1 << 24)) {
      throw new IllegalArgumentException("too many points to label at once: " + n);
    }
    Arrays.sort(packed);
    order = new int[n];
    long[] k = new long[n];
    int[] s = new int[n + 1];
    int m = 0;
    for (int i = 0; i < n; i++) {
      long key = packed[i] >>> 24;
      order[i] = (int) (packed[i] & 0xFFFFFF);
      if (m == 0 || k[m - 1] != key) {
        k[m] = key;
        s[m] = i;
        m++;
      }
    }
    s[m] = n;
    keys = Arrays.copyOf(k, m);
    start = Arrays.copyOf(s, m + 1);
  }

  private long key(double px, double py, double pz) {
    return key((long) Math.floor((px - x0) / cell), (long) Math.floor((py - y0) / cell),
        (long) Math.floor((pz - z0) / cell));
  }

  private static long key(long cx, long cy, long cz) {
    long h = cx * 0x9E3779B97F4A7C15L + cy;
    h = h * 0xBF58476D1CE4E5B9L + cz;
    h ^= h >>> 29;
    h *= 0x94D049BB133111EBL;
    return (h ^ (h >>> 32)) & HASH_MASK;
  }

  /** Calls {@code action} with every point within {@code r} (at most the cell size) of i,
   * i itself included. */
  void within(int i, double r, IntConsumer action) {
    long cx = (long) Math.floor((x[i] - x0) / cell);
    long cy = (long) Math.floor((y[i] - y0) / cell);
    long cz = (long) Math.floor((z[i] - z0) / cell);
    double r2 = r * r;
    for (long a = cx - 1; a <= cx + 1; a++) {
      for (long b = cy - 1; b <= cy + 1; b++) {
        for (long c = cz - 1; c <= cz + 1; c++) {
          int at = Arrays.binarySearch(keys, key(a, b, c));
          if (at < 0) {
            continue;
          }
          for (int t = start[at]; t < start[at + 1]; t++) {
            int j = order[t];
            double dx = x[j] - x[i];
            double dy = y[j] - y[i];
            double dz = z[j] - z[i];
            if (dx * dx + dy * dy + dz * dz <= r2) {
              action.accept(j);
            }
          }
        }
      }
    }
  }
}
