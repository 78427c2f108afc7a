package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * How a survey's units are decided: GeoTIFF keys, the WKT bit, the user's choice, tile
 * agreement. GeoTIFF key ids and unit codes: OGC GeoTIFF 1.1 / check-values.md section 1
 * (ProjLinearUnitsGeoKey 3076, VerticalUnitsGeoKey 4099, 9001/9002/9003 [from memory]); the open
 * files' units: shared/data/README.md, "Coordinate systems and units as the files state them".
 */
class UnitsTest {
  @TempDir Path dir;

  private static final int[] PROJECTED = {1024, 1};

  private Path tiny(String name, TinyLas t) {
    return t.point(TinyLas.format0(1, 2, 3, 2, 0x09)).writeTo(dir.resolve(name));
  }

  @Test
  void userDefinedLinearUnitBySize() {
    byte[] doubles = ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN).putDouble(0, 0.3048)
        .array();
    byte[] keys = ByteBuffer.allocate(8 + 16).order(ByteOrder.LITTLE_ENDIAN)
        .putShort((short) 1).putShort((short) 1).putShort((short) 0).putShort((short) 2)
        .putShort((short) 3076).putShort((short) 0).putShort((short) 1).putShort((short) 32767)
        .putShort((short) 3077).putShort((short) 34736).putShort((short) 1).putShort((short) 0)
        .array();
    Path p = tiny("user.las", new TinyLas()
        .vlr(Vlr.PROJECTION_USER_ID, 34735, keys, -1)
        .vlr(Vlr.PROJECTION_USER_ID, 34736, doubles, -1));
    CrsInfo crs = LasFile.open(p).crs();
    assertEquals(Optional.of(LinearUnit.FOOT), crs.horizontal());
    assertTrue(crs.horizontalSource().contains("3077"), crs.horizontalSource());
  }

  @Test
  void geographicKeysAreRefused() {
    Path p = tiny("geo.las", new TinyLas().geoKeys(new int[] {1024, 2}, new int[] {2048, 4326}));
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE)));
    assertTrue(e.getMessage().contains("geographic"), e.getMessage());
    assertEquals("coordinate system", e.field());
  }

  @Test
  void geographicTypeAloneIsGeographic() {
    Path p = tiny("geo2.las", new TinyLas().geoKeys(new int[] {2048, 4269}));
    assertTrue(LasFile.open(p).crs().unusable().contains("geographic"));
  }

  @Test
  void projectedKeysWithGeographicBaseAreFine() {
    // mvk-thin.las carries GeographicTypeGeoKey 4269 as the base of projected EPSG:26995.
    CrsInfo crs = LasFile.open(SurveyTestFiles.open("mvk-thin.las")).crs();
    assertEquals("", crs.unusable());
    assertEquals(OptionalInt.of(26995), crs.epsg());
  }

  @Test
  void unsupportedUnitCodeNeedsOverride() {
    Path p = tiny("chain.las", new TinyLas().geoKeys(PROJECTED, new int[] {3076, 9033},
        new int[] {4099, 9001}));
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(p), UnitsChoice.fromFile()));
    assertTrue(e.getMessage().contains("9033"), e.getMessage());
    assertTrue(e.getMessage().contains("--override-file-units"), e.getMessage());
    Survey s = Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE).overridingFile());
    assertEquals(LinearUnit.METRE, s.units().horizontal());
  }

  @Test
  void wktBitPicksTheWktOverTheKeys() {
    String wkt = "PROJCS[\"p\",GEOGCS[\"g\"],UNIT[\"metre\",1]]";
    TinyLas keysAndWkt = new TinyLas().geoKeys(PROJECTED, new int[] {3076, 9002},
        new int[] {4099, 9002}).wkt(wkt);
    CrsInfo keysGovern = LasFile.open(tiny("a.las", keysAndWkt)).crs();
    assertEquals(Optional.of(LinearUnit.FOOT), keysGovern.horizontal());
    assertEquals(Optional.of(LinearUnit.FOOT), keysGovern.vertical());
    CrsInfo wktGoverns = LasFile.open(tiny("b.las", new TinyLas().geoKeys(PROJECTED,
        new int[] {3076, 9002}, new int[] {4099, 9002}).wkt(wkt).globalEncoding(16))).crs();
    assertEquals(Optional.of(LinearUnit.METRE), wktGoverns.horizontal());
    // The keys disagree on the horizontal unit, so their vertical unit is not borrowed.
    assertEquals(Optional.empty(), wktGoverns.vertical());
    assertTrue(wktGoverns.records().contains("WKT governs"), wktGoverns.records());
  }

  @Test
  void wktGovernsAndBorrowsAnAgreeingVerticalUnit() {
    // nebraska_wkt_and_geotiff.las: WKT (Foot_US, no vertical CRS) governs; its GeoTIFF keys
    // state 3076 = 4099 = 9003. README: horizontal and vertical US survey foot.
    CrsInfo crs = LasFile.open(SurveyTestFiles.open("nebraska_wkt_and_geotiff.las")).crs();
    assertEquals(Optional.of(LinearUnit.US_SURVEY_FOOT), crs.vertical());
    assertTrue(crs.verticalSource().contains("VerticalUnitsGeoKey 4099"), crs.verticalSource());
    assertEquals("NAD83_2011_Nebraska_ft", crs.name());
    assertTrue(crs.wkt().startsWith("PROJCS["), crs.wkt());
  }

  @Test
  void onlyWktWithoutTheBitIsStillRead() {
    CrsInfo crs = LasFile.open(tiny("w.las", new TinyLas()
        .wkt("PROJCS[\"p\",GEOGCS[\"g\"],UNIT[\"foot\",0.3048]]"))).crs();
    assertEquals(Optional.of(LinearUnit.FOOT), crs.horizontal());
    assertTrue(crs.records().contains("no GeoTIFF keys"), crs.records());
  }

  @Test
  void unstatedUnitsNeedAnExplicitChoice() {
    Path corridor = SurveyTestFiles.open("corridor_12AN2_20_thinned.las");
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(corridor), UnitsChoice.fromFile()));
    assertEquals("horizontal unit", e.field());
    assertTrue(e.getMessage().startsWith(corridor.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("--survey-units m|ft|usft"), e.getMessage());
    assertTrue(e.getMessage().contains("--horizontal-units"), e.getMessage());
    Survey s = Survey.open(List.of(corridor), UnitsChoice.of(LinearUnit.METRE));
    assertEquals(LinearUnit.METRE, s.units().vertical());
    assertTrue(s.units().source().contains("given by option"), s.units().source());
  }

  @Test
  void verticalFollowsHorizontalOnlyWhenAsked() {
    // autzen_trim.las: ProjLinearUnits 9002, vertical not stated (README).
    Path autzen = SurveyTestFiles.open("autzen_trim.las");
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(autzen), UnitsChoice.fromFile()));
    assertEquals("vertical unit", e.field());
    assertTrue(e.getMessage().contains("--vertical-follows-horizontal"), e.getMessage());
    Survey s = Survey.open(List.of(autzen),
        UnitsChoice.fromFile().withVerticalFollowingHorizontal());
    assertEquals(LinearUnit.FOOT, s.units().horizontal());
    assertEquals(LinearUnit.FOOT, s.units().vertical());
  }

  @Test
  void optionThatContradictsTheFileIsAnError() {
    Path mvk = SurveyTestFiles.open("mvk-thin.las");
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(mvk), UnitsChoice.of(LinearUnit.METRE)));
    assertTrue(e.getMessage().contains("the file states US survey foot"), e.getMessage());
    Survey s = Survey.open(List.of(mvk), UnitsChoice.of(LinearUnit.US_SURVEY_FOOT));
    assertEquals(LinearUnit.US_SURVEY_FOOT, s.units().horizontal());
  }

  @Test
  void boundsAreInMetres() {
    // mvk-thin.las header extent (README, 3 decimals) times 1200/3937 m per US survey foot.
    Survey s = Survey.open(List.of(SurveyTestFiles.open("mvk-thin.las")),
        UnitsChoice.fromFile());
    double usft = 1200.0 / 3937.0;
    assertEquals(2045001.760 * usft, s.bounds().minX(), 0.001);
    assertEquals(1272499.790 * usft, s.bounds().maxY(), 0.001);
    assertEquals(228.730 * usft, s.bounds().maxZ(), 0.001);
  }

  @Test
  void tilesMustAgreeOnUnits() {
    Path mvk = SurveyTestFiles.open("mvk-thin.las");
    Path topo = SurveyTestFiles.open("topography_forest.las");
    InputException e = assertThrows(InputException.class, () -> Survey.open(List.of(mvk, topo),
        UnitsChoice.fromFile().withVerticalFollowingHorizontal()));
    assertEquals("horizontal unit", e.field());
    assertTrue(e.getMessage().startsWith(topo.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("same units"), e.getMessage());
  }

  @Test
  void tilesMustAgreeOnTheEpsgCode() {
    // mvk-thin: EPSG 26995; 4_6_crop: EPSG 2903; both US survey feet (README).
    Path mvk = SurveyTestFiles.open("mvk-thin.las");
    Path crop = SurveyTestFiles.open("4_6_crop.las");
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(mvk, crop), UnitsChoice.fromFile()));
    assertEquals("EPSG code", e.field());
  }
}
