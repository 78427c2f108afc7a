package org.clearance.wire;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import smile.clustering.DBSCAN;
import smile.clustering.PartitionClustering;

/**
 * Clusters seed points into wire pieces with DBSCAN (Ester, Kriegel, Sander and Xu 1996, KDD-96
 * pp. 226-231; smile-core {@link DBSCAN}) under the anisotropic metric
 * d^2 = (ds / k)^2 + de^2 + dz^2 (methods.md 1.5), so that sparse points along one wire link
 * while wires a metre apart across the span do not (package-private). The metric is Euclidean
 * on (s / k, e, z), so smile's KD-tree search serves it.
 */
final class WireClusters {

  private WireClusters() {}

  /**
   * Clusters the seeds.
   *
   * @param p the span's points
   * @param seeds indices of the seed points
   * @param stretch k, &gt;= 1
   * @param radius DBSCAN radius in the stretched metric, m
   * @param minPoints DBSCAN core-point count
   * @return clusters as point indices (sorted), largest first; noise left out
   */
  static List<int[]> of(SpanPoints p, int[] seeds, double stretch, double radius,
      int minPoints) {
    return of(p, seeds, stretch, radius, minPoints, s -> 0);
  }

  /**
   * Clusters the seeds with their elevations taken relative to a reference profile along the
   * span ({@link SagReference}): with the common sag shape of a span's wires removed, the steep
   * ends of stacked conductors no longer link diagonally to the next wire (issue 15).
   *
   * @param reference reference elevation at a station, m (station in m)
   */
  static List<int[]> of(SpanPoints p, int[] seeds, double stretch, double radius,
      int minPoints, DoubleUnaryOperator reference) {
    List<int[]> out = new ArrayList<>();
    if (seeds.length < minPoints) {
      return out;
    }
    double[][] data = new double[seeds.length][];
    for (int k = 0; k < seeds.length; k++) {
      int i = seeds[k];
      double s = p.s(i);
      data[k] = new double[] {s / stretch, p.e(i), p.z(i) - reference.applyAsDouble(s)};
    }
    DBSCAN<double[]> db = DBSCAN.fit(data, minPoints, radius);
    IntList[] groups = new IntList[db.k];
    for (int g = 0; g < groups.length; g++) {
      groups[g] = new IntList();
    }
    for (int k = 0; k < seeds.length; k++) {
      int label = db.y[k];
      if (label != PartitionClustering.OUTLIER && label >= 0 && label < groups.length) {
        groups[label].add(seeds[k]);
      }
    }
    for (IntList g : groups) {
      if (g.size() > 0) {
        int[] a = g.toArray();
        java.util.Arrays.sort(a);
        out.add(a);
      }
    }
    out.sort(Comparator.<int[]>comparingInt(a -> -a.length).thenComparingInt(a -> a[0]));
    return out;
  }
}
