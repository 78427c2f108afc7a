package org.clearance.wire;

import java.util.Optional;
import org.apache.commons.math3.exception.MathArithmeticException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.util.Pair;

/**
 * Iteratively reweighted Levenberg-Marquardt for a {@link CurveModel} (package-private).
 *
 * <p>Each round fixes the weights W_i = b_i / (1 + z'(s_i)^2), b_i the Tukey biweight of the
 * point's orthogonal residual in the previous round (1 in the first round unless given), and
 * solves the weighted problem with commons-math3's {@link LevenbergMarquardtOptimizer} (Moré 1978
 * MINPACK variant) using the analytic Jacobian of methods.md section 2.3. 1 / (1 + z'^2) =
 * 1 / cosh^2 t turns vertical residuals into orthogonal ones to first order.
 */
final class RobustLevenbergMarquardt {

  /** Reweighting rounds at most; Tukey weights settle in 3-5 rounds from a fair start. */
  static final int MAX_ROUNDS = 10;
  /** LM iterations per round; from a parabola start it needs 3-10. */
  static final int MAX_ITERATIONS = 200;
  /** Model evaluations per round, a multiple of the iterations for rejected LM steps. */
  static final int MAX_EVALUATIONS = 2000;
  /** Lower bound of the robust scale, m: below lidar precision, keeps exact data from 0 / 0. */
  static final double SIGMA_FLOOR = 0.001;
  /** Relative parameter change below which the rounds have settled. */
  static final double SETTLE = 1e-9;
  /** Largest |t| = |s - s0| / c kept for data stations; sinh 6 = 202, steeper than any wire. */
  static final double T_LIMIT = 6;
  /** Factor by which c may leave the physical bounds during iteration before it is clamped. */
  static final double C_SLACK = 4;

  /** Outcome of the rounds: parameters, robust weights, iterations and failure if any. */
  record Outcome(double[] p, double[] robust, int iterations, Optional<String> failure) {}

  private RobustLevenbergMarquardt() {}

  /**
   * Runs the rounds.
   *
   * @param s centred stations, m
   * @param z centred elevations, m
   * @param robust0 initial robust weights in [0, 1], 0 for unusable points (not changed)
   * @param start start parameters (not changed)
   * @param cMin smallest physical c, m
   * @param cMax largest physical c, m
   */
  static Outcome run(CurveModel model, double[] s, double[] z, double[] robust0, double[] start,
      double cMin, double cMax) {
    int n = s.length;
    double[] robust = robust0.clone();
    double[] p = start.clone();
    int iterations = 0;
    double[] r = new double[n];
    double[] residual = new double[n];
    // slopes at the current parameters, for the next round's weights; null until computed
    double[] slope = null;
    for (int round = 0; round < MAX_ROUNDS; round++) {
      int used = 0;
      for (double b : robust) {
        used += b > 0 ? 1 : 0;
      }
      if (used < model.size()) {
        return new Outcome(p, robust, iterations, Optional.of(
            "only " + used + " points keep weight, " + model.size() + " parameters"));
      }
      LeastSquaresOptimizer.Optimum opt;
      try {
        opt = solve(model, s, z, robust, p, slope, used, cMin, cMax);
      } catch (MathIllegalStateException | MathArithmeticException e) {
        return new Outcome(p, robust, iterations,
            Optional.of("Levenberg-Marquardt did not converge: " + e.getMessage()));
      }
      iterations += opt.getIterations();
      double[] q = opt.getPoint().toArray();
      for (double v : q) {
        if (!Double.isFinite(v)) {
          return new Outcome(p, robust, iterations, Optional.of("non-finite parameters"));
        }
      }
      double change = 0;
      for (int j = 0; j < q.length; j++) {
        change = Math.max(change, Math.abs(q[j] - p[j]) / (1 + Math.abs(q[j])));
      }
      p = q;
      // Scale from the points that currently keep weight: the plain MAD of all points in the
      // first round, a self-consistent trimmed scale once outliers (up to half or more after a
      // RANSAC start) carry weight 0. Each residual once per round (the scale and the weights
      // use the same ones), as orthogonalResidual computes it, keeping the slope for the next
      // round's weights.
      if (slope == null) {
        slope = new double[n];
      }
      for (int i = 0; i < n; i++) {
        double k = model.slope(p, s[i]);
        slope[i] = k;
        residual[i] = (z[i] - model.z(p, s[i])) / Math.sqrt(1 + k * k);
      }
      int m = 0;
      for (int i = 0; i < n; i++) {
        if (robust[i] > 0) {
          r[m++] = residual[i];
        }
      }
      double sigma = Math.max(SIGMA_FLOOR, RobustScale.sigmaMad(r, m));
      boolean sameSet = true;
      for (int i = 0; i < n; i++) {
        if (!(Double.isFinite(s[i]) && Double.isFinite(z[i]))) {
          continue;
        }
        double b = RobustScale.tukey(residual[i], sigma);
        sameSet &= (b > 0) == (robust[i] > 0);
        robust[i] = b;
      }
      if (round > 0 && sameSet && change < SETTLE) {
        break;
      }
    }
    return new Outcome(p, robust, iterations, Optional.empty());
  }

  /** Orthogonal residual of (s, z), m: vertical residual over sqrt(1 + slope^2). */
  static double orthogonalResidual(CurveModel model, double[] p, double s, double z) {
    double k = model.slope(p, s);
    return (z - model.z(p, s)) / Math.sqrt(1 + k * k);
  }

  /** One weighted solve from {@code start}; {@code slopes} are z' at start per point, or null. */
  private static LeastSquaresOptimizer.Optimum solve(CurveModel model, double[] s, double[] z,
      double[] robust, double[] start, double[] slopes, int used, double cMin, double cMax) {
    double[] ss = new double[used];
    double[] sw = new double[used];
    double[] target = new double[used];
    double sLo = Double.POSITIVE_INFINITY;
    double sHi = Double.NEGATIVE_INFINITY;
    int m = 0;
    for (int i = 0; i < s.length; i++) {
      if (robust[i] > 0) {
        double k = slopes != null ? slopes[i] : model.slope(start, s[i]);
        ss[m] = s[i];
        sw[m] = Math.sqrt(robust[i] / (1 + k * k));
        target[m] = sw[m] * z[i];
        sLo = Math.min(sLo, s[i]);
        sHi = Math.max(sHi, s[i]);
        m++;
      }
    }
    int k = model.size();
    MultivariateJacobianFunction f = point -> {
      double[] p = point.toArray();
      double[] v = new double[used];
      double[][] jac = new double[used][];
      for (int i = 0; i < used; i++) {
        double[] g = new double[k];
        v[i] = sw[i] * model.zAndGradient(p, ss[i], g);
        for (int j = 0; j < k; j++) {
          g[j] *= sw[i];
        }
        jac[i] = g;
      }
      return new Pair<>(new ArrayRealVector(v, false), new Array2DRowRealMatrix(jac, false));
    };
    double lo = sLo;
    double hi = sHi;
    return new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
        .model(f)
        .target(target)
        .start(start)
        .maxIterations(MAX_ITERATIONS)
        .maxEvaluations(MAX_EVALUATIONS)
        .parameterValidator(v -> new ArrayRealVector(
            keepInRange(model, model.clampC(v.toArray(), cMin / C_SLACK, cMax * C_SLACK), lo, hi),
            false))
        .build());
  }

  /** Keeps the vertex within T_LIMIT c of every data station so cosh cannot overflow. */
  private static double[] keepInRange(CurveModel model, double[] p, double sLo, double sHi) {
    double c = model.c(p);
    double lo = sHi - T_LIMIT * c;
    double hi = sLo + T_LIMIT * c;
    if (lo > hi) {
      return p;
    }
    p[0] = Math.min(hi, Math.max(lo, p[0]));
    return p;
  }

  /**
   * Covariance of (s0, z0, c) from the final weights: sigma0^2 M (J^T W J)^-1 M^T, M the model's
   * full Jacobian; empty when there are no redundant points or the normal matrix is singular.
   */
  static Optional<CatenaryCovariance> covariance(CurveModel model, double[] p, double[] s,
      double[] z, double[] robust) {
    int k = model.size();
    double[][] nm = new double[k][k];
    double wrr = 0;
    int used = 0;
    for (int i = 0; i < s.length; i++) {
      if (!(robust[i] > 0)) {
        continue;
      }
      double sl = model.slope(p, s[i]);
      double w = robust[i] / (1 + sl * sl);
      double[] g = new double[k];
      double res = z[i] - model.zAndGradient(p, s[i], g);
      for (int a = 0; a < k; a++) {
        for (int b = 0; b < k; b++) {
          nm[a][b] += w * g[a] * g[b];
        }
      }
      wrr += w * res * res;
      used++;
    }
    if (used <= k) {
      return Optional.empty();
    }
    LUDecomposition lu = new LUDecomposition(new Array2DRowRealMatrix(nm, false));
    if (!lu.getSolver().isNonSingular()) {
      return Optional.empty();
    }
    RealMatrix inv = lu.getSolver().getInverse().scalarMultiply(wrr / (used - k));
    RealMatrix mm = new Array2DRowRealMatrix(model.fullJacobian(p), false);
    double[][] full = mm.multiply(inv).multiply(mm.transpose()).getData();
    for (double[] row : full) {
      for (double v : row) {
        if (!Double.isFinite(v)) {
          return Optional.empty();
        }
      }
    }
    return Optional.of(CatenaryCovariance.of(full));
  }
}
