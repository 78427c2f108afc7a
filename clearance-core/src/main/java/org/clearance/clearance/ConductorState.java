package org.clearance.clearance;

import java.util.Objects;
import org.clearance.sag.ConditionState;
import org.clearance.wire.ConductorCurve;

/**
 * The geometry of one conductor in one condition, as the engine measures it: a hanging curve that
 * may also swing about its chord by any angle in [{@code swingMin}, {@code swingMax}] (a single
 * angle when both are equal: the wire as surveyed, blown aside by the wind of the survey day).
 *
 * @param curve the conductor in the vertical plane through its attachments (before any swing)
 * @param swingMin smallest swing angle about the chord, radians in [-pi/2, swingMax]
 * @param swingMax largest swing angle about the chord, radians in [swingMin, pi/2]; positive
 *     angles swing towards the left looking from attachment A to B
 */
public record ConductorState(ConductorCurve curve, double swingMin, double swingMax) {

  public ConductorState {
    Objects.requireNonNull(curve, "curve");
    if (!(swingMin >= -Math.PI / 2 && swingMin <= swingMax && swingMax <= Math.PI / 2)) {
      throw new IllegalArgumentException("swing range must lie in [-pi/2, pi/2]: " + swingMin
          + ", " + swingMax);
    }
  }

  /** The hanging curve, no swing. */
  public static ConductorState hanging(ConductorCurve curve) {
    return new ConductorState(curve, 0, 0);
  }

  /**
   * The wire as surveyed: the fitted curve swung by the angle the survey showed
   * (methods.md 3.6 geometry). The fit gives the vertical sag v of the swung wire; in its tilted
   * plane the wire sags v / cos(phi), which the catenary through the same attachments with the
   * constant c cos(phi) gives to the parabolic approximation (sag = L^2 / 8c; the difference is
   * below 1e-4 of the sag for swings under 10 degrees).
   *
   * @param fitted the curve fitted to the survey (its vertical projection)
   * @param swingRad the fitted swing, radians in [-pi/2, pi/2]; 0 (or NaN) for a still wire
   */
  public static ConductorState surveyed(ConductorCurve fitted, double swingRad) {
    if (!(swingRad != 0 && Math.abs(swingRad) < Math.PI / 2)) {
      return hanging(fitted);
    }
    ConductorCurve tilted = fitted.withConstant(fitted.curve().c() * Math.cos(swingRad));
    return new ConductorState(tilted, swingRad, swingRad);
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
