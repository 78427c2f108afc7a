package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Kasa's algebraic circle fit and its consensus form, checked on points constructed exactly on a
 * known circle (the reference is the construction: a circle through its own points, exact to
 * rounding) at survey-sized coordinates.
 */
class CircleTest {
  static final double CX = 489_250.31;
  static final double CY = 6_669_400.72;
  static final double R = 0.19;

  private static List<double[]> onCircle(double... degrees) {
    List<double[]> p = new ArrayList<>();
    for (double d : degrees) {
      double a = Math.toRadians(d);
      p.add(new double[] {CX + R * Math.cos(a), CY + R * Math.sin(a), 1.0});
    }
    return p;
  }

  @Test
  void pointsOnACircleGiveItBack() {
    double[] c = Circle.fit(onCircle(10, 100, 200, 290, 330));
    assertNotNull(c);
    assertEquals(CX, c[0], 1e-6);
    assertEquals(CY, c[1], 1e-6);
    assertEquals(R, c[2], 1e-6);
  }

  @Test
  void threePointsOnOneSideStillGiveTheCircle() {
    double[] c = Circle.fit(onCircle(0, 40, 80));
    assertEquals(CX, c[0], 1e-6);
    assertEquals(CY, c[1], 1e-6);
  }

  @Test
  void tooFewOrCollinearPointsGiveNone() {
    assertNull(Circle.fit(onCircle(0, 90)));
    assertNull(Circle.fit(List.of(new double[] {0, 0}, new double[] {1, 1},
        new double[] {2, 2})));
  }

  @Test
  void consensusLeavesOutAnArmAndAShrub() {
    List<double[]> p = onCircle(15, 95, 170, 250, 300);
    p.add(new double[] {CX + 0.05, CY + 0.30, 9.0});   // arm return across the line
    p.add(new double[] {CX - 0.02, CY - 0.25, 9.0});
    p.add(new double[] {CX + 0.45, CY + 0.10, 1.2});   // shrub at the foot
    double[] c = Circle.robust(p, 0.23, 0.04, 4);
    assertNotNull(c);
    assertEquals(CX, c[0], 1e-6);
    assertEquals(CY, c[1], 1e-6);
    assertEquals(R, c[2], 1e-6);
    // a plain least-squares fit through all of them is pulled off
    double[] plain = Circle.fit(p);
    assertEquals(true, Math.hypot(plain[0] - CX, plain[1] - CY) > 0.01);
  }

  @Test
  void consensusNeedsEnoughPointsOnOneCircle() {
    List<double[]> p = onCircle(15, 95, 170);
    assertNull(Circle.robust(p, 0.23, 0.04, 4));
  }
}
