package org.clearance.rules;

import java.util.Objects;
import java.util.Optional;

/**
 * A zone whose distances are resolved for one span.
 *
 * @param zone the zone
 * @param radial the radial distance, for a radial zone
 * @param horizontal the horizontal distance, for a components zone
 * @param vertical the vertical distance, for a components zone
 */
public record ResolvedZone(Zone zone, Optional<ResolvedDistance> radial,
    Optional<ResolvedDistance> horizontal, Optional<ResolvedDistance> vertical) {

  public ResolvedZone {
    Objects.requireNonNull(zone, "zone");
    if (radial.isPresent() == (horizontal.isPresent() || vertical.isPresent())
        || horizontal.isPresent() != vertical.isPresent()) {
      throw new IllegalArgumentException("a zone is radial or has both components");
    }
  }

  /** The required distances at a station of a span of the given length. */
  public Requirement at(double spanLengthM, double stationM) {
    double nan = Double.NaN;
    return new Requirement(zone,
        radial.map(d -> d.at(spanLengthM, stationM)).orElse(nan),
        horizontal.map(d -> d.at(spanLengthM, stationM)).orElse(nan),
        vertical.map(d -> d.at(spanLengthM, stationM)).orElse(nan));
  }
}
