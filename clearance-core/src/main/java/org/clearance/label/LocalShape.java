package org.clearance.label;

import org.clearance.wire.Eigen3;

/**
 * Dimensionality features of a point's neighbourhood from the eigenvalues l1 &gt;= l2 &gt;= l3 of
 * the 3D covariance of the points within a fixed radius: linearity (l1 - l2) / l1, planarity
 * (l2 - l3) / l1 and scattering l3 / l1, which sum to 1 (Demantke, Mallet, David and Vallet
 * 2011, "Dimensionality based scale selection in 3D lidar point clouds", ISPRS Archives
 * XXXVIII-5/W12; Weinmann, Jutzi, Hinz and Mallet 2015, "Semantic point cloud interpretation
 * based on optimal neighborhoods, relevant features and efficient classifiers", ISPRS J.
 * 105:286-304, eigenvalue-based features), and the verticality |v1z| of the principal direction.
 *
 * @param linearity (l1 - l2) / l1, 0-1
 * @param planarity (l2 - l3) / l1, 0-1
 * @param scattering l3 / l1, 0-1
 * @param verticality |z component| of the unit principal direction, 0 (level) to 1 (vertical)
 */
record LocalShape(double linearity, double planarity, double scattering, double verticality) {

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
    Eigen3.Result r = Eigen3.symmetric(sxx / n - mx * mx, sxy / n - mx * my, sxz / n - mx * mz,
        syy / n - my * my, syz / n - my * mz, szz / n - mz * mz);
    double l1 = r.l1();
    if (!(l1 > 0)) {
      return null;
    }
    double l2 = Math.max(0, r.l2());
    double l3 = Math.max(0, r.l3());
    return new LocalShape((l1 - l2) / l1, (l2 - l3) / l1, l3 / l1, Math.abs(r.v1z()));
  }
}
