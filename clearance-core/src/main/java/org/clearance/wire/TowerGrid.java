package org.clearance.wire;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.survey.PointChunk;

/**
 * Tower evidence gathered while the survey streams by (package-private): a sparse plan grid of
 * {@link #CELL_M} cells over the areas where towers are looked for (discs around the structures
 * file's positions and bands along the spans), holding per cell the ASPRS class-15 (tower) points
 * and which one-metre height slices above ground they occupy, and, for points never classified or
 * unclassified (class 0, 1), which one-metre height slices above ground are occupied. One grid per reading thread; {@link #absorb} merges them.
 */
final class TowerGrid implements Consumer<PointChunk> {

  /** Cell side, m: a third of a lattice tower base, so a tower is a compact group of cells. */
  static final double CELL_M = 3.0;
  /** Height slices per cell: one metre each from the ground, up to 64 m. */
  static final int SLICES = 64;
  /** ASPRS class 15: transmission tower. */
  static final int TOWER_CLASS = 15;

  /** One cell's evidence. */
  static final class Cell {
    final long cx;
    final long cy;
    int towerPoints;
    double towerSumX;
    double towerSumY;
    /** One-metre height slices above ground occupied by class-15 points. */
    long towerSlices;
    long slices;
    int openPoints;
    double openSumX;
    double openSumY;

    Cell(long cx, long cy) {
      this.cx = cx;
      this.cy = cy;
    }
  }

  /** An area where towers are looked for. */
  interface Area {
    /** True when plan point (x, y), m, lies in the area. */
    boolean contains(double x, double y);

    /** The plan bounding box: min x, min y, max x, max y, m. */
    double[] box();
  }

  private final List<Area> areas;
  private final CorridorIndex index;
  private final HeightModel heights;
  private final Map<Long, Cell> cells = new HashMap<>();

  TowerGrid(List<Area> areas, CorridorIndex index, HeightModel heights) {
    this.areas = List.copyOf(areas);
    this.index = index;
    this.heights = heights;
  }

  /** The index over the areas' bounding boxes. */
  static CorridorIndex index(List<Area> areas) {
    List<double[]> boxes = new ArrayList<>();
    for (Area a : areas) {
      double[] b = a.box();
      boxes.add(new double[] {b[0], b[1], b[2], b[3]});
    }
    return new CorridorIndex(boxes);
  }

  @Override
  public void accept(PointChunk chunk) {
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] z = chunk.z();
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      int k = cls[i];
      boolean tower = k == TOWER_CLASS;
      boolean open = k == CandidateCollector.NEVER_CLASSIFIED
          || k == CandidateCollector.UNCLASSIFIED;
      if ((!tower && !open) || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      int[] near = index.at(x[i], y[i]);
      boolean inside = false;
      for (int a : near) {
        if (areas.get(a).contains(x[i], y[i])) {
          inside = true;
          break;
        }
      }
      if (!inside) {
        continue;
      }
      double hag = heights.heightAboveGround(x[i], y[i], z[i]);
      if (tower) {
        Cell c = cell(x[i], y[i]);
        c.towerPoints++;
        c.towerSumX += x[i];
        c.towerSumY += y[i];
        if (hag >= 0 && hag < SLICES) {
          c.towerSlices |= 1L << (int) hag;
        }
        continue;
      }
      if (!(hag >= 0 && hag < SLICES)) {
        continue;
      }
      Cell c = cell(x[i], y[i]);
      c.slices |= 1L << (int) hag;
      c.openPoints++;
      c.openSumX += x[i];
      c.openSumY += y[i];
    }
  }

  private Cell cell(double x, double y) {
    long cx = (long) Math.floor(x / CELL_M);
    long cy = (long) Math.floor(y / CELL_M);
    return cells.computeIfAbsent(key(cx, cy), q -> new Cell(cx, cy));
  }

  static long key(long cx, long cy) {
    return (cx << 32) ^ (cy & 0xFFFFFFFFL);
  }

  /** Merges another grid's cells into this one. */
  void absorb(TowerGrid other) {
    other.cells.forEach((key, o) -> {
      Cell c = cells.computeIfAbsent(key, q -> new Cell(o.cx, o.cy));
      c.towerPoints += o.towerPoints;
      c.towerSumX += o.towerSumX;
      c.towerSumY += o.towerSumY;
      c.towerSlices |= o.towerSlices;
      c.slices |= o.slices;
      c.openPoints += o.openPoints;
      c.openSumX += o.openSumX;
      c.openSumY += o.openSumY;
    });
    other.cells.clear();
  }

  /** The cells, keyed by {@link #key}. */
  Map<Long, Cell> cells() {
    return cells;
  }
}
