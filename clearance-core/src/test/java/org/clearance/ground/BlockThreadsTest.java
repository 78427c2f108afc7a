package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The terrain and the trees are built block by block on several threads (issue 12); the result
 * must be the one the sequential loop gives, cell for cell and tree for tree, in small blocks so
 * that the synthetic scene spans many of them.
 */
class BlockThreadsTest {
  private static final SyntheticSurvey SURVEY = new SyntheticSurvey(42, 40);

  @Test
  void terrainAndTreesAreTheSameForAnyThreadCount() {
    for (GroundOptions.Source source : GroundOptions.Source.values()) {
      GroundOptions d = GroundOptions.defaults().withSource(source);
      GroundOptions small = new GroundOptions(d.source(), d.smrf(), 32, d.coverageMargin(),
          d.minGroundShare());
      TreeOptions trees = new TreeOptions(0.5, 2, 60, 32, 1.0);
      GroundModel one = build(small, 1);
      for (int threads : new int[] {2, 3}) {
        GroundModel many = build(small, threads);
        assertEquals(one.source(), many.source());
        int cells = 0;
        for (double x = SyntheticSurvey.X0 - 20; x < SyntheticSurvey.X0 + 320; x += 0.7) {
          for (double y = SyntheticSurvey.Y0 - 20; y < SyntheticSurvey.Y0 + 320; y += 0.7) {
            // Exact: the same arithmetic on the same cells.
            assertEquals(one.groundZ(x, y), many.groundZ(x, y), 0.0, x + " " + y);
            cells += Double.isNaN(one.groundZ(x, y)) ? 0 : 1;
          }
        }
        assertTrue(cells > 100_000, "cells compared: " + cells);
        List<Tree> t1 = canopy(trees).findTrees(one, 1);
        List<Tree> tn = canopy(trees).findTrees(one, threads);
        assertTrue(t1.size() >= SURVEY.trees().size(), "trees: " + t1.size());
        assertEquals(t1, tn);
      }
    }
  }

  private static GroundModel build(GroundOptions options, int threads) {
    GroundModelBuilder b = new GroundModelBuilder(options);
    SURVEY.stream(8192, b);
    return b.build(threads);
  }

  private static CanopyBuilder canopy(TreeOptions options) {
    CanopyBuilder c = new CanopyBuilder(options, PlanPredicate.ALL);
    SURVEY.stream(8192, c);
    return c;
  }
}
