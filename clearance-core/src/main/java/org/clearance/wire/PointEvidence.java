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
 * points, at least {@value #LINE_SHARE} of them linear, running {@value #MIN_LINE_RUN_M} m or more along the span,
 * is a wire nobody fitted. A wire point with a point of another group (vegetation) within
 * {@value #TOUCH_M} m is not set aside: where a branch touches a wire the two cannot be told
 * apart, and the point is measured.
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
    int n = p.size();
    boolean[] wire = new boolean[n];
    for (int i = 0; i < n; i++) {
      wire[i] = on[i] || crossing[i] || p.labelled(i)
          || wires.reason(p.key(i)) == SetAside.Reason.WIRE;
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
    boolean[] vegetation = new boolean[n];
    for (int i = 0; i < n; i++) {
      int g = group[i];
      if (g < 0) {
        continue;
      }
      if (count[g] <= MAX_AIRBORNE_POINTS && lowest[g] >= floorM + AIRBORNE_GAP_M
          && openBelow(p.standing(), sMin[g], sMax[g], eMin[g], eMax[g], lowest[g])) {
        out.addAirborne(p.key(i));
      } else if (count[g] >= MIN_LINE_POINTS && lin[g] >= LINE_SHARE * count[g]
          && sMax[g] - sMin[g] >= MIN_LINE_RUN_M) {
        out.addWire(p.key(i));
      } else {
        vegetation[i] = true;
      }
    }
    IntList near = new IntList();
    for (int i = 0; i < n; i++) {
      if (!on[i] && !(crossing[i] && !p.labelled(i))) {
        continue;
      }
      grid.within(i, TOUCH_M, near);
      boolean touched = false;
      for (int t = 0; t < near.size() && !touched; t++) {
        touched = vegetation[near.get(t)];
      }
      if (touched) {
        continue;
      }
      if (on[i]) {
        out.addWire(p.key(i));
      } else {
        out.addCrossing(p.key(i));
      }
    }
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
