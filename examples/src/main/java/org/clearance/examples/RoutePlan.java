package org.clearance.examples;

import java.util.SplittableRandom;

/**
 * The plan of the demo line: structure centres, which are dead-ends, where the ravine and the road
 * cross. Span lengths are drawn in 250-450 m; the line turns only at dead-end (angle) structures.
 */
final class RoutePlan {
  static final double MIN_SPAN_M = 250;
  static final double MAX_SPAN_M = 450;
  /** Ravine span length range, m: short enough for the plateau step to make an uplift span. */
  static final double MIN_RAVINE_SPAN_M = 285;
  static final double MAX_RAVINE_SPAN_M = 320;
  /** Line deflection at an angle structure, degrees. */
  static final double MIN_DEFLECTION_DEG = 12;
  static final double MAX_DEFLECTION_DEG = 35;
  /** Start of the line: an invented line on land in WGS 84 / UTM zone 11N (near
   * 60.2 N, 117.2 W). */
  static final double START_X = 486_250.0;
  static final double START_Y = 6_671_400.0;
  static final double ROAD_WIDTH_M = 7.0;

  final double[] x;
  final double[] y;
  final boolean[] deadEnd;
  final int ravineSpan;
  final DemoRoad road;
  private final double[] length;
  private final double[] ux;
  private final double[] uy;

  private RoutePlan(double[] x, double[] y, boolean[] deadEnd, int ravineSpan, DemoRoad road) {
    this.x = x;
    this.y = y;
    this.deadEnd = deadEnd;
    this.ravineSpan = ravineSpan;
    this.road = road;
    int n = x.length - 1;
    length = new double[n];
    ux = new double[n];
    uy = new double[n];
    for (int i = 0; i < n; i++) {
      length[i] = Math.hypot(x[i + 1] - x[i], y[i + 1] - y[i]);
      ux[i] = (x[i + 1] - x[i]) / length[i];
      uy[i] = (y[i + 1] - y[i]) / length[i];
    }
  }

  int spanCount() {
    return x.length - 1;
  }

  /** Plan length of span i, m. */
  double spanLength(int i) {
    return length[i];
  }

  static RoutePlan plan(SplittableRandom rng, int spans) {
    boolean[] deadEnd = new boolean[spans + 1];
    deadEnd[0] = true;
    deadEnd[spans] = true;
    int sections = spans < 6 ? 1 : spans <= 15 ? 2 + rng.nextInt(2) : Math.max(2, spans / 5);
    for (int k = 1; k < sections; k++) {
      int at = (int) Math.round((double) k * spans / sections) + rng.nextInt(-1, 2);
      at = Math.max(2, Math.min(spans - 2, at));
      deadEnd[at] = true;
    }
    int ravine = spans / 2;
    double[] x = new double[spans + 1];
    double[] y = new double[spans + 1];
    x[0] = START_X;
    y[0] = START_Y;
    double az = Math.toRadians(rng.nextDouble(30, 70));
    for (int i = 0; i < spans; i++) {
      if (i > 0 && deadEnd[i]) {
        double turn = Math.toRadians(rng.nextDouble(MIN_DEFLECTION_DEG, MAX_DEFLECTION_DEG));
        az += rng.nextBoolean() ? turn : -turn;
      }
      double len = i == ravine ? rng.nextDouble(MIN_RAVINE_SPAN_M, MAX_RAVINE_SPAN_M)
          : rng.nextDouble(MIN_SPAN_M, MAX_SPAN_M);
      x[i + 1] = x[i] + len * Math.sin(az);
      y[i + 1] = y[i] + len * Math.cos(az);
    }
    int roadSpan = Math.max(0, spans / 4);
    if (roadSpan == ravine) {
      roadSpan = Math.max(0, ravine - 1);
    }
    double f = rng.nextDouble(0.3, 0.7);
    double rx = x[roadSpan] + f * (x[roadSpan + 1] - x[roadSpan]);
    double ry = y[roadSpan] + f * (y[roadSpan + 1] - y[roadSpan]);
    double spanAz = Math.atan2(x[roadSpan + 1] - x[roadSpan], y[roadSpan + 1] - y[roadSpan]);
    double crossing = Math.toRadians(rng.nextDouble(60, 90)) * (rng.nextBoolean() ? 1 : -1);
    DemoRoad road = new DemoRoad(rx, ry, Math.sin(spanAz + crossing), Math.cos(spanAz + crossing),
        ROAD_WIDTH_M, roadSpan);
    return new RoutePlan(x, y, deadEnd, ravine, road);
  }

  /** Unit plan vector of span i: x component. */
  double ux(int i) {
    return ux[i];
  }

  /** Unit plan vector of span i: y component. */
  double uy(int i) {
    return uy[i];
  }

  /** Line deflection at structure i, radians, positive to the left (0 at the ends). */
  double deflection(int i) {
    if (i == 0 || i == spanCount()) {
      return 0;
    }
    double cross = ux(i - 1) * uy(i) - uy(i - 1) * ux(i);
    double dot = ux(i - 1) * ux(i) + uy(i - 1) * uy(i);
    return Math.atan2(cross, dot);
  }

  /** Unit plan vector along the line at structure i (bisector): x and y. */
  double[] along(int i) {
    int n = spanCount();
    double ax = (i > 0 ? ux(i - 1) : 0) + (i < n ? ux(i) : 0);
    double ay = (i > 0 ? uy(i - 1) : 0) + (i < n ? uy(i) : 0);
    double len = Math.hypot(ax, ay);
    return new double[] {ax / len, ay / len};
  }
}
