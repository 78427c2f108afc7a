package org.clearance.clearance;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One fitted conductor of a span in every condition of the run.
 *
 * @param name position name (e.g. {@code B}, or {@code B.1} for a bundle sub-conductor)
 * @param role {@code phase} or {@code shield}
 * @param states one entry per condition of the run's {@link ConditionSet}, the surveyed state
 *     first; empty where the condition could not be computed for this conductor
 * @param failures one entry per condition: why it could not be computed, or empty
 */
public record ConductorModel(
    String name, String role, List<Optional<ConductorState>> states,
    List<Optional<String>> failures) {

  public ConductorModel {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(role, "role");
    states = List.copyOf(states);
    failures = List.copyOf(failures);
    if (states.size() != failures.size() || states.isEmpty()) {
      throw new IllegalArgumentException("one state or failure per condition, survey first");
    }
    if (states.get(0).isEmpty()) {
      throw new IllegalArgumentException("the surveyed state is required: " + name);
    }
  }

  /** The surveyed state. */
  public ConductorState survey() {
    return states.get(0).orElseThrow();
  }
}
