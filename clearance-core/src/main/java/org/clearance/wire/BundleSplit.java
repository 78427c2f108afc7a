package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.clearance.line.Span;

/**
 * Splits one fitted wire into the sub-conductors of a bundle, or keeps it whole
 * (package-private). The residuals of the wire's fit as one conductor are split by
 * {@link BundleCheck} (Zhou, Jiang and Jiang 2018, methods.md 1.6); each group is then fitted as a
 * conductor of its own. When the specification says the position is bundled the check is
 * tuned to its spacing; otherwise the defaults decide whether a wire that is not a single
 * conductor is a bundle. A bundle that will not split is reported whole, with its spread.
 */
final class BundleSplit {

  /** Residual RMS, as a share of the spacing, above which a known bundle is split: a twin at
   * spacing d fitted as one leaves d / 2. */
  static final double SPLIT_RMS_SHARE = 0.25;
  /** Smallest distance between sub-conductor groups, as a share of the spacing. */
  static final double MIN_SEPARATION_SHARE = 0.5;
  /** Smallest separation of the groups against their own spread for a known bundle: the
   * specification already says the wire is a bundle, so a weaker split is accepted. */
  static final double KNOWN_BUNDLE_RATIO = 2.5;
  /** Fewest points in a sub-conductor group. */
  static final int MIN_GROUP_POINTS = 5;
  /** Smallest share of an even split's points a sub-conductor group must hold: sub-conductors
   * of one bundle are seen about equally often. */
  static final double MIN_GROUP_SHARE = 0.3;
  /** Smallest share of the wire's stretch a sub-conductor group must run along. */
  static final double MIN_GROUP_EXTENT_SHARE = 0.5;

  /**
   * One conductor coming out of the split.
   *
   * @param fit its fit
   * @param bundle its place in the bundle; empty for a single conductor
   */
  record Part(ConductorFit.Result fit, Optional<BundleInfo> bundle) {}

  private BundleSplit() {}

  /**
   * Splits or keeps the wire.
   *
   * @param p the span's points
   * @param whole the wire's fit as one conductor (plain plan line), converged
   * @param span the span
   * @param name the position or extra name
   * @param expected sub-conductors the specification gives (1 when single or unknown)
   * @param spacing the specification's sub-conductor spacing, m, or NaN
   * @param zA attachment elevation at the first structure, m, or NaN; zB at the second
   * @param ends where the conductor ends at the structures
   */
  static List<Part> split(SpanPoints p, ConductorFit.Result whole, Span span, String name,
      int expected, double spacing, double zA, double zB, ConductorEnds ends) {
    BundleCheck check = expected > 1 && Double.isFinite(spacing)
        ? new BundleCheck(new BundleCheck.Options(SPLIT_RMS_SHARE * spacing,
            MIN_SEPARATION_SHARE * spacing, KNOWN_BUNDLE_RATIO, MIN_GROUP_POINTS))
        : new BundleCheck(BundleCheck.Options.defaults());
    BundleCheck.Verdict v = check.check(whole.lateral(), whole.vertical());
    int[] members = whole.members();
    List<Part> parts = new ArrayList<>();
    List<BundleCheck.Group> groups = v.likelyBundle() ? substantial(p, members, v.groups())
        : List.of();
    if (groups.size() >= 2) {
      List<ConductorFit.Result> subs = new ArrayList<>();
      for (BundleCheck.Group g : groups) {
        int[] idx = g.members().indices();
        int[] sub = new int[idx.length];
        for (int k = 0; k < idx.length; k++) {
          sub[k] = members[idx[k]];
        }
        subs.add(ConductorFit.fit(p, sub, span, true, zA, zB, ends));
      }
      double spread = spread(groups);
      for (int k = 0; k < subs.size(); k++) {
        parts.add(new Part(subs.get(k), Optional.of(new BundleInfo(name, k + 1, subs.size(),
            spread))));
      }
      return parts;
    }
    boolean bundled = expected > 1;
    ConductorFit.Result single = ConductorFit.fit(p, members, span, !bundled, zA, zB, ends);
    Optional<BundleInfo> info = Optional.empty();
    if (bundled) {
      double rms = lateralRms(single);
      info = Optional.of(new BundleInfo(name, 0, 1, Double.isFinite(rms) ? 2 * rms : 0));
    }
    parts.add(new Part(single, info));
    return parts;
  }

  /**
   * The groups that look like whole sub-conductors: each holds at least {@link #MIN_GROUP_SHARE}
   * of an even split's points and runs along at least {@link #MIN_GROUP_EXTENT_SHARE} of the
   * wire's stretch. A clump of stray points beside one wire (a crown touching it, a bird) is no
   * sub-conductor; its points are left out of the sub-conductors' fits. Empty unless at least
   * two groups qualify.
   */
  private static List<BundleCheck.Group> substantial(SpanPoints p, int[] members,
      List<BundleCheck.Group> groups) {
    double extent = extent(p, members, null);
    List<BundleCheck.Group> out = new ArrayList<>();
    for (BundleCheck.Group g : groups) {
      int[] idx = g.members().indices();
      if (idx.length >= MIN_GROUP_SHARE * members.length / groups.size()
          && extent(p, members, idx) >= MIN_GROUP_EXTENT_SHARE * extent) {
        out.add(g);
      }
    }
    return out.size() >= 2 ? out : List.of();
  }

  /** Station extent of the members (all, or those at positions idx of members), m. */
  private static double extent(SpanPoints p, int[] members, int[] idx) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    int n = idx == null ? members.length : idx.length;
    for (int k = 0; k < n; k++) {
      double s = p.s(members[idx == null ? k : idx[k]]);
      lo = Math.min(lo, s);
      hi = Math.max(hi, s);
    }
    return hi - lo;
  }

  /** Largest distance between two group centres in the cross-section, m. */
  private static double spread(List<BundleCheck.Group> groups) {
    double worst = 0;
    for (BundleCheck.Group a : groups) {
      for (BundleCheck.Group b : groups) {
        worst = Math.max(worst, Math.hypot(a.lateral() - b.lateral(),
            a.vertical() - b.vertical()));
      }
    }
    return worst;
  }

  private static double lateralRms(ConductorFit.Result r) {
    double sum = 0;
    int n = 0;
    for (double v : r.lateral()) {
      if (Double.isFinite(v)) {
        sum += v * v;
        n++;
      }
    }
    return n > 0 ? Math.sqrt(sum / n) : Double.NaN;
  }
}
