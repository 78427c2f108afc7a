package org.clearance.report;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/**
 * Encodes geometries as GeoPackage binary blobs (OGC GeoPackage Encoding Standard 1.3, clause
 * 2.1.3 "StandardGeoPackageBinary"): the header {@code 'G' 'P'}, version 0, a flags byte
 * (bit 0 byte order, 1 = little-endian; bits 1-3 envelope contents, 1 = [minx, maxx, miny, maxy],
 * 2 = [minx, maxx, miny, maxy, minz, maxz]; bit 4 empty; bit 5 extended type, 0 here), the srs
 * id, the envelope, then the geometry as ISO WKB (OGC Simple Features 1.2.1 clause 8.2: byte
 * order, type code 1 point / 2 line string, plus 1000 with z). Everything little-endian.
 */
final class GpkgGeometry {

  /** Envelope contents indicator: x and y. */
  static final int ENVELOPE_XY = 1;
  /** Envelope contents indicator: x, y and z. */
  static final int ENVELOPE_XYZ = 2;
  /** WKB geometry type codes (ISO; z adds 1000). */
  static final int WKB_POINT = 1;
  static final int WKB_LINESTRING = 2;
  static final int WKB_POLYGON = 3;
  static final int WKB_Z = 1000;

  private GpkgGeometry() {}

  /** A 2D point. */
  static byte[] point(int srsId, double x, double y) {
    ByteBuffer b = header(srsId, ENVELOPE_XY, 1 + 4 + 16);
    b.putDouble(x).putDouble(x).putDouble(y).putDouble(y);
    b.put((byte) 1).putInt(WKB_POINT).putDouble(x).putDouble(y);
    return b.array();
  }

  /**
   * A line string, 2D or with z.
   *
   * @param xyz coordinates: x0, y0, (z0,) x1, y1, ...
   * @param withZ whether each vertex has a z
   */
  static byte[] lineString(int srsId, double[] xyz, boolean withZ) {
    int dim = withZ ? 3 : 2;
    int n = xyz.length / dim;
    if (n < 2 || n * dim != xyz.length) {
      throw new IllegalArgumentException("a line string needs two or more whole vertices");
    }
    double[] min = new double[dim];
    double[] max = new double[dim];
    java.util.Arrays.fill(min, Double.POSITIVE_INFINITY);
    java.util.Arrays.fill(max, Double.NEGATIVE_INFINITY);
    for (int i = 0; i < n; i++) {
      for (int k = 0; k < dim; k++) {
        min[k] = Math.min(min[k], xyz[i * dim + k]);
        max[k] = Math.max(max[k], xyz[i * dim + k]);
      }
    }
    ByteBuffer b = header(srsId, withZ ? ENVELOPE_XYZ : ENVELOPE_XY, 1 + 4 + 4 + 8 * xyz.length);
    for (int k = 0; k < dim; k++) {
      b.putDouble(min[k]).putDouble(max[k]);
    }
    b.put((byte) 1).putInt(WKB_LINESTRING + (withZ ? WKB_Z : 0)).putInt(n);
    for (double v : xyz) {
      b.putDouble(v);
    }
    return b.array();
  }

  /**
   * A 2D polygon of one ring (OGC Simple Features WKB; the ring is closed here when its last
   * vertex differs from its first).
   *
   * @param xy ring vertices: x0, y0, x1, y1, ... (three or more)
   */
  static byte[] polygon(int srsId, double[] xy) {
    int n = xy.length / 2;
    if (n < 3 || 2 * n != xy.length) {
      throw new IllegalArgumentException("a polygon ring needs three or more whole vertices");
    }
    boolean closed = xy[0] == xy[xy.length - 2] && xy[1] == xy[xy.length - 1];
    int count = closed ? n : n + 1;
    double minX = Double.POSITIVE_INFINITY;
    double minY = Double.POSITIVE_INFINITY;
    double maxX = Double.NEGATIVE_INFINITY;
    double maxY = Double.NEGATIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      minX = Math.min(minX, xy[2 * i]);
      maxX = Math.max(maxX, xy[2 * i]);
      minY = Math.min(minY, xy[2 * i + 1]);
      maxY = Math.max(maxY, xy[2 * i + 1]);
    }
    ByteBuffer b = header(srsId, ENVELOPE_XY, 1 + 4 + 4 + 4 + 16 * count);
    b.putDouble(minX).putDouble(maxX).putDouble(minY).putDouble(maxY);
    b.put((byte) 1).putInt(WKB_POLYGON).putInt(1).putInt(count);
    for (double v : xy) {
      b.putDouble(v);
    }
    if (!closed) {
      b.putDouble(xy[0]).putDouble(xy[1]);
    }
    return b.array();
  }

  /** A buffer holding the header, with room for the envelope and {@code wkbBytes}. */
  private static ByteBuffer header(int srsId, int envelope, int wkbBytes) {
    int envelopeDoubles = envelope == ENVELOPE_XYZ ? 6 : 4;
    ByteBuffer b = ByteBuffer.allocate(8 + 8 * envelopeDoubles + wkbBytes)
        .order(ByteOrder.LITTLE_ENDIAN);
    b.put((byte) 'G').put((byte) 'P').put((byte) 0).put((byte) ((envelope << 1) | 1));
    b.putInt(srsId);
    return b;
  }
}
