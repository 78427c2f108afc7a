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
import java.util.ArrayList;
import java.util.List;
import java.util.zip.CRC32C;
import org.clearance.io.AtomicFiles;

/**
 * Writes {@link PolePointFile pole-points.bin}. Thread-safe: collectors append whole records to
 * a temporary file of unsorted records; {@link #close()} sorts them, writes the header (with the
 * pole-column counts gathered meanwhile) and the checksum trailer, and moves the finished file
 * into place; {@link #abort()} deletes what was written.
 */
public final class PolePointWriter implements Closeable {

  private final PolePointFile layout;
  private final Path target;
  private final Path unsorted;
  private final OutputStream out;
  private final long[] column;
  private long count;

  /** Opens the writer; the layout's column counts are replaced by those added. */
  public PolePointWriter(Path target, PolePointFile layout) throws IOException {
    this.layout = layout;
    this.target = target;
    this.unsorted = AtomicFiles.tempFileBeside(target);
    this.out = new BufferedOutputStream(Files.newOutputStream(unsorted),
        RecordFiles.BUFFER_BYTES);
    this.column = new long[layout.structures().size()];
  }

  /** The layout the records refer to. */
  public PolePointFile layout() {
    return layout;
  }

  /**
   * Appends records already encoded ({@link PolePointFile#RECORD_BYTES} each, little-endian)
   * and adds pole-column counts per structure index.
   */
  synchronized void write(ByteBuffer records, long[] columnPoints) throws IOException {
    int bytes = records.position();
    if (bytes % PolePointFile.RECORD_BYTES != 0) {
      throw new IllegalArgumentException("not whole records: " + bytes);
    }
    out.write(records.array(), 0, bytes);
    count += bytes / PolePointFile.RECORD_BYTES;
    for (int i = 0; i < column.length; i++) {
      column[i] += columnPoints[i];
    }
  }

  /**
   * Appends points (their structures must be in the layout); for tools and tests that build a
   * file without the engine.
   */
  public void write(List<PolePoint> points) throws IOException {
    java.util.Map<String, Integer> index = new java.util.HashMap<>();
    for (int i = 0; i < layout.structures().size(); i++) {
      index.put(layout.structures().get(i).key(), i);
    }
    ByteBuffer b = ByteBuffer.allocate(points.size() * PolePointFile.RECORD_BYTES)
        .order(ByteOrder.LITTLE_ENDIAN);
    for (PolePoint p : points) {
      Integer s = index.get(p.lineId() + "\u0000" + p.structureId());
      if (s == null) {
        throw new IllegalArgumentException("structure not in the file header: "
            + p.structureId());
      }
      b.putInt(s).putDouble(p.x()).putDouble(p.y()).putDouble(p.z())
          .putShort((short) p.classification()).putFloat((float) p.heightAboveGround())
          .putFloat((float) p.planDistanceM());
    }
    write(b, new long[layout.structures().size()]);
  }

  /** Number of records written so far. */
  public synchronized long count() {
    return count;
  }

  private byte[] header() {
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.writeBytes(PolePointFile.MAGIC);
    ByteBuffer head = ByteBuffer.allocate(3 * 8 + 4).order(ByteOrder.LITTLE_ENDIAN)
        .putDouble(layout.keepRadiusM()).putDouble(layout.keepHeightM())
        .putDouble(layout.columnRadiusM()).putInt(layout.structures().size());
    b.writeBytes(head.array());
    for (int i = 0; i < layout.structures().size(); i++) {
      PolePointFile.Pole p = layout.structures().get(i);
      RecordFiles.writeString(b, p.lineId());
      RecordFiles.writeString(b, p.structureId());
      b.writeBytes(ByteBuffer.allocate(3 * 8).order(ByteOrder.LITTLE_ENDIAN).putDouble(p.x())
          .putDouble(p.y()).putLong(column[i]).array());
    }
    return b.toByteArray();
  }

  /** The file's layout with the column counts gathered. */
  public synchronized PolePointFile finished() {
    List<PolePointFile.Pole> poles = new ArrayList<>();
    for (int i = 0; i < column.length; i++) {
      PolePointFile.Pole p = layout.structures().get(i);
      poles.add(new PolePointFile.Pole(p.lineId(), p.structureId(), p.x(), p.y(), column[i]));
    }
    return new PolePointFile(layout.keepRadiusM(), layout.keepHeightM(), layout.columnRadiusM(),
        poles);
  }

  /** Sorts the records, writes the finished file and moves it into place. */
  @Override
  public synchronized void close() throws IOException {
    try {
      out.close();
      RecordFiles.writeSorted(target, header(), unsorted, PolePointFile.RECORD_BYTES,
          PolePointFile::compareRecords, PolePointFile.END);
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
