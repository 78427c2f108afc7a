package org.clearance.wire;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;

/**
 * The points of one fit, centred on their mean station and elevation for well-conditioned
 * arithmetic, with the bookkeeping every fit path shares (package-private).
 */
final class Centred {
  /** Centred stations, m (NaN for an unusable point). */
  final double[] s;
  /** Centred elevations, m (NaN for an unusable point). */
  final double[] z;
  /** 1 for a point with finite coordinates, 0 otherwise. */
  final double[] weights;
  /** Mean station of the usable points, m. */
  final double sRef;
  /** Mean elevation of the usable points, m. */
  final double zRef;
  /** Number of usable points. */
  final int usable;
  /** Number of distinct stations among the usable points. */
  final int distinctStations;

  private Centred(double[] s, double[] z, double[] weights, double sRef, double zRef, int usable,
      int distinctStations) {
    this.s = s;
    this.z = z;
    this.weights = weights;
    this.sRef = sRef;
    this.zRef = zRef;
    this.usable = usable;
    this.distinctStations = distinctStations;
  }

  /**
   * Centres the points.
   *
   * @throws IllegalArgumentException when the arrays differ in length
   */
  static Centred of(double[] s, double[] z) {
    Objects.requireNonNull(s, "s");
    Objects.requireNonNull(z, "z");
    if (s.length != z.length) {
      throw new IllegalArgumentException("s and z differ in length: " + s.length + ", "
          + z.length);
    }
    int n = s.length;
    double[] w = new double[n];
    double sumS = 0;
    double sumZ = 0;
    int usable = 0;
    for (int i = 0; i < n; i++) {
      if (Double.isFinite(s[i]) && Double.isFinite(z[i])) {
        w[i] = 1;
        sumS += s[i];
        sumZ += z[i];
        usable++;
      }
    }
    double sRef = usable > 0 ? sumS / usable : 0;
    double zRef = usable > 0 ? sumZ / usable : 0;
    double[] cs = new double[n];
    double[] cz = new double[n];
    double[] sorted = new double[usable];
    int k = 0;
    for (int i = 0; i < n; i++) {
      cs[i] = w[i] > 0 ? s[i] - sRef : Double.NaN;
      cz[i] = w[i] > 0 ? z[i] - zRef : Double.NaN;
      if (w[i] > 0) {
        sorted[k++] = cs[i];
      }
    }
    Arrays.sort(sorted);
    int distinct = 0;
    for (int i = 0; i < usable; i++) {
      if (i == 0 || sorted[i] != sorted[i - 1]) {
        distinct++;
      }
    }
    return new Centred(cs, cz, w, sRef, zRef, usable, distinct);
  }

  /** The successful fit of a model outcome, shifted back to the caller's coordinates. */
  CatenaryFit result(CurveModel model, RobustLevenbergMarquardt.Outcome o, int iterations,
      CatenaryFit.Method method) {
    double[] f = model.full(o.p());
    Catenary local = new Catenary(f[0], f[1], f[2]);
    return result(local, RobustLevenbergMarquardt.covariance(model, o.p(), s, z, o.robust()),
        o.robust(), iterations, method);
  }

  /** The successful fit of a curve in centred coordinates, shifted back. */
  CatenaryFit result(Catenary local, Optional<CatenaryCovariance> covariance, double[] robust,
      int iterations, CatenaryFit.Method method) {
    boolean[] inlier = new boolean[s.length];
    double sum = 0;
    int count = 0;
    for (int i = 0; i < s.length; i++) {
      if (robust[i] > 0) {
        inlier[i] = true;
        double k = local.slope(s[i]);
        double r = (z[i] - local.z(s[i])) / Math.sqrt(1 + k * k);
        sum += r * r;
        count++;
      }
    }
    Catenary curve = new Catenary(local.s0() + sRef, local.z0() + zRef, local.c());
    return new CatenaryFit(Optional.of(curve), covariance,
        count > 0 ? Math.sqrt(sum / count) : Double.NaN, PointMask.of(inlier), iterations, method,
        Optional.empty());
  }
}
