package org.clearance.ground;

import java.util.Arrays;

/**
 * Marker-controlled watershed of a canopy height model: each tree top floods down its crown, the
 * highest unassigned cell next to an assigned one going first (priority flooding, Meyer 1994,
 * "Topographic distance and watershed lines", Signal Processing 38(1):113-125), so neighbouring
 * crowns meet in the valleys between them.
 */
final class CrownSegmenter {
  private CrownSegmenter() {}

  /**
   * Number of cells of each top's crown.
   *
   * @param chm canopy heights, metres, row-major {@code side x side}, NaN where unknown
   * @param tops indices of the tree tops
   * @return cells per top, same order as {@code tops}, each &gt;= 1
   */
  static int[] crownCells(float[] chm, int side, int[] tops, TreeOptions o) {
    int[] label = new int[chm.length];
    Arrays.fill(label, -1);
    int[] count = new int[tops.length];
    double[] reach2 = new double[tops.length];
    CellQueue queue = new CellQueue();
    for (int t = 0; t < tops.length; t++) {
      int i = tops[t];
      label[i] = t;
      count[t] = 1;
      double reach = TreeFinder.CROWN_REACH * TreeOptions.windowRadius(chm[i]) / o.cellSize();
      reach2[t] = reach * reach;
      queue.push(i, chm[i]);
    }
    while (!queue.isEmpty()) {
      int p = queue.pop();
      int t = label[p];
      int pc = p % side;
      int pr = p / side;
      int tc = tops[t] % side;
      int tr = tops[t] / side;
      for (int dr = -1; dr <= 1; dr++) {
        for (int dc = -1; dc <= 1; dc++) {
          int qc = pc + dc;
          int qr = pr + dr;
          if ((dr == 0 && dc == 0) || qc < 0 || qr < 0 || qc >= side || qr >= side) {
            continue;
          }
          int q = qr * side + qc;
          double far2 = (double) (qc - tc) * (qc - tc) + (double) (qr - tr) * (qr - tr);
          if (label[q] != -1 || !(chm[q] >= o.minHeight()) || far2 > reach2[t]) {
            continue;
          }
          label[q] = t;
          count[t]++;
          queue.push(q, chm[q]);
        }
      }
    }
    return count;
  }
}
