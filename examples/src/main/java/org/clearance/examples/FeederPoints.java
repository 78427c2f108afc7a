package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * Generates the demo feeder's airborne survey span by span (package-private): vertical pulses
 * over the corridor giving crown, inside-crown, low-vegetation and ground returns; points along
 * each conductor and the crossing service line; the few returns of a wood pole (its side, top,
 * cross arm or brackets, insulators); low and high noise. Classes as the main demo's (FULL:
 * ground 2, vegetation 3/4/5 by height, noise 7/18, conductors and the neutral 14, poles 15,
 * insulators 16), mapped by the classification mode.
 */
final class FeederPoints {
  static final int GROUND = 2;
  static final int LOW_NOISE = 7;
  static final int HIGH_NOISE = 18;
  static final int POLE = 15;
  static final int INSULATOR = 16;
  /** Side returns per metre of pole height at the default density: a 0.3 m column is a small
   * target for vertical pulses (common practice, no source). */
  static final double POLE_PER_METRE = 0.8;
  static final double ARM_PER_METRE = 3.0;
  static final double SERVICE_PER_METRE = 2.0;
  /** Noise points per pulse, low (below ground) and high (in the air). */
  static final double LOW_NOISE_RATE = 1.0 / 20_000;
  static final double HIGH_NOISE_RATE = 1.0 / 30_000;
  /** Share of open-ground pulses returned by grass instead of bare ground. */
  static final double GRASS_SHARE = 0.25;
  private static final double STEEL_SIGMA_M = 0.02;

  private final FeederScene scene;
  private final double scale;
  private final FlightStrip strip;

  FeederPoints(FeederScene scene) {
    this.scene = scene;
    this.scale = scene.options().pointDensity() / FeederOptions.DEFAULT_DENSITY;
    double total = 0;
    for (FeederScene.Span s : scene.spans()) {
      total += s.lengthM();
    }
    strip = scene.hostStrip() != null ? scene.hostStrip()
        : new FlightStrip(1, 0, 300, -10, total + 10, true, 3.2e8, 40, 300);
  }

  void generate(PointSink sink) {
    ChunkEmitter out = new ChunkEmitter(sink, scene.options().mode());
    SplittableRandom root = new SplittableRandom(scene.pointSeed());
    List<FeederScene.Tree> trees = scene.trees();
    for (FeederScene.Span sp : scene.spans()) {
      SplittableRandom rng = root.split();
      double chainage = scene.chainageAt(sp.from());
      FeederPole a = scene.poles().get(sp.from());
      FeederPole b = scene.poles().get(sp.to());
      List<FeederScene.Tree> near = new ArrayList<>();
      for (FeederScene.Tree t : trees) {
        double s = station(a, b, sp.lengthM(), t.x(), t.y());
        if (s > -10 && s < sp.lengthM() + 10) {
          near.add(t);
        }
      }
      if (!scene.builtIn()) {
        surface(sp, a, b, near, chainage, rng, out);
      }
      for (int k = 0; k < sp.wires().size(); k++) {
        FeederWire w = sp.wires().get(k);
        wire(w.curve(), w.pointsPerMetre(), w.noiseSigmaM(), TruthId.wire(sp.index(), k), w,
            chainage, rng, out);
      }
      if (sp.service().isPresent()) {
        wire(sp.service().get(), SERVICE_PER_METRE * Math.sqrt(scale), 0.03,
            TruthId.wire(sp.index(), FeederScene.SERVICE_WIRE), null, chainage, rng, out);
      }
      pole(sp.from(), chainage, rng, out);
      if (sp.to() == scene.poles().size() - 1) {
        pole(sp.to(), chainage + sp.lengthM(), rng, out);
      }
    }
    out.flush();
  }

  private static double station(FeederPole a, FeederPole b, double len, double x, double y) {
    return ((x - a.x()) * (b.x() - a.x()) + (y - a.y()) * (b.y() - a.y())) / len;
  }

  private void surface(FeederScene.Span sp, FeederPole a, FeederPole b,
      List<FeederScene.Tree> near, double chainage, SplittableRandom rng, ChunkEmitter out) {
    double len = sp.lengthM();
    double ux = (b.x() - a.x()) / len;
    double uy = (b.y() - a.y()) / len;
    double w = FeederScene.HALF_WIDTH_M;
    long pulses = (long) Math.floor(scene.options().pointDensity() * len * 2 * w
        + rng.nextDouble());
    for (long k = 0; k < pulses; k++) {
      double s = rng.nextDouble(0, len);
      double e = rng.nextDouble(-w, w);
      double x = a.x() + s * ux - e * uy;
      double y = a.y() + s * uy + e * ux;
      double g = scene.groundZ(x, y);
      out.pulse(strip, chainage + s, e, (int) (k & 1));
      if (rng.nextDouble() < LOW_NOISE_RATE) {
        out.emit(x, y, g - rng.nextDouble(1.5, 10), LOW_NOISE, TruthId.of(TruthId.Kind.NOISE_LOW,
            0), 300, 1, 1);
      }
      if (rng.nextDouble() < HIGH_NOISE_RATE) {
        out.emit(x, y, g + rng.nextDouble(60, 300), HIGH_NOISE,
            TruthId.of(TruthId.Kind.NOISE_HIGH, 0), 300, 1, 1);
      }
      FeederScene.Tree hit = null;
      double top = Double.NEGATIVE_INFINITY;
      for (int t = 0; t < near.size(); t++) {
        FeederScene.Tree tr = near.get(t);
        double z = crownTop(tr, Math.hypot(x - tr.x(), y - tr.y()));
        if (z > top) {
          top = z;
          hit = tr;
        }
      }
      if (hit == null) {
        boolean grass = rng.nextDouble() < GRASS_SHARE;
        double z = grass ? g + rng.nextDouble(0.05, 0.45) : g;
        out.emit(x, y, z, grass ? 3 : GROUND, TruthId.of(grass ? TruthId.Kind.LOW_VEGETATION
            : TruthId.Kind.GROUND, 0), 1500 + rng.nextInt(3000), 1, 1);
        continue;
      }
      int id = TruthId.of(TruthId.Kind.TREE, scene.trees().indexOf(hit));
      boolean inside = rng.nextDouble() < 0.5;
      int returns = inside ? 3 : 2;
      double z1 = top - rng.nextDouble(0, 0.25);
      out.emit(x, y, z1, vegetation(z1 - g), id, 800 + rng.nextInt(2000), 1, returns);
      if (inside) {
        double lo = hit.baseZ() + hit.crownBaseM();
        double z2 = lo + rng.nextDouble() * Math.max(0, z1 - 1.2 - lo);
        out.emit(x, y, z2, vegetation(z2 - g), id, 600 + rng.nextInt(1500), 2, returns);
      }
      out.emit(x, y, g, GROUND, TruthId.of(TruthId.Kind.GROUND, 0),
          400 + rng.nextInt(1000), returns, returns);
    }
  }

  /** Elevation of a crown's upper surface at plan distance r from its stem, or -inf. */
  static double crownTop(FeederScene.Tree t, double r) {
    if (r >= t.crownRadiusM()) {
      return Double.NEGATIVE_INFINITY;
    }
    double q = r / t.crownRadiusM();
    double u = t.cone() ? 1 - q : 0.5 * (1 + Math.sqrt(1 - q * q));
    return t.baseZ() + t.crownBaseM() + u * (t.heightM() - t.crownBaseM());
  }

  private static int vegetation(double h) {
    return h < 0.5 ? 3 : h < 2 ? 4 : 5;
  }

  private void wire(ConductorCurve curve, double perMetre, double sigma, int id, FeederWire w,
      double chainage, SplittableRandom rng, ChunkEmitter out) {
    Catenary k = curve.curve();
    double arc = k.arcLength(0, curve.length());
    double sinhA = Math.sinh(-k.s0() / k.c());
    long count = (long) Math.floor(perMetre * arc + rng.nextDouble());
    for (long j = 0; j < count; j++) {
      double l = rng.nextDouble(0, arc);
      double v = l / k.c() + sinhA;
      double s = k.s0() + k.c() * Math.log(v + Math.sqrt(v * v + 1));
      if (w != null && w.inGap(s)) {
        continue;
      }
      double x = curve.x(s) + sigma * rng.nextGaussian();
      double y = curve.y(s) + sigma * rng.nextGaussian();
      double z = curve.z(s) + sigma * rng.nextGaussian();
      out.pulse(strip, chainage + Math.min(s, curve.length()), 0, 0);
      out.emit(x, y, z, ClassificationMode.CONDUCTOR_CLASS, id, 5000 + rng.nextInt(4000), 1,
          2);
    }
  }

  private void pole(int index, double chainage, SplittableRandom rng, ChunkEmitter out) {
    FeederPole p = scene.poles().get(index);
    out.pulse(strip, chainage, 0, 0);
    int id = TruthId.of(TruthId.Kind.TOWER, index);
    // a joint-use tower's own steel is the corridor's: here only the feeder's frame on it
    long side = scene.jointUse(index) ? 0
        : (long) Math.floor(POLE_PER_METRE * scale * p.heightM() + rng.nextDouble());
    for (long k = 0; k < side; k++) {
      double a = rng.nextDouble(0, 2 * Math.PI);
      double z = p.groundZ() + p.heightM() * Math.sqrt(rng.nextDouble());
      out.emit(p.x() + p.radiusM() * Math.cos(a), p.y() + p.radiusM() * Math.sin(a), z, POLE,
          id, 2000 + rng.nextInt(3000), 1, 2);
    }
    for (int k = 0; k < (scene.jointUse(index) ? 0 : 2); k++) {
      out.emit(p.x() + p.radiusM() * rng.nextDouble(-0.7, 0.7),
          p.y() + p.radiusM() * rng.nextDouble(-0.7, 0.7), p.topZ(), POLE, id, 3000, 1, 2);
    }
    double maxOff = 0;
    double minOff = 0;
    Framing framing = scene.framingAt(index);
    for (FeederScene.Position pos : scene.positionsAt(index)) {
      if (!pos.neutral()) {
        maxOff = Math.max(maxOff, pos.offsetM());
        minOff = Math.min(minOff, pos.offsetM());
      }
    }
    if (framing != Framing.VERTICAL) {
      double z = p.topZ() - 0.6;
      segment(p, minOff - 0.15, z, maxOff + 0.15, z, ARM_PER_METRE * scale, POLE, id, rng, out);
    }
    int ins = TruthId.of(TruthId.Kind.INSULATOR, index);
    for (FeederScene.Position pos : scene.positionsAt(index)) {
      double z = p.topZ() - pos.belowTopM();
      segment(p, pos.offsetM(), z - 0.25, pos.offsetM(), z - 0.05, 10 * scale, INSULATOR, ins,
          rng, out);
      if (framing == Framing.VERTICAL || pos.neutral()) {
        segment(p, 0, z - 0.1, pos.offsetM(), z - 0.1, 6 * scale, POLE, id, rng, out);
      }
    }
  }

  /** Points on a straight piece in the pole's cross-section: (offset, elevation) to (.., ..). */
  private void segment(FeederPole p, double o1, double z1, double o2, double z2, double perMetre,
      int cls, int id, SplittableRandom rng, ChunkEmitter out) {
    double len = Math.hypot(o2 - o1, z2 - z1);
    long n = (long) Math.floor(perMetre * len + rng.nextDouble());
    for (long k = 0; k < n; k++) {
      double u = rng.nextDouble();
      double o = o1 + u * (o2 - o1);
      double z = z1 + u * (z2 - z1) + STEEL_SIGMA_M * rng.nextGaussian();
      double a = STEEL_SIGMA_M * rng.nextGaussian();
      out.emit(p.x() + o * p.acrossX() + a * p.alongX(), p.y() + o * p.acrossY()
          + a * p.alongY(), z, cls, id, 2500 + rng.nextInt(3000), 1, 1);
    }
  }
}
