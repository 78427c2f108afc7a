package org.clearance.run;

import org.clearance.clearance.ConductorState;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * A conductor's geometry in one condition, as stored in the run model: its attachment points,
 * catenary constant and swing range. Coordinates in metres (survey CRS scaled to metres).
 *
 * @param ax easting of attachment A, m
 * @param ay northing of attachment A, m
 * @param az elevation of attachment A, m
 * @param bx easting of attachment B, m
 * @param by northing of attachment B, m
 * @param bz elevation of attachment B, m
 * @param c catenary constant, m
 * @param swingMin smallest swing about the chord, radians (&lt;= 0)
 * @param swingMax largest swing about the chord, radians (&gt;= 0)
 */
public record CurveRecord(
    double ax, double ay, double az, double bx, double by, double bz, double c,
    double swingMin, double swingMax) {

  /** The record of an engine state. */
  public static CurveRecord of(ConductorState state) {
    ConductorCurve curve = state.curve();
    double len = curve.length();
    return new CurveRecord(curve.x(0), curve.y(0), curve.zA(), curve.x(len), curve.y(len),
        curve.zB(), curve.curve().c(), state.swingMin(), state.swingMax());
  }

  /** Back to the engine's state. */
  public ConductorState toState() {
    SpanFrame plan = SpanFrame.between(ax, ay, bx, by);
    ConductorCurve curve = new ConductorCurve(plan,
        Catenary.through(0, az, plan.length(), bz, c));
    return new ConductorState(curve, swingMin, swingMax);
  }
}
