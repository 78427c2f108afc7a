package org.clearance.wire;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Two lines in one run (package-private): a distribution feeder built under a transmission line
 * on its towers, or two lines sharing a corridor, show each other's wires in their spans. A span
 * of one line finds the other line's conductors as extras (wires its specification lacks); they
 * are that line's conductors, fitted and measured in that line's span, so they are taken out of
 * this span's list (docs/wire-finder.md, "Two lines in one run"). Their points are set aside as
 * wire all the same: the evidence of which points lie on a wire is shared by every span of every
 * line ({@link PointEvidence}).
 *
 * <p>An extra is another line's conductor (matched to a position of that line's specification)
 * when, at {@value #SAMPLES} stations spread over its fitted curve, at least {@value #SHARE} of
 * those that lie within the other conductor's fitted curve are within {@value #SAME_WIRE_M} m of
 * it, and there are at least {@value #MIN_SAMPLES} such; an extra without a curve (too few points
 * to fit, as a wire with a long gap) is one when its first, last and lowest points lie within
 * {@value #SAME_WIRE_M} m of the other conductor's curve, or, when that has none either, of its
 * first, last and lowest points.
 */
final class OtherLineWires {
  /** Stations sampled along an extra's curve. */
  static final int SAMPLES = 21;
  /** Least number of those stations lying within the other conductor's span. */
  static final int MIN_SAMPLES = 5;
  /** Share of those stations that must lie on the other conductor. */
  static final double SHARE = 0.8;
  /** Largest 3D distance between two fits of one wire, m: below the closest spacing of
   * distribution conductors (0.35 m, docs/wire-finder.md), above the difference between two fits
   * of the same points (a few centimetres; 0.15 m RMS is the quality gate). */
  static final double SAME_WIRE_M = 0.3;

  private OtherLineWires() {}

  /**
   * The spans with every extra that is a fitted conductor of another line's span left out;
   * spans of a single-line run are returned as they are.
   */
  static List<SpanWires> withoutOtherLinesWires(List<SpanWires> spans) {
    if (spans.stream().map(s -> s.span().lineId()).distinct().count() < 2) {
      return spans;
    }
    List<SpanWires> out = new ArrayList<>();
    for (SpanWires sw : spans) {
      List<FittedConductor> kept = new ArrayList<>();
      for (FittedConductor c : sw.conductors()) {
        if (c.position().isEmpty() && onOtherLine(c, sw.span().lineId(), spans)) {
          continue;
        }
        kept.add(c);
      }
      out.add(kept.size() == sw.conductors().size() ? sw : new SpanWires(sw.span(),
          sw.status(), sw.reason(), kept, sw.candidatePoints(), sw.labelled()));
    }
    return out;
  }

  /** Number of extras left out: the difference in conductors between the two lists. */
  static int removed(List<SpanWires> before, List<SpanWires> after) {
    int n = 0;
    for (int i = 0; i < before.size(); i++) {
      n += before.get(i).conductors().size() - after.get(i).conductors().size();
    }
    return n;
  }

  private static boolean onOtherLine(FittedConductor extra, String lineId,
      List<SpanWires> spans) {
    for (SpanWires other : spans) {
      if (other.span().lineId().equals(lineId)) {
        continue;
      }
      for (FittedConductor c : other.conductors()) {
        if (c.position().isPresent() && sameWire(extra, c)) {
          return true;
        }
      }
    }
    return false;
  }

  /** Whether an extra and another line's conductor are one wire. */
  static boolean sameWire(FittedConductor extra, FittedConductor other) {
    Optional<ConductorCurve> a = extra.curve();
    Optional<ConductorCurve> b = other.curve();
    if (a.isPresent()) {
      return b.isPresent() && sameWire(a.get(), b.get());
    }
    if (extra.points().isEmpty()) {
      return false;
    }
    WireExtent e = extra.points().get();
    double[][] ends = {{e.firstX(), e.firstY(), e.firstZ()}, {e.lastX(), e.lastY(), e.lastZ()},
        {e.lowX(), e.lowY(), e.lowZ()}};
    for (double[] p : ends) {
      double d;
      if (b.isPresent()) {
        ConductorCurve c = b.get();
        double s = c.plan().station(p[0], p[1]);
        d = s < 0 || s > c.length() ? Double.POSITIVE_INFINITY
            : Math.hypot(c.plan().offset(p[0], p[1]), p[2] - c.z(s));
      } else if (other.points().isPresent()) {
        WireExtent o = other.points().get();
        d = Math.min(Math.min(dist(p, o.firstX(), o.firstY(), o.firstZ()),
            dist(p, o.lastX(), o.lastY(), o.lastZ())), dist(p, o.lowX(), o.lowY(), o.lowZ()));
      } else {
        return false;
      }
      if (!(d <= SAME_WIRE_M)) {
        return false;
      }
    }
    return true;
  }

  private static double dist(double[] p, double x, double y, double z) {
    return Math.sqrt((p[0] - x) * (p[0] - x) + (p[1] - y) * (p[1] - y) + (p[2] - z) * (p[2] - z));
  }

  /** Whether the two curves are one wire where they overlap in plan. */
  static boolean sameWire(ConductorCurve a, ConductorCurve b) {
    int within = 0;
    int close = 0;
    for (int k = 0; k < SAMPLES; k++) {
      double s = a.length() * k / (SAMPLES - 1);
      double x = a.x(s);
      double y = a.y(s);
      double sb = b.plan().station(x, y);
      if (sb < 0 || sb > b.length()) {
        continue;
      }
      within++;
      double d = Math.hypot(b.plan().offset(x, y), a.z(s) - b.z(sb));
      close += d <= SAME_WIRE_M ? 1 : 0;
    }
    return within >= MIN_SAMPLES && close >= SHARE * within;
  }
}
