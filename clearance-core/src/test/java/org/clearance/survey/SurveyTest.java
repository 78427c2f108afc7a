package org.clearance.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.OptionalInt;
import java.util.Set;
import java.util.function.Consumer;
import org.clearance.InputException;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Several tiles read as one survey: sequential order, parallel coverage, raw scan, failures.
 * Expected values are computed here from the points written (hand-checkable sums).
 */
class SurveyTest {
  /** Coordinates written at 1 cm (tile A) and 1 mm (tile B) come back within half a step. */
  private static final double TOL_A = 0.005 + 1e-9;
  private static final double TOL_B = 0.0005 + 1e-9;
  private static final int N_A = 1000;
  private static final int N_B = 1500;

  @TempDir Path dir;
  private Path tileA;
  private Path tileB;

  private static SurveyUnits metres() {
    return new SurveyUnits(LinearUnit.METRE, LinearUnit.METRE, "Ridgeway grid",
        OptionalInt.empty(), "", "test");
  }

  /** Point i of a tile: x = base + i, y = 2 i, z = i / 10, class i mod 7 (metres). */
  private static PointChunk points(int n, double base) {
    PointChunk c = new PointChunk(n);
    for (int i = 0; i < n; i++) {
      c.add(base + i, 2.0 * i, i / 10.0, i % 7);
      c.gpsTime()[i] = i;
    }
    return c;
  }

  @BeforeEach
  void writeTiles() {
    tileA = dir.resolve("a.las");
    tileB = dir.resolve("b.las");
    try (LasWriter w = LasWriter.create(tileA, LasWriterOptions.of(2, PointFormat.F1)
        .withScale(0.01, 0.01, 0.01).withOffset(600_000, 0, 0).withCrs(metres()))) {
      w.write(points(N_A, 600_000));
    }
    try (LasWriter w = LasWriter.create(tileB, LasWriterOptions.of(4, PointFormat.F7)
        .withScale(0.001, 0.001, 0.001).withOffset(601_000, 0, 0).withCrs(metres()))) {
      w.write(points(N_B, 601_000));
    }
  }

  @Test
  void tilesOfDifferentFormatsAndScalesReadAsOne() {
    Survey s = Survey.open(List.of(tileA, tileB), UnitsChoice.fromFile(), 256);
    assertEquals(N_A + N_B, s.pointCount());
    assertEquals(600_000, s.bounds().minX(), TOL_A);
    assertEquals(601_000 + N_B - 1, s.bounds().maxX(), TOL_B);
    List<String> order = new ArrayList<>();
    long[] count = new long[2];
    s.read(c -> {
      order.add(c.fileIndex() + ":" + c.firstRecord());
      double base = c.fileIndex() == 0 ? 600_000 : 601_000;
      double tol = c.fileIndex() == 0 ? TOL_A : TOL_B;
      for (int i = 0; i < c.size(); i++) {
        long rec = c.firstRecord() + i;
        assertEquals(base + rec, c.x()[i], tol);
        assertEquals(2.0 * rec, c.y()[i], tol);
        assertEquals(rec / 10.0, c.z()[i], tol);
        assertEquals(rec % 7, c.classification()[i]);
        assertEquals(rec, c.gpsTime()[i], 0.0);
      }
      count[c.fileIndex()] += c.size();
    });
    // 1000 = 3 x 256 + 232 and 1500 = 5 x 256 + 220: chunks in file and record order.
    assertEquals(List.of("0:0", "0:256", "0:512", "0:768", "1:0", "1:256", "1:512", "1:768",
        "1:1024", "1:1280"), order);
    assertEquals(N_A, count[0]);
    assertEquals(N_B, count[1]);
  }

  @Test
  void parallelReadCoversEveryChunkOnce() {
    Survey s = Survey.open(List.of(tileA, tileB), UnitsChoice.fromFile(), 100);
    List<Set<String>> perWorker = Collections.synchronizedList(new ArrayList<>());
    List<double[]> sums = Collections.synchronizedList(new ArrayList<>());
    s.readParallel(3, () -> {
      Set<String> mine = new HashSet<>();
      double[] sum = new double[1];
      perWorker.add(mine);
      sums.add(sum);
      return c -> {
        mine.add(c.fileIndex() + ":" + c.firstRecord());
        for (int i = 0; i < c.size(); i++) {
          sum[0] += c.y()[i];
        }
      };
    });
    Set<String> all = new HashSet<>();
    int total = 0;
    for (Set<String> m : perWorker) {
      total += m.size();
      all.addAll(m);
    }
    assertEquals(3, perWorker.size());
    assertEquals(10 + 15, total);
    assertEquals(25, all.size());
    double sum = sums.stream().mapToDouble(a -> a[0]).sum();
    // sum of 2i over i < n is n (n - 1).
    assertEquals((double) N_A * (N_A - 1) + (double) N_B * (N_B - 1), sum, 1e-3);
  }

  @Test
  void aRecordRangeReadsThoseRecordsOnly() {
    Survey s = Survey.open(List.of(tileA, tileB), UnitsChoice.fromFile(), 256);
    List<String> order = new ArrayList<>();
    double[] sumY = new double[1];
    s.readRecords(1, 300, 700, c -> {
      order.add(c.fileIndex() + ":" + c.firstRecord() + "+" + c.size());
      for (int i = 0; i < c.size(); i++) {
        long rec = c.firstRecord() + i;
        assertEquals(601_000 + rec, c.x()[i], TOL_B);
        sumY[0] += c.y()[i];
      }
    });
    // 700 records from 300 in chunks of 256: 256 + 256 + 188.
    assertEquals(List.of("1:300+256", "1:556+256", "1:812+188"), order);
    // sum of 2i for i in [300, 1000) is 999 * 1000 - 299 * 300 = 909 300.
    assertEquals(909_300.0, sumY[0], 1e-3);
    assertThrows(IllegalArgumentException.class, () -> s.readRecords(0, 900, 101, c -> { }));
  }

  @Test
  void rawScanReadsAllPointBytes() {
    Survey s = Survey.open(List.of(tileA, tileB), UnitsChoice.fromFile());
    assertEquals(N_A * 28L + N_B * 36L, s.rawScan());
  }

  @Test
  void failureInAWorkerStopsTheReadAndIsRethrown() {
    Survey s = Survey.open(List.of(tileA, tileB), UnitsChoice.fromFile(), 100);
    IllegalStateException e = assertThrows(IllegalStateException.class,
        () -> s.readParallel(2, () -> (Consumer<PointChunk>) c -> {
          if (c.fileIndex() == 1) {
            throw new IllegalStateException("consumer gave up");
          }
        }));
    assertEquals("consumer gave up", e.getMessage());
  }

  @Test
  void unitsMismatchBetweenTilesIsAnError() {
    Path feet = dir.resolve("feet.las");
    try (LasWriter w = LasWriter.create(feet, LasWriterOptions.of(2, PointFormat.F0)
        .withCrs(new SurveyUnits(LinearUnit.FOOT, LinearUnit.FOOT, "", OptionalInt.empty(), "",
            "test")))) {
      w.write(points(5, 0));
    }
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(tileA, feet), UnitsChoice.fromFile()));
    assertTrue(e.getMessage().startsWith(feet.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("international foot"), e.getMessage());
    assertTrue(e.getMessage().contains(tileA.toString()), e.getMessage());
  }

  @Test
  void theSameFileTwiceIsAnError() {
    InputException e = assertThrows(InputException.class,
        () -> Survey.open(List.of(tileA, dir.resolve("./a.las")), UnitsChoice.fromFile()));
    assertTrue(e.getMessage().contains("given twice"), e.getMessage());
  }

  @Test
  void summaryCountsOccupiedCells() {
    // Tile A, point i at x = 600000 + i, y = 2 i (i < 1000), 5 m cells (hand count): for
    // i = 5k..5k+4 the cell column is k and 2i = 10k..10k+8 gives rows 2k (i = 5k..5k+2) and
    // 2k+1 (i = 5k+3, 5k+4): two cells per block of five points, 200 blocks, 400 cells.
    SurveySummary s = SurveySummary.compute(List.of(tileA), UnitsChoice.fromFile(), 1);
    assertEquals(N_A, s.pointCount());
    assertEquals(400, s.occupiedCells().getAsLong());
    assertEquals(400 * 25.0, s.occupiedArea(), 1e-9);
    assertEquals(N_A / (400 * 25.0), s.density(), 1e-12);
    assertEquals(0, s.gpsTimeMin(), 0);
    assertEquals(N_A - 1, s.gpsTimeMax(), 0);
  }

  @Test
  void emptyTileBetweenTilesIsSkipped() {
    Path empty = dir.resolve("empty.las");
    LasWriter.create(empty, LasWriterOptions.of(2, PointFormat.F0).withCrs(metres())).close();
    Survey s = Survey.open(List.of(tileA, empty, tileB), UnitsChoice.fromFile(), 500);
    List<String> order = new ArrayList<>();
    s.read(c -> order.add(c.fileIndex() + ":" + c.firstRecord() + "+" + c.size()));
    assertEquals(List.of("0:0+500", "0:500+500", "2:0+500", "2:500+500", "2:1000+500"), order);
    long[] n = new long[1];
    s.readParallel(2, () -> c -> {
      synchronized (n) {
        n[0] += c.size();
      }
    });
    assertEquals(N_A + N_B, n[0]);
  }

  @Test
  void fileThatShrinksAfterOpeningIsAnInputError() throws java.io.IOException {
    Survey s = Survey.open(List.of(tileA), UnitsChoice.fromFile());
    try (java.io.RandomAccessFile f = new java.io.RandomAccessFile(tileA.toFile(), "rw")) {
      f.setLength(f.length() - 100);
    }
    InputException e = assertThrows(InputException.class, () -> s.read(c -> { }));
    assertTrue(e.getMessage().startsWith(tileA.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("damaged or changed"), e.getMessage());
  }
}
