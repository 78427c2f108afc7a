package org.clearance.examples;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Rewrites a LAS file in place as a survey whose echoes are not recorded: every point return 1
 * of 1 (as some vendors deliver them, and as a file thinned to one return a pulse reads), the
 * header's points by return all in the first. ASPRS LAS 1.4 R15: the return byte is byte 14 of
 * every point record (formats 0-5: return number bits 0-2, number of returns bits 3-5; formats
 * 6-10: bits 0-3 and 4-7), the header's point data offset at byte 96, format at 104, record
 * length at 105, legacy count at 107, legacy points by return at 111 (5 x 4 bytes) and, from LAS
 * 1.4, the count at 247 and points by return at 255 (15 x 8 bytes).
 */
final class SingleReturns {
  private SingleReturns() {}

  static void rewrite(Path las) throws IOException {
    try (FileChannel ch = FileChannel.open(las, StandardOpenOption.READ,
        StandardOpenOption.WRITE)) {
      ByteBuffer h = ByteBuffer.allocate(375).order(ByteOrder.LITTLE_ENDIAN);
      ch.read(h, 0);
      int minor = h.get(25) & 0xFF;
      long offset = h.getInt(96) & 0xFFFFFFFFL;
      int format = h.get(104) & 0x3F;
      int length = h.getShort(105) & 0xFFFF;
      long count = minor >= 4 && h.getLong(247) != 0 ? h.getLong(247) : h.getInt(107) & 0xFFFFFFFFL;
      byte one = (byte) (format >= 6 ? 0x11 : 0x09);
      byte keep = (byte) (format >= 6 ? 0x00 : 0xC0);
      ByteBuffer rec = ByteBuffer.allocate(length);
      for (long i = 0; i < count; i++) {
        long at = offset + i * length;
        rec.clear();
        ch.read(rec, at);
        rec.put(14, (byte) ((rec.get(14) & keep) | one));
        rec.flip();
        ch.write(rec, at);
      }
      ByteBuffer counts = ByteBuffer.allocate(20).order(ByteOrder.LITTLE_ENDIAN);
      counts.putInt(0, (h.getInt(107) != 0) ? (int) count : 0);
      ch.write(counts, 111);
      if (minor >= 4) {
        ByteBuffer wide = ByteBuffer.allocate(120).order(ByteOrder.LITTLE_ENDIAN);
        wide.putLong(0, count);
        ch.write(wide, 255);
      }
    }
  }
}
