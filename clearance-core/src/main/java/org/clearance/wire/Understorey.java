package org.clearance.wire;

import java.util.HashMap;
import java.util.Map;

/**
 * A sparse plan grid over one span corridor holding, per {@value #CELL_M} m cell (station and
 * offset in the span's frame), the height above ground of the highest non-ground point below the
 * candidate height (package-private). It is the evidence of what stands under a small group of
 * candidates ({@link PointEvidence}): a bird or high noise has open air below it, the top of a
 * crown has the rest of its crown.
 *
 * <p>Only cells holding such a point are stored (one map entry each): memory follows the
 * corridor's area, never the survey's size. Not thread-safe; one per reading thread, merged with
 * {@link #addAll}.
 */
final class Understorey {
  /** Cell size of the grid, m: finer than the column radius of {@link PointEvidence}. */
  static final double CELL_M = 1.0;
  /** Least height above ground of a point recorded, m: above ground returns, the ground model's
   * error and grass, so that an unclassified ground return is never taken for a crown (common
   * practice, no source). */
  static final double MIN_HEIGHT_M = 0.5;

  private final Map<Long, Float> highest = new HashMap<>();

  /** Records a point at station s, offset e (m) standing hag m above ground. */
  void add(double s, double e, double hag) {
    if (!(hag >= MIN_HEIGHT_M)) {
      return;
    }
    highest.merge(cell(index(s), index(e)), (float) hag, Math::max);
  }

  /** Keeps the higher value of every cell of another grid (same corridor). */
  void addAll(Understorey other) {
    other.highest.forEach((k, v) -> highest.merge(k, v, Math::max));
  }

  /** Number of cells holding a point. */
  int cells() {
    return highest.size();
  }

  /**
   * The highest recorded height above ground in the cells that meet the plan box (m), or
   * negative infinity when none holds a point.
   */
  double highestIn(double s0, double s1, double e0, double e1) {
    double best = Double.NEGATIVE_INFINITY;
    long i1 = index(s1);
    long j1 = index(e1);
    for (long i = index(s0); i <= i1; i++) {
      for (long j = index(e0); j <= j1; j++) {
        Float v = highest.get(cell(i, j));
        if (v != null) {
          best = Math.max(best, v);
        }
      }
    }
    return best;
  }

  private static long index(double v) {
    return (long) Math.floor(v / CELL_M);
  }

  private static long cell(long i, long j) {
    return (i << 32) ^ (j & 0xFFFFFFFFL);
  }
}
