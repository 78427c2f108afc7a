package org.clearance.label;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.clearance.ground.GroundModel;
import org.clearance.io.IntOrder;
import org.clearance.line.SpanFrame;
import org.clearance.wire.PointSource;
import org.clearance.wire.SetAside;

/**
 * Separates man-made objects from vegetation among the unclassified points near the line
 * (docs/labelling.md has every feature and threshold with its source).
 *
 * <ol>
 *   <li>The points: unclassified, at least 1 m above ground, within the region of a span, not
 *       already set aside as wire or airborne ({@link LabelPoints}); class-2 points more than
 *       {@link #GROUND_LABEL_MAX_HEIGHT_M} above ground (a ground label not believed); in a
 *       partly labelled survey the points labelled vegetation too, whose labels are trusted
 *       only as far as their object looks like vegetation.</li>
 *   <li>Per point, the dimensionality features of the points within {@link #RADIUS_M}
 *       ({@link LocalShape}).</li>
 *   <li>Objects: single-linkage clusters of the points at {@link #LINK_M} (steps 2 and 3 in
 *       one sweep, {@link NeighbourSweep}).</li>
 *   <li>Per object: mean linearity, planarity and scattering, share of planar points, share of
 *       points in the lowest quarter of its height (a mast stands on the ground), the plan
 *       spread of its upper half per metre of height (a crown spreads, a mast does not) and,
 *       where the survey records echoes, its share of later returns (return number 2 or more):
 *       a pulse goes on through a crown and returns again inside it, while a roof or solid body
 *       returns once and a lattice member or a wire returns first and then from the ground
 *       below.</li>
 *   <li>An object is man-made only on strong evidence: {@link ObjectKind#MAST} when at least
 *       {@link #MAST_MIN_HEIGHT_M} tall with upper spread at most {@link #MAST_MAX_SPREAD_M},
 *       and either standing (mean scattering at most {@link #MAST_MAX_SCATTERING}, at least
 *       {@link #MAST_MIN_BASE_SHARE} of its points in the lowest quarter of its height: a crane
 *       on its carrier, a mast) or a lattice (mean linearity at least
 *       {@link #LATTICE_MIN_LINEARITY}, scattering at most {@link #LATTICE_MAX_SCATTERING}, at
 *       least {@link #LATTICE_MIN_BASE_SHARE} of its points in the lowest quarter: a tower
 *       crane); {@link ObjectKind#PLANAR} when at least {@link #PLANAR_MIN_SHARE} of its
 *       points are planar, its mean scattering is at most {@link #PLANAR_MAX_SCATTERING} and
 *       it is a few flat faces stopping its pulses ({@link Facets#roofLike}: a crown is not a
 *       roof).
 *       Where echoes are recorded, an object with {@link #ECHO_VEGETATION_SHARE} or more later
 *       returns stays vegetation whatever its shape. An object that is none of these but long
 *       and thin ({@link #isLinear}) is {@link ObjectKind#LINEAR}: a wire nobody named, or a
 *       vegetation label along a wire. Everything else stays vegetation.</li>
 *   <li>Fragments too small to judge attach to a man-made object nearby
 *       ({@link #attachFragments}).</li>
 * </ol>
 * The points of man-made objects go into the {@link SetAside} with the reason OBJECT; the engine
 * counts them per span instead of measuring them and keeps them out of the canopy.
 */
public final class ObjectLabeller {

  /** Neighbourhood radius of the features, m: holds 10-40 points at the 10-20 points per m^2 of
   * line surveys (common practice, no source; the tile's median is 19 at 1 m, measured). */
  static final double RADIUS_M = 1.0;
  /** Fewest neighbours for a covariance worth reading (a plane needs 3; margin for noise). */
  static final int MIN_NEIGHBOURS = 6;
  /** Link distance of an object's points, m (as {@link #RADIUS_M}: a crown sampled at 1 point
   * per m^2 or more is one object). */
  static final double LINK_M = 1.0;
  /** Fewest points of an object the labelling may call man-made: the features of fewer are
   * too noisy (on the open tile a 38-point piece of a crown reached contrast 0.33). */
  static final int MIN_OBJECT_POINTS = 100;
  /** Least height of a mast-like object, m: lower objects are never near a conductor's zone
   * and are left to the planar test. */
  static final double MAST_MIN_HEIGHT_M = 4.0;
  /** Most mean scattering of a standing mast-like object (open tile: cranes and class-26
   * objects 0.11-0.19, tree stands 12 m and taller 0.18-0.32; docs/labelling.md). */
  static final double MAST_MAX_SCATTERING = 0.2;
  /** Most upper spread of a mast-like object, m^2 per m of height (open tile: cranes 0.76-1.16,
   * tree stands 12 m and taller 2.5-10.7). */
  static final double MAST_MAX_SPREAD_M = 2.0;
  /** Least share of a mast-like object's points in the lowest quarter of its height (open tile:
   * cranes 0.49-0.53, tree stands at most 0.30; generated conifer crowns, seen from above, start
   * high; docs/labelling.md). */
  static final double MAST_MIN_BASE_SHARE = 0.4;
  /** Least mean linearity of a lattice (a tower crane, a lattice mast: steel members sampled
   * along their length; open tile: tree stands at most 0.52, the tile tower's pieces
   * 0.55-0.66; the demo's tower crane 0.72, some of its conifer crowns 0.66-0.68). */
  static final double LATTICE_MIN_LINEARITY = 0.65;
  /** Most mean scattering of a lattice (open tile: tower pieces 0.06-0.07, the demo's tower
   * crane 0.065; tree stands 0.18 and more). */
  static final double LATTICE_MAX_SCATTERING = 0.1;
  /** Least share of a lattice's points in the lowest quarter of its height: its mast runs down
   * to the ground (the demo's tower crane 0.19 under its jib); a crown seen from above has none
   * there (generated conifer crowns 0.0, which reach linearity 0.66-0.68). */
  static final double LATTICE_MIN_BASE_SHARE = 0.1;
  /** Most mean scattering of a planar object: a sampled plane scatters only by its noise (3 cm
   * over a 1 m disc gives about 0.004; the demo's shed 0.003), a crown at least 0.04 (the
   * demo's) to 0.18 (the open tile's). */
  static final double PLANAR_MAX_SCATTERING = 0.03;
  /** The lowest quarter of an object's height, for {@link #MAST_MIN_BASE_SHARE}. */
  static final double BASE_QUARTER = 0.25;
  /** Least share of planar points of a planar object (open tile: tree stands at most 0.28,
   * cranes 0.28-0.41; a roof or wall sampled densely is nearly all planar). */
  static final double PLANAR_MIN_SHARE = 0.5;
  /** Share of later returns at which an object stays vegetation when echoes are recorded
   * (common practice, no source: inside a crown a pulse returns again, on a roof or a steel
   * member it returns first; see docs/labelling.md for the measured shares). */
  static final double ECHO_VEGETATION_SHARE = 0.1;
  /** Share of later returns, or of points of pulses with several returns, among all points
   * looked at above which the survey's echoes are read (a file with return numbers and numbers
   * of returns all 0 or all 1 tells nothing). */
  static final double ECHO_INFORMATIVE_SHARE = 0.05;
  /** Reach of a fragment's attachment to a man-made object, m (open tile: the cut-off top of a
   * crane's jib lies 2.5 and 4.1 m from the rest of the crane, measured). */
  static final double ATTACH_M = 5.0;
  /** Least height above ground of a fragment's lowest point for it to attach, m: a plant grows
   * from the ground, and every point from 1 m up is looked at (common practice, no source). */
  static final double FLOAT_M = 3.0;
  /** Least mean linearity of a linear object (a wire sampled along its length with 3 cm noise
   * over a 1 m neighbourhood: about 0.99; crowns at most 0.68, the demo's conifers, and the
   * demo's tower crane 0.72; docs/labelling.md). */
  static final double LINEAR_MIN_LINEARITY = 0.85;
  /** Least share of linear points of a linear object (as the wire finder's unfitted wires,
   * docs/wire-finder.md: 80 %). */
  static final double LINEAR_MIN_SHARE = 0.8;
  /** Least plan length of a linear object, m (the wire finder's least wire run). */
  static final double LINEAR_MIN_LENGTH_M = 10.0;
  /** Fewest points of an object judged for the linear kind only, below {@link
   * #MIN_OBJECT_POINTS}: a sparsely sampled wire (4 points per m) breaks at its gaps into pieces
   * of a few tens of points (issue 9); 20 points over the least length of {@link
   * #LINEAR_MIN_LENGTH_M} m is 2 points per m. A crown's piece is never 10 m long and 85 %
   * linear (docs/labelling.md), so the small size costs no vegetation. */
  static final int LINEAR_MIN_POINTS = 20;
  /** Height above ground beyond which a class-2 label is not believed and the point is looked
   * at as unclassified, m: SMRF's ground band is 0.5 m plus 1.25 m per unit of slope
   * (docs/ground.md); snow banks and kerbs stay below (common practice, no source). The
   * clearance engine uses the same value. */
  public static final double GROUND_LABEL_MAX_HEIGHT_M = 2.0;
  /** Plan cell of the upper spread, m. */
  static final double SPREAD_CELL_M = 0.5;

  private ObjectLabeller() {}

  /**
   * Labels the unclassified points near the spans and adds the man-made ones to
   * {@code setAside}, block by block along the line ({@link LabelBlocks}): the survey is read
   * once, the points of each block's window wait on disk in {@code spillFolder}, and the points
   * held at once are those of a block's window per thread, not of the survey.
   *
   * @param source the survey
   * @param frames the spans' plan frames
   * @param regionM points within this plan distance of a span's chord are looked at, m
   * @param ground the ground model
   * @param setAside the wire finder's points set aside; receives the man-made points
   * @param judgeVegetationLabels true in a partly labelled survey: points labelled vegetation
   *     (3-5) are clustered with the rest, and those of an object the evidence shows man-made
   *     or linear are not trusted (set aside, counted)
   * @param threads blocks labelled at once
   * @param spillFolder where the blocks' points wait (a temporary file, deleted before return)
   * @return the objects and counts
   * @throws IOException when the temporary file cannot be written or read
   */
  public static ObjectLabels label(PointSource source, List<SpanFrame> frames, double regionM,
      GroundModel ground, SetAside setAside, boolean judgeVegetationLabels, int threads,
      Path spillFolder) throws IOException {
    return LabelBlocks.label(source, frames, regionM, ground, setAside, judgeVegetationLabels,
        threads, spillFolder);
  }

  /** {@link #label(PointSource, List, double, GroundModel, SetAside, boolean, int, Path)} with
   * the blocks' points waiting in the system's temporary folder. */
  public static ObjectLabels label(PointSource source, List<SpanFrame> frames, double regionM,
      GroundModel ground, SetAside setAside, boolean judgeVegetationLabels, int threads) {
    try {
      return label(source, frames, regionM, ground, setAside, judgeVegetationLabels, threads,
          Path.of(System.getProperty("java.io.tmpdir")));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** {@link #label(PointSource, List, double, GroundModel, SetAside, boolean, int)} one block
   * at a time. */
  public static ObjectLabels label(PointSource source, List<SpanFrame> frames, double regionM,
      GroundModel ground, SetAside setAside, boolean judgeVegetationLabels) {
    return label(source, frames, regionM, ground, setAside, judgeVegetationLabels, 1);
  }

  /** The labelling of the whole line at once (all its points held): the reference of the
   * block-by-block path ({@link LabelBlocks}). */
  static ObjectLabels labelWhole(PointSource source, List<SpanFrame> frames, double regionM,
      GroundModel ground, SetAside setAside, boolean judgeVegetationLabels) {
    LabelPoints all = gather(source, () -> new LabelPoints(frames, regionM, ground, setAside,
        judgeVegetationLabels));
    return label(all, setAside);
  }

  /** The points of one pass, merged from the reading threads and sorted. */
  static LabelPoints gather(PointSource source, java.util.function.Supplier<LabelPoints> make) {
    List<LabelPoints> parts = Collections.synchronizedList(new ArrayList<>());
    source.stream(() -> {
      LabelPoints p = make.get();
      parts.add(p);
      return p;
    });
    LabelPoints all = make.get();
    parts.forEach(all::absorb);
    sort(all);
    return all;
  }

  /** Sorts the points by coordinates, so the result does not depend on the reading order. */
  static void sort(LabelPoints p) {
    double[] px = p.x;
    double[] py = p.y;
    double[] pz = p.z;
    int[] idx = IntOrder.sorted(p.size, (a, b) -> {
      int c = Double.compare(px[a], px[b]);
      c = c != 0 ? c : Double.compare(py[a], py[b]);
      return c != 0 ? c : Double.compare(pz[a], pz[b]);
    });
    double[] x = new double[p.size];
    double[] y = new double[p.size];
    double[] z = new double[p.size];
    float[] h = new float[p.size];
    byte[] r = new byte[p.size];
    byte[] o = new byte[p.size];
    byte[] l = new byte[p.size];
    byte[] w = new byte[p.size];
    for (int k = 0; k < p.size; k++) {
      int i = idx[k];
      x[k] = p.x[i];
      y[k] = p.y[i];
      z[k] = p.z[i];
      h[k] = p.hag[i];
      r[k] = p.returnNumber[i];
      o[k] = p.returns[i];
      l[k] = p.label[i];
      w[k] = p.zone[i];
    }
    p.zone = w;
    p.x = x;
    p.y = y;
    p.z = z;
    p.hag = h;
    p.returnNumber = r;
    p.returns = o;
    p.label = l;
  }

  static ObjectLabels label(LabelPoints p, SetAside setAside) {
    int n = p.size;
    if (n == 0) {
      return ObjectLabels.NONE;
    }
    Judged j = judge(p, echoesInformative(p.later, p.multiPulse, n));
    int[] parent = j.root();
    ObjectKind[] kindOf = j.kindOf();
    boolean echoes = j.echoes();
    List<LabelledObject> objects = sortedObjects(j.objects());
    long setAsideCount = 0;
    long vegetationLabels = 0;
    long vegetationLabelsDoubted = 0;
    long groundDoubted = 0;
    for (int i = 0; i < n; i++) {
      ObjectKind k = kindOf[parent[i]];
      boolean manMade = k != null && k != ObjectKind.VEGETATION;
      vegetationLabels += p.label[i] == LabelPoints.VEGETATION_LABEL ? 1 : 0;
      groundDoubted += p.label[i] == LabelPoints.GROUND_DOUBTED ? 1 : 0;
      if (manMade) {
        setAside.addObject(SetAside.key(p.x[i], p.y[i], p.z[i]));
        setAsideCount++;
        vegetationLabelsDoubted += p.label[i] == LabelPoints.VEGETATION_LABEL ? 1 : 0;
      }
    }
    return new ObjectLabels(objects, n, setAsideCount, echoes,
        new ObjectLabels.Doubted(vegetationLabels, vegetationLabelsDoubted, groundDoubted));
  }

  /**
   * Whether the survey's echoes tell anything: at least {@link #ECHO_INFORMATIVE_SHARE} of the
   * points looked at are later returns or come from pulses with several returns.
   *
   * @param later points with return number 2 or more
   * @param multiPulse points whose pulse had several returns
   * @param n points looked at
   */
  static boolean echoesInformative(long later, long multiPulse, long n) {
    return n > 0 && (later >= ECHO_INFORMATIVE_SHARE * n
        || multiPulse >= ECHO_INFORMATIVE_SHARE * n);
  }

  /**
   * What steps 2-6 found for a set of points.
   *
   * @param root each point's object (the index of its root point)
   * @param kindOf the kind at each object's root (null for an unjudged fragment)
   * @param objects the judged objects
   * @param objectRoots the root of each judged object, in the order of {@code objects}
   * @param echoes whether the return numbers were read
   */
  record Judged(int[] root, ObjectKind[] kindOf, List<LabelledObject> objects,
      List<Integer> objectRoots, boolean echoes) {}

  /** The objects in a fixed order (by plan position of the top, then height), whatever the
   * reading or the blocks. */
  static List<LabelledObject> sortedObjects(List<LabelledObject> objects) {
    List<LabelledObject> out = new ArrayList<>(objects);
    out.sort(java.util.Comparator.comparingDouble(LabelledObject::x)
        .thenComparingDouble(LabelledObject::y).thenComparingDouble(LabelledObject::heightM));
    return out;
  }

  /** Steps 2-6 on sorted points, with the survey's echoes read or not. */
  static Judged judge(LabelPoints p, boolean echoes) {
    int n = p.size;
    LocalShape[] shape = new LocalShape[n];
    int[] parent = NeighbourSweep.shapesAndObjects(p, shape);
    ObjectKind[] kindOf = new ObjectKind[n];
    List<Integer> roots = new ArrayList<>();
    List<LabelledObject> objects = ObjectEvidence.objects(p, parent, shape, echoes, kindOf,
        roots);
    attachFragments(p, parent, kindOf);
    return new Judged(parent, kindOf, objects, roots, echoes);
  }

  /**
   * Step 6: a fragment (an object of fewer than {@link #MIN_OBJECT_POINTS} points, too few to
   * judge by itself) takes the kind of a man-made object other than a linear one (a fragment
   * beside a wire may be a crown near a conductor) with a point within {@link #ATTACH_M}
   * of it when no point of a vegetation object lies that near and its lowest point floats at
   * least {@link #FLOAT_M} above ground (nothing that grows there): the top of a crane's jib cut
   * off from the rest where its middle lies on a wire and was set aside as wire.
   */
  private static void attachFragments(LabelPoints p, int[] root, ObjectKind[] kindOf) {
    int n = p.size;
    int[] count = new int[n];
    float[] lowest = new float[n];
    Arrays.fill(lowest, Float.POSITIVE_INFINITY);
    for (int i = 0; i < n; i++) {
      count[root[i]]++;
      lowest[root[i]] = Math.min(lowest[root[i]], p.hag[i]);
    }
    boolean anyFragment = false;
    for (int i = 0; i < n && !anyFragment; i++) {
      anyFragment = count[root[i]] < MIN_OBJECT_POINTS && lowest[root[i]] >= FLOAT_M;
    }
    if (!anyFragment) {
      return;
    }
    CellIndex wide = new CellIndex(p.x, p.y, p.z, n, ATTACH_M);
    ObjectKind[] verdict = new ObjectKind[n];
    boolean[] blocked = new boolean[n];
    int[] order = wide.order;
    int[] from = new int[CellIndex.COLUMNS];
    int[] to = new int[CellIndex.COLUMNS];
    double reach2 = ATTACH_M * ATTACH_M;
    for (int i = 0; i < n; i++) {
      int r = root[i];
      if (count[r] >= MIN_OBJECT_POINTS || lowest[r] < FLOAT_M || blocked[r]) {
        continue;
      }
      wide.runs(i, from, to);
      double px = p.x[i];
      double py = p.y[i];
      double pz = p.z[i];
      search:
      for (int k = 0; k < CellIndex.COLUMNS; k++) {
        for (int t = from[k]; t < to[k]; t++) {
          double dx = wide.sx[t] - px;
          double dy = wide.sy[t] - py;
          double dz = wide.sz[t] - pz;
          if (dx * dx + dy * dy + dz * dz > reach2) {
            continue;
          }
          ObjectKind kind = kindOf[root[order[t]]];
          if (kind == ObjectKind.VEGETATION) {
            // blocked whatever else lies near: the rest of the search cannot change that
            blocked[r] = true;
            break search;
          } else if (kind != null && kind != ObjectKind.LINEAR && verdict[r] == null) {
            // a fragment beside a wire may be a crown near the conductor: it stays vegetation
            verdict[r] = kind;
          }
        }
      }
    }
    for (int r = 0; r < n; r++) {
      if (verdict[r] != null && !blocked[r] && root[r] == r) {
        kindOf[r] = verdict[r];
      }
    }
  }

  /**
   * Step 5b: a long thin object, a wire or cable the wire finder did not name, or a run of
   * points labelled vegetation along a wire: mean linearity at least
   * {@link #LINEAR_MIN_LINEARITY}, at least {@link #LINEAR_MIN_SHARE} of its points linear, and
   * at least {@link #LINEAR_MIN_LENGTH_M} long in plan.
   *
   * @param linearity mean linearity of its points (0-1)
   * @param linearShare share of its points whose largest feature is linearity (0-1)
   * @param lengthM diagonal of its plan extent, m
   */
  static boolean isLinear(double linearity, double linearShare, double lengthM) {
    return linearity >= LINEAR_MIN_LINEARITY && linearShare >= LINEAR_MIN_SHARE
        && lengthM >= LINEAR_MIN_LENGTH_M;
  }

  /** The decision of step 5 (class comment; the shares as {@link LabelledObject}'s). */
  static ObjectKind decide(double heightM, double linearity, double scattering,
      double planarShare, double spreadM, double baseShare, double multiReturnShare,
      double multiPulseShare, double facetShare) {
    if (multiReturnShare >= ECHO_VEGETATION_SHARE) {
      return ObjectKind.VEGETATION;
    }
    boolean tall = heightM >= MAST_MIN_HEIGHT_M && spreadM <= MAST_MAX_SPREAD_M;
    boolean standing = scattering <= MAST_MAX_SCATTERING && baseShare >= MAST_MIN_BASE_SHARE;
    boolean lattice = linearity >= LATTICE_MIN_LINEARITY && scattering <= LATTICE_MAX_SCATTERING
        && baseShare >= LATTICE_MIN_BASE_SHARE;
    if (tall && (standing || lattice)) {
      return ObjectKind.MAST;
    }
    if (planarShare >= PLANAR_MIN_SHARE && scattering <= PLANAR_MAX_SCATTERING
        && Facets.roofLike(facetShare, multiPulseShare)) {
      return ObjectKind.PLANAR;
    }
    return ObjectKind.VEGETATION;
  }
}
