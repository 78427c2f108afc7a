package org.clearance.assess;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * A bounded sample of one span's vegetation points for drawing: the points inside a zone (with
 * the zone's priority) and, apart, a sample of the other points near the line. Memory is bounded
 * by the cap, never by the survey: reservoir sampling (Vitter 1985, "Random sampling with a
 * reservoir", ACM TOMS 11(1), algorithm R) with a fixed seed.
 */
public final class SpanPoints {

  /** Seed of the sampler: drawings of one run folder are repeatable. */
  private static final long SEED = 0x5EED_C1EAL;

  private final Reservoir inside;
  private final Reservoir other;

  /** @param cap points kept per kind at most (&gt;= 0) */
  SpanPoints(int cap) {
    this.inside = new Reservoir(cap);
    this.other = new Reservoir(cap);
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

  /** Coordinate of a kept inside point: 0 x, 1 y, 2 z (m). */
  public double inside(int i, int axis) {
    return inside.xyz[3 * i + axis];
  }

  /** Zone priority of a kept inside point. */
  public int insidePriority(int i) {
    return inside.tag[i];
  }

  /** Coordinate of a kept other point: 0 x, 1 y, 2 z (m). */
  public double other(int i, int axis) {
    return other.xyz[3 * i + axis];
  }

  /** Fixed-capacity reservoir of tagged points. */
  private static final class Reservoir {
    private final int cap;
    private double[] xyz = new double[0];
    private int[] tag = new int[0];
    private int size;
    private long seen;
    private final SplittableRandom random = new SplittableRandom(SEED);

    Reservoir(int cap) {
      this.cap = cap;
    }

    void add(double x, double y, double z, int t) {
      seen++;
      int slot;
      if (size < cap) {
        if (size == tag.length) {
          int n = Math.min(cap, Math.max(16, 2 * size));
          xyz = Arrays.copyOf(xyz, 3 * n);
          tag = Arrays.copyOf(tag, n);
        }
        slot = size++;
      } else {
        long j = random.nextLong(seen);
        if (j >= cap) {
          return;
        }
        slot = (int) j;
      }
      xyz[3 * slot] = x;
      xyz[3 * slot + 1] = y;
      xyz[3 * slot + 2] = z;
      tag[slot] = t;
    }
  }
}
