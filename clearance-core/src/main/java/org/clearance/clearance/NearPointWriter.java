package org.clearance.clearance;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.zip.CRC32C;
import org.clearance.io.AtomicFiles;
import org.clearance.io.RecordSort;
import org.clearance.line.ConductorPosition.Role;

/**
 * Writes {@link NearPointFile near-points.bin}. Thread-safe: workers may write concurrently (each
 * call appends whole records) to a temporary file of unsorted records; {@link #close()} sorts
 * them ({@link RecordSort}), adds the header and the checksum trailer, and moves the finished
 * file into place; {@link #abort()} deletes what was written.
 */
public final class NearPointWriter implements Closeable {

  /** Records buffered before they go to the stream; keeps locking rare. */
  private static final int BUFFER_BYTES = 1 << 20;

  private final NearPointFile layout;
  private final Path target;
  private final Path unsorted;
  private final OutputStream out;
  private final Map<String, Integer> spanIndex = new HashMap<>();
  private final Map<String, Integer> conductorIndex = new HashMap<>();
  private long count;

  /** Opens the writer. */
  public NearPointWriter(Path target, NearPointFile layout) throws IOException {
    this.layout = layout;
    this.target = target;
    this.unsorted = AtomicFiles.tempFileBeside(target);
    this.out = new BufferedOutputStream(Files.newOutputStream(unsorted), BUFFER_BYTES);
    for (int i = 0; i < layout.spanIds().size(); i++) {
      spanIndex.put(layout.spanIds().get(i), i);
    }
    for (int i = 0; i < layout.conductors().size(); i++) {
      conductorIndex.put(layout.conductors().get(i), i);
    }
  }

  private byte[] header() {
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.writeBytes(NearPointFile.MAGIC);
    writeStrings(b, layout.conditions());
    for (String g : layout.groups()) {
      RecordFiles.writeString(b, g);
    }
    writeStrings(b, layout.spanIds());
    writeStrings(b, layout.conductors());
    List<String> roles = new java.util.ArrayList<>(layout.roles().stream()
        .map(r -> r.name().toLowerCase(Locale.ROOT)).toList());
    for (double v : layout.voltages()) {
      roles.add(NearPointFile.VOLTAGE_PREFIX + v);
    }
    writeStrings(b, roles);
    return b.toByteArray();
  }

  private static void writeStrings(ByteArrayOutputStream b, List<String> list) {
    b.writeBytes(ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(list.size())
        .array());
    for (String s : list) {
      RecordFiles.writeString(b, s);
    }
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
          .putShort((short) (p.classification()
              | (p.wireTouched() ? NearPointFile.WIRE_TOUCHED_BIT : 0))).putFloat((float) p.heightAboveGround());
      List<List<ConditionDistance>> groups = new java.util.ArrayList<>();
      for (Role role : layout.roles()) {
        groups.add(p.distances(role));
      }
      for (double v : layout.voltages()) {
        groups.add(p.circuits().stream().filter(c -> c.kv() == v).findFirst()
            .map(PointClearance.VoltageDistances::distances).orElse(List.of()));
      }
      for (PointClearance.VoltageDistances c : p.circuits()) {
        if (!layout.voltages().contains(c.kv())) {
          throw new IllegalArgumentException("a voltage the file header does not list: "
              + c.kv());
        }
      }
      for (List<ConditionDistance> ds : groups) {
        if (!ds.isEmpty() && ds.size() != n) {
          throw new IllegalArgumentException("expected " + n + " conditions, got " + ds.size());
        }
        for (int c = 0; c < n; c++) {
          if (ds.isEmpty()) {
            buf.putFloat(Float.NaN).putFloat(Float.NaN).putFloat(Float.NaN).putShort((short) -1)
                .putFloat(Float.NaN);
            continue;
          }
          ConditionDistance d = ds.get(c);
          if (!d.condition().equals(layout.conditions().get(c))) {
            throw new IllegalArgumentException("condition order differs from the header: "
                + d.condition());
          }
          Integer conductor = conductorIndex.get(d.conductor());
          buf.putFloat((float) d.distance()).putFloat((float) d.horizontal())
              .putFloat((float) d.vertical())
              .putShort(conductor == null ? -1 : conductor.shortValue())
              .putFloat((float) d.station());
        }
      }
      if (!p.neutral().isEmpty() && !layout.roles().contains(Role.NEUTRAL)
          || !p.shield().isEmpty() && !layout.roles().contains(Role.SHIELD)) {
        throw new IllegalArgumentException("a role's distances the file header does not list");
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

  /** Sorts the records, writes the finished file and moves it into place. */
  @Override
  public synchronized void close() throws IOException {
    try {
      out.close();
      int rb = layout.recordBytes();
      RecordFiles.writeSorted(target, header(), unsorted, rb,
          (a, ai, b, bi) -> NearPointFile.compareRecords(a, ai, b, bi, rb), NearPointFile.END);
    } finally {
      Files.deleteIfExists(unsorted);
    }
  }

  /** Discards the partial file. */
  public synchronized void abort() {
    try {
      out.close();
    } catch (IOException ignored) {
      // the file is deleted next; nothing to save
    }
    try {
      Files.deleteIfExists(unsorted);
    } catch (IOException ignored) {
      // a leftover .part file is harmless and named as such
    }
  }
}
