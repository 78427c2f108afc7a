package org.clearance.examples;

import java.util.List;
import java.util.Objects;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.ConductorType;

/**
 * One conductor position of the demo line (as its line specification states it).
 *
 * @param name position name, e.g. {@code A}, {@code SW1}
 * @param role phase conductor or shield wire
 * @param type conductor type
 * @param offsetM nominal horizontal offset from the structure centre line, m, positive to the left
 *     looking along increasing sequence
 * @param attachHeightM nominal attachment height above the structure's ground at a suspension
 *     structure, m (dead-ends hold phases at arm height, {@link #insulatorLengthM} higher)
 * @param insulatorLengthM suspension string length, m (0 for shield wires clamped to the peak)
 */
public record DemoPosition(
    String name,
    Role role,
    ConductorType type,
    double offsetM,
    double attachHeightM,
    double insulatorLengthM) {

  /** Phase conductor or shield wire. */
  public enum Role {
    PHASE,
    SHIELD
  }

  public DemoPosition {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(type, "type");
  }

  /** ACSR Drake (795 kcmil 26/7) from the built-in conductor library (span-specs acsr.csv). */
  public static final ConductorType DRAKE = builtin("Drake");

  /** ACSR Partridge (266.8 kcmil 26/7), the shield wire, from the built-in library. */
  public static final ConductorType PARTRIDGE = builtin("Partridge");

  private static ConductorType builtin(String code) {
    return ConductorLibrary.builtin().find(code)
        .orElseThrow(() -> new IllegalStateException("built-in library lacks " + code));
  }

  /** Height of the phase cross arm above a standard (no extension) tower's ground, m. */
  static final double ARM_HEIGHT_M = 24.0;
  /** Height of the shield-wire peaks above the cross arm, m. */
  static final double PEAK_ABOVE_ARM_M = 7.0;
  /** Suspension (I-string) insulator length for 230 kV, m (common practice, no source). */
  static final double PHASE_INSULATOR_M = 2.4;

  /**
   * The demo line's positions: a horizontal single circuit of Drake (A left, B centre through
   * the tower window, C right) and two Partridge shield wires on the peaks.
   */
  public static List<DemoPosition> demoLine() {
    double phaseHeight = ARM_HEIGHT_M - PHASE_INSULATOR_M;
    double peak = ARM_HEIGHT_M + PEAK_ABOVE_ARM_M;
    return List.of(
        new DemoPosition("A", Role.PHASE, DRAKE, 8.0, phaseHeight, PHASE_INSULATOR_M),
        new DemoPosition("B", Role.PHASE, DRAKE, 0.0, phaseHeight, PHASE_INSULATOR_M),
        new DemoPosition("C", Role.PHASE, DRAKE, -8.0, phaseHeight, PHASE_INSULATOR_M),
        new DemoPosition("SW1", Role.SHIELD, PARTRIDGE, 5.5, peak, 0.0),
        new DemoPosition("SW2", Role.SHIELD, PARTRIDGE, -5.5, peak, 0.0));
  }
}
