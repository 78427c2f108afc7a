package org.clearance.run;

/**
 * A structure at a span end as stored in the run model.
 *
 * @param id structure id
 * @param x easting, m
 * @param y northing, m
 * @param groundZ ground elevation, m, or NaN
 * @param type {@code suspension} or {@code dead_end}
 * @param equipment equipment the structures file lists, e.g. {@code transformer;fuse} (kinds in a
 *     fixed order joined by {@code ;}; empty when none)
 */
public record StructureRecord(String id, double x, double y, double groundZ, String type,
    String equipment) {

  /** A structure without listed equipment. */
  public StructureRecord(String id, double x, double y, double groundZ, String type) {
    this(id, x, y, groundZ, type, "");
  }

  public StructureRecord {
    java.util.Objects.requireNonNull(equipment, "equipment");
  }
}
