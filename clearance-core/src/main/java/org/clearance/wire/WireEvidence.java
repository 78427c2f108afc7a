package org.clearance.wire;

import java.util.Objects;

/**
 * Geometric evidence that an unlabelled point lies on a wire (package-private).
 *
 * <p>For each point, the covariance of its neighbours within a sphere (radius from the options,
 * doubled once where fewer than {@link WireFinderOptions.Evidence#MIN_NEIGHBOURS} points fall in)
 * gives eigenvalues l1 &gt;= l2 &gt;= l3 and the principal direction v1 (methods.md 1.2;
 * Weinmann, Jutzi, Hinz and Mallet 2015, ISPRS J. 105:286). A wire point has a high linearity
 * (l1 - l2) / l1 and a principal direction close to the span's in plan and not steep. A sphere,
 * not a cylinder along the span, is used on purpose: a long cylinder makes any volume of points
 * (a crown) look linear along its axis. Measured on the open corridor tile: 94 % of the class-14
 * points pass the defaults, 0.1 % of the vegetation (docs/wire-finder.md).
 */
final class WireEvidence {

  private final WireFinderOptions.Evidence options;

  WireEvidence(WireFinderOptions.Evidence options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /**
   * Which points show wire evidence; labelled points (class 13, 14) are not examined and get
   * false (they are seeds already).
   */
  boolean[] evaluate(SpanPoints p) {
    int n = p.size();
    boolean[] linear = new boolean[n];
    if (n == 0) {
      return linear;
    }
    double r = options.radiusM();
    PointGrid grid = new PointGrid(p, r);
    IntList nb = new IntList();
    double maxPlan = Math.toRadians(options.maxPlanAngleDeg());
    double maxIncl = Math.toRadians(options.maxInclinationDeg());
    for (int i = 0; i < n; i++) {
      if (p.labelled(i)) {
        continue;
      }
      grid.within(i, r, nb);
      if (nb.size() < WireFinderOptions.Evidence.MIN_NEIGHBOURS) {
        grid.within(i, 2 * r, nb);
        if (nb.size() < WireFinderOptions.Evidence.MIN_NEIGHBOURS) {
          continue;
        }
      }
      linear[i] = isLinear(p, nb, maxPlan, maxIncl);
    }
    return linear;
  }

  private boolean isLinear(SpanPoints p, IntList nb, double maxPlan, double maxIncl) {
    Eigen3.Result eig = PointSpread.of(p, nb).axes();
    if (!(eig.l1() > 0)) {
      return false;
    }
    double linearity = (eig.l1() - eig.l2()) / eig.l1();
    double plan = Math.hypot(eig.v1x(), eig.v1y());
    double planAngle = Math.atan2(Math.abs(eig.v1y()), Math.abs(eig.v1x()));
    double inclination = Math.atan2(Math.abs(eig.v1z()), plan);
    return linearity >= options.minLinearity() && planAngle <= maxPlan
        && inclination <= maxIncl;
  }
}
