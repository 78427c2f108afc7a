package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** External sort of fixed-size records: runs merged give what one in-memory sort gives. */
class RecordSortTest {

  @TempDir Path dir;

  @Test
  void aLargeFileIsSortedInRunsAndMergedToTheSameBytes() throws IOException {
    // RecordSort with runs of 10 records forces the merge path on a small file
    Path unsorted = dir.resolve("records");
    int rb = 8;
    byte[] data = new byte[rb * 95];
    new Random(3).nextBytes(data);
    Files.write(unsorted, data);
    RecordSort.Order order = (x, xi, y, yi) -> Arrays.compareUnsigned(x, xi, xi + rb,
        y, yi, yi + rb);
    ByteArrayOutputStream merged = new ByteArrayOutputStream();
    assertEquals(95, RecordSort.sort(unsorted, rb, order, merged, 10 * rb));
    ByteArrayOutputStream inMemory = new ByteArrayOutputStream();
    RecordSort.sort(unsorted, rb, order, inMemory, RecordSort.RUN_BYTES);
    assertArrayEquals(inMemory.toByteArray(), merged.toByteArray());
    byte[] out = merged.toByteArray();
    for (int i = 1; i < 95; i++) {
      assertTrue(order.compare(out, (i - 1) * rb, out, i * rb) <= 0, "record " + i);
    }
    try (Stream<Path> s = Files.list(dir)) {
      assertEquals(1, s.count(), "the run files are deleted");
    }
  }
}
