package org.clearance.wire;

import java.util.Arrays;

/**
 * A uniform 3D grid over a span's points in (s, e, z) for radius searches (package-private): the
 * points' indices sorted by cell key, and per distinct key its range (a voxel hash, methods.md
 * 6.3).
 */
final class PointGrid {
  private final SpanPoints p;
  private final double cell;
  private final long[] keys;
  private final int[] start;
  private final int[] members;

  /** @param cell cell side, m, &gt; 0 (about the search radius) */
  PointGrid(SpanPoints p, double cell) {
    this.p = p;
    this.cell = cell;
    int n = p.size();
    long[] k = new long[n];
    Integer[] order = new Integer[n];
    for (int i = 0; i < n; i++) {
      k[i] = key(cellOf(p.s(i)), cellOf(p.e(i)), cellOf(p.z(i)));
      order[i] = i;
    }
    Arrays.sort(order, (a, b) -> a.equals(b) ? 0
        : k[a] != k[b] ? Long.compare(k[a], k[b]) : Integer.compare(a, b));
    members = new int[n];
    long[] distinct = new long[n];
    int[] first = new int[n + 1];
    int d = 0;
    for (int i = 0; i < n; i++) {
      members[i] = order[i];
      if (i == 0 || k[order[i]] != k[order[i - 1]]) {
        distinct[d] = k[order[i]];
        first[d] = i;
        d++;
      }
    }
    first[d] = n;
    keys = Arrays.copyOf(distinct, d);
    start = Arrays.copyOf(first, d + 1);
  }

  private long cellOf(double v) {
    return (long) Math.floor(v / cell);
  }

  /** Packs three cell indices of 21 bits each (offsets keep negatives apart). */
  private static long key(long a, long b, long c) {
    long m = (1L << 21) - 1;
    return (((a + (1L << 20)) & m) << 42) | (((b + (1L << 20)) & m) << 21)
        | ((c + (1L << 20)) & m);
  }

  /**
   * Collects into {@code out} (cleared first) the indices of the points within {@code radius},
   * m, of point i, i itself included.
   */
  void within(int i, double radius, IntList out) {
    within(p.s(i), p.e(i), p.z(i), radius, out);
  }

  /**
   * Collects into {@code out} (cleared first) the indices of the points within {@code radius},
   * m, of the place at station si, offset ei, elevation zi (m).
   */
  void within(double si, double ei, double zi, double radius, IntList out) {
    out.clear();
    long reach = (long) Math.ceil(radius / cell);
    long cs = cellOf(si);
    long ce = cellOf(ei);
    long cz = cellOf(zi);
    double r2 = radius * radius;
    for (long a = cs - reach; a <= cs + reach; a++) {
      for (long b = ce - reach; b <= ce + reach; b++) {
        for (long c = cz - reach; c <= cz + reach; c++) {
          int slot = Arrays.binarySearch(keys, key(a, b, c));
          if (slot < 0) {
            continue;
          }
          for (int t = start[slot]; t < start[slot + 1]; t++) {
            int j = members[t];
            double ds = p.s(j) - si;
            double de = p.e(j) - ei;
            double dz = p.z(j) - zi;
            if (ds * ds + de * de + dz * dz <= r2) {
              out.add(j);
            }
          }
        }
      }
    }
  }
}
