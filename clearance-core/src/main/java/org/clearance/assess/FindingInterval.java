package org.clearance.assess;

import java.util.Objects;

/**
 * A finding's distance with its uncertainty at the rule profile's confidence level (docs/rules.md):
 * the interval [d - k sigma, d + k sigma]. The finding is a <em>violation</em> when even the
 * upper bound is inside the zone, a <em>possible violation</em> when the zone's distance lies
 * within the interval.
 *
 * @param distanceM the governing distance as measured, m
 * @param sigmaM its standard uncertainty, m
 * @param lowM lower bound d - k sigma, m (&gt;= 0)
 * @param highM upper bound d + k sigma, m
 * @param confidencePercent the profile's two-sided confidence level, %
 * @param verdict violation or possible violation
 * @param dominant the input contributing most to sigma
 */
public record FindingInterval(double distanceM, double sigmaM, double lowM, double highM,
    double confidencePercent, Verdict verdict, String dominant) {

  /** How sure a finding is. */
  public enum Verdict {
    /** The whole interval is inside the zone. */
    VIOLATION,
    /** The zone's distance lies within the interval: inside or outside cannot be told. */
    POSSIBLE_VIOLATION;

    /** Words for files and reports. */
    public String words() {
      return this == VIOLATION ? "violation" : "possible violation";
    }
  }

  public FindingInterval {
    Objects.requireNonNull(verdict, "verdict");
    Objects.requireNonNull(dominant, "dominant");
  }
}
