package org.clearance.clearance;

import java.util.List;

/**
 * Where a point in a survey without vegetation labels is taken for a structure's own steel,
 * wood or hardware rather than vegetation (docs/clearance.md): the disc around each structure
 * centre, the cross arms with their insulators and jumpers, and the structures of another line
 * in the same run.
 */
final class StructureZone {

  /** Least reach of a structure's arm hardware along the line from its centre, m: an arm with
   * its insulators where no conductor end was fitted (common practice, no source). Where the
   * fitted conductors end farther out (a 3 m strain insulator at a dead-end whose arm lies on
   * the bisector of the line's turn: 3 m + 8 m x tan(15.6 deg) = 5.2 m along at a 31 degree
   * turn), the hardware reaches out to the farthest conductor end, plus {@link #ARM_END_MARGIN_M}. */
  static final double ARM_ALONG_M = 5.0;
  /** The same on a pole line, m: a pole's arms run across the line, so along it the hardware is
   * only the arm's depth with its insulators and ties (about 0.3 m either side of the pole,
   * common practice, no source) and the attachments' plan error (0.3 m, docs/wire-finder.md);
   * 1.5 m allows twice that for the scatter of the returns. A strain assembly reaching farther
   * along is covered by the fitted conductor ends, as on towers. The tower's 5 m set aside the
   * vegetation 4-5 m from a pole (generated feeder, seed 48, vertical framing, ground-only:
   * span P201-P202 read 5.849 m against a true 5.543 m). */
  static final double POLE_ARM_ALONG_M = 1.5;
  /** Reach of the hardware along the line beyond the farthest fitted conductor end, m: the
   * fitted attachments lie within 0.3 m of the true ones in plan (docs/wire-finder.md), and the
   * clamp and jumper points scatter a few centimetres about them. */
  static final double ARM_END_MARGIN_M = 0.5;
  /** Reach of an arm beyond its outermost conductor end, m: arm tip and clamp, and on the open
   * corridor tile's angle tower arms 3.5 m beyond the conductors' nominal offsets (measured). */
  static final double ARM_MARGIN_M = 4.0;
  /** Depth of jumper loops and insulator hardware below the lowest conductor end, m. */
  static final double ARM_BELOW_M = 3.0;

  private StructureZone() {}

  /**
   * Whether a point lies within the structure exclusion radius of either end structure of the
   * span in plan: {@code exclusionM}, or the span's own smaller radius (a pole's column,
   * {@link ClearanceEngine#POLE_COLUMN_M}). Within a pole's column a point lower than
   * {@link ClearanceEngine#POLE_FOOT_M} above ground is not taken for the pole: grass at the
   * pole's foot cannot be told from the pole's lowest returns, and measuring both errs towards a
   * smaller distance, setting both aside towards a larger one (issue 9).
   *
   * @param hag the point's height above ground, m (NaN: unknown, taken as above the foot)
   */
  static boolean near(PreparedSpan p, double x, double y, double hag, double exclusionM) {
    boolean pole = !Double.isNaN(p.model.structureExclusionM());
    if (pole && hag < ClearanceEngine.POLE_FOOT_M) {
      return false;
    }
    double r = pole ? Math.min(exclusionM, p.model.structureExclusionM()) : exclusionM;
    double r2 = r * r;
    double ax = p.model.span().from().x() - x;
    double ay = p.model.span().from().y() - y;
    double bx = p.model.span().to().x() - x;
    double by = p.model.span().to().y() - y;
    return ax * ax + ay * ay < r2 || bx * bx + by * by < r2;
  }

  /**
   * Whether a point stands at a structure of another line's span among the candidates: where a
   * feeder is built under a transmission line (docs/clearance.md, "Two lines in one run"), the
   * tower is a structure of both lines and its steel is no vegetation for either, whatever
   * exclusion radius the feeder's own poles need.
   */
  static boolean nearOtherLines(List<PreparedSpan> spans, int[] candidates, PreparedSpan p,
      double x, double y, double hag, double exclusionM) {
    for (int sp : candidates) {
      PreparedSpan q = spans.get(sp);
      if (!q.model.span().lineId().equals(p.model.span().lineId())
          && near(q, x, y, hag, exclusionM)) {
        return true;
      }
    }
    return false;
  }

  /**
   * Whether a point at station {@code s} and offset {@code e} of the span (m) and elevation
   * {@code z} lies where a structure's cross arms, insulators and jumpers are: within
   * {@link #ARM_ALONG_M} along the line of a structure ({@link #POLE_ARM_ALONG_M} on a pole line:
   * a span with its own structure exclusion), or out to the farthest fitted conductor
   * end there and {@link #ARM_END_MARGIN_M} beyond (a strain insulator and the jumper end where
   * the conductor begins), across out to {@link #ARM_MARGIN_M} beyond the outermost conductor
   * end there on either side (a conductor not fitted, say with a gap in its points, still has
   * its arm and insulator), and no lower than {@link #ARM_BELOW_M} below the lowest conductor end
   * there (the arms reach past the structure disc on wide towers).
   */
  static boolean onCrossArm(PreparedSpan p, double s, double e, double z) {
    for (int end = 0; end < 2; end++) {
      if (Double.isNaN(p.armZLo[end])) {
        continue;
      }
      double along = end == 0 ? s : s - p.model.span().lengthM();
      double half = Math.max(Math.abs(p.armELo[end]), Math.abs(p.armEHi[end])) + ARM_MARGIN_M;
      double least = Double.isNaN(p.model.structureExclusionM()) ? ARM_ALONG_M
          : POLE_ARM_ALONG_M;
      double reach = Math.max(least, p.armAlong[end] + ARM_END_MARGIN_M);
      if (Math.abs(along) <= reach && Math.abs(e) <= half
          && z >= p.armZLo[end] - ARM_BELOW_M) {
        return true;
      }
    }
    return false;
  }
}
