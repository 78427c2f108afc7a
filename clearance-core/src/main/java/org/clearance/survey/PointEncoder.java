package org.clearance.survey;

import java.nio.ByteBuffer;
import java.util.Locale;

/**
 * Packs {@link PointChunk} points into LAS point records (layout as {@link PointDecoder}) and
 * keeps the running totals the header needs: point count, counts by return, integer extent.
 */
final class PointEncoder {
  /** Scan angle rank limits of formats 0-5, degrees (LAS 1.4 R15, table 7). */
  static final int MAX_SCAN_RANK = 90;
  /** Scan angle limits of formats 6-10, in 0.006 degree steps (+-180 degrees). */
  static final int MAX_SCAN_STEPS = 30_000;

  private final PointFormat format;
  private final int recordLength;
  private final double sx;
  private final double sy;
  private final double sz;
  private final double ox;
  private final double oy;
  private final double oz;
  private final double horizontal;
  private final double vertical;

  private long count;
  private final long[] byReturn = new long[15];
  private int minX = Integer.MAX_VALUE;
  private int minY = Integer.MAX_VALUE;
  private int minZ = Integer.MAX_VALUE;
  private int maxX = Integer.MIN_VALUE;
  private int maxY = Integer.MIN_VALUE;
  private int maxZ = Integer.MIN_VALUE;

  PointEncoder(LasWriterOptions o) {
    format = o.pointFormat();
    recordLength = o.recordLength();
    sx = o.scaleX();
    sy = o.scaleY();
    sz = o.scaleZ();
    ox = o.offsetX();
    oy = o.offsetY();
    oz = o.offsetZ();
    horizontal = o.crs().map(u -> u.horizontal().metres()).orElse(1.0);
    vertical = o.crs().map(u -> u.vertical().metres()).orElse(1.0);
  }

  /**
   * Packs all points of {@code c} into {@code out} from position 0 (little-endian, zeroed
   * beforehand by the caller's clear of extra and wave packet bytes).
   *
   * @throws IllegalArgumentException when a value does not fit the format, naming the point
   */
  void encode(PointChunk c, ByteBuffer out) {
    for (int i = 0; i < c.size(); i++) {
      int p = i * recordLength;
      int xi = quantize(c.x()[i] / horizontal, ox, sx, "x", i);
      int yi = quantize(c.y()[i] / horizontal, oy, sy, "y", i);
      int zi = quantize(c.z()[i] / vertical, oz, sz, "z", i);
      out.putInt(p, xi).putInt(p + 4, yi).putInt(p + 8, zi);
      out.putShort(p + 12, (short) check(c.intensity()[i], 0xFFFF, "intensity", i));
      int rn = check(c.returnNumber()[i], format.maxReturnNumber(), "return number", i);
      int nr = check(c.numberOfReturns()[i], format.maxReturnNumber(), "number of returns", i);
      int cls = check(c.classification()[i], format.maxClassification(), "classification", i);
      int flags = c.flags()[i];
      int dir = c.scanDirection()[i] & 1;
      int edge = c.edgeOfFlightLine()[i] & 1;
      if (format.isExtended()) {
        int channel = check(c.scannerChannel()[i], 3, "scanner channel", i);
        out.put(p + 14, (byte) (rn | nr << 4));
        out.put(p + 15, (byte) ((flags & 15) | channel << 4 | dir << 6 | edge << 7));
        out.put(p + 16, (byte) cls);
        out.put(p + 17, (byte) check(c.userData()[i], 0xFF, "user data", i));
        long steps = Math.round(c.scanAngle()[i] / PointDecoder.SCAN_ANGLE_STEP);
        out.putShort(p + 18, (short) checkSigned(steps, MAX_SCAN_STEPS, "scan angle", i));
        out.putShort(p + 20, (short) check(c.pointSourceId()[i], 0xFFFF, "point source id", i));
      } else {
        out.put(p + 14, (byte) (rn | nr << 3 | dir << 6 | edge << 7));
        out.put(p + 15, (byte) (cls | (flags & 7) << 5));
        long rank = Math.round(c.scanAngle()[i]);
        out.put(p + 16, (byte) checkSigned(rank, MAX_SCAN_RANK, "scan angle rank", i));
        out.put(p + 17, (byte) check(c.userData()[i], 0xFF, "user data", i));
        out.putShort(p + 18, (short) check(c.pointSourceId()[i], 0xFFFF, "point source id", i));
      }
      if (format.hasGpsTime()) {
        double t = c.gpsTime()[i];
        out.putDouble(p + format.gpsOffset(), Double.isNaN(t) ? 0 : t);
      }
      if (format.hasRgb()) {
        out.putShort(p + format.rgbOffset(), (short) check(c.red()[i], 0xFFFF, "red", i));
        out.putShort(p + format.rgbOffset() + 2, (short) check(c.green()[i], 0xFFFF, "green", i));
        out.putShort(p + format.rgbOffset() + 4, (short) check(c.blue()[i], 0xFFFF, "blue", i));
      }
      if (format.hasNir()) {
        out.putShort(p + format.nirOffset(), (short) check(c.nir()[i], 0xFFFF, "nir", i));
      }
      if (rn >= 1) {
        byReturn[rn - 1]++;
      }
      minX = Math.min(minX, xi);
      minY = Math.min(minY, yi);
      minZ = Math.min(minZ, zi);
      maxX = Math.max(maxX, xi);
      maxY = Math.max(maxY, yi);
      maxZ = Math.max(maxZ, zi);
    }
    count += c.size();
  }

  private static int quantize(double v, double offset, double scale, String axis, int i) {
    double q = Math.rint((v - offset) / scale);
    if (!(q >= Integer.MIN_VALUE && q <= Integer.MAX_VALUE)) {
      throw new IllegalArgumentException(String.format(Locale.ROOT,
          "point %d: %s = %s does not fit a 32-bit integer with offset %s and scale %s",
          i, axis, v, offset, scale));
    }
    return (int) q;
  }

  private static int check(int v, int max, String what, int i) {
    if (v < 0 || v > max) {
      throw new IllegalArgumentException(
          "point " + i + ": " + what + " " + v + " outside 0-" + max + " for this format");
    }
    return v;
  }

  private static long checkSigned(long v, int limit, String what, int i) {
    if (v < -limit || v > limit) {
      throw new IllegalArgumentException(
          "point " + i + ": " + what + " " + v + " outside +-" + limit + " for this format");
    }
    return v;
  }

  long count() {
    return count;
  }

  /** Point counts by return number 1-15. */
  long[] byReturn() {
    return byReturn.clone();
  }

  /** Integer extent {minX, minY, minZ, maxX, maxY, maxZ}; meaningful only when count &gt; 0. */
  int[] extent() {
    return new int[] {minX, minY, minZ, maxX, maxY, maxZ};
  }
}
