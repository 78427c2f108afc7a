package org.clearance.line;

import java.util.Objects;

/**
 * One span: the stretch of line between two consecutive structures of one line.
 *
 * @param id {@code <line_id>/<from>-<to>}, or {@code <from>-<to>} when the structures file gives
 *     no line id (docs/line-inputs.md)
 * @param lineId id of the line specification the span belongs to
 * @param from structure at the start (lower sequence)
 * @param to structure at the end (higher sequence)
 * @param frame plan frame from the centre of {@code from} to the centre of {@code to}
 * @param lengthM plan (horizontal) length between the structure centres, m (&gt; 0)
 * @param sectionIndex 0-based index of the span's tension section within its line
 */
public record Span(
    String id,
    String lineId,
    Structure from,
    Structure to,
    SpanFrame frame,
    double lengthM,
    int sectionIndex) {

  public Span {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(from, "from");
    Objects.requireNonNull(to, "to");
    Objects.requireNonNull(frame, "frame");
    if (!(Double.isFinite(lengthM) && lengthM > 0)) {
      throw new IllegalArgumentException("span length must be positive: " + lengthM);
    }
    if (sectionIndex < 0) {
      throw new IllegalArgumentException("section index must be >= 0: " + sectionIndex);
    }
  }
}
