package org.clearance.wire;

import org.clearance.io.Hyperbolic;

/**
 * A catenary family with k free parameters, in coordinates centred on the data (station and
 * elevation minus a reference), as the least-squares engine sees it. Package-private plumbing of
 * {@link CatenaryFitter}.
 *
 * <p>Derivatives from docs/methods.md section 2.3 with t = (s - s0) / c:
 * dz/dz0 = 1, dz/ds0 = -sinh t, dz/dc = cosh t - 1 - t sinh t.
 */
interface CurveModel {

  /** Number of free parameters k. */
  int size();

  /** Elevation at station s (centred), m. */
  double z(double[] p, double s);

  /** Slope dz/ds at station s. */
  double slope(double[] p, double s);

  /** Gradient dz/dp at station s, length k (a new array). */
  double[] gradient(double[] p, double s);

  /**
   * Elevation at station s (centred), m, as {@link #z}, with the gradient dz/dp written into
   * {@code g} (length k) as {@link #gradient} gives it: the same doubles, with the hyperbolic
   * functions both share evaluated once.
   */
  double zAndGradient(double[] p, double s, double[] g);

  /** The catenary constant c of parameters p, m. */
  double c(double[] p);

  /** Full parameters (s0, z0, c), centred, of parameters p. */
  double[] full(double[] p);

  /** Jacobian d(s0, z0, c)/dp, 3 x k, for mapping the parameter covariance. */
  double[][] fullJacobian(double[] p);

  /** Returns p with c moved into [lo, hi]; keeps the optimiser away from c &lt;= 0. */
  double[] clampC(double[] p, double lo, double hi);

  /** All three parameters free: p = (s0, z0, c). */
  final class Free implements CurveModel {

    @Override
    public int size() {
      return 3;
    }

    @Override
    public double z(double[] p, double s) {
      return p[1] + p[2] * Catenary.coshm1((s - p[0]) / p[2]);
    }

    @Override
    public double slope(double[] p, double s) {
      return Hyperbolic.sinh((s - p[0]) / p[2]);
    }

    @Override
    public double[] gradient(double[] p, double s) {
      double t = (s - p[0]) / p[2];
      double sh = Hyperbolic.sinh(t);
      return new double[] {-sh, 1, Catenary.coshm1(t) - t * sh};
    }

    @Override
    public double zAndGradient(double[] p, double s, double[] g) {
      double t = (s - p[0]) / p[2];
      double cm1 = Catenary.coshm1(t);
      double sh = Hyperbolic.sinh(t);
      g[0] = -sh;
      g[1] = 1;
      g[2] = cm1 - t * sh;
      return p[1] + p[2] * cm1;
    }

    @Override
    public double c(double[] p) {
      return p[2];
    }

    @Override
    public double[] full(double[] p) {
      return p.clone();
    }

    @Override
    public double[][] fullJacobian(double[] p) {
      return new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
    }

    @Override
    public double[] clampC(double[] p, double lo, double hi) {
      return new double[] {p[0], p[1], Math.min(hi, Math.max(lo, p[2]))};
    }
  }

  /**
   * One attachment (sA, zA) known, p = (s0, c); the vertex elevation follows:
   * z(s) = zA + c (coshm1(t) - coshm1(tA)), tA = (sA - s0) / c.
   */
  final class OneAnchor implements CurveModel {
    private final double sA;
    private final double zA;

    OneAnchor(double sA, double zA) {
      this.sA = sA;
      this.zA = zA;
    }

    @Override
    public int size() {
      return 2;
    }

    @Override
    public double z(double[] p, double s) {
      return zA + p[1] * (Catenary.coshm1((s - p[0]) / p[1]) - Catenary.coshm1((sA - p[0]) / p[1]));
    }

    @Override
    public double slope(double[] p, double s) {
      return Hyperbolic.sinh((s - p[0]) / p[1]);
    }

    @Override
    public double[] gradient(double[] p, double s) {
      double t = (s - p[0]) / p[1];
      double ta = (sA - p[0]) / p[1];
      double sh = Hyperbolic.sinh(t);
      double sha = Hyperbolic.sinh(ta);
      return new double[] {-sh + sha,
          (Catenary.coshm1(t) - t * sh) - (Catenary.coshm1(ta) - ta * sha)};
    }

    @Override
    public double zAndGradient(double[] p, double s, double[] g) {
      double t = (s - p[0]) / p[1];
      double ta = (sA - p[0]) / p[1];
      double cm1 = Catenary.coshm1(t);
      double cm1a = Catenary.coshm1(ta);
      double sh = Hyperbolic.sinh(t);
      double sha = Hyperbolic.sinh(ta);
      g[0] = -sh + sha;
      g[1] = (cm1 - t * sh) - (cm1a - ta * sha);
      return zA + p[1] * (cm1 - cm1a);
    }

    @Override
    public double c(double[] p) {
      return p[1];
    }

    @Override
    public double[] full(double[] p) {
      double ta = (sA - p[0]) / p[1];
      return new double[] {p[0], zA - p[1] * Catenary.coshm1(ta), p[1]};
    }

    @Override
    public double[][] fullJacobian(double[] p) {
      double ta = (sA - p[0]) / p[1];
      double sha = Hyperbolic.sinh(ta);
      // z0 = zA - c coshm1(tA): dz0/ds0 = sinh tA, dz0/dc = -(coshm1 tA - tA sinh tA)
      return new double[][] {{1, 0}, {sha, -(Catenary.coshm1(ta) - ta * sha)}, {0, 1}};
    }

    @Override
    public double[] clampC(double[] p, double lo, double hi) {
      return new double[] {p[0], Math.min(hi, Math.max(lo, p[1]))};
    }
  }
}
