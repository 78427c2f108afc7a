package org.clearance.clearance;

import java.util.List;
import java.util.Objects;

/**
 * The layout of {@code near-points.bin}, the file in which the clearance engine keeps every
 * vegetation point near a conductor with its distances, so that rule profiles can be re-evaluated
 * without reading the survey again.
 *
 * <p>Little-endian binary. Header: the 8 ASCII bytes {@code CLRNEAR1}; int32 number of
 * conditions, then per condition its name and report group; int32 number of spans, then each span
 * id; int32 number of conductor names, then each name (every string is an int16 byte length and
 * UTF-8 bytes). Records follow to the end of the file, each: int32 span index; float64 x, y, z
 * (metres, survey CRS scaled to metres); int16 ASPRS class; float32 height above ground (m, NaN
 * when unknown); then per condition, in header order: float32 distance, horizontal, vertical (m),
 * int16 conductor index, float32 station (m). Float32 keeps distances to well under a millimetre
 * at the ranges stored (below a few hundred metres).
 *
 * @param conditions condition names, the surveyed state first
 * @param groups report group of each condition ({@code survey}, {@code hot}, {@code blowout},
 *     {@code ice})
 * @param spanIds span ids that records refer to by index
 * @param conductors conductor names that records refer to by index
 */
public record NearPointFile(
    List<String> conditions, List<String> groups, List<String> spanIds, List<String> conductors) {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "near-points.bin";
  /** Magic bytes and format version. */
  static final byte[] MAGIC = {'C', 'L', 'R', 'N', 'E', 'A', 'R', '1'};
  /** Bytes of a record before the per-condition part. */
  static final int FIXED_BYTES = 4 + 3 * 8 + 2 + 4;
  /** Bytes per condition in a record. */
  static final int CONDITION_BYTES = 3 * 4 + 2 + 4;

  public NearPointFile {
    conditions = List.copyOf(conditions);
    groups = List.copyOf(groups);
    spanIds = List.copyOf(spanIds);
    conductors = List.copyOf(conductors);
    if (conditions.size() != groups.size()) {
      throw new IllegalArgumentException("one group per condition");
    }
    if (conditions.isEmpty()) {
      throw new IllegalArgumentException("at least the surveyed state");
    }
    if (conductors.size() > Short.MAX_VALUE) {
      throw new IllegalArgumentException("too many conductor names: " + conductors.size());
    }
    conditions.forEach(Objects::requireNonNull);
  }

  /** Bytes of one record. */
  public int recordBytes() {
    return FIXED_BYTES + CONDITION_BYTES * conditions.size();
  }
}
