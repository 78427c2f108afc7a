package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.StringJoiner;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every open LAS file against the reference values of shared/data/README.md ("Reference values
 * (independent reader)" and "Coordinate systems and units as the files state them"), read there
 * by an independent reader (numpy).
 */
class OpenDataTest {
  /**
   * The README prints extents rounded to 3 decimals: half a unit of the last place, plus a hair
   * for values that sit exactly on the half (topography_forest min y = 5274357.1435).
   */
  private static final double EXTENT_TOL = 0.0005 + 1e-7;

  // Source: shared/data/README.md, table "Reference values (independent reader)".
  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = ';', value = {
    "autzen_trim.las; 1.2; 3; 34; 110000; 1:83893 2:26107;"
        + " 636001.760; 848935.200; 406.260; 637179.220; 849497.900; 520.510",
    "mvk-thin.las; 1.2; 1; 28; 6280; 1:129 2:1693 4:141 5:578 9:37 12:3702;"
        + " 2045001.760; 1267501.190; 95.790; 2049993.920; 1272499.790; 228.730",
    "warsaw_small.las; 1.2; 3; 34; 3000; 0:433 2:1381 3:257 4:27 5:902;"
        + " 639913.260; 485143.140; 84.700; 639946.750; 485175.910; 104.550",
    "4_6_crop.las; 1.2; 3; 34; 23875; 1:14872 2:9003;"
        + " 1639600.000; 1454500.020; 7077.920; 1639799.980; 1454700.000; 7139.700",
    "nebraska_wkt_and_geotiff.las; 1.4; 6; 30; 25408; 2:9808 3:158 4:724 5:10956 6:3737 7:25;"
        + " 2445180.000; 604300.000; 1352.700; 2445239.990; 604339.980; 1403.960",
    "topography_forest.las; 1.2; 1; 28; 73403; 1:61347 2:8159 9:3897;"
        + " 273357.145; 5274357.144; 788.993; 273642.856; 5274642.848; 829.758",
    "corridor_12AN2_20_thinned.las; 1.4; 7; 36; 153464;"
        + " 1:24794 2:52389 5:53836 9:205 14:9453 15:1179 26:11608;"
        + " 229885.703; 569975.328; 2.054; 230024.887; 570389.939; 45.428"
  })
  void headerCountsClassesAndExtent(String name, String version, int format, int recordLength,
      long points, String classes, double minX, double minY, double minZ, double maxX,
      double maxY, double maxZ) {
    LasFile file = LasFile.open(SurveyTestFiles.open(name));
    assertEquals(version, file.header().version());
    assertEquals(format, file.header().pointFormat().id());
    assertEquals(recordLength, file.header().recordLength());
    assertEquals(points, file.header().pointCount());

    SurveySummary s = SurveySummary.compute(
        List.of(SurveyTestFiles.open(name)), UnitsChoice.fromFile(), 2);
    assertEquals(points, s.pointCount());
    StringJoiner histogram = new StringJoiner(" ");
    s.classCounts().forEach(c -> histogram.add(c.code() + ":" + c.count()));
    assertEquals(classes, histogram.toString());
    assertEquals(minX, s.extent().minX(), EXTENT_TOL);
    assertEquals(minY, s.extent().minY(), EXTENT_TOL);
    assertEquals(minZ, s.extent().minZ(), EXTENT_TOL);
    assertEquals(maxX, s.extent().maxX(), EXTENT_TOL);
    assertEquals(maxY, s.extent().maxY(), EXTENT_TOL);
    assertEquals(maxZ, s.extent().maxZ(), EXTENT_TOL);
  }

  // Source: shared/data/README.md, table "Coordinate systems and units as the files state them";
  // "-" = not stated (unknown).
  @ParameterizedTest(name = "{0}")
  @CsvSource(delimiter = ';', value = {
    "autzen_trim.las; FOOT; -; GeoTIFF ProjLinearUnitsGeoKey",
    "mvk-thin.las; US_SURVEY_FOOT; US_SURVEY_FOOT; GeoTIFF ProjLinearUnitsGeoKey",
    "4_6_crop.las; US_SURVEY_FOOT; US_SURVEY_FOOT; GeoTIFF ProjLinearUnitsGeoKey",
    "nebraska_wkt_and_geotiff.las; US_SURVEY_FOOT; US_SURVEY_FOOT; WKT record 2112",
    "topography_forest.las; METRE; -; EPSG:2949 via proj4j",
    "warsaw_small.las; -; -; WKT record 2112 holds no CRS definition",
    "corridor_12AN2_20_thinned.las; -; -; no coordinate system record"
  })
  void unitsAsTheFilesStateThem(String name, String horizontal, String vertical, String how) {
    CrsInfo crs = LasFile.open(SurveyTestFiles.open(name)).crs();
    assertEquals(unit(horizontal), crs.horizontal());
    assertEquals(unit(vertical), crs.vertical());
    assertTrue(crs.horizontalSource().contains(how), crs.horizontalSource());
    assertEquals("", crs.unusable());
    assertEquals("", crs.unitProblem());
  }

  private static Optional<LinearUnit> unit(String text) {
    return text.equals("-") ? Optional.empty() : Optional.of(LinearUnit.valueOf(text));
  }
}
