package org.clearance;

import org.clearance.clearance.SpanModel;
import org.clearance.ground.GroundModel;
import org.clearance.line.SpanFrame;
import org.clearance.wire.ConductorCurve;

/**
 * How much of a span's corridor the survey covers: the share of sample points, every
 * {@link #STEP_M} m along the span and across the conductors' band widened by
 * {@link #MARGIN_M} on each side, where the ground model has terrain (it has terrain only where
 * the survey has points, plus a small margin). A span the survey covers only in part cannot be
 * called clear: its other part was never looked at.
 */
final class SurveyCoverage {

  /** Sample spacing along and across the span, m: finer than any gap worth reporting. */
  static final double STEP_M = 5.0;
  /** Band beyond the outermost conductors, m: the width of the widest built-in zone. */
  static final double MARGIN_M = 8.0;
  /** Share below which a span is incomplete: a few uncovered samples at the very edge of the
   * band (the survey's own edge) are not a gap. */
  static final double MIN_SHARE = 0.98;

  private SurveyCoverage() {}

  /** The share of the span's corridor with survey data, 0 to 1; NaN without conductors. */
  static double share(SpanModel span, GroundModel ground) {
    SpanFrame frame = span.span().frame();
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (var c : span.conductors()) {
      ConductorCurve curve = c.survey().curve();
      for (double s : new double[] {0, curve.length()}) {
        double e = frame.offset(curve.x(s), curve.y(s));
        lo = Math.min(lo, e);
        hi = Math.max(hi, e);
      }
    }
    if (!Double.isFinite(lo)) {
      return Double.NaN;
    }
    int all = 0;
    int covered = 0;
    double length = span.span().lengthM();
    for (double s = 0; s <= length; s += STEP_M) {
      for (double e = lo - MARGIN_M; e <= hi + MARGIN_M; e += STEP_M) {
        all++;
        if (!Double.isNaN(ground.groundZ(frame.x(s, e), frame.y(s, e)))) {
          covered++;
        }
      }
    }
    return (double) covered / all;
  }
}
