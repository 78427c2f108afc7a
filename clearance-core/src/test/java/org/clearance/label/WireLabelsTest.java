package org.clearance.label;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import org.clearance.ground.GroundModel;
import org.clearance.ground.GroundModelBuilder;
import org.clearance.ground.GroundOptions;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;
import org.clearance.wire.PointSource;
import org.clearance.wire.SetAside;
import org.junit.jupiter.api.Test;

/**
 * A crown a vendor labelled wire conductor (14) beside a conductor is not believed and is
 * measured; a wire labelled 14 that the wire finder did not fit keeps its label; a labelled
 * wire point the finder put on a conductor is not looked at (issue 9: labels trusted only as
 * far as they are consistent). Generated, seeded: one 200 m span along grid east on flat
 * ground (z = 0); a crown of radius 3 m, 14 m tall, 6 m left of the line at mid-span, every
 * point class 14; an unfitted wire 8 m right of the line, 12 m up, 10 points per metre with
 * 3 cm noise, class 14; the span's own conductor at 12 m on the line, class 14, set aside as
 * wire by the (here simulated) wire finder.
 */
class WireLabelsTest {

  private static final double REGION_M = 70;
  private static final List<SpanFrame> FRAMES = List.of(SpanFrame.between(0, 0, 200, 0));

  private final List<PointChunk> chunks = new ArrayList<>();
  private final List<double[]> crown = new ArrayList<>();
  private final List<double[]> unfitted = new ArrayList<>();
  private final List<double[]> conductor = new ArrayList<>();

  @Test
  void crownLabelledWireIsMeasuredAndWiresKeepTheirLabel() {
    SplittableRandom rng = new SplittableRandom(14);
    for (double x = -80; x <= 280; x += 2) {
      for (double y = -80; y <= 80; y += 2) {
        point(x, y, 0.02 * rng.nextGaussian(), 2, 1, null);
      }
    }
    // the crown: points through the upper half of an ellipsoid (as LabelBlocksTest's crowns,
    // denser: 20 points per m^2 of crown plan area)
    double radius = 3;
    double height = 14;
    int n = (int) (20 * Math.PI * radius * radius);
    for (int k = 0; k < n; k++) {
      double a = rng.nextDouble(2 * Math.PI);
      double r = radius * Math.sqrt(rng.nextDouble());
      double u = rng.nextDouble();
      point(100 + r * Math.cos(a), 6 + r * Math.sin(a), height - height / 2 * u * u, 14,
          u > 0.3 ? 2 : 1, crown);
    }
    for (double x = 20; x <= 180; x += 0.1) {
      point(x, -8 + 0.03 * rng.nextGaussian(), 12 + 0.03 * rng.nextGaussian(), 14, 1,
          unfitted);
      point(x, 0.03 * rng.nextGaussian(), 12 + 0.03 * rng.nextGaussian(), 14, 1, conductor);
    }
    GroundModelBuilder g = new GroundModelBuilder(GroundOptions.defaults());
    chunks.forEach(g);
    GroundModel ground = g.build();
    SetAside setAside = SetAside.of(conductor.stream().mapToLong(WireLabelsTest::key)
        .toArray(), new long[0]);

    WireLabels.Result r = WireLabels.judge(source(), FRAMES, REGION_M, ground, setAside, true);

    assertEquals(crown.size() + unfitted.size(), r.looked(), r.describe());
    long crownDistrusted = crown.stream().filter(p -> setAside.labelDistrusted(key(p))).count();
    long wireDistrusted = unfitted.stream().filter(p -> setAside.labelDistrusted(key(p)))
        .count();
    // the crown's 565 points (its lowest 7 m up) make one object judged vegetation, but for a
    // stray point more than the 1 m link from the rest (564 measured with this seed): at least
    // 99 % of the crown is measured
    assertTrue(crownDistrusted >= 0.99 * crown.size(), crownDistrusted + " of " + crown.size());
    assertEquals(0, wireDistrusted, r.describe());
    assertEquals(crownDistrusted, r.distrusted());
    assertTrue(conductor.stream().noneMatch(p -> setAside.labelDistrusted(key(p))));
    assertTrue(!WireLabels.anyIn(new long[256]));
  }

  /**
   * Crowns a vendor labelled building (6), tower (15) and bridge deck (17) are measured; a real
   * flat-roofed building labelled 6 and a lattice tower labelled 15 standing at the span's first
   * structure keep their labels (issue 9). Generated on the same span and ground: crowns as above
   * (every point from a pulse with two returns) at mid-span, 6 m left (class 6), 6 m right (class
   * 15) and 40 m further on, 6 m left (class 17); a 10 m x 10 m flat roof 8 m up with its four
   * walls, 20 points per m^2, every return 1 of 1, 25 m right of the line at station 60 (class 6);
   * a tower 30 m tall at station 0, four legs from a 6 m base to a 1 m top, 20 points per metre,
   * with a 10 m cross arm at 25 m (class 15).
   */
  @Test
  void crownsLabelledBuildingTowerDeckAreMeasured() {
    SplittableRandom rng = new SplittableRandom(6);
    for (double x = -80; x <= 280; x += 2) {
      for (double y = -80; y <= 80; y += 2) {
        point(x, y, 0.02 * rng.nextGaussian(), 2, 1, null);
      }
    }
    List<double[]> crowns = new ArrayList<>();
    crown(rng, 100, 6, 6, crowns);
    crown(rng, 100, -6, 15, crowns);
    crown(rng, 140, 6, 17, crowns);
    List<double[]> building = new ArrayList<>();
    for (double x = 55; x <= 65; x += 0.22) {
      for (double y = -30; y <= -20; y += 0.22) {
        point(x + 0.03 * rng.nextGaussian(), y + 0.03 * rng.nextGaussian(),
            8 + 0.03 * rng.nextGaussian(), 6, 1, building);
      }
      for (double z = 1; z < 8; z += 0.22) {
        point(x, -30 + 0.03 * rng.nextGaussian(), z, 6, 1, building);
        point(x, -20 + 0.03 * rng.nextGaussian(), z, 6, 1, building);
        point(55 + 0.03 * rng.nextGaussian(), x - 85, z, 6, 1, building);
        point(65 + 0.03 * rng.nextGaussian(), x - 85, z, 6, 1, building);
      }
    }
    List<double[]> tower = new ArrayList<>();
    for (double z = 0; z <= 30; z += 0.05) {
      double half = 3 - 2.5 * z / 30;
      for (int leg = 0; leg < 4; leg++) {
        double sx = leg < 2 ? 1 : -1;
        double sy = leg % 2 == 0 ? 1 : -1;
        point(sx * half + 0.03 * rng.nextGaussian(), sy * half + 0.03 * rng.nextGaussian(), z,
            15, 1, tower);
      }
    }
    for (double y = -5; y <= 5; y += 0.05) {
      point(0.03 * rng.nextGaussian(), y, 25 + 0.03 * rng.nextGaussian(), 15, 1, tower);
    }
    GroundModelBuilder g = new GroundModelBuilder(GroundOptions.defaults());
    chunks.forEach(g);
    GroundModel ground = g.build();
    SetAside setAside = SetAside.none();

    WireLabels.Result r = WireLabels.judge(source(), FRAMES, REGION_M, ground, setAside, true);

    long crownDistrusted = crowns.stream().filter(p -> setAside.labelDistrusted(key(p))).count();
    long buildingDistrusted = building.stream().filter(p -> setAside.labelDistrusted(key(p)))
        .count();
    long towerDistrusted = tower.stream().filter(p -> setAside.labelDistrusted(key(p))).count();
    System.out.println("labels 6/15/17: " + r.describe() + "; crowns " + crownDistrusted + " of "
        + crowns.size() + ", building " + buildingDistrusted + " of " + building.size()
        + ", tower " + towerDistrusted + " of " + tower.size());
    // as above: at least 99 % of each crown is one object judged vegetation
    assertTrue(crownDistrusted >= 0.99 * crowns.size(), crownDistrusted + " of " + crowns.size());
    assertEquals(0, buildingDistrusted, r.describe());
    assertEquals(0, towerDistrusted, r.describe());
    assertEquals(0, r.looked(), r.describe());
    assertEquals(crownDistrusted, r.structuresDistrusted());
    assertTrue(WireLabels.judgedClass(6) && WireLabels.judgedClass(15)
        && WireLabels.judgedClass(17) && !WireLabels.judgedClass(5));
  }

  /** A crown as in the first test at plan (x, y), every point of class {@code cls} from a pulse
   * with two returns. */
  private void crown(SplittableRandom rng, double x, double y, int cls, List<double[]> into) {
    double radius = 3;
    double height = 14;
    int n = (int) (20 * Math.PI * radius * radius);
    for (int k = 0; k < n; k++) {
      double a = rng.nextDouble(2 * Math.PI);
      double r = radius * Math.sqrt(rng.nextDouble());
      double u = rng.nextDouble();
      point(x + r * Math.cos(a), y + r * Math.sin(a), height - height / 2 * u * u, cls,
          u > 0.3 ? 2 : 1, into);
      PointChunk c = chunks.get(chunks.size() - 1);
      c.numberOfReturns()[c.size() - 1] = 2;
    }
  }

  private static long key(double[] p) {
    return SetAside.key(p[0], p[1], p[2]);
  }

  private PointSource source() {
    return consumers -> {
      List<Consumer<PointChunk>> two = List.of(consumers.get(), consumers.get());
      for (int i = 0; i < chunks.size(); i++) {
        two.get(i % 2).accept(chunks.get(i));
      }
    };
  }

  private void point(double x, double y, double z, int cls, int returnNumber,
      List<double[]> into) {
    if (chunks.isEmpty() || chunks.get(chunks.size() - 1).isFull()) {
      chunks.add(new PointChunk(8192));
    }
    PointChunk c = chunks.get(chunks.size() - 1);
    int i = c.add(x, y, z, cls);
    c.returnNumber()[i] = (byte) returnNumber;
    if (into != null) {
      into.add(new double[] {x, y, z});
    }
  }
}
