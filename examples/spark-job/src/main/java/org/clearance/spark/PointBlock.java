package org.clearance.spark;

import java.io.Serializable;
import java.util.Arrays;
import java.util.function.Consumer;
import org.clearance.survey.PointChunk;

/**
 * Points of one span's work area read from one tile piece, as they travel between Spark tasks:
 * the attributes the core's stages read (coordinates in metres, ASPRS class, flags, return
 * numbers, GPS time: the span's flight time dates its survey temperature), in growable
 * arrays. Order is kept but carries no meaning: every stage accepts its
 * points in any order, as the command line's parallel reader delivers them.
 */
final class PointBlock implements Serializable {
  private static final long serialVersionUID = 1L;
  /** First capacity of a block, points. */
  private static final int FIRST_CAPACITY = 1024;

  private int size;
  /** Earliest and latest GPS time of the points added, s; NaN when none carries one. */
  private double gpsMin = Double.NaN;
  private double gpsMax = Double.NaN;
  private double[] x = new double[FIRST_CAPACITY];
  private double[] y = new double[FIRST_CAPACITY];
  private double[] z = new double[FIRST_CAPACITY];
  private short[] classification = new short[FIRST_CAPACITY];
  private byte[] flags = new byte[FIRST_CAPACITY];
  private byte[] returnNumber = new byte[FIRST_CAPACITY];
  private byte[] numberOfReturns = new byte[FIRST_CAPACITY];
  private double[] gpsTime = new double[FIRST_CAPACITY];

  /** Why the points of this block could not be read, or null (a block of a failed piece). */
  private String failure;

  /** A block that carries no points, only why its piece could not be read. */
  static PointBlock failed(String why) {
    PointBlock b = new PointBlock();
    b.failure = why;
    return b;
  }

  /** Why the piece of this block could not be read, or null. */
  String failure() {
    return failure;
  }

  /** Number of points held. */
  int size() {
    return size;
  }

  /** Appends point {@code i} of the chunk. */
  void add(PointChunk c, int i) {
    if (size == x.length) {
      int n = 2 * size;
      x = Arrays.copyOf(x, n);
      y = Arrays.copyOf(y, n);
      z = Arrays.copyOf(z, n);
      classification = Arrays.copyOf(classification, n);
      flags = Arrays.copyOf(flags, n);
      returnNumber = Arrays.copyOf(returnNumber, n);
      numberOfReturns = Arrays.copyOf(numberOfReturns, n);
      gpsTime = Arrays.copyOf(gpsTime, n);
    }
    x[size] = c.x()[i];
    y[size] = c.y()[i];
    z[size] = c.z()[i];
    classification[size] = c.classification()[i];
    flags[size] = c.flags()[i];
    returnNumber[size] = c.returnNumber()[i];
    numberOfReturns[size] = c.numberOfReturns()[i];
    double g = c.gpsTime()[i];
    gpsTime[size] = g;
    size++;
    if (!Double.isNaN(g)) {
      gpsMin = Double.isNaN(gpsMin) ? g : Math.min(gpsMin, g);
      gpsMax = Double.isNaN(gpsMax) ? g : Math.max(gpsMax, g);
    }
  }

  /** Earliest GPS time of the points, s, or NaN. */
  double gpsMin() {
    return gpsMin;
  }

  /** Latest GPS time of the points, s, or NaN. */
  double gpsMax() {
    return gpsMax;
  }

  /**
   * Feeds the points to {@code sink} through {@code chunk} (reused, filled up to its capacity);
   * {@code first} numbers the records across blocks.
   *
   * @return the next record number
   */
  long feed(PointChunk chunk, long first, Consumer<PointChunk> sink) {
    long record = first;
    for (int from = 0; from < size; from += chunk.capacity()) {
      int n = Math.min(chunk.capacity(), size - from);
      chunk.reset(0, record);
      for (int j = 0; j < n; j++) {
        int i = chunk.add(x[from + j], y[from + j], z[from + j], classification[from + j]);
        chunk.flags()[i] = flags[from + j];
        chunk.returnNumber()[i] = returnNumber[from + j];
        chunk.numberOfReturns()[i] = numberOfReturns[from + j];
        chunk.gpsTime()[i] = gpsTime[from + j];
      }
      record += n;
      sink.accept(chunk);
    }
    return record;
  }
}
