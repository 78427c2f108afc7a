package org.clearance.run;

import java.util.List;
import java.util.Objects;
import org.clearance.clearance.ConditionMinimum;
import org.clearance.clearance.SpanContext;
import org.clearance.clearance.SpanStatus;
import org.clearance.wire.Crossing;

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
 * @param setAside unclassified points in the span's measuring box set aside as not vegetation
 * @param temperature the survey-time conductor temperature of the span and of its section
 * @param crossings wires crossing the span (docs/wire-finder.md, "Crossing wires"), by station
 */
public record SpanRecord(
    SpanContext context, String lineName, StructureRecord from, StructureRecord to,
    SpanStatus status, String reason, List<ConductorRecord> conductors,
    List<ConditionMinimum> minima, long pointsMeasured, long pointsKept, List<String> notes,
    SetAsideCounts setAside, SurveyTemperature temperature, List<Crossing> crossings) {

  /** A span without crossing wires. */
  public SpanRecord(SpanContext context, String lineName, StructureRecord from,
      StructureRecord to, SpanStatus status, String reason, List<ConductorRecord> conductors,
      List<ConditionMinimum> minima, long pointsMeasured, long pointsKept, List<String> notes,
      SetAsideCounts setAside, SurveyTemperature temperature) {
    this(context, lineName, from, to, status, reason, conductors, minima, pointsMeasured,
        pointsKept, notes, setAside, temperature, List.of());
  }

  /**
   * The conductor temperature during the survey (docs/clearance.md, "Survey temperature"): the
   * span's own, from the heat balance at its flight time or as given, and its tension section's,
   * which the change of state to every condition uses. NaN where not known.
   *
   * @param spanC the span's temperature, degC
   * @param spanSigmaC its standard uncertainty, degC
   * @param source {@code computed}, {@code measured}, {@code assumed} or {@code none}
   * @param sectionC the section's temperature used by the change of state, degC
   * @param sectionSigmaC its standard uncertainty, degC
   */
  public record SurveyTemperature(double spanC, double spanSigmaC, String source,
      double sectionC, double sectionSigmaC) {
    /** Nothing known (runs written before the field existed; lines without a temperature). */
    public static final SurveyTemperature NONE = new SurveyTemperature(Double.NaN, Double.NaN,
        "none", Double.NaN, Double.NaN);

    public SurveyTemperature {
      Objects.requireNonNull(source, "source");
    }
  }

  /** A span without a survey temperature record. */
  public SpanRecord(SpanContext context, String lineName, StructureRecord from,
      StructureRecord to, SpanStatus status, String reason, List<ConductorRecord> conductors,
      List<ConditionMinimum> minima, long pointsMeasured, long pointsKept, List<String> notes,
      SetAsideCounts setAside) {
    this(context, lineName, from, to, status, reason, conductors, minima, pointsMeasured,
        pointsKept, notes, setAside, SurveyTemperature.NONE);
  }

  /**
   * Unclassified points set aside in a span instead of measured, with the reason
   * (docs/wire-finder.md, "Points set aside"; docs/labelling.md).
   *
   * @param wire on a wire
   * @param structure on a structure (within the structure radius or on its cross arms)
   * @param airborne isolated airborne points (birds, high noise)
   * @param object parts of man-made objects (buildings, cranes, masts, fences, vehicles)
   * @param crossing points of wires crossing the span (service drops, lines crossing it)
   * @param wireTouched points on a wire touched by vegetation: not set aside but measured, as a
   *     branch on the wire and the wire cannot be told apart (docs/clearance.md, "A wire
   *     touched by vegetation"); counted here with the points set aside so a reviewer sees them
   * @param labelsDistrusted points whose vendor label was not believed (docs/labelling.md,
   *     "Partly labelled surveys"): measured as unclassified, or set aside as a man-made object
   *     (then in {@code object} too)
   */
  public record SetAsideCounts(long wire, long structure, long airborne, long object,
      long crossing, long wireTouched, long labelsDistrusted) {
    /** Nothing set aside. */
    public static final SetAsideCounts NONE = new SetAsideCounts(0, 0, 0, 0, 0);

    /** Counts without touched wire points or distrusted labels. */
    public SetAsideCounts(long wire, long structure, long airborne, long object, long crossing) {
      this(wire, structure, airborne, object, crossing, 0, 0);
    }

    /** Counts without crossing wires. */
    public SetAsideCounts(long wire, long structure, long airborne, long object) {
      this(wire, structure, airborne, object, 0);
    }

    /** Counts without man-made objects. */
    public SetAsideCounts(long wire, long structure, long airborne) {
      this(wire, structure, airborne, 0);
    }
  }

  /** A span without points set aside. */
  public SpanRecord(SpanContext context, String lineName, StructureRecord from,
      StructureRecord to, SpanStatus status, String reason, List<ConductorRecord> conductors,
      List<ConditionMinimum> minima, long pointsMeasured, long pointsKept, List<String> notes) {
    this(context, lineName, from, to, status, reason, conductors, minima, pointsMeasured,
        pointsKept, notes, SetAsideCounts.NONE);
  }

  public SpanRecord {
    Objects.requireNonNull(context, "context");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(reason, "reason");
    conductors = List.copyOf(conductors);
    minima = List.copyOf(minima);
    notes = List.copyOf(notes);
    Objects.requireNonNull(setAside, "setAside");
    Objects.requireNonNull(temperature, "temperature");
    crossings = List.copyOf(crossings);
  }

  /** The span id. */
  public String id() {
    return context.spanId();
  }
}
