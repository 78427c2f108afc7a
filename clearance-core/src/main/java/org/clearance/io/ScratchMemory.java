package org.clearance.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.MappedByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Working memory outside the Java heap for structures that grow with the corridor (the ground
 * and canopy rasters, the keys of the points set aside): a region of a temporary file mapped into
 * memory, so the operating system pages it to disk when memory is short and the heap the check
 * needs stays that of a few blocks of the line, not of the survey (docs/benchmark.md, "Heap flat
 * in survey size").
 *
 * <p>The file is opened with {@link StandardOpenOption#DELETE_ON_CLOSE} and closed as soon as it
 * is mapped (a mapping does not depend on its channel, {@link FileChannel#map}): on Linux and
 * macOS its name is removed as it is opened, on Windows when it is closed, so no file is left
 * behind, whether the check ends, fails or is killed. The region lives until its buffer is
 * collected. The folder is the JVM's temporary folder ({@code java.io.tmpdir}, which a user may
 * point at a disk with room: {@code java -Djava.io.tmpdir=DIR -jar clearance.jar ...}).
 */
public final class ScratchMemory {

  /** File name prefix of the scratch files (seen only for the moment between create and open). */
  static final String PREFIX = "clearance-scratch-";
  /** Zeros written at a time when a region is made, bytes. */
  private static final int ZERO_CHUNK_BYTES = 1 << 16;

  private ScratchMemory() {}

  /**
   * A new zero-filled region of {@code bytes} bytes, native byte order, outside the heap.
   *
   * @param bytes size, 1 to {@link Integer#MAX_VALUE}
   * @throws UncheckedIOException when the temporary file cannot be made or mapped (a full disk)
   */
  public static MappedByteBuffer map(long bytes) {
    return map(bytes, Path.of(System.getProperty("java.io.tmpdir")));
  }

  /** {@link #map(long)} with the file in {@code folder}. */
  static MappedByteBuffer map(long bytes, Path folder) {
    if (bytes < 1 || bytes > Integer.MAX_VALUE) {
      throw new IllegalArgumentException("scratch region size out of range: " + bytes);
    }
    Path file = null;
    try {
      file = Files.createTempFile(folder, PREFIX, ".bin");
      try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ,
          StandardOpenOption.WRITE, StandardOpenOption.DELETE_ON_CLOSE)) {
        // written out first: a full disk is then an I/O error here, not a fault later on a
        // write to a mapped page the file system cannot back
        ByteBuffer zeros = ByteBuffer.allocate((int) Math.min(bytes, ZERO_CHUNK_BYTES));
        for (long at = 0; at < bytes; ) {
          zeros.clear().limit((int) Math.min(zeros.capacity(), bytes - at));
          at += ch.write(zeros, at);
        }
        MappedByteBuffer region = ch.map(FileChannel.MapMode.READ_WRITE, 0, bytes);
        region.order(ByteOrder.nativeOrder());
        return region;
      }
    } catch (IOException e) {
      throw new UncheckedIOException("cannot make " + bytes + " bytes of scratch memory in "
          + folder + " (the temporary folder): " + e.getMessage(), e);
    } finally {
      if (file != null) {
        try {
          Files.deleteIfExists(file);
        } catch (IOException ignored) {
          // deleted on close already (Windows: once the mapping is released)
        }
      }
    }
  }
}
