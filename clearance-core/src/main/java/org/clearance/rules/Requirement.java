package org.clearance.rules;

import java.util.Objects;

/**
 * The distances a zone requires at one place of a span.
 *
 * @param zone the zone
 * @param radialM required radial distance, m, or NaN for a components zone
 * @param horizontalM required horizontal distance, m, or NaN for a radial zone
 * @param verticalM required vertical distance, m, or NaN for a radial zone
 */
public record Requirement(Zone zone, double radialM, double horizontalM, double verticalM) {
  public Requirement {
    Objects.requireNonNull(zone, "zone");
  }
}
