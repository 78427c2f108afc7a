package org.clearance.wire;

import java.util.BitSet;

/**
 * A subset of the input points of a fit or split (immutable): the inliers a fit kept, or the
 * members of one sub-conductor group. Indices are those of the input arrays.
 */
public final class PointMask {

  private final BitSet bits;
  private final int size;

  private PointMask(BitSet bits, int size) {
    this.bits = bits;
    this.size = size;
  }

  /** A mask of {@code size} points containing none. */
  public static PointMask none(int size) {
    return new PointMask(new BitSet(), checkSize(size));
  }

  /** A mask from flags, one per point (copied). */
  public static PointMask of(boolean[] member) {
    BitSet b = new BitSet(member.length);
    for (int i = 0; i < member.length; i++) {
      if (member[i]) {
        b.set(i);
      }
    }
    return new PointMask(b, member.length);
  }

  private static int checkSize(int size) {
    if (size < 0) {
      throw new IllegalArgumentException("size must not be negative: " + size);
    }
    return size;
  }

  /** Number of points the mask covers (members and non-members). */
  public int size() {
    return size;
  }

  /** Number of members. */
  public int count() {
    return bits.cardinality();
  }

  /**
   * Whether point i is a member.
   *
   * @throws IndexOutOfBoundsException when i is outside [0, size())
   */
  public boolean contains(int i) {
    if (i < 0 || i >= size) {
      throw new IndexOutOfBoundsException("point " + i + " outside 0.." + (size - 1));
    }
    return bits.get(i);
  }

  /** Indices of the members in increasing order (a new array). */
  public int[] indices() {
    return bits.stream().toArray();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof PointMask m && m.size == size && m.bits.equals(bits);
  }

  @Override
  public int hashCode() {
    return 31 * bits.hashCode() + size;
  }

  @Override
  public String toString() {
    return "PointMask[" + count() + " of " + size + "]";
  }
}
