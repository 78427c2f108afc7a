package org.clearance.io;

/**
 * sinh, cosh and expm1 equal to the bit to {@link StrictMath}'s (and so to {@link Math}'s in
 * JDK 17, which calls StrictMath), in plain Java: the algorithms of fdlibm 5.3 (Sun
 * Microsystems 1993; files e_sinh.c, e_cosh.c, s_expm1.c), whose C code JDK 17 calls through a
 * native method for each value. That call costs several times the arithmetic; here the JIT
 * compiles and inlines the arithmetic, and every result is the same double, so catenary fits and
 * distances do not change in the last digit. {@link StrictMath#exp} is already plain Java in
 * JDK 17 (the same fdlibm exp) and is used as it is. {@code HyperbolicTest} compares every
 * function with StrictMath's on millions of arguments.
 *
 * <p>The fdlibm notice, kept as its licence asks: "Copyright (C) 1993 by Sun Microsystems, Inc.
 * All rights reserved. Developed at SunSoft, a Sun Microsystems, Inc. business. Permission to
 * use, copy, modify, and distribute this software is freely granted, provided that this notice
 * is preserved."
 */
public final class Hyperbolic {

  private static final double HUGE = 1.0e300;
  private static final double TINY = 1.0e-300;
  private static final double SINH_HUGE = 1.0e307;
  /** expm1 overflows above this argument: ln(Double.MAX_VALUE). */
  private static final double OVERFLOW_THRESHOLD = 7.09782712893383973096e+02;
  /** ln 2 split in a high part with trailing zero bits and a low correction. */
  private static final double LN2_HI = 6.93147180369123816490e-01;
  private static final double LN2_LO = 1.90821492927058770002e-10;
  private static final double INV_LN2 = 1.44269504088896338700e+00;
  /** Rational approximation coefficients of expm1 on [-0.5 ln 2, 0.5 ln 2] (fdlibm). */
  private static final double Q1 = -3.33333333333331316428e-02;
  private static final double Q2 = 1.58730158725481460165e-03;
  private static final double Q3 = -7.93650757867487942473e-05;
  private static final double Q4 = 4.00821782732936239552e-06;
  private static final double Q5 = -2.01099218183624371326e-07;

  private Hyperbolic() {}

  /** sinh x, the same double as {@link StrictMath#sinh}. */
  public static double sinh(double x) {
    long bits = Double.doubleToRawLongBits(x);
    int jx = (int) (bits >>> 32);
    int ix = jx & 0x7fffffff;
    if (ix >= 0x7ff00000) { // infinity or NaN
      return x + x;
    }
    double h = jx < 0 ? -0.5 : 0.5;
    if (ix < 0x40360000) { // |x| < 22
      if (ix < 0x3e300000 && SINH_HUGE + x > 1) { // |x| < 2^-28: sinh x = x
        return x;
      }
      double t = expm1(Math.abs(x));
      if (ix < 0x3ff00000) { // |x| < 1
        return h * (2.0 * t - t * t / (t + 1));
      }
      return h * (t + t / (t + 1));
    }
    if (ix < 0x40862E42) { // |x| < ln(Double.MAX_VALUE)
      return h * StrictMath.exp(Math.abs(x));
    }
    if (belowOverflow(ix, bits)) {
      double w = StrictMath.exp(0.5 * Math.abs(x));
      double t = h * w;
      return t * w;
    }
    return x * SINH_HUGE; // overflow
  }

  /** cosh x, the same double as {@link StrictMath#cosh}. */
  public static double cosh(double x) {
    long bits = Double.doubleToRawLongBits(x);
    int ix = (int) (bits >>> 32) & 0x7fffffff;
    if (ix >= 0x7ff00000) { // infinity or NaN
      return x * x;
    }
    if (ix < 0x3fd62e43) { // |x| < 0.5 ln 2
      double t = expm1(Math.abs(x));
      double w = 1 + t;
      if (ix < 0x3c800000) { // |x| < 2^-55: cosh x = 1
        return w;
      }
      return 1 + (t * t) / (w + w);
    }
    if (ix < 0x40360000) { // |x| < 22
      double t = StrictMath.exp(Math.abs(x));
      return 0.5 * t + 0.5 / t;
    }
    if (ix < 0x40862E42) { // |x| < ln(Double.MAX_VALUE)
      return 0.5 * StrictMath.exp(Math.abs(x));
    }
    if (belowOverflow(ix, bits)) {
      double w = StrictMath.exp(0.5 * Math.abs(x));
      double t = 0.5 * w;
      return t * w;
    }
    return HUGE * HUGE; // overflow
  }

  /** exp(x) - 1, the same double as {@link StrictMath#expm1}. */
  public static double expm1(double x) {
    long bits = Double.doubleToRawLongBits(x);
    int hx = (int) (bits >>> 32);
    boolean negative = hx < 0;
    hx &= 0x7fffffff;
    if (hx >= 0x4043687A) { // |x| >= 56 ln 2
      if (hx >= 0x40862E42) { // |x| >= 709.78
        if (hx >= 0x7ff00000) {
          if (((hx & 0xfffff) | (int) bits) != 0) { // NaN
            return x + x;
          }
          return negative ? -1.0 : x; // exp(-inf) - 1 = -1
        }
        if (x > OVERFLOW_THRESHOLD) {
          return HUGE * HUGE; // overflow
        }
      }
      if (negative && x + TINY < 0.0) { // x < -56 ln 2: -1 (inexact)
        return TINY - 1;
      }
    }
    double c = 0;
    int k;
    if (hx > 0x3fd62e42) { // |x| > 0.5 ln 2: reduce x = k ln 2 + r
      double hi;
      double lo;
      if (hx < 0x3FF0A2B2) { // and |x| < 1.5 ln 2
        if (!negative) {
          hi = x - LN2_HI;
          lo = LN2_LO;
          k = 1;
        } else {
          hi = x + LN2_HI;
          lo = -LN2_LO;
          k = -1;
        }
      } else {
        k = (int) (INV_LN2 * x + (negative ? -0.5 : 0.5));
        double t = k;
        hi = x - t * LN2_HI; // t * LN2_HI is exact here
        lo = t * LN2_LO;
      }
      x = hi - lo;
      c = (hi - x) - lo;
    } else if (hx < 0x3c900000) { // |x| < 2^-54: expm1 x = x (inexact when x != 0)
      double t = HUGE + x;
      return x - (t - (HUGE + x));
    } else {
      k = 0;
    }
    // x is now in the primary range
    double hfx = 0.5 * x;
    double hxs = x * hfx;
    double r1 = 1 + hxs * (Q1 + hxs * (Q2 + hxs * (Q3 + hxs * (Q4 + hxs * Q5))));
    double t = 3.0 - r1 * hfx;
    double e = hxs * ((r1 - t) / (6.0 - x * t));
    if (k == 0) {
      return x - (x * e - hxs); // c is 0
    }
    e = x * (e - c) - c;
    e -= hxs;
    if (k == -1) {
      return 0.5 * (x - e) - 0.5;
    }
    if (k == 1) {
      if (x < -0.25) {
        return -2.0 * (e - (x + 0.5));
      }
      return 1 + 2.0 * (x - e);
    }
    if (k <= -2 || k > 56) { // suffices to return exp(x) - 1
      return addToExponent(1 - (e - x), k) - 1;
    }
    if (k < 20) {
      t = highWord(0x3ff00000 - (0x200000 >> k)); // 1 - 2^-k
      return addToExponent(t - (e - x), k);
    }
    t = highWord((0x3ff - k) << 20); // 2^-k
    double y = x - (e + t);
    y += 1;
    return addToExponent(y, k);
  }

  /** |x| at most the largest argument whose sinh and cosh are finite (high word ix). */
  private static boolean belowOverflow(int ix, long bits) {
    long lx = bits & 0xffffffffL;
    return ix < 0x408633CE || (ix == 0x408633CE && lx <= 0x8fb9f87dL);
  }

  /** y times 2^k by adding k to the exponent field (no overflow in the callers' ranges). */
  private static double addToExponent(double y, int k) {
    return Double.longBitsToDouble(Double.doubleToRawLongBits(y) + ((long) (k << 20) << 32));
  }

  /** The double whose high word is {@code hi} and low word 0. */
  private static double highWord(int hi) {
    return Double.longBitsToDouble((long) hi << 32);
  }
}
