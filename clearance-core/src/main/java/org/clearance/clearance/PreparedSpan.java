package org.clearance.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.line.SpanFrame;
import org.clearance.wire.Catenary;
import org.clearance.wire.ConductorCurve;

/**
 * A span made ready for the engine's inner loop: its measuring box in the span frame and one
 * distance kernel per conductor per condition. Immutable; shared between worker threads.
 */
final class PreparedSpan {

  final int index;
  final SpanModel model;
  final SpanFrame frame;
  final double sMin;
  final double sMax;
  final double eMin;
  final double eMax;
  final double zMin;
  final double zMax;
  /** Extra plan margin of the tree region beyond the measuring box, m. */
  final double treePad;
  /** [condition][conductor]; null where the condition is not available for the conductor. */
  final CatenaryDistance[][] kernels;
  final double[][] swingMin;
  final double[][] swingMax;
  /**
   * Per condition and conductor, for cheap lower bounds: the conductor's plan frame, how far it
   * can move sideways by swinging (m), and its lowest elevation (m).
   */
  final SpanFrame[][] plans;
  final double[][] sideReach;
  final double[][] lowest;
  /** Catenary of each state (vertex station and elevation, constant), for the tangent bound. */
  final double[][] vertexS;
  final double[][] vertexZ;
  final double[][] constant;
  final String[] names;
  /** Role of each conductor: a wire of no known role counts as energised (issue 15). */
  final Role[] roles;
  /** Per role ordinal, whether a conductor of the span has it. */
  private final boolean[] present = new boolean[Role.values().length];
  /**
   * Cross-arm boxes at the span's two structures, in the span frame: per end (0 at the first
   * structure, 1 at the second) the least and largest offset, the lowest elevation and the
   * largest distance along the line from the structure of the surveyed conductors' ends there
   * (m); NaN where no conductor ends there.
   */
  final double[] armAlong = {Double.NaN, Double.NaN};
  final double[] armELo = {Double.NaN, Double.NaN};
  final double[] armEHi = {Double.NaN, Double.NaN};
  final double[] armZLo = {Double.NaN, Double.NaN};

  /** Station bin of the conductor floor, m: a fraction of a span, a few tree crowns long. */
  static final double FLOOR_BIN_M = 5.0;
  /** Rounding allowance of the floor, m: far above double rounding, far below any clearance. */
  static final double FLOOR_MARGIN_M = 1e-3;

  /** The measuring box margin, m. */
  private final double reach;
  /**
   * Per {@link #FLOOR_BIN_M} bin of span station from {@link #sMin}: the lowest elevation of any
   * conductor, in any condition and any swing, whose span station lies within the reach of the
   * bin, less {@link #FLOOR_MARGIN_M} (m; +infinity where no conductor is that near).
   */
  private final double[] floor;
  /** Per condition, whether a phase (energised) conductor has a state in it. */
  final boolean[] phaseIn;

  /**
   * @param reach measuring box margin around the conductors in every condition, m
   * @param treeReach plan margin of the region where trees are collected, m (&gt;= reach)
   */
  PreparedSpan(int index, SpanModel model, int conditions, double reach, double treeReach) {
    this.index = index;
    this.model = model;
    this.frame = model.span().frame();
    int n = model.conductors().size();
    kernels = new CatenaryDistance[conditions][n];
    swingMin = new double[conditions][n];
    swingMax = new double[conditions][n];
    plans = new SpanFrame[conditions][n];
    sideReach = new double[conditions][n];
    lowest = new double[conditions][n];
    vertexS = new double[conditions][n];
    vertexZ = new double[conditions][n];
    constant = new double[conditions][n];
    names = new String[n];
    roles = new Role[n];
    phaseIn = new boolean[conditions];
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    double zLo = Double.POSITIVE_INFINITY;
    double zHi = Double.NEGATIVE_INFINITY;
    double sLo = 0;
    double sHi = model.span().lengthM();
    for (int j = 0; j < n; j++) {
      ConductorModel conductor = model.conductors().get(j);
      names[j] = conductor.name();
      roles[j] = Role.ofName(conductor.role());
      present[roles[j].ordinal()] = true;
      for (int k = 0; k < conditions; k++) {
        Optional<ConductorState> state = k < conductor.states().size()
            ? conductor.states().get(k) : Optional.empty();
        if (state.isEmpty()) {
          continue;
        }
        ConductorState st = state.get();
        ConductorCurve curve = st.curve();
        kernels[k][j] = new CatenaryDistance(curve);
        phaseIn[k] |= roles[j] == Role.PHASE;
        swingMin[k][j] = st.swingMin();
        swingMax[k][j] = st.swingMax();
        double sag = maxSag(curve);
        double sideways = st.swings() ? sag : 0;
        plans[k][j] = curve.plan();
        sideReach[k][j] = sag * Math.sin(Math.max(-st.swingMin(), st.swingMax()));
        lowest[k][j] = lowestZ(curve);
        vertexS[k][j] = curve.curve().s0();
        vertexZ[k][j] = curve.curve().z0();
        constant[k][j] = curve.curve().c();
        for (double s : new double[] {0, curve.length()}) {
          double x = curve.x(s);
          double y = curve.y(s);
          double e = frame.offset(x, y);
          double st0 = frame.station(x, y);
          lo = Math.min(lo, e - sideways);
          hi = Math.max(hi, e + sideways);
          sLo = Math.min(sLo, st0);
          sHi = Math.max(sHi, st0);
          zHi = Math.max(zHi, curve.z(s));
        }
        zLo = Math.min(zLo, lowestZ(curve));
        if (k == 0) {
          for (double s : new double[] {0, curve.length()}) {
            double x = curve.x(s);
            double y = curve.y(s);
            int end = frame.station(x, y) < model.span().lengthM() / 2 ? 0 : 1;
            double e = frame.offset(x, y);
            double along = Math.abs(end == 0 ? frame.station(x, y)
                : frame.station(x, y) - model.span().lengthM());
            armAlong[end] = Double.isNaN(armAlong[end]) ? along : Math.max(armAlong[end], along);
            armELo[end] = Double.isNaN(armELo[end]) ? e : Math.min(armELo[end], e);
            armEHi[end] = Double.isNaN(armEHi[end]) ? e : Math.max(armEHi[end], e);
            armZLo[end] = Double.isNaN(armZLo[end]) ? curve.z(s)
                : Math.min(armZLo[end], curve.z(s));
          }
        }
      }
    }
    sMin = sLo - reach;
    sMax = sHi + reach;
    eMin = lo - reach;
    eMax = hi + reach;
    zMin = zLo - reach;
    zMax = zHi + reach;
    treePad = Math.max(0, treeReach - reach);
    this.reach = reach;
    floor = floors();
  }

  /**
   * True when a point at span station {@code s} and elevation {@code z} is farther than the
   * reach from every conductor in every condition: more than the reach below every conductor
   * point within the reach along the span (a point's distance is at least its station
   * difference along the span and at least its height difference; a catenary lies below its
   * chord, so swinging about the chord only raises it). One comparison; a screen before the
   * lower bounds of {@link #lowerBound}.
   */
  boolean belowFloor(double s, double z) {
    int b = (int) ((s - sMin) / FLOOR_BIN_M);
    return b >= 0 && b < floor.length && z < floor[b] - reach;
  }

  private double[] floors() {
    if (!(sMax > sMin)) {
      return new double[0];
    }
    double[] out = new double[(int) Math.ceil((sMax - sMin) / FLOOR_BIN_M)];
    java.util.Arrays.fill(out, Double.POSITIVE_INFINITY);
    for (CatenaryDistance[] row : kernels) {
      for (CatenaryDistance kernel : row) {
        if (kernel == null) {
          continue;
        }
        ConductorCurve curve = kernel.conductor();
        double length = curve.length();
        double t0 = frame.station(curve.x(0), curve.y(0));
        double t1 = frame.station(curve.x(length), curve.y(length));
        if (!(Math.abs(t1 - t0) > 0)) {
          java.util.Arrays.fill(out, Double.NEGATIVE_INFINITY); // no screen for this span
          return out;
        }
        for (int b = 0; b < out.length; b++) {
          // The conductor's own stations whose span stations lie within the reach of the bin;
          // span station is affine in the conductor's station (both straight in plan).
          double lo = sMin + b * FLOOR_BIN_M - reach;
          double hi = sMin + (b + 1) * FLOOR_BIN_M + reach;
          double u0 = length * (lo - t0) / (t1 - t0);
          double u1 = length * (hi - t0) / (t1 - t0);
          double from = Math.max(0, Math.min(u0, u1));
          double to = Math.min(length, Math.max(u0, u1));
          if (from > to) {
            continue;
          }
          // A catenary is convex: its least value on [from, to] is at an end or the vertex.
          double low = Math.min(curve.z(from), curve.z(to));
          double vertex = curve.curve().s0();
          if (vertex > from && vertex < to) {
            low = Math.min(low, curve.z(vertex));
          }
          out[b] = Math.min(out[b], low - FLOOR_MARGIN_M);
        }
      }
    }
    return out;
  }

  /** True when the span has at least one conductor to measure to. */
  boolean measurable() {
    return Double.isFinite(eMin);
  }

  /**
   * A lower bound of the distance from a point to conductor j in condition k, m.
   *
   * <p>A swinging conductor: the plan distance beyond its sideways reach, or the height below its
   * lowest point (a catenary lies below its chord, and swinging only raises it), whichever is
   * larger. A hanging one: the catenary is convex, so it lies above its tangent at the point's
   * station; a point below that tangent is at least its distance from the tangent line away in
   * the vertical plane, v / sqrt(1 + z'^2) for a vertical gap v, and combined with the offset
   * e from the plane, sqrt(e^2 + (v / sqrt(1 + z'^2))^2). The bound holds for the whole
   * (unclamped) catenary and so for the span's part of it.
   */
  double lowerBound(int k, int j, double x, double y, double z) {
    SpanFrame plan = plans[k][j];
    double e = plan.offset(x, y);
    if (sideReach[k][j] > 0) {
      double side = Math.abs(e) - sideReach[k][j];
      double below = lowest[k][j] - z;
      return Math.max(0, Math.max(side, below));
    }
    double c = constant[k][j];
    double t = (plan.station(x, y) - vertexS[k][j]) / c;
    double ex = Math.exp(t);
    double ch = 0.5 * (ex + 1 / ex);
    double v = vertexZ[k][j] + c * (ch - 1) - z; // gap below the curve at the point's station
    if (!(v > 0)) {
      return Math.abs(e);
    }
    double across = v / ch; // sqrt(1 + sinh^2 t) = cosh t
    return Math.sqrt(e * e + across * across);
  }

  /** Whether the span has a conductor of this role. */
  boolean has(Role role) {
    return present[role.ordinal()];
  }

  /** Whether a point lies in the measuring box. */
  boolean inBox(double s, double e, double z) {
    return s >= sMin && s <= sMax && e >= eMin && e <= eMax && z >= zMin && z <= zMax;
  }

  /** Whether a plan position lies in the tree region (the box widened by the tree pad). */
  boolean inTreeRegion(double s, double e) {
    return s >= sMin - treePad && s <= sMax + treePad && e >= eMin - treePad
        && e <= eMax + treePad;
  }

  /** Cells (x, y cell coordinates) of the plan grid that the tree region touches. */
  List<long[]> cells(double cell) {
    List<long[]> out = new ArrayList<>();
    if (!measurable()) {
      return out;
    }
    double minX = Double.POSITIVE_INFINITY;
    double maxX = Double.NEGATIVE_INFINITY;
    double minY = Double.POSITIVE_INFINITY;
    double maxY = Double.NEGATIVE_INFINITY;
    for (double s : new double[] {sMin - treePad, sMax + treePad}) {
      for (double e : new double[] {eMin - treePad, eMax + treePad}) {
        minX = Math.min(minX, frame.x(s, e));
        maxX = Math.max(maxX, frame.x(s, e));
        minY = Math.min(minY, frame.y(s, e));
        maxY = Math.max(maxY, frame.y(s, e));
      }
    }
    double halfDiagonal = cell * Math.sqrt(0.5);
    for (long cx = (long) Math.floor(minX / cell); cx <= (long) Math.floor(maxX / cell); cx++) {
      for (long cy = (long) Math.floor(minY / cell); cy <= (long) Math.floor(maxY / cell); cy++) {
        double x = (cx + 0.5) * cell;
        double y = (cy + 0.5) * cell;
        double s = frame.station(x, y);
        double e = frame.offset(x, y);
        double pad = treePad + halfDiagonal;
        if (s >= sMin - pad && s <= sMax + pad && e >= eMin - pad && e <= eMax + pad) {
          out.add(new long[] {cx, cy});
        }
      }
    }
    return out;
  }

  /** Largest vertical sag below the chord, m. */
  static double maxSag(ConductorCurve curve) {
    Catenary cat = curve.curve();
    double s = cat.maxSagStation(0, curve.length());
    return Math.max(0, cat.sagBelowChord(0, curve.length(), s));
  }

  /** Lowest elevation of the curve between its attachments, m. */
  static double lowestZ(ConductorCurve curve) {
    double s0 = curve.curve().s0();
    double low = Math.min(curve.zA(), curve.zB());
    if (s0 > 0 && s0 < curve.length()) {
      low = Math.min(low, curve.z(s0));
    }
    return low;
  }
}
