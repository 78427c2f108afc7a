package org.clearance.wire;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.line.SpanLayout;

/**
 * Everything the wire finder found.
 *
 * @param layout the spans the conductors were fitted in: the given layout, or the layout
 *     rebuilt with the structure changes applied
 * @param spans one entry per span of {@code layout}, in layout order
 * @param structureChanges every change made to the structures file's positions
 */
public record WireResult(SpanLayout layout, List<SpanWires> spans,
    List<StructureChange> structureChanges) {

  public WireResult {
    Objects.requireNonNull(layout, "layout");
    spans = List.copyOf(spans);
    structureChanges = List.copyOf(structureChanges);
  }

  /** The result of the span with this id, if any. */
  public Optional<SpanWires> span(String spanId) {
    return spans.stream().filter(s -> s.span().id().equals(spanId)).findFirst();
  }
}
