package org.clearance.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.clearance.clearance.ConditionDistance;

/**
 * Which line conditions a zone or the fall-in rule looks at: report groups ({@code survey},
 * {@code hot}, {@code blowout}, {@code ice}, or {@code all}) and/or named conditions of the line
 * specification. A condition is selected when its group or its name is listed.
 *
 * @param groups report groups; {@link #ALL} selects every condition
 * @param names condition names from the line specification
 */
public record ConditionSelector(Set<String> groups, Set<String> names) {

  /** The word that selects every condition. */
  public static final String ALL = "all";

  /** The report groups a profile may name (plus {@link #ALL}). */
  public static final List<String> GROUPS = List.of("survey", "hot", "blowout", "ice");

  public ConditionSelector {
    groups = Set.copyOf(groups);
    names = Set.copyOf(names);
    if (groups.isEmpty() && names.isEmpty()) {
      throw new IllegalArgumentException("a condition selector needs a group or a name");
    }
  }

  /** Whether a distance of the given condition is selected. */
  public boolean selects(ConditionDistance d) {
    return groups.contains(ALL) || groups.contains(d.group()) || names.contains(d.condition());
  }

  /** Plain words, e.g. {@code "groups hot, blowout; conditions storm-90"}. */
  public String describe() {
    List<String> parts = new ArrayList<>();
    if (groups.contains(ALL)) {
      parts.add("every condition (the worst of survey, hot, blowout, ice)");
    } else if (!groups.isEmpty()) {
      List<String> ordered = new ArrayList<>();
      for (String g : GROUPS) {
        if (groups.contains(g)) {
          ordered.add(g);
        }
      }
      parts.add("report group" + (ordered.size() > 1 ? "s " : " ") + String.join(", ", ordered));
    }
    if (!names.isEmpty()) {
      parts.add("condition" + (names.size() > 1 ? "s " : " ")
          + String.join(", ", names.stream().sorted().toList()));
    }
    return String.join("; ", parts);
  }
}
