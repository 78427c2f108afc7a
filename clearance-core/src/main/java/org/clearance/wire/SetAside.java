package org.clearance.wire;

import org.clearance.survey.LongHashSet;

/**
 * Survey points of classes 0 and 1 that the wire finder's evidence shows are not vegetation, so
 * that the clearance engine may set them aside: points on a wire, and isolated airborne points
 * (birds, high noise), and points of man-made objects the labelling step found. Every other
 * unclassified point near a conductor stays vegetation.
 *
 * <p>Points are known by a key made from their exact coordinates as read ({@link #key}); the
 * engine reads the same survey and so finds the same keys. The evidence and its thresholds are
 * in {@link PointEvidence} and docs/wire-finder.md ("Points set aside"). Filled by the wire
 * finder, then only read: safe to read from many threads.
 */
public final class SetAside {

  /** Why a point is set aside. */
  public enum Reason {
    /** Not set aside: vegetation when its class and height say so. */
    NONE,
    /** A point of a wire: on a fitted conductor within its fit tolerance, or on a long linear
     * piece no conductor was fitted to. */
    WIRE,
    /** An isolated airborne point: a few points with nothing else within the isolation
     * distance, high above anything below them (a bird, high noise). */
    AIRBORNE,
    /** A point of a man-made object (building, crane, mast, fence, vehicle) shown by the
     * labelling step's evidence ({@code org.clearance.label.ObjectLabeller}). */
    OBJECT,
    /** A point of a wire crossing the span (a service drop, a line crossing under or over it;
     * {@link Crossing}). */
    CROSSING
  }

  private final LongHashSet wire = new LongHashSet();
  private final LongHashSet airborne = new LongHashSet();
  private final LongHashSet object = new LongHashSet();
  private final LongHashSet crossing = new LongHashSet();
  /** Points on a wire that are measured all the same, because vegetation touches them. */
  private final LongHashSet touched = new LongHashSet();
  /** Points of a class that rules out vegetation whose label the labelling step does not
   * believe (a crown labelled wire): measured as unclassified. */
  private final LongHashSet distrusted = new LongHashSet();

  /** An empty set: nothing is set aside. */
  public static SetAside none() {
    return new SetAside();
  }

  /** The key of a point from its coordinates as read (any unit, the same for every reader). */
  public static long key(double x, double y, double z) {
    long h = Double.doubleToLongBits(x);
    h = h * 0x9E3779B97F4A7C15L + Double.doubleToLongBits(y);
    h = h * 0x9E3779B97F4A7C15L + Double.doubleToLongBits(z);
    h ^= h >>> 31;
    h *= 0xBF58476D1CE4E5B9L;
    return h ^ (h >>> 29);
  }

  /** A set of the given keys ({@link #key}): wire points, then isolated airborne points. */
  public static SetAside of(long[] wireKeys, long[] airborneKeys) {
    return of(wireKeys, airborneKeys, new long[0]);
  }

  /** A set of the given keys: wire points, isolated airborne points, crossing wires' points. */
  public static SetAside of(long[] wireKeys, long[] airborneKeys, long[] crossingKeys) {
    return of(wireKeys, airborneKeys, crossingKeys, new long[0]);
  }

  /**
   * A set of the given keys: wire points, isolated airborne points, crossing wires' points, and
   * wire points touched by vegetation ({@link #touchedWire}).
   */
  public static SetAside of(long[] wireKeys, long[] airborneKeys, long[] crossingKeys,
      long[] touchedKeys) {
    SetAside s = new SetAside();
    for (long k : touchedKeys) {
      s.addTouched(k);
    }
    for (long k : crossingKeys) {
      s.addCrossing(k);
    }
    for (long k : wireKeys) {
      s.addWire(k);
    }
    for (long k : airborneKeys) {
      s.addAirborne(k);
    }
    return s;
  }

  synchronized void addWire(long key) {
    wire.add(key);
  }

  synchronized void addAirborne(long key) {
    airborne.add(key);
  }

  synchronized void addCrossing(long key) {
    crossing.add(key);
  }

  synchronized void addTouched(long key) {
    touched.add(key);
  }

  /**
   * Whether the point with this key lies on a wire (on a fitted curve within its fit tolerance,
   * or on a crossing wire) yet is not set aside because vegetation lies within the touch
   * distance of it (docs/wire-finder.md, "Points set aside"): the point is probably the wire
   * itself, but a branch on the wire and the wire cannot be told apart, so it is measured. Its
   * {@link #reason} is {@link Reason#NONE} unless another span's evidence sets it aside.
   */
  public boolean touchedWire(long key) {
    return touched.contains(key);
  }

  /**
   * Adds a point whose label rules out vegetation but whose object the labelling step shows to
   * be a crown (a crown labelled wire, {@code org.clearance.label.WireLabels}): called before
   * the engine reads the set.
   */
  public synchronized void addDistrustedLabel(long key) {
    distrusted.add(key);
  }

  /** Whether the point with this key is one of {@link #addDistrustedLabel}: the engine measures
   * it as an unclassified point. */
  public boolean labelDistrusted(long key) {
    return distrusted.contains(key);
  }

  /** Points whose label is not believed ({@link #addDistrustedLabel}). */
  public long distrustedCount() {
    return distrusted.size();
  }

  /** The keys of the wire points touched by vegetation ({@link #touchedWire}), in no order. */
  public synchronized long[] touchedKeys() {
    return touched.toArray();
  }

  /** Adds a point of a man-made object: called by the labelling step before the engine reads
   * the set. */
  public synchronized void addObject(long key) {
    object.add(key);
  }

  /** Why the point with this key is set aside, {@link Reason#NONE} when it is not. */
  public Reason reason(long key) {
    if (wire.contains(key)) {
      return Reason.WIRE;
    }
    if (airborne.contains(key)) {
      return Reason.AIRBORNE;
    }
    if (crossing.contains(key)) {
      return Reason.CROSSING;
    }
    return object.contains(key) ? Reason.OBJECT : Reason.NONE;
  }

  /** The keys of the points set aside as wire, in no particular order (to send elsewhere). */
  public synchronized long[] wireKeys() {
    return wire.toArray();
  }

  /** The keys of the isolated airborne points, in no particular order. */
  public synchronized long[] airborneKeys() {
    return airborne.toArray();
  }

  /** The keys of the points of crossing wires, in no particular order. */
  public synchronized long[] crossingKeys() {
    return crossing.toArray();
  }

  /** Points set aside as points of crossing wires. */
  public long crossingCount() {
    return crossing.size();
  }

  /** Points set aside as wire. */
  public long wireCount() {
    return wire.size();
  }

  /** Points set aside as parts of man-made objects. */
  public long objectCount() {
    return object.size();
  }

  /** Points set aside as isolated airborne points. */
  public long airborneCount() {
    return airborne.size();
  }
}
