package org.clearance.report;

import org.clearance.line.SpanFrame;
import org.clearance.run.CurveRecord;
import org.clearance.wire.Catenary;

/**
 * Points along a stored conductor state for drawing and GIS output. A swung state is drawn
 * rotated about its chord by one angle: each point hanging a sag {@code f} below the chord moves
 * {@code f sin(phi)} sideways (positive to the left looking from attachment A to B) and rises to
 * {@code f cos(phi)} below the chord (docs/methods.md section 3.6, the swing geometry
 * of check-values.md section 2).
 */
final class ConductorSampler {

  /** Longest step between drawn points, m: a catenary's curvature is slight over 5 m. */
  static final double STEP_M = 5.0;
  /** Fewest segments: a short span still shows its sag. */
  static final int MIN_SEGMENTS = 8;
  /** Most segments: keeps long spans' files small. */
  static final int MAX_SEGMENTS = 200;

  private ConductorSampler() {}

  /** The angle a state is drawn at: the end of its swing range farther from hanging. */
  static double drawnSwing(CurveRecord r) {
    return Math.abs(r.swingMax()) >= Math.abs(r.swingMin()) ? r.swingMax() : r.swingMin();
  }

  /**
   * Samples a state.
   *
   * @param r the state
   * @param swing swing angle about the chord, radians (0 = hanging)
   * @return x, y, z triples in metres, from attachment A to B
   */
  static double[] sample(CurveRecord r, double swing) {
    SpanFrame plan = SpanFrame.between(r.ax(), r.ay(), r.bx(), r.by());
    double len = plan.length();
    Catenary cat = Catenary.through(0, r.az(), len, r.bz(), r.c());
    int n = (int) Math.max(MIN_SEGMENTS, Math.min(MAX_SEGMENTS, Math.ceil(len / STEP_M)));
    double[] out = new double[3 * (n + 1)];
    double sin = Math.sin(swing);
    double cos = Math.cos(swing);
    for (int i = 0; i <= n; i++) {
      double s = len * i / n;
      double chord = r.az() + (r.bz() - r.az()) * s / len;
      double f = chord - cat.z(s);
      out[3 * i] = plan.x(s, f * sin);
      out[3 * i + 1] = plan.y(s, f * sin);
      out[3 * i + 2] = chord - f * cos;
    }
    return out;
  }
}
