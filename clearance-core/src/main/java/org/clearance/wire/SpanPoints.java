package org.clearance.wire;

import java.util.Arrays;

/**
 * The wire candidate points of one span in the span's frame, in compact growable arrays
 * (package-private): station s along the span and offset e across it (m, {@link
 * org.clearance.line.SpanFrame}), elevation z (m, stored relative to a reference elevation so
 * that floats keep millimetres), height above ground (m, NaN where unknown) and ASPRS class.
 *
 * <p>Each point also keeps its key ({@link SetAside#key}) so that the points found to be wire can
 * be named to the clearance engine. Beside the candidates it holds the corridor's {@link
 * StandingGrid}: the non-ground points that are not candidates.
 *
 * <p>26 bytes a point: memory follows the number of candidates, never the survey. Not
 * thread-safe; one instance per reading thread, merged with {@link #addAll}.
 */
final class SpanPoints {
  /** ASPRS class 13: wire - guard (shield). */
  static final int SHIELD_CLASS = 13;
  /** ASPRS class 14: wire - conductor (phase). */
  static final int CONDUCTOR_CLASS = 14;
  /** Initial capacity; grows by half each time it fills. */
  private static final int INITIAL = 64;

  private final double zRef;
  private float[] s = new float[INITIAL];
  private float[] e = new float[INITIAL];
  private float[] z = new float[INITIAL];
  private float[] h = new float[INITIAL];
  private byte[] c = new byte[INITIAL];
  private long[] k = new long[INITIAL];
  private int n;
  private final StandingGrid standing;
  /** Unlabelled points below the candidate floor near the conductors ({@link #low}), made on
   * first use (a buffer of low points holds none of its own). */
  private SpanPoints low;

  /** @param zRef reference elevation subtracted before storing, m, finite */
  SpanPoints(double zRef) {
    this(zRef, new StandingGrid());
  }

  /**
   * @param zRef reference elevation subtracted before storing, m, finite
   * @param standing the span's grid of what stands ({@link StandingGrid#shared})
   */
  SpanPoints(double zRef, StandingGrid standing) {
    if (!Double.isFinite(zRef)) {
      throw new IllegalArgumentException("zRef must be finite: " + zRef);
    }
    this.zRef = zRef;
    this.standing = java.util.Objects.requireNonNull(standing, "standing");
  }

  /** Adds one point: station, offset, elevation (all m), height above ground (m or NaN), class;
   * its key is 0 (for points made up in tests). */
  void add(double station, double offset, double elevation, double hag, int cls) {
    add(station, offset, elevation, hag, cls, 0L);
  }

  /** Adds one point with its key ({@link SetAside#key}). */
  void add(double station, double offset, double elevation, double hag, int cls, long key) {
    if (n == s.length) {
      grow(n + (n >> 1) + 1);
    }
    s[n] = (float) station;
    e[n] = (float) offset;
    z[n] = (float) (elevation - zRef);
    h[n] = (float) hag;
    c[n] = (byte) cls;
    k[n] = key;
    n++;
  }

  private void grow(int capacity) {
    s = Arrays.copyOf(s, capacity);
    e = Arrays.copyOf(e, capacity);
    z = Arrays.copyOf(z, capacity);
    h = Arrays.copyOf(h, capacity);
    c = Arrays.copyOf(c, capacity);
    k = Arrays.copyOf(k, capacity);
  }

  /** Appends every point of another buffer with the same reference elevation. */
  void addAll(SpanPoints other) {
    if (other.zRef != zRef) {
      throw new IllegalArgumentException("reference elevations differ");
    }
    if (n + other.n > s.length) {
      grow(n + other.n);
    }
    System.arraycopy(other.s, 0, s, n, other.n);
    System.arraycopy(other.e, 0, e, n, other.n);
    System.arraycopy(other.z, 0, z, n, other.n);
    System.arraycopy(other.h, 0, h, n, other.n);
    System.arraycopy(other.c, 0, c, n, other.n);
    System.arraycopy(other.k, 0, k, n, other.n);
    n += other.n;
    standing.addAll(other.standing);
    if (other.low != null) {
      low().addAll(other.low);
    }
  }

  /**
   * Sorts the points by station, then offset, elevation and class, so that the order (and every
   * result computed from it) does not depend on the order the survey was read in.
   */
  void sort() {
    if (low != null) {
      low.sort();
    }
    Integer[] order = new Integer[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
    }
    Arrays.sort(order, (a, b) -> {
      int k = Float.compare(s[a], s[b]);
      k = k != 0 ? k : Float.compare(e[a], e[b]);
      k = k != 0 ? k : Float.compare(z[a], z[b]);
      k = k != 0 ? k : Float.compare(h[a], h[b]);
      k = k != 0 ? k : Byte.compare(c[a], c[b]);
      return k != 0 ? k : Long.compare(this.k[a], this.k[b]);
    });
    float[] s2 = new float[n];
    float[] e2 = new float[n];
    float[] z2 = new float[n];
    float[] h2 = new float[n];
    byte[] c2 = new byte[n];
    long[] k2 = new long[n];
    for (int i = 0; i < n; i++) {
      int j = order[i];
      s2[i] = s[j];
      e2[i] = e[j];
      z2[i] = z[j];
      h2[i] = h[j];
      c2[i] = c[j];
      k2[i] = k[j];
    }
    s = s2;
    e = e2;
    z = z2;
    h = h2;
    c = c2;
    k = k2;
  }

  /**
   * A copy whose elevations are taken relative to a profile along the span: z - reference(s),
   * m. Same points in the same order (indices carry over), same keys; its standing grid is
   * empty. Used to grow closely spaced wires with their common sag shape taken out
   * ({@link SagReference}).
   *
   * @param reference elevation of the profile at a station, m (station in m)
   */
  SpanPoints relativeTo(java.util.function.DoubleUnaryOperator reference) {
    SpanPoints out = new SpanPoints(0);
    out.grow(Math.max(INITIAL, n));
    for (int i = 0; i < n; i++) {
      out.s[i] = s[i];
      out.e[i] = e[i];
      out.z[i] = (float) (z(i) - reference.applyAsDouble(s[i]));
      out.h[i] = h[i];
      out.c[i] = c[i];
      out.k[i] = k[i];
    }
    out.n = n;
    return out;
  }

  /**
   * The unlabelled points (class 0 or 1) below the candidate floor, yet high enough and near
   * enough the conductors' nominal offsets that a conductor sagging low may pass through them
   * (mutable; {@link LowWirePoints}). They are no candidates: no wire is sought among them, and
   * only those on a fitted conductor's curve are ever set aside. Same reference elevation.
   */
  SpanPoints low() {
    if (low == null) {
      low = new SpanPoints(zRef);
    }
    return low;
  }

  /** The highest non-ground point that is not a candidate, per plan cell (mutable). */
  StandingGrid standing() {
    return standing;
  }

  int size() {
    return n;
  }

  /** Station along the span, m. */
  double s(int i) {
    return s[i];
  }

  /** Offset across the span, m, positive to the left. */
  double e(int i) {
    return e[i];
  }

  /** Elevation, m. */
  double z(int i) {
    return z[i] + zRef;
  }

  /** Height above ground, m, or NaN. */
  double hag(int i) {
    return h[i];
  }

  /** ASPRS class, 0-255. */
  int cls(int i) {
    return c[i] & 0xFF;
  }

  /** The point's key ({@link SetAside#key}), 0 when not given. */
  long key(int i) {
    return k[i];
  }

  /** True for a point the survey labelled as a wire (class 13 or 14). */
  boolean labelled(int i) {
    int k = cls(i);
    return k == SHIELD_CLASS || k == CONDUCTOR_CLASS;
  }

  /** Takes a labelled point as unclassified (ASPRS class 1): its wire label is not trusted
   * ({@link CrownLabels}). */
  void unlabel(int i) {
    c[i] = (byte) CandidateCollector.UNCLASSIFIED;
  }

  /** Index of the first point with station &gt;= s (points sorted), in [0, size()]. */
  int firstAtOrAfter(double station) {
    int lo = 0;
    int hi = n;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (s[mid] < station) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }
}
