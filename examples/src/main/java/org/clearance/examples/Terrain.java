package org.clearance.examples;

import java.util.SplittableRandom;

/**
 * Ground elevation of the demo scene, m: a base level, a gentle trend levelling off over a few
 * kilometres, smooth relief (a sum of plane waves of random direction and phase), a meandering
 * ravine with a plateau step across it (the line crosses it, climbing from the low rim to the
 * high rim), and a road graded level across its width. Deterministic for a given random stream.
 */
final class Terrain {
  /** Relief components: from 1100 m down to about 40 m wavelength. */
  private static final int WAVES = 7;
  private static final double LONGEST_WAVE_M = 1100;
  private static final double WAVE_RATIO = 0.57;
  /** Amplitude of the longest wave, m; shorter ones shrink roughly with wavelength. */
  private static final double LONGEST_AMPLITUDE_M = 6.0;
  /** Base elevation of the scene, m (low, so rule altitude bands start at sea level). */
  static final double BASE_Z = 48.0;
  /** Depth of the ravine below its rims, m. */
  static final double RAVINE_DEPTH_M = 26.0;
  /** Gaussian half width of the ravine, m. */
  static final double RAVINE_WIDTH_M = 48.0;
  /** Height of the plateau step across the ravine, m (enough for an uplift span). */
  static final double STEP_HEIGHT_M = 52.0;
  /** Horizontal scale of the step (tanh), m: a steep but smooth escarpment. */
  static final double STEP_WIDTH_M = 70.0;
  /** Meander amplitude and wavelength of the ravine axis, m. */
  private static final double MEANDER_M = 14.0;
  private static final double MEANDER_WAVE_M = 260.0;
  /** Distance over which the regional trend levels off, m: keeps long lines at sane heights. */
  private static final double TREND_LENGTH_M = 3000.0;
  /** Width of the road shoulders over which the graded surface blends into the terrain, m. */
  private static final double SHOULDER_M = 4.0;

  private final double originX;
  private final double originY;
  private final double trendSlope;
  private final double trendUx;
  private final double trendUy;
  private final double[] kx = new double[WAVES];
  private final double[] ky = new double[WAVES];
  private final double[] amplitude = new double[WAVES];
  private final double[] phase = new double[WAVES];
  private final double ravineX;
  private final double ravineY;
  private final double ravineUx;
  private final double ravineUy;
  private final DemoRoad road;

  /**
   * @param rng random stream for the relief
   * @param ravineX easting of a point on the ravine axis, m
   * @param ravineY northing of that point, m
   * @param climbX x of the unit plan vector across the ravine towards the high rim
   * @param climbY y of that vector
   * @param road the road, graded level across its width
   */
  Terrain(SplittableRandom rng, double ravineX, double ravineY, double climbX, double climbY,
      DemoRoad road) {
    this.originX = ravineX;
    this.originY = ravineY;
    double trendAz = rng.nextDouble(2 * Math.PI);
    this.trendSlope = rng.nextDouble(0.002, 0.01);
    this.trendUx = Math.sin(trendAz);
    this.trendUy = Math.cos(trendAz);
    double wave = LONGEST_WAVE_M;
    for (int k = 0; k < WAVES; k++) {
      double dir = rng.nextDouble(2 * Math.PI);
      kx[k] = 2 * Math.PI / wave * Math.sin(dir);
      ky[k] = 2 * Math.PI / wave * Math.cos(dir);
      amplitude[k] = LONGEST_AMPLITUDE_M * Math.pow(wave / LONGEST_WAVE_M, 0.85)
          * rng.nextDouble(0.6, 1.0);
      phase[k] = rng.nextDouble(2 * Math.PI);
      wave *= WAVE_RATIO;
    }
    this.ravineX = ravineX;
    this.ravineY = ravineY;
    this.ravineUx = climbX;
    this.ravineUy = climbY;
    this.road = road;
  }

  /** Ground elevation at (x, y), m. */
  double z(double x, double y) {
    double base = natural(x, y);
    double q = road.distance(x, y);
    double half = 0.5 * road.widthM();
    if (q >= half + SHOULDER_M) {
      return base;
    }
    double t = road.along(x, y);
    double graded = natural(road.x() + t * road.ux(), road.y() + t * road.uy());
    if (q <= half) {
      return graded;
    }
    double f = (q - half) / SHOULDER_M;
    double blend = f * f * (3 - 2 * f); // smoothstep from the road edge to the terrain
    return graded + blend * (base - graded);
  }

  /** The ground without the road. */
  private double natural(double x, double y) {
    double dx = x - originX;
    double dy = y - originY;
    double a = trendUx * dx + trendUy * dy;
    double z = BASE_Z + trendSlope * TREND_LENGTH_M * Math.tanh(a / TREND_LENGTH_M);
    for (int k = 0; k < WAVES; k++) {
      z += amplitude[k] * Math.cos(kx[k] * dx + ky[k] * dy + phase[k]);
    }
    double across = (x - ravineX) * ravineUx + (y - ravineY) * ravineUy;
    double along = -(x - ravineX) * ravineUy + (y - ravineY) * ravineUx;
    double d = across - MEANDER_M * Math.sin(2 * Math.PI * along / MEANDER_WAVE_M);
    double r = d / RAVINE_WIDTH_M;
    z -= RAVINE_DEPTH_M * Math.exp(-r * r);
    z += STEP_HEIGHT_M * 0.5 * (1 + Math.tanh(d / STEP_WIDTH_M));
    return z;
  }
}
