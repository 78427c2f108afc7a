package org.clearance.survey;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Builds the header block and VLRs {@link LasWriter} writes (layouts: ASPRS LAS 1.4 R15 sections
 * 2.4 and 2.5; GeoTIFF key directory: GeoTIFF 1.0 section 2.4).
 */
final class LasHeaderWriter {
  private static final long U32_MAX = 0xFFFFFFFFL;
  /** Length of one Extra Bytes descriptor (LAS 1.4 R15, Extra Bytes VLR). */
  static final int EXTRA_BYTES_DESCRIPTOR = 192;
  /** An Extra Bytes descriptor states at most this many undocumented bytes (1-byte field). */
  static final int MAX_UNDOCUMENTED_PER_DESCRIPTOR = 255;

  private LasHeaderWriter() {}

  /** One VLR to write. */
  record VlrBytes(String userId, int recordId, String description, byte[] data) {}

  /** The VLRs for these options: CRS records, then the Extra Bytes record (LAS 1.4). */
  static List<VlrBytes> vlrs(LasWriterOptions o) {
    List<VlrBytes> out = new ArrayList<>();
    if (o.crs().isPresent()) {
      SurveyUnits u = o.crs().get();
      if (o.pointFormat().isExtended()) {
        String wkt = u.wkt().isEmpty() ? localWkt(u) : u.wkt();
        byte[] text = (wkt + "\0").getBytes(StandardCharsets.UTF_8);
        out.add(new VlrBytes(Vlr.PROJECTION_USER_ID, Vlr.WKT_RECORD, "OGC coordinate system WKT",
            text));
      } else {
        out.add(new VlrBytes(Vlr.PROJECTION_USER_ID, Vlr.GEO_KEY_DIRECTORY,
            "GeoTIFF GeoKeyDirectoryTag", geoKeys(u)));
        if (!u.crsName().isEmpty()) {
          out.add(new VlrBytes(Vlr.PROJECTION_USER_ID, Vlr.GEO_ASCII_PARAMS,
              "GeoTIFF GeoAsciiParamsTag", citation(u)));
        }
      }
    }
    if (o.versionMinor() >= 4 && o.extraBytes() > 0) {
      out.add(new VlrBytes(Vlr.SPEC_USER_ID, Vlr.EXTRA_BYTES_RECORD, "Extra Bytes",
          extraBytesRecord(o.extraBytes())));
    }
    return out;
  }

  /** The bytes of all VLRs, headers included. */
  static byte[] vlrBytes(List<VlrBytes> vlrs) {
    ByteArrayOutputStream all = new ByteArrayOutputStream();
    for (VlrBytes v : vlrs) {
      if (v.data().length > 0xFFFF) {
        throw new IllegalArgumentException("VLR " + v.recordId() + " longer than 65535 bytes");
      }
      ByteBuffer h = ByteBuffer.allocate(LasFile.VLR_HEADER_BYTES).order(ByteOrder.LITTLE_ENDIAN);
      putText(h, 2, v.userId(), 16);
      h.putShort(18, (short) v.recordId());
      h.putShort(20, (short) v.data().length);
      putText(h, 22, v.description(), 32);
      all.writeBytes(h.array());
      all.writeBytes(v.data());
    }
    return all.toByteArray();
  }

  /** The CRS name as GeoTIFF ASCII parameters: the text and a '|' terminator. */
  static byte[] citation(SurveyUnits u) {
    return (asciiName(u) + "|\0").getBytes(StandardCharsets.US_ASCII);
  }

  private static String asciiName(SurveyUnits u) {
    return u.crsName().replaceAll("[^\\x20-\\x7e]", "?").replace('|', '/');
  }

  /**
   * GeoTIFF keys: model type projected (1024 = 1), the CRS name as citation (1026, in the ASCII
   * record) when given, the EPSG code (3072) when known, the horizontal (3076) and vertical
   * (4099) unit codes; keys in ascending order as GeoTIFF requires.
   */
  static byte[] geoKeys(SurveyUnits u) {
    List<int[]> keys = new ArrayList<>();
    keys.add(new int[] {GeoKeysCrs.MODEL_TYPE, 0, 1, GeoKeysCrs.MODEL_PROJECTED});
    if (!u.crsName().isEmpty()) {
      keys.add(new int[] {GeoKeysCrs.CITATION, Vlr.GEO_ASCII_PARAMS, asciiName(u).length() + 1,
          0});
    }
    if (u.epsg().isPresent() && u.epsg().getAsInt() > 0 && u.epsg().getAsInt() < 0xFFFF) {
      keys.add(new int[] {GeoKeysCrs.PROJECTED_CS_TYPE, 0, 1, u.epsg().getAsInt()});
    }
    keys.add(new int[] {GeoKeysCrs.PROJ_LINEAR_UNITS, 0, 1, u.horizontal().epsgCode()});
    keys.add(new int[] {GeoKeysCrs.VERTICAL_UNITS, 0, 1, u.vertical().epsgCode()});
    ByteBuffer b = ByteBuffer.allocate(8 + 8 * keys.size()).order(ByteOrder.LITTLE_ENDIAN);
    b.putShort((short) 1).putShort((short) 1).putShort((short) 0).putShort((short) keys.size());
    for (int[] k : keys) {
      for (int v : k) {
        b.putShort((short) v);
      }
    }
    return b.array();
  }

  /**
   * A WKT1 compound of a local engineering CRS and a vertical CRS that states only the units
   * (OGC 01-009 section 7: LOCAL_CS, VERT_CS, COMPD_CS; datum type codes 10000 local and 2005
   * geoid-based, from memory).
   */
  static String localWkt(SurveyUnits u) {
    String name = u.crsName().isEmpty() ? "local grid" : u.crsName().replace("\"", "\"\"");
    return "COMPD_CS[\"" + name + " + heights\",LOCAL_CS[\"" + name
        + "\",LOCAL_DATUM[\"unknown\",10000]," + unit(u.horizontal())
        + ",AXIS[\"Easting\",EAST],AXIS[\"Northing\",NORTH]],VERT_CS[\"heights\","
        + "VERT_DATUM[\"unknown\",2005]," + unit(u.vertical()) + ",AXIS[\"Up\",UP]]]";
  }

  private static String unit(LinearUnit u) {
    String name = u == LinearUnit.METRE ? "metre" : u == LinearUnit.FOOT ? "foot"
        : "US survey foot";
    return String.format(Locale.ROOT, "UNIT[\"%s\",%s,AUTHORITY[\"EPSG\",\"%d\"]]", name,
        Double.toString(u.metres()), u.epsgCode());
  }

  /** Extra Bytes descriptors marking {@code n} bytes as undocumented (data type 0). */
  static byte[] extraBytesRecord(int n) {
    int descriptors = (n + MAX_UNDOCUMENTED_PER_DESCRIPTOR - 1) / MAX_UNDOCUMENTED_PER_DESCRIPTOR;
    ByteBuffer b = ByteBuffer.allocate(descriptors * EXTRA_BYTES_DESCRIPTOR)
        .order(ByteOrder.LITTLE_ENDIAN);
    for (int d = 0; d < descriptors; d++) {
      int at = d * EXTRA_BYTES_DESCRIPTOR;
      int bytes = Math.min(MAX_UNDOCUMENTED_PER_DESCRIPTOR,
          n - d * MAX_UNDOCUMENTED_PER_DESCRIPTOR);
      b.put(at + 2, (byte) 0);
      b.put(at + 3, (byte) bytes);
      putText(b, at + 4, "padding " + d, 32);
      putText(b, at + 160, "undocumented, written as zeros", 32);
    }
    return b.array();
  }

  /** Totals for the header, taken when the file is closed. */
  record Totals(long count, long[] byReturn, int[] extent) {}

  /** The public header block (227 bytes for LAS 1.2, 375 for 1.4). */
  static byte[] header(LasWriterOptions o, int vlrCount, long pointOffset, Totals t) {
    int size = LasHeader.standardHeaderSize(o.versionMinor());
    ByteBuffer b = ByteBuffer.allocate(size).order(ByteOrder.LITTLE_ENDIAN);
    putText(b, 0, LasHeaderParser.SIGNATURE, 4);
    b.putShort(4, (short) o.fileSourceId());
    int encoding = o.adjustedGpsTime() ? LasHeader.GPS_ADJUSTED_BIT : 0;
    if (o.pointFormat().isExtended() && o.crs().isPresent()) {
      encoding |= LasHeader.WKT_BIT;
    }
    b.putShort(6, (short) encoding);
    b.put(24, (byte) 1).put(25, (byte) o.versionMinor());
    putText(b, 26, o.systemId(), 32);
    putText(b, 58, o.software(), 32);
    b.putShort(90, (short) o.creationDate().getDayOfYear());
    b.putShort(92, (short) o.creationDate().getYear());
    b.putShort(94, (short) size);
    b.putInt(96, (int) pointOffset);
    b.putInt(100, vlrCount);
    b.put(104, (byte) o.pointFormat().id());
    b.putShort(105, (short) o.recordLength());
    boolean legacyFits = !o.pointFormat().isExtended() && t.count() <= U32_MAX;
    b.putInt(107, (int) (legacyFits ? t.count() : 0));
    for (int r = 0; r < 5; r++) {
      b.putInt(111 + 4 * r, (int) (legacyFits ? Math.min(t.byReturn()[r], U32_MAX) : 0));
    }
    double[] scale = {o.scaleX(), o.scaleY(), o.scaleZ()};
    double[] offset = {o.offsetX(), o.offsetY(), o.offsetZ()};
    for (int a = 0; a < 3; a++) {
      b.putDouble(131 + 8 * a, scale[a]);
      b.putDouble(155 + 8 * a, offset[a]);
      double min = t.count() == 0 ? 0 : t.extent()[a] * scale[a] + offset[a];
      double max = t.count() == 0 ? 0 : t.extent()[a + 3] * scale[a] + offset[a];
      b.putDouble(179 + 16 * a, max);
      b.putDouble(187 + 16 * a, min);
    }
    if (o.versionMinor() >= 4) {
      b.putLong(227, 0).putLong(235, 0).putInt(243, 0);
      b.putLong(247, t.count());
      for (int r = 0; r < 15; r++) {
        b.putLong(255 + 8 * r, t.byReturn()[r]);
      }
    }
    return b.array();
  }

  private static void putText(ByteBuffer b, int at, String text, int length) {
    byte[] bytes = text.getBytes(StandardCharsets.US_ASCII);
    for (int i = 0; i < length; i++) {
      b.put(at + i, i < bytes.length ? bytes[i] : 0);
    }
  }
}
