package org.clearance.clearance;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.clearance.survey.PointChunk;

/**
 * Measures, for every vegetation point near the line, its true 3D distance to every conductor of
 * the nearby spans in every condition (shared/reference/methods.md section 6).
 *
 * <p>Spans are indexed, points are streamed: each worker thread takes whole chunks, finds the
 * spans whose measuring box (conductor envelope in all conditions plus the keep radius) may
 * contain a point through a plan grid ({@link SpanIndex}), and measures with the exact
 * point-to-catenary kernel ({@link CatenaryDistance}); swinging conditions take the minimum over
 * their swing range. Points near a structure fall in the boxes of both adjacent spans and are
 * measured to both. Points within the keep radius of a conductor in any condition go to the
 * {@link NearPointWriter}; memory is bounded by the spans, never by the survey.
 */
public final class ClearanceEngine {

  /** Points buffered per worker before they are handed to the writer. */
  private static final int FLUSH_POINTS = 4096;

  /**
   * Options.
   *
   * @param keepRadius points closer than this to a conductor in any condition are stored for
   *     rule evaluation, m (&gt; 0); must exceed the widest zone of any profile to be evaluated
   * @param threads worker threads (&gt;= 1)
   * @param conductorExclusion in an unclassified survey, points closer than this to a conductor
   *     in the surveyed state are taken to be the conductor itself, m (&gt;= 0)
   * @param structureExclusion in an unclassified survey, points closer than this in plan to a
   *     structure centre are taken to be the structure, m (&gt;= 0)
   */
  public record Options(
      double keepRadius, int threads, double conductorExclusion, double structureExclusion) {

    /**
     * Keep radius 15 m (wider than any built-in zone, with room for several years of growth),
     * conductor exclusion 0.5 m (a twin bundle's half spacing plus lidar noise), structure
     * exclusion 8 m (a lattice tower's half cross-arm length; common practice, no source).
     */
    public static Options defaults(int threads) {
      return new Options(15.0, threads, 0.5, 8.0);
    }

    public Options {
      if (!(Double.isFinite(keepRadius) && keepRadius > 0)) {
        throw new IllegalArgumentException("keep radius must be positive: " + keepRadius);
      }
      if (threads < 1) {
        throw new IllegalArgumentException("threads must be at least 1: " + threads);
      }
      if (!(conductorExclusion >= 0 && structureExclusion >= 0)) {
        throw new IllegalArgumentException("exclusions must be >= 0");
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

  /**
   * @param models spans with their conductors in every condition of {@code conditions}
   * @param conditions the run's conditions, the surveyed state first
   * @param heights heights above ground
   * @param vegetation which points are vegetation
   * @param options options
   */
  public ClearanceEngine(List<SpanModel> models, ConditionSet conditions, HeightModel heights,
      VegetationSelector vegetation, Options options) {
    this.conditions = Objects.requireNonNull(conditions, "conditions");
    this.heights = Objects.requireNonNull(heights, "heights");
    this.vegetation = Objects.requireNonNull(vegetation, "vegetation");
    this.options = Objects.requireNonNull(options, "options");
    List<PreparedSpan> prepared = new ArrayList<>();
    for (int i = 0; i < models.size(); i++) {
      prepared.add(new PreparedSpan(i, models.get(i), conditions.size(), options.keepRadius()));
    }
    this.spans = List.copyOf(prepared);
    this.index = new SpanIndex(spans);
  }

  /** The layout the engine's near-points file must have. */
  public NearPointFile nearPointLayout() {
    List<String> ids = new ArrayList<>();
    List<String> names = new ArrayList<>();
    for (PreparedSpan p : spans) {
      ids.add(p.model.span().id());
      for (String n : p.names) {
        if (!names.contains(n)) {
          names.add(n);
        }
      }
    }
    return new NearPointFile(conditions.names(), conditions.groups(), ids, names);
  }

  /**
   * Streams all points of the source and measures them.
   *
   * @param source the survey
   * @param out where near points go (its layout from {@link #nearPointLayout()}), or null to keep
   *     only the per-span minima
   * @return per span what was measured, in the order of the models
   */
  public List<SpanClearance> measure(ChunkSource source, NearPointWriter out) {
    List<Worker> workers = Collections.synchronizedList(new ArrayList<>());
    source.readParallel(options.threads(), () -> {
      Worker w = new Worker(out);
      workers.add(w);
      return w;
    });
    for (Worker w : workers) {
      w.flush();
    }
    return merge(workers);
  }

  private List<SpanClearance> merge(List<Worker> workers) {
    int nc = conditions.size();
    List<SpanClearance> result = new ArrayList<>();
    for (PreparedSpan p : spans) {
      int i = p.index;
      List<ConditionMinimum> minima = new ArrayList<>();
      long measured = 0;
      long kept = 0;
      long exConductor = 0;
      long exStructure = 0;
      for (Worker w : workers) {
        measured += w.measured[i];
        kept += w.kept[i];
        exConductor += w.excludedConductor[i];
        exStructure += w.excludedStructure[i];
      }
      for (int k = 0; k < nc; k++) {
        ConditionMinimum best = null;
        for (Worker w : workers) {
          ConditionMinimum m = w.minimum[i][k];
          if (m != null && (best == null || m.distance() < best.distance())) {
            best = m;
          }
        }
        minima.add(best != null ? best : new ConditionMinimum(conditions.names().get(k),
            conditions.groups().get(k), Double.NaN, Double.NaN, Double.NaN, "", Double.NaN,
            Double.NaN, Double.NaN));
      }
      result.add(new SpanClearance(p.model.span().id(), minima, measured, kept, exConductor,
          exStructure));
    }
    return result;
  }

  /** One worker thread's state: its buffers and per-span minima. */
  private final class Worker implements Consumer<PointChunk> {
    private final NearPointWriter out;
    private final List<PointClearance> buffer = new ArrayList<>();
    private final ConditionMinimum[][] minimum;
    private final long[] measured;
    private final long[] kept;
    private final long[] excludedConductor;
    private final long[] excludedStructure;
    private final double[] best;
    private final int[] bestConductor;
    private final double[] bestAngle;

    Worker(NearPointWriter out) {
      this.out = out;
      int n = spans.size();
      minimum = new ConditionMinimum[n][conditions.size()];
      measured = new long[n];
      kept = new long[n];
      excludedConductor = new long[n];
      excludedStructure = new long[n];
      best = new double[conditions.size()];
      bestConductor = new int[conditions.size()];
      bestAngle = new double[conditions.size()];
    }

    @Override
    public void accept(PointChunk chunk) {
      double[] xs = chunk.x();
      double[] ys = chunk.y();
      double[] zs = chunk.z();
      short[] cls = chunk.classification();
      byte[] flags = chunk.flags();
      for (int i = 0; i < chunk.size(); i++) {
        if (!vegetation.candidateClass(cls[i])
            || (flags[i] & PointChunk.FLAG_WITHHELD) != 0) {
          continue;
        }
        int[] candidates = index.spansAt(xs[i], ys[i]);
        if (candidates.length == 0) {
          continue;
        }
        double hag = Double.NaN;
        boolean hagDone = false;
        for (int sp : candidates) {
          PreparedSpan p = spans.get(sp);
          double s = p.frame.station(xs[i], ys[i]);
          double e = p.frame.offset(xs[i], ys[i]);
          if (!p.inBox(s, e, zs[i])) {
            continue;
          }
          if (!hagDone) {
            hag = heights.heightAboveGround(xs[i], ys[i], zs[i]);
            hagDone = true;
          }
          measure(p, xs[i], ys[i], zs[i], cls[i], hag);
        }
      }
      if (buffer.size() >= FLUSH_POINTS) {
        flush();
      }
    }

    private void measure(PreparedSpan p, double x, double y, double z, int cls, double hag) {
      int sp = p.index;
      if (vegetation.inferred()) {
        if (!(hag >= VegetationSelector.UNCLASSIFIED_MIN_HEIGHT)) {
          return;
        }
        if (nearStructure(p, x, y)) {
          excludedStructure[sp]++;
          return;
        }
      }
      int nc = conditions.size();
      double nearest = Double.POSITIVE_INFINITY;
      for (int k = 0; k < nc; k++) {
        best[k] = Double.POSITIVE_INFINITY;
        bestConductor[k] = -1;
        CatenaryDistance[] row = p.kernels[k];
        for (int j = 0; j < row.length; j++) {
          CatenaryDistance kernel = row[j];
          if (kernel == null) {
            continue;
          }
          double phi = 0;
          double d;
          if (p.swingMin[k][j] < 0 || p.swingMax[k][j] > 0) {
            phi = kernel.closestSwingAngle(x, y, z, p.swingMin[k][j], p.swingMax[k][j]);
            d = kernel.distance(x, y, z, phi);
          } else {
            d = kernel.distance(x, y, z);
          }
          if (d < best[k]) {
            best[k] = d;
            bestConductor[k] = j;
            bestAngle[k] = phi;
          }
        }
        nearest = Math.min(nearest, best[k]);
      }
      if (vegetation.inferred() && best[0] < options.conductorExclusion()) {
        excludedConductor[sp]++;
        return;
      }
      measured[sp]++;
      boolean keep = nearest <= options.keepRadius();
      List<ConditionDistance> details = keep ? new ArrayList<>(nc) : null;
      for (int k = 0; k < nc; k++) {
        int j = bestConductor[k];
        String name = conditions.names().get(k);
        String group = conditions.groups().get(k);
        if (j < 0) {
          if (keep) {
            details.add(new ConditionDistance(name, group, Double.NaN, Double.NaN, Double.NaN, "",
                Double.NaN));
          }
          continue;
        }
        ConditionMinimum current = minimum[sp][k];
        boolean newMinimum = current == null || best[k] < current.distance();
        if (!keep && !newMinimum) {
          continue;
        }
        ConductorDistance cd = p.kernels[k][j].closest(x, y, z, bestAngle[k]);
        if (newMinimum) {
          minimum[sp][k] = new ConditionMinimum(name, group, cd.distance(), cd.horizontal(),
              cd.vertical(), p.names[j], x, y, z);
        }
        if (keep) {
          double station = p.frame.station(cd.closestX(), cd.closestY());
          details.add(new ConditionDistance(name, group, cd.distance(), cd.horizontal(),
              cd.vertical(), p.names[j], station));
        }
      }
      if (keep) {
        kept[sp]++;
        buffer.add(new PointClearance(p.model.span().id(), x, y, z, cls, hag, details));
      }
    }

    private boolean nearStructure(PreparedSpan p, double x, double y) {
      double r2 = options.structureExclusion() * options.structureExclusion();
      double ax = p.model.span().from().x() - x;
      double ay = p.model.span().from().y() - y;
      double bx = p.model.span().to().x() - x;
      double by = p.model.span().to().y() - y;
      return ax * ax + ay * ay < r2 || bx * bx + by * by < r2;
    }

    void flush() {
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
}
