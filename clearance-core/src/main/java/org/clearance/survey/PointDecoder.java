package org.clearance.survey;

import java.nio.ByteBuffer;
import java.util.Arrays;

/**
 * Decodes packed LAS point records into a {@link PointChunk}.
 *
 * <p>Field layout: ASPRS LAS 1.4 R15, tables 7-12 (formats 0-5) and 13-17 (formats 6-10).
 * Coordinates are {@code (integer * scale + offset) * unit}, so a unit factor of 1 keeps the
 * file's own units. Formats 0-5: return number and count in 3 bits each, class in bits 0-4 of the
 * class byte with synthetic, key-point and withheld in bits 5-7, scan angle rank in whole degrees.
 * Formats 6-10: return number and count in 4 bits each, flags (synthetic, key-point, withheld,
 * overlap) in 4 bits, scanner channel in 2, full class byte, scan angle in steps of 0.006 degree.
 * Extra bytes and wave packet descriptors are skipped.
 */
final class PointDecoder {
  /** Scan angle step of formats 6-10, degrees (LAS 1.4 R15, table 13). */
  static final double SCAN_ANGLE_STEP = 0.006;

  private final PointFormat format;
  private final int recordLength;
  private final double sx;
  private final double sy;
  private final double sz;
  private final double ox;
  private final double oy;
  private final double oz;
  private final double horizontalFactor;
  private final double verticalFactor;
  /** The header's bounding box widened by the tolerance, in output units: x, y, z lows, highs. */
  private final double[] low = new double[3];
  private final double[] high = new double[3];
  /** The header's bounding box as written, file units. */
  private final double[] headerMin;
  private final double[] headerMax;

  /**
   * @param header the file's header
   * @param horizontalFactor metres per horizontal file unit, or 1 to keep file units
   * @param verticalFactor metres per vertical file unit, or 1 to keep file units
   */
  PointDecoder(LasHeader header, double horizontalFactor, double verticalFactor) {
    this.format = header.pointFormat();
    this.recordLength = header.recordLength();
    this.sx = header.scaleX();
    this.sy = header.scaleY();
    this.sz = header.scaleZ();
    this.ox = header.offsetX();
    this.oy = header.offsetY();
    this.oz = header.offsetZ();
    this.horizontalFactor = horizontalFactor;
    this.verticalFactor = verticalFactor;
    headerMin = new double[] {header.minX(), header.minY(), header.minZ()};
    headerMax = new double[] {header.maxX(), header.maxY(), header.maxZ()};
    double[] scale = {sx, sy, sz};
    double[] factor = {horizontalFactor, horizontalFactor, verticalFactor};
    for (int a = 0; a < 3; a++) {
      double tol = boundsTolerance(scale[a], headerMin[a], headerMax[a]);
      low[a] = (headerMin[a] - tol) * factor[a];
      high[a] = (headerMax[a] + tol) * factor[a];
    }
  }

  /**
   * How far a point may lie outside the header's bounding box, file units: one scale step (a
   * writer may round the box to the coordinate grid) plus a few units in the last place of the
   * largest bound (the box and the points are computed in doubles). Decided here, no source.
   */
  static double boundsTolerance(double scale, double min, double max) {
    return Math.abs(scale) + 4 * Math.ulp(Math.max(Math.abs(min), Math.abs(max)));
  }

  /**
   * The first point of a decoded chunk outside the header's bounding box (with
   * {@link #boundsTolerance}), or -1 when all lie inside.
   */
  int firstOutsideBounds(PointChunk c) {
    double[][] axes = {c.x(), c.y(), c.z()};
    for (int a = 0; a < 3; a++) {
      double[] v = axes[a];
      double lo = low[a];
      double hi = high[a];
      for (int i = 0, n = c.size(); i < n; i++) {
        if (!(v[i] >= lo && v[i] <= hi)) {
          return firstOutside(c);
        }
      }
    }
    return -1;
  }

  private int firstOutside(PointChunk c) {
    for (int i = 0; i < c.size(); i++) {
      if (outsideAxis(c, i) != null) {
        return i;
      }
    }
    return -1;
  }

  /** The axis (x, y or z) on which point {@code i} of the chunk lies outside, or null. */
  String outsideAxis(PointChunk c, int i) {
    double[] v = {c.x()[i], c.y()[i], c.z()[i]};
    String[] names = {"x", "y", "z"};
    for (int a = 0; a < 3; a++) {
      if (!(v[a] >= low[a] && v[a] <= high[a])) {
        return names[a];
      }
    }
    return null;
  }

  /** What is wrong with point {@code i}, which lies outside, in file units. */
  String outsideProblem(PointChunk c, int i) {
    String axis = outsideAxis(c, i);
    int a = axis.charAt(0) - 'x';
    double factor = a == 2 ? verticalFactor : horizontalFactor;
    double value = (a == 0 ? c.x() : a == 1 ? c.y() : c.z())[i] / factor;
    return String.format(java.util.Locale.ROOT, "%s = %s lies outside the header's bounding"
        + " box, min %s %s to max %s %s (tolerance one scale step); the header, its scale or"
        + " offset, or the record is damaged", axis, value, axis, headerMin[a], axis,
        headerMax[a]);
  }

  /** Decodes {@code count} records from the start of {@code b} (little-endian) into the chunk. */
  void decode(ByteBuffer b, int count, PointChunk chunk) {
    if (format.isExtended()) {
      decodeExtended(b, count, chunk);
    } else {
      decodeLegacy(b, count, chunk);
    }
    decodeOptional(b, count, chunk);
    chunk.setSize(count);
  }

  private void decodeLegacy(ByteBuffer b, int count, PointChunk c) {
    double[] x = c.x();
    double[] y = c.y();
    double[] z = c.z();
    int[] intensity = c.intensity();
    byte[] rn = c.returnNumber();
    byte[] nr = c.numberOfReturns();
    short[] cls = c.classification();
    byte[] flags = c.flags();
    byte[] channel = c.scannerChannel();
    byte[] dir = c.scanDirection();
    byte[] edge = c.edgeOfFlightLine();
    float[] angle = c.scanAngle();
    short[] user = c.userData();
    int[] source = c.pointSourceId();
    for (int i = 0, p = 0; i < count; i++, p += recordLength) {
      x[i] = (b.getInt(p) * sx + ox) * horizontalFactor;
      y[i] = (b.getInt(p + 4) * sy + oy) * horizontalFactor;
      z[i] = (b.getInt(p + 8) * sz + oz) * verticalFactor;
      intensity[i] = b.getShort(p + 12) & 0xFFFF;
      int r = b.get(p + 14) & 0xFF;
      rn[i] = (byte) (r & 7);
      nr[i] = (byte) ((r >> 3) & 7);
      dir[i] = (byte) ((r >> 6) & 1);
      edge[i] = (byte) (r >> 7);
      int k = b.get(p + 15) & 0xFF;
      cls[i] = (short) (k & 31);
      flags[i] = (byte) (k >> 5);
      channel[i] = 0;
      angle[i] = b.get(p + 16);
      user[i] = (short) (b.get(p + 17) & 0xFF);
      source[i] = b.getShort(p + 18) & 0xFFFF;
    }
  }

  private void decodeExtended(ByteBuffer b, int count, PointChunk c) {
    double[] x = c.x();
    double[] y = c.y();
    double[] z = c.z();
    int[] intensity = c.intensity();
    byte[] rn = c.returnNumber();
    byte[] nr = c.numberOfReturns();
    short[] cls = c.classification();
    byte[] flags = c.flags();
    byte[] channel = c.scannerChannel();
    byte[] dir = c.scanDirection();
    byte[] edge = c.edgeOfFlightLine();
    float[] angle = c.scanAngle();
    short[] user = c.userData();
    int[] source = c.pointSourceId();
    for (int i = 0, p = 0; i < count; i++, p += recordLength) {
      x[i] = (b.getInt(p) * sx + ox) * horizontalFactor;
      y[i] = (b.getInt(p + 4) * sy + oy) * horizontalFactor;
      z[i] = (b.getInt(p + 8) * sz + oz) * verticalFactor;
      intensity[i] = b.getShort(p + 12) & 0xFFFF;
      int r = b.get(p + 14) & 0xFF;
      rn[i] = (byte) (r & 15);
      nr[i] = (byte) (r >> 4);
      int f = b.get(p + 15) & 0xFF;
      flags[i] = (byte) (f & 15);
      channel[i] = (byte) ((f >> 4) & 3);
      dir[i] = (byte) ((f >> 6) & 1);
      edge[i] = (byte) (f >> 7);
      cls[i] = (short) (b.get(p + 16) & 0xFF);
      user[i] = (short) (b.get(p + 17) & 0xFF);
      angle[i] = (float) (b.getShort(p + 18) * SCAN_ANGLE_STEP);
      source[i] = b.getShort(p + 20) & 0xFFFF;
    }
  }

  private void decodeOptional(ByteBuffer b, int count, PointChunk c) {
    double[] gps = c.gpsTime();
    int at = format.gpsOffset();
    if (at < 0) {
      Arrays.fill(gps, 0, count, Double.NaN);
    } else {
      for (int i = 0, p = at; i < count; i++, p += recordLength) {
        gps[i] = b.getDouble(p);
      }
    }
    fillU16(b, format.rgbOffset(), count, c.red());
    fillU16(b, format.rgbOffset() < 0 ? -1 : format.rgbOffset() + 2, count, c.green());
    fillU16(b, format.rgbOffset() < 0 ? -1 : format.rgbOffset() + 4, count, c.blue());
    fillU16(b, format.nirOffset(), count, c.nir());
  }

  /** Reads an unsigned 16-bit field at {@code at} of each record, or zeros when {@code at < 0}. */
  private void fillU16(ByteBuffer b, int at, int count, int[] out) {
    if (at < 0) {
      Arrays.fill(out, 0, count, 0);
      return;
    }
    for (int i = 0, p = at; i < count; i++, p += recordLength) {
      out[i] = b.getShort(p) & 0xFFFF;
    }
  }
}
