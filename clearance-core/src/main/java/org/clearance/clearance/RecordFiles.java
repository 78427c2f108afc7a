package org.clearance.clearance;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.zip.CRC32C;
import java.util.zip.CheckedOutputStream;
import org.clearance.InputException;
import org.clearance.io.AtomicFiles;
import org.clearance.io.RecordSort;

/**
 * What the run folder's binary point files ({@link NearPointFile near-points.bin},
 * {@link PolePointFile pole-points.bin}) share: a header, fixed-size little-endian records sorted
 * by their content, and a trailer of an 8-byte end marker, the int64 number of records and the
 * CRC-32C (Castagnoli; RFC 3720 appendix B.4) of every byte before the trailer; strings are an
 * int16 byte length and their UTF-8 bytes.
 */
final class RecordFiles {

  /** Bytes buffered per stream. */
  static final int BUFFER_BYTES = 1 << 20;
  /** Bytes of the trailer: end marker, int64 count, int32 CRC-32C. */
  static final int TRAILER_BYTES = 8 + 8 + 4;
  /** Ends every message about a damaged file. */
  static final String RERUN = "; the run folder is damaged: run the check again";

  private RecordFiles() {}

  /**
   * Writes {@code header}, the records of {@code unsorted} in {@code order} and the trailer to
   * {@code target}, atomically.
   */
  static void writeSorted(Path target, byte[] header, Path unsorted, int recordBytes,
      RecordSort.Order order, byte[] end) throws IOException {
    AtomicFiles.write(target, raw -> {
      CRC32C crc = new CRC32C();
      OutputStream o = new CheckedOutputStream(new BufferedOutputStream(raw, BUFFER_BYTES), crc);
      o.write(header);
      long n = RecordSort.sort(unsorted, recordBytes, order, o, RecordSort.RUN_BYTES);
      o.flush();
      o.write(ByteBuffer.allocate(TRAILER_BYTES).order(ByteOrder.LITTLE_ENDIAN).put(end)
          .putLong(n).putInt((int) crc.getValue()).array());
      o.flush();
    });
  }

  /** Appends a string: int16 byte length, UTF-8 bytes. */
  static void writeString(ByteArrayOutputStream b, String s) {
    byte[] bytes = s.getBytes(StandardCharsets.UTF_8);
    if (bytes.length > Short.MAX_VALUE) {
      throw new IllegalArgumentException("string too long: " + s.length());
    }
    b.writeBytes(ByteBuffer.allocate(2).order(ByteOrder.LITTLE_ENDIAN)
        .putShort((short) bytes.length).array());
    b.writeBytes(bytes);
  }

  /** Reads a string written by {@link #writeString}; adds the bytes read to {@code bytes[0]}. */
  static String readString(DataInputStream in, long[] bytes) throws IOException {
    int len = Short.reverseBytes(in.readShort()) & 0xFFFF;
    byte[] b = new byte[len];
    in.readFully(b);
    bytes[0] += 2 + len;
    return new String(b, StandardCharsets.UTF_8);
  }

  /**
   * The number of records between a header of {@code headerBytes} and the trailer of a file of
   * {@code size} bytes.
   *
   * @throws InputException when that is not a whole number of records
   */
  static long records(Path file, long size, long headerBytes, int recordBytes) {
    long data = size - headerBytes - TRAILER_BYTES;
    if (data < 0 || data % recordBytes != 0) {
      throw new InputException(file, null, null, "holds " + size + " bytes, not a whole "
          + "number of " + recordBytes + "-byte records after its header plus its trailer"
          + RERUN);
    }
    return data / recordBytes;
  }

  /**
   * Reads the trailer after the last record and checks its end marker, its record count and its
   * checksum against {@code crc}, the checksum of every byte read before it.
   *
   * @throws InputException when the file was cut, extended or damaged
   */
  static void checkTrailer(Path file, DataInputStream in, CRC32C crc, byte[] end, long records)
      throws IOException {
    long expected = crc.getValue();
    byte[] trailer = new byte[TRAILER_BYTES];
    in.readFully(trailer);
    ByteBuffer t = ByteBuffer.wrap(trailer).order(ByteOrder.LITTLE_ENDIAN);
    byte[] marker = new byte[end.length];
    t.get(marker);
    long count = t.getLong();
    long stored = Integer.toUnsignedLong(t.getInt());
    if (!Arrays.equals(marker, end) || count != records) {
      throw new InputException(file, "trailer", null, "missing or damaged end marker "
          + "(the file was cut or extended)" + RERUN);
    }
    if (stored != expected) {
      throw new InputException(file, "trailer", "checksum", String.format(Locale.ROOT,
          "CRC-32C of the content is %08x, the file says %08x", expected, stored) + RERUN);
    }
  }
}
