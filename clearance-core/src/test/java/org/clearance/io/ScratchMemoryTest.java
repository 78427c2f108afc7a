package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.LongBuffer;
import java.nio.MappedByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ScratchMemoryTest {

  @Test
  void leavesNoFileBehindAndKeepsWhatIsWritten(@TempDir Path folder) throws IOException {
    // Issue 12: every temporary file is removed, also on failure. On Linux the name goes as the
    // file is opened (DELETE_ON_CLOSE), so the folder is empty while the region is in use.
    MappedByteBuffer region = ScratchMemory.map(1 << 20, folder);
    LongBuffer longs = region.asLongBuffer();
    for (int i = 0; i < longs.capacity(); i++) {
      longs.put(i, i * 31L);
    }
    for (int i = 0; i < longs.capacity(); i++) {
      assertEquals(i * 31L, longs.get(i));
    }
    try (Stream<Path> left = Files.list(folder)) {
      assertEquals(0, left.count(), "scratch file left in " + folder);
    }
  }

  @Test
  void aFolderThatCannotHoldTheFileIsAClearError(@TempDir Path folder) {
    Path missing = folder.resolve("no-such-folder");
    UncheckedIOException e = assertThrows(UncheckedIOException.class,
        () -> ScratchMemory.map(4096, missing));
    assertTrue(e.getMessage().contains("no-such-folder"), e.getMessage());
  }
}
