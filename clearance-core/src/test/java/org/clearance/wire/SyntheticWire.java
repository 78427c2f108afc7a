package org.clearance.wire;

import java.util.Random;

/**
 * Seeded synthetic wire points for fitter tests: a known catenary between attachments at
 * stations 0 and L, sampled at random stations with Gaussian vertical noise, optional gaps and
 * outliers (birds above the wire, branches below it, clutter anywhere in the span's box).
 */
final class SyntheticWire {
  final Catenary truth;
  final double length;
  final double[] s;
  final double[] z;
  /** True where the point was generated as an outlier. */
  final boolean[] outlier;

  private SyntheticWire(Catenary truth, double length, double[] s, double[] z, boolean[] outlier) {
    this.truth = truth;
    this.length = length;
    this.s = s;
    this.z = z;
    this.outlier = outlier;
  }

  /**
   * Points of the catenary with constant c through (0, zA) and (L, zB).
   *
   * @param n number of points
   * @param from smallest station sampled as a share of L
   * @param to largest station sampled as a share of L
   * @param noise standard deviation of the vertical noise, m
   * @param outlierShare share of points replaced by outliers, in [0, 1)
   */
  static SyntheticWire of(long seed, double length, double zA, double zB, double c, int n,
      double from, double to, double noise, double outlierShare) {
    Random rnd = new Random(seed);
    Catenary truth = Catenary.through(0, zA, length, zB, c);
    double[] s = new double[n];
    double[] z = new double[n];
    boolean[] out = new boolean[n];
    double zLow = Math.min(Math.min(zA, zB), truth.z(truth.maxSagStation(0, length)));
    double zHigh = Math.max(zA, zB);
    for (int i = 0; i < n; i++) {
      s[i] = length * (from + (to - from) * rnd.nextDouble());
      z[i] = truth.z(s[i]) + noise * rnd.nextGaussian();
      if (rnd.nextDouble() < outlierShare) {
        out[i] = true;
        double kind = rnd.nextDouble();
        if (kind < 0.3) {
          z[i] = truth.z(s[i]) + 0.4 + 2.0 * rnd.nextDouble(); // bird or wire marker above
        } else if (kind < 0.7) {
          z[i] = truth.z(s[i]) - 0.4 - 3.0 * rnd.nextDouble(); // branch touching from below
        } else {
          z[i] = zLow - 10 + (zHigh - zLow + 15) * rnd.nextDouble(); // clutter in the box
        }
      }
    }
    return new SyntheticWire(truth, length, s, z, out);
  }

  /** Mid-span sag error of a fitted curve, m (absolute). */
  double sagError(Catenary fitted) {
    return Math.abs(fitted.midSpanSag(0, length) - truth.midSpanSag(0, length));
  }

  /** Larger of the two attachment elevation errors of a fitted curve, m (absolute). */
  double attachmentError(Catenary fitted) {
    return Math.max(Math.abs(fitted.z(0) - truth.z(0)),
        Math.abs(fitted.z(length) - truth.z(length)));
  }
}
