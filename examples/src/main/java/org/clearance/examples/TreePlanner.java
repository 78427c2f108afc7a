package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.wire.ConductorCurve;

/**
 * Places the demo's trees and shrubs: forest stands outside the right-of-way on a jittered grid,
 * shrubs in the cleared strip and in open land, and planted trees at chosen distances from the
 * conductors (grow-in, near-miss) or tall enough to fall into the line (fall-in).
 */
final class TreePlanner {
  /** Forest grid spacing, m (about 230 stems per hectare). */
  private static final double FOREST_SPACING_M = 6.5;
  private static final double MIN_TREE_M = 6;
  private static final double MAX_TREE_M = 34;
  /** Share of forest trees that are emergent giants (1.3-1.5 times the stand). */
  private static final double GIANT_SHARE = 1.0 / 150;
  /** Shrub densities, per m^2. */
  private static final double ROW_SHRUB_DENSITY = 1.0 / 120;
  private static final double OPEN_SHRUB_DENSITY = 1.0 / 350;
  /** Planting attempts before giving up on one planted tree. */
  private static final int PLANT_TRIES = 40;
  /** Planted-tree distance bands from a conductor, m. */
  static final double GROW_IN_MIN_M = 1.0;
  static final double GROW_IN_MAX_M = 5.0;
  static final double CLOSE_GROW_IN_MAX_M = 3.0;
  static final double NEAR_MISS_MIN_M = 5.5;
  static final double NEAR_MISS_MAX_M = 9.0;
  /** Tallest planted fall-in tree, m. */
  private static final double MAX_FALL_IN_M = 48;
  /** Keep-out radius around tower centres for trees, m. */
  private static final double TOWER_CLEAR_M = 10;

  private final SplittableRandom rng;
  private final Corridor corridor;
  private final Terrain terrain;
  private final Stands stands;
  private final LineBuilder.Layout layout;
  private final List<DemoBuilding> buildings;
  private final DemoRoad road;
  private final int ravineSpan;
  private final List<Draft> drafts = new ArrayList<>();
  /** Planted drafts are added span by span: the first draft index of each span, and the end. */
  private int[] plantedStart;

  /** A tree placed but not yet measured against the conductors (lengths in m). */
  private record Draft(double x, double y, double height, DemoTree.Shape shape, double radius,
      double crownBase, DemoTree.Role role, int span) {}

  TreePlanner(SplittableRandom rng, Corridor corridor, Terrain terrain, Stands stands,
      LineBuilder.Layout layout, List<DemoBuilding> buildings, DemoRoad road, int ravineSpan) {
    this.rng = rng;
    this.corridor = corridor;
    this.terrain = terrain;
    this.stands = stands;
    this.layout = layout;
    this.buildings = buildings;
    this.road = road;
    this.ravineSpan = ravineSpan;
  }

  List<DemoTree> plan() {
    int n = corridor.spanCount();
    plantedStart = new int[n + 1];
    for (int i = 0; i < n; i++) {
      plantedStart[i] = drafts.size();
      if (i != ravineSpan && i % 3 == 1) { // every third span: a close one, under 3 m
        plantNear(i, DemoTree.Role.GROW_IN, GROW_IN_MIN_M, CLOSE_GROW_IN_MAX_M);
      } else if (i != ravineSpan && rng.nextDouble() < 0.4) {
        plantNear(i, DemoTree.Role.GROW_IN, GROW_IN_MIN_M, GROW_IN_MAX_M);
      }
      if (i != ravineSpan && rng.nextDouble() < 0.6) {
        plantNear(i, DemoTree.Role.NEAR_MISS, NEAR_MISS_MIN_M, NEAR_MISS_MAX_M);
      }
      if (i % 4 == 2 || rng.nextDouble() < 0.3) {
        plantFallIn(i);
      }
    }
    plantedStart[n] = drafts.size();
    for (int i = 0; i < n; i++) {
      forest(i);
      shrubs(i);
    }
    List<DemoTree> trees = new ArrayList<>(drafts.size());
    for (Draft d : drafts) {
      trees.add(finish(trees.size(), d));
    }
    return trees;
  }

  private void plantNear(int span, DemoTree.Role role, double minD, double maxD) {
    DemoSpan sp = layout.spans().get(span);
    for (int t = 0; t < PLANT_TRIES; t++) {
      DemoWire w = sp.wires().get(rng.nextInt(sp.wires().size()));
      if (w.role() != DemoPosition.Role.PHASE) {
        continue;
      }
      ConductorCurve c = w.curve();
      double s = rng.nextDouble(0.2, 0.8) * c.length();
      double phi = Math.toRadians(rng.nextDouble(-35, 35));
      double d = rng.nextDouble(minD, maxD);
      double nx = -c.plan().uy();
      double ny = c.plan().ux();
      double ax = c.x(s) + d * Math.sin(phi) * nx;
      double ay = c.y(s) + d * Math.sin(phi) * ny;
      double h = c.z(s) - d * Math.cos(phi) - terrain.z(ax, ay);
      if (h < 3 || h > MAX_TREE_M || blocked(ax, ay, 2, span)
          || corridor.owner(ax, ay, span) != span) {
        continue;
      }
      drafts.add(new Draft(ax, ay, h, DemoTree.Shape.CONE, h * rng.nextDouble(0.12, 0.18),
          h * rng.nextDouble(0.2, 0.4), role, span));
      return;
    }
  }

  private void plantFallIn(int span) {
    double len = layout.spans().get(span).lengthM();
    double maxE = Math.min(Corridor.ROW_HALF_WIDTH_M + 10, corridor.halfWidth() - 3);
    for (int t = 0; t < PLANT_TRIES; t++) {
      double e = rng.nextDouble(Corridor.ROW_HALF_WIDTH_M + 1.5, maxE)
          * (rng.nextBoolean() ? 1 : -1);
      double s = rng.nextDouble(0.2, 0.8) * len;
      double x = corridor.x(span, s, e);
      double y = corridor.y(span, s, e);
      if (blocked(x, y, 3, span) || corridor.owner(x, y, span) != span
          || corridor.inRow(span, x, y)) {
        continue;
      }
      double reach = nearest(span, x, y, terrain.z(x, y))[0];
      double h = reach + rng.nextDouble(1.5, 6.0);
      if (h > MAX_FALL_IN_M) {
        continue;
      }
      boolean cone = rng.nextBoolean();
      drafts.add(new Draft(x, y, h, cone ? DemoTree.Shape.CONE : DemoTree.Shape.ELLIPSOID,
          h * (cone ? rng.nextDouble(0.12, 0.16) : rng.nextDouble(0.2, 0.26)),
          h * rng.nextDouble(0.35, 0.5), DemoTree.Role.FALL_IN, span));
      return;
    }
  }

  private void forest(int span) {
    double w = corridor.halfWidth();
    double len = layout.spans().get(span).lengthM();
    for (double s = -w; s < len + w; s += FOREST_SPACING_M) {
      for (double e = -w; e < w; e += FOREST_SPACING_M) {
        double js = s + FOREST_SPACING_M * rng.nextDouble(0.05, 0.95);
        double je = e + FOREST_SPACING_M * rng.nextDouble(0.05, 0.95);
        double x = corridor.x(span, js, je);
        double y = corridor.y(span, js, je);
        if (!stands.forest(x, y) || corridor.owner(x, y, span) != span
            || corridor.segmentDistance(span, x, y) < Corridor.ROW_HALF_WIDTH_M + 0.5
            || blocked(x, y, 3, span) || nearPlanted(x, y, span, 4)) {
          continue;
        }
        double h = stands.meanHeight(x, y) + 2.5 * rng.nextGaussian();
        if (rng.nextDouble() < GIANT_SHARE) {
          h *= rng.nextDouble(1.3, 1.5);
        }
        h = Math.max(MIN_TREE_M, Math.min(MAX_FALL_IN_M, h));
        boolean conifer = stands.conifer(x, y) ^ rng.nextDouble() < 0.15;
        drafts.add(new Draft(x, y, h, conifer ? DemoTree.Shape.CONE : DemoTree.Shape.ELLIPSOID,
            h * (conifer ? rng.nextDouble(0.12, 0.18) : rng.nextDouble(0.2, 0.3)),
            h * (conifer ? rng.nextDouble(0.25, 0.45) : rng.nextDouble(0.3, 0.5)),
            DemoTree.Role.FOREST, span));
      }
    }
  }

  private void shrubs(int span) {
    double w = corridor.halfWidth();
    double len = layout.spans().get(span).lengthM();
    double area = (len + 2 * w) * 2 * w;
    int tries = (int) (area * OPEN_SHRUB_DENSITY + area * ROW_SHRUB_DENSITY);
    for (int k = 0; k < tries; k++) {
      double s = rng.nextDouble(-w, len + w);
      double e = rng.nextDouble(-w, w);
      double x = corridor.x(span, s, e);
      double y = corridor.y(span, s, e);
      boolean row = corridor.inRow(span, x, y);
      double keep = row ? ROW_SHRUB_DENSITY : stands.forest(x, y) ? 0 : OPEN_SHRUB_DENSITY;
      if (rng.nextDouble() * (ROW_SHRUB_DENSITY + OPEN_SHRUB_DENSITY) >= keep
          || corridor.owner(x, y, span) != span || blocked(x, y, 1.5, span)) {
        continue;
      }
      double h = rng.nextDouble(0.5, 3.0);
      drafts.add(new Draft(x, y, h, DemoTree.Shape.ELLIPSOID, rng.nextDouble(0.5, 1.6), 0.05 * h,
          DemoTree.Role.SHRUB, span));
    }
  }

  /** True when a planted tree of span-1..span+1 stands within r of (x, y). */
  private boolean nearPlanted(double x, double y, int span, double r) {
    int from = plantedStart[Math.max(0, span - 1)];
    int to = plantedStart[Math.min(corridor.spanCount(), span + 2)];
    for (int k = from; k < to; k++) {
      if (Math.hypot(drafts.get(k).x() - x, drafts.get(k).y() - y) < r) {
        return true;
      }
    }
    return false;
  }

  /** True when (x, y), owned by span, is on the road, a building or a tower site. */
  private boolean blocked(double x, double y, double margin, int span) {
    if (road.distance(x, y) < 0.5 * road.widthM() + margin) {
      return true;
    }
    for (DemoBuilding b : buildings) {
      if (Math.abs(b.span() - span) <= 1
          && Math.hypot(b.x() - x, b.y() - y) < b.halfDiagonalM() + margin) {
        return true;
      }
    }
    List<DemoStructure> st = layout.structures();
    for (int k = Math.max(0, span - 1); k <= Math.min(st.size() - 1, span + 2); k++) {
      if (Math.hypot(st.get(k).x() - x, st.get(k).y() - y) < TOWER_CLEAR_M) {
        return true;
      }
    }
    return false;
  }

  /** {distance, span, wire index} of the conductor nearest to (x, y, z), spans span-1..span+1. */
  private double[] nearest(int span, double x, double y, double z) {
    double[] best = {Double.POSITIVE_INFINITY, -1, -1};
    for (int i = Math.max(0, span - 1); i <= Math.min(corridor.spanCount() - 1, span + 1); i++) {
      List<DemoWire> wires = layout.spans().get(i).wires();
      for (int k = 0; k < wires.size(); k++) {
        double d = CurveDistance.distance(wires.get(k).curve(), x, y, z);
        if (d < best[0]) {
          best = new double[] {d, i, k};
        }
      }
    }
    return best;
  }

  private DemoTree finish(int id, Draft d) {
    double baseZ = terrain.z(d.x(), d.y());
    double[] apex = nearest(d.span(), d.x(), d.y(), baseZ + d.height());
    double[] base = nearest(d.span(), d.x(), d.y(), baseZ);
    String position = layout.spans().get((int) apex[1]).wires().get((int) apex[2]).position();
    return new DemoTree(id, d.x(), d.y(), baseZ, d.height(), d.shape(), d.radius(),
        d.crownBase(), d.role(), d.span(), (int) apex[1], position, apex[0], base[0]);
  }
}
