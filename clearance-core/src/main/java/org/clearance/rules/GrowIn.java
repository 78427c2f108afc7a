package org.clearance.rules;

/**
 * Years until a vegetation point grows into a clearance zone (grow-in).
 *
 * <p>Model: the point is the edge of the vegetation; it moves up at the vertical growth rate and
 * towards the conductor (in plan) at the lateral growth rate, and stops moving sideways once it
 * is under or over the conductor. The conductor is taken as locally horizontal at its nearest
 * point. With only vertical growth and a point straight below the conductor, the radial time is
 * t = (d - r) / g of docs/methods.md section 5.2; in general it is the first time
 * the moving point's distance falls below the required one. Growth upwards moves a point that is
 * above the conductor away from it, so such a point only enters by lateral growth.
 *
 * <p>Results: years (&gt;= 0); 0 when the point is inside the zone now; +infinity when growth at
 * these rates never brings it inside.
 */
public final class GrowIn {

  private GrowIn() {}

  /**
   * Years until the radial distance falls below {@code requiredM}.
   *
   * @param horizontalM plan distance to the nearest conductor point, m (&gt;= 0)
   * @param verticalM height above the nearest conductor point, m (negative below)
   * @param requiredM required radial distance, m (&gt; 0)
   * @param verticalRate upward growth, m/year (&gt;= 0)
   * @param lateralRate sideways growth, m/year (&gt;= 0)
   * @return years, 0 if inside now, +infinity if never
   */
  public static double yearsRadial(double horizontalM, double verticalM, double requiredM,
      double verticalRate, double lateralRate) {
    check(horizontalM, verticalM, verticalRate, lateralRate);
    double h = horizontalM;
    double v = verticalM;
    double r = requiredM;
    double c = h * h + v * v - r * r;
    if (c < 0) {
      return 0;
    }
    // Phase 1, until the point is over or under the conductor (t0): squared distance is the
    // quadratic a t^2 + b t + c; the first root, if any, is the entry time.
    double t0 = lateralRate > 0 ? h / lateralRate : Double.POSITIVE_INFINITY;
    double a = lateralRate * lateralRate + verticalRate * verticalRate;
    double b = 2 * (v * verticalRate - h * lateralRate);
    if (a > 0 && b < 0) {
      double disc = b * b - 4 * a * c;
      if (disc >= 0) {
        // Stable smaller root c / q of the two positive roots q / a and c / q.
        double q = (-b + Math.sqrt(disc)) / 2;
        double t1 = c / q;
        if (t1 <= t0) {
          return t1;
        }
      }
    }
    // Phase 2, straight under the conductor: only vertical growth remains.
    if (t0 < Double.POSITIVE_INFINITY && verticalRate > 0 && v + verticalRate * t0 <= -r) {
      return (-r - v) / verticalRate;
    }
    return Double.POSITIVE_INFINITY;
  }

  /**
   * Years until a point is inside a components zone: plan distance below {@code requiredHM} and
   * absolute height difference below {@code requiredVM} at the same time.
   *
   * @param horizontalM plan distance to the nearest conductor point, m (&gt;= 0)
   * @param verticalM height above the nearest conductor point, m (negative below)
   * @param requiredHM required horizontal distance, m (&gt; 0)
   * @param requiredVM required vertical distance, m (&gt; 0)
   * @param verticalRate upward growth, m/year (&gt;= 0)
   * @param lateralRate sideways growth, m/year (&gt;= 0)
   * @return years, 0 if inside now, +infinity if never
   */
  public static double yearsComponents(double horizontalM, double verticalM, double requiredHM,
      double requiredVM, double verticalRate, double lateralRate) {
    check(horizontalM, verticalM, verticalRate, lateralRate);
    double h = horizontalM;
    double v = verticalM;
    double inH;
    if (h < requiredHM) {
      inH = 0;
    } else {
      inH = lateralRate > 0 ? (h - requiredHM) / lateralRate : Double.POSITIVE_INFINITY;
    }
    double enterV;
    double leaveV;
    if (Math.abs(v) < requiredVM) {
      enterV = 0;
      leaveV = verticalRate > 0 ? (requiredVM - v) / verticalRate : Double.POSITIVE_INFINITY;
    } else if (v < 0 && verticalRate > 0) {
      enterV = (-requiredVM - v) / verticalRate;
      leaveV = (requiredVM - v) / verticalRate;
    } else {
      return Double.POSITIVE_INFINITY;
    }
    double enter = Math.max(inH, enterV);
    return enter < leaveV ? enter : Double.POSITIVE_INFINITY;
  }

  private static void check(double h, double v, double gv, double gh) {
    if (!(h >= 0 && Double.isFinite(h) && Double.isFinite(v))) {
      throw new IllegalArgumentException("bad point offsets: " + h + ", " + v);
    }
    if (!(gv >= 0 && gh >= 0 && Double.isFinite(gv) && Double.isFinite(gh))) {
      throw new IllegalArgumentException("bad growth rates: " + gv + ", " + gh);
    }
  }
}
