package org.clearance.survey;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.TreeMap;
import org.clearance.InputException;

/**
 * Reads the units and EPSG code of a CRS given as GeoTIFF keys (LAS records 34735-34737).
 *
 * <p>Source: GeoTIFF Format Specification rev. 1.0 section 2.4 (GeoKeyDirectoryTag layout: a
 * four-short header, then four shorts per key: id, tag location, count, value or index) and OGC
 * GeoTIFF 1.1 (OGC 19-008r4) for the key ids: GTModelTypeGeoKey 1024 (1 projected, 2
 * geographic, 3 geocentric), GeographicTypeGeoKey 2048, ProjectedCSTypeGeoKey 3072,
 * ProjLinearUnitsGeoKey 3076, ProjLinearUnitSizeGeoKey 3077, VerticalUnitsGeoKey 4099; unit codes
 * 9001 metre, 9002 foot, 9003 US survey foot [from memory, see check-values.md section 1].
 */
final class GeoKeysCrs {
  static final int MODEL_TYPE = 1024;
  static final int CITATION = 1026;
  static final int GEOGRAPHIC_TYPE = 2048;
  static final int PROJECTED_CS_TYPE = 3072;
  static final int PCS_CITATION = 3073;
  static final int PROJ_LINEAR_UNITS = 3076;
  static final int PROJ_LINEAR_UNIT_SIZE = 3077;
  static final int VERTICAL_UNITS = 4099;
  /** GeoTIFF's code for "user-defined". */
  static final int USER_DEFINED = 32767;
  /** GTModelTypeGeoKey values. */
  static final int MODEL_PROJECTED = 1;
  static final int MODEL_GEOGRAPHIC = 2;
  static final int MODEL_GEOCENTRIC = 3;

  private GeoKeysCrs() {}

  /** One key's value: a short, a double or text, as its tag location says. */
  private record Value(int shortValue, double doubleValue, String text) {}

  /**
   * What the keys state.
   *
   * @param path the file, for messages
   * @param directory the GeoKeyDirectoryTag record
   * @param doubles the GeoDoubleParamsTag record, or null
   * @param ascii the GeoAsciiParamsTag record, or null
   * @throws InputException when the key directory is malformed
   */
  static CrsStatement read(Path path, Vlr directory, Vlr doubles, Vlr ascii) {
    Map<Integer, Value> keys = parse(path, directory, doubles, ascii);
    String name = text(keys, PCS_CITATION);
    if (name.isEmpty()) {
      name = text(keys, CITATION);
    }
    int model = shortOf(keys, MODEL_TYPE);
    int pcs = shortOf(keys, PROJECTED_CS_TYPE);
    boolean hasPcs = pcs > 0 && pcs != USER_DEFINED;
    OptionalInt epsg = hasPcs ? OptionalInt.of(pcs) : OptionalInt.empty();
    if (name.isEmpty() && hasPcs) {
      name = "EPSG:" + pcs;
    }
    String unusable = "";
    if (model == MODEL_GEOGRAPHIC || (model < 0 && keys.containsKey(GEOGRAPHIC_TYPE)
        && !keys.containsKey(PROJECTED_CS_TYPE) && !keys.containsKey(PROJ_LINEAR_UNITS))) {
      unusable = "GeoTIFF keys give geographic (longitude, latitude) coordinates";
    } else if (model == MODEL_GEOCENTRIC) {
      unusable = "GeoTIFF keys give geocentric coordinates";
    }
    String problem = "";
    Optional<LinearUnit> h = Optional.empty();
    String hSource;
    if (keys.containsKey(PROJ_LINEAR_UNITS)) {
      int code = shortOf(keys, PROJ_LINEAR_UNITS);
      hSource = "GeoTIFF ProjLinearUnitsGeoKey " + PROJ_LINEAR_UNITS;
      if (code == USER_DEFINED && keys.containsKey(PROJ_LINEAR_UNIT_SIZE)) {
        double size = keys.get(PROJ_LINEAR_UNIT_SIZE).doubleValue();
        h = Units.byFactor(size);
        hSource = "GeoTIFF ProjLinearUnitSizeGeoKey " + PROJ_LINEAR_UNIT_SIZE;
        if (h.isEmpty()) {
          problem = String.format(Locale.ROOT, "horizontal unit of %s m in %s is not metre,"
              + " international foot or US survey foot", size, hSource);
        }
      } else {
        h = LinearUnit.fromEpsgCode(code);
        if (h.isEmpty()) {
          problem = "horizontal unit code " + describeShort(keys, PROJ_LINEAR_UNITS) + " in "
              + hSource
              + " is not 9001 (metre), 9002 (foot) or 9003 (US survey foot)";
        }
      }
    } else if (hasPcs) {
      EpsgUnits.Lookup lookup = EpsgUnits.of(pcs);
      h = lookup.unit();
      hSource = "EPSG:" + pcs + " via proj4j (GeoTIFF ProjectedCSTypeGeoKey " + PROJECTED_CS_TYPE
          + ", no unit key)";
      if (lookup.geographic()) {
        unusable = "GeoTIFF ProjectedCSTypeGeoKey names geographic CRS EPSG:" + pcs;
      } else if (h.isEmpty()) {
        hSource = "GeoTIFF keys give no unit key and " + lookup.note();
      }
    } else {
      hSource = "GeoTIFF keys state no horizontal unit";
    }
    Optional<LinearUnit> v = Optional.empty();
    String vSource;
    if (keys.containsKey(VERTICAL_UNITS)) {
      int code = shortOf(keys, VERTICAL_UNITS);
      vSource = "GeoTIFF VerticalUnitsGeoKey " + VERTICAL_UNITS;
      v = LinearUnit.fromEpsgCode(code);
      if (v.isEmpty()) {
        problem = CrsStatement.join(problem, "vertical unit code "
            + describeShort(keys, VERTICAL_UNITS) + " in " + vSource
            + " is not 9001 (metre), 9002 (foot) or 9003 (US survey foot)");
      }
    } else {
      vSource = "GeoTIFF keys state no vertical unit";
    }
    return new CrsStatement(h, hSource, v, vSource, name, epsg, unusable, problem);
  }

  private static int shortOf(Map<Integer, Value> keys, int id) {
    Value v = keys.get(id);
    return v == null ? -1 : v.shortValue();
  }

  /**
   * A short key's value for messages: the number, or what was found instead when the key points
   * into the double or text parameters (never the internal -1).
   */
  private static String describeShort(Map<Integer, Value> keys, int id) {
    Value v = keys.get(id);
    if (v.shortValue() >= 0) {
      return Integer.toString(v.shortValue());
    }
    return v.text() != null ? "(given as text '" + v.text() + "', not a number)"
        : "(given as the double " + v.doubleValue() + ", not a short integer)";
  }

  private static String text(Map<Integer, Value> keys, int id) {
    Value v = keys.get(id);
    return v == null || v.text() == null ? "" : v.text();
  }

  private static Map<Integer, Value> parse(Path path, Vlr dir, Vlr doubles, Vlr ascii) {
    String where = "GeoTIFF record " + Vlr.GEO_KEY_DIRECTORY;
    ByteBuffer b = ByteBuffer.wrap(dir.data()).order(ByteOrder.LITTLE_ENDIAN);
    if (b.capacity() < 8) {
      throw new InputException(path, where, "key directory header",
          "needs 8 bytes, the record has " + b.capacity());
    }
    int count = b.getShort(6) & 0xFFFF;
    if (8 + 8L * count > b.capacity()) {
      throw new InputException(path, where, "number of keys", String.format(Locale.ROOT,
          "%d keys need %d bytes, the record has %d", count, 8 + 8 * count, b.capacity()));
    }
    ByteBuffer d = doubles == null ? null
        : ByteBuffer.wrap(doubles.data()).order(ByteOrder.LITTLE_ENDIAN);
    byte[] a = ascii == null ? null : ascii.data();
    Map<Integer, Value> keys = new TreeMap<>();
    for (int i = 0; i < count; i++) {
      int at = 8 + 8 * i;
      int id = b.getShort(at) & 0xFFFF;
      int location = b.getShort(at + 2) & 0xFFFF;
      int n = b.getShort(at + 4) & 0xFFFF;
      int value = b.getShort(at + 6) & 0xFFFF;
      String field = "key " + id;
      if (location == 0) {
        keys.put(id, new Value(value, Double.NaN, null));
      } else if (location == Vlr.GEO_DOUBLE_PARAMS) {
        if (d == null || 8L * (value + 1) > d.capacity()) {
          throw new InputException(path, where, field, "points to double " + value
              + " beyond the GeoTIFF double parameters record");
        }
        keys.put(id, new Value(-1, d.getDouble(8 * value), null));
      } else if (location == Vlr.GEO_ASCII_PARAMS) {
        if (a == null || value + n > a.length) {
          throw new InputException(path, where, field, "points to text beyond the GeoTIFF"
              + " ASCII parameters record");
        }
        String s = new String(a, value, n, StandardCharsets.ISO_8859_1);
        keys.put(id, new Value(-1, Double.NaN, s.replace("\0", "").replaceAll("\\|+$", "")
            .strip()));
      }
    }
    return keys;
  }
}
