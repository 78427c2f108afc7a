package org.clearance.assess;

import java.util.Arrays;

/**
 * A bounded sample of one span's vegetation points for drawing: the points inside a zone (with
 * the zone's priority) and, apart, a sample of the other points near the line. Memory is bounded
 * by the cap, never by the survey. The sample is the {@code cap} points with the smallest hash of
 * their coordinates (bottom-k sampling by hash, Cohen and Kaplan 2007, "Summarizing data using
 * bottom-k sketches", PODC), kept in hash order: the same points give the same sample in the same
 * order whatever order they arrive in, so a drawing is byte-identical between runs even though
 * the measuring threads store points in varying order.
 */
public final class SpanPoints {

  private final Sample inside;
  private final Sample other;

  /** @param cap points kept per kind at most (&gt;= 0) */
  SpanPoints(int cap) {
    this.inside = new Sample(cap);
    this.other = new Sample(cap);
  }

  void addInside(double x, double y, double z, int priority) {
    inside.add(x, y, z, priority);
  }

  void addOther(double x, double y, double z) {
    other.add(x, y, z, 0);
  }

  /** Points inside a zone kept for drawing. */
  public int insideCount() {
    return inside.size;
  }

  /** Other points kept for drawing. */
  public int otherCount() {
    return other.size;
  }

  /** Coordinate of a kept inside point, in hash order: 0 x, 1 y, 2 z (m). */
  public double inside(int i, int axis) {
    return inside.coordinate(i, axis);
  }

  /** Zone priority of a kept inside point. */
  public int insidePriority(int i) {
    return inside.tag(i);
  }

  /** Coordinate of a kept other point, in hash order: 0 x, 1 y, 2 z (m). */
  public double other(int i, int axis) {
    return other.coordinate(i, axis);
  }

  /** The SplitMix64 finaliser (Steele, Lea and Flood 2014, OOPSLA): a well-mixed 64-bit hash. */
  static long mix(long z) {
    z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
    z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
    return z ^ (z >>> 31);
  }

  /** The hash of a tagged point. */
  static long key(double x, double y, double z, int t) {
    long h = mix(Double.doubleToLongBits(x));
    h = mix(h ^ Double.doubleToLongBits(y));
    h = mix(h ^ Double.doubleToLongBits(z));
    return mix(h ^ t);
  }

  /** Fixed-capacity set of the tagged points with the smallest keys. */
  private static final class Sample {
    private final int cap;
    private double[] xyz = new double[0];
    private int[] tag = new int[0];
    private long[] keys = new long[0];
    private int size;
    /** Slot of the largest key while full, or -1. */
    private int maxSlot = -1;
    /** Slots in key order, built on the first read. */
    private int[] order;

    Sample(int cap) {
      this.cap = cap;
    }

    void add(double x, double y, double z, int t) {
      if (cap == 0) {
        return;
      }
      order = null;
      long k = key(x, y, z, t);
      int slot;
      if (size < cap) {
        if (size == tag.length) {
          int n = Math.min(cap, Math.max(16, 2 * size));
          xyz = Arrays.copyOf(xyz, 3 * n);
          tag = Arrays.copyOf(tag, n);
          keys = Arrays.copyOf(keys, n);
        }
        slot = size++;
      } else {
        if (maxSlot < 0) {
          maxSlot = largest();
        }
        if (!before(k, x, y, z, t, maxSlot)) {
          return;
        }
        slot = maxSlot;
        maxSlot = -1;
      }
      keys[slot] = k;
      xyz[3 * slot] = x;
      xyz[3 * slot + 1] = y;
      xyz[3 * slot + 2] = z;
      tag[slot] = t;
    }

    /** Whether a point comes before the one in a slot: by key, ties by coordinates and tag. */
    private boolean before(long k, double x, double y, double z, int t, int slot) {
      return compare(k, x, y, z, t, keys[slot], xyz[3 * slot], xyz[3 * slot + 1],
          xyz[3 * slot + 2], tag[slot]) < 0;
    }

    private static int compare(long k1, double x1, double y1, double z1, int t1, long k2,
        double x2, double y2, double z2, int t2) {
      int c = Long.compare(k1, k2);
      c = c != 0 ? c : Double.compare(x1, x2);
      c = c != 0 ? c : Double.compare(y1, y2);
      c = c != 0 ? c : Double.compare(z1, z2);
      return c != 0 ? c : Integer.compare(t1, t2);
    }

    private int compareSlots(int a, int b) {
      return compare(keys[a], xyz[3 * a], xyz[3 * a + 1], xyz[3 * a + 2], tag[a], keys[b],
          xyz[3 * b], xyz[3 * b + 1], xyz[3 * b + 2], tag[b]);
    }

    private int largest() {
      int m = 0;
      for (int i = 1; i < size; i++) {
        if (compareSlots(i, m) > 0) {
          m = i;
        }
      }
      return m;
    }

    private int slot(int i) {
      if (order == null) {
        order = java.util.stream.IntStream.range(0, size).boxed()
            .sorted(this::compareSlots).mapToInt(Integer::intValue).toArray();
      }
      return order[i];
    }

    double coordinate(int i, int axis) {
      return xyz[3 * slot(i) + axis];
    }

    int tag(int i) {
      return tag[slot(i)];
    }
  }
}
