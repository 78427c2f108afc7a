package org.clearance.wire;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.line.PlanCellIndex;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;

/**
 * When each span was flown: the GPS times of the points in the span's plan strip, streamed with
 * the wire pass. Points labelled as wires (ASPRS classes 13 and 14) are used when a span has any;
 * otherwise every point of the strip (a survey without wire labels: the aircraft flies the strip
 * in one pass, so the wires and the points under them share their time). Memory is a few numbers
 * per span.
 *
 * <p>Use: {@link #consumers(Supplier)} wraps the wire finder's per-thread consumers; after the
 * pass {@link #result()} gives the times.
 */
public final class FlightTimes {

  /** Half width of the strip whose points date a span, m: the outer conductors of a double
   * circuit lie within about 15 m of the centre line (common practice, no source). */
  public static final double HALF_WIDTH_M = 20;
  /** ASPRS classes of wire points (LAS 1.4 R15: 13 wire - guard, 14 wire - conductor). */
  private static final int SHIELD_CLASS = 13;
  private static final int CONDUCTOR_CLASS = 14;
  /** Plan index cell, m: a few strip widths. */
  private static final double CELL_M = 64;

  /**
   * The flight time of one span.
   *
   * @param spanId the span
   * @param meanGps mean GPS time of the dating points, s (as in the LAS files); NaN when none
   * @param minGps earliest, s; NaN when none
   * @param maxGps latest, s; NaN when none
   * @param count number of points used
   * @param wirePoints true when they are points labelled as wires
   */
  public record SpanTime(String spanId, double meanGps, double minGps, double maxGps, long count,
      boolean wirePoints) {}

  private final List<Span> spans;
  private final PlanCellIndex index;
  private final List<double[]> parts = Collections.synchronizedList(new ArrayList<>());

  /** @param spans the spans to date */
  public FlightTimes(List<Span> spans) {
    this.spans = List.copyOf(spans);
    PlanCellIndex.Builder b = new PlanCellIndex.Builder(CELL_M);
    for (int k = 0; k < this.spans.size(); k++) {
      SpanFrame f = this.spans.get(k).frame();
      double x1 = f.x(f.length(), 0);
      double y1 = f.y(f.length(), 0);
      b.addBox(Math.min(f.originX(), x1) - HALF_WIDTH_M, Math.min(f.originY(), y1) - HALF_WIDTH_M,
          Math.max(f.originX(), x1) + HALF_WIDTH_M, Math.max(f.originY(), y1) + HALF_WIDTH_M, k);
    }
    index = b.build();
  }

  /** Wraps per-thread consumers so that each also dates the spans. */
  public Supplier<Consumer<PointChunk>> consumers(Supplier<Consumer<PointChunk>> inner) {
    return () -> {
      Consumer<PointChunk> c = inner.get();
      double[] acc = newAccumulator();
      parts.add(acc);
      return chunk -> {
        c.accept(chunk);
        accept(chunk, acc);
      };
    };
  }

  /** Per span 8 numbers: wire sum, count, min, max, then the same for all strip points. */
  private double[] newAccumulator() {
    double[] a = new double[spans.size() * 8];
    for (int k = 0; k < spans.size(); k++) {
      a[8 * k + 2] = Double.POSITIVE_INFINITY;
      a[8 * k + 3] = Double.NEGATIVE_INFINITY;
      a[8 * k + 6] = Double.POSITIVE_INFINITY;
      a[8 * k + 7] = Double.NEGATIVE_INFINITY;
    }
    return a;
  }

  private void accept(PointChunk chunk, double[] acc) {
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] t = chunk.gpsTime();
    short[] cls = chunk.classification();
    // points come in flight order, so most share the previous point's cell: look it up again
    // only when the cell changes
    long lastCx = Long.MIN_VALUE;
    long lastCy = Long.MIN_VALUE;
    int[] inCell = null;
    for (int i = 0; i < chunk.size(); i++) {
      if (!Double.isFinite(t[i])) {
        continue;
      }
      long cx = PlanCellIndex.cellOf(x[i], CELL_M);
      long cy = PlanCellIndex.cellOf(y[i], CELL_M);
      if (cx != lastCx || cy != lastCy || inCell == null) {
        inCell = index.atCell(cx, cy);
        lastCx = cx;
        lastCy = cy;
      }
      for (int k : inCell) {
        SpanFrame f = spans.get(k).frame();
        double s = f.station(x[i], y[i]);
        if (s < 0 || s > f.length() || Math.abs(f.offset(x[i], y[i])) > HALF_WIDTH_M) {
          continue;
        }
        int c = cls[i] & 0xFF;
        int base = 8 * k + (c == SHIELD_CLASS || c == CONDUCTOR_CLASS ? 0 : 4);
        acc[base] += t[i];
        acc[base + 1]++;
        acc[base + 2] = Math.min(acc[base + 2], t[i]);
        acc[base + 3] = Math.max(acc[base + 3], t[i]);
      }
    }
  }

  /** Per span id, its flight time (NaN times where no point dated it). */
  public Map<String, SpanTime> result() {
    double[] all = newAccumulator();
    synchronized (parts) {
      for (double[] p : parts) {
        for (int j = 0; j < all.length; j += 4) {
          all[j] += p[j];
          all[j + 1] += p[j + 1];
          all[j + 2] = Math.min(all[j + 2], p[j + 2]);
          all[j + 3] = Math.max(all[j + 3], p[j + 3]);
        }
      }
    }
    Map<String, SpanTime> out = new LinkedHashMap<>();
    for (int k = 0; k < spans.size(); k++) {
      boolean wires = all[8 * k + 1] > 0;
      int b = 8 * k + (wires ? 0 : 4);
      long n = (long) all[b + 1];
      String id = spans.get(k).id();
      out.put(id, n == 0 ? new SpanTime(id, Double.NaN, Double.NaN, Double.NaN, 0, false)
          : new SpanTime(id, all[b] / n, all[b + 2], all[b + 3], n, wires));
    }
    return out;
  }
}
