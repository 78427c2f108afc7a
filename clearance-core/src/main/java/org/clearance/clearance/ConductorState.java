package org.clearance.clearance;

import java.util.Objects;
import org.clearance.sag.ConditionState;
import org.clearance.wire.ConductorCurve;

/**
 * The geometry of one conductor in one condition, as the engine measures it: a hanging curve that
 * may also swing about its chord by any angle in [{@code swingMin}, {@code swingMax}].
 *
 * @param curve the conductor in the vertical plane through its attachments
 * @param swingMin smallest swing angle about the chord, radians in [-pi/2, 0]
 * @param swingMax largest swing angle about the chord, radians in [0, pi/2]; positive angles swing
 *     towards the left looking from attachment A to B
 */
public record ConductorState(ConductorCurve curve, double swingMin, double swingMax) {

  public ConductorState {
    Objects.requireNonNull(curve, "curve");
    if (!(swingMin >= -Math.PI / 2 && swingMin <= 0)) {
      throw new IllegalArgumentException("swingMin must be in [-pi/2, 0]: " + swingMin);
    }
    if (!(swingMax >= 0 && swingMax <= Math.PI / 2)) {
      throw new IllegalArgumentException("swingMax must be in [0, pi/2]: " + swingMax);
    }
  }

  /** The hanging curve, no swing. */
  public static ConductorState hanging(ConductorCurve curve) {
    return new ConductorState(curve, 0, 0);
  }

  /** The engine's view of a state from the sag models. */
  public static ConductorState of(ConditionState state) {
    double phi = state.swingAngle();
    switch (state.swingSide()) {
      case LEFT:
        return new ConductorState(state.curve(), 0, phi);
      case RIGHT:
        return new ConductorState(state.curve(), -phi, 0);
      default:
        return new ConductorState(state.curve(), -phi, phi);
    }
  }

  /** Whether the conductor may swing at all. */
  public boolean swings() {
    return swingMin < 0 || swingMax > 0;
  }
}
