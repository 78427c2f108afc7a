package org.clearance.wire;

import java.util.Arrays;
import java.util.Optional;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;

/**
 * Fits one conductor to its points in a span (package-private): a straight line in plan, then a
 * catenary in the vertical plane through that line (the 5-parameter model of Chan and Lichti
 * 2011, methods.md 2.1), and the quality figures of the result.
 *
 * <p>The plan line is fitted in the span frame by total least squares ({@link PlanLineFitter}),
 * robust for a single conductor, plain for a bundle's centre line (a robust line would follow one
 * sub-conductor). Its crossings with the cross-sections through the conductor's ends (the
 * structure centres, stations 0 and L, or a dead-end's strain assembly length inside them) are
 * the plan attachments; the catenary is fitted ({@link CatenaryFitter}) to the
 * points' stations along the attachment-to-attachment line and elevations, free, or through
 * known attachment elevations. A wire blown sideways while surveyed bows across the span in
 * proportion to its sag ({@link SwingFit}); the bow is fitted, the plan line moved onto the
 * bowed wire's chord and the catenary refitted, and the residuals are taken from the bowed wire.
 */
final class ConductorFit {

  /** Stations sampled for the largest curve sigma: every 5 % of the span. */
  static final int SIGMA_SAMPLES = 21;
  /** Largest angle between the plan line and the span for a usable crossing, radians (60 deg):
   * conductors run along their span, the growth step already rejects more than its own limit. */
  static final double MIN_ALONG = 0.5;
  /** How far beyond a conductor's end a point may lie and still count (noise), m. */
  static final double END_SLACK_M = 0.3;
  /** Robust standard deviations beyond which a point is not counted in the quality figures. */
  static final double CLIP_SIGMAS = 3;
  /** Floor of the robust standard deviation, m: below airborne wire noise. */
  static final double SIGMA_FLOOR_M = 0.02;

  /**
   * The fit.
   *
   * @param members indices of the points fitted
   * @param curve the conductor; empty when the fit failed
   * @param fit the catenary fit (failed when the curve is empty); null when no plan line fitted
   * @param lateral per member, offset from the (bowed) wire across the span, m
   * @param vertical per member, elevation above the curve, m (NaN when the fit failed)
   * @param quality the figures over the kept points
   * @param swingRad the wire's swing from the vertical while surveyed ({@link SwingFit}),
   *     radians, positive towards positive offsets; 0 when not shown by the points, NaN when
   *     the fit failed
   * @param failure why no curve was fitted
   */
  record Result(int[] members, Optional<ConductorCurve> curve, CatenaryFit fit,
      double[] lateral, double[] vertical, WireQuality quality, double swingRad,
      Optional<String> failure) {}

  private ConductorFit() {}

  /**
   * Fits the members' points.
   *
   * @param p the span's points
   * @param members indices of the conductor's points (at least 3 for a free fit)
   * @param span the span (frame and length)
   * @param robustPlan robust plan line (single conductor) or plain (bundle centre line)
   * @param zA attachment elevation at the span's first structure, m, or NaN when unknown
   * @param zB attachment elevation at the span's second structure, m, or NaN when unknown
   */
  static Result fit(SpanPoints p, int[] members, Span span, boolean robustPlan, double zA,
      double zB) {
    return fit(p, members, span, robustPlan, zA, zB, ConductorEnds.SQUARE);
  }

  /**
   * Fits the members' points of a conductor ending where {@code ends} says: at the structures'
   * cross arms, or a dead-end's strain assembly further into the span; points beyond its ends
   * are insulator or jumper, not conductor, and are left out of the catenary.
   */
  static Result fit(SpanPoints p, int[] members, Span span, boolean robustPlan, double zA,
      double zB, ConductorEnds ends) {
    int n = members.length;
    double[] ps = new double[n];
    double[] pe = new double[n];
    double[] pz = new double[n];
    for (int k = 0; k < n; k++) {
      ps[k] = p.s(members[k]);
      pe[k] = p.e(members[k]);
      pz[k] = p.z(members[k]);
    }
    Optional<PlanLine> line = new PlanLineFitter(new PlanLineFitter.Options(robustPlan))
        .fitPoints(ps, pe);
    if (line.isEmpty() || !(Math.abs(line.get().ux()) >= MIN_ALONG)) {
      return failed(members, "no plan line along the span through the points");
    }
    PlanLine pl = line.get();
    SpanFrame f = span.frame();
    double planSlope = pl.uy() / pl.ux();
    double e0 = pl.pointY() - pl.pointX() * planSlope;
    double sA = ends.stationA(e0, planSlope);
    double sB = ends.stationB(e0, planSlope, span.lengthM());
    if (!(sB - sA > 0)) {
      return failed(members, "the conductor's ends at the structures do not leave a span");
    }
    for (int k = 0; k < n; k++) {
      if (!(ps[k] >= sA - END_SLACK_M && ps[k] <= sB + END_SLACK_M)) {
        pz[k] = Double.NaN; // beyond the conductor's ends: left out of the catenary
      }
    }
    double eA = e0 + planSlope * sA;
    double eB = e0 + planSlope * sB;
    SpanFrame plan = SpanFrame.between(f.x(sA, eA), f.y(sA, eA), f.x(sB, eB), f.y(sB, eB));
    double[] sc = new double[n];
    double[] lateral = new double[n];
    project(f, plan, ps, pe, sc, lateral);
    CatenaryFit fit = catenary(sc, pz, plan.length(), zA, zB);
    if (!fit.converged()) {
      return new Result(members, Optional.empty(), fit, lateral, nanArray(n), WireQuality.none(),
          Double.NaN, fit.failure());
    }
    boolean[] kept = kept(fit, pl, robustPlan);
    SwingFit.Bow bow = SwingFit.fit(sc, lateral, sag(fit.curve(), sc, plan.length()), kept,
        plan.length());
    if (bow != SwingFit.Bow.NONE) {
      // The bowed wire's chord is the plan line: move the attachments onto it and refit.
      double lc0 = plan.length();
      double eB0 = bow.alpha() + bow.beta() * lc0;
      plan = SpanFrame.between(plan.x(0, bow.alpha()), plan.y(0, bow.alpha()),
          plan.x(lc0, eB0), plan.y(lc0, eB0));
      project(f, plan, ps, pe, sc, lateral);
      fit = catenary(sc, pz, plan.length(), zA, zB);
      if (!fit.converged()) {
        return new Result(members, Optional.empty(), fit, lateral, nanArray(n),
            WireQuality.none(), Double.NaN, fit.failure());
      }
      kept = kept(fit, pl, robustPlan);
      bow = SwingFit.fit(sc, lateral, sag(fit.curve(), sc, plan.length()), kept,
          plan.length());
    }
    double lc = plan.length();
    Catenary c = fit.curve();
    double[] sag = sag(c, sc, lc);
    double[] vertical = new double[n];
    for (int k = 0; k < n; k++) {
      vertical[k] = pz[k] - c.z(sc[k]);
      lateral[k] -= bow.lateral(sc[k], sag[k]);
    }
    clip(kept, lateral, vertical);
    double sum = 0;
    int count = 0;
    for (int k = 0; k < n; k++) {
      if (kept[k]) {
        double slope = c.slope(sc[k]);
        double v = vertical[k] * vertical[k] / (1 + slope * slope);
        sum += lateral[k] * lateral[k] + v;
        count++;
      }
    }
    double rms = count > 0 ? Math.sqrt(sum / count) : Double.NaN;
    double[] cover = coverage(sc, kept, lc);
    double sigma = fit.covariance().map(cov -> largestSigma(cov, c, lc)).orElse(Double.NaN);
    WireQuality q = new WireQuality(count, cover[0], rms, cover[1], sigma);
    return new Result(members, Optional.of(new ConductorCurve(plan, c)), fit, lateral, vertical,
        q, bow.angle(), Optional.empty());
  }

  /**
   * Drops from the kept points those more than {@link #CLIP_SIGMAS} robust standard deviations
   * (1.4826 MAD, per axis, at least {@link #SIGMA_FLOOR_M}) from the wire across or up: the
   * quality figures describe the wire, not a branch or a bird a robust fit merely down-weighted.
   */
  private static void clip(boolean[] kept, double[] lateral, double[] vertical) {
    double[] a = new double[kept.length];
    double[] b = new double[kept.length];
    int m = 0;
    for (int k = 0; k < kept.length; k++) {
      if (kept[k]) {
        a[m] = lateral[k];
        b[m] = vertical[k];
        m++;
      }
    }
    if (m == 0) {
      return;
    }
    double limA = CLIP_SIGMAS * Math.max(SIGMA_FLOOR_M, RobustScale.sigmaMad(a, m));
    double limB = CLIP_SIGMAS * Math.max(SIGMA_FLOOR_M, RobustScale.sigmaMad(b, m));
    for (int k = 0; k < kept.length; k++) {
      kept[k] &= Math.abs(lateral[k]) <= limA && Math.abs(vertical[k]) <= limB;
    }
  }

  /** Stations along and offsets from the plan line of points given in the span frame. */
  private static void project(SpanFrame span, SpanFrame plan, double[] ps, double[] pe,
      double[] sc, double[] lateral) {
    for (int k = 0; k < ps.length; k++) {
      double x = span.x(ps[k], pe[k]);
      double y = span.y(ps[k], pe[k]);
      sc[k] = plan.station(x, y);
      lateral[k] = plan.offset(x, y);
    }
  }

  private static CatenaryFit catenary(double[] sc, double[] pz, double lc, double zA,
      double zB) {
    if (Double.isFinite(zA) && Double.isFinite(zB)) {
      return CatenaryFitter.fitThrough(sc, pz, 0, zA, lc, zB);
    } else if (Double.isFinite(zA)) {
      return CatenaryFitter.fitFrom(sc, pz, 0, zA);
    } else if (Double.isFinite(zB)) {
      return CatenaryFitter.fitFrom(sc, pz, lc, zB);
    }
    return CatenaryFitter.fit(sc, pz);
  }

  /** The points both the catenary and (for a robust plan line) the plan line kept. */
  private static boolean[] kept(CatenaryFit fit, PlanLine pl, boolean robustPlan) {
    boolean[] kept = new boolean[fit.pointCount()];
    for (int k = 0; k < kept.length; k++) {
      kept[k] = fit.inliers().contains(k) && (!robustPlan || pl.inliers().contains(k));
    }
    return kept;
  }

  /** Vertical sag of the curve below its chord from 0 to lc at each station, m. */
  private static double[] sag(Catenary c, double[] sc, double lc) {
    double[] v = new double[sc.length];
    for (int k = 0; k < sc.length; k++) {
      v[k] = c.sagBelowChord(0, lc, sc[k]);
    }
    return v;
  }

  private static Result failed(int[] members, String why) {
    return new Result(members, Optional.empty(), null, nanArray(members.length),
        nanArray(members.length), WireQuality.none(), Double.NaN, Optional.of(why));
  }

  private static double[] nanArray(int n) {
    double[] a = new double[n];
    Arrays.fill(a, Double.NaN);
    return a;
  }

  /**
   * Coverage (percent of the length) and largest gap (m) of the kept stations over [0, length]:
   * neighbouring stations at most {@link WireQuality#COVERAGE_BREAK_M} apart cover the stretch
   * between them; the gap counts from each end of the span.
   */
  static double[] coverage(double[] stations, boolean[] kept, double length) {
    double[] s = new double[stations.length];
    int m = 0;
    for (int k = 0; k < stations.length; k++) {
      if (kept[k]) {
        s[m++] = Math.min(length, Math.max(0, stations[k]));
      }
    }
    if (m == 0) {
      return new double[] {0, length};
    }
    Arrays.sort(s, 0, m);
    double covered = 0;
    double gap = Math.max(s[0], length - s[m - 1]);
    for (int k = 1; k < m; k++) {
      double d = s[k] - s[k - 1];
      if (d <= WireQuality.COVERAGE_BREAK_M) {
        covered += d;
      }
      gap = Math.max(gap, d);
    }
    return new double[] {100 * covered / length, gap};
  }

  /** Largest standard deviation of the curve elevation at {@link #SIGMA_SAMPLES} stations. */
  private static double largestSigma(CatenaryCovariance cov, Catenary c, double length) {
    double worst = 0;
    for (int k = 0; k < SIGMA_SAMPLES; k++) {
      worst = Math.max(worst, cov.sigmaZ(c, length * k / (SIGMA_SAMPLES - 1)));
    }
    return worst;
  }
}
