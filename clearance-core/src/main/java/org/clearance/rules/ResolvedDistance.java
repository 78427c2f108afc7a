package org.clearance.rules;

import java.util.List;
import java.util.Objects;

/**
 * One distance of a zone resolved for a span: a base that does not depend on the position in
 * the span, plus mid-span allowances (the zone's own, and those of zones it builds on).
 *
 * @param baseM the base distance, m (&gt; 0)
 * @param allowances allowances added at a station
 * @param basis how the base was found, in plain words
 */
public record ResolvedDistance(double baseM, List<MidspanAllowance> allowances, String basis) {

  public ResolvedDistance {
    allowances = List.copyOf(allowances);
    Objects.requireNonNull(basis, "basis");
  }

  /**
   * The distance at a station of a span, m.
   *
   * @param spanLengthM plan length of the span, m
   * @param stationM station of the conductor point from the span's first structure, m
   */
  public double at(double spanLengthM, double stationM) {
    double d = baseM;
    for (MidspanAllowance a : allowances) {
      if (!a.isNone()) {
        d += a.at(spanLengthM, stationM);
      }
    }
    return d;
  }

  /** Whether any allowance can change the distance along the span. */
  public boolean variesAlongSpan() {
    return allowances.stream().anyMatch(a -> !a.isNone());
  }
}
