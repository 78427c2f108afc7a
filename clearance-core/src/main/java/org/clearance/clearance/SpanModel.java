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
 * @param structureExclusionM in a survey without vegetation labels, points closer than this in
 *     plan to the span's structure centres are taken to be the structure, m; NaN for the
 *     engine's default (a lattice tower's reach): a pole line gives
 *     {@link ClearanceEngine#POLE_COLUMN_M}
 */
public record SpanModel(Span span, SpanContext context, List<ConductorModel> conductors,
    double structureExclusionM) {

  /** A span measured with the engine's default structure exclusion. */
  public SpanModel(Span span, SpanContext context, List<ConductorModel> conductors) {
    this(span, context, conductors, Double.NaN);
  }

  public SpanModel {
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(context, "context");
    conductors = List.copyOf(conductors);
  }
}
