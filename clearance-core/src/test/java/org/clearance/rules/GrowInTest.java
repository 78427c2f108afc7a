package org.clearance.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Years to grow into a zone. */
class GrowInTest {

  /** Closed forms below are exact; allow floating-point rounding only. */
  private static final double TOL_YEARS = 1e-9;

  @ParameterizedTest(name = "{0}")
  @CsvSource({
      // case, h m, v m, required m, up m/yr, sideways m/yr, expected years
      // methods.md 5.2: straight below, vertical growth: t = (d - r) / g = (5 - 3) / 0.5 = 4
      "'below, vertical only', 0, -5, 3, 0.5, 0, 4",
      "'inside now', 0, -2, 3, 0.5, 0.2, 0",
      "'above, vertical growth moves away', 0, 5, 3, 0.5, 0, Infinity",
      // same formula sideways: (5 - 3) / 0.5 = 4
      "'level, lateral only', 5, 0, 3, 0, 0.5, 4",
      // computed: 2^2 + (t - 5)^2 = 3^2 -> t = 5 - sqrt(5) = 2.7639320225
      "'oblique, vertical only', 2, -5, 3, 1, 0, 2.7639320225002103",
      // computed: (3 - t)^2 + (t - 4)^2 = 2.5^2 -> 2t^2 - 14t + 18.75 = 0 ->
      // t = (14 - sqrt(46)) / 4 = 1.8044175...
      "'oblique, both rates', 3, -4, 2.5, 1, 1, 1.804417504218683",
      // computed: no entry while moving sideways (discriminant < 0); under the conductor from
      // t = 1 at v = -9; enters when v = -2: t = 8
      "'far below, enters after reaching the axis', 1, -10, 2, 1, 1, 8",
      "'no growth', 1, -4, 2, 0, 0, Infinity"})
  void radial(String name, double h, double v, double r, double up, double side,
      double expected) {
    assertEquals(expected, GrowIn.yearsRadial(h, v, r, up, side), TOL_YEARS);
  }

  @ParameterizedTest(name = "{0}")
  @CsvSource({
      // case, h, v, required h, required v, up, sideways, expected years [computed by hand]
      // horizontal in at (4 - 3) / 0.25 = 4 years, vertical in at (6 - 2) / 0.5 = 8 years
      "'both components must close', 4, -6, 3, 2, 0.5, 0.25, 8",
      "'inside now', 1, 1.5, 3, 2, 0.5, 0.25, 0",
      "'above the box', 1, 3, 3, 2, 0.5, 0.25, Infinity",
      "'within vertical band, no lateral growth', 4, -1, 3, 2, 0, 0, Infinity",
      // lateral entry at (4 - 3) / 0.5 = 2 years while still within the vertical band
      "'within vertical band, lateral growth', 4, -1, 3, 2, 0, 0.5, 2",
      // vertical band passed between years 2 and 4, horizontal entry only at year 18
      "'grows through before it is near', 10, -3, 1, 1, 1, 0.5, Infinity"})
  void components(String name, double h, double v, double rh, double rv, double up,
      double side, double expected) {
    assertEquals(expected, GrowIn.yearsComponents(h, v, rh, rv, up, side), TOL_YEARS);
  }
}
