package org.clearance.wire;

import java.util.function.DoubleUnaryOperator;

/**
 * The common sag shape of a span's closely spaced wires, as a reference profile for clustering
 * and growth (package-private; issue 15). The wires of one distribution span hang nearly
 * parallel (same span, similar tension): one parabola z = z0 + d t + 4 f (t^2 - t) in t = s / L,
 * with d the rise from one structure to the other and f the mid-span sag, follows each of them
 * up to a constant. Taken relative to it, each wire is a nearly level line, so a short piece's
 * straight extension stays on its own wire instead of reaching the one below at a steep end.
 *
 * <p>The shape is the one under which the seeds' elevations gather most tightly: a vote over
 * (d, f) (the Hough transform's idea applied to the shape's two parameters, methods.md 1.4)
 * scoring each shape by the sum of squared counts of a linearly binned histogram of z minus the
 * shape (a sharper histogram scores higher; every wire of a stack becomes one peak under the
 * right shape, and vegetation spreads whatever the shape). A coarse grid over the range the
 * seeds allow, then a fine grid around the best. A least-squares parabola through all seeds, as
 * used before, is pulled by vegetation and crossing wires (seed 35, vertical framing: 2.6 m of
 * sag for a true 1.4 m).
 */
final class SagReference {

  /** Fewest seeds for a shape. */
  static final int MIN_POINTS = 20;
  /** Coarse grid step and histogram bin, m: half of the closest stacks' 0.6 m spacing. */
  static final double COARSE_STEP_M = 0.25;
  /** Fine grid step, m, and its histogram bin, m: about the 2-4 cm noise of a wire point. */
  static final double FINE_STEP_M = 0.02;
  static final double FINE_BIN_M = 0.05;
  /** Half width of the fine search around the coarse best, m: a little over one coarse step. */
  static final double FINE_REACH_M = 0.3;
  /** Most sag and rise considered, m: a 200 m span at c = 250 m sags 20 m (common practice, no
   * source); keeps the grid bounded when stray seeds stand far apart in elevation. */
  static final double MAX_EXTENT_M = 25;
  /** Share of the span at either end whose seeds bound the rise. */
  static final double END_SHARE = 0.15;

  private SagReference() {}

  /** The reference profile of the seeds (elevation at a station, m), or zero when too few. */
  static DoubleUnaryOperator of(SpanPoints p, int[] seeds, double lengthM) {
    if (seeds.length < MIN_POINTS || !(lengthM > 0)) {
      return s -> 0;
    }
    int n = seeds.length;
    double[] t = new double[n];
    double[] z = new double[n];
    double zLo = Double.POSITIVE_INFINITY;
    double zHi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < n; k++) {
      t[k] = p.s(seeds[k]) / lengthM;
      z[k] = p.z(seeds[k]);
      zLo = Math.min(zLo, z[k]);
      zHi = Math.max(zHi, z[k]);
    }
    double range = Math.min(MAX_EXTENT_M, zHi - zLo);
    double[] rise = riseBounds(t, z, range);
    double[] best = search(t, z, rise[0], rise[1], 0, range + COARSE_STEP_M, COARSE_STEP_M,
        COARSE_STEP_M);
    best = search(t, z, best[0] - FINE_REACH_M, best[0] + FINE_REACH_M,
        Math.max(0, best[1] - FINE_REACH_M), best[1] + FINE_REACH_M, FINE_STEP_M, FINE_BIN_M);
    double d = best[0];
    double f = best[1];
    return s -> shape(d, f, s / lengthM);
  }

  /** The shape's elevation at t, up to a constant, m. */
  static double shape(double rise, double sag, double t) {
    return rise * t + 4 * sag * (t * t - t);
  }

  /** Bounds of the rise from the seeds near either end; the full range when an end has none. */
  private static double[] riseBounds(double[] t, double[] z, double range) {
    double aLo = Double.POSITIVE_INFINITY;
    double aHi = Double.NEGATIVE_INFINITY;
    double bLo = Double.POSITIVE_INFINITY;
    double bHi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < t.length; k++) {
      if (t[k] <= END_SHARE) {
        aLo = Math.min(aLo, z[k]);
        aHi = Math.max(aHi, z[k]);
      } else if (t[k] >= 1 - END_SHARE) {
        bLo = Math.min(bLo, z[k]);
        bHi = Math.max(bHi, z[k]);
      }
    }
    if (!(aHi >= aLo && bHi >= bLo)) {
      return new double[] {-range, range};
    }
    return new double[] {Math.max(-MAX_EXTENT_M, bLo - aHi - COARSE_STEP_M),
        Math.min(MAX_EXTENT_M, bHi - aLo + COARSE_STEP_M)};
  }

  /** The (rise, sag) on the grid whose residual histogram is sharpest. */
  private static double[] search(double[] t, double[] z, double dLo, double dHi, double fLo,
      double fHi, double step, double bin) {
    int nd = (int) Math.ceil((dHi - dLo) / step) + 1;
    int nf = (int) Math.ceil((fHi - fLo) / step) + 1;
    double[] r = new double[t.length];
    double bestScore = -1;
    double[] best = {0, 0};
    for (int i = 0; i < nd; i++) {
      double d = dLo + i * step;
      for (int j = 0; j < nf; j++) {
        double f = fLo + j * step;
        for (int k = 0; k < t.length; k++) {
          r[k] = z[k] - shape(d, f, t[k]);
        }
        double score = sharpness(r, bin);
        if (score > bestScore) {
          bestScore = score;
          best = new double[] {d, f};
        }
      }
    }
    return best;
  }

  /** Sum of squared counts of the linearly binned histogram of r (bin width in m). */
  static double sharpness(double[] r, double bin) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (double v : r) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
    int bins = (int) ((hi - lo) / bin) + 2;
    double[] h = new double[bins];
    for (double v : r) {
      double x = (v - lo) / bin;
      int b = (int) x;
      double w = x - b;
      h[b] += 1 - w;
      h[b + 1] += w;
    }
    double sum = 0;
    for (double c : h) {
      sum += c * c;
    }
    return sum;
  }
}
