package org.clearance.ground;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.clearance.io.OrderedParallel;

/**
 * Finds individual trees in a canopy surface, one block at a time.
 *
 * <p>For each block (read with an overlap of twice the largest search window):
 * <ol>
 *   <li>canopy height model (CHM) = highest vegetation return per cell minus the ground at the
 *       cell centre (methods.md 5.1);
 *   <li>airborne groups removed ({@link #removeSpikes}): a few cells standing more than
 *       {@link #SPIKE_M} m above every other canopy cell within {@link #SPIKE_RADIUS_M} m are
 *       birds or high noise, not a crown, and are emptied (common practice, no source: a crown
 *       falls less than 10 m within 2 m of its apex unless it is ten times as long as it is
 *       wide);
 *   <li>pits and small holes filled: a cell with at least {@link #MIN_NEIGHBOURS_TO_FILL} of its
 *       eight neighbours in the canopy that is empty, or more than {@link TreeOptions#pitDepth()}
 *       below their median, takes that median (median pit filling: common practice, no source);
 *   <li>tree tops: cells of at least the minimum height that no other cell within the variable
 *       window exceeds, radius 0.5 (2.51 + 0.009 h^2) m (Popescu &amp; Wynne 2004); ties go to the
 *       cell with the lower (row, column);
 *   <li>crowns: marker-controlled watershed from the tops, flooding the CHM from the top down
 *       (Meyer's priority flooding, 1994), only over cells of at least the minimum height and
 *       within {@link #CROWN_REACH} predicted crown radii of their top.
 * </ol>
 * Only tops in the block's core are reported, so every tree is reported once.
 */
final class TreeFinder {
  /** A crown may spread to this many times its predicted radius: real crowns vary about +-50 %. */
  static final double CROWN_REACH = 1.5;
  /** Cells are filled only when most (5 of 8) neighbours hold canopy: a gap, not an edge. */
  static final int MIN_NEIGHBOURS_TO_FILL = 5;

  /** Spike test radius, m. */
  static final double SPIKE_RADIUS_M = 2.0;
  /** Height a spike stands above every canopy cell around it, m. */
  static final double SPIKE_M = 10.0;

  private TreeFinder() {}

  /** Most cells of an airborne group: a bird or a small flock (1-6 returns in the demo). */
  static final int MAX_SPIKE_CELLS = 6;

  /**
   * Empties the airborne groups (see the class comment); returns a new raster. Cells are
   * grouped when they lie within {@link #SPIKE_RADIUS_M} and {@link #SPIKE_M} in height of each
   * other; a group of at most {@link #MAX_SPIKE_CELLS} cells, all at least {@link #SPIKE_M}
   * high, with every other canopy cell within {@link #SPIKE_RADIUS_M} more than {@link #SPIKE_M}
   * below it, floats: a bird, a flock or high noise, never a crown (a crown falls continuously
   * to its base).
   */
  static float[] removeSpikes(float[] chm, int side, double cellSize) {
    float[] out = chm.clone();
    int reach = (int) Math.ceil(SPIKE_RADIUS_M / cellSize);
    double r2 = (SPIKE_RADIUS_M / cellSize) * (SPIKE_RADIUS_M / cellSize);
    boolean[] seen = new boolean[chm.length];
    int[] group = new int[MAX_SPIKE_CELLS + 1];
    for (int start = 0; start < chm.length; start++) {
      if (seen[start] || Float.isNaN(chm[start]) || chm[start] < SPIKE_M) {
        continue;
      }
      // Grow the group from the start cell; give up once it is too big to be airborne.
      int n = 0;
      group[n++] = start;
      seen[start] = true;
      boolean floats = true;
      for (int g = 0; g < n && floats; g++) {
        int i = group[g];
        int r = i / side;
        int c = i % side;
        float v = chm[i];
        for (int dr = -reach; dr <= reach && floats; dr++) {
          for (int dc = -reach; dc <= reach && floats; dc++) {
            int rr = r + dr;
            int cc = c + dc;
            if ((dr == 0 && dc == 0) || rr < 0 || cc < 0 || rr >= side || cc >= side
                || dr * dr + dc * dc > r2) {
              continue;
            }
            int j = rr * side + cc;
            float w = chm[j];
            if (Float.isNaN(w) || w < v - SPIKE_M) {
              continue; // empty, or far below: air between
            }
            if (w > v + SPIKE_M || w < SPIKE_M) {
              floats = false; // something far above, or a link down to low canopy
            } else if (!contains(group, n, j)) {
              if (n == group.length) {
                floats = false;
              } else {
                group[n++] = j;
                seen[j] = true;
              }
            }
          }
        }
      }
      if (floats) {
        for (int g = 0; g < n; g++) {
          out[group[g]] = Float.NaN;
        }
      }
    }
    return out;
  }

  private static boolean contains(int[] a, int n, int v) {
    for (int k = 0; k < n; k++) {
      if (a[k] == v) {
        return true;
      }
    }
    return false;
  }

  /**
   * The trees of the canopy raster {@code dsm}, block by block on {@code threads} threads; the
   * blocks' trees are concatenated in block order, so the list is the same for any thread count.
   */
  static List<Tree> find(SparseGrid dsm, GroundModel ground, TreeOptions options, int threads) {
    int window = options.maxWindowCells();
    int overlap = (int) Math.ceil(2 * CROWN_REACH * window) + 1;
    Offsets offsets = new Offsets(window);
    List<Tree> trees = new ArrayList<>();
    OrderedParallel.forEach(BlockTiling.cover(dsm, options.blockCells(), overlap), threads, b -> {
      List<Tree> inBlock = new ArrayList<>();
      findInBlock(dsm, ground, options, b, offsets, inBlock);
      return inBlock;
    }, trees::addAll);
    return trees;
  }

  private static void findInBlock(SparseGrid dsm, GroundModel ground, TreeOptions o,
      BlockTiling.Block b, Offsets offsets, List<Tree> out) {
    int side = b.readSize();
    float[] top = dsm.readBlock(b.readCol0(), b.readRow0(), side, side);
    float[] chm = new float[top.length];
    boolean tall = false;
    for (int r = 0; r < side; r++) {
      for (int c = 0; c < side; c++) {
        int i = r * side + c;
        double g = Float.isNaN(top[i]) ? Double.NaN
            : ground.groundZ(dsm.centreX(b.readCol0() + c), dsm.centreY(b.readRow0() + r));
        chm[i] = (float) (top[i] - g);
        tall |= chm[i] >= o.minHeight();
      }
    }
    if (!tall) {
      return;
    }
    chm = fillPits(removeSpikes(chm, side, o.cellSize()), side, o.pitDepth());
    int[] tops = findTops(chm, side, o, offsets);
    int[] area = CrownSegmenter.crownCells(chm, side, tops, o);
    for (int t = 0; t < tops.length; t++) {
      int i = tops[t];
      int c = i % side;
      int r = i / side;
      if (!b.inCore(c, r)) {
        continue;
      }
      double x = dsm.centreX(b.readCol0() + c);
      double y = dsm.centreY(b.readRow0() + r);
      double base = ground.groundZ(x, y);
      double h = chm[i];
      double radius = Math.sqrt(area[t] * o.cellSize() * o.cellSize() / Math.PI);
      out.add(new Tree(x, y, base + h, base, h, radius));
    }
  }

  /** Median pit filling (see the class comment); returns a new raster. */
  static float[] fillPits(float[] chm, int side, double pitDepth) {
    float[] out = chm.clone();
    float[] nb = new float[8];
    for (int r = 1; r < side - 1; r++) {
      for (int c = 1; c < side - 1; c++) {
        int i = r * side + c;
        int n = 0;
        for (int dr = -1; dr <= 1; dr++) {
          for (int dc = -1; dc <= 1; dc++) {
            float v = chm[i + dr * side + dc];
            if ((dr != 0 || dc != 0) && !Float.isNaN(v)) {
              nb[n++] = v;
            }
          }
        }
        if (n == 0) {
          continue;
        }
        float v = chm[i];
        if (!Float.isNaN(v) && !medianMayExceed(nb, n, (float) (v + pitDepth))) {
          continue; // not a pit, whatever the exact median: no sort needed
        }
        Arrays.sort(nb, 0, n);
        float median = (n % 2 == 1) ? nb[n / 2] : 0.5f * (nb[n / 2 - 1] + nb[n / 2]);
        boolean pit = !Float.isNaN(chm[i]) && n >= MIN_NEIGHBOURS_TO_FILL
            && chm[i] < median - pitDepth;
        boolean gap = Float.isNaN(chm[i]) && n >= MIN_NEIGHBOURS_TO_FILL;
        if (pit || gap) {
          out[i] = median;
        }
      }
    }
    return out;
  }

  /**
   * Whether the median of {@code nb[0..n)} can exceed {@code level}: only when more than half of
   * the values exceed it (odd n), or at least half (even n, the median being the mean of the two
   * middle values). A count, cheaper than the sort the median needs.
   */
  static boolean medianMayExceed(float[] nb, int n, float level) {
    int above = 0;
    for (int k = 0; k < n; k++) {
      if (nb[k] > level) {
        above++;
      }
    }
    return n % 2 == 1 ? above > n / 2 : above >= n / 2;
  }

  /** Indices of the variable-window local maxima of at least the minimum height. */
  static int[] findTops(float[] chm, int side, TreeOptions o, Offsets offsets) {
    int[] tops = new int[64];
    int n = 0;
    double capRadius = TreeOptions.windowRadius(o.maxHeight());
    for (int r = 0; r < side; r++) {
      for (int c = 0; c < side; c++) {
        int i = r * side + c;
        float h = chm[i];
        if (!(h >= o.minHeight())) {
          continue;
        }
        double radius = Math.min(TreeOptions.windowRadius(h), capRadius) / o.cellSize();
        if (isTop(chm, side, c, r, radius * radius, offsets)) {
          if (n == tops.length) {
            tops = Arrays.copyOf(tops, 2 * n);
          }
          tops[n++] = i;
        }
      }
    }
    return Arrays.copyOf(tops, n);
  }

  private static boolean isTop(float[] chm, int side, int c, int r, double radius2,
      Offsets offsets) {
    int i = r * side + c;
    float h = chm[i];
    for (int k = 0; k < offsets.size && offsets.d2[k] <= radius2; k++) {
      int cc = c + offsets.dc[k];
      int rr = r + offsets.dr[k];
      if (cc < 0 || rr < 0 || cc >= side || rr >= side) {
        continue;
      }
      int j = rr * side + cc;
      float v = chm[j];
      if (v > h || (v == h && j < i)) {
        return false;
      }
    }
    return true;
  }

  /** Cell offsets within a disk (centre excluded), nearest first, so a higher cell is met soon. */
  static final class Offsets {
    final int[] dc;
    final int[] dr;
    final int[] d2;
    final int size;

    Offsets(int radius) {
      List<int[]> list = new ArrayList<>();
      for (int r = -radius; r <= radius; r++) {
        for (int c = -radius; c <= radius; c++) {
          int d = r * r + c * c;
          if (d > 0 && d <= radius * radius) {
            list.add(new int[] {c, r, d});
          }
        }
      }
      list.sort((p, q) -> Integer.compare(p[2], q[2]));
      size = list.size();
      dc = new int[size];
      dr = new int[size];
      d2 = new int[size];
      for (int k = 0; k < size; k++) {
        dc[k] = list.get(k)[0];
        dr[k] = list.get(k)[1];
        d2[k] = list.get(k)[2];
      }
    }
  }
}
