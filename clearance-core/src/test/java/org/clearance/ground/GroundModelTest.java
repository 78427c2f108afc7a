package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.clearance.InputException;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * SMRF and class-2 terrain on the seeded synthetic survey (truth known exactly). The bounds are
 * ours (no outside source gives errors for this scene); they would catch a broken filter: the
 * published ISPRS mean total error of SMRF is 2.97 % on much harder scenes (methods.md 4.3).
 */
class GroundModelTest {
  private static final SyntheticSurvey SURVEY = new SyntheticSurvey(42, 40);
  private static GroundModel filtered;
  private static GroundModel classified;
  private static CrossMatrix filterScore;
  private static long nonNoise;
  private static long groundLabelled;

  @BeforeAll
  static void build() {
    GroundModelBuilder f = new GroundModelBuilder(
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    GroundModelBuilder a = new GroundModelBuilder(GroundOptions.defaults());
    long[] counts = new long[2];
    SURVEY.stream(8192, chunk -> {
      f.accept(chunk);
      a.accept(chunk);
      for (int i = 0; i < chunk.size(); i++) {
        int cls = chunk.classification()[i];
        counts[0] += cls == 7 || cls == 18 ? 0 : 1;
        counts[1] += cls == 2 ? 1 : 0;
      }
    });
    filtered = f.build();
    classified = a.build();
    nonNoise = counts[0];
    groundLabelled = counts[1];
    FilterEvaluation e = new FilterEvaluation(filtered);
    SURVEY.stream(8192, e);
    filterScore = e.result();
  }

  @Test
  void smrfSeparatesGroundFromObjects() {
    // Our bounds for this scene (no outside source): under 0.5 % of ground rejected, under 1 %
    // of trees, shrubs and roof accepted.
    assertTrue(filterScore.typeI() < 0.005, "type I " + filterScore.typeI());
    assertTrue(filterScore.typeII() < 0.01, "type II " + filterScore.typeII());
    assertTrue(filterScore.kappa() > 0.97, "kappa " + filterScore.kappa());
    assertEquals(nonNoise, filterScore.total());
  }

  @Test
  void terrainIsWithinCentimetresOnOpenGround() {
    // Truth: the generating function. The lowest-point surface sits about one noise sigma
    // (3 cm) low: the minimum of ~4 normal draws has mean -1.03 sigma (order statistics, from
    // memory), so allow a 5 cm bias and 10 cm for 95 % of positions.
    for (GroundModel g : List.of(filtered, classified)) {
      double[] err = openGroundErrors(g, 4000);
      double mean = Arrays.stream(err).average().orElseThrow();
      double[] abs = Arrays.stream(err).map(Math::abs).sorted().toArray();
      assertEquals(0, mean, 0.05, g.source().kind().toString());
      assertTrue(abs[(int) (0.95 * abs.length)] < 0.10, "95th percentile " + abs[(int) (0.95 * abs.length)]);
    }
  }

  @Test
  void terrainUnderCrownsAndBuildingIsInterpolated() {
    double bx = (SyntheticSurvey.BX0 + SyntheticSurvey.BX1) / 2;
    double by = (SyntheticSurvey.BY0 + SyntheticSurvey.BY1) / 2;
    for (GroundModel g : List.of(filtered, classified)) {
      assertEquals(SyntheticSurvey.terrain(bx, by), g.groundZ(bx, by), 0.15);
      for (SyntheticSurvey.PlantedTree t : SURVEY.trees()) {
        assertEquals(SyntheticSurvey.terrain(t.x(), t.y()), g.groundZ(t.x(), t.y()), 0.15);
      }
    }
  }

  @Test
  void heightAboveGroundOfTreeTops() {
    for (SyntheticSurvey.PlantedTree t : SURVEY.trees()) {
      double top = SyntheticSurvey.terrain(t.x(), t.y()) + t.height();
      assertEquals(t.height(), filtered.heightAboveGround(t.x(), t.y(), top), 0.15);
    }
  }

  @Test
  void pointTestUsesTheElevationBand() {
    // Open flat-ish spot (slope ~0.045): band = 0.5 + 1.25 * 0.045 = 0.56 m (computed).
    double x = SyntheticSurvey.X0 + 250;
    double y = SyntheticSurvey.Y0 + 120;
    while (SURVEY.nearObject(x, y, 3)) {
      y += 1;
    }
    double z = SyntheticSurvey.terrain(x, y);
    assertTrue(filtered.isGround(x, y, z + 0.3));
    assertTrue(filtered.isGround(x, y, z - 0.4));
    assertFalse(filtered.isGround(x, y, z + 1.0));
    assertEquals(0.0447, filtered.slope(x, y), 0.03);
  }

  @Test
  void outsideCoverageIsNan() {
    double x = SyntheticSurvey.X0 - 100;
    double y = SyntheticSurvey.Y0 + 100;
    assertTrue(Double.isNaN(filtered.groundZ(x, y)));
    assertTrue(Double.isNaN(filtered.heightAboveGround(x, y, 100)));
    assertFalse(filtered.isGround(x, y, 100));
    // The 5 m coverage margin reaches just past the surveyed edge.
    assertFalse(Double.isNaN(filtered.groundZ(SyntheticSurvey.X0 - 3, y)));
  }

  @Test
  void sourceReportsWhatWasUsed() {
    GroundSource f = filtered.source();
    assertEquals(GroundSource.Kind.FILTERED, f.kind());
    assertEquals(SmrfOptions.defaults(), f.filter().orElseThrow());
    assertEquals(nonNoise, f.points());
    assertEquals(groundLabelled, f.classifiedGroundPoints());
    assertTrue(f.describe().contains("SMRF"));
    GroundSource c = classified.source();
    assertEquals(GroundSource.Kind.CLASSIFIED, c.kind());
    assertTrue(c.filter().isEmpty());
    // 300 m x 300 m at 1 m cells with 4 uniform points per m^2: a cell is empty with Poisson
    // probability e^-4, so 90 000 (1 - e^-4) = 88 352 cells hold points (computed; trees and
    // roofs add points, the thinned ground under crowns removes some); allow 0.5 %.
    assertEquals(88_352, c.surfaceCells(), 450);
    assertTrue(c.filledCells() > 0);
  }

  @Test
  void noiseClassesAreIgnored() {
    // The survey holds class-7 points 8 m below ground; the terrain must not follow them.
    SURVEY.stream(8192, chunk -> {
      for (int i = 0; i < chunk.size(); i++) {
        if (chunk.classification()[i] == 7) {
          double x = chunk.x()[i];
          double y = chunk.y()[i];
          assertEquals(SyntheticSurvey.terrain(x, y), filtered.groundZ(x, y), 0.3);
        }
      }
    });
  }

  @Test
  void classifiedSourceWithoutGroundPointsIsAnInputError() {
    GroundModelBuilder b = new GroundModelBuilder(
        GroundOptions.defaults().withSource(GroundOptions.Source.CLASSIFIED));
    b.accept(flatChunk(1));
    InputException e = assertThrows(InputException.class, b::build);
    assertEquals("classification", e.field());
    GroundModelBuilder auto = new GroundModelBuilder(GroundOptions.defaults());
    auto.accept(flatChunk(1));
    assertEquals(GroundSource.Kind.FILTERED, auto.build().source().kind());
    assertThrows(IllegalStateException.class, auto::build);
  }

  @Test
  void unlabelledLowOutliersDoNotPullTheTerrainDown() {
    // Flat ground at 50 m with three single-point pits 6 m deep labelled 1, not 7: SMRF's
    // low-outlier screen must set them aside.
    PointChunk c = flatChunk(1);
    double[][] pits = {{30.5, 30.5}, {60.5, 20.5}, {45.5, 70.5}};
    for (double[] p : pits) {
      c.add(p[0], p[1], 44.0, 1);
    }
    GroundModel g = GroundModelBuilder.build(List.of(c),
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    for (double[] p : pits) {
      assertEquals(50.0, g.groundZ(p[0], p[1]), 0.05);
      assertFalse(g.isGround(p[0], p[1], 44.0));
    }
  }

  @Test
  void deepAndClusteredLowOutliersDoNotPullTheTerrainDown() {
    // Issue 9 item 5: multipath returns far below the terrain (here 20 m, 150 m and 300 m) in
    // an unlabelled survey, single and in clusters filling 2 x 2 cells, gave tree heights of
    // hundreds of metres when they became ground. SMRF sets low outliers aside before the
    // opening (Pingel et al. 2013, methods.md 4.3); the terrain must stay at 50 m.
    PointChunk c = flatChunk(1);
    double[][] pits = {{30.5, 30.5, 20}, {60.5, 20.5, 150}, {20.5, 75.5, 300}};
    for (double[] p : pits) {
      c.add(p[0], p[1], 50 - p[2], 1);
    }
    double[][] clusters = {{70.2, 70.2, 150}, {15.2, 40.2, 300}};
    for (double[] q : clusters) {
      for (int dx = 0; dx < 2; dx++) {
        for (int dy = 0; dy < 2; dy++) {
          c.add(q[0] + dx, q[1] + dy, 50 - q[2] - 0.3 * (dx + dy), 1);
        }
      }
    }
    GroundModel g = GroundModelBuilder.build(List.of(c),
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    for (double[] p : pits) {
      assertEquals(50.0, g.groundZ(p[0], p[1]), 0.05);
    }
    for (double[] q : clusters) {
      for (int dx = 0; dx < 2; dx++) {
        for (int dy = 0; dy < 2; dy++) {
          assertEquals(50.0, g.groundZ(q[0] + dx, q[1] + dy), 0.05);
        }
      }
    }
    // and a tree top 20 m up is 20 m above the ground there
    assertEquals(20.0, g.heightAboveGround(70.7, 70.7, 70.0), 0.05);
  }

  @Test
  void sparseGroundUnderADenseStandIsNotALowOutlier() {
    // Regression, issue 9 (generated transmission corridor seed 41, unclassified): under a
    // forest wider than the largest opening (here 80 m x 80 m against 36 m), the cells whose
    // lowest return is a ground return (30 % of them) lie 12-20 m below their neighbours' crown
    // returns; the one-cell closing of the low-outlier screen set them all aside, the canopy
    // became the terrain and a 27 m tree read 0.59 m short (up to 13 m wrong in the stand).
    // Ground on a 0.1 slope: z = 50 + 0.1 x; crowns 12-20 m above it in every cell.
    PointChunk c = new PointChunk(120_000);
    Random rnd = new Random(41);
    for (int k = 0; k < 100_000; k++) {
      double x = 160 * rnd.nextDouble();
      double y = 160 * rnd.nextDouble();
      double g = 50 + 0.1 * x;
      boolean stand = x > 40 && x < 120 && y > 40 && y < 120;
      boolean reached = !stand || rnd.nextDouble() < 0.3;
      c.add(x, y, reached ? g + 0.03 * rnd.nextGaussian() : g + 12 + 8 * rnd.nextDouble(), 1);
    }
    GroundModel g = GroundModelBuilder.build(List.of(c),
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    double worst = 0;
    for (double x = 45.5; x < 116; x += 5) {
      for (double y = 45.5; y < 116; y += 5) {
        worst = Math.max(worst, Math.abs(g.groundZ(x, y) - (50 + 0.1 * x)));
      }
    }
    // Tolerance 0.15 m: docs/ground.md's "terrain under crowns" bar.
    assertEquals(0, worst, 0.15, "worst terrain error under the stand, m");
  }

  @Test
  void blocksJoinWithoutSteps() {
    // The same small scene processed in 32 m blocks and in one 256 m block: cells with ground
    // agree exactly, filled cells (under the box) within 5 cm.
    PointChunk c = flatChunk(1);
    GroundOptions big = GroundOptions.defaults().withSource(GroundOptions.Source.FILTER);
    GroundOptions small = new GroundOptions(big.source(), big.smrf(), 32, 5, 0.01);
    GroundModel g1 = GroundModelBuilder.build(List.of(c), big);
    GroundModel g2 = GroundModelBuilder.build(List.of(c), small);
    Random rnd = new Random(9);
    for (int k = 0; k < 2000; k++) {
      double x = 100 * rnd.nextDouble();
      double y = 100 * rnd.nextDouble();
      assertEquals(g1.groundZ(x, y), g2.groundZ(x, y), 0.05);
    }
  }

  @Test
  void steepSlopeIsNotReadLow() {
    // Regression: a minimum surface puts each cell's lowest point, which lies towards the
    // downhill edge, at the cell centre; on a 0.6 slope with 1 m cells this read 0.17 m low
    // before LowestPointGrid moved the point to the centre. Truth: the generating plane; the
    // remaining bias is the minimum of ~4 noisy points (about -1 sigma = -3 cm, from memory).
    PointChunk c = new PointChunk(50_000);
    Random rnd = new Random(8);
    for (int k = 0; k < 40_000; k++) {
      double x = 100 * rnd.nextDouble();
      double y = 100 * rnd.nextDouble();
      c.add(x, y, 300 + 0.6 * x - 0.2 * y + 0.03 * rnd.nextGaussian(), 2);
    }
    for (GroundOptions.Source source : GroundOptions.Source.values()) {
      GroundModel g = GroundModelBuilder.build(List.of(c),
          GroundOptions.defaults().withSource(source));
      double sum = 0;
      double slope = 0;
      for (int k = 0; k < 2000; k++) {
        double x = 10 + 80 * rnd.nextDouble();
        double y = 10 + 80 * rnd.nextDouble();
        sum += g.groundZ(x, y) - (300 + 0.6 * x - 0.2 * y);
        slope += g.slope(x, y);
      }
      assertEquals(-0.03, sum / 2000, 0.03, source.toString());
      // |gradient| of the plane = hypot(0.6, 0.2) (computed); cell noise makes single cells
      // scatter by a few hundredths, the mean over 2000 positions is close.
      assertEquals(Math.hypot(0.6, 0.2), slope / 2000, 0.02, source.toString());
    }
  }

  @Test
  void classifiedTerrainAlongALongDiagonalCorridorStaysSmall() {
    // A 1.5 km line at 45 degrees surveyed 25 m either side, ground points only.
    double ux = Math.sqrt(0.5);
    PointChunk c = new PointChunk(200_000);
    Random rnd = new Random(2);
    for (int k = 0; k < 150_000; k++) {
      double s = 1500 * rnd.nextDouble();
      double e = -25 + 50 * rnd.nextDouble();
      double x = 600_000 + (s - e) * ux;
      double y = 5_000_000 + (s + e) * ux;
      c.add(x, y, 200 + 0.01 * s, 2);
    }
    GroundModel g = GroundModelBuilder.build(List.of(c),
        GroundOptions.defaults().withSource(GroundOptions.Source.CLASSIFIED));
    // Bounding box: 1061 m square = 275 tiles of 64 m; the corridor touches ~4 per tile column.
    assertTrue(g.tileCount() < 100, "tiles " + g.tileCount());
    double x = 600_000 + 700 * ux;
    double y = 5_000_000 + 700 * ux;
    assertEquals(207.0, g.groundZ(x, y), 0.01);
    assertTrue(Double.isNaN(g.groundZ(x + 100, y - 100))); // 141 m off the line
  }

  /** Open ground errors (model - truth) at random positions at least 3 m from any object. */
  private static double[] openGroundErrors(GroundModel g, int n) {
    Random rnd = new Random(1);
    double[] out = new double[n];
    int k = 0;
    while (k < n) {
      double x = SyntheticSurvey.X0 + 5 + 290 * rnd.nextDouble();
      double y = SyntheticSurvey.Y0 + 5 + 290 * rnd.nextDouble();
      if (!SURVEY.nearObject(x, y, 3)) {
        out[k++] = g.groundZ(x, y) - SyntheticSurvey.terrain(x, y);
      }
    }
    return out;
  }

  /** A 100 m square of flat ground at 50 m (4 points per m^2) with a 12 m box, 6 m tall. */
  private static PointChunk flatChunk(int groundClass) {
    PointChunk c = new PointChunk(60_000);
    Random rnd = new Random(4);
    for (int k = 0; k < 40_000; k++) {
      double x = 100 * rnd.nextDouble();
      double y = 100 * rnd.nextDouble();
      boolean box = x > 40 && x < 52 && y > 40 && y < 52;
      c.add(x, y, box ? 56 : 50 + 0.02 * rnd.nextGaussian(), box ? 6 : groundClass);
    }
    return c;
  }
}
