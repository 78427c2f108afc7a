package org.clearance.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;
import org.junit.jupiter.api.Test;

/**
 * Issue 9 item 6: the survey state is the wire as surveyed, swung by the fitted angle. A wire
 * swung by phi about its chord hangs in a tilted plane; its sag d there shows as d cos(phi)
 * below the chord and d sin(phi) to the side (methods.md 3.6 geometry; check-values.md section 2
 * checks the same rotation: 2.5000 / 0.6699 m).
 */
class ConductorStateTest {

  private static final double L = 300;

  @Test
  void surveyedStateLiesOnTheSwungWire() {
    double phi = Math.toRadians(3);
    double c0 = 1500; // the wire in its tilted plane
    SpanFrame plan = SpanFrame.between(0, 0, L, 0);
    Catenary inPlane = Catenary.through(0, 40, L, 44, c0);
    // What the fit sees: the vertical projection, sag d cos(phi): to the parabolic
    // approximation the catenary of constant c0 / cos(phi) through the same attachments.
    ConductorCurve fitted = new ConductorCurve(plan, Catenary.through(0, 40, L, 44,
        c0 / Math.cos(phi)));
    ConductorState state = ConductorState.surveyed(fitted, phi);
    assertEquals(phi, state.swingMin(), 0);
    assertEquals(phi, state.swingMax(), 0);
    CatenaryDistance kernel = new CatenaryDistance(state.curve());
    CatenaryDistance still = new CatenaryDistance(fitted);
    double worstStill = 0;
    for (int k = 1; k < 20; k++) {
      double s = L * k / 20.0;
      double chord = 40 + 4 * s / L;
      double d = chord - inPlane.z(s); // sag in the tilted plane
      // rotating about the (nearly level) chord: down by d cos(phi), left (+y) by d sin(phi)
      double x = s;
      double y = d * Math.sin(phi);
      double z = chord - d * Math.cos(phi);
      double got = kernel.distance(x, y, z, kernel.closestSwingAngle(x, y, z, phi, phi));
      // the chord rises 4 m in 300 m: rotating about it, not about a level line, moves the
      // point by at most d (1 - cos(atan(4/300))) ~ 1e-4 d
      assertEquals(0, got, 2e-3, "station " + s);
      worstStill = Math.max(worstStill, still.distance(x, y, z));
    }
    // The vertical-plane curve is off by d sin(phi) at mid-span: 7.5 m sag x sin 3 deg.
    assertTrue(worstStill > 0.3, "still-air curve off by " + worstStill);
  }

  @Test
  void aStillWireIsTheFittedCurve() {
    SpanFrame plan = SpanFrame.between(0, 0, L, 0);
    ConductorCurve fitted = new ConductorCurve(plan, Catenary.through(0, 40, L, 44, 1500));
    ConductorState state = ConductorState.surveyed(fitted, 0);
    assertEquals(fitted, state.curve());
    assertEquals(0, state.swingMax(), 0);
    assertEquals(fitted, ConductorState.surveyed(fitted, Double.NaN).curve());
  }
}
