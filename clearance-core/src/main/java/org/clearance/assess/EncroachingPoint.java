package org.clearance.assess;

import java.util.Objects;
import java.util.Optional;
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
 * @param allowedTop highest elevation the vegetation may keep until the next trim
 *     ({@link CutHeight}), m
 * @param allowedTopNow highest elevation that clears the zone today (no growth), m
 * @param interval the distance interval and verdict at the profile's confidence level, or empty
 *     when the profile asks for none
 * @param wireTouched a point on a wire touched by vegetation ({@code
 *     PointClearance.wireTouched}): probably the wire itself; a site stands on the vegetation
 *     beside it ({@link SiteBuilder})
 */
record EncroachingPoint(double x, double y, double z, double heightAboveGround,
    ZoneViolation violation, double years, double allowedTop, double allowedTopNow,
    Optional<FindingInterval> interval, boolean wireTouched) {

  EncroachingPoint(double x, double y, double z, double heightAboveGround,
      ZoneViolation violation, double years, double allowedTop, double allowedTopNow,
      Optional<FindingInterval> interval) {
    this(x, y, z, heightAboveGround, violation, years, allowedTop, allowedTopNow, interval,
        false);
  }

  EncroachingPoint(double x, double y, double z, double heightAboveGround,
      ZoneViolation violation, double years, double allowedTop, double allowedTopNow) {
    this(x, y, z, heightAboveGround, violation, years, allowedTop, allowedTopNow,
        Optional.empty());
  }

  EncroachingPoint {
    Objects.requireNonNull(violation, "violation");
    Objects.requireNonNull(interval, "interval");
  }

  int priority() {
    return violation.zone().priority();
  }
}
