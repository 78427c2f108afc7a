package org.clearance.examples;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.clearance.wire.ConductorCurve;

/**
 * The man-made objects the labelling tests stand beside the line ({@link DemoOptions#manMade()}),
 * in span 1 (span 0 of a one-span scene): a tower crane whose jib reaches over the conductors
 * with its hoist rope hanging between two phases, a chain-link fence along the right-of-way, and
 * a flat-roofed shed under the line (a {@link DemoBuilding}, sampled with the other roofs). The
 * crane and the fence are unclassified (1) in every mode, as vendors leave such objects; their
 * truth kind is {@link TruthId.Kind#MAN_MADE} with index {@link #CRANE} or {@link #FENCE}.
 *
 * <p>Steel is sampled as side returns along each member, the way oblique pulses catch a lattice;
 * {@link #STEEL_PER_METRE} gives the crane about as many points as the open tile's crane of the
 * same height (about 1 200, docs/labelling.md), not a sensor model.
 */
final class ManMadeFixtures {
  /** Truth index of the crane and of the fence. */
  static final int CRANE = 0;
  static final int FENCE = 1;
  /** Points per metre of crane member and of fence post or rail. */
  static final double STEEL_PER_METRE = 4.0;
  /** Points per square metre of fence mesh. */
  static final double MESH_PER_M2 = 2.0;
  /** Point noise on steel, m (as the towers'). */
  static final double STEEL_SIGMA_M = 0.03;
  /** Share of steel returns that are first of two (the pulse goes on to the ground). */
  static final double FIRST_OF_TWO = 0.6;
  /** Crane: mast width, plan distance of the mast beyond the outer phase, height of the jib's
   * underside above that phase at the crane, jib and counter-jib lengths, jib depth, where the
   * hoist rope hangs along the jib and how far above the phase it ends, m. */
  static final double MAST_WIDTH_M = 1.6;
  static final double MAST_BEYOND_M = 9.0;
  static final double JIB_ABOVE_M = 4.5;
  static final double JIB_M = 18.0;
  static final double COUNTER_JIB_M = 6.0;
  static final double JIB_DEPTH_M = 1.2;
  static final double HOIST_AT_M = 12.0;
  static final double HOIST_ABOVE_M = 1.5;
  /** Fence: distance beyond the other outer phase, length, height and post spacing, m. */
  static final double FENCE_BEYOND_M = 4.0;
  static final double FENCE_M = 60.0;
  static final double FENCE_HEIGHT_M = 2.0;
  static final double POST_SPACING_M = 3.0;
  /** Shed: plan length and width, roof height, m; it stands under the middle phase. */
  static final double SHED_LENGTH_M = 10.0;
  static final double SHED_WIDTH_M = 6.0;
  static final double SHED_HEIGHT_M = 5.0;

  /** A straight member from one end to the other, m. */
  record Member(double x1, double y1, double z1, double x2, double y2, double z2) {
    double length() {
      return Math.sqrt((x2 - x1) * (x2 - x1) + (y2 - y1) * (y2 - y1) + (z2 - z1) * (z2 - z1));
    }
  }

  private final int span;
  private final List<Member> crane = new ArrayList<>();
  private final List<Member> fencePosts = new ArrayList<>();
  private final double[] fence;
  private final DemoBuilding shed;

  /**
   * Plans the fixtures of a line.
   *
   * @param spans the line's spans
   * @param terrain the ground
   * @param shedId the id the shed gets in the scene's building list
   */
  ManMadeFixtures(List<DemoSpan> spans, Terrain terrain, int shedId) {
    span = Math.min(1, spans.size() - 1);
    DemoSpan sp = spans.get(span);
    double l = sp.lengthM();
    ConductorCurve a = sp.wire("A").curve();
    ConductorCurve b = sp.wire("B").curve();
    ConductorCurve c = sp.wire("C").curve();
    double ux = (b.x(l) - b.x(0)) / l;
    double uy = (b.y(l) - b.y(0)) / l;
    double s = 0.5 * l;
    double nx = a.x(s) - b.x(s);
    double ny = a.y(s) - b.y(s);
    double nn = Math.hypot(nx, ny);
    nx /= nn;
    ny /= nn;
    // Crane beyond phase A, jib pointing over the line.
    double mx = a.x(s) + MAST_BEYOND_M * nx;
    double my = a.y(s) + MAST_BEYOND_M * ny;
    double base = terrain.z(mx, my);
    double jibZ = a.z(s) + JIB_ABOVE_M;
    double h = 0.5 * MAST_WIDTH_M;
    double[][] corner = {{h, h}, {h, -h}, {-h, -h}, {-h, h}};
    for (int k = 0; k < 4; k++) {
      double[] p = corner[k];
      double[] q = corner[(k + 1) % 4];
      double px = mx + p[0] * ux + p[1] * nx;
      double py = my + p[0] * uy + p[1] * ny;
      double qx = mx + q[0] * ux + q[1] * nx;
      double qy = my + q[0] * uy + q[1] * ny;
      crane.add(new Member(px, py, base, px, py, jibZ + JIB_DEPTH_M));
      for (double z = base; z + MAST_WIDTH_M <= jibZ; z += MAST_WIDTH_M) {
        crane.add(new Member(px, py, z, qx, qy, z + MAST_WIDTH_M));
      }
    }
    // Jib (two lower chords, one upper) over the line and the counter-jib behind the mast.
    for (double sign : new double[] {-1, 1}) {
      crane.add(new Member(mx + sign * h * ux + COUNTER_JIB_M * nx,
          my + sign * h * uy + COUNTER_JIB_M * ny, jibZ,
          mx + sign * h * ux - JIB_M * nx, my + sign * h * uy - JIB_M * ny, jibZ));
    }
    crane.add(new Member(mx + COUNTER_JIB_M * nx, my + COUNTER_JIB_M * ny, jibZ + JIB_DEPTH_M,
        mx - JIB_M * nx, my - JIB_M * ny, jibZ + JIB_DEPTH_M));
    for (double d = -COUNTER_JIB_M; d + MAST_WIDTH_M <= JIB_M; d += MAST_WIDTH_M) {
      double sign = Math.floor(d / MAST_WIDTH_M) % 2 == 0 ? 1 : -1;
      crane.add(new Member(mx + sign * h * ux - d * nx, my + sign * h * uy - d * ny, jibZ,
          mx - (d + MAST_WIDTH_M) * nx, my - (d + MAST_WIDTH_M) * ny, jibZ + JIB_DEPTH_M));
    }
    double hx = mx - HOIST_AT_M * nx;
    double hy = my - HOIST_AT_M * ny;
    crane.add(new Member(hx, hy, jibZ, hx, hy, a.z(s) + HOIST_ABOVE_M));
    // Fence beyond phase C, along the line from 30 % of the span.
    double f0 = 0.3 * l;
    double fx = c.x(f0) - FENCE_BEYOND_M * nx;
    double fy = c.y(f0) - FENCE_BEYOND_M * ny;
    fence = new double[] {fx, fy, fx + FENCE_M * ux, fy + FENCE_M * uy};
    for (double d = 0; d <= FENCE_M; d += POST_SPACING_M) {
      double px = fx + d * ux;
      double py = fy + d * uy;
      double g = terrain.z(px, py);
      fencePosts.add(new Member(px, py, g, px, py, g + FENCE_HEIGHT_M));
    }
    // Shed under phase B at 70 % of the span.
    double sx = b.x(0.7 * l);
    double sy = b.y(0.7 * l);
    double az = Math.atan2(ux, uy);
    double low = Double.POSITIVE_INFINITY;
    for (double[] p : new double[][] {{1, 1}, {1, -1}, {-1, -1}, {-1, 1}}) {
      low = Math.min(low, terrain.z(sx + 0.5 * (p[0] * SHED_LENGTH_M * ux
          + p[1] * SHED_WIDTH_M * nx), sy + 0.5 * (p[0] * SHED_LENGTH_M * uy
          + p[1] * SHED_WIDTH_M * ny)));
    }
    shed = new DemoBuilding(shedId, sx, sy, SHED_LENGTH_M, SHED_WIDTH_M, az, low, SHED_HEIGHT_M,
        SHED_HEIGHT_M, DemoBuilding.Roof.FLAT, span);
  }

  /** The shed, to stand among the scene's buildings. */
  DemoBuilding shed() {
    return shed;
  }

  /** The span the fixtures stand in. */
  int span() {
    return span;
  }

  /** The crane's members (truth). */
  List<Member> crane() {
    return List.copyOf(crane);
  }

  /** Emits the crane's and the fence's points when {@code index} is their span. */
  void generate(int index, SplittableRandom rng, ChunkEmitter out, FlightStrip strip,
      Corridor corridor, Terrain terrain) {
    if (index != span) {
      return;
    }
    int craneId = TruthId.of(TruthId.Kind.MAN_MADE, CRANE);
    int fenceId = TruthId.of(TruthId.Kind.MAN_MADE, FENCE);
    for (Member m : crane) {
      steel(m, craneId, rng, out, strip, corridor);
    }
    for (Member m : fencePosts) {
      steel(m, fenceId, rng, out, strip, corridor);
    }
    double len = Math.hypot(fence[2] - fence[0], fence[3] - fence[1]);
    long mesh = (long) Math.floor(MESH_PER_M2 * len * FENCE_HEIGHT_M + rng.nextDouble());
    for (long k = 0; k < mesh; k++) {
      double t = rng.nextDouble();
      double x = fence[0] + t * (fence[2] - fence[0]);
      double y = fence[1] + t * (fence[3] - fence[1]);
      double z = terrain.z(x, y) + rng.nextDouble() * FENCE_HEIGHT_M;
      emit(x, y, z, fenceId, rng, out, strip, corridor);
    }
  }

  private void steel(Member m, int id, SplittableRandom rng, ChunkEmitter out, FlightStrip strip,
      Corridor corridor) {
    long n = (long) Math.floor(STEEL_PER_METRE * m.length() + rng.nextDouble());
    for (long k = 0; k < n; k++) {
      double t = rng.nextDouble();
      emit(m.x1() + t * (m.x2() - m.x1()) + STEEL_SIGMA_M * rng.nextGaussian(),
          m.y1() + t * (m.y2() - m.y1()) + STEEL_SIGMA_M * rng.nextGaussian(),
          m.z1() + t * (m.z2() - m.z1()) + STEEL_SIGMA_M * rng.nextGaussian(), id, rng, out,
          strip, corridor);
    }
  }

  private void emit(double x, double y, double z, int id, SplittableRandom rng, ChunkEmitter out,
      FlightStrip strip, Corridor corridor) {
    out.pulse(strip, corridor.chainage(span, x, y), corridor.offset(span, x, y), rng.nextInt(2));
    int returns = rng.nextDouble() < FIRST_OF_TWO ? 2 : 1;
    out.emit(x, y, z, ClassificationMode.UNCLASSIFIED_CLASS, id, 3000 + rng.nextInt(3000), 1,
        returns);
  }
}
