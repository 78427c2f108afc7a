package org.clearance.wire;

import java.util.BitSet;

/**
 * Which of the input points a fit kept (immutable). Indices are those of the input arrays.
 */
public final class InlierMask {

  private final BitSet bits;
  private final int size;

  private InlierMask(BitSet bits, int size) {
    this.bits = bits;
    this.size = size;
  }

  /** A mask of {@code size} points with no inlier. */
  public static InlierMask none(int size) {
    return new InlierMask(new BitSet(), checkSize(size));
  }

  /** A mask from flags, one per point (copied). */
  public static InlierMask of(boolean[] inlier) {
    BitSet b = new BitSet(inlier.length);
    for (int i = 0; i < inlier.length; i++) {
      if (inlier[i]) {
        b.set(i);
      }
    }
    return new InlierMask(b, inlier.length);
  }

  private static int checkSize(int size) {
    if (size < 0) {
      throw new IllegalArgumentException("size must not be negative: " + size);
    }
    return size;
  }

  /** Number of points the mask covers (inliers and outliers). */
  public int size() {
    return size;
  }

  /** Number of inliers. */
  public int count() {
    return bits.cardinality();
  }

  /**
   * Whether point i is an inlier.
   *
   * @throws IndexOutOfBoundsException when i is outside [0, size())
   */
  public boolean isInlier(int i) {
    if (i < 0 || i >= size) {
      throw new IndexOutOfBoundsException("point " + i + " outside 0.." + (size - 1));
    }
    return bits.get(i);
  }

  /** Indices of the inliers in increasing order (a new array). */
  public int[] indices() {
    return bits.stream().toArray();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof InlierMask m && m.size == size && m.bits.equals(bits);
  }

  @Override
  public int hashCode() {
    return 31 * bits.hashCode() + size;
  }

  @Override
  public String toString() {
    return "InlierMask[" + count() + " of " + size + "]";
  }
}
