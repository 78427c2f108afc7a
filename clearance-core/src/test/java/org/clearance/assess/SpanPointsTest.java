package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The bounded drawing sample (reservoir sampling, Vitter 1985 algorithm R). */
class SpanPointsTest {

  @Test
  void keepsAtMostTheCapAndAFairShareOfEachPart() {
    SpanPoints s = new SpanPoints(200);
    for (int i = 0; i < 20_000; i++) {
      s.addOther(i, 0, 0);
      if (i < 30) {
        s.addInside(i, 1, 2, 1 + i % 3);
      }
    }
    assertEquals(200, s.otherCount());
    assertEquals(30, s.insideCount(), "under the cap every point is kept");
    int firstHalf = 0;
    for (int i = 0; i < s.otherCount(); i++) {
      double x = s.other(i, 0);
      assertTrue(x >= 0 && x < 20_000 && x == Math.rint(x));
      firstHalf += x < 10_000 ? 1 : 0;
    }
    // a uniform sample of 200 holds 100 +- 3 sigma (sigma = sqrt(200 x 0.25) = 7.1) from the
    // first half (binomial; common practice, no source)
    assertTrue(Math.abs(firstHalf - 100) < 22, "first half: " + firstHalf);
    assertEquals(2.0, s.inside(0, 2), 0.0);
    assertEquals(1, s.insidePriority(0));
  }

  @Test
  void zeroCapKeepsNothing() {
    SpanPoints s = new SpanPoints(0);
    s.addOther(1, 2, 3);
    assertEquals(0, s.otherCount());
  }
}
