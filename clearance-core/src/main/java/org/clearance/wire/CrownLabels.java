package org.clearance.wire;

/**
 * Wire labels (ASPRS 13, 14) among a span's candidates that lie in a volume of wire-labelled
 * points rather than on a line (package-private; issue 9: existing labels are trusted only as
 * far as they are consistent). A vendor's classifier that took a crown hanging on a conductor
 * for wire leaves the crown in class 14; taken as wire seeds, its points join the conductor's
 * and the phase is lost (measured on the open corridor tile, docs/labelling.md).
 *
 * <p>For each labelled candidate, the covariance of the labelled candidates within {@link
 * #RADIUS_M} (at least {@link #MIN_NEIGHBOURS}) gives eigenvalues l1 &gt;= l2 &gt;= l3
 * (Demantké, Mallet, David and Vallet 2011, ISPRS Archives XXXVIII-5/W12; Weinmann, Jutzi, Hinz
 * and Mallet 2015, ISPRS J. 105:286-304). A point whose neighbourhood scatters (l3 / l1 above
 * {@link #MIN_SCATTERING}) and is not long and thin (linearity (l1 - l2) / l1 below {@link
 * #MAX_LINEARITY}) is a <em>volume</em> point: a wire, one or a bundle of them, is a line
 * (linearity 0.9 and more). A labelled point is taken as unclassified (class 1) when it is a
 * volume point or at least half of its labelled neighbours are: it is then no wire seed and no
 * wire label, and is a wire point only if it lies on a fitted curve ({@link PointEvidence}). So
 * the crown's points are judged as an unlabelled survey's, the wire's points away from the crown
 * stay labelled seeds, and the wire's points inside the crown are found on its fitted curve. The
 * survey's label itself is judged later, for measuring, by the labelling step
 * ({@code org.clearance.label.WireLabels}).
 */
final class CrownLabels {

  /** Neighbourhood radius, m: the labelling step's feature radius ({@code label.LocalShape};
   * common practice, no source: 10-40 points at line-survey densities). */
  static final double RADIUS_M = 1.0;
  /** Fewest labelled neighbours (the point included) for a shape worth reading: a plane needs 3,
   * with a margin for noise (as the labelling step; common practice, no source). */
  static final int MIN_NEIGHBOURS = 6;
  /** Least scattering l3 / l1 of a volume: the labelling step's planar-object maximum (a plane
   * or a line scatters only by its noise: 3 cm over a 1 m disc about 0.004; crowns 0.04 and more;
   * docs/labelling.md, "Thresholds and their sources"). */
  static final double MIN_SCATTERING = 0.03;
  /** Linearity at or above which a neighbourhood whose principal direction runs along the span
   * is a line, whatever it scatters: a bundle of four sub-conductors 0.45 m apart scatters like
   * a volume over 1 m (l2 and l3 about (0.225 m)^2 against l1 about 0.25 m^2: linearity about
   * 0.75, computed; {@code CrownLabelsTest}), a crown's neighbourhood has no direction
   * (common practice, no source). */
  static final double MAX_LINEARITY = 0.5;
  /** Largest angle in plan between a line's principal direction and the span, and largest
   * inclination, degrees: the wire finder's linear evidence ({@link
   * WireFinderOptions.Evidence#defaults}). */
  static final double MAX_PLAN_ANGLE_DEG = 15;
  static final double MAX_INCLINATION_DEG = 35;
  /** Share of volume points among a labelled point's labelled neighbours that makes it a volume
   * point too: a wire point beside or inside a crown (common practice, no source). */
  static final double VOLUME_SHARE = 0.5;

  private CrownLabels() {}

  /**
   * Takes the labelled candidates that lie in a volume of labelled points as unclassified.
   *
   * @param p the span's candidates (their classes are changed in place)
   * @return the number of points taken as unclassified
   */
  static int demote(SpanPoints p) {
    int n = p.size();
    boolean[] volume = new boolean[n];
    int labelled = 0;
    for (int i = 0; i < n; i++) {
      labelled += p.labelled(i) ? 1 : 0;
    }
    if (labelled < MIN_NEIGHBOURS) {
      return 0;
    }
    PointGrid grid = new PointGrid(p, RADIUS_M);
    IntList all = new IntList();
    IntList nb = new IntList();
    int[][] neighbours = new int[n][];
    for (int i = 0; i < n; i++) {
      if (!p.labelled(i)) {
        continue;
      }
      grid.within(i, RADIUS_M, all);
      nb.clear();
      for (int k = 0; k < all.size(); k++) {
        if (p.labelled(all.get(k))) {
          nb.add(all.get(k));
        }
      }
      neighbours[i] = nb.toArray();
      if (nb.size() < MIN_NEIGHBOURS) {
        continue;
      }
      Eigen3.Result eig = PointSpread.of(p, nb).axes();
      if (!(eig.l1() > 0)) {
        continue;
      }
      double linearity = (eig.l1() - eig.l2()) / eig.l1();
      double plan = Math.hypot(eig.v1x(), eig.v1y());
      boolean along = Math.atan2(Math.abs(eig.v1y()), Math.abs(eig.v1x()))
          <= Math.toRadians(MAX_PLAN_ANGLE_DEG)
          && Math.atan2(Math.abs(eig.v1z()), plan) <= Math.toRadians(MAX_INCLINATION_DEG);
      volume[i] = eig.l3() / eig.l1() > MIN_SCATTERING && !(linearity >= MAX_LINEARITY && along);
    }
    boolean[] demote = new boolean[n];
    int count = 0;
    for (int i = 0; i < n; i++) {
      if (neighbours[i] == null) {
        continue;
      }
      int v = 0;
      for (int j : neighbours[i]) {
        v += volume[j] ? 1 : 0;
      }
      demote[i] = volume[i] || v >= VOLUME_SHARE * neighbours[i].length;
      count += demote[i] ? 1 : 0;
    }
    for (int i = 0; i < n; i++) {
      if (demote[i]) {
        p.unlabel(i);
      }
    }
    return count;
  }
}
