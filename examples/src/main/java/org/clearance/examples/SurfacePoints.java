package org.clearance.examples;

import java.util.List;
import java.util.SplittableRandom;

/**
 * Fires the survey's vertical laser pulses over one span's part of the corridor and turns each
 * into its returns: ground or road, grass, shrubs and tree crowns (up to four returns through the
 * canopy, then understorey and ground), roofs, and the occasional noise point.
 */
final class SurfacePoints {
  /** ASPRS classes (LAS 1.4 R15, check-values.md section 1). */
  static final int GROUND = 2;
  static final int LOW_VEGETATION = 3;
  static final int MEDIUM_VEGETATION = 4;
  static final int HIGH_VEGETATION = 5;
  static final int BUILDING = 6;
  static final int LOW_NOISE = 7;
  static final int HIGH_NOISE = 18;
  /** Height limits of low and medium vegetation, m (vendor practice varies: no source). */
  static final double LOW_VEGETATION_MAX_M = 0.5;
  static final double MEDIUM_VEGETATION_MAX_M = 2.0;
  /** Most returns recorded per pulse (many sensors record four: common practice, no source). */
  static final int MAX_RETURNS = 4;
  /** Least vertical separation of two returns of one pulse, m (sensor dead zone, from memory). */
  static final double MIN_SEPARATION_M = 1.2;
  /** Mean depth below the crown surface of a first return, m. */
  private static final double PENETRATION_M = 0.35;
  /** Chance of a second return inside the same crown, and of going on to the next layer. */
  private static final double SECOND_IN_CROWN = 0.3;
  private static final double CONTINUE = 0.6;
  /** Chances of an understorey return under forest canopy and of a ground return after canopy. */
  private static final double UNDERSTOREY = 0.35;
  private static final double GROUND_AFTER_CANOPY = 0.75;
  /** Chance that an open-ground pulse returns from grass rather than bare ground. */
  private static final double GRASS = 0.35;
  /** Noise rates per pulse. */
  private static final double LOW_NOISE_RATE = 1.0 / 20_000;
  private static final double HIGH_NOISE_RATE = 1.0 / 30_000;
  /** Ground point noise, m (typical ALS vertical accuracy: common practice, no source). */
  private static final double GROUND_SIGMA_M = 0.03;
  /** Radius of the stray class-14 patch on a roof, m, and depth of the one in a crown, m. */
  static final double STRAY_ROOF_RADIUS_M = 1.5;
  static final double STRAY_CROWN_DEPTH_M = 2.0;

  private final DemoScene scene;
  private final Corridor corridor;
  private final Terrain terrain;
  private final Stands stands;
  private final boolean strays;
  private final double[] zs = new double[MAX_RETURNS];
  private final int[] classes = new int[MAX_RETURNS];
  private final int[] ids = new int[MAX_RETURNS];
  private final int[] crownIds = new int[32];
  private final double[] crownTop = new double[32];
  private final double[] crownLow = new double[32];

  SurfacePoints(DemoScene scene) {
    this.scene = scene;
    this.corridor = scene.corridor();
    this.terrain = scene.terrain();
    this.stands = scene.stands();
    this.strays = scene.options().mode().hasStrayLabels();
  }

  void generate(int span, SplittableRandom rng, ChunkEmitter out) {
    double len = scene.spans().get(span).lengthM();
    double w = corridor.halfWidth();
    CrownGrid grid = new CrownGrid(corridor, span, len, scene.trees(), scene.treesNear(span));
    List<DemoBuilding> buildings = scene.buildingsNear(span);
    double density = scene.options().pointDensity();
    for (FlightStrip strip : scene.strips()) {
      double eLo = Math.max(-w, strip.centreOffsetM() - strip.halfSwathM());
      double eHi = Math.min(w, strip.centreOffsetM() + strip.halfSwathM());
      if (!(eHi > eLo)) {
        continue;
      }
      long count = (long) Math.floor(density * (len + 2 * w) * (eHi - eLo) + rng.nextDouble());
      for (long k = 0; k < count; k++) {
        double s = rng.nextDouble(-w, len + w);
        double e = rng.nextDouble(eLo, eHi);
        double x = corridor.x(span, s, e);
        double y = corridor.y(span, s, e);
        if (corridor.owner(x, y, span) != span) {
          continue;
        }
        double ch = corridor.chainage(span, x, y);
        if (!strip.covers(e, ch)) {
          continue;
        }
        out.pulse(strip, ch, e, rng.nextInt(2));
        trace(span, x, y, s, e, grid, buildings, rng, out);
      }
    }
  }

  private void trace(int span, double x, double y, double s, double e, CrownGrid grid,
      List<DemoBuilding> buildings, SplittableRandom rng, ChunkEmitter out) {
    double g = terrain.z(x, y);
    double u = rng.nextDouble();
    if (u < LOW_NOISE_RATE) {
      out.emit(x, y, g - rng.nextDouble(1.5, 25), LOW_NOISE, TruthId.of(TruthId.Kind.NOISE_LOW, 0),
          rng.nextInt(200, 4000), 1, 1);
      return;
    }
    if (u < LOW_NOISE_RATE + HIGH_NOISE_RATE) {
      out.emit(x, y, g + rng.nextDouble(60, 400), HIGH_NOISE,
          TruthId.of(TruthId.Kind.NOISE_HIGH, 0), rng.nextInt(200, 4000), 1, 1);
      return;
    }
    for (DemoBuilding b : buildings) {
      double roof = b.roofZ(x, y);
      if (!Double.isNaN(roof)) {
        boolean stray = strays && b.id() == scene.strayBuilding()
            && Math.hypot(x - b.x(), y - b.y()) < STRAY_ROOF_RADIUS_M;
        out.emit(x, y, roof + GROUND_SIGMA_M * rng.nextGaussian(),
            stray ? ClassificationMode.CONDUCTOR_CLASS : BUILDING,
            TruthId.of(TruthId.Kind.BUILDING, b.id()), 24000 + rng.nextInt(8000), 1, 1);
        return;
      }
    }
    int crowns = crowns(grid, x, y, s, e);
    int n = 0;
    double level = Double.POSITIVE_INFINITY;
    boolean stopped = false;
    for (int k = 0; k < crowns && n < MAX_RETURNS; k++) {
      double top = Math.min(crownTop[k] - PENETRATION_M * -Math.log(1 - rng.nextDouble()),
          level - MIN_SEPARATION_M);
      if (top < crownLow[k]) {
        continue;
      }
      n = add(n, top, g, crownIds[k]);
      level = top;
      if (n < MAX_RETURNS && rng.nextDouble() < SECOND_IN_CROWN
          && level - MIN_SEPARATION_M > crownLow[k]) {
        level = rng.nextDouble(crownLow[k], level - MIN_SEPARATION_M);
        n = add(n, level, g, crownIds[k]);
      }
      if (rng.nextDouble() >= CONTINUE) {
        stopped = true;
        break;
      }
    }
    boolean road = scene.road().distance(x, y) <= 0.5 * scene.road().widthM();
    if (!stopped && n < MAX_RETURNS) {
      boolean forest = stands.forest(x, y) && !corridor.inRow(span, x, y);
      if (n > 0 && forest && rng.nextDouble() < UNDERSTOREY
          && level - g > MIN_SEPARATION_M + 0.8) {
        level = g + rng.nextDouble(0.3, Math.min(2.5, level - g - MIN_SEPARATION_M));
        zs[n] = level;
        classes[n] = vegetationClass(level - g);
        ids[n++] = TruthId.of(TruthId.Kind.UNDERSTOREY, 0);
      }
      if (n == 0 && !road && !forest && rng.nextDouble() < GRASS) {
        double h = rng.nextDouble(0.1, 0.6);
        zs[n] = g + h;
        classes[n] = vegetationClass(h);
        ids[n++] = TruthId.of(TruthId.Kind.LOW_VEGETATION, 0);
      } else if (n == 0 || (n < MAX_RETURNS && level - g > MIN_SEPARATION_M
          && rng.nextDouble() < GROUND_AFTER_CANOPY)) {
        zs[n] = g + GROUND_SIGMA_M * rng.nextGaussian();
        classes[n] = GROUND;
        ids[n++] = TruthId.of(road ? TruthId.Kind.ROAD : TruthId.Kind.GROUND, 0);
      }
    }
    for (int k = 0; k < n; k++) {
      TruthId.Kind kind = TruthId.kind(ids[k]);
      int base = kind == TruthId.Kind.ROAD ? 10000 : kind == TruthId.Kind.GROUND ? 20000 : 14000;
      int intensity = (int) ((base + rng.nextInt(6000)) * Math.pow(0.7, k));
      out.emit(x, y, zs[k], classes[k], ids[k], intensity, k + 1, n);
    }
  }

  /** Adds a crown return; returns the new count. */
  private int add(int n, double z, double g, int treeId) {
    zs[n] = z;
    DemoTree t = scene.trees().get(treeId);
    boolean stray = strays && treeId == scene.strayTree() && z > t.topZ() - STRAY_CROWN_DEPTH_M;
    classes[n] = stray ? ClassificationMode.CONDUCTOR_CLASS : vegetationClass(z - g);
    ids[n] = TruthId.of(TruthId.Kind.TREE, treeId);
    return n + 1;
  }

  /** Fills the crown buffers with the crowns over (x, y), highest surface first; returns count. */
  private int crowns(CrownGrid grid, double x, double y, double s, double e) {
    int cell = grid.cell(s, e);
    if (cell < 0) {
      return 0;
    }
    int n = 0;
    for (int k = grid.from(cell); k < grid.to(cell) && n < crownIds.length; k++) {
      DemoTree t = scene.trees().get(grid.item(k));
      double dx = x - t.x();
      double dy = y - t.y();
      double r = Math.sqrt(dx * dx + dy * dy);
      double top = t.upperZ(r);
      if (Double.isNaN(top)) {
        continue;
      }
      int j = n++;
      while (j > 0 && crownTop[j - 1] < top) { // insertion sort, highest first
        crownTop[j] = crownTop[j - 1];
        crownLow[j] = crownLow[j - 1];
        crownIds[j] = crownIds[j - 1];
        j--;
      }
      crownTop[j] = top;
      crownLow[j] = t.lowerZ(r);
      crownIds[j] = t.id();
    }
    return n;
  }

  /** Vegetation class by height above ground (FULL mode). */
  static int vegetationClass(double height) {
    return height < LOW_VEGETATION_MAX_M ? LOW_VEGETATION
        : height < MEDIUM_VEGETATION_MAX_M ? MEDIUM_VEGETATION : HIGH_VEGETATION;
  }
}
