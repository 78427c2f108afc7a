package org.clearance.sag;

import java.util.Objects;
import org.clearance.line.LineCondition;
import org.clearance.wire.ConductorCurve;

/**
 * One span's conductor in one line condition, as the clearance engine measures it.
 *
 * <p>{@code curve} lies in the vertical plane through its attachments. When {@code swingAngle} is
 * above 0 the conductor may also hang swung about its chord (the straight line between the
 * attachments) by any angle up to {@code swingAngle}, towards the side(s) {@code swingSide} names:
 * both sides normally; one side only for a state whose attachments were displaced by insulator
 * swing for wind from one side ({@link InsulatorSwing}).
 *
 * @param condition the line condition
 * @param curve the conductor in this condition, in the vertical plane through its attachments
 * @param swingAngle largest swing angle about the chord, radians in [0, pi/2] (0 when none)
 * @param swingSide the side(s) the conductor may swing towards
 * @param horizontalTension horizontal tension of the tension section (ruling span) in this
 *     condition, N, or NaN when not computed
 * @param weightPerLength load per length used (bare, iced or wind resultant), N/m, or NaN
 * @param basis short text for the report saying how the state was obtained
 */
public record ConditionState(
    LineCondition condition,
    ConductorCurve curve,
    double swingAngle,
    SwingSide swingSide,
    double horizontalTension,
    double weightPerLength,
    String basis) {

  /** Towards which side of the span a conductor may swing. */
  public enum SwingSide {
    /** Either side: angles in [-swingAngle, +swingAngle]. */
    BOTH,
    /** Only to the left looking from attachment A to B (the +n side of the plan frame). */
    LEFT,
    /** Only to the right looking from A to B (the -n side). */
    RIGHT
  }

  public ConditionState {
    Objects.requireNonNull(condition, "condition");
    Objects.requireNonNull(curve, "curve");
    Objects.requireNonNull(swingSide, "swingSide");
    Objects.requireNonNull(basis, "basis");
    if (!(swingAngle >= 0 && swingAngle <= Math.PI / 2)) {
      throw new IllegalArgumentException("swing angle must be in [0, pi/2]: " + swingAngle);
    }
    if (!(Double.isNaN(horizontalTension)
        || (Double.isFinite(horizontalTension) && horizontalTension > 0))) {
      throw new IllegalArgumentException("tension must be positive or NaN: " + horizontalTension);
    }
    if (!(Double.isNaN(weightPerLength)
        || (Double.isFinite(weightPerLength) && weightPerLength > 0))) {
      throw new IllegalArgumentException("weight must be positive or NaN: " + weightPerLength);
    }
  }
}
