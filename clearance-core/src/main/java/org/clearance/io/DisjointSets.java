package org.clearance.io;

/**
 * Union-find over an {@code int[]} of parents (element i is its own root when
 * {@code parent[i] == i}), with path compression; a union keeps the smaller index as the root,
 * so groups are numbered by their first member whatever order the unions come in.
 */
public final class DisjointSets {

  private DisjointSets() {}

  /** The root of {@code i}'s group; compresses the path on the way. */
  public static int root(int[] parent, int i) {
    int r = i;
    while (parent[r] != r) {
      r = parent[r];
    }
    while (parent[i] != r) {
      int next = parent[i];
      parent[i] = r;
      i = next;
    }
    return r;
  }

  /**
   * {@link #union} of a group given by its root: joins {@code b}'s group to the group whose root
   * is {@code rootA} and returns the root of the joined group (the smaller root), so a caller
   * joining one element to many saves looking its root up each time.
   */
  public static int join(int[] parent, int rootA, int b) {
    int rb = root(parent, b);
    if (rb != rootA) {
      parent[Math.max(rootA, rb)] = Math.min(rootA, rb);
    }
    return Math.min(rootA, rb);
  }

  /** Joins the groups of {@code a} and {@code b}; the smaller root becomes the root. */
  public static void union(int[] parent, int a, int b) {
    int ra = root(parent, a);
    int rb = root(parent, b);
    if (ra != rb) {
      parent[Math.max(ra, rb)] = Math.min(ra, rb);
    }
  }
}
