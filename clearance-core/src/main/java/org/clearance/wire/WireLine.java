package org.clearance.wire;

/**
 * The line of a wire piece ({@link WirePiece}) fitted to its points, and whether another point
 * continues it (package-private; docs/wire-finder.md, "Points set aside").
 *
 * <p>In plan: the principal axis of the points (the eigenvector of the 2 x 2 plan covariance;
 * Weinmann, Jutzi, Hinz and Mallet 2015, ISPRS J. 105:286-304, eigenvalue features); a hanging
 * wire, swung or not, lies in a vertical plane, so it is a straight line in plan. Along the axis:
 * the elevation as a straight line, or else as a parabola that sags like a hanging wire
 * (curvature 0 to 1 / {@link WirePiece#MIN_CATENARY_M}; a catenary's second derivative is 1/c at
 * its low point, methods.md 2.1). The points are a piece when each lies within {@link
 * WirePiece#TOL_M} of both and they run at least {@link WirePiece#MIN_RUN_M} m.
 *
 * <p>A point continues the piece when it lies, across in plan and in elevation, within {@link
 * PointEvidence#TOL_SIGMAS} robust standard deviations (1.4826 MAD, at least {@link
 * PointEvidence#SIGMA_FLOOR_M}) of the piece's own residuals from that fixed line, and never
 * farther than {@link WirePiece#TOL_M}: the evidence of a fitted conductor's curve ({@link
 * PointEvidence#onCurve}) applied to a wire nobody fitted. The line is fitted without the point,
 * so a crown's point beside the wire neither tilts it nor widens its tolerance.
 */
final class WireLine {

  private final double ms;
  private final double me;
  private final double ux;
  private final double uy;
  /** Elevation along the axis: a + b u + c u^2 with u = t - mt. */
  private final double mt;
  private final double a;
  private final double b;
  private final double c;
  private final double tolAcross;
  private final double tolUp;

  private WireLine(double ms, double me, double ux, double uy, double[] fit, double tolAcross,
      double tolUp) {
    this.ms = ms;
    this.me = me;
    this.ux = ux;
    this.uy = uy;
    this.mt = fit[0];
    this.a = fit[1];
    this.b = fit[2];
    this.c = fit[3];
    this.tolAcross = tolAcross;
    this.tolUp = tolUp;
  }

  /** The line of the given candidates ({@code count} of {@code members}), or null when they are
   * no wire piece. */
  static WireLine of(SpanPoints p, int[] members, int count) {
    if (count < WirePiece.MIN_POINTS) {
      return null;
    }
    double[] s = new double[count];
    double[] e = new double[count];
    double[] z = new double[count];
    for (int k = 0; k < count; k++) {
      s[k] = p.s(members[k]);
      e[k] = p.e(members[k]);
      z[k] = p.z(members[k]);
    }
    return of(s, e, z, count);
  }

  /**
   * The line of the points (station, offset, elevation, m; the first {@code n}), or null when
   * they are no wire piece.
   */
  static WireLine of(double[] s, double[] e, double[] z, int n) {
    if (n < WirePiece.MIN_POINTS) {
      return null;
    }
    double ms = 0;
    double me = 0;
    for (int k = 0; k < n; k++) {
      ms += s[k];
      me += e[k];
    }
    ms /= n;
    me /= n;
    double ss = 0;
    double se = 0;
    double ee = 0;
    for (int k = 0; k < n; k++) {
      double ds = s[k] - ms;
      double de = e[k] - me;
      ss += ds * ds;
      se += ds * de;
      ee += de * de;
    }
    // principal axis of the 2 x 2 covariance: angle 0.5 atan2(2 se, ss - ee)
    double angle = 0.5 * Math.atan2(2 * se, ss - ee);
    double ux = Math.cos(angle);
    double uy = Math.sin(angle);
    double[] t = new double[n];
    double[] across = new double[n];
    double tMin = Double.POSITIVE_INFINITY;
    double tMax = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < n; k++) {
      double ds = s[k] - ms;
      double de = e[k] - me;
      across[k] = -uy * ds + ux * de;
      if (Math.abs(across[k]) > WirePiece.TOL_M) {
        return null;
      }
      t[k] = ux * ds + uy * de;
      tMin = Math.min(tMin, t[k]);
      tMax = Math.max(tMax, t[k]);
    }
    if (tMax - tMin < WirePiece.MIN_RUN_M) {
      return null;
    }
    double[] fit = straight(t, z, n);
    if (fit == null) {
      fit = sag(t, z, n);
    }
    if (fit == null) {
      return null;
    }
    double[] up = new double[n];
    for (int k = 0; k < n; k++) {
      double u = t[k] - fit[0];
      up[k] = z[k] - fit[1] - fit[2] * u - fit[3] * u * u;
    }
    return new WireLine(ms, me, ux, uy, fit, tolerance(across, n), tolerance(up, n));
  }

  /** True when the point (station, offset, elevation, m) continues the piece. */
  boolean continues(double s, double e, double z) {
    double ds = s - ms;
    double de = e - me;
    double u = ux * ds + uy * de - mt;
    return Math.abs(-uy * ds + ux * de) <= tolAcross
        && Math.abs(z - a - b * u - c * u * u) <= tolUp;
  }

  private static double tolerance(double[] residuals, int n) {
    double sigma = Math.max(PointEvidence.SIGMA_FLOOR_M, RobustScale.sigmaMad(residuals, n));
    return Math.min(WirePiece.TOL_M, PointEvidence.TOL_SIGMAS * sigma);
  }

  /** Straight line z = a + b t: every residual within {@link WirePiece#TOL_M}, slope within
   * limits; {mt, a, b, 0} or null. */
  private static double[] straight(double[] t, double[] z, int n) {
    double mt = 0;
    double mz = 0;
    for (int k = 0; k < n; k++) {
      mt += t[k];
      mz += z[k];
    }
    mt /= n;
    mz /= n;
    double tt = 0;
    double tz = 0;
    for (int k = 0; k < n; k++) {
      tt += (t[k] - mt) * (t[k] - mt);
      tz += (t[k] - mt) * (z[k] - mz);
    }
    double b = tz / tt;
    if (!(Math.abs(b) <= WirePiece.MAX_SLOPE)) {
      return null;
    }
    for (int k = 0; k < n; k++) {
      if (Math.abs(z[k] - mz - b * (t[k] - mt)) > WirePiece.TOL_M) {
        return null;
      }
    }
    return new double[] {mt, mz, b, 0};
  }

  /**
   * Parabola z = a + b u + c u^2, u = t - mean t, by least squares (normal equations): every
   * residual within {@link WirePiece#TOL_M}, curvature 2c between 0 and 1 / {@link
   * WirePiece#MIN_CATENARY_M} (hanging, not humped), slope within limits over the piece;
   * {mt, a, b, c} or null.
   */
  private static double[] sag(double[] t, double[] z, int n) {
    double mt = 0;
    for (int k = 0; k < n; k++) {
      mt += t[k];
    }
    mt /= n;
    double s1 = 0;
    double s2 = 0;
    double s3 = 0;
    double s4 = 0;
    double z0 = 0;
    double z1 = 0;
    double z2 = 0;
    for (int k = 0; k < n; k++) {
      double u = t[k] - mt;
      s1 += u;
      s2 += u * u;
      s3 += u * u * u;
      s4 += u * u * u * u;
      z0 += z[k];
      z1 += u * z[k];
      z2 += u * u * z[k];
    }
    double[] c = solve3(n, s1, s2, s1, s2, s3, s2, s3, s4, z0, z1, z2);
    if (c == null || !(c[2] >= 0 && 2 * c[2] <= 1 / WirePiece.MIN_CATENARY_M)) {
      return null;
    }
    double uMin = Double.POSITIVE_INFINITY;
    double uMax = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < n; k++) {
      double u = t[k] - mt;
      uMin = Math.min(uMin, u);
      uMax = Math.max(uMax, u);
      if (Math.abs(z[k] - c[0] - c[1] * u - c[2] * u * u) > WirePiece.TOL_M) {
        return null;
      }
    }
    if (!(Math.abs(c[1] + 2 * c[2] * uMin) <= WirePiece.MAX_SLOPE
        && Math.abs(c[1] + 2 * c[2] * uMax) <= WirePiece.MAX_SLOPE)) {
      return null;
    }
    return new double[] {mt, c[0], c[1], c[2]};
  }

  /** Solves a 3 x 3 system (row-major) by Cramer's rule; null when singular. */
  private static double[] solve3(double a, double b, double c, double d, double e, double f,
      double g, double h, double i, double r0, double r1, double r2) {
    double det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
    if (!(Math.abs(det) > 1e-12)) {
      return null;
    }
    double x0 = (r0 * (e * i - f * h) - b * (r1 * i - f * r2) + c * (r1 * h - e * r2)) / det;
    double x1 = (a * (r1 * i - f * r2) - r0 * (d * i - f * g) + c * (d * r2 - r1 * g)) / det;
    double x2 = (a * (e * r2 - r1 * h) - b * (d * r2 - r1 * g) + r0 * (d * h - e * g)) / det;
    return new double[] {x0, x1, x2};
  }
}
