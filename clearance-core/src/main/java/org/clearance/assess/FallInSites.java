package org.clearance.assess;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.clearance.clearance.ConditionDistance;
import org.clearance.clearance.ConditionSet;
import org.clearance.line.SpanFrame;
import org.clearance.rules.FallInFinding;
import org.clearance.rules.SpanRules;
import org.clearance.run.TreeRecord;

/**
 * Fall-in sites: the trees near a span that the profile's fall-in rule says can strike it
 * ({@link SpanRules#fallIn}, docs/rules.md). A tree's site has the tree top as its location, the
 * distance from its base to the nearest conductor as its clearance, its reach (height plus the
 * rule's allowance) as the required distance and reach minus distance as the deficit. Its cut
 * height is the height at which its reach no longer exceeds the distance, less one trim cycle of
 * growth at the high-vegetation rate (ASPRS class 5): {@code height - margin - growth}, at least
 * 0. The station of the nearest conductor point is not stored for trees, so a mid-span allowance
 * is taken in full (the conservative choice of {@code MidspanAllowance.at}).
 */
final class FallInSites {

  /** ASPRS class 5, high vegetation: the growth class used for trees. */
  static final int TREE_CLASS = 5;

  private FallInSites() {}

  /** What the fall-in check found for the trees of one span. */
  record Result(List<CutSite> sites, List<String> notAssessed) {}

  /**
   * @param rules the profile resolved for the span
   * @param conditions the run's conditions (the order of each tree's base distances)
   * @param frame the span's plan frame, or null
   * @param trees the span's trees
   * @param priority priority given to fall-in sites
   */
  static Result check(SpanRules rules, ConditionSet conditions, SpanFrame frame,
      List<TreeRecord> trees, int priority) {
    List<CutSite> sites = new ArrayList<>();
    List<String> notAssessed = new ArrayList<>();
    for (TreeRecord t : trees) {
      if (!(Double.isFinite(t.heightM()) && t.heightM() > 0)) {
        notAssessed.add("tree " + t.id() + ": height not known");
        continue;
      }
      List<ConditionDistance> ds = new ArrayList<>();
      for (int k = 0; k < conditions.size() && k < t.baseDistances().size(); k++) {
        ds.add(new ConditionDistance(conditions.names().get(k), conditions.groups().get(k),
            t.baseDistances().get(k), Double.NaN, Double.NaN, t.nearestConductor(),
            Double.NaN));
      }
      FallInFinding f = rules.fallIn(t.heightM(), ds);
      if (f.notAssessedReason().isPresent()) {
        notAssessed.add("tree " + t.id() + ": " + f.notAssessedReason().get());
        continue;
      }
      if (!f.canStrike()) {
        continue;
      }
      double growth = CutHeight.cycleGrowth(rules.profile(), TREE_CLASS);
      double cutTo = Math.max(0, t.heightM() - f.marginM() - growth);
      double chainage = Double.NaN;
      double offset = Double.NaN;
      CutSite.Side side = CutSite.Side.CENTRE;
      if (frame != null) {
        chainage = frame.station(t.x(), t.y());
        double e = frame.offset(t.x(), t.y());
        offset = Math.abs(e);
        side = SiteBuilder.sideOf(e);
      }
      double area = Double.isFinite(t.crownRadiusM()) && t.crownRadiusM() > 0
          ? Math.PI * t.crownRadiusM() * t.crownRadiusM() : Double.NaN;
      sites.add(new CutSite("", t.spanId(), CutSite.Kind.FALL_IN, priority,
          CutSite.FALL_IN_ZONE, false, f.condition(), f.distanceM(), f.reachM(), f.marginM(),
          t.x(), t.y(), t.topZ(), Double.NaN, Double.NaN, chainage, side, offset, t.heightM(),
          cutTo, OptionalInt.empty(), area, Double.NaN));
    }
    return new Result(sites, notAssessed);
  }
}
