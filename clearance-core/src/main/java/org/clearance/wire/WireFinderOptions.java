package org.clearance.wire;

import java.util.Objects;

/**
 * Options of the {@link WireFinder}, grouped by step; every group checks its values at
 * construction and has documented defaults (docs/wire-finder.md explains each).
 *
 * @param collection which survey points are kept as wire candidates
 * @param evidence geometric evidence for unlabelled candidates
 * @param growth clustering and growing wires along their model
 * @param quality thresholds below which a conductor is not assessed
 * @param structures locating and refining structures from tower points
 * @param threads worker threads for reading and for the spans, 1 to 256
 */
public record WireFinderOptions(Collection collection, Evidence evidence, Growth growth,
    Quality quality, Structures structures, int threads) {

  /** Most worker threads accepted; the survey reader's own limit. */
  public static final int MAX_THREADS = 256;

  public WireFinderOptions {
    Objects.requireNonNull(collection, "collection");
    Objects.requireNonNull(evidence, "evidence");
    Objects.requireNonNull(growth, "growth");
    Objects.requireNonNull(quality, "quality");
    Objects.requireNonNull(structures, "structures");
    if (threads < 1 || threads > MAX_THREADS) {
      throw new IllegalArgumentException("threads must be 1 to 256: " + threads);
    }
  }

  /** Every group at its defaults, on {@code threads} threads. */
  public static WireFinderOptions defaults(int threads) {
    return new WireFinderOptions(Collection.defaults(), Evidence.defaults(), Growth.defaults(),
        Quality.defaults(), Structures.defaults(), threads);
  }

  /** The same options with other structure options. */
  public WireFinderOptions withStructures(Structures s) {
    return new WireFinderOptions(collection, evidence, growth, quality, s, threads);
  }

  /** The same options with other quality thresholds. */
  public WireFinderOptions withQuality(Quality q) {
    return new WireFinderOptions(collection, evidence, growth, q, structures, threads);
  }

  private static void positive(String name, double v) {
    if (!(Double.isFinite(v) && v > 0)) {
      throw new IllegalArgumentException(name + " must be positive: " + v);
    }
  }

  private static void nonNegative(String name, double v) {
    if (!(Double.isFinite(v) && v >= 0)) {
      throw new IllegalArgumentException(name + " must be >= 0: " + v);
    }
  }

  private static void angle(String name, double deg) {
    if (!(deg > 0 && deg < 90)) {
      throw new IllegalArgumentException(name + " must be in (0, 90) degrees: " + deg);
    }
  }

  /**
   * Which points are kept, per span, while the survey streams by.
   *
   * @param lateralMarginM corridor half-width beyond the outermost specification offset, m, &gt;
   *     0: room for conductors blown aside during the survey and structure position errors
   * @param defaultHalfWidthM corridor half-width when the specification gives no offsets, m, &gt; 0
   * @param stationMarginM how far beyond each structure along the span points are kept, m, &gt;= 0
   * @param minHeightM lowest height above ground of an unlabelled candidate, m, &gt; 0; raised to
   *     {@link #ATTACH_SHARE} of the lowest specification attachment height when that is higher
   */
  public record Collection(double lateralMarginM, double defaultHalfWidthM,
      double stationMarginM, double minHeightM) {

    /**
     * Share of the lowest nominal attachment height below which no conductor hangs: a conductor
     * attached at h keeps well over a quarter of h above ground at mid-span on any line built to
     * a ground-clearance code (common practice, no source).
     */
    public static final double ATTACH_SHARE = 0.25;
    /** Ceiling of the derived minimum height, m: low-voltage crossings hang about 6 m up. */
    public static final double MAX_DERIVED_HEIGHT_M = 6.0;

    public Collection {
      positive("lateralMarginM", lateralMarginM);
      positive("defaultHalfWidthM", defaultHalfWidthM);
      nonNegative("stationMarginM", stationMarginM);
      positive("minHeightM", minHeightM);
    }

    /**
     * Margin 8 m, 25 m half-width without offsets, 2 m beyond the structures, unlabelled
     * candidates from 3 m above ground (common practice, no source).
     */
    public static Collection defaults() {
      return new Collection(8.0, 25.0, 2.0, 3.0);
    }
  }

  /**
   * Geometric evidence that an unlabelled point lies on a wire: covariance eigenvalues of its
   * neighbourhood (Weinmann et al. 2015; methods.md 1.2).
   *
   * @param radiusM radius of the spherical neighbourhood, m, &gt; 0 (doubled once where it holds
   *     fewer than {@link #MIN_NEIGHBOURS} points)
   * @param minLinearity smallest linearity (l1 - l2) / l1, in (0, 1)
   * @param maxPlanAngleDeg largest angle in plan between the principal direction and the span,
   *     degrees, in (0, 90)
   * @param maxInclinationDeg largest inclination of the principal direction, degrees, in (0, 90)
   */
  public record Evidence(double radiusM, double minLinearity, double maxPlanAngleDeg,
      double maxInclinationDeg) {

    /** Fewest neighbours (the point included) for a covariance worth reading. */
    public static final int MIN_NEIGHBOURS = 4;

    public Evidence {
      positive("radiusM", radiusM);
      if (!(minLinearity > 0 && minLinearity < 1)) {
        throw new IllegalArgumentException("minLinearity must be in (0, 1): " + minLinearity);
      }
      angle("maxPlanAngleDeg", maxPlanAngleDeg);
      angle("maxInclinationDeg", maxInclinationDeg);
    }

    /**
     * 1.5 m, linearity 0.8, 15 degrees in plan, 35 degrees inclination. Measured on the open
     * corridor tile (docs/wire-finder.md): 94 % of the class-14 points pass, 0.1 % of the
     * vegetation.
     */
    public static Evidence defaults() {
      return new Evidence(1.5, 0.8, 15.0, 35.0);
    }
  }

  /**
   * Clustering (DBSCAN, Ester et al. 1996) and growth along the model (hypothesis and
   * verification, Sohn, Jwa and Kim 2012; methods.md 1.5, 1.7).
   *
   * @param stationStretch factor k dividing the along-span distance in the clustering metric
   *     d^2 = (ds / k)^2 + de^2 + dz^2, &gt;= 1
   * @param clusterRadiusM DBSCAN radius in that metric, m, &gt; 0
   * @param clusterMinPoints DBSCAN core-point count (the point included), &gt;= 2
   * @param tubeLateralM half-width across the span of the tube points join a wire in, m, &gt; 0
   *     (widened by half the bundle spacing for bundled positions)
   * @param tubeVerticalM half-height of that tube, m, &gt; 0
   * @param stepM how far beyond its points a wire is extended per growth round, m, &gt; 0
   * @param minLengthM shortest stretch along the span a cluster must cover to be a wire, m, &gt; 0
   * @param maxAngleDeg largest angle in plan between a wire and its span, degrees, in (0, 90)
   */
  public record Growth(double stationStretch, double clusterRadiusM, int clusterMinPoints,
      double tubeLateralM, double tubeVerticalM, double stepM, double minLengthM,
      double maxAngleDeg) {

    public Growth {
      if (!(stationStretch >= 1 && Double.isFinite(stationStretch))) {
        throw new IllegalArgumentException("stationStretch must be >= 1: " + stationStretch);
      }
      positive("clusterRadiusM", clusterRadiusM);
      if (clusterMinPoints < 2) {
        throw new IllegalArgumentException("clusterMinPoints must be >= 2: " + clusterMinPoints);
      }
      positive("tubeLateralM", tubeLateralM);
      positive("tubeVerticalM", tubeVerticalM);
      positive("stepM", stepM);
      positive("minLengthM", minLengthM);
      angle("maxAngleDeg", maxAngleDeg);
    }

    /**
     * k = 5 and radius 1 m (points 5 m apart along a wire link, wires 1 m apart across do not),
     * 4 points, tube 0.6 m across and 0.45 m up and down (about ten times the 3-5 cm wire noise,
     * and room for a twin or quad bundle of up to about 0.5 m spacing the specification does
     * not mention), 15 m steps, 10 m shortest wire, 10 degrees (common practice, no source).
     */
    public static Growth defaults() {
      return new Growth(5.0, 1.0, 4, 0.6, 0.45, 15.0, 10.0, 10.0);
    }
  }

  /**
   * Thresholds below which a fitted conductor is not assessed.
   *
   * @param minPoints fewest kept points, &gt;= 3
   * @param minCoveragePct smallest coverage of the span length, percent, in [0, 100]
   * @param maxRmsM largest RMS residual, m, &gt; 0 (for a bundle reported whole, its spread is
   *     taken off first)
   * @param maxCurveSigmaM largest standard deviation of the curve elevation over the span from
   *     the parameter covariance, m, &gt; 0
   */
  public record Quality(int minPoints, double minCoveragePct, double maxRmsM,
      double maxCurveSigmaM) {

    public Quality {
      if (minPoints < 3) {
        throw new IllegalArgumentException("minPoints must be >= 3: " + minPoints);
      }
      if (!(minCoveragePct >= 0 && minCoveragePct <= 100)) {
        throw new IllegalArgumentException("minCoveragePct must be in [0, 100]: "
            + minCoveragePct);
      }
      positive("maxRmsM", maxRmsM);
      positive("maxCurveSigmaM", maxCurveSigmaM);
    }

    /**
     * 15 points, 30 % coverage, 0.15 m RMS (three times the 5 cm residual of one airborne wire),
     * 0.25 m curve sigma (common practice, no source).
     */
    public static Quality defaults() {
      return new Quality(15, 30.0, 0.15, 0.25);
    }
  }

  /**
   * Locating structures from tower points (ASPRS class 15, or tall vertical point columns in
   * surveys without tower labels).
   *
   * @param refine whether to look for towers at all
   * @param searchRadiusM how far from a structures file position its tower is looked for, m, &gt; 0
   * @param toleranceM plan distance from the tower centre above which a position is moved, m,
   *     &gt; 0
   * @param minTowerPoints fewest points a tower must show, &gt;= 1
   */
  public record Structures(boolean refine, double searchRadiusM, double toleranceM,
      int minTowerPoints) {

    public Structures {
      positive("searchRadiusM", searchRadiusM);
      positive("toleranceM", toleranceM);
      if (minTowerPoints < 1) {
        throw new IllegalArgumentException("minTowerPoints must be >= 1: " + minTowerPoints);
      }
    }

    /**
     * Refine within 60 m; move a position more than 3 m from its tower's centre (a lattice tower
     * base is 6-12 m wide, so its point centre is good to a metre or two); 30 tower points
     * (common practice, no source).
     */
    public static Structures defaults() {
      return new Structures(true, 60.0, 3.0, 30);
    }
  }
}
