package org.clearance.ground;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;

/**
 * Collects the canopy surface from a stream of point chunks (the highest vegetation-like return
 * per cell), restricted to a plan region such as the corridor around the line, and then finds the
 * trees in it against a {@link GroundModel}.
 *
 * <p>Points of these ASPRS classes are left out, since they are not vegetation: 2 ground, 6
 * building, 7 low noise, 9 water, 10 rail, 11 road surface, 13-16 wires, towers and insulators,
 * 17 bridge deck, 18 high noise, 19 overhead structure, 20 ignored ground, 21 snow, 22 temporal
 * exclusion; withheld points too. Where the survey's wires are not yet classified, relabel the
 * wire points (e.g. to 14) in the chunk before passing it, or they will read as tall canopy.
 *
 * <p>Memory: one sparse raster at {@link TreeOptions#cellSize()} over the accepted region only.
 */
public final class CanopyBuilder implements Consumer<PointChunk> {
  private static final boolean[] NOT_VEGETATION = new boolean[256];

  static {
    for (int cls : new int[] {2, 6, 7, 9, 10, 11, 13, 14, 15, 16, 17, 18, 19, 20, 21, 22}) {
      NOT_VEGETATION[cls] = true;
    }
  }

  /** Points a {@link Batch} buffers before it takes the builder's lock. */
  static final int BATCH_POINTS = 4096;

  private final TreeOptions options;
  private final PlanPredicate region;
  private final SparseGrid surface;

  /**
   * @param options canopy and tree-top parameters
   * @param region plan positions to keep, e.g. within 60 m of a span; {@link PlanPredicate#ALL}
   */
  public CanopyBuilder(TreeOptions options, PlanPredicate region) {
    this.options = Objects.requireNonNull(options, "options");
    this.region = Objects.requireNonNull(region, "region");
    this.surface = new SparseGrid(options.cellSize());
  }

  /** Shortcut: collects every chunk and finds the trees. */
  public static List<Tree> findTrees(Iterable<PointChunk> chunks, GroundModel ground,
      TreeOptions options, PlanPredicate region) {
    CanopyBuilder b = new CanopyBuilder(options, region);
    chunks.forEach(b);
    return b.findTrees(ground);
  }

  /**
   * Shortcut: reads the survey on {@code threads} threads into one builder (each thread adds its
   * points in batches under the builder's lock) and finds the trees. The region is called from
   * all reader threads at once.
   *
   * @param threads reader threads, 1 to 256 (1 reads on the calling thread)
   */
  public static List<Tree> findTrees(Survey survey, GroundModel ground, TreeOptions options,
      PlanPredicate region, int threads) {
    CanopyBuilder b = new CanopyBuilder(options, region);
    if (threads == 1) {
      survey.read(b);
    } else {
      List<Batch> batches = new ArrayList<>();
      survey.readParallel(threads, () -> {
        Batch batch = b.batch();
        batches.add(batch);
        return chunk -> {
          double[] x = chunk.x();
          double[] y = chunk.y();
          double[] z = chunk.z();
          for (int i = 0, n = chunk.size(); i < n; i++) {
            if (isCanopyPoint(chunk, i)) {
              batch.add(x[i], y[i], z[i]);
            }
          }
        };
      });
      batches.forEach(Batch::flush);
    }
    return b.findTrees(ground, threads);
  }

  /**
   * A reader thread's buffer of canopy points, added to its builder under the builder's lock
   * {@value #BATCH_POINTS} at a time: one raster for all threads (a raster per thread held the
   * corridor's canopy once per thread). The highest point per cell does not depend on the order
   * the points arrive in, so neither does the result. Call {@link #flush()} after the last point.
   */
  public final class Batch {
    private final double[] xyz = new double[3 * BATCH_POINTS];
    private int n;

    private Batch() {}

    /** As {@link CanopyBuilder#add} (the region tested here, outside the lock), buffered. */
    public void add(double x, double y, double z) {
      if (!region.test(x, y)) {
        return;
      }
      xyz[3 * n] = x;
      xyz[3 * n + 1] = y;
      xyz[3 * n + 2] = z;
      if (++n == BATCH_POINTS) {
        flush();
      }
    }

    /** Adds the buffered points to the builder. */
    public void flush() {
      synchronized (CanopyBuilder.this) {
        for (int i = 0; i < n; i++) {
          surface.accumulateMax(xyz[3 * i], xyz[3 * i + 1], xyz[3 * i + 2]);
        }
      }
      n = 0;
    }
  }

  /** A buffer for one reader thread; see {@link Batch}. */
  public Batch batch() {
    return new Batch();
  }

  /**
   * Adds one point the caller has already judged to be vegetation (class and any other tests
   * done), if it lies in the region; coordinates in metres.
   */
  public void add(double x, double y, double z) {
    if (region.test(x, y)) {
      surface.accumulateMax(x, y, z);
    }
  }

  /** True when a point of class {@code cls} can be part of the canopy. */
  static boolean isCanopyClass(int cls) {
    return !NOT_VEGETATION[cls & 0xff];
  }

  /** Adds a chunk's vegetation-like points inside the region (coordinates in metres). */
  @Override
  public void accept(PointChunk chunk) {
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] z = chunk.z();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      if (isCanopyPoint(chunk, i)) {
        add(x[i], y[i], z[i]);
      }
    }
  }

  /** True when point {@code i} of the chunk can be canopy: a canopy class, not withheld. */
  private static boolean isCanopyPoint(PointChunk chunk, int i) {
    return !NOT_VEGETATION[chunk.classification()[i] & 0xff]
        && (chunk.flags()[i] & PointChunk.FLAG_WITHHELD) == 0;
  }

  /**
   * Finds the trees of the canopy collected so far, block by block (see {@link TreeFinder}).
   *
   * @param ground the terrain; canopy cells outside its coverage are skipped
   * @return the trees, in no particular order
   */
  public List<Tree> findTrees(GroundModel ground) {
    return findTrees(ground, 1);
  }

  /**
   * As {@link #findTrees(GroundModel)}, the blocks on {@code threads} threads (same trees in the
   * same order for any thread count).
   *
   * @param threads worker threads, &gt;= 1
   */
  public List<Tree> findTrees(GroundModel ground, int threads) {
    return TreeFinder.find(surface, ground, options, threads);
  }

  /** Approximate heap bytes of the canopy raster. */
  public long memoryBytes() {
    return surface.memoryBytes();
  }
}
