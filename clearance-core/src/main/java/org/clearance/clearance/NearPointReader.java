package org.clearance.clearance;

import java.io.BufferedInputStream;
import java.io.DataInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Consumer;
import java.util.zip.CRC32C;
import java.util.zip.CheckedInputStream;
import org.clearance.InputException;
import org.clearance.line.ConductorPosition.Role;

/**
 * Reads {@link NearPointFile near-points.bin} back, streaming, one record at a time. A file of
 * another format version, a truncated file, a checksum that does not match or an index outside
 * the header is an {@link InputException} naming the file (and the record), never another
 * exception.
 */
public final class NearPointReader {

  /** Stream buffer. */
  private static final int BUFFER_BYTES = RecordFiles.BUFFER_BYTES;
  /** What a damaged file's message ends with. */
  private static final String RERUN = RecordFiles.RERUN;

  private NearPointReader() {}

  /** Reads only the header (format version and lists), without checking the records. */
  public static NearPointFile header(Path file) throws IOException {
    long size = Files.size(file);
    try (DataInputStream in = new DataInputStream(new BufferedInputStream(
        Files.newInputStream(file), BUFFER_BYTES))) {
      return readHeader(file, in, size).layout;
    }
  }

  /**
   * Reads the whole file once and checks its size, record count, indices and checksum.
   *
   * @return the header
   * @throws InputException naming the file when it is damaged or of another format
   */
  public static NearPointFile verify(Path file) throws IOException {
    return forEach(file, p -> { });
  }

  /**
   * Calls {@code sink} for every record in file order; returns the header. The checksum is
   * checked at the end: a damaged file throws after some records were passed on, so a caller
   * discards what it built (as the run folder's staging does).
   */
  public static NearPointFile forEach(Path file, Consumer<PointClearance> sink) throws IOException {
    long size = Files.size(file);
    CRC32C crc = new CRC32C();
    try (DataInputStream in = new DataInputStream(new CheckedInputStream(
        new BufferedInputStream(Files.newInputStream(file), BUFFER_BYTES), crc))) {
      Header h = readHeader(file, in, size);
      NearPointFile layout = h.layout;
      int n = layout.conditions().size();
      int rb = layout.recordBytes();
      long records = RecordFiles.records(file, size, h.bytes, rb);
      byte[] rec = new byte[rb];
      ByteBuffer buf = ByteBuffer.wrap(rec).order(ByteOrder.LITTLE_ENDIAN);
      for (long index = 0; index < records; index++) {
        in.readFully(rec);
        buf.clear();
        String where = "record " + index;
        int span = buf.getInt();
        if (span < 0 || span >= layout.spanIds().size()) {
          throw new InputException(file, where, "span index", "span index " + span
              + " outside the header's " + layout.spanIds().size() + RERUN);
        }
        double x = buf.getDouble();
        double y = buf.getDouble();
        double z = buf.getDouble();
        int field = buf.getShort() & 0xFFFF;
        if ((field & ~(0xFF | NearPointFile.WIRE_TOUCHED_BIT)) != 0) {
          throw new InputException(file, where, "class", "class field " + field
              + " is no ASPRS class (0-255) with the touched-wire mark" + RERUN);
        }
        int cls = field & 0xFF;
        boolean touched = (field & NearPointFile.WIRE_TOUCHED_BIT) != 0;
        double hag = buf.getFloat();
        List<List<ConditionDistance>> byRole = new ArrayList<>();
        List<Role> entries = new ArrayList<>(layout.roles());
        for (int v = 0; v < layout.voltages().size(); v++) {
          entries.add(Role.PHASE);
        }
        for (int e = 0; e < entries.size(); e++) {
          Role role = e < layout.roles().size() ? entries.get(e) : null;
          List<ConditionDistance> ds = new ArrayList<>(n);
          for (int c = 0; c < n; c++) {
            double d = buf.getFloat();
            double hz = buf.getFloat();
            double v = buf.getFloat();
            int conductor = buf.getShort();
            double st = buf.getFloat();
            if (conductor < -1 || conductor >= layout.conductors().size()) {
              throw new InputException(file, where, "conductor index", "conductor index "
                  + conductor + " outside the header's " + layout.conductors().size() + RERUN);
            }
            ds.add(new ConditionDistance(layout.conditions().get(c), layout.groups().get(c), d,
                hz, v, conductor < 0 ? "" : layout.conductors().get(conductor), st));
          }
          boolean none = role != Role.PHASE
              && ds.stream().allMatch(d -> d.conductor().isEmpty());
          byRole.add(none ? List.of() : ds);
        }
        List<PointClearance.VoltageDistances> circuits = new ArrayList<>();
        for (int v = 0; v < layout.voltages().size(); v++) {
          List<ConditionDistance> ds = byRole.get(layout.roles().size() + v);
          if (!ds.isEmpty()) {
            circuits.add(new PointClearance.VoltageDistances(layout.voltages().get(v), ds));
          }
        }
        sink.accept(new PointClearance(layout.spanIds().get(span), x, y, z, cls, hag,
            byRole.get(0), roleList(layout, byRole, Role.NEUTRAL),
            roleList(layout, byRole, Role.SHIELD), circuits, touched));
      }
      RecordFiles.checkTrailer(file, in, crc, NearPointFile.END, records);
      return layout;
    } catch (EOFException e) {
      throw new InputException(file, null, null, "ends early" + RERUN);
    }
  }

  private static List<ConditionDistance> roleList(NearPointFile layout,
      List<List<ConditionDistance>> byRole, Role role) {
    int i = layout.roles().indexOf(role);
    return i < 0 ? List.of() : byRole.get(i);
  }

  /** A header and its length in bytes. */
  private record Header(NearPointFile layout, long bytes) {}

  private static Header readHeader(Path file, DataInputStream in, long size) throws IOException {
    try {
      byte[] magic = in.readNBytes(NearPointFile.MAGIC.length);
      if (!Arrays.equals(magic, NearPointFile.MAGIC)) {
        boolean older = magic.length == 8 && new String(magic, 0, 7, StandardCharsets.US_ASCII)
            .equals("CLRNEAR");
        throw new InputException(file, "header", "format", older
            ? "near-points format " + (char) magic[7] + ", this version reads format "
                + (char) NearPointFile.MAGIC[7] + ": run the check again with this version"
            : "not a near-points file (no CLRNEAR3 marker)" + RERUN);
      }
      long[] bytes = {magic.length};
      List<String> conditions = readStrings(file, in, size, bytes);
      List<String> groups = new ArrayList<>();
      for (int i = 0; i < conditions.size(); i++) {
        groups.add(RecordFiles.readString(in, bytes));
      }
      List<String> spans = readStrings(file, in, size, bytes);
      List<String> conductors = readStrings(file, in, size, bytes);
      List<Role> roles = new ArrayList<>();
      List<Double> voltages = new ArrayList<>();
      for (String r : readStrings(file, in, size, bytes)) {
        if (r.startsWith(NearPointFile.VOLTAGE_PREFIX)) {
          try {
            voltages.add(Double.parseDouble(r.substring(NearPointFile.VOLTAGE_PREFIX.length())));
          } catch (NumberFormatException e) {
            throw new InputException(file, "header", "role", "unknown conductor role '" + r
                + "'" + RERUN);
          }
          continue;
        }
        if (!voltages.isEmpty()) {
          throw new InputException(file, "header", "role", "conductor role '" + r
              + "' after the voltage entries" + RERUN);
        }
        roles.add(switch (r) {
          case "phase" -> Role.PHASE;
          case "neutral" -> Role.NEUTRAL;
          case "shield" -> Role.SHIELD;
          default -> throw new InputException(file, "header", "role", "unknown conductor role '"
              + r + "'" + RERUN);
        });
      }
      try {
        return new Header(new NearPointFile(conditions, groups, spans, conductors, roles,
            voltages), bytes[0]);
      } catch (IllegalArgumentException e) {
        throw new InputException(file, "header", null, e.getMessage() + RERUN);
      }
    } catch (EOFException e) {
      throw new InputException(file, "header", null, "file ends inside its header" + RERUN);
    }
  }

  private static List<String> readStrings(Path file, DataInputStream in, long size,
      long[] bytes) throws IOException {
    int n = Integer.reverseBytes(in.readInt());
    bytes[0] += 4;
    // every string takes at least its 2-byte length
    if (n < 0 || n > (size - bytes[0]) / 2) {
      throw new InputException(file, "header", "list length", "list of " + n
          + " names cannot fit in the file's " + size + " bytes" + RERUN);
    }
    List<String> out = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      out.add(RecordFiles.readString(in, bytes));
    }
    return out;
  }
}
