package org.clearance.examples;

import java.util.SplittableRandom;

/**
 * Smooth fields that say where forest stands, whether it is conifer or broadleaf, and how tall it
 * grows: sums of three plane waves each, deterministic for a random stream.
 */
final class Stands {
  private static final int WAVES = 3;
  /** Forest where the cover field exceeds this (about 60 % of the land). */
  private static final double FOREST_THRESHOLD = -0.25;
  /** Mean and spread of stand height, m. */
  private static final double MEAN_HEIGHT_M = 20.0;
  private static final double HEIGHT_SPREAD_M = 6.0;

  private final double[][] cover;
  private final double[][] species;
  private final double[][] height;

  Stands(SplittableRandom rng) {
    cover = field(rng, 700, 250);
    species = field(rng, 900, 300);
    height = field(rng, 1200, 400);
  }

  private static double[][] field(SplittableRandom rng, double longWave, double shortWave) {
    double[][] f = new double[WAVES][4];
    for (int k = 0; k < WAVES; k++) {
      double wave = longWave + (shortWave - longWave) * k / (WAVES - 1);
      double dir = rng.nextDouble(2 * Math.PI);
      f[k][0] = 2 * Math.PI / wave * Math.sin(dir);
      f[k][1] = 2 * Math.PI / wave * Math.cos(dir);
      f[k][2] = rng.nextDouble(2 * Math.PI);
      f[k][3] = 1.0 / WAVES;
    }
    return f;
  }

  private static double eval(double[][] f, double x, double y) {
    double v = 0;
    for (double[] w : f) {
      v += w[3] * Math.cos(w[0] * x + w[1] * y + w[2]);
    }
    return v * Math.sqrt(WAVES); // unit-ish spread
  }

  /** True when (x, y) lies in a forest stand. */
  boolean forest(double x, double y) {
    return eval(cover, x, y) > FOREST_THRESHOLD;
  }

  /** True when the stand at (x, y) is conifer. */
  boolean conifer(double x, double y) {
    return eval(species, x, y) > 0;
  }

  /** Mean tree height of the stand at (x, y), m. */
  double meanHeight(double x, double y) {
    return MEAN_HEIGHT_M + HEIGHT_SPREAD_M * Math.max(-1, Math.min(1, eval(height, x, y)));
  }
}
