package org.clearance.survey;

import java.io.EOFException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.clearance.InputException;

/**
 * One uncompressed ASPRS LAS file (versions 1.0 to 1.4, point formats 0 to 10): its header, its
 * variable length records and what they say about the coordinate system.
 *
 * <p>{@link #open(Path)} reads and checks the header, every VLR and EVLR and the extent of the
 * point data up front, so a file that opens can be streamed without surprises. Points are read by
 * {@link Survey}, which converts them to metres.
 *
 * <p>Source: ASPRS LAS Specification 1.4 R15 (header section 2.4, VLRs 2.5, EVLRs 2.7).
 */
public final class LasFile {
  /** Size of a VLR header, bytes (LAS 1.4 R15, table 14). */
  static final int VLR_HEADER_BYTES = 54;
  /** Size of an EVLR header, bytes (LAS 1.4 R15, table 25). */
  static final int EVLR_HEADER_BYTES = 60;
  /** EVLR payloads larger than this (waveform data) are not loaded: they are never needed. */
  static final long MAX_LOADED_EVLR_BYTES = 16L << 20;
  /** Bytes read for the header: the largest standard header. */
  private static final int HEADER_READ_BYTES = 375;

  private final Path path;
  private final long size;
  private final LasHeader header;
  private final List<Vlr> vlrs;
  private final List<Vlr> evlrs;
  private final CrsInfo crs;

  private LasFile(Path path, long size, LasHeader header, List<Vlr> vlrs, List<Vlr> evlrs) {
    this.path = path;
    this.size = size;
    this.header = header;
    this.vlrs = List.copyOf(vlrs);
    this.evlrs = List.copyOf(evlrs);
    this.crs = CrsReader.read(path, header, this.vlrs, this.evlrs);
  }

  /**
   * Opens a LAS file and checks its header, VLRs, EVLRs and point data extent.
   *
   * @param path the file
   * @return the opened file (no file handle stays open)
   * @throws InputException when the file is missing, unreadable or malformed; the message names
   *     the file, the record and the field
   * @throws UncheckedIOException on other I/O failures
   */
  public static LasFile open(Path path) {
    Objects.requireNonNull(path, "path");
    if (Files.isDirectory(path)) {
      throw new InputException(path, null, null, "is a folder, not a LAS file");
    }
    try (FileChannel ch = FileChannel.open(path, StandardOpenOption.READ)) {
      long size = ch.size();
      ByteBuffer head = ByteBuffer.allocate((int) Math.min(size, HEADER_READ_BYTES));
      readFully(ch, head, 0);
      LasHeader header = LasHeaderParser.parse(path, head.flip(), size);
      List<Vlr> vlrs = readVlrs(path, ch, header);
      List<Vlr> evlrs = readEvlrs(path, ch, header, size);
      return new LasFile(path, size, header, vlrs, evlrs);
    } catch (NoSuchFileException e) {
      throw new InputException(path, null, null, "no such file");
    } catch (AccessDeniedException e) {
      throw new InputException(path, null, null, "permission denied");
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read " + path, e);
    }
  }

  private static List<Vlr> readVlrs(Path path, FileChannel ch, LasHeader h) throws IOException {
    List<Vlr> out = new ArrayList<>();
    long at = h.headerSize();
    long end = h.pointDataOffset();
    for (long i = 0; i < h.vlrCount(); i++) {
      String where = "VLR " + (i + 1) + " of " + h.vlrCount();
      if (at + VLR_HEADER_BYTES > end) {
        throw new InputException(path, where, "record header", String.format(Locale.ROOT,
            "the 54-byte header at byte %d runs past the start of the point data (byte %d)",
            at, end));
      }
      ByteBuffer b = ByteBuffer.allocate(VLR_HEADER_BYTES).order(ByteOrder.LITTLE_ENDIAN);
      readFully(ch, b, at);
      int length = LasHeaderParser.u16(b, 20);
      long dataAt = at + VLR_HEADER_BYTES;
      if (dataAt + length > end) {
        throw new InputException(path, where, "record length after header", String.format(
            Locale.ROOT, "%d bytes from byte %d run past the start of the point data (byte %d)",
            length, dataAt, end));
      }
      ByteBuffer data = ByteBuffer.allocate(length);
      readFully(ch, data, dataAt);
      out.add(new Vlr(LasHeaderParser.text(b, 2, 16), LasHeaderParser.u16(b, 18),
          LasHeaderParser.text(b, 22, 32), false, at, length, data.array()));
      at = dataAt + length;
    }
    return out;
  }

  private static List<Vlr> readEvlrs(Path path, FileChannel ch, LasHeader h, long size)
      throws IOException {
    long start;
    long count;
    String field;
    if (h.versionMinor() >= 4) {
      start = h.evlrStart();
      count = h.evlrCount();
      field = "start of first extended VLR";
    } else if (h.versionMinor() == 3) {
      start = h.waveformStart();
      count = start == 0 ? 0 : 1;
      field = "start of waveform data packet record";
    } else {
      return List.of();
    }
    if (count == 0) {
      return List.of();
    }
    if (start < h.pointDataEnd() || start > size) {
      throw new InputException(path, "header", field, String.format(Locale.ROOT,
          "byte %d is not between the end of the point data (byte %d) and the end of the file"
              + " (byte %d)", start, h.pointDataEnd(), size));
    }
    List<Vlr> out = new ArrayList<>();
    long at = start;
    for (long i = 0; i < count; i++) {
      String where = "extended VLR " + (i + 1) + " of " + count;
      if (at + EVLR_HEADER_BYTES > size) {
        throw new InputException(path, where, "record header", String.format(Locale.ROOT,
            "the 60-byte header at byte %d runs past the end of the file (%d bytes)", at, size));
      }
      ByteBuffer b = ByteBuffer.allocate(EVLR_HEADER_BYTES).order(ByteOrder.LITTLE_ENDIAN);
      readFully(ch, b, at);
      long length = b.getLong(20);
      long dataAt = at + EVLR_HEADER_BYTES;
      if (length < 0 || length > size - dataAt) {
        throw new InputException(path, where, "record length after header", String.format(
            Locale.ROOT, "%s bytes from byte %d run past the end of the file (%d bytes)",
            Long.toUnsignedString(length), dataAt, size));
      }
      byte[] data = new byte[0];
      if (length <= MAX_LOADED_EVLR_BYTES) {
        ByteBuffer d = ByteBuffer.allocate((int) length);
        readFully(ch, d, dataAt);
        data = d.array();
      }
      out.add(new Vlr(LasHeaderParser.text(b, 2, 16), LasHeaderParser.u16(b, 18),
          LasHeaderParser.text(b, 28, 32), true, at, length, data));
      at = dataAt + length;
    }
    return out;
  }

  /**
   * Fills {@code buf} from {@code position}; a file that ends first is an {@link EOFException}.
   */
  static void readFully(FileChannel ch, ByteBuffer buf, long position) throws IOException {
    long at = position;
    while (buf.hasRemaining()) {
      int n = ch.read(buf, at);
      if (n < 0) {
        throw new EOFException("file ended at byte " + at);
      }
      at += n;
    }
  }

  /** The file's path as given. */
  public Path path() {
    return path;
  }

  /** File size in bytes when it was opened. */
  public long size() {
    return size;
  }

  /** The public header as written. */
  public LasHeader header() {
    return header;
  }

  /** The variable length records, in file order. */
  public List<Vlr> vlrs() {
    return vlrs;
  }

  /** The extended variable length records (LAS 1.3 waveform record, LAS 1.4 EVLRs). */
  public List<Vlr> evlrs() {
    return evlrs;
  }

  /** What the file's CRS records say about its coordinate system and units. */
  public CrsInfo crs() {
    return crs;
  }

  @Override
  public String toString() {
    return "LasFile[" + path + ", " + header + "]";
  }
}
