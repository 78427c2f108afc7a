package org.clearance.clearance;

/**
 * The closest vegetation point of a span in one condition.
 *
 * @param condition condition name
 * @param group report group
 * @param distance smallest distance, m, or NaN when no vegetation point was measured
 * @param horizontal its horizontal component, m, or NaN
 * @param vertical its vertical component (point above conductor positive), m, or NaN
 * @param conductor the conductor it is closest to, or empty
 * @param x easting of the vegetation point, m, or NaN
 * @param y northing, m, or NaN
 * @param z elevation, m, or NaN
 */
public record ConditionMinimum(
    String condition, String group, double distance, double horizontal, double vertical,
    String conductor, double x, double y, double z) {}
