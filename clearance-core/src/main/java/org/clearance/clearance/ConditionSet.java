package org.clearance.clearance;

import java.util.List;
import java.util.Locale;
import org.clearance.line.LineCondition;

/**
 * The conditions a run measures: the surveyed state first, then every named condition of the line
 * specifications in order of first appearance (lines that lack a condition get no distance for
 * it); built by {@link ConditionModels#conditionSet}.
 *
 * @param names condition names, {@link ConditionDistance#SURVEY} first
 * @param groups report group of each: {@code survey}, {@code hot}, {@code blowout}, {@code ice}
 */
public record ConditionSet(List<String> names, List<String> groups) {

  public ConditionSet {
    names = List.copyOf(names);
    groups = List.copyOf(groups);
    if (names.isEmpty() || !names.get(0).equals(ConditionDistance.SURVEY)) {
      throw new IllegalArgumentException("the surveyed state comes first");
    }
    if (names.size() != groups.size()) {
      throw new IllegalArgumentException("one group per condition");
    }
  }

  /** The report group name of a condition. */
  public static String group(LineCondition c) {
    return c.reportGroup().name().toLowerCase(Locale.ROOT);
  }

  public int size() {
    return names.size();
  }

  /** Index of a condition name, or -1. */
  public int indexOf(String name) {
    return names.indexOf(name);
  }
}
