package org.clearance.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * The packing of spans into partitions by their expected points (longest-processing-time-first,
 * Graham 1969: within 4/3 - 1/(3m) of the best largest load on m partitions).
 */
class SpanPartitionerTest {

  /** A 2 km river crossing among 60 m distribution spans: the crossing, larger than a fair
   * share, gets a partition of its own; the short spans share the others evenly. Points at
   * about 4 million per km of corridor (common practice, no source): 8 000 000 for the
   * crossing, 240 000 per short span. */
  @Test
  void aLongCrossingGetsAPartitionOfItsOwnAndShortSpansArePacked() {
    long[] weights = new long[61];
    weights[17] = 8_000_000;
    for (int k = 0; k < weights.length; k++) {
      if (k != 17) {
        weights[k] = 240_000;
      }
    }
    SpanPartitioner p = new SpanPartitioner(weights, 4);
    assertEquals(4, p.numPartitions());
    int crossing = p.getPartition(17);
    for (int k = 0; k < weights.length; k++) {
      if (k != 17) {
        assertTrue(p.getPartition(k) != crossing, "span " + k + " shares the crossing's");
      }
    }
    long[] load = p.loads(weights);
    Arrays.sort(load);
    // 60 short spans over the 3 other partitions: 20 each, exactly
    assertEquals(20 * 240_000L, load[0]);
    assertEquals(20 * 240_000L, load[2]);
    assertEquals(8_000_000L, load[3]);
  }

  /** Graham's list-scheduling bound holds on uneven weights (largest load at most the mean
   * load plus the largest span: Graham 1966), and every span has a partition. */
  @Test
  void theLargestLoadIsWithinGrahamsBound() {
    long[] weights = new long[200];
    java.util.Random random = new java.util.Random(13);
    long total = 0;
    long largest = 0;
    for (int k = 0; k < weights.length; k++) {
      weights[k] = 50_000 + (long) (random.nextDouble() * random.nextDouble() * 5_000_000);
      total += weights[k];
      largest = Math.max(largest, weights[k]);
    }
    int m = 12;
    SpanPartitioner p = new SpanPartitioner(weights, m);
    long worst = Arrays.stream(p.loads(weights)).max().orElseThrow();
    assertTrue(worst <= (double) total / m + largest, worst + " vs " + total / m + largest);
    assertEquals(total, Arrays.stream(p.loads(weights)).sum());
    for (int k = 0; k < weights.length; k++) {
      int part = p.getPartition(k);
      assertTrue(part >= 0 && part < m);
    }
  }

  /** Fewer spans than partitions asked: one partition per span, none empty. */
  @Test
  void neverMorePartitionsThanSpans() {
    SpanPartitioner p = new SpanPartitioner(new long[] {5, 7, 9}, 12);
    assertEquals(3, p.numPartitions());
    assertEquals(3, Arrays.stream(new int[] {p.getPartition(0), p.getPartition(1),
        p.getPartition(2)}).distinct().count());
  }
}
