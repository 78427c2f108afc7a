package org.clearance.examples;

import java.util.List;
import java.util.SplittableRandom;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * Samples the thin objects of one span the way airborne lidar catches them: points along each
 * conductor (1-4 per metre, 2-5 cm noise, gaps), jumpers at dead-ends, the steel members and
 * insulators of the span's start tower (and of the last tower on the last span), and birds.
 */
final class ObjectPoints {
  /** ASPRS classes (check-values.md section 1). */
  static final int TOWER = 15;
  static final int INSULATOR = 16;
  /** Points per metre of tower member and of insulator at the default density. */
  private static final double TOWER_PER_METRE = 1.2;
  private static final double INSULATOR_PER_METRE = 4.0;
  private static final double JUMPER_PER_METRE = 3.0;
  /** Point noise on steel and insulators, m. */
  private static final double STEEL_SIGMA_M = 0.03;
  /** Sag of a jumper loop below the line joining its ends, m. */
  static final double JUMPER_SAG_M = 1.5;
  /**
   * Share of wire returns marked first of two (the pulse went on to the ground; that return is
   * not simulated separately, the ground is sampled by its own pulses).
   */
  private static final double WIRE_FIRST_OF_TWO = 0.6;
  /** Scatter of a bird's points, m. */
  private static final double BIRD_SIGMA_M = 0.08;

  private final DemoScene scene;
  private final Corridor corridor;
  private final double scale;
  private final boolean[] covering;

  ObjectPoints(DemoScene scene) {
    this.scene = scene;
    this.corridor = scene.corridor();
    this.scale = scene.options().pointDensity() / DemoOptions.DEFAULT_DENSITY;
    this.covering = new boolean[scene.strips().size()];
  }

  void generate(int span, SplittableRandom rng, ChunkEmitter out) {
    DemoSpan sp = scene.spans().get(span);
    for (int k = 0; k < sp.wires().size(); k++) {
      wire(span, k, sp.wires().get(k), rng, out);
    }
    structure(span, span, rng, out);
    if (span == scene.spans().size() - 1) {
      structure(span, span + 1, rng, out);
    }
    for (DemoBird b : scene.birds()) {
      if (b.span() == span) {
        int id = TruthId.of(TruthId.Kind.BIRD, b.id());
        for (int k = 0; k < b.pointCount(); k++) {
          double x = b.x() + BIRD_SIGMA_M * rng.nextGaussian();
          double y = b.y() + BIRD_SIGMA_M * rng.nextGaussian();
          double z = b.z() + BIRD_SIGMA_M * rng.nextGaussian();
          pulse(span, x, y, rng, out);
          out.emit(x, y, z, ClassificationMode.UNCLASSIFIED_CLASS, id, 9000 + rng.nextInt(4000),
              1, 1);
        }
      }
    }
  }

  private void wire(int span, int index, DemoWire w, SplittableRandom rng, ChunkEmitter out) {
    ConductorCurve curve = w.curve();
    Catenary k = curve.curve();
    double arc = k.arcLength(0, curve.length());
    double sinhA = Math.sinh(-k.s0() / k.c());
    long count = (long) Math.floor(w.pointsPerMetre() * arc + rng.nextDouble());
    int cls = w.role() == DemoPosition.Role.PHASE ? ClassificationMode.CONDUCTOR_CLASS
        : ClassificationMode.SHIELD_CLASS;
    int id = TruthId.wire(span, index);
    double sigma = w.noiseSigmaM();
    double swing = SurveyWind.swingRad(scene.options(), span);
    double[] a = {curve.x(0), curve.y(0), curve.zA()};
    double[] b = {curve.x(curve.length()), curve.y(curve.length()), curve.zB()};
    for (long j = 0; j < count; j++) {
      double l = rng.nextDouble(0, arc);
      double s = k.s0() + k.c() * asinh(l / k.c() + sinhA); // station at arc length l
      if (w.inGap(s)) {
        continue;
      }
      double[] q = {curve.x(s), curve.y(s), curve.z(s)};
      if (swing != 0) {
        SurveyWind.rotate(q, a, b, swing);
      }
      double x = q[0] + sigma * rng.nextGaussian();
      double y = q[1] + sigma * rng.nextGaussian();
      double z = q[2] + sigma * rng.nextGaussian();
      pulse(span, x, y, rng, out);
      int returns = rng.nextDouble() < WIRE_FIRST_OF_TWO ? 2 : 1;
      out.emit(x, y, z, cls, id, 5000 + rng.nextInt(5000), 1, returns);
    }
  }

  private static double asinh(double v) {
    return Math.log(v + Math.sqrt(v * v + 1));
  }

  /** Tower, insulators and (at interior dead-ends) jumpers of structure t, sampled with span. */
  private void structure(int span, int t, SplittableRandom rng, ChunkEmitter out) {
    DemoStructure st = scene.structures().get(t);
    List<DemoPosition> positions = scene.positions();
    double arm = TowerGeometry.armHalfLength(st, positions);
    int towerId = TruthId.of(TruthId.Kind.TOWER, t);
    for (double[] m : TowerGeometry.members(st, arm)) {
      segment(span, m, TOWER_PER_METRE * scale, TOWER, towerId, 20000, rng, out);
    }
    int n = scene.spans().size();
    int insulatorId = TruthId.of(TruthId.Kind.INSULATOR, t);
    for (int p = 0; p < positions.size(); p++) {
      DemoPosition pos = positions.get(p);
      if (pos.role() != DemoPosition.Role.PHASE) {
        continue;
      }
      double[] hang = TowerGeometry.hangPoint(st, pos);
      double[] back = t > 0 ? endB(t - 1, p) : null;
      double[] ahead = t < n ? endA(t, p) : null;
      if (st.type() == DemoStructure.Type.SUSPENSION) {
        segment(span, join(hang, ahead), INSULATOR_PER_METRE * scale, INSULATOR, insulatorId,
            16000, rng, out);
        continue;
      }
      if (back != null) {
        segment(span, join(hang, back), INSULATOR_PER_METRE * scale, INSULATOR, insulatorId,
            16000, rng, out);
      }
      if (ahead != null) {
        segment(span, join(hang, ahead), INSULATOR_PER_METRE * scale, INSULATOR, insulatorId,
            16000, rng, out);
      }
      if (back != null && ahead != null) {
        jumper(span, back, ahead, TruthId.of(TruthId.Kind.JUMPER,
            t * TruthId.WIRES_PER_SPAN + p), rng, out);
      }
    }
  }

  private double[] endA(int span, int wire) {
    ConductorCurve c = scene.spans().get(span).wires().get(wire).curve();
    return new double[] {c.x(0), c.y(0), c.zA()};
  }

  private double[] endB(int span, int wire) {
    ConductorCurve c = scene.spans().get(span).wires().get(wire).curve();
    return new double[] {c.x(c.length()), c.y(c.length()), c.zB()};
  }

  private static double[] join(double[] a, double[] b) {
    return new double[] {a[0], a[1], a[2], b[0], b[1], b[2]};
  }

  private void segment(int span, double[] m, double perMetre, int cls, int id, int intensity,
      SplittableRandom rng, ChunkEmitter out) {
    double len = Math.sqrt(sq(m[3] - m[0]) + sq(m[4] - m[1]) + sq(m[5] - m[2]));
    long count = (long) Math.floor(perMetre * len + rng.nextDouble());
    for (long j = 0; j < count; j++) {
      double u = rng.nextDouble();
      double x = m[0] + u * (m[3] - m[0]) + STEEL_SIGMA_M * rng.nextGaussian();
      double y = m[1] + u * (m[4] - m[1]) + STEEL_SIGMA_M * rng.nextGaussian();
      double z = m[2] + u * (m[5] - m[2]) + STEEL_SIGMA_M * rng.nextGaussian();
      pulse(span, x, y, rng, out);
      out.emit(x, y, z, cls, id, intensity + rng.nextInt(8000), 1, 1);
    }
  }

  private void jumper(int span, double[] a, double[] b, int id, SplittableRandom rng,
      ChunkEmitter out) {
    double len = Math.sqrt(sq(b[0] - a[0]) + sq(b[1] - a[1]) + sq(b[2] - a[2]));
    long count = (long) Math.floor(JUMPER_PER_METRE * scale * (len + 2) + rng.nextDouble());
    for (long j = 0; j < count; j++) {
      double u = rng.nextDouble();
      double x = a[0] + u * (b[0] - a[0]) + STEEL_SIGMA_M * rng.nextGaussian();
      double y = a[1] + u * (b[1] - a[1]) + STEEL_SIGMA_M * rng.nextGaussian();
      double z = a[2] + u * (b[2] - a[2]) - 4 * JUMPER_SAG_M * u * (1 - u)
          + STEEL_SIGMA_M * rng.nextGaussian();
      pulse(span, x, y, rng, out);
      out.emit(x, y, z, ClassificationMode.CONDUCTOR_CLASS, id, 5000 + rng.nextInt(5000), 1, 1);
    }
  }

  /** Sets the pulse attributes for an object point: a random strip among those covering it. */
  private void pulse(int span, double x, double y, SplittableRandom rng, ChunkEmitter out) {
    double e = corridor.offset(span, x, y);
    double ch = corridor.chainage(span, x, y);
    List<FlightStrip> strips = scene.strips();
    int n = 0;
    for (int k = 0; k < strips.size(); k++) {
      covering[k] = strips.get(k).covers(e, ch);
      n += covering[k] ? 1 : 0;
    }
    int pick = n == 0 ? -1 : rng.nextInt(n);
    FlightStrip chosen = strips.get(0);
    for (int k = 0; k < strips.size() && pick >= 0; k++) {
      if (covering[k] && pick-- == 0) {
        chosen = strips.get(k);
      }
    }
    out.pulse(chosen, ch, e, rng.nextInt(2));
  }

  private static double sq(double v) {
    return v * v;
  }
}
