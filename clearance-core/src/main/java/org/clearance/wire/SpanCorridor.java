package org.clearance.wire;

import java.util.Objects;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;

/**
 * The box in a span's frame inside which survey points are kept for the span (package-private):
 * stations from {@code -stationMargin} to {@code length + stationMargin}, offsets within the
 * half-width, and the height rule for unlabelled points.
 *
 * @param span the span
 * @param halfWidthM largest |offset| kept, m
 * @param stationMarginM how far beyond each structure points are kept, m
 * @param minHeightM lowest height above ground of an unlabelled candidate, m
 * @param zRef reference elevation for compact storage, m
 * @param lowHalfWidthM largest |offset| of an unlabelled point kept below {@code minHeightM}
 *     ({@link SpanPoints#low}), m, at most {@code halfWidthM}
 */
record SpanCorridor(Span span, double halfWidthM, double stationMarginM, double minHeightM,
    double zRef, double lowHalfWidthM) {

  SpanCorridor {
    Objects.requireNonNull(span, "span");
  }

  /**
   * True when an unlabelled point inside the corridor, at offset e and hag m above ground, is
   * kept as a low point ({@link SpanPoints#low}): below the candidate floor, at least {@link
   * LowWirePoints#MIN_HEIGHT_M} above ground, within {@code lowHalfWidthM} across.
   */
  boolean holdsLow(double e, double hag) {
    return hag < minHeightM && hag >= LowWirePoints.MIN_HEIGHT_M && Math.abs(e) <= lowHalfWidthM;
  }

  SpanFrame frame() {
    return span.frame();
  }

  /** True when the plan point at station s and offset e lies in the corridor. */
  boolean contains(double s, double e) {
    return s >= -stationMarginM && s <= span.lengthM() + stationMarginM
        && Math.abs(e) <= halfWidthM;
  }

  /** True when the plan point lies in the corridor widened by {@code bandM} m on every side. */
  boolean contains(double s, double e, double bandM) {
    return s >= -stationMarginM - bandM && s <= span.lengthM() + stationMarginM + bandM
        && Math.abs(e) <= halfWidthM + bandM;
  }

  /** The four plan corners of the corridor, x0 y0 x1 y1 ..., m. */
  double[] corners() {
    return corners(0);
  }

  /** The four plan corners of the corridor widened by {@code bandM} m on every side. */
  double[] corners(double bandM) {
    SpanFrame f = frame();
    double s0 = -stationMarginM - bandM;
    double s1 = span.lengthM() + stationMarginM + bandM;
    double w = halfWidthM + bandM;
    return new double[] {f.x(s0, -w), f.y(s0, -w), f.x(s1, -w), f.y(s1, -w), f.x(s1, w),
        f.y(s1, w), f.x(s0, w), f.y(s0, w)};
  }
}
