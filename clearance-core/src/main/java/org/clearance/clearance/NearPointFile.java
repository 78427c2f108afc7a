package org.clearance.clearance;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.clearance.line.ConductorPosition.Role;

/**
 * The layout of {@code near-points.bin}, the file in which the clearance engine keeps every
 * vegetation point near a conductor with its distances, so that rule profiles can be re-evaluated
 * without reading the survey again.
 *
 * <p>Little-endian binary. Header: the 8 ASCII bytes {@code CLRNEAR3} (format 3); int32 number of
 * conditions, then per condition its name and report group; int32 number of spans, then each span
 * id; int32 number of conductor names, then each name; int32 number of conductor roles measured,
 * then each role ({@code phase} first, then {@code neutral} and/or {@code shield} when some span
 * has them; then, when some span's energised conductors carry more than one voltage (issue 15),
 * one entry {@code phase@<kV>} per voltage, e.g. {@code phase@12.47}; every string is an int16
 * byte length and UTF-8 bytes). Records follow to the end of
 * the file, each: int32 span index; float64 x, y, z (metres, survey CRS scaled to metres); int16
 * ASPRS class in the low 8 bits, plus {@link #WIRE_TOUCHED_BIT} for a point on a wire touched by
 * vegetation ({@code PointClearance.wireTouched}; files written before it never set it); float32 height above ground (m, NaN when unknown); then per role, in header
 * order, per condition, in header order: float32 distance, horizontal, vertical (m), int16
 * conductor index (-1: none of that role), float32 station (m): the nearest conductor of that
 * role; then the same per voltage entry: the nearest energised conductor of that voltage. Float32 keeps distances to well under a
 * millimetre at the ranges stored (below a few hundred metres). Records are sorted by span index,
 * then x, y and z, then their remaining bytes, so the same survey gives the same file whatever
 * the order the reading threads met the points in. Trailer: the 8 ASCII bytes {@code CLRNEND3},
 * int64 number of records, and the CRC-32C (Castagnoli; RFC 3720 appendix B.4) of every byte
 * before the trailer, so a truncated or damaged file is recognised before it is used.
 *
 * @param conditions condition names, the surveyed state first
 * @param groups report group of each condition ({@code survey}, {@code hot}, {@code blowout},
 *     {@code ice})
 * @param spanIds span ids that records refer to by index
 * @param conductors conductor names that records refer to by index
 * @param roles conductor roles whose nearest distances each record holds, {@code PHASE} first
 * @param voltages voltages (kV) whose nearest energised conductor each record holds too, for
 *     spans whose circuits carry different voltages; empty when none does
 */
public record NearPointFile(
    List<String> conditions, List<String> groups, List<String> spanIds, List<String> conductors,
    List<Role> roles, List<Double> voltages) {

  /** Prefix of a voltage entry in the header's role list. */
  static final String VOLTAGE_PREFIX = "phase@";

  /** File name inside a run folder. */
  public static final String FILE_NAME = "near-points.bin";
  /** Magic bytes and format version. */
  /** Bit of the class field marking a point on a wire touched by vegetation. */
  static final int WIRE_TOUCHED_BIT = 0x100;

  static final byte[] MAGIC = {'C', 'L', 'R', 'N', 'E', 'A', 'R', '3'};
  /** Magic bytes of the trailer. */
  static final byte[] END = {'C', 'L', 'R', 'N', 'E', 'N', 'D', '3'};
  /** Byte offsets of the span index and of x, y, z in a record. */
  private static final int[] KEY_DOUBLES = {4, 12, 20};
  /** Bytes of a record before the per-condition part. */
  static final int FIXED_BYTES = 4 + 3 * 8 + 2 + 4;
  /** Bytes per condition in a record. */
  static final int CONDITION_BYTES = 3 * 4 + 2 + 4;

  public NearPointFile {
    conditions = List.copyOf(conditions);
    groups = List.copyOf(groups);
    spanIds = List.copyOf(spanIds);
    conductors = List.copyOf(conductors);
    roles = List.copyOf(roles);
    voltages = List.copyOf(voltages);
    for (double v : voltages) {
      if (!(Double.isFinite(v) && v > 0)) {
        throw new IllegalArgumentException("voltage entries must be positive: " + voltages);
      }
    }
    if (voltages.size() != Set.copyOf(voltages).size()) {
      throw new IllegalArgumentException("a voltage is listed twice: " + voltages);
    }
    if (roles.isEmpty() || roles.get(0) != Role.PHASE || roles.size() != Set.copyOf(roles).size()) {
      throw new IllegalArgumentException("roles must start with phase and name each role once: "
          + roles);
    }
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
    return FIXED_BYTES + CONDITION_BYTES * conditions.size() * (roles.size() + voltages.size());
  }

  /** A layout without distances by voltage. */
  public NearPointFile(List<String> conditions, List<String> groups, List<String> spanIds,
      List<String> conductors, List<Role> roles) {
    this(conditions, groups, spanIds, conductors, roles, List.of());
  }

  /** A layout measuring energised (phase) conductors only. */
  public NearPointFile(List<String> conditions, List<String> groups, List<String> spanIds,
      List<String> conductors) {
    this(conditions, groups, spanIds, conductors, List.of(Role.PHASE));
  }

  /**
   * The order of records in the file: span index, then x, y, z, then the remaining bytes
   * (unsigned), so that only byte-identical records compare equal.
   */
  static int compareRecords(byte[] a, int ai, byte[] b, int bi, int recordBytes) {
    ByteBuffer ba = ByteBuffer.wrap(a).order(ByteOrder.LITTLE_ENDIAN);
    ByteBuffer bb = ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN);
    int c = Integer.compare(ba.getInt(ai), bb.getInt(bi));
    for (int k = 0; c == 0 && k < KEY_DOUBLES.length; k++) {
      c = Double.compare(ba.getDouble(ai + KEY_DOUBLES[k]), bb.getDouble(bi + KEY_DOUBLES[k]));
    }
    int rest = KEY_DOUBLES[KEY_DOUBLES.length - 1] + 8;
    return c != 0 ? c : Arrays.compareUnsigned(a, ai + rest, ai + recordBytes, b, bi + rest,
        bi + recordBytes);
  }
}
