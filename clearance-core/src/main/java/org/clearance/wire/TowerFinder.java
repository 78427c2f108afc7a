package org.clearance.wire;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Groups the cells of a {@link TowerGrid} into towers (package-private): connected groups of
 * cells (8-neighbourhood) that hold class-15 points, or, in a survey without any, that hold tall
 * columns of unclassified points. Class-15 points make a tower only where they make such a
 * column themselves (a crown labelled tower does not). See {@link StructureRefiner} for the tests a column passes.
 */
final class TowerFinder {

  /** Fewest occupied one-metre slices for a cell to count as part of a column. */
  static final int MIN_CELL_SLICES = 6;

  private TowerFinder() {}

  /**
   * The towers, in a deterministic order (by x, then y).
   *
   * @param cells the grid's cells by key
   * @param minPoints fewest points of a tower
   * @param topMin lowest tower top above ground for column evidence, m
   */
  static List<StructureRefiner.Tower> towers(Map<Long, TowerGrid.Cell> cells, int minPoints,
      double topMin) {
    boolean labelled = cells.values().stream().anyMatch(c -> c.towerPoints > 0);
    Set<Long> evidence = new HashSet<>();
    for (Map.Entry<Long, TowerGrid.Cell> e : cells.entrySet()) {
      TowerGrid.Cell c = e.getValue();
      if (labelled ? c.towerPoints > 0 : Long.bitCount(c.slices) >= MIN_CELL_SLICES) {
        evidence.add(e.getKey());
      }
    }
    List<Long> keys = new ArrayList<>(evidence);
    keys.sort(Comparator.naturalOrder());
    Set<Long> done = new HashSet<>();
    List<StructureRefiner.Tower> out = new ArrayList<>();
    for (long start : keys) {
      if (!done.add(start)) {
        continue;
      }
      List<TowerGrid.Cell> group = new ArrayList<>();
      ArrayDeque<Long> queue = new ArrayDeque<>();
      queue.add(start);
      while (!queue.isEmpty()) {
        TowerGrid.Cell c = cells.get(queue.poll());
        group.add(c);
        for (long dx = -1; dx <= 1; dx++) {
          for (long dy = -1; dy <= 1; dy++) {
            long k = TowerGrid.key(c.cx + dx, c.cy + dy);
            if (evidence.contains(k) && done.add(k)) {
              queue.add(k);
            }
          }
        }
      }
      StructureRefiner.Tower t = labelled ? labelledTower(group, minPoints, topMin)
          : columnTower(group, minPoints, topMin);
      if (t != null) {
        out.add(t);
      }
    }
    out.sort(Comparator.comparingDouble(StructureRefiner.Tower::x)
        .thenComparingDouble(StructureRefiner.Tower::y));
    return out;
  }

  /**
   * A tower of class-15 points, when they look like one: the column tests of {@link
   * #columnTower} on the class-15 points' slices (issue 9: labels trusted only as far as they
   * are consistent). A crown a vendor labelled tower stands on a trunk the lidar barely sees and
   * ends below the conductors; taken for a tower it would cut the span at the crown.
   */
  private static StructureRefiner.Tower labelledTower(List<TowerGrid.Cell> group,
      int minPoints, double topMin) {
    int n = 0;
    double sx = 0;
    double sy = 0;
    long slices = 0;
    long minX = Long.MAX_VALUE;
    long maxX = Long.MIN_VALUE;
    long minY = Long.MAX_VALUE;
    long maxY = Long.MIN_VALUE;
    for (TowerGrid.Cell c : group) {
      n += c.towerPoints;
      sx += c.towerSumX;
      sy += c.towerSumY;
      slices |= c.towerSlices;
      minX = Math.min(minX, c.cx);
      maxX = Math.max(maxX, c.cx);
      minY = Math.min(minY, c.cy);
      maxY = Math.max(maxY, c.cy);
    }
    if (n < minPoints || !column(slices, minX, maxX, minY, maxY, topMin)) {
      return null;
    }
    return new StructureRefiner.Tower(sx / n, sy / n, n, "ASPRS class 15 (tower) points",
        true);
  }

  private static StructureRefiner.Tower columnTower(List<TowerGrid.Cell> group, int minPoints,
      double topMin) {
    int n = 0;
    double sx = 0;
    double sy = 0;
    long slices = 0;
    long minX = Long.MAX_VALUE;
    long maxX = Long.MIN_VALUE;
    long minY = Long.MAX_VALUE;
    long maxY = Long.MIN_VALUE;
    for (TowerGrid.Cell c : group) {
      n += c.openPoints;
      sx += c.openSumX;
      sy += c.openSumY;
      slices |= c.slices;
      minX = Math.min(minX, c.cx);
      maxX = Math.max(maxX, c.cx);
      minY = Math.min(minY, c.cy);
      maxY = Math.max(maxY, c.cy);
    }
    if (n < minPoints || !column(slices, minX, maxX, minY, maxY, topMin)) {
      return null;
    }
    int top = 63 - Long.numberOfLeadingZeros(slices);
    return new StructureRefiner.Tower(sx / n, sy / n, n,
        "column of unclassified points from near the ground to " + top + " m", false);
  }

  /**
   * Whether occupied slices over a group of cells make a tower's column: no wider than {@link
   * StructureRefiner#MAX_FOOTPRINT_M}, its top at least {@code topMin}, seen from the foot
   * ({@link StructureRefiner#FOOT_SLICE}) and at {@link StructureRefiner#FILL_SHARE} of the
   * metres up to the top.
   *
   * @param slices occupied one-metre slices above ground (bit k: k to k + 1 m)
   * @param topMin lowest top, m
   */
  private static boolean column(long slices, long minX, long maxX, long minY, long maxY,
      double topMin) {
    if (slices == 0) {
      return false;
    }
    double wide = TowerGrid.CELL_M * Math.max(maxX - minX + 1, maxY - minY + 1);
    int top = 63 - Long.numberOfLeadingZeros(slices);
    if (top < topMin || wide > StructureRefiner.MAX_FOOTPRINT_M) {
      return false;
    }
    int lowest = Long.numberOfTrailingZeros(slices);
    int filled = Long.bitCount(slices);
    return lowest <= StructureRefiner.FOOT_SLICE
        && filled >= StructureRefiner.FILL_SHARE * (top - lowest + 1);
  }
}
