package org.clearance.assess;

import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.PointClearance;
import org.clearance.rules.Requirement;
import org.clearance.rules.ResolvedZone;
import org.clearance.rules.RuleProfile;
import org.clearance.rules.SpanRules;

/**
 * The height to cut vegetation to so that it stays outside the violation-reference zone (the
 * profile's governing minimum) until the next trim: after growing upwards for one trim cycle at
 * its class's vertical rate, the cut top is still at least the zone's distance from the
 * conductor, in every condition the zone applies in.
 *
 * <p>For one point and one condition, with the conductor point nearest to it at height
 * {@code zc = z - vertical} and plan distance {@code h}, growth {@code g = rate x cycle} (0 when
 * the profile gives no growth rates or no trim cycle):
 *
 * <ul>
 *   <li>radial zone of distance {@code r}: if {@code h < r} the top may reach
 *       {@code zc - sqrt(r^2 - h^2) - g} (the lower edge of the zone's circle at that plan
 *       distance, less the growth); otherwise a cut in height does not help (the point is beside
 *       the zone: trim from the side);
 *   <li>components zone of distances {@code H, V}: if {@code h < H} the top may reach
 *       {@code zc - V - g}; otherwise no limit.
 * </ul>
 *
 * The conductor is taken as locally horizontal at its nearest point, as in the grow-in model of
 * docs/rules.md. The site's cut height is the lowest of these tops over its points and
 * conditions, less the ground under each point, and never below 0 (0 = remove to the ground).
 * Lateral growth is not part of the height: a site close beside the line needs a side trim too.
 */
public final class CutHeight {

  private CutHeight() {}

  /**
   * The highest elevation the vegetation at a point may keep.
   *
   * @param rules the profile resolved for the point's span (must be assessed)
   * @param point the point with its distances
   * @return elevation, m (same datum as the point's z); +infinity when no condition limits it
   *     (the point is beside the zone); NaN when the span is not assessed
   */
  public static double allowedTop(SpanRules rules, PointClearance point) {
    return allowedTop(rules, point, true);
  }

  /**
   * The highest elevation the vegetation at a point may keep, with or without one trim cycle of
   * growth.
   *
   * @param withGrowth whether the top must stay clear until the next trim (true) or only today
   * @return elevation, m; as {@link #allowedTop(SpanRules, PointClearance)}
   */
  public static double allowedTop(SpanRules rules, PointClearance point, boolean withGrowth) {
    if (rules.reference().isEmpty()) {
      return Double.NaN;
    }
    ResolvedZone ref = rules.reference().get();
    double growth = withGrowth ? cycleGrowth(rules.profile(), point.classification()) : 0;
    double length = rules.span().lengthM();
    double top = Double.POSITIVE_INFINITY;
    for (ConditionDistance d : point.distancesFor(ref.zone().roles())) {
      if (!ref.zone().conditions().selects(d) || Double.isNaN(d.horizontal())
          || Double.isNaN(d.vertical())) {
        continue;
      }
      double h = Math.abs(d.horizontal());
      double zc = point.z() - d.vertical();
      Requirement req = ref.at(length, d.station());
      double limit;
      if (ref.radial().isPresent()) {
        double r = req.radialM();
        limit = h < r ? zc - Math.sqrt(r * r - h * h) - growth : Double.POSITIVE_INFINITY;
      } else {
        limit = h < req.horizontalM() ? zc - req.verticalM() - growth
            : Double.POSITIVE_INFINITY;
      }
      top = Math.min(top, limit);
    }
    return top;
  }

  /**
   * Upward growth over one trim cycle for a class, m: the class's vertical rate times the cycle,
   * or 0 when the profile gives no growth rates or no trim cycle.
   */
  public static double cycleGrowth(RuleProfile profile, int classification) {
    if (profile.growth().isEmpty() || !Double.isFinite(profile.trimCycleYears())) {
      return 0;
    }
    return profile.growth().get().forClass(classification).verticalMPerYear()
        * profile.trimCycleYears();
  }
}
