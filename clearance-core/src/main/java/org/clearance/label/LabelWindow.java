package org.clearance.label;

import java.util.List;
import org.clearance.line.SpanFrame;

/**
 * The plan window of one block of consecutive spans: the points the labelling looks at (within
 * the region of any span) that lie within the region of a block span widened by the overlap. A
 * point is {@link #CORE} when the first span whose region holds it is in the block (so every
 * point looked at is core in exactly one block), {@link #INNER} when it lies within the region
 * widened by the overlap less {@link #EDGE_M}, and {@link #EDGE} in the outer band. An object
 * with no point in the outer band is whole in the window: its points are linked at
 * {@link ObjectLabeller#LINK_M}, less than the band's width, so none of them lies beyond it.
 */
final class LabelWindow {

  static final byte OUTSIDE = -1;
  static final byte CORE = 0;
  static final byte INNER = 1;
  static final byte EDGE = 2;

  /** Width of the outer band, m: the fragment attachment's reach ({@link
   * ObjectLabeller#ATTACH_M}, 5 m), which is more than the feature radius and the link distance
   * (1 m), so a whole object's features, links and fragment neighbours all lie in the window. */
  static final double EDGE_M = ObjectLabeller.ATTACH_M;

  private final List<SpanFrame> frames;
  private final int from;
  private final int to;
  private final double regionM;
  private final double overlapM;
  private final double minX;
  private final double maxX;
  private final double minY;
  private final double maxY;

  /**
   * @param frames every span of the line, in order
   * @param from first span of the block (index in {@code frames})
   * @param to one past the last span of the block
   * @param regionM the region looked at around each chord, m
   * @param overlapM how far beyond the block's region the window reaches, m (more than
   *     {@link #EDGE_M})
   */
  LabelWindow(List<SpanFrame> frames, int from, int to, double regionM, double overlapM) {
    this.frames = frames;
    this.from = from;
    this.to = to;
    this.regionM = regionM;
    this.overlapM = overlapM;
    double reach = regionM + overlapM;
    double ax = Double.POSITIVE_INFINITY;
    double bx = Double.NEGATIVE_INFINITY;
    double ay = Double.POSITIVE_INFINITY;
    double by = Double.NEGATIVE_INFINITY;
    for (int k = from; k < to; k++) {
      SpanFrame f = frames.get(k);
      for (double s : new double[] {-reach, f.length() + reach}) {
        for (double e : new double[] {-reach, reach}) {
          ax = Math.min(ax, f.x(s, e));
          bx = Math.max(bx, f.x(s, e));
          ay = Math.min(ay, f.y(s, e));
          by = Math.max(by, f.y(s, e));
        }
      }
    }
    minX = ax;
    maxX = bx;
    minY = ay;
    maxY = by;
  }

  /**
   * Where a plan point lies ({@link #OUTSIDE} when the block does not look at it).
   *
   * @param owner the first span whose region holds the point ({@link LabelPoints#owner}), &gt;= 0
   */
  byte zone(double px, double py, int owner) {
    if (px < minX || px > maxX || py < minY || py > maxY
        || !near(px, py, regionM + overlapM)) {
      return OUTSIDE;
    }
    if (owner >= from && owner < to) {
      return CORE;
    }
    return near(px, py, regionM + overlapM - EDGE_M) ? INNER : EDGE;
  }

  /** Least easting the window may hold, m. */
  double minX() {
    return minX;
  }

  /** Greatest easting the window may hold, m. */
  double maxX() {
    return maxX;
  }

  /** Least northing the window may hold, m. */
  double minY() {
    return minY;
  }

  /** Greatest northing the window may hold, m. */
  double maxY() {
    return maxY;
  }

  private boolean near(double px, double py, double reach) {
    for (int k = from; k < to; k++) {
      SpanFrame f = frames.get(k);
      double s = f.station(px, py);
      if (s >= -reach && s <= f.length() + reach && Math.abs(f.offset(px, py)) <= reach) {
        return true;
      }
    }
    return false;
  }
}
