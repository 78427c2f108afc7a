package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * near-points.bin format 2: the same points give the same bytes whatever the order they were
 * written in (issue 10, item 11), and a damaged file is an input error naming the file (item 9).
 */
class NearPointFileTest {

  private static final NearPointFile LAYOUT = new NearPointFile(List.of("survey", "hot"),
      List.of("survey", "hot"), List.of("L/A-B", "L/B-C"), List.of("P1", "P2"));

  @TempDir Path dir;

  /** Seeded points: two spans, some sharing x so that y and z decide the order. */
  private static List<PointClearance> points(int n, long seed) {
    Random r = new Random(seed);
    List<PointClearance> out = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      double x = r.nextInt(20);
      List<ConditionDistance> ds = List.of(
          new ConditionDistance("survey", "survey", r.nextDouble() * 10, 1, 2, "P1", 50),
          new ConditionDistance("hot", "hot", r.nextDouble() * 10, 1, 2,
              r.nextBoolean() ? "P2" : "", 60));
      out.add(new PointClearance(LAYOUT.spanIds().get(r.nextInt(2)), x, r.nextInt(5),
          r.nextDouble() * 30, 5, 3.5, ds));
    }
    return out;
  }

  private Path write(String name, List<PointClearance> pts, int batch) throws IOException {
    Path f = dir.resolve(name);
    try (NearPointWriter w = new NearPointWriter(f, LAYOUT)) {
      for (int i = 0; i < pts.size(); i += batch) {
        w.write(pts.subList(i, Math.min(pts.size(), i + batch)));
      }
    }
    return f;
  }

  @Test
  void samePointsInAnyOrderGiveTheSameBytesSortedBySpanAndPosition() throws IOException {
    List<PointClearance> pts = points(2000, 7);
    Path a = write("a.bin", pts, 100);
    List<PointClearance> shuffled = new ArrayList<>(pts);
    Collections.shuffle(shuffled, new Random(8));
    Path b = write("b.bin", shuffled, 37);
    assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
    List<PointClearance> back = new ArrayList<>();
    NearPointReader.forEach(a, back::add);
    assertEquals(pts.size(), back.size());
    for (int i = 1; i < back.size(); i++) {
      PointClearance p = back.get(i - 1);
      PointClearance q = back.get(i);
      int span = p.spanId().compareTo(q.spanId());
      assertTrue(span < 0 || span == 0 && (p.x() < q.x() || p.x() == q.x() && p.y() <= q.y()),
          "record " + i);
    }
    try (Stream<Path> s = Files.list(dir)) {
      assertEquals(2, s.count(), "no temporary file left");
    }
  }

  @Test
  void damagedFilesAreInputErrorsNamingTheFile() throws IOException {
    Path good = write("good.bin", points(50, 1), 50);
    byte[] bytes = Files.readAllBytes(good);
    // truncated, one bit flipped in a record, an older format, another file
    byte[] cut = java.util.Arrays.copyOf(bytes, bytes.length - 7);
    byte[] flipped = bytes.clone();
    flipped[bytes.length / 2] ^= 0x10;
    byte[] older = bytes.clone();
    older[7] = '1';
    byte[] text = "span_id,x\n".getBytes(StandardCharsets.UTF_8);
    String[][] cases = {{"cut", "ends early|end marker|whole number"}, {"flipped", "CRC-32C|outside the header"},
        {"older", "format 1"}, {"text", "not a near-points file|ends"}};
    byte[][] contents = {cut, flipped, older, text};
    for (int i = 0; i < cases.length; i++) {
      Path f = Files.write(dir.resolve(cases[i][0] + ".bin"), contents[i]);
      InputException e = assertThrows(InputException.class, () -> NearPointReader.verify(f),
          cases[i][0]);
      assertTrue(e.getMessage().contains(f.toString()), e.getMessage());
      assertTrue(java.util.regex.Pattern.compile(cases[i][1]).matcher(e.getMessage()).find(),
          cases[i][0] + ": " + e.getMessage());
    }
  }
}
