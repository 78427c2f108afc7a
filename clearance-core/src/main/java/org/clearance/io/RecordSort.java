package org.clearance.io;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.PriorityQueue;

/**
 * Sorts a file of fixed-size binary records into a stream, in bounded memory: runs of at most
 * {@code runBytes} are sorted in memory and, when there is more than one, written to temporary
 * files beside the input and merged (external merge sort; Knuth, The Art of Computer
 * Programming vol. 3, section 5.4). Records that compare equal are byte-identical for the orders
 * used here, so the result does not depend on the input order.
 */
public final class RecordSort {

  /** Bytes of records sorted in memory at once; bounds the memory of a sort. */
  public static final int RUN_BYTES = 32 << 20;
  /** Buffer of each stream. */
  private static final int BUFFER_BYTES = 1 << 16;

  /** An order of records given as byte arrays and offsets. */
  @FunctionalInterface
  public interface Order {
    /** Compares the record at {@code a[ai..]} with the one at {@code b[bi..]}. */
    int compare(byte[] a, int ai, byte[] b, int bi);
  }

  private RecordSort() {}

  /**
   * Writes the records of {@code in} to {@code out} in order.
   *
   * @param in a file of whole records
   * @param recordBytes bytes per record
   * @param order the order
   * @param out where the sorted records go (not closed)
   * @param runBytes bytes sorted in memory at once ({@link #RUN_BYTES} normally)
   * @return number of records
   * @throws IOException when the file is not whole records, or on a read or write failure
   */
  public static long sort(Path in, int recordBytes, Order order, OutputStream out, int runBytes)
      throws IOException {
    long size = Files.size(in);
    if (size % recordBytes != 0) {
      throw new IOException(in + ": " + size + " bytes is not a whole number of "
          + recordBytes + "-byte records");
    }
    long n = size / recordBytes;
    int perRun = Math.max(1, runBytes / recordBytes);
    List<Path> runs = new ArrayList<>();
    try (InputStream is = new BufferedInputStream(Files.newInputStream(in), BUFFER_BYTES)) {
      if (n <= perRun) {
        writeSorted(is.readNBytes((int) size), recordBytes, order, out);
        return n;
      }
      for (long left = n; left > 0; left -= perRun) {
        int count = (int) Math.min(perRun, left);
        Path run = AtomicFiles.tempFileBeside(in);
        runs.add(run);
        try (OutputStream ro = new BufferedOutputStream(Files.newOutputStream(run),
            BUFFER_BYTES)) {
          writeSorted(is.readNBytes(count * recordBytes), recordBytes, order, ro);
        }
      }
      merge(runs, recordBytes, order, out);
      return n;
    } finally {
      for (Path r : runs) {
        Files.deleteIfExists(r);
      }
    }
  }

  private static void writeSorted(byte[] buf, int rb, Order order, OutputStream out)
      throws IOException {
    int n = buf.length / rb;
    Integer[] idx = new Integer[n];
    Arrays.setAll(idx, i -> i);
    Arrays.sort(idx, (i, j) -> order.compare(buf, i * rb, buf, j * rb));
    for (int i : idx) {
      out.write(buf, i * rb, rb);
    }
  }

  /** The head record of one run being merged. */
  private static final class Head {
    final InputStream in;
    final byte[] record;

    Head(InputStream in, int rb) {
      this.in = in;
      this.record = new byte[rb];
    }

    boolean next() throws IOException {
      return in.readNBytes(record, 0, record.length) == record.length;
    }
  }

  private static void merge(List<Path> runs, int rb, Order order, OutputStream out)
      throws IOException {
    PriorityQueue<Head> heads = new PriorityQueue<>(
        (a, b) -> order.compare(a.record, 0, b.record, 0));
    List<InputStream> open = new ArrayList<>();
    try {
      for (Path r : runs) {
        InputStream in = new BufferedInputStream(Files.newInputStream(r), BUFFER_BYTES);
        open.add(in);
        Head h = new Head(in, rb);
        if (h.next()) {
          heads.add(h);
        }
      }
      while (!heads.isEmpty()) {
        Head h = heads.poll();
        out.write(h.record);
        if (h.next()) {
          heads.add(h);
        }
      }
    } finally {
      for (InputStream in : open) {
        in.close();
      }
    }
  }
}
