package org.clearance.rules;

import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;
import org.clearance.line.ConductorPosition.Role;

/**
 * One clearance zone of a rule profile.
 *
 * @param name unique name within the profile
 * @param priority 1 = most urgent; unique within the profile
 * @param violationReference whether the zone is the profile's governing minimum: being inside it
 *     is a violation, and years-to-violation count towards it
 * @param voltage the line voltages the zone applies to
 * @param conditions the line conditions in which the zone applies
 * @param measurement how distances are measured and the distances required
 * @param allowance extra clearance towards mid-span ({@link MidspanAllowance#NONE} for none)
 * @param note what the zone is for, in the profile author's words (empty when none)
 * @param roles the conductor roles the zone is measured from: the energised conductors
 *     ({@code PHASE}) by default; neutrals and shield wires only when the profile names them
 *     (issue 15)
 */
public record Zone(
    String name,
    int priority,
    boolean violationReference,
    VoltageBand voltage,
    ConditionSelector conditions,
    Measurement measurement,
    MidspanAllowance allowance,
    String note,
    Set<Role> roles) {

  /** The default: a zone applies to the energised conductors only. */
  public static final Set<Role> ENERGISED = Set.of(Role.PHASE);

  public Zone {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(voltage, "voltage");
    Objects.requireNonNull(conditions, "conditions");
    Objects.requireNonNull(measurement, "measurement");
    Objects.requireNonNull(allowance, "allowance");
    Objects.requireNonNull(note, "note");
    if (roles.isEmpty()) {
      throw new IllegalArgumentException("a zone applies to at least one conductor role");
    }
    roles = Set.copyOf(EnumSet.copyOf(roles));
    if (priority < 1) {
      throw new IllegalArgumentException("priority must be >= 1: " + priority);
    }
  }

  /** Whether the zone applies to neutrals or shield wires as well as energised conductors. */
  public boolean beyondEnergised() {
    return !roles.equals(ENERGISED);
  }

  /** Whether the zone is a pole-clearing cylinder around structures. */
  public boolean poleClearing() {
    return measurement instanceof Measurement.PoleCylinder;
  }

  /** Whether the zone measures the radial distance. */
  public boolean radial() {
    return measurement instanceof Measurement.Radial;
  }
}
