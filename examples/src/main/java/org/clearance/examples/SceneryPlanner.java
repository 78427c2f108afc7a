package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Places the demo's buildings, birds and flight strips.
 */
final class SceneryPlanner {
  /** Keep-out distance of buildings from tower centres, m. */
  private static final double BUILDING_TOWER_CLEAR_M = 30;
  /** Gap between a building and the road edge, m. */
  private static final double BUILDING_ROAD_CLEAR_M = 6;
  private static final int BUILDING_TRIES = 60;
  /** Chance per span of a perched bird and of a bird in flight. */
  private static final double PERCHED_CHANCE = 0.35;
  private static final double FLYING_CHANCE = 0.12;
  /** Flying height of the survey above ground, m, and its ground speed, m/s. */
  private static final double ALTITUDE_M = 180;
  private static final double SPEED_M_S = 28;
  /** GPS time of the first strip (adjusted standard GPS time, s) and the turn between strips, s. */
  private static final double FIRST_TIME_S = 3.5e8;
  private static final double TURN_S = 600;

  private final SplittableRandom rng;
  private final Corridor corridor;
  private final Terrain terrain;
  private final LineBuilder.Layout layout;
  private final DemoRoad road;
  private final int ravineSpan;

  SceneryPlanner(SplittableRandom rng, Corridor corridor, Terrain terrain,
      LineBuilder.Layout layout, DemoRoad road, int ravineSpan) {
    this.rng = rng;
    this.corridor = corridor;
    this.terrain = terrain;
    this.layout = layout;
    this.road = road;
    this.ravineSpan = ravineSpan;
  }

  List<DemoBuilding> buildings() {
    int n = corridor.spanCount();
    int wanted = Math.max(3, n / 3 + 1);
    List<DemoBuilding> out = new ArrayList<>();
    for (int t = 0; t < wanted * BUILDING_TRIES && out.size() < wanted; t++) {
      int span = rng.nextInt(n);
      if (span == ravineSpan) {
        continue;
      }
      boolean house = rng.nextDouble() < 0.6;
      double length = house ? rng.nextDouble(10, 16) : rng.nextDouble(14, 24);
      double width = house ? rng.nextDouble(7, 10) : rng.nextDouble(9, 14);
      double half = 0.5 * Math.hypot(length, width);
      double minE = Corridor.ROW_HALF_WIDTH_M + 4 + half;
      double maxE = corridor.halfWidth() - half - 1;
      if (maxE <= minE) {
        continue;
      }
      double len = layout.spans().get(span).lengthM();
      double s = rng.nextDouble(0.15, 0.85) * len;
      double e = rng.nextDouble(minE, maxE) * (rng.nextBoolean() ? 1 : -1);
      double x = corridor.x(span, s, e);
      double y = corridor.y(span, s, e);
      if (corridor.owner(x, y, span) != span || !clear(x, y, half, span, out)) {
        continue;
      }
      double lineAz = Math.atan2(corridor.x(span, 1, 0) - corridor.x(span, 0, 0),
          corridor.y(span, 1, 0) - corridor.y(span, 0, 0));
      double az = lineAz + Math.toRadians(rng.nextDouble(-20, 20));
      double eave = house ? rng.nextDouble(2.8, 5.5) : rng.nextDouble(4, 7);
      double ridge = house ? eave + rng.nextDouble(2, 3.5) : eave;
      DemoBuilding draft = new DemoBuilding(out.size(), x, y, length, width, az, 0, eave, ridge,
          house ? DemoBuilding.Roof.GABLE : DemoBuilding.Roof.FLAT, span);
      double base = Double.POSITIVE_INFINITY;
      for (int k = 0; k < 4; k++) {
        base = Math.min(base, terrain.z(draft.cornerX(k), draft.cornerY(k)));
      }
      out.add(new DemoBuilding(out.size(), x, y, length, width, az, base, eave, ridge,
          draft.roof(), span));
    }
    return out;
  }

  private boolean clear(double x, double y, double half, int span, List<DemoBuilding> placed) {
    if (road.distance(x, y) < 0.5 * road.widthM() + half + BUILDING_ROAD_CLEAR_M) {
      return false;
    }
    List<DemoStructure> st = layout.structures();
    for (int k = Math.max(0, span - 1); k <= Math.min(st.size() - 1, span + 2); k++) {
      if (Math.hypot(st.get(k).x() - x, st.get(k).y() - y) < BUILDING_TOWER_CLEAR_M) {
        return false;
      }
    }
    for (DemoBuilding b : placed) {
      if (Math.hypot(b.x() - x, b.y() - y) < b.halfDiagonalM() + half + 4) {
        return false;
      }
    }
    return true;
  }

  List<DemoBird> birds() {
    int n = corridor.spanCount();
    int forced = n / 3;
    List<DemoBird> out = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      DemoSpan span = layout.spans().get(i);
      if (i == forced || rng.nextDouble() < PERCHED_CHANCE) {
        for (int t = 0; t < 20; t++) {
          DemoWire w = span.wires().get(rng.nextInt(span.wires().size()));
          double s = rng.nextDouble(0.15, 0.85) * w.length();
          if (w.inGap(s)) {
            continue;
          }
          var c = w.curve();
          out.add(new DemoBird(out.size(), i, w.position(), c.x(s), c.y(s),
              c.z(s) + rng.nextDouble(0.15, 0.4), rng.nextInt(3, 7)));
          break;
        }
      }
      if (rng.nextDouble() < FLYING_CHANCE) {
        double s = rng.nextDouble(0.1, 0.9) * span.lengthM();
        double e = rng.nextDouble(-0.8, 0.8) * corridor.halfWidth();
        double x = corridor.x(i, s, e);
        double y = corridor.y(i, s, e);
        out.add(new DemoBird(out.size(), i, "", x, y, terrain.z(x, y) + rng.nextDouble(45, 80),
            rng.nextInt(2, 6)));
      }
    }
    return out;
  }

  /**
   * Three strips: two full-length ones either side of the centre line (flown in opposite
   * directions, overlapping over the middle of the corridor) and a shorter re-flight along the
   * centre over part of the line, so the density varies.
   */
  List<FlightStrip> strips() {
    double w = corridor.halfWidth();
    double len = corridor.length();
    double half = 0.75 * w;
    double t1 = FIRST_TIME_S + rng.nextDouble(0, 3600);
    double t2 = t1 + len / SPEED_M_S + TURN_S;
    double from = rng.nextDouble(0.15, 0.35) * len;
    double to = from + rng.nextDouble(0.3, 0.45) * len;
    double t3 = t2 + len / SPEED_M_S + TURN_S + from / SPEED_M_S;
    return List.of(
        new FlightStrip(1, 0.5 * w, half, 0, len + w, true, t1, SPEED_M_S, ALTITUDE_M),
        new FlightStrip(2, -0.5 * w, half, 0, len + w, false, t2, SPEED_M_S, ALTITUDE_M),
        new FlightStrip(3, 0, half, from, to, true, t3, SPEED_M_S, ALTITUDE_M));
  }
}
