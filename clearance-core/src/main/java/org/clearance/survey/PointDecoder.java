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
