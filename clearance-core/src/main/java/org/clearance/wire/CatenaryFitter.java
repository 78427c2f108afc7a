package org.clearance.wire;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * Fits a catenary z(s) = z0 + c (cosh((s - s0) / c) - 1) to points (s_i, z_i) of one conductor
 * in its span's vertical plane (docs/methods.md section 2).
 *
 * <p>Free fit ({@link #fit}): parabola start by linear least squares (methods.md 2.2), then
 * Levenberg-Marquardt with the analytic Jacobian and orthogonal-distance weights
 * W_ii = 1 / cosh^2 t_i, inside iteratively reweighted rounds with Tukey's biweight on
 * sigma = 1.4826 MAD (methods.md 2.3). When the robust fit fails or leaves more than
 * {@link Options#ransacTrigger()} of the points out, RANSAC on 3-point samples (methods.md 2.4)
 * finds a consensus that the same robust refinement then polishes; that result is kept unless the
 * robust one has the strictly larger consensus within {@link Options#inlierThreshold()}. Spans
 * whose vertex lies outside the data (inclined, uplift) need no special care: s0 is never
 * constrained to the span.
 *
 * <p>Constrained fits: {@link #fitThrough} with both attachments known (only c free, Brent on ln
 * c) and {@link #fitFrom} with one attachment known (s0 and c free).
 *
 * <p>Bad data never throws: too few points, a curve outside [{@link #C_MIN}, {@link #C_MAX}] or a
 * solver that does not converge give a failed {@link CatenaryFit} with a reason. Points with a
 * non-finite coordinate are ignored (never inliers). Only programming errors throw
 * {@link IllegalArgumentException}: arrays of different length, non-finite or misordered
 * attachments.
 */
public final class CatenaryFitter {

  /** Smallest physical catenary constant, m: a 50 m span at c = 20 m would sag 18 m. */
  public static final double C_MIN = 20;
  /** Largest physical catenary constant, m: a 300 m span at c = 50 km sags only 0.22 m, tauter
   * than any conductor is strung; above this the points are a straight line, not a catenary. */
  public static final double C_MAX = 50_000;

  /**
   * Fitter options.
   *
   * @param inlierThreshold orthogonal distance within which a point counts as agreeing with a
   *     RANSAC candidate, m, &gt; 0 (methods.md 2.4: 2-3 times the point noise)
   * @param ransacConfidence probability that RANSAC draws at least one all-inlier sample, in (0, 1)
   * @param ransacTrigger share of points left out by the robust fit above which RANSAC also runs,
   *     in [0, 1]
   * @param seed RANSAC random seed (fits are deterministic)
   */
  public record Options(double inlierThreshold, double ransacConfidence, double ransacTrigger,
      long seed) {

    public Options {
      if (!(Double.isFinite(inlierThreshold) && inlierThreshold > 0)) {
        throw new IllegalArgumentException("inlierThreshold must be positive: " + inlierThreshold);
      }
      if (!(ransacConfidence > 0 && ransacConfidence < 1)) {
        throw new IllegalArgumentException("ransacConfidence must be in (0, 1): "
            + ransacConfidence);
      }
      if (!(ransacTrigger >= 0 && ransacTrigger <= 1)) {
        throw new IllegalArgumentException("ransacTrigger must be in [0, 1]: " + ransacTrigger);
      }
    }

    /**
     * Defaults for airborne lidar: threshold 0.20 m (about 4-5 times the 3-5 cm noise of wire
     * returns, common practice, no source), confidence 0.99, RANSAC when more than 10 % of the
     * points are left out (an M-estimator started from least squares is reliable only for light
     * contamination), seed 1.
     */
    public static Options defaults() {
      return new Options(0.20, 0.99, 0.10, 1L);
    }
  }

  private final Options options;

  /** A fitter with the given options. */
  public CatenaryFitter(Options options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** Free fit with default options; see {@link #fitFree}. */
  public static CatenaryFit fit(double[] s, double[] z) {
    return new CatenaryFitter(Options.defaults()).fitFree(s, z);
  }

  /** Fit with both attachments known, default options; see {@link #fitBothAttachments}. */
  public static CatenaryFit fitThrough(double[] s, double[] z, double sA, double zA, double sB,
      double zB) {
    return new CatenaryFitter(Options.defaults()).fitBothAttachments(s, z, sA, zA, sB, zB);
  }

  /** Fit with one attachment known, default options; see {@link #fitOneAttachment}. */
  public static CatenaryFit fitFrom(double[] s, double[] z, double sA, double zA) {
    return new CatenaryFitter(Options.defaults()).fitOneAttachment(s, z, sA, zA);
  }

  /**
   * Fits all three parameters (s0, z0, c).
   *
   * @param s stations along the span, m (any origin; at least 3 distinct finite values needed)
   * @param z elevations, m, same length as s
   * @return the fit, never null; failed with a reason when no physical curve fits
   * @throws IllegalArgumentException when the arrays differ in length
   */
  public CatenaryFit fitFree(double[] s, double[] z) {
    Centred d = Centred.of(s, z);
    if (d.usable < 3 || d.distinctStations < 3) {
      return CatenaryFit.failed(String.format(Locale.ROOT,
          "needs at least 3 points at distinct stations, got %d points at %d stations",
          d.usable, d.distinctStations), s.length, 0, CatenaryFit.Method.ROBUST);
    }
    CurveModel model = new CurveModel.Free();
    Optional<RobustLevenbergMarquardt.Outcome> robust = ParabolaStart.free(d.s, d.z, d.weights)
        .filter(p -> p[2] >= C_MIN && p[2] <= C_MAX)
        .map(p -> RobustLevenbergMarquardt.run(model, d.s, d.z, d.weights, p, C_MIN, C_MAX));
    String why = robust.isEmpty()
        ? "the least-squares parabola does not sag (opens downwards or c out of bounds)"
        : robust.get().failure().orElseGet(() -> boundsProblem(robust.get().p()[2]));
    int iterations = robust.map(RobustLevenbergMarquardt.Outcome::iterations).orElse(0);
    boolean robustOk = why == null;
    if (robustOk && outlierShare(robust.get().robust(), d.usable) <= options.ransacTrigger()) {
      return d.result(model, robust.get(), iterations, CatenaryFit.Method.ROBUST);
    }
    Optional<CatenaryRansac.Consensus> consensus = CatenaryRansac.run(d.s, d.z,
        options.inlierThreshold(), options.ransacConfidence(), options.seed(), C_MIN, C_MAX);
    if (consensus.isPresent()) {
      double[] w0 = new double[s.length];
      for (int i = 0; i < w0.length; i++) {
        w0[i] = consensus.get().inlier()[i] ? 1 : 0;
      }
      RobustLevenbergMarquardt.Outcome refined = RobustLevenbergMarquardt.run(
          model, d.s, d.z, w0, consensus.get().p(), C_MIN, C_MAX);
      String refinedWhy = refined.failure().orElseGet(() -> boundsProblem(refined.p()[2]));
      int total = iterations + refined.iterations();
      // With heavy contamination the consensus result is preferred unless the robust one
      // agrees with strictly more points.
      if (refinedWhy == null && (!robustOk || agreeing(model, refined.p(), d)
          >= agreeing(model, robust.get().p(), d))) {
        return d.result(model, refined, total, CatenaryFit.Method.RANSAC);
      }
      if (robustOk) {
        return d.result(model, robust.get(), total, CatenaryFit.Method.ROBUST);
      }
      return CatenaryFit.failed("robust fit: " + why + "; RANSAC refinement: " + refinedWhy,
          s.length, total, CatenaryFit.Method.RANSAC);
    }
    if (robustOk) {
      return d.result(model, robust.get(), iterations, CatenaryFit.Method.ROBUST);
    }
    return CatenaryFit.failed("robust fit: " + why
        + "; RANSAC: no 3-point sample gave a catenary within the bounds of c",
        s.length, iterations, CatenaryFit.Method.RANSAC);
  }

  /**
   * Fits c with both attachments known: the curve passes exactly through (sA, zA) and (sB, zB)
   * (methods.md section 2.5).
   *
   * @param s stations, m; z elevations, m (same length; at least 1 finite point needed)
   * @param sA station of attachment A, m; zA its elevation, m
   * @param sB station of attachment B, m (&gt; sA); zB its elevation, m
   * @throws IllegalArgumentException when the arrays differ in length or the attachments are not
   *     finite or sB &lt;= sA
   */
  public CatenaryFit fitBothAttachments(double[] s, double[] z, double sA, double zA, double sB,
      double zB) {
    requireFinite(sA, zA);
    requireFinite(sB, zB);
    if (!(sB > sA)) {
      throw new IllegalArgumentException("sB must exceed sA: " + sA + ", " + sB);
    }
    Centred d = Centred.of(s, z);
    CatenaryFit.Method method = CatenaryFit.Method.TWO_ATTACHMENTS;
    if (d.usable < 1) {
      return CatenaryFit.failed("needs at least 1 point with finite coordinates", s.length, 0,
          method);
    }
    double a = sA - d.sRef;
    double b = sB - d.sRef;
    double za = zA - d.zRef;
    double zb = zB - d.zRef;
    TwoAttachmentFit.Outcome o = TwoAttachmentFit.run(d.s, d.z, d.weights, a, za, b, zb, C_MIN,
        C_MAX);
    String why = o.failure().orElseGet(() -> boundsProblem(o.c()));
    if (why != null) {
      return CatenaryFit.failed(why, s.length, o.evaluations(), method);
    }
    Catenary local = Catenary.through(a, za, b, zb, o.c());
    return d.result(local, TwoAttachmentFit.covariance(d.s, d.z, o.robust(), a, za, b, zb,
        o.c()), o.robust(), o.evaluations(), method);
  }

  /**
   * Fits s0 and c with attachment (sA, zA) known: the curve passes exactly through it.
   *
   * @param s stations, m; z elevations, m (same length; at least 2 points at distinct stations
   *     other than sA needed)
   * @param sA station of the attachment, m; zA its elevation, m
   * @throws IllegalArgumentException when the arrays differ in length or the attachment is not
   *     finite
   */
  public CatenaryFit fitOneAttachment(double[] s, double[] z, double sA, double zA) {
    requireFinite(sA, zA);
    Centred d = Centred.of(s, z);
    CatenaryFit.Method method = CatenaryFit.Method.ONE_ATTACHMENT;
    if (d.usable < 2 || d.distinctStations < 2) {
      return CatenaryFit.failed(String.format(Locale.ROOT,
          "needs at least 2 points at distinct stations, got %d points at %d stations",
          d.usable, d.distinctStations), s.length, 0, method);
    }
    CurveModel model = new CurveModel.OneAnchor(sA - d.sRef, zA - d.zRef);
    Optional<double[]> start = ParabolaStart.oneAnchor(d.s, d.z, d.weights, sA - d.sRef,
        zA - d.zRef).filter(p -> p[1] >= C_MIN && p[1] <= C_MAX);
    if (start.isEmpty()) {
      return CatenaryFit.failed(
          "the least-squares parabola through the attachment does not sag within the bounds of c",
          s.length, 0, method);
    }
    RobustLevenbergMarquardt.Outcome o = RobustLevenbergMarquardt.run(model, d.s, d.z,
        d.weights, start.get(), C_MIN, C_MAX);
    String why = o.failure().orElseGet(() -> boundsProblem(o.p()[1]));
    if (why != null) {
      return CatenaryFit.failed(why, s.length, o.iterations(), method);
    }
    return d.result(model, o, o.iterations(), method);
  }

  private static void requireFinite(double s, double z) {
    if (!(Double.isFinite(s) && Double.isFinite(z))) {
      throw new IllegalArgumentException("attachment must be finite: " + s + ", " + z);
    }
  }

  /** Null when c is within the physical bounds, else the reason. */
  private static String boundsProblem(double c) {
    if (c >= C_MIN && c <= C_MAX) {
      return null;
    }
    return String.format(Locale.ROOT, "catenary constant %.1f m outside the physical range "
        + "[%.0f, %.0f] m", c, C_MIN, C_MAX);
  }

  private static double outlierShare(double[] robust, int usable) {
    int kept = 0;
    for (double b : robust) {
      kept += b > 0 ? 1 : 0;
    }
    return 1 - (double) kept / usable;
  }

  /** Number of points within the inlier threshold of the curve p (the consensus measure). */
  private int agreeing(CurveModel model, double[] p, Centred d) {
    int count = 0;
    for (int i = 0; i < d.s.length; i++) {
      if (d.weights[i] > 0 && Math.abs(RobustLevenbergMarquardt.orthogonalResidual(model, p,
          d.s[i], d.z[i])) <= options.inlierThreshold()) {
        count++;
      }
    }
    return count;
  }
}
