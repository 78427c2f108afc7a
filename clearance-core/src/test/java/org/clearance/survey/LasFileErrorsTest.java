package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Malformed LAS files, each built as a small byte array: every one must give a one-line
 * {@link InputException} naming the file and the field. Header field offsets: ASPRS LAS 1.4 R15
 * section 2.4 (scale at byte 131, offset at 155, format at 104, record length at 105).
 */
class LasFileErrorsTest {
  @TempDir Path dir;

  private static TinyLas valid() {
    return new TinyLas().format(0).point(TinyLas.format0(100, 200, 300, 2, 0x09));
  }

  /** Opens the bytes as a file and returns the error, checking it names file and field. */
  private InputException fail(byte[] bytes, String field, String words) throws IOException {
    Path p = Files.write(dir.resolve("bad.las"), bytes);
    InputException e = assertThrows(InputException.class, () -> LasFile.open(p));
    assertTrue(e.getMessage().startsWith(p.toString()), e.getMessage());
    assertEquals(field, e.field(), e.getMessage());
    assertTrue(e.getMessage().contains(words), e.getMessage());
    assertFalse(e.getMessage().contains("\n"), "one line: " + e.getMessage());
    return e;
  }

  private static byte[] patch(byte[] b, int at, ByteBuffer value) {
    byte[] out = b.clone();
    byte[] v = value.array();
    System.arraycopy(v, 0, out, at, v.length);
    return out;
  }

  private static ByteBuffer le(int size) {
    return ByteBuffer.allocate(size).order(ByteOrder.LITTLE_ENDIAN);
  }

  @Test
  void validTinyFileOpens() throws IOException {
    Path p = Files.write(dir.resolve("ok.las"), valid().build());
    assertEquals(1, LasFile.open(p).header().pointCount());
  }

  @Test
  void emptyFile() throws IOException {
    fail(new byte[0], null, "empty file");
  }

  @Test
  void notLas() throws IOException {
    fail("PK\3\4 this is a zip file, not lidar".getBytes(StandardCharsets.US_ASCII),
        "file signature", "not a LAS file");
  }

  @Test
  void truncatedHeader() throws IOException {
    fail(Arrays.copyOf(valid().build(), 150), null, "truncated header");
  }

  @Test
  void truncatedLas14Header() throws IOException {
    byte[] b = new TinyLas().minor(4).format(6).build();
    fail(Arrays.copyOf(b, 300), null, "truncated header");
  }

  @Test
  void headerSizeSmallerThanTheVersionsHeader() throws IOException {
    fail(valid().headerSize(100).build(), "header size", "less than the 227 bytes");
  }

  @Test
  void headerSizePastTheEnd() throws IOException {
    fail(valid().headerSize(60000).build(), "header size", "past the end");
  }

  @Test
  void pointOffsetPastTheEnd() throws IOException {
    byte[] b = patch(valid().build(), 96, le(4).putInt(0, 1_000_000));
    fail(b, "offset to point data", "past the end of the file");
  }

  @Test
  void pointOffsetInsideTheHeader() throws IOException {
    byte[] b = patch(valid().build(), 96, le(4).putInt(0, 100));
    fail(b, "offset to point data", "inside the 227-byte header");
  }

  @Test
  void pointCountBeyondTheFileEnd() throws IOException {
    fail(valid().legacyCount(1000).build(), "number of point records", "need 20227 bytes");
  }

  @Test
  void las14PointCountBeyondTheFileEnd() throws IOException {
    byte[] b = new TinyLas().minor(4).format(6).count64(5_000_000_000L).build();
    fail(b, "number of point records", "150000000375 bytes");
  }

  @Test
  void legacyCountDisagreesWith64BitCount() throws IOException {
    byte[] b = new TinyLas().minor(4).format(1).legacyCount(7).count64(0)
        .point(new byte[28]).build();
    b = patch(b, 247, le(8).putLong(0, 1));
    fail(b, "legacy number of point records", "disagrees");
  }

  @Test
  void zeroScale() throws IOException {
    fail(valid().scale(0.01, 0.0, 0.01).build(), "y scale factor", "must not be zero");
  }

  @Test
  void nanScale() throws IOException {
    fail(valid().scale(Double.NaN, 0.01, 0.01).build(), "x scale factor", "not a finite");
  }

  @Test
  void infiniteOffset() throws IOException {
    fail(valid().offset(0, 0, Double.POSITIVE_INFINITY).build(), "z offset", "not a finite");
  }

  @Test
  void unknownPointFormat() throws IOException {
    byte[] b = patch(valid().build(), 104, le(1).put(0, (byte) 11));
    fail(b, "point data format", "unknown point data format 11");
  }

  @Test
  void compressedPointFormat() throws IOException {
    byte[] b = patch(valid().build(), 104, le(1).put(0, (byte) (0x80 | 3)));
    fail(b, "point data format", "decompress");
  }

  @Test
  void recordShorterThanTheFormat() throws IOException {
    fail(valid().recordLength(18).build(), "point data record length",
        "18 bytes is shorter than the 20 bytes point format 0 needs");
  }

  @Test
  void vlrLengthPastTheEnd() throws IOException {
    byte[] b = valid().vlr("someone", 7, new byte[10], 5000).build();
    InputException e = fail(b, "record length after header", "run past the start of the point");
    assertEquals("VLR 1 of 1", e.location());
  }

  @Test
  void vlrCountPastTheEnd() throws IOException {
    byte[] b = patch(valid().build(), 100, le(4).putInt(0, 3));
    InputException e = fail(b, "record header", "54-byte header");
    assertEquals("VLR 1 of 3", e.location());
  }

  @Test
  void evlrPastTheEnd() throws IOException {
    TinyLas t = new TinyLas().minor(4).format(6).point(new byte[30]);
    byte[] b = t.build();
    b = patch(b, 235, le(8).putLong(0, b.length));
    b = patch(b, 243, le(4).putInt(0, 1));
    fail(b, "record header", "60-byte header");
  }

  @Test
  void unsupportedVersion() throws IOException {
    byte[] b = patch(valid().build(), 24, le(2).put(0, (byte) 2).put(1, (byte) 0));
    fail(b, "version", "2.0 is not supported");
  }

  @Test
  void missingFile() {
    Path p = dir.resolve("nowhere.las");
    InputException e = assertThrows(InputException.class, () -> LasFile.open(p));
    assertEquals(p + ": no such file", e.getMessage());
  }

  @Test
  void malformedGeoKeyDirectory() throws IOException {
    byte[] keys = TinyLas.keyDirectory(new int[] {3076, 9001});
    ByteBuffer.wrap(keys).order(ByteOrder.LITTLE_ENDIAN).putShort(6, (short) 9);
    byte[] b = valid().vlr(Vlr.PROJECTION_USER_ID, Vlr.GEO_KEY_DIRECTORY, keys, -1).build();
    fail(b, "number of keys", "9 keys need 80 bytes");
  }
}
