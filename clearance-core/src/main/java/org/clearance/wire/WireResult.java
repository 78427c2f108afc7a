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
 * @param setAside unclassified points the evidence shows are wire or isolated airborne points,
 *     not vegetation (docs/wire-finder.md, "Points set aside")
 */
public record WireResult(SpanLayout layout, List<SpanWires> spans,
    List<StructureChange> structureChanges, SetAside setAside) {

  /** A result without points set aside. */
  public WireResult(SpanLayout layout, List<SpanWires> spans,
      List<StructureChange> structureChanges) {
    this(layout, spans, structureChanges, SetAside.none());
  }

  public WireResult {
    Objects.requireNonNull(layout, "layout");
    Objects.requireNonNull(setAside, "setAside");
    spans = List.copyOf(spans);
    structureChanges = List.copyOf(structureChanges);
  }

  /** The result of the span with this id, if any. */
  public Optional<SpanWires> span(String spanId) {
    return spans.stream().filter(s -> s.span().id().equals(spanId)).findFirst();
  }
}
