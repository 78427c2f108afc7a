package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.util.FastMath;
import org.junit.jupiter.api.Test;

/**
 * Catenary geometry against shared/reference/check-values.md section 2 (values [computed] there
 * from the textbook formulas C = H / w, D = C (cosh(S / 2C) - 1), L = 2 C sinh(S / 2C),
 * T = H + w D).
 */
class CatenaryTest {

  /** Drake-like conductor, check-values.md section 2: w = 1.628 kg/m x 9.80665 = 15.9652 N/m. */
  private static final double W = 1.628 * 9.80665;
  /** Horizontal tension of the reference cases, N. */
  private static final double H = 28_000;
  private static final double C = H / W;

  @Test
  void levelSpan() {
    // check-values.md section 2, level span S = 300 m [computed]
    Catenary cat = Catenary.through(0, 100, 300, 100, C);
    assertEquals(1753.812, C, 1e-3);
    assertEquals(6.4185, cat.midSpanSag(0, 300), 1e-4);
    assertEquals(300.3659, cat.arcLength(0, 300), 1e-4);
    assertEquals(28_102.5, H + W * cat.midSpanSag(0, 300), 0.05);
    assertEquals(150.0, cat.s0(), 1e-9);
    // parabolic approximation w S^2 / (8 H) = 6.4146 m [computed], 4 mm below the catenary
    assertEquals(6.4146, W * 300 * 300 / (8 * H), 1e-4);
  }

  @Test
  void inclinedSpanWithVertexOutside() {
    // check-values.md section 2, inclined span, far support 30 m higher [computed]
    Catenary cat = Catenary.through(0, 0, 300, 30, C);
    assertEquals(-24.878, cat.s0(), 1e-3); // vertex beyond the lower support: uplift case
    assertEquals(6.4504, cat.midSpanSag(0, 300), 1e-4);
    double at = cat.maxSagStation(0, 300);
    assertEquals(150.213, at, 1e-3);
    assertEquals(6.4505, cat.sagBelowChord(0, 300, at), 1e-4);
    assertEquals(301.8603, cat.arcLength(0, 300), 1e-4);
    assertEquals(30.0, cat.z(300), 1e-9);
  }

  @Test
  void unequalSupportsTextbookExample() {
    // Chakrabarti et al., Textbook on Power System Engineering, Ex. 5.2 via check-values.md
    // section 2: S = 250 m, supports 10 m apart, resultant 2.7731 kg/m, T = 4502.9 kgf; the
    // book's parabolic working gives the lowest point 60.05 m from the lower support and sags
    // 1.110 / 11.110 m. The exact catenary with c = T / w differs by the parabola's error
    // (x^4 / (24 c^3), about 1 cm here): tolerances 0.1 m and 5 mm.
    double c = 4502.9 / 2.7731;
    Catenary cat = Catenary.through(0, 0, 250, 10, c);
    assertEquals(60.05, cat.s0(), 0.1);
    assertEquals(1.110, cat.z(0) - cat.z0(), 0.005);
    assertEquals(11.110, cat.z(250) - cat.z0(), 0.005);
  }

  @Test
  void midSpanSagInverse() {
    // withMidSpanSag inverts midSpanSag: round trip, pure geometry (1e-9 m)
    Catenary cat = Catenary.withMidSpanSag(0, 10, 280, 35, 7.25);
    assertEquals(7.25, cat.midSpanSag(0, 280), 1e-9);
    assertEquals(35, cat.z(280), 1e-9);
  }

  @Test
  void stableNearVertex() {
    // cosh t - 1 = 2 sinh^2(t/2) exactly (identity); the plain form loses digits at small t.
    // Series t^2/2 + t^4/24 at t = 1e-6 (Taylor, from memory of the cosh series).
    double t = 1e-6;
    // tolerance about one ulp of 5e-13
    assertEquals(t * t / 2 + t * t * t * t / 24, Catenary.coshm1(t), 1e-27);
    // reference library: commons-math3 FastMath.asinh
    assertEquals(FastMath.asinh(-3.5), Catenary.asinh(-3.5), 1e-15);
    assertEquals(FastMath.asinh(-1e-9), Catenary.asinh(-1e-9), 1e-24);
  }
}
