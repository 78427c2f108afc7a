package org.clearance.label;

import java.nio.ByteBuffer;
import java.util.Arrays;
import java.util.List;
import java.util.function.Consumer;
import org.clearance.ground.GroundModel;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;
import org.clearance.wire.SetAside;

/**
 * The points the labelling looks at, gathered in one pass (one collector per reading thread,
 * merged after): unclassified points (class 0 or 1, not withheld) at least {@link #MIN_HAG_M}
 * above ground, class-2 points more than {@link #GROUND_LABEL_MAX_HEIGHT_M} above it (a ground
 * label not believed) and, in a partly labelled survey, the points labelled vegetation (3-5) at
 * least {@link #MIN_HAG_M} above ground, whose labels are trusted only as far as the objects
 * they belong to look like vegetation; all within the region of a span, not set aside by the
 * wire finder. About 40 bytes a point; only the line's region is held, never the whole survey
 * (and one block window at a time, {@link LabelBlocks}).
 */
final class LabelPoints implements Consumer<PointChunk> {

  /** Lowest point looked at, m above ground: the canopy's lowest return (half the 2 m least tree
   * height, Popescu and Wynne 2004), so every point that can make a tree is labelled. */
  static final double MIN_HAG_M = 1.0;
  /** Height above ground beyond which a class-2 label is not believed, m
   * ({@link ObjectLabeller#GROUND_LABEL_MAX_HEIGHT_M}). */
  static final double GROUND_LABEL_MAX_HEIGHT_M = ObjectLabeller.GROUND_LABEL_MAX_HEIGHT_M;
  /** What a point was labelled: unclassified (0 or 1). */
  static final byte OPEN = 0;
  /** What a point was labelled: vegetation (3-5), in a partly labelled survey. */
  static final byte VEGETATION_LABEL = 1;
  /** What a point was labelled: ground (2), standing above {@link #GROUND_LABEL_MAX_HEIGHT_M}. */
  static final byte GROUND_DOUBTED = 2;

  /** Bytes a point takes in a block store ({@link #writeColumns}): x, y, z, height, return
   * number, number of returns, label, zone. */
  static final int BYTES_PER_POINT = 3 * Double.BYTES + Float.BYTES + 4;

  private final List<SpanFrame> frames;
  private final double regionM;
  private final GroundModel ground;
  private final SetAside setAside;
  private final boolean judgeVegetationLabels;

  int size;
  /** Later returns (return number 2 or more) among the points added. */
  long later;
  /** Points of pulses with several returns (number of returns 2 or more) among those added. */
  long multiPulse;
  double[] x;
  double[] y;
  double[] z;
  float[] hag;
  /** Return number of the point within its pulse (0 when the file does not say). */
  byte[] returnNumber;
  /** Number of returns of the point's pulse (0 when the file does not say). */
  byte[] returns;
  /** What each point was labelled ({@link #OPEN}, {@link #VEGETATION_LABEL},
   * {@link #GROUND_DOUBTED}). */
  byte[] label;
  /** Where each point lies in its block window ({@link LabelWindow#CORE} for the whole line). */
  byte[] zone;

  /** A collector of the points looked at on the whole line. */
  LabelPoints(List<SpanFrame> frames, double regionM, GroundModel ground, SetAside setAside,
      boolean judgeVegetationLabels) {
    this(frames, regionM, ground, setAside, judgeVegetationLabels, 1024);
  }

  private LabelPoints(List<SpanFrame> frames, double regionM, GroundModel ground,
      SetAside setAside, boolean judgeVegetationLabels, int capacity) {
    this.frames = frames;
    this.regionM = regionM;
    this.ground = ground;
    this.setAside = setAside;
    this.judgeVegetationLabels = judgeVegetationLabels;
    x = new double[capacity];
    y = new double[capacity];
    z = new double[capacity];
    hag = new float[capacity];
    returnNumber = new byte[capacity];
    returns = new byte[capacity];
    label = new byte[capacity];
    zone = new byte[capacity];
  }

  /** An empty holder of points (no collector) with room for {@code capacity} points. */
  static LabelPoints holder(int capacity) {
    return new LabelPoints(List.of(), 0, null, null, false, Math.max(1, capacity));
  }

  @Override
  public void accept(PointChunk chunk) {
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      byte kind = kind(cls[i], flags[i], judgeVegetationLabels);
      if (kind < 0) {
        continue;
      }
      double px = chunk.x()[i];
      double py = chunk.y()[i];
      double pz = chunk.z()[i];
      if (!inRegion(frames, regionM, px, py)) {
        continue;
      }
      double h = ground.heightAboveGround(px, py, pz);
      if (!looked(kind, h, setAside, px, py, pz)) {
        continue;
      }
      add(px, py, pz, h, chunk.returnNumber()[i], chunk.numberOfReturns()[i], kind,
          LabelWindow.CORE);
    }
  }

  /**
   * What a point of class {@code cls} is labelled as for the labelling ({@link #OPEN},
   * {@link #GROUND_DOUBTED}, {@link #VEGETATION_LABEL}), or -1 when it is not looked at (another
   * class, or withheld).
   */
  static byte kind(int cls, byte flags, boolean judgeVegetationLabels) {
    byte kind = cls <= 1 ? OPEN : cls == 2 ? GROUND_DOUBTED
        : judgeVegetationLabels && cls >= 3 && cls <= 5 ? VEGETATION_LABEL : -1;
    return (flags & PointChunk.FLAG_WITHHELD) != 0 ? -1 : kind;
  }

  /** Whether a point of {@code kind} at {@code h} m above ground, in the region, is looked at:
   * high enough for its kind and not set aside by the wire finder. */
  static boolean looked(byte kind, double h, SetAside setAside, double px, double py,
      double pz) {
    boolean high = kind == GROUND_DOUBTED ? h > GROUND_LABEL_MAX_HEIGHT_M : h >= MIN_HAG_M;
    return high && setAside.reason(SetAside.key(px, py, pz)) == SetAside.Reason.NONE;
  }

  /** Whether a plan point lies within {@code regionM} of a span's chord (the region looked at). */
  static boolean inRegion(List<SpanFrame> frames, double regionM, double px, double py) {
    return owner(frames, regionM, px, py) >= 0;
  }

  /** The first span (index in {@code frames}) whose region holds the plan point, or -1. */
  static int owner(List<SpanFrame> frames, double regionM, double px, double py) {
    for (int k = 0; k < frames.size(); k++) {
      if (holds(frames.get(k), regionM, px, py)) {
        return k;
      }
    }
    return -1;
  }

  /** Whether the region of the span of frame {@code f} (within {@code regionM} of its chord)
   * holds the plan point. */
  static boolean holds(SpanFrame f, double regionM, double px, double py) {
    double s = f.station(px, py);
    return s >= -regionM && s <= f.length() + regionM && Math.abs(f.offset(px, py)) <= regionM;
  }

  /** Adds a point whose pulse had {@code n} returns, this one the last. */
  void add(double px, double py, double pz, double h, byte n, byte kind) {
    add(px, py, pz, h, n, n, kind, LabelWindow.CORE);
  }

  /**
   * Adds a point.
   *
   * @param n its return number (0 when the file does not say)
   * @param of the number of returns of its pulse (0 when the file does not say)
   */
  void add(double px, double py, double pz, double h, byte n, byte of, byte kind, byte where) {
    later += n >= 2 ? 1 : 0;
    multiPulse += n >= 2 || of >= 2 ? 1 : 0;
    if (size == x.length) {
      int cap = size * 2;
      x = Arrays.copyOf(x, cap);
      y = Arrays.copyOf(y, cap);
      z = Arrays.copyOf(z, cap);
      hag = Arrays.copyOf(hag, cap);
      returnNumber = Arrays.copyOf(returnNumber, cap);
      returns = Arrays.copyOf(returns, cap);
      label = Arrays.copyOf(label, cap);
      zone = Arrays.copyOf(zone, cap);
    }
    x[size] = px;
    y[size] = py;
    z[size] = pz;
    hag[size] = (float) h;
    returnNumber[size] = n;
    returns[size] = of;
    label[size] = kind;
    zone[size] = where;
    size++;
  }

  /** Writes the points' columns, one after the other ({@link #BYTES_PER_POINT} a point), into
   * {@code out} (cleared first, flipped after; room for {@link #size} points). */
  void writeColumns(ByteBuffer out) {
    out.clear();
    out.asDoubleBuffer().put(x, 0, size);
    out.position(out.position() + size * Double.BYTES);
    out.asDoubleBuffer().put(y, 0, size);
    out.position(out.position() + size * Double.BYTES);
    out.asDoubleBuffer().put(z, 0, size);
    out.position(out.position() + size * Double.BYTES);
    out.asFloatBuffer().put(hag, 0, size);
    out.position(out.position() + size * Float.BYTES);
    out.put(returnNumber, 0, size);
    out.put(returns, 0, size);
    out.put(label, 0, size);
    out.put(zone, 0, size);
    out.flip();
  }

  /** Appends {@code n} points read from columns written by {@link #writeColumns} (the arrays
   * must have room). */
  void readColumns(ByteBuffer in, int n) {
    int at = size;
    in.asDoubleBuffer().get(x, at, n);
    in.position(in.position() + n * Double.BYTES);
    in.asDoubleBuffer().get(y, at, n);
    in.position(in.position() + n * Double.BYTES);
    in.asDoubleBuffer().get(z, at, n);
    in.position(in.position() + n * Double.BYTES);
    in.asFloatBuffer().get(hag, at, n);
    in.position(in.position() + n * Float.BYTES);
    in.get(returnNumber, at, n);
    in.get(returns, at, n);
    in.get(label, at, n);
    in.get(zone, at, n);
    for (int i = at; i < at + n; i++) {
      later += returnNumber[i] >= 2 ? 1 : 0;
      multiPulse += returnNumber[i] >= 2 || returns[i] >= 2 ? 1 : 0;
    }
    size += n;
  }

  /** Adds another collector's points. */
  void absorb(LabelPoints o) {
    for (int i = 0; i < o.size; i++) {
      add(o.x[i], o.y[i], o.z[i], o.hag[i], o.returnNumber[i], o.returns[i], o.label[i],
          o.zone[i]);
    }
  }
}
