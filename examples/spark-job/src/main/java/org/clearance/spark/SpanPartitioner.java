package org.clearance.spark;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;
import org.apache.spark.Partitioner;

/**
 * Puts spans into partitions by their expected work, so that a 2 km river crossing and a 60 m
 * distribution span do not make one slow task and many idle ones: spans are taken largest first
 * and each goes to the partition with the least work so far (longest-processing-time-first
 * packing; Graham 1969, within 4/3 of the best makespan). A span larger than a fair share gets a
 * partition of its own; small spans are packed together. The weights are the plan's point
 * estimates (points are what every stage's cost follows).
 */
final class SpanPartitioner extends Partitioner {
  private static final long serialVersionUID = 1L;

  private final int[] partitionOf;
  private final int partitions;

  /**
   * @param weights per span (key 0..n-1), its expected points (&gt;= 0)
   * @param partitions partitions wanted, &gt;= 1 (fewer when there are fewer spans)
   */
  SpanPartitioner(long[] weights, int partitions) {
    this.partitions = Math.max(1, Math.min(partitions, weights.length));
    this.partitionOf = new int[weights.length];
    long[] load = new long[this.partitions];
    Integer[] order = IntStream.range(0, weights.length).boxed().toArray(Integer[]::new);
    Arrays.sort(order, Comparator.<Integer>comparingLong(k -> -weights[k])
        .thenComparingInt(k -> k));
    for (int k : order) {
      int best = 0;
      for (int p = 1; p < load.length; p++) {
        if (load[p] < load[best]) {
          best = p;
        }
      }
      partitionOf[k] = best;
      load[best] += Math.max(1, weights[k]);
    }
  }

  @Override
  public int numPartitions() {
    return partitions;
  }

  @Override
  public int getPartition(Object key) {
    return partitionOf[(Integer) key];
  }

  /** The expected points of each partition under this packing. */
  long[] loads(long[] weights) {
    long[] load = new long[partitions];
    for (int k = 0; k < weights.length; k++) {
      load[partitionOf[k]] += weights[k];
    }
    return load;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof SpanPartitioner p && Arrays.equals(partitionOf, p.partitionOf)
        && partitions == p.partitions;
  }

  @Override
  public int hashCode() {
    return Arrays.hashCode(partitionOf) * 31 + partitions;
  }
}
