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

/**
 * Reads {@link PolePointFile pole-points.bin} back, streaming. Another format version, a
 * truncated or extended file, a checksum that does not match, an index outside the header or a
 * value out of range is an {@link InputException} naming the file and record.
 */
public final class PolePointReader {

  private static final String RERUN = RecordFiles.RERUN;

  private PolePointReader() {}

  /**
   * Calls {@code sink} for every record in file order and returns the header. The checksum is
   * checked at the end: a damaged file throws after some records were passed on.
   */
  public static PolePointFile forEach(Path file, Consumer<PolePoint> sink) throws IOException {
    long size = Files.size(file);
    CRC32C crc = new CRC32C();
    try (DataInputStream in = new DataInputStream(new CheckedInputStream(
        new BufferedInputStream(Files.newInputStream(file), RecordFiles.BUFFER_BYTES), crc))) {
      long[] bytes = {0};
      PolePointFile layout = header(file, in, size, bytes);
      int rb = PolePointFile.RECORD_BYTES;
      long records = RecordFiles.records(file, size, bytes[0], rb);
      byte[] rec = new byte[rb];
      ByteBuffer buf = ByteBuffer.wrap(rec).order(ByteOrder.LITTLE_ENDIAN);
      for (long index = 0; index < records; index++) {
        in.readFully(rec);
        buf.clear();
        String where = "record " + index;
        int s = buf.getInt();
        if (s < 0 || s >= layout.structures().size()) {
          throw new InputException(file, where, "structure index", "structure index " + s
              + " outside the header's " + layout.structures().size() + RERUN);
        }
        double x = buf.getDouble();
        double y = buf.getDouble();
        double z = buf.getDouble();
        int cls = buf.getShort();
        double hag = buf.getFloat();
        double plan = buf.getFloat();
        if (!(Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z))
            || !(plan >= 0 && plan <= layout.keepRadiusM() * (1 + 1e-6))
            || hag > layout.keepHeightM() * (1 + 1e-6)) {
          throw new InputException(file, where, "distance", "position, plan distance or "
              + "height outside what the header keeps" + RERUN);
        }
        PolePointFile.Pole p = layout.structures().get(s);
        sink.accept(new PolePoint(p.lineId(), p.structureId(), x, y, z, cls, hag, plan));
      }
      RecordFiles.checkTrailer(file, in, crc, PolePointFile.END, records);
      return layout;
    } catch (EOFException e) {
      throw new InputException(file, null, null, "ends early" + RERUN);
    }
  }

  private static PolePointFile header(Path file, DataInputStream in, long size, long[] bytes)
      throws IOException {
    byte[] magic = in.readNBytes(PolePointFile.MAGIC.length);
    if (!Arrays.equals(magic, PolePointFile.MAGIC)) {
      boolean other = magic.length == 8 && new String(magic, 0, 7, StandardCharsets.US_ASCII)
          .equals("CLRPOLE");
      throw new InputException(file, "header", "format", other
          ? "pole-points format " + (char) magic[7] + ", this version reads format "
              + (char) PolePointFile.MAGIC[7] + ": run the check again with this version"
          : "not a pole-points file (no CLRPOLE1 marker)" + RERUN);
    }
    double radius = Double.longBitsToDouble(Long.reverseBytes(in.readLong()));
    double height = Double.longBitsToDouble(Long.reverseBytes(in.readLong()));
    double column = Double.longBitsToDouble(Long.reverseBytes(in.readLong()));
    int n = Integer.reverseBytes(in.readInt());
    bytes[0] = magic.length + 3 * 8 + 4;
    // each structure takes at least two string lengths and three 8-byte numbers
    if (n < 0 || n > (size - bytes[0]) / (2 * 2 + 3 * 8)) {
      throw new InputException(file, "header", "structures", "list of " + n
          + " structures cannot fit in the file's " + size + " bytes" + RERUN);
    }
    List<PolePointFile.Pole> poles = new ArrayList<>(n);
    try {
      for (int i = 0; i < n; i++) {
        String line = RecordFiles.readString(in, bytes);
        String id = RecordFiles.readString(in, bytes);
        double x = Double.longBitsToDouble(Long.reverseBytes(in.readLong()));
        double y = Double.longBitsToDouble(Long.reverseBytes(in.readLong()));
        long count = Long.reverseBytes(in.readLong());
        bytes[0] += 3 * 8;
        poles.add(new PolePointFile.Pole(line, id, x, y, count));
      }
      return new PolePointFile(radius, height, column, poles);
    } catch (IllegalArgumentException e) {
      throw new InputException(file, "header", null, e.getMessage() + RERUN);
    } catch (EOFException e) {
      throw new InputException(file, "header", null, "file ends inside its header" + RERUN);
    }
  }
}
