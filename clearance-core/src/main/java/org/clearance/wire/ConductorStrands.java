package org.clearance.wire;

import java.util.List;
import org.clearance.line.SpanFrame;

/**
 * The points of the line's own conductors inside a group that is vegetation as a whole
 * (package-private; docs/wire-finder.md, "Points set aside"). A conductor the finder found but did
 * not fit, or fitted over part of the span only, leaves its other points among the candidates;
 * where a crown comes within the groups' link distance ({@link PointEvidence#LINK_M}) of them,
 * they join the crown's group and were measured as vegetation, a few decimetres from the fitted
 * neighbour conductors (issue 9: span minima of 0.2-0.5 m against a true 2.2-6.5 m).
 *
 * <p>Evidence, all of it needed: a strand of the group's points with linear evidence ({@link
 * WirePiece#strands}) that is a wire piece ({@link WirePiece#isPiece}), of at least {@link
 * #MIN_POINTS} points over at least {@link #MIN_RUN_M} m, running along the span (within {@link
 * #MAX_PLAN_ANGLE_DEG} degrees in plan) and hanging like a fitted conductor of the span: its
 * elevation less that conductor's curve is a straight line within {@link WirePiece#TOL_M}
 * (conductors of one span hang with nearly the same catenary parameter, so they are parallel
 * curves up to the straight line between their attachments; methods.md 2.1). The strand's points,
 * and the group's other points on the same line (within {@link WirePiece#TOL_M} across and up,
 * over the strand's run widened by {@link WirePiece#STRAND_HALF_LENGTH_M} at each end: a wire
 * point beside a crown has no linear evidence of its own), are wire; every other point of the
 * group stays vegetation. A crown's points scatter by decimetres to metres about any line, so a
 * crown gives no such strand; a wire point with vegetation within {@link PointEvidence#TOUCH_M}
 * is still measured (the caller's touch rule).
 */
final class ConductorStrands {

  /** Fewest points of a strand: as an unfitted wire's group ({@link
   * PointEvidence#MIN_LINE_POINTS}), twice a wire piece's least ({@link WirePiece#MIN_POINTS}). */
  static final int MIN_POINTS = PointEvidence.MIN_LINE_POINTS;
  /** Least run of a strand along the span, m: twice a wire piece's least run ({@link
   * WirePiece#MIN_RUN_M}), more than a crown's branch lies straight (common practice, no
   * source). */
  static final double MIN_RUN_M = 2 * WirePiece.MIN_RUN_M;
  /** Largest plan angle between a strand and the span, degrees: the growth step's test of a wire
   * running along the span (docs/wire-finder.md, step 5). */
  static final double MAX_PLAN_ANGLE_DEG = 10;

  /** Reach of a crossing wire's points that a group's point is tested against, m: the width of
   * a feeder's wire corridor (widest offset, about 2 m, plus 8 m either side; docs/wire-finder.md,
   * step 2), so that the crossing wire's points found on one side of the conductors define its
   * line where it runs into a crown on the other side. Two crossing wires within this reach make
   * no single piece and nothing is set aside (common practice, no source). */
  static final double CROSSING_REACH_M = 20;
  /** Most passes following a crossing wire into a group: one point further per pass at the
   * least; a crossing wire crosses a feeder's corridor (about 20 m) in fewer points than this
   * at 1-3 points per m (common practice, no source). */
  static final int MAX_CROSSING_PASSES = 100;

  private ConductorStrands() {}

  /**
   * The group's points that lie on a strand of the line's own conductors.
   *
   * @param p the span's candidates
   * @param members the group's points
   * @param inGroup per candidate, true for the group's points (scratch, left as found)
   * @param linear per candidate, linear evidence ({@link WireEvidence})
   * @param grid a grid over the candidates with cells of at least the sleeve's reach
   * @param frame the span's frame (of the candidates' stations and offsets)
   * @param curves the span's fitted conductors
   * @return per member of {@code members}, true for a wire point
   */
  static boolean[] find(SpanPoints p, int[] members, boolean[] inGroup, boolean[] linear,
      PointGrid grid, SpanFrame frame, List<ConductorCurve> curves) {
    boolean[] wire = new boolean[members.length];
    if (curves.isEmpty() || members.length < MIN_POINTS) {
      return wire;
    }
    for (int i : members) {
      inGroup[i] = true;
    }
    int[] root = WirePiece.strands(p, members, inGroup, linear, grid);
    for (int i : members) {
      inGroup[i] = false;
    }
    java.util.Map<Integer, IntList> byRoot = new java.util.TreeMap<>();
    for (int k = 0; k < members.length; k++) {
      if (root[k] >= 0) {
        byRoot.computeIfAbsent(root[k], r -> new IntList()).add(members[k]);
      }
    }
    for (IntList list : byRoot.values()) {
      int c = list.size();
      int[] strand = new int[c];
      for (int k = 0; k < c; k++) {
        strand[k] = list.get(k);
      }
      double[] zc = new double[c];
      if (c < MIN_POINTS || !WirePiece.isPiece(p, strand, c)) {
        continue;
      }
      double[] plan = line(p, strand, c, null, 0);
      if (plan == null || Math.abs(plan[1]) > Math.tan(Math.toRadians(MAX_PLAN_ANGLE_DEG))
          || plan[3] - plan[2] < MIN_RUN_M) {
        continue;
      }
      for (ConductorCurve curve : curves) {
        for (int k = 0; k < c; k++) {
          zc[k] = curveZ(curve, frame, p.s(strand[k]), p.e(strand[k]));
        }
        double[] height = line(p, strand, c, zc, 1);
        if (height == null) {
          continue;
        }
        for (int k = 0; k < members.length; k++) {
          int i = members[k];
          double s = p.s(i);
          if (s < plan[2] - WirePiece.STRAND_HALF_LENGTH_M
              || s > plan[3] + WirePiece.STRAND_HALF_LENGTH_M) {
            continue;
          }
          double along = curveZ(curve, frame, s, p.e(i)) + height[0] + height[1] * s;
          wire[k] |= Math.abs(p.e(i) - plan[0] - plan[1] * s) <= WirePiece.TOL_M
              && Math.abs(p.z(i) - along) <= WirePiece.TOL_M;
        }
        break;
      }
    }
    return wire;
  }

  /**
   * The group's points that continue a wire crossing the span ({@link CrossingFinder}) into the
   * group: a point is on the crossing wire when the crossing wire's points (and the group's
   * points already shown to be on it) within {@link #CROSSING_REACH_M}, at least {@link
   * WirePiece#MIN_POINTS} of them, form a wire piece and the point continues its line ({@link
   * WireLine#continues}: within four robust standard deviations of the piece's own residuals,
   * the line fitted without the point). The test is repeated from the points found, so a
   * crossing wire is followed into a crown's group point by point; a crown's point off the
   * wire's line stays vegetation.
   *
   * <p>Regression (issue 9, generated triangular feeder, seed 44, ground-only, span P206-P207):
   * the point was tested by refitting the piece with it, within 0.16 m; a crown point 0.16 m
   * beside the service line passed, tilted the line, and the service line's last point in the
   * crown then failed, was measured as vegetation and set the span's minimum (4.888 m against a
   * true 5.805 m) and a watch-zone site.
   *
   * @param p the span's candidates
   * @param members the group's points
   * @param known per candidate, true for a crossing wire's point; the points found are added
   * @param knownList the same points as a list; the points found are added
   * @return per member of {@code members}, true for a point of a crossing wire
   */
  static boolean[] onCrossings(SpanPoints p, int[] members, boolean[] known, IntList knownList) {
    boolean[] out = new boolean[members.length];
    int[] buf = new int[64];
    boolean grew = true;
    for (int pass = 0; grew && pass < MAX_CROSSING_PASSES; pass++) {
      grew = false;
      for (int k = 0; k < members.length; k++) {
        int i = members[k];
        if (known[i]) {
          continue;
        }
        int c = 0;
        for (int t = 0; t < knownList.size(); t++) {
          int j = knownList.get(t);
          double ds = p.s(j) - p.s(i);
          double de = p.e(j) - p.e(i);
          double dz = p.z(j) - p.z(i);
          if (ds * ds + de * de + dz * dz <= CROSSING_REACH_M * CROSSING_REACH_M) {
            if (c + 1 >= buf.length) {
              buf = java.util.Arrays.copyOf(buf, 2 * buf.length);
            }
            buf[c++] = j;
          }
        }
        WireLine line = WireLine.of(p, buf, c);
        if (line != null && line.continues(p.s(i), p.e(i), p.z(i))) {
          known[i] = true;
          knownList.add(i);
          out[k] = true;
          grew = true;
        }
      }
    }
    return out;
  }

  /**
   * The span's candidates on a fitted conductor's curve (as {@link #onCurves(SpanPoints, int[],
   * SpanFrame, List)}: within {@link WirePiece#TOL_M} in plan and elevation, between its
   * attachments). They join no group ({@link PointEvidence#setAside}), so that a stray point of
   * one conductor does not join the points of another one nobody fitted into a group that is no
   * wire (issue 9, seed 50: a neutral's point joined the eleven points of an unfitted phase 1.4 m
   * above it); they are set aside as wire unless vegetation touches them.
   */
  static boolean[] onCurves(SpanPoints p, SpanFrame frame, List<ConductorCurve> curves) {
    if (frame == null || curves.isEmpty()) {
      return new boolean[p.size()];
    }
    int[] all = new int[p.size()];
    for (int i = 0; i < all.length; i++) {
      all[i] = i;
    }
    return onCurves(p, all, frame, curves);
  }

  /**
   * The group's points on a fitted conductor's curve: within {@link WirePiece#TOL_M} of it in plan
   * and in elevation, between its attachments. A conductor fitted over part of the span leaves
   * its points in a coverage gap among the candidates (they were not members of its fit); beside
   * a crown they join the crown's group.
   *
   * @param p the span's candidates
   * @param members the group's points
   * @param frame the span's frame
   * @param curves the span's fitted conductors
   * @return per member of {@code members}, true for a point on a curve
   */
  static boolean[] onCurves(SpanPoints p, int[] members, SpanFrame frame,
      List<ConductorCurve> curves) {
    boolean[] out = new boolean[members.length];
    for (int k = 0; k < members.length; k++) {
      int i = members[k];
      double x = frame.x(p.s(i), p.e(i));
      double y = frame.y(p.s(i), p.e(i));
      for (ConductorCurve c : curves) {
        double s = c.plan().station(x, y);
        if (s >= 0 && s <= c.length() && Math.abs(c.plan().offset(x, y)) <= WirePiece.TOL_M
            && Math.abs(p.z(i) - c.z(s)) <= WirePiece.TOL_M) {
          out[k] = true;
          break;
        }
      }
    }
    return out;
  }

  /** The fitted conductor's elevation, m, across from the point at station s, offset e. */
  private static double curveZ(ConductorCurve curve, SpanFrame frame, double s, double e) {
    double x = frame.x(s, e);
    double y = frame.y(s, e);
    return curve.z(curve.plan().station(x, y));
  }

  /**
   * Least-squares line over the strand's stations: of the offset ({@code zc} null, {@code
   * axis} 0), or of the elevation less {@code zc} ({@code axis} 1).
   *
   * @return {a, b, first station, last station} of value = a + b s, or null when a point lies
   *     farther than {@link WirePiece#TOL_M} from it
   */
  private static double[] line(SpanPoints p, int[] strand, int c, double[] zc, int axis) {
    double ms = 0;
    double mv = 0;
    double sMin = Double.POSITIVE_INFINITY;
    double sMax = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < c; k++) {
      double s = p.s(strand[k]);
      ms += s;
      mv += value(p, strand[k], zc, k, axis);
      sMin = Math.min(sMin, s);
      sMax = Math.max(sMax, s);
    }
    ms /= c;
    mv /= c;
    double ss = 0;
    double sv = 0;
    for (int k = 0; k < c; k++) {
      double ds = p.s(strand[k]) - ms;
      ss += ds * ds;
      sv += ds * (value(p, strand[k], zc, k, axis) - mv);
    }
    if (!(ss > 0)) {
      return null;
    }
    double b = sv / ss;
    double a = mv - b * ms;
    for (int k = 0; k < c; k++) {
      if (Math.abs(value(p, strand[k], zc, k, axis) - a - b * p.s(strand[k]))
          > WirePiece.TOL_M) {
        return null;
      }
    }
    return new double[] {a, b, sMin, sMax};
  }

  private static double value(SpanPoints p, int i, double[] zc, int k, int axis) {
    return axis == 0 ? p.e(i) : p.z(i) - zc[k];
  }
}
