package org.clearance.wire;

/**
 * The mean and the principal axes (covariance eigenvalues and vectors) of some of a span's
 * candidates in the span frame (station s, offset e, elevation z; m): the shape measure of the
 * linearity tests (Weinmann et al. 2015, docs/methods.md 1.2).
 *
 * @param meanS mean station, m
 * @param meanE mean offset, m
 * @param meanZ mean elevation, m
 * @param axes eigenvalues (m^2, largest first) and unit eigenvectors of the covariance
 */
record PointSpread(double meanS, double meanE, double meanZ, Eigen3.Result axes) {

  /** The spread of the points {@code idx} of {@code p} (at least one). */
  static PointSpread of(SpanPoints p, IntList idx) {
    int n = idx.size();
    double ms = 0;
    double me = 0;
    double mz = 0;
    for (int k = 0; k < n; k++) {
      int i = idx.get(k);
      ms += p.s(i);
      me += p.e(i);
      mz += p.z(i);
    }
    ms /= n;
    me /= n;
    mz /= n;
    double ss = 0;
    double se = 0;
    double sz = 0;
    double ee = 0;
    double ez = 0;
    double zz = 0;
    for (int k = 0; k < n; k++) {
      int i = idx.get(k);
      double ds = p.s(i) - ms;
      double de = p.e(i) - me;
      double dz = p.z(i) - mz;
      ss += ds * ds;
      se += ds * de;
      sz += ds * dz;
      ee += de * de;
      ez += de * dz;
      zz += dz * dz;
    }
    return new PointSpread(ms, me, mz,
        Eigen3.symmetric(ss / n, se / n, sz / n, ee / n, ez / n, zz / n));
  }
}
