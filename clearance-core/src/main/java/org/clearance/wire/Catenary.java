package org.clearance.wire;

import org.clearance.io.Hyperbolic;

/**
 * A catenary in a vertical plane: z(s) = z0 + c (cosh((s - s0) / c) - 1).
 *
 * <p>s is the horizontal station in the plane and z the elevation, both in metres; (s0, z0) is the
 * vertex (lowest point of the full curve, which may lie outside the span on inclined spans) and
 * c = H / w the catenary constant, m (horizontal tension over weight per length). Formulas:
 * docs/check-values.md section 2 and docs/methods.md section 2.5.
 *
 * @param s0 station of the vertex, m
 * @param z0 elevation of the vertex, m
 * @param c catenary constant, m, finite and &gt; 0
 */
public record Catenary(double s0, double z0, double c) {

  /** Bisection steps for {@link #withMidSpanSag}: halves a bracket of 1e12 m far below 1e-9 m. */
  private static final int SAG_BISECTION_STEPS = 200;

  public Catenary {
    if (!(Double.isFinite(s0) && Double.isFinite(z0))) {
      throw new IllegalArgumentException("vertex must be finite: " + s0 + ", " + z0);
    }
    if (!(Double.isFinite(c) && c > 0)) {
      throw new IllegalArgumentException("catenary constant must be positive: " + c);
    }
  }

  /**
   * The catenary with constant c through the two points (sA, zA) and (sB, zB), sA &lt; sB.
   * Methods.md section 2.5: s0 = (sA + sB)/2 - c asinh(v / (2 c sinh(h / 2c))).
   */
  public static Catenary through(double sA, double zA, double sB, double zB, double c) {
    if (!(sB > sA)) {
      throw new IllegalArgumentException("sB must exceed sA: " + sA + ", " + sB);
    }
    double h = sB - sA;
    double v = zB - zA;
    double s0 = 0.5 * (sA + sB) - c * asinh(v / (2 * c * Hyperbolic.sinh(h / (2 * c))));
    double z0 = zA - c * coshm1((sA - s0) / c);
    return new Catenary(s0, z0, c);
  }

  /**
   * The catenary through (sA, zA) and (sB, zB) whose vertical sag below the chord at the
   * horizontal mid-point equals {@code sag}, m (&gt; 0). Solved by bisection on c (the mid-span sag
   * falls monotonically as c grows).
   *
   * @throws IllegalArgumentException when sag is not positive and finite
   */
  public static Catenary withMidSpanSag(double sA, double zA, double sB, double zB, double sag) {
    if (!(Double.isFinite(sag) && sag > 0)) {
      throw new IllegalArgumentException("sag must be positive: " + sag);
    }
    double lo = 1e-6 * (sB - sA); // very deep curve: sag larger than any requested
    double hi = 1e12;
    for (int i = 0; i < SAG_BISECTION_STEPS; i++) {
      double mid = Math.sqrt(lo * hi);
      double d = through(sA, zA, sB, zB, mid).midSpanSag(sA, sB);
      if (d > sag) {
        lo = mid;
      } else {
        hi = mid;
      }
      if (hi / lo - 1 < 1e-15) {
        break;
      }
    }
    return through(sA, zA, sB, zB, Math.sqrt(lo * hi));
  }

  /** Elevation at station s, m. */
  public double z(double s) {
    return z0 + c * coshm1((s - s0) / c);
  }

  /** Slope dz/ds at station s (dimensionless) = sinh((s - s0) / c). */
  public double slope(double s) {
    return Hyperbolic.sinh((s - s0) / c);
  }

  /** Curve length between stations s1 and s2, m: c (sinh t2 - sinh t1). */
  public double arcLength(double s1, double s2) {
    return c * (Hyperbolic.sinh((s2 - s0) / c) - Hyperbolic.sinh((s1 - s0) / c));
  }

  /** Vertical distance from the chord (sA, z(sA))-(sB, z(sB)) down to the curve at s, m. */
  public double sagBelowChord(double sA, double sB, double s) {
    double zA = z(sA);
    double zB = z(sB);
    double chord = zA + (zB - zA) * (s - sA) / (sB - sA);
    return chord - z(s);
  }

  /** Vertical sag below the chord at the horizontal mid-point of [sA, sB], m. */
  public double midSpanSag(double sA, double sB) {
    return sagBelowChord(sA, sB, 0.5 * (sA + sB));
  }

  /**
   * Largest vertical sag below the chord within [sA, sB], m, and where it occurs: the station
   * where the slope equals the chord slope, s = s0 + c asinh((zB - zA)/(sB - sA)).
   */
  public double maxSagStation(double sA, double sB) {
    double chordSlope = (z(sB) - z(sA)) / (sB - sA);
    double s = s0 + c * asinh(chordSlope);
    return Math.min(sB, Math.max(sA, s));
  }

  /**
   * cosh(t) - 1 without cancellation: 2 sinh^2(t / 2). Near the vertex t is small and the plain
   * form would lose digits relative to c.
   */
  static double coshm1(double t) {
    double h = Hyperbolic.sinh(0.5 * t);
    return 2 * h * h;
  }

  /** Inverse hyperbolic sine, odd-symmetric so that negative arguments keep their digits. */
  static double asinh(double x) {
    double a = Math.abs(x);
    if (a > 1e8) { // sqrt(a^2 + 1) = a to double precision; avoids overflow of a^2
      return Math.copySign(Math.log(2 * a), x);
    }
    // log(a + sqrt(a^2 + 1)) written as log1p so that small arguments keep their digits
    return Math.copySign(Math.log1p(a + a * a / (1 + Math.sqrt(a * a + 1))), x);
  }
}
