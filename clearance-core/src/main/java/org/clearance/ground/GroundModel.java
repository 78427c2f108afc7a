package org.clearance.ground;

import java.util.Objects;

/**
 * The terrain surface of a survey: ground elevation and height above ground anywhere the survey
 * covers, and SMRF's final ground test for single points.
 *
 * <p>The terrain is a raster (cell size {@link #cellSize()}) read by bilinear interpolation between
 * cell centres, falling back to the nearest cell at the edge of the covered area. It is stored
 * sparsely, tile by tile, so its memory follows the corridor. Lookups are O(1), allocation-free and
 * safe from several threads. Build one with {@link GroundModelBuilder}.
 */
public final class GroundModel {
  private final SparseGrid terrain;
  private final double elevationThreshold;
  private final double elevationScalar;
  private final GroundSource source;

  GroundModel(SparseGrid terrain, SmrfOptions thresholds, GroundSource source) {
    this.terrain = Objects.requireNonNull(terrain, "terrain");
    this.elevationThreshold = thresholds.elevationThreshold();
    this.elevationScalar = thresholds.elevationScalar();
    this.source = Objects.requireNonNull(source, "source");
  }

  /**
   * Ground elevation at a plan position.
   *
   * @param x easting, metres
   * @param y northing, metres
   * @return elevation, metres; NaN outside the covered area
   */
  public double groundZ(double x, double y) {
    return terrain.value(x, y);
  }

  /**
   * Height of a point above the ground beneath it.
   *
   * @param x easting, metres
   * @param y northing, metres
   * @param z elevation, metres
   * @return z minus the ground elevation, metres (negative below ground); NaN outside coverage
   */
  public double heightAboveGround(double x, double y, double z) {
    return z - terrain.value(x, y);
  }

  /**
   * Steepness of the terrain at a plan position, rise over run (0 = flat, 1 = 45 degrees).
   *
   * @return slope, dimensionless, &gt;= 0; NaN where the four surrounding cells are not all covered
   */
  public double slope(double x, double y) {
    return terrain.slope(x, y);
  }

  /**
   * SMRF's final test (Pingel, Clarke &amp; McBride 2013; methods.md 4.3): a point is ground when
   * {@code |z - ground| <= eta + kappa * slope}, with eta and kappa from the filter options and the
   * slope of this surface. Where the slope is unknown (edge of coverage) the band is eta alone.
   *
   * @param x easting, metres
   * @param y northing, metres
   * @param z elevation, metres
   * @return true for a ground point; false outside coverage
   */
  public boolean isGround(double x, double y, double z) {
    double g = terrain.value(x, y);
    if (Double.isNaN(g)) {
      return false;
    }
    double s = terrain.slope(x, y);
    double band = elevationThreshold + (Double.isNaN(s) ? 0 : elevationScalar * s);
    return Math.abs(z - g) <= band;
  }

  /** Where the terrain came from. */
  public GroundSource source() {
    return source;
  }

  /** Cell side of the terrain raster, metres. */
  public double cellSize() {
    return terrain.cellSize();
  }

  /** Approximate heap bytes held by the terrain raster. */
  public long memoryBytes() {
    return terrain.memoryBytes();
  }

  /** Number of tiles of the terrain raster (grows with the corridor's area, not its extent). */
  public int tileCount() {
    return terrain.tileCount();
  }
}
