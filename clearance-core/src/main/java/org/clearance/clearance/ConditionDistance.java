package org.clearance.clearance;

import java.util.Objects;

/**
 * The distance from one vegetation point to the nearest conductor of its span in one line
 * condition.
 *
 * @param condition condition name: {@link #SURVEY} for the surveyed state, else the name of a
 *     condition of the line specification
 * @param group report group: {@code survey}, {@code hot}, {@code blowout} or {@code ice}
 * @param distance true 3D distance to the nearest conductor, m (&gt;= 0); for swinging
 *     conditions the minimum over all swing angles in the case's range
 * @param horizontal plan distance between the point and the nearest conductor point, m (&gt;= 0)
 * @param vertical height of the point above the nearest conductor point, m (negative below)
 * @param conductor position name of the nearest conductor (e.g. {@code B})
 * @param station horizontal station of the nearest conductor point from the span's first
 *     structure, m
 */
public record ConditionDistance(
    String condition,
    String group,
    double distance,
    double horizontal,
    double vertical,
    String conductor,
    double station) {

  /** Name and group of the surveyed state. */
  public static final String SURVEY = "survey";

  public ConditionDistance {
    Objects.requireNonNull(condition, "condition");
    Objects.requireNonNull(group, "group");
    Objects.requireNonNull(conductor, "conductor");
  }
}
