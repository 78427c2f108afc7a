package org.clearance.ground;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;
import org.clearance.InputException;
import org.clearance.io.OrderedParallel;
import org.clearance.survey.PointChunk;
import org.clearance.survey.Survey;

/**
 * Builds a {@link GroundModel} from a stream of point chunks in one pass.
 *
 * <p>While the survey streams by, the builder keeps only two sparse rasters: the lowest point per
 * cell over all non-noise points, and the lowest class-2 (ground) point per cell, each with its
 * position in the cell ({@link LowestPointGrid}). {@link #build()} then makes the terrain block
 * by block (dense rasters of {@code blockSize} plus an overlap), so memory stays bounded by the
 * corridor's area:
 * <ul>
 *   <li>class 2 used: the class-2 minimum surface, holes (under buildings, dense canopy) filled
 *       by Laplace inpainting;
 *   <li>filter used: SMRF (Pingel, Clarke &amp; McBride 2013) over the minimum surface of all
 *       points; the cells it keeps as ground make the provisional DEM.
 * </ul>
 * Finally each ground cell's lowest point is moved to the cell centre along the provisional
 * surface's gradient (undoing the minimum surface's downhill bias on slopes) and the terrain is
 * inpainted again from those values.
 * Points of class 7 (low noise) and 18 (high noise) and withheld points are ignored.
 *
 * <p>Usage: {@code GroundModelBuilder b = new GroundModelBuilder(options); survey.read(b);
 * GroundModel g = b.build();} or {@link #build(Survey, GroundOptions, int)}.
 */
public final class GroundModelBuilder implements Consumer<PointChunk> {
  /** ASPRS class 2: ground. */
  static final int CLASS_GROUND = 2;
  /** ASPRS class 7: low point (noise). */
  static final int CLASS_LOW_NOISE = 7;
  /** ASPRS class 18: high noise. */
  static final int CLASS_HIGH_NOISE = 18;

  /** Cells beyond an area that its heights interpolate from (bilinear: one; one more spare). */
  static final int INTERPOLATION_PAD_CELLS = 2;

  private final GroundOptions options;
  private LowestPointGrid surface;
  private LowestPointGrid classified;
  private long points;
  private long groundPoints;

  /** @throws NullPointerException when options is null */
  public GroundModelBuilder(GroundOptions options) {
    this.options = Objects.requireNonNull(options, "options");
    double cell = options.smrf().cellSize();
    this.surface = new LowestPointGrid(cell);
    this.classified = options.source() == GroundOptions.Source.FILTER
        ? null : new LowestPointGrid(cell);
  }

  /** Shortcut: feeds every chunk to a new builder and builds. */
  public static GroundModel build(Iterable<PointChunk> chunks, GroundOptions options) {
    GroundModelBuilder b = new GroundModelBuilder(options);
    chunks.forEach(b);
    return b.build();
  }

  /**
   * Shortcut: reads the survey on {@code threads} threads into one builder (decoding in
   * parallel, adding a decoded chunk under the builder's lock: a builder per thread would hold
   * the corridor's rasters once per thread) and builds.
   *
   * @param threads reader threads, 1 to 256 (1 reads on the calling thread)
   * @throws InputException as {@link Survey#read} and {@link #build()}
   */
  public static GroundModel build(Survey survey, GroundOptions options, int threads) {
    GroundModelBuilder b = new GroundModelBuilder(options);
    if (threads == 1) {
      survey.read(b);
      return b.build();
    }
    survey.readParallel(threads, () -> chunk -> {
      synchronized (b) {
        b.accept(chunk);
      }
    });
    return b.build(threads);
  }

  /**
   * The plan rectangles whose points decide the terrain over an area: the read windows (core
   * plus overlap) of the blocks that the area touches, with the cells that heights inside the
   * area interpolate from. A builder fed every point of these rectangles, and perhaps others,
   * gives inside the area the terrain of a builder fed the whole survey, provided both decide the
   * same way between class 2 and the filter (with {@link GroundOptions.Source#AUTO}: a survey
   * classified throughout). A distributed run reads a span's points this way (docs/spark.md).
   *
   * @param options the ground options (cell size, block size, overlap)
   * @return rectangles {@code {minX, minY, maxX, maxY}}, m, in row-major block order
   */
  public static List<double[]> inputWindows(GroundOptions options, double minX, double minY,
      double maxX, double maxY) {
    double cell = options.smrf().cellSize();
    int pad = INTERPOLATION_PAD_CELLS;
    return BlockTiling.windows(SparseGrid.DEFAULT_TILE_CELLS, options.blockCells(),
        options.overlapCells(), (int) Math.floor(minX / cell) - pad,
        (int) Math.floor(minY / cell) - pad, (int) Math.floor(maxX / cell) + pad,
        (int) Math.floor(maxY / cell) + pad).stream()
        .map(w -> new double[] {w[0] * cell, w[1] * cell, w[2] * cell, w[3] * cell}).toList();
  }

  /** Adds everything another builder (same options) has collected; that builder is emptied. */
  public void absorb(GroundModelBuilder other) {
    surface.merge(other.surface);
    if (classified != null) {
      classified.merge(other.classified);
    }
    points += other.points;
    groundPoints += other.groundPoints;
    other.surface = null;
    other.classified = null;
  }

  /** True for points every ground step ignores: noise classes 7 and 18, and withheld points. */
  static boolean isIgnored(PointChunk chunk, int i) {
    int cls = chunk.classification()[i];
    return cls == CLASS_LOW_NOISE || cls == CLASS_HIGH_NOISE
        || (chunk.flags()[i] & PointChunk.FLAG_WITHHELD) != 0;
  }

  /**
   * Adds a chunk's points (coordinates in metres).
   *
   * @throws IllegalStateException after {@link #build()}
   */
  @Override
  public void accept(PointChunk chunk) {
    if (surface == null) {
      throw new IllegalStateException("builder already built");
    }
    double[] x = chunk.x();
    double[] y = chunk.y();
    double[] z = chunk.z();
    short[] cls = chunk.classification();
    for (int i = 0, n = chunk.size(); i < n; i++) {
      if (isIgnored(chunk, i)) {
        continue;
      }
      points++;
      surface.accept(x[i], y[i], z[i]);
      if (cls[i] == CLASS_GROUND) {
        groundPoints++;
        if (classified != null) {
          classified.accept(x[i], y[i], z[i]);
        }
      }
    }
  }

  /**
   * Makes the terrain. The builder cannot be used afterwards.
   *
   * @throws InputException when the options demand class-2 points and the survey has none
   * @throws IllegalStateException when called twice
   */
  public GroundModel build() {
    return build(1);
  }

  /**
   * Makes the terrain, its blocks on {@code threads} threads. Each block's terrain depends only
   * on the collected rasters, and the blocks are written in their fixed order, so the result is
   * the same for every thread count. The builder cannot be used afterwards.
   *
   * @param threads worker threads, &gt;= 1
   * @throws InputException when the options demand class-2 points and the survey has none
   * @throws IllegalStateException when called twice
   */
  public GroundModel build(int threads) {
    if (surface == null) {
      throw new IllegalStateException("builder already built");
    }
    boolean useClassified = switch (options.source()) {
      case CLASSIFIED -> true;
      case FILTER -> false;
      case AUTO -> points > 0 && groundPoints >= options.minGroundShare() * points;
    };
    if (useClassified && groundPoints == 0) {
      throw new InputException((String) null, null, "classification",
          "the survey has no ground (class 2) points; let the ground filter find the ground");
    }
    SmrfOptions smrf = options.smrf();
    SparseGrid terrain = new SparseGrid(smrf.cellSize());
    int margin = (int) Math.ceil(options.coverageMargin() / smrf.cellSize());
    long[] cells = new long[3]; // surface, ground, filled
    OrderedParallel.forEach(BlockTiling.cover(surface.elevations(), options.blockCells(),
        options.overlapCells()), threads, b -> blockTerrain(b, useClassified, margin), t -> {
          BlockTiling.Block b = t.block();
          int side = b.readSize();
          for (int r = b.overlap(); r < b.overlap() + b.size(); r++) {
            for (int c = b.overlap(); c < b.overlap() + b.size(); c++) {
              int i = r * side + c;
              if (!Float.isNaN(t.lowest()[i])) {
                cells[0]++;
              }
              if (t.covered()[i] && !Float.isNaN(t.dem()[i])) {
                terrain.set(b.readCol0() + c, b.readRow0() + r, t.dem()[i]);
                cells[t.ground()[i] ? 1 : 2]++;
              }
            }
          }
        });
    long surfaceCells = cells[0];
    long groundCells = cells[1];
    long filledCells = cells[2];
    GroundSource source = new GroundSource(
        useClassified ? GroundSource.Kind.CLASSIFIED : GroundSource.Kind.FILTERED,
        useClassified ? Optional.empty() : Optional.of(smrf),
        points, groundPoints, surfaceCells, groundCells, filledCells);
    surface = null;
    classified = null;
    return new GroundModel(terrain, smrf, source);
  }

  /**
   * Terrain of one block (read raster, row-major).
   *
   * @param block the block
   * @param lowest lowest point per cell of all considered points, metres, NaN where empty
   * @param covered cells within the coverage margin of a cell with points
   * @param ground cells whose value comes from ground points
   * @param dem terrain, metres; NaN when the block has no ground at all
   */
  private record BlockTerrain(BlockTiling.Block block, float[] lowest, boolean[] covered, boolean[] ground, float[] dem) {}

  private BlockTerrain blockTerrain(BlockTiling.Block b, boolean useClassified, int margin) {
    int side = b.readSize();
    int col0 = b.readCol0();
    int row0 = b.readRow0();
    float[] all = surface.elevations().readBlock(col0, row0, side, side);
    boolean[] ground = new boolean[all.length];
    float[] provisional;
    if (useClassified) {
      float[] g = classified.elevations().readBlock(col0, row0, side, side);
      for (int i = 0; i < g.length; i++) {
        ground[i] = !Float.isNaN(g[i]);
      }
      provisional = Inpainter.fill(g, side, side);
    } else {
      SmrfRaster.Result r = SmrfRaster.run(all, side, side, options.smrf());
      for (int i = 0; i < all.length; i++) {
        ground[i] = !Float.isNaN(all[i]) && !r.object()[i] && !r.lowOutlier()[i];
      }
      provisional = r.dem();
    }
    float[] dem = provisional;
    if (!Float.isNaN(provisional[0])) {
      LowestPointGrid lows = useClassified ? classified : surface;
      float[] centred = lows.positionCorrected(col0, row0, side, provisional);
      for (int i = 0; i < centred.length; i++) {
        centred[i] = ground[i] ? centred[i] : Float.NaN;
      }
      dem = Inpainter.fill(centred, side, side);
    }
    return new BlockTerrain(b, all, coverage(all, side, margin), ground, dem);
  }

  /** Cells with data, grown by {@code margin} cells in x and y (a square neighbourhood). */
  static boolean[] coverage(float[] data, int side, int margin) {
    boolean[] rows = new boolean[data.length];
    for (int r = 0; r < side; r++) {
      int last = Integer.MIN_VALUE / 2;
      for (int c = 0; c < side; c++) {
        if (!Float.isNaN(data[r * side + c])) {
          last = c;
        }
        rows[r * side + c] = c - last <= margin;
      }
      last = Integer.MAX_VALUE / 2;
      for (int c = side - 1; c >= 0; c--) {
        if (!Float.isNaN(data[r * side + c])) {
          last = c;
        }
        rows[r * side + c] |= last - c <= margin;
      }
    }
    boolean[] out = new boolean[data.length];
    for (int c = 0; c < side; c++) {
      int last = Integer.MIN_VALUE / 2;
      for (int r = 0; r < side; r++) {
        if (rows[r * side + c]) {
          last = r;
        }
        out[r * side + c] = r - last <= margin;
      }
      last = Integer.MAX_VALUE / 2;
      for (int r = side - 1; r >= 0; r--) {
        if (rows[r * side + c]) {
          last = r;
        }
        out[r * side + c] |= last - r <= margin;
      }
    }
    return out;
  }
}
