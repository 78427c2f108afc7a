package org.clearance.label;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.TreeMap;
import java.util.function.Consumer;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.SpanFrame;
import org.clearance.survey.Bounds;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;
import org.clearance.survey.SurveyTestFiles;
import org.clearance.survey.UnitsChoice;
import org.clearance.wire.PointSource;
import org.clearance.wire.SetAside;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 9: the labelling thresholds were set on the open corridor tile and the demo corridor;
 * here they meet open files that played no part in setting them (shared/data/open; class
 * counts of the independent reader in shared/data/README.md), every point reset to class 1 and
 * the ground from SMRF, the whole file looked at (one frame along it, the region reaching every
 * point). The vendors' labels are read only to score: points labelled vegetation (3-5) set aside
 * as man-made are the dangerous error (a tree dropped), buildings (6) set aside are right.
 * Measured figures in docs/labelling.md ("Thresholds on other data").
 */
class OpenFilesLabellingTest {

  @ParameterizedTest(name = "{0}")
  @CsvSource({
    // file, units, most share of labelled vegetation set aside.
    // nebraska: 2:9808 3:158 4:724 5:10956 6:3737 (US survey feet); suburban, labelled.
    "nebraska_wkt_and_geotiff.las, file, 0.01",
    // warsaw: 2:1381 3:257 4:27 5:902; metres in fact.
    "warsaw_small.las, m, 0.01",
    // topography_forest: 1:61347 2:8159 9:3897, steep forest; no vegetation labels (class 1
    // holds the forest): scored by class, bound not applicable (-1).
    "topography_forest.las, file-follow, -1",
    // autzen: 1:83893 2:26107 (feet), a stadium, buildings and trees all in class 1.
    "autzen_trim.las, ft-follow, -1",
    // 4_6_crop: 1:14872 2:9003 (US survey feet).
    "4_6_crop.las, file, -1"
  })
  void labelledVegetationIsNotTakenForManMade(String name, String units, double maxShare) {
    UnitsChoice choice = switch (units) {
      case "file" -> UnitsChoice.fromFile();
      case "file-follow", "ft-follow" -> UnitsChoice.fromFile().withVerticalFollowingHorizontal();
      default -> UnitsChoice.of(LinearUnit.METRE);
    };
    Survey survey = Survey.open(List.of(SurveyTestFiles.open(name)), choice);
    PointSource unlabelled = consumers -> survey.read(relabel(consumers.get()));
    GroundModelBuilder gb = new GroundModelBuilder(
        GroundOptions.defaults().withSource(GroundOptions.Source.FILTER));
    unlabelled.stream(() -> gb);
    GroundModel ground = gb.build();
    Bounds b = survey.bounds();
    double midY = 0.5 * (b.minY() + b.maxY());
    SpanFrame frame = SpanFrame.between(b.minX(), midY, b.maxX(), midY);
    double region = 0.5 * (b.maxY() - b.minY()) + 1;
    SetAside setAside = SetAside.none();
    ObjectLabels labels = ObjectLabeller.label(unlabelled, List.of(frame), region, ground,
        setAside, false);
    System.out.println(name + ": " + labels.describe());
    for (LabelledObject o : labels.objects()) {
      if (o.kind() != ObjectKind.VEGETATION || !Double.isNaN(o.facetShare())) {
        System.out.println(String.format(Locale.ROOT, "  %s %d pts h %.1f m L %.3f S %.3f"
            + " planar share %.2f spread %.2f base %.2f later returns %.2f multi-return pulses"
            + " %.2f facets %.2f", o.kind(), o.points(), o.heightM(), o.linearity(),
            o.scattering(), o.planarShare(), o.upperSpreadM(), o.baseShare(),
            o.multiReturnShare(), o.multiPulseShare(), o.facetShare()));
      }
    }
    TreeMap<Integer, long[]> byClass = new TreeMap<>();
    survey.read(chunk -> {
      for (int i = 0; i < chunk.size(); i++) {
        long[] t = byClass.computeIfAbsent((int) chunk.classification()[i], k -> new long[2]);
        t[0]++;
        t[1] += setAside.reason(SetAside.key(chunk.x()[i], chunk.y()[i], chunk.z()[i]))
            == SetAside.Reason.OBJECT ? 1 : 0;
      }
    });
    long vegetation = 0;
    long vegetationSetAside = 0;
    for (var e : byClass.entrySet()) {
      System.out.println(String.format(Locale.ROOT, "  %s vendor class %d: %d points, %d set"
          + " aside as man-made (%.1f %%)", name, e.getKey(), e.getValue()[0], e.getValue()[1],
          100.0 * e.getValue()[1] / e.getValue()[0]));
      if (e.getKey() >= 3 && e.getKey() <= 5) {
        vegetation += e.getValue()[0];
        vegetationSetAside += e.getValue()[1];
      }
    }
    if (maxShare >= 0) {
      assertTrue(vegetationSetAside <= maxShare * vegetation, name + ": " + vegetationSetAside
          + " of " + vegetation + " vegetation points set aside");
    }
  }

  /** A consumer that sees every point as class 1. */
  private static Consumer<PointChunk> relabel(Consumer<PointChunk> next) {
    return chunk -> {
      short[] c = chunk.classification();
      short[] saved = c.clone();
      java.util.Arrays.fill(c, 0, chunk.size(), (short) 1);
      next.accept(chunk);
      System.arraycopy(saved, 0, c, 0, chunk.size());
    };
  }
}
