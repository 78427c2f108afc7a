package org.clearance.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The bounded drawing sample (bottom-k sampling by hash). */
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
    for (int i = 0; i < s.insideCount(); i++) {
      assertEquals(2.0, s.inside(i, 2), 0.0);
      assertEquals(1 + (int) s.inside(i, 0) % 3, s.insidePriority(i));
    }
  }

  @Test
  void theSampleDoesNotDependOnTheOrderOfThePoints() {
    // regression (issue 10 item 11): the reservoir kept different points when the measuring
    // threads stored them in another order, so report.html differed between identical runs
    SpanPoints forward = new SpanPoints(50);
    SpanPoints backward = new SpanPoints(50);
    int n = 5_000;
    for (int i = 0; i < n; i++) {
      forward.addOther(i * 0.5, i % 7, i % 11);
      int j = n - 1 - i;
      backward.addOther(j * 0.5, j % 7, j % 11);
    }
    assertEquals(50, forward.otherCount());
    for (int i = 0; i < 50; i++) {
      for (int axis = 0; axis < 3; axis++) {
        assertEquals(forward.other(i, axis), backward.other(i, axis), 0.0);
      }
    }
  }

  @Test
  void zeroCapKeepsNothing() {
    SpanPoints s = new SpanPoints(0);
    s.addOther(1, 2, 3);
    assertEquals(0, s.otherCount());
  }
}
