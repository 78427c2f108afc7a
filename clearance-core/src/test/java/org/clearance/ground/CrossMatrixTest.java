package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CrossMatrixTest {
  private static final double TOL = 1e-12;

  @ParameterizedTest
  @CsvSource({
    // a, b, c, d, type I, type II, total, kappa
    // Cohen's kappa worked example (from memory, the Wikipedia "Cohen's kappa" article): 50
    // items, yes/yes 20, yes/no 5, no/yes 10, no/no 15 -> p_o 0.7, p_e 0.5, kappa 0.4.
    // Type I 5/25, type II 10/25, total 15/50 (computed from Sithole & Vosselman's definitions).
    "20, 5, 10, 15, 0.2, 0.4, 0.3, 0.4",
    // Perfect filter: kappa 1 (computed).
    "70, 0, 0, 30, 0, 0, 0, 1",
    // Everything called ground: p_o = 0.7, p_e = 0.7 -> kappa 0 (computed).
    "70, 0, 30, 0, 0, 1, 0.3, 0",
    // Exactly inverted: p_o = 0, p_e = 0.5 -> kappa -1 (computed).
    "0, 50, 50, 0, 1, 1, 1, -1",
    // a=900 b=30 c=20 d=50: p_o = 0.95; p_e = (930*920 + 70*80)/1e6 = 0.8612;
    // kappa = 0.0888 / 0.1388 (computed)
    "900, 30, 20, 50, 0.03225806451612903, 0.2857142857142857, 0.05, 0.6397694524495675"
  })
  void errorMeasuresAndKappa(long a, long b, long c, long d, double typeI, double typeII,
      double total, double kappa) {
    CrossMatrix m = new CrossMatrix(a, b, c, d);
    assertEquals(typeI, m.typeI(), TOL);
    assertEquals(typeII, m.typeII(), TOL);
    assertEquals(total, m.totalError(), TOL);
    assertEquals(kappa, m.kappa(), TOL);
  }

  @ParameterizedTest
  @CsvSource({"0, 0, 0, 0", "10, 0, 0, 0"})
  void undefinedMeasuresAreNan(long a, long b, long c, long d) {
    CrossMatrix m = new CrossMatrix(a, b, c, d);
    assertTrue(Double.isNaN(m.typeII()));
    assertTrue(Double.isNaN(m.kappa()));
  }

  @org.junit.jupiter.api.Test
  void poolsAndRejectsNegativeCounts() {
    CrossMatrix m = new CrossMatrix(1, 2, 3, 4).plus(new CrossMatrix(10, 20, 30, 40));
    assertEquals(new CrossMatrix(11, 22, 33, 44), m);
    assertThrows(IllegalArgumentException.class, () -> new CrossMatrix(-1, 0, 0, 0));
  }
}
