package org.clearance.survey;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.InputException;

/**
 * Parses and checks the public header block of a LAS file (ASPRS LAS 1.4 R15, section 2.4;
 * byte offsets below are the specification's).
 */
final class LasHeaderParser {
  /** The file signature every LAS file starts with. */
  static final String SIGNATURE = "LASF";
  /** Bits 6-7 of the point format byte mark compressed (LAZ) point data: common practice. */
  private static final int COMPRESSED_FORMAT_BITS = 0xC0;
  /** Largest value of an unsigned 32-bit field. */
  private static final long U32_MAX = 0xFFFFFFFFL;
  /**
   * Finest scale factor accepted, file units per step: a nanometre (or nano-foot) is far below
   * any survey's precision; a smaller one is a damaged field. Common practice, no source.
   */
  static final double MIN_SCALE = 1e-9;
  /**
   * Coarsest scale factor accepted, file units per step: one metre or foot per step cannot
   * describe a conductor; a larger one (1e308 gave infinite coordinates) is a damaged field.
   * Common practice, no source.
   */
  static final double MAX_SCALE = 1;
  /**
   * Largest coordinate offset or header bound accepted, file units: projected coordinates stay
   * below about 1e8 (UTM northings reach 1e7 m, state plane feet about 3e7). Common practice, no
   * source.
   */
  static final double MAX_COORDINATE = 1e9;

  private LasHeaderParser() {}

  /**
   * Parses the header.
   *
   * @param path the file, for messages
   * @param bytes the first {@code min(fileSize, 375)} bytes of the file, little-endian
   * @param fileSize size of the file, bytes
   * @throws InputException when the header is malformed, naming the field
   */
  static LasHeader parse(Path path, ByteBuffer bytes, long fileSize) {
    ByteBuffer b = bytes.duplicate().order(ByteOrder.LITTLE_ENDIAN);
    if (fileSize == 0) {
      throw new InputException(path, null, null, "empty file (0 bytes), not a LAS file");
    }
    if (fileSize < 4 || !SIGNATURE.equals(text(b, 0, 4))) {
      throw new InputException(
          path, "header", "file signature", "not a LAS file: it does not begin with 'LASF'");
    }
    int minimum = LasHeader.standardHeaderSize(0);
    if (fileSize < minimum) {
      throw truncated(path, fileSize, minimum, "1.x");
    }
    int major = b.get(24) & 0xFF;
    int minor = b.get(25) & 0xFF;
    if (major != 1 || minor > 4) {
      throw new InputException(path, "header", "version", String.format(Locale.ROOT,
          "LAS version %d.%d is not supported (1.0 to 1.4 are read)", major, minor));
    }
    int standard = LasHeader.standardHeaderSize(minor);
    if (fileSize < standard) {
      throw truncated(path, fileSize, standard, major + "." + minor);
    }
    int headerSize = u16(b, 94);
    if (headerSize < standard) {
      throw new InputException(path, "header", "header size", String.format(Locale.ROOT,
          "%d bytes is less than the %d bytes of a LAS %d.%d header",
          headerSize, standard, major, minor));
    }
    if (headerSize > fileSize) {
      throw new InputException(path, "header", "header size", String.format(Locale.ROOT,
          "%d bytes runs past the end of the file (%d bytes)", headerSize, fileSize));
    }
    long offset = u32(b, 96);
    if (offset < headerSize) {
      throw new InputException(path, "header", "offset to point data", String.format(Locale.ROOT,
          "%d lies inside the %d-byte header", offset, headerSize));
    }
    if (offset > fileSize) {
      throw new InputException(path, "header", "offset to point data", String.format(Locale.ROOT,
          "%d lies past the end of the file (%d bytes)", offset, fileSize));
    }
    PointFormat format = format(path, b.get(104) & 0xFF);
    int introduced = format.isExtended() ? 4 : format.hasWavePacket() ? 3 : 0;
    if (minor < introduced) {
      throw new InputException(path, "header", "version", String.format(Locale.ROOT,
          "LAS %d.%d cannot hold point format %d (it was introduced in LAS 1.%d, whose header"
              + " carries its point count); the version or the format field is wrong",
          major, minor, format.id(), introduced));
    }
    int recordLength = u16(b, 105);
    if (recordLength < format.minRecordLength()) {
      throw new InputException(path, "header", "point data record length", String.format(
          Locale.ROOT, "%d bytes is shorter than the %d bytes point format %d needs",
          recordLength, format.minRecordLength(), format.id()));
    }
    double[] scale = finiteTriple(path, b, 131, "scale factor", true);
    double[] shift = finiteTriple(path, b, 155, "offset", false);
    checkScaleAndOffset(path, scale, shift);
    double[] bounds = new double[6];
    String[] boundNames = {"max x", "min x", "max y", "min y", "max z", "min z"};
    for (int i = 0; i < 6; i++) {
      bounds[i] = b.getDouble(179 + 8 * i);
      if (!(Math.abs(bounds[i]) <= MAX_COORDINATE)) {
        throw new InputException(path, "header", boundNames[i], Double.isFinite(bounds[i])
            ? String.format(Locale.ROOT, "%s is beyond the plausible %.0e file units",
                bounds[i], MAX_COORDINATE)
            : "not a finite number");
      }
    }
    long legacyCount = u32(b, 107);
    List<Long> byReturn = new ArrayList<>();
    long waveformStart = minor >= 3 ? b.getLong(227) : 0;
    long evlrStart = 0;
    long evlrCount = 0;
    long count = legacyCount;
    if (minor >= 4) {
      evlrStart = b.getLong(235);
      evlrCount = u32(b, 243);
      long count64 = b.getLong(247);
      if (count64 < 0) {
        throw new InputException(path, "header", "number of point records",
            "64-bit count " + Long.toUnsignedString(count64) + " is too large");
      }
      if (count64 == 0 && legacyCount != 0) {
        count = legacyCount;
      } else {
        if (legacyCount != 0 && legacyCount != count64) {
          throw new InputException(path, "header", "legacy number of point records",
              legacyCount + " disagrees with the 64-bit count " + count64);
        }
        count = count64;
      }
      for (int i = 0; i < 15; i++) {
        byReturn.add(b.getLong(255 + 8 * i));
      }
    } else {
      for (int i = 0; i < 5; i++) {
        byReturn.add(u32(b, 111 + 4 * i));
      }
    }
    long available = fileSize - offset;
    if (count > available / recordLength) {
      throw new InputException(path, "header", "number of point records", String.format(
          Locale.ROOT, "%d points of %d bytes from byte %d need %s bytes but the file has %d",
          count, recordLength, offset, bytesNeeded(offset, count, recordLength), fileSize));
    }
    boolean extendedRecords = minor >= 4 && evlrCount > 0 || minor == 3 && waveformStart != 0;
    long unread = (fileSize - offset) / recordLength - count;
    if (!extendedRecords && unread > 0) {
      throw new InputException(path, "header", minor >= 4 && count != legacyCount
          ? "number of point records" : "legacy number of point records", String.format(
          Locale.ROOT, "the header counts %d points but %d more whole %d-byte records follow"
              + " them up to the end of the file (byte %d); the count or the offset to point"
              + " data is wrong", count, unread, recordLength, fileSize));
    }
    if (count > 0) {
      for (int i = 0; i < 6; i += 2) {
        if (bounds[i + 1] > bounds[i]) {
          throw new InputException(path, "header", boundNames[i + 1], String.format(Locale.ROOT,
              "%s is greater than %s %s", bounds[i + 1], boundNames[i], bounds[i]));
        }
      }
    }
    return new LasHeader(major, minor, u16(b, 4), u16(b, 6), guid(b), text(b, 26, 32),
        text(b, 58, 32), u16(b, 90), u16(b, 92), headerSize, offset, u32(b, 100), format,
        recordLength, count, legacyCount, byReturn, scale[0], scale[1], scale[2], shift[0],
        shift[1], shift[2], bounds[1], bounds[3], bounds[5], bounds[0], bounds[2], bounds[4],
        waveformStart, evlrStart, evlrCount);
  }

  private static void checkScaleAndOffset(Path path, double[] scale, double[] shift) {
    String[] axes = {"x", "y", "z"};
    for (int i = 0; i < 3; i++) {
      double s = Math.abs(scale[i]);
      if (s < MIN_SCALE || s > MAX_SCALE) {
        throw new InputException(path, "header", axes[i] + " scale factor", String.format(
            Locale.ROOT, "%s is outside the plausible %.0e to %.0f file units per step",
            scale[i], MIN_SCALE, MAX_SCALE));
      }
      if (Math.abs(shift[i]) > MAX_COORDINATE) {
        throw new InputException(path, "header", axes[i] + " offset", String.format(Locale.ROOT,
            "%s is beyond the plausible %.0e file units", shift[i], MAX_COORDINATE));
      }
    }
  }

  private static String bytesNeeded(long offset, long count, int recordLength) {
    return java.math.BigInteger.valueOf(count).multiply(java.math.BigInteger.valueOf(recordLength))
        .add(java.math.BigInteger.valueOf(offset)).toString();
  }

  private static PointFormat format(Path path, int raw) {
    if ((raw & COMPRESSED_FORMAT_BITS) != 0) {
      throw new InputException(path, "header", "point data format", "format byte " + raw
          + " marks compressed (LAZ) points; decompress the file to plain LAS first");
    }
    PointFormat f = PointFormat.ofId(raw);
    if (f == null) {
      throw new InputException(path, "header", "point data format",
          "unknown point data format " + raw + " (formats 0 to 10 are defined)");
    }
    return f;
  }

  private static double[] finiteTriple(
      Path path, ByteBuffer b, int at, String what, boolean nonZero) {
    double[] v = new double[3];
    String[] axes = {"x", "y", "z"};
    for (int i = 0; i < 3; i++) {
      v[i] = b.getDouble(at + 8 * i);
      if (!Double.isFinite(v[i])) {
        throw new InputException(path, "header", axes[i] + " " + what, "not a finite number");
      }
      if (nonZero && v[i] == 0) {
        throw new InputException(path, "header", axes[i] + " " + what, "must not be zero");
      }
    }
    return v;
  }

  private static InputException truncated(Path path, long size, int needed, String version) {
    return new InputException(path, "header", null, String.format(Locale.ROOT,
        "truncated header: the file has %d bytes, a LAS %s header needs %d",
        size, version, needed));
  }

  private static String guid(ByteBuffer b) {
    StringBuilder sb = new StringBuilder(36);
    sb.append(String.format(Locale.ROOT, "%08x-%04x-%04x-", u32(b, 8), u16(b, 12), u16(b, 14)));
    for (int i = 16; i < 24; i++) {
      if (i == 18) {
        sb.append('-');
      }
      sb.append(String.format(Locale.ROOT, "%02x", b.get(i) & 0xFF));
    }
    return sb.toString();
  }

  /** Text of a fixed-length NUL-padded field, trailing NULs and spaces removed. */
  static String text(ByteBuffer b, int at, int length) {
    byte[] raw = new byte[length];
    for (int i = 0; i < length; i++) {
      raw[i] = b.get(at + i);
    }
    int end = 0;
    while (end < length && raw[end] != 0) {
      end++;
    }
    return new String(raw, 0, end, StandardCharsets.ISO_8859_1).strip();
  }

  static int u16(ByteBuffer b, int at) {
    return b.getShort(at) & 0xFFFF;
  }

  static long u32(ByteBuffer b, int at) {
    return b.getInt(at) & U32_MAX;
  }
}
