package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class TensionSectionTest {

  @Test
  void rulingSpanCheckValues() {
    // shared/reference/check-values.md section 2 [computed]: RS = sqrt(sum S^3 / sum S).
    assertEquals(339.116, TensionSection.rulingSpan(250, 300, 350, 400), 0.0005);
    assertEquals(848.53, TensionSection.rulingSpan(600, 800, 1000), 0.005); // feet in, feet out
    // Equal spans: the ruling span is the span (methods.md section 3.4: exact for uniform spans).
    assertEquals(300.0, TensionSection.rulingSpan(300, 300, 300), 1e-12);
    assertEquals(412.5, TensionSection.rulingSpan(412.5), 1e-12);
  }

  @Test
  void rulingSpanLiesBetweenMeanAndLongestSpan() {
    // common practice, no source: RS exceeds the mean span and is below the longest span.
    double rs = TensionSection.rulingSpan(100, 500);
    assertEquals(Math.sqrt((1e6 + 1.25e8) / 600), rs, 1e-9); // by hand: sqrt(126e6 / 600)
    assertEquals(true, rs > 300 && rs < 500);
  }

  @Test
  void rulingSpanRejectsBadLengths() {
    assertThrows(IllegalArgumentException.class, () -> TensionSection.rulingSpan());
    assertThrows(IllegalArgumentException.class, () -> TensionSection.rulingSpan(300, 0));
    assertThrows(IllegalArgumentException.class, () -> TensionSection.rulingSpan(300, Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> TensionSection.rulingSpan(-300));
  }
}
