package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;

/**
 * Grows wire pieces along their own model into whole wires (package-private): hypothesis and
 * verification after Sohn, Jwa and Kim (2012), ISPRS Annals I-3 (methods.md 1.7).
 *
 * <p>Clusters are taken largest first. A cluster's model ({@link TubeModel}) is extended a step
 * beyond the piece's ends; every candidate point of the span not yet taken by a wire that falls in
 * the tube joins, the model is refitted, and so on. When a step finds nothing the next step is
 * twice as long, so gaps in the points are bridged along the model; growth stops when the piece
 * reaches both ends of the span and a last sweep over its whole length adds nothing. Candidates
 * include every kept point, not only the seeds: unlabelled points on a labelled wire and points
 * without linear evidence (beside a tree) join this way. A grown piece is kept as a wire only
 * when it is long enough, runs along the span in plan, has enough points left after a final
 * check against the tube without extrapolation, and does not fill the tube evenly as a hedge or
 * a crown would (a bundle's separate sub-conductors may spread as widely); otherwise its points
 * stay free for later pieces.
 */
final class WireGrowth {

  /** Growth rounds at most per piece; a 1 km span in 15 m steps needs about 70. */
  static final int MAX_ROUNDS = 400;
  /**
   * Largest robust spread (1.4826 MAD) about the model, as a share of the tube's half-size:
   * points filling the tube evenly spread over 0.74 of it, a wire's 3-5 cm noise far less, and
   * a wire with a crown around part of it keeps the spread of its own points (a median, unlike
   * an RMS, ignores the leaves while they are fewer than the wire's points).
   */
  static final double SPREAD_SHARE = 0.5;

  /** Longest break between neighbouring points that still counts as one stretch of wire, m:
   * the break the coverage figure allows (docs/wire-finder.md, conductors.csv). */
  static final double LINK_GAP_M = 5;

  private WireGrowth() {}

  /**
   * Grows the clusters.
   *
   * @param p the span's points (sorted by station)
   * @param clusters seed clusters, largest first
   * @param sLo smallest station a wire point may have, m; sHi largest, m
   * @param growth the growth options
   * @param tolLateral tube half-width, m; tolVertical tube half-height, m
   * @return the wires' members (sorted indices), in the order found
   */
  static List<int[]> grow(SpanPoints p, List<int[]> clusters, double sLo, double sHi,
      WireFinderOptions.Growth growth, double tolLateral, double tolVertical) {
    return grow(p, clusters, sLo, sHi, growth, tolLateral, tolVertical, false);
  }

  /**
   * As {@link #grow(SpanPoints, List, double, double, WireFinderOptions.Growth, double,
   * double)}; with {@code relative} the points' elevations are relative to the span's common
   * sag shape ({@link SagReference}, {@link SpanPoints#relativeTo}) and the local models may
   * bend either way ({@link TubeModel#fit(SpanPoints, IntList, double, double, boolean)}).
   */
  static List<int[]> grow(SpanPoints p, List<int[]> clusters, double sLo, double sHi,
      WireFinderOptions.Growth growth, double tolLateral, double tolVertical,
      boolean relative) {
    int n = p.size();
    int[] owner = new int[n];
    java.util.Arrays.fill(owner, -1);
    List<int[]> wires = new ArrayList<>();
    double maxSlope = Math.tan(Math.toRadians(growth.maxAngleDeg()));
    for (int[] cluster : clusters) {
      boolean[] in = new boolean[n];
      IntList members = new IntList();
      for (int i : cluster) {
        double s = p.s(i);
        if (owner[i] < 0 && s >= sLo && s <= sHi) {
          in[i] = true;
          members.add(i);
        }
      }
      if (members.size() < growth.clusterMinPoints()) {
        continue;
      }
      extend(p, members, in, owner, sLo, sHi, growth, tolLateral, tolVertical, relative);
      int[] wire = verify(p, members, growth, maxSlope, tolLateral, tolVertical, relative);
      if (wire != null) {
        for (int i : wire) {
          owner[i] = wires.size();
        }
        wires.add(wire);
      }
    }
    return wires;
  }

  private static void extend(SpanPoints p, IntList members, boolean[] in, int[] owner,
      double sLo, double sHi, WireFinderOptions.Growth growth, double tolLateral,
      double tolVertical, boolean relative) {
    double step = growth.stepM();
    boolean swept = false;
    for (int round = 0; round < MAX_ROUNDS; round++) {
      TubeModel m = TubeModel.fit(p, members, tolLateral, tolVertical, relative);
      if (m == null) {
        return;
      }
      double nlo = Math.max(sLo, m.lo - step);
      double nhi = Math.min(sHi, m.hi + step);
      int added = take(p, m, nlo, m.lo, members, in, owner)
          + take(p, m, m.hi, nhi, members, in, owner);
      if (added > 0) {
        step = growth.stepM();
        swept = false;
        continue;
      }
      if (nlo > sLo || nhi < sHi) {
        step = Math.min(2 * step, sHi - sLo);
        continue;
      }
      if (swept) {
        return;
      }
      swept = true;
      if (take(p, m, m.lo, m.hi, members, in, owner) == 0) {
        return;
      }
    }
  }

  /** Adds the free points with station in [from, to] that lie in the tube; returns how many. */
  private static int take(SpanPoints p, TubeModel m, double from, double to, IntList members,
      boolean[] in, int[] owner) {
    int added = 0;
    for (int i = p.firstAtOrAfter(from); i < p.size() && p.s(i) <= to; i++) {
      if (!in[i] && owner[i] < 0 && m.contains(p, i)) {
        in[i] = true;
        members.add(i);
        added++;
      }
    }
    return added;
  }

  /** Length along the span covered by the points without a break longer than
   * {@link #LINK_GAP_M}, m (points in any order). */
  static double linkedLength(SpanPoints p, IntList members) {
    double[] st = new double[members.size()];
    for (int k = 0; k < st.length; k++) {
      st[k] = p.s(members.get(k));
    }
    java.util.Arrays.sort(st);
    double sum = 0;
    for (int k = 1; k < st.length; k++) {
      double d = st[k] - st[k - 1];
      sum += d <= LINK_GAP_M ? d : 0;
    }
    return sum;
  }

  /** The members inside the final tube, or null when they do not make a wire. */
  private static int[] verify(SpanPoints p, IntList members, WireFinderOptions.Growth growth,
      double maxSlope, double tolLateral, double tolVertical, boolean relative) {
    TubeModel m = TubeModel.fit(p, members, tolLateral, tolVertical, relative);
    if (m == null || m.hi - m.lo < growth.minLengthM() || Math.abs(m.planSlope()) > maxSlope) {
      return null;
    }
    IntList kept = new IntList();
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < members.size(); k++) {
      int i = members.get(k);
      if (m.contains(p, i)) {
        kept.add(i);
        lo = Math.min(lo, p.s(i));
        hi = Math.max(hi, p.s(i));
      }
    }
    if (kept.size() < 2 * growth.clusterMinPoints() || hi - lo < growth.minLengthM()) {
      return null;
    }
    if (relative && linkedLength(p, kept) < growth.minLengthM()) {
      // closely spaced wires: clumps of a few crowns strung along a straight extension over
      // long gaps are no wire (issue 15, vertical framing, seed 34 ground-only: 14 points of
      // three crowns over 54 m took the neutral's position)
      return null;
    }
    double[] lat = new double[kept.size()];
    double[] vert = new double[kept.size()];
    for (int k = 0; k < kept.size(); k++) {
      int i = kept.get(k);
      lat[k] = p.e(i) - m.e(p.s(i));
      vert[k] = p.z(i) - m.z(p.s(i));
    }
    boolean spread = RobustScale.sigmaMad(lat, lat.length) > SPREAD_SHARE * tolLateral
        || RobustScale.sigmaMad(vert, vert.length) > SPREAD_SHARE * tolVertical;
    if (spread && !BundleCheck.of(lat, vert).likelyBundle()) {
      // points filling the tube evenly: a hedge or a crown. A bundle's sub-conductors spread
      // as widely but in separate tight groups, which an even fill never splits into (an even
      // spread cut in two is 2 sqrt 3 = 3.5 of its halves' deviations apart, the check wants 4).
      return null;
    }
    int[] out = kept.toArray();
    java.util.Arrays.sort(out);
    return out;
  }

}
