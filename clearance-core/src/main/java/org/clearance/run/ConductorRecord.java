package org.clearance.run;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One conductor of a span as stored in the run model: its fit quality and its geometry in every
 * condition.
 *
 * @param name position name (e.g. {@code B}, {@code B.1})
 * @param role {@code phase}, {@code shield} or {@code unknown}
 * @param status {@code fitted} or {@code not_assessed}
 * @param reason why not assessed, or empty
 * @param points survey points in the fit
 * @param coveragePct share of the span length with points, %
 * @param rmsM RMS residual of the fit, m
 * @param maxGapM largest gap between points along the span, m
 * @param states geometry per condition of the run (surveyed first); empty where not computed
 * @param failures why a condition could not be computed, per condition; empty where it was
 */
public record ConductorRecord(
    String name, String role, String status, String reason, int points, double coveragePct,
    double rmsM, double maxGapM, List<Optional<CurveRecord>> states,
    List<Optional<String>> failures) {

  public ConductorRecord {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(reason, "reason");
    states = List.copyOf(states);
    failures = List.copyOf(failures);
  }

  /** True when the conductor was fitted and has a surveyed geometry. */
  public boolean fitted() {
    return "fitted".equals(status) && !states.isEmpty() && states.get(0).isPresent();
  }
}
