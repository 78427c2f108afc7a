package org.clearance.survey;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * Decides what a LAS file says about its CRS and units from its WKT record (2112) and GeoTIFF keys
 * (34735-34737), all under user id {@code LASF_Projection}.
 *
 * <p>The global encoding's WKT bit (bit 4, LAS 1.4 R15 table 4) picks the governing records: set,
 * the WKT governs; clear, the GeoTIFF keys govern. When only the other kind is present it is used
 * and {@link CrsInfo#records()} says so. When the governing records state no vertical unit but the
 * other records state one and agree on the horizontal unit, that vertical unit is taken and its
 * source says so. Nothing is guessed: a unit not stated stays empty.
 */
final class CrsReader {
  private CrsReader() {}

  static CrsInfo read(Path path, LasHeader header, List<Vlr> vlrs, List<Vlr> evlrs) {
    Vlr wkt = find(vlrs, evlrs, Vlr.WKT_RECORD);
    Vlr dir = find(vlrs, evlrs, Vlr.GEO_KEY_DIRECTORY);
    if (wkt == null && dir == null) {
      return CrsInfo.none();
    }
    CrsStatement fromWkt = wkt == null ? null : WktCrs.read(wkt.dataAsText());
    CrsStatement fromKeys = dir == null ? null : GeoKeysCrs.read(path, dir,
        find(vlrs, evlrs, Vlr.GEO_DOUBLE_PARAMS), find(vlrs, evlrs, Vlr.GEO_ASCII_PARAMS));
    CrsStatement primary;
    CrsStatement secondary;
    String records;
    String primaryName;
    boolean wktPrimary;
    if (header.wktGoverns()) {
      wktPrimary = wkt != null;
      records = wkt == null
          ? "GeoTIFF keys; global encoding bit 4 names WKT but the file has no WKT record, so the"
              + " GeoTIFF keys are used"
          : "WKT" + (dir == null ? "" : " and GeoTIFF keys") + "; WKT governs (global encoding"
              + " bit 4 set)";
    } else {
      wktPrimary = dir == null;
      records = dir == null
          ? "WKT; global encoding bit 4 is clear but the file has no GeoTIFF keys, so the WKT is"
              + " used"
          : "GeoTIFF keys" + (wkt == null ? "" : " and WKT") + "; GeoTIFF keys govern (global"
              + " encoding bit 4 clear)";
    }
    primary = wktPrimary ? fromWkt : fromKeys;
    secondary = wktPrimary ? fromKeys : fromWkt;
    primaryName = wktPrimary ? "WKT" : "GeoTIFF keys";
    Optional<LinearUnit> vertical = primary.vertical();
    String verticalSource = primary.verticalSource();
    if (vertical.isEmpty() && secondary != null && secondary.vertical().isPresent()
        && primary.horizontal().isPresent()
        && primary.horizontal().equals(secondary.horizontal())) {
      vertical = secondary.vertical();
      verticalSource = secondary.verticalSource() + " (the governing " + primaryName
          + " states no vertical unit; both agree on the horizontal unit)";
    }
    String name = primary.name().isEmpty() && secondary != null ? secondary.name()
        : primary.name();
    return new CrsInfo(primary.horizontal(), vertical, primary.horizontalSource(),
        verticalSource, name, primary.epsg(), wktPrimary ? wkt.dataAsText().strip() : "",
        records, primary.unusable(), primary.unitProblem());
  }

  private static Vlr find(List<Vlr> vlrs, List<Vlr> evlrs, int recordId) {
    for (Vlr v : vlrs) {
      if (v.is(Vlr.PROJECTION_USER_ID, recordId)) {
        return v;
      }
    }
    for (Vlr v : evlrs) {
      if (v.is(Vlr.PROJECTION_USER_ID, recordId) && v.isLoaded()) {
        return v;
      }
    }
    return null;
  }
}
