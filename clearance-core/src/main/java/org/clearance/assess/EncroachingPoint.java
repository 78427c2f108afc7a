package org.clearance.assess;

import java.util.Objects;
import org.clearance.rules.ZoneViolation;

/**
 * A vegetation point inside a zone, with what the site builder needs of it.
 *
 * @param x easting, m
 * @param y northing, m
 * @param z elevation, m
 * @param heightAboveGround height above ground, m, or NaN
 * @param violation the most urgent zone it is inside
 * @param years years to the violation-reference zone (0 inside, +infinity never, NaN unknown)
 * @param allowedTop highest elevation the vegetation may keep ({@link CutHeight}), m
 */
record EncroachingPoint(double x, double y, double z, double heightAboveGround,
    ZoneViolation violation, double years, double allowedTop) {

  EncroachingPoint {
    Objects.requireNonNull(violation, "violation");
  }

  int priority() {
    return violation.zone().priority();
  }
}
