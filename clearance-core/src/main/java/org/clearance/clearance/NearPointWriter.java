package org.clearance.clearance;

import java.io.BufferedOutputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.clearance.io.AtomicFiles;

/**
 * Writes {@link NearPointFile near-points.bin}. Thread-safe: workers may write concurrently (each
 * call appends whole records). Writes to a temporary file and moves it into place on
 * {@link #close()}; {@link #abort()} deletes it.
 */
public final class NearPointWriter implements Closeable {

  /** Records buffered before they go to the stream; keeps locking rare. */
  private static final int BUFFER_BYTES = 1 << 20;

  private final NearPointFile layout;
  private final Path target;
  private final Path temp;
  private final OutputStream out;
  private final Map<String, Integer> spanIndex = new HashMap<>();
  private final Map<String, Integer> conductorIndex = new HashMap<>();
  private long count;

  /** Opens the writer and writes the header. */
  public NearPointWriter(Path target, NearPointFile layout) throws IOException {
    this.layout = layout;
    this.target = target;
    this.temp = AtomicFiles.tempFileBeside(target);
    this.out = new BufferedOutputStream(Files.newOutputStream(temp), BUFFER_BYTES);
    for (int i = 0; i < layout.spanIds().size(); i++) {
      spanIndex.put(layout.spanIds().get(i), i);
    }
    for (int i = 0; i < layout.conductors().size(); i++) {
      conductorIndex.put(layout.conductors().get(i), i);
    }
    writeHeader();
  }

  private void writeHeader() throws IOException {
    out.write(NearPointFile.MAGIC);
    writeStrings(layout.conditions());
    for (String g : layout.groups()) {
      writeString(g);
    }
    writeStrings(layout.spanIds());
    writeStrings(layout.conductors());
  }

  private void writeStrings(List<String> list) throws IOException {
    out.write(ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(list.size()).array());
    for (String s : list) {
      writeString(s);
    }
  }

  private void writeString(String s) throws IOException {
    byte[] b = s.getBytes(StandardCharsets.UTF_8);
    if (b.length > Short.MAX_VALUE) {
      throw new IllegalArgumentException("string too long: " + s.length());
    }
    out.write(ByteBuffer.allocate(2).order(ByteOrder.LITTLE_ENDIAN).putShort((short) b.length)
        .array());
    out.write(b);
  }

  /** Appends the points; their conditions must be in the layout's order. */
  public void write(List<PointClearance> points) throws IOException {
    if (points.isEmpty()) {
      return;
    }
    int n = layout.conditions().size();
    ByteBuffer buf = ByteBuffer.allocate(points.size() * layout.recordBytes())
        .order(ByteOrder.LITTLE_ENDIAN);
    for (PointClearance p : points) {
      Integer span = spanIndex.get(p.spanId());
      if (span == null) {
        throw new IllegalArgumentException("span not in the file header: " + p.spanId());
      }
      if (p.distances().size() != n) {
        throw new IllegalArgumentException("expected " + n + " conditions, got "
            + p.distances().size());
      }
      buf.putInt(span).putDouble(p.x()).putDouble(p.y()).putDouble(p.z())
          .putShort((short) p.classification()).putFloat((float) p.heightAboveGround());
      for (int c = 0; c < n; c++) {
        ConditionDistance d = p.distances().get(c);
        if (!d.condition().equals(layout.conditions().get(c))) {
          throw new IllegalArgumentException("condition order differs from the header: "
              + d.condition());
        }
        Integer conductor = conductorIndex.get(d.conductor());
        buf.putFloat((float) d.distance()).putFloat((float) d.horizontal())
            .putFloat((float) d.vertical()).putShort(conductor == null ? -1 : conductor.shortValue())
            .putFloat((float) d.station());
      }
    }
    synchronized (this) {
      out.write(buf.array(), 0, buf.position());
      count += points.size();
    }
  }

  /** Number of records written so far. */
  public synchronized long count() {
    return count;
  }

  /** Finishes the file and moves it into place. */
  @Override
  public synchronized void close() throws IOException {
    out.close();
    Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
  }

  /** Discards the partial file. */
  public synchronized void abort() {
    try {
      out.close();
    } catch (IOException ignored) {
      // the file is deleted next; nothing to save
    }
    try {
      Files.deleteIfExists(temp);
    } catch (IOException ignored) {
      // a leftover .part file is harmless and named as such
    }
  }
}
