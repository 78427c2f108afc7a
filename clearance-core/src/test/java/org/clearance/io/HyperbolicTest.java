package org.clearance.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The plain-Java sinh, cosh and expm1 give the very double {@link StrictMath} gives (the
 * reference library here is the JDK's own fdlibm, called natively), bit for bit, on random
 * arguments of every magnitude, on every branch threshold of fdlibm and one ulp either side of
 * it, and on special values. Equal bits are what keep the catenary fits and the outputs
 * unchanged (PreviousVersionOutputsTest).
 */
class HyperbolicTest {

  /** Random arguments per range and function: enough to reach every branch many times. */
  private static final int SAMPLES = 200_000;

  /** Branch thresholds of fdlibm's sinh, cosh and expm1, as doubles (high words in the C). */
  private static final double[] THRESHOLDS = {
      0x1p-55, 0x1p-54, 0x1p-28, 0.5 * Math.log(2), 1.5 * Math.log(2), 1, 22, 56 * Math.log(2),
      Math.log(Double.MAX_VALUE), 709.782712893384, 710.4758600739439, 0.25, 20 * Math.log(2),
      57 * Math.log(2)};

  @Test
  void sameBitsAsStrictMathOnRandomArguments() {
    Random r = new Random(20261205);
    double[] ranges = {1e-9, 1e-3, 0.35, 1.1, 6, 23, 45, 720, 1e5};
    for (double range : ranges) {
      for (int i = 0; i < SAMPLES; i++) {
        double x = (2 * r.nextDouble() - 1) * range;
        checkAll(x);
      }
    }
    for (int i = 0; i < SAMPLES; i++) { // any bit pattern: subnormals, huge, NaN payloads
      checkAll(Double.longBitsToDouble(r.nextLong()));
    }
  }

  @Test
  void sameBitsAsStrictMathAtEveryThreshold() {
    for (double t : THRESHOLDS) {
      double x = t;
      for (int step = 0; step < 40; step++) {
        checkAll(x);
        checkAll(-x);
        x = Math.nextUp(x);
      }
      x = t;
      for (int step = 0; step < 40; step++) {
        checkAll(x);
        checkAll(-x);
        x = Math.nextDown(x);
      }
    }
    for (int k = -60; k <= 60; k++) { // every reduction multiple of ln 2 in expm1
      double x = k * Math.log(2);
      checkAll(x);
      checkAll(Math.nextUp(x));
      checkAll(Math.nextDown(x));
      checkAll(x + 0.5 * Math.log(2));
    }
  }

  @Test
  void sameBitsAsStrictMathOnSpecialValues() {
    double[] special = {0.0, -0.0, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL,
        Double.MAX_VALUE, -Double.MAX_VALUE, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
        Double.NaN, 1e-300, -1e-300, 800, -800};
    for (double x : special) {
      checkAll(x);
    }
  }

  private static void checkAll(double x) {
    check("sinh", StrictMath::sinh, Hyperbolic::sinh, x);
    check("cosh", StrictMath::cosh, Hyperbolic::cosh, x);
    check("expm1", StrictMath::expm1, Hyperbolic::expm1, x);
  }

  private static void check(String name, DoubleUnaryOperator reference,
      DoubleUnaryOperator ours, double x) {
    double expected = reference.applyAsDouble(x);
    double actual = ours.applyAsDouble(x);
    if (Double.isNaN(expected) && Double.isNaN(actual)) {
      return; // NaN payloads are not part of the contract
    }
    assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
        () -> name + "(" + x + " = " + Double.toHexString(x) + "): StrictMath "
            + Double.toHexString(expected) + ", ours " + Double.toHexString(actual));
  }
}
