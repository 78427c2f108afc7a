package org.clearance.line;

import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * One structure (tower, pole) of a line, as the structures file gives it, in metres.
 *
 * @param id structure id, unique within its line, non-empty
 * @param lineId line id from the structures file, or an empty string when the file gives none
 * @param sequence order along the line (from the file, or the 1-based row order when the file has
 *     no {@code sequence}), unique within the line
 * @param type suspension or dead-end
 * @param x easting of the structure centre, m (survey CRS, converted to metres)
 * @param y northing of the structure centre, m
 * @param groundZ ground elevation at the structure, m, or NaN when not given
 * @param attachZ elevation of each given conductor attachment by position name, m; positions
 *     without a value are absent (unmodifiable, in file column order)
 * @param sourceFile the structures file, for messages
 * @param sourceLine 1-based line of the row (CSV) or of the feature (GeoJSON) in that file
 * @param equipment equipment the file lists on the structure (empty when none or not given)
 */
public record Structure(
    String id,
    String lineId,
    int sequence,
    StructureType type,
    double x,
    double y,
    double groundZ,
    Map<String, Double> attachZ,
    String sourceFile,
    int sourceLine,
    Set<PoleEquipment> equipment) {

  /** A structure without listed equipment. */
  public Structure(String id, String lineId, int sequence, StructureType type, double x, double y,
      double groundZ, Map<String, Double> attachZ, String sourceFile, int sourceLine) {
    this(id, lineId, sequence, type, x, y, groundZ, attachZ, sourceFile, sourceLine, Set.of());
  }

  public Structure {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(lineId, "lineId");
    Objects.requireNonNull(type, "type");
    Objects.requireNonNull(sourceFile, "sourceFile");
    if (id.isEmpty()) {
      throw new IllegalArgumentException("empty structure id");
    }
    if (!(Double.isFinite(x) && Double.isFinite(y))) {
      throw new IllegalArgumentException("plan position must be finite: " + x + ", " + y);
    }
    attachZ = Collections.unmodifiableMap(new LinkedHashMap<>(attachZ));
    equipment = equipment.isEmpty() ? Set.of()
        : Collections.unmodifiableSet(EnumSet.copyOf(equipment));
  }

  /** The listed equipment as files write it, in a fixed order, joined by {@code ;} ("" when none). */
  public String equipmentText() {
    return equipment.stream().sorted().map(PoleEquipment::fileName)
        .collect(Collectors.joining(";"));
  }

  /** Attachment elevation of a conductor position, m, or NaN when the file does not give it. */
  public double attachmentZ(String position) {
    Double z = attachZ.get(position);
    return z == null ? Double.NaN : z;
  }

  /** True for a dead-end structure. */
  public boolean isDeadEnd() {
    return type == StructureType.DEAD_END;
  }

  /** Location text for messages: {@code "<file>, line <n>"}. */
  public String where() {
    return sourceFile + ", line " + sourceLine;
  }
}
