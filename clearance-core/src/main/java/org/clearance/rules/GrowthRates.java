package org.clearance.rules;

import java.util.Map;
import java.util.Objects;

/**
 * Vegetation growth rates by ASPRS point class, used for years-to-violation and for zones whose
 * distance adds the growth over one trim cycle.
 *
 * @param byClass rates for particular ASPRS classes (e.g. 3, 4, 5 low/medium/high vegetation)
 * @param fallback rates for every other class (e.g. unclassified points)
 */
public record GrowthRates(Map<Integer, Rate> byClass, Rate fallback) {

  /**
   * Growth of one vegetation class.
   *
   * @param verticalMPerYear upward growth, m/year (&gt;= 0)
   * @param lateralMPerYear sideways growth, m/year (&gt;= 0)
   */
  public record Rate(double verticalMPerYear, double lateralMPerYear) {
    public Rate {
      if (!(Double.isFinite(verticalMPerYear) && verticalMPerYear >= 0)) {
        throw new IllegalArgumentException("vertical growth must be >= 0: " + verticalMPerYear);
      }
      if (!(Double.isFinite(lateralMPerYear) && lateralMPerYear >= 0)) {
        throw new IllegalArgumentException("lateral growth must be >= 0: " + lateralMPerYear);
      }
    }
  }

  public GrowthRates {
    byClass = Map.copyOf(byClass);
    Objects.requireNonNull(fallback, "fallback");
  }

  /** The rates for an ASPRS class. */
  public Rate forClass(int classification) {
    return byClass.getOrDefault(classification, fallback);
  }

  /** The fastest vertical rate of any class, m/year. */
  public double fastestVertical() {
    double max = fallback.verticalMPerYear();
    for (Rate r : byClass.values()) {
      max = Math.max(max, r.verticalMPerYear());
    }
    return max;
  }

  /** The fastest lateral rate of any class, m/year. */
  public double fastestLateral() {
    double max = fallback.lateralMPerYear();
    for (Rate r : byClass.values()) {
      max = Math.max(max, r.lateralMPerYear());
    }
    return max;
  }
}
