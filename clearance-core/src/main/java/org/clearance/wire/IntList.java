package org.clearance.wire;

import java.util.Arrays;

/** A growable list of ints without boxing (package-private). */
final class IntList {
  private int[] a = new int[16];
  private int n;

  void add(int v) {
    if (n == a.length) {
      a = Arrays.copyOf(a, 2 * n);
    }
    a[n++] = v;
  }

  int get(int i) {
    return a[i];
  }

  int size() {
    return n;
  }

  void clear() {
    n = 0;
  }

  int[] toArray() {
    return Arrays.copyOf(a, n);
  }
}
