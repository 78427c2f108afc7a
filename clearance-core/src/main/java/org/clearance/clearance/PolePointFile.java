package org.clearance.clearance;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * The layout of {@code pole-points.bin}: the vegetation points within {@link #keepRadiusM()} in
 * plan of each structure centre and at most {@link #keepHeightM()} above ground, so that
 * pole-clearing zones (cylinders around a structure; docs/rules.md) can be evaluated, and
 * evaluated again with other radii or height bands, without reading the survey.
 *
 * <p>Little-endian binary. Header: the 8 ASCII bytes {@code CLRPOLE1} (format 1); float64 keep
 * radius (m), float64 keep height (m), float64 radius of the pole column set aside in a survey
 * without vegetation labels (m; NaN in a labelled survey); int32 number of structures, then per
 * structure: line id and structure id (int16 byte length and UTF-8 bytes each), float64 x, y of
 * its centre (m), int64 number of points set aside as the pole's own column. Records follow,
 * each: int32 structure index; float64 x, y, z (m); int16 ASPRS class; float32 height above
 * ground (m, NaN when unknown); float32 plan distance from the structure centre (m). Records are
 * sorted by structure index, then x, y, z, then their remaining bytes, so the file does not
 * depend on the order the reading threads met the points in. Trailer: the 8 ASCII bytes
 * {@code CLRPEND1}, int64 number of records, and the CRC-32C (Castagnoli; RFC 3720 appendix B.4)
 * of every byte before the trailer.
 *
 * @param keepRadiusM points within this plan distance of a structure centre are stored, m
 * @param keepHeightM points at most this high above ground are stored, m
 * @param columnRadiusM in a survey without vegetation labels, points within this plan distance
 *     of the centre are the pole itself and are set aside (counted), m; NaN when labelled
 * @param structures the structures, in the order records refer to them
 */
public record PolePointFile(double keepRadiusM, double keepHeightM, double columnRadiusM,
    List<Pole> structures) {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "pole-points.bin";
  /** Magic bytes and format version. */
  static final byte[] MAGIC = {'C', 'L', 'R', 'P', 'O', 'L', 'E', '1'};
  /** Magic bytes of the trailer. */
  static final byte[] END = {'C', 'L', 'R', 'P', 'E', 'N', 'D', '1'};
  /** Bytes of a record. */
  static final int RECORD_BYTES = 4 + 3 * 8 + 2 + 4 + 4;
  /** Byte offsets of x, y, z in a record. */
  private static final int[] KEY_DOUBLES = {4, 12, 20};

  /**
   * A structure of the file.
   *
   * @param lineId line id
   * @param structureId structure id
   * @param x easting of the centre, m
   * @param y northing of the centre, m
   * @param columnPoints points set aside as the pole's own column (unlabelled surveys)
   */
  public record Pole(String lineId, String structureId, double x, double y, long columnPoints) {
    public Pole {
      Objects.requireNonNull(lineId, "lineId");
      Objects.requireNonNull(structureId, "structureId");
      if (!(Double.isFinite(x) && Double.isFinite(y)) || columnPoints < 0) {
        throw new IllegalArgumentException("structure " + structureId
            + ": centre and column count must be finite and >= 0");
      }
    }

    /** Key of the structure: line id and structure id. */
    public String key() {
      return lineId + "\u0000" + structureId;
    }
  }

  public PolePointFile {
    structures = List.copyOf(structures);
    if (!(Double.isFinite(keepRadiusM) && keepRadiusM > 0 && Double.isFinite(keepHeightM)
        && keepHeightM > 0)) {
      throw new IllegalArgumentException("keep radius and height must be positive: "
          + keepRadiusM + ", " + keepHeightM);
    }
    if (!(Double.isNaN(columnRadiusM) || columnRadiusM >= 0 && columnRadiusM < keepRadiusM)) {
      throw new IllegalArgumentException("pole column radius must be NaN or 0 to the keep "
          + "radius: " + columnRadiusM);
    }
    Set<String> keys = new HashSet<>();
    for (Pole p : structures) {
      if (!keys.add(p.key())) {
        throw new IllegalArgumentException("structure " + p.structureId() + " of line "
            + p.lineId() + " is listed twice");
      }
    }
  }

  /** Record order: structure index, then x, y, z, then the remaining bytes (unsigned). */
  static int compareRecords(byte[] a, int ai, byte[] b, int bi) {
    ByteBuffer ba = ByteBuffer.wrap(a).order(ByteOrder.LITTLE_ENDIAN);
    ByteBuffer bb = ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN);
    int c = Integer.compare(ba.getInt(ai), bb.getInt(bi));
    for (int k = 0; c == 0 && k < KEY_DOUBLES.length; k++) {
      c = Double.compare(ba.getDouble(ai + KEY_DOUBLES[k]), bb.getDouble(bi + KEY_DOUBLES[k]));
    }
    int rest = KEY_DOUBLES[KEY_DOUBLES.length - 1] + 8;
    return c != 0 ? c : Arrays.compareUnsigned(a, ai + rest, ai + RECORD_BYTES, b, bi + rest,
        bi + RECORD_BYTES);
  }
}
