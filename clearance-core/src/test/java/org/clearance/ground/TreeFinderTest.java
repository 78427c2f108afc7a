package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class TreeFinderTest {
  private static final SyntheticSurvey SURVEY = new SyntheticSurvey(7, 45);
  private static GroundModel ground;
  private static List<Tree> trees;

  @BeforeAll
  static void find() {
    GroundModelBuilder g = new GroundModelBuilder(GroundOptions.defaults());
    CanopyBuilder c = new CanopyBuilder(TreeOptions.defaults(), PlanPredicate.ALL);
    SURVEY.stream(8192, chunk -> {
      g.accept(chunk);
      c.accept(chunk);
    });
    ground = g.build();
    trees = c.findTrees(ground);
  }

  @Test
  void everyPlantedTreeIsFoundOnceWithItsHeight() {
    // Truth: the planted stems of the seeded survey. Tolerances: position within 1 m (the flat
    // top of an ellipsoid crown, 0.5 m cells), height within 0.5 m (the task's bound).
    assertEquals(SURVEY.trees().size(), trees.size());
    for (SyntheticSurvey.PlantedTree p : SURVEY.trees()) {
      Tree t = nearest(trees, p.x(), p.y());
      assertEquals(0, Math.hypot(t.x() - p.x(), t.y() - p.y()), 1.0);
      assertEquals(p.height(), t.height(), 0.5);
      assertEquals(SyntheticSurvey.terrain(t.x(), t.y()), t.baseZ(), 0.15);
      assertEquals(t.baseZ() + t.height(), t.topZ(), 1e-9);
      // Crown area of the planted disk within 20 % in radius: cells along the rim and the
      // 2 m floor of the flood make the watershed area approximate.
      assertEquals(p.crownRadius(), t.crownRadius(), 0.2 * p.crownRadius());
    }
  }

  @Test
  void regionLimitsTheSearch() {
    // Keep only the western half: only trees there are found (a 10 m band at the cut may lose
    // or clip crowns, so compare away from it).
    double cut = SyntheticSurvey.X0 + 150;
    CanopyBuilder c = new CanopyBuilder(TreeOptions.defaults(), (x, y) -> x < cut);
    SURVEY.stream(8192, c);
    List<Tree> west = c.findTrees(ground);
    assertTrue(west.stream().allMatch(t -> t.x() < cut));
    long expected = SURVEY.trees().stream().filter(p -> p.x() < cut - 10).count();
    long found = west.stream().filter(t -> t.x() < cut - 10).count();
    assertEquals(expected, found);
    assertTrue(c.memoryBytes() < 0.7 * new CanopyBuilderProbe().fullMemory());
  }

  @Test
  void buildingsWiresAndGroundAreNotCanopy() {
    // ASPRS classes left out of the canopy (LAS 1.4 R15 class table).
    for (int cls : new int[] {2, 6, 7, 9, 13, 14, 15, 16, 17, 18, 19}) {
      assertTrue(!CanopyBuilder.isCanopyClass(cls), "class " + cls);
    }
    for (int cls : new int[] {0, 1, 3, 4, 5, 12, 64}) {
      assertTrue(CanopyBuilder.isCanopyClass(cls), "class " + cls);
    }
  }

  @Test
  void pitsAndGapsTakeTheMedianOfTheirNeighbours() {
    // Hand-made 5 x 5 canopy at 10 m with a 4 m pit at (2,2) and a hole at (1,3); pit depth 1 m.
    int s = 5;
    float[] chm = new float[s * s];
    Arrays.fill(chm, 10f);
    chm[2 * s + 2] = 4f;
    chm[3 * s + 1] = Float.NaN;
    chm[3 * s + 3] = 9.5f; // 0.5 m below: not a pit
    float[] out = TreeFinder.fillPits(chm, s, 1.0);
    assertEquals(10f, out[2 * s + 2], 0f);
    assertEquals(10f, out[3 * s + 1], 0f);
    assertEquals(9.5f, out[3 * s + 3], 0f);
  }

  @Test
  void airborneSpikesAreEmptiedAndSteepCrownsKept() {
    // Issue 9 item 4: a high-noise return 300 m up over open land, a bird 60 m above a 20 m
    // crown and a flock 72 m up made trees for the fall-in check. Hand-made 0.5 m canopy: a cone 20 m tall
    // falling 5 m per metre (steep conifer, kept), a lone return at 300 m, one at 60 m above
    // the crown.
    int s = 21;
    float[] chm = new float[s * s];
    Arrays.fill(chm, Float.NaN);
    for (int r = 0; r < s; r++) {
      for (int c = 0; c < 10; c++) {
        double d = 0.5 * Math.hypot(r - 10, c - 5);
        if (d <= 3) {
          chm[r * s + c] = (float) (20 - 5 * d);
        }
      }
    }
    chm[10 * s + 17] = 300f;
    chm[12 * s + 5] = 80f;
    // a flock of three birds 72 m up, over open land at the block's far side
    chm[2 * s + 15] = 72f;
    chm[2 * s + 16] = 72.4f;
    chm[3 * s + 16] = 71.8f;
    float[] out = TreeFinder.removeSpikes(chm, s, 0.5);
    assertEquals(20f, out[10 * s + 5], 0f);
    assertEquals(chm[11 * s + 5], out[11 * s + 5], 0f);
    assertEquals(chm[10 * s + 8], out[10 * s + 8], 0f);
    assertTrue(Float.isNaN(out[10 * s + 17]));
    assertTrue(Float.isNaN(out[12 * s + 5]));
    assertTrue(Float.isNaN(out[2 * s + 15]));
    assertTrue(Float.isNaN(out[2 * s + 16]));
    assertTrue(Float.isNaN(out[3 * s + 16]));
  }

  @Test
  void plateauGivesOneTopAndTwoConesTwoCrowns() {
    // Hand-made 40 x 40 canopy (0.5 m cells): cones 14 m and 12 m tall falling 2 m per metre,
    // crowns 2.5 m in radius, tops 4.5 m apart so the crowns overlap; cone 1 has a flat 2-cell
    // top (tie: the lower index wins). Windows: 0.5 (2.51 + 0.009 h^2) = 2.14 m and 1.90 m, both
    // below the 4.5 m spacing, so both tops stand (computed).
    int s = 40;
    float[] chm = new float[s * s];
    Arrays.fill(chm, Float.NaN);
    double[][] cones = {{16, 20, 14}, {25, 20, 12}};
    for (int r = 0; r < s; r++) {
      for (int c = 0; c < s; c++) {
        float best = Float.NaN;
        for (double[] k : cones) {
          double d = 0.5 * Math.hypot(c - k[0], r - k[1]);
          if (d <= 2.5) {
            float h = (float) (k[2] - 2.0 * d);
            best = Float.isNaN(best) || h > best ? h : best;
          }
        }
        chm[r * s + c] = best;
      }
    }
    chm[20 * s + 17] = 14f; // the plateau's second cell
    TreeOptions o = TreeOptions.defaults();
    int[] tops = TreeFinder.findTops(chm, s, o, new TreeFinder.Offsets(o.maxWindowCells()));
    assertArrayEquals(new int[] {20 * s + 16, 20 * s + 25}, tops);
    int[] cells = CrownSegmenter.crownCells(chm, s, tops, o);
    // Cone 1 stands above cone 2 wherever they overlap, so its crown is its whole disk: the 81
    // lattice cells within 5 cells of its top (Gauss circle count, computed), plus ridge cells
    // of cone 2 that touch its rim and are contested (at most one per rim cell facing cone 2,
    // about 8). Every canopy cell goes to one of the two crowns (reaches 3.2 and 2.85 m > 2.5 m).
    long canopy = 0;
    for (float v : chm) {
      canopy += v >= 2 ? 1 : 0;
    }
    assertEquals(canopy, cells[0] + cells[1]);
    assertTrue(cells[0] >= 81 && cells[0] <= 81 + 8, "crown 1 cells " + cells[0]);
  }

  @Test
  void queuePopsHighestFirst() {
    // Reference: sorting (java.util.Arrays.sort) of the same keys.
    CellQueue q = new CellQueue();
    float[] keys = new float[500];
    java.util.Random rnd = new java.util.Random(3);
    for (int i = 0; i < keys.length; i++) {
      keys[i] = (float) rnd.nextGaussian();
      q.push(i, keys[i]);
    }
    float[] sorted = keys.clone();
    Arrays.sort(sorted);
    for (int k = sorted.length - 1; k >= 0; k--) {
      assertEquals(sorted[k], keys[q.pop()], 0f);
    }
    assertTrue(q.isEmpty());
  }

  private static Tree nearest(List<Tree> list, double x, double y) {
    Tree best = null;
    double bd = Double.POSITIVE_INFINITY;
    for (Tree t : list) {
      double d = Math.hypot(t.x() - x, t.y() - y);
      if (d < bd) {
        bd = d;
        best = t;
      }
    }
    return best;
  }

  /** Memory of the canopy raster over the whole survey, for comparison. */
  private static final class CanopyBuilderProbe {
    long fullMemory() {
      CanopyBuilder c = new CanopyBuilder(TreeOptions.defaults(), PlanPredicate.ALL);
      SURVEY.stream(8192, c);
      return c.memoryBytes();
    }
  }
}
