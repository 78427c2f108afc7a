package org.clearance.wire;

import java.util.List;
import org.clearance.line.PlanCellIndex;

/**
 * A uniform plan grid from cells to the corridors whose bounding box covers them
 * (package-private): index the spans, stream the points (methods.md 6.3). Only cells near a
 * corridor exist, so memory follows the line length. Immutable and safe to share between threads.
 */
final class CorridorIndex {

  /** Cell side, m: a few corridor half-widths keeps the lists short and the map small. */
  static final double CELL_M = 32.0;

  private final PlanCellIndex cells;

  /** @param boxes per corridor, its plan corners x0 y0 x1 y1 ... (any number of corners) */
  CorridorIndex(List<double[]> boxes) {
    PlanCellIndex.Builder b = new PlanCellIndex.Builder(CELL_M);
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
      b.addBox(minX, minY, maxX, maxY, k);
    }
    cells = b.build();
  }

  /** Indices of the corridors whose box may contain plan point (x, y), m; never null. */
  int[] at(double x, double y) {
    return cells.at(x, y);
  }
}
