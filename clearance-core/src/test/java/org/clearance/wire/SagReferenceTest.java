package org.clearance.wire;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The common sag shape of a vertical stack (issue 15) on hand-made points: three parallel
 * parabolas 0.8 m apart and a neutral, with vegetation seeds and a crossing wire below them.
 * Expected values are the generating shape's (computed: z = d t + 4 f (t^2 - t), t = s / L).
 */
class SagReferenceTest {
  /** Rise and mid-span sag of the generated stack, m (the shape the points were made from). */
  private static final double RISE_M = 2.3;
  private static final double SAG_M = 1.4;
  private static final double LENGTH_M = 118;
  /** Tolerance of the recovered shape at any station, m: about the 2-4 cm point noise. */
  private static final double SHAPE_TOL_M = 0.04;

  @Test
  void stackShapeIsFoundDespiteVegetationAndACrossingBelow() {
    Random r = new Random(35);
    SpanPoints p = new SpanPoints(170);
    int[] seeds = new int[1400];
    int n = 0;
    for (double level : new double[] {0, -0.8, -1.6, -2.9}) {
      for (int k = 0; k < 220; k++) {
        double s = LENGTH_M * r.nextDouble();
        p.add(s, 0.3 + 0.03 * r.nextGaussian(), 175 + level + SagReference.shape(RISE_M,
            SAG_M, s / LENGTH_M) + 0.03 * r.nextGaussian(), 9, 1);
      }
    }
    // vegetation seeds: 400 points scattered 2-6 m below the stack's lowest wire
    for (int k = 0; k < 400; k++) {
      double s = LENGTH_M * r.nextDouble();
      p.add(s, 8 * r.nextGaussian(), 175 - 5 - 4 * r.nextDouble()
          + SagReference.shape(RISE_M, SAG_M, s / LENGTH_M), 4, 1);
    }
    // a crossing wire 1.5 m below the neutral at mid-span, 20 m of it in the corridor
    for (int k = 0; k < 80; k++) {
      double e = -10 + 20 * r.nextDouble();
      p.add(60 + 0.3 * e, e, 175 - 2.9 - 1.5 - SAG_M + 0.03 * r.nextGaussian(), 5, 1);
    }
    p.sort();
    for (int i = 0; i < p.size(); i++) {
      seeds[n++] = i;
    }
    DoubleUnaryOperator ref = SagReference.of(p, java.util.Arrays.copyOf(seeds, n), LENGTH_M);
    double c = ref.applyAsDouble(0);
    for (double s = 0; s <= LENGTH_M; s += 5) {
      assertEquals(SagReference.shape(RISE_M, SAG_M, s / LENGTH_M), ref.applyAsDouble(s) - c,
          SHAPE_TOL_M, "station " + s);
    }
  }

  @Test
  void tooFewSeedsGiveALevelReference() {
    SpanPoints p = new SpanPoints(0);
    for (int k = 0; k < 5; k++) {
      p.add(k, 0, 10 + k, 5, 1);
    }
    DoubleUnaryOperator ref = SagReference.of(p, new int[] {0, 1, 2, 3, 4}, 10);
    assertEquals(0, ref.applyAsDouble(5), 0);
  }

  @Test
  void relativeToKeepsOrderAndKeys() {
    SpanPoints p = new SpanPoints(100);
    p.add(1, 0.5, 101, 3, 1, 7L);
    p.add(2, 0.6, 102.5, 4, 14, 8L);
    SpanPoints q = p.relativeTo(s -> 100 + s);
    assertEquals(2, q.size());
    assertEquals(0.0, q.z(0), 1e-6); // 101 - (100 + 1)
    assertEquals(0.5, q.z(1), 1e-6); // 102.5 - (100 + 2)
    assertEquals(8L, q.key(1));
    assertEquals(14, q.cls(1));
    assertEquals(0.6, q.e(1), 1e-6);
  }
}
