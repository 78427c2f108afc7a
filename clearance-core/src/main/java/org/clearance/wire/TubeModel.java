package org.clearance.wire;

/**
 * A quick local model of one wire piece in its span's frame, for growing the piece along itself
 * (package-private): a straight line in plan e(s) = a0 + a1 u and a parabola z(s) = b0 + b1 u +
 * b2 u^2 in the vertical, u = s - sc (a straight line for pieces too short to show their
 * curvature), fitted by least squares with points far outside the tube clipped. Around it, a
 * tube whose half-sizes grow with the distance beyond the piece's ends, so extrapolation errors
 * are allowed for (hypothesis and verification, Sohn, Jwa and Kim 2012, methods.md 1.7).
 */
final class TubeModel {

  /** Shortest piece whose curvature is fitted, m: over less a 3-5 cm noise swamps it. */
  static final double MIN_CURVED_EXTENT_M = 40;
  /** Fewest points for a parabola. */
  static final int MIN_CURVED_POINTS = 8;
  /** Clipping rounds: each refits without the points beyond {@link #CLIP_FACTOR} tubes. */
  static final int CLIP_ROUNDS = 3;
  /** Points farther than this many tube half-sizes are left out of the next round. */
  static final double CLIP_FACTOR = 2;
  /** Tube growth per metre beyond the piece for slope errors, m/m (about 1 degree). */
  static final double SLOPE_ALLOWANCE = 0.02;
  /** Smallest catenary constant allowed for in a straight-line model, m: the unmodelled
   * curvature adds d^2 / (2 c) beyond the piece's end. */
  static final double CURVE_ALLOWANCE_C = 500;
  /** Most the lateral tube may widen beyond the piece, m: wires of one span stand metres apart. */
  static final double MAX_EXTRA_LATERAL_M = 1.0;
  /** Most the vertical tube may widen beyond the piece, m. */
  static final double MAX_EXTRA_VERTICAL_M = 1.5;
  /**
   * Most a narrowed tube (closely spaced conductors) may widen beyond the piece, as a share of
   * its half-size: a tube of 0.4 of the spacing then reaches 0.6 of it, short of the next
   * conductor (issue 15: a straight piece at a steep end otherwise reached the wire below).
   */
  static final double CLOSE_EXTRA_SHARE = 0.5;
  /** The default tube's half-sizes ({@link WireFinderOptions.Growth#defaults()}), m: narrower
   * tubes widen less beyond the piece. */
  static final double DEFAULT_TUBE_LATERAL_M = 0.6;
  static final double DEFAULT_TUBE_VERTICAL_M = 0.45;
  /** Smallest curvature radius (c = 1 / (2 b2)) of a parabola accepted, m ({@link
   * CatenaryFitter#C_MIN}). */
  static final double MIN_C = CatenaryFitter.C_MIN;

  final double lo;
  final double hi;
  private final double sc;
  private final double a0;
  private final double a1;
  private final double a2;
  private final double b0;
  private final double b1;
  private final double b2;
  private final boolean curved;
  private final double tolLateral;
  private final double tolVertical;

  private TubeModel(double lo, double hi, double sc, double[] a, double[] b, boolean curved,
      double tolLateral, double tolVertical) {
    this.lo = lo;
    this.hi = hi;
    this.sc = sc;
    this.a0 = a[0];
    this.a1 = a[1];
    this.a2 = a.length > 2 ? a[2] : 0;
    this.b0 = b[0];
    this.b1 = b[1];
    this.b2 = b.length > 2 ? b[2] : 0;
    this.curved = curved;
    this.tolLateral = tolLateral;
    this.tolVertical = tolVertical;
  }

  /**
   * Fits the model to the members; null when they are fewer than 2 or all at one station.
   *
   * @param tolLateral tube half-width across, m; tolVertical tube half-height, m
   */
  static TubeModel fit(SpanPoints p, IntList members, double tolLateral, double tolVertical) {
    return fit(p, members, tolLateral, tolVertical, false);
  }

  /**
   * As {@link #fit(SpanPoints, IntList, double, double)}; with {@code relative} the elevations
   * are taken relative to the span's common sag shape ({@link SagReference}), so what is left
   * of a wire's curvature may bend either way and a parabola of either sign is accepted.
   */
  static TubeModel fit(SpanPoints p, IntList members, double tolLateral, double tolVertical,
      boolean relative) {
    int n = members.size();
    if (n < 2) {
      return null;
    }
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    double sum = 0;
    for (int k = 0; k < n; k++) {
      double s = p.s(members.get(k));
      lo = Math.min(lo, s);
      hi = Math.max(hi, s);
      sum += s;
    }
    if (!(hi > lo)) {
      return null;
    }
    double sc = sum / n;
    boolean[] use = new boolean[n];
    java.util.Arrays.fill(use, true);
    boolean wantCurve = hi - lo >= MIN_CURVED_EXTENT_M && n >= MIN_CURVED_POINTS;
    TubeModel m = null;
    for (int round = 0; round <= CLIP_ROUNDS; round++) {
      double[] b = wantCurve ? polyFit(p, members, use, sc, 2, false) : null;
      boolean curved = b != null && (relative || b[2] > 0)
          && 1 / (2 * Math.abs(b[2])) >= MIN_C;
      if (!curved) {
        b = polyFit(p, members, use, sc, 1, false);
      }
      double[] a = curved ? polyFit(p, members, use, sc, 2, true) : null;
      if (a == null || !(Math.abs(a[2]) <= Math.abs(b[2]))) {
        a = polyFit(p, members, use, sc, 1, true);
      }
      if (a == null || b == null) {
        return m;
      }
      m = new TubeModel(lo, hi, sc, a, b, curved, tolLateral, tolVertical);
      int kept = 0;
      for (int k = 0; k < n; k++) {
        int i = members.get(k);
        use[k] = Math.abs(p.e(i) - m.e(p.s(i))) <= CLIP_FACTOR * tolLateral
            && Math.abs(p.z(i) - m.z(p.s(i))) <= CLIP_FACTOR * tolVertical;
        kept += use[k] ? 1 : 0;
      }
      if (kept < 2) {
        return m;
      }
    }
    return m;
  }

  /** Least squares polynomial of degree 1 or 2 in u = s - sc of e (plan) or z; null if singular. */
  private static double[] polyFit(SpanPoints p, IntList members, boolean[] use, double sc,
      int degree, boolean plan) {
    // Normal equations of the rows (1, u) or (1, u, u^2) summed in scalars: point by point the
    // same products and sums as a row array per point gave (1 * u = u exactly), no allocation.
    double n = 0;
    double su = 0;
    double suu = 0;
    double suuu = 0;
    double suuuu = 0;
    double sw = 0;
    double suw = 0;
    double suuw = 0;
    double z0 = Double.NaN;
    for (int k = 0; k < members.size(); k++) {
      if (!use[k]) {
        continue;
      }
      int i = members.get(k);
      double u = p.s(i) - sc;
      double v = plan ? p.e(i) : p.z(i);
      if (Double.isNaN(z0)) {
        z0 = v;
      }
      double w = v - z0;
      n += 1;
      su += u;
      suu += u * u;
      sw += w;
      suw += u * w;
      if (degree == 2) {
        double u2 = u * u;
        suuu += u * u2;
        suuuu += u2 * u2;
        suuw += u2 * w;
      }
    }
    double[][] ata = degree == 1
        ? new double[][] {{n, su}, {su, suu}}
        : new double[][] {{n, su, suu}, {su, suu, suuu}, {suu, suuu, suuuu}};
    double[] atb = degree == 1 ? new double[] {sw, suw} : new double[] {sw, suw, suuw};
    double[] x = solve(ata, atb);
    if (x != null) {
      x[0] += z0;
    }
    return x;
  }

  /** Gaussian elimination with partial pivoting; null when singular. */
  static double[] solve(double[][] a, double[] b) {
    int n = b.length;
    double[][] m = new double[n][];
    double[] r = b.clone();
    for (int i = 0; i < n; i++) {
      m[i] = a[i].clone();
    }
    for (int col = 0; col < n; col++) {
      int piv = col;
      for (int row = col + 1; row < n; row++) {
        if (Math.abs(m[row][col]) > Math.abs(m[piv][col])) {
          piv = row;
        }
      }
      if (!(Math.abs(m[piv][col]) > 1e-12 * (1 + Math.abs(m[0][0])))) {
        return null;
      }
      double[] t = m[col];
      m[col] = m[piv];
      m[piv] = t;
      double tr = r[col];
      r[col] = r[piv];
      r[piv] = tr;
      for (int row = col + 1; row < n; row++) {
        double f = m[row][col] / m[col][col];
        for (int c = col; c < n; c++) {
          m[row][c] -= f * m[col][c];
        }
        r[row] -= f * r[col];
      }
    }
    double[] x = new double[n];
    for (int i = n - 1; i >= 0; i--) {
      double v = r[i];
      for (int c = i + 1; c < n; c++) {
        v -= m[i][c] * x[c];
      }
      x[i] = v / m[i][i];
    }
    return x;
  }

  /** Offset of the model at station s, m. */
  double e(double s) {
    double u = s - sc;
    return a0 + a1 * u + a2 * u * u;
  }

  /** Elevation of the model at station s, m. */
  double z(double s) {
    double u = s - sc;
    return b0 + b1 * u + b2 * u * u;
  }

  /** Largest plan slope |de/ds| of the model over the piece. */
  double planSlope() {
    return Math.max(Math.abs(a1 + 2 * a2 * (lo - sc)), Math.abs(a1 + 2 * a2 * (hi - sc)));
  }

  /** True when the vertical model is curved (a parabola, not a line). */
  boolean curved() {
    return curved;
  }

  /**
   * True when point i lies in the tube, widened for its distance beyond the piece's ends. A tube
   * narrower than the default (closely spaced conductors) widens at most in proportion, so that
   * it does not reach the next conductor of the framing.
   */
  boolean contains(SpanPoints p, int i) {
    double s = p.s(i);
    double d = s < lo ? lo - s : s > hi ? s - hi : 0;
    double k = Math.min(1, Math.min(tolLateral / DEFAULT_TUBE_LATERAL_M,
        tolVertical / DEFAULT_TUBE_VERTICAL_M));
    double extraLat = k < 1 ? CLOSE_EXTRA_SHARE * tolLateral : MAX_EXTRA_LATERAL_M;
    double extraVert = k < 1 ? CLOSE_EXTRA_SHARE * tolVertical : MAX_EXTRA_VERTICAL_M;
    double lat = tolLateral + Math.min(extraLat, SLOPE_ALLOWANCE * d);
    double bend = curved ? 0 : d * d / (2 * CURVE_ALLOWANCE_C);
    double vert = tolVertical + Math.min(extraVert, SLOPE_ALLOWANCE * d + bend);
    return Math.abs(p.e(i) - e(s)) <= lat && Math.abs(p.z(i) - z(s)) <= vert;
  }
}
