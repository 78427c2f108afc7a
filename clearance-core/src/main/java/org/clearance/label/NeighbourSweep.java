package org.clearance.label;

import org.clearance.io.DisjointSets;

/**
 * Steps 2 and 3 of {@link ObjectLabeller}: each point's dimensionality features from the points
 * within {@link ObjectLabeller#RADIUS_M} ({@link LocalShape}) and the objects, single-linkage
 * clusters at {@link ObjectLabeller#LINK_M}, in one sweep over a {@link CellIndex}.
 *
 * <p>The points are taken cell by cell ({@link CellIndex.Sweep}: the 9 column runs found once
 * per cell), each point's neighbours in the index's order, so its sums are added in the same
 * order, and give the same doubles, whatever order the points are taken in. Each linked pair is
 * joined once (by its larger index); a union keeps the smaller root, so every object's root is
 * its least index whatever order the joins come in, and a neighbour already in the point's group
 * is not joined again.
 */
final class NeighbourSweep {

  private NeighbourSweep() {}

  /**
   * @param p the points, sorted
   * @param shape receives each point's features (null with fewer than
   *     {@link ObjectLabeller#MIN_NEIGHBOURS} neighbours or no spread)
   * @return each point's object: the least index of its cluster
   */
  static int[] shapesAndObjects(LabelPoints p, LocalShape[] shape) {
    int n = p.size;
    double cell = Math.max(ObjectLabeller.RADIUS_M, ObjectLabeller.LINK_M);
    CellIndex index = new CellIndex(p.x, p.y, p.z, n, cell);
    int[] parent = new int[n];
    for (int i = 0; i < n; i++) {
      parent[i] = i;
    }
    int[] order = index.order;
    double[] sx = index.sx;
    double[] sy = index.sy;
    double[] sz = index.sz;
    double r2 = cell * cell;
    double radius2 = ObjectLabeller.RADIUS_M * ObjectLabeller.RADIUS_M;
    double link2 = ObjectLabeller.LINK_M * ObjectLabeller.LINK_M;
    CellIndex.Sweep sweep = index.sweep();
    int[] from = sweep.from;
    int[] to = sweep.to;
    for (int c = 0; c < index.cells(); c++) {
      sweep.moveTo(c);
      for (int q = index.firstOf(c); q < index.firstOf(c + 1); q++) {
        int i = order[q];
        double px = sx[q];
        double py = sy[q];
        double pz = sz[q];
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        double s4 = 0;
        double s5 = 0;
        double s6 = 0;
        double s7 = 0;
        double s8 = 0;
        double s9 = 0;
        // i may have been joined already by a later point taken before it
        int myRoot = DisjointSets.root(parent, i);
        for (int k = 0; k < CellIndex.COLUMNS; k++) {
          for (int t = from[k]; t < to[k]; t++) {
            double dx = sx[t] - px;
            double dy = sy[t] - py;
            double dz = sz[t] - pz;
            double d2 = dx * dx + dy * dy + dz * dz;
            if (d2 > r2) {
              continue;
            }
            if (d2 <= radius2) {
              s0++;
              s1 += dx;
              s2 += dy;
              s3 += dz;
              s4 += dx * dx;
              s5 += dx * dy;
              s6 += dx * dz;
              s7 += dy * dy;
              s8 += dy * dz;
              s9 += dz * dz;
            }
            int j = order[t];
            // each pair once; a neighbour already in i's group needs no join
            if (j < i && d2 <= link2 && parent[j] != myRoot) {
              myRoot = DisjointSets.join(parent, myRoot, j);
            }
          }
        }
        if (s0 >= ObjectLabeller.MIN_NEIGHBOURS) {
          shape[i] = LocalShape.of((int) s0, s1, s2, s3, s4, s5, s6, s7, s8, s9);
        }
      }
    }
    for (int i = 0; i < n; i++) {
      parent[i] = DisjointSets.root(parent, i);
    }
    return parent;
  }
}
