package org.clearance.examples;

import com.sun.nio.file.ExtendedOpenOption;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.Optional;

/**
 * A cold read of a file without root: the whole file read with {@code O_DIRECT} (the JDK's
 * {@link ExtendedOpenOption#DIRECT}, Linux and a file system that supports it), which bypasses
 * the page cache, so the figure is the disk's (or the virtual disk's host cache's), whatever the
 * page cache holds. Nothing is decoded.
 */
final class ColdRead {

  /** Said when the file system refuses direct reads. */
  static final String UNAVAILABLE = "not measured (the file system refuses O_DIRECT reads)";
  /** Bytes per read: large, so that the figure is the disk's streaming rate. */
  static final int BUFFER_BYTES = 8 << 20;

  /**
   * @param bytes bytes read
   * @param seconds wall time, s
   */
  record Result(long bytes, double seconds) {
    String describe() {
      return String.format(Locale.ROOT, "%,d bytes in %.3f s (%.0f MB/s, O_DIRECT)", bytes,
          seconds, bytes / seconds / 1e6);
    }
  }

  private ColdRead() {}

  /** Reads the whole file with the page cache bypassed; empty when the system refuses. */
  static Optional<Result> read(Path file) {
    int block;
    try {
      block = (int) Files.getFileStore(file).getBlockSize();
    } catch (UnsupportedOperationException | IOException e) {
      return Optional.empty();
    }
    ByteBuffer buf = ByteBuffer.allocateDirect(BUFFER_BYTES + block).alignedSlice(block);
    long t0 = System.nanoTime();
    long total = 0;
    try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ,
        ExtendedOpenOption.DIRECT)) {
      long size = ch.size();
      while (total < size) {
        buf.clear();
        int n = ch.read(buf, total);
        if (n <= 0) {
          break;
        }
        total += n;
      }
    } catch (UnsupportedOperationException | IOException e) {
      return Optional.empty();
    }
    return Optional.of(new Result(total, (System.nanoTime() - t0) / 1e9));
  }
}
