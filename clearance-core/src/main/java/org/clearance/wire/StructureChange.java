package org.clearance.wire;

import java.util.Locale;
import java.util.Objects;

/**
 * One change the wire finder made to the structures file's positions, from tower points in the
 * survey, or, on a pole line, the outcome of looking for each pole (confirmed or not found).
 *
 * @param lineId line of the structure
 * @param structureId id of the structure (for an added one, the automatic id given to it)
 * @param kind moved or added
 * @param fromX easting the structures file gave, m; NaN for an added structure
 * @param fromY northing the structures file gave, m; NaN for an added structure
 * @param toX easting used from now on (centre of the tower points), m
 * @param toY northing used from now on, m
 * @param evidencePoints survey points in the tower the position was taken from
 * @param evidence what the position was taken from, in plain words
 */
public record StructureChange(String lineId, String structureId, Kind kind, double fromX,
    double fromY, double toX, double toY, int evidencePoints, String evidence) {

  /** What was changed. */
  public enum Kind {
    /** The structures file's position was more than the tolerance away from the tower. */
    MOVED,
    /** A tower stands between two consecutive structures of the file and was added. */
    ADDED,
    /** A pole line's pole was found within 0.2 m of the file's position, which is kept: from
     * and to are the file's position. */
    CONFIRMED,
    /** A pole line's pole was not found near the file's position, or two candidates were: the
     * position is kept (from and to are the file's position), see the evidence text. */
    NOT_FOUND
  }

  /** One console line for people (the same in `check` and `wires`). */
  public String describe() {
    return switch (kind) {
      case MOVED -> String.format(Locale.ROOT, "structure %s (line %s) moved %.1f m to %.3f, %.3f"
          + " (%d survey points: %s)", structureId, lineId, shiftM(), toX, toY, evidencePoints,
          evidence);
      case CONFIRMED -> String.format(Locale.ROOT, "structure %s (line %s) pole found, position"
          + " kept (%d survey points: %s)", structureId, lineId, evidencePoints, evidence);
      case NOT_FOUND -> String.format(Locale.ROOT, "structure %s (line %s) pole not found in the"
          + " points, position kept: %s", structureId, lineId, evidence);
      case ADDED -> String.format(Locale.ROOT, "structure %s (line %s) added at %.3f, %.3f: the"
          + " structures file has none there (%d survey points: %s)", structureId, lineId, toX,
          toY, evidencePoints, evidence);
    };
  }

  /** Whether the change moved or added a structure (else it only reports a pole check). */
  public boolean changesLayout() {
    return kind == Kind.MOVED || kind == Kind.ADDED;
  }

  public StructureChange {
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(structureId, "structureId");
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(evidence, "evidence");
  }

  /** Plan distance moved, m; NaN for an added structure. */
  public double shiftM() {
    return Math.hypot(toX - fromX, toY - fromY);
  }
}
