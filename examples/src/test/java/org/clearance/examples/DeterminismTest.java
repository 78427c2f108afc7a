package org.clearance.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

class DeterminismTest {

  /** A hash over every attribute of every point and its truth id, in generation order. */
  private static long hash(DemoScene scene) {
    long[] h = {1125899906842597L};
    scene.points((c, ids) -> {
      for (int i = 0; i < c.size(); i++) {
        long[] values = {Double.doubleToLongBits(c.x()[i]), Double.doubleToLongBits(c.y()[i]),
            Double.doubleToLongBits(c.z()[i]), c.intensity()[i], c.returnNumber()[i],
            c.numberOfReturns()[i], c.classification()[i], c.pointSourceId()[i],
            Double.doubleToLongBits(c.gpsTime()[i]), Float.floatToIntBits(c.scanAngle()[i]),
            c.scanDirection()[i], c.edgeOfFlightLine()[i], ids[i]};
        for (long v : values) {
          h[0] = 31 * h[0] + v;
        }
      }
    });
    return h[0];
  }

  @Test
  void sameSeedGivesTheSamePointsAndTruth() {
    DemoScene a = DemoScene.create(Scenes.small(3));
    DemoScene b = DemoScene.create(Scenes.small(3));
    assertEquals(a.structures(), b.structures());
    assertEquals(a.spans(), b.spans());
    assertEquals(a.trees(), b.trees());
    assertEquals(a.buildings(), b.buildings());
    assertEquals(a.birds(), b.birds());
    assertEquals(hash(a), hash(b));
    assertEquals(hash(a), hash(a)); // a scene generates the same points every time
  }

  @Test
  void differentSeedsDiffer() {
    DemoScene a = Scenes.of(Scenes.small(3));
    DemoScene b = Scenes.of(Scenes.small(4));
    assertNotEquals(a.structures(), b.structures());
    assertNotEquals(a.trees(), b.trees());
    assertNotEquals(hash(a), hash(b));
  }

  @Test
  void pointsStreamThroughOneReusedChunk() {
    DemoScene scene = Scenes.of(Scenes.small(3));
    PointChunk[] first = {null};
    long[] n = {0};
    long[] expectedFirst = {0};
    scene.points((c, ids) -> {
      if (first[0] == null) {
        first[0] = c;
      }
      assertSame(first[0], c);
      assertTrue(c.size() <= ChunkEmitter.CAPACITY);
      assertEquals(expectedFirst[0], c.firstRecord());
      expectedFirst[0] += c.size();
      n[0] += c.size();
    });
    assertTrue(n[0] > ChunkEmitter.CAPACITY, "several chunks: " + n[0]);
  }

  @Test
  void attributesAreRealistic() {
    DemoScene scene = Scenes.of(Scenes.small(3));
    int[] sources = new int[4];
    double[] time = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
    scene.points((c, ids) -> {
      for (int i = 0; i < c.size(); i++) {
        // LAS 1.4 R15: return number 1..number of returns, at most 15; here at most 4.
        assertTrue(c.returnNumber()[i] >= 1 && c.returnNumber()[i] <= c.numberOfReturns()[i]);
        assertTrue(c.numberOfReturns()[i] <= SurfacePoints.MAX_RETURNS);
        sources[c.pointSourceId()[i]]++;
        assertTrue(Math.abs(c.scanAngle()[i]) < 30, "scan angle " + c.scanAngle()[i]);
        time[0] = Math.min(time[0], c.gpsTime()[i]);
        time[1] = Math.max(time[1], c.gpsTime()[i]);
      }
    });
    assertEquals(0, sources[0]);
    assertTrue(Arrays.stream(sources, 1, 4).allMatch(k -> k > 1000), Arrays.toString(sources));
    assertTrue(time[0] > 3e8 && time[1] - time[0] > 60, "GPS times " + Arrays.toString(time));
  }

  @Test
  void gpsTimeIncreasesAlongEachStrip() {
    for (FlightStrip s : Scenes.of(Scenes.small(3)).strips()) {
      double a = s.time(s.startChainage() + 10);
      double b = s.time(s.startChainage() + 20);
      assertEquals(s.forward(), b > a);
      assertEquals(10 / s.speed(), Math.abs(b - a), 1e-6); // times near 3.5e8 s: ulp 6e-8 s
    }
  }
}
