package org.clearance.run;

import java.util.List;
import java.util.Objects;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanStatus;

/**
 * One span of a run as stored in the run model.
 *
 * @param context span id, line id, voltage, altitude, length
 * @param lineName human-readable line name
 * @param from first structure
 * @param to second structure
 * @param status assessment status
 * @param reason why the span is not (fully) assessed, or empty
 * @param conductors conductors found or expected
 * @param minima closest vegetation per condition (run order)
 * @param pointsMeasured vegetation points measured in the span's box
 * @param pointsKept points stored within the keep radius
 * @param notes further remarks for the report (structure refinements, excluded points ...)
 */
public record SpanRecord(
    SpanContext context, String lineName, StructureRecord from, StructureRecord to,
    SpanStatus status, String reason, List<ConductorRecord> conductors,
    List<ConditionMinimum> minima, long pointsMeasured, long pointsKept, List<String> notes) {

  public SpanRecord {
    Objects.requireNonNull(context, "context");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(reason, "reason");
    conductors = List.copyOf(conductors);
    minima = List.copyOf(minima);
    notes = List.copyOf(notes);
  }

  /** The span id. */
  public String id() {
    return context.spanId();
  }
}
