package org.clearance.wire;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import org.clearance.ground.HeightModel;
import org.clearance.line.ConductorPosition;
import org.clearance.line.LineLayout;
import org.clearance.line.Structure;
import org.clearance.survey.PointChunk;

/**
 * Locates the wood poles of a pole line (distribution) in the points, in any classification
 * mode (package-private). Around each structures-file position the points within
 * {@link #REACH_M} in plan are kept while the survey streams by (memory follows the number of
 * poles, not the survey's size; at most {@link #MAX_POINTS} per pole). A pole is a thin vertical
 * column: at least {@link #MIN_POINTS} returns within {@link #COLUMN_R_M} of one plan axis,
 * occupying at least {@link #MIN_SLICES} one-metre height slices and reaching down to
 * {@link #FOOT_SHARE} of the highest nominal attachment height, with few returns in the ring
 * around it below the wires (a trunk under a crown has its crown there), and with the line's
 * wire points converging on it: near the attachment heights, within {@link #WIRE_ALONG_M} along
 * the line, most of them lie within the framing's widest offset of the axis (a tree trunk beside
 * the line sees the wires off to one side). Only a pole found within {@link #SEARCH_M} of the
 * file's position, and no second distinct column passing the same tests, repairs the position.
 * Thresholds: a wood pole is 0.25-0.45 m across (issue 15; common practice, no source).
 */
final class PoleFinder {

  /** Radius around a file position within which a pole repairs it, m. */
  static final double SEARCH_M = 3.0;
  /** Radius of the points kept around a file position, m: the search plus the wire context. */
  static final double REACH_M = 7.5;
  /** Column radius, m: a 0.45 m pole's radius plus 0.1 m for scatter. */
  static final double COLUMN_R_M = 0.33;
  /** Outer radius of the ring around a column that must stay nearly empty below the wires, m. */
  static final double RING_M = 1.0;
  /** Largest pole radius, m: a 0.45 m pole (issue 15). */
  static final double POLE_R_M = 0.23;
  /** Distance of a side return from the pole's circle, m: survey noise (common practice, no
   * source). */
  static final double SIDE_TOL_M = 0.04;
  /** Fewest side returns on the pole's circle. */
  static final int SIDE_LEAST = 4;
  /** Most side returns tried for the circle (every three of them propose one). */
  static final int MAX_SIDE = 40;
  /** Fewest returns on a column. */
  static final int MIN_POINTS = 5;
  /** Fewest one-metre slices a column occupies. */
  static final int MIN_SLICES = 4;
  /** A column's lowest return stands below this share of the highest nominal attachment. */
  static final double FOOT_SHARE = 0.6;
  /** Wire points are looked for above the lowest nominal attachment less this, m (a pole may
   * stand 2 m shorter than nominal, and a conductor sags a little near its pole). */
  static final double WIRE_BELOW_M = 2.5;
  /** Along-line reach of the wire context on each side of a column, m. */
  static final double WIRE_ALONG_M = 4.0;
  /** Least along-line distance of a wire context point, m (off the pole's own equipment). */
  static final double WIRE_FROM_M = 0.6;
  /** Share of the wire context points that must lie within the framing's reach of the axis. */
  static final double WIRE_SHARE = 0.75;
  /** Fewest wire context points on a side. */
  static final int MIN_WIRE_POINTS = 2;
  /** Two accepted columns farther apart than this are distinct (ambiguous), m. */
  static final double DISTINCT_M = 1.0;
  /** A file position farther than this from its pole is moved, m: the column centre's own
   * scatter is a few centimetres. */
  static final double MOVE_M = 0.2;
  /** Points kept per pole at most. */
  static final int MAX_POINTS = 100_000;
  /** Height above ground of the lowest return used, m (grass, ground model error). */
  static final double MIN_HAG_M = 0.5;

  /** Outcome for one structure. */
  enum Outcome { FOUND, NOT_FOUND, AMBIGUOUS }

  /**
   * One structure's result: the pole centre (NaN when not found), the plan distance from the
   * file position, m, the column's points and a plain-words reason.
   */
  record Result(Outcome outcome, double x, double y, double shiftM, int points, String why) {}

  /** One pole line structure looked at. */
  record Site(Structure s, double ax, double ay, double minAttach, double maxAttach,
      double reach, boolean end) {}

  private final List<Site> sites;
  private final double[][] xs;
  private final double[][] ys;
  private final double[][] hs;
  private final int[] counts;

  private PoleFinder(List<Site> sites) {
    this.sites = sites;
    int n = sites.size();
    xs = new double[n][];
    ys = new double[n][];
    hs = new double[n][];
    counts = new int[n];
    for (int k = 0; k < n; k++) {
      xs[k] = new double[64];
      ys[k] = new double[64];
      hs[k] = new double[64];
    }
  }

  /** The sites of a pole line: each structure with the line's direction and framing. */
  static List<Site> sites(LineLayout line) {
    List<Structure> st = line.structures();
    double minA = Double.NaN;
    double maxA = Double.NaN;
    double reach = 0;
    for (ConductorPosition p : line.spec().conductors()) {
      if (Double.isFinite(p.attachHeightM())) {
        minA = Double.isNaN(minA) ? p.attachHeightM() : Math.min(minA, p.attachHeightM());
        maxA = Double.isNaN(maxA) ? p.attachHeightM() : Math.max(maxA, p.attachHeightM());
      }
      if (Double.isFinite(p.offsetM())) {
        reach = Math.max(reach, Math.abs(p.offsetM()));
      }
    }
    if (Double.isNaN(minA)) {
      minA = 9.0;
      maxA = 11.0;
    }
    List<Site> out = new ArrayList<>();
    for (int k = 0; k < st.size(); k++) {
      Structure a = st.get(Math.max(0, k - 1));
      Structure b = st.get(Math.min(st.size() - 1, k + 1));
      double dx = b.x() - a.x();
      double dy = b.y() - a.y();
      double len = Math.hypot(dx, dy);
      if (len == 0) {
        dx = 1;
        dy = 0;
        len = 1;
      }
      out.add(new Site(st.get(k), dx / len, dy / len, minA, maxA, reach,
          k == 0 || k == st.size() - 1));
    }
    return out;
  }

  /** Reads the points around the sites and locates each pole. */
  static List<Result> locate(PointSource source, List<Site> sites, HeightModel heights) {
    if (sites.isEmpty()) {
      return List.of();
    }
    List<double[]> boxes = new ArrayList<>();
    for (Site s : sites) {
      boxes.add(new double[] {s.s().x() - REACH_M, s.s().y() - REACH_M, s.s().x() + REACH_M,
          s.s().y() + REACH_M});
    }
    CorridorIndex index = new CorridorIndex(boxes);
    PoleFinder all = new PoleFinder(sites);
    source.stream(() -> chunk -> all.accept(chunk, index, heights));
    List<Result> out = new ArrayList<>();
    for (int k = 0; k < sites.size(); k++) {
      out.add(all.locate(k));
    }
    return out;
  }

  private synchronized void add(int k, double x, double y, double h) {
    if (counts[k] == MAX_POINTS) {
      return;
    }
    if (counts[k] == xs[k].length) {
      int n = Math.min(MAX_POINTS, 2 * counts[k]);
      xs[k] = Arrays.copyOf(xs[k], n);
      ys[k] = Arrays.copyOf(ys[k], n);
      hs[k] = Arrays.copyOf(hs[k], n);
    }
    xs[k][counts[k]] = x;
    ys[k][counts[k]] = y;
    hs[k][counts[k]] = h;
    counts[k]++;
  }

  private void accept(PointChunk chunk, CorridorIndex index, HeightModel heights) {
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] z = chunk.z();
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      int c = cls[i];
      if (c == CandidateCollector.GROUND || c == CandidateCollector.LOW_NOISE
          || c == CandidateCollector.HIGH_NOISE || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
        continue;
      }
      for (int k : index.at(x[i], y[i])) {
        Site s = sites.get(k);
        if (Math.hypot(x[i] - s.s().x(), y[i] - s.s().y()) <= REACH_M) {
          double h = heights.heightAboveGround(x[i], y[i], z[i]);
          if (h >= MIN_HAG_M) {
            add(k, x[i], y[i], h);
          }
        }
      }
    }
  }

  /** Locates the pole of site k from the points kept. */
  private Result locate(int k) {
    Site s = sites.get(k);
    int n = counts[k];
    double[] x = xs[k];
    double[] y = ys[k];
    double[] h = hs[k];
    double bandTop = s.minAttach() - WIRE_BELOW_M;
    double top = s.maxAttach() + 2.0;
    List<double[]> accepted = new ArrayList<>();
    // one seed per plan cell of the column's radius: the work stays bounded in dense vegetation
    java.util.Set<Long> seeded = new java.util.HashSet<>();
    for (int i = 0; i < n; i++) {
      if (h[i] > FOOT_SHARE * s.maxAttach()
          || Math.hypot(x[i] - s.s().x(), y[i] - s.s().y()) > SEARCH_M + COLUMN_R_M
          || !seeded.add((long) Math.floor(x[i] / COLUMN_R_M) * 1_000_003L
              + (long) Math.floor(y[i] / COLUMN_R_M))) {
        continue;
      }
      double[] c = column(x, y, h, n, x[i], y[i], top, bandTop, s.ax(), s.ay());
      for (int it = 0; it < 3 && c != null; it++) {
        c = column(x, y, h, n, c[0], c[1], top, bandTop, s.ax(), s.ay());
      }
      if (c == null || Math.hypot(c[0] - s.s().x(), c[1] - s.s().y()) > SEARCH_M
          || !isolated(x, y, h, n, c, bandTop) || !wired(s, x, y, h, n, c, bandTop, top)) {
        continue;
      }
      boolean merged = false;
      for (double[] a : accepted) {
        if (Math.hypot(a[0] - c[0], a[1] - c[1]) <= DISTINCT_M) {
          merged = true;
          if (c[2] > a[2]) {
            System.arraycopy(c, 0, a, 0, 3);
          }
        }
      }
      if (!merged) {
        accepted.add(c);
      }
    }
    if (accepted.isEmpty()) {
      return new Result(Outcome.NOT_FOUND, Double.NaN, Double.NaN, Double.NaN, 0, String.format(
          Locale.ROOT, "no pole column with wires converging on it within %.1f m", SEARCH_M));
    }
    if (accepted.size() > 1) {
      return new Result(Outcome.AMBIGUOUS, Double.NaN, Double.NaN, Double.NaN, 0,
          String.format(Locale.ROOT, "%d distinct pole-like columns within %.1f m",
              accepted.size(), SEARCH_M));
    }
    double[] c = accepted.get(0);
    return new Result(Outcome.FOUND, c[0], c[1],
        Math.hypot(c[0] - s.s().x(), c[1] - s.s().y()), (int) c[2],
        "wood pole column of survey points with the line's wires converging on it");
  }

  /**
   * The column around (cx, cy): its centre, m, and count of returns up to {@code top}, or null
   * when it is not a column (too few returns or slices, no foot). The centre is that of the
   * circle most of the pole's side returns lie on ({@link Circle#robust}: the arm, insulators
   * or a shrub at the foot are left out by the consensus); side returns are those below
   * {@code bandTop}, m above ground, or higher ones not on a wire along the line (unit plan
   * vector ax, ay). Else the mean of the side returns, else the plan median of all.
   */
  private static double[] column(double[] x, double[] y, double[] h, int n, double cx,
      double cy, double top, double bandTop, double ax, double ay) {
    List<double[]> in = new ArrayList<>();
    long slices = 0;
    double low = Double.POSITIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      if (h[i] <= top && Math.hypot(x[i] - cx, y[i] - cy) <= COLUMN_R_M) {
        in.add(new double[] {x[i], y[i], h[i]});
        slices |= 1L << Math.min(63, (int) h[i]);
        low = Math.min(low, h[i]);
      }
    }
    if (in.size() < MIN_POINTS || Long.bitCount(slices) < MIN_SLICES
        || low > FOOT_SHARE * top) {
      return null;
    }
    double[] mx = in.stream().mapToDouble(p -> p[0]).sorted().toArray();
    double[] my = in.stream().mapToDouble(p -> p[1]).sorted().toArray();
    double[] c = {median(mx), median(my), in.size()};
    // the pole's own side: not on a wire (the conductors of a stacked framing run within the
    // column's radius); the arm and insulators are left out by the circle's consensus
    List<double[]> side = in.stream().filter(p -> p[2] <= bandTop
        || !onWire(x, y, h, n, p, ax, ay)).toList();
    double[] circle = side.size() > MAX_SIDE ? null
        : Circle.robust(side, POLE_R_M, SIDE_TOL_M, SIDE_LEAST);
    if (circle != null && Math.hypot(circle[0] - c[0], circle[1] - c[1]) <= COLUMN_R_M) {
      c[0] = circle[0];
      c[1] = circle[1];
    } else if (side.size() >= 3) {
      c[0] = side.stream().mapToDouble(p -> p[0]).average().orElseThrow();
      c[1] = side.stream().mapToDouble(p -> p[1]).average().orElseThrow();
    }
    return c;
  }

  /**
   * Whether return p (x, y, height) lies on a wire running along the line (unit plan vector
   * ax, ay): another return lies {@link #WIRE_FROM_M} to 2 m from it along the line, within
   * 0.15 m across and 0.3 m in height (a conductor's slope near its pole is small).
   */
  private static boolean onWire(double[] x, double[] y, double[] h, int n, double[] p,
      double ax, double ay) {
    for (int i = 0; i < n; i++) {
      double dx = x[i] - p[0];
      double dy = y[i] - p[1];
      double a = Math.abs(dx * ax + dy * ay);
      if (a >= WIRE_FROM_M && a <= 2.0 && Math.abs(-dx * ay + dy * ax) <= 0.15
          && Math.abs(h[i] - p[2]) <= 0.3) {
        return true;
      }
    }
    return false;
  }

  private static double median(double[] v) {
    int m = v.length / 2;
    return v.length % 2 == 1 ? v[m] : 0.5 * (v[m - 1] + v[m]);
  }

  /** Whether the ring around the column, below the wires, holds no more returns than it. */
  private static boolean isolated(double[] x, double[] y, double[] h, int n, double[] c,
      double bandTop) {
    int col = 0;
    int ring = 0;
    for (int i = 0; i < n; i++) {
      if (h[i] > bandTop) {
        continue;
      }
      double d = Math.hypot(x[i] - c[0], y[i] - c[1]);
      if (d <= COLUMN_R_M) {
        col++;
      } else if (d <= RING_M) {
        ring++;
      }
    }
    return ring <= Math.max(2, col);
  }

  /** Whether the line's wire points converge on the column (see the class comment). */
  private static boolean wired(Site s, double[] x, double[] y, double[] h, int n, double[] c,
      double bandTop, double top) {
    int before = 0;
    int after = 0;
    int off = 0;
    double within = s.reach() + 0.5;
    for (int i = 0; i < n; i++) {
      if (h[i] < bandTop || h[i] > top) {
        continue;
      }
      double dx = x[i] - c[0];
      double dy = y[i] - c[1];
      double a = dx * s.ax() + dy * s.ay();
      double o = -dx * s.ay() + dy * s.ax();
      if (Math.abs(a) < WIRE_FROM_M || Math.abs(a) > WIRE_ALONG_M || Math.abs(o) > within + 3) {
        continue;
      }
      if (Math.abs(o) > within) {
        off++;
      } else if (a < 0) {
        before++;
      } else {
        after++;
      }
    }
    boolean sides = s.end() ? Math.max(before, after) >= MIN_WIRE_POINTS
        : Math.min(before, after) >= MIN_WIRE_POINTS;
    return sides && before + after >= WIRE_SHARE * (before + after + off);
  }
}
