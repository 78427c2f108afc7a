package org.clearance.wire;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A uniform plan grid from cells to the corridors whose bounding box covers them
 * (package-private): index the spans, stream the points (methods.md 6.3). Only cells near a
 * corridor exist, so memory follows the line length. Immutable and safe to share between threads.
 */
final class CorridorIndex {

  /** Cell side, m: a few corridor half-widths keeps the lists short and the map small. */
  static final double CELL_M = 32.0;
  private static final int[] NONE = new int[0];

  private final Map<Long, int[]> cells;

  /** @param boxes per corridor, its plan corners x0 y0 x1 y1 ... (any number of corners) */
  CorridorIndex(List<double[]> boxes) {
    Map<Long, List<Integer>> lists = new HashMap<>();
    for (int k = 0; k < boxes.size(); k++) {
      double[] c = boxes.get(k);
      double minX = Double.POSITIVE_INFINITY;
      double minY = Double.POSITIVE_INFINITY;
      double maxX = Double.NEGATIVE_INFINITY;
      double maxY = Double.NEGATIVE_INFINITY;
      for (int i = 0; i + 1 < c.length; i += 2) {
        minX = Math.min(minX, c[i]);
        maxX = Math.max(maxX, c[i]);
        minY = Math.min(minY, c[i + 1]);
        maxY = Math.max(maxY, c[i + 1]);
      }
      for (long cx = cell(minX); cx <= cell(maxX); cx++) {
        for (long cy = cell(minY); cy <= cell(maxY); cy++) {
          lists.computeIfAbsent(key(cx, cy), q -> new ArrayList<>()).add(k);
        }
      }
    }
    cells = new HashMap<>();
    lists.forEach((key, list) -> cells.put(key, list.stream().mapToInt(Integer::intValue)
        .toArray()));
  }

  private static long cell(double v) {
    return (long) Math.floor(v / CELL_M);
  }

  private static long key(long cx, long cy) {
    return (cx << 32) ^ (cy & 0xFFFFFFFFL);
  }

  /** Indices of the corridors whose box may contain plan point (x, y), m; never null. */
  int[] at(double x, double y) {
    int[] list = cells.get(key(cell(x), cell(y)));
    return list == null ? NONE : list;
  }
}
