package org.clearance.wire;

/**
 * Linear evidence for closely spaced conductors (package-private). In a distribution framing the
 * sphere of {@link WireEvidence} holds the neighbouring conductors too, and their parallel lines
 * read as a plane; here a point shows wire evidence when a thin sleeve along the span through it
 * holds a line of points and the sleeve's surroundings are nearly empty.
 *
 * <p>For point i the neighbours within {@link #HALF_LENGTH_M} along the span are tried against
 * straight lines through i of slopes dz/ds from -{@link #MAX_SLOPE} to {@link #MAX_SLOPE}
 * (a Hough vote, methods.md 1.4); the best line's sleeve (radius r across, in offset and
 * elevation) must hold at least {@link #MIN_CORE} points and its shell (r to
 * {@link #SHELL_FACTOR} r) no more than it. A wire's sleeve holds its
 * points and an empty shell up to the next conductor (r is 0.4 of the spacing, so the shell ends
 * before it); a crown fills the shell about four times as densely (by volume) as the sleeve. A line crossing
 * the span at more than a few degrees leaves the sleeve within a metre and is no seed.
 */
final class SleeveEvidence {
  /** Half length of the sleeve along the span, m. */
  static final double HALF_LENGTH_M = 1.5;
  /** Steepest slope tried: a sagging distribution conductor near its structure (common
   * practice, no source), and the tried step. */
  static final double MAX_SLOPE = 0.4;
  static final double SLOPE_STEP = 0.02;
  /** Fewest points in the sleeve, the point included. */
  static final int MIN_CORE = 4;
  /** Shell outer radius in sleeve radii. */
  static final double SHELL_FACTOR = 2.2;
  /** Most shell points per sleeve point. */
  static final double MAX_SHELL_SHARE = 1.0;

  private SleeveEvidence() {}

  /** Which unlabelled points show wire evidence for sleeve radius {@code r}, m. */
  static boolean[] evaluate(SpanPoints p, double r) {
    int n = p.size();
    boolean[] linear = new boolean[n];
    double outer = SHELL_FACTOR * r;
    PointGrid grid = new PointGrid(p, HALF_LENGTH_M);
    IntList nb = new IntList();
    int slopes = (int) Math.round(2 * MAX_SLOPE / SLOPE_STEP) + 1;
    int[] votes = new int[slopes];
    double reach = Math.hypot(HALF_LENGTH_M, MAX_SLOPE * HALF_LENGTH_M + outer);
    for (int i = 0; i < n; i++) {
      if (p.labelled(i)) {
        continue;
      }
      grid.within(i, reach, nb);
      if (nb.size() < MIN_CORE) {
        continue;
      }
      java.util.Arrays.fill(votes, 0);
      for (int k = 0; k < nb.size(); k++) {
        int j = nb.get(k);
        double ds = p.s(j) - p.s(i);
        double de = p.e(j) - p.e(i);
        if (Math.abs(ds) > HALF_LENGTH_M || Math.abs(de) > r) {
          continue;
        }
        double dz = p.z(j) - p.z(i);
        for (int t = 0; t < slopes; t++) {
          double m = -MAX_SLOPE + t * SLOPE_STEP;
          double v = dz - m * ds;
          if (de * de + v * v <= r * r) {
            votes[t]++;
          }
        }
      }
      int best = 0;
      for (int t = 1; t < slopes; t++) {
        if (votes[t] > votes[best]) {
          best = t;
        }
      }
      if (votes[best] < MIN_CORE) {
        continue;
      }
      double m = -MAX_SLOPE + best * SLOPE_STEP;
      int shell = 0;
      for (int k = 0; k < nb.size(); k++) {
        int j = nb.get(k);
        double ds = p.s(j) - p.s(i);
        if (Math.abs(ds) > HALF_LENGTH_M) {
          continue;
        }
        double de = p.e(j) - p.e(i);
        double v = p.z(j) - p.z(i) - m * ds;
        double d2 = de * de + v * v;
        if (d2 > r * r && d2 <= outer * outer) {
          shell++;
        }
      }
      linear[i] = shell <= MAX_SHELL_SHARE * votes[best];
    }
    return linear;
  }
}
