package org.clearance.wire;

import java.util.Objects;
import org.clearance.line.SpanFrame;

/**
 * One conductor of one span in 3D: a straight line in plan from attachment A to attachment B and a
 * catenary in the vertical plane through that line.
 *
 * <p>The plan frame starts at A's plan position and ends at B's, so stations run from 0 at A to
 * {@code plan.length()} at B; elevations in metres. This is the state of a conductor in one line
 * condition (as surveyed, hot, iced); a swung (blowout) state is the same curve rotated about its
 * chord, see the sag package.
 *
 * @param plan plan line from attachment A to attachment B
 * @param curve catenary in the vertical plane of {@code plan}
 */
public record ConductorCurve(SpanFrame plan, Catenary curve) {

  public ConductorCurve {
    Objects.requireNonNull(plan, "plan");
    Objects.requireNonNull(curve, "curve");
  }

  /** Horizontal length between the attachments, m. */
  public double length() {
    return plan.length();
  }

  /** Elevation of attachment A, m. */
  public double zA() {
    return curve.z(0);
  }

  /** Elevation of attachment B, m. */
  public double zB() {
    return curve.z(plan.length());
  }

  /** Vertical sag below the chord at the horizontal mid-point, m. */
  public double midSpanSag() {
    return curve.midSpanSag(0, plan.length());
  }

  /** Easting of the conductor at station s, m. */
  public double x(double s) {
    return plan.x(s, 0);
  }

  /** Northing of the conductor at station s, m. */
  public double y(double s) {
    return plan.y(s, 0);
  }

  /** Elevation of the conductor at station s, m. */
  public double z(double s) {
    return curve.z(s);
  }

  /**
   * The same curve cut short at its ends: the part from station {@code startCut} to station
   * {@code length() - endCut}, as a conductor of its own (stations from 0 again). Used where the
   * conductor really ends before the structure's cross-section, at a strain insulator.
   *
   * @param startCut plan distance removed at A, m (&gt;= 0)
   * @param endCut plan distance removed at B, m (&gt;= 0)
   * @throws IllegalArgumentException when the cuts leave nothing
   */
  public ConductorCurve trimmed(double startCut, double endCut) {
    double len = plan.length();
    if (!(startCut >= 0 && endCut >= 0 && startCut + endCut < len)) {
      throw new IllegalArgumentException("cuts " + startCut + " + " + endCut
          + " m leave nothing of " + len + " m");
    }
    SpanFrame cut = new SpanFrame(plan.x(startCut, 0), plan.y(startCut, 0), plan.ux(),
        plan.uy(), len - startCut - endCut);
    return new ConductorCurve(cut, new Catenary(curve.s0() - startCut, curve.z0(), curve.c()));
  }

  /** The same attachments with another catenary constant c, m. */
  public ConductorCurve withConstant(double c) {
    return new ConductorCurve(plan, Catenary.through(0, zA(), plan.length(), zB(), c));
  }
}
