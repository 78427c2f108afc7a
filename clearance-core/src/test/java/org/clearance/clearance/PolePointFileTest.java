package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.clearance.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** pole-points.bin: round trip, order, and a damaged file named as such. */
class PolePointFileTest {

  @TempDir Path dir;

  private static final PolePointFile LAYOUT = new PolePointFile(5.0, 4.0, 0.33, List.of(
      new PolePointFile.Pole("F7", "P201", 100.0, 200.0, 0),
      new PolePointFile.Pole("F7", "P202", 150.0, 200.0, 0)));

  private static final List<PolePoint> POINTS = List.of(
      new PolePoint("F7", "P202", 151.0, 201.0, 12.5, 5, 2.5, 1.414),
      new PolePoint("F7", "P201", 102.0, 200.0, 11.0, 3, 1.0, 2.0),
      new PolePoint("F7", "P201", 101.0, 200.5, 10.25, 4, 0.25, 1.118));

  private Path write(String name, List<PolePoint> points) throws IOException {
    Path f = dir.resolve(name);
    PolePointWriter w = new PolePointWriter(f, LAYOUT);
    w.write(points);
    w.close();
    return f;
  }

  @Test
  void pointsComeBackSortedByStructureThenPosition() throws IOException {
    Path f = write("a.bin", POINTS);
    List<PolePoint> back = new ArrayList<>();
    PolePointFile layout = PolePointReader.forEach(f, back::add);
    assertEquals(LAYOUT, layout);
    assertEquals(List.of(POINTS.get(2), POINTS.get(1), POINTS.get(0)).stream()
        .map(p -> p.structureId() + " " + p.x()).toList(),
        back.stream().map(p -> p.structureId() + " " + p.x()).toList());
    // float32 fields: height above ground and plan distance within float precision
    assertEquals(1.414, back.get(2).planDistanceM(), 1e-6);
    assertEquals(12.5, back.get(2).z(), 0.0);
    Path g = write("b.bin", List.of(POINTS.get(1), POINTS.get(0), POINTS.get(2)));
    assertArrayEquals(Files.readAllBytes(f), Files.readAllBytes(g));
  }

  @Test
  void aCutExtendedOrFlippedFileIsRefusedNamingTheFile() throws IOException {
    byte[] good = Files.readAllBytes(write("good.bin", POINTS));
    Path cut = dir.resolve("cut.bin");
    Files.write(cut, Arrays.copyOf(good, good.length - 3));
    Path longer = dir.resolve("longer.bin");
    Files.write(longer, Arrays.copyOf(good, good.length + PolePointFile.RECORD_BYTES));
    Path flipped = dir.resolve("flipped.bin");
    byte[] f = good.clone();
    f[good.length - RecordFiles.TRAILER_BYTES - 4] ^= 0x01; // lowest bit of the last float
    Files.write(flipped, f);
    for (Path p : List.of(cut, longer, flipped)) {
      InputException e = assertThrows(InputException.class,
          () -> PolePointReader.forEach(p, x -> { }));
      assertTrue(e.getMessage().contains(p.getFileName().toString())
          && e.getMessage().contains("run the check again"), e.getMessage());
    }
    InputException e = assertThrows(InputException.class,
        () -> PolePointReader.forEach(flipped, x -> { }));
    assertTrue(e.getMessage().contains("CRC-32C"), e.getMessage());
  }
}
