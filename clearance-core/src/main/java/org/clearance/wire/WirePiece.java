package org.clearance.wire;

/**
 * Whether a group of candidate points is a piece of a wire on its own: a thin, nearly level line
 * in any direction (package-private; docs/wire-finder.md, "Points set aside").
 *
 * <p>In plan the points must lie within {@link #TOL_M} of their principal axis (the eigenvector
 * of the 2 x 2 plan covariance; Weinmann, Jutzi, Hinz and Mallet 2015, ISPRS J. 105:286-304,
 * eigenvalue features), and along that axis their elevations within {@link #TOL_M} of a straight
 * line, or of a parabola that sags like a hanging wire (curvature at most 1 / {@link
 * #MIN_CATENARY_M}; a catenary's second derivative is 1/c at its low point, methods.md 2.1). The
 * piece must hold {@link #MIN_POINTS} points over {@link #MIN_RUN_M} m and climb no steeper than
 * {@link #MAX_SLOPE}. This is what is left of a wire nobody fitted: pieces of a conductor the
 * finder could not fit between gaps in its coverage, and a service line or other wire crossing
 * the span. A crown's points scatter by decimetres to metres about any line; a pole stands
 * vertical; a bird gives a handful of points within a few decimetres.
 */
final class WirePiece {

  /** Fewest points of a piece: one more than the sleeve evidence's least core, so that a line
   * is over-determined in both plan and elevation. */
  static final int MIN_POINTS = 5;
  /** Least run of a piece in plan, m: half the sleeve length of {@link SleeveEvidence}, more
   * than a bird or a twig, and reached by five points of a wire sampled at 1-3 points per m. */
  static final double MIN_RUN_M = 1.5;
  /** Largest distance of a piece's point from its line, in plan and in elevation, m: four
   * standard deviations of a 4 cm wire noise (as {@link CloseSpacing#MIN_TUBE_M}). */
  static final double TOL_M = CloseSpacing.MIN_TUBE_M;
  /** Least catenary parameter of a hanging wire, m: a slack service drop or a feeder
   * conductor at 5 % of its rated strength (common practice, no source). */
  static final double MIN_CATENARY_M = 100;
  /** Steepest climb of a piece, dz per m in plan: the wire evidence's 35 degrees
   * ({@link WireFinderOptions.Evidence#defaults}). */
  static final double MAX_SLOPE = Math.tan(Math.toRadians(35));

  /** Half length along the span of the sleeve that joins a strand's points, m: the clustering
   * reach along a closely spaced line ({@link CloseSpacing#ALONG_REACH_M}), a few points of a
   * wire sampled at one to three points per metre. */
  static final double STRAND_HALF_LENGTH_M = CloseSpacing.ALONG_REACH_M;

  /** Slope under which two neighbours of a strand join whatever their best lines, dz/ds: a
   * conductor away from its structures (common practice, no source). Over the sleeve's length
   * it allows {@value #TOL_M} + 0.3 m, less than the 0.6 m least vertical spacing of the demo's
   * stacked framing, so conductors one above the other stay apart. */
  static final double LEVEL_SLOPE = 0.1;

  private WirePiece() {}

  /**
   * The strands of a group: its points with linear evidence, joined when each lies in the
   * other's best sleeve along the span (radius {@link #TOL_M} across and up about the line through the
   * point whose slope, tried from -{@link SleeveEvidence#MAX_SLOPE} to {@link
   * SleeveEvidence#MAX_SLOPE}, holds the most of them; a Hough vote, methods.md 1.4). Two
   * conductors hung one above the other, a conductor and the pole it is tied to, or a wire and a
   * crown that comes within the group's link distance of it, fall into separate strands.
   *
   * @param p the span's candidates
   * @param members the group's points
   * @param inGroup per candidate, true for the group's points
   * @param linear per candidate, linear evidence
   * @param grid a grid over the candidates with cells of at least the sleeve's reach
   * @return per member of {@code members}, the member index of its strand's root; -1 for a
   *     point without linear evidence
   */
  static int[] strands(SpanPoints p, int[] members, boolean[] inGroup, boolean[] linear,
      PointGrid grid) {
    int m = members.length;
    java.util.Map<Integer, Integer> slot = new java.util.HashMap<>();
    int[] parent = new int[m];
    for (int k = 0; k < m; k++) {
      slot.put(members[k], k);
      parent[k] = linear[members[k]] ? k : -1;
    }
    int slopes = (int) Math.round(2 * SleeveEvidence.MAX_SLOPE / SleeveEvidence.SLOPE_STEP) + 1;
    int[] votes = new int[slopes];
    double reach = Math.hypot(STRAND_HALF_LENGTH_M, SleeveEvidence.MAX_SLOPE
        * STRAND_HALF_LENGTH_M + TOL_M);
    IntList nb = new IntList();
    double[] slope = new double[m];
    for (int k = 0; k < m; k++) {
      if (parent[k] >= 0) {
        grid.within(members[k], reach, nb);
        slope[k] = bestSlope(p, members[k], nb, inGroup, linear, votes);
      }
    }
    for (int k = 0; k < m; k++) {
      int i = members[k];
      if (parent[k] < 0) {
        continue;
      }
      grid.within(i, reach, nb);
      for (int t = 0; t < nb.size(); t++) {
        int j = nb.get(t);
        if (j == i || !inSleeve(p, i, j, inGroup, linear)) {
          continue;
        }
        int q = slot.get(j);
        double ds = p.s(j) - p.s(i);
        double dz = p.z(j) - p.z(i);
        // joined when each lies in the other's best sleeve (the end of one conductor whose
        // best line climbs to the next one is not joined to it), or when the two are nearly
        // level (a wire's end, whose best line may point elsewhere)
        if (Math.abs(dz - slope[k] * ds) <= TOL_M && Math.abs(dz - slope[q] * ds) <= TOL_M
            || Math.abs(dz) <= TOL_M + LEVEL_SLOPE * Math.abs(ds)) {
          org.clearance.io.DisjointSets.union(parent, k, q);
        }
      }
    }
    for (int k = 0; k < m; k++) {
      if (parent[k] >= 0) {
        parent[k] = org.clearance.io.DisjointSets.root(parent, k);
      }
    }
    return parent;
  }

  /** True when j is a usable neighbour of i within the sleeve's length and radius across. */
  private static boolean inSleeve(SpanPoints p, int i, int j, boolean[] inGroup,
      boolean[] linear) {
    return inGroup[j] && linear[j] && Math.abs(p.s(j) - p.s(i)) <= STRAND_HALF_LENGTH_M
        && Math.abs(p.e(j) - p.e(i)) <= TOL_M;
  }

  /** The slope dz/ds of the line through point i that holds the most sleeve neighbours. */
  private static double bestSlope(SpanPoints p, int i, IntList nb, boolean[] inGroup,
      boolean[] linear, int[] votes) {
    java.util.Arrays.fill(votes, 0);
    for (int t = 0; t < nb.size(); t++) {
      int j = nb.get(t);
      if (j == i || !inSleeve(p, i, j, inGroup, linear)) {
        continue;
      }
      double ds = p.s(j) - p.s(i);
      double dz = p.z(j) - p.z(i);
      for (int q = 0; q < votes.length; q++) {
        votes[q] += Math.abs(dz - slopeOf(q) * ds) <= TOL_M ? 1 : 0;
      }
    }
    int best = 0;
    for (int q = 1; q < votes.length; q++) {
      best = votes[q] > votes[best] ? q : best;
    }
    return slopeOf(best);
  }

  private static double slopeOf(int q) {
    return -SleeveEvidence.MAX_SLOPE + q * SleeveEvidence.SLOPE_STEP;
  }

  /**
   * True when the points form a piece of a wire.
   *
   * @param p the span's candidates
   * @param members indices of the group's points
   * @param count how many of {@code members} to use (from the start)
   */
  static boolean isPiece(SpanPoints p, int[] members, int count) {
    return WireLine.of(p, members, count) != null;
  }
}
