package org.clearance.clearance;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.clearance.ground.CanopyBuilder;
import org.clearance.ground.HeightModel;
import org.clearance.label.WireLabels;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.survey.PointChunk;
import org.clearance.wire.SetAside;

/**
 * One worker thread of the {@link ClearanceEngine}: measures the chunks it is given and keeps its
 * own per-span minima, counts and near-point buffer, merged after the pass; its canopy points
 * go to the engine's one canopy builder in batches.
 */
final class EngineWorker implements Consumer<PointChunk> {

  /** Points buffered before they are handed to the writer. */
  private static final int FLUSH_POINTS = 4096;
  /**
   * Lowest return that goes into the canopy for the tree search, m above ground: half the 2 m
   * minimum tree height (Popescu and Wynne 2004, methods.md 5.1); lower vegetation cannot hold a
   * tree top and is most of the points.
   */
  static final double CANOPY_MIN_HEIGHT_M = 1.0;
  /** What happened to a point in one span. */

  private final List<PreparedSpan> spans;
  private final SpanIndex index;
  private final ConditionSet conditions;
  private final HeightModel heights;
  private final VegetationSelector vegetation;
  private final ClearanceEngine.Options options;
  private final NearPointWriter out;
  private final CanopyBuilder.Batch canopy;

  private final List<PointClearance> buffer = new ArrayList<>();
  final ConditionMinimum[][] minimum;
  final long[] measured;
  final long[] kept;
  final long[] excludedConductor;
  final long[] excludedStructure;
  final long[] excludedAirborne;
  final long[] excludedObject;
  final long[] excludedCrossing;
  /** Per span: points on a wire touched by vegetation, measured ({@link SetAside#touchedWire}). */
  final long[] wireTouched;
  /** Per span: points whose label was not believed (a class-2 point high above the ground model
   * measured as unclassified, a vegetation label on a man-made object set aside). */
  final long[] labelsDistrusted;
  /** Per span and condition: whether this worker's minimum stands on a touched wire point. */
  final boolean[][] minimumOnWire;
  /** Per span: points of classes not read that may be vegetation within the keep radius, the
   * nearest of them (m) and their classes. */
  final long[] unreadCount;
  final double[] unreadNearest;
  final java.util.BitSet[] unreadClasses;
  private final SetAside setAside;
  /** Whether some wire labels are not believed ({@link SetAside#labelDistrusted}): then class
   * 13/14 points are looked up. */
  private final boolean relabels;
  /** The conductor roles measured apart, indexed by ordinal. */
  private static final Role[] ROLES = Role.values();
  private static final int PHASE = Role.PHASE.ordinal();
  /** Per condition and role: nearest distance, conductor index, swing angle and station. */
  private final double[][] best;
  private final int[][] bestConductor;
  private final double[][] bestAngle;
  private final double[][] bestStation;
  /** Voltages measured apart (kV), and per span and conductor the voltage slots it counts in
   * (slot {@code ROLES.length + index}). */
  private final List<Double> voltages;
  private final int[][][] voltageGroups;
  /** Per span, whether {@link #minimaWithinReach} has held. */
  private final boolean[] screened;
  /** Per condition and conductor, the lower bounds of the point being measured, m. */
  private final double[][] bounds;

  EngineWorker(List<PreparedSpan> spans, SpanIndex index, ConditionSet conditions,
      HeightModel heights, VegetationSelector vegetation, ClearanceEngine.Options options,
      NearPointWriter out, CanopyBuilder.Batch canopy, SetAside setAside, List<Double> voltages,
      int[][][] voltageGroups) {
    this.setAside = setAside;
    this.relabels = vegetation.inferred() && setAside.distrustedCount() > 0;
    this.voltages = voltages;
    this.voltageGroups = voltageGroups;
    this.spans = spans;
    this.index = index;
    this.conditions = conditions;
    this.heights = heights;
    this.vegetation = vegetation;
    this.options = options;
    this.out = out;
    this.canopy = canopy;
    int n = spans.size();
    int nc = conditions.size();
    minimum = new ConditionMinimum[n][nc];
    measured = new long[n];
    kept = new long[n];
    excludedConductor = new long[n];
    excludedStructure = new long[n];
    excludedAirborne = new long[n];
    excludedObject = new long[n];
    excludedCrossing = new long[n];
    wireTouched = new long[n];
    labelsDistrusted = new long[n];
    minimumOnWire = new boolean[n][nc];
    unreadCount = new long[n];
    unreadNearest = new double[n];
    java.util.Arrays.fill(unreadNearest, Double.POSITIVE_INFINITY);
    unreadClasses = new java.util.BitSet[n];
    for (int i = 0; i < n; i++) {
      unreadClasses[i] = new java.util.BitSet(256);
    }
    int slots = ROLES.length + voltages.size();
    best = new double[nc][slots];
    bestConductor = new int[nc][slots];
    bestAngle = new double[nc][slots];
    bestStation = new double[nc][slots];
    bounds = new double[nc][0];
    screened = new boolean[n];
  }

  @Override
  public void accept(PointChunk chunk) {
    double[] xs = chunk.x();
    double[] ys = chunk.y();
    double[] zs = chunk.z();
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0; i < chunk.size(); i++) {
      if ((flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      boolean read = vegetation.candidateClass(cls[i]);
      // a crown a vendor labelled wire, building, tower or deck (issue 9): measured as an
      // unclassified point
      boolean relabelled = !read && relabels && WireLabels.judgedClass(cls[i])
          && setAside.labelDistrusted(SetAside.key(xs[i], ys[i], zs[i]));
      if (!read && !relabelled && !vegetation.mayBeUnread(cls[i])) {
        continue;
      }
      int[] candidates = index.spansAt(xs[i], ys[i]);
      if (candidates.length == 0) {
        continue;
      }
      if (read || relabelled) {
        point(candidates, xs[i], ys[i], zs[i], cls[i], relabelled);
      } else {
        unreadPoint(candidates, xs[i], ys[i], zs[i], cls[i]);
      }
    }
    if (buffer.size() >= FLUSH_POINTS) {
      flush();
    }
  }

  private void point(int[] candidates, double x, double y, double z, int cls,
      boolean relabelled) {
    double hag = Double.NaN;
    boolean hagDone = false;
    boolean inTreeRegion = false;
    boolean notVegetation = false;
    SetAside.Reason reason = null;
    boolean touched = false;
    boolean inferredPoint = relabelled || vegetation.inferredClass(cls);
    for (int sp : candidates) {
      PreparedSpan p = spans.get(sp);
      double s = p.frame.station(x, y);
      double e = p.frame.offset(x, y);
      if (!p.inTreeRegion(s, e)) {
        continue;
      }
      if (!hagDone) {
        hag = heights.heightAboveGround(x, y, z);
        hagDone = true;
        if (inferredPoint && (cls == VegetationSelector.GROUND
            ? !vegetation.groundLabelDoubted(hag)
            : !(hag >= VegetationSelector.UNCLASSIFIED_MIN_HEIGHT))) {
          return;
        }
      }
      inTreeRegion = true;
      if (inferredPoint && (StructureZone.near(p, x, y, hag, options.structureExclusion())
          || StructureZone.onCrossArm(p, s, e, z)
          || StructureZone.nearOtherLines(spans, candidates, p, x, y, hag,
              options.structureExclusion()))) {
        if (p.inBox(s, e, z)) {
          excludedStructure[sp]++;
        }
        notVegetation = true;
        continue;
      }
      if (vegetation.inferred()) {
        if (reason == null) {
          long key = SetAside.key(x, y, z);
          reason = setAside.reason(key);
          touched = reason == SetAside.Reason.NONE && setAside.touchedWire(key);
        }
        if (reason != SetAside.Reason.NONE) {
          if (p.inBox(s, e, z)) {
            if (reason == SetAside.Reason.OBJECT && VegetationSelector.DEFAULT_CLASSES
                .contains(cls)) {
              labelsDistrusted[sp]++;
            }
            (switch (reason) {
              case WIRE -> excludedConductor;
              case OBJECT -> excludedObject;
              case CROSSING -> excludedCrossing;
              default -> excludedAirborne;
            })[sp]++;
          }
          notVegetation = true;
          continue;
        }
      }
      if (p.inBox(s, e, z)) {
        if (touched) {
          wireTouched[sp]++;
        }
        if (relabelled || inferredPoint && cls == VegetationSelector.GROUND) {
          labelsDistrusted[sp]++;
        }
        measure(p, s, x, y, z, cls, hag, touched);
      }
    }
    if (canopy != null && inTreeRegion && !notVegetation && !touched
        && hag >= CANOPY_MIN_HEIGHT_M) {
      canopy.add(x, y, z);
    }
  }

  /**
   * A point of a class the check does not read that may be vegetation all the same: counted
   * per span when within the keep radius of a conductor in any condition, never measured as
   * vegetation.
   */
  private void unreadPoint(int[] candidates, double x, double y, double z, int cls) {
    double hag = Double.NaN;
    boolean hagDone = false;
    for (int sp : candidates) {
      PreparedSpan p = spans.get(sp);
      double s = p.frame.station(x, y);
      double e = p.frame.offset(x, y);
      if (!p.inBox(s, e, z)) {
        continue;
      }
      if (!hagDone) {
        hag = heights.heightAboveGround(x, y, z);
        hagDone = true;
        if (!vegetation.unread(cls, hag)) {
          return;
        }
      }
      double d = nearest(p, x, y, z);
      if (d <= options.keepRadius()) {
        unreadCount[sp]++;
        unreadNearest[sp] = Math.min(unreadNearest[sp], d);
        unreadClasses[sp].set(cls);
      }
    }
  }

  /** Least distance from a point to the span's conductors over every condition, m. */
  private double nearest(PreparedSpan p, double x, double y, double z) {
    double best = Double.POSITIVE_INFINITY;
    for (int k = 0; k < conditions.size(); k++) {
      CatenaryDistance[] row = p.kernels[k];
      for (int j = 0; j < row.length; j++) {
        if (row[j] == null || p.lowerBound(k, j, x, y, z) >= best) {
          continue;
        }
        double phi = p.swingMin[k][j] < 0 || p.swingMax[k][j] > 0
            ? row[j].closestSwingAngle(x, y, z, p.swingMin[k][j], p.swingMax[k][j]) : 0;
        best = Math.min(best, row[j].distance(x, y, z, phi));
      }
    }
    return best;
  }

  /**
   * Measures one point: per condition, the nearest conductor of each role (energised, neutral,
   * shield; issue 15). The span minima count energised conductors only; the point is kept when
   * within the keep radius of any conductor, so a zone that names another role can be checked.
   */
  private void measure(PreparedSpan p, double s, double x, double y, double z, int cls,
      double hag, boolean touched) {
    int sp = p.index;
    int nc = conditions.size();
    if (p.belowFloor(s, z) && minimaWithinReach(p)) {
      // Farther than the keep radius from every conductor, so not stored, and every span
      // minimum is already nearer than that: nothing to compute (issue 12's one comparison).
      measured[sp]++;
      return;
    }
    // Lower bounds first: a point that cannot be stored (farther than the keep radius in every
    // condition) only needs exact distances where it may set a new span minimum.
    double lowest = Double.POSITIVE_INFINITY;
    for (int k = 0; k < nc; k++) {
      CatenaryDistance[] row = p.kernels[k];
      double[] b = bounds(k, row.length);
      for (int j = 0; j < row.length; j++) {
        if (row[j] != null) {
          b[j] = p.lowerBound(k, j, x, y, z);
          lowest = Math.min(lowest, b[j]);
        }
      }
    }
    boolean mayKeep = lowest <= options.keepRadius();
    double nearest = Double.POSITIVE_INFINITY;
    for (int k = 0; k < nc; k++) {
      java.util.Arrays.fill(best[k], Double.POSITIVE_INFINITY);
      java.util.Arrays.fill(bestConductor[k], -1);
      ConditionMinimum current = minimum[sp][k];
      double cutoff = mayKeep || current == null ? Double.POSITIVE_INFINITY : current.distance();
      CatenaryDistance[] row = p.kernels[k];
      for (int j = 0; j < row.length; j++) {
        CatenaryDistance kernel = row[j];
        int g = p.roles[j].ordinal();
        if (kernel == null || !mayKeep && g != PHASE) {
          continue;
        }
        int[] own = mayKeep ? voltageGroups[sp][j] : NO_GROUPS;
        double need = best[k][g];
        for (int q : own) {
          need = Math.max(need, best[k][ROLES.length + q]);
        }
        double bound = bounds[k][j];
        if (bound >= need || bound >= cutoff) {
          continue;
        }
        double phi = p.swingMin[k][j] < 0 || p.swingMax[k][j] > 0
            ? kernel.closestSwingAngle(x, y, z, p.swingMin[k][j], p.swingMax[k][j]) : 0;
        double station = kernel.closestStation(x, y, z, phi);
        double d = kernel.distanceAt(x, y, z, phi, station);
        if (d < best[k][g]) {
          best[k][g] = d;
          bestConductor[k][g] = j;
          bestAngle[k][g] = phi;
          bestStation[k][g] = station;
        }
        for (int q : own) {
          int slot = ROLES.length + q;
          if (d < best[k][slot]) {
            best[k][slot] = d;
            bestConductor[k][slot] = j;
            bestAngle[k][slot] = phi;
            bestStation[k][slot] = station;
          }
        }
      }
      for (int g = 0; g < ROLES.length; g++) {
        nearest = Math.min(nearest, best[k][g]);
      }
    }
    measured[sp]++;
    boolean keep = nearest <= options.keepRadius();
    List<List<ConditionDistance>> details = keep ? new ArrayList<>(ROLES.length) : null;
    for (Role role : ROLES) {
      int g = role.ordinal();
      if (!keep && g != PHASE) {
        continue; // nothing to store, and only energised conductors set span minima
      }
      boolean present = role == Role.PHASE || p.has(role);
      List<ConditionDistance> list = keep && present ? new ArrayList<>(nc) : null;
      if (keep) {
        details.add(list == null ? List.of() : list);
      }
      for (int k = 0; k < nc; k++) {
        int j = bestConductor[k][g];
        String name = conditions.names().get(k);
        String group = conditions.groups().get(k);
        if (j < 0) {
          if (list != null) {
            list.add(new ConditionDistance(name, group, Double.NaN, Double.NaN, Double.NaN, "",
                Double.NaN));
          }
          continue;
        }
        ConditionMinimum current = minimum[sp][k];
        boolean newMinimum = role == Role.PHASE
            && (current == null || best[k][g] < current.distance());
        if (list == null && !newMinimum) {
          continue;
        }
        ConductorDistance cd = p.kernels[k][j].closestAt(x, y, z, bestAngle[k][g],
            bestStation[k][g]);
        if (newMinimum) {
          minimum[sp][k] = new ConditionMinimum(name, group, cd.distance(), cd.horizontal(),
              cd.vertical(), p.names[j], x, y, z);
          minimumOnWire[sp][k] = touched;
        }
        if (list != null) {
          double station = p.frame.station(cd.closestX(), cd.closestY());
          list.add(new ConditionDistance(name, group, cd.distance(), cd.horizontal(),
              cd.vertical(), p.names[j], station));
        }
      }
    }
    if (keep) {
      kept[sp]++;
      buffer.add(new PointClearance(p.model.span().id(), x, y, z, cls, hag,
          details.get(Role.PHASE.ordinal()), details.get(Role.NEUTRAL.ordinal()),
          details.get(Role.SHIELD.ordinal()), byVoltage(p, nc, x, y, z), touched));
    }
  }

  /** No voltage slots: a span of one voltage, or a point that is not kept. */
  private static final int[] NO_GROUPS = new int[0];

  /**
   * The point's distances to the nearest energised conductor of each voltage of the span
   * (issue 15), from the slots {@link #measure} filled; empty on a span of one voltage.
   */
  private List<PointClearance.VoltageDistances> byVoltage(PreparedSpan p, int nc, double x,
      double y, double z) {
    if (!p.model.context().multiVoltage()) {
      return List.of();
    }
    List<PointClearance.VoltageDistances> out = new ArrayList<>();
    for (double kv : p.model.context().voltagesKv()) {
      int slot = ROLES.length + voltages.indexOf(kv);
      List<ConditionDistance> list = new ArrayList<>(nc);
      for (int k = 0; k < nc; k++) {
        int j = bestConductor[k][slot];
        String name = conditions.names().get(k);
        String group = conditions.groups().get(k);
        if (j < 0) {
          list.add(new ConditionDistance(name, group, Double.NaN, Double.NaN, Double.NaN, "",
              Double.NaN));
          continue;
        }
        ConductorDistance cd = p.kernels[k][j].closestAt(x, y, z, bestAngle[k][slot],
            bestStation[k][slot]);
        list.add(new ConditionDistance(name, group, cd.distance(), cd.horizontal(),
            cd.vertical(), p.names[j], p.frame.station(cd.closestX(), cd.closestY())));
      }
      out.add(new PointClearance.VoltageDistances(kv, list));
    }
    return out;
  }

  /**
   * Whether every condition of the span with an energised conductor already has a minimum within
   * the keep radius in this worker (then a point farther than that cannot lower it). Once true it
   * stays true: minima only fall.
   */
  private boolean minimaWithinReach(PreparedSpan p) {
    int sp = p.index;
    if (screened[sp]) {
      return true;
    }
    for (int k = 0; k < conditions.size(); k++) {
      ConditionMinimum m = minimum[sp][k];
      if (p.phaseIn[k] && (m == null || !(m.distance() <= options.keepRadius()))) {
        return false;
      }
    }
    screened[sp] = true;
    return true;
  }

  /** This worker's row of lower bounds for condition {@code k}, at least {@code n} long. */
  private double[] bounds(int k, int n) {
    if (bounds[k].length < n) {
      bounds[k] = new double[n];
    }
    return bounds[k];
  }

  void flush() {
    if (canopy != null) {
      canopy.flush();
    }
    if (out != null && !buffer.isEmpty()) {
      try {
        out.write(buffer);
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }
    buffer.clear();
  }
}
