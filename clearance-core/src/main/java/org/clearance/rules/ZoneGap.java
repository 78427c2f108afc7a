package org.clearance.rules;

import java.util.Objects;

/**
 * A zone that applies but could not be assessed, and why.
 *
 * @param zone zone name
 * @param reason why, in plain words
 */
public record ZoneGap(String zone, String reason) {
  public ZoneGap {
    Objects.requireNonNull(zone, "zone");
    Objects.requireNonNull(reason, "reason");
  }
}
