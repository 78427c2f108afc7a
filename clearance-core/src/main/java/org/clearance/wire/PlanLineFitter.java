package org.clearance.wire;

import java.util.Objects;
import java.util.Optional;
import java.util.SplittableRandom;

/**
 * Fits a straight line in plan to wire points (x, y) by total least squares: the line through
 * the centroid along the principal axis of the 2 x 2 covariance (Pearson 1901, "On lines and
 * planes of closest fit", Phil. Mag. 2(11):559; docs/methods.md sections 2.1-2.2).
 * The major-axis angle has the closed form theta = atan2(2 Sxy, Sxx - Syy) / 2.
 *
 * <p>Robust option: a least-median-of-squares start, then reweighted rounds with Tukey's biweight
 * on the perpendicular residuals at sigma = 1.4826 MAD (as in {@link CatenaryFitter}), so that
 * stray points (a branch, a crossing wire) do not tilt the line. The direction is oriented so
 * that the input order runs forwards: the last inlier lies ahead of the first.
 */
public final class PlanLineFitter {

  /** Reweighting rounds at most; the inlier set settles in 2-5 rounds. */
  static final int MAX_ROUNDS = 10;
  /** Random pairs tried by the least-median start: P = 0.99 of one clean pair down to a 30 %
   * inlier share needs 49 (RANSAC trial formula, methods.md section 2.4). */
  static final int LMEDS_TRIALS = 64;
  /** Fixed seed: fits are deterministic. */
  static final long LMEDS_SEED = 0x5eedL;
  /** Lower bound of the robust scale, m: below plan precision, keeps exact data from 0 / 0. */
  static final double SIGMA_FLOOR = 0.001;

  /**
   * Options.
   *
   * @param robust whether to reweight against outliers (Tukey biweight); plain total least
   *     squares otherwise
   */
  public record Options(boolean robust) {
    /** Robust fitting. */
    public static Options defaults() {
      return new Options(true);
    }
  }

  private final Options options;

  /** A fitter with the given options. */
  public PlanLineFitter(Options options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** Robust fit with default options; see {@link #fitPoints}. */
  public static Optional<PlanLine> fit(double[] x, double[] y) {
    return new PlanLineFitter(Options.defaults()).fitPoints(x, y);
  }

  /**
   * Fits the line.
   *
   * @param x eastings, m; y northings, m (same length; points with a non-finite coordinate are
   *     ignored)
   * @return the line, or empty when fewer than 2 distinct usable points remain
   * @throws IllegalArgumentException when the arrays differ in length
   */
  public Optional<PlanLine> fitPoints(double[] x, double[] y) {
    Objects.requireNonNull(x, "x");
    Objects.requireNonNull(y, "y");
    if (x.length != y.length) {
      throw new IllegalArgumentException("x and y differ in length: " + x.length + ", "
          + y.length);
    }
    int n = x.length;
    double[] w = new double[n];
    int first = -1;
    int last = -1;
    for (int i = 0; i < n; i++) {
      if (Double.isFinite(x[i]) && Double.isFinite(y[i])) {
        w[i] = 1;
        first = first < 0 ? i : first;
        last = i;
      }
    }
    if (first < 0) {
      return Optional.empty();
    }
    // Work relative to the first point: projected coordinates are large (1e6 m) and the
    // covariance would lose digits.
    double ox = x[first];
    double oy = y[first];
    double[] line = principalAxis(x, y, w, ox, oy);
    if (line == null) {
      return Optional.empty();
    }
    if (options.robust()) {
      line = leastMedian(x, y, w, ox, oy, line);
    }
    double[] r = new double[n];
    for (int round = 0; options.robust() && round < MAX_ROUNDS; round++) {
      int m = 0;
      for (int i = 0; i < n; i++) {
        if (w[i] > 0) {
          r[m++] = lateral(line, x[i] - ox, y[i] - oy);
        }
      }
      double sigma = Math.max(SIGMA_FLOOR, RobustScale.sigmaMad(r, m));
      double[] nw = new double[n];
      boolean same = true;
      for (int i = 0; i < n; i++) {
        if (Double.isFinite(x[i]) && Double.isFinite(y[i])) {
          nw[i] = RobustScale.tukey(lateral(line, x[i] - ox, y[i] - oy), sigma);
          same &= (nw[i] > 0) == (w[i] > 0);
        }
      }
      double[] next = principalAxis(x, y, nw, ox, oy);
      if (next == null) {
        break; // the reweighted set collapsed to one point: keep the previous line
      }
      w = nw;
      boolean settled = same && Math.abs(next[0] - line[0]) < 1e-12
          && Math.abs(next[1] - line[1]) < 1e-12 && Math.abs(next[2] * line[3]
          - next[3] * line[2]) < 1e-15;
      line = next;
      if (settled) {
        break;
      }
    }
    boolean[] in = new boolean[n];
    double sum = 0;
    int count = 0;
    int firstIn = -1;
    int lastIn = -1;
    for (int i = 0; i < n; i++) {
      if (w[i] > 0) {
        in[i] = true;
        double e = lateral(line, x[i] - ox, y[i] - oy);
        sum += e * e;
        count++;
        firstIn = firstIn < 0 ? i : firstIn;
        lastIn = i;
      }
    }
    PlanLine fitted = new PlanLine(line[0] + ox, line[1] + oy, line[2], line[3],
        Math.sqrt(sum / count), PointMask.of(in));
    return Optional.of(fitted.orientedAlong(x[lastIn] - x[firstIn], y[lastIn] - y[firstIn]));
  }

  /**
   * Least median of squares start (Rousseeuw 1984, J. Amer. Statist. Assoc. 79(388):871): of
   * the lines through random pairs of points, the one with the smallest median squared
   * residual; {@code fallback} when no pair beats it. A reweighting started from a plain fit
   * can stay captured by one-sided outliers (a hedge beside the wire); this start cannot while
   * outliers are fewer than half.
   */
  private static double[] leastMedian(double[] x, double[] y, double[] w, double ox, double oy,
      double[] fallback) {
    int n = x.length;
    int[] usable = new int[n];
    int m = 0;
    for (int i = 0; i < n; i++) {
      if (w[i] > 0) {
        usable[m++] = i;
      }
    }
    double[] r2 = new double[m];
    double best = medianSquared(fallback, x, y, usable, m, ox, oy, r2);
    double[] line = fallback;
    SplittableRandom random = new SplittableRandom(LMEDS_SEED);
    for (int trial = 0; trial < LMEDS_TRIALS; trial++) {
      int a = usable[random.nextInt(m)];
      int b = usable[random.nextInt(m)];
      double dx = x[b] - x[a];
      double dy = y[b] - y[a];
      double len = Math.hypot(dx, dy);
      if (!(len > 0)) {
        continue;
      }
      double[] cand = {x[a] - ox, y[a] - oy, dx / len, dy / len};
      double med = medianSquared(cand, x, y, usable, m, ox, oy, r2);
      if (med < best) {
        best = med;
        line = cand;
      }
    }
    return line;
  }

  private static double medianSquared(double[] line, double[] x, double[] y, int[] usable, int m,
      double ox, double oy, double[] r2) {
    for (int k = 0; k < m; k++) {
      double e = lateral(line, x[usable[k]] - ox, y[usable[k]] - oy);
      r2[k] = e * e;
    }
    return RobustScale.median(r2, m);
  }

  /** {cx, cy, ux, uy} of the weighted principal axis (relative coordinates), or null. */
  private static double[] principalAxis(double[] x, double[] y, double[] w, double ox,
      double oy) {
    double sw = 0;
    double sx = 0;
    double sy = 0;
    for (int i = 0; i < x.length; i++) {
      if (w[i] > 0) {
        sw += w[i];
        sx += w[i] * (x[i] - ox);
        sy += w[i] * (y[i] - oy);
      }
    }
    if (!(sw > 0)) {
      return null;
    }
    double cx = sx / sw;
    double cy = sy / sw;
    double sxx = 0;
    double syy = 0;
    double sxy = 0;
    for (int i = 0; i < x.length; i++) {
      if (w[i] > 0) {
        double dx = x[i] - ox - cx;
        double dy = y[i] - oy - cy;
        sxx += w[i] * dx * dx;
        syy += w[i] * dy * dy;
        sxy += w[i] * dx * dy;
      }
    }
    if (!(sxx + syy > 0)) {
      return null; // all weighted points coincide
    }
    double theta = 0.5 * Math.atan2(2 * sxy, sxx - syy);
    return new double[] {cx, cy, Math.cos(theta), Math.sin(theta)};
  }

  private static double lateral(double[] line, double dx, double dy) {
    return -(dx - line[0]) * line[3] + (dy - line[1]) * line[2];
  }
}
