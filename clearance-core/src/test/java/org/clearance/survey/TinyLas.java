package org.clearance.survey;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Builds small LAS files byte by byte for tests, independently of {@link LasWriter}: field
 * offsets typed in from ASPRS LAS 1.4 R15 section 2.4 (header) and 2.5 (VLR header).
 */
final class TinyLas {
  private int minor = 2;
  private int format;
  private int recordLength = -1;
  private int headerSize = -1;
  private long pointOffset = -1;
  private long legacyCount = -1;
  private long count64 = -1;
  private int globalEncoding;
  private double[] scale = {0.01, 0.01, 0.01};
  private double[] offset = {0, 0, 0};
  private final ByteArrayOutputStream vlrs = new ByteArrayOutputStream();
  private int vlrCount;
  private final ByteArrayOutputStream points = new ByteArrayOutputStream();
  private long pointRecords;
  /** Bounding box as max x, min x, max y, min y, max z, min z; null: computed from the points. */
  private double[] bounds;

  TinyLas minor(int m) {
    minor = m;
    return this;
  }

  TinyLas format(int f) {
    format = f;
    return this;
  }

  TinyLas recordLength(int n) {
    recordLength = n;
    return this;
  }

  TinyLas headerSize(int n) {
    headerSize = n;
    return this;
  }

  TinyLas pointOffset(long n) {
    pointOffset = n;
    return this;
  }

  TinyLas legacyCount(long n) {
    legacyCount = n;
    return this;
  }

  TinyLas count64(long n) {
    count64 = n;
    return this;
  }

  TinyLas globalEncoding(int bits) {
    globalEncoding = bits;
    return this;
  }

  TinyLas scale(double x, double y, double z) {
    scale = new double[] {x, y, z};
    return this;
  }

  TinyLas offset(double x, double y, double z) {
    offset = new double[] {x, y, z};
    return this;
  }

  /** Header bounds in the header's order: max x, min x, max y, min y, max z, min z. */
  TinyLas bounds(double... maxMinXyz) {
    bounds = maxMinXyz.clone();
    return this;
  }

  /** Adds a VLR; {@code declaredLength} &lt; 0 means the data's length. */
  TinyLas vlr(String userId, int recordId, byte[] data, int declaredLength) {
    ByteBuffer h = ByteBuffer.allocate(54).order(ByteOrder.LITTLE_ENDIAN);
    put(h, 2, userId);
    h.putShort(18, (short) recordId);
    h.putShort(20, (short) (declaredLength < 0 ? data.length : declaredLength));
    put(h, 22, "test record");
    vlrs.writeBytes(h.array());
    vlrs.writeBytes(data);
    vlrCount++;
    return this;
  }

  /** Adds a WKT record (LASF_Projection 2112) holding {@code wkt} and a NUL. */
  TinyLas wkt(String wkt) {
    return vlr(Vlr.PROJECTION_USER_ID, Vlr.WKT_RECORD,
        (wkt + "\0").getBytes(StandardCharsets.UTF_8), -1);
  }

  /** Adds a GeoTIFF key directory (LASF_Projection 34735) with {id, value} short keys. */
  TinyLas geoKeys(int[]... keys) {
    return vlr(Vlr.PROJECTION_USER_ID, Vlr.GEO_KEY_DIRECTORY, keyDirectory(keys), -1);
  }

  /** A GeoTIFF key directory with the given {id, value} keys stored in place. */
  static byte[] keyDirectory(int[]... keys) {
    ByteBuffer b = ByteBuffer.allocate(8 + 8 * keys.length).order(ByteOrder.LITTLE_ENDIAN);
    b.putShort((short) 1).putShort((short) 1).putShort((short) 0).putShort((short) keys.length);
    for (int[] k : keys) {
      b.putShort((short) k[0]).putShort((short) 0).putShort((short) 1).putShort((short) k[1]);
    }
    return b.array();
  }

  /** Appends one raw point record. */
  TinyLas point(byte[] record) {
    points.writeBytes(record);
    pointRecords++;
    return this;
  }

  /** A format 0 record (20 bytes): integer coordinates, class byte, return byte. */
  static byte[] format0(int x, int y, int z, int classByte, int returnByte) {
    ByteBuffer b = ByteBuffer.allocate(20).order(ByteOrder.LITTLE_ENDIAN);
    b.putInt(0, x).putInt(4, y).putInt(8, z);
    b.put(14, (byte) returnByte).put(15, (byte) classByte);
    return b.array();
  }

  int standardHeaderSize() {
    return minor >= 4 ? 375 : minor == 3 ? 235 : 227;
  }

  /** The header and VLRs only (what precedes the point data). */
  byte[] head() {
    int hs = standardHeaderSize();
    int declaredHeader = headerSize < 0 ? hs : headerSize;
    byte[] v = vlrs.toByteArray();
    long offsetToPoints = pointOffset < 0 ? hs + v.length : pointOffset;
    int rl = recordLength < 0 ? PointFormat.ofId(format).minRecordLength() : recordLength;
    long n = pointRecords;
    ByteBuffer b = ByteBuffer.allocate(hs).order(ByteOrder.LITTLE_ENDIAN);
    put(b, 0, "LASF");
    b.putShort(6, (short) globalEncoding);
    b.put(24, (byte) 1).put(25, (byte) minor);
    b.putShort(94, (short) declaredHeader);
    b.putInt(96, (int) offsetToPoints);
    b.putInt(100, vlrCount);
    b.put(104, (byte) format);
    b.putShort(105, (short) rl);
    boolean extended = format >= 6;
    b.putInt(107, (int) (legacyCount >= 0 ? legacyCount : extended ? 0 : n));
    for (int i = 0; i < 3; i++) {
      b.putDouble(131 + 8 * i, scale[i]);
      b.putDouble(155 + 8 * i, offset[i]);
    }
    double[] box = bounds != null ? bounds : pointBounds(rl);
    for (int i = 0; i < 6; i++) {
      b.putDouble(179 + 8 * i, box[i]);
    }
    if (minor >= 4) {
      b.putLong(247, count64 >= 0 ? count64 : n);
    }
    ByteArrayOutputStream all = new ByteArrayOutputStream();
    all.writeBytes(b.array());
    all.writeBytes(v);
    return all.toByteArray();
  }

  /** The box of the point records' coordinates (first 12 bytes of each), header order. */
  private double[] pointBounds(int rl) {
    double[] box = new double[6];
    ByteBuffer p = ByteBuffer.wrap(points.toByteArray()).order(ByteOrder.LITTLE_ENDIAN);
    for (int at = 0; rl >= 12 && at + 12 <= p.capacity(); at += rl) {
      for (int a = 0; a < 3; a++) {
        double v = p.getInt(at + 4 * a) * scale[a] + offset[a];
        box[2 * a] = at == 0 ? v : Math.max(box[2 * a], v);
        box[2 * a + 1] = at == 0 ? v : Math.min(box[2 * a + 1], v);
      }
    }
    return box;
  }

  /** The whole file: header, VLRs, padding up to the point offset, points. */
  byte[] build() {
    ByteArrayOutputStream all = new ByteArrayOutputStream();
    byte[] h = head();
    all.writeBytes(h);
    if (pointOffset > h.length) {
      all.writeBytes(new byte[(int) (pointOffset - h.length)]);
    }
    all.writeBytes(points.toByteArray());
    return all.toByteArray();
  }

  /** Writes the whole file to {@code path}. */
  Path writeTo(Path path) {
    try {
      return Files.write(path, build());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static void put(ByteBuffer b, int at, String s) {
    byte[] t = s.getBytes(StandardCharsets.US_ASCII);
    for (int i = 0; i < t.length; i++) {
      b.put(at + i, t[i]);
    }
  }
}
