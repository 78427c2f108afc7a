package org.clearance.label;

import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;

/**
 * The points of every block window, binned in the one pass over the survey and kept on disk
 * until their block is labelled, so the heap holds one window per labelling thread whatever the
 * survey's size. One temporary file in the given folder (the run's staging folder for a check)
 * holds segments of up to {@link #SEGMENT_POINTS} points of one block each, in columns
 * ({@link LabelPoints#writeColumns}, {@link LabelPoints#BYTES_PER_POINT} bytes a point); the
 * file is deleted when the store is closed.
 */
final class LabelStore implements Closeable {

  /** Most points of a segment: 4 096 x 31 bytes, a write of about 127 KiB. */
  static final int SEGMENT_POINTS = 4096;

  private final FileChannel channel;
  private long end;
  /** Per block: the file offset and the point count of each of its segments. */
  private final long[][] offsets;
  private final int[][] counts;
  private final int[] segments;
  private final long[] points;

  /**
   * @param folder where the temporary file goes
   * @param blocks the number of blocks
   * @throws IOException when the file cannot be created
   */
  LabelStore(Path folder, int blocks) throws IOException {
    Path file = Files.createTempFile(folder, ".labelling-", ".points");
    channel = FileChannel.open(file, StandardOpenOption.READ, StandardOpenOption.WRITE,
        StandardOpenOption.DELETE_ON_CLOSE);
    offsets = new long[blocks][8];
    counts = new int[blocks][8];
    segments = new int[blocks];
    points = new long[blocks];
  }

  /** A buffer for one segment, in the store's byte order. */
  static ByteBuffer segmentBuffer() {
    return ByteBuffer.allocate(SEGMENT_POINTS * LabelPoints.BYTES_PER_POINT)
        .order(ByteOrder.LITTLE_ENDIAN);
  }

  /**
   * Appends {@code p}'s points (at most {@link #SEGMENT_POINTS}) to block {@code block}'s.
   * Safe to call from several threads at once.
   *
   * @param buffer a buffer of {@link #segmentBuffer} owned by the caller
   */
  void append(int block, LabelPoints p, ByteBuffer buffer) throws IOException {
    if (p.size == 0) {
      return;
    }
    p.writeColumns(buffer);
    long at;
    synchronized (this) {
      at = end;
      end += buffer.remaining();
      int s = segments[block]++;
      if (s == offsets[block].length) {
        offsets[block] = Arrays.copyOf(offsets[block], 2 * s);
        counts[block] = Arrays.copyOf(counts[block], 2 * s);
      }
      offsets[block][s] = at;
      counts[block][s] = p.size;
      points[block] += p.size;
    }
    while (buffer.hasRemaining()) {
      at += channel.write(buffer, at);
    }
  }

  /** Points stored for block {@code block}. */
  synchronized long points(int block) {
    return points[block];
  }

  /**
   * The points stored for block {@code block}, in the order they were stored. Safe to call from
   * several threads at once once every append is done.
   */
  LabelPoints read(int block) throws IOException {
    long n = points(block);
    if (n >= Integer.MAX_VALUE) {
      throw new IllegalStateException("too many points in one block window: " + n);
    }
    LabelPoints p = LabelPoints.holder((int) n);
    ByteBuffer buffer = segmentBuffer();
    for (int s = 0; s < segments[block]; s++) {
      int count = counts[block][s];
      buffer.clear().limit(count * LabelPoints.BYTES_PER_POINT);
      long at = offsets[block][s];
      while (buffer.hasRemaining()) {
        int got = channel.read(buffer, at);
        if (got < 0) {
          throw new IOException("labelling store ends early");
        }
        at += got;
      }
      buffer.flip();
      p.readColumns(buffer, count);
    }
    return p;
  }

  @Override
  public void close() throws IOException {
    channel.close();
  }
}
