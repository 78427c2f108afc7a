package org.clearance.clearance;

import java.util.List;
import java.util.Objects;
import org.clearance.line.Span;

/**
 * A span ready for measuring: its fitted conductors in every condition.
 *
 * @param span the span
 * @param context what rule evaluation needs to know about it
 * @param conductors fitted conductors; may be empty for a span that cannot be assessed
 */
public record SpanModel(Span span, SpanContext context, List<ConductorModel> conductors) {

  public SpanModel {
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(context, "context");
    conductors = List.copyOf(conductors);
  }
}
