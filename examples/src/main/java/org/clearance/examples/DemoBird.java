package org.clearance.examples;

import java.util.Objects;

/**
 * A bird seen by the survey (truth): a few points perched just above a wire, or in flight.
 *
 * @param id index in {@link DemoScene#birds()}
 * @param span index of the span
 * @param position wire position the bird sits on, or an empty string for a bird in flight
 * @param x easting of the bird, m
 * @param y northing, m
 * @param z elevation, m
 * @param pointCount number of points the survey has on it
 */
public record DemoBird(int id, int span, String position, double x, double y, double z,
    int pointCount) {

  public DemoBird {
    Objects.requireNonNull(position, "position");
  }

  /** True for a bird perched on a wire. */
  public boolean perched() {
    return !position.isEmpty();
  }
}
