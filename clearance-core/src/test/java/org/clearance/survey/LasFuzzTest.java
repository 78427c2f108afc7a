package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Seeded fuzz test of LAS reading (issue 10, "Done when"): mutations of small valid files (bit
 * flips and extreme values in header fields, damaged VLRs and records, truncation, extra bytes)
 * are opened and streamed as {@code check} does. Every case must end in one of two ways: a
 * one-line {@link InputException} naming the file, or a survey whose every point is finite and
 * inside the header's bounding box with exactly the header's count. Anything else (another
 * exception, an error, a point outside the box, a count that differs) fails the test with the
 * seed and the mutation, so it can be replayed.
 */
class LasFuzzTest {
  /** Cases per run: a few thousand, under a minute on a laptop. */
  private static final int CASES = 2000;
  /** Fixed seed: the same cases in every run; change it to explore. */
  private static final long SEED = 20_261_204L;

  @TempDir Path dir;

  /** Header fields by byte offset (ASPRS LAS 1.4 R15 table 3), for naming mutations. */
  private static final TreeMap<Integer, String> FIELDS = new TreeMap<>(Map.ofEntries(
      Map.entry(0, "signature"), Map.entry(4, "file source id"), Map.entry(6, "global encoding"),
      Map.entry(8, "project id"), Map.entry(24, "version"), Map.entry(26, "system id"),
      Map.entry(58, "software"), Map.entry(90, "creation date"), Map.entry(94, "header size"),
      Map.entry(96, "offset to point data"), Map.entry(100, "number of VLRs"),
      Map.entry(104, "point format"), Map.entry(105, "record length"),
      Map.entry(107, "legacy count"), Map.entry(111, "legacy count by return"),
      Map.entry(131, "scale"), Map.entry(155, "offset"), Map.entry(179, "bounds"),
      Map.entry(227, "waveform start"), Map.entry(235, "EVLR start"),
      Map.entry(243, "EVLR count"), Map.entry(247, "64-bit count"),
      Map.entry(255, "count by return"), Map.entry(375, "VLRs")));

  /** Offsets of the numeric header fields that extreme values are written into, with widths. */
  private static final int[][] NUMERIC = {
      {94, 2}, {96, 4}, {100, 4}, {104, 1}, {105, 2}, {107, 4}, {131, 8}, {139, 8}, {147, 8},
      {155, 8}, {163, 8}, {171, 8}, {179, 8}, {187, 8}, {195, 8}, {203, 8}, {211, 8}, {219, 8},
      {235, 8}, {243, 4}, {247, 8}};

  private static final double[] EXTREME_DOUBLES = {0, -0.0, 1e308, -1e308, 4.9e-324, 1e-300,
      Double.NaN, Double.POSITIVE_INFINITY, 1e9, 1e10, 0.5, -1, 1e-12};
  private static final long[] EXTREME_INTEGERS = {0, 1, -1, 0x7F, 0xFF, 0x7FFF, 0xFFFF,
      0x7FFF_FFFFL, 0xFFFF_FFFFL, Long.MAX_VALUE, Long.MIN_VALUE, 226, 227, 228, 374, 375, 376,
      30_000, 32_768, 65_535};

  /** Small valid files: LAS 1.2 formats 0, 1 and 3 with GeoTIFF keys, LAS 1.4 format 6 and 7. */
  static List<byte[]> seeds() {
    int[][] keys = {{1024, 1}, {3072, 32611}, {4099, 9001}};
    List<byte[]> out = new ArrayList<>();
    out.add(withPoints(new TinyLas().format(0).geoKeys(keys), 20, 5));
    out.add(withPoints(new TinyLas().format(1).geoKeys(keys).offset(487000, 4100000, 0), 28, 4));
    out.add(withPoints(new TinyLas().format(3).geoKeys(keys), 34, 3));
    out.add(withPoints(new TinyLas().minor(4).format(6).globalEncoding(LasHeader.WKT_BIT)
        .wkt("PROJCS[\"p\",GEOGCS[\"g\"],UNIT[\"metre\",1]]"), 30, 4));
    out.add(withPoints(new TinyLas().minor(4).format(7).recordLength(40)
        .globalEncoding(LasHeader.WKT_BIT).scale(0.001, 0.001, 0.001)
        .wkt("PROJCS[\"p\",GEOGCS[\"g\"],UNIT[\"US survey foot\",0.304800609601219]]"), 40, 3));
    return out;
  }

  private static byte[] withPoints(TinyLas t, int length, int n) {
    for (int i = 0; i < n; i++) {
      ByteBuffer r = ByteBuffer.allocate(length).order(ByteOrder.LITTLE_ENDIAN);
      r.putInt(0, 1000 + 137 * i).putInt(4, 2000 - 91 * i).putInt(8, 300 + 11 * i);
      r.put(14, (byte) 0x09);
      r.put(length >= 30 && t.build()[104] >= 6 ? 16 : 15, (byte) (i % 2 == 0 ? 2 : 5));
      t.point(r.array());
    }
    return t.build();
  }

  /** A mutation: the bytes and a description naming what was changed. */
  record Mutation(byte[] bytes, String what, int at) {}

  static Mutation mutate(byte[] seed, Random rnd) {
    byte[] b = seed.clone();
    int headerEnd = Math.min(seed.length, ByteBuffer.wrap(seed).order(ByteOrder.LITTLE_ENDIAN)
        .getShort(94) & 0xFFFF);
    int pointsAt = ByteBuffer.wrap(seed).order(ByteOrder.LITTLE_ENDIAN).getInt(96);
    switch (rnd.nextInt(8)) {
      case 0: { // bit flip in the header
        int at = rnd.nextInt(headerEnd);
        b[at] ^= (byte) (1 << rnd.nextInt(8));
        return new Mutation(b, "bit flip in header byte " + at, at);
      }
      case 1: { // extreme value in a numeric header field
        int[] f = NUMERIC[rnd.nextInt(NUMERIC.length)];
        if (f[0] + f[1] > headerEnd) {
          return new Mutation(b, "unchanged (field beyond this version's header)", -1);
        }
        ByteBuffer w = ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN);
        String value;
        if (f[1] == 8 && f[0] >= 131 && f[0] < 227) {
          double v = EXTREME_DOUBLES[rnd.nextInt(EXTREME_DOUBLES.length)];
          w.putDouble(f[0], v);
          value = Double.toString(v);
        } else {
          long v = EXTREME_INTEGERS[rnd.nextInt(EXTREME_INTEGERS.length)];
          for (int k = 0; k < f[1]; k++) {
            b[f[0] + k] = (byte) (v >>> (8 * k));
          }
          value = Long.toString(v);
        }
        return new Mutation(b, "value " + value + " at header byte " + f[0], f[0]);
      }
      case 2: { // random byte in the VLRs
        if (pointsAt <= headerEnd) {
          return new Mutation(b, "unchanged (no VLR)", -1);
        }
        int at = headerEnd + rnd.nextInt(pointsAt - headerEnd);
        b[at] = (byte) rnd.nextInt(256);
        return new Mutation(b, "random byte in VLR byte " + at, at);
      }
      case 3: { // random bytes in the point records
        int n = 1 + rnd.nextInt(4);
        int first = -1;
        for (int k = 0; k < n; k++) {
          int at = pointsAt + rnd.nextInt(b.length - pointsAt);
          b[at] = (byte) rnd.nextInt(256);
          first = first < 0 ? at : Math.min(first, at);
        }
        return new Mutation(b, n + " random bytes in the records from byte " + first, first);
      }
      case 4: { // truncation
        int len = rnd.nextInt(b.length);
        return new Mutation(Arrays.copyOf(b, len), "truncated to " + len + " bytes", len);
      }
      case 5: { // bytes appended
        int n = 1 + rnd.nextInt(80);
        byte[] out = Arrays.copyOf(b, b.length + n);
        for (int k = b.length; k < out.length; k++) {
          out[k] = (byte) rnd.nextInt(256);
        }
        return new Mutation(out, n + " bytes appended", b.length);
      }
      case 6: { // one byte inserted (everything after shifts)
        int at = rnd.nextInt(b.length);
        byte[] out = new byte[b.length + 1];
        System.arraycopy(b, 0, out, 0, at);
        out[at] = (byte) rnd.nextInt(256);
        System.arraycopy(b, at, out, at + 1, b.length - at);
        return new Mutation(out, "byte inserted at " + at, at);
      }
      default: { // one byte removed
        int at = rnd.nextInt(b.length);
        byte[] out = new byte[b.length - 1];
        System.arraycopy(b, 0, out, 0, at);
        System.arraycopy(b, at + 1, out, at, b.length - at - 1);
        return new Mutation(out, "byte removed at " + at, at);
      }
    }
  }

  /** Where a byte offset lies, for the tally of accepted cases. */
  private static String region(int at, byte[] bytes) {
    if (at < 0) {
      return "unchanged";
    }
    if (bytes.length >= 100) {
      int pointsAt = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN).getInt(96);
      int headerSize = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN).getShort(94);
      if (at >= pointsAt && pointsAt > 0) {
        return "point records";
      }
      if (at >= headerSize) {
        return "VLRs";
      }
    }
    return "header " + FIELDS.floorEntry(at).getValue();
  }

  @Test
  @Timeout(value = 10, unit = TimeUnit.MINUTES) // a hang guard, not a speed target
  void mutatedFilesAreRejectedCleanlyOrReadCorrectly() throws IOException {
    Random rnd = new Random(SEED);
    List<byte[]> seeds = seeds();
    for (byte[] seed : seeds) {
      assertEquals("accepted", run(seed, Files.write(dir.resolve("seed.las"), seed)), "seed");
    }
    Map<String, Integer> rejected = new TreeMap<>();
    Map<String, Integer> accepted = new TreeMap<>();
    Path p = dir.resolve("case.las");
    for (int c = 0; c < CASES; c++) {
      Mutation m = mutate(seeds.get(c % seeds.size()), rnd);
      Files.write(p, m.bytes());
      String outcome;
      try {
        outcome = run(m.bytes(), p);
      } catch (Throwable t) {
        throw new AssertionError("case " + c + " (seed " + SEED + ", " + m.what() + "): "
            + t, t);
      }
      if (outcome.equals("accepted")) {
        accepted.merge(region(m.at(), seeds.get(c % seeds.size())), 1, Integer::sum);
      } else {
        rejected.merge(outcome, 1, Integer::sum);
      }
    }
    int nRejected = rejected.values().stream().mapToInt(Integer::intValue).sum();
    int nAccepted = accepted.values().stream().mapToInt(Integer::intValue).sum();
    System.out.printf("LAS fuzz: %d cases, %d rejected cleanly, %d accepted%n", CASES,
        nRejected, nAccepted);
    System.out.println("  rejected by field: " + rejected);
    System.out.println("  accepted by mutated part: " + accepted);
    assertEquals(CASES, nRejected + nAccepted);
    assertTrue(nRejected > CASES / 4, "most mutations of a tiny file break it: " + nRejected);
  }

  /**
   * Opens and streams the file as {@code check} does; returns "accepted" or the field named by
   * the clean rejection. Throws on any other outcome.
   */
  private static String run(byte[] bytes, Path p) {
    try {
      Survey s = Survey.open(List.of(p), new UnitsChoice(Optional.empty(), Optional.empty(),
          true, false));
      LasHeader h = s.files().get(0).header();
      AtomicLong n = new AtomicLong();
      double fh = s.units().horizontal().metres();
      double fv = s.units().vertical().metres();
      double[] lo = {h.minX() * fh, h.minY() * fh, h.minZ() * fv};
      double[] hi = {h.maxX() * fh, h.maxY() * fh, h.maxZ() * fv};
      double[] tol = {Math.abs(h.scaleX()) * fh * 1.001 + 1e-6, Math.abs(h.scaleY()) * fh
          * 1.001 + 1e-6, Math.abs(h.scaleZ()) * fv * 1.001 + 1e-6};
      java.util.function.Consumer<PointChunk> check = c -> {
        for (int i = 0; i < c.size(); i++) {
          double[] v = {c.x()[i], c.y()[i], c.z()[i]};
          for (int a = 0; a < 3; a++) {
            if (!(v[a] >= lo[a] - tol[a] && v[a] <= hi[a] + tol[a])) {
              throw new AssertionError("accepted point outside the header box: axis " + a
                  + " value " + v[a] + " box " + lo[a] + " to " + hi[a]);
            }
          }
        }
        n.addAndGet(c.size());
      };
      // one case in eight (by file length) through the parallel reader: worker failures too
      if ((bytes.length & 7) == 0) {
        s.readParallel(2, () -> check);
      } else {
        s.read(check);
      }
      if (n.get() != h.pointCount()) {
        throw new AssertionError("read " + n.get() + " points, header says " + h.pointCount());
      }
      if ((p.toFile().length() - h.pointDataOffset()) / h.recordLength() > h.pointCount()
          && s.files().get(0).evlrs().isEmpty()) {
        throw new AssertionError("whole records beyond the count were ignored");
      }
      return "accepted";
    } catch (InputException e) {
      String msg = e.getMessage();
      assertTrue(msg.startsWith(p.toString()), msg);
      assertFalse(msg.contains("\n"), msg);
      assertTrue(e.field() != null || e.location() != null || msg.contains("empty file")
          || msg.contains("truncated"), "names a field or place: " + msg);
      return e.field() != null ? e.field() : String.valueOf(e.location());
    } catch (RuntimeException e) {
      fail("not a clean rejection: " + e, e);
      return null;
    }
  }
}
