package org.clearance.examples;

import org.clearance.survey.PointChunk;

/**
 * Collects generated points into one reusable chunk and hands it to a sink when full, so memory
 * does not grow with the point count. Pulse attributes (strip, time, scan angle) are set once per
 * pulse and apply to the points emitted after.
 */
final class ChunkEmitter {
  /** Points per chunk: large enough to amortise the sink call, small enough for the cache. */
  static final int CAPACITY = 65_536;

  private final PointChunk chunk = new PointChunk(CAPACITY);
  private final int[] ids = new int[CAPACITY];
  private final PointSink sink;
  private final ClassificationMode mode;
  private long emitted;
  private int sourceId;
  private double gpsTime = Double.NaN;
  private float scanAngle;
  private int scanDirection;
  private int edge;

  ChunkEmitter(PointSink sink, ClassificationMode mode) {
    this.sink = sink;
    this.mode = mode;
    chunk.reset(0, 0);
  }

  /** Sets the attributes of the pulse whose returns follow. */
  void pulse(FlightStrip strip, double chainage, double offset, int direction) {
    sourceId = strip.pointSourceId();
    gpsTime = strip.time(chainage);
    scanAngle = (float) strip.scanAngleDeg(offset);
    scanDirection = direction;
    edge = Math.abs(offset - strip.centreOffsetM()) > 0.97 * strip.halfSwathM() ? 1 : 0;
  }

  /**
   * Adds one return.
   *
   * @param fullClass the class in FULL mode (the mode maps it)
   * @param truthId packed {@link TruthId}
   * @param intensity 0-65535
   * @param returnNumber 1-15
   * @param returns number of returns of the pulse, 1-15
   */
  void emit(double x, double y, double z, int fullClass, int truthId, int intensity,
      int returnNumber, int returns) {
    int i = chunk.add(x, y, z, mode.label(fullClass, x, y));
    ids[i] = truthId;
    chunk.intensity()[i] = Math.max(0, Math.min(65535, intensity));
    chunk.returnNumber()[i] = (byte) returnNumber;
    chunk.numberOfReturns()[i] = (byte) returns;
    chunk.pointSourceId()[i] = sourceId;
    chunk.gpsTime()[i] = gpsTime;
    chunk.scanAngle()[i] = scanAngle;
    chunk.scanDirection()[i] = (byte) scanDirection;
    chunk.edgeOfFlightLine()[i] = (byte) edge;
    if (chunk.isFull()) {
      flush();
    }
  }

  /** Hands over the points collected so far, if any. */
  void flush() {
    if (chunk.size() > 0) {
      sink.accept(chunk, ids);
      emitted += chunk.size();
      chunk.reset(0, emitted);
    }
  }

  /** Points handed over so far. */
  long emitted() {
    return emitted;
  }
}
