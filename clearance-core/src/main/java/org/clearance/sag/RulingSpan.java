package org.clearance.sag;

/**
 * The ruling span of a tension section: S_R = sqrt(sum S_i^3 / sum S_i) over the plan lengths of
 * all spans between two dead-ends (docs/methods.md 3.4; check-values.md section 2).
 *
 * <p>Suspension strings are assumed to equalise the horizontal tension between spans, so the whole
 * section behaves under a change of state like one level span of length S_R.
 */
public final class RulingSpan {

  private RulingSpan() {}

  /**
   * The ruling span of the given plan span lengths.
   *
   * @param planLengths plan (horizontal) span lengths, m, each finite and &gt; 0; at least one
   * @return the ruling span, m, between the shortest and the longest span
   * @throws IllegalArgumentException when there is no span or a length is not positive
   */
  public static double of(double... planLengths) {
    if (planLengths.length == 0) {
      throw new IllegalArgumentException("a ruling span needs at least one span");
    }
    double sum = 0;
    double sumCubes = 0;
    for (double s : planLengths) {
      if (!(Double.isFinite(s) && s > 0)) {
        throw new IllegalArgumentException("span length must be positive: " + s + " m");
      }
      sum += s;
      sumCubes += s * s * s;
    }
    return Math.sqrt(sumCubes / sum);
  }
}
