package org.clearance.label;

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
 * wire finder. About 40 bytes a point; only the line's region is held, never the whole survey.
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

  private final List<SpanFrame> frames;
  private final double regionM;
  private final GroundModel ground;
  private final SetAside setAside;
  private final boolean judgeVegetationLabels;
  /** The block window the points are gathered for, or null for the whole line. */
  private final LabelWindow window;
  /** True to count the points (and their later returns) without holding them. */
  private final boolean countOnly;

  int size;
  /** Later returns (return number 2 or more) among the points added. */
  long later;
  /** Points of pulses with several returns (number of returns 2 or more) among those added. */
  long multiPulse;
  double[] x = new double[1024];
  double[] y = new double[1024];
  double[] z = new double[1024];
  float[] hag = new float[1024];
  /** Return number of the point within its pulse (0 when the file does not say). */
  byte[] returnNumber = new byte[1024];
  /** Number of returns of the point's pulse (0 when the file does not say). */
  byte[] returns = new byte[1024];
  /** What each point was labelled ({@link #OPEN}, {@link #VEGETATION_LABEL},
   * {@link #GROUND_DOUBTED}). */
  byte[] label = new byte[1024];
  /** Where each point lies in the block window ({@link LabelWindow#CORE} for the whole line). */
  byte[] zone = new byte[1024];

  LabelPoints(List<SpanFrame> frames, double regionM, GroundModel ground, SetAside setAside,
      boolean judgeVegetationLabels) {
    this(frames, regionM, ground, setAside, judgeVegetationLabels, null, false);
  }

  /**
   * A collector for one block window ({@code window} not null) or a counter of the points
   * looked at on the whole line ({@code countOnly}).
   */
  LabelPoints(List<SpanFrame> frames, double regionM, GroundModel ground, SetAside setAside,
      boolean judgeVegetationLabels, LabelWindow window, boolean countOnly) {
    this.window = window;
    this.countOnly = countOnly;
    this.frames = frames;
    this.regionM = regionM;
    this.ground = ground;
    this.setAside = setAside;
    this.judgeVegetationLabels = judgeVegetationLabels;
  }

  @Override
  public void accept(PointChunk chunk) {
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      int c = cls[i];
      byte kind = c <= 1 ? OPEN : c == 2 ? GROUND_DOUBTED
          : judgeVegetationLabels && c >= 3 && c <= 5 ? VEGETATION_LABEL : -1;
      if (kind < 0 || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      double px = chunk.x()[i];
      double py = chunk.y()[i];
      double pz = chunk.z()[i];
      byte where = window != null ? window.zone(px, py)
          : inRegion(px, py) ? LabelWindow.CORE : LabelWindow.OUTSIDE;
      if (where == LabelWindow.OUTSIDE) {
        continue;
      }
      double h = ground.heightAboveGround(px, py, pz);
      boolean high = kind == GROUND_DOUBTED ? h > GROUND_LABEL_MAX_HEIGHT_M : h >= MIN_HAG_M;
      if (!high || setAside.reason(SetAside.key(px, py, pz)) != SetAside.Reason.NONE) {
        continue;
      }
      add(px, py, pz, h, chunk.returnNumber()[i], chunk.numberOfReturns()[i], kind, where);
    }
  }

  /** Whether a plan point lies within {@code regionM} of a span's chord (the region looked at). */
  static boolean inRegion(List<SpanFrame> frames, double regionM, double px, double py) {
    return owner(frames, regionM, px, py) >= 0;
  }

  /** The first span (index in {@code frames}) whose region holds the plan point, or -1. */
  static int owner(List<SpanFrame> frames, double regionM, double px, double py) {
    for (int k = 0; k < frames.size(); k++) {
      SpanFrame f = frames.get(k);
      double s = f.station(px, py);
      if (s >= -regionM && s <= f.length() + regionM && Math.abs(f.offset(px, py)) <= regionM) {
        return k;
      }
    }
    return -1;
  }

  private boolean inRegion(double px, double py) {
    for (SpanFrame f : frames) {
      double s = f.station(px, py);
      if (s >= -regionM && s <= f.length() + regionM && Math.abs(f.offset(px, py)) <= regionM) {
        return true;
      }
    }
    return false;
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
    if (countOnly) {
      size++;
      return;
    }
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

  /** Adds another collector's points. */
  void absorb(LabelPoints o) {
    for (int i = 0; i < o.size; i++) {
      add(o.x[i], o.y[i], o.z[i], o.hag[i], o.returnNumber[i], o.returns[i], o.label[i],
          o.zone[i]);
    }
  }
}
