package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Headers that disagree with themselves or with the points (issue 10, item 6), and record lengths
 * near the LAS maximum (item 8). Field offsets: ASPRS LAS 1.4 R15 section 2.4 (scale at byte
 * 131, offset at 155, bounds from 179, legacy count at 107, offset to points at 96).
 */
class LasConsistencyTest {
  @TempDir Path dir;

  private static TinyLas valid() {
    return new TinyLas().format(0).point(TinyLas.format0(100, 200, 300, 2, 0x09))
        .point(TinyLas.format0(150, 250, 350, 5, 0x09));
  }

  private Path write(byte[] bytes) throws IOException {
    return Files.write(dir.resolve("bad.las"), bytes);
  }

  private static byte[] putDouble(byte[] b, int at, double v) {
    byte[] out = b.clone();
    ByteBuffer.wrap(out).order(ByteOrder.LITTLE_ENDIAN).putDouble(at, v);
    return out;
  }

  private static byte[] putInt(byte[] b, int at, int v) {
    byte[] out = b.clone();
    ByteBuffer.wrap(out).order(ByteOrder.LITTLE_ENDIAN).putInt(at, v);
    return out;
  }

  private static void check(InputException e, Path p, String field, String words) {
    assertTrue(e.getMessage().startsWith(p.toString()), e.getMessage());
    assertEquals(field, e.field(), e.getMessage());
    assertTrue(e.getMessage().contains(words), e.getMessage());
    assertFalse(e.getMessage().contains("\n"), e.getMessage());
  }

  private void openFails(byte[] bytes, String field, String words) throws IOException {
    Path p = write(bytes);
    check(assertThrows(InputException.class, () -> LasFile.open(p)), p, field, words);
  }

  private void readFails(byte[] bytes, String field, String words) throws IOException {
    Path p = write(bytes);
    Survey s = Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE));
    check(assertThrows(InputException.class, () -> s.read(c -> { })), p, field, words);
    check(assertThrows(InputException.class, () -> s.readParallel(2, () -> c -> { })), p, field,
        words);
  }

  @Test
  void validFileReadsBothPoints() throws IOException {
    Survey s = Survey.open(List.of(write(valid().build())), UnitsChoice.of(LinearUnit.METRE));
    AtomicLong n = new AtomicLong();
    s.read(c -> n.addAndGet(c.size()));
    assertEquals(2, n.get());
  }

  /** Bug: x scale 1e308 gave infinite coordinates and a StackOverflowError in check. */
  @Test
  void hugeScaleIsRefused() throws IOException {
    openFails(putDouble(valid().build(), 131, 1e308), "x scale factor", "outside the plausible");
  }

  @Test
  void tinyScaleIsRefused() throws IOException {
    openFails(putDouble(valid().build(), 147, 1e-300), "z scale factor", "outside the plausible");
  }

  @Test
  void hugeOffsetIsRefused() throws IOException {
    openFails(putDouble(valid().build(), 163, 1e300), "y offset", "beyond the plausible");
  }

  @Test
  void hugeBoundIsRefused() throws IOException {
    openFails(putDouble(valid().build(), 179, 1e300), "max x", "beyond the plausible");
  }

  @Test
  void minAboveMaxIsRefused() throws IOException {
    openFails(valid().bounds(2, 1, 3, 4, 4, 3).build(), "min y", "greater than max y");
  }

  /** Bug: a format-6 file labelled LAS 1.0 read 0 points with exit 0. */
  @Test
  void extendedFormatInOldVersionIsRefused() throws IOException {
    openFails(new TinyLas().minor(0).format(6).point(new byte[30]).build(), "version",
        "cannot hold point format 6");
  }

  @Test
  void waveFormatInLas12IsRefused() throws IOException {
    openFails(new TinyLas().minor(2).format(4).point(new byte[57]).build(), "version",
        "cannot hold point format 4");
  }

  /** Bug: a legacy count of 0 in LAS 1.2 with points present read 0 points with exit 0. */
  @Test
  void zeroCountWithPointsIsRefused() throws IOException {
    openFails(valid().legacyCount(0).build(), "legacy number of point records",
        "counts 0 points but 2 more whole 20-byte records follow");
  }

  @Test
  void las14ZeroCountsWithPointsAreRefused() throws IOException {
    openFails(new TinyLas().minor(4).format(6).count64(0).point(new byte[30]).build(),
        "legacy number of point records", "counts 0 points but 1 more");
  }

  /** Bug: an offset to point data one byte early read garbage coordinates. */
  @Test
  void offsetOneByteEarlyIsRefused() throws IOException {
    byte[] b = valid().build();
    byte[] shifted = new byte[b.length + 1];
    System.arraycopy(b, 0, shifted, 0, 227);
    System.arraycopy(b, 227, shifted, 228, b.length - 227);
    // points now start at byte 228; the header still says 227, one byte early
    readFails(shifted, "x", "outside the header's bounding box");
  }

  /** Bug: points outside the header's bounding box were never noticed (878 fuzz cases). */
  @Test
  void pointOutsideTheBoxIsRefused() throws IOException {
    // points span x 1.00-1.50 m (scale 0.01); the box ends at 1.40; one step of slack is 0.01
    readFails(valid().bounds(1.4, 1.0, 2.5, 2.0, 3.5, 3.0).build(), "x",
        "x = 1.5 lies outside");
  }

  @Test
  void pointOneStepOutsideTheBoxIsAccepted() throws IOException {
    // tolerance one scale step (0.01 m): a box rounded by one step still reads
    Path p = write(valid().bounds(1.49, 1.01, 2.49, 2.01, 3.49, 3.01).build());
    Survey s = Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE));
    AtomicLong n = new AtomicLong();
    s.read(c -> n.addAndGet(c.size()));
    assertEquals(2, n.get());
  }

  @Test
  void recordNumberIsNamed() throws IOException {
    byte[] b = putInt(valid().build(), 227 + 20 + 8, 99_999);
    readFails(b, "z", "z = 999.99 lies outside");
    Path p = write(b);
    Survey s = Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE));
    InputException e = assertThrows(InputException.class, () -> s.read(c -> { }));
    assertEquals("point record 2", e.location());
  }

  /** Bug: 30 000-byte records needed 65 536 x 30 000 bytes (5.9 GB) per reading thread. */
  @Test
  void longRecordsGetSmallerChunks() {
    assertEquals(65_536, PointStreamer.chunkPoints(65_536, 67));
    assertEquals(PointStreamer.MAX_BUFFER_BYTES / 30_000, PointStreamer.chunkPoints(65_536, 30_000));
    assertEquals(PointStreamer.MAX_BUFFER_BYTES / 65_535, PointStreamer.chunkPoints(65_536, 65_535));
  }

  @Test
  void longestRecordsAreRead() throws IOException {
    TinyLas t = new TinyLas().format(0).recordLength(65_535);
    for (int i = 0; i < 3; i++) {
      byte[] r = new byte[65_535];
      System.arraycopy(TinyLas.format0(10 * i, 20, 30, 2, 0x09), 0, r, 0, 20);
      t.point(r);
    }
    Survey s = Survey.open(List.of(write(t.build())), UnitsChoice.of(LinearUnit.METRE));
    AtomicLong n = new AtomicLong();
    s.readParallel(2, () -> c -> n.addAndGet(c.size()));
    assertEquals(3, n.get());
  }

  /** Bug: an OutOfMemoryError in a reader thread was swallowed and the survey had 0 points. */
  @Test
  void workerErrorReachesTheCaller() throws IOException {
    Survey s = Survey.open(List.of(write(valid().build())), UnitsChoice.of(LinearUnit.METRE));
    OutOfMemoryError oom = new OutOfMemoryError("test");
    OutOfMemoryError got = assertThrows(OutOfMemoryError.class,
        () -> s.readParallel(2, () -> c -> {
          throw oom;
        }));
    assertSame(oom, got);
  }
}
