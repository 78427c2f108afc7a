package org.clearance.wire;

import java.util.List;
import org.clearance.line.SpanFrame;

/**
 * The points of a fitted conductor that sags below the wire-candidate floor (package-private;
 * docs/wire-finder.md, "Points set aside"). An unlabelled point lower than the corridor's
 * minimum height is never a wire candidate ({@link WireFinderOptions.Collection#minHeightM}): a
 * neutral or an underbuild conductor hanging 2.7-3.0 m over a dip left its lowest points among
 * the vegetation, measured a few centimetres from its own curve (issue 9, demo feeder seed 43,
 * vertical framing, span P208-P209: 4 zone sites and 11 fall-in sites on the neutral, span
 * minimum 1.312 m against a true 2.730 m).
 *
 * <p>The finder keeps those low points apart ({@link SpanPoints#low}: from {@value #MIN_HEIGHT_M}
 * m above ground up to the floor, within {@value #LATERAL_MARGIN_M} m across of the outermost
 * nominal offset) and seeks no wire among them. After the fit, a low point that lies on a fitted
 * conductor's curve, within {@link WirePiece#TOL_M} in plan and in elevation between its
 * attachments (the test {@link ConductorStrands#onCurves} applies above the floor: four standard
 * deviations of a 4 cm wire noise), is set aside as wire, unless vegetation lies within {@link
 * PointEvidence#TOUCH_M} of it: another low point off the curves, or a candidate the evidence
 * left vegetation. Then it is measured and marked touched (the house rule: a point close to a wire
 * is vegetation unless the evidence says it is the wire itself). Grass and shrubs under a low
 * conductor are never taken: a return more than {@link WirePiece#TOL_M} below the curve is
 * measured, and so is a shrub top on the curve with its shrub within the touch distance.
 */
final class LowWirePoints {

  /** Least height above ground of a low point kept, m: a conductor hanging lower over open
   * ground is a finding of its own, and its points measured as vegetation give sites there (a
   * false alarm, never a missed tree); below it lie grass and the ground model's error (common
   * practice, no source). */
  static final double MIN_HEIGHT_M = 1.0;
  /** Reach across beyond the outermost nominal conductor offset within which low points are
   * kept, m: a conductor's plan line lies within the structures' position tolerance (3 m, the
   * finder's step 1) of its nominal offset; memory then follows the strips under the conductors,
   * not the whole corridor's undergrowth (common practice, no source). */
  static final double LATERAL_MARGIN_M = 3.0;

  private LowWirePoints() {}

  /**
   * Sets aside the low points on the span's fitted conductors.
   *
   * @param p the span's candidates, sorted, with their low points ({@link SpanPoints#low})
   * @param vegetation per candidate, true for a point the evidence leaves vegetation
   * @param frame the span's frame (of the stations and offsets), or null
   * @param curves the span's fitted conductors' curves
   * @param out where the points set aside, or touched, go
   * @return number of low points set aside as wire
   */
  static int setAside(SpanPoints p, boolean[] vegetation, SpanFrame frame,
      List<ConductorCurve> curves, SetAside out) {
    SpanPoints low = p.low();
    if (frame == null || curves.isEmpty() || low.size() == 0) {
      return 0;
    }
    int[] all = new int[low.size()];
    for (int j = 0; j < all.length; j++) {
      all[j] = j;
    }
    boolean[] on = ConductorStrands.onCurves(low, all, frame, curves);
    int set = 0;
    for (int j = 0; j < all.length; j++) {
      if (!on[j]) {
        continue;
      }
      if (touched(low, j, on, p, vegetation)) {
        out.addTouched(low.key(j));
      } else {
        out.addWire(low.key(j));
        set++;
      }
    }
    return set;
  }

  /** True when a low point off the curves or a vegetation candidate lies within {@link
   * PointEvidence#TOUCH_M} of low point j (both buffers sorted by station). */
  private static boolean touched(SpanPoints low, int j, boolean[] on, SpanPoints p,
      boolean[] vegetation) {
    double r = PointEvidence.TOUCH_M;
    for (int k = low.firstAtOrAfter(low.s(j) - r); k < low.size() && low.s(k) <= low.s(j) + r;
        k++) {
      if (!on[k] && near(low, k, low, j, r)) {
        return true;
      }
    }
    for (int i = p.firstAtOrAfter(low.s(j) - r); i < p.size() && p.s(i) <= low.s(j) + r; i++) {
      if (vegetation[i] && near(p, i, low, j, r)) {
        return true;
      }
    }
    return false;
  }

  private static boolean near(SpanPoints a, int i, SpanPoints b, int j, double r) {
    double ds = a.s(i) - b.s(j);
    double de = a.e(i) - b.e(j);
    double dz = a.z(i) - b.z(j);
    return ds * ds + de * de + dz * dz <= r * r;
  }
}
