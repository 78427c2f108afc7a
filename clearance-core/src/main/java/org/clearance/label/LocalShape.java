package org.clearance.label;

import org.clearance.wire.Eigen3;

/**
 * Dimensionality features of a point's neighbourhood from the eigenvalues l1 &gt;= l2 &gt;= l3 of
 * the 3D covariance of the points within a fixed radius: linearity (l1 - l2) / l1, planarity
 * (l2 - l3) / l1 and scattering l3 / l1, which sum to 1 (Demantke, Mallet, David and Vallet
 * 2011, "Dimensionality based scale selection in 3D lidar point clouds", ISPRS Archives
 * XXXVIII-5/W12; Weinmann, Jutzi, Hinz and Mallet 2015, "Semantic point cloud interpretation
 * based on optimal neighborhoods, relevant features and efficient classifiers", ISPRS J.
 * 105:286-304, eigenvalue-based features), the verticality |v1z| of the principal direction,
 * and the normal: the unit eigenvector of l3, turned upwards (nz &gt;= 0), the direction a
 * roof's facet faces.
 *
 * @param linearity (l1 - l2) / l1, 0-1
 * @param planarity (l2 - l3) / l1, 0-1
 * @param scattering l3 / l1, 0-1
 * @param verticality |z component| of the unit principal direction, 0 (level) to 1 (vertical)
 * @param nx x component of the unit normal (eigenvector of l3), likewise ny and nz (nz &gt;= 0)
 */
record LocalShape(double linearity, double planarity, double scattering, double verticality,
    double nx, double ny, double nz) {

  /** Which of the three features is largest: 0 linear, 1 planar, 2 scattered. */
  int dominant() {
    if (linearity >= planarity && linearity >= scattering) {
      return 0;
    }
    return planarity >= scattering ? 1 : 2;
  }

  /**
   * The features of a neighbourhood from its coordinate sums.
   *
   * @param n points
   * @param sx sum of x (relative to any origin, m), likewise sy, sz and the sums of products
   * @return the features, or null when the covariance is degenerate (all points in one place)
   */
  static LocalShape of(int n, double sx, double sy, double sz, double sxx, double sxy,
      double sxz, double syy, double syz, double szz) {
    double mx = sx / n;
    double my = sy / n;
    double mz = sz / n;
    double cxx = sxx / n - mx * mx;
    double cxy = sxy / n - mx * my;
    double cxz = sxz / n - mx * mz;
    double cyy = syy / n - my * my;
    double cyz = syz / n - my * mz;
    double czz = szz / n - mz * mz;
    Eigen3.Result r = Eigen3.symmetric(cxx, cxy, cxz, cyy, cyz, czz);
    double l1 = r.l1();
    if (!(l1 > 0)) {
      return null;
    }
    double l2 = Math.max(0, r.l2());
    double l3 = Math.max(0, r.l3());
    double[] normal = nullVector(cxx - r.l3(), cxy, cxz, cyy - r.l3(), cyz, czz - r.l3());
    return new LocalShape((l1 - l2) / l1, (l2 - l3) / l1, l3 / l1, Math.abs(r.v1z()),
        normal[0], normal[1], normal[2]);
  }

  /**
   * The unit vector a symmetric matrix of rank 2, [[a, b, c], [b, d, e], [c, e, f]], sends to
   * zero: the largest cross product of two of its rows (each row is orthogonal to the null
   * vector), turned so its z component is not negative; (0, 0, 1) when the rank is lower.
   */
  static double[] nullVector(double a, double b, double c, double d, double e, double f) {
    // the rows' cross products (0, 1), (0, 2), (1, 2) in that order, the first largest kept
    double bx = 0;
    double by = 0;
    double bz = 1;
    double bestNorm = 0;
    for (int pair = 0; pair < 3; pair++) {
      double u0 = pair == 2 ? b : a;
      double u1 = pair == 2 ? d : b;
      double u2 = pair == 2 ? e : c;
      double v0 = pair == 0 ? b : c;
      double v1 = pair == 0 ? d : e;
      double v2 = pair == 0 ? e : f;
      double x = u1 * v2 - u2 * v1;
      double y = u2 * v0 - u0 * v2;
      double z = u0 * v1 - u1 * v0;
      double norm = Math.sqrt(x * x + y * y + z * z);
      if (norm > bestNorm) {
        bestNorm = norm;
        double sign = z < 0 ? -1 : 1;
        bx = sign * x / norm;
        by = sign * y / norm;
        bz = sign * z / norm;
      }
    }
    return new double[] {bx, by, bz};
  }
}
