package org.clearance.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import org.clearance.io.AtomicFiles;

/**
 * Writes a LAS 1.2 or 1.4 file from {@link PointChunk}s (coordinates in metres).
 *
 * <p>Points go to a temporary file in the target's folder; {@link #close()} writes the final
 * header (point count, counts by return, extent) and renames the file onto the target, so a
 * reader never sees a half-written file. {@link #abort()}, or any failure in {@link #write},
 * deletes the temporary file instead, and a later {@code close()} does nothing more.
 *
 * <p>Attributes the format does not carry are dropped; a NaN GPS time is written as 0; the
 * overlap flag is written only by formats 6-10 (formats 0-5 express overlap as class 12).
 *
 * <p>Usage: {@code try (LasWriter w = LasWriter.create(path, options)) { w.write(chunk); }}
 * commits on leaving the block; call {@link #abort()} in a {@code catch} to discard the file.
 */
public final class LasWriter implements AutoCloseable {
  private static final long U32_MAX = 0xFFFFFFFFL;

  private final Path target;
  private final Path temp;
  private final LasWriterOptions options;
  private final PointEncoder encoder;
  private final int vlrCount;
  private final long pointOffset;
  private FileChannel channel;
  private ByteBuffer buffer;
  private long position;
  private boolean finished;

  private LasWriter(Path target, LasWriterOptions options) throws IOException {
    this.target = target;
    this.options = options;
    this.encoder = new PointEncoder(options);
    List<LasHeaderWriter.VlrBytes> vlrs = LasHeaderWriter.vlrs(options);
    byte[] vlrBytes = LasHeaderWriter.vlrBytes(vlrs);
    this.vlrCount = vlrs.size();
    this.pointOffset = LasHeader.standardHeaderSize(options.versionMinor()) + vlrBytes.length;
    this.temp = AtomicFiles.tempFileBeside(target);
    boolean ok = false;
    try {
      channel = FileChannel.open(temp, StandardOpenOption.WRITE);
      int headerSize = LasHeader.standardHeaderSize(options.versionMinor());
      writeAt(ByteBuffer.wrap(new byte[headerSize]), 0);
      writeAt(ByteBuffer.wrap(vlrBytes), headerSize);
      position = pointOffset;
      ok = true;
    } finally {
      if (!ok) {
        discard();
      }
    }
  }

  /**
   * Starts writing {@code target}; nothing appears there until {@link #close()}.
   *
   * @throws UncheckedIOException when the temporary file cannot be created
   */
  public static LasWriter create(Path target, LasWriterOptions options) {
    Objects.requireNonNull(target, "target");
    Objects.requireNonNull(options, "options");
    try {
      return new LasWriter(target, options);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot create a file next to " + target, e);
    }
  }

  /**
   * Appends the chunk's points.
   *
   * @throws IllegalArgumentException when a value does not fit the format (the file is then
   *     discarded)
   * @throws IllegalStateException after close or abort, or past 2^32 - 1 points in LAS 1.2
   */
  public void write(PointChunk chunk) {
    if (finished) {
      throw new IllegalStateException("writer already closed");
    }
    boolean ok = false;
    try {
      if (options.versionMinor() < 4 && encoder.count() + chunk.size() > U32_MAX) {
        throw new IllegalStateException("LAS 1.2 holds at most 2^32 - 1 points");
      }
      int bytes = chunk.size() * options.recordLength();
      if (buffer == null || buffer.capacity() < bytes) {
        buffer = ByteBuffer.allocate(Math.max(bytes, 1)).order(ByteOrder.LITTLE_ENDIAN);
      }
      Arrays.fill(buffer.array(), 0, bytes, (byte) 0);
      encoder.encode(chunk, buffer);
      buffer.clear().limit(bytes);
      writeAt(buffer, position);
      position += bytes;
      ok = true;
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write " + temp, e);
    } finally {
      if (!ok) {
        abort();
      }
    }
  }

  /** Points written so far. */
  public long pointCount() {
    return encoder.count();
  }

  /**
   * Writes the final header and renames the temporary file onto the target (replacing it). Does
   * nothing after {@link #abort()} or a second call.
   *
   * @throws UncheckedIOException when the file cannot be finished (it is then discarded)
   */
  @Override
  public void close() {
    if (finished) {
      return;
    }
    finished = true;
    boolean ok = false;
    try {
      LasHeaderWriter.Totals totals = new LasHeaderWriter.Totals(encoder.count(),
          encoder.byReturn(), encoder.extent());
      writeAt(ByteBuffer.wrap(LasHeaderWriter.header(options, vlrCount, pointOffset, totals)), 0);
      channel.close();
      channel = null;
      try {
        Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING,
            StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
      }
      ok = true;
    } catch (IOException e) {
      throw new UncheckedIOException("cannot finish " + target, e);
    } finally {
      if (!ok) {
        discard();
      }
    }
  }

  /** Discards everything written; the target is left as it was. */
  public void abort() {
    finished = true;
    discard();
  }

  private void discard() {
    try {
      if (channel != null) {
        channel.close();
        channel = null;
      }
      Files.deleteIfExists(temp);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot delete " + temp, e);
    }
  }

  private void writeAt(ByteBuffer b, long at) throws IOException {
    long p = at;
    while (b.hasRemaining()) {
      p += channel.write(b, p);
    }
  }
}
