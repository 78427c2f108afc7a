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
