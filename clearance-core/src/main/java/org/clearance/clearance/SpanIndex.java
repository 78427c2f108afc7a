package org.clearance.clearance;

import java.util.List;
import org.clearance.line.PlanCellIndex;

/**
 * The engine's plan grid from cells to the spans whose tree region (which holds the measuring
 * box) touches them ({@link PlanCellIndex}). Immutable; shared between threads.
 */
final class SpanIndex {

  /** Cell size, m: a few times the corridor half-width keeps lists short and the table small. */
  static final double CELL = 32.0;

  private final PlanCellIndex cells;

  SpanIndex(List<PreparedSpan> spans) {
    PlanCellIndex.Builder b = new PlanCellIndex.Builder(CELL);
    for (int i = 0; i < spans.size(); i++) {
      for (long[] c : spans.get(i).cells(CELL)) {
        b.add(c[0], c[1], i);
      }
    }
    cells = b.build();
  }

  /** Indices of the spans whose region may contain plan point (x, y), m; never null. */
  int[] spansAt(double x, double y) {
    return cells.at(x, y);
  }
}
