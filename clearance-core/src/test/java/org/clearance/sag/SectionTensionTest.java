package org.clearance.sag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class SectionTensionTest {

  // check-values.md section 2, ruling span [computed]: 250, 300, 350, 400 m -> 339.116 m;
  // 600, 800, 1000 ft -> 848.53 ft.
  @Test
  void rulingSpanTable() {
    assertEquals(339.116, RulingSpan.of(250, 300, 350, 400), 0.0005);
    assertEquals(848.53, RulingSpan.of(600, 800, 1000), 0.005);
    assertEquals(275.0, RulingSpan.of(275), 1e-12);
  }

  @Test
  void rulingSpanRejectsBadSpans() {
    assertThrows(IllegalArgumentException.class, () -> RulingSpan.of());
    assertThrows(IllegalArgumentException.class, () -> RulingSpan.of(300, 0));
    assertThrows(IllegalArgumentException.class, () -> RulingSpan.of(300, Double.NaN));
  }

  // Equal constants: the mean is that constant, no spread, H = w c (definition c = H / w).
  @Test
  void equalConstants() {
    SectionTension t = SectionTension.estimate(List.of(SagFixtures.span(250, 30, 31, 1800),
        SagFixtures.span(400, 31, 20, 1800), SagFixtures.span(310, 20, 25, 1800)), 15.9652);
    assertEquals(3, t.spanCount());
    assertEquals(1800.0, t.meanConstant(), 1e-9);
    assertEquals(0.0, t.constantSpread(), 1e-9);
    assertEquals(15.9652 * 1800, t.horizontalTension(), 1e-6);
  }

  // Hand computation of the S^3-weighted mean and spread: spans 100 and 200 m (weights 1 and 8)
  // with c = 1000 and 1100 m: mean = (1000 + 8 * 1100) / 9 = 1088.889 m; spread =
  // sqrt((1 * 88.889^2 + 8 * 11.111^2) / 9) = 31.427 m.
  @Test
  void weightedMeanAndSpread() {
    SectionTension t = SectionTension.estimate(
        List.of(SagFixtures.span(100, 30, 30, 1000), SagFixtures.span(200, 30, 30, 1100)), 10.0);
    assertEquals(9800.0 / 9, t.meanConstant(), 1e-9);
    assertEquals(Math.sqrt((Math.pow(800.0 / 9, 2) + 8 * Math.pow(100.0 / 9, 2)) / 9),
        t.constantSpread(), 1e-9);
    assertEquals(1000.0, t.minConstant(), 0.0);
    assertEquals(1100.0, t.maxConstant(), 0.0);
    assertEquals(10 * 9800.0 / 9, t.horizontalTension(), 1e-6);
    assertEquals(t.constantSpread() / t.meanConstant(), t.relativeSpread(), 1e-15);
  }

  // Derived (class Javadoc): for a small spread the weighted mean equals the slack-equivalent
  // constant sqrt(sum S^3 / sum(S^3 / c^2)) to second order; 1 % spread -> about 1e-4 relative.
  @Test
  void meanKeepsSectionSlackToFirstOrder() {
    double[] s = {250, 300, 350, 400};
    double[] c = {1790, 1810, 1800, 1795};
    double sum3 = 0;
    double sumSlack = 0;
    List<org.clearance.wire.ConductorCurve> spans = new java.util.ArrayList<>();
    for (int i = 0; i < s.length; i++) {
      sum3 += Math.pow(s[i], 3);
      sumSlack += Math.pow(s[i], 3) / (c[i] * c[i]);
      spans.add(SagFixtures.span(s[i], 40, 40, c[i]));
    }
    double slackEquivalent = Math.sqrt(sum3 / sumSlack);
    double mean = SectionTension.estimate(spans, Double.NaN).meanConstant();
    assertEquals(slackEquivalent, mean, 1e-4 * mean);
  }

  @Test
  void unknownWeightGivesNaNTension() {
    SectionTension t =
        SectionTension.estimate(List.of(SagFixtures.span(300, 30, 30, 1500)), Double.NaN);
    assertTrue(Double.isNaN(t.horizontalTension()));
    assertTrue(Double.isNaN(t.tensionSpread()));
    assertEquals(1500.0, t.meanConstant(), 1e-9);
  }

  @Test
  void rejectsEmptySection() {
    assertThrows(IllegalArgumentException.class, () -> SectionTension.estimate(List.of(), 15.0));
    assertThrows(IllegalArgumentException.class,
        () -> SectionTension.estimate(List.of(SagFixtures.span(300, 30, 30, 1500)), -1.0));
  }
}
