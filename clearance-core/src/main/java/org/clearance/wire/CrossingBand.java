package org.clearance.wire;

/**
 * The points of a wire crossing the span just beyond its candidates' corridor (package-private;
 * docs/wire-finder.md, "Points set aside").
 *
 * <p>The candidates are the points inside the span's corridor (the widest conductor offset plus
 * the collection's lateral margin, 8 m by default), but the clearance engine measures every point
 * within its keep radius (10 m by default) of a conductor in any condition, so a crossing service
 * line found inside the corridor ({@link CrossingFinder}) was measured as vegetation where it runs
 * on beyond the corridor's edge. The collection step therefore keeps the open points (class 0 or
 * 1, at least the candidate height above ground) of a band {@value #BAND_M} m wide around the
 * corridor apart ({@link CandidateCollector}); here the crossing wires are followed into them
 * point by point, as into a crown's group ({@link ConductorStrands#onCrossings}): a band point is
 * on a crossing wire when the wire points within {@link ConductorStrands#CROSSING_REACH_M} (at
 * least {@link WirePiece#MIN_POINTS}; the corridor's points set aside as a crossing wire or as a
 * wire nobody fitted, and the band points already shown to be on it) form one wire piece whose
 * line the point continues ({@link WireLine#continues}); two wires within that reach make no
 * piece, and nothing is set aside. Such a point is set aside as crossing unless vegetation lies within
 * {@link PointEvidence#TOUCH_M}: a band point not on the wire, or a vegetation point of the
 * corridor; then it is measured and marked touched ({@link SetAside#touchedWire}).
 *
 * <p>Regression (issue 9, generated feeders, ground-only and unlabelled, span P206-P207 of seeds
 * 41 and 42 horizontal and 45 vertical): the service line crossing the span ran on 0.1-0.5 m
 * beyond the corridor's edge, 8.8-9.0 m from the nearest conductor, and set the span's minimum
 * (8.972, 8.790 and 8.811 m against a true 9.886, 9.222 and 9.826 m).
 */
final class CrossingBand {

  /** Width of the band around the corridor, m: the clearance engine's default keep radius
   * (10 m) less the corridor's default lateral margin (8 m), plus 3 m for a conductor blown
   * aside under the blowout condition (common practice, no source). */
  static final double BAND_M = 5.0;

  private CrossingBand() {}

  /**
   * Sets aside the band's points on the span's crossing wires.
   *
   * @param p the span's candidates
   * @param crossed per candidate, true for a point set aside as a crossing wire's or as a wire
   *     nobody fitted (a group that is a wire piece or a long linear group: a crossing wire's
   *     piece between crowns)
   * @param vegetation per candidate, true for a point measured as vegetation
   * @param outer the open points of the band (the same frame and reference elevation as p)
   * @param out where the points set aside go
   */
  static void setAside(SpanPoints p, boolean[] crossed, boolean[] vegetation, SpanPoints outer,
      SetAside out) {
    int n = outer.size();
    double reach = ConductorStrands.CROSSING_REACH_M;
    int known = 0;
    for (boolean c : crossed) {
      known += c ? 1 : 0;
    }
    if (n == 0 || known < WirePiece.MIN_POINTS) {
      return;
    }
    // the wire's points so far: the corridor's crossing points, then the band's found
    double[] rs = new double[known + n];
    double[] re = new double[known + n];
    double[] rz = new double[known + n];
    int m = 0;
    for (int i = 0; i < crossed.length; i++) {
      if (crossed[i]) {
        rs[m] = p.s(i);
        re[m] = p.e(i);
        rz[m] = p.z(i);
        m++;
      }
    }
    boolean[] on = new boolean[n];
    double[] bs = new double[m + n];
    double[] be = new double[m + n];
    double[] bz = new double[m + n];
    boolean grew = true;
    for (int pass = 0; grew && pass < ConductorStrands.MAX_CROSSING_PASSES; pass++) {
      grew = false;
      for (int j = 0; j < n; j++) {
        if (on[j]) {
          continue;
        }
        double s = outer.s(j);
        double e = outer.e(j);
        double z = outer.z(j);
        int c = 0;
        for (int t = 0; t < m; t++) {
          double ds = rs[t] - s;
          double de = re[t] - e;
          double dz = rz[t] - z;
          if (ds * ds + de * de + dz * dz <= reach * reach) {
            bs[c] = rs[t];
            be[c] = re[t];
            bz[c] = rz[t];
            c++;
          }
        }
        WireLine line = WireLine.of(bs, be, bz, c);
        if (line != null && line.continues(s, e, z)) {
          on[j] = true;
          rs[m] = s;
          re[m] = e;
          rz[m] = z;
          m++;
          grew = true;
        }
      }
    }
    PointGrid bandGrid = new PointGrid(outer, PointEvidence.TOUCH_M);
    PointGrid grid = new PointGrid(p, PointEvidence.TOUCH_M);
    IntList near = new IntList();
    for (int j = 0; j < n; j++) {
      if (!on[j]) {
        continue;
      }
      boolean touched = false;
      bandGrid.within(j, PointEvidence.TOUCH_M, near);
      for (int t = 0; t < near.size() && !touched; t++) {
        touched = !on[near.get(t)];
      }
      grid.within(outer.s(j), outer.e(j), outer.z(j), PointEvidence.TOUCH_M, near);
      for (int t = 0; t < near.size() && !touched; t++) {
        touched = vegetation[near.get(t)];
      }
      if (touched) {
        out.addTouched(outer.key(j));
      } else {
        out.addCrossing(outer.key(j));
      }
    }
  }
}
