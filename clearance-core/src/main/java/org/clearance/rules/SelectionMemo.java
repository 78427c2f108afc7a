package org.clearance.rules;

import java.util.Arrays;
import java.util.Objects;
import org.clearance.clearance.ConditionDistance;

/**
 * A {@link ConditionSelector}'s answer remembered per condition: every distance of a run names
 * its condition and group with the same few string instances (the run's condition table), so
 * after the first point of each condition the answer is an identity comparison instead of three
 * set lookups per point, zone and condition. The answer is always the selector's own: a pair
 * not seen yet, or a run whose strings are not shared, asks the selector. Safe to share between
 * threads: the remembered pairs are an immutable snapshot replaced whole (a lost race only
 * forgets a pair).
 */
final class SelectionMemo {

  /** Pairs remembered at most: far above the conditions of any line specification. */
  static final int MAX_PAIRS = 64;

  /** Remembered pairs and answers, index for index. */
  private record Snapshot(String[] conditions, String[] groups, boolean[] selected) {}

  private final ConditionSelector selector;
  private volatile Snapshot known = new Snapshot(new String[0], new String[0], new boolean[0]);

  SelectionMemo(ConditionSelector selector) {
    this.selector = Objects.requireNonNull(selector, "selector");
  }

  /** Whether the selector selects the distance's condition ({@link ConditionSelector#selects}). */
  boolean selects(ConditionDistance d) {
    Snapshot s = known;
    String condition = d.condition();
    String group = d.group();
    for (int i = 0; i < s.conditions.length; i++) {
      if (s.conditions[i] == condition && s.groups[i] == group) {
        return s.selected[i];
      }
    }
    boolean answer = selector.selects(d);
    int n = s.conditions.length;
    if (n < MAX_PAIRS) {
      String[] c = Arrays.copyOf(s.conditions, n + 1);
      String[] g = Arrays.copyOf(s.groups, n + 1);
      boolean[] a = Arrays.copyOf(s.selected, n + 1);
      c[n] = condition;
      g[n] = group;
      a[n] = answer;
      known = new Snapshot(c, g, a);
    }
    return answer;
  }
}
