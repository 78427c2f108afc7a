package org.clearance.line;

import java.util.Objects;

/**
 * One conductor position on a line's structures (a phase or a shield wire), as the line
 * specification gives it. Values not given are NaN.
 *
 * @param position unique position name within the line, e.g. {@code A} or {@code SW1}; matches
 *     {@code attach_z_<position>} in the structures file
 * @param role phase conductor, shield (earth) wire, or neutral / secondary conductor
 * @param circuit circuit number, &ge; 1 (1 when not given)
 * @param conductor the conductor type hung at this position
 * @param offsetM nominal horizontal offset of the attachment from the structure centre line, m,
 *     positive to the left looking along increasing sequence, or NaN
 * @param attachHeightM nominal attachment height above the structure's ground, m (&gt; 0), or NaN
 * @param bundle sub-conductors per phase, &ge; 1
 * @param bundleSpacingM sub-conductor spacing, m (&gt; 0), or NaN when {@code bundle} is 1
 * @param insulatorLengthM suspension string length, m (&ge; 0), or NaN
 * @param strainLengthM length of the strain (dead-end) insulator assembly along the conductor,
 *     m (&ge; 0): at a dead-end structure the conductor ends this far from the structure's
 *     cross-section; 0 when not given
 */
public record ConductorPosition(
    String position,
    Role role,
    int circuit,
    ConductorType conductor,
    double offsetM,
    double attachHeightM,
    int bundle,
    double bundleSpacingM,
    double insulatorLengthM,
    double strainLengthM) {

  /** What a conductor position carries. */
  public enum Role {
    /** A phase conductor (ASPRS LAS class 14, wire - conductor). */
    PHASE,
    /** A shield (guard, earth) wire (ASPRS LAS class 13, wire - guard). */
    SHIELD,
    /**
     * A neutral or secondary (low-voltage) conductor of a distribution line, hung below the
     * primaries and not energised at the line's voltage (ASPRS LAS class 14, wire - conductor).
     */
    NEUTRAL;

    /**
     * The role of a lower-case role name as run files store it ({@code phase}, {@code neutral},
     * {@code shield}); any other name (a wire of no known position) is taken as energised, the
     * safe reading (issue 15).
     */
    public static Role ofName(String name) {
      return switch (name) {
        case "neutral" -> NEUTRAL;
        case "shield" -> SHIELD;
        default -> PHASE;
      };
    }
  }

  public ConductorPosition {
    Objects.requireNonNull(position, "position");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(conductor, "conductor");
    if (circuit < 1) {
      throw new IllegalArgumentException("circuit must be at least 1: " + circuit);
    }
    if (bundle < 1) {
      throw new IllegalArgumentException("bundle must be at least 1: " + bundle);
    }
    if (!(strainLengthM >= 0 && Double.isFinite(strainLengthM))) {
      throw new IllegalArgumentException("strain assembly length must be >= 0: "
          + strainLengthM);
    }
  }

  /** A position without a strain assembly length (the conductor ends at the cross-section). */
  public ConductorPosition(String position, Role role, int circuit, ConductorType conductor,
      double offsetM, double attachHeightM, int bundle, double bundleSpacingM,
      double insulatorLengthM) {
    this(position, role, circuit, conductor, offsetM, attachHeightM, bundle, bundleSpacingM,
        insulatorLengthM, 0.0);
  }

  /** True for a phase conductor. */
  public boolean isPhase() {
    return role == Role.PHASE;
  }
}
