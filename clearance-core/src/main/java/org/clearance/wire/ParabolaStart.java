package org.clearance.wire;

import java.util.Optional;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;

/**
 * Closed-form starting values for the catenary fit from a parabola (package-private).
 *
 * <p>Shared/reference/methods.md section 2.2: z = a0 + a1 s + a2 s^2 fitted by linear least
 * squares gives c = 1 / (2 a2), s0 = -a1 / (2 a2), z0 = a0 - a1^2 / (4 a2) (the catenary's
 * second-order Taylor expansion at its vertex). A parabola that opens downwards (a2 &lt;= 0) gives
 * no start.
 */
final class ParabolaStart {

  /** Newton steps that turn a 3-point parabola into the catenary through the same points. */
  static final int EXACT_STEPS = 6;
  /** Residual at the 3 points, m, below which the exact catenary is found. */
  static final double EXACT_TOLERANCE = 1e-9;

  private ParabolaStart() {}

  /**
   * Free start (s0, z0, c) from the points with weight &gt; 0 (centred coordinates), weighted by
   * w; empty when fewer than 3 distinct stations or the parabola does not open upwards.
   */
  static Optional<double[]> free(double[] s, double[] z, double[] w) {
    double scale = 0;
    for (int i = 0; i < s.length; i++) {
      if (w[i] > 0) {
        scale = Math.max(scale, Math.abs(s[i]));
      }
    }
    if (!(scale > 0)) {
      return Optional.empty();
    }
    double[][] n = new double[3][3];
    double[] rhs = new double[3];
    for (int i = 0; i < s.length; i++) {
      if (!(w[i] > 0)) {
        continue;
      }
      double x = s[i] / scale;
      double[] g = {1, x, x * x};
      for (int a = 0; a < 3; a++) {
        for (int b = 0; b < 3; b++) {
          n[a][b] += w[i] * g[a] * g[b];
        }
        rhs[a] += w[i] * g[a] * z[i];
      }
    }
    Optional<double[]> b = solve(n, rhs);
    if (b.isEmpty()) {
      return Optional.empty();
    }
    double a0 = b.get()[0];
    double a1 = b.get()[1] / scale;
    double a2 = b.get()[2] / (scale * scale);
    return fromParabola(a0, a1, a2);
  }

  /**
   * Start (s0, c) with attachment (sA, zA) fixed: z - zA = a1 (s - sA) + a2 (s - sA)^2 by linear
   * least squares, vertex at sA - a1 / (2 a2).
   */
  static Optional<double[]> oneAnchor(double[] s, double[] z, double[] w, double sA, double zA) {
    double scale = 0;
    for (int i = 0; i < s.length; i++) {
      if (w[i] > 0) {
        scale = Math.max(scale, Math.abs(s[i] - sA));
      }
    }
    if (!(scale > 0)) {
      return Optional.empty();
    }
    double[][] n = new double[2][2];
    double[] rhs = new double[2];
    for (int i = 0; i < s.length; i++) {
      if (!(w[i] > 0)) {
        continue;
      }
      double x = (s[i] - sA) / scale;
      double[] g = {x, x * x};
      for (int a = 0; a < 2; a++) {
        for (int b = 0; b < 2; b++) {
          n[a][b] += w[i] * g[a] * g[b];
        }
        rhs[a] += w[i] * g[a] * (z[i] - zA);
      }
    }
    Optional<double[]> b = solve(n, rhs);
    if (b.isEmpty()) {
      return Optional.empty();
    }
    double a1 = b.get()[0] / scale;
    double a2 = b.get()[1] / (scale * scale);
    if (!(a2 > 0)) {
      return Optional.empty();
    }
    return Optional.of(new double[] {sA - a1 / (2 * a2), 1 / (2 * a2)});
  }

  /**
   * The catenary (s0, z0, c) through three points with distinct stations: the parabola through
   * them, then Newton steps on the 3 x 3 system z(s_k) = z_k (methods.md section 2.4). Falls back
   * to the parabola's values when Newton does not settle; empty when the parabola does not open
   * upwards.
   */
  static Optional<double[]> throughThree(double[] s, double[] z) {
    double d1 = (z[1] - z[0]) / (s[1] - s[0]);
    double d2 = (z[2] - z[0]) / (s[2] - s[0]);
    double a2 = (d2 - d1) / (s[2] - s[1]);
    double a1 = d1 - a2 * (s[0] + s[1]);
    double a0 = z[0] - a1 * s[0] - a2 * s[0] * s[0];
    Optional<double[]> start = fromParabola(a0, a1, a2);
    if (start.isEmpty()) {
      return start;
    }
    CurveModel.Free model = new CurveModel.Free();
    double[] p = start.get().clone();
    for (int step = 0; step < EXACT_STEPS; step++) {
      double[][] jac = new double[3][];
      double[] res = new double[3];
      double worst = 0;
      for (int k = 0; k < 3; k++) {
        jac[k] = model.gradient(p, s[k]);
        res[k] = z[k] - model.z(p, s[k]);
        worst = Math.max(worst, Math.abs(res[k]));
      }
      if (worst < EXACT_TOLERANCE) {
        return Optional.of(p);
      }
      Optional<double[]> d = solve(jac, res);
      if (d.isEmpty()) {
        break;
      }
      double[] q = {p[0] + d.get()[0], p[1] + d.get()[1], p[2] + d.get()[2]};
      if (!(q[2] > 0 && Double.isFinite(q[0]) && Double.isFinite(q[1]))) {
        break;
      }
      p = q;
    }
    return Optional.of(p);
  }

  private static Optional<double[]> fromParabola(double a0, double a1, double a2) {
    if (!(a2 > 0 && Double.isFinite(a0) && Double.isFinite(a1) && Double.isFinite(a2))) {
      return Optional.empty();
    }
    return Optional.of(new double[] {-a1 / (2 * a2), a0 - a1 * a1 / (4 * a2), 1 / (2 * a2)});
  }

  private static Optional<double[]> solve(double[][] a, double[] b) {
    DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(a)).getSolver();
    if (!solver.isNonSingular()) {
      return Optional.empty();
    }
    double[] x = solver.solve(new ArrayRealVector(b, false)).toArray();
    for (double v : x) {
      if (!Double.isFinite(v)) {
        return Optional.empty();
      }
    }
    return Optional.of(x);
  }
}
