package org.clearance.line;

import java.util.List;
import java.util.Objects;

/**
 * One line laid out: its specification, its structures in sequence order, its spans and its
 * tension sections.
 *
 * @param spec the line specification
 * @param structures structures in sequence order (at least two, unmodifiable)
 * @param spans spans in sequence order, one fewer than structures (unmodifiable)
 * @param sections tension sections in sequence order (unmodifiable); span
 *     {@link Span#sectionIndex()} indexes this list
 */
public record LineLayout(
    LineSpec spec, List<Structure> structures, List<Span> spans, List<TensionSection> sections) {

  public LineLayout {
    Objects.requireNonNull(spec, "spec");
    structures = List.copyOf(structures);
    spans = List.copyOf(spans);
    sections = List.copyOf(sections);
  }

  /** The tension section a span of this line belongs to. */
  public TensionSection section(Span span) {
    return sections.get(span.sectionIndex());
  }
}
