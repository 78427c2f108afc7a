package org.clearance.wire;

/**
 * The sideways bow of a conductor blown by wind while it was surveyed (package-private).
 *
 * <p>A conductor swung by an angle phi about its chord hangs in a plane tilted from the vertical:
 * a point whose sag below the chord is d in that plane lies d cos(phi) below the chord and
 * d sin(phi) to the side (the swung-plane geometry of docs/check-values.md section 2
 * and methods.md 3.6). Given the vertical sag v = d cos(phi) of the fitted catenary at each point,
 * the lateral offsets from the straight plan line therefore follow alpha + beta s + kappa v with
 * kappa = tan(phi); alpha and beta correct the plan line. Fitted by least squares with one round
 * of clipping. Only fitted when the points show enough of the sag to tell kappa from the line.
 */
final class SwingFit {

  /** Shortest stretch of the span the points must cover, as a share of its length. */
  static final double MIN_EXTENT_SHARE = 0.4;
  /** Smallest range of sag among the points, m: less cannot separate the bow from the line. */
  static final double MIN_SAG_RANGE_M = 1.0;
  /** Largest swing believed of a surveyed wire, radians (45 deg): surveys are flown in light
   * wind, a swing this large would be a gale; more means the points are not one wire. */
  static final double MAX_SWING = Math.toRadians(45);
  /** Clipping: points beyond this many RMS residuals are left out of the second round. */
  static final double CLIP_RMS = 4;
  /** Clipping floor, m: below wire noise. */
  static final double CLIP_FLOOR_M = 0.10;

  /** Plan line correction (alpha m, beta), kappa = tan(swing), and the swing angle (radians). */
  record Bow(double alpha, double beta, double kappa) {
    static final Bow NONE = new Bow(0, 0, 0);

    /** The swing angle, radians, positive towards positive offsets. */
    double angle() {
      return Math.atan(kappa);
    }

    /** Lateral offset of the bowed wire at station s with vertical sag v, m. */
    double lateral(double s, double v) {
      return alpha + beta * s + kappa * v;
    }
  }

  private SwingFit() {}

  /**
   * Fits the bow.
   *
   * @param s stations along the plan line, m
   * @param lateral offsets from the plan line, m
   * @param sag vertical sag of the fitted curve below its chord at each station, m
   * @param use which points to fit
   * @param length plan length of the span, m
   * @return the bow; {@link Bow#NONE} when the points cannot show one
   */
  static Bow fit(double[] s, double[] lateral, double[] sag, boolean[] use, double length) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    double vLo = Double.POSITIVE_INFINITY;
    double vHi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < s.length; k++) {
      if (use[k]) {
        lo = Math.min(lo, s[k]);
        hi = Math.max(hi, s[k]);
        vLo = Math.min(vLo, sag[k]);
        vHi = Math.max(vHi, sag[k]);
      }
    }
    if (!(hi - lo >= MIN_EXTENT_SHARE * length && vHi - vLo >= MIN_SAG_RANGE_M)) {
      return Bow.NONE;
    }
    boolean[] in = use.clone();
    Bow bow = null;
    for (int round = 0; round < 2; round++) {
      bow = solve(s, lateral, sag, in, length);
      if (bow == null) {
        return Bow.NONE;
      }
      double sum = 0;
      int n = 0;
      for (int k = 0; k < s.length; k++) {
        if (in[k]) {
          double r = lateral[k] - bow.lateral(s[k], sag[k]);
          sum += r * r;
          n++;
        }
      }
      double clip = Math.max(CLIP_FLOOR_M, CLIP_RMS * Math.sqrt(sum / n));
      for (int k = 0; k < s.length; k++) {
        in[k] = use[k] && Math.abs(lateral[k] - bow.lateral(s[k], sag[k])) <= clip;
      }
    }
    return Math.abs(bow.angle()) <= MAX_SWING ? bow : Bow.NONE;
  }

  private static Bow solve(double[] s, double[] lateral, double[] sag, boolean[] in,
      double length) {
    double[][] ata = new double[3][3];
    double[] atb = new double[3];
    int n = 0;
    for (int k = 0; k < s.length; k++) {
      if (!in[k]) {
        continue;
      }
      double[] row = {1, s[k] / length, sag[k]};
      for (int r = 0; r < 3; r++) {
        for (int c = 0; c < 3; c++) {
          ata[r][c] += row[r] * row[c];
        }
        atb[r] += row[r] * lateral[k];
      }
      n++;
    }
    if (n < 4) {
      return null;
    }
    double[] x = TubeModel.solve(ata, atb);
    return x == null ? null : new Bow(x[0], x[1] / length, x[2]);
  }
}
