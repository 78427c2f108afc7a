package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.clearance.survey.Bounds;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.Survey;
import org.clearance.survey.SurveyTestFiles;
import org.clearance.survey.UnitsChoice;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * SMRF with its default parameters, ignoring the files' labels, scored against the class-2 labels
 * of the real open files in shared/data/open (Sithole &amp; Vosselman 2004 measures, methods.md
 * 4.1). Point counts per class are the independent reader's (shared/data/README.md). The files in
 * feet are read into metres, so the metric SMRF defaults apply unchanged. The bounds are ours,
 * loose enough for label conventions, tight enough to catch a broken filter; the measured figures
 * are in docs/ground.md.
 */
class OpenFilesGroundTest {

  @ParameterizedTest(name = "{0}")
  @CsvSource({
    // file, units, points compared (README class counts less classes 0/7/12/18), class-2 points,
    // max total error, min kappa
    // 4_6_crop: 1:14872 2:9003
    "4_6_crop.las, file, 23875, 9003, 0.15, 0.8",
    // nebraska: 2:9808 3:158 4:724 5:10956 6:3737 7:25 (7 skipped)
    "nebraska_wkt_and_geotiff.las, file, 25383, 9808, 0.15, 0.8",
    // corridor: 1:24794 2:52389 5:53836 9:205 14:9453 15:1179 26:11608; metres, no CRS record
    "corridor_12AN2_20_thinned.las, m, 153464, 52389, 0.15, 0.8",
    // warsaw: 0:433 (skipped) 2:1381 3:257 4:27 5:902; no unit stated, metres in fact
    "warsaw_small.las, m, 2567, 1381, 0.15, 0.6"
  })
  void smrfAgreesWithCompleteGroundLabels(String name, String units, long compared,
      long ground, double maxTotal, double minKappa) {
    Survey survey = open(name, units);
    GroundModel model = GroundModelBuilder.build(survey, filterOnly(), 1);
    CrossMatrix m = FilterEvaluation.evaluate(survey, model);
    System.out.println(report(name, m));
    assertEquals(compared, m.total());
    assertEquals(ground, m.groundAsGround() + m.groundAsObject());
    assertTrue(m.totalError() < maxTotal, "total error " + m.totalError());
    assertTrue(m.kappa() > minKappa, "kappa " + m.kappa());
    assertTrue(m.typeI() < 0.02, "type I " + m.typeI());
    assertTerrainInMetres(survey, model);
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource({
    // file, units, points compared, class-2 points, max RMS of (SMRF - class-2 terrain) at the
    // class-2 points, metres.
    // autzen: 1:83893 2:26107. Of the class-1 points, ~50 000 lie within 0.15 m of the class-2
    // surface: the labels leave most ground returns in class 1, so type II and total error
    // measure the labels, not the filter. Checked instead: ground kept, terrain agrees.
    "autzen_trim.las, ft-follow, 110000, 26107, 0.08",
    // topography_forest: 1:61347 2:8159 9:3897, steep forest with a lake; class 1 again holds
    // ground-level returns. SMRF follows the water surface where the class-2 terrain bridges
    // the lake from its shores, hence the looser bound.
    "topography_forest.las, file-follow, 73403, 8159, 0.3"
  })
  void smrfKeepsLabelledGroundWhereLabelsAreIncomplete(String name, String units,
      long compared, long ground, double maxRms) {
    Survey survey = open(name, units);
    GroundModel model = GroundModelBuilder.build(survey, filterOnly(), 1);
    GroundModel labelled = GroundModelBuilder.build(survey,
        GroundOptions.defaults().withSource(GroundOptions.Source.CLASSIFIED), 1);
    CrossMatrix m = FilterEvaluation.evaluate(survey, model);
    System.out.println(report(name, m));
    assertEquals(compared, m.total());
    assertEquals(ground, m.groundAsGround() + m.groundAsObject());
    assertTrue(m.typeI() < 0.02, "type I " + m.typeI());
    double[] sum = new double[2];
    survey.read(c -> {
      for (int i = 0; i < c.size(); i++) {
        if (c.classification()[i] == 2) {
          double d = model.groundZ(c.x()[i], c.y()[i]) - labelled.groundZ(c.x()[i], c.y()[i]);
          sum[0] += d * d;
          sum[1]++;
        }
      }
    });
    double rms = Math.sqrt(sum[0] / sum[1]);
    System.out.printf(Locale.ROOT, "%s: RMS(SMRF - class-2 terrain) at class-2 points %.3f m%n",
        name, rms);
    assertTrue(rms < maxRms, "rms " + rms);
    assertTerrainInMetres(survey, model);
  }

  @Test
  void parallelReadingGivesTheSameTerrainAndTrees() {
    // Two reader threads adding to one builder in whatever order they meet the points: the same
    // lowest point per cell and highest canopy return per cell as one thread, so the same
    // terrain and trees (exactly).
    Survey survey = open("corridor_12AN2_20_thinned.las", "m");
    GroundModel one = GroundModelBuilder.build(survey, GroundOptions.defaults(), 1);
    GroundModel two = GroundModelBuilder.build(survey, GroundOptions.defaults(), 2);
    Bounds b = survey.bounds();
    java.util.Random rnd = new java.util.Random(6);
    for (int k = 0; k < 1000; k++) {
      double x = b.minX() + (b.maxX() - b.minX()) * rnd.nextDouble();
      double y = b.minY() + (b.maxY() - b.minY()) * rnd.nextDouble();
      assertEquals(one.groundZ(x, y), two.groundZ(x, y), 0);
    }
    assertEquals(one.source(), two.source());
    List<Tree> t1 = CanopyBuilder.findTrees(survey, one, TreeOptions.defaults(), PlanPredicate.ALL,
        1);
    List<Tree> t2 = CanopyBuilder.findTrees(survey, one, TreeOptions.defaults(), PlanPredicate.ALL,
        2);
    assertEquals(t1, t2);
    assertTrue(t1.size() > 0);
  }

  @Test
  @Tag("slow")
  void verySparseFileStillKeepsMostGround() {
    // mvk-thin: 6280 points over 5 km x 5 km (one per ~4000 m^2), 1:129 2:1693 4:141 5:578 9:37
    // 12:3702 (12 skipped). Far too sparse for a 1 m raster filter; recorded for the table.
    Survey survey = open("mvk-thin.las", "file");
    GroundModel model = GroundModelBuilder.build(survey, filterOnly(), 1);
    CrossMatrix m = FilterEvaluation.evaluate(survey, model);
    System.out.println(report("mvk-thin.las", m));
    assertEquals(2578, m.total());
    assertTrue(m.typeI() < 0.1, "type I " + m.typeI());
  }

  private static GroundOptions filterOnly() {
    return GroundOptions.defaults().withSource(GroundOptions.Source.FILTER);
  }

  private static Survey open(String name, String units) {
    UnitsChoice choice = switch (units) {
      case "file" -> UnitsChoice.fromFile();
      case "file-follow", "ft-follow" -> UnitsChoice.fromFile().withVerticalFollowingHorizontal();
      case "m" -> UnitsChoice.of(LinearUnit.METRE);
      default -> throw new IllegalArgumentException(units);
    };
    return Survey.open(List.of(SurveyTestFiles.open(name)), choice);
  }

  /** The terrain at the survey's centre lies within the survey's z range, both in metres. */
  private static void assertTerrainInMetres(Survey survey, GroundModel model) {
    Bounds b = survey.bounds();
    double g = model.groundZ(0.5 * (b.minX() + b.maxX()), 0.5 * (b.minY() + b.maxY()));
    assertTrue(g >= b.minZ() - 0.5 && g <= b.maxZ(), "ground " + g + " outside " + b);
  }

  private static String report(String name, CrossMatrix m) {
    return String.format(Locale.ROOT,
        "%s: a %d b %d c %d d %d; type I %.2f %%, type II %.2f %%, total %.2f %%, kappa %.3f",
        name, m.groundAsGround(), m.groundAsObject(), m.objectAsGround(), m.objectAsObject(),
        100 * m.typeI(), 100 * m.typeII(), 100 * m.totalError(), m.kappa());
  }
}
