package org.clearance.wire;

import java.util.List;
import java.util.Random;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.line.SpanFrame;
import org.clearance.survey.PointChunk;

/**
 * A small seeded corridor for finder tests, with its truth: straight structures on a tilted
 * ground plane, catenary wires between them (optionally swung, bundled, with gaps), lattice
 * towers, tree crowns, a house, and the vendor's stray wire labels on its roof and on a crown.
 * Classes follow one of three modes: everything labelled, wires unlabelled, all unclassified.
 */
final class SyntheticCorridor implements PointSource, HeightModel {

  /** How the points are classified. */
  enum Mode { LABELLED, WIRES_UNLABELLED, UNCLASSIFIED }

  /**
   * One conductor position.
   *
   * @param name position name
   * @param shield true for a shield wire (class 13)
   * @param offset offset from the centre line, m, positive to the left
   * @param height attachment height above the structure's ground, m
   * @param c catenary constant, m
   * @param perMetre points per metre of wire
   * @param bundle sub-conductors (1; 2 side by side; 4 in a square)
   * @param spacing sub-conductor spacing, m
   */
  record Position(String name, boolean shield, double offset, double height, double c,
      double perMetre, int bundle, double spacing) {}

  static final double GROUND_Z0 = 120;
  static final double GROUND_SLOPE_X = 0.02;
  static final double NOISE = 0.03;

  final double[] tx;
  final double[] ty;
  final double[] towerHeight;
  final List<Position> positions;
  final Mode mode;
  final long seed;
  /** Per span and position: a gap [from, to] in stations (empty array for none). */
  final double[][][] gaps;
  /** Per span: swing of every wire while surveyed, radians. */
  final double[] swing;

  SyntheticCorridor(double[] tx, double[] ty, double[] towerHeight, List<Position> positions,
      Mode mode, long seed, double[][][] gaps, double[] swing) {
    this.tx = tx;
    this.ty = ty;
    this.towerHeight = towerHeight;
    this.positions = List.copyOf(positions);
    this.mode = mode;
    this.seed = seed;
    this.gaps = gaps;
    this.swing = swing;
  }

  /** A three-phase line with two shield wires, like many 230 kV lines, on spans of 300 m. */
  static SyntheticCorridor standard(Mode mode, long seed) {
    int n = 4;
    double[] x = new double[n];
    double[] y = new double[n];
    double[] h = new double[n];
    for (int i = 0; i < n; i++) {
      x[i] = 500_000 + 300 * i * 0.8;
      y[i] = 4_000_000 + 300 * i * 0.6;
      h[i] = i == 2 ? 6 : 0; // a body extension at the third structure
    }
    return new SyntheticCorridor(x, y, h, standardPositions(), mode, seed,
        new double[n - 1][5][0], new double[n - 1]);
  }

  static List<Position> standardPositions() {
    return List.of(
        new Position("A", false, 7.0, 20.0, 1500, 3, 1, 0),
        new Position("B", false, 0.0, 20.0, 1500, 3, 1, 0),
        new Position("C", false, -7.0, 20.0, 1500, 3, 1, 0),
        new Position("SW1", true, 4.5, 28.0, 1700, 1.5, 1, 0),
        new Position("SW2", true, -4.5, 28.0, 1700, 1.5, 1, 0));
  }

  double groundZ(double x, double y) {
    return GROUND_Z0 + GROUND_SLOPE_X * (x - 500_000);
  }

  @Override
  public double heightAboveGround(double x, double y, double z) {
    return z - groundZ(x, y);
  }

  int spans() {
    return tx.length - 1;
  }

  SpanFrame frame(int span) {
    return SpanFrame.between(tx[span], ty[span], tx[span + 1], ty[span + 1]);
  }

  /** The true curve (bundle centre) of a position in a span, vertical plane. */
  ConductorCurve truth(int span, Position p) {
    SpanFrame f = frame(span);
    double ax = f.x(0, p.offset());
    double ay = f.y(0, p.offset());
    double bx = f.x(f.length(), p.offset());
    double by = f.y(f.length(), p.offset());
    double za = groundZ(tx[span], ty[span]) + towerHeight[span] + p.height();
    double zb = groundZ(tx[span + 1], ty[span + 1]) + towerHeight[span + 1] + p.height();
    SpanFrame plan = SpanFrame.between(ax, ay, bx, by);
    return new ConductorCurve(plan, Catenary.through(0, za, plan.length(), zb, p.c()));
  }

  private int cls(int labelled) {
    switch (mode) {
      case LABELLED:
        return labelled;
      case WIRES_UNLABELLED:
        return labelled == 13 || labelled == 14 ? 1 : labelled;
      default:
        return 1;
    }
  }

  @Override
  public void stream(java.util.function.Supplier<Consumer<PointChunk>> consumers) {
    Consumer<PointChunk> out = consumers.get();
    Random r = new Random(seed);
    PointChunk chunk = new PointChunk(8192);
    Emitter e = (x, y, z, c) -> {
      if (chunk.isFull()) {
        out.accept(chunk);
        chunk.reset(0, 0);
      }
      chunk.add(x, y, z, cls(c));
    };
    for (int k = 0; k < spans(); k++) {
      ground(k, e);
      for (int j = 0; j < positions.size(); j++) {
        wire(k, j, r, e);
      }
      trees(k, r, e);
    }
    for (int i = 0; i < tx.length; i++) {
      tower(i, r, e);
    }
    house(r, e);
    if (chunk.size() > 0) {
      out.accept(chunk);
    }
  }

  interface Emitter {
    void emit(double x, double y, double z, int cls);
  }

  private void ground(int k, Emitter e) {
    SpanFrame f = frame(k);
    for (double s = 0; s < f.length(); s += 2) {
      for (double o = -30; o <= 30; o += 2) {
        double x = f.x(s, o);
        double y = f.y(s, o);
        e.emit(x, y, groundZ(x, y), 2);
      }
    }
  }

  private void wire(int k, int j, Random r, Emitter e) {
    Position p = positions.get(j);
    ConductorCurve t = truth(k, p);
    double len = t.length();
    int n = (int) (p.perMetre() * len);
    double phi = swing[k];
    double[] gap = gaps[k][j];
    for (int i = 0; i < n; i++) {
      double s = len * r.nextDouble();
      if (s < 2 || s > len - 2 || (gap.length == 2 && s >= gap[0] && s <= gap[1])) {
        continue;
      }
      double d = t.curve().sagBelowChord(0, len, s);
      double sub = p.bundle() > 1 ? (r.nextBoolean() ? 0.5 : -0.5) * p.spacing() : 0;
      // a quad bundle is a square: sub-conductors also half a spacing above and below
      double up = p.bundle() == 4 ? (r.nextBoolean() ? 0.5 : -0.5) * p.spacing() : 0;
      double lateral = sub + d * Math.sin(phi);
      double chordZ = t.zA() + (t.zB() - t.zA()) * s / len;
      double z = chordZ - d * Math.cos(phi);
      double x = t.plan().x(s, lateral) + NOISE * r.nextGaussian();
      double y = t.plan().y(s, lateral) + NOISE * r.nextGaussian();
      e.emit(x, y, z + up + NOISE * r.nextGaussian(), p.shield() ? 13 : 14);
    }
  }

  /** Crowns beside and under the line, one reaching within 4 m of phase C mid-span. */
  private void trees(int k, Random r, Emitter e) {
    SpanFrame f = frame(k);
    double[][] crowns = {{80, -18, 14}, {150, -9, 11}, {220, 16, 15}, {260, 24, 12}};
    for (double[] c : crowns) {
      double x0 = f.x(c[0], c[1]);
      double y0 = f.y(c[0], c[1]);
      double top = groundZ(x0, y0) + c[2];
      for (int i = 0; i < 600; i++) {
        double a = 2 * Math.PI * r.nextDouble();
        double rad = 3 * Math.sqrt(r.nextDouble());
        double x = x0 + rad * Math.cos(a);
        double y = y0 + rad * Math.sin(a);
        double z = top - 5 * r.nextDouble() * (0.4 + rad / 3);
        int cls = k == 1 && c[0] == 150 && z > top - 1 ? 14 : 5; // stray labels on one crown
        e.emit(x, y, z, cls);
      }
    }
  }

  /** A lattice tower: four legs, a cross arm, a peak frame (class 15). */
  private void tower(int i, Random r, Emitter e) {
    SpanFrame f = frame(Math.min(i, spans() - 1));
    double s0 = i == spans() ? f.length() : 0;
    double g = groundZ(tx[i], ty[i]);
    double top = towerHeight[i] + 30;
    for (double z = 0; z < top; z += 0.5) {
      double w = 3.5 * (1 - z / top) + 0.8;
      for (int leg = 0; leg < 4; leg++) {
        double ds = (leg < 2 ? -1 : 1) * w;
        double de = (leg % 2 == 0 ? -1 : 1) * w;
        e.emit(f.x(s0 + ds, de), f.y(s0 + ds, de), g + z, 15);
      }
    }
    for (double o = -8; o <= 8; o += 0.4) {
      e.emit(f.x(s0, o), f.y(s0, o), g + towerHeight[i] + 22, 15);
    }
  }

  /** A house with a gable roof 12-20 m off the line, stray wire labels on its ridge. */
  private void house(Random r, Emitter e) {
    SpanFrame f = frame(0);
    for (int i = 0; i < 800; i++) {
      double s = 100 + 12 * r.nextDouble();
      double o = 12 + 8 * r.nextDouble();
      double x = f.x(s, o);
      double y = f.y(s, o);
      double z = groundZ(x, y) + 7 - 0.5 * Math.abs(o - 16);
      e.emit(x, y, z, Math.abs(o - 16) < 0.8 && s < 103 ? 14 : 6);
    }
  }
}
