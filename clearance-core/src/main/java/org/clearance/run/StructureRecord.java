package org.clearance.run;

/**
 * A structure at a span end as stored in the run model.
 *
 * @param id structure id
 * @param x easting, m
 * @param y northing, m
 * @param groundZ ground elevation, m, or NaN
 * @param type {@code suspension} or {@code dead_end}
 */
public record StructureRecord(String id, double x, double y, double groundZ, String type) {}
