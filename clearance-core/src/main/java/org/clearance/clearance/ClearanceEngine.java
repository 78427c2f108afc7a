package org.clearance.clearance;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.ground.CanopyBuilder;
import org.clearance.ground.GroundModel;
import org.clearance.ground.HeightModel;
import org.clearance.ground.Tree;
import org.clearance.ground.TreeOptions;
import org.clearance.line.ConductorPosition.Role;
import org.clearance.survey.PointChunk;
import org.clearance.wire.SetAside;

/**
 * Measures, for every vegetation point near the line, its true 3D distance to every conductor of
 * the nearby spans in every condition (docs/methods.md section 6).
 *
 * <p>Spans are indexed, points are streamed: each worker thread takes whole chunks, finds the
 * spans whose measuring box (conductor envelope in all conditions plus the keep radius) may
 * contain a point through a plan grid ({@link SpanIndex}), and measures with the exact
 * point-to-catenary kernel ({@link CatenaryDistance}); swinging conditions take the minimum over
 * their swing range. Points near a structure fall in the boxes of both adjacent spans and are
 * measured to both. Points within the keep radius of a conductor in any condition go to the
 * {@link NearPointWriter}; memory is bounded by the spans, never by the survey.
 *
 * <p>When trees are wanted, the vegetation points within the tree reach of the line also build a
 * canopy surface; after the pass the trees are found in it ({@link CanopyBuilder}, Popescu and
 * Wynne 2004) and each tree's base is measured to the nearest span's conductors for the fall-in
 * check.
 */
public final class ClearanceEngine {

  /** Points buffered per worker before they are handed to the writer. */
  private static final int FLUSH_POINTS = 4096;

  /**
   * Height above ground below which a point in a pole's column is measured, not taken for the
   * pole, m: low vegetation stands up to about 0.5 m (the split between low and medium
   * vegetation; common practice, no source), and at the pole's foot its returns and the pole's
   * lowest ones cannot be told apart. Measuring both errs by at most the height between them
   * towards a smaller distance; setting both aside set the generated feeders' minima above the
   * truth (issue 9).
   */
  public static final double POLE_FOOT_M = 0.5;

  /**
   * Radius of a pole's own column of returns, m (issue 15, issue 9): what a pole line sets aside
   * around a structure centre (the structure exclusion of a pole line), and, in a survey without
   * vegetation labels, the points taken to be the pole in pole-clearing zones (counted in {@code
   * pole-points.bin}, never measured as vegetation in a cylinder). A wood or steel pole is
   * 0.25-0.45 m across (issue 15): half the widest plus 0.275 m for the error of the centre
   * position (the pole finder confirms a file position only within 0.2 m of the pole it
   * locates, docs/wire-finder.md; common practice, no source). Its hardware sits on arms, which
   * {@code StructureZone}'s arm box excludes apart. Grass, a shrub or a crown beside the pole,
   * outside the column, is measured. The exclusion was 1 m: the grass 0.4-0.9 m from a pole then
   * set generated feeders' span minima 6-10 cm above the truth (seed 44, vertical framing,
   * ground-only, span P210-P211: 8.789 m against 8.692 m). The 8 m of a lattice tower would drop
   * the vegetation along a sixth of a 100 m feeder span.
   */
  public static final double POLE_COLUMN_M = 0.5;

  /**
   * Options.
   *
   * @param keepRadius points closer than this to a conductor in any condition are stored for
   *     rule evaluation, m (&gt; 0); must exceed the widest zone of any profile to be evaluated
   * @param threads worker threads (&gt;= 1)
   * @param structureExclusion in an unclassified survey, points closer than this in plan to a
   *     structure centre are taken to be the structure, m (&gt;= 0)
   * @param treeReach trees are collected up to this plan distance from the conductors' envelope,
   *     m (&gt;= keepRadius)
   */
  public record Options(
      double keepRadius, int threads, double structureExclusion, double treeReach) {

    /**
     * Keep radius 10 m (wider than every built-in zone: the widest, 20 ft in GO 95 fire-threat
     * areas and the example profile's watch band, stay below 8 m; a wider profile zone makes
     * its spans INCOMPLETE and asks for a larger radius), structure exclusion 8 m (a lattice
     * tower's half cross-arm length), tree reach 50 m (taller than almost any tree near a line;
     * common practice, no source).
     */
    public static Options defaults(int threads) {
      return new Options(10.0, threads, 8.0, 50.0);
    }

    public Options {
      if (!(Double.isFinite(keepRadius) && keepRadius > 0)) {
        throw new IllegalArgumentException("keep radius must be positive: " + keepRadius);
      }
      if (threads < 1) {
        throw new IllegalArgumentException("threads must be at least 1: " + threads);
      }
      if (!(structureExclusion >= 0)) {
        throw new IllegalArgumentException("structure exclusion must be >= 0");
      }
      if (!(treeReach >= keepRadius)) {
        throw new IllegalArgumentException("tree reach must be at least the keep radius: "
            + treeReach);
      }
    }
  }

  /** A source of point chunks, such as {@code Survey::readParallel}. */
  @FunctionalInterface
  public interface ChunkSource {
    /** Feeds all chunks to consumers made by the supplier, one per worker thread. */
    void readParallel(int threads, Supplier<Consumer<PointChunk>> consumers);
  }

  private final List<PreparedSpan> spans;
  private final ConditionSet conditions;
  private final HeightModel heights;
  private final VegetationSelector vegetation;
  private final Options options;
  private final SpanIndex index;
  private final GroundModel ground;
  private final TreeOptions treeOptions;
  /** Voltages (kV) measured apart on spans whose circuits carry more than one, highest first. */
  private final List<Double> voltages;
  /** Per span and conductor, the indices in {@link #voltages} it counts in. */
  private final int[][][] voltageGroups;

  /**
   * An engine that measures distances only (no trees).
   *
   * @param models spans with their conductors in every condition of {@code conditions}
   * @param conditions the run's conditions, the surveyed state first
   * @param heights heights above ground
   * @param vegetation which points are vegetation
   * @param options options
   */
  public ClearanceEngine(List<SpanModel> models, ConditionSet conditions, HeightModel heights,
      VegetationSelector vegetation, Options options) {
    this(models, conditions, heights, vegetation, options, null, null);
  }

  /**
   * An engine that also finds trees for the fall-in check.
   *
   * @param ground the ground model (heights above ground and tree bases); null for no trees
   * @param treeOptions tree-finding options; null for no trees
   */
  public ClearanceEngine(List<SpanModel> models, ConditionSet conditions, GroundModel ground,
      VegetationSelector vegetation, Options options, TreeOptions treeOptions) {
    this(models, conditions, ground::heightAboveGround, vegetation, options, ground,
        treeOptions);
  }

  private ClearanceEngine(List<SpanModel> models, ConditionSet conditions, HeightModel heights,
      VegetationSelector vegetation, Options options, GroundModel ground,
      TreeOptions treeOptions) {
    this.conditions = Objects.requireNonNull(conditions, "conditions");
    this.heights = Objects.requireNonNull(heights, "heights");
    this.vegetation = Objects.requireNonNull(vegetation, "vegetation");
    this.options = Objects.requireNonNull(options, "options");
    this.ground = ground;
    this.treeOptions = ground == null ? null : treeOptions;
    List<PreparedSpan> prepared = new ArrayList<>();
    for (int i = 0; i < models.size(); i++) {
      prepared.add(new PreparedSpan(i, models.get(i), conditions.size(), options.keepRadius(),
          treeOptions == null ? options.keepRadius() : options.treeReach()));
    }
    this.spans = List.copyOf(prepared);
    this.index = new SpanIndex(spans);
    java.util.TreeSet<Double> kv = new java.util.TreeSet<>();
    for (SpanModel m : models) {
      if (m.context().multiVoltage()) {
        kv.addAll(m.context().voltagesKv());
      }
    }
    this.voltages = List.copyOf(kv.descendingSet());
    this.voltageGroups = new int[spans.size()][][];
    for (PreparedSpan p : spans) {
      voltageGroups[p.index] = groups(p, voltages);
    }
  }

  /**
   * Per conductor of a span, the indices in {@code voltages} of the voltage groups it counts in:
   * an energised conductor of known position in its circuit's, one of no known position in every
   * voltage of the span (the safe reading); none on a span of one voltage.
   */
  private static int[][] groups(PreparedSpan p, List<Double> voltages) {
    SpanContext c = p.model.context();
    int[][] out = new int[p.names.length][];
    for (int j = 0; j < out.length; j++) {
      if (!c.multiVoltage() || p.roles[j] != Role.PHASE) {
        out[j] = new int[0];
        continue;
      }
      double v = c.voltageOf(p.names[j]);
      out[j] = Double.isNaN(v)
          ? c.voltagesKv().stream().mapToInt(voltages::indexOf).toArray()
          : new int[] {voltages.indexOf(v)};
    }
    return out;
  }

  /** The layout the engine's near-points file must have. */
  public NearPointFile nearPointLayout() {
    List<String> ids = new ArrayList<>();
    List<String> names = new ArrayList<>();
    java.util.EnumSet<Role> roles = java.util.EnumSet.of(Role.PHASE);
    for (PreparedSpan p : spans) {
      ids.add(p.model.span().id());
      roles.addAll(java.util.Arrays.asList(p.roles));
      for (String n : p.names) {
        if (!names.contains(n)) {
          names.add(n);
        }
      }
    }
    return new NearPointFile(conditions.names(), conditions.groups(), ids, names,
        List.copyOf(roles), voltages);
  }

  /**
   * The layout of the engine's pole-points file: every structure at a span end, once, in span
   * order, with the keep radius and height and (in a survey without vegetation labels) the
   * pole column radius {@link #POLE_COLUMN_M}.
   *
   * @param keepRadiusM plan distance from a structure centre within which points are stored, m
   * @param keepHeightM height above ground up to which points are stored, m
   */
  public PolePointFile polePointLayout(double keepRadiusM, double keepHeightM) {
    List<PolePointFile.Pole> poles = new ArrayList<>();
    java.util.Set<String> seen = new java.util.HashSet<>();
    for (PreparedSpan p : spans) {
      String line = p.model.context().lineId();
      for (org.clearance.line.Structure s : List.of(p.model.span().from(),
          p.model.span().to())) {
        PolePointFile.Pole pole = new PolePointFile.Pole(line, s.id(), s.x(), s.y(), 0);
        if (seen.add(pole.key())) {
          poles.add(pole);
        }
      }
    }
    return new PolePointFile(keepRadiusM, keepHeightM,
        vegetation.inferred() ? POLE_COLUMN_M : Double.NaN, poles);
  }

  /**
   * Streams all points of the source and measures them.
   *
   * @param source the survey
   * @param out where near points go (its layout from {@link #nearPointLayout()}), or null to keep
   *     only the per-span minima
   * @return per span what was measured (in the order of the models) and the trees near the line
   */
  public Measurement measure(ChunkSource source, NearPointWriter out) {
    return measure(source, out, SetAside.none());
  }

  /**
   * Streams all points of the source and measures them; in a survey whose vegetation is
   * inferred, the points set aside (wire, isolated airborne, man-made object) are counted, not
   * measured. Every other unclassified point near a conductor is measured as vegetation.
   *
   * @param setAside the wire finder's points set aside ({@code WireResult.setAside()})
   */
  public Measurement measure(ChunkSource source, NearPointWriter out, SetAside setAside) {
    return measure(source, out, setAside, null);
  }

  /**
   * Streams all points of the source, measures them and, when {@code poles} is given, also
   * stores the vegetation points around every structure for pole-clearing zones.
   *
   * @param poles where points near structures go (layout from {@link #polePointLayout}), or null
   */
  public Measurement measure(ChunkSource source, NearPointWriter out, SetAside setAside,
      PolePointWriter poles) {
    Objects.requireNonNull(setAside, "setAside");
    List<EngineWorker> workers = Collections.synchronizedList(new ArrayList<>());
    List<PoleCollector> collectors = Collections.synchronizedList(new ArrayList<>());
    org.clearance.line.PlanCellIndex grid = poles == null ? null
        : PoleCollector.grid(poles.layout());
    CanopyBuilder canopy = treeOptions == null ? null
        : new CanopyBuilder(treeOptions, (x, y) -> true);
    source.readParallel(options.threads(), () -> {
      EngineWorker w = new EngineWorker(spans, index, conditions, heights, vegetation, options,
          out, canopy == null ? null : canopy.batch(), setAside, voltages, voltageGroups);
      workers.add(w);
      if (poles == null) {
        return w;
      }
      PoleCollector c = new PoleCollector(grid, heights, vegetation, setAside, poles);
      collectors.add(c);
      return chunk -> {
        w.accept(chunk);
        c.accept(chunk);
      };
    });
    for (EngineWorker w : workers) {
      w.flush();
    }
    for (PoleCollector c : collectors) {
      c.flush();
    }
    return new Measurement(merge(workers), trees(canopy));
  }

  private List<SpanClearance> merge(List<EngineWorker> workers) {
    int nc = conditions.size();
    List<SpanClearance> result = new ArrayList<>();
    for (PreparedSpan p : spans) {
      int i = p.index;
      List<ConditionMinimum> minima = new ArrayList<>();
      long measured = 0;
      long kept = 0;
      long exConductor = 0;
      long exStructure = 0;
      long exAirborne = 0;
      long exObject = 0;
      long exCrossing = 0;
      long touched = 0;
      long distrusted = 0;
      long unread = 0;
      double unreadNearest = Double.POSITIVE_INFINITY;
      java.util.BitSet unreadClasses = new java.util.BitSet(256);
      for (EngineWorker w : workers) {
        exAirborne += w.excludedAirborne[i];
        exObject += w.excludedObject[i];
        exCrossing += w.excludedCrossing[i];
        touched += w.wireTouched[i];
        distrusted += w.labelsDistrusted[i];
        unread += w.unreadCount[i];
        unreadNearest = Math.min(unreadNearest, w.unreadNearest[i]);
        unreadClasses.or(w.unreadClasses[i]);
        measured += w.measured[i];
        kept += w.kept[i];
        exConductor += w.excludedConductor[i];
        exStructure += w.excludedStructure[i];
      }
      List<String> onWire = new ArrayList<>();
      for (int k = 0; k < nc; k++) {
        ConditionMinimum best = null;
        boolean bestOnWire = false;
        for (EngineWorker w : workers) {
          ConditionMinimum m = w.minimum[i][k];
          if (m != null && (best == null || m.distance() < best.distance())) {
            best = m;
            bestOnWire = w.minimumOnWire[i][k];
          }
        }
        if (bestOnWire) {
          onWire.add(conditions.names().get(k));
        }
        minima.add(best != null ? best : new ConditionMinimum(conditions.names().get(k),
            conditions.groups().get(k), Double.NaN, Double.NaN, Double.NaN, "", Double.NaN,
            Double.NaN, Double.NaN));
      }
      result.add(new SpanClearance(p.model.span().id(), minima, measured, kept, exConductor,
          exStructure, exAirborne, new SpanClearance.Unread(unread,
              unread > 0 ? unreadNearest : Double.NaN, unreadClasses.stream().boxed().toList()),
          exObject, exCrossing, touched, distrusted, onWire));
    }
    return result;
  }

  private List<TreeClearance> trees(CanopyBuilder all) {
    if (all == null) {
      return List.of();
    }
    List<TreeClearance> out = new ArrayList<>();
    for (Tree tree : all.findTrees(ground, options.threads())) {
      out.addAll(measureTree(tree));
    }
    out.sort((a, b) -> Double.compare(a.baseDistances().get(0), b.baseDistances().get(0)));
    return out;
  }

  /**
   * The tree's base distances to the span nearest it, one per line among the spans near it (a
   * tree between two lines of one corridor may fall into either: docs/clearance.md, "Two lines
   * in one run"); empty when no span is near. Lines in the order of their first span.
   */
  private List<TreeClearance> measureTree(Tree tree) {
    java.util.Map<String, PreparedSpan> nearest = new java.util.LinkedHashMap<>();
    java.util.Map<String, Double> nearestDistance = new java.util.HashMap<>();
    java.util.Map<String, String> nearestConductor = new java.util.HashMap<>();
    for (int sp : index.spansAt(tree.x(), tree.y())) {
      PreparedSpan p = spans.get(sp);
      if (!p.inTreeRegion(p.frame.station(tree.x(), tree.y()),
          p.frame.offset(tree.x(), tree.y()))) {
        continue;
      }
      String line = p.model.span().lineId();
      CatenaryDistance[] row = p.kernels[0];
      for (int j = 0; j < row.length; j++) {
        if (row[j] == null) {
          continue;
        }
        double d = row[j].distance(tree.x(), tree.y(), tree.baseZ());
        if (d < nearestDistance.getOrDefault(line, Double.POSITIVE_INFINITY)) {
          nearestDistance.put(line, d);
          nearest.put(line, p);
          nearestConductor.put(line, p.names[j]);
        }
      }
    }
    List<TreeClearance> out = new ArrayList<>();
    for (java.util.Map.Entry<String, PreparedSpan> e : nearest.entrySet()) {
      out.add(measureTree(tree, e.getValue(), nearestConductor.get(e.getKey())));
    }
    return out;
  }

  /** The tree's base distances to one span's conductors in every condition. */
  private TreeClearance measureTree(Tree tree, PreparedSpan nearest, String nearestConductor) {
    List<Double> ds = new ArrayList<>();
    for (int k = 0; k < conditions.size(); k++) {
      double best = Double.NaN;
      CatenaryDistance[] row = nearest.kernels[k];
      for (int j = 0; j < row.length; j++) {
        if (row[j] == null) {
          continue;
        }
        double phi = row[j].closestSwingAngle(tree.x(), tree.y(), tree.baseZ(),
            nearest.swingMin[k][j], nearest.swingMax[k][j]);
        double d = row[j].distance(tree.x(), tree.y(), tree.baseZ(), phi);
        if (!(d >= best)) {
          best = d;
        }
      }
      ds.add(best);
    }
    return new TreeClearance(tree, nearest.model.span().id(), ds, nearestConductor);
  }
}
