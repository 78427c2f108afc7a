package org.clearance.assess;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.line.SpanFrame;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.algorithm.ConvexHull;

/**
 * Turns the encroaching points of one span into grow-in sites: single-linkage clusters
 * ({@link SiteClusterer}) with their governing point, location, heights and area.
 *
 * <p>Per site: the zone is the most urgent zone any of its points is inside; the governing point
 * is, among the points in that zone, the one deepest inside it (largest deficit), and gives the
 * condition, clearance, required distance, deficit and location. Vegetation height is that of the
 * site's tallest point above ground; the cut height is {@link CutHeight}'s; area is the plan area
 * of the convex hull of the site's points (JTS {@code ConvexHull}); years to violation the
 * smallest of its points'.
 *
 * <p>A point on a wire touched by vegetation ({@link EncroachingPoint#wireTouched}) is probably
 * the wire itself: where a site holds vegetation points besides, it stands on them (position,
 * heights, cut height, area, point count, and its clearance when they reach the same zone), so
 * a crew is sent to the vegetation, never to the conductor. Its zone is never made less urgent
 * by this: a zone reached only by the wire point keeps the site in it. The span's minimum is
 * not computed here and keeps the measured value (docs/clearance.md).
 */
final class SiteBuilder {

  /** Points closer than this to the centre line are on it (no side), m. */
  static final double CENTRE_TOLERANCE_M = 0.01;

  private static final GeometryFactory GEOMETRY = new GeometryFactory();

  private final SiteClusterer clusterer;

  /** @param linkDistanceM link distance of a site, m (&gt; 0) */
  SiteBuilder(double linkDistanceM) {
    this.clusterer = new SiteClusterer(linkDistanceM);
  }

  /**
   * The sites of one span, unsorted and without ids.
   *
   * @param spanId the span
   * @param frame the span's plan frame from its first structure to its second, or null when
   *     the structures coincide in plan (chainage, side and offset are then not computed)
   * @param points the span's encroaching points
   */
  List<CutSite> build(String spanId, SpanFrame frame, List<EncroachingPoint> points) {
    int n = points.size();
    double[] x = new double[n];
    double[] y = new double[n];
    double[] z = new double[n];
    for (int i = 0; i < n; i++) {
      x[i] = points.get(i).x();
      y[i] = points.get(i).y();
      z[i] = points.get(i).z();
    }
    int[] label = clusterer.labels(x, y, z);
    int sites = 0;
    for (int l : label) {
      sites = Math.max(sites, l + 1);
    }
    List<List<EncroachingPoint>> groups = new ArrayList<>();
    for (int s = 0; s < sites; s++) {
      groups.add(new ArrayList<>());
    }
    for (int i = 0; i < n; i++) {
      groups.get(label[i]).add(points.get(i));
    }
    List<CutSite> out = new ArrayList<>();
    for (List<EncroachingPoint> g : groups) {
      out.add(site(spanId, frame, g));
    }
    return out;
  }

  private static CutSite site(String spanId, SpanFrame frame, List<EncroachingPoint> g) {
    List<EncroachingPoint> vegetation = g.stream().filter(p -> !p.wireTouched()).toList();
    List<EncroachingPoint> on = vegetation.isEmpty() ? g : vegetation;
    EncroachingPoint deepest = governing(g);
    EncroachingPoint stand = governing(on);
    // A zone reached only by a wire point touched by vegetation keeps the site in that zone
    // (never dropped nor made less urgent); the site still stands on the vegetation.
    EncroachingPoint gov = stand.priority() == deepest.priority() ? stand : deepest;
    double tallest = Double.NaN;
    double years = Double.NaN;
    double cut = Double.POSITIVE_INFINITY;
    double cutNow = Double.POSITIVE_INFINITY;
    boolean cutKnown = true;
    for (EncroachingPoint p : on) {
      if (Double.isFinite(p.heightAboveGround())) {
        tallest = Double.isNaN(tallest) ? p.heightAboveGround()
            : Math.max(tallest, p.heightAboveGround());
      }
      if (!Double.isNaN(p.years())) {
        years = Double.isNaN(years) ? p.years() : Math.min(years, p.years());
      }
      if (Double.isInfinite(p.allowedTop()) && p.allowedTop() > 0) {
        continue; // beside the zone: no height limit from this point
      }
      if (Double.isNaN(p.allowedTop()) || Double.isNaN(p.heightAboveGround())) {
        cutKnown = false;
        continue;
      }
      double ground = p.z() - p.heightAboveGround();
      cut = Math.min(cut, p.allowedTop() - ground);
      cutNow = Math.min(cutNow, p.allowedTopNow() - ground);
    }
    if (gov != stand && !Double.isNaN(gov.years())) {
      years = Double.isNaN(years) ? gov.years() : Math.min(years, gov.years());
    }
    double cutTo = !cutKnown || Double.isInfinite(cut) ? Double.NaN : Math.max(0, cut);
    double cutToNow = !cutKnown || Double.isInfinite(cutNow) || Double.isNaN(cutNow)
        ? Double.NaN : Math.max(0, cutNow);
    double chainage = Double.NaN;
    double offset = Double.NaN;
    CutSite.Side side = CutSite.Side.CENTRE;
    if (frame != null) {
      chainage = frame.station(stand.x(), stand.y());
      double e = frame.offset(stand.x(), stand.y());
      offset = Math.abs(e);
      side = sideOf(e);
    }
    var v = gov.violation();
    return new CutSite("", spanId, CutSite.Kind.GROW_IN, v.zone().priority(), v.zone().name(),
        v.zone().violationReference(), v.condition(), v.actualM(), v.requiredM(), v.deficitM(),
        stand.x(), stand.y(), stand.z(), Double.NaN, Double.NaN, chainage, side, offset,
        tallest, cutTo, OptionalInt.of(on.size()), planArea(on), years, v.conductor(), cutToNow,
        siteInterval(gov, g));
  }

  /** The point of the most urgent zone deepest inside it (largest deficit). */
  private static EncroachingPoint governing(List<EncroachingPoint> g) {
    EncroachingPoint gov = null;
    for (EncroachingPoint p : g) {
      if (gov == null || p.priority() < gov.priority() || (p.priority() == gov.priority()
          && p.violation().deficitM() > gov.violation().deficitM())) {
        gov = p;
      }
    }
    return gov;
  }

  /** The governing point's interval, a violation when any point of the site is one. */
  private static Optional<FindingInterval> siteInterval(EncroachingPoint gov,
      List<EncroachingPoint> g) {
    if (gov.interval().isEmpty()) {
      return Optional.empty();
    }
    boolean any = g.stream().anyMatch(p -> p.interval().map(i -> i.verdict()
        == FindingInterval.Verdict.VIOLATION).orElse(true));
    FindingInterval i = gov.interval().get();
    return Optional.of(new FindingInterval(i.distanceM(), i.sigmaM(), i.lowM(), i.highM(),
        i.confidencePercent(), any ? FindingInterval.Verdict.VIOLATION
            : FindingInterval.Verdict.POSSIBLE_VIOLATION, i.dominant()));
  }

  /** Side of a signed offset (positive left). */
  static CutSite.Side sideOf(double offset) {
    if (offset > CENTRE_TOLERANCE_M) {
      return CutSite.Side.LEFT;
    }
    return offset < -CENTRE_TOLERANCE_M ? CutSite.Side.RIGHT : CutSite.Side.CENTRE;
  }

  /** Plan area of the convex hull of the points, m2 (0 for fewer than three in general). */
  static double planArea(List<EncroachingPoint> g) {
    Coordinate[] c = new Coordinate[g.size()];
    for (int i = 0; i < c.length; i++) {
      c[i] = new Coordinate(g.get(i).x(), g.get(i).y());
    }
    return new ConvexHull(c, GEOMETRY).getConvexHull().getArea();
  }
}
