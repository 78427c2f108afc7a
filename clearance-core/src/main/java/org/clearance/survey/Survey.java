package org.clearance.survey;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.InputException;

/**
 * A lidar survey: one or more LAS files (tiles) read as one point stream in metres.
 *
 * <p>{@link #open(List, UnitsChoice)} opens and checks every file and decides the units (see
 * {@link UnitsChoice}); reading then streams reusable {@link PointChunk}s of at most
 * {@link #DEFAULT_CHUNK_POINTS} points, so memory does not grow with the survey. Coordinates in
 * the chunks are metres: the file's {@code integer * scale + offset} times its unit's length.
 */
public final class Survey {
  /** Points per chunk unless told otherwise: 65 536 points are 2-4 MB of buffers. */
  public static final int DEFAULT_CHUNK_POINTS = 65_536;

  private final List<LasFile> files;
  private final SurveyUnits units;
  private final PointStreamer streamer;

  private Survey(List<LasFile> files, SurveyUnits units, int chunkPoints) {
    this.files = List.copyOf(files);
    this.units = units;
    this.streamer = new PointStreamer(this.files, units.horizontal().metres(),
        units.vertical().metres(), chunkPoints);
  }

  /**
   * Opens a survey with chunks of {@link #DEFAULT_CHUNK_POINTS} points.
   *
   * @param paths the LAS files, at least one, each once
   * @param choice how to decide the units
   * @throws InputException when a file is missing or malformed, a unit is unknown or conflicts,
   *     the coordinates are not projected, or the tiles disagree on units or CRS
   */
  public static Survey open(List<Path> paths, UnitsChoice choice) {
    return open(paths, choice, DEFAULT_CHUNK_POINTS);
  }

  /**
   * Opens a survey.
   *
   * @param paths the LAS files, at least one, each once
   * @param choice how to decide the units
   * @param chunkPoints points per chunk, at least 1
   * @throws InputException as {@link #open(List, UnitsChoice)}
   */
  public static Survey open(List<Path> paths, UnitsChoice choice, int chunkPoints) {
    List<LasFile> files = openAll(paths);
    SurveyUnits units = UnitsResolver.resolve(files, choice, true).toSurveyUnits();
    return new Survey(files, units, chunkPoints);
  }

  /** Opens every file once; a file given twice is an error. */
  static List<LasFile> openAll(List<Path> paths) {
    if (paths.isEmpty()) {
      throw new IllegalArgumentException("a survey needs at least one file");
    }
    Map<Path, Path> seen = new HashMap<>();
    List<LasFile> files = new ArrayList<>();
    for (Path p : paths) {
      Path key = p.toAbsolutePath().normalize();
      Path before = seen.putIfAbsent(key, p);
      if (before != null) {
        throw new InputException(p, null, null, "the file is given twice");
      }
      files.add(LasFile.open(p));
    }
    return files;
  }

  /** The survey's units and CRS, and how they were found. */
  public SurveyUnits units() {
    return units;
  }

  /** The files in the order given; a chunk's {@link PointChunk#fileIndex()} indexes this list. */
  public List<LasFile> files() {
    return files;
  }

  /** Number of points in all files. */
  public long pointCount() {
    long n = 0;
    for (LasFile f : files) {
      n += f.header().pointCount();
    }
    return n;
  }

  /**
   * The extent of all files as their headers state it, in metres; NaN when there are no points.
   * Headers are trusted here; reading the points gives the exact extent.
   */
  public Bounds bounds() {
    Bounds all = Bounds.empty();
    double fh = units.horizontal().metres();
    double fv = units.vertical().metres();
    for (LasFile f : files) {
      LasHeader h = f.header();
      if (h.pointCount() > 0) {
        all = all.union(new Bounds(h.minX() * fh, h.minY() * fh, h.minZ() * fv, h.maxX() * fh,
            h.maxY() * fh, h.maxZ() * fv));
      }
    }
    return all;
  }

  /**
   * Reads all points on the calling thread, files in order and records in file order. The chunk
   * passed to {@code consumer} is reused for the next block: copy what must outlive the call.
   *
   * @throws InputException when a file turns out shorter than its header said
   * @throws java.io.UncheckedIOException on I/O failure
   */
  public void read(Consumer<PointChunk> consumer) {
    streamer.read(consumer);
  }

  /**
   * Reads all points on {@code threads} worker threads that both decode and consume. The supplier
   * is called {@code threads} times on the calling thread before reading starts; each worker uses
   * its own consumer and its own chunk, so consumers need no locking, and the caller can keep the
   * consumers to merge their results afterwards. <b>Ordering: none.</b> Chunks arrive in no
   * particular order across or within workers; use {@link PointChunk#fileIndex()} and
   * {@link PointChunk#firstRecord()} to place them. The first failure in any worker stops the
   * others and is rethrown here.
   *
   * @param threads worker threads, 1 to 256
   */
  public void readParallel(int threads, Supplier<Consumer<PointChunk>> consumers) {
    streamer.readParallel(threads, consumers);
  }

  /**
   * Reads the records {@code [first, first + count)} of one file on the calling thread, by their
   * byte offsets in the file (a distributed job reads a tile's pieces this way). The chunk is
   * reused as in {@link #read}.
   *
   * @param fileIndex index in {@link #files()}
   * @param first first record, 0-based
   * @param count number of records, &gt;= 0
   * @throws IllegalArgumentException when the range is outside the file
   * @throws InputException when the file turns out shorter than its header said
   */
  public void readRecords(int fileIndex, long first, long count, Consumer<PointChunk> consumer) {
    streamer.readRecords(fileIndex, first, count, consumer);
  }

  /**
   * Reads every byte of the point data of every file without decoding, through the same
   * positional reads as {@link #read}; a baseline for throughput measurements.
   *
   * @return bytes read
   */
  public long rawScan() {
    return streamer.rawScan();
  }
}
