package org.clearance.rules;

import java.util.Objects;

/**
 * A point inside a zone.
 *
 * @param zone the zone
 * @param condition name of the line condition in which the point is inside
 * @param group report group of that condition
 * @param conductor position name of the nearest conductor
 * @param stationM station of the nearest conductor point, m
 * @param component which distance governs: the radial one, or for a components zone the
 *     component with the smaller deficit (clearing it alone takes the point out of the zone)
 * @param actualM the point's distance in that component, m (absolute for vertical)
 * @param requiredM the zone's distance in that component at the station, m
 * @param deficitM required minus actual, m (&gt; 0)
 */
public record ZoneViolation(
    Zone zone,
    String condition,
    String group,
    String conductor,
    double stationM,
    Component component,
    double actualM,
    double requiredM,
    double deficitM) {

  /** The distance a finding refers to. */
  public enum Component {
    RADIAL,
    HORIZONTAL,
    VERTICAL
  }

  public ZoneViolation {
    Objects.requireNonNull(zone, "zone");
    Objects.requireNonNull(condition, "condition");
    Objects.requireNonNull(component, "component");
  }
}
