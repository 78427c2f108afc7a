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
 * @param uncertainties one entry per condition: how uncertain the state's position is along the
 *     span, or empty where not computed (an empty list when not computed at all)
 */
public record ConductorModel(
    String name, String role, List<Optional<ConductorState>> states,
    List<Optional<String>> failures, List<Optional<StateUncertainty>> uncertainties) {

  /** A model without uncertainties. */
  public ConductorModel(String name, String role, List<Optional<ConductorState>> states,
      List<Optional<String>> failures) {
    this(name, role, states, failures, List.of());
  }

  public ConductorModel {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(role, "role");
    states = List.copyOf(states);
    failures = List.copyOf(failures);
    uncertainties = List.copyOf(uncertainties);
    if (!uncertainties.isEmpty() && uncertainties.size() != states.size()) {
      throw new IllegalArgumentException("one uncertainty per condition, or none at all");
    }
    if (states.size() != failures.size() || states.isEmpty()) {
      throw new IllegalArgumentException("one state or failure per condition, survey first");
    }
    if (states.get(0).isEmpty()) {
      throw new IllegalArgumentException("the surveyed state is required: " + name);
    }
  }

  /** The uncertainty of the state of condition k, if computed. */
  public Optional<StateUncertainty> uncertainty(int k) {
    return k < uncertainties.size() ? uncertainties.get(k) : Optional.empty();
  }

  /** The surveyed state. */
  public ConductorState survey() {
    return states.get(0).orElseThrow();
  }
}
