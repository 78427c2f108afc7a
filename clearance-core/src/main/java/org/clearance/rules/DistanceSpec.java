package org.clearance.rules;

import java.util.Objects;

/**
 * How a zone's distance is given: a fixed distance, a table by voltage band and altitude band
 * ({@link DistanceTable}), or the distance of another zone plus margins.
 */
public sealed interface DistanceSpec
    permits DistanceSpec.Fixed, DistanceSpec.Relative, DistanceTable {

  /**
   * A fixed distance.
   *
   * @param metres the distance, m (&gt;= 0; zone distances are &gt; 0)
   */
  record Fixed(double metres) implements DistanceSpec {
    public Fixed {
      if (!(Double.isFinite(metres) && metres >= 0)) {
        throw new IllegalArgumentException("distance must not be negative: " + metres);
      }
    }
  }

  /**
   * The distance of another zone of the same profile (the same component: radial, horizontal or
   * vertical), at the same span and station, plus margins.
   *
   * @param zone name of the zone the distance is based on
   * @param plusM fixed margin added, m (&gt;= 0)
   * @param plusCycleGrowth whether to add the growth over one trim cycle: the cycle length times
   *     the fastest growth rate of the profile (vertical for a vertical distance, lateral for a
   *     horizontal one, the larger of both for a radial one)
   */
  record Relative(String zone, double plusM, boolean plusCycleGrowth) implements DistanceSpec {
    public Relative {
      Objects.requireNonNull(zone, "zone");
      if (!(Double.isFinite(plusM) && plusM >= 0)) {
        throw new IllegalArgumentException("margin must be >= 0: " + plusM);
      }
    }
  }
}
