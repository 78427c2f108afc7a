package org.clearance.spark;

import java.io.Serializable;

/**
 * Point keys ({@link org.clearance.wire.SetAside#key}) that one span's task sends to the spans
 * near it through a shuffle: first its wire points (every span needs its neighbours' to set its
 * own points aside, as the command line's wire finder does once all spans are fitted), then the
 * points it set aside (wire and isolated airborne), which every task that measures near it
 * must skip.
 *
 * @param span the sending span's key in the job
 * @param wire keys of wire points
 * @param airborne keys of isolated airborne points (empty for the wire points' message)
 * @param crossing keys of points of wires crossing the span (empty for the wire points'
 *     message)
 * @param touched keys of wire points touched by vegetation, measured ({@link
 *     org.clearance.wire.SetAside#touchedWire}; empty for the wire points' message)
 * @param failure null; else why the sending span could not set its points aside (the key
 *     lists are then null, and the span is reported NOT ASSESSED)
 */
record PointKeys(int span, long[] wire, long[] airborne, long[] crossing, long[] touched,
    String failure) implements Serializable {

  /** Keys without failure. */
  PointKeys(int span, long[] wire, long[] airborne, long[] crossing, long[] touched) {
    this(span, wire, airborne, crossing, touched, null);
  }
}
