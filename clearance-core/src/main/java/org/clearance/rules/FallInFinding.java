package org.clearance.rules;

import java.util.Optional;

/**
 * The fall-in test of one tree.
 *
 * @param notAssessedReason why the test was not made (empty when it was)
 * @param canStrike whether the tree's reach (height plus allowance) is at least the distance
 *     from its base to the nearest conductor
 * @param condition the condition whose conductor position governs (the largest margin)
 * @param distanceM distance from the tree base to the nearest conductor in that condition, m
 * @param reachM tree height plus the rule's allowance, m
 * @param marginM reach minus distance, m (&gt;= 0 when the tree can strike)
 */
public record FallInFinding(
    Optional<String> notAssessedReason,
    boolean canStrike,
    String condition,
    double distanceM,
    double reachM,
    double marginM) {

  static FallInFinding notAssessed(String reason) {
    return new FallInFinding(Optional.of(reason), false, "", Double.NaN, Double.NaN,
        Double.NaN);
  }
}
