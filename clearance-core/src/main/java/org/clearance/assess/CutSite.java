package org.clearance.assess;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * One place where vegetation is inside a clearance zone of a span (a grow-in site: a connected
 * clump of encroaching points), or a tree that can fall into the line (a fall-in site). One line
 * of the work list. Lengths in metres, coordinates in metres of the survey CRS (the writers
 * convert both to the output units).
 *
 * @param siteId id unique in the run: the span id, a dot and the site's place in the span's
 *     order (most urgent first), e.g. {@code CR-7.2}
 * @param spanId the span
 * @param kind grow-in clump or fall-in tree
 * @param priority the zone's priority (1 = most urgent); fall-in sites rank after every zone of
 *     the profile
 * @param zone the zone's name, or {@link #FALL_IN_ZONE}
 * @param violationReference whether the zone is the profile's violation reference (the
 *     governing minimum)
 * @param condition the line condition in which the governing point is deepest in the zone
 * @param minClearanceM the governing point's distance, m (3D, or the governing component of a
 *     components zone; for a fall-in tree the distance from its base to the nearest conductor)
 * @param requiredM the zone's distance there, m (for a fall-in tree its reach: height plus the
 *     rule's allowance)
 * @param deficitM required minus actual, m (&gt; 0)
 * @param x easting of the governing point (the tree top for fall-in), m
 * @param y northing, m
 * @param z elevation, m
 * @param lon longitude, degrees (WGS84), or NaN when the CRS is not known
 * @param lat latitude, degrees (WGS84), or NaN
 * @param chainageM plan distance along the span from its first structure, m
 * @param side side of the centre line looking from the first structure to the second
 * @param offsetM plan distance from the centre line (structure to structure), m (&gt;= 0)
 * @param vegHeightM height above ground of the site's tallest point (a tree's height), m, or NaN
 *     without ground
 * @param cutToHeightM height above ground to cut the vegetation down to, m (0 = remove), or NaN
 *     when a cut in height does not clear it (it is beside the conductor) or there is no ground;
 *     see {@link CutHeight}
 * @param points encroaching points in the site; empty for a fall-in tree
 * @param areaM2 plan area of the convex hull of the site's points, m2 (a tree: its crown
 *     circle), NaN when not known
 * @param yearsToViolation years until the site grows into the violation-reference zone: 0 when
 *     it is inside it, +infinity when never at the profile's rates, NaN when not computed
 * @param conductor position name of the conductor the governing point is nearest to (for a
 *     fall-in tree, the conductor nearest its base in the surveyed state), or empty
 * @param cutToNowM like {@code cutToHeightM} but without the trim cycle's growth: the height
 *     that clears the zone today, m, or NaN
 * @param interval the governing distance's interval at the profile's confidence level and the
 *     site's verdict (a violation when any of its points is one), or empty when the profile asks
 *     for no confidence level (and for fall-in sites)
 */
public record CutSite(
    String siteId, String spanId, Kind kind, int priority, String zone,
    boolean violationReference, String condition, double minClearanceM, double requiredM,
    double deficitM, double x, double y, double z, double lon, double lat, double chainageM,
    Side side, double offsetM, double vegHeightM, double cutToHeightM, OptionalInt points,
    double areaM2, double yearsToViolation, String conductor, double cutToNowM,
    Optional<FindingInterval> interval) {

  /** A site without an interval. */
  public CutSite(String siteId, String spanId, Kind kind, int priority, String zone,
      boolean violationReference, String condition, double minClearanceM, double requiredM,
      double deficitM, double x, double y, double z, double lon, double lat, double chainageM,
      Side side, double offsetM, double vegHeightM, double cutToHeightM, OptionalInt points,
      double areaM2, double yearsToViolation, String conductor, double cutToNowM) {
    this(siteId, spanId, kind, priority, zone, violationReference, condition, minClearanceM,
        requiredM, deficitM, x, y, z, lon, lat, chainageM, side, offsetM, vegHeightM,
        cutToHeightM, points, areaM2, yearsToViolation, conductor, cutToNowM, Optional.empty());
  }

  /** Zone name of fall-in sites. */
  public static final String FALL_IN_ZONE = "fall-in";

  /** What a site is. */
  public enum Kind {
    /** Vegetation points inside a zone. */
    GROW_IN,
    /** A tree tall enough to strike the line when it falls. */
    FALL_IN,
    /**
     * Vegetation inside a pole-clearing zone around a structure with listed equipment (e.g.
     * California PRC 4292): clear the ground around the pole. Its minimum clearance is the
     * governing point's plan distance from the structure centre, its required distance the
     * zone's plan reach, its cut-to height the band's lower edge and its area the cleared ring.
     */
    POLE_CLEARING
  }

  /** Side of the centre line, looking from the span's first structure to its second. */
  public enum Side {
    LEFT,
    RIGHT,
    /** Within a centimetre of the centre line. */
    CENTRE;

    /** Lower-case word for files. */
    public String word() {
      return name().toLowerCase(java.util.Locale.ROOT);
    }
  }

  public CutSite {
    Objects.requireNonNull(siteId, "siteId");
    Objects.requireNonNull(spanId, "spanId");
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(zone, "zone");
    Objects.requireNonNull(condition, "condition");
    Objects.requireNonNull(side, "side");
    Objects.requireNonNull(points, "points");
    Objects.requireNonNull(interval, "interval");
    Objects.requireNonNull(conductor, "conductor");
  }

  /** The same site under another id. */
  public CutSite withId(String id) {
    return new CutSite(id, spanId, kind, priority, zone, violationReference, condition,
        minClearanceM, requiredM, deficitM, x, y, z, lon, lat, chainageM, side, offsetM,
        vegHeightM, cutToHeightM, points, areaM2, yearsToViolation, conductor, cutToNowM,
        interval);
  }

  /** Whether the site is only a possible violation (its interval straddles the zone). */
  public boolean possibleOnly() {
    return interval.map(i -> i.verdict() == FindingInterval.Verdict.POSSIBLE_VIOLATION)
        .orElse(false);
  }

  /** The same site with a longitude and latitude. */
  public CutSite withLonLat(double longitude, double latitude) {
    return new CutSite(siteId, spanId, kind, priority, zone, violationReference, condition,
        minClearanceM, requiredM, deficitM, x, y, z, longitude, latitude, chainageM, side,
        offsetM, vegHeightM, cutToHeightM, points, areaM2, yearsToViolation, conductor,
        cutToNowM, interval);
  }
}
