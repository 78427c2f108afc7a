package org.clearance.ground;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.Consumer;
import org.clearance.survey.PointChunk;

/**
 * A seeded synthetic survey with known truth: a sloped plane with a hill and a ravine, planted
 * trees with ellipsoidal crowns, shrub patches, one flat-roofed building and a few noise points.
 * Points are labelled with ASPRS classes (2 ground, 3 low vegetation, 5 high vegetation, 6
 * building, 7 and 18 noise) and streamed through one reusable {@link PointChunk}, as a reader would.
 * Coordinates are offset to UTM-like magnitudes so float/double handling is exercised.
 */
final class SyntheticSurvey {
  /** Planted tree: stem position (m), height above ground (m), crown radius (m). */
  record PlantedTree(double x, double y, double height, double crownRadius) {}

  static final double X0 = 520_000;
  static final double Y0 = 4_180_000;
  static final double SIDE = 300;
  /** Ground sample density, points per square metre. */
  static final double GROUND_DENSITY = 4;
  /** Crown sample density, points per square metre of crown projection. */
  static final double CROWN_DENSITY = 10;
  /** Share of ground samples under a crown that reach the ground. */
  static final double PENETRATION = 0.3;
  static final double NOISE = 0.03;
  static final double BX0 = X0 + 180;
  static final double BX1 = X0 + 204;
  static final double BY0 = Y0 + 40;
  static final double BY1 = Y0 + 56;
  static final double ROOF_HEIGHT = 9;

  private final long seed;
  private final List<PlantedTree> trees = new ArrayList<>();
  private final List<double[]> shrubs = new ArrayList<>();
  private final double roofZ;

  SyntheticSurvey(long seed, int treeCount) {
    this.seed = seed;
    Random rnd = new Random(seed);
    for (int k = 0; k < 8; k++) {
      shrubs.add(new double[] {X0 + 20 + 260 * rnd.nextDouble(), Y0 + 20 + 260 * rnd.nextDouble()});
    }
    int attempts = 0;
    while (trees.size() < treeCount && attempts++ < 100_000) {
      double h = 6 + 22 * rnd.nextDouble();
      double r = 1.0 + 0.12 * h;
      double x = X0 + 20 + 260 * rnd.nextDouble();
      double y = Y0 + 20 + 260 * rnd.nextDouble();
      if (x > BX0 - r - 3 && x < BX1 + r + 3 && y > BY0 - r - 3 && y < BY1 + r + 3) {
        continue;
      }
      boolean free = true;
      for (PlantedTree t : trees) {
        free &= Math.hypot(t.x() - x, t.y() - y) > t.crownRadius() + r + 1.5;
      }
      for (double[] s : shrubs) {
        free &= Math.hypot(s[0] - x, s[1] - y) > r + 4;
      }
      if (free) {
        trees.add(new PlantedTree(x, y, h, r));
      }
    }
    roofZ = terrain((BX0 + BX1) / 2, (BY0 + BY1) / 2) + ROOF_HEIGHT;
  }

  List<PlantedTree> trees() {
    return trees;
  }

  /** True terrain elevation, metres. */
  static double terrain(double x, double y) {
    double u = x - X0;
    double v = y - Y0;
    double hill = 10 * Math.exp(-((u - 80) * (u - 80) + (v - 210) * (v - 210)) / (2 * 30 * 30));
    double d = (v - 0.6 * u - 20) / Math.sqrt(1 + 0.36);
    double ravine = -4 * Math.exp(-d * d / (2 * 8 * 8));
    return 120 + 0.04 * u + 0.02 * v + hill + ravine;
  }

  /** True when (x, y) is within {@code margin} m of a tree crown, shrub patch or the building. */
  boolean nearObject(double x, double y, double margin) {
    if (x > BX0 - margin && x < BX1 + margin && y > BY0 - margin && y < BY1 + margin) {
      return true;
    }
    for (PlantedTree t : trees) {
      if (Math.hypot(t.x() - x, t.y() - y) < t.crownRadius() + margin) {
        return true;
      }
    }
    for (double[] s : shrubs) {
      if (Math.hypot(s[0] - x, s[1] - y) < 3 + margin) {
        return true;
      }
    }
    return false;
  }

  /** Streams all points through one reusable chunk of {@code capacity} points. */
  void stream(int capacity, Consumer<PointChunk> sink) {
    Random rnd = new Random(seed * 31 + 7);
    PointChunk chunk = new PointChunk(capacity);
    chunk.reset(0, 0);
    long[] count = {0};
    Adder add = (x, y, z, cls) -> {
      if (chunk.isFull()) {
        sink.accept(chunk);
        count[0] += chunk.size();
        chunk.reset(0, count[0]);
      }
      chunk.add(x, y, z, cls);
    };
    long groundSamples = Math.round(SIDE * SIDE * GROUND_DENSITY);
    for (long k = 0; k < groundSamples; k++) {
      double x = X0 + SIDE * rnd.nextDouble();
      double y = Y0 + SIDE * rnd.nextDouble();
      double g = terrain(x, y) + NOISE * rnd.nextGaussian();
      if (x > BX0 && x < BX1 && y > BY0 && y < BY1) {
        add.add(x, y, roofZ + NOISE * rnd.nextGaussian(), 6);
        continue;
      }
      boolean underCrown = false;
      for (PlantedTree t : trees) {
        underCrown |= Math.hypot(t.x() - x, t.y() - y) < t.crownRadius();
      }
      if (underCrown && rnd.nextDouble() > PENETRATION) {
        continue;
      }
      boolean inShrub = false;
      for (double[] s : shrubs) {
        inShrub |= Math.hypot(s[0] - x, s[1] - y) < 3;
      }
      if (inShrub && rnd.nextDouble() < 0.7) {
        add.add(x, y, g + 0.8 + rnd.nextDouble(), 3);
      } else {
        add.add(x, y, g, 2);
      }
    }
    for (PlantedTree t : trees) {
      double top = terrain(t.x(), t.y()) + t.height();
      double depth = 0.55 * t.height();
      long n = Math.round(Math.PI * t.crownRadius() * t.crownRadius() * CROWN_DENSITY);
      for (long k = 0; k < n; k++) {
        double r = t.crownRadius() * Math.sqrt(rnd.nextDouble());
        double a = 2 * Math.PI * rnd.nextDouble();
        double q = r / t.crownRadius();
        double surfaceZ = top - depth * (1 - Math.sqrt(1 - q * q));
        double z = rnd.nextDouble() < 0.7
            ? surfaceZ + NOISE * rnd.nextGaussian()
            : surfaceZ - (surfaceZ - (top - depth)) * rnd.nextDouble();
        add.add(t.x() + r * Math.cos(a), t.y() + r * Math.sin(a), z, 5);
      }
    }
    for (int k = 0; k < 40; k++) {
      double x = X0 + SIDE * rnd.nextDouble();
      double y = Y0 + SIDE * rnd.nextDouble();
      add.add(x, y, terrain(x, y) - 8, 7);
      add.add(x, y, terrain(x, y) + 150, 18);
    }
    if (chunk.size() > 0) {
      sink.accept(chunk);
    }
  }

  @FunctionalInterface
  private interface Adder {
    void add(double x, double y, double z, int cls);
  }
}
