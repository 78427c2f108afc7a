package org.clearance.survey;

import java.io.EOFException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.InputException;

/**
 * Streams the points of several LAS files in fixed-size chunks with positional reads
 * ({@link FileChannel#read(ByteBuffer, long)}, 64-bit offsets). Memory is one chunk and one byte
 * buffer per reading thread, whatever the size of the files.
 */
final class PointStreamer {
  /** Most threads a parallel read may use; more would only contend for the disk. */
  static final int MAX_THREADS = 256;
  /**
   * Largest read buffer per thread, bytes: 65 536 points of the longest standard record (67
   * bytes) fit; files with long records (extra bytes, up to 65 535 per record) get fewer points
   * per chunk instead of a buffer of gigabytes.
   */
  static final int MAX_BUFFER_BYTES = 8 << 20;

  private final List<LasFile> files;
  private final double horizontalFactor;
  private final double verticalFactor;
  private final int chunkPoints;
  private final int bufferBytes;
  /** Cumulative chunk counts: chunks of file i are [starts[i], starts[i + 1]). */
  private final long[] starts;

  /**
   * @param files the files, in order
   * @param horizontalFactor metres per horizontal file unit (1 keeps file units)
   * @param verticalFactor metres per vertical file unit (1 keeps file units)
   * @param chunkPoints most points per chunk, at least 1; fewer when the records are so long
   *     that the chunk would need more than {@link #MAX_BUFFER_BYTES}
   */
  PointStreamer(List<LasFile> files, double horizontalFactor, double verticalFactor,
      int chunkPoints) {
    if (chunkPoints < 1) {
      throw new IllegalArgumentException("chunkPoints must be at least 1: " + chunkPoints);
    }
    this.files = List.copyOf(files);
    this.horizontalFactor = horizontalFactor;
    this.verticalFactor = verticalFactor;
    int longest = 1;
    for (LasFile f : this.files) {
      longest = Math.max(longest, f.header().recordLength());
    }
    int points = chunkPoints(chunkPoints, longest);
    starts = new long[this.files.size() + 1];
    for (int i = 0; i < this.files.size(); i++) {
      LasHeader h = this.files.get(i).header();
      starts[i + 1] = starts[i] + (h.pointCount() + points - 1) / points;
    }
    this.chunkPoints = points;
    this.bufferBytes = points * longest;
  }

  /** Points per chunk for records of {@code recordLength} bytes: at most {@code wanted}. */
  static int chunkPoints(int wanted, int recordLength) {
    return Math.max(1, Math.min(wanted, MAX_BUFFER_BYTES / Math.max(1, recordLength)));
  }

  /** Reads all chunks in file and record order on the calling thread. */
  void read(Consumer<PointChunk> consumer) {
    Worker w = new Worker();
    try {
      for (long k = 0; k < starts[files.size()]; k++) {
        consumer.accept(w.load(k));
      }
    } finally {
      w.close();
    }
  }

  /**
   * Reads records {@code [first, first + count)} of file {@code fileIndex} in chunks on the
   * calling thread; a chunk's {@link PointChunk#firstRecord()} is its first record's number.
   */
  void readRecords(int fileIndex, long first, long count, Consumer<PointChunk> consumer) {
    LasHeader h = files.get(fileIndex).header();
    if (first < 0 || count < 0 || first + count > h.pointCount()) {
      throw new IllegalArgumentException("records [" + first + ", " + (first + count)
          + ") outside the file's " + h.pointCount() + " points");
    }
    Worker w = new Worker();
    try {
      for (long at = first; at < first + count; at += chunkPoints) {
        consumer.accept(w.load(fileIndex, at, (int) Math.min(chunkPoints, first + count - at)));
      }
    } finally {
      w.close();
    }
  }

  /**
   * Reads all chunks on {@code threads} worker threads, each with its own chunk, buffer and
   * consumer; chunks arrive in no particular order. The first failure stops all workers and is
   * rethrown here.
   */
  void readParallel(int threads, Supplier<Consumer<PointChunk>> consumers) {
    if (threads < 1 || threads > MAX_THREADS) {
      throw new IllegalArgumentException("threads must be 1 to " + MAX_THREADS + ": " + threads);
    }
    List<Consumer<PointChunk>> perWorker = new ArrayList<>();
    for (int t = 0; t < threads; t++) {
      perWorker.add(consumers.get());
    }
    AtomicLong next = new AtomicLong();
    AtomicBoolean stop = new AtomicBoolean();
    AtomicReference<Throwable> failure = new AtomicReference<>();
    long total = starts[files.size()];
    List<Thread> workers = new ArrayList<>();
    for (int t = 0; t < threads; t++) {
      Consumer<PointChunk> consumer = perWorker.get(t);
      Thread thread = new Thread(() -> {
        Worker w = null;
        try {
          w = new Worker();
          for (long k = next.getAndIncrement(); k < total && !stop.get();
              k = next.getAndIncrement()) {
            consumer.accept(w.load(k));
          }
        } catch (Throwable e) {
          // every failure, an OutOfMemoryError in the buffers included, reaches the caller
          failure.compareAndSet(null, e);
          stop.set(true);
        } finally {
          if (w != null) {
            w.close();
          }
        }
      }, "survey-reader-" + t);
      thread.setDaemon(true);
      workers.add(thread);
      thread.start();
    }
    try {
      for (Thread thread : workers) {
        thread.join();
      }
    } catch (InterruptedException e) {
      stop.set(true);
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while reading the survey", e);
    }
    Throwable f = failure.get();
    if (f instanceof RuntimeException r) {
      throw r;
    }
    if (f instanceof Error err) {
      throw err;
    }
    if (f != null) {
      throw new IllegalStateException("a survey reader failed", f);
    }
  }

  /** Reads every byte of the point data of every file without decoding; returns the count. */
  long rawScan() {
    ByteBuffer buf = ByteBuffer.allocateDirect(bufferBytes);
    long total = 0;
    for (LasFile f : files) {
      LasHeader h = f.header();
      long end = h.pointDataEnd();
      try (FileChannel ch = FileChannel.open(f.path(), StandardOpenOption.READ)) {
        for (long at = h.pointDataOffset(); at < end; ) {
          buf.clear();
          buf.limit((int) Math.min(buf.capacity(), end - at));
          LasFile.readFully(ch, buf, at);
          at += buf.limit();
          total += buf.limit();
        }
      } catch (EOFException e) {
        throw shrunk(f, e);
      } catch (IOException e) {
        throw new UncheckedIOException("cannot read " + f.path(), e);
      }
    }
    return total;
  }

  private static InputException shrunk(LasFile f, EOFException e) {
    return new InputException(f.path(), "point data", null, e.getMessage()
        + ", before the end of the point data: the file is damaged or changed after opening");
  }

  /** One thread's chunk, buffer and open file. */
  private final class Worker {
    private final PointChunk chunk = new PointChunk(chunkPoints);
    private final ByteBuffer buf =
        ByteBuffer.allocateDirect(bufferBytes).order(ByteOrder.LITTLE_ENDIAN);
    private int fileIndex = -1;
    private FileChannel channel;
    private PointDecoder decoder;

    /** Reads and decodes global chunk {@code k}. */
    PointChunk load(long k) {
      int i = Arrays.binarySearch(starts, k);
      i = i >= 0 ? i : -i - 2;
      while (starts[i + 1] == k) {
        i++;
      }
      long first = (k - starts[i]) * chunkPoints;
      return load(i, first, (int) Math.min(chunkPoints,
          files.get(i).header().pointCount() - first));
    }

    /** Reads and decodes {@code n} records of file {@code i} from record {@code first}. */
    PointChunk load(int i, long first, int n) {
      LasFile f = files.get(i);
      LasHeader h = f.header();
      try {
        if (i != fileIndex) {
          close();
          channel = FileChannel.open(f.path(), StandardOpenOption.READ);
          decoder = new PointDecoder(h, horizontalFactor, verticalFactor);
          fileIndex = i;
        }
        buf.clear();
        buf.limit(n * h.recordLength());
        LasFile.readFully(channel, buf, h.pointDataOffset() + first * h.recordLength());
      } catch (EOFException e) {
        throw shrunk(f, e);
      } catch (IOException e) {
        throw new UncheckedIOException(String.format(Locale.ROOT,
            "cannot read %s at point %d", f.path(), first), e);
      }
      chunk.reset(i, first);
      decoder.decode(buf, n, chunk);
      int outside = decoder.firstOutsideBounds(chunk);
      if (outside >= 0) {
        throw new InputException(f.path(), "point record " + (first + outside + 1),
            decoder.outsideAxis(chunk, outside), decoder.outsideProblem(chunk, outside));
      }
      return chunk;
    }

    void close() {
      if (channel != null) {
        try {
          channel.close();
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        } finally {
          channel = null;
          fileIndex = -1;
        }
      }
    }
  }
}
