package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/**
 * Units and codes read from WKT. Syntax: WKT1 per OGC 01-009 section 7 (PROJCS, COMPD_CS,
 * VERT_CS, UNIT, AUTHORITY); WKT2 per OGC 18-010r7 (PROJCRS, COMPOUNDCRS, VERTCRS, BOUNDCRS,
 * LENGTHUNIT, ID). The CRS texts below are written for these tests; the unit lengths are the
 * NIST values (check-values.md section 1): foot 0.3048 m, US survey foot 1200/3937 m.
 */
class WktCrsTest {
  private static final String GEOG1 = "GEOGCS[\"GCS invented\",DATUM[\"D_invented\","
      + "SPHEROID[\"GRS 1980\",6378137,298.257222101]],PRIMEM[\"Greenwich\",0],"
      + "UNIT[\"degree\",0.0174532925199433]]";

  @Test
  void wkt1ProjectedUsSurveyFeetWithCodes() {
    String wkt = "PROJCS[\"Invented State Plane (ftUS)\"," + GEOG1
        + ",PROJECTION[\"Transverse_Mercator\"],PARAMETER[\"false_easting\",1640416.667],"
        + "UNIT[\"US survey foot\",0.3048006096012192,AUTHORITY[\"EPSG\",\"9003\"]],"
        + "AUTHORITY[\"EPSG\",\"2903\"]]";
    CrsStatement s = WktCrs.read(wkt);
    assertEquals(Optional.of(LinearUnit.US_SURVEY_FOOT), s.horizontal());
    assertEquals(OptionalInt.of(2903), s.epsg());
    assertEquals("Invented State Plane (ftUS)", s.name());
    assertEquals(Optional.empty(), s.vertical());
    assertEquals("WKT record 2112 has no vertical CRS", s.verticalSource());
  }

  @Test
  void wkt1UnitByLengthAlone() {
    // The nebraska file's WKT writes the US survey foot as 0.30480060960121924 with no code.
    String wkt = "PROJCS[\"x\"," + GEOG1 + ",UNIT[\"Foot_US\",0.30480060960121924]]";
    assertEquals(Optional.of(LinearUnit.US_SURVEY_FOOT), WktCrs.read(wkt).horizontal());
    String ft = "PROJCS[\"x\"," + GEOG1 + ",UNIT[\"foot\",0.3048]]";
    assertEquals(Optional.of(LinearUnit.FOOT), WktCrs.read(ft).horizontal());
  }

  @Test
  void wkt1CompoundWithVerticalMetres() {
    String wkt = "COMPD_CS[\"Invented grid + height\",PROJCS[\"Invented grid\"," + GEOG1
        + ",UNIT[\"foot\",0.3048,AUTHORITY[\"EPSG\",\"9002\"]]],VERT_CS[\"Invented height\","
        + "VERT_DATUM[\"Invented datum\",2005],UNIT[\"metre\",1.0,AUTHORITY[\"EPSG\",\"9001\"]],"
        + "AXIS[\"Up\",UP]]]";
    CrsStatement s = WktCrs.read(wkt);
    assertEquals(Optional.of(LinearUnit.FOOT), s.horizontal());
    assertEquals(Optional.of(LinearUnit.METRE), s.vertical());
    assertEquals("WKT record 2112 (VERT_CS unit)", s.verticalSource());
    assertEquals("Invented grid + height", s.name());
  }

  @Test
  void wkt1ParenthesesAreAccepted() {
    String wkt = "PROJCS(\"p\",GEOGCS(\"g\",DATUM(\"d\",SPHEROID(\"s\",6378137,298.25))),"
        + "UNIT(\"metre\",1))";
    assertEquals(Optional.of(LinearUnit.METRE), WktCrs.read(wkt).horizontal());
  }

  @Test
  void wkt2ProjectedUnitOnAxesNotOnParameters() {
    // The false easting is in metres, the axes in US survey feet: the axes govern.
    String wkt = "PROJCRS[\"Invented 2 (ftUS)\",BASEGEOGCRS[\"g\",DATUM[\"d\",ELLIPSOID[\"GRS"
        + " 1980\",6378137,298.257222101,LENGTHUNIT[\"metre\",1]]],ANGLEUNIT[\"degree\","
        + "0.0174532925199433]],CONVERSION[\"c\",METHOD[\"Lambert Conic Conformal (2SP)\"],"
        + "PARAMETER[\"False easting\",600000,LENGTHUNIT[\"metre\",1]]],CS[Cartesian,2],"
        + "AXIS[\"easting (X)\",east,ORDER[1],LENGTHUNIT[\"US survey foot\","
        + "0.304800609601219]],AXIS[\"northing (Y)\",north,ORDER[2],LENGTHUNIT[\"US survey"
        + " foot\",0.304800609601219]],ID[\"EPSG\",2230]]";
    CrsStatement s = WktCrs.read(wkt);
    assertEquals(Optional.of(LinearUnit.US_SURVEY_FOOT), s.horizontal());
    assertEquals(OptionalInt.of(2230), s.epsg());
  }

  @Test
  void wkt2CompoundWithVerticalFeetAndCrsLevelUnit() {
    String wkt = "COMPOUNDCRS[\"c\",PROJCRS[\"p\",BASEGEOGCRS[\"g\",DATUM[\"d\",ELLIPSOID[\"e\","
        + "6378137,298.25]]],CONVERSION[\"c\",METHOD[\"m\"]],CS[Cartesian,2],AXIS[\"E\",east],"
        + "AXIS[\"N\",north],LENGTHUNIT[\"metre\",1.0]],VERTCRS[\"v\",VDATUM[\"vd\"],"
        + "CS[vertical,1],AXIS[\"gravity-related height (H)\",up],LENGTHUNIT[\"foot\",0.3048],"
        + "ID[\"EPSG\",8228]]]";
    CrsStatement s = WktCrs.read(wkt);
    assertEquals(Optional.of(LinearUnit.METRE), s.horizontal());
    assertEquals(Optional.of(LinearUnit.FOOT), s.vertical());
  }

  @Test
  void wkt2BoundCrsReadsItsSource() {
    String wkt = "BOUNDCRS[SOURCECRS[PROJCRS[\"p\",CS[Cartesian,2],AXIS[\"E\",east],"
        + "AXIS[\"N\",north],LENGTHUNIT[\"foot\",0.3048]]],TARGETCRS[GEOGCRS[\"WGS 84\"]],"
        + "ABRIDGEDTRANSFORMATION[\"t\",METHOD[\"Geocentric translations\"]]]";
    assertEquals(Optional.of(LinearUnit.FOOT), WktCrs.read(wkt).horizontal());
  }

  @Test
  void projectedWithoutUnitTakesItFromTheEpsgDatabase() {
    // EPSG:2949 is in metres, EPSG:2903 in US survey feet: shared/data/README.md (units of
    // topography_forest.las and 4_6_crop.las).
    String m = "PROJCS[\"no unit\"," + GEOG1 + ",AUTHORITY[\"EPSG\",\"2949\"]]";
    CrsStatement s = WktCrs.read(m);
    assertEquals(Optional.of(LinearUnit.METRE), s.horizontal());
    assertTrue(s.horizontalSource().startsWith("EPSG:2949 via proj4j"), s.horizontalSource());
    String ft = "PROJCS[\"no unit\"," + GEOG1 + ",AUTHORITY[\"EPSG\",\"2903\"]]";
    assertEquals(Optional.of(LinearUnit.US_SURVEY_FOOT), WktCrs.read(ft).horizontal());
  }

  @Test
  void geographicIsUnusable() {
    CrsStatement s = WktCrs.read(GEOG1);
    assertTrue(s.unusable().contains("geographic"), s.unusable());
    CrsStatement s2 = WktCrs.read("GEOGCRS[\"WGS 84\",CS[ellipsoidal,2]]");
    assertTrue(s2.unusable().contains("geographic"), s2.unusable());
  }

  @Test
  void unsupportedUnitIsAProblemNotAGuess() {
    String wkt = "PROJCS[\"km grid\"," + GEOG1 + ",UNIT[\"kilometre\",1000]]";
    CrsStatement s = WktCrs.read(wkt);
    assertEquals(Optional.empty(), s.horizontal());
    assertTrue(s.unitProblem().contains("'kilometre'"), s.unitProblem());
  }

  @Test
  void badOrEmptyTextStatesNothing() {
    // warsaw_small.las carries the text '' in its WKT record (shared/data/README.md).
    assertEquals("WKT record 2112 holds no CRS definition", WktCrs.read("''").horizontalSource());
    CrsStatement s = WktCrs.read("PROJCS[\"unterminated\",UNIT[\"metre\",1]");
    assertTrue(s.horizontalSource().contains("could not be read"), s.horizontalSource());
    assertEquals(Optional.empty(), s.horizontal());
  }

  @Test
  void parserKeepsValuesAndChildrenInOrder() {
    WktNode n = WktNode.parse("A[\"say \"\"hi\"\"\", 1.5e3, B[x], -2, C[]]");
    assertEquals("A", n.keyword());
    assertEquals(java.util.List.of("say \"hi\"", "1.5e3", "-2"), n.values());
    assertEquals(2, n.children().size());
    assertEquals("x", n.children().get(0).value(0));
    assertThrows(IllegalArgumentException.class, () -> WktNode.parse("A[1] B[2]"));
  }
}
