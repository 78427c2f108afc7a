package org.clearance.line;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A uniform plan grid from cells to lists of item indices (spans, corridors), for streaming
 * points past a few thousand items (methods.md 6.3: index the spans, stream the points). Only
 * cells that hold items exist, in an open-addressing table with a mixed hash (no boxing, no
 * collision chains along a diagonal line), so memory follows the line's length, not its bounding
 * box. Immutable after {@link Builder#build()}; safe to share between threads.
 */
public final class PlanCellIndex {

  private static final int[] NONE = new int[0];
  private static final long EMPTY = Long.MIN_VALUE;

  private final double cell;
  private final long[] keys;
  private final int[][] values;
  private final int mask;

  private PlanCellIndex(double cell, List<long[]> pairs) {
    this.cell = cell;
    pairs.sort((a, b) -> a[0] != b[0] ? Long.compare(a[0], b[0]) : Long.compare(a[1], b[1]));
    int distinct = 0;
    for (int i = 0; i < pairs.size(); i++) {
      if (i == 0 || pairs.get(i)[0] != pairs.get(i - 1)[0]) {
        distinct++;
      }
    }
    int cap = Integer.highestOneBit(Math.max(4, distinct * 2)) << 1;
    keys = new long[cap];
    Arrays.fill(keys, EMPTY);
    values = new int[cap][];
    mask = cap - 1;
    int i = 0;
    while (i < pairs.size()) {
      int j = i;
      while (j < pairs.size() && pairs.get(j)[0] == pairs.get(i)[0]) {
        j++;
      }
      int[] list = pairs.subList(i, j).stream().mapToInt(p -> (int) p[1]).distinct().toArray();
      int slot = slot(pairs.get(i)[0]);
      while (keys[slot] != EMPTY) {
        slot = (slot + 1) & mask;
      }
      keys[slot] = pairs.get(i)[0];
      values[slot] = list;
      i = j;
    }
  }

  /** Collects (cell, item) pairs. */
  public static final class Builder {
    private final double cell;
    private final List<long[]> pairs = new ArrayList<>();

    /** @param cell cell side, m (&gt; 0) */
    public Builder(double cell) {
      if (!(Double.isFinite(cell) && cell > 0)) {
        throw new IllegalArgumentException("cell side must be positive: " + cell);
      }
      this.cell = cell;
    }

    /** Puts item {@code item} in cell (cx, cy) (cell coordinates, see {@link #cellOf}). */
    public Builder add(long cx, long cy, int item) {
      pairs.add(new long[] {key(cx, cy), item});
      return this;
    }

    /** Puts item {@code item} in every cell the plan box touches, m. */
    public Builder addBox(double minX, double minY, double maxX, double maxY, int item) {
      for (long cx = cellOf(minX, cell); cx <= cellOf(maxX, cell); cx++) {
        for (long cy = cellOf(minY, cell); cy <= cellOf(maxY, cell); cy++) {
          add(cx, cy, item);
        }
      }
      return this;
    }

    public PlanCellIndex build() {
      return new PlanCellIndex(cell, pairs);
    }
  }

  /** The cell coordinate of a plan coordinate v, m, for cells of side {@code cell}, m. */
  public static long cellOf(double v, double cell) {
    return (long) Math.floor(v / cell);
  }

  /** The items of the cell holding plan point (x, y), m; never null, do not modify. */
  public int[] at(double x, double y) {
    return atCell(cellOf(x, cell), cellOf(y, cell));
  }

  /** The items of cell (cx, cy) (cell coordinates, see {@link #cellOf}); never null, do not
   * modify. */
  public int[] atCell(long cx, long cy) {
    long key = key(cx, cy);
    int slot = slot(key);
    while (true) {
      long k = keys[slot];
      if (k == key) {
        return values[slot];
      }
      if (k == EMPTY) {
        return NONE;
      }
      slot = (slot + 1) & mask;
    }
  }

  private int slot(long key) {
    return (int) ((key * 0x9E3779B97F4A7C15L) >>> 40) & mask;
  }

  private static long key(long cx, long cy) {
    return (cx << 32) ^ (cy & 0xFFFFFFFFL);
  }
}
