package org.clearance.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import org.clearance.InputException;

/**
 * Reading small user text files (line specifications, rule profiles, conductor and structure
 * tables) as strict UTF-8 with a size cap, with input errors a user can act on.
 */
public final class TextFiles {

  /**
   * Largest YAML file read, bytes: a line specification or rule profile is a few kilobytes; a
   * 10 MB one took 20 s to parse before this cap (issue 10 item 12).
   */
  public static final long MAX_YAML_BYTES = 1L << 20;
  /** Largest table read (conductor library CSV), bytes: thousands of rows fit. */
  public static final long MAX_TABLE_BYTES = 4L << 20;
  /**
   * Largest structures file read, bytes: 100 000 structures (a utility's whole network) as
   * GeoJSON take about 30 MB.
   */
  public static final long MAX_STRUCTURES_BYTES = 64L << 20;

  /** Byte-order mark some editors write at the start of UTF-8 files; not part of the text. */
  private static final String BOM = "\uFEFF";

  private TextFiles() {}

  /**
   * The whole file as text, without a leading byte-order mark.
   *
   * @param file the file
   * @param maxBytes the largest size accepted, bytes
   * @throws InputException when the file is missing, unreadable, a folder, larger than
   *     {@code maxBytes} or not UTF-8
   */
  public static String read(Path file, long maxBytes) {
    return read(file, maxBytes, "a UTF-8 text file");
  }

  /**
   * The whole file as text, as {@link #read(Path, long)}, saying what was expected when it is not.
   *
   * @param expected what the file should be, e.g. {@code "the line specification (YAML text)"}
   * @throws InputException as {@link #read(Path, long)}; a LAS point file (signature
   *     {@code LASF}, ASPRS LAS 1.4 R15 table 3) is named as such
   */
  public static String read(Path file, long maxBytes, String expected) {
    if (Files.isDirectory(file)) {
      throw new InputException(file, null, null, "is a folder, not a file");
    }
    try (InputStream in = Files.newInputStream(file)) {
      byte[] bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes + 1));
      if (bytes.length > maxBytes) {
        throw new InputException(file, null, null, String.format(Locale.ROOT,
            "the file is larger than the %d bytes such a file can plausibly need", maxBytes));
      }
      if (bytes.length >= 4 && bytes[0] == 'L' && bytes[1] == 'A' && bytes[2] == 'S'
          && bytes[3] == 'F') {
        throw new InputException(file, null, null,
            "a LAS point file (give it with --survey); expected " + expected);
      }
      return decode(file, bytes);
    } catch (NoSuchFileException e) {
      throw new InputException(file, null, null, "file not found");
    } catch (AccessDeniedException e) {
      throw new InputException(file, null, null, "permission denied");
    } catch (IOException e) {
      throw new InputException(file, null, null, "cannot read the file: " + e.getMessage());
    }
  }

  /**
   * Bytes as strict UTF-8 text, without a leading byte-order mark.
   *
   * @param label the file or resource name, for messages
   * @throws InputException naming the line and byte where the text stops being UTF-8
   */
  public static String decode(Object label, byte[] bytes) {
    ByteBuffer in = ByteBuffer.wrap(bytes);
    CharBuffer out = CharBuffer.allocate(bytes.length);
    CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder();
    CoderResult result = decoder.decode(in, out, true);
    if (result.isError()) {
      int at = in.position();
      int line = 1;
      for (int i = 0; i < at; i++) {
        line += bytes[i] == '\n' ? 1 : 0;
      }
      throw new InputException(String.valueOf(label), "line " + line, null, String.format(
          Locale.ROOT, "not UTF-8 text (byte %d of the file, 0x%02X, is not UTF-8); save the"
              + " file as UTF-8", at + 1, bytes[at] & 0xFF));
    }
    decoder.flush(out);
    String text = out.flip().toString();
    return text.startsWith(BOM) ? text.substring(BOM.length()) : text;
  }

  /**
   * Refuses a file of the wrong kind before it is parsed as a table: a YAML mapping (a line
   * specification or a rule profile given where a CSV table is expected) has a first meaningful
   * line {@code key: value} and no comma, which no table header has.
   *
   * @param file the file, for the message
   * @param text its text
   * @param expected what was expected, e.g. "the structures table (CSV or GeoJSON)"
   * @throws InputException naming the file and what it looks like
   */
  public static void refuseYamlForTable(String file, String text, String expected) {
    String[] lines = text.split("\n", 50);
    for (int n = 0; n < lines.length; n++) {
      String t = lines[n].strip();
      if (t.isEmpty() || t.startsWith("#")) {
        continue;
      }
      if (!t.contains(",") && (t.matches("[A-Za-z_][A-Za-z0-9_-]*\\s*:(\\s.*)?")
          || t.equals("---"))) {
        throw new InputException(file, "line " + (n + 1), null, "expected " + expected + ", but this "
            + "looks like a YAML file (a line specification or rule profile?); check which "
            + "file goes with which option");
      }
      return;
    }
  }
}
