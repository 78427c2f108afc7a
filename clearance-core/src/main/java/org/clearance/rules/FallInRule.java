package org.clearance.rules;

import java.util.Objects;

/**
 * The fall-in (strike) rule: a tree can strike the line when it is at least as tall as the
 * distance from its base to the nearest conductor in the rule's condition, less an allowance
 * (a rigid tree rotating about its base sweeps a sphere of radius equal to its height:
 * docs/methods.md section 5.2).
 *
 * @param enabled whether fall-in is assessed
 * @param conditions the conditions whose conductor position counts (null when disabled)
 * @param allowance clearance added to the tree height (its reach), e.g. a flashover distance
 *     (null when disabled)
 */
public record FallInRule(boolean enabled, ConditionSelector conditions, DistanceSpec allowance) {

  /** Fall-in not assessed. */
  public static final FallInRule DISABLED = new FallInRule(false, null, null);

  public FallInRule {
    if (enabled) {
      Objects.requireNonNull(conditions, "conditions");
      Objects.requireNonNull(allowance, "allowance");
    }
  }
}
