package org.clearance.sag;

import java.util.Locale;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * Swing of suspension insulator strings under wind and the displaced conductor attachments
 * (methods.md 3.6).
 *
 * <p>Simplified form used here: tan phi_i = (wind load per length x wind span) / (vertical load
 * per length x weight span); the wind on the string itself, its own weight and the transverse
 * pull of a line angle are left out. The attachment moves downwind by l sin phi_i and rises by
 * l (1 - cos phi_i). With equal wind and weight spans the string hangs at the conductor's own
 * swing angle. The displaced conductor keeps the catenary constant of the unswung state (the small
 * change of span length from the displacement is neglected) and is then swung about its new chord;
 * the string is taken at its full angle whatever angle the engine tries for the conductor, and the
 * swing is only towards the wind's side, so the engine measures the two wind directions as two
 * states (see {@link ConditionState.SwingSide}).
 */
public final class InsulatorSwing {

  private InsulatorSwing() {}

  /**
   * Swing angle of a suspension string from vertical, radians in [0, pi/2).
   *
   * @param loading load per length on the conductor (vertical and transverse), N/m
   * @param windSpan wind span, m (&gt; 0)
   * @param weightSpan weight span, m (&gt; 0)
   */
  public static double angle(ConductorLoading loading, double windSpan, double weightSpan) {
    if (!(Double.isFinite(windSpan) && windSpan > 0 && Double.isFinite(weightSpan)
        && weightSpan > 0)) {
      throw new IllegalArgumentException("wind and weight spans must be positive: " + windSpan
          + ", " + weightSpan + " m");
    }
    return Math.atan2(loading.transverse() * windSpan, loading.vertical() * weightSpan);
  }

  /**
   * The state for wind from one side with the suspension strings swung and the attachments
   * displaced. A null string means a fixed attachment (strain or dead-end string, post insulator).
   *
   * @param state a state with a swing angle (normally a WIND condition)
   * @param atA string at attachment A, or null when fixed
   * @param atB string at attachment B, or null when fixed
   * @param side LEFT (wind pushes towards +n of the plan frame) or RIGHT
   * @return the displaced state, swinging only towards {@code side}
   * @throws IllegalArgumentException when side is BOTH
   */
  public static ConditionState displaced(ConditionState state, SuspensionString atA,
      SuspensionString atB, ConditionState.SwingSide side) {
    if (side == ConditionState.SwingSide.BOTH) {
      throw new IllegalArgumentException("insulator swing needs one wind side, LEFT or RIGHT");
    }
    double tanPhi = Math.tan(state.swingAngle());
    SwingOffset a = offset(atA, tanPhi);
    SwingOffset b = offset(atB, tanPhi);
    double sign = side == ConditionState.SwingSide.LEFT ? 1.0 : -1.0;
    ConductorCurve old = state.curve();
    SpanFrame p = old.plan();
    double len = p.length();
    SpanFrame plan = SpanFrame.between(p.x(0, sign * a.horizontal()), p.y(0, sign * a.horizontal()),
        p.x(len, sign * b.horizontal()), p.y(len, sign * b.horizontal()));
    Catenary curve = Catenary.through(0, old.zA() + a.rise(), plan.length(), old.zB() + b.rise(),
        old.curve().c());
    String basis = state.basis() + String.format(Locale.ROOT,
        "; strings swung, attachments moved %.2f / %.2f m %s and up %.2f / %.2f m",
        a.horizontal(), b.horizontal(), side == ConditionState.SwingSide.LEFT ? "left" : "right",
        a.rise(), b.rise());
    return new ConditionState(state.condition(), new ConductorCurve(plan, curve),
        state.swingAngle(), side, state.horizontalTension(), state.weightPerLength(), basis);
  }

  private static SwingOffset offset(SuspensionString string, double tanPhi) {
    if (string == null) {
      return SwingOffset.NONE;
    }
    double angle = Math.atan(tanPhi * string.windSpan() / string.weightSpan());
    return SwingOffset.of(string.length(), angle);
  }
}
