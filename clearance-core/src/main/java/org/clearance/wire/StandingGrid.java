package org.clearance.wire;

import java.util.HashMap;
import java.util.Map;

/**
 * A sparse plan grid over one span corridor and a {@value #BAND_M} m band around it, holding per
 * {@value #CELL_M} m cell (station and offset in the span's frame) the height above ground of the
 * highest non-ground point that is not a wire candidate: below the candidate height, or in the
 * band, or labelled by the survey as something else (package-private). It is the evidence of
 * what stands under a small group of candidates ({@link PointEvidence}): a bird or high noise has
 * open air below it, the top of a crown has the rest of its crown, which may spread beyond the
 * corridor's edge.
 *
 * <p>Cells are stored in tiles of {@value #TILE} by {@value #TILE} cells, only tiles holding such
 * a point (about 4.4 bytes a cell): memory follows the corridor's area, never the survey's
 * size. Not thread-safe; one per reading thread, merged with {@link #addAll}.
 */
final class StandingGrid {
  /** Cell size of the grid, m: finer than the column radius of {@link PointEvidence}. */
  static final double CELL_M = 1.0;
  /** Band around the corridor also recorded, m: the column searched under a group at the
   * corridor's edge reaches this far out ({@link PointEvidence#COLUMN_MARGIN_M}). */
  static final double BAND_M = PointEvidence.COLUMN_MARGIN_M;
  /** Least height above ground of a point recorded, m: above ground returns, the ground model's
   * error and grass, so that an unclassified ground return is never taken for a crown (common
   * practice, no source). */
  static final double MIN_HEIGHT_M = 0.5;
  /** Cells along a tile's side. */
  static final int TILE = 16;

  private final Map<Long, float[]> tiles = new HashMap<>();

  /** Records a point at station s, offset e (m) standing hag m above ground. */
  void add(double s, double e, double hag) {
    if (!(hag >= MIN_HEIGHT_M)) {
      return;
    }
    long i = index(s);
    long j = index(e);
    float[] t = tiles.computeIfAbsent(key(Math.floorDiv(i, TILE), Math.floorDiv(j, TILE)),
        k -> newTile());
    int c = slot(i, j);
    t[c] = Math.max(t[c], (float) hag);
  }

  /** Keeps the higher value of every cell of another grid (same corridor). */
  void addAll(StandingGrid other) {
    other.tiles.forEach((k, v) -> {
      float[] t = tiles.computeIfAbsent(k, x -> newTile());
      for (int c = 0; c < t.length; c++) {
        t[c] = Math.max(t[c], v[c]);
      }
    });
  }

  /** Number of cells holding a point. */
  int cells() {
    int n = 0;
    for (float[] t : tiles.values()) {
      for (float v : t) {
        n += v > Float.NEGATIVE_INFINITY ? 1 : 0;
      }
    }
    return n;
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
        float[] t = tiles.get(key(Math.floorDiv(i, TILE), Math.floorDiv(j, TILE)));
        if (t != null) {
          best = Math.max(best, t[slot(i, j)]);
        }
      }
    }
    return best;
  }

  private static float[] newTile() {
    float[] t = new float[TILE * TILE];
    java.util.Arrays.fill(t, Float.NEGATIVE_INFINITY);
    return t;
  }

  private static int slot(long i, long j) {
    return (int) (Math.floorMod(i, TILE) * TILE + Math.floorMod(j, TILE));
  }

  private static long index(double v) {
    return (long) Math.floor(v / CELL_M);
  }

  private static long key(long i, long j) {
    return (i << 32) ^ (j & 0xFFFFFFFFL);
  }
}
