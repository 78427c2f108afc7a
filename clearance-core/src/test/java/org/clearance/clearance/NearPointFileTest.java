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
import org.clearance.line.ConductorPosition.Role;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * near-points.bin format 3: the same points give the same bytes whatever the order they were
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

  /**
   * Issue 9 (wire sites): a point on a wire touched by vegetation keeps its mark through the
   * file (bit 8 of the class field) and its ASPRS class; other points read back unmarked.
   */
  @Test
  void wireTouchedMarkRoundTrips() throws IOException {
    List<ConditionDistance> ds = List.of(
        new ConditionDistance("survey", "survey", 0.02, 0.01, -0.01, "P1", 50),
        new ConditionDistance("hot", "hot", 0.5, 0.3, -0.4, "P2", 50));
    PointClearance wire = new PointClearance("L/A-B", 1, 2, 3, 1, 9.5, ds, List.of(), List.of(),
        List.of(), true);
    PointClearance branch = new PointClearance("L/A-B", 1.1, 2, 3, 5, 9.5, ds);
    Path f = write("touched.bin", List.of(branch, wire), 2);
    List<PointClearance> back = new ArrayList<>();
    NearPointReader.forEach(f, back::add);
    assertEquals(2, back.size());
    assertTrue(back.get(0).wireTouched(), back.get(0).toString());
    assertEquals(1, back.get(0).classification());
    assertTrue(!back.get(1).wireTouched(), back.get(1).toString());
    assertEquals(5, back.get(1).classification());
  }

  /**
   * Issue 15: a point keeps its distance to the nearest neutral and shield wire beside the one
   * to the nearest energised conductor; a span without such conductors reads back without them.
   */
  @Test
  void distancesPerRoleRoundTrip() throws IOException {
    NearPointFile layout = new NearPointFile(List.of("survey", "hot"), List.of("survey", "hot"),
        List.of("F/1-2", "F/2-3"), List.of("A", "N", "SW"),
        List.of(Role.PHASE, Role.NEUTRAL, Role.SHIELD));
    List<ConditionDistance> phase = List.of(
        new ConditionDistance("survey", "survey", 2.5, 1.5, -2.0, "A", 30),
        new ConditionDistance("hot", "hot", 2.25, 1.5, -1.6770510, "A", 31));
    List<ConditionDistance> neutral = List.of(
        new ConditionDistance("survey", "survey", 0.5, 0.3, -0.4, "N", 29),
        new ConditionDistance("hot", "hot", Double.NaN, Double.NaN, Double.NaN, "", Double.NaN));
    List<ConditionDistance> shield = List.of(
        new ConditionDistance("survey", "survey", 5.0, 3.0, -4.0, "SW", 28),
        new ConditionDistance("hot", "hot", 4.5, 2.7, -3.6, "SW", 27));
    PointClearance a = new PointClearance("F/1-2", 1, 2, 3, 5, 1.5, phase, neutral, shield);
    PointClearance b = new PointClearance("F/2-3", 4, 5, 6, 3, 0.5, phase);
    Path f = dir.resolve("roles.bin");
    try (NearPointWriter w = new NearPointWriter(f, layout)) {
      w.write(List.of(b, a));
    }
    List<PointClearance> back = new ArrayList<>();
    assertEquals(layout, NearPointReader.forEach(f, back::add));
    assertEquals(2, back.size());
    PointClearance ra = back.get(0);
    assertEquals(0.5, ra.neutral().get(0).distance(), 1e-6);
    assertEquals("N", ra.neutral().get(0).conductor());
    assertTrue(Double.isNaN(ra.neutral().get(1).distance()));
    assertEquals(4.5, ra.shield().get(1).distance(), 1e-6);
    assertEquals("SW", ra.shield().get(1).conductor());
    assertEquals(2.25, ra.distances().get(1).distance(), 1e-6);
    assertEquals(6, ra.distancesFor(java.util.EnumSet.allOf(Role.class)).size());
    PointClearance rb = back.get(1);
    assertTrue(rb.neutral().isEmpty() && rb.shield().isEmpty(), rb.toString());
    assertEquals(2, rb.distancesFor(java.util.EnumSet.allOf(Role.class)).size());
    assertEquals(NearPointFile.FIXED_BYTES + 3 * 2 * NearPointFile.CONDITION_BYTES,
        layout.recordBytes());
  }

  /**
   * Issue 15: on a span whose circuits carry 230 and 12.47 kV, a point keeps its distance to
   * the nearest conductor of each voltage; a span of one voltage reads back without them.
   */
  @Test
  void distancesPerVoltageRoundTrip() throws IOException {
    NearPointFile layout = new NearPointFile(List.of("survey", "hot"), List.of("survey", "hot"),
        List.of("U/1-2", "F/1-2"), List.of("B", "D"), List.of(Role.PHASE), List.of(230.0, 12.47));
    List<ConditionDistance> to12 = List.of(
        new ConditionDistance("survey", "survey", 1.5, 1.0, -1.1180340, "D", 40),
        new ConditionDistance("hot", "hot", 1.25, 1.0, -0.75, "D", 41));
    List<ConditionDistance> to230 = List.of(
        new ConditionDistance("survey", "survey", 4.5, 2.0, 4.0311289, "B", 42),
        new ConditionDistance("hot", "hot", 4.0, 2.0, 3.4641016, "B", 43));
    PointClearance a = new PointClearance("U/1-2", 1, 2, 3, 5, 1.5, to12, List.of(), List.of(),
        List.of(new PointClearance.VoltageDistances(230, to230),
            new PointClearance.VoltageDistances(12.47, to12)));
    PointClearance b = new PointClearance("F/1-2", 4, 5, 6, 3, 0.5, to12);
    Path f = dir.resolve("voltages.bin");
    try (NearPointWriter w = new NearPointWriter(f, layout)) {
      w.write(List.of(a, b));
    }
    List<PointClearance> back = new ArrayList<>();
    assertEquals(layout, NearPointReader.forEach(f, back::add));
    PointClearance ra = back.get(0); // records sort by the header's span index: U/1-2 first
    PointClearance rb = back.get(1);
    assertTrue(rb.circuits().isEmpty(), rb.toString());
    assertEquals(2, ra.circuits().size());
    assertEquals(4.0, ra.atVoltage(230).distances().get(1).distance(), 1e-6);
    assertEquals("B", ra.atVoltage(230).distances().get(0).conductor());
    assertEquals(1.5, ra.atVoltage(12.47).distances().get(0).distance(), 1e-6);
    assertEquals(NearPointFile.FIXED_BYTES + 3 * 2 * NearPointFile.CONDITION_BYTES,
        layout.recordBytes());
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
