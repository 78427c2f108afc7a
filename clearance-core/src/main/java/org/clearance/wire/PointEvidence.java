package org.clearance.wire;

import java.util.List;
import org.clearance.io.DisjointSets;

/**
 * Which unclassified wire candidates of a span are shown not to be vegetation (package-private).
 * A point near a wire is vegetation unless this evidence says otherwise; thresholds are named
 * constants, documented in docs/wire-finder.md ("Points set aside").
 *
 * <p>Two steps. {@link #onCurve}: a point fitted to a conductor that lies on the fitted (swung)
 * curve within {@value #TOL_SIGMAS} robust standard deviations of the fit's residuals across and
 * up (at most {@value #TOL_CAP_M} m), or a member of a grown wire whose curve could not be fitted
 * and which has linear evidence of its own. {@link #setAside}, once every span's wire points are
 * known (a neighbouring span's wire reaches into the corridor near a structure): the remaining
 * candidates are joined into groups of points within {@value #LINK_M} m; a group of at most
 * {@value #MAX_AIRBORNE_POINTS} points whose lowest point is at least {@value #AIRBORNE_GAP_M} m
 * above the lowest candidate height, with open air below it, is an isolated airborne point (a
 * bird, high noise, a wire return far off its curve). Open air: no non-ground point that is not a
 * candidate (below the candidate height, or just outside the corridor: {@link StandingGrid})
 * stands in the group's column, its plan extent widened by {@value #COLUMN_MARGIN_M} m, higher
 * than {@value #UNDER_DEPTH_M} m below the group's lowest point. The top of a crown whose lower
 * crown lies below the candidate height, or whose crown spreads past the corridor's edge, has
 * that crown in its column and is measured. A group of at least {@value #MIN_LINE_POINTS}
 * points, at least {@value #LINE_SHARE} of them linear, running {@value #MIN_LINE_RUN_M} m or
 * more along the span, is a wire nobody fitted; so is a group that is a thin hanging line in any
 * direction ({@link WirePiece}: a crossing service line, a piece of a conductor the finder could
 * not fit), and a group, at least {@value #STRANDS_LINEAR_SHARE} of it linear, made only of such
 * lines (two unfitted conductors within the link distance of each other). In a group that is
 * vegetation as a whole, the points of the line's own conductors and of crossing wires that the
 * crown's group took in are picked out ({@link ConductorStrands}); points below the candidate
 * floor on a fitted curve are wire too ({@link LowWirePoints}). On a pole line the
 * points within {@value #POLE_RADIUS_M} m of a pole join no group. A wire point with a point of
 * another group (vegetation) within
 * {@value #TOUCH_M} m is not set aside: where a branch touches a wire the two cannot be told
 * apart, and the point is measured ({@link SetAside#touchedWire}: a site then stands on the
 * vegetation beside it, docs/clearance.md).
 */
final class PointEvidence {

  /** Robust standard deviations of the fit residual within which a point is on the curve
   * (Gaussian noise: 1 point in about 16 000 per axis lies beyond). */
  static final double TOL_SIGMAS = 4;
  /** Floor of the robust standard deviation, m: below airborne wire noise (as the fit's). */
  static final double SIGMA_FLOOR_M = ConductorFit.SIGMA_FLOOR_M;
  /** Largest on-curve tolerance, m: a noisier fit never sets aside points farther out. */
  static final double TOL_CAP_M = 0.25;
  /** Link distance of the groups, m: crowns sampled at 0.5 point per m^2 and more have
   * neighbours nearer than this (common practice, no source). */
  static final double LINK_M = 2.0;
  /** Most points of an isolated airborne group: a bird gives a handful (1-6 in the demo). */
  static final int MAX_AIRBORNE_POINTS = 6;
  /** Least height of an airborne group's lowest point above the lowest candidate height, m:
   * a group that reaches down to the candidates' floor may stand on something below it. */
  static final double AIRBORNE_GAP_M = 1.5;
  /** Widening of an airborne group's plan extent for its column, m: a crown spreads out below
   * its top, so its lower crown lies within a metre of the top's outline in plan (common
   * practice, no source); a bird has open air there. */
  static final double COLUMN_MARGIN_M = 1.0;
  /** Depth below an airborne group's lowest point within which a non-ground point in its column
   * shows that the group stands on something (a crown), m. A crown top cut off its crown by the
   * candidate floor stands at least {@value #AIRBORNE_GAP_M} m above that floor, and a sparse
   * crown's next returns lie up to {@value #LINK_M} m further down; twice that sum allows for
   * crowns sampled unevenly (common practice, no source). Erring deep is safe: a bird flying
   * lower than this over a crown is measured, which only brings a reading closer. */
  static final double UNDER_DEPTH_M = 2 * (AIRBORNE_GAP_M + LINK_M);
  /** Fewest points of an unfitted wire. */
  static final int MIN_LINE_POINTS = 10;
  /** Least share of linear points in an unfitted wire (crowns: 0.1 % of points are linear). */
  static final double LINE_SHARE = 0.8;
  /** Least run along the span of an unfitted wire, m (the growth step's least wire length). */
  static final double MIN_LINE_RUN_M = 10;
  /** Least share of linear points in a group that is split into strands ({@link
   * WirePiece#strands}): most points of a wire show linear evidence; crowns measured on the demo
   * feeders hold 10-35 % (common practice, no source). */
  static final double STRANDS_LINEAR_SHARE = 0.5;
  /** Plan radius around a pole kept out of the groups, m: the pole, its arms and hardware are
   * no wire; such points stay vegetation here, and the clearance engine (a later package) sets
   * aside only the pole's column (ClearanceEngine.POLE_COLUMN_M) and its arms, and measures the
   * rest (issue 9: grass and shrubs beside a pole). */
  static final double POLE_RADIUS_M = 1.0;
  /** A wire point with vegetation this near is measured, not set aside, m. */
  static final double TOUCH_M = 0.3;

  private PointEvidence() {}

  /**
   * The candidates on a fitted wire.
   *
   * @param p the span's candidates
   * @param fits every wire fitted or tried in the span (sub-conductors of bundles apart)
   * @param linear per candidate, linear evidence ({@link WireEvidence})
   * @return per candidate, true when it lies on a wire
   */
  static boolean[] onCurve(SpanPoints p, List<ConductorFit.Result> fits, boolean[] linear) {
    boolean[] on = new boolean[p.size()];
    for (ConductorFit.Result r : fits) {
      int[] m = r.members();
      if (r.curve().isEmpty()) {
        for (int i : m) {
          on[i] |= linear[i];
        }
        continue;
      }
      double tolA = tolerance(r.lateral());
      double tolB = tolerance(r.vertical());
      for (int k = 0; k < m.length; k++) {
        if (Math.abs(r.lateral()[k]) <= tolA && Math.abs(r.vertical()[k]) <= tolB) {
          on[m[k]] = true;
        }
      }
    }
    return on;
  }

  private static double tolerance(double[] residuals) {
    double[] v = new double[residuals.length];
    int n = 0;
    for (double r : residuals) {
      if (Double.isFinite(r)) {
        v[n++] = r;
      }
    }
    if (n == 0) {
      return 0;
    }
    double sigma = Math.max(SIGMA_FLOOR_M, RobustScale.sigmaMad(v, n));
    return Math.min(TOL_CAP_M, TOL_SIGMAS * sigma);
  }

  /**
   * Adds the span's points that are not vegetation to {@code out}.
   *
   * @param p the span's candidates
   * @param on this span's wire points from {@link #onCurve}
   * @param linear per candidate, linear evidence
   * @param crossing per candidate, true for a point of a wire crossing the span ({@link
   *     CrossingFinder}): set aside as such unless vegetation touches it, as a wire point
   * @param wires every span's wire points so far (to know a neighbour's wire)
   * @param floorM the span's lowest candidate height above ground, m
   * @param out where the points set aside go
   */
  static void setAside(SpanPoints p, boolean[] on, boolean[] linear, boolean[] crossing,
      SetAside wires, double floorM, SetAside out) {
    setAside(p, on, linear, crossing, wires, floorM, Double.NaN, Double.NaN, out);
  }

  /**
   * As {@link #setAside(SpanPoints, boolean[], boolean[], boolean[], SetAside, double,
   * SetAside)}, on a pole line: the candidates within {@code poleRadiusM} in plan of the span's
   * structures (station 0 and {@code lengthM}, offset 0) join no group. The clearance engine never
   * measures them (its pole exclusion, docs/clearance.md), and through them the pieces of the
   * wires tied to the pole would join the pole into one group that is no wire.
   *
   * @param lengthM the span's length, m (the second structure's station)
   * @param poleRadiusM plan radius kept out of the groups around each structure, m, or NaN for
   *     none (lattice towers: their exclusion is wider and their members are no wire)
   */
  static void setAside(SpanPoints p, boolean[] on, boolean[] linear, boolean[] crossing,
      SetAside wires, double floorM, double lengthM, double poleRadiusM, SetAside out) {
    setAside(p, on, linear, crossing, wires, floorM, lengthM, poleRadiusM, null, List.of(), null,
        out);
  }

  /**
   * As {@link #setAside(SpanPoints, boolean[], boolean[], boolean[], SetAside, double, double,
   * double, SetAside)}, with the span's fitted conductors: in a group that is vegetation as a
   * whole, the points on a strand of the line's own conductors ({@link ConductorStrands}) are
   * wire, unless vegetation touches them.
   *
   * @param frame the span's frame (of the candidates' stations and offsets), or null
   * @param curves the span's fitted conductors' curves (none: no strand is looked for)
   * @param outer the open points in the band around the span's corridor ({@link CrossingBand}),
   *     or null: the crossing wires are followed into them
   */
  static void setAside(SpanPoints p, boolean[] on, boolean[] linear, boolean[] crossing,
      SetAside wires, double floorM, double lengthM, double poleRadiusM,
      org.clearance.line.SpanFrame frame, List<ConductorCurve> curves, SpanPoints outer,
      SetAside out) {
    int n = p.size();
    boolean[] fitted = ConductorStrands.onCurves(p, frame, curves);
    boolean[] wire = new boolean[n];
    for (int i = 0; i < n; i++) {
      wire[i] = on[i] || fitted[i] || crossing[i] || p.labelled(i)
          || wires.reason(p.key(i)) == SetAside.Reason.WIRE
          || Math.hypot(p.s(i), p.e(i)) < poleRadiusM
          || Math.hypot(p.s(i) - lengthM, p.e(i)) < poleRadiusM;
    }
    PointGrid grid = new PointGrid(p, LINK_M);
    int[] group = groups(p, wire, grid);
    int[] count = new int[n];
    int[] lin = new int[n];
    double[] lowest = new double[n];
    double[] sMin = new double[n];
    double[] sMax = new double[n];
    double[] eMin = new double[n];
    double[] eMax = new double[n];
    java.util.Arrays.fill(eMin, Double.POSITIVE_INFINITY);
    java.util.Arrays.fill(eMax, Double.NEGATIVE_INFINITY);
    java.util.Arrays.fill(lowest, Double.POSITIVE_INFINITY);
    java.util.Arrays.fill(sMin, Double.POSITIVE_INFINITY);
    java.util.Arrays.fill(sMax, Double.NEGATIVE_INFINITY);
    for (int i = 0; i < n; i++) {
      int g = group[i];
      if (g < 0) {
        continue;
      }
      count[g]++;
      lin[g] += linear[i] ? 1 : 0;
      double h = p.hag(i);
      lowest[g] = Double.isNaN(h) ? Double.NEGATIVE_INFINITY : Math.min(lowest[g], h);
      sMin[g] = Math.min(sMin[g], p.s(i));
      sMax[g] = Math.max(sMax[g], p.s(i));
      eMin[g] = Math.min(eMin[g], p.e(i));
      eMax[g] = Math.max(eMax[g], p.e(i));
    }
    int[][] members = members(group, count);
    boolean[] piece = new boolean[n];
    for (int g = 0; g < n; g++) {
      piece[g] = members[g] != null && WirePiece.isPiece(p, members[g], count[g]);
    }
    boolean[] vegetation = new boolean[n];
    // the points of wires nobody fitted set aside here: the crossing wires are followed from
    // them into the band beyond the corridor (CrossingBand)
    boolean[] unfitted = new boolean[n];
    for (int i = 0; i < n; i++) {
      int g = group[i];
      if (g < 0) {
        continue;
      }
      if (count[g] >= MIN_LINE_POINTS && lin[g] >= LINE_SHARE * count[g]
          && sMax[g] - sMin[g] >= MIN_LINE_RUN_M || piece[g]) {
        out.addWire(p.key(i));
        unfitted[i] = true;
      } else if (count[g] <= MAX_AIRBORNE_POINTS && lowest[g] >= floorM + AIRBORNE_GAP_M
          && openBelow(p.standing(), sMin[g], sMax[g], eMin[g], eMax[g], lowest[g])) {
        out.addAirborne(p.key(i));
      } else {
        vegetation[i] = true;
      }
    }
    boolean[] strand = strandPieces(p, count, lin, members, vegetation, grid);
    for (int i = 0; i < n; i++) {
      if (strand[i]) {
        out.addWire(p.key(i));
      }
    }
    byte[] own = ownWires(p, members, linear, crossing, vegetation, grid, frame, curves);
    IntList near = new IntList();
    for (int i = 0; i < n; i++) {
      if (own[i] != 0 && !touched(grid, i, vegetation, near)) {
        if (own[i] == OWN_CONDUCTOR) {
          out.addWire(p.key(i));
        } else {
          out.addCrossing(p.key(i));
          unfitted[i] = true;
        }
      }
    }
    for (int i = 0; i < n; i++) {
      if (!fitted[i] || on[i] || crossing[i] || p.labelled(i)
          || wires.reason(p.key(i)) == SetAside.Reason.WIRE) {
        continue;
      }
      if (touched(grid, i, vegetation, near)) {
        out.addTouched(p.key(i));
      } else {
        out.addWire(p.key(i));
      }
    }
    for (int i = 0; i < n; i++) {
      if (!on[i] && !(crossing[i] && !p.labelled(i))) {
        continue;
      }
      if (touched(grid, i, vegetation, near)) {
        out.addTouched(p.key(i));
        continue;
      }
      if (on[i]) {
        out.addWire(p.key(i));
      } else {
        out.addCrossing(p.key(i));
        unfitted[i] = true;
      }
    }
    LowWirePoints.setAside(p, vegetation, frame, curves, out);
    if (outer != null) {
      CrossingBand.setAside(p, unfitted, vegetation, outer, out);
    }
  }

  /** {@link #ownWires}: a point of one of the line's own conductors. */
  private static final byte OWN_CONDUCTOR = 1;
  /** {@link #ownWires}: a point of a wire crossing the span. */
  private static final byte OWN_CROSSING = 2;

  /**
   * The points of the line's own conductors ({@link ConductorStrands#find}) and of the wires
   * crossing the span ({@link ConductorStrands#onCrossings}) in groups that are still vegetation
   * as a whole; they are taken out of {@code vegetation}, so that they touch no wire point, and
   * are set aside by the caller unless vegetation touches them.
   *
   * @return per candidate, 0, {@link #OWN_CONDUCTOR} or {@link #OWN_CROSSING}
   */
  private static byte[] ownWires(SpanPoints p, int[][] members, boolean[] linear,
      boolean[] crossing, boolean[] vegetation, PointGrid grid,
      org.clearance.line.SpanFrame frame, List<ConductorCurve> curves) {
    int n = p.size();
    byte[] own = new byte[n];
    boolean[] inGroup = new boolean[n];
    boolean anyCrossing = false;
    for (boolean c : crossing) {
      anyCrossing |= c;
    }
    boolean[] known = anyCrossing ? crossing.clone() : null;
    IntList knownList = new IntList();
    for (int i = 0; i < n && anyCrossing; i++) {
      if (crossing[i]) {
        knownList.add(i);
      }
    }
    for (int g = 0; g < n; g++) {
      int[] m = members[g];
      if (m == null || !vegetation[m[0]]) {
        continue;
      }
      boolean[] wire = frame == null ? new boolean[m.length]
          : ConductorStrands.find(p, m, inGroup, linear, grid, frame, curves);
      boolean[] onCurve = frame == null ? wire
          : ConductorStrands.onCurves(p, m, frame, curves);
      boolean[] across = known == null ? new boolean[m.length]
          : ConductorStrands.onCrossings(p, m, known, knownList);
      for (int k = 0; k < m.length; k++) {
        own[m[k]] = wire[k] || onCurve[k] ? OWN_CONDUCTOR : across[k] ? OWN_CROSSING : 0;
      }
    }
    for (int i = 0; i < n; i++) {
      vegetation[i] &= own[i] == 0;
    }
    return own;
  }

  /** True when no non-ground point stands in the group's column (plan box s0-s1, e0-e1, widened
   * by {@link #COLUMN_MARGIN_M}) higher than {@link #UNDER_DEPTH_M} below its lowest point
   * (height above ground, m). */
  static boolean openBelow(StandingGrid standing, double s0, double s1, double e0, double e1,
      double lowestM) {
    double top = standing.highestIn(s0 - COLUMN_MARGIN_M, s1 + COLUMN_MARGIN_M,
        e0 - COLUMN_MARGIN_M, e1 + COLUMN_MARGIN_M);
    return top < lowestM - UNDER_DEPTH_M;
  }

  /** True when a point of {@code vegetation} lies within {@link #TOUCH_M} of point i. */
  private static boolean touched(PointGrid grid, int i, boolean[] vegetation, IntList near) {
    grid.within(i, TOUCH_M, near);
    for (int t = 0; t < near.size(); t++) {
      if (vegetation[near.get(t)]) {
        return true;
      }
    }
    return false;
  }

  /**
   * The points of groups that are vegetation as a whole yet made of wire pieces only: every
   * point of the group lies on a strand ({@link WirePiece#strands}) that is a wire piece ({@link
   * WirePiece#isPiece}). Two conductors hung one above the other, or side by side, whose pieces
   * fall within the group's link distance, form one such group; a group holding anything else (a
   * crown, a pole) keeps all its points as vegetation. Only groups of at least twice {@link
   * WirePiece#MIN_POINTS} points, at least {@link #STRANDS_LINEAR_SHARE} of them with linear
   * evidence, are split (a crown's share is lower). The points are taken out of {@code
   * vegetation}; no vegetation can touch them, as the group holds every point within {@link
   * #LINK_M} of them.
   */
  private static boolean[] strandPieces(SpanPoints p, int[] count, int[] lin, int[][] members,
      boolean[] vegetation, PointGrid grid) {
    int n = p.size();
    boolean[] piece = new boolean[n];
    boolean[] inGroup = new boolean[n];
    for (int g = 0; g < n; g++) {
      int[] m = members[g];
      if (m == null || !vegetation[m[0]] || count[g] < 2 * WirePiece.MIN_POINTS
          || lin[g] < STRANDS_LINEAR_SHARE * count[g]) {
        continue;
      }
      for (int i : m) {
        inGroup[i] = true;
      }
      int[] root = WirePiece.strands(p, m, inGroup, inGroup, grid);
      for (int i : m) {
        inGroup[i] = false;
      }
      if (allPieces(p, m, root)) {
        for (int i : m) {
          piece[i] = true;
          vegetation[i] = false;
        }
      }
    }
    return piece;
  }

  /**
   * True when every strand of the group (member index of its root per member) is a wire piece:
   * a strand of at least {@link WirePiece#MIN_POINTS} points on its own, a shorter one (the end
   * of a wire beyond a gap) together with one of those pieces.
   */
  private static boolean allPieces(SpanPoints p, int[] m, int[] root) {
    List<int[]> pieces = new java.util.ArrayList<>();
    List<int[]> short_ = new java.util.ArrayList<>();
    for (int r = 0; r < m.length; r++) {
      if (root[r] != r) {
        continue;
      }
      int c = 0;
      int[] buf = new int[m.length];
      for (int k = 0; k < m.length; k++) {
        if (root[k] == r) {
          buf[c++] = m[k];
        }
      }
      int[] strand = java.util.Arrays.copyOf(buf, c);
      if (c < WirePiece.MIN_POINTS) {
        short_.add(strand);
      } else if (WirePiece.isPiece(p, strand, c)) {
        pieces.add(strand);
      } else {
        return false;
      }
    }
    for (int[] s : short_) {
      boolean continues = false;
      for (int t = 0; t < pieces.size() && !continues; t++) {
        int[] both = java.util.Arrays.copyOf(pieces.get(t), pieces.get(t).length + s.length);
        System.arraycopy(s, 0, both, pieces.get(t).length, s.length);
        continues = WirePiece.isPiece(p, both, both.length);
      }
      if (!continues) {
        return false;
      }
    }
    return !pieces.isEmpty();
  }

  /** The members of every group, indexed by group id (null for ids that name no group). */
  private static int[][] members(int[] group, int[] count) {
    int n = group.length;
    int[][] out = new int[n][];
    int[] fill = new int[n];
    for (int i = 0; i < n; i++) {
      int g = group[i];
      if (g >= 0) {
        if (out[g] == null) {
          out[g] = new int[count[g]];
        }
        out[g][fill[g]++] = i;
      }
    }
    return out;
  }

  /** Groups (single linkage within {@link #LINK_M}) of the points that are not wire; -1 for
   * wire points. Group ids are the index of a member. */
  private static int[] groups(SpanPoints p, boolean[] wire, PointGrid grid) {
    int n = p.size();
    int[] parent = new int[n];
    for (int i = 0; i < n; i++) {
      parent[i] = wire[i] ? -1 : i;
    }
    IntList near = new IntList();
    for (int i = 0; i < n; i++) {
      if (wire[i]) {
        continue;
      }
      grid.within(i, LINK_M, near);
      for (int t = 0; t < near.size(); t++) {
        int j = near.get(t);
        if (!wire[j]) {
          DisjointSets.union(parent, i, j);
        }
      }
    }
    for (int i = 0; i < n; i++) {
      if (parent[i] >= 0) {
        parent[i] = DisjointSets.root(parent, i);
      }
    }
    return parent;
  }
}
