package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Writer to reader round trip for every version and format the writer supports, with every
 * attribute the format carries, extra bytes, CRS records and header totals. Field ranges: ASPRS
 * LAS 1.4 R15 tables 7-17 (3-bit returns and 5-bit classes in formats 0-5, 4-bit returns and
 * 8-bit classes in 6-10, scan angle rank +-90 or steps of 0.006 degree up to +-30000).
 */
class LasRoundTripTest {
  private static final int POINTS = 700;
  private static final int EXTRA = 3;
  private static final double SX = 0.01;
  private static final double SY = 0.02;
  private static final double SZ = 0.001;
  private static final double OX = 500_000;
  private static final double OY = 4_200_000;
  private static final double OZ = -50;
  /** Invented scenario: the Lakeview Cooperative's local grid. */
  private static final SurveyUnits UNITS = new SurveyUnits(LinearUnit.US_SURVEY_FOOT,
      LinearUnit.FOOT, "Lakeview local grid", OptionalInt.empty(), "", "test");

  @TempDir Path dir;

  static Stream<Arguments> versionsAndFormats() {
    List<Arguments> all = new ArrayList<>();
    for (int f = 0; f <= 3; f++) {
      all.add(Arguments.of(2, f));
    }
    for (int f = 0; f <= 10; f++) {
      all.add(Arguments.of(4, f));
    }
    return all.stream();
  }

  /** The integer coordinates and attributes written, to check the read-back against. */
  private static PointChunk generate(PointFormat f, int[][] ints) {
    Random r = new Random(20240917L + f.id());
    PointChunk c = new PointChunk(POINTS);
    for (int i = 0; i < POINTS; i++) {
      int kx = r.nextInt(2_000_000) - 1_000_000;
      int ky = r.nextInt(2_000_000) - 1_000_000;
      int kz = r.nextInt(200_000);
      ints[i] = new int[] {kx, ky, kz};
      double x = (kx * SX + OX) * UNITS.horizontal().metres();
      double y = (ky * SY + OY) * UNITS.horizontal().metres();
      double z = (kz * SZ + OZ) * UNITS.vertical().metres();
      int j = c.add(x, y, z, r.nextInt(f.maxClassification() + 1));
      c.intensity()[j] = r.nextInt(65_536);
      int n = 1 + r.nextInt(f.maxReturnNumber());
      c.numberOfReturns()[j] = (byte) n;
      c.returnNumber()[j] = (byte) (1 + r.nextInt(n));
      c.flags()[j] = (byte) r.nextInt(f.isExtended() ? 16 : 8);
      c.scannerChannel()[j] = (byte) (f.isExtended() ? r.nextInt(4) : 0);
      c.scanDirection()[j] = (byte) r.nextInt(2);
      c.edgeOfFlightLine()[j] = (byte) r.nextInt(2);
      c.scanAngle()[j] = f.isExtended() ? (float) ((r.nextInt(60_001) - 30_000) * 0.006)
          : r.nextInt(181) - 90;
      c.userData()[j] = (short) r.nextInt(256);
      c.pointSourceId()[j] = r.nextInt(65_536);
      c.gpsTime()[j] = f.hasGpsTime() ? 1.0e9 + r.nextDouble() * 1e6 : Double.NaN;
      c.red()[j] = f.hasRgb() ? r.nextInt(65_536) : 0;
      c.green()[j] = f.hasRgb() ? r.nextInt(65_536) : 0;
      c.blue()[j] = f.hasRgb() ? r.nextInt(65_536) : 0;
      c.nir()[j] = f.hasNir() ? r.nextInt(65_536) : 0;
    }
    return c;
  }

  /** Writes the chunk through the writer in pieces of 256 points. */
  private static void write(LasWriter w, PointChunk all) {
    PointChunk piece = new PointChunk(256);
    for (int i = 0; i < all.size(); i++) {
      piece.addCopy(all, i);
      if (piece.isFull() || i == all.size() - 1) {
        w.write(piece);
        piece.reset(0, 0);
      }
    }
  }

  @ParameterizedTest(name = "LAS 1.{0} format {1}")
  @MethodSource("versionsAndFormats")
  void everyAttributeSurvives(int minor, int formatId) throws IOException {
    PointFormat f = PointFormat.ofId(formatId);
    int[][] ints = new int[POINTS][];
    PointChunk expected = generate(f, ints);
    Path path = dir.resolve("trip.las");
    LasWriterOptions o = LasWriterOptions.of(minor, f).withScale(SX, SY, SZ)
        .withOffset(OX, OY, OZ).withCrs(UNITS).withExtraBytes(EXTRA).withSystemId("bench rig")
        .withFileSourceId(77).withCreationDate(LocalDate.of(2024, 2, 29));
    try (LasWriter w = LasWriter.create(path, o)) {
      write(w, expected);
    }

    LasFile file = LasFile.open(path);
    LasHeader h = file.header();
    assertEquals("1." + minor, h.version());
    assertEquals(f, h.pointFormat());
    assertEquals(f.minRecordLength() + EXTRA, h.recordLength());
    assertEquals(EXTRA, h.extraBytes());
    assertEquals(POINTS, h.pointCount());
    assertEquals(f.isExtended() ? 0 : POINTS, h.legacyPointCount());
    assertEquals(77, h.fileSourceId());
    assertEquals("bench rig", h.systemId());
    assertEquals(60, h.creationDay());
    assertEquals(2024, h.creationYear());
    assertEquals(f.isExtended(), h.wktGoverns());
    assertTrue(h.adjustedGpsTime());
    long[] byReturn = new long[15];
    int[] lo = {Integer.MAX_VALUE, Integer.MAX_VALUE, Integer.MAX_VALUE};
    int[] hi = {Integer.MIN_VALUE, Integer.MIN_VALUE, Integer.MIN_VALUE};
    for (int i = 0; i < POINTS; i++) {
      byReturn[expected.returnNumber()[i] - 1]++;
      for (int a = 0; a < 3; a++) {
        lo[a] = Math.min(lo[a], ints[i][a]);
        hi[a] = Math.max(hi[a], ints[i][a]);
      }
    }
    for (int r = 0; r < h.pointsByReturn().size(); r++) {
      assertEquals(byReturn[r], h.pointsByReturn().get(r), "return " + (r + 1));
    }
    assertEquals(lo[0] * SX + OX, h.minX(), 1e-9);
    assertEquals(hi[1] * SY + OY, h.maxY(), 1e-9);
    assertEquals(lo[2] * SZ + OZ, h.minZ(), 1e-9);
    if (minor == 4) {
      Vlr eb = file.vlrs().stream().filter(v -> v.is(Vlr.SPEC_USER_ID, 4)).findFirst()
          .orElseThrow();
      assertEquals(192, eb.dataLength());
      assertEquals(0, eb.data()[2]);
      assertEquals(EXTRA, eb.data()[3]);
    }

    Survey s = Survey.open(List.of(path), UnitsChoice.fromFile(), 200);
    assertEquals(LinearUnit.US_SURVEY_FOOT, s.units().horizontal());
    assertEquals(LinearUnit.FOOT, s.units().vertical());
    // GeoTIFF keys carry the name as citation; the local WKT names its compound CRS.
    assertEquals("Lakeview local grid" + (f.isExtended() ? " + heights" : ""),
        s.units().crsName());
    int[] seen = {0};
    s.read(c -> {
      for (int i = 0; i < c.size(); i++) {
        int e = (int) c.firstRecord() + i;
        String at = "point " + e;
        assertEquals(expected.x()[e], c.x()[i], 1e-9, at);
        assertEquals(expected.y()[e], c.y()[i], 1e-9, at);
        assertEquals(expected.z()[e], c.z()[i], 1e-9, at);
        assertEquals(expected.intensity()[e], c.intensity()[i], at);
        assertEquals(expected.returnNumber()[e], c.returnNumber()[i], at);
        assertEquals(expected.numberOfReturns()[e], c.numberOfReturns()[i], at);
        assertEquals(expected.classification()[e], c.classification()[i], at);
        assertEquals(expected.flags()[e], c.flags()[i], at);
        assertEquals(expected.scannerChannel()[e], c.scannerChannel()[i], at);
        assertEquals(expected.scanDirection()[e], c.scanDirection()[i], at);
        assertEquals(expected.edgeOfFlightLine()[e], c.edgeOfFlightLine()[i], at);
        assertEquals(expected.scanAngle()[e], c.scanAngle()[i], 0f, at);
        assertEquals(expected.userData()[e], c.userData()[i], at);
        assertEquals(expected.pointSourceId()[e], c.pointSourceId()[i], at);
        assertEquals(expected.gpsTime()[e], c.gpsTime()[i], 0.0, at);
        assertEquals(expected.red()[e], c.red()[i], at);
        assertEquals(expected.green()[e], c.green()[i], at);
        assertEquals(expected.blue()[e], c.blue()[i], at);
        assertEquals(expected.nir()[e], c.nir()[i], at);
      }
      seen[0] += c.size();
    });
    assertEquals(POINTS, seen[0]);
  }

  @Test
  void las14CountFieldsFollowTheFormatFamily() throws IOException {
    // LAS 1.4 R15 section 2.4: formats 6-10 leave the legacy count at 0; formats 0-5 fill both.
    for (int id : new int[] {1, 6}) {
      Path p = dir.resolve("count" + id + ".las");
      PointChunk c = new PointChunk(3);
      c.add(1, 2, 3, 2);
      c.add(4, 5, 6, 2);
      try (LasWriter w = LasWriter.create(p, LasWriterOptions.of(4, PointFormat.ofId(id)))) {
        w.write(c);
      }
      ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(p)).order(ByteOrder.LITTLE_ENDIAN);
      assertEquals(id == 6 ? 0 : 2, b.getInt(107));
      assertEquals(2L, b.getLong(247));
      assertEquals(2L, b.getLong(255));
    }
  }

  @Test
  void las14WithOnlyTheLegacyCountIsRead() throws IOException {
    Path p = new TinyLas().minor(4).format(1).count64(0).legacyCount(1)
        .point(new byte[28]).writeTo(dir.resolve("legacy.las"));
    assertEquals(1, LasFile.open(p).header().pointCount());
  }

  @Test
  void emptyFileHasNoBounds() {
    Path p = dir.resolve("empty.las");
    LasWriter.create(p, LasWriterOptions.of(2, PointFormat.F0)).close();
    Survey s = Survey.open(List.of(p), UnitsChoice.of(LinearUnit.METRE));
    assertEquals(0, s.pointCount());
    assertTrue(s.bounds().isEmpty());
  }

  @Test
  void badValueDiscardsTheFileAndLeavesNothing() throws IOException {
    Path p = dir.resolve("bad.las");
    PointChunk c = new PointChunk(2);
    c.add(1, 2, 3, 2);
    c.add(1, 2, 3, 40);
    LasWriter w = LasWriter.create(p, LasWriterOptions.of(2, PointFormat.F1));
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> w.write(c));
    assertTrue(e.getMessage().contains("classification 40"), e.getMessage());
    w.close();
    assertFalse(Files.exists(p));
    try (Stream<Path> left = Files.list(dir)) {
      assertEquals(0, left.count());
    }
  }

  @Test
  void abortLeavesTheTargetAsItWas() throws IOException {
    Path p = Files.writeString(dir.resolve("keep.las"), "old");
    LasWriter w = LasWriter.create(p, LasWriterOptions.of(2, PointFormat.F0));
    PointChunk c = new PointChunk(1);
    c.add(1, 2, 3, 2);
    w.write(c);
    w.abort();
    assertEquals("old", Files.readString(p));
    try (Stream<Path> left = Files.list(dir)) {
      assertEquals(1, left.count());
    }
  }

  @Test
  void coordinateOutsideTheIntegerRangeIsRefused() {
    PointChunk c = new PointChunk(1);
    c.add(1e9, 0, 0, 2);
    LasWriter w = LasWriter.create(dir.resolve("far.las"),
        LasWriterOptions.of(2, PointFormat.F0));
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> w.write(c));
    assertTrue(e.getMessage().contains("32-bit"), e.getMessage());
  }

  @Test
  void geoKeysOfTheWriterAreReadBack() {
    Path p = dir.resolve("keys.las");
    SurveyUnits u = new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE, "", OptionalInt.of(2949),
        "", "test");
    LasWriter.create(p, LasWriterOptions.of(2, PointFormat.F1).withCrs(u)).close();
    CrsInfo crs = LasFile.open(p).crs();
    assertEquals(OptionalInt.of(2949), crs.epsg());
    assertEquals(java.util.Optional.of(LinearUnit.METRE), crs.vertical());
    assertArrayEquals(new byte[] {1, 0, 1, 0, 0, 0, 4, 0},
        java.util.Arrays.copyOf(file(p).vlrs().get(0).data(), 8));
  }

  private static LasFile file(Path p) {
    return LasFile.open(p);
  }
}
