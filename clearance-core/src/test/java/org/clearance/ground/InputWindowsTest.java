package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

/**
 * The input windows of an area: a builder fed only the points inside them gives, inside the area,
 * exactly the terrain of a builder fed everything (the block and its overlap are all a block's
 * terrain reads), including cells filled by inpainting under a hole in the ground points. The
 * expected values are the whole-survey builder's own: this checks the windows, not the terrain.
 */
class InputWindowsTest {
  /** Area of interest, m: inside the second and third 256 m blocks along x. */
  private static final double AX0 = 300;
  private static final double AY0 = 50;
  private static final double AX1 = 560;
  private static final double AY1 = 150;

  /** Rolling ground over 1200 x 200 m (1 m jittered grid), with a 40 m hole in the area. */
  private static void survey(java.util.function.Consumer<PointChunk> sink) {
    Random rnd = new Random(11);
    PointChunk c = new PointChunk(65_536);
    for (int i = 0; i < 1200; i++) {
      for (int j = 0; j < 200; j++) {
        double x = i + rnd.nextDouble();
        double y = j + rnd.nextDouble();
        boolean hole = x > 400 && x < 440 && y > 80 && y < 120;
        double z = 50 + 0.02 * x + 3 * Math.sin(x / 37) * Math.cos(y / 23);
        c.add(x, y, z + 0.03 * rnd.nextGaussian(), hole ? 5 : 2);
        if (hole) {
          c.z()[c.size() - 1] += 12;
        }
        if (c.isFull()) {
          sink.accept(c);
          c.reset(0, 0);
        }
      }
    }
    sink.accept(c);
  }

  @Test
  void theWindowsGiveTheWholeSurveysTerrainInTheArea() {
    GroundOptions options = GroundOptions.defaults();
    GroundModelBuilder whole = new GroundModelBuilder(options);
    survey(whole);
    GroundModel expected = whole.build();

    List<double[]> windows = GroundModelBuilder.inputWindows(options, AX0, AY0, AX1, AY1);
    // 256 m blocks: x 300-560 touches blocks 1 and 2, y 50-150 block 0.
    assertEquals(2, windows.size());
    GroundModelBuilder part = new GroundModelBuilder(options);
    long[] kept = new long[1];
    survey(chunk -> {
      PointChunk inside = new PointChunk(chunk.size() + 1);
      for (int i = 0; i < chunk.size(); i++) {
        for (double[] w : windows) {
          if (chunk.x()[i] >= w[0] && chunk.x()[i] < w[2] && chunk.y()[i] >= w[1]
              && chunk.y()[i] < w[3]) {
            inside.addCopy(chunk, i);
            break;
          }
        }
      }
      kept[0] += inside.size();
      part.accept(inside);
    });
    GroundModel actual = part.build();
    assertTrue(kept[0] < 1200 * 200, "the windows leave points out");
    for (double x = AX0; x <= AX1; x += 0.5) {
      for (double y = AY0; y <= AY1; y += 0.5) {
        assertEquals(expected.groundZ(x, y), actual.groundZ(x, y), 0.0, x + ", " + y);
      }
    }
  }
}
