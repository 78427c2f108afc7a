package org.clearance.wire;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.clearance.InputException;
import org.clearance.ground.HeightModel;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineLayout;
import org.clearance.line.LineSpec;
import org.clearance.line.Span;
import org.clearance.line.SpanFrame;
import org.clearance.line.SpanLayout;
import org.clearance.line.Structure;
import org.clearance.line.StructureType;

/**
 * Checks the structures file's positions against the towers the survey shows, and moves or adds
 * structures (package-private). Towers are compact groups of {@link TowerGrid} cells: with
 * ASPRS class-15 points when the survey has any, else with tall columns of unclassified points
 * whose one-metre slices fill most of the height from near the ground to at least
 * {@link #TOP_SHARE} of the highest nominal attachment (lattice steel is seen at every height;
 * a crown is not, below its crown base). Pylon localisation from point evidence: Sohn, Jwa and
 * Kim (2012); Munir et al. (2019) (methods.md 1.2, 1.4).
 */
final class StructureRefiner {

  /** Half-width of the band along each span searched for a structure the file lacks, m. */
  static final double BAND_M = 12.0;
  /** A span this many times longer than its line's median span may hide an angle structure
   * the file lacks: its band is widened. */
  static final double LONG_SPAN_FACTOR = 1.6;
  /** Half-width of a widened band as a share of the span length: an angle structure missing
   * from a line turning by up to 60 degrees stands within a quarter of the span of the chord. */
  static final double WIDE_BAND_SHARE = 0.3;
  /** Fewest spans in a line for its median span to tell a long span. */
  static final int MEDIAN_SPANS = 3;
  /** A tower nearer than this to a span's end belongs to the end structure, m. */
  static final double END_CLEARANCE_M = 40.0;
  /** Tower top as a share of the highest nominal attachment height. */
  static final double TOP_SHARE = 0.9;
  /** Tower top when the specifications give no heights, m. */
  static final double DEFAULT_TOP_M = 15.0;
  /** Highest slice, m, by which a tower's legs must show: steel stands on the ground, a crown
   * on a trunk that airborne lidar barely sees. */
  static final int FOOT_SLICE = 6;
  /** Share of the slices from the foot to the top a tower must occupy: lattice steel is seen
   * at almost every metre of height. */
  static final double FILL_SHARE = 0.75;
  /** Widest tower footprint, m: lattice bases run to about 15 m. */
  static final double MAX_FOOTPRINT_M = 25.0;

  /** The refined layout and the changes made. */
  record Refined(SpanLayout layout, List<StructureChange> changes) {}

  /**
   * One tower found: plan centre, m, point count, how it was recognised, and whether from
   * class-15 labels (else from a column of unclassified points).
   */
  record Tower(double x, double y, int points, String evidence, boolean labelled) {}

  private final WireFinderOptions.Structures options;

  StructureRefiner(WireFinderOptions.Structures options) {
    this.options = options;
  }

  /** Reads the source once for tower evidence and refines the layout. */
  Refined refine(PointSource source, SpanLayout layout, HeightModel heights) {
    List<TowerGrid.Area> areas = areas(layout);
    CorridorIndex index = TowerGrid.index(areas);
    List<TowerGrid> grids = Collections.synchronizedList(new ArrayList<>());
    source.stream(() -> {
      TowerGrid g = new TowerGrid(areas, index, heights);
      grids.add(g);
      return g;
    });
    if (grids.isEmpty()) {
      return new Refined(layout, List.of());
    }
    TowerGrid all = grids.get(0);
    for (int k = 1; k < grids.size(); k++) {
      all.absorb(grids.get(k));
    }
    List<Tower> towers = TowerFinder.towers(all.cells(), options.minTowerPoints(),
        topMin(layout));
    List<PoleFinder.Site> sites = new ArrayList<>();
    for (LineLayout line : layout.lines()) {
      if (isPoleLine(line.spec())) {
        sites.addAll(PoleFinder.sites(line));
      }
    }
    List<PoleFinder.Result> found = PoleFinder.locate(source, sites, heights);
    Map<Structure, PoleFinder.Result> poles = new java.util.HashMap<>();
    for (int k = 0; k < sites.size(); k++) {
      poles.put(sites.get(k).s(), found.get(k));
    }
    return apply(layout, towers, poles);
  }

  /**
   * Whether a line hangs its conductors closer than {@link CloseSpacing#ACTIVE_BELOW_M}: a pole
   * line (distribution). Its structures are located as wood poles ({@link PoleFinder}) in any
   * classification mode; class-15 towers are used only where no pole is found, and the
   * lattice-tower column test is not used: a tree beside the line stands just like a tower.
   */
  static boolean isPoleLine(LineSpec spec) {
    return CloseSpacing.of(spec, WireFinderOptions.Growth.defaults()) != null;
  }

  /**
   * Refines the layout with the towers found. Within each line, structures and towers are paired
   * nearest first (each at most once; lines may share towers, as two circuits on one tower do);
   * a structure farther than the tolerance from its tower moves to it, and unpaired towers inside
   * long spans are added. When the result is no valid layout (two structures brought to one
   * place), the layout is left as given.
   */
  Refined apply(SpanLayout layout, List<Tower> towers) {
    return apply(layout, towers, Map.of());
  }

  /**
   * As {@link #apply(SpanLayout, List)}, with the poles located on pole lines: a pole found
   * more than {@link PoleFinder#MOVE_M} from its file position moves it (else it is confirmed);
   * a pole not found, or ambiguous, leaves the position (or a class-15 tower's move) and is
   * reported.
   */
  Refined apply(SpanLayout layout, List<Tower> towers, Map<Structure, PoleFinder.Result> poles) {
    List<StructureChange> changes = new ArrayList<>();
    List<Structure> structures = new ArrayList<>();
    List<LineSpec> specs = new ArrayList<>();
    for (LineLayout line : layout.lines()) {
      specs.add(line.spec());
      List<Structure> given = line.structures();
      List<Tower> usable = isPoleLine(line.spec())
          ? towers.stream().filter(Tower::labelled).toList() : towers;
      boolean[] used = new boolean[usable.size()];
      int[] towerOf = pair(given, usable, used);
      List<Structure> refined = new ArrayList<>();
      for (int k = 0; k < given.size(); k++) {
        Structure s = given.get(k);
        Tower tw = towerOf[k] < 0 ? null : usable.get(towerOf[k]);
        PoleFinder.Result pole = poles.get(s);
        if (pole != null && pole.outcome() == PoleFinder.Outcome.FOUND) {
          boolean move = pole.shiftM() > PoleFinder.MOVE_M;
          refined.add(!move ? s : new Structure(s.id(), s.lineId(), s.sequence(), s.type(),
              pole.x(), pole.y(), s.groundZ(), s.attachZ(), s.sourceFile(), s.sourceLine()));
          changes.add(new StructureChange(line.spec().lineId(), s.id(),
              move ? StructureChange.Kind.MOVED : StructureChange.Kind.CONFIRMED, s.x(), s.y(),
              move ? pole.x() : s.x(), move ? pole.y() : s.y(), pole.points(),
              pole.why() + String.format(Locale.ROOT, ", %.2f m from the file's position",
                  pole.shiftM())));
          continue;
        }
        if (pole != null) {
          changes.add(new StructureChange(line.spec().lineId(), s.id(),
              StructureChange.Kind.NOT_FOUND, s.x(), s.y(), s.x(), s.y(), 0,
              pole.why() + (pole.outcome() == PoleFinder.Outcome.AMBIGUOUS
                  ? ": ambiguous, position kept" : ": position kept")));
        }
        if (tw == null || Math.hypot(tw.x() - s.x(), tw.y() - s.y()) <= options.toleranceM()) {
          refined.add(s);
          continue;
        }
        refined.add(new Structure(s.id(), s.lineId(), s.sequence(), s.type(), tw.x(), tw.y(),
            s.groundZ(), s.attachZ(), s.sourceFile(), s.sourceLine()));
        changes.add(new StructureChange(line.spec().lineId(), s.id(),
            StructureChange.Kind.MOVED, s.x(), s.y(), tw.x(), tw.y(), tw.points(),
            tw.evidence()));
      }
      structures.addAll(added(line, refined, usable, used, changes));
    }
    if (changes.stream().noneMatch(StructureChange::changesLayout)) {
      return new Refined(layout, changes);
    }
    try {
      return new Refined(SpanLayout.build(structures, specs), changes);
    } catch (InputException e) {
      return new Refined(layout, changes.stream().filter(c -> !c.changesLayout()).toList());
    }
  }

  /**
   * Pairs structures with towers within the search radius, nearest pairs first; marks the
   * paired towers used. Returns, per structure, its tower index or -1.
   */
  private int[] pair(List<Structure> structures, List<Tower> towers, boolean[] used) {
    List<double[]> pairs = new ArrayList<>();
    for (int k = 0; k < structures.size(); k++) {
      Structure s = structures.get(k);
      for (int t = 0; t < towers.size(); t++) {
        double d = Math.hypot(towers.get(t).x() - s.x(), towers.get(t).y() - s.y());
        if (d <= options.searchRadiusM()) {
          pairs.add(new double[] {d, k, t});
        }
      }
    }
    pairs.sort(Comparator.<double[]>comparingDouble(a -> a[0]).thenComparingDouble(a -> a[1])
        .thenComparingDouble(a -> a[2]));
    int[] towerOf = new int[structures.size()];
    java.util.Arrays.fill(towerOf, -1);
    for (double[] pr : pairs) {
      int k = (int) pr[1];
      int t = (int) pr[2];
      if (towerOf[k] < 0 && !used[t]) {
        towerOf[k] = t;
        used[t] = true;
      }
    }
    return towerOf;
  }

  /** The line's structures with the towers standing inside its spans added, renumbered if need. */
  private List<Structure> added(LineLayout line, List<Structure> refined, List<Tower> towers,
      boolean[] used, List<StructureChange> changes) {
    List<Structure> out = new ArrayList<>();
    List<Integer> addedAt = new ArrayList<>();
    int found = 0;
    for (int k = 0; k < refined.size(); k++) {
      Structure a = refined.get(k);
      out.add(a);
      if (k + 1 == refined.size()) {
        break;
      }
      Structure b = refined.get(k + 1);
      SpanFrame f = SpanFrame.between(a.x(), a.y(), b.x(), b.y());
      double half = bandHalfWidth(line, f.length());
      Boolean longSpan = isLong(line, f.length());
      List<Integer> inside = new ArrayList<>();
      for (int t = 0; t < towers.size(); t++) {
        Tower tw = towers.get(t);
        double s = f.station(tw.x(), tw.y());
        boolean may = longSpan == null ? tw.labelled() : longSpan;
        if (!used[t] && may && s >= END_CLEARANCE_M && s <= f.length() - END_CLEARANCE_M
            && Math.abs(f.offset(tw.x(), tw.y())) <= half) {
          inside.add(t);
        }
      }
      inside.sort(Comparator.comparingDouble(t -> f.station(towers.get(t).x(),
          towers.get(t).y())));
      for (int t : inside) {
        used[t] = true;
        Tower tw = towers.get(t);
        String id = freshId(line, ++found);
        out.add(new Structure(id, a.lineId(), a.sequence(), StructureType.SUSPENSION, tw.x(),
            tw.y(), Double.NaN, Map.of(), "(tower found in the survey)", 0));
        addedAt.add(out.size() - 1);
        changes.add(new StructureChange(line.spec().lineId(), id, StructureChange.Kind.ADDED,
            Double.NaN, Double.NaN, tw.x(), tw.y(), tw.points(), tw.evidence()));
      }
    }
    if (addedAt.isEmpty()) {
      return out;
    }
    List<Structure> renumbered = new ArrayList<>();
    for (int k = 0; k < out.size(); k++) {
      Structure s = out.get(k);
      renumbered.add(new Structure(s.id(), s.lineId(), k + 1, s.type(), s.x(), s.y(),
          s.groundZ(), s.attachZ(), s.sourceFile(), s.sourceLine()));
    }
    return renumbered;
  }

  private static String freshId(LineLayout line, int n) {
    int k = n;
    while (true) {
      String id = String.format(Locale.ROOT, "found%d", k);
      if (line.structures().stream().noneMatch(s -> s.id().equals(id))) {
        return id;
      }
      k++;
    }
  }

  /** The discs around the structures and the bands along the spans that may hide one. */
  private List<TowerGrid.Area> areas(SpanLayout layout) {
    List<TowerGrid.Area> areas = new ArrayList<>();
    double r = options.searchRadiusM();
    for (LineLayout line : layout.lines()) {
      for (Structure s : line.structures()) {
        areas.add(new Disc(s.x(), s.y(), r));
      }
      for (Span span : line.spans()) {
        if (!Boolean.FALSE.equals(isLong(line, span.lengthM()))) {
          areas.add(new Band(span.frame(), bandHalfWidth(line, span.lengthM())));
        }
      }
    }
    return areas;
  }

  /**
   * Half-width of the band searched for a missing structure along a span of this length, m:
   * {@link #BAND_M}, widened for a span much longer than its line's median (or in a line too
   * short to tell).
   */
  static double bandHalfWidth(LineLayout line, double length) {
    return Boolean.FALSE.equals(isLong(line, length)) ? BAND_M
        : Math.max(BAND_M, WIDE_BAND_SHARE * length);
  }

  /**
   * Whether a span of this length is much longer than its line's median span (one structure
   * missing makes a span about twice as long); null when the line has too few spans to tell.
   * Structures are only added inside long spans, or, in a line too short to tell, from class-15
   * points: a tall tree in an ordinary span must never split it.
   */
  static Boolean isLong(LineLayout line, double length) {
    List<Span> spans = line.spans();
    if (spans.size() < MEDIAN_SPANS) {
      return null;
    }
    double[] lengths = spans.stream().mapToDouble(Span::lengthM).sorted().toArray();
    return length > LONG_SPAN_FACTOR * lengths[lengths.length / 2];
  }

  /** Lowest top of a tower column: a share of the highest nominal attachment height. */
  private static double topMin(SpanLayout layout) {
    double top = Double.NaN;
    for (LineLayout line : layout.lines()) {
      for (ConductorPosition p : line.spec().conductors()) {
        if (Double.isFinite(p.attachHeightM())) {
          top = Double.isNaN(top) ? p.attachHeightM() : Math.max(top, p.attachHeightM());
        }
      }
    }
    return Double.isNaN(top) ? DEFAULT_TOP_M : TOP_SHARE * top;
  }

  /** A disc in plan. */
  private record Disc(double x, double y, double r) implements TowerGrid.Area {
    @Override
    public boolean contains(double px, double py) {
      return Math.hypot(px - x, py - y) <= r;
    }

    @Override
    public double[] box() {
      return new double[] {x - r, y - r, x + r, y + r};
    }
  }

  /** A band along a span frame, structure to structure. */
  private record Band(SpanFrame f, double half) implements TowerGrid.Area {
    @Override
    public boolean contains(double px, double py) {
      double s = f.station(px, py);
      return s >= 0 && s <= f.length() && Math.abs(f.offset(px, py)) <= half;
    }

    @Override
    public double[] box() {
      double[] xs = {f.x(0, -half), f.x(0, half), f.x(f.length(), -half),
          f.x(f.length(), half)};
      double[] ys = {f.y(0, -half), f.y(0, half), f.y(f.length(), -half),
          f.y(f.length(), half)};
      return new double[] {Math.min(Math.min(xs[0], xs[1]), Math.min(xs[2], xs[3])),
          Math.min(Math.min(ys[0], ys[1]), Math.min(ys[2], ys[3])),
          Math.max(Math.max(xs[0], xs[1]), Math.max(xs[2], xs[3])),
          Math.max(Math.max(ys[0], ys[1]), Math.max(ys[2], ys[3]))};
    }
  }
}
