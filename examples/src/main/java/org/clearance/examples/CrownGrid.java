package org.clearance.examples;

import java.util.List;

/**
 * A plan grid over one span's corridor rectangle (in the span's station/offset frame) listing the
 * tree crowns that may cover each cell, for fast pulse tracing. Built per span and dropped after,
 * so memory stays small.
 */
final class CrownGrid {
  /** Cell size, m: a few crowns per cell. */
  private static final double CELL_M = 4.0;
  /** Margin around the corridor rectangle, m: covers the widest crown of a neighbour's tree. */
  private static final double PAD_M = 25.0;

  private final double sMin;
  private final double eMin;
  private final int cols;
  private final int rows;
  private final int[] start;
  private final int[] items;

  /**
   * @param corridor the corridor
   * @param span the span whose frame the grid uses
   * @param spanLength its plan length, m
   * @param trees all trees of the scene
   * @param candidates ids of the trees that may reach into the span's corridor
   */
  CrownGrid(Corridor corridor, int span, double spanLength, List<DemoTree> trees,
      int[] candidates) {
    double w = corridor.halfWidth();
    sMin = -w - PAD_M;
    eMin = -w - PAD_M;
    cols = (int) Math.ceil((spanLength + 2 * w + 2 * PAD_M) / CELL_M);
    rows = (int) Math.ceil((2 * w + 2 * PAD_M) / CELL_M);
    int[][] box = new int[candidates.length][];
    start = new int[cols * rows + 1];
    for (int k = 0; k < candidates.length; k++) {
      DemoTree t = trees.get(candidates[k]);
      double s = corridor.station(span, t.x(), t.y());
      double e = corridor.offset(span, t.x(), t.y());
      double r = t.crownRadiusM();
      box[k] = new int[] {Math.max(0, col(s - r)), Math.min(cols - 1, col(s + r)),
          Math.max(0, row(e - r)), Math.min(rows - 1, row(e + r))};
      for (int c = box[k][0]; c <= box[k][1]; c++) {
        for (int q = box[k][2]; q <= box[k][3]; q++) {
          start[q * cols + c + 1]++;
        }
      }
    }
    for (int k = 0; k < cols * rows; k++) {
      start[k + 1] += start[k];
    }
    items = new int[start[cols * rows]];
    int[] fill = new int[cols * rows];
    for (int k = 0; k < candidates.length; k++) {
      for (int c = box[k][0]; c <= box[k][1]; c++) {
        for (int q = box[k][2]; q <= box[k][3]; q++) {
          int cell = q * cols + c;
          items[start[cell] + fill[cell]++] = candidates[k];
        }
      }
    }
  }

  private int col(double s) {
    return (int) Math.floor((s - sMin) / CELL_M);
  }

  private int row(double e) {
    return (int) Math.floor((e - eMin) / CELL_M);
  }

  /** The cell holding (s, e) in the span frame, or -1 outside the grid. */
  int cell(double s, double e) {
    int c = col(s);
    int q = row(e);
    if (c < 0 || c >= cols || q < 0 || q >= rows) {
      return -1;
    }
    return q * cols + c;
  }

  /** First item index of a cell (from {@link #cell}). */
  int from(int cell) {
    return start[cell];
  }

  /** End (exclusive) item index of a cell. */
  int to(int cell) {
    return start[cell + 1];
  }

  /** Tree id at item index k. */
  int item(int k) {
    return items[k];
  }
}
