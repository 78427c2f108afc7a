package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The sideways bow of a wire swung while surveyed. */
class SwingFitTest {

  /**
   * The swung-plane geometry of shared/reference/check-values.md section 2 [computed]: sag 5 m
   * swung 30 degrees about the chord moves the low point 2.5000 m sideways and raises it
   * 0.6699 m. Points of a 300 m span whose in-plane sag is 5 m at mid-span, swung 30 degrees:
   * the bow fitted from their vertical sag v = d cos 30 and lateral offset d sin 30 gives back
   * 30 degrees, and predicts 2.5000 m at mid-span where the vertical sag is 5 - 0.6699.
   */
  @Test
  void checkValueSwingGeometry() {
    double length = 300;
    Catenary inPlane = Catenary.withMidSpanSag(0, 0, length, 0, 5.0);
    int n = 61;
    double[] s = new double[n];
    double[] lat = new double[n];
    double[] v = new double[n];
    double phi = Math.toRadians(30);
    for (int k = 0; k < n; k++) {
      s[k] = 5 * k;
      double d = inPlane.sagBelowChord(0, length, s[k]);
      lat[k] = d * Math.sin(phi);
      v[k] = d * Math.cos(phi);
    }
    boolean[] use = new boolean[n];
    Arrays.fill(use, true);
    SwingFit.Bow bow = SwingFit.fit(s, lat, v, use, length);
    assertEquals(Math.toRadians(30), bow.angle(), 1e-9);
    assertEquals(2.5000, bow.lateral(150, 5.0 - 0.6699), 1e-4);
    assertEquals(0, bow.alpha(), 1e-9);
    assertEquals(0, bow.beta(), 1e-12);
  }

  /** A twin bundle's two sub-conductors 0.45 m apart bow alike: their mean follows the bow. */
  @Test
  void bimodalLateralResidualsDoNotBiasTheBow() {
    double length = 300;
    Catenary c = Catenary.through(0, 0, length, -35, 1500);
    Random r = new Random(3);
    int n = 1200;
    double[] s = new double[n];
    double[] lat = new double[n];
    double[] v = new double[n];
    for (int k = 0; k < n; k++) {
      s[k] = length * r.nextDouble();
      v[k] = c.sagBelowChord(0, length, s[k]);
      lat[k] = (r.nextBoolean() ? 0.225 : -0.225) + Math.tan(Math.toRadians(8)) * v[k]
          + 0.03 * r.nextGaussian();
    }
    boolean[] use = new boolean[n];
    Arrays.fill(use, true);
    SwingFit.Bow bow = SwingFit.fit(s, lat, v, use, length);
    // 1200 points, 0.23 m spread: the slope against v (0-7.5 m) is good to about 0.003
    assertEquals(Math.tan(Math.toRadians(8)), bow.kappa(), 0.005);
  }

  /** Points at one end of the span cannot tell a bow from a tilted line: no bow. */
  @Test
  void shortPieceGivesNoBow() {
    double[] s = {10, 20, 30, 40, 50};
    double[] lat = {0.1, 0.2, 0.3, 0.4, 0.5};
    double[] v = {0.5, 1.0, 1.4, 1.8, 2.1};
    boolean[] use = {true, true, true, true, true};
    assertSame(SwingFit.Bow.NONE, SwingFit.fit(s, lat, v, use, 300));
  }
}
