package org.clearance.wire;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * Tells whether one fitted wire is likely a bundle of sub-conductors, and splits it.
 *
 * <p>Zhou, Jiang and Jiang (2018), "A novel method for high-voltage bundle conductor
 * reconstruction from airborne LiDAR data", Remote Sens. 10(12):2051 (methods.md section 1.6):
 * a bundle fitted as one wire leaves large residuals, and its sub-conductors separate when the
 * points are projected on the plan (across the line) and vertical planes. Here: when the RMS of
 * the 2-D residual (lateral offset from the plan line, height above the catenary) exceeds
 * {@link Options#singleWireRms()}, the points are split recursively in two along the lateral or
 * the vertical residual, at the threshold that maximises the between-group variance (Otsu 1979,
 * IEEE Trans. SMC 9(1):62, in one dimension), as long as the two groups are far apart both in
 * metres and against their own spread. Sub-conductor spacing is about 0.3-0.5 m (methods.md 1.6).
 *
 * <p>Pass the residuals of all points of the wire, outliers included: a robust fit may have
 * followed one sub-conductor and left the others out.
 */
public final class BundleCheck {

  /** Groups at most: bundles have up to 4 sub-conductors on most lines, 8 on the largest. */
  static final int MAX_GROUPS = 8;

  /**
   * Options.
   *
   * @param singleWireRms residual RMS up to which one wire is assumed, m, &gt; 0
   * @param minSeparation smallest distance between the means of two sub-conductor groups, m,
   *     &gt; 0
   * @param minSeparationRatio smallest ratio of that distance to the pooled within-group
   *     standard deviation, &gt; 0 (a single normal cluster split in two gives about 2.7)
   * @param minGroupPoints fewest points in a group, &gt;= 1
   */
  public record Options(double singleWireRms, double minSeparation, double minSeparationRatio,
      int minGroupPoints) {

    public Options {
      if (!(Double.isFinite(singleWireRms) && singleWireRms > 0)) {
        throw new IllegalArgumentException("singleWireRms must be positive: " + singleWireRms);
      }
      if (!(Double.isFinite(minSeparation) && minSeparation > 0)) {
        throw new IllegalArgumentException("minSeparation must be positive: " + minSeparation);
      }
      if (!(Double.isFinite(minSeparationRatio) && minSeparationRatio > 0)) {
        throw new IllegalArgumentException("minSeparationRatio must be positive: "
            + minSeparationRatio);
      }
      if (minGroupPoints < 1) {
        throw new IllegalArgumentException("minGroupPoints must be >= 1: " + minGroupPoints);
      }
    }

    /**
     * Defaults: one wire up to 0.10 m RMS (about twice the 3-5 cm residual of a single wire;
     * a twin bundle at 0.3-0.5 m spacing fitted as one leaves 0.15-0.25 m), groups at least
     * 0.15 m and 4 within-group deviations apart, at least 5 points each (common practice, no
     * source).
     */
    public static Options defaults() {
      return new Options(0.10, 0.15, 4.0, 5);
    }
  }

  /**
   * One sub-conductor found by the split.
   *
   * @param lateral mean lateral residual of its points, m (positive to the left of the line)
   * @param vertical mean vertical residual of its points, m (positive above the curve)
   * @param members its points
   */
  public record Group(double lateral, double vertical, PointMask members) {
    public Group {
      Objects.requireNonNull(members, "members");
    }
  }

  /**
   * The verdict.
   *
   * @param likelyBundle true when the residual RMS exceeds the single-wire limit and the points
   *     split into two or more groups
   * @param residualRms RMS of the 2-D residual over the finite points, m (NaN when none)
   * @param groups the groups, ordered by lateral then vertical mean; one group of all finite
   *     points when not a bundle
   */
  public record Verdict(boolean likelyBundle, double residualRms, List<Group> groups) {
    public Verdict {
      groups = List.copyOf(groups);
    }
  }

  private final Options options;

  /** A check with the given options. */
  public BundleCheck(Options options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** Check with default options; see {@link #check}. */
  public static Verdict of(double[] lateral, double[] vertical) {
    return new BundleCheck(Options.defaults()).check(lateral, vertical);
  }

  /**
   * Checks one fitted wire.
   *
   * @param lateral per point, the signed offset from the fitted plan line, m
   * @param vertical per point, the height above the fitted catenary, m (same length); points
   *     with a non-finite residual belong to no group
   * @throws IllegalArgumentException when the arrays differ in length
   */
  public Verdict check(double[] lateral, double[] vertical) {
    Objects.requireNonNull(lateral, "lateral");
    Objects.requireNonNull(vertical, "vertical");
    if (lateral.length != vertical.length) {
      throw new IllegalArgumentException("lateral and vertical differ in length: "
          + lateral.length + ", " + vertical.length);
    }
    int n = lateral.length;
    List<int[]> groups = new ArrayList<>();
    int[] all = new int[n];
    int m = 0;
    double sum = 0;
    for (int i = 0; i < n; i++) {
      if (Double.isFinite(lateral[i]) && Double.isFinite(vertical[i])) {
        all[m++] = i;
        sum += lateral[i] * lateral[i] + vertical[i] * vertical[i];
      }
    }
    double rms = m > 0 ? Math.sqrt(sum / m) : Double.NaN;
    groups.add(Arrays.copyOf(all, m));
    if (m > 0 && rms > options.singleWireRms()) {
      boolean changed = true;
      while (changed && groups.size() < MAX_GROUPS) {
        changed = false;
        for (int g = 0; g < groups.size() && groups.size() < MAX_GROUPS; g++) {
          int[][] parts = bestSplit(groups.get(g), lateral, vertical);
          if (parts != null) {
            groups.set(g, parts[0]);
            groups.add(g + 1, parts[1]);
            changed = true;
            g++;
          }
        }
      }
    }
    List<Group> out = new ArrayList<>();
    for (int[] idx : groups) {
      if (idx.length == 0) {
        continue;
      }
      boolean[] member = new boolean[n];
      double sl = 0;
      double sv = 0;
      for (int i : idx) {
        member[i] = true;
        sl += lateral[i];
        sv += vertical[i];
      }
      out.add(new Group(sl / idx.length, sv / idx.length, PointMask.of(member)));
    }
    out.sort(Comparator.comparingDouble(Group::lateral).thenComparingDouble(Group::vertical));
    return new Verdict(out.size() >= 2, rms, out);
  }

  /** The better accepted two-way split of a group along lateral or vertical, or null. */
  private int[][] bestSplit(int[] idx, double[] lateral, double[] vertical) {
    Split a = split(idx, lateral);
    Split b = split(idx, vertical);
    Split best = a == null ? b : b == null ? a : a.ratio >= b.ratio ? a : b;
    return best == null ? null : best.parts;
  }

  private record Split(double ratio, int[][] parts) {}

  /** Otsu split of the values v[idx]; null when it fails the separation tests. */
  private Split split(int[] idx, double[] v) {
    int n = idx.length;
    int k = options.minGroupPoints();
    if (n < 2 * k) {
      return null;
    }
    Integer[] order = new Integer[n];
    for (int i = 0; i < n; i++) {
      order[i] = idx[i];
    }
    Arrays.sort(order, Comparator.comparingDouble(i -> v[i]));
    double[] prefix = new double[n + 1];
    double[] prefixSq = new double[n + 1];
    for (int i = 0; i < n; i++) {
      double x = v[order[i]];
      prefix[i + 1] = prefix[i] + x;
      prefixSq[i + 1] = prefixSq[i] + x * x;
    }
    int bestCut = -1;
    double bestBetween = -1;
    for (int cut = k; cut <= n - k; cut++) {
      double m1 = prefix[cut] / cut;
      double m2 = (prefix[n] - prefix[cut]) / (n - cut);
      double between = (double) cut * (n - cut) * (m2 - m1) * (m2 - m1);
      if (between > bestBetween) {
        bestBetween = between;
        bestCut = cut;
      }
    }
    int cut = bestCut;
    double m1 = prefix[cut] / cut;
    double m2 = (prefix[n] - prefix[cut]) / (n - cut);
    double ss1 = Math.max(0, prefixSq[cut] - cut * m1 * m1);
    double ss2 = Math.max(0, prefixSq[n] - prefixSq[cut] - (n - cut) * m2 * m2);
    double within = n > 2 ? Math.sqrt((ss1 + ss2) / (n - 2)) : 0;
    double gap = m2 - m1;
    double ratio = within > 0 ? gap / within : Double.POSITIVE_INFINITY;
    if (!(gap >= options.minSeparation() && ratio >= options.minSeparationRatio())) {
      return null;
    }
    int[] low = new int[cut];
    int[] high = new int[n - cut];
    for (int i = 0; i < n; i++) {
      if (i < cut) {
        low[i] = order[i];
      } else {
        high[i - cut] = order[i];
      }
    }
    Arrays.sort(low);
    Arrays.sort(high);
    return new Split(ratio, new int[][] {low, high});
  }
}
