package org.clearance.ground;

import java.util.Objects;

/**
 * How {@link GroundModelBuilder} makes the terrain surface.
 *
 * @param source where the ground comes from: the survey's class-2 points, the SMRF filter, or
 *     whichever fits ({@link Source#AUTO})
 * @param smrf filter parameters; its cell size is also the cell of the terrain raster when the
 *     class-2 points are used
 * @param blockSize side of the blocks the raster is processed in, metres, finite, &gt;= 16 x the
 *     cell size (default 256); rounded up to whole tiles of 64 cells
 * @param coverageMargin distance from the nearest cell holding survey points within which the
 *     terrain is still given (small gaps bridged), metres, finite, &gt;= 0 (default 5)
 * @param minGroundShare share of the survey's points that must be class 2 for {@link Source#AUTO}
 *     to use them, in (0, 1] (default 0.01)
 */
public record GroundOptions(
    Source source,
    SmrfOptions smrf,
    double blockSize,
    double coverageMargin,
    double minGroundShare) {

  /** Where the terrain comes from. */
  public enum Source {
    /** Class-2 points when at least {@code minGroundShare} of the points are class 2, else SMRF. */
    AUTO,
    /** The survey's class-2 points; an error when it has none. */
    CLASSIFIED,
    /** SMRF over all non-noise points, whatever their classes. */
    FILTER
  }

  /** Blocks smaller than this many cells a side spend most of their time in the overlap. */
  private static final int MIN_BLOCK_CELLS = 16;

  /**
   * @throws IllegalArgumentException when a parameter is out of range
   * @throws NullPointerException when {@code source} or {@code smrf} is null
   */
  public GroundOptions {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(smrf, "smrf");
    if (!(Double.isFinite(blockSize) && blockSize >= MIN_BLOCK_CELLS * smrf.cellSize())) {
      throw new IllegalArgumentException(
          "block size must be finite and >= 16 cells: " + blockSize + " m");
    }
    if (!(Double.isFinite(coverageMargin) && coverageMargin >= 0)) {
      throw new IllegalArgumentException(
          "coverage margin must be finite and >= 0: " + coverageMargin + " m");
    }
    if (!(minGroundShare > 0 && minGroundShare <= 1)) {
      throw new IllegalArgumentException("minimum ground share must be in (0, 1]: "
          + minGroundShare);
    }
  }

  /** AUTO source, default SMRF, 256 m blocks, 5 m coverage margin, 1 % ground share. */
  public static GroundOptions defaults() {
    return new GroundOptions(Source.AUTO, SmrfOptions.defaults(), 256, 5, 0.01);
  }

  /** The same options with another source. */
  public GroundOptions withSource(Source newSource) {
    return new GroundOptions(newSource, smrf, blockSize, coverageMargin, minGroundShare);
  }

  /** The same options with other SMRF parameters. */
  public GroundOptions withSmrf(SmrfOptions newSmrf) {
    return new GroundOptions(source, newSmrf, blockSize, coverageMargin, minGroundShare);
  }

  /** Block side in cells (before rounding to tiles). */
  int blockCells() {
    return (int) Math.ceil(blockSize / smrf.cellSize());
  }

  /**
   * Overlap read around each block, cells: twice the largest opening radius, the reach of one
   * opening (an erosion then a dilation), and at least the coverage margin.
   */
  int overlapCells() {
    int margin = (int) Math.ceil(coverageMargin / smrf.cellSize());
    return Math.max(2 * smrf.maxRadiusCells(), margin) + 1;
  }
}
