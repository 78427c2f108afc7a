package org.clearance.assess;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.clearance.io.DisjointSets;

/**
 * Groups points into sites by single linkage: two points belong to the same site when a chain of
 * points joins them in which each step is at most the link distance (3D). This is the
 * connected-components reading of single-linkage clustering cut at the link distance (Gower and
 * Ross 1969, "Minimum spanning trees and single linkage cluster analysis", Applied Statistics
 * 18(1)); it is computed with a union-find over a voxel grid whose cell is the link distance, so
 * each point is compared only with the points of its own and the 26 neighbouring cells.
 *
 * <p>Cost about n times the points per neighbourhood; memory a few arrays of n plus the grid.
 */
public final class SiteClusterer {

  /** Cells per axis of the packed key: 2^21 cells of 1.5 m span about 3000 km. */
  private static final int KEY_BITS = 21;
  private static final long KEY_MASK = (1L << KEY_BITS) - 1;

  private final double link;

  /**
   * @param linkDistanceM largest step between two points of one site, m (&gt; 0, finite)
   */
  public SiteClusterer(double linkDistanceM) {
    if (!(Double.isFinite(linkDistanceM) && linkDistanceM > 0)) {
      throw new IllegalArgumentException("link distance must be positive: " + linkDistanceM);
    }
    this.link = linkDistanceM;
  }

  /** Shortcut: {@code new SiteClusterer(linkDistanceM).labels(x, y, z)}. */
  public static int[] cluster(double[] x, double[] y, double[] z, double linkDistanceM) {
    return new SiteClusterer(linkDistanceM).labels(x, y, z);
  }

  /**
   * The site of every point.
   *
   * @param x eastings, m (finite)
   * @param y northings, m (finite)
   * @param z elevations, m (finite)
   * @return one label per point, 0 .. sites-1, numbered in order of each site's first point
   * @throws IllegalArgumentException when the arrays differ in length or hold a non-finite value
   */
  public int[] labels(double[] x, double[] y, double[] z) {
    int n = x.length;
    if (y.length != n || z.length != n) {
      throw new IllegalArgumentException("coordinate arrays differ in length");
    }
    if (n == 0) {
      return new int[0];
    }
    double minX = Double.POSITIVE_INFINITY;
    double minY = Double.POSITIVE_INFINITY;
    double minZ = Double.POSITIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      if (!(Double.isFinite(x[i]) && Double.isFinite(y[i]) && Double.isFinite(z[i]))) {
        throw new IllegalArgumentException("point " + i + " has a non-finite coordinate");
      }
      minX = Math.min(minX, x[i]);
      minY = Math.min(minY, y[i]);
      minZ = Math.min(minZ, z[i]);
    }
    Map<Long, int[]> cells = new HashMap<>();
    for (int i = 0; i < n; i++) {
      long key = key(cell(x[i], minX), cell(y[i], minY), cell(z[i], minZ));
      int[] list = cells.get(key);
      cells.put(key, append(list == null ? new int[4] : list, i));
    }
    int[] parent = new int[n];
    for (int i = 0; i < n; i++) {
      parent[i] = i;
    }
    double link2 = link * link;
    for (int i = 0; i < n; i++) {
      long ci = cell(x[i], minX);
      long cj = cell(y[i], minY);
      long ck = cell(z[i], minZ);
      for (long di = -1; di <= 1; di++) {
        for (long dj = -1; dj <= 1; dj++) {
          for (long dk = -1; dk <= 1; dk++) {
            if (ci + di < 0 || cj + dj < 0 || ck + dk < 0) {
              continue;
            }
            int[] members = cells.get(key(ci + di, cj + dj, ck + dk));
            if (members == null) {
              continue;
            }
            for (int m = 1; m <= members[0]; m++) {
              int j = members[m];
              if (j > i && squared(x, y, z, i, j) <= link2) {
                DisjointSets.union(parent, i, j);
              }
            }
          }
        }
      }
    }
    int[] label = new int[n];
    int[] rootLabel = new int[n];
    Arrays.fill(rootLabel, -1);
    int next = 0;
    for (int i = 0; i < n; i++) {
      int r = DisjointSets.root(parent, i);
      if (rootLabel[r] < 0) {
        rootLabel[r] = next++;
      }
      label[i] = rootLabel[r];
    }
    return label;
  }

  private long cell(double v, double min) {
    long c = (long) Math.floor((v - min) / link);
    if (c > KEY_MASK - 1) {
      throw new IllegalArgumentException("points spread too far to cluster at a link of "
          + link + " m");
    }
    return c;
  }

  private static long key(long i, long j, long k) {
    return (i << (2 * KEY_BITS)) | (j << KEY_BITS) | k;
  }

  private static double squared(double[] x, double[] y, double[] z, int i, int j) {
    double dx = x[i] - x[j];
    double dy = y[i] - y[j];
    double dz = z[i] - z[j];
    return dx * dx + dy * dy + dz * dz;
  }

  /** Appends to a growable int list whose element 0 holds the count. */
  private static int[] append(int[] list, int value) {
    int count = list[0];
    int[] out = count + 1 < list.length ? list : Arrays.copyOf(list, list.length * 2);
    out[count + 1] = value;
    out[0] = count + 1;
    return out;
  }
}
