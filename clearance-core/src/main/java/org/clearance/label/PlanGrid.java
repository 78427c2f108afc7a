package org.clearance.label;

import java.util.List;
import java.util.function.IntConsumer;
import org.clearance.line.SpanFrame;

/**
 * Plan cells over the line that say which spans' regions and which block windows may hold a
 * point of a cell, so that placing a point costs a few span tests instead of one per span of
 * the line. The answers are those of the exact tests: a cell lists every span whose region's
 * bounding box (padded by {@link #PAD_M}) meets it, in span order, so the first listed span
 * whose region holds a point is the first span of the line that does ({@link LabelPoints#owner}).
 */
final class PlanGrid {

  /** Least cell side, m: a few cells per span of a few hundred metres. */
  static final double MIN_CELL_M = 50.0;
  /** Most cells: the cell side grows on very long lines so the grid stays a few MiB. */
  static final int MAX_CELLS = 1 << 20;
  /** Padding of every bounding box, m: far more than the rounding of its corners. */
  static final double PAD_M = 1.0;

  private final List<SpanFrame> frames;
  private final double regionM;
  private final double x0;
  private final double y0;
  private final double cell;
  private final int nx;
  private final int ny;
  private final int[] spanStart;
  private final int[] spanList;
  private final int[] windowStart;
  private final int[] windowList;

  /**
   * @param frames every span of the line, in order
   * @param regionM the region looked at around each chord, m
   * @param windows the block windows, in block order
   */
  PlanGrid(List<SpanFrame> frames, double regionM, List<LabelWindow> windows) {
    this.frames = frames;
    this.regionM = regionM;
    double[][] spanBoxes = new double[frames.size()][];
    for (int k = 0; k < frames.size(); k++) {
      spanBoxes[k] = regionBox(frames.get(k), regionM);
    }
    double[][] windowBoxes = new double[windows.size()][];
    double ax = Double.POSITIVE_INFINITY;
    double bx = Double.NEGATIVE_INFINITY;
    double ay = Double.POSITIVE_INFINITY;
    double by = Double.NEGATIVE_INFINITY;
    for (int b = 0; b < windows.size(); b++) {
      LabelWindow w = windows.get(b);
      windowBoxes[b] = new double[] {w.minX() - PAD_M, w.maxX() + PAD_M, w.minY() - PAD_M,
          w.maxY() + PAD_M};
      ax = Math.min(ax, windowBoxes[b][0]);
      bx = Math.max(bx, windowBoxes[b][1]);
      ay = Math.min(ay, windowBoxes[b][2]);
      by = Math.max(by, windowBoxes[b][3]);
    }
    for (double[] box : spanBoxes) {
      ax = Math.min(ax, box[0]);
      bx = Math.max(bx, box[1]);
      ay = Math.min(ay, box[2]);
      by = Math.max(by, box[3]);
    }
    if (frames.isEmpty()) {
      ax = 0;
      bx = 0;
      ay = 0;
      by = 0;
    }
    x0 = ax;
    y0 = ay;
    cell = Math.max(MIN_CELL_M, Math.sqrt((bx - ax) * (by - ay) / MAX_CELLS) * 1.01);
    nx = (int) Math.floor((bx - ax) / cell) + 1;
    ny = (int) Math.floor((by - ay) / cell) + 1;
    spanStart = new int[nx * ny + 1];
    spanList = fill(spanBoxes, spanStart);
    windowStart = new int[nx * ny + 1];
    windowList = fill(windowBoxes, windowStart);
  }

  /** The plan bounding box {minX, maxX, minY, maxY} of a span's region, padded, m. */
  private static double[] regionBox(SpanFrame f, double regionM) {
    double[] box = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
        Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
    for (double s : new double[] {-regionM, f.length() + regionM}) {
      for (double e : new double[] {-regionM, regionM}) {
        box[0] = Math.min(box[0], f.x(s, e) - PAD_M);
        box[1] = Math.max(box[1], f.x(s, e) + PAD_M);
        box[2] = Math.min(box[2], f.y(s, e) - PAD_M);
        box[3] = Math.max(box[3], f.y(s, e) + PAD_M);
      }
    }
    return box;
  }

  /** The items (in order) listed per cell, as a compressed row table with {@code start}. */
  private int[] fill(double[][] boxes, int[] start) {
    for (double[] box : boxes) {
      forCells(box, c -> start[c + 1]++);
    }
    for (int c = 0; c < nx * ny; c++) {
      start[c + 1] += start[c];
    }
    int[] list = new int[start[nx * ny]];
    int[] at = start.clone();
    for (int k = 0; k < boxes.length; k++) {
      int item = k;
      forCells(boxes[k], c -> list[at[c]++] = item);
    }
    return list;
  }

  private void forCells(double[] box, IntConsumer action) {
    for (int iy = clampY(box[2]); iy <= clampY(box[3]); iy++) {
      for (int ix = clampX(box[0]); ix <= clampX(box[1]); ix++) {
        action.accept(iy * nx + ix);
      }
    }
  }

  private int clampX(double px) {
    return Math.max(0, Math.min(nx - 1, (int) Math.floor((px - x0) / cell)));
  }

  private int clampY(double py) {
    return Math.max(0, Math.min(ny - 1, (int) Math.floor((py - y0) / cell)));
  }

  /** The cell of a plan point, or -1 outside the grid (then no region holds it). */
  int cellOf(double px, double py) {
    double fx = Math.floor((px - x0) / cell);
    double fy = Math.floor((py - y0) / cell);
    if (!(fx >= 0 && fx < nx && fy >= 0 && fy < ny)) {
      return -1;
    }
    return (int) fy * nx + (int) fx;
  }

  /** The first span (index in the frames) whose region holds the plan point in {@code cell},
   * or -1: the same as {@link LabelPoints#owner}. */
  int owner(int cell, double px, double py) {
    if (cell < 0) {
      return -1;
    }
    for (int t = spanStart[cell]; t < spanStart[cell + 1]; t++) {
      int k = spanList[t];
      if (LabelPoints.holds(frames.get(k), regionM, px, py)) {
        return k;
      }
    }
    return -1;
  }

  /** Where the windows that may hold a point of {@code cell} start in {@link #window}. */
  int windowsFrom(int cell) {
    return windowStart[cell];
  }

  /** One past where the windows of {@code cell} end in {@link #window}. */
  int windowsTo(int cell) {
    return windowStart[cell + 1];
  }

  /** The block of the {@code t}-th listed window. */
  int window(int t) {
    return windowList[t];
  }
}
