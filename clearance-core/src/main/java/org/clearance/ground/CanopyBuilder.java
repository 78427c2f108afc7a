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
   * Shortcut: reads the survey on {@code threads} threads (one builder each, merged) and finds
   * the trees. The region is called from all reader threads at once.
   *
   * @param threads reader threads, 1 to 256 (1 reads on the calling thread)
   */
  public static List<Tree> findTrees(Survey survey, GroundModel ground, TreeOptions options,
      PlanPredicate region, int threads) {
    CanopyBuilder first = new CanopyBuilder(options, region);
    if (threads == 1) {
      survey.read(first);
    } else {
      List<CanopyBuilder> all = new ArrayList<>();
      survey.readParallel(threads, () -> {
        CanopyBuilder b = new CanopyBuilder(options, region);
        all.add(b);
        return b;
      });
      for (CanopyBuilder b : all) {
        first.absorb(b);
      }
    }
    return first.findTrees(ground, threads);
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

  /** Adds everything another builder (same options) has collected. */
  public void absorb(CanopyBuilder other) {
    surface.mergeMax(other.surface);
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
    short[] cls = chunk.classification();
    byte[] flags = chunk.flags();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      if (NOT_VEGETATION[cls[i] & 0xff] || (flags[i] & PointChunk.FLAG_WITHHELD) != 0
          || !region.test(x[i], y[i])) {
        continue;
      }
      surface.accumulateMax(x[i], y[i], z[i]);
    }
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
