package org.clearance.clearance;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A uniform plan grid from cells to the spans whose measuring box covers them (methods.md 6.3:
 * index the spans, stream the points). Only cells near a span exist, in an open-addressing hash
 * table, so memory follows the line length, not its bounding box. Immutable after construction
 * and safe to share between threads.
 */
final class SpanIndex {

  /** Cell size, m: a few times the corridor half-width keeps lists short and the table small. */
  static final double CELL = 32.0;
  private static final int[] NONE = new int[0];

  private final long[] keys;
  private final int[][] values;
  private final int mask;

  SpanIndex(List<PreparedSpan> spans) {
    List<long[]> pairs = new ArrayList<>();
    for (int i = 0; i < spans.size(); i++) {
      PreparedSpan p = spans.get(i);
      for (long key : p.cells(CELL)) {
        pairs.add(new long[] {key, i});
      }
    }
    pairs.sort((a, b) -> a[0] != b[0] ? Long.compare(a[0], b[0]) : Long.compare(a[1], b[1]));
    int distinct = 0;
    for (int i = 0; i < pairs.size(); i++) {
      if (i == 0 || pairs.get(i)[0] != pairs.get(i - 1)[0]) {
        distinct++;
      }
    }
    int cap = Integer.highestOneBit(Math.max(4, distinct * 2)) << 1;
    keys = new long[cap];
    Arrays.fill(keys, Long.MIN_VALUE);
    values = new int[cap][];
    mask = cap - 1;
    int i = 0;
    while (i < pairs.size()) {
      int j = i;
      while (j < pairs.size() && pairs.get(j)[0] == pairs.get(i)[0]) {
        j++;
      }
      int[] list = new int[j - i];
      for (int k = i; k < j; k++) {
        list[k - i] = (int) pairs.get(k)[1];
      }
      put(pairs.get(i)[0], list);
      i = j;
    }
  }

  private void put(long key, int[] list) {
    int slot = slot(key);
    while (keys[slot] != Long.MIN_VALUE) {
      slot = (slot + 1) & mask;
    }
    keys[slot] = key;
    values[slot] = list;
  }

  private int slot(long key) {
    long h = key * 0x9E3779B97F4A7C15L;
    return (int) (h >>> 40) & mask;
  }

  /** Indices of the spans whose box may contain plan point (x, y), m; never null. */
  int[] spansAt(double x, double y) {
    long key = cellKey(x, y);
    int slot = slot(key);
    while (true) {
      long k = keys[slot];
      if (k == key) {
        return values[slot];
      }
      if (k == Long.MIN_VALUE) {
        return NONE;
      }
      slot = (slot + 1) & mask;
    }
  }

  /** Cell key of plan point (x, y), m. */
  static long cellKey(double x, double y) {
    long cx = (long) Math.floor(x / CELL);
    long cy = (long) Math.floor(y / CELL);
    return (cx << 32) ^ (cy & 0xFFFFFFFFL);
  }
}
