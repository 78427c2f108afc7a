package org.clearance.assess;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * One line of the work list: one tree, or one patch of vegetation that is not part of a found
 * tree, with every reason it is on the list. Lengths in metres, coordinates in metres of the
 * survey CRS (the writers convert both). A value not computed is NaN or empty.
 *
 * @param itemId id unique in the run: the span id, a dot, {@code W} and the item's place in the
 *     span's order (most urgent first), e.g. {@code CR-7.W2}
 * @param spanId the span
 * @param treeId the tree's id in the run model, or empty for a vegetation patch
 * @param priority the most urgent priority among its reasons (1 = most urgent)
 * @param zone the most urgent zone it is inside, or {@link CutSite#FALL_IN_ZONE} for a tree
 *     that is on the list only because it can fall into the line
 * @param reasons every reason, most urgent first, e.g.
 *     {@code zone prc4293 (hot); zone watch (hot); fall-in (hot)}
 * @param work what a crew does
 * @param condition the line condition of the most urgent reason
 * @param conductor position name of the governing conductor, or empty
 * @param circuit circuit of that conductor, or 0 when not known
 * @param clearanceM distance from the vegetation's governing point to the conductor in that
 *     condition (3D, or the governing component of a components zone), m; NaN when the item is
 *     on the list only for fall-in
 * @param requiredM the zone's distance there, m, or NaN
 * @param deficitM required minus clearance, m, or NaN
 * @param sideTrimM how far to cut the vegetation back towards the line's side (horizontally,
 *     away from the conductor) when it is beside the zone, m; NaN otherwise
 * @param cutToNowM height above ground to cut to so that it is clear today, m (0 = to the
 *     ground), or NaN
 * @param cutToCycleM height above ground to cut to so that it stays clear until the next trim
 *     (one cycle of growth), m, or NaN
 * @param fallInDistanceM distance from the tree's base to the nearest conductor, m, or NaN when
 *     not a fall-in tree
 * @param fallInReachM the tree's reach (height plus the rule's allowance), m, or NaN
 * @param vegHeightM height of the tree or of the patch's tallest point above ground, m, or NaN
 * @param x easting of the tree top, or of the patch's governing point, m
 * @param y northing, m
 * @param z elevation, m
 * @param lon longitude, degrees (WGS84), or NaN
 * @param lat latitude, degrees (WGS84), or NaN
 * @param stationM plan distance along the line from its first structure, m
 * @param chainageM plan distance along the span from its first structure, m
 * @param nearestStructure id of the span's structure nearest along the span
 * @param side side of the centre line looking from the span's first structure to its second
 * @param offsetM plan distance from the centre line, m
 * @param rightOfWay on or off the right-of-way, or not known (no width given)
 * @param points encroaching points of its grow-in sites; empty for a fall-in-only tree
 * @param areaM2 plan area (tree: crown circle; patch: hull of its points), m2, or NaN
 * @param yearsToViolation years until it grows into the violation-reference zone (0 inside,
 *     +infinity never, NaN not computed)
 * @param siteIds the cut sites (grow-in clumps and fall-in checks) it gathers
 */
public record WorkItem(
    String itemId, String spanId, String treeId, int priority, String zone, String reasons,
    Work work, String condition, String conductor, int circuit, double clearanceM,
    double requiredM, double deficitM, double sideTrimM, double cutToNowM, double cutToCycleM,
    double fallInDistanceM, double fallInReachM, double vegHeightM, double x, double y,
    double z, double lon, double lat, double stationM, double chainageM,
    String nearestStructure, CutSite.Side side, double offsetM, RightOfWay rightOfWay,
    OptionalInt points, double areaM2, double yearsToViolation, List<String> siteIds) {

  /** What a crew does. */
  public enum Work {
    /** A tree that can fall into the line: fell it (or, where the utility allows, top it). */
    REMOVE_TREE,
    /** Cut the vegetation down to a height above ground. */
    CLEAR_TO_HEIGHT,
    /** The vegetation is beside the zone: cut it back horizontally. */
    SIDE_TRIM,
    /**
     * Inside a zone that asks for no cut yet (e.g. a watch band): its top is already below the
     * height that keeps it clear of the violation-reference zone for a trim cycle.
     */
    NO_CUT_NOW,
    /**
     * Vegetation inside a pole-clearing zone (e.g. California PRC 4292): clear the ground and
     * the zone's height band around the pole out to the zone's radius.
     */
    CLEAR_AROUND_POLE;

    /**
     * Words for files: {@code remove tree}, {@code clear to height}, {@code side-trim},
     * {@code no cut now (re-check)}, {@code clear around pole}.
     */
    public String words() {
      return switch (this) {
        case REMOVE_TREE -> "remove tree";
        case CLEAR_TO_HEIGHT -> "clear to height";
        case SIDE_TRIM -> "side-trim";
        case NO_CUT_NOW -> "no cut now (re-check)";
        case CLEAR_AROUND_POLE -> "clear around pole";
      };
    }
  }

  /** Where the item stands against the right-of-way. */
  public enum RightOfWay {
    ON,
    OFF,
    /** The line specification gives no width. */
    NOT_KNOWN;

    /** Words for files: {@code on}, {@code off}, or empty. */
    public String words() {
      return this == NOT_KNOWN ? "" : name().toLowerCase(Locale.ROOT);
    }
  }

  public WorkItem {
    Objects.requireNonNull(itemId, "itemId");
    Objects.requireNonNull(spanId, "spanId");
    Objects.requireNonNull(treeId, "treeId");
    Objects.requireNonNull(zone, "zone");
    Objects.requireNonNull(reasons, "reasons");
    Objects.requireNonNull(work, "work");
    Objects.requireNonNull(condition, "condition");
    Objects.requireNonNull(conductor, "conductor");
    Objects.requireNonNull(nearestStructure, "nearestStructure");
    Objects.requireNonNull(side, "side");
    Objects.requireNonNull(rightOfWay, "rightOfWay");
    Objects.requireNonNull(points, "points");
    siteIds = List.copyOf(siteIds);
  }
}
