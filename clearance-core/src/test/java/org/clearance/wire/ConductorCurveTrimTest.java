package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.clearance.line.SpanFrame;
import org.junit.jupiter.api.Test;

class ConductorCurveTrimTest {

  /** Pure geometry: the trimmed conductor is the same curve. */
  private static final double TOL = 1e-9;

  @Test
  void trimmedConductorIsTheSameCurveBetweenNewEnds() {
    // Inclined 300 m span, far support 30 m higher, C = 1753.812 m: the check-values.md
    // section 2 inclined case [computed there].
    SpanFrame plan = SpanFrame.between(100, 200, 100 + 300 * 0.6, 200 + 300 * 0.8);
    ConductorCurve full = new ConductorCurve(plan, Catenary.through(0, 40, 300, 70, 1753.812));
    ConductorCurve cut = full.trimmed(3, 2.5);
    assertEquals(294.5, cut.length(), TOL);
    assertEquals(full.z(3), cut.zA(), TOL);
    assertEquals(full.z(297.5), cut.zB(), TOL);
    assertEquals(full.x(3), cut.x(0), TOL);
    assertEquals(full.y(3), cut.y(0), TOL);
    for (double s = 0; s <= cut.length(); s += 7.3) {
      assertEquals(full.z(s + 3), cut.z(s), TOL);
      assertEquals(full.x(s + 3), cut.x(s), TOL);
    }
    assertEquals(full.curve().c(), cut.curve().c(), 0.0);
    assertThrows(IllegalArgumentException.class, () -> full.trimmed(150, 150));
    assertThrows(IllegalArgumentException.class, () -> full.trimmed(-1, 0));
  }
}
