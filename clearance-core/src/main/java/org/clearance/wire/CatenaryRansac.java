package org.clearance.wire;

import java.util.Optional;
import java.util.SplittableRandom;

/**
 * RANSAC consensus for a catenary in the span plane (package-private). Fischler and Bolles
 * (1981), Comm. ACM 24(6):381; docs/methods.md section 2.4.
 *
 * <p>Each trial draws 3 points with well-spread stations, takes the catenary through them
 * ({@link ParabolaStart#throughThree}) and counts the points whose orthogonal residual is within
 * the threshold; ties go to the smaller sum of squared inlier residuals. The trial count adapts
 * to the best inlier share w found so far: N = log(1 - P) / log(1 - w^3).
 */
final class CatenaryRansac {

  /** Trials at most: enough for P = 0.99 down to a 10 % inlier share (4603 trials). */
  static final int MAX_TRIALS = 5000;
  /** Smallest gap between sampled stations as a share of the station range: avoids samples
   * whose curvature is mostly noise. */
  static final double MIN_SAMPLE_GAP = 0.05;

  /** Best consensus: parameters (s0, z0, c) centred, and which points agreed. */
  record Consensus(double[] p, boolean[] inlier, int count, int trials) {}

  private CatenaryRansac() {}

  /**
   * Runs RANSAC over the points with finite s and z.
   *
   * @param s centred stations, m
   * @param z centred elevations, m
   * @param threshold largest orthogonal residual of an inlier, m, &gt; 0
   * @param confidence probability of drawing one all-inlier sample, in (0, 1)
   * @param seed random seed (the search is deterministic for a seed)
   * @param cMin smallest physical c, m
   * @param cMax largest physical c, m
   * @return the best consensus, empty when no sample gave a physical curve
   */
  static Optional<Consensus> run(double[] s, double[] z, double threshold, double confidence,
      long seed, double cMin, double cMax) {
    int n = s.length;
    int[] usable = new int[n];
    int m = 0;
    double sLo = Double.POSITIVE_INFINITY;
    double sHi = Double.NEGATIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      if (Double.isFinite(s[i]) && Double.isFinite(z[i])) {
        usable[m++] = i;
        sLo = Math.min(sLo, s[i]);
        sHi = Math.max(sHi, s[i]);
      }
    }
    if (m < 3 || !(sHi > sLo)) {
      return Optional.empty();
    }
    double minGap = MIN_SAMPLE_GAP * (sHi - sLo);
    CurveModel.Free model = new CurveModel.Free();
    SplittableRandom random = new SplittableRandom(seed);
    double[] best = null;
    int bestCount = 0;
    double bestCost = Double.POSITIVE_INFINITY;
    long needed = MAX_TRIALS;
    int trials = 0;
    double[] ss = new double[3];
    double[] zz = new double[3];
    while (trials < needed && trials < MAX_TRIALS) {
      trials++;
      int a = usable[random.nextInt(m)];
      int b = usable[random.nextInt(m)];
      int c = usable[random.nextInt(m)];
      int lo = s[a] <= s[b] ? (s[a] <= s[c] ? a : c) : (s[b] <= s[c] ? b : c);
      int hi = s[a] > s[b] ? (s[a] > s[c] ? a : c) : (s[b] > s[c] ? b : c);
      int mid = a + b + c - lo - hi;
      if (lo == hi || mid == lo || mid == hi
          || s[mid] - s[lo] < minGap || s[hi] - s[mid] < minGap) {
        continue;
      }
      ss[0] = s[lo];
      ss[1] = s[mid];
      ss[2] = s[hi];
      zz[0] = z[lo];
      zz[1] = z[mid];
      zz[2] = z[hi];
      Optional<double[]> cand = ParabolaStart.throughThree(ss, zz);
      if (cand.isEmpty() || !(cand.get()[2] >= cMin && cand.get()[2] <= cMax)) {
        continue;
      }
      double[] p = cand.get();
      int count = 0;
      double cost = 0;
      for (int k = 0; k < m; k++) {
        int i = usable[k];
        double r = RobustLevenbergMarquardt.orthogonalResidual(model, p, s[i], z[i]);
        if (Math.abs(r) <= threshold) {
          count++;
          cost += r * r;
        }
      }
      if (count > bestCount || (count == bestCount && cost < bestCost)) {
        best = p;
        bestCount = count;
        bestCost = cost;
        double w = (double) count / m;
        double q = 1 - w * w * w;
        needed = q <= 0 ? 1 : (long) Math.ceil(Math.log(1 - confidence) / Math.log(q));
      }
    }
    if (best == null) {
      return Optional.empty();
    }
    boolean[] inlier = new boolean[n];
    for (int k = 0; k < m; k++) {
      int i = usable[k];
      double r = RobustLevenbergMarquardt.orthogonalResidual(model, best, s[i], z[i]);
      inlier[i] = Math.abs(r) <= threshold;
    }
    return Optional.of(new Consensus(best, inlier, bestCount, trials));
  }
}
