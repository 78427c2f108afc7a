package org.clearance.wire;

import java.util.Locale;
import java.util.Optional;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * Catenary fit with both attachments known (package-private): only c is free, the vertex follows
 * from methods.md section 2.5 ({@link Catenary#through}).
 *
 * <p>Each reweighting round minimises F(u) = sum W_i (z_i - z(s_i; c))^2 over u = ln c with
 * Brent's method (Brent 1973, "Algorithms for minimization without derivatives", ch. 5;
 * commons-math3 {@link BrentOptimizer}) on the bracket around the best of a coarse grid, so a
 * stray local minimum far from the data's sag cannot capture it. W_i = b_i / (1 + z'^2) with b_i
 * the Tukey biweight of the previous round.
 */
final class TwoAttachmentFit {

  /** Grid points over [ln cMin, ln cMax] before Brent: spacing about 0.13 in ln c (13 %). */
  static final int GRID = 64;
  /** Relative tolerance of Brent on ln c; gives c to about 1e-10 relative. */
  static final double BRENT_RELATIVE = 1e-12;
  /** Absolute tolerance of Brent on ln c. */
  static final double BRENT_ABSOLUTE = 1e-12;
  /** Objective evaluations per Brent search at most. */
  static final int BRENT_EVALUATIONS = 200;
  /** Distance in ln c from a bound below which the minimum counts as lying on the bound. */
  static final double AT_BOUND = 1e-6;
  /** Relative step of the central difference for dz/dc along the constrained family. */
  static final double DIFF_STEP = 1e-6;

  /** Outcome: c, final robust weights, objective evaluations, failure if any. */
  record Outcome(double c, double[] robust, int evaluations, Optional<String> failure) {}

  private TwoAttachmentFit() {}

  static Outcome run(double[] s, double[] z, double[] robust0, double sA, double zA, double sB,
      double zB, double cMin, double cMax) {
    int n = s.length;
    double[] robust = robust0.clone();
    double[] w = new double[n];
    double uLo = Math.log(cMin);
    double uHi = Math.log(cMax);
    double c = Double.NaN;
    int evaluations = 0;
    double[] r = new double[n];
    for (int round = 0; round < RobustLevenbergMarquardt.MAX_ROUNDS; round++) {
      int used = 0;
      for (int i = 0; i < n; i++) {
        if (robust[i] > 0) {
          double k = Double.isNaN(c) ? 0 : Catenary.through(sA, zA, sB, zB, c).slope(s[i]);
          w[i] = robust[i] / (1 + k * k);
          used++;
        } else {
          w[i] = 0;
        }
      }
      if (used < 1) {
        return new Outcome(c, robust, evaluations, Optional.of("no point keeps weight"));
      }
      double bestU = uLo;
      double bestF = Double.POSITIVE_INFINITY;
      for (int g = 0; g <= GRID; g++) {
        double u = uLo + (uHi - uLo) * g / GRID;
        double f = objective(s, z, w, sA, zA, sB, zB, Math.exp(u));
        evaluations++;
        if (f < bestF) {
          bestF = f;
          bestU = u;
        }
      }
      double step = (uHi - uLo) / GRID;
      double lo = Math.max(uLo, bestU - step);
      double hi = Math.min(uHi, bestU + step);
      BrentOptimizer brent = new BrentOptimizer(BRENT_RELATIVE, BRENT_ABSOLUTE);
      UnivariatePointValuePair opt = brent.optimize(new MaxEval(BRENT_EVALUATIONS),
          new UnivariateObjectiveFunction(u -> objective(s, z, w, sA, zA, sB, zB, Math.exp(u))),
          GoalType.MINIMIZE, new SearchInterval(lo, hi, bestU));
      evaluations += brent.getEvaluations();
      double u = opt.getValue() <= bestF ? opt.getPoint() : bestU;
      double cNew = Math.exp(u);
      double change = Double.isNaN(c) ? Double.POSITIVE_INFINITY : Math.abs(cNew / c - 1);
      c = cNew;
      if (u - uLo < AT_BOUND || uHi - u < AT_BOUND) {
        return new Outcome(c, robust, evaluations, Optional.of(String.format(Locale.ROOT,
            "the best catenary constant lies at the edge of the physical range [%.0f, %.0f] m",
            cMin, cMax)));
      }
      Catenary curve = Catenary.through(sA, zA, sB, zB, c);
      int m = 0;
      for (int i = 0; i < n; i++) {
        if (robust[i] > 0) {
          r[m++] = orthogonal(curve, s[i], z[i]);
        }
      }
      double sigma = Math.max(RobustLevenbergMarquardt.SIGMA_FLOOR, RobustScale.sigmaMad(r, m));
      boolean sameSet = true;
      for (int i = 0; i < n; i++) {
        if (Double.isFinite(s[i]) && Double.isFinite(z[i])) {
          double b = RobustScale.tukey(orthogonal(curve, s[i], z[i]), sigma);
          sameSet &= (b > 0) == (robust[i] > 0);
          robust[i] = b;
        }
      }
      if (round > 0 && sameSet && change < RobustLevenbergMarquardt.SETTLE) {
        break;
      }
    }
    return new Outcome(c, robust, evaluations, Optional.empty());
  }

  private static double orthogonal(Catenary curve, double s, double z) {
    double k = curve.slope(s);
    return (z - curve.z(s)) / Math.sqrt(1 + k * k);
  }

  private static double objective(double[] s, double[] z, double[] w, double sA, double zA,
      double sB, double zB, double c) {
    Catenary curve = Catenary.through(sA, zA, sB, zB, c);
    double f = 0;
    for (int i = 0; i < s.length; i++) {
      if (w[i] > 0) {
        double d = z[i] - curve.z(s[i]);
        f += w[i] * d * d;
      }
    }
    return f;
  }

  /**
   * Covariance of (s0, z0, c) when only c is free: var(c) = sigma0^2 / sum W (dz/dc)^2 with
   * sigma0^2 = sum W r^2 / (n - 1), mapped by g = d(s0, z0, c)/dc (rank 1). Derivatives along the
   * constrained family by central differences. Empty with fewer than 2 weighted points.
   */
  static Optional<CatenaryCovariance> covariance(double[] s, double[] z, double[] robust,
      double sA, double zA, double sB, double zB, double c) {
    double h = DIFF_STEP * c;
    Catenary mid = Catenary.through(sA, zA, sB, zB, c);
    Catenary up = Catenary.through(sA, zA, sB, zB, c + h);
    Catenary dn = Catenary.through(sA, zA, sB, zB, c - h);
    double nn = 0;
    double wrr = 0;
    int used = 0;
    for (int i = 0; i < s.length; i++) {
      if (!(robust[i] > 0)) {
        continue;
      }
      double k = mid.slope(s[i]);
      double wi = robust[i] / (1 + k * k);
      double g = (up.z(s[i]) - dn.z(s[i])) / (2 * h);
      double d = z[i] - mid.z(s[i]);
      nn += wi * g * g;
      wrr += wi * d * d;
      used++;
    }
    if (used < 2 || !(nn > 0)) {
      return Optional.empty();
    }
    double varC = wrr / (used - 1) / nn;
    double[] g = {(up.s0() - dn.s0()) / (2 * h), (up.z0() - dn.z0()) / (2 * h), 1};
    double[][] m = new double[3][3];
    for (int a = 0; a < 3; a++) {
      for (int b = 0; b < 3; b++) {
        m[a][b] = g[a] * g[b] * varC;
      }
    }
    for (double[] row : m) {
      for (double v : row) {
        if (!Double.isFinite(v)) {
          return Optional.empty();
        }
      }
    }
    return Optional.of(CatenaryCovariance.of(m));
  }
}
