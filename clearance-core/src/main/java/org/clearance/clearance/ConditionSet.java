package org.clearance.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.clearance.line.LineCondition;
import org.clearance.line.LineSpec;

/**
 * The conditions a run measures: the surveyed state first, then every named condition of the line
 * specifications in order of first appearance (lines that lack a condition get no distance for
 * it).
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

  /** The surveyed state and the conditions of all given line specifications. */
  public static ConditionSet of(List<LineSpec> specs) {
    List<String> names = new ArrayList<>(List.of(ConditionDistance.SURVEY));
    List<String> groups = new ArrayList<>(List.of(ConditionDistance.SURVEY));
    for (LineSpec spec : specs) {
      for (LineCondition c : spec.conditions()) {
        if (!names.contains(c.name())) {
          names.add(c.name());
          groups.add(group(c));
        }
      }
    }
    return new ConditionSet(names, groups);
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
