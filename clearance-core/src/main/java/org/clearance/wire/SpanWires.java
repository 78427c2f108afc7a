package org.clearance.wire;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.clearance.line.Span;

/**
 * The conductors the wire finder fitted in one span.
 *
 * <p>The span is {@link WireStatus#FITTED} only when every phase position of its line
 * specification has a fitted conductor (all sub-conductors of a bundle); otherwise it is
 * {@link WireStatus#NOT_ASSESSED} with the reason, and must never be reported clear.
 *
 * @param span the span
 * @param status fitted or not assessed
 * @param reason why not assessed; empty when fitted
 * @param conductors specification positions in specification order (bundle sub-conductors in
 *     order), then extras; a position without a conductor appears as a not-assessed entry
 * @param candidatePoints survey points kept in the span's corridor as wire candidates
 * @param labelled true when the span's wires were seeded from ASPRS class 13/14 labels, false
 *     when found from geometric evidence alone
 * @param crossings wires crossing the span (service drops, lines crossing under or over it),
 *     by station: not conductors of the span
 */
public record SpanWires(
    Span span,
    WireStatus status,
    Optional<String> reason,
    List<FittedConductor> conductors,
    int candidatePoints,
    boolean labelled,
    List<Crossing> crossings) {

  /** A span without crossing wires. */
  public SpanWires(Span span, WireStatus status, Optional<String> reason,
      List<FittedConductor> conductors, int candidatePoints, boolean labelled) {
    this(span, status, reason, conductors, candidatePoints, labelled, List.of());
  }

  public SpanWires {
    crossings = List.copyOf(crossings);
    Objects.requireNonNull(span, "span");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(reason, "reason");
    conductors = List.copyOf(conductors);
    if ((status == WireStatus.FITTED) != reason.isEmpty()) {
      throw new IllegalArgumentException("a reason is given exactly when not assessed: "
          + span.id());
    }
  }

  /** The same span with these crossing wires. */
  public SpanWires withCrossings(List<Crossing> found) {
    return new SpanWires(span, status, reason, conductors, candidatePoints, labelled, found);
  }

  /** The conductors with status fitted. */
  public List<FittedConductor> fitted() {
    return conductors.stream().filter(FittedConductor::isFitted).toList();
  }

  /** The conductor with this name, if any. */
  public Optional<FittedConductor> conductor(String name) {
    return conductors.stream().filter(c -> c.name().equals(name)).findFirst();
  }
}
