package org.clearance.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.OptionalInt;
import org.clearance.assess.LonLat;
import org.clearance.io.JsonFiles;
import org.clearance.rules.RuleProfiles;
import org.clearance.run.RunFixture;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.SurveyUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Longitude and latitude through proj4j, and sites.geojson. */
class LonLatTest {

  /** 1e-7 degree is about 1 cm; proj4j and PROJ agree far better than that here. */
  private static final double DEG_TOL = 1e-7;
  private static final double US_FT = 1200.0 / 3937; // NIST (check-values.md section 1)

  @TempDir Path dir;

  // Reference values computed with GDAL 3.6.2 (PROJ), an independent library:
  //   echo "500100 4100000" | gdaltransform -s_srs EPSG:32610 -t_srs EPSG:4326 -output_xy
  //   echo "6000000 2000000" | gdaltransform -s_srs EPSG:2227 -t_srs EPSG:4326 -output_xy
  @ParameterizedTest
  @CsvSource({
    "32610, METRE, 500100, 4100000, -122.998875421175, 37.0462224705789",
    "2227, US_SURVEY_FOOT, 6000000, 2000000, -122.435572841825, 37.4716177057708"
  })
  void matchesGdal(int epsg, LinearUnit unit, double x, double y, double lon, double lat) {
    SurveyUnits u = new SurveyUnits(unit, unit, "", OptionalInt.of(epsg), "", "test");
    LonLat t = LonLat.forUnits(u).transform().orElseThrow();
    double[] ll = t.of(unit.toMetres(x), unit.toMetres(y)); // the run model holds metres
    assertEquals(lon, ll[0], DEG_TOL);
    assertEquals(lat, ll[1], DEG_TOL);
  }

  @Test
  void noEpsgNoTransform() {
    LonLat.Lookup l = LonLat.forUnits(SurveyUnits.metres("test"));
    assertTrue(l.transform().isEmpty());
    assertTrue(l.note().contains("no EPSG code"));
    SurveyUnits geographic = new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE, "",
        OptionalInt.of(4326), "", "test");
    assertTrue(LonLat.forUnits(geographic).note().contains("not a projected CRS"));
  }

  @Test
  void geojsonHoldsTheSitesInLongitudeLatitude() throws IOException {
    SurveyUnits u = new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE,
        "WGS 84 / UTM zone 10N", OptionalInt.of(32610), "", "test");
    RunFixture f = new RunFixture(500000, 4100000, u);
    f.write(dir);
    ReportStage.Outcome o = ReportStage.run(dir, f.model(),
        RuleProfiles.builtin("example-utility"), ReportOptions.defaults(), null);
    assertTrue(o.written().contains("sites.geojson"));
    assertTrue(o.notes().isEmpty());
    JsonNode root = JsonFiles.parse(Files.readString(dir.resolve("sites.geojson")), "t");
    assertEquals("FeatureCollection", root.get("type").textValue());
    JsonNode features = root.get("features");
    assertEquals(3, features.size());
    JsonNode first = features.get(0);
    JsonNode xy = first.get("geometry").get("coordinates");
    // the first site is at (500100, 4100000): GDAL's value above, written to 1e-7 degree
    assertEquals(-122.998875421175, xy.get(0).doubleValue(), 0.6e-7);
    assertEquals(37.0462224705789, xy.get(1).doubleValue(), 0.6e-7);
    JsonNode props = first.get("properties");
    assertEquals("prc4293", props.get("zone").textValue());
    assertEquals(500100, props.get("x").doubleValue(), 1e-9);
    assertEquals(0.0, props.get("years_to_violation").doubleValue(), 0.0);
    JsonNode tree = features.get(2).get("properties");
    assertTrue(tree.get("n_points").isNull());
    assertTrue(tree.get("years_to_violation").isNull());
    // the work list carries the same longitude and latitude
    Map<String, String> row = CsvText.rows(Files.readString(dir.resolve("worklist.csv")))
        .get(0);
    assertEquals(-122.998875421175, Double.parseDouble(row.get("lon")), 0.6e-8);
    assertFalse(row.get("lat").isEmpty());
  }
}
