package org.clearance.io;

/**
 * A stable sort of the indices {@code 0..n-1} under a comparator on ints: the permutation that
 * {@code Arrays.sort(Integer[], Comparator)} gives (a stable sort's result is unique for a
 * consistent order), without boxing each index (16 bytes and a pointer per point). Top-down
 * merge sort with insertion sort on short runs (Knuth, The Art of Computer Programming vol. 3,
 * 5.2.4); O(n log n) comparisons, one extra {@code int[n]}.
 */
public final class IntOrder {

  /** An order on indices. */
  @FunctionalInterface
  public interface Comparator {
    /** Negative, zero or positive as index {@code a} sorts before, with or after {@code b}. */
    int compare(int a, int b);
  }

  /** Runs this short are sorted by insertion: fewer moves than merging them. */
  static final int INSERTION_RUN = 24;

  private IntOrder() {}

  /** The indices {@code 0..n-1} in the comparator's order, equal ones in index order. */
  public static int[] sorted(int n, Comparator order) {
    int[] a = new int[n];
    for (int i = 0; i < n; i++) {
      a[i] = i;
    }
    int[] tmp = new int[n];
    sort(a, tmp, 0, n, order);
    return a;
  }

  private static void sort(int[] a, int[] tmp, int from, int to, Comparator order) {
    if (to - from <= INSERTION_RUN) {
      for (int i = from + 1; i < to; i++) {
        int v = a[i];
        int j = i - 1;
        while (j >= from && order.compare(a[j], v) > 0) {
          a[j + 1] = a[j];
          j--;
        }
        a[j + 1] = v;
      }
      return;
    }
    int mid = (from + to) >>> 1;
    sort(a, tmp, from, mid, order);
    sort(a, tmp, mid, to, order);
    if (order.compare(a[mid - 1], a[mid]) <= 0) {
      return; // already in order
    }
    System.arraycopy(a, from, tmp, from, to - from);
    int i = from;
    int j = mid;
    for (int k = from; k < to; k++) {
      // Take from the left run on ties: stable.
      if (j >= to || i < mid && order.compare(tmp[i], tmp[j]) <= 0) {
        a[k] = tmp[i++];
      } else {
        a[k] = tmp[j++];
      }
    }
  }
}
