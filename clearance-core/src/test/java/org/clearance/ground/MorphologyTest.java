package org.clearance.ground;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MorphologyTest {

  @ParameterizedTest
  @CsvSource({
    // r, dy, floor(sqrt(r^2 - dy^2)) (computed; 3-4-5 and 5-12-13 right triangles are exact)
    "5, 0, 5",
    "5, 3, 4",
    "5, 4, 3",
    "5, 5, 0",
    "13, 5, 12",
    "13, 12, 5",
    "1, 1, 0",
    "18, 17, 5"
  })
  void halfWidthOfDiskRows(int r, int dy, int expected) {
    assertEquals(expected, Morphology.halfWidth(r, dy));
  }

  @ParameterizedTest
  @CsvSource({"0, 9, 7", "1, 9, 7", "2, 16, 11", "4, 30, 25", "7, 40, 33", "9, 12, 5"})
  void erosionAndDilationMatchTheDefinition(int radius, int width, int height) {
    // Reference: the definition, min/max over all cells with dx^2 + dy^2 <= r^2 inside the raster.
    Random rnd = new Random(radius * 100 + width);
    float[] z = new float[width * height];
    for (int i = 0; i < z.length; i++) {
      z[i] = (float) (100 + 5 * rnd.nextGaussian());
    }
    assertArrayEquals(bruteForce(z, width, height, radius, false),
        Morphology.erode(z, width, height, radius), 0f);
    assertArrayEquals(bruteForce(z, width, height, radius, true),
        Morphology.dilate(z, width, height, radius), 0f);
  }

  @Test
  void openingRemovesANarrowBumpAndKeepsAWidePlateau() {
    // Hand-made: flat 0 with a 3 x 3 bump of 5 and a 9 x 9 plateau of 2. A disk of radius 2 fits
    // inside the plateau but not the bump, so opening keeps the plateau and removes the bump.
    int w = 30;
    float[] z = new float[w * w];
    for (int r = 4; r < 7; r++) {
      for (int c = 4; c < 7; c++) {
        z[r * w + c] = 5;
      }
    }
    for (int r = 15; r < 24; r++) {
      for (int c = 15; c < 24; c++) {
        z[r * w + c] = 2;
      }
    }
    float[] opened = Morphology.open(z, w, w, 2);
    assertEquals(0f, opened[5 * w + 5], 0f);
    assertEquals(2f, opened[19 * w + 19], 0f);
    assertEquals(2f, opened[15 * w + 19], 0f);
  }

  @Test
  void closingFillsASingleCellPit() {
    // Hand-made: a one-cell pit 7 m deep in flat ground at 10 m.
    int w = 9;
    float[] z = new float[w * w];
    java.util.Arrays.fill(z, 10f);
    z[4 * w + 4] = 3f;
    assertEquals(10f, Morphology.close(z, w, w, 1)[4 * w + 4], 0f);
  }

  private static float[] bruteForce(float[] z, int w, int h, int radius, boolean max) {
    float[] out = new float[z.length];
    for (int r = 0; r < h; r++) {
      for (int c = 0; c < w; c++) {
        float best = max ? Float.NEGATIVE_INFINITY : Float.POSITIVE_INFINITY;
        for (int dr = -radius; dr <= radius; dr++) {
          for (int dc = -radius; dc <= radius; dc++) {
            int rr = r + dr;
            int cc = c + dc;
            if (dr * dr + dc * dc > radius * radius || rr < 0 || cc < 0 || rr >= h || cc >= w) {
              continue;
            }
            float v = z[rr * w + cc];
            best = max ? Math.max(best, v) : Math.min(best, v);
          }
        }
        out[r * w + c] = best;
      }
    }
    return out;
  }
}
