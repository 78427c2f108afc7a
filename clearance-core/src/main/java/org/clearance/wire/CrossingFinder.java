package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;
import org.clearance.io.DisjointSets;
import org.clearance.line.Span;

/**
 * Finds wires that cross a span (package-private; issue 15): among the span's candidates not on
 * one of its own wires, groups of points joined within {@value #LINK_M} m (single linkage) that
 * form one straight thin line (eigenvalues of the group's covariance, Weinmann et al. 2015,
 * methods.md 1.2) running at least {@value #MIN_RUN_M} m at {@value #MIN_ANGLE_DEG} degrees or
 * more to the span in plan and no steeper than {@value #MAX_STEEP_DEG} degrees. The span's own
 * conductors run within 10 degrees of it (docs/wire-finder.md, step 5), so nothing of them is
 * taken; a pole is vertical, a guy wire steep, a cross arm shorter than the least run, and a
 * crown neither thin nor straight. A crossing wire that passes within the link distance of a
 * crown joins the crown's group; such a group is tested again by its line cores ({@link
 * #lineCores}), so the wire's points away from the crown are still recognised (issue 9).
 */
final class CrossingFinder {

  /** Link distance of the groups, m: as {@link PointEvidence#LINK_M}. */
  static final double LINK_M = PointEvidence.LINK_M;
  /** Fewest points of a crossing wire: as an unfitted wire's ({@link
   * PointEvidence#MIN_LINE_POINTS}). */
  static final int MIN_POINTS = PointEvidence.MIN_LINE_POINTS;
  /** Least run along the line, m: longer than a distribution cross arm (2.4-3 m, common
   * practice, no source). */
  static final double MIN_RUN_M = 5;
  /** Least plan angle to the span, degrees: twice the 10 degrees a conductor may deviate. */
  static final double MIN_ANGLE_DEG = 20;
  /** Steepest crossing wire, degrees: a wire's steepness limit of the seeds (step 3). */
  static final double MAX_STEEP_DEG = 35;
  /** Least linearity (l1 - l2) / l1 of the group's covariance: a 3-5 cm thick line over 5 m
   * gives 0.999, a crown under 0.9 (common practice, no source). */
  static final double MIN_LINEARITY = 0.98;
  /** Largest RMS distance of the points from their line, m: the RMS threshold of a fitted
   * conductor ({@link WireFinderOptions.Quality#defaults()}). */
  static final double MAX_RMS_M = 0.15;

  /** Radius of the neighbourhood of a line core's point, m: the wire evidence's sphere
   * ({@link WireFinderOptions.Evidence#defaults()}), a few points of a wire sampled at one to
   * three points per metre. */
  static final double CORE_RADIUS_M = 1.5;

  /** Pieces of one crossing wire meet the span within this in plan, m, at angles within
   * this, degrees, and elevations within this, m: a few times the position error of a line
   * fitted to a piece of 5 m or more (common practice, no source). */
  static final double SAME_PLAN_M = 1.0;
  static final double SAME_ANGLE_DEG = 5;
  static final double SAME_HEIGHT_M = 0.3;

  private CrossingFinder() {}

  /**
   * The crossings found.
   *
   * @param crossings the crossing wires, by station
   * @param member per candidate, true when it is a point of a crossing wire
   */
  record Found(List<Crossing> crossings, boolean[] member) {}

  /**
   * Finds the crossing wires of a span.
   *
   * @param p the span's candidates
   * @param taken per candidate, true when it belongs to one of the span's own wires
   * @param span the span
   * @param conductors the span's conductors (fitted ones give the separation)
   */
  static Found find(SpanPoints p, boolean[] taken, Span span,
      List<FittedConductor> conductors) {
    int n = p.size();
    boolean[] member = new boolean[n];
    List<Crossing> out = new ArrayList<>();
    int[] parent = new int[n];
    PointGrid grid = new PointGrid(p, LINK_M);
    IntList near = new IntList();
    for (int i = 0; i < n; i++) {
      parent[i] = taken[i] ? -1 : i;
    }
    for (int i = 0; i < n; i++) {
      if (taken[i]) {
        continue;
      }
      grid.within(i, LINK_M, near);
      for (int t = 0; t < near.size(); t++) {
        if (!taken[near.get(t)]) {
          DisjointSets.union(parent, i, near.get(t));
        }
      }
    }
    List<IntList> groups = new ArrayList<>();
    int[] groupOf = new int[n];
    java.util.Arrays.fill(groupOf, -1);
    for (int i = 0; i < n; i++) {
      if (parent[i] < 0) {
        continue;
      }
      int r = DisjointSets.root(parent, i);
      if (groupOf[r] < 0) {
        groupOf[r] = groups.size();
        groups.add(new IntList());
      }
      groups.get(groupOf[r]).add(i);
    }
    List<IntList> lines = new ArrayList<>();
    List<Crossing> found = new ArrayList<>();
    List<IntList> tried = new ArrayList<>();
    boolean[] scratchIn = new boolean[n];
    boolean[] scratchCore = new boolean[n];
    int[] scratchParent = new int[n];
    for (IntList g : groups) {
      Crossing whole = g.size() < MIN_POINTS ? null : crossing(p, g, span, conductors);
      if (whole != null || g.size() < MIN_POINTS) {
        tried.add(g);
      } else {
        tried.addAll(lineCores(p, g, grid, scratchIn, scratchCore, scratchParent));
      }
    }
    for (IntList g : tried) {
      Crossing c = g.size() < MIN_POINTS ? null : crossing(p, g, span, conductors);
      if (c == null) {
        continue;
      }
      // pieces of one crossing wire split by a gap in its points are one crossing
      int same = -1;
      for (int k = 0; k < found.size() && same < 0; k++) {
        same = sameWire(found.get(k), c) ? k : -1;
      }
      if (same < 0) {
        lines.add(g);
        found.add(c);
        continue;
      }
      IntList merged = new IntList();
      for (IntList part : List.of(lines.get(same), g)) {
        for (int k = 0; k < part.size(); k++) {
          merged.add(part.get(k));
        }
      }
      Crossing m = crossing(p, merged, span, conductors);
      if (m != null) {
        lines.set(same, merged);
        found.set(same, m);
      } else {
        lines.add(g);
        found.add(c);
      }
    }
    for (int k = 0; k < found.size(); k++) {
      out.add(found.get(k));
      for (int j = 0; j < lines.get(k).size(); j++) {
        member[lines.get(k).get(j)] = true;
      }
    }
    out.sort(java.util.Comparator.comparingDouble(Crossing::stationM));
    return new Found(out, member);
  }

  /**
   * The line cores of a group that is no crossing wire as a whole (a crossing wire joined to a
   * crown within the link distance): its points whose neighbours in the group within {@link
   * #CORE_RADIUS_M} (at least {@link WireFinderOptions.Evidence#MIN_NEIGHBOURS}, the point
   * included) form a line in any direction, linearity at least {@link #MIN_LINEARITY}, joined
   * within {@link #LINK_M} (single linkage). Each core is then tested as a group is; a crown's
   * points give no core that passes. A crossing wire's points within the radius of the crown are
   * no core; they are followed into the crown's group later ({@link ConductorStrands#onCrossings})
   * and stay measured where vegetation touches them.
   */
  static List<IntList> lineCores(SpanPoints p, IntList g, PointGrid grid, boolean[] inGroup,
      boolean[] core, int[] parent) {
    for (int k = 0; k < g.size(); k++) {
      inGroup[g.get(k)] = true;
    }
    IntList near = new IntList();
    IntList nb = new IntList();
    for (int k = 0; k < g.size(); k++) {
      int i = g.get(k);
      grid.within(i, CORE_RADIUS_M, near);
      nb.clear();
      for (int t = 0; t < near.size(); t++) {
        if (inGroup[near.get(t)]) {
          nb.add(near.get(t));
        }
      }
      if (nb.size() < WireFinderOptions.Evidence.MIN_NEIGHBOURS) {
        continue;
      }
      Eigen3.Result r = PointSpread.of(p, nb).axes();
      core[i] = r.l1() > 0 && (r.l1() - r.l2()) / r.l1() >= MIN_LINEARITY;
    }
    for (int k = 0; k < g.size(); k++) {
      int i = g.get(k);
      parent[i] = core[i] ? i : -1;
    }
    for (int k = 0; k < g.size(); k++) {
      int i = g.get(k);
      if (!core[i]) {
        continue;
      }
      grid.within(i, LINK_M, near);
      for (int t = 0; t < near.size(); t++) {
        if (inGroup[near.get(t)] && core[near.get(t)]) {
          DisjointSets.union(parent, i, near.get(t));
        }
      }
    }
    java.util.Map<Integer, IntList> byRoot = new java.util.TreeMap<>();
    for (int k = 0; k < g.size(); k++) {
      int i = g.get(k);
      if (core[i]) {
        byRoot.computeIfAbsent(DisjointSets.root(parent, i), x -> new IntList()).add(i);
      }
    }
    for (int k = 0; k < g.size(); k++) {
      inGroup[g.get(k)] = false;
      core[g.get(k)] = false;
    }
    return new ArrayList<>(byRoot.values());
  }

  /** True when two crossings are pieces of one straight wire: they meet the span at one place,
   * at one angle and one elevation, within {@link #SAME_PLAN_M}, {@link #SAME_ANGLE_DEG} and
   * {@link #SAME_HEIGHT_M}. */
  private static boolean sameWire(Crossing a, Crossing b) {
    return Math.hypot(a.x() - b.x(), a.y() - b.y()) <= SAME_PLAN_M
        && Math.abs(a.angleDeg() - b.angleDeg()) <= SAME_ANGLE_DEG
        && Math.abs(a.z() - b.z()) <= SAME_HEIGHT_M;
  }

  /** The group as a crossing wire, or null when it is not one. */
  private static Crossing crossing(SpanPoints p, IntList g, Span span,
      List<FittedConductor> conductors) {
    int n = g.size();
    PointSpread spread = PointSpread.of(p, g);
    double ms = spread.meanS();
    double me = spread.meanE();
    double mz = spread.meanZ();
    Eigen3.Result r = spread.axes();
    double plan = Math.hypot(r.v1x(), r.v1y());
    double angle = Math.toDegrees(Math.atan2(Math.abs(r.v1y()), Math.abs(r.v1x())));
    double steep = Math.toDegrees(Math.atan2(Math.abs(r.v1z()), plan));
    double run = 2 * Math.sqrt(3 * r.l1()); // an even spread over a run L has variance L^2/12
    if (!(r.l1() > 0) || (r.l1() - r.l2()) / r.l1() < MIN_LINEARITY
        || Math.sqrt(Math.max(0, r.l2() + r.l3())) > MAX_RMS_M || run < MIN_RUN_M
        || angle < MIN_ANGLE_DEG || steep > MAX_STEEP_DEG) {
      return null;
    }
    // where the crossing line meets e = e0 in plan (e0: the lowest conductor's offset there)
    double ds = r.v1x() / plan;
    double de = r.v1y() / plan;
    double slope = r.v1z() / plan;
    double e0 = 0;
    double s0 = ms + (e0 - me) / de * ds;
    FittedConductor lowest = null;
    double lowZ = Double.POSITIVE_INFINITY;
    for (int pass = 0; pass < 2; pass++) {
      lowest = null;
      lowZ = Double.POSITIVE_INFINITY;
      for (FittedConductor c : conductors) {
        if (!c.isFitted() || c.curve().isEmpty()) {
          continue;
        }
        ConductorCurve cc = c.curve().get();
        double x = span.frame().x(s0, e0);
        double y = span.frame().y(s0, e0);
        double t = cc.plan().station(x, y);
        if (t < 0 || t > cc.length()) {
          continue;
        }
        double z = cc.z(t);
        if (z < lowZ) {
          lowZ = z;
          lowest = c;
        }
      }
      if (lowest == null) {
        break;
      }
      ConductorCurve cc = lowest.curve().get();
      double t = cc.plan().station(span.frame().x(s0, e0), span.frame().y(s0, e0));
      e0 = span.frame().offset(cc.x(t), cc.y(t));
      s0 = ms + (e0 - me) / de * ds;
    }
    double x = span.frame().x(s0, e0);
    double y = span.frame().y(s0, e0);
    double along = Math.hypot(s0 - ms, e0 - me) * Math.signum((s0 - ms) * ds + (e0 - me) * de);
    double z = mz + slope * along;
    double sep = Double.NaN;
    String name = "";
    if (lowest != null && s0 >= 0 && s0 <= span.lengthM()) {
      ConductorCurve cc = lowest.curve().get();
      sep = cc.z(cc.plan().station(x, y)) - z;
      name = lowest.name();
    }
    return new Crossing(x, y, z, s0, angle, n, name, sep);
  }
}
